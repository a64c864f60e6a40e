// Scores one off-centre-fed parameter vector for the optimizer, with the same tiers as the
// centre-fed objective (objective.ts; Deb, CMAME 186, 2000):
//   geometry infeasible       → 1000 + violation          (no solve)
//   direct-feed, SWR too high → 100 + (SWR_max − limit)
//   feasible                  → −G_peak (dBi)
// Over ground the shape is mounted and scored as the centre-fed family's is (groundObjective.ts:
// gain 4πU/P_in, the peak within the objective's elevation window).
import { solveFeed, solveShape, type Shape } from "../em/index.js";
import { InputError } from "../errors.js";
import { MountingError } from "../shapes/mounting.js";
import { offCentreShape, unpackOffCentre, type OffCentreSpec } from "../shapes/offCentre.js";
import { offCentreViolation } from "../shapes/offCentreConstraints.js";
import { wavelengthM } from "../units.js";
import { GEOMETRY_PENALTY, SWR_PENALTY, swrOf, type Evaluation } from "./objective.js";
import { limitsOf, type DesignRequest } from "./request.js";
import { groundedShape, objectiveSolveOptions } from "./groundObjective.js";

export function offCentreSpecOf(r: DesignRequest): OffCentreSpec {
  return { piecesPerArm: r.piecesPerArm, wireLengthM: r.lengthWl * wavelengthM(r.frequencyHz) };
}

export function offCentreShapeOf(x: readonly number[], r: DesignRequest, frequencyHz = r.frequencyHz): Shape {
  return groundedShape(offCentreShape(unpackOffCentre(x, r.piecesPerArm), offCentreSpecOf(r), {
    frequencyHz,
    wireRadiusM: r.wireDiameterM / 2,
    conductor: r.conductor,
    segmentsPerWavelength: r.segmentsPerWavelength,
  }), r); // over ground: mounted as the request says
}

export function evaluateOffCentre(x: readonly number[], r: DesignRequest, swrFrequenciesHz: number[], swrLimit: number): Evaluation {
  const violation = offCentreViolation(unpackOffCentre(x, r.piecesPerArm), offCentreSpecOf(r), limitsOf(r), wavelengthM(r.frequencyHz), r.wireDiameterM / 2);
  if (violation.total > 0) return { score: GEOMETRY_PENALTY + violation.total, gainDbi: null, maxSwr: null, reasons: violation.reasons };
  try {
    const solution = solveShape(offCentreShapeOf(x, r), objectiveSolveOptions(r)); // over ground: peak in the objective's window
    const gainDbi = solution.peakGainDbi;
    if (r.variant === "max-gain") return { score: -gainDbi, gainDbi, maxSwr: null, reasons: [] };
    let maxSwr = 0;
    for (const f of swrFrequenciesHz) {
      const z = f === r.frequencyHz ? solution.inputImpedanceOhm : solveFeed(offCentreShapeOf(x, r, f)).inputImpedanceOhm;
      maxSwr = Math.max(maxSwr, swrOf(z, r.lineImpedanceOhm));
    }
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
