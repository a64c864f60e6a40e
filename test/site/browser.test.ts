// The built site in real headless Chromium (Debian's /usr/bin/chromium through playwright-core),
// served from 127.0.0.1 by the harness's own static server. Two builds: the catalog at the root
// (reusing dist/ when `npm run build` left a matching fingerprint), and a small fixture catalog,
// hostile text included, under the sub-path /club/atlas/.
import { mkdirSync, readdirSync, readFileSync, rmSync, writeFileSync } from "node:fs";
import { join } from "node:path";
import DxfParser from "dxf-parser";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { checkEntryText } from "../../generator/catalog/store.js";
import { parseShape } from "../../generator/em/shapeFile.js";
import { sha256Hex } from "../../generator/export/index.js";
import { bandsOf } from "../../generator/site/catalog.js";
import { isOk, type Entry, type OkEntry } from "../../generator/site/ok.js";
import { CACHE, ensureSite, launchChromium, serve, watchedPage, type Browser, type PageWatch, type SiteBuild, type StaticServer } from "./harness.js";
import { HOSTILE, hostileEntry, readEntries, siteTestEntriesDir } from "./entries.js";
import { expectShownEqualsEntry } from "./shownCheck.js";

const SUB = "/club/atlas/";
// the site these tests open is built from the free-space part of the catalog (entries.ts)
const ENTRIES_DIR = siteTestEntriesDir();
const entries = readEntries(ENTRIES_DIR);
const okEntries = entries.filter(isOk);
const bands = bandsOf(entries);

let main: SiteBuild, sub: SiteBuild;
let mainServer: StaticServer, subServer: StaticServer;
let browser: Browser;
const fixtureIds: string[] = [];

/** A small catalog for the sub-path build: a few real entries and one with hostile text. */
function writeFixture(): string {
  const dir = join(CACHE, "fixture-entries");
  mkdirSync(dir, { recursive: true });
  const picked: Entry[] = [...okEntries.slice(0, 3), ...entries.filter((e) => !isOk(e)).slice(0, 1), hostileEntry(okEntries[0])];
  const keep = new Set(picked.map((e) => `${e.id}.json`));
  for (const name of readdirSync(dir)) if (!keep.has(name)) rmSync(join(dir, name), { recursive: true, force: true });
  for (const e of picked) {
    const text = `${JSON.stringify(e)}\n`;
    let old = "";
    try { old = readFileSync(join(dir, `${e.id}.json`), "utf8"); } catch { /* new */ }
    if (old !== text) writeFileSync(join(dir, `${e.id}.json`), text);
    fixtureIds.push(e.id);
  }
  return dir;
}

beforeAll(async () => {
  if (okEntries.length < 2) throw new Error(`the browser tests need at least two buildable entries in ${ENTRIES_DIR}`);
  main = await ensureSite("main", ENTRIES_DIR, "/", { reuseDist: true });
  sub = await ensureSite("subpath", writeFixture(), SUB);
  console.log(`site builds: main ${main.built ? `built in ${main.seconds.toFixed(1)} s` : `reused ${main.dir}`}, sub-path ${sub.built ? `built in ${sub.seconds.toFixed(1)} s` : "reused"}`);
  browser = await launchChromium();
  mainServer = await serve(main.dir, "/");
  subServer = await serve(sub.dir, SUB);
});

afterAll(async () => {
  await browser?.close();
  await mainServer?.close();
  await subServer?.close();
});

async function open(path: string, server = mainServer): Promise<PageWatch> {
  const w = await watchedPage(browser);
  const res = await w.page.goto(server.origin + path, { waitUntil: "networkidle" });
  expect(res?.status(), path).toBe(200);
  return w;
}

/** Scrolls through the page so lazy images load, then waits for the network to settle. */
async function scrollAll(w: PageWatch) {
  await w.page.evaluate(async () => {
    for (let y = 0; y < document.body.scrollHeight; y += 600) {
      window.scrollTo(0, y);
      await new Promise((r) => setTimeout(r, 30));
    }
  });
  await w.page.waitForLoadState("networkidle");
}

