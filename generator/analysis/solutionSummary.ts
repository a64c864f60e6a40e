// The figures every analysis reports (the JSON contract of `analyze --json` and of `design --json`),
// in the units a person reads (degrees). Pure, so the browser designer reports the same fields.
import { SOLVER_VERSION, type Solution } from "../em/index.js";
import { DEG_PER_RAD } from "../units.js";
import { uncertaintyOf, type Refinement } from "./converged.js";

export function solutionSummary(solution: Solution, refinement?: Refinement) {
  return {
    solverVersion: SOLVER_VERSION,
    frequencyHz: solution.frequencyHz,
    unknowns: solution.unknowns,
    segments: solution.segments,
    inputImpedanceOhm: solution.inputImpedanceOhm,
    peakGainDbi: solution.peakGainDbi,
    peakDirectivityDbi: solution.peakDirectivityDbi,
    radiationEfficiency: solution.radiationEfficiency,
    peakDirection: {
      thetaDeg: solution.peakDirectionRad.theta * DEG_PER_RAD,
      phiDeg: solution.peakDirectionRad.phi * DEG_PER_RAD,
    },
    energyBalanceError: solution.energyBalanceError,
    feedGapM: solution.feedGapM,
    ...(refinement && { uncertainty: uncertaintyOf(refinement) }),
    warnings: solution.warnings,
    ...groundSummary(solution),
  };
}

export type SolutionSummary = ReturnType<typeof solutionSummary>;

/** The ground figures for --json (absent in free space). */
export function groundSummary(solution: Solution) {
  const g = solution.ground;
  if (!g) return {};
  return {
    ground: g.ground,
    inputPowerW: solution.inputPowerW,
    peakElevationDeg: g.peakElevationDeg,
    peakAzimuthDeg: g.peakAzimuthDeg,
    gainAtElevationDbi: g.gainAtElevationDbi,
    elevationCut: g.elevationCut,
    upperHalfPowerW: g.upperHalfPowerW,
    groundLossW: g.groundLossW,
    lowestPointM: lowestPointM(solution),
  };
}

function lowestPointM(solution: Solution): number {
  const m = solution.mesh;
  let low = Infinity;
  for (let s = 0; s < m.segmentCount; s++) {
    low = Math.min(low, m.start[3 * s + 2], m.start[3 * s + 2] + m.dir[3 * s + 2] * m.lengthM[s]);
  }
  return low;
}

export type GroundSummary = ReturnType<typeof groundSummary>;
