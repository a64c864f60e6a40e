// The in-browser designer (<base>/custom/) in Debian's chromium, served from 127.0.0.1 by the
// harness: a run from a URL matches `bentwire design --json`, downloads made in the page parse and
// load into `analyze`, bad values start nothing, cancel ends the worker, nothing leaves the host.
// The reference for every figure is the command line on the same inputs (the same generator code
// under Node); the DXF is read with dxf-parser, a general-purpose reader from the npm registry.
import { execFile } from "node:child_process";
import { mkdirSync, readFileSync, readdirSync, rmSync, writeFileSync } from "node:fs";
import { join } from "node:path";
import { promisify } from "node:util";
import DxfParser from "dxf-parser";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { checkEntryText } from "../../generator/catalog/store.js";
import { parseShape } from "../../generator/em/shapeFile.js";
import { sha256Hex } from "../../generator/export/index.js";
import { isOk } from "../../generator/site/ok.js";
import { requestFromState, stateFromQuery } from "../../generator/browser/designerQuery.js";
import { CACHE, ROOT, ensureSite, launchChromium, serve, watchedPage, type Browser, type PageWatch, type SiteBuild, type StaticServer } from "./harness.js";
import { readEntries } from "./entries.js";

const run = promisify(execFile);
const BASE = "/club/atlas/";
const TSX = join(ROOT, "node_modules/.bin/tsx");
const CLI = join(ROOT, "generator/cli/main.ts");
/** A small, fast case: a 1.5 λ wire with one piece per arm (a V) at 145 MHz. */
const CASE = { freqMhz: "145", bandMhz: "144:146", lengthWl: "1.5", pieces: "1", variant: "max-gain", wireDiameterMm: "2", conductor: "copper", seed: "1" };
const CASE_FLAGS = ["--freq-mhz", "145", "--band-mhz", "144:146", "--length-wl", "1.5", "--pieces", "1", "--variant", "max-gain", "--wire-diameter-mm", "2", "--conductor", "copper", "--seed", "1"];

let site: SiteBuild, server: StaticServer, browser: Browser;
let cliResult: Record<string, any>;

async function cli(args: string[]): Promise<{ stdout: string; stderr: string; code: number }> {
  try {
    const { stdout, stderr } = await run(TSX, [CLI, ...args], { cwd: ROOT, maxBuffer: 1 << 26 });
    return { stdout, stderr, code: 0 };
  } catch (e) {
    const err = e as { stdout: string; stderr: string; code: number };
    return { stdout: err.stdout, stderr: err.stderr, code: err.code };
  }
}

function fixture(): string {
  const dir = join(CACHE, "designer-entries");
  rmSync(dir, { recursive: true, force: true });
  mkdirSync(dir, { recursive: true });
  for (const e of readEntries().filter(isOk).slice(0, 2)) writeFileSync(join(dir, `${e.id}.json`), `${JSON.stringify(e)}\n`);
  return dir;
}

beforeAll(async () => {
  site = await ensureSite("designer", fixture(), BASE);
  server = await serve(site.dir, BASE);
  browser = await launchChromium();
  cliResult = JSON.parse((await cli(["design", ...CASE_FLAGS, "--json"])).stdout);
});

afterAll(async () => {
  await browser?.close();
  await server?.close();
});

const url = (q: Record<string, string>) => `${server.origin}${BASE}custom/?${new URLSearchParams(q)}`;
/** The page publishes #design-result when the search ends and the full analysis after: this waits for both. */
async function finished(p: PageWatch["page"]): Promise<void> {
  await p.waitForSelector("#design-result", { state: "attached", timeout: 240_000 });
  await p.waitForSelector('[data-progress][data-state="done"]', { state: "attached", timeout: 240_000 });
}

function expectLocal(w: PageWatch) {
  expect(w.requests.filter((u) => !u.startsWith(`${server.origin}${BASE}`) && !u.startsWith("data:") && !u.startsWith("blob:")), "requests leaving the host").toEqual([]);
  expect(browser.allRequests.filter((u) => !u.startsWith(server.origin) && !u.startsWith("data:") && !u.startsWith("blob:")), "requests of any page or worker").toEqual([]);
  expect(w.problems, "console errors, warnings and CSP violations").toEqual([]);
}

