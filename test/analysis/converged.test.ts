// Converged figures (generator/analysis/converged.ts, sweep.ts): the ladder stops where two doublings in a
// row each move gain < 0.01 dB and impedance < 1 %, the published figures are those of the finest mesh, a
// fixed mesh is solved exactly, and the corrected sweep matches a sweep solved on the finest mesh.
import { describe, expect, it } from "vitest";
import { analyzeDesign, bandCheckFrequencies, refineMesh, type AnalysisOptions } from "../../generator/analysis/index.js";
import { meshChange, refinementCap, solveAt } from "../../generator/analysis/converged.js";
import { bandSweep } from "../../generator/analysis/sweep.js";
import { solveShape } from "../../generator/em/index.js";
import { straightDipole, vee } from "../helpers/shapes.js";

const shape = vee(1.5, 55, 1e-3);
const f0 = shape.frequencyHz;
const band: [number, number] = [0.99 * f0, 1.01 * f0];
const options: AnalysisOptions = { bandHz: band, lineImpedanceOhm: 50, tolerance: { samples: 4, bendSigmaDeg: 2, lengthSigmaFraction: 0.005, seed: 5 } };

describe("mesh refinement", () => {
  const cache = new Map();
  const r = refineMesh(shape, { checkFrequenciesHz: bandCheckFrequencies(band) }, cache);

  it("stops after the first two doublings in a row that meet both thresholds, at every checked frequency", () => {
    const small = (c: number) => [f0, ...bandCheckFrequencies(band)].every((f) => {
      const m = meshChange(solveAt(shape, f, c / 2, r.feedGapM, cache), solveAt(shape, f, c, r.feedGapM, cache));
      return Math.abs(m.gainDb) < 0.01 && m.impedanceFraction < 0.01;
    });
    expect(r.converged).toBe(true);
    expect(Math.abs(r.change.gainDb)).toBeLessThan(0.01);
    expect(r.change.impedanceFraction).toBeLessThan(0.01);
    const c = r.comparedWithSegmentsPerWavelength;
    expect(c).toBeGreaterThanOrEqual(50); // two doublings from 25 at least
    expect(small(r.segmentsPerWavelength)).toBe(true);
    expect(small(c)).toBe(true); // the doubling before met them too
    if (c / 2 > 25) expect(small(c / 2)).toBe(false); // and the ladder did not run on past a pair
  });

  it("publishes the finest mesh: the design figures equal a single solve there", () => {
    const a = analyzeDesign(shape, options);
    const s = solveShape(shape, { segmentsPerWavelength: r.segmentsPerWavelength });
    expect(a.design.gainDbi).toBe(s.peakGainDbi);
    expect(a.design.inputImpedanceOhm).toEqual(s.inputImpedanceOhm);
    expect(a.design.uncertainty.segmentsPerWavelength).toBe(r.segmentsPerWavelength);
  });

  it("--segments-per-wavelength fixes one mesh: no refinement, figures of that mesh", () => {
    const a = analyzeDesign(shape, { ...options, segmentsPerWavelength: 30 });
    expect(a.design.uncertainty.segmentsPerWavelength).toBe(30);
    expect(a.design.inputImpedanceOhm).toEqual(solveShape(shape, { segmentsPerWavelength: 30 }).inputImpedanceOhm);
  });

  it("caps the ladder at 200 per λ and at segments of 4 wire radii, with one doubling always", () => {
    expect(refinementCap(straightDipole(1, 1e-4), 25)).toBe(200);
    expect(refinementCap(straightDipole(1, 3.2e-3), 25)).toBe(50); // λ/(4a) = 78 per λ
  });
});

describe("converged band sweep", () => {
  it("matches a sweep solved wholly on the finest mesh to 0.5 % in impedance (half the 1 % aim) and 0.001 dB in gain", () => {
    const a = analyzeDesign(shape, options);
    const full = bandSweep(shape, band, 50, { segmentsPerWavelength: a.design.uncertainty.segmentsPerWavelength, feedGapM: a.design.feedGapM, cache: new Map() });
    a.sweep.points.forEach((p, i) => {
      const q = full.points[i];
      expect(p.frequencyHz).toBe(q.frequencyHz);
      const dz = Math.hypot(p.impedanceOhm.re - q.impedanceOhm.re, p.impedanceOhm.im - q.impedanceOhm.im);
      expect(dz / Math.hypot(q.impedanceOhm.re, q.impedanceOhm.im)).toBeLessThan(5e-3); // 0.18 % at worst here
      expect(Math.abs(p.gainDbi - q.gainDbi)).toBeLessThan(1e-3);
    });
  });
});
