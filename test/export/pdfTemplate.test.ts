// The printable template PDF read back with our own minimal reader (zlib for the page streams, a
// regular expression for the page boxes and rectangle operators), not with the library that wrote it:
// one page per SVG sheet, each the paper's size, and the check bar exactly 100 mm long.
// Sources: ISO 216 for A4 = 210 × 297 mm; ANSI/ASME Y14.1 for Letter = 8.5 × 11 in; ISO 32000-1
// §8.3.2.3 for the default user unit of 1/72 in; 1 in = 25.4 mm exactly (1959 international inch).
import { describe, expect, it } from "vitest";
import { bendingTemplateSvgs } from "../../generator/export/index.js";
import { templatePdf } from "../../generator/export/pdfTemplate.js";
import { exportShapeOf } from "../../generator/site/downloads.js";
import { isOk } from "../../generator/site/ok.js";
import { readEntries } from "../site/entries.js";
import { readPdf } from "../helpers/pdfRead.js";

const PT_PER_MM = 72 / 25.4;

const ok = readEntries().filter(isOk);
const tiled = ok.find((e) => bendingTemplateSvgs(exportShapeOf(e), { paper: "a4" }).length > 4)!;

describe("printable template PDF", () => {
  it("has one A4 page per tiled sheet and a 100 mm check bar on every page", async () => {
    const sheets = bendingTemplateSvgs(exportShapeOf(tiled), { paper: "a4" });
    const pdf = readPdf(await templatePdf(sheets, tiled.title));
    expect(pdf.pages).toHaveLength(sheets.length);
    for (const p of pdf.pages) {
      const [short, long] = [p.widthPt, p.heightPt].sort((a, b) => a - b);
      expect(short / PT_PER_MM).toBeCloseTo(210, 2);
      expect(long / PT_PER_MM).toBeCloseTo(297, 2);
    }
    // the check bar: 100 mm long, 3 mm high (one outline per page); the inch bar 4 in = 101.6 mm
    const bars = pdf.rects.filter((r) => Math.abs(r.h / PT_PER_MM - 3) < 1e-3 && Math.abs(r.w / PT_PER_MM - 100) < 1e-3);
    expect(bars).toHaveLength(sheets.length);
    const inch = pdf.rects.filter((r) => Math.abs(r.h / PT_PER_MM - 3) < 1e-3 && Math.abs(r.w / 72 - 4) < 1e-4);
    expect(inch).toHaveLength(sheets.length);
  });

  it("fits a Letter sheet and keeps the same check bar", async () => {
    const sheets = bendingTemplateSvgs(exportShapeOf(tiled), { paper: "letter" });
    const pdf = readPdf(await templatePdf(sheets, tiled.title));
    expect(pdf.pages).toHaveLength(sheets.length);
    for (const p of pdf.pages) expect([p.widthPt, p.heightPt].sort((a, b) => a - b).map((v) => v / 72)).toEqual([expect.closeTo(8.5, 4), expect.closeTo(11, 4)]);
    expect(pdf.rects.filter((r) => Math.abs(r.w / PT_PER_MM - 100) < 1e-3 && Math.abs(r.h / PT_PER_MM - 3) < 1e-3)).toHaveLength(sheets.length);
  });

  it("is byte-identical for the same sheets", async () => {
    const sheets = bendingTemplateSvgs(exportShapeOf(ok[0]), { paper: "a4" });
    expect(Buffer.from(await templatePdf(sheets, "t")).equals(Buffer.from(await templatePdf(sheets, "t")))).toBe(true);
  });
});
