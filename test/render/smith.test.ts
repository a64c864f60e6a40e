// Smith chart mapping Γ = (Z − Z0)/(Z + Z0) (P. H. Smith, Electronics, Jan. 1939; Pozar,
// Microwave Engineering, 4th ed., §2.4): a matched load at the centre, a short at the left edge,
// an open at the right edge, inductive reactance in the upper half.
import { describe, expect, it } from "vitest";
import { smithSvg } from "../../generator/render/index.js";
import { gammaMagForSwr, gammaOf, reactanceArcPath, toXY } from "../../generator/render/smithMath.js";
import { copy, okEntries, roleAttr, rootAttr } from "./fixtures.js";

const chart = { cx: 100, cy: 100, r: 50 };

describe("Smith chart mapping", () => {
  it("maps Z = Z0 to Γ = 0, a short to Γ = −1, an open-ish load to Γ → +1", () => {
    expect(gammaOf({ re: 50, im: 0 }, 50)).toEqual({ re: 0, im: 0 });
    expect(gammaOf({ re: 0, im: 0 }, 50)).toEqual({ re: -1, im: 0 });
    expect(gammaOf({ re: 1e9, im: 0 }, 50).re).toBeCloseTo(1, 6);
  });

  it("puts inductive loads in the upper half and |Γ| = 1/3 at SWR 2", () => {
    const g = gammaOf({ re: 50, im: 50 }, 50); // z = 1 + j: Γ = j/(2 + j) = (1 + 2j)/5
    expect(g.re).toBeCloseTo(0.2, 12);
    expect(g.im).toBeCloseTo(0.4, 12);
    expect(toXY(chart, g)[1]).toBeLessThan(chart.cy);
    expect(gammaMagForSwr(2)).toBeCloseTo(1 / 3, 12);
  });

  it("runs each reactance arc from the rim to Γ = 1", () => {
    for (const x of [0.2, 1, -5]) {
      const nums = reactanceArcPath(chart, x).match(/-?\d+(\.\d+)?/g)!.map(Number);
      expect(Math.hypot(nums[0] - chart.cx, nums[1] - chart.cy)).toBeCloseTo(chart.r, 1);
      expect(nums.slice(-2)).toEqual([chart.cx + chart.r, chart.cy]);
    }
  });
});

describe("smithSvg", () => {
  const base = okEntries()[0];
  const design = (re: number, im: number) => {
    const e = copy(base);
    e.figures!.inputImpedanceOhm = { re, im };
    const svg = smithSvg(e);
    const [cx, cy] = rootAttr(svg, "data-center").split(" ").map(Number);
    return { svg, cx, cy, r: Number(rootAttr(svg, "data-radius")), x: Number(roleAttr(svg, "design-point", "cx")), y: Number(roleAttr(svg, "design-point", "cy")) };
  };

  it("draws a design point with Z = Z0 at the chart's centre", () => {
    const z0 = base.sweep!.lineImpedanceOhm, d = design(z0, 0);
    expect([d.x, d.y]).toEqual([d.cx, d.cy]);
  });

  it("draws a short (Z = 0) at the left edge", () => {
    const d = design(0, 0);
    expect([d.x, d.y]).toEqual([d.cx - d.r, d.cy]);
  });

  it("draws the SWR 2 circle dashed and the in-band locus", () => {
    const { svg, r } = design(50, 0);
    expect(Number(roleAttr(svg, "swr2", "r"))).toBeCloseTo(r / 3, 1);
    expect(roleAttr(svg, "swr2", "stroke-dasharray")).not.toBe("");
    expect(svg).toContain('data-role="locus-in-band"');
  });
});