const nodes = (r: Record<string, any>): number[] => r.shape.wires[0].pointsM.flat();
const maxDiff = (a: number[], b: number[]) => (a.length === b.length ? Math.max(...a.map((v, i) => Math.abs(v - b[i]))) : Infinity);

describe("designer page", () => {
  let page: PageWatch;
  let web: Record<string, any>;

  it("a run from a URL with run=1 completes and publishes the result with the fields of design --json", async () => {
    page = await watchedPage(browser);
    await page.page.goto(url({ ...CASE, run: "1" }));
    await page.page.waitForSelector("#design-result", { state: "attached", timeout: 240_000 });
    web = JSON.parse((await page.page.locator("#design-result").textContent())!);
    // shown before the analysis ends: the search's figures come first, the full sections after
    // (read in one task of the page, so the DOM cannot change between the two reads)
    const early = await page.page.evaluate(() => ({
      state: document.querySelector<HTMLElement>("[data-progress]")!.dataset.state,
      pieces: document.querySelectorAll('table[data-table="early-pieces"] tbody tr').length,
    }));
    expect(["analysing", "done"]).toContain(early.state);
    if (early.state === "analysing") expect(early.pieces).toBe(1);
    await finished(page.page);
    expect(web).toEqual(JSON.parse((await page.page.locator("#design-result").textContent())!)); // published once
    expect(Object.keys(web).sort()).toEqual(Object.keys(cliResult).sort());
    expect(web.status).toBe("ok");
    expect(web.status).toBe(cliResult.status);
    expect(Math.abs(web.peakGainDbi - cliResult.peakGainDbi), "gain vs the CLI (dB)").toBeLessThan(1e-6);
    expect(web.solverVersion).toBe(cliResult.solverVersion);
    // the catalog page's sections are there, filled from the same table rows
    for (const t of ["figures", "pieces", "vertices", "tolerance", "downloads"]) expect(await page.page.locator(`table[data-table="${t}"]`).count(), t).toBe(1);
    const broken = await page.page.$$eval("[data-result] img", (imgs) => imgs.filter((i) => !(i as HTMLImageElement).complete || (i as HTMLImageElement).naturalWidth === 0).length);
    expect(broken).toBe(0);
    expect(await page.page.locator("[data-result] img").count()).toBe(6);
    expectLocal(page);
  }, 300_000);

  // Chromium's and Node's V8 may differ in the last bit of Math.sin, cos, exp… on a few % of
  // arguments; on this case the search still ends on the same nodes.
  it("the browser's nodes equal the CLI's within 1e-9 m", () => {
    expect(maxDiff(nodes(web), nodes(cliResult))).toBeLessThan(1e-9);
  });

  it("the worker bundle is the CLI's code: run under Node it gives the CLI's result bit for bit", async () => {
    const worker = readdirSync(join(site.dir, "_astro")).find((n) => /^designer-.*\.js$/.test(n));
    expect(worker, "worker bundle in _astro/").toBeDefined();
    // a plain Node process stands in for the worker's global scope: `self` with postMessage
    const runner = join(CACHE, "designer-bundle-runner.mjs");
    writeFileSync(runner, [
      "import { pathToFileURL } from 'node:url';",
      "globalThis.self = globalThis;",
      "self.postMessage = (m) => { if (m.type === 'done') process.stdout.write(JSON.stringify(m.result)); if (m.type === 'error') process.stderr.write(m.message); };",
      "await import(pathToFileURL(process.argv[2]).href);",
      "self.onmessage({ data: { request: JSON.parse(process.argv[3]) } });",
    ].join("\n"));
    const request = { frequencyHz: 145e6, lengthWl: 1.5, piecesPerArm: 1, wireDiameterM: 0.002, conductor: "copper", variant: "max-gain", bandHz: [144e6, 146e6], lineImpedanceOhm: 50, swrLimit: 2, seed: 1 };
    const { stdout } = await promisify(execFile)(process.execPath, [runner, join(site.dir, "_astro", worker!), JSON.stringify(request)], { maxBuffer: 1 << 26 });
    expect(JSON.parse(stdout)).toEqual(cliResult);
  }, 300_000);

  it("downloads made in the page parse, and the shape file loads into analyze with the same figures", async () => {
    const links = await page.page.$$eval("[data-result] a[data-download]", (as) => as.map((a) => a.getAttribute("download")!));
    const files = new Map<string, string>();
    // Chromium lets one page start only 10 downloads without asking: every 9 files, the same run is
    // made afresh on a new page (same inputs and seed, same files) and the next links are clicked there
    let from = page.page;
    for (const [k, name] of links.entries()) {
      if (k > 0 && k % 9 === 0) {
        if (from !== page.page) await from.close();
        from = (await watchedPage(browser)).page;
        await from.goto(url({ ...CASE, run: "1" }));
        await finished(from);
      }
      const [dl] = await Promise.all([from.waitForEvent("download", { timeout: 30_000 }), from.click(`a[download="${name}"]`)]).catch((err) => {
        throw new Error(`download of ${name} (${k + 1} of ${links.length}): ${(err as Error).message.split("\n")[0]}`);
      });
      files.set(name, readFileSync((await dl.path())!, "utf8"));
    }
    if (from !== page.page) await from.close();
    const id = links.find((n) => n.endsWith(".shape.json"))!.replace(/\.shape\.json$/, "");
    expect(id).toMatch(/^custom-145mhz-1\.5wl-k1-max-gain$/);
    const entry = checkEntryText(files.get(`${id}.json`)!, "download");
    expect(entry.ok, entry.ok ? "" : entry.problem).toBe(true);
    const shape = parseShape(files.get(`${id}.shape.json`)!);
    expect(maxDiff(shape.wires[0].pointsM.flat(), nodes(web))).toBeLessThan(1e-6); // entry rounding: 7 significant digits
    const dir = join(CACHE, "designer-downloads");
    mkdirSync(dir, { recursive: true });
    writeFileSync(join(dir, "shape.json"), files.get(`${id}.shape.json`)!);
    const analyzed = JSON.parse((await cli(["analyze", join(dir, "shape.json"), "--json"])).stdout);
    expect(Math.abs(analyzed.peakGainDbi - web.peakGainDbi), "analyze of the downloaded shape vs the page (dB)").toBeLessThan(1e-4);
    if (entry.ok) expect(Math.abs(analyzed.peakGainDbi - entry.value.figures!.gainDbi)).toBeLessThan(1e-4);
    const csv = files.get(`${id}.nodes.csv`)!.trim().split("\r\n");
    expect(csv).toHaveLength(3 + 1);
    const dxf = new DxfParser().parseSync(files.get(`${id}.dxf`)!);
    const poly = dxf!.entities.find((e) => e.type === "POLYLINE" || e.type === "LWPOLYLINE") as unknown as { vertices: { x: number; y: number }[] };
    expect(poly.vertices).toHaveLength(3);
    poly.vertices.forEach((v, k) => expect(Math.abs(v.x - shape.wires[0].pointsM[k][0] * 1000)).toBeLessThan(1e-3));
    const templates = [...files.keys()].filter((n) => n.endsWith(".svg"));
    expect(templates.some((n) => n.includes("-a4")) && templates.some((n) => n.includes("-letter"))).toBe(true);
    for (const n of templates) expect(files.get(n)!, n).toMatch(/<svg[^>]*width="[\d.]+mm"/);
    const sums = files.get("SHA256SUMS")!.trim().split("\n").map((l) => l.split("  ") as [string, string]);
    for (const [hash, name] of sums) expect(sha256Hex(files.get(name)!), name).toBe(hash);
    expectLocal(page);
    await page.page.close();
  }, 120_000);

  it("bad form values show the CLI's message and start nothing", async () => {
    const w = await watchedPage(browser);
    const cases: [Record<string, string>, string[]][] = [
      [{ ...CASE, lengthWl: "9" }, [...CASE_FLAGS.slice(0, 4), "--length-wl", "9", ...CASE_FLAGS.slice(6)]],
      [{ ...CASE, bandMhz: "146:150" }, [...CASE_FLAGS.slice(0, 2), "--band-mhz", "146:150", ...CASE_FLAGS.slice(4)]],
    ];
    for (const [q, flags] of cases) {
      await w.page.goto(url({ ...q, run: "1" }), { waitUntil: "networkidle" });
      const shown = (await w.page.locator("[data-form-message]").textContent())!;
      const fromCli = await cli(["design", ...flags, "--json"]);
      expect(fromCli.code).toBe(2);
      expect(fromCli.stderr).toContain(shown);
      expect(shown).toMatch(/^design: /);
    }
    await w.page.goto(url({ ...CASE, freqMhz: "-3", run: "1" }), { waitUntil: "networkidle" });
    expect(await w.page.locator("[data-form-message]").textContent()).toBe("design: freqMhz must be a positive number");
    // hostile text in the URL shows as text and never runs
    await w.page.goto(url({ ...CASE, pieces: '<img src=x onerror="window.__pwned=1">', run: "1" }), { waitUntil: "networkidle" });
    expect(await w.page.locator("[data-form-message]").textContent()).toMatch(/^design: pieces must be a whole number from 1 to 8$/);
    expect(await w.page.evaluate(() => (window as unknown as { __pwned?: number }).__pwned)).toBeUndefined();
    expect(await w.page.locator("#design-result").count()).toBe(0);
    expect(await w.page.locator("[data-progress]").isHidden()).toBe(true);
    expect(w.requests.filter((u) => /designer-[^/]*\.js$/.test(u)), "worker script fetched").toEqual([]);
    expectLocal(w);
    await w.page.close();
  });

  it("a design page links here: re-optimize for my wire, and the scale calculator with its scaled inputs", async () => {
    const entry = readEntries().filter(isOk)[0];
    const w = await watchedPage(browser);
    await w.page.goto(`${server.origin}${BASE}designs/${entry.id}/`, { waitUntil: "networkidle" });
    const mine = new URL((await w.page.locator("[data-my-wire] a").getAttribute("href"))!, server.origin);
    expect(mine.pathname).toBe(`${BASE}custom/`);
    expect(Number(mine.searchParams.get("freqMhz"))).toBeCloseTo(entry.inputs.frequencyHz / 1e6, 4);
    expect(Number(mine.searchParams.get("lengthWl"))).toBe(entry.inputs.lengthWl);
    expect(mine.searchParams.get("pieces")).toBe(String(entry.inputs.piecesPerArm));
    // scaling to twice the frequency halves the wire (the calculator's rule: every length × f_design / f_new)
    const target = (2 * entry.inputs.frequencyHz) / 1e6;
    await w.page.fill("[data-scale-input]", String(target));
    const scaled = new URL((await w.page.locator("[data-scale-custom]").getAttribute("href"))!, server.origin);
    expect(Number(scaled.searchParams.get("freqMhz"))).toBeCloseTo(target, 4);
    expect(Number(scaled.searchParams.get("wireDiameterMm"))).toBeCloseTo((entry.inputs.wireDiameterM * 1000) / 2, 6);
    const [lo, hi] = scaled.searchParams.get("bandMhz")!.split(":").map(Number);
    expect(lo).toBeCloseTo((2 * entry.inputs.bandLowHz) / 1e6, 3);
    expect(hi).toBeCloseTo((2 * entry.inputs.bandHighHz) / 1e6, 3);
    await w.page.click("[data-scale-custom]");
    await w.page.waitForURL(/\/custom\//);
    expect(Number(await w.page.inputValue("input[name=freqMhz]"))).toBeCloseTo(target, 4);
    expect(await w.page.inputValue("input[name=pieces]")).toBe(String(entry.inputs.piecesPerArm));
    expect(await w.page.locator("[data-progress]").isHidden()).toBe(true); // a link fills the form; only run=1 starts
    expectLocal(w);
    await w.page.close();
  }, 60_000);

  it("cancel ends the worker: no more progress, no result", async () => {
    const w = await watchedPage(browser);
    await w.page.goto(url({ ...CASE, lengthWl: "2.5", pieces: "4" }), { waitUntil: "networkidle" });
    const started = w.page.waitForEvent("worker");
    await w.page.click("[data-run]");
    const worker = await started;
    const closed = new Promise<void>((ok) => worker.on("close", () => ok()));
    await w.page.waitForFunction(() => Number(document.querySelector<HTMLElement>("[data-progress]")!.dataset.evaluations) > 0, null, { timeout: 120_000 });
    await w.page.click("[data-cancel]");
    await closed;
    const at = await w.page.locator("[data-progress]").getAttribute("data-evaluations");
    await w.page.waitForTimeout(1500);
    expect(await w.page.locator("[data-progress]").getAttribute("data-evaluations")).toBe(at);
    expect(await w.page.locator("[data-progress]").getAttribute("data-state")).toBe("cancelled");
    expect(await w.page.locator("#design-result").count()).toBe(0);
    expect(await w.page.locator("[data-run]").isEnabled()).toBe(true);
    expectLocal(w);
    await w.page.close();
  }, 180_000);
});

// Over ground: the same run as `design --ground average --height-m 10` (a 1 λ straight wire 10 m over
// average ground at 28.5 MHz: one piece per arm, a few hundred evaluations), its figures over ground
// in the page, and a shape file that carries the ground so `analyze` gives the same figures.
const GROUND_CASE = { freqMhz: "28.5", lengthWl: "1", pieces: "1", variant: "max-gain", wireDiameterMm: "2", conductor: "copper", seed: "1", ground: "average", heightM: "10" };
const GROUND_FLAGS = ["--freq-mhz", "28.5", "--length-wl", "1", "--pieces", "1", "--variant", "max-gain", "--wire-diameter-mm", "2", "--conductor", "copper", "--seed", "1", "--ground", "average", "--height-m", "10"];

describe("designer page over ground", () => {
  let ref: Record<string, any>;

  it("a run from a URL with run=1 over average ground publishes design --json's result, shows the ground figures, and its shape file analyzes the same", async () => {
    const fromCli = await cli(["design", ...GROUND_FLAGS, "--json"]);
    expect(fromCli.code, fromCli.stderr).toBe(0);
    ref = JSON.parse(fromCli.stdout);
    const w = await watchedPage(browser);
    await w.page.goto(url({ ...GROUND_CASE, run: "1" }));
    await finished(w.page);
    const got = JSON.parse((await w.page.locator("#design-result").textContent())!);
    expect(Object.keys(got).sort()).toEqual(Object.keys(ref).sort());
    expect(got.status).toBe("ok");
    expect(got.ground).toEqual({ type: "real", relativePermittivity: 13, conductivitySPerM: 5e-3 });
    expect(Math.abs(got.peakGainDbi - ref.peakGainDbi), "gain vs the CLI (dB)").toBeLessThan(1e-6);
    expect(Math.abs(got.objectiveGainDbi - ref.objectiveGainDbi), "objective gain vs the CLI (dB)").toBeLessThan(1e-6);
    expect(maxDiff(got.gainAtElevationDbi.map((e: { gainDbi: number }) => e.gainDbi), ref.gainAtElevationDbi.map((e: { gainDbi: number }) => e.gainDbi))).toBeLessThan(1e-6);
    expect(Math.abs(got.peakElevationDeg - ref.peakElevationDeg)).toBeLessThan(1e-6);
    expect(maxDiff(nodes(got), nodes(ref)), "nodes vs the CLI (m)").toBeLessThan(1e-9);
    expect({ mounting: got.mounting, objective: got.objective, feedHeightM: got.feedHeightM }).toEqual({ mounting: ref.mounting, objective: ref.objective, feedHeightM: ref.feedHeightM });
    // the figures the CLI reports over ground, as text in the result
    const rows = await w.page.$$eval('table[data-table="ground"] tr', (trs) => trs.map((tr) => tr.textContent ?? ""));
    expect(rows.find((r) => r.startsWith("Peak gain"))).toContain(`${ref.peakGainDbi.toFixed(2)} dBi at ${ref.peakElevationDeg.toFixed(1)}° elevation`);
    expect(rows.some((r) => r.startsWith("Takeoff"))).toBe(true);
    expect(rows.some((r) => r.startsWith("Ground loss") && r.includes("% of the input power"))).toBe(true);
    expect(await w.page.locator('table[data-table="elevations"] tbody tr').count()).toBe(ref.gainAtElevationDbi.length);
    // the elevation pattern as the catalog page draws it: ground line, takeoff at the peak's elevation
    const src = (await w.page.getAttribute('[data-figure="elevation"] img', "src"))!;
    const svg = decodeURIComponent(src.replace(/^data:image\/svg\+xml;charset=utf-8,/, ""));
    expect(svg).toContain('class="groundline"');
    expect(svg).toMatch(/takeoff \d/);
    // the shape file: the wire as mounted, with its ground, the bytes `design --out` writes
    const name = (await w.page.getAttribute('[data-result] a[download$=".shape.json"]', "download"))!;
    expect(name).toBe("custom-28.5mhz-1wl-k1-max-gain-average-h10m-horizontal-peak.shape.json");
    const [dl] = await Promise.all([w.page.waitForEvent("download", { timeout: 30_000 }), w.page.click(`a[download="${name}"]`)]);
    const text = readFileSync((await dl.path())!, "utf8");
    const shape = parseShape(text);
    expect(shape.ground).toEqual(got.ground);
    expect(maxDiff(shape.wires[0].pointsM.flat(), nodes(got))).toBe(0);
    const dir = join(CACHE, "designer-downloads");
    mkdirSync(dir, { recursive: true });
    writeFileSync(join(dir, "ground.shape.json"), text);
    const analyzed = await cli(["analyze", join(dir, "ground.shape.json"), "--json"]);
    expect(analyzed.code, analyzed.stderr).toBe(0);
    const a = JSON.parse(analyzed.stdout);
    expect(Math.abs(a.peakGainDbi - got.peakGainDbi), "analyze of the downloaded shape vs the page (dB)").toBeLessThan(1e-6);
    expect(Math.abs(a.peakElevationDeg - got.peakElevationDeg)).toBeLessThan(1e-6);
    expectLocal(w);
    await w.page.close();
  }, 300_000);

  it("the worker bundle over ground, run under Node on the page's request, gives design --json's result bit for bit", async () => {
    const worker = readdirSync(join(site.dir, "_astro")).find((n) => /^designer-.*\.js$/.test(n))!;
    const runner = join(CACHE, "designer-bundle-runner-ground.mjs");
    writeFileSync(runner, [
      "import { pathToFileURL } from 'node:url';",
      "globalThis.self = globalThis;",
      "self.postMessage = (m) => { if (m.type === 'done') process.stdout.write(JSON.stringify(m.result)); if (m.type === 'error') process.stderr.write(m.message); };",
      "await import(pathToFileURL(process.argv[2]).href);",
      "self.onmessage({ data: { request: JSON.parse(process.argv[3]) } });",
    ].join("\n"));
    const request = requestFromState(stateFromQuery(`?${new URLSearchParams(GROUND_CASE)}`));
    const { stdout } = await promisify(execFile)(process.execPath, [runner, join(site.dir, "_astro", worker), JSON.stringify(request)], { maxBuffer: 1 << 26 });
    expect(JSON.parse(stdout)).toEqual(ref);
  }, 300_000);

  it("a bad height shows the CLI's message and starts nothing", async () => {
    const w = await watchedPage(browser);
    await w.page.goto(url({ ...GROUND_CASE, heightM: "0", run: "1" }), { waitUntil: "networkidle" });
    const shown = (await w.page.locator("[data-form-message]").textContent())!;
    const fromCli = await cli(["design", ...GROUND_FLAGS.slice(0, -1), "0", "--json"]);
    expect(fromCli.code).toBe(2);
    expect(shown).toBe("design: heightM: heightM must be a positive number");
    expect(fromCli.stderr.trim()).toBe(shown);
    expect(await w.page.getAttribute("input[name=heightM]", "aria-invalid")).toBe("true");
    expect(await w.page.locator("#design-result").count()).toBe(0);
    expect(await w.page.locator("[data-progress]").isHidden()).toBe(true);
    expect(w.requests.filter((u) => /designer-[^/]*\.js$/.test(u)), "worker script fetched").toEqual([]);
    expectLocal(w);
    await w.page.close();
  });

  it("a clearance fills its field from the URL; on a horizontal design it shows the CLI's message there and starts nothing", async () => {
    const w = await watchedPage(browser);
    await w.page.goto(url({ ...GROUND_CASE, mounting: "vertical", clearanceM: "2" }), { waitUntil: "networkidle" });
    expect(await w.page.inputValue("input[name=clearanceM]")).toBe("2");
    await w.page.goto(url({ ...GROUND_CASE, clearanceM: "2", run: "1" }), { waitUntil: "networkidle" });
    const shown = (await w.page.locator("[data-form-message]").textContent())!;
    const fromCli = await cli(["design", ...GROUND_FLAGS, "--clearance-m", "2", "--json"]);
    expect(fromCli.code).toBe(2);
    expect(shown).toBe("design: verticalClearanceM: a clearance (--clearance-m) applies to the vertical mounting only (--mounting vertical)");
    expect(fromCli.stderr.trim()).toBe(shown);
    expect(await w.page.getAttribute("input[name=clearanceM]", "aria-invalid")).toBe("true");
    expect(await w.page.locator("#design-result").count()).toBe(0);
    expect(w.requests.filter((u) => /designer-[^/]*\.js$/.test(u)), "worker script fetched").toEqual([]);
    expectLocal(w);
    await w.page.close();
  });
});
