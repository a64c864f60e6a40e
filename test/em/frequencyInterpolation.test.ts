// Interpolated band sweeps (generator/em/frequencyInterpolation.ts) against direct fills at every
// frequency on the same fixed mesh. Acceptance: Z within 2e-4 relative and SWR within 0.01 of
// the direct solves for bands up to the stated 8 % limit (the project's own thresholds);
// SWR = (1 + |Γ|)/(1 − |Γ|), Γ = (Z − Z0)/(Z + Z0) (Pozar, Microwave Engineering, §2.3).
import { describe, expect, it } from "vitest";
import { checkFrequencies, shapeOf, swrOf } from "../../generator/design/objective.js";
import { parseDesignRequest } from "../../generator/design/request.js";
import { bandImpedances, MAX_RELATIVE_BANDWIDTH } from "../../generator/em/frequencyInterpolation.js";
import { solveFeed } from "../../generator/em/solve.js";

const request = (band: [number, number], conductor: "copper" | "perfect") =>
  parseDesignRequest({ frequencyHz: 145e6, lengthWl: 1.5, piecesPerArm: 3, wireDiameterM: 2e-3, conductor, variant: "direct-feed", bandHz: band });
const X = [1.183, -0.528, 0.693, 0.092, 0.427];

describe("interpolated band sweep on a fixed mesh", () => {
  for (const [band, conductor] of [[[144e6, 146e6], "copper"], [[139.5e6, 150.5e6], "perfect"], [[139.5e6, 150.5e6], "copper"]] as const) {
    const width = (band[1] - band[0]) / 145e6;
    it(`matches direct fills within 2e-4 in Z and 0.01 in SWR over a ${(width * 100).toFixed(1)} % band (${conductor})`, () => {
      expect(width).toBeLessThanOrEqual(MAX_RELATIVE_BANDWIDTH);
      const r = request([band[0], band[1]], conductor);
      const shape = shapeOf(X, r);
      const fs = checkFrequencies(r, 11);
      const interpolated = bandImpedances(shape, fs);
      const direct = bandImpedances(shape, fs, { interpolate: false });
      interpolated.forEach((z, i) => {
        const d = direct[i];
        expect(Math.hypot(z.re - d.re, z.im - d.im) / Math.hypot(d.re, d.im)).toBeLessThan(2e-4);
        expect(Math.abs(swrOf(z, 50) - swrOf(d, 50))).toBeLessThan(0.01);
      });
    });
  }

  it("at the design frequency equals solveFeed on the same mesh", () => {
    const r = request([144e6, 146e6], "copper");
    const shape = shapeOf(X, r);
    const [z] = bandImpedances(shape, [145e6]);
    const ref = solveFeed(shape).inputImpedanceOhm;
    expect(Math.hypot(z.re - ref.re, z.im - ref.im)).toBeLessThan(1e-9 * Math.hypot(ref.re, ref.im));
  });

  it("falls back to direct fills above the band limit (same answers with and without interpolation)", () => {
    const r = request([130e6, 160e6], "copper"); // 21 % wide
    const shape = shapeOf(X, r);
    const fs = checkFrequencies(r, 11);
    expect(bandImpedances(shape, fs)).toEqual(bandImpedances(shape, fs, { interpolate: false }));
  });
});
