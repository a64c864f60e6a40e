// The off-centre-fed bent-wire family: one wire of length L in the x–y plane, fed at a point that
// need not be its middle, so the two arms differ in length and in their bends. The feed sits at the
// origin; the right arm leaves it at heading +φ1 from the +y axis, the left arm at −φ1 (the apex
// angle at the feed is 2φ1, bisected by +y), and each arm then turns at its own bends. Each arm has
// K straight pieces. Free parameters, 4K − 2 in all:
//   x = [t, φ1, βR_1 … βR_{K−1}, uR_1 … uR_{K−1}, βL_1 … βL_{K−1}, uL_1 … uL_{K−1}]
//   t      = left-arm length / L, the feed's distance from the left tip as a fraction of the wire;
//            the right arm is (1 − t)L. t ≤ ½ loses nothing: swapping the arms is a mirror image.
//   β      = turns at the bends, positive turning away from the +y axis (toward +x on the right
//            arm, toward −x on the left arm), so equal right and left parameters with t = ½ give
//            the mirror-symmetric bent-arm shape of bentArm.ts.
//   u      = free piece lengths as fractions of their arm; the arm's last piece takes the rest.
// Vertices of the right arm: p_0 = 0, p_i = p_{i−1} + ℓ_i (sin ψ_i, cos ψ_i, 0), ψ_1 = φ1,
// ψ_i = ψ_{i−1} + β_{i−1}; the left arm is built the same way with x → −x. The polyline runs from
// the left tip through the feed (vertex K) to the right tip. Lengths in metres, angles in radians.
// Box (offCentreBounds in offCentreConstraints.ts): t ∈ [K·ℓ_min/L, ½], φ1 ∈ [α_min/2, π/2],
// β ∈ [−β_max, β_max], u ∈ [ℓ_min/arm, 1 − (K−1)ℓ_min/arm] with arm the shorter arm's length.
import type { Shape, Vec3 } from "../em/index.js";
import type { ShapeContext } from "./bentArm.js";

export interface OffCentreSpec {
  piecesPerArm: number;
  /** Whole wire length, tip to tip along the wire (m). */
  wireLengthM: number;
}

export interface ArmParameters {
  bendAnglesRad: number[];
  /** Free piece lengths as fractions of this arm (K − 1 of them). */
  pieceFractions: number[];
}

export interface OffCentreParameters {
  /** Feed position: distance from the left tip as a fraction of the wire, 0 < t ≤ ½. */
  feedFraction: number;
  /** Half the apex angle at the feed, from the +y axis to each arm's first piece. */
  halfApexRad: number;
  right: ArmParameters;
  left: ArmParameters;
}

export const offCentreParameterCount = (piecesPerArm: number): number => 4 * piecesPerArm - 2;

export function unpackOffCentre(x: readonly number[], piecesPerArm: number): OffCentreParameters {
  const m = piecesPerArm - 1;
  const arm = (at: number): ArmParameters => ({ bendAnglesRad: x.slice(at, at + m), pieceFractions: x.slice(at + m, at + 2 * m) });
  return { feedFraction: x[0], halfApexRad: x[1], right: arm(2), left: arm(2 + 2 * m) };
}

export function packOffCentre(p: OffCentreParameters): number[] {
  return [p.feedFraction, p.halfApexRad, ...p.right.bendAnglesRad, ...p.right.pieceFractions, ...p.left.bendAnglesRad, ...p.left.pieceFractions];
}

/**
 * The centre-fed parameters [φ1, β…, u…] as an off-centre vector: feed in the middle (t = ½) and
 * both arms alike; at t = ½ each arm is half the wire, so the fractions carry over unchanged.
 */
export function mirrorAsOffCentre(x: readonly number[], piecesPerArm: number): number[] {
  const arm = x.slice(1, 2 * piecesPerArm - 1);
  return [0.5, x[0], ...arm, ...arm];
}

/**
 * The same shape with one more piece on each arm: each arm's last piece split in two equal halves
 * with a 0° bend between them (as addPiece in bentArm.ts does for the mirror family).
 */
export function addPieceOffCentre(x: readonly number[], piecesPerArm: number): number[] {
  const p = unpackOffCentre(x, piecesPerArm);
  const split = (a: ArmParameters): ArmParameters => {
    const last = 1 - a.pieceFractions.reduce((s, u) => s + u, 0);
    return { bendAnglesRad: [...a.bendAnglesRad, 0], pieceFractions: [...a.pieceFractions, last / 2] };
  };
  return packOffCentre({ ...p, right: split(p.right), left: split(p.left) });
}

