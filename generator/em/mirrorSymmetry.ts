// Mirror symmetry of a mesh about the y–z plane (x → −x), found from the mesh itself. The reflection
// M = diag(−1, 1, 1) maps each segment s onto a segment s' = M(s), kept in the same or the reverse
// direction; a rooftop basis b then maps onto a basis P(b) with a sign σ_b (−1 when its segments
// are reversed: M f_b(M r) = σ_b f_{P(b)}(r)). For a reciprocal, mirror-invariant structure the
// Galerkin matrix obeys Z_{P(m),P(n)} = σ_m σ_n Z_{mn} (the moment integrals are invariant under a
// rigid isometry; Harrington, Field Computation by Moment Methods, 1968, on symmetric structures).
// Match test: segment ends within TOLERANCE × the mesh extent, equal length and radius (relative
// TOLERANCE); anything else is "not symmetric" and callers take the general path.
import type { Mesh } from "./mesh.js";

export const MIRROR_TOLERANCE = 1e-11;

export interface MirrorSymmetry {
  /** M(s) for every segment. */
  segment: Int32Array;
  /** True where M(s) runs opposite to s. */
  reversed: Uint8Array;
  /** P(b) for every basis function. */
  basis: Int32Array;
  /** σ_b = ±1. */
  sign: Int8Array;
}

export function detectMirrorSymmetry(mesh: Mesh): MirrorSymmetry | null {
  const ns = mesh.segmentCount;
  const { start, dir, lengthM, radiusM } = mesh;
  let extent = 0;
  for (let i = 0; i < 3 * ns; i++) extent = Math.max(extent, Math.abs(start[i]));
  for (let s = 0; s < ns; s++) extent = Math.max(extent, lengthM[s]);
  const tol = MIRROR_TOLERANCE * extent;
  const end = (s: number, c: number) => start[3 * s + c] + dir[3 * s + c] * lengthM[s];
  const near = (ax: number, ay: number, az: number, bx: number, by: number, bz: number) =>
    Math.abs(ax - bx) <= tol && Math.abs(ay - by) <= tol && Math.abs(az - bz) <= tol;
  const segment = new Int32Array(ns).fill(-1);
  const reversed = new Uint8Array(ns);
  for (let s = 0; s < ns; s++) {
    const sx = -start[3 * s], sy = start[3 * s + 1], sz = start[3 * s + 2]; // M(start)
    const ex = -end(s, 0), ey = end(s, 1), ez = end(s, 2); // M(end)
    for (let t = 0; t < ns && segment[s] < 0; t++) {
      const same = Math.abs(lengthM[t] - lengthM[s]) <= MIRROR_TOLERANCE * lengthM[s] && Math.abs(radiusM[t] - radiusM[s]) <= MIRROR_TOLERANCE * radiusM[s];
      if (!same) continue;
      const tx = start[3 * t], ty = start[3 * t + 1], tz = start[3 * t + 2];
      const ux = end(t, 0), uy = end(t, 1), uz = end(t, 2);
      if (near(tx, ty, tz, sx, sy, sz) && near(ux, uy, uz, ex, ey, ez)) segment[s] = t;
      else if (near(tx, ty, tz, ex, ey, ez) && near(ux, uy, uz, sx, sy, sz)) { segment[s] = t; reversed[s] = 1; }
    }
    if (segment[s] < 0) return null;
  }
  const basis = new Int32Array(mesh.unknowns).fill(-1);
  const sign = new Int8Array(mesh.unknowns);
  // the rising half of b (segment A, node at its end) maps onto A' = M(A): onto its rising half if
  // A' keeps the direction, onto its falling half (σ = −1) if reversed; the falling half likewise
  const assign = (b: number, image: number, sg: number): boolean => {
    if (image < 0) return false;
    if (basis[b] >= 0) return basis[b] === image && sign[b] === sg;
    basis[b] = image; sign[b] = sg;
    return true;
  };
  for (let s = 0; s < ns; s++) {
    const t = segment[s], rev = reversed[s] === 1;
    const rising = mesh.basisAtEnd[s], falling = mesh.basisAtStart[s];
    if (rising >= 0 && !assign(rising, rev ? mesh.basisAtStart[t] : mesh.basisAtEnd[t], rev ? -1 : 1)) return null;
    if (falling >= 0 && !assign(falling, rev ? mesh.basisAtEnd[t] : mesh.basisAtStart[t], rev ? -1 : 1)) return null;
  }
  for (let b = 0; b < mesh.unknowns; b++) if (basis[b] < 0 || basis[basis[b]] !== b) return null;
  return { segment, reversed, basis, sign };
}
