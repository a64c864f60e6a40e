// What keeps an off-centre-fed shape buildable and inside the thin-wire model: the same rules and
// defaults as the centre-fed family (constraints.ts gives each rule's reason) applied to both arms,
// which now differ: every piece of either arm ≥ minPieceWl, the apex at the feed ≥ minArmAngleRad,
// no bend sharper than maxBendRad, non-adjacent pieces apart by the clearance. One rule is new: the
// feed must lie on the wire with room for K pieces on the shorter arm, 0 < t ≤ ½.
// The violation is a sum of normalised shortfalls (Deb, CMAME 186, 2000), 0 when every rule holds.
import { segmentDistanceM } from "../geometry.js";
import { RAD_PER_DEG } from "../units.js";
import { minClearanceM, type BentArmLimits, type Violation } from "./constraints.js";
import { armLengthsM, armPieceLengthsM, offCentrePointsM, type OffCentreParameters, type OffCentreSpec } from "./offCentre.js";

export function offCentreViolation(
  p: OffCentreParameters,
  spec: OffCentreSpec,
  limits: BentArmLimits,
  wavelengthM: number,
  wireRadiusM: number,
): Violation {
  const reasons: string[] = [];
  let total = 0;
  if (p.feedFraction > 0.5) {
    total += p.feedFraction - 0.5;
    reasons.push(`feed at ${p.feedFraction.toFixed(3)} of the wire from the left tip; past the middle, swap the arms (≤ 0.5)`);
  }
  const minPieceM = limits.minPieceWl * wavelengthM;
  const { leftM, rightM } = armLengthsM(p, spec);
  for (const [name, arm, lengthM] of [["right", p.right, rightM], ["left", p.left, leftM]] as const) {
    armPieceLengthsM(arm, lengthM).forEach((len, i) => {
      if (len < minPieceM) {
        total += (minPieceM - len) / wavelengthM;
        reasons.push(`${name} arm piece ${i + 1} is ${(len / wavelengthM).toFixed(3)} λ, under the minimum ${limits.minPieceWl} λ`);
      }
    });
    arm.bendAnglesRad.forEach((b, i) => {
      if (Math.abs(b) > limits.maxBendRad) {
        total += Math.abs(b) - limits.maxBendRad;
        reasons.push(`${name} arm bend ${i + 1} turns ${(b / RAD_PER_DEG).toFixed(1)}°, beyond ±${(limits.maxBendRad / RAD_PER_DEG).toFixed(0)}°`);
      }
    });
  }
  const apex = 2 * p.halfApexRad;
  if (apex < limits.minArmAngleRad) {
    total += limits.minArmAngleRad - apex;
    reasons.push(`arms meet at ${(apex / RAD_PER_DEG).toFixed(1)}°, under the minimum ${(limits.minArmAngleRad / RAD_PER_DEG).toFixed(0)}°`);
  }
  if (apex > 2 * Math.PI - limits.minArmAngleRad) {
    total += apex - (2 * Math.PI - limits.minArmAngleRad);
    reasons.push(`arms meet at ${(apex / RAD_PER_DEG).toFixed(1)}°, folding back past the minimum ${(limits.minArmAngleRad / RAD_PER_DEG).toFixed(0)}° on the other side`);
  }
  if (total > 0) return { total, reasons }; // clearance is meaningless for a malformed shape
  const points = offCentrePointsM(p, spec);
  const clearanceM = minClearanceM(limits, wavelengthM, wireRadiusM);
  for (let i = 0; i + 1 < points.length; i++) {
    for (let j = i + 2; j + 1 < points.length; j++) {
      const d = segmentDistanceM(points[i], points[i + 1], points[j], points[j + 1]);
      if (d < clearanceM) {
        total += (clearanceM - d) / wavelengthM;
        reasons.push(`pieces ${i + 1} and ${j + 1} (left tip to right tip) come within ${(d / wavelengthM).toFixed(3)} λ, under the clearance ${(clearanceM / wavelengthM).toFixed(3)} λ`);
      }
    }
  }
  return { total, reasons };
}

/** Box bounds of x = [t, φ1, βR…, uR…, βL…, uL…] that no feasible shape lies outside of. */
export function offCentreBounds(spec: OffCentreSpec, limits: BentArmLimits, wavelengthM: number): { lower: number[]; upper: number[] } {
  const k = spec.piecesPerArm;
  const minPieceM = limits.minPieceWl * wavelengthM;
  const tMin = Math.min(0.5, (k * minPieceM) / spec.wireLengthM);
  // the shorter arm is at least tMin·L, the longer at most (1 − tMin)·L: fractions inside these
  const minFraction = minPieceM / ((1 - tMin) * spec.wireLengthM);
  const maxFraction = Math.max(minFraction, 1 - ((k - 1) * minPieceM) / ((1 - tMin) * spec.wireLengthM));
  const lower = [tMin, limits.minArmAngleRad / 2];
  const upper = [0.5, Math.PI / 2]; // φ1 > 90° folds both arms below the feed: the y → −y mirror
  for (const _arm of [0, 1]) {
    for (let i = 1; i < k; i++) { lower.push(-limits.maxBendRad); upper.push(limits.maxBendRad); }
    for (let i = 1; i < k; i++) { lower.push(minFraction); upper.push(maxFraction); }
  }
  return { lower, upper };
}