/** Arm lengths (m): left = tL, right = (1 − t)L. */
export function armLengthsM(p: OffCentreParameters, spec: OffCentreSpec): { leftM: number; rightM: number } {
  return { leftM: p.feedFraction * spec.wireLengthM, rightM: (1 - p.feedFraction) * spec.wireLengthM };
}

/** Piece lengths of one arm from the feed outward (m); the last may be ≤ 0 for infeasible fractions. */
export function armPieceLengthsM(arm: ArmParameters, armLengthM: number): number[] {
  const free = arm.pieceFractions.map((u) => u * armLengthM);
  return [...free, armLengthM - free.reduce((s, v) => s + v, 0)];
}

/** One arm's vertices from the feed outward; side +1 is the right arm, −1 the left. */
export function armPointsM(arm: ArmParameters, armLengthM: number, halfApexRad: number, side: 1 | -1): Vec3[] {
  const points: Vec3[] = [[0, 0, 0]];
  let psi = halfApexRad;
  armPieceLengthsM(arm, armLengthM).forEach((len, i) => {
    if (i > 0) psi += arm.bendAnglesRad[i - 1];
    const [x, y] = points[i];
    points.push([x + side * len * Math.sin(psi), y + len * Math.cos(psi), 0]);
  });
  return points;
}

/** The whole wire from the left tip through the feed (vertex K) to the right tip. */
export function offCentrePointsM(p: OffCentreParameters, spec: OffCentreSpec): Vec3[] {
  const { leftM, rightM } = armLengthsM(p, spec);
  const right = armPointsM(p.right, rightM, p.halfApexRad, 1);
  const left = armPointsM(p.left, leftM, p.halfApexRad, -1);
  return [...left.slice(1).reverse(), ...right];
}

export function offCentreShape(p: OffCentreParameters, spec: OffCentreSpec, ctx: ShapeContext): Shape {
  const shape: Shape = {
    frequencyHz: ctx.frequencyHz,
    wireRadiusM: ctx.wireRadiusM,
    conductor: ctx.conductor,
    wires: [{ pointsM: offCentrePointsM(p, spec) }],
    feed: { wire: 0, vertex: spec.piecesPerArm },
  };
  if (ctx.name !== undefined) shape.name = ctx.name;
  if (ctx.segmentsPerWavelength !== undefined) shape.segmentsPerWavelength = ctx.segmentsPerWavelength;
  return shape;
}

const wrap = (a: number): number => {
  let b = a;
  while (b > Math.PI) b -= 2 * Math.PI;
  while (b <= -Math.PI) b += 2 * Math.PI;
  return b;
};

/** Reads one arm (feed outward) back: length, first heading from +y (away from the axis), bends, fractions. */
function readArm(points: readonly Vec3[], side: 1 | -1): { lengthM: number; firstRad: number; arm: ArmParameters } {
  const lengths: number[] = [];
  const headings: number[] = [];
  for (let i = 1; i < points.length; i++) {
    const dx = side * (points[i][0] - points[i - 1][0]);
    const dy = points[i][1] - points[i - 1][1];
    lengths.push(Math.hypot(dx, dy));
    headings.push(Math.atan2(dx, dy));
  }
  const lengthM = lengths.reduce((s, v) => s + v, 0);
  return {
    lengthM,
    firstRad: headings[0],
    arm: { bendAnglesRad: headings.slice(1).map((h, i) => wrap(h - headings[i])), pieceFractions: lengths.slice(0, -1).map((l) => l / lengthM) },
  };
}

/**
 * Reads the parameters back from an off-centre shape in the frame offCentreShape builds (feed at the
 * origin, apex bisected by +y). The half apex angle is taken from the right arm.
 */
export function offCentreFromShape(shape: Shape): { params: OffCentreParameters; spec: OffCentreSpec } {
  const points = shape.wires[0].pointsM;
  const k = shape.feed.vertex;
  if (points.length - 1 - k !== k) throw new Error(`off-centre shape: both arms must have ${k} pieces (got ${k} and ${points.length - 1 - k})`);
  const right = readArm(points.slice(k), 1);
  const left = readArm(points.slice(0, k + 1).reverse(), -1);
  const wireLengthM = right.lengthM + left.lengthM;
  return {
    params: { feedFraction: left.lengthM / wireLengthM, halfApexRad: right.firstRad, right: right.arm, left: left.arm },
    spec: { piecesPerArm: k, wireLengthM },
  };
}
