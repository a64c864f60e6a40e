// The shape drawing is to scale: distances in SVG units divided by the drawing's px-per-metre
// give metres, for the tips and for the scale bar; the main lobe is an arrow in the plane, or a
// circled dot/cross with a caption when it rises more than 45° from the wire plane.
import { describe, expect, it } from "vitest";
import { shapeSvg } from "../../generator/render/index.js";
import { copy, okEntries, roleAttr, rootAttr } from "./fixtures.js";

const entries = okEntries();

describe("shapeSvg", () => {
  it.each(entries.map((e) => [e.id, e] as const))("draws %s to scale: tip-to-tip distance in SVG units / px per metre = metres", (_id, entry) => {
    const svg = shapeSvg(entry);
    const pxPerM = Number(rootAttr(svg, "data-px-per-m"));
    const pts = roleAttr(svg, "wire", "points").split(" ").map((p) => p.split(",").map(Number));
    const a = entry.shape!.pointsM[0], b = entry.shape!.pointsM.at(-1)!;
    const tipsM = Math.hypot(a[0] - b[0], a[1] - b[1]);
    const tipsPx = Math.hypot(pts[0][0] - pts.at(-1)![0], pts[0][1] - pts.at(-1)![1]);
    // coordinates are written to 0.01 px and the scale to a few significant digits: allow both
    expect(Math.abs(tipsPx / pxPerM - tipsM)).toBeLessThanOrEqual(0.02 / pxPerM + 2e-5 * tipsM);
    expect(pts).toHaveLength(entry.shape!.pointsM.length);
  });

  it("keeps x to the right and y up", () => {
    const entry = entries[0];
    const pts = roleAttr(shapeSvg(entry), "wire", "points").split(" ").map((p) => p.split(",").map(Number));
    const m = entry.shape!.pointsM, f = entry.shape!.feedVertex;
    expect(Math.sign(pts.at(-1)![0] - pts[f][0])).toBe(Math.sign(m.at(-1)![0] - m[f][0]));
    expect(Math.sign(pts.at(-1)![1] - pts[f][1])).toBe(-Math.sign(m.at(-1)![1] - m[f][1]));
  });

  it("has a scale bar whose drawn length matches its label", () => {
    const svg = shapeSvg(entries[0]);
    const pxPerM = Number(rootAttr(svg, "data-px-per-m"));
    expect(Number(roleAttr(svg, "scale-bar", "data-length-px")) / pxPerM).toBeCloseTo(Number(roleAttr(svg, "scale-bar", "data-length-m")), 4);
    expect(svg).toMatch(/>\d+ (m|cm|mm)<\/text>/);
  });

  it("labels piece lengths in mm or cm, marks the feed, and draws an in-plane lobe as an arrow", () => {
    const svg = shapeSvg(entries[0]);
    expect(svg).toMatch(/>\d+(\.\d)? (mm|cm)<\/text>/);
    expect(svg).toContain('data-role="feed"');
    expect(svg).toContain('data-role="lobe-arrow"');
    expect(svg).not.toContain("out of the page");
  });

  it("labels the turn at every bend and the angle between the arms at the feed", () => {
    for (const e of entries) {
      const svg = shapeSvg(e), bends = e.shape!.pointsM.length - 3;
      expect(svg.match(/>\d+°<\/text>/g)).toHaveLength(bends + 1);
      expect(svg.includes("Angle at a bend")).toBe(bends > 0);
    }
  });

  it("draws a circled dot and a caption when the lobe points out of the page toward +z", () => {
    const e = copy(entries[0]);
    e.figures!.peakDirection = { thetaDeg: 20, phiDeg: 45 };
    const svg = shapeSvg(e);
    expect(svg).toContain('data-role="lobe-out-of-page"');
    expect(svg).toContain("main lobe out of the page, toward you");
    expect(svg).not.toContain('data-role="lobe-arrow"');
  });

  it("draws a circled cross when the lobe points away, into −z", () => {
    const e = copy(entries[0]);
    e.figures!.peakDirection = { thetaDeg: 170, phiDeg: 0 };
    expect(shapeSvg(e)).toContain("main lobe out of the page, away from you");
  });

  it("leaves dimensions off for thumbnails", () => {
    const svg = shapeSvg(entries[0], { widthPx: 160, dimensions: false });
    expect(svg).not.toContain("<text");
    expect(rootAttr(svg, "width")).toBe("160");
  });
});
