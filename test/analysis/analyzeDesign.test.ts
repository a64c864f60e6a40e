// The full analysis of a design: sweep definitions (realized gain per IEEE Std 145-2013:
// G_r = G(1 − |Γ|²)), the tolerance study's determinism and its zero-spread limit, and the match
// suggestion re-computed through the band sweep.
import { describe, expect, it } from "vitest";
import { analyzeDesign, type AnalysisOptions } from "../../generator/analysis/index.js";
import { toleranceStudy } from "../../generator/analysis/tolerance.js";
import { vee } from "../helpers/shapes.js";
import { InputError } from "../../generator/errors.js";

const shape = vee(1.5, 55, 1e-3);
const f0 = shape.frequencyHz;
const options: AnalysisOptions = {
  bandHz: [0.99 * f0, 1.01 * f0],
  lineImpedanceOhm: 50,
  tolerance: { samples: 16, bendSigmaDeg: 2, lengthSigmaFraction: 0.005, seed: 5 },
};

describe("analyzeDesign", () => {
  const a = analyzeDesign(shape, options);

  it("sweeps at least 11 frequencies inside the band plus a margin each side", () => {
    const inside = a.sweep.points.filter((p) => p.inBand);
    expect(inside.length).toBeGreaterThanOrEqual(11);
    expect(inside[0].frequencyHz).toBe(options.bandHz[0]);
    expect(inside.at(-1)!.frequencyHz).toBe(options.bandHz[1]);
    expect(a.sweep.points[0].frequencyHz).toBeLessThan(options.bandHz[0]);
    expect(a.sweep.points.at(-1)!.frequencyHz).toBeGreaterThan(options.bandHz[1]);
  });

  it("realized gain is gain plus 10·log10(1 − |Γ|²) (IEEE Std 145-2013)", () => {
    for (const p of a.sweep.points) {
      const g = (p.swr - 1) / (p.swr + 1);
      expect(p.realizedGainDbi).toBeCloseTo(p.gainDbi + 10 * Math.log10(1 - g * g), 9);
    }
  });

  it("suggests two L-networks that bring the SWR to 1 at the design frequency, and always the balun", () => {
    expect(a.match.needed).toBe(true);
    expect(a.match.networks).toHaveLength(2);
    const mid = a.sweep.points.filter((p) => p.inBand).findIndex((p) => Math.abs(p.frequencyHz - f0) < 1);
    for (const n of a.match.networks) expect(n.bandSwr[mid]).toBeCloseTo(1, 6);
    expect(a.match.balunNote).toMatch(/1:1 current balun/);
  });

  it("tolerance study: same seed, same numbers; zero σ gives zero spread", () => {
    const again = analyzeDesign(shape, options);
    expect(again.tolerance).toEqual(a.tolerance);
    // the study runs on the starting mesh and compares with that mesh's own nominal gain
    const zero = toleranceStudy(shape, a.tolerance.nominalGainDbi, { samples: 8, bendSigmaDeg: 0, lengthSigmaFraction: 0, seed: 1, lineImpedanceOhm: 50 });
    expect(zero.gainDbi.p95 - zero.gainDbi.p5).toBe(0);
    expect(zero.swr.p95 - zero.swr.p5).toBe(0);
    expect(zero.gainDbi.p50).toBeCloseTo(a.tolerance.nominalGainDbi, 9);
    expect(Math.abs(a.tolerance.nominalGainDbi - a.design.gainDbi)).toBeLessThan(0.05);
    expect(zero.fragile).toBe(false);
  });

  it("bend errors spread the gain, and the spread grows with σ", () => {
    const small = toleranceStudy(shape, a.design.gainDbi, { samples: 24, bendSigmaDeg: 1, lengthSigmaFraction: 0.002, seed: 2, lineImpedanceOhm: 50 });
    const large = toleranceStudy(shape, a.design.gainDbi, { samples: 24, bendSigmaDeg: 8, lengthSigmaFraction: 0.02, seed: 2, lineImpedanceOhm: 50 });
    expect(large.swr.p95 - large.swr.p5).toBeGreaterThan(small.swr.p95 - small.swr.p5);
  });

  it("reports trust figures: segment convergence and energy balance", () => {
    // published mesh and the one before it (analysis/converged.ts doubles from 25 per λ)
    const [published, before] = a.checks.segmentsPerWavelength;
    expect(published).toBe(2 * before);
    expect(before).toBeGreaterThanOrEqual(25);
    expect(Math.abs(a.checks.gainChangeDb)).toBe(a.design.uncertainty.gainDb);
    expect(Math.abs(a.checks.gainChangeDb)).toBeLessThan(0.01);
    expect(a.checks.energyBalanceError).toBeLessThan(1e-3);
  });

  it("describes the lobe of a V in words: toward its open end (the tips), in the wire's plane", () => {
    // a V's main lobe lies along its bisector toward the open end (common practice)
    expect(a.pattern.words.lobe).toMatch(/^The main lobe points toward the arm tips, .*, in the plane of the wire/);
    expect(a.pattern.gridDbi).toHaveLength(37);
    expect(a.pattern.gridDbi[0]).toHaveLength(36);
  });

  it("refuses a band without the design frequency, a negative line impedance and zero samples", () => {
    const bad: AnalysisOptions[] = [
      { ...options, bandHz: [2 * f0, 3 * f0] },
      { ...options, lineImpedanceOhm: -50 },
      { ...options, tolerance: { ...options.tolerance, samples: 0 } },
    ];
    for (const o of bad) expect(() => analyzeDesign(shape, o)).toThrow(InputError);
  });
});
