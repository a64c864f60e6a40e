// Tolerance study: what a hand-bent copy really does. Monte Carlo (seeded) over independent errors
// at every vertex and piece of every wire, walking outward from the feed (or from a free end of an
// unfed wire): each vertex adds a bend error ε ~ N(0, σ_angle) that turns everything beyond it, each
// piece is scaled by (1 + δ), δ ~ N(0, σ_length). Turns are about z (the normal of a catalog shape's
// plane), or about x for a piece along z. Reported: the 5th, 50th and 95th percentiles (linear
// interpolation between order statistics, Hyndman & Fan 1996 definition 7) of gain and SWR; a design
// is fragile when its 5th-percentile gain falls more than 0.5 dB below nominal.
// Each copy's peak search is warm-started from the nominal shape's distinct maxima and their mirror
// images (a copy's lobe is close to one of them, but the two mirror-twin lobes of a symmetric shape
// swap places as the copy's errors tip the balance, so both twins are starts).
import { InputError } from "../errors.js";
import { solveShape, type Shape, type Vec3 } from "../em/index.js";
import { DEFAULT_PEAK_OPTIONS, type Direction } from "../em/pattern.js";
import { createRng, type Rng } from "../optimize/rng.js";
import { RAD_PER_DEG } from "../units.js";
import { swr } from "./swr.js";

export interface ToleranceOptions {
  samples: number;
  bendSigmaDeg: number;
  lengthSigmaFraction: number;
  seed: number;
  lineImpedanceOhm: number;
  /** Over ground: each copy's gain is the best within this elevation window (degrees). */
  elevationWindowDeg?: [number, number];
}

export const DEFAULT_TOLERANCE: ToleranceOptions = { samples: 64, bendSigmaDeg: 2, lengthSigmaFraction: 0.005, seed: 1, lineImpedanceOhm: 50 };
export const FRAGILE_DROP_DB = 0.5;

export interface Percentiles {
  p5: number;
  p50: number;
  p95: number;
}

export interface ToleranceStudy {
  samples: number;
  failedSamples: number;
  bendSigmaDeg: number;
  lengthSigmaFraction: number;
  seed: number;
  nominalGainDbi: number;
  gainDbi: Percentiles;
  swr: Percentiles;
  fragile: boolean;
}

export function percentile(sorted: readonly number[], q: number): number {
  const h = (sorted.length - 1) * q;
  const lo = Math.floor(h);
  const hi = Math.min(sorted.length - 1, lo + 1);
  return sorted[lo] + (h - lo) * (sorted[hi] - sorted[lo]);
}

const percentiles = (values: number[]): Percentiles => {
  const s = [...values].sort((a, b) => a - b);
  return { p5: percentile(s, 0.05), p50: percentile(s, 0.5), p95: percentile(s, 0.95) };
};

/** Rebuilds a chain of vertices from its start with perturbed turns and lengths. */
function perturbChain(points: Vec3[], rng: Rng, o: ToleranceOptions): Vec3[] {
  const out: Vec3[] = [points[0]];
  let turn = 0;
  for (let i = 1; i < points.length; i++) {
    const d: Vec3 = [0, 1, 2].map((c) => points[i][c] - points[i - 1][c]) as Vec3;
    turn += rng.normal() * o.bendSigmaDeg * RAD_PER_DEG;
    const scale = 1 + rng.normal() * o.lengthSigmaFraction;
    const c = Math.cos(turn), s = Math.sin(turn);
    const alongZ = Math.hypot(d[0], d[1]) < 1e-9 * Math.abs(d[2]);
    const r: Vec3 = alongZ ? [d[0], c * d[1] - s * d[2], s * d[1] + c * d[2]] : [c * d[0] - s * d[1], s * d[0] + c * d[1], d[2]];
    const p = out[i - 1];
    out.push([p[0] + scale * r[0], p[1] + scale * r[1], p[2] + scale * r[2]]);
  }
  return out;
}

export function perturbShape(shape: Shape, rng: Rng, o: ToleranceOptions): Shape {
  const wires = shape.wires.map((wire, w) => {
    if (w !== shape.feed.wire) return { ...wire, pointsM: perturbChain(wire.pointsM, rng, o) };
    const f = shape.feed.vertex;
    const right = perturbChain(wire.pointsM.slice(f), rng, o);
    const left = perturbChain(wire.pointsM.slice(0, f + 1).reverse(), rng, o);
    return { ...wire, pointsM: [...left.reverse(), ...right.slice(1)] };
  });
  return { ...shape, wires };
}

/**
 * peakStarts: the nominal shape's peak maxima (findPeak(...).maxima) for a warm-started peak search
 * in every copy; without them each copy searches the whole sphere.
 */
export function toleranceStudy(shape: Shape, nominalGainDbi: number, options: ToleranceOptions, peakStarts?: readonly Direction[]): ToleranceStudy {
  if (!(Number.isInteger(options.samples) && options.samples > 0)) {
    throw new InputError(`tolerance: samples must be a whole number above 0 (got ${options.samples})`);
  }
  if (!(options.bendSigmaDeg >= 0) || !(options.lengthSigmaFraction >= 0)) {
    throw new InputError("tolerance: the error spreads (σ) must be 0 or more");
  }
  const rng = createRng(options.seed);
  const gains: number[] = [];
  const swrs: number[] = [];
  let failed = 0;
  for (let i = 0; i < options.samples; i++) {
    const copy = perturbShape(shape, rng, options);
    try {
      const window = options.elevationWindowDeg ? { elevationWindowDeg: options.elevationWindowDeg, energyBalance: false } : {};
      const s = solveShape(copy, { ...window, ...(peakStarts?.length ? { peak: { ...DEFAULT_PEAK_OPTIONS, starts: peakStarts } } : {}) });
      gains.push(s.peakGainDbi);
      swrs.push(swr(s.inputImpedanceOhm, options.lineImpedanceOhm));
    } catch (err) {
      if (!(err instanceof InputError)) throw err;
      failed++; // the bent copy touched itself: counted, not solved
    }
  }
  const gainDbi = gains.length ? percentiles(gains) : { p5: NaN, p50: NaN, p95: NaN };
  return {
    samples: options.samples,
    failedSamples: failed,
    bendSigmaDeg: options.bendSigmaDeg,
    lengthSigmaFraction: options.lengthSigmaFraction,
    seed: options.seed,
    nominalGainDbi,
    gainDbi,
    swr: swrs.length ? percentiles(swrs) : { p5: NaN, p50: NaN, p95: NaN },
    fragile: !(gainDbi.p5 >= nominalGainDbi - FRAGILE_DROP_DB),
  };
}
