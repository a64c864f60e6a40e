// The bent-arm family: a centre-fed wire whose two arms are mirror images in the x–y plane, each
// made of K straight pieces. The right arm leaves the feed (origin) at angle φ1 from the +y symmetry
// axis, turning by β_i at each bend (positive turns toward +x, i.e. clockwise seen from +z); piece
// lengths ℓ_1…ℓ_K sum to half the wire. Free parameters, 2K − 1 in all:
//   x = [φ1, β_1 … β_{K−1}, u_1 … u_{K−1}],   u_i = ℓ_i / (L/2),  ℓ_K = (L/2)(1 − Σu_i).
// Vertices of the right arm: p_0 = 0, p_i = p_{i−1} + ℓ_i (sin ψ_i, cos ψ_i, 0), ψ_1 = φ1,
// ψ_i = ψ_{i−1} + β_{i−1}. The left arm is (x, y) → (−x, y). Lengths in metres, angles in radians.
import type { Shape, Vec3 } from "../em/index.js";

export interface BentArmSpec {
  piecesPerArm: number;
  /** Whole wire length, tip to tip along the wire (m). */
  wireLengthM: number;
}

export interface BentArmParameters {
  firstAngleRad: number;
  bendAnglesRad: number[];
  /** Free piece lengths as fractions of half the wire (K − 1 of them). */
  pieceFractions: number[];
}

export const parameterCount = (piecesPerArm: number): number => 2 * piecesPerArm - 1;

export function unpack(x: readonly number[], piecesPerArm: number): BentArmParameters {
  const k = piecesPerArm;
  return { firstAngleRad: x[0], bendAnglesRad: x.slice(1, k), pieceFractions: x.slice(k, 2 * k - 1) };
}

export function pack(p: BentArmParameters): number[] {
  return [p.firstAngleRad, ...p.bendAnglesRad, ...p.pieceFractions];
}

/** Piece lengths ℓ_1…ℓ_K of one arm (m); the last may come out ≤ 0 for infeasible fractions. */
export function pieceLengthsM(p: BentArmParameters, spec: BentArmSpec): number[] {
  const half = spec.wireLengthM / 2;
  const free = p.pieceFractions.map((u) => u * half);
  return [...free, half - free.reduce((s, v) => s + v, 0)];
}

/** Right-arm vertices from the feed outward, p_0 = origin. */
export function rightArmM(p: BentArmParameters, spec: BentArmSpec): Vec3[] {
  const lengths = pieceLengthsM(p, spec);
  const points: Vec3[] = [[0, 0, 0]];
  let psi = p.firstAngleRad;
  lengths.forEach((len, i) => {
    if (i > 0) psi += p.bendAnglesRad[i - 1];
    const [x, y] = points[i];
    points.push([x + len * Math.sin(psi), y + len * Math.cos(psi), 0]);
  });
  return points;
}

/** The whole wire as one polyline from the left tip through the feed to the right tip. */
export function wirePointsM(p: BentArmParameters, spec: BentArmSpec): Vec3[] {
  const right = rightArmM(p, spec);
  const left = right.slice(1).reverse().map(([x, y, z]): Vec3 => [x === 0 ? 0 : -x, y, z]);
  return [...left, ...right];
}

export interface ShapeContext {
  frequencyHz: number;
  wireRadiusM: number;
  conductor: Shape["conductor"];
  segmentsPerWavelength?: number;
  name?: string;
}

export function toShape(p: BentArmParameters, spec: BentArmSpec, ctx: ShapeContext): Shape {
  const shape: Shape = {
    frequencyHz: ctx.frequencyHz,
    wireRadiusM: ctx.wireRadiusM,
    conductor: ctx.conductor,
    wires: [{ pointsM: wirePointsM(p, spec) }],
    feed: { wire: 0, vertex: spec.piecesPerArm },
  };
  if (ctx.name !== undefined) shape.name = ctx.name;
  if (ctx.segmentsPerWavelength !== undefined) shape.segmentsPerWavelength = ctx.segmentsPerWavelength;
  return shape;
}

/** Reads the parameters back from a bent-arm shape (the right arm, after the feed vertex). */
export function fromShape(shape: Shape): { params: BentArmParameters; spec: BentArmSpec } {
  const points = shape.wires[0].pointsM;
  const k = shape.feed.vertex;
  const right = points.slice(k);
  const lengths: number[] = [];
  const headings: number[] = [];
  for (let i = 1; i < right.length; i++) {
    const dx = right[i][0] - right[i - 1][0];
    const dy = right[i][1] - right[i - 1][1];
    lengths.push(Math.hypot(dx, dy));
    headings.push(Math.atan2(dx, dy));
  }
  const half = lengths.reduce((s, v) => s + v, 0);
  const bends = headings.slice(1).map((h, i) => {
    let b = h - headings[i];
    while (b > Math.PI) b -= 2 * Math.PI;
    while (b <= -Math.PI) b += 2 * Math.PI;
    return b;
  });
  return {
    params: { firstAngleRad: headings[0], bendAnglesRad: bends, pieceFractions: lengths.slice(0, -1).map((l) => l / half) },
    spec: { piecesPerArm: k, wireLengthM: 2 * half },
  };
}

/**
 * The same shape with one more piece per arm: the last piece split in two equal halves with a 0°
 * bend between them. A search for K + 1 pieces started here can only improve on K.
 */
export function addPiece(x: readonly number[], piecesPerArm: number): number[] {
  const p = unpack(x, piecesPerArm);
  const last = 1 - p.pieceFractions.reduce((s, u) => s + u, 0);
  return pack({ firstAngleRad: p.firstAngleRad, bendAnglesRad: [...p.bendAnglesRad, 0], pieceFractions: [...p.pieceFractions, last / 2] });
}
