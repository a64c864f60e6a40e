// Half-power beamwidth of a shape in the cut through its peak that is narrower (the E-plane of a
// straight dipole), as used by the reference checks.
import { halfPowerBeamwidthDeg, principalCuts } from "../analysis/patternFigures.js";
import { solveShape, type Shape } from "../em/index.js";

export function frontHalfPowerBeamwidthDeg(shape: Shape): number {
  const s = solveShape(shape);
  const cuts = principalCuts(s.peakDirectionRad.theta, s.peakDirectionRad.phi);
  const widths = [halfPowerBeamwidthDeg(s.farField, cuts.alongTheta), halfPowerBeamwidthDeg(s.farField, cuts.alongPhi)];
  return Math.min(...widths.filter((w): w is number => w !== null));
}
