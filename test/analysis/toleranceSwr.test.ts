// SWR as built: the 90th-percentile publishing rule, the per-frequency percentiles of the bent
// copies (bare and after a feed), and the tolerance verdict that covers SWR as well as gain.
import { feedGapM } from "../../generator/em/feedSource.js";
import { describe, expect, it } from "vitest";
import { solveFeed } from "../../generator/em/index.js";
import { swr } from "../../generator/analysis/swr.js";
import { percentile, toleranceStudy, DEFAULT_TOLERANCE } from "../../generator/analysis/tolerance.js";
import { meetsSwrAsBuilt, toleranceFrequencies, toleranceSwrStudy, toleranceVerdict } from "../../generator/analysis/toleranceSwr.js";
import { straightDipole } from "../helpers/shapes.js";

describe("the 90th-percentile rule", () => {
  it("uses Hyndman & Fan (1996) definition 7: the 90th percentile of 1…10 is 9.1", () => {
    // definition 7: h = (n − 1)·q, linear between order statistics (also numpy's default)
    expect(percentile([1, 2, 3, 4, 5, 6, 7, 8, 9, 10], 0.9)).toBeCloseTo(9.1, 12);
  });
  it("publishes SWR ≤ limit only when every frequency's 90th percentile meets it", () => {
    expect(meetsSwrAsBuilt([1.4, 1.9, 2.0], 2)).toBe(true);
    expect(meetsSwrAsBuilt([1.4, 2.01, 1.5], 2)).toBe(false);
    expect(meetsSwrAsBuilt([1.4, Number.NaN], 2)).toBe(false);
    expect(meetsSwrAsBuilt([1.4, Infinity], 2)).toBe(false);
    expect(meetsSwrAsBuilt([], 2)).toBe(false);
  });
  it("spreads the check frequencies evenly from edge to edge", () => {
    expect(toleranceFrequencies([144e6, 146e6], 5)).toEqual([144e6, 144.5e6, 145e6, 145.5e6, 146e6]);
    expect(() => toleranceFrequencies([144e6, 146e6], 1)).toThrow(/2 or more/);
  });
});

describe("SWR percentiles of the bent copies", () => {
  const dipole = straightDipole(0.48, 1e-3);
  const f0 = dipole.frequencyHz;
  const freqs = [0.99 * f0, f0, 1.01 * f0];
  const base = { ...DEFAULT_TOLERANCE, samples: 6 };

  it("with no bending error every copy is the design: every percentile is the design's SWR", () => {
    const study = toleranceSwrStudy(dipole, freqs, { ...base, bendSigmaDeg: 0, lengthSigmaFraction: 0 }, 2);
    study.perFrequency.forEach((row, k) => {
      // the mesh and the feed gap (in metres) of the design frequency, as the band sweep keeps them
      const nominal = swr(solveFeed({ ...dipole, frequencyHz: freqs[k] }, { segmentsPerWavelength: (25 * f0) / freqs[k], feedGapM: feedGapM(f0) }).inputImpedanceOhm, 50);
      expect(row.bare.p50).toBeCloseTo(nominal, 9);
      expect(row.bare.p90).toBeCloseTo(nominal, 9);
      expect(row.afterFeed).toBeUndefined();
    });
    expect(study.meetsLimitAsBuilt).toBe(true); // a 0.48 λ dipole is about 70 Ω: SWR ≈ 1.4 (common practice)
  });

  it("judges after the feed when one is given, with p50 ≤ p90 ≤ p95", () => {
    // a feed that doubles the impedance: a 70 Ω dipole becomes ≈ 140 Ω, SWR ≈ 2.8, so the rule fails
    const study = toleranceSwrStudy(dipole, freqs, base, 2, (z) => ({ re: 2 * z.re, im: 2 * z.im }));
    for (const row of study.perFrequency) {
      expect(row.bare.p50).toBeLessThanOrEqual(row.bare.p90);
      expect(row.bare.p90).toBeLessThanOrEqual(row.bare.p95);
      expect(row.afterFeed!.p90).toBeGreaterThan(2);
    }
    expect(study.meetsLimitAsBuilt).toBe(false);
    const gain = toleranceStudy(dipole, 2.1, base);
    const verdict = toleranceVerdict(gain, study);
    expect(verdict.sensitive).toBe(true);
    expect(verdict.words).toMatch(/SWR does not hold as built/);
    expect(verdict.words).toMatch(/after the recommended feed/);
  });

  it("uses the same seeded copies as the gain study, so the same seed gives the same numbers", () => {
    const a = toleranceSwrStudy(dipole, freqs, base, 2);
    const b = toleranceSwrStudy(dipole, freqs, base, 2);
    expect(a).toEqual(b);
  });
});