function expectLocal(w: PageWatch, server: StaticServer, prefix = "/") {
  const outside = w.requests.filter((u) => !u.startsWith(server.origin + prefix) && !u.startsWith("data:"));
  expect(outside, "requests that leave the host or the base path").toEqual([]);
  expect(w.problems, "console errors, warnings and CSP violations").toEqual([]);
}

const bestBand = [...bands].sort((a, b) => b.ok.length - a.ok.length)[0];
const design: OkEntry = bestBand.ok[0];

describe("site at the root", () => {
  it("home page lists every band and its best designs, all from this host", async () => {
    const w = await open("/");
    const bandLinks = await w.page.$$eval("section.band-card h3 a", (as) => as.map((a) => a.getAttribute("href")));
    expect(bandLinks).toEqual(bands.map((b) => `/bands/${b.id}/`));
    await scrollAll(w);
    const broken = await w.page.$$eval("img", (imgs) => imgs.filter((i) => !(i as HTMLImageElement).complete || (i as HTMLImageElement).naturalWidth === 0).map((i) => i.getAttribute("src")));
    expect(broken).toEqual([]);
    expectLocal(w, mainServer);
    await w.page.close();
  });

  it("band page: every design in a sortable table with thumbnails; infeasible ones say so", async () => {
    const w = await open(`/bands/${bestBand.id}/`);
    const ids = await w.page.$$eval("table.band-table tbody tr", (trs) => trs.map((t) => t.getAttribute("data-id")));
    expect(ids.sort()).toEqual(bestBand.ok.map((e) => e.id).sort());
    const none = await w.page.$$eval("table.infeasible-table tbody tr", (trs) => trs.map((t) => t.getAttribute("data-id")));
    expect(none.sort()).toEqual(bestBand.entries.filter((e) => !isOk(e)).map((e) => e.id).sort());
    const infeasible = await w.page.$$eval("tr.infeasible", (trs) => trs.map((t) => t.textContent ?? ""));
    expect(infeasible).toHaveLength(bestBand.entries.length - bestBand.ok.length);
    for (const t of infeasible) expect(t).toContain("no buildable shape");
    await w.page.click('th[data-col="pieces"] button');
    const pieces = await w.page.$$eval("table.band-table tbody tr", (trs) => trs.map((t) => Number(t.getAttribute("data-sort-pieces"))));
    expect(pieces).toEqual([...pieces].sort((a, b) => b - a));
    await w.page.click('th[data-col="pieces"] button');
    const again = await w.page.$$eval("table.band-table tbody tr", (trs) => trs.map((t) => Number(t.getAttribute("data-sort-pieces"))));
    expect(again).toEqual([...again].sort((a, b) => a - b));
    await scrollAll(w);
    const thumbs = await w.page.$$eval("table.band-table img", (imgs) => imgs.map((i) => (i as HTMLImageElement).naturalWidth));
    expect(thumbs).toHaveLength(bestBand.ok.length);
    for (const t of thumbs) expect(t).toBeGreaterThan(0);
    expectLocal(w, mainServer);
    await w.page.close();
  });

  it("finder: a band and a minimum gain give exactly the right designs, within 100 ms of a keystroke", async () => {
    const gains = bestBand.ok.map((e) => e.figures.gainDbi).sort((a, b) => a - b);
    const minGain = Math.floor(gains[Math.floor(gains.length / 2)] * 10) / 10;
    const expected = bestBand.ok.filter((e) => e.figures.gainDbi >= minGain).sort((a, b) => b.figures.gainDbi - a.figures.gainDbi || (a.id < b.id ? -1 : 1)).map((e) => e.id);
    const w = await open("/finder/");
    await w.page.waitForSelector("[data-finder-results][data-ready]");
    await w.page.selectOption("select[name=band]", bestBand.id);
    const input = w.page.locator("input[name=gain]");
    const text = minGain.toFixed(1);
    await input.click();
    await input.pressSequentially(text.slice(0, -1));
    // time the last keystroke: key down to the result list changing
    await w.page.evaluate(() => {
      const list = document.querySelector("[data-finder-results]")!;
      const win = window as unknown as { __t0?: number; __t1?: number };
      document.querySelector("input[name=gain]")!.addEventListener("keydown", () => { win.__t0 = performance.now(); }, { once: true });
      new MutationObserver((_, obs) => { win.__t1 = performance.now(); obs.disconnect(); }).observe(list, { childList: true });
    });
    await input.press(text.slice(-1));
    await w.page.waitForFunction(() => (window as unknown as { __t1?: number }).__t1 !== undefined);
    const ms = await w.page.evaluate(() => { const win = window as unknown as { __t0: number; __t1: number }; return win.__t1 - win.__t0; });
    console.log(`finder: keystroke to results ${ms.toFixed(1)} ms`);
    expect(ms).toBeLessThan(100);
    const found = await w.page.$$eval("[data-finder-results] a", (as) => as.map((a) => a.getAttribute("data-id")));
    expect(found).toEqual(expected);
    // the address keeps the filter as a number ("6" for 6.0)
    expect(Number(new URL(w.page.url()).searchParams.get("gain"))).toBe(minGain);
    expectLocal(w, mainServer);
    await w.page.close();
  });

  it("full-text search finds a design", async () => {
    const w = await open("/finder/");
    await w.page.fill("input[name=q]", design.id);
    await w.page.waitForFunction(() => document.querySelectorAll("[data-search-results] li").length > 0, undefined, { timeout: 15_000 });
    const urls = await w.page.$$eval("[data-search-results] a", (as) => as.map((a) => a.getAttribute("href")));
    expect(urls[0]).toBe(`/designs/${design.id}/`);
    await w.page.fill("input[name=q]", `${design.inputs.bandName} balun`);
    await w.page.waitForFunction(() => (document.querySelector("[data-search-results]") as HTMLElement).dataset.query?.includes("balun"), undefined, { timeout: 15_000 });
    const more = await w.page.$$eval("[data-search-results] a", (as) => as.map((a) => a.getAttribute("href")!));
    expect(more.length).toBeGreaterThan(0);
    expect(await w.page.locator("[data-search-results] mark").count()).toBeGreaterThan(0);
    expectLocal(w, mainServer);
    await w.page.close();
  });

  it("design page shows its plots and tables; every number equals the entry; under 200 KB", async () => {
    const w = await open(`/designs/${design.id}/`);
    await scrollAll(w);
    const figs = await w.page.$$eval(".figs img", (imgs) => imgs.map((i) => ({ src: i.getAttribute("src"), w: (i as HTMLImageElement).naturalWidth })));
    expect(figs.map((f) => f.src!.replace(/^.*\//, "")).sort()).toEqual(["pattern-3d.webp", "pattern-phi.svg", "pattern-theta.svg", "shape.svg", "smith.svg", "sweep.svg"]);
    for (const f of figs) expect(f.w, f.src!).toBeGreaterThan(0);
    for (const t of ["figures", "pieces", "vertices", "tolerance", "downloads"]) expect(await w.page.locator(`table[data-table="${t}"]`).count(), t).toBe(1);
    const rows = await w.page.locator('table[data-table="vertices"] tbody tr').count();
    expect(rows).toBe(design.shape.pointsM.length);
    expect(await expectShownEqualsEntry(w.page, "html", design)).toBeGreaterThan(40);
    const bytes = await w.bytes();
    console.log(`design page: ${(bytes / 1024).toFixed(1)} KiB transferred without downloads (${w.requests.length} requests)`);
    expect(bytes).toBeLessThan(200 * 1024);
    expect(w.requests.some((u) => u.includes("/files/"))).toBe(false);
    expectLocal(w, mainServer);
    await w.page.close();
  });

  it("every download link resolves and parses, and the checksum lists match", async () => {
    const w = await open(`/designs/${design.id}/`);
    const links = await w.page.$$eval("a[data-download]", (as) => as.map((a) => a.getAttribute("href")!));
    const maps = await w.page.$$eval("a[data-sheet-map]", (as) => as.map((a) => a.getAttribute("href")!));
    for (const m of maps) {
      await w.page.goto(mainServer.origin + m, { waitUntil: "networkidle" });
      for (const href of await w.page.$$eval("a[data-download]", (as) => as.map((a) => a.getAttribute("href")!))) if (!links.includes(href)) links.push(href);
    }
    expectLocal(w, mainServer);
    await w.page.close();
    const bodies = new Map<string, Buffer>();
    for (const href of links) {
      const res = await fetch(mainServer.origin + href);
      expect(res.status, href).toBe(200);
      bodies.set(href.replace(/^.*\//, ""), Buffer.from(await res.arrayBuffer()));
    }
    const text = (name: string) => bodies.get(name)!.toString("utf8");
    const names = [...bodies.keys()];
    const checked = checkEntryText(text(`${design.id}.json`), "download");
    expect(checked.ok && checked.value).toEqual(design);
    const shape = parseShape(text(`${design.id}.shape.json`));
    expect(shape.wires[0].pointsM).toEqual(design.shape.pointsM);
    const csv = text(`${design.id}.nodes.csv`).trim().split("\r\n");
    expect(csv).toHaveLength(design.shape.pointsM.length + 1);
    expect(Number(csv[1].split(",")[2])).toBeCloseTo(design.shape.pointsM[0][0], 6);
    const dxf = new DxfParser().parseSync(text(`${design.id}.dxf`));
    const poly = dxf!.entities.find((e) => e.type === "POLYLINE" || e.type === "LWPOLYLINE") as unknown as { vertices: { x: number; y: number }[] };
    expect(poly.vertices).toHaveLength(design.shape.pointsM.length);
    poly.vertices.forEach((v, k) => expect(v.x).toBeCloseTo(design.shape.pointsM[k][0] * 1000, 3));
    const templates = names.filter((n) => n.endsWith(".svg"));
    expect(templates.some((n) => n.includes("-a4")) && templates.some((n) => n.includes("-letter"))).toBe(true);
    for (const n of templates) {
      const svg = text(n);
      expect(svg, n).toMatch(/<svg[^>]*width="[\d.]+mm"/);
      expect(svg, n).toMatch(/100 mm/);
    }
    const sums = text("SHA256SUMS").trim().split("\n").map((l) => l.split("  ") as [string, string]);
    expect(sums.map((s) => s[1]).sort()).toEqual(names.filter((n) => n !== "SHA256SUMS").sort());
    for (const [hash, name] of sums) expect(sha256Hex(bodies.get(name)!), name).toBe(hash);
    const all = await (await fetch(`${mainServer.origin}/downloads/SHA256SUMS`)).text();
    for (const [hash, name] of sums) expect(all).toContain(`${hash}  designs/${design.id}/files/${name}\n`);
  });

  it("scale calculator scales every length to a new frequency", async () => {
    const w = await open(`/designs/${design.id}/`);
    await w.page.fill("[data-scale-input]", String((2 * design.inputs.frequencyHz) / 1e6));
    const whole = await w.page.textContent('tr[data-key="length"] td.num');
    expect(Number(whole)).toBeCloseTo((design.inputs.lengthM * 1000) / 2, 1);
    expectLocal(w, mainServer);
    await w.page.close();
  });

  it("compare page overlays two designs' patterns", async () => {
    const [a, b] = okEntries;
    const w = await open(`/compare/?ids=${a.id},${b.id}`);
    await w.page.waitForSelector("[data-compare-out]:not([hidden])");
    expect(await w.page.locator("svg.overlay").count()).toBe(2);
    expect(await w.page.locator("svg.overlay path.trace").count()).toBe(4);
    expect(await w.page.locator("[data-compare-table] thead th").count()).toBe(3);
    await scrollAll(w);
    expectLocal(w, mainServer);
    await w.page.close();
  });

  it("method page shows the reference checks; safety page the cautions", async () => {
    const w = await open("/method/");
    const rows = await w.page.$$eval('table[data-table="validation"] tbody tr', (trs) => trs.map((t) => t.querySelectorAll("td").length));
    expect(rows.length).toBeGreaterThan(5);
    for (const n of rows) expect(n).toBe(7);
    expectLocal(w, mainServer);
    await w.page.close();
    const s = await open("/safety/");
    const text = (await s.page.textContent("main")) ?? "";
    for (const word of ["RF exposure", "power line", "Lightning", "local codes"]) expect(text).toContain(word);
    await s.page.close();
  });

  it("no request of any page left the host", () => {
    const outside = browser.allRequests.filter((u) => !u.startsWith(mainServer.origin) && !u.startsWith(subServer.origin) && !u.startsWith("data:"));
    expect(outside).toEqual([]);
  });
});

describe(`site under the sub-path ${SUB}, with hostile entry text`, () => {
  const hostileId = "hostile-1.5wl-k1-max-gain";

  it("every page, link, image, script and search works under the sub-path", async () => {
    const visited = new Set<string>();
    const queue = [SUB];
    while (queue.length) {
      const path = queue.shift()!;
      if (visited.has(path)) continue;
      visited.add(path);
      const w = await open(path, subServer);
      await scrollAll(w);
      const hrefs = await w.page.$$eval("a[href]", (as) => as.map((a) => a.getAttribute("href")!));
      for (const h of hrefs) {
        if (h.startsWith("#")) continue;
        expect(h.startsWith(SUB), `link ${h} on ${path}`).toBe(true);
        const clean = h.split("#")[0].split("?")[0];
        if (clean.endsWith("/") && !visited.has(clean) && !clean.includes("/files/")) queue.push(clean);
      }
      expectLocal(w, subServer, SUB);
      await w.page.close();
    }
    expect(visited.size).toBeGreaterThan(8);
    const w = await open(`${SUB}finder/?gain=0`, subServer);
    await w.page.waitForSelector("[data-finder-results][data-ready]");
    expect(await w.page.locator("[data-finder-results] a").count()).toBe(fixtureIds.length - entries.filter((e) => !isOk(e)).slice(0, 1).length);
    await w.page.fill("input[name=q]", okEntries[0].inputs.bandName); // a band the sub-path fixture holds
    await w.page.waitForFunction(() => document.querySelectorAll("[data-search-results] li").length > 0, undefined, { timeout: 15_000 });
    const urls = await w.page.$$eval("[data-search-results] a", (as) => as.map((a) => a.getAttribute("href")!));
    for (const u of urls) expect(u.startsWith(SUB)).toBe(true);
    expectLocal(w, subServer, SUB);
    await w.page.close();
    const links = await (await open(`${SUB}designs/${okEntries[0].id}/`, subServer)).page.$$eval("a[data-download]", (as) => as.map((a) => a.getAttribute("href")!));
    for (const href of links) expect((await fetch(subServer.origin + href, { method: "HEAD" })).status, href).toBe(200);
    expect(subServer.log.filter((l) => l.status !== 200)).toEqual([]);
  });

  it("hostile markup in a title and band note shows as text and never runs", async () => {
    for (const path of [`${SUB}bands/hostile/`, `${SUB}designs/${hostileId}/`, SUB, `${SUB}compare/?ids=${hostileId},${okEntries[0].id}`]) {
      const w = await open(path, subServer);
      if (path.includes("compare")) await w.page.waitForSelector("[data-compare-out]:not([hidden])");
      const text = (await w.page.textContent("body")) ?? "";
      if (!path.endsWith(SUB)) expect(text, path).toContain(path.includes("compare") || path.includes("designs") ? HOSTILE.title : HOSTILE.bandNote);
      expect(await w.page.evaluate(() => (window as unknown as { __pwned?: number }).__pwned), path).toBeUndefined();
      const inline = await w.page.$$eval("script", (ss) => ss.filter((s) => !s.getAttribute("src")).map((s) => s.textContent));
      expect(inline, path).toEqual([]);
      expect(await w.page.locator("main img[src='x']").count(), path).toBe(0);
      expect(w.requests.filter((u) => /\/x$/.test(u)), path).toEqual([]);
      expectLocal(w, subServer, SUB);
      await w.page.close();
    }
    const w = await open(`${SUB}finder/`, subServer);
    await w.page.fill("input[name=q]", "Field day");
    await w.page.waitForFunction(() => document.querySelectorAll("[data-search-results] li").length > 0, undefined, { timeout: 15_000 });
    expect(await w.page.textContent("[data-search-results]")).toContain("<script>");
    expect(await w.page.evaluate(() => (window as unknown as { __pwned?: number }).__pwned)).toBeUndefined();
    expectLocal(w, subServer, SUB);
    await w.page.close();
  });
});
