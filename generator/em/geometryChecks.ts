// Thin-wire validity of a mesh. The reduced kernel assumes segments much longer than the wire
// radius and wires that do not come close (Gibson, ch. 4, "thin-wire approximation": error grows
// as L/a falls below a few). Refused: segments shorter than the radius; segments that touch or
// cross (axis distance below the sum of radii). Warned: segments shorter than 4 radii; segments
// closer than 4 radii that do not share a node.
import { InputError } from "../errors.js";
import type { Mesh } from "./mesh.js";

const fmt = (v: number) => Number(v.toPrecision(3));

/** Smallest distance between segments [p0, p0+u] and [q0, q0+v] (Eberly's clamped closest points). */
export function segmentDistance(mesh: Mesh, p: number, q: number): number {
  const s = mesh.start, d = mesh.dir;
  const lp = mesh.lengthM[p], lq = mesh.lengthM[q];
  const ux = d[3 * p] * lp, uy = d[3 * p + 1] * lp, uz = d[3 * p + 2] * lp;
  const vx = d[3 * q] * lq, vy = d[3 * q + 1] * lq, vz = d[3 * q + 2] * lq;
  const wx = s[3 * p] - s[3 * q], wy = s[3 * p + 1] - s[3 * q + 1], wz = s[3 * p + 2] - s[3 * q + 2];
  const a = ux * ux + uy * uy + uz * uz, b = ux * vx + uy * vy + uz * vz, c = vx * vx + vy * vy + vz * vz;
  const dd = ux * wx + uy * wy + uz * wz, e = vx * wx + vy * wy + vz * wz;
  const den = a * c - b * b;
  let sc = den > 1e-14 * a * c ? (b * e - c * dd) / den : 0;
  sc = Math.min(1, Math.max(0, sc));
  let tc = (b * sc + e) / c;
  if (tc < 0) { tc = 0; sc = Math.min(1, Math.max(0, -dd / a)); }
  else if (tc > 1) { tc = 1; sc = Math.min(1, Math.max(0, (b - dd) / a)); }
  const x = wx + sc * ux - tc * vx, y = wy + sc * uy - tc * vy, z = wz + sc * uz - tc * vz;
  return Math.sqrt(x * x + y * y + z * z);
}

const where = (mesh: Mesh, s: number) => `wires[${mesh.wireOf[s]}] piece ${mesh.pieceOf[s]}`;

/** Throws InputError for shapes the solver must refuse; returns warnings for doubtful ones. */
export function checkMesh(mesh: Mesh): string[] {
  const warnings = new Set<string>();
  for (let s = 0; s < mesh.segmentCount; s++) {
    const len = mesh.lengthM[s], a = mesh.radiusM[s];
    if (len < a) {
      throw new InputError(
        `shape: ${where(mesh, s)}: segments of ${fmt(len)} m are shorter than the wire radius ${fmt(a)} m; lengthen the piece or use fewer segments per wavelength`,
      );
    }
    if (len < 4 * a) warnings.add(`${where(mesh, s)}: segments of ${fmt(len)} m are under 4 wire radii; the thin-wire model loses accuracy`);
  }
  for (let p = 0; p < mesh.segmentCount; p++) {
    for (let q = p + 1; q < mesh.segmentCount; q++) {
      const sameWire = mesh.wireOf[p] === mesh.wireOf[q];
      if (sameWire && q === p + 1) continue; // neighbours share a node
      const dist = segmentDistance(mesh, p, q);
      const touch = mesh.radiusM[p] + mesh.radiusM[q];
      if (dist < touch) {
        throw new InputError(
          `shape: ${where(mesh, p)} and ${where(mesh, q)} touch or cross (${fmt(dist)} m apart, wire radii sum to ${fmt(touch)} m); wires must not intersect`,
        );
      }
      if (dist < 2 * touch) {
        warnings.add(`${where(mesh, p)} and ${where(mesh, q)} come within ${fmt(dist)} m, under 4 wire radii; the thin-wire model loses accuracy`);
      }
    }
  }
  return [...warnings];
}
