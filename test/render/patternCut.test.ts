// The polar cut puts the peak sample on the outer ring at the top, is linear in dB down to 30 dB
// below the peak, and clips anything lower to the centre.
import { describe, expect, it } from "vitest";
import { patternCutSvg } from "../../generator/render/index.js";
import { copy, okEntries, pathPoints, roleAttr, rootAttr } from "./fixtures.js";

const entry = okEntries()[0];

function geometry(svg: string) {
  const [cx, cy] = rootAttr(svg, "data-center").split(" ").map(Number);
  const pts = pathPoints(roleAttr(svg, "gain", "d"));
  return { cx, cy, outer: Number(roleAttr(svg, "ring-peak", "r")), pts, radius: (i: number) => Math.hypot(pts[i][0] - cx, pts[i][1] - cy) };
}

describe("patternCutSvg", () => {
  it.each(["phi", "theta"] as const)("puts the peak sample of the %s cut on the outer ring, straight up", (which) => {
    const svg = patternCutSvg(entry, which);
    const g = geometry(svg), mid = 180 / entry.pattern!.cutStepDeg;
    expect(g.pts).toHaveLength(360 / entry.pattern!.cutStepDeg);
    expect(g.radius(mid)).toBeCloseTo(g.outer, 1);
    expect(g.pts[mid][0]).toBeCloseTo(g.cx, 1);
    expect(g.pts[mid][1]).toBeLessThan(g.cy);
    for (let i = 0; i < g.pts.length; i++) expect(g.radius(i)).toBeLessThanOrEqual(g.outer + 0.01);
  });

  it("is linear in dB: 15 dB below the peak sits halfway out; 40 dB below sits at the centre", () => {
    const e = copy(entry), cut = e.pattern!.cutAlongPhiDbi, peak = Math.max(...cut);
    cut[10] = peak - 15;
    cut[20] = peak - 40;
    const g = geometry(patternCutSvg(e, "phi"));
    expect(g.radius(10)).toBeCloseTo(g.outer / 2, 1);
    expect(g.radius(20)).toBeCloseTo(0, 1);
  });

  it("labels the rings in dBi and names the cut in its caption", () => {
    const phi = patternCutSvg(entry, "phi"), theta = patternCutSvg(entry, "theta");
    expect(phi).toMatch(/dBi \(peak\)/);
    expect(phi).toContain("Cut through the peak along φ̂ (in the wire&#39;s plane when the lobe is in it)");
    expect(theta).toContain("Cut through the peak along θ̂");
    expect(phi).toContain("Peak at the top");
  });

  it("rejects an unknown cut name", () => {
    expect(() => patternCutSvg(entry, "psi" as never)).toThrow(/"phi" or "theta"/);
  });
});
