// The site's page logic, tested as plain functions over real catalog entries.
import { beforeAll, describe, expect, it } from "vitest";
import { parseShape } from "../../generator/em/shapeFile.js";
import { bandsOf, bestOf, checkSiteEntry, totals } from "../../generator/site/catalog.js";
import { compareRows, escapeText, idsFromQuery, overlayPolarSvg } from "../../generator/site/compare.js";
import { CHECKSUM_FILE, allChecksums, downloadFiles, downloadRows, shapeFileOf, sheetMaps, templateSheets, type DownloadFile, type PdfCache } from "../../generator/site/downloads.js";
import { figureFiles, figureSizes, newFigureCache, renderFigure, svgSize } from "../../generator/site/figures.js";
import { gainDbi, parseShown, shownDecimals } from "../../generator/site/format.js";
import { isOk } from "../../generator/site/ok.js";
import { at, normalBase, paths } from "../../generator/site/paths.js";
import { scaleDesign, scaleInputOf } from "../../generator/site/scale.js";
import { decodeEntities, excerptParts } from "../../generator/site/searchText.js";
import { SHOWN_UNITS, valueAt, type Shown } from "../../generator/site/shown.js";
import { compareSortKeys, readSortKey, sortedOrder } from "../../generator/site/sort.js";
import { bandRow, keyFigures, matchRows, pieceRows, shortTitle, toleranceRows, vertexRows } from "../../generator/site/tables.js";
import { validationRows } from "../../generator/site/validation.js";
import { sha256Hex } from "../../generator/export/index.js";
import { firstOk, hostileEntry, readEntries, resealed } from "./entries.js";

const entries = readEntries();
const ok = firstOk(entries);

/** A shown number equals its entry field within the displayed precision. */
function expectTrue(s: Shown, root: unknown) {
  const value = valueAt(root, s.field!) as number;
  expect(typeof value, s.field).toBe("number");
  const scaled = value * SHOWN_UNITS[s.unit ?? "si"];
  const tol = 0.5 * 10 ** -shownDecimals(s.text) + 1e-9 * Math.abs(scaled);
  expect(Math.abs(parseShown(s.text) - scaled), `${s.field} shown as ${s.text}`).toBeLessThanOrEqual(tol);
}

describe("catalog checks", () => {
  const text = JSON.stringify(ok) + "\n";
  it("accepts a sealed entry and rejects a damaged one with one line naming the file", () => {
    expect(checkSiteEntry(text, `/x/${ok.id}.json`).id).toBe(ok.id);
    const edited = text.replace(`"gainDbi":${ok.figures.gainDbi}`, `"gainDbi":${ok.figures.gainDbi + 1}`);
    expect(() => checkSiteEntry(edited, `/x/${ok.id}.json`)).toThrow(new RegExp(`^site entries: /x/${ok.id}\\.json: content hash does not match`));
    expect(() => checkSiteEntry(text.slice(0, 500), "/x/cut.json")).toThrow(/cut\.json: not valid JSON/);
    expect(() => checkSiteEntry(text, "/x/other-name.json")).toThrow(/does not match the file name/);
    expect(checkSiteEntry(text, `/x/${ok.id}.json`)).not.toHaveProperty("extra");
  });

  it("refuses a band id that is not safe in a URL", () => {
    const bad = resealed(ok, (e) => { e.inputs.bandId = "../x"; });
    expect(() => checkSiteEntry(JSON.stringify(bad), `/x/${ok.id}.json`)).toThrow(/bandId/);
  });

  it("groups designs into bands in frequency order, best gain first", () => {
    const bands = bandsOf(entries);
    for (let k = 1; k < bands.length; k++) expect(bands[k].lowHz).toBeGreaterThanOrEqual(bands[k - 1].lowHz);
    for (const b of bands) {
      const gains = b.ok.map((e) => e.figures.gainDbi);
      expect(gains).toEqual([...gains].sort((x, y) => y - x));
      expect(bestOf(b, 3).length).toBeLessThanOrEqual(3);
    }
    expect(totals(entries).designs).toBe(entries.length);
  });
});

describe("tables", () => {
  it("every shown number equals the entry within its display precision", () => {
    for (const e of entries.filter(isOk)) {
      const shownParts = [
        ...keyFigures(e).flatMap((r) => r.parts), ...toleranceRows(e).flatMap((r) => r.parts),
        ...pieceRows(e).flatMap((p) => [p.lengthMm, p.lengthIn, ...(p.bend ? [p.bend] : [])]),
        ...vertexRows(e).flatMap((v) => [v.xMm, v.yMm, v.xIn, v.yIn]),
        ...matchRows(e).flatMap((m) => m.parts.map((p) => p.exact)),
        ...Object.values(bandRow(e).cells).flatMap((c) => c.parts),
      ].filter((s) => s.field);
      expect(shownParts.length).toBeGreaterThan(20);
      for (const s of shownParts) expectTrue(s, e);
    }
  });

  it("lists one row per piece and per vertex, feed marked", () => {
    expect(pieceRows(ok)).toHaveLength(ok.inputs.piecesPerArm);
    expect(pieceRows(ok).at(-1)!.bend).toBeNull();
    const v = vertexRows(ok);
    expect(v).toHaveLength(ok.shape.pointsM.length);
    expect(v[ok.shape.feedVertex].what).toBe("feed point");
  });

  it("strips the band name from titles inside a band", () => {
    expect(shortTitle(ok)).not.toContain(ok.inputs.bandName);
    expect(shortTitle(ok).length).toBeGreaterThan(5);
  });
});

