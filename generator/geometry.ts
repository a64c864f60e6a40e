// Small vector geometry shared by the solver's checks and the shape constraints.
import type { Vec3 } from "./em/shapeFile.js";

/**
 * Smallest distance between segments [a0, a1] and [b0, b1] (closest points of two segments,
 * clamped to their ends; Eberly, "Distance between two line segments", Geometric Tools, 1999).
 */
export function segmentDistanceM(a0: Vec3, a1: Vec3, b0: Vec3, b1: Vec3): number {
  const ux = a1[0] - a0[0], uy = a1[1] - a0[1], uz = a1[2] - a0[2];
  const vx = b1[0] - b0[0], vy = b1[1] - b0[1], vz = b1[2] - b0[2];
  const wx = a0[0] - b0[0], wy = a0[1] - b0[1], wz = a0[2] - b0[2];
  const a = ux * ux + uy * uy + uz * uz, b = ux * vx + uy * vy + uz * vz, c = vx * vx + vy * vy + vz * vz;
  const d = ux * wx + uy * wy + uz * wz, e = vx * wx + vy * wy + vz * wz;
  const den = a * c - b * b;
  let s = den > 1e-14 * a * c ? (b * e - c * d) / den : 0;
  s = Math.min(1, Math.max(0, s));
  let t = (b * s + e) / c;
  if (t < 0) { t = 0; s = Math.min(1, Math.max(0, -d / a)); }
  else if (t > 1) { t = 1; s = Math.min(1, Math.max(0, (b - d) / a)); }
  const x = wx + s * ux - t * vx, y = wy + s * uy - t * vy, z = wz + s * uz - t * vz;
  return Math.sqrt(x * x + y * y + z * z);
}

export const distanceM = (a: Vec3, b: Vec3): number => Math.hypot(a[0] - b[0], a[1] - b[1], a[2] - b[2]);
