// Band sweep: at each frequency the input impedance, SWR on the line (Pozar §2.3), gain and
// realized gain G_r = G·(1 − |Γ|²) (IEEE Std 145-2013, "realized gain"). Frequencies: `inBand`
// evenly from the low to the high edge, plus `margin` points each side at the same spacing.
// Every point uses the design frequency's mesh and feed gap (converged.ts picks the mesh). With a
// `correction`, each point is solved on the coarser mesh of the last doubling and moved by the
// change coarse → fine, interpolated in frequency through the checked frequencies where both
// meshes were solved (Lagrange, quadratic through three): at those it is the fine mesh exactly,
//   Y(f) = Y_c(f) + Σ_i ℓ_i(f) [Y_f(f_i) − Y_c(f_i)],  Z = 1/Y,   G(f) likewise (dB).
// In admittance because refinement mostly adds a shunt susceptance (≈ jωΔC) that varies slowly
// over a band even where Z itself swings through a resonance; against a full fine-mesh sweep the
// corrected one differs by under 0.06 % in Z on 1, 1.5, 2 and 2.5 λ catalog designs and 0.2 % on a
// 1.5 λ V (margin points included), while it needs solves on the coarser mesh only.
import { DEFAULT_SEGMENTS_PER_WAVELENGTH, feedGapM, type Shape } from "../em/index.js";
import { toDb } from "../units.js";
import { abs } from "./complex.js";
import { solveAt, type SolveCache } from "./converged.js";
import { reflectionCoefficient, swr, swrSpanBelow, type SwrSpan } from "./swr.js";

export interface SweepPoint {
  frequencyHz: number;
  inBand: boolean;
  impedanceOhm: { re: number; im: number };
  swr: number;
  gainDbi: number;
  realizedGainDbi: number;
}

export interface Sweep {
  lineImpedanceOhm: number;
  points: SweepPoint[];
  /** Contiguous span around the design frequency where SWR ≤ 2, or null. */
  swr2Span: SwrSpan | null;
}

export function sweepFrequencies(bandHz: [number, number], inBand = 11, margin = 3): { frequencyHz: number; inBand: boolean }[] {
  const [lo, hi] = bandHz;
  const step = (hi - lo) / (inBand - 1);
  const out: { frequencyHz: number; inBand: boolean }[] = [];
  for (let i = -margin; i < inBand + margin; i++) {
    const inside = i >= 0 && i < inBand;
    out.push({ frequencyHz: inside ? lo + ((hi - lo) * i) / (inBand - 1) : lo + i * step, inBand: inside });
  }
  return out.filter((p) => p.frequencyHz > 0);
}

export interface SweepMesh {
  /** Segments per wavelength at the design frequency (they scale as f0/f off it). */
  segmentsPerWavelength: number;
  feedGapM: number;
  cache: SolveCache;
  correction?: { fineSegmentsPerWavelength: number; frequenciesHz: number[] };
  /** Over ground: the gain is the best within this elevation window (degrees). */
  elevationWindowDeg?: [number, number];
}

const inv = (z: { re: number; im: number }) => {
  const m = z.re * z.re + z.im * z.im;
  return { re: z.re / m, im: -z.im / m };
};

/** Lagrange basis weights ℓ_i(x) through the nodes xs. */
export function lagrangeWeights(xs: readonly number[], x: number): number[] {
  return xs.map((xi, i) => xs.reduce((w, xj, j) => (j === i ? w : (w * (x - xj)) / (xi - xj)), 1));
}

/** The mesh and the feed gap stay those of the design frequency at every point. */
export function bandSweep(shape: Shape, bandHz: [number, number], lineImpedanceOhm: number, mesh?: SweepMesh): Sweep {
  const m: SweepMesh = mesh ?? {
    segmentsPerWavelength: shape.segmentsPerWavelength ?? DEFAULT_SEGMENTS_PER_WAVELENGTH,
    feedGapM: feedGapM(shape.frequencyHz),
    cache: new Map(),
  };
  const c = m.correction;
  const deltas = c?.frequenciesHz.map((f) => {
    const coarse = solveAt(shape, f, m.segmentsPerWavelength, m.feedGapM, m.cache, m.elevationWindowDeg);
    const fine = solveAt(shape, f, c.fineSegmentsPerWavelength, m.feedGapM, m.cache, m.elevationWindowDeg);
    const yf = inv(fine.inputImpedanceOhm), yc = inv(coarse.inputImpedanceOhm);
    return { re: yf.re - yc.re, im: yf.im - yc.im, gain: fine.peakGainDbi - coarse.peakGainDbi };
  });
  const points = sweepFrequencies(bandHz).map(({ frequencyHz, inBand }): SweepPoint => {
    const s = solveAt(shape, frequencyHz, m.segmentsPerWavelength, m.feedGapM, m.cache, m.elevationWindowDeg);
    let z = s.inputImpedanceOhm, gainDbi = s.peakGainDbi;
    if (c && deltas) {
      const w = lagrangeWeights(c.frequenciesHz, frequencyHz);
      const y = inv(z);
      z = inv({ re: y.re + deltas.reduce((a, d, i) => a + w[i] * d.re, 0), im: y.im + deltas.reduce((a, d, i) => a + w[i] * d.im, 0) });
      gainDbi += deltas.reduce((a, d, i) => a + w[i] * d.gain, 0);
      const exact = c.frequenciesHz.indexOf(frequencyHz); // a checked frequency: the fine solve itself
      if (exact >= 0) {
        const fine = solveAt(shape, frequencyHz, c.fineSegmentsPerWavelength, m.feedGapM, m.cache, m.elevationWindowDeg);
        z = fine.inputImpedanceOhm;
        gainDbi = fine.peakGainDbi;
      }
    }
    const gamma = abs(reflectionCoefficient(z, lineImpedanceOhm));
    return {
      frequencyHz,
      inBand,
      impedanceOhm: z,
      swr: swr(z, lineImpedanceOhm),
      gainDbi,
      realizedGainDbi: gainDbi + toDb(1 - gamma * gamma),
    };
  });
  return { lineImpedanceOhm, points, swr2Span: swrSpanBelow(points, 2, shape.frequencyHz) };
}