describe("downloads", () => {
  const cache: PdfCache = new Map();
  let files: DownloadFile[] = [];
  beforeAll(async () => { files = await downloadFiles(ok, cache); });
  it("writes a shape file that the solver's reader accepts, with the entry's geometry", () => {
    const shape = parseShape(files.find((f) => f.group === "shape")!.content as string);
    expect(shape.wires[0].pointsM).toEqual(ok.shape.pointsM);
    expect(shape.feed).toEqual({ wire: 0, vertex: ok.shape.feedVertex });
    expect(shape.frequencyHz).toBe(ok.inputs.frequencyHz);
    expect(shape.wireRadiusM).toBe(ok.inputs.wireDiameterM / 2);
    expect(shapeFileOf(ok).conductor).toBe(ok.inputs.conductor);
  });

  it("lists every file in the checksum file with its SHA-256", async () => {
    const sums = (files.find((f) => f.name === CHECKSUM_FILE)!.content as string).trim().split("\n");
    expect(sums).toHaveLength(files.length - 1);
    for (const f of files.filter((f) => f.name !== CHECKSUM_FILE)) expect(sums).toContain(`${sha256Hex(f.content)}  ${f.name}`);
    const all = await allChecksums([ok], paths.file, cache);
    expect(all).toContain(`  designs/${ok.id}/files/${ok.id}.dxf`);
  });

  it("has an entry, shape, CSV, DXF, A4 and Letter templates (PDF and sheets), and groups template pages", () => {
    const groups = new Set(files.map((f) => f.group));
    for (const g of ["entry", "shape", "nodes", "dxf", "pdf-a4", "pdf-letter", "template-a4", "template-letter", "checksums"]) expect(groups).toContain(g);
    const rows = downloadRows(files);
    expect(rows.map((r) => r.group)).toEqual(["entry", "shape", "nodes", "dxf", "pdf-a4", "pdf-letter", "template-a4", "template-letter", "checksums"]);
    expect(rows.flatMap((r) => r.files)).toHaveLength(files.length);
    expect(JSON.parse(files[0].content as string)).toEqual(ok);
  });

  it("names tiled template sheets by row and column and maps every sheet once", () => {
    for (const e of entries.filter(isOk)) {
      const fs = templateSheets(e);
      const maps = sheetMaps(fs);
      for (const m of maps) {
        const sheets = fs.filter((f) => f.sheet?.paper === m.paper);
        expect(m.cells.flat().filter(Boolean).map((c) => c!.name).sort()).toEqual(sheets.map((f) => f.name).sort());
        for (const f of sheets) expect(f.name).toMatch(new RegExp(`-r${f.sheet!.row + 1}c${f.sheet!.column + 1}\\.svg$`));
        expect(downloadRows(fs).find((r) => r.group === `template-${m.paper}`)!.tiledPaper).toBe(m.paper);
      }
    }
  });

  it("gives an infeasible entry its JSON and checksums only", async () => {
    const bad = resealed(ok, (e) => { e.status = "infeasible"; e.shape = null; e.figures = null; });
    expect((await downloadFiles(bad, cache)).map((f) => f.group)).toEqual(["entry", "checksums"]);
  });
});

describe("figures", () => {
  // the build draws each figure once and keeps what later pages need (site/data.ts); that must only save time
  it("a build's shared figure cache gives the bytes and sizes of a fresh draw", async () => {
    const designs = entries.filter(isOk).slice(0, 3);
    const cache = newFigureCache();
    for (const e of designs) for (const file of figureFiles) {
      const shared = (await renderFigure(e, file, cache)).body, fresh = (await renderFigure(e, file)).body;
      expect(Buffer.from(shared).equals(Buffer.from(fresh)), `${e.id} ${file}`).toBe(true);
    }
    for (const e of designs) expect(figureSizes(e, cache)).toEqual(figureSizes(e));
  });
});

