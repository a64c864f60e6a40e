// What keeps a bent-arm shape buildable and inside the thin-wire model, with the defaults' reasons.
//   minPieceWl = 0.05 λ: a piece must hold the solver's 3 segments at ≥ 4 radii each for wires up
//     to 4e-3 λ radius, and be long enough (≥ 10 cm on 2 m) to bend and measure by hand.
//   minClearanceWl = 0.02 λ (and ≥ 10 wire diameters): non-touching pieces closer than that form a
//     short transmission line whose coupling the thin-wire kernel models poorly, and a hand-bent
//     copy with 2° errors would change the gap by a large fraction.
//   minArmAngleRad = 30°: the two arms at the feed need room for the feed gap and balun and stop
//     acting as a two-wire line.
//   maxBendRad = 150°: a sharper hairpin folds the wire back on itself and cannot be bent
//     repeatably.
// The violation is a sum of normalised shortfalls (0 when all hold), so an optimizer can follow it
// back into the feasible region (Deb, "An efficient constraint handling method for genetic
// algorithms", CMAME 186, 2000: feasible beats infeasible, less violation beats more).
import { segmentDistanceM } from "../geometry.js";
import { lengthText } from "../lengthText.js";
import { RAD_PER_DEG } from "../units.js";
import { pieceLengthsM, wirePointsM, type BentArmParameters, type BentArmSpec } from "./bentArm.js";

export interface BentArmLimits {
  minPieceWl: number;
  minClearanceWl: number;
  minClearanceDiameters: number;
  minArmAngleRad: number;
  maxBendRad: number;
}

export const DEFAULT_LIMITS: BentArmLimits = {
  minPieceWl: 0.05,
  minClearanceWl: 0.02,
  minClearanceDiameters: 10,
  minArmAngleRad: 30 * RAD_PER_DEG,
  maxBendRad: 150 * RAD_PER_DEG,
};

export interface Violation {
  total: number;
  reasons: string[];
}

export function minClearanceM(limits: BentArmLimits, wavelengthM: number, wireRadiusM: number): number {
  return Math.max(limits.minClearanceWl * wavelengthM, limits.minClearanceDiameters * 2 * wireRadiusM);
}

export function constraintViolation(
  p: BentArmParameters,
  spec: BentArmSpec,
  limits: BentArmLimits,
  wavelengthM: number,
  wireRadiusM: number,
): Violation {
  const reasons: string[] = [];
  let total = 0;
  const minPieceM = limits.minPieceWl * wavelengthM;
  pieceLengthsM(p, spec).forEach((len, i) => {
    if (len < minPieceM) {
      total += (minPieceM - len) / wavelengthM;
      reasons.push(
        `piece ${i + 1} of each arm (counted from the feed) is ${pair(len, minPieceM, wavelengthM)}, ${lengthText(minPieceM - len)} short of the minimum ${lengthText(minPieceM)} (${limits.minPieceWl} λ) a piece needs to be bent by hand and modelled; try fewer pieces per arm or a longer wire`,
      );
    }
  });
  const armAngle = 2 * p.firstAngleRad;
  if (armAngle < limits.minArmAngleRad) {
    total += limits.minArmAngleRad - armAngle;
    const minDeg = limits.minArmAngleRad / RAD_PER_DEG, deg = armAngle / RAD_PER_DEG;
    reasons.push(`the arms meet at ${deg.toFixed(1)}° at the feed, ${degText(minDeg - deg)} under the ${minDeg.toFixed(0)}° that leaves room for the feed and balun; open the arms wider`);
  }
  p.bendAnglesRad.forEach((b, i) => {
    if (Math.abs(b) > limits.maxBendRad) {
      total += Math.abs(b) - limits.maxBendRad;
      const maxDeg = limits.maxBendRad / RAD_PER_DEG, deg = b / RAD_PER_DEG;
      reasons.push(`bend ${i + 1} of each arm (counted from the feed) turns ${deg.toFixed(1)}°, ${degText(Math.abs(deg) - maxDeg)} beyond the ±${maxDeg.toFixed(0)}° that can be bent repeatably (a sharper turn folds the wire back on itself); try fewer pieces per arm`);
    }
  });
  if (total > 0) return { total, reasons }; // clearance is meaningless for a malformed shape
  const points = wirePointsM(p, spec);
  const clearanceM = minClearanceM(limits, wavelengthM, wireRadiusM);
  for (let i = 0; i + 1 < points.length; i++) {
    for (let j = i + 2; j + 1 < points.length; j++) {
      const d = segmentDistanceM(points[i], points[i + 1], points[j], points[j + 1]);
      if (d < clearanceM) {
        total += (clearanceM - d) / wavelengthM;
        reasons.push(
          `pieces ${i + 1} and ${j + 1} (counted from one tip to the other) come within ${pair(d, clearanceM, wavelengthM)} of each other, ${lengthText(clearanceM - d)} closer than the ${lengthText(clearanceM)} clearance that keeps them from coupling like a feed line; try fewer pieces per arm or a shorter wire`,
        );
      }
    }
  }
  return { total, reasons };
}

/** "x mm (y λ)", with λ digits enough to tell the value from the limit it is compared with. */
function pair(valueM: number, limitM: number, wavelengthM: number): string {
  const gap = Math.abs(limitM - valueM) / wavelengthM;
  const decimals = Math.min(9, Math.max(3, Math.ceil(-Math.log10(gap))));
  return `${lengthText(valueM)} (${(valueM / wavelengthM).toFixed(decimals)} λ)`;
}

const degText = (deg: number): string => `${deg >= 0.1 ? deg.toFixed(1) : deg.toPrecision(2)}°`;

/** Box bounds of x = [φ1, β…, u…] that no feasible shape lies outside of. */
export function parameterBounds(spec: BentArmSpec, limits: BentArmLimits, wavelengthM: number): { lower: number[]; upper: number[] } {
  const k = spec.piecesPerArm;
  const minFraction = (limits.minPieceWl * wavelengthM) / (spec.wireLengthM / 2);
  const lower = [limits.minArmAngleRad / 2];
  const upper = [Math.PI / 2]; // φ1 > 90° mirrors a shape with φ1 < 90° (y → −y, β → −β)
  for (let i = 1; i < k; i++) { lower.push(-limits.maxBendRad); upper.push(limits.maxBendRad); }
  for (let i = 1; i < k; i++) { lower.push(minFraction); upper.push(Math.max(minFraction, 1 - (k - 1) * minFraction)); }
  return { lower, upper };
}
