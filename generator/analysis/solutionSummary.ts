// The figures every analysis reports (the JSON contract of `analyze --json` and of `design --json`),
// in the units a person reads (degrees). Pure, so the browser designer reports the same fields.
import { SOLVER_VERSION, type Solution } from "../em/index.js";
import { DEG_PER_RAD } from "../units.js";

export function solutionSummary(solution: Solution) {
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
    warnings: solution.warnings,
  };
}

export type SolutionSummary = ReturnType<typeof solutionSummary>;