describe("scale calculator", () => {
  const input = scaleInputOf(ok);
  it("scales every length by f_design / f_new and keeps the angles", () => {
    const r = scaleDesign(input, (2 * ok.inputs.frequencyHz) / 1e6);
    expect(r.ok).toBe(true);
    expect(r.factor).toBeCloseTo(0.5, 12);
    expect(r.lengthM).toBeCloseTo(ok.inputs.lengthM / 2, 12);
    r.pieceLengthsM.forEach((l, k) => expect(l).toBeCloseTo(ok.shape.pieceLengthsM[k] / 2, 12));
    expect(r.wireDiameterM).toBeCloseTo(ok.inputs.wireDiameterM / 2, 12);
  });
  it("refuses empty or absurd frequencies and warns far from the design", () => {
    expect(scaleDesign(input, null).ok).toBe(false);
    expect(scaleDesign(input, 0.1).ok).toBe(false);
    expect(scaleDesign(input, Number.NaN).ok).toBe(false);
    expect(scaleDesign(input, ok.inputs.frequencyHz / 1e6).caution).toBeNull();
    expect(scaleDesign(input, (ok.inputs.frequencyHz * 3) / 1e6).caution).toMatch(/factor of two/);
  });
});

describe("small helpers", () => {
  it("builds base-aware URLs", () => {
    expect(normalBase("")).toBe("/");
    expect(normalBase("/club/atlas")).toBe("/club/atlas/");
    expect(at("/club/atlas/", paths.design("x"))).toBe("/club/atlas/designs/x/");
    expect(at("/", paths.home)).toBe("/");
    expect(paths.compare(["a", "b"])).toBe("compare/?ids=a,b");
  });

  it("sorts table keys with missing values last", () => {
    expect(sortedOrder([3, -Infinity, 5, 1], true)).toEqual([2, 0, 3, 1]);
    expect(sortedOrder([3, -Infinity, 5, 1], false)).toEqual([3, 0, 2, 1]);
    expect(readSortKey("", true)).toBe(-Infinity);
    expect(readSortKey("2.5", true)).toBe(2.5);
    expect(compareSortKeys("direct-feed", "max-gain", false)).toBeLessThan(0);
  });

  it("splits search excerpts into text runs and decodes entities", () => {
    expect(excerptParts("a &lt;script&gt; <mark>balun</mark> &amp; b")).toEqual([
      { text: "a <script> ", marked: false }, { text: "balun", marked: true }, { text: " & b", marked: false },
    ]);
    expect(decodeEntities("&#955; &#x3A9; &bogus;")).toBe("λ Ω &bogus;");
  });

  it("escapes every label of the overlay chart", () => {
    const svg = overlayPolarSvg([{ label: "<script>x</script>", valuesDbi: [1, 2, 3, 2], stepDeg: 90 }], "a & b");
    expect(svg).not.toContain("<script>");
    expect(svg).toContain("&lt;script&gt;");
    expect(escapeText(`"'<>&`)).toBe("&quot;&#39;&lt;&gt;&amp;");
    expect(idsFromQuery("a,b,a,../x,c,d")).toEqual(["a", "b", "c"]);
    expect(compareRows([ok, ok])[1].values).toEqual([gainDbi(ok.figures.gainDbi), gainDbi(ok.figures.gainDbi)]);
  });

  it("reads the size an SVG declares", () => {
    expect(svgSize('<svg xmlns="http://www.w3.org/2000/svg" viewBox="0 0 10 5" width="800" height="400.4">')).toEqual({ width: 800, height: 400 });
  });

  it("formats reference checks with their deviation and tolerance", () => {
    const rows = validationRows([{ id: "a", quantity: "q", unit: "dBi", reference: 2.15, source: "s", ours: 2.1, deviation: -0.05, tolerance: 0.2, pass: true },
      { id: "b", quantity: "q", unit: "Ω", reference: 0.0291, source: "s", ours: 0.03, deviation: 0.0009, tolerance: 0.0015, pass: true }]);
    expect(rows[0]).toMatchObject({ reference: "2.15 dBi", ours: "2.10 dBi", deviation: "\u22120.05 dBi", tolerance: "±0.20 dBi" });
    expect(rows[1].deviation).toBe("+0.0009 Ω");
    expect(rows[1].tolerance).toBe("±0.0015 Ω");
    const ratio = validationRows([{ id: "c", quantity: "|Γ|", unit: "", reference: 0.8027, source: "s", ours: 0.8031, deviation: 0.0004, tolerance: 0.005, pass: true }]);
    expect(ratio[0]).toMatchObject({ reference: "0.8027", ours: "0.8031", deviation: "+0.0004", tolerance: "±0.0050" }); // a ratio has no unit, no trailing space
  });

  it("keeps hostile text intact in the data (escaping is the page's job)", () => {
    const h = hostileEntry(ok);
    expect(checkSiteEntry(JSON.stringify(h), `/x/${h.id}.json`).title).toContain("<script>");
  });
});

describe("home highlights", () => {
  it("picks at most three different designs per band, the first with the band's most gain", async () => {
    const { highlights } = await import("../../generator/site/catalog.js");
    for (const b of bandsOf(entries)) {
      const h = highlights(b);
      expect(h.length).toBeLessThanOrEqual(3);
      expect(new Set(h.map((x) => x.entry.id)).size).toBe(h.length);
      if (b.ok.length) expect(h[0].entry.id).toBe(b.ok[0].id);
    }
  });
});
