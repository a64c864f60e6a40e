// The site with designs over the ground, in headless Chromium: a small catalog of the committed
// over-ground fixtures (test/fixtures/entries-hf) beside a few free-space entries of designs/entries,
// built and served as the other browser tests do (harness.ts).
import { mkdirSync, readdirSync, readFileSync, rmSync, writeFileSync } from "node:fs";
import { join } from "node:path";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { parseShape } from "../../generator/em/shapeFile.js";
import { isOk } from "../../generator/site/ok.js";
import { isOverGround, LAYOUT_CSV_HEADER, type GroundEntry } from "../../generator/site/overGround.js";
import { CACHE, ensureSite, launchChromium, serve, watchedPage, type Browser, type PageWatch, type StaticServer } from "./harness.js";
import { readEntries, resealed } from "./entries.js";
import { expectShownEqualsEntry } from "./shownCheck.js";

const HF_FIXTURES = join(import.meta.dirname, "../fixtures/entries-hf");
const hf = readEntries(HF_FIXTURES).filter(isOverGround);
// free-space entries of the committed catalog (it holds entries over the ground too)
const freeSpace = readEntries().filter(isOk).filter((e) => e.inputs.overGround === undefined);
const free = freeSpace.slice(0, 3);
const target = hf.find((e) => e.id === "20m-1wl-k1-max-gain-h10m-horizontal-long-distance")!;
const vertical = hf.find((e) => e.inputs.overGround.mounting === "vertical")!;
/** A band id in both parts of the grid (10 m): a free-space entry, and an over-ground copy of the target under that band. */
const free10 = freeSpace.find((e) => e.inputs.bandId === "10m")!;
const ground10 = resealed(target, (e) => { e.id = "10m-1wl-k1-max-gain-h10m-horizontal-long-distance"; e.inputs.bandId = "10m"; e.inputs.bandName = free10.inputs.bandName; e.title = e.title.replace(target.inputs.bandName, free10.inputs.bandName); });

let server: StaticServer, browser: Browser;

function fixture(): string {
  const dir = join(CACHE, "hf-entries");
  mkdirSync(dir, { recursive: true });
  const want = new Map<string, string>();
  for (const n of readdirSync(HF_FIXTURES).filter((n) => n.endsWith(".json"))) want.set(n, readFileSync(join(HF_FIXTURES, n), "utf8"));
  for (const e of [...free, free10, ground10]) want.set(`${e.id}.json`, `${JSON.stringify(e)}\n`);
  for (const n of readdirSync(dir)) if (!want.has(n)) rmSync(join(dir, n), { force: true });
  for (const [n, text] of want) {
    let old = "";
    try { old = readFileSync(join(dir, n), "utf8"); } catch { /* new */ }
    if (old !== text) writeFileSync(join(dir, n), text);
  }
  return dir;
}

beforeAll(async () => {
  if (hf.length < 3 || !target || !vertical || !free10) throw new Error(`the over-ground fixtures in ${HF_FIXTURES} are incomplete`);
  const site = await ensureSite("hf", fixture(), "/");
  console.log(`over-ground site: ${site.built ? `built in ${site.seconds.toFixed(1)} s` : "reused"}`);
  server = await serve(site.dir, "/");
  browser = await launchChromium();
});

afterAll(async () => {
  await browser?.close();
  await server?.close();
});

async function open(path: string, width = 1280): Promise<PageWatch> {
  const w = await watchedPage(browser);
  await w.page.setViewportSize({ width, height: 900 });
  const res = await w.page.goto(server.origin + path, { waitUntil: "networkidle" });
  expect(res?.status(), path).toBe(200);
  return w;
}

function expectClean(w: PageWatch) {
  expect(w.requests.filter((u) => !u.startsWith(server.origin) && !u.startsWith("data:") && !u.startsWith("blob:")), "requests leaving the host").toEqual([]);
  expect(w.problems, "console errors, warnings and CSP violations").toEqual([]);
}

