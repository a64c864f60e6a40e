// Scores one bent-arm parameter vector for the optimizer (smaller is better):
//   geometry infeasible      → 1000 + violation          (no solve)
//   direct-feed, SWR too high → 100 + (SWR_max − limit)  (Deb 2000: any feasible beats any infeasible)
//   feasible                  → −G_peak (dBi)
// `max-gain` maximises peak gain in any direction at the design frequency. `direct-feed` does the
// same subject to SWR ≤ limit against the line impedance at every checked frequency of the band,
// so the shape needs no matching network. The band is solved on the design frequency's mesh (fixed
// across the band, like a published fixed-mesh sweep), by matrix interpolation when it is at most 8 %
// wide (em/frequencyInterpolation.ts).
import { swr as swrOf } from "../analysis/swr.js";
import { bandImpedances } from "../em/frequencyInterpolation.js";
import { solveShape, type Shape } from "../em/index.js";
import { InputError } from "../errors.js";
import { MountingError } from "../shapes/mounting.js";
import { toShape, unpack, type BentArmSpec } from "../shapes/bentArm.js";
import { constraintViolation } from "../shapes/constraints.js";
import { wavelengthM } from "../units.js";
import { bandOf, limitsOf, type DesignRequest } from "./request.js";
import { groundedShape, objectiveSolveOptions } from "./groundObjective.js";

export const GEOMETRY_PENALTY = 1000;
export const SWR_PENALTY = 100;

export interface Evaluation {
  score: number;
  gainDbi: number | null;
  maxSwr: number | null;
  reasons: string[];
}

/**
 * A shape that met every constraint: solved, and within the SWR limit where there is one. Not
 * `score < 0`: over ground the gain in a narrow elevation window can be below 0 dBi, so −G > 0.
 */
export const isFeasible = (e: Evaluation): boolean => e.gainDbi !== null && e.reasons.length === 0;

export function specOf(r: DesignRequest): BentArmSpec {
  return { piecesPerArm: r.piecesPerArm, wireLengthM: r.lengthWl * wavelengthM(r.frequencyHz) };
}

export function shapeOf(x: readonly number[], r: DesignRequest, frequencyHz = r.frequencyHz): Shape {
  return groundedShape(toShape(unpack(x, r.piecesPerArm), specOf(r), {
    frequencyHz,
    wireRadiusM: r.wireDiameterM / 2,
    conductor: r.conductor,
    segmentsPerWavelength: r.segmentsPerWavelength,
  }), r); // over ground: mounted as the request says
}

export { swr as swrOf } from "../analysis/swr.js";

/** Frequencies at which a direct-feed design's SWR is checked: `count` evenly across the band. */
export function checkFrequencies(r: DesignRequest, count: number): number[] {
  const [lo, hi] = bandOf(r);
  return Array.from({ length: count }, (_, i) => lo + ((hi - lo) * i) / (count - 1));
}

export function evaluate(x: readonly number[], r: DesignRequest, swrFrequenciesHz: number[], swrLimit: number): Evaluation {
  const violation = constraintViolation(unpack(x, r.piecesPerArm), specOf(r), limitsOf(r), wavelengthM(r.frequencyHz), r.wireDiameterM / 2);
  if (violation.total > 0) return { score: GEOMETRY_PENALTY + violation.total, gainDbi: null, maxSwr: null, reasons: violation.reasons };
  try {
    const solution = solveShape(shapeOf(x, r), objectiveSolveOptions(r)); // over ground: peak in the objective's window
    const gainDbi = solution.peakGainDbi;
    if (r.variant === "max-gain") return { score: -gainDbi, gainDbi, maxSwr: null, reasons: [] };
    // the other frequencies on the design frequency's mesh, interpolated where the band is narrow
    const others = swrFrequenciesHz.filter((f) => f !== r.frequencyHz);
    const zs = [...bandImpedances(shapeOf(x, r), others), ...(others.length < swrFrequenciesHz.length ? [solution.inputImpedanceOhm] : [])];
    let maxSwr = 0;
    for (const z of zs) maxSwr = Math.max(maxSwr, swrOf(z, r.lineImpedanceOhm));
    if (maxSwr > swrLimit) {
      const excess = Number.isFinite(maxSwr) ? maxSwr - swrLimit : 1e3;
      return { score: SWR_PENALTY + excess, gainDbi, maxSwr, reasons: [`SWR reaches ${maxSwr.toFixed(2)} in the band, above ${swrLimit}`] };
    }
    return { score: -gainDbi, gainDbi, maxSwr, reasons: [] };
  } catch (err) {
    // a mounting shortfall grows with its size (in wavelengths), so the search can walk back from it
    if (err instanceof MountingError) return { score: GEOMETRY_PENALTY + 1 + err.shortfallM / wavelengthM(r.frequencyHz), gainDbi: null, maxSwr: null, reasons: [err.message] };
    if (err instanceof InputError) return { score: GEOMETRY_PENALTY + 1, gainDbi: null, maxSwr: null, reasons: [err.message] };
    throw err;
  }
}
