// Planes about which the radiation intensity U(r̂) is mirror-symmetric, derived from the solved
// currents themselves (no assumption about how a shape is laid out). For a plane with unit normal m,
// the mirror of a direction is r̂' = r̂ − 2(r̂·m)m whatever the plane's offset (the offset only adds
// a common phase to the far field). Two cases:
//   - the wire plane: every segment lies in one plane, so N = ∫J e^{jk r̂·r} dl is an in-plane vector
//     and r̂'·r differs from r̂·r by a constant; hence |N⊥(r̂')| = |N⊥(r̂)| for any currents;
//   - a mirror plane of the structure and its currents: every segment has a mirror twin carrying
//     the mirrored current times one common factor (±1 for the even and odd modes of a symmetric
//     feed); then N(r̂') is the mirror of N(r̂) times that factor and U(r̂') = U(r̂).
// Candidate normals: the principal axes of the length-weighted segment midpoints (a mirror plane
// of a point set passes through its centroid and is normal to a principal axis) and the x, y, z
// axes (for shapes whose principal axes are degenerate, e.g. a straight wire).
import { eigenSymmetric } from "../optimize/eigenSymmetric.js";
import type { FarFieldPlan } from "./farField.js";

export type V3 = [number, number, number];

export interface SymmetryPlane {
  /** Unit normal. */
  normal: V3;
  /** "wire": all the wire lies in this plane; "mirror": the structure and its currents mirror about it. */
  kind: "wire" | "mirror";
}

const dot = (a: readonly number[], b: readonly number[]) => a[0] * b[0] + a[1] * b[1] + a[2] * b[2];

/** Mirror image of a direction about the plane with unit normal m. */
export function mirrorDirection(d: readonly number[], m: readonly number[]): V3 {
  const t = 2 * dot(d, m);
  return [d[0] - t * m[0], d[1] - t * m[1], d[2] - t * m[2]];
}

export function symmetryPlanes(plan: FarFieldPlan): SymmetryPlane[] {
  const ns = plan.segStartNode.length;
  if (ns === 0) return [];
  const xyz = plan.nodeXyz;
  const mid = new Float64Array(3 * ns);
  const len = new Float64Array(ns);
  let total = 0;
  const c = [0, 0, 0];
  for (let s = 0; s < ns; s++) {
    const a = plan.segStartNode[s], b = plan.segEndNode[s];
    len[s] = Math.hypot(plan.segVec[3 * s], plan.segVec[3 * s + 1], plan.segVec[3 * s + 2]);
    for (let k = 0; k < 3; k++) {
      mid[3 * s + k] = 0.5 * (xyz[3 * a + k] + xyz[3 * b + k]);
      c[k] += len[s] * mid[3 * s + k];
    }
    total += len[s];
  }
  for (let k = 0; k < 3; k++) c[k] /= total;
  const cov = [[0, 0, 0], [0, 0, 0], [0, 0, 0]];
  let size = 0;
  for (let s = 0; s < ns; s++) {
    const r = [mid[3 * s] - c[0], mid[3 * s + 1] - c[1], mid[3 * s + 2] - c[2]];
    size = Math.max(size, Math.hypot(r[0], r[1], r[2]) + len[s]);
    for (let i = 0; i < 3; i++) for (let j = 0; j < 3; j++) cov[i][j] += len[s] * r[i] * r[j];
  }
  const eig = eigenSymmetric(cov);
  const candidates: V3[] = [];
  const push = (v: V3) => {
    const l = Math.hypot(v[0], v[1], v[2]);
    if (!(l > 0)) return;
    const u: V3 = [v[0] / l, v[1] / l, v[2] / l];
    if (candidates.every((w) => Math.abs(dot(w, u)) < 1 - 1e-9)) candidates.push(u);
  };
  for (let k = 0; k < 3; k++) push([eig.vectors[0][k], eig.vectors[1][k], eig.vectors[2][k]]);
  push([1, 0, 0]); push([0, 1, 0]); push([0, 0, 1]);

  const tol = 1e-6 * size; // stored coordinates carry about 7 significant digits
  let maxI = 0;
  for (let i = 0; i < plan.segCurrent.length; i++) maxI = Math.max(maxI, Math.abs(plan.segCurrent[i]));
  const planes: SymmetryPlane[] = [];
  for (const m of candidates) {
    let inPlane = true;
    for (let s = 0; s < ns && inPlane; s++) {
      const a = plan.segStartNode[s], b = plan.segEndNode[s];
      for (const n of [a, b]) {
        const d = (xyz[3 * n] - c[0]) * m[0] + (xyz[3 * n + 1] - c[1]) * m[1] + (xyz[3 * n + 2] - c[2]) * m[2];
        if (Math.abs(d) > tol) { inPlane = false; break; }
      }
    }
    if (inPlane) planes.push({ normal: m, kind: "wire" });
    // a search aid, so near-symmetry is enough (rounded coordinates leave ~1e-4 of asymmetry)
    else if (mirrorsCurrents(plan, m, c, mid, len, tol, 1e-3 * maxI)) planes.push({ normal: m, kind: "mirror" });
  }
  return planes;
}

/** Whether each segment has a mirror twin carrying the mirrored current times one common factor. */
function mirrorsCurrents(
  plan: FarFieldPlan, m: V3, c: number[], mid: Float64Array, len: Float64Array, tol: number, currentTol: number,
): boolean {
  const ns = len.length;
  const I = plan.segCurrent;
  // the twin's end currents, in the order of the mirrored segment (ends swap when it runs the other way)
  const twinCurrent = new Float64Array(4 * ns);
  for (let s = 0; s < ns; s++) {
    const r = [mid[3 * s] - c[0], mid[3 * s + 1] - c[1], mid[3 * s + 2] - c[2]];
    const target = mirrorDirection(r, m);
    let t = 0;
    for (; t < ns; t++) {
      if (Math.abs(len[t] - len[s]) > tol) continue;
      if (Math.hypot(mid[3 * t] - c[0] - target[0], mid[3 * t + 1] - c[1] - target[1], mid[3 * t + 2] - c[2] - target[2]) <= tol) break;
    }
    if (t === ns) return false;
    const v = mirrorDirection([plan.segVec[3 * s], plan.segVec[3 * s + 1], plan.segVec[3 * s + 2]], m);
    const same = dot(v, [plan.segVec[3 * t], plan.segVec[3 * t + 1], plan.segVec[3 * t + 2]]) > 0;
    twinCurrent.set(same ? [I[4 * t], I[4 * t + 1], I[4 * t + 2], I[4 * t + 3]] : [-I[4 * t + 2], -I[4 * t + 3], -I[4 * t], -I[4 * t + 1]], 4 * s);
  }
  // the common factor, from the largest current (twin = factor × own)
  let big = 0;
  for (let e = 0; e < 2 * ns; e++) if (Math.hypot(I[2 * e], I[2 * e + 1]) > Math.hypot(I[2 * big], I[2 * big + 1])) big = e;
  const ar = I[2 * big], ai = I[2 * big + 1], br = twinCurrent[2 * big], bi = twinCurrent[2 * big + 1];
  const a2 = ar * ar + ai * ai;
  if (!(a2 > 0)) return true; // no current: nothing radiates
  const fr = (br * ar + bi * ai) / a2, fi = (bi * ar - br * ai) / a2;
  for (let e = 0; e < 2 * ns; e++) {
    const xr = I[2 * e], xi = I[2 * e + 1];
    if (Math.hypot(fr * xr - fi * xi - twinCurrent[2 * e], fr * xi + fi * xr - twinCurrent[2 * e + 1]) > currentTol) return false;
  }
  return true;
}