describe("the site over the ground", () => {
  it("finder: a 10 m mast and at most 30 m of wire find a 20 m design", async () => {
    const w = await open("/finder/");
    await w.page.waitForSelector("[data-finder-results][data-ready]", { state: "attached" });
    await w.page.fill('input[name="mast"]', "10");
    await w.page.fill('input[name="wire"]', "30");
    await w.page.waitForFunction(() => new URL(location.href).searchParams.get("wire") === "30");
    const ids = await w.page.$$eval("[data-finder-results] a[data-id]", (as) => as.map((a) => a.getAttribute("data-id")!));
    expect(ids).toContain(target.id);
    const expected = [...hf, ground10 as GroundEntry].filter((e) => e.overGround.highestPointM <= 10.005 && e.inputs.lengthM <= 30).map((e) => e.id).sort();
    expect([...ids].sort()).toEqual(expected);
    expect(ids.filter((id) => id.startsWith("20m-"))).toEqual([target.id]);
    // the card says how it is hung
    const card = await w.page.locator(`a[data-id="${target.id}"] [data-ground]`).textContent();
    expect(card).toContain("horizontal at 10 m");
    // and the address carries the filters, so the list can be shared
    expect(new URL(w.page.url()).searchParams.get("mast")).toBe("10");
    expectClean(w);
    await w.page.close();
  });

  it("design page: shows the elevation cut with the ground line and planning elevations, and the height curve", async () => {
    const w = await open(`/designs/${target.id}/`);
    const cut = w.page.locator('figure[data-figure="elevation-cut"] svg');
    expect(await cut.count()).toBe(1);
    expect(await cut.locator(".groundline").count()).toBe(1);
    expect(await cut.locator("path.trace").count()).toBe(1);
    expect(await cut.locator("[data-mark-deg]").count()).toBe(target.overGround.gainAtElevationDbi.length);
    expect(await cut.locator("circle.takeoff").count()).toBe(1);
    expect(await w.page.locator('table[data-table="planning-elevations"] tbody tr').count()).toBe(target.overGround.gainAtElevationDbi.length);
    const heights = w.page.locator('table[data-table="height-curve"] tbody tr');
    expect(await heights.count()).toBe(target.overGround.heightCurve.length + 1);
    expect(await w.page.locator('table[data-table="height-curve"] tbody tr.current').getAttribute("data-height-m")).toBe("10");
    expect(await w.page.locator('figure[data-figure="height-curve"] svg circle[data-current]').count()).toBe(1);
    expect(await w.page.locator('table[data-table="other-grounds"] tbody tr').count()).toBe(target.overGround.otherGrounds.length + 2);
    expect(await w.page.locator('table[data-table="supports"] tbody tr').count()).toBe(target.overGround.mountedPointsM.length);
    expect(await w.page.locator("[data-hf-caution]").textContent()).toMatch(/power lines[\s\S]*fall distance[\s\S]*lightning[\s\S]*RF exposure/i);
    // no paper template and no scaling for a wire hung over the ground
    expect(await w.page.locator("a[data-download][href*='template']").count()).toBe(0);
    expect(await w.page.locator("[data-scale]").count()).toBe(0);
    // every number shown in the over-ground part matches its entry field within the shown precision
    expect(await expectShownEqualsEntry(w.page, '[data-section="over-ground"]', target)).toBeGreaterThan(30);
    expectClean(w);
    await w.page.close();
  });

  it("the HF layout plan downloads and parses (CSV and SVG), and the shape file carries the ground", async () => {
    const w = await open(`/designs/${vertical.id}/`);
    const [csvDownload] = await Promise.all([w.page.waitForEvent("download"), w.page.click('a[data-layout-download="csv"]')]);
    expect(csvDownload.suggestedFilename()).toBe(`${vertical.id}.layout.csv`);
    const csv = readFileSync((await csvDownload.path())!, "utf8").trimEnd().split("\n");
    expect(csv[1]).toBe(LAYOUT_CSV_HEADER);
    const cols = LAYOUT_CSV_HEADER.split(",");
    const rows = csv.slice(2).map((l) => Object.fromEntries(l.split(",").map((v, k) => [cols[k], v])));
    const m = vertical.overGround.mountedPointsM, feed = vertical.shape.feedVertex;
    expect(rows).toHaveLength(m.length);
    rows.forEach((r, k) => {
      expect(Number(r.height_m)).toBeCloseTo(m[k][2], 3);
      expect(Number(r.ground_from_feed_m)).toBeCloseTo(Math.hypot(m[k][0] - m[feed][0], m[k][1] - m[feed][1]), 3);
      expect(Number(r.ground_from_feed_ft)).toBeCloseTo(Number(r.ground_from_feed_m) / 0.3048, 1); // international foot, exact
    });
    const [svgDownload] = await Promise.all([w.page.waitForEvent("download"), w.page.click('a[data-layout-download="svg"]')]);
    const svgText = readFileSync((await svgDownload.path())!, "utf8");
    const parsed = await w.page.evaluate((text) => {
      const doc = new DOMParser().parseFromString(text, "image/svg+xml");
      return { error: doc.getElementsByTagName("parsererror").length, root: doc.documentElement.nodeName, pegs: doc.querySelectorAll("circle.peg, circle.feedpeg").length, labels: [...doc.querySelectorAll("text.peglabel")].map((t) => t.textContent) };
    }, svgText);
    expect(parsed.error).toBe(0);
    expect(parsed.root).toBe("svg");
    expect(parsed.pegs).toBeGreaterThanOrEqual(m.length);
    expect(parsed.labels.some((t) => /ft/.test(t ?? ""))).toBe(true);
    const shapeHref = await w.page.locator(`a[data-download][href$="${vertical.id}.shape.json"]`).getAttribute("href");
    const shape = parseShape(await (await fetch(server.origin + shapeHref)).text());
    expect(shape.ground).toEqual(vertical.inputs.overGround.ground);
    expect(shape.wires[0].pointsM).toEqual(m);
    expectClean(w);
    await w.page.close();
  });

  it("band and home pages list the HF bands with height, mounting and purpose", async () => {
    const home = await open("/");
    expect(await home.page.locator("#group-hf").count()).toBe(1);
    expect(await home.page.locator(`a[href="/bands/20m/"]`).count()).toBeGreaterThan(0);
    expectClean(home);
    await home.page.close();
    const band = await open("/bands/20m/");
    for (const col of ["height", "mounting", "purpose", "takeoff"]) expect(await band.page.locator(`th[data-col="${col}"]`).count(), col).toBe(1);
    expect(await band.page.locator("[data-ground-note]").count()).toBe(1);
    expectClean(band);
    await band.page.close();
  });

  it("a band id used in free space and over the ground gives two band pages", async () => {
    const freeBand = await open("/bands/10m/");
    expect(await freeBand.page.$$eval("tr[data-id]", (trs) => trs.map((t) => t.getAttribute("data-id")))).toEqual([free10.id]);
    expect(await freeBand.page.locator('th[data-col="height"]').count()).toBe(0);
    await freeBand.page.close();
    const groundBand = await open("/bands/10m-over-ground/");
    expect(await groundBand.page.$$eval("tr[data-id]", (trs) => trs.map((t) => t.getAttribute("data-id")))).toEqual([ground10.id]);
    expect(await groundBand.page.locator("h1").textContent()).toBe(`${free10.inputs.bandName}, over the ground`);
    await groundBand.page.close();
    const page = await open(`/designs/${ground10.id}/`);
    expect(await page.page.locator(".crumbs a").nth(1).getAttribute("href")).toBe("/bands/10m-over-ground/");
    expectClean(page);
    await page.page.close();
  });

  it("compare page overlays the elevation patterns of designs over the ground", async () => {
    const ids = [target.id, vertical.id, free[0].id];
    const w = await open(`/compare/?ids=${ids.join(",")}`);
    await w.page.waitForSelector("[data-compare-out]:not([hidden])");
    expect(await w.page.locator('[data-overlay="elevation"] svg path.trace').count()).toBe(2);
    expect(await w.page.locator('[data-overlay="phi"] svg path.trace').count()).toBe(1);
    const rows = await w.page.$$eval("[data-compare-table] tbody th", (th) => th.map((t) => t.textContent));
    expect(rows).toContain("Takeoff elevation");
    expectClean(w);
    await w.page.close();
  });

  it("fits a phone: no sideways scrolling, and diagram text of 11 px or more (the site's rule) at 390 px", async () => {
    const pages = [...([target, vertical] as GroundEntry[]).map((e) => `/designs/${e.id}/`), `/compare/?ids=${target.id},${vertical.id}`, "/bands/20m/", "/"];
    for (const path of pages) {
      const w = await open(path, 390);
      if (path.startsWith("/compare")) await w.page.waitForSelector("[data-compare-out]:not([hidden])");
      const over = await w.page.evaluate(() => document.documentElement.scrollWidth - window.innerWidth);
      expect(over, path).toBeLessThanOrEqual(0);
      // the smallest text of every inline diagram as it shows on the screen
      const sizes = await w.page.evaluate(() => [...document.querySelectorAll<SVGSVGElement>("main svg[viewBox]")].flatMap((svg) => {
        const texts = [...svg.querySelectorAll("text")];
        const width = svg.getBoundingClientRect().width;
        if (!texts.length || width === 0) return [];
        return [{ what: svg.getAttribute("class") ?? "svg", px: (Math.min(...texts.map((t) => parseFloat(getComputedStyle(t).fontSize))) * width) / svg.viewBox.baseVal.width }];
      }));
      if (path.startsWith("/designs/")) expect(sizes.length, path).toBeGreaterThanOrEqual(3);
      for (const s of sizes) expect(s.px, `${path}: ${s.what}`).toBeGreaterThanOrEqual(11 - 0.05);
      expectClean(w);
      await w.page.close();
    }
  });

  it("a free-space design page in the same build is as before", async () => {
    const w = await open(`/designs/${free[0].id}/`);
    expect(await w.page.locator('[data-section="over-ground"]').count()).toBe(0);
    expect(await w.page.locator("[data-scale]").count()).toBe(1);
    expect(await w.page.locator("a[data-download][href$='.nodes.csv']").count()).toBe(1);
    expectClean(w);
    await w.page.close();
  });
});
