// Every SVG the renderers make is a well-formed, self-contained document that sharp (librsvg) can
// draw, with a viewBox and a <title>, and the same entry always gives the same bytes.
import sharp from "sharp";
import { describe, expect, it } from "vitest";
import type { Entry } from "../../generator/catalog/entrySchema.js";
import { pattern3dSvg, patternCutSvg, shapeSvg, smithSvg, sweepSvg } from "../../generator/render/index.js";
import { copy, okEntries } from "./fixtures.js";
import { xmlProblem } from "./xmlCheck.js";

const renderers: [string, (e: Entry) => string][] = [
  ["shapeSvg", (e) => shapeSvg(e)],
  ["shapeSvg without dimensions", (e) => shapeSvg(e, { widthPx: 160, dimensions: false })],
  ["patternCutSvg along φ", (e) => patternCutSvg(e, "phi")],
  ["patternCutSvg along θ", (e) => patternCutSvg(e, "theta")],
  ["pattern3dSvg", (e) => pattern3dSvg(e)],
  ["sweepSvg", (e) => sweepSvg(e)],
  ["smithSvg", (e) => smithSvg(e)],
];
const entries = okEntries();

describe.each(renderers)("%s", (_name, render) => {
  it.each(entries.map((e) => [e.id, e] as const))("is well-formed XML with a viewBox, a title and a size for %s", (_id, entry) => {
    const svg = render(entry);
    expect(xmlProblem(svg)).toBeNull();
    expect(svg).toMatch(/^<svg xmlns="http:\/\/www\.w3\.org\/2000\/svg" viewBox="-?[\d.]+ -?[\d.]+ [\d.]+ [\d.]+" width="\d+" height="\d+"/);
    expect(svg).toMatch(/^<svg[^>]*><title>[^<]+<\/title>/);
  });

  it("is self-contained: no links, external images, fonts, scripts or ids", () => {
    const svg = render(entries[0]);
    expect(svg).not.toMatch(/href|url\(|@import|@font-face|<script|<image|<foreignObject| id="/);
  });

  it("renders to PNG with sharp", async () => {
    const png = await sharp(Buffer.from(render(entries[0]))).png().toBuffer();
    const meta = await sharp(png).metadata();
    expect(meta.format).toBe("png");
    expect(meta.width).toBeGreaterThan(100);
  });

  it("gives identical bytes for identical input, including a fresh copy of the entry", () => {
    expect(render(copy(entries[0]))).toBe(render(entries[0]));
  });

  it("refuses an infeasible entry with a clear error", () => {
    const bad = { ...copy(entries[0]), status: "infeasible" as const, shape: null, figures: null, sweep: null, pattern: null };
    expect(() => render(bad)).toThrow(/status "infeasible"/);
  });
});

describe("the well-formedness check itself", () => {
  it.each([
    ["<svg><g></svg>", /mismatched/],
    ['<svg a="1" a="2"/>', /duplicate/],
    ["<svg>a < b</svg>", /bad tag name/],
    ["<svg>fish & chips</svg>", /stray "&"/],
    ['<svg a=1/>', /bad attribute/],
    ["<svg/><svg/>", /more than one root/],
  ])("rejects %s", (xml, problem) => {
    expect(xmlProblem(xml)).toMatch(problem);
  });

  it("accepts entities and self-closing elements", () => {
    expect(xmlProblem('<svg x="&quot;"><title>a &amp; b &#955;</title><g/></svg>')).toBeNull();
  });
});
