// The built site on a phone (390 px) and at the workbench (1280 px), in Debian's headless chromium:
// no page wider than the screen, every table cell's text fully in view (stacked into cards, or in a
// scroll box with a visible cue), diagram text at least 11 px on a phone; search ranking and paging;
// the finder's wire length and near-band frequencies; the printable PDF's pages and 1:1 check bar;
// the sheet map; compare's messages; and the turnable 3D view. Reuses dist/ when `npm run build`
// left a matching build there (see harness.ts).
import { existsSync } from "node:fs";
import { readFile } from "node:fs/promises";
import { join } from "node:path";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { bendingTemplateSvgs } from "../../generator/export/index.js";
import { exportShapeOf } from "../../generator/site/downloads.js";
import { bandsOf } from "../../generator/site/catalog.js";
import { isOk } from "../../generator/site/ok.js";
import { readPdf } from "../helpers/pdfRead.js";
import { readEntries, siteTestEntriesDir } from "./entries.js";
import { ensureSite, launchChromium, serve, watchedPage, type Browser, type StaticServer } from "./harness.js";

// the site these tests open is built from the free-space part of the catalog (entries.ts)
const ENTRIES_DIR = siteTestEntriesDir();
const entries = readEntries(ENTRIES_DIR);
const ok = entries.filter(isOk);
const bands = bandsOf(entries);
const bestBand = [...bands].sort((a, b) => b.ok.length - a.ok.length)[0];
const design = bestBand.ok[0];
const a4Sheets = (e: (typeof ok)[number]) => bendingTemplateSvgs(exportShapeOf(e), { paper: "a4" }).length;
const tiled = ok.find((e) => a4Sheets(e) > 3 && a4Sheets(e) <= 40)!;
const infeasible = entries.find((e) => !isOk(e));
/** A phone's CSS width (a common handset) and a workbench laptop's. */
const WIDTHS = [390, 1280] as const;
/** The smallest text a diagram may show on a phone, CSS px (the site's own rule, issue 16). */
const MIN_TEXT_PX = 11;
const PT_PER_MM = 72 / 25.4; // ISO 32000-1 §8.3.2.3: 1 pt = 1/72 in; 1 in = 25.4 mm exactly

let browser: Browser;
let server: StaticServer;
let siteDir = "";

beforeAll(async () => {
  const site = await ensureSite("main", ENTRIES_DIR, "/", { reuseDist: true });
  siteDir = site.dir;
  browser = await launchChromium();
  server = await serve(site.dir, "/");
});

afterAll(async () => {
  await browser?.close();
  await server?.close();
});

async function open(path: string, width: number) {
  const w = await watchedPage(browser);
  await w.page.setViewportSize({ width, height: width < 600 ? 844 : 900 });
  const res = await w.page.goto(server.origin + path, { waitUntil: "networkidle" });
  expect(res?.status(), path).toBe(200);
  return w;
}

/** Cells whose text leaves the screen or their own box, where no visible scroll cue says so. */
async function hiddenCells(page: import("playwright-core").Page): Promise<string[]> {
  return page.evaluate(() => {
    const vw = document.documentElement.clientWidth;
    const bad: string[] = [];
    for (const cell of document.querySelectorAll<HTMLElement>("main td, main th")) {
      const text = (cell.innerText ?? "").trim();
      if (!text || cell.closest(".sr") || cell.offsetParent === null) continue;
      // a header row hidden for screen readers only (stacked tables show each label in its cell)
      const head = cell.closest("thead");
      if (head && head.getBoundingClientRect().width <= 1) continue;
      const r = cell.getBoundingClientRect();
      const cut = cell.scrollWidth > cell.clientWidth + 1;
      const offScreen = r.left < -0.5 || r.right > vw + 0.5;
      if (!cut && !offScreen) continue;
      const wrap = cell.closest<HTMLElement>(".table-wrap");
      const cue = wrap?.nextElementSibling as HTMLElement | null;
      const cued = wrap && wrap.scrollWidth > wrap.clientWidth && cue?.classList.contains("scroll-cue") && cue.offsetParent !== null;
      if (cut || !cued) bad.push(`${text.slice(0, 40)} [${Math.round(r.left)}–${Math.round(r.right)} of ${vw}${cut ? ", cut inside its cell" : ""}]`);
    }
    return bad;
  });
}

/** The smallest text of every diagram on the page, in CSS px as shown. */
async function smallestDiagramText(page: import("playwright-core").Page): Promise<{ what: string; px: number }[]> {
  return page.evaluate(async () => {
    const out: { what: string; px: number }[] = [];
    const smallest = (svg: string) => {
      const vb = /viewBox="([-\d.]+) ([-\d.]+) ([\d.]+) ([\d.]+)"/.exec(svg);
      const sizes = [...svg.matchAll(/font-size(?:="|:\s*)([\d.]+)/g)].map((m) => Number(m[1]));
      return vb && sizes.length ? { vbW: Number(vb[3]), font: Math.min(...sizes) } : null;
    };
    for (const img of document.querySelectorAll<HTMLImageElement>("main img[src$='.svg']")) {
      if (img.offsetParent === null || img.hidden) continue;
      const s = smallest(await (await fetch(img.src)).text());
      if (s) out.push({ what: img.src.replace(/^.*\/designs\//, ""), px: (s.font * img.clientWidth) / s.vbW });
    }
    for (const svg of document.querySelectorAll<SVGSVGElement>("main svg[viewBox]")) {
      const texts = [...svg.querySelectorAll("text")];
      if (!texts.length || svg.getBoundingClientRect().width === 0) continue;
      const k = svg.getBoundingClientRect().width / svg.viewBox.baseVal.width;
      out.push({ what: svg.getAttribute("class") ?? "inline svg", px: Math.min(...texts.map((t) => parseFloat(getComputedStyle(t).fontSize))) * k });
    }
    return out;
  });
}

describe("every page fits a phone and a workbench screen", () => {
  const pages = () => [
    "/", `/bands/${bestBand.id}/`, "/finder/?gain=0", `/designs/${design.id}/`, `/designs/${tiled.id}/template-a4/`,
    `/compare/?ids=${ok.slice(0, 3).map((e) => e.id).join(",")}`, "/method/",
  ];
  for (const width of WIDTHS) {
    it(`at ${width} px: no sideways overflow, no cut table text${width < 600 ? ", diagram text ≥ 11 px" : ""}`, async () => {
      for (const path of pages()) {
        const w = await open(path, width);
        if (path.startsWith("/compare")) await w.page.waitForSelector("[data-compare-out]:not([hidden])");
        if (path.startsWith("/finder")) await w.page.waitForSelector("[data-finder-results][data-ready]");
        // scroll through so lazy images load (an unloaded one has no size to measure)
        await w.page.evaluate(async () => {
          for (let y = 0; y < document.body.scrollHeight; y += 600) { window.scrollTo(0, y); await new Promise((r) => setTimeout(r, 30)); }
          window.scrollTo(0, 0);
        });
        await w.page.waitForLoadState("networkidle");
        await w.page.waitForTimeout(150); // the overflow cue runs on the next animation frame
        const scrollWidth = await w.page.evaluate(() => document.documentElement.scrollWidth);
        expect(scrollWidth, `${path} at ${width} px`).toBeLessThanOrEqual(width);
        expect(await hiddenCells(w.page), `${path} at ${width} px`).toEqual([]);
        if (width < 600) for (const d of await smallestDiagramText(w.page)) expect(d.px, `${path}: ${d.what}`).toBeGreaterThanOrEqual(MIN_TEXT_PX - 0.05);
        expect(w.problems, path).toEqual([]);
        await w.page.close();
      }
    });
  }
});

describe("search ranks and pages", () => {
  async function search(q: string) {
    const w = await open("/finder/", 1280);
    await w.page.fill("input[name=q]", q);
    await w.page.waitForFunction((want) => (document.querySelector("[data-search-results]") as HTMLElement).dataset.query === want, q, { timeout: 20_000 });
    return w;
  }
  const ids = (w: Awaited<ReturnType<typeof search>>) => w.page.$$eval("[data-search-results] li > a", (as) => as.map((a) => (a.getAttribute("href") ?? "").replace(/^\/designs\/|\/$/g, "")));

  for (const [q, bandId, variant] of [["70 cm direct feed", "70cm", "direct-feed"], ["2 m most gain", "2m", "max-gain"]] as const) {
    it(`“${q}” puts the ${bandId} ${variant} designs first, each with gain, size and feed`, async () => {
      const want = ok.filter((e) => e.inputs.bandId === bandId && e.inputs.variant === variant).map((e) => e.id);
      expect(want.length).toBeGreaterThan(0);
      const w = await search(q);
      const shown = await ids(w);
      const head = shown.slice(0, Math.min(want.length, shown.length));
      for (const id of head) expect(want, `${q}: ${id}`).toContain(id);
      const facts = await w.page.$$eval("[data-search-results] li [data-result-facts]", (ps) => ps.map((p) => p.textContent ?? ""));
      expect(facts.length).toBe(shown.filter((id) => ok.some((e) => e.id === id)).length);
      for (const t of facts) expect(t).toMatch(/dBi · [\d.]+ m \([\d.]+ ft\) of wire · span [\d.]+ × [\d.]+ m · (direct 50 Ω feed|most gain)/);
      await w.page.close();
    });
  }

  it("pages through a long result list", async () => {
    const w = await search("balun");
    const total = Number(await w.page.getAttribute("[data-search-results]", "data-total"));
    expect(total).toBeGreaterThan(10);
    const first = await ids(w);
    expect(first).toHaveLength(10);
    expect(await w.page.textContent("[data-search-status]")).toContain(`${total} pages found; showing 1–10`);
    await w.page.click("[data-search-next]");
    await w.page.waitForFunction(() => (document.querySelector("[data-search-results]") as HTMLElement).dataset.page === "2");
    const second = await ids(w);
    expect(second.length).toBe(Math.min(10, total - 10));
    expect(second.filter((id) => first.includes(id))).toEqual([]);
    await w.page.close();
  });
});

describe("finder", () => {
  it("offers the 2 m designs for 147 MHz with the regional note", async () => {
    const w = await open("/finder/?mhz=147", 390);
    await w.page.waitForSelector("[data-finder-results][data-ready]");
    expect(await w.page.isVisible("[data-frequency-note]")).toBe(true);
    expect(await w.page.textContent("[data-frequency-note]")).toContain("Regions 2 and 3 extend to 148 MHz");
    const found = await w.page.$$eval("[data-finder-results] a", (as) => as.map((a) => a.getAttribute("data-id")!));
    expect(found.sort()).toEqual(ok.filter((e) => e.inputs.bandId === "2m").map((e) => e.id).sort());
    await w.page.close();
  });

  it("filters by the longest wire in feet", async () => {
    const w = await open("/finder/?wire=3&unit=ft", 1280);
    await w.page.waitForSelector("[data-finder-results][data-ready]");
    const found = await w.page.$$eval("[data-finder-results] a", (as) => as.map((a) => a.getAttribute("data-id")!));
    // 3 ft = 0.9144 m (1 ft = 0.3048 m exactly)
    expect(found.sort()).toEqual(ok.filter((e) => e.inputs.lengthM <= 0.9144).map((e) => e.id).sort());
    expect(await w.page.textContent("[data-finder-results]")).toMatch(/m \([\d.]+ ft\) of wire/);
    await w.page.close();
  });
});

describe("printable templates", () => {
  it("one PDF with a page per sheet, each at the paper's size with a 100 mm check bar", async () => {
    const w = await open(`/designs/${tiled.id}/`, 1280);
    const href = await w.page.getAttribute("a[data-download][href$='.template-a4.pdf']", "href");
    await w.page.close();
    const pdf = readPdf(new Uint8Array(await (await fetch(server.origin + href)).arrayBuffer()));
    expect(pdf.pages).toHaveLength(a4Sheets(tiled));
    for (const p of pdf.pages) expect([p.widthPt, p.heightPt].sort((a, b) => a - b).map((v) => v / PT_PER_MM)).toEqual([expect.closeTo(210, 2), expect.closeTo(297, 2)]); // ISO 216 A4
    expect(pdf.rects.filter((r) => Math.abs(r.w / PT_PER_MM - 100) < 1e-3 && Math.abs(r.h / PT_PER_MM - 3) < 1e-3)).toHaveLength(pdf.pages.length);
  });

  it("the sheet map draws every row of sheets and the wire over them", async () => {
    const w = await open(`/designs/${tiled.id}/template-a4/`, 390);
    const box = await w.page.evaluate(() => {
      const svg = document.querySelector<SVGSVGElement>("svg.sheet-map-svg")!;
      const vb = svg.viewBox.baseVal;
      const rects = [...svg.querySelectorAll("rect")].map((r) => ({ y: r.y.baseVal.value + r.height.baseVal.value, x: r.x.baseVal.value + r.width.baseVal.value }));
      return { bottom: vb.y + vb.height, right: vb.x + vb.width, lowest: Math.max(...rects.map((r) => r.y)), rightmost: Math.max(...rects.map((r) => r.x)), sheets: svg.querySelectorAll("a[data-sheet]").length, wire: svg.querySelectorAll("polyline.wire").length };
    });
    expect(box.lowest).toBeLessThanOrEqual(box.bottom);
    expect(box.rightmost).toBeLessThanOrEqual(box.right);
    expect(box.sheets).toBe(a4Sheets(tiled));
    expect(box.wire).toBe(1);
    await w.page.close();
  });

  it.runIf(infeasible !== undefined)("a design without a buildable shape does not tell you to print a template", async () => {
    const w = await open(`/designs/${infeasible!.id}/`, 390);
    expect(await w.page.locator("[data-print-note]").count()).toBe(0);
    expect((await w.page.textContent("main")) ?? "").not.toMatch(/print/i);
    await w.page.close();
  });
});

describe("compare", () => {
  it("names a fourth design and unknown ids instead of dropping them", async () => {
    const w = await open(`/compare/?ids=${ok.slice(0, 4).map((e) => e.id).join(",")},no-such-design`, 390);
    await w.page.waitForSelector("[data-compare-out]:not([hidden])");
    const words = (await w.page.textContent("[data-compare-problems]")) ?? "";
    expect(words).toContain("“no-such-design”");
    expect(words).toContain(`“${ok[3].id}” was left out`);
    expect(await w.page.locator("svg.overlay path.trace").count()).toBe(6);
    await w.page.close();
  });

  it("the band page says so when four designs are ticked", async () => {
    const w = await open(`/bands/${bestBand.id}/`, 1280);
    const boxes = w.page.locator("table.band-table input[name=ids]");
    for (let k = 0; k < 4; k++) await boxes.nth(k).check();
    await w.page.click("form[data-compare-form] button[type=submit]");
    expect(await w.page.textContent("[data-compare-message]")).toContain("at most 3 can be compared");
    expect(new URL(w.page.url()).pathname).toBe(`/bands/${bestBand.id}/`);
    await w.page.close();
  });
});

describe("the 3D pattern turns", () => {
  for (const width of WIDTHS) {
    it(`a drag changes the drawing (${width} px)`, async () => {
      const w = await open(`/designs/${design.id}/`, width);
      await w.page.locator("figure[data-pattern3d]").scrollIntoViewIfNeeded();
      await w.page.waitForSelector("figure[data-pattern3d][data-turnable=ready] canvas");
      const canvas = w.page.locator("figure[data-pattern3d] canvas");
      const before = await canvas.evaluate((c: HTMLCanvasElement) => c.toDataURL());
      const yaw0 = await canvas.getAttribute("data-yaw-deg");
      const b = (await canvas.boundingBox())!;
      await w.page.mouse.move(b.x + b.width / 2, b.y + b.height / 2);
      await w.page.mouse.down();
      await w.page.mouse.move(b.x + b.width / 2 + 80, b.y + b.height / 2 + 30, { steps: 6 });
      await w.page.mouse.up();
      await w.page.waitForFunction(() => document.querySelector("figure[data-pattern3d] canvas")!.getAttribute("data-yaw-deg") !== null);
      await w.page.waitForTimeout(100);
      expect(await canvas.getAttribute("data-yaw-deg")).not.toBe(yaw0);
      expect(await canvas.evaluate((c: HTMLCanvasElement) => c.toDataURL())).not.toBe(before);
      expect(w.problems).toEqual([]);
      await w.page.close();
    });
  }
});

describe("scale calculator downloads", () => {
  it("saves the scaled shape file and a template PDF made in the browser", async () => {
    const w = await open(`/designs/${design.id}/`, 1280);
    const mhz = (2 * design.inputs.frequencyHz) / 1e6;
    await w.page.fill("[data-scale-input]", String(mhz));
    const [shapeDl] = await Promise.all([w.page.waitForEvent("download"), w.page.click("[data-scaled=shape]")]);
    const shape = JSON.parse(await readFile((await shapeDl.path())!, "utf8")) as { frequencyHz: number; wires: { pointsM: number[][] }[] };
    expect(shape.frequencyHz).toBeCloseTo(mhz * 1e6, 3);
    // a free-space wire scaled by f0 / f keeps its behaviour: every coordinate halves at twice the frequency
    shape.wires[0].pointsM.forEach((p, k) => p.forEach((v, a) => expect(v).toBeCloseTo(design.shape.pointsM[k][a] / 2, 9)));
    const [pdfDl] = await Promise.all([w.page.waitForEvent("download", { timeout: 30_000 }), w.page.click("[data-scaled=pdf-a4]")]);
    const pdf = readPdf(new Uint8Array(await readFile((await pdfDl.path())!)));
    expect(pdf.pages.length).toBeGreaterThan(0);
    expect(pdf.rects.filter((r) => Math.abs(r.w / PT_PER_MM - 100) < 1e-3 && Math.abs(r.h / PT_PER_MM - 3) < 1e-3)).toHaveLength(pdf.pages.length);
    // the designer page comes from another branch: linked exactly when the build has it
    const hasDesigner = existsSync(join(siteDir, "custom", "index.html"));
    expect(await w.page.locator("[data-designer-link]").count()).toBe(hasDesigner ? 1 : 0);
    if (hasDesigner) {
      const href = new URL((await w.page.getAttribute("[data-designer-link]", "href"))!, server.origin);
      expect(href.pathname).toBe("/custom/");
      expect(Number(href.searchParams.get("freqMhz"))).toBeCloseTo(mhz, 3);
      expect(href.searchParams.get("pieces")).toBe(String(design.inputs.piecesPerArm));
    }
    expect(w.problems).toEqual([]);
    await w.page.close();
  });
});
