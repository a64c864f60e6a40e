// Double integrals of the reduced thin-wire kernel over a pair of straight segments p and q:
//   K_ab = ∫_p ∫_q t^a t'^b · e^{−jkR}/R dl' dl,  a, b ∈ {0, 1},  R = √(|r − r'|² + a_pa_q),
// with t, t' ∈ [0, 1] the fractional positions along p and q (Gibson, The Method of Moments in
// Electromagnetics, 2nd ed., ch. 4 on thin wires; the reduced kernel is his eq. for the
// "approximate kernel"). The 1/(4π) is applied by the caller.
// Far pairs: Gauss–Legendre in both variables, fewer points as the pair moves apart.
// Near pairs (self, touching, next-but-one): the kernel is split into
//   (e^{−jkR} − 1)/R  (smooth: Gauss–Legendre)  +  1/R  (inner integral in closed form),
//   ∫_0^L ds/√((s−s0)²+ρ²) = asinh((L−s0)/ρ) + asinh(s0/ρ),
//   ∫_0^L s ds/√((s−s0)²+ρ²) = √((L−s0)²+ρ²) − √(s0²+ρ²) + s0·∫_0^L ds/√(…),
// with the outer integral by Gauss–Legendre, taken as the mean of p-outer and q-outer.
// Optionally (KernelRules.exactNear, off by default) collinear near pairs (a segment with itself and
// its neighbours on one straight run) get the exact-kernel correction of exactKernel.ts added to the
// static part: the ring-averaged surface kernel instead of the reduced one.
import { addCollinearCorrection } from "./exactKernel.js";
import { gaussLegendre01, type GaussRule } from "./gaussLegendre.js";
import type { Mesh } from "./mesh.js";

export interface KernelRules {
  far: GaussRule[]; // indexed by number of points
  nearOuter: GaussRule;
  nearSmooth: GaussRule;
  /** Exact (ring-averaged) static kernel on collinear near pairs; false (default): the reduced kernel throughout. Off by default: it moved impedances ~1 % on thick wires but did not cure the mesh creep (the wire ends did), and its graded quadrature is not yet mirror-exact (1e-7). */
  exactNear: boolean;
}

export function createKernelRules(exactNear = false): KernelRules {
  const far: GaussRule[] = [];
  for (let n = 1; n <= 6; n++) far[n] = gaussLegendre01(n);
  return { far, nearOuter: gaussLegendre01(10), nearSmooth: gaussLegendre01(4), exactNear };
}

/** The rules every solve uses: a table of constants, computed once rather than per matrix fill. */
export const KERNEL_RULES: Readonly<KernelRules> = createKernelRules();

/** Centre distance / longer length below which a pair is "near" (static part in closed form). */
export const NEAR_RATIO = 2.1;
const RATIO_TIE = 1e-9;

/**
 * True when pairIntegrals treats (p, q) as near. Near pairs integrate p by Gauss–Legendre and q in
 * closed form, so (p, q) and (q, p) differ at the quadrature-error level; far pairs are a tensor
 * rule, the same either way up to rounding.
 */
export function isNearPair(mesh: Mesh, p: number, q: number): boolean {
  const { start, dir, lengthM } = mesh;
  let d2 = 0;
  for (let c = 0; c < 3; c++) {
    const d = start[3 * p + c] + 0.5 * dir[3 * p + c] * lengthM[p] - start[3 * q + c] - 0.5 * dir[3 * q + c] * lengthM[q];
    d2 += d * d;
  }
  return Math.sqrt(d2) / Math.max(lengthM[p], lengthM[q]) < NEAR_RATIO;
}

/** Out: [K00re, K00im, K10re, K10im, K01re, K01im, K11re, K11im] for segments p, q. */
export function pairIntegrals(
  mesh: Mesh,
  p: number,
  q: number,
  kRadPerM: number,
  rules: KernelRules,
  out: Float64Array,
): void {
  const { start, dir, lengthM } = mesh;
  const lp = lengthM[p];
  const lq = lengthM[q];
  const a2 = mesh.radiusM[p] * mesh.radiusM[q];
  const px = start[3 * p], py = start[3 * p + 1], pz = start[3 * p + 2];
  const qx = start[3 * q], qy = start[3 * q + 1], qz = start[3 * q + 2];
  const upx = dir[3 * p] * lp, upy = dir[3 * p + 1] * lp, upz = dir[3 * p + 2] * lp;
  const uqx = dir[3 * q] * lq, uqy = dir[3 * q + 1] * lq, uqz = dir[3 * q + 2] * lq;
  // centre distance decides the treatment
  const cx = px + 0.5 * upx - qx - 0.5 * uqx;
  const cy = py + 0.5 * upy - qy - 0.5 * uqy;
  const cz = pz + 0.5 * upz - qz - 0.5 * uqz;
  const ratio = Math.sqrt(cx * cx + cy * cy + cz * cz) / Math.max(lp, lq);
  out.fill(0);
  if (ratio < NEAR_RATIO) {
    // the closed-form inner integral makes the two roles differ at the quadrature-error level: use
    // the mean of both orders so Z_mn = Z_nm and mirror images agree whatever the segment numbering
    nearPair(px, py, pz, upx, upy, upz, qx, qy, qz, uqx, uqy, uqz, lp, lq, a2, kRadPerM, rules, out);
    const swapped = new Float64Array(8);
    nearPair(qx, qy, qz, uqx, uqy, uqz, px, py, pz, upx, upy, upz, lq, lp, a2, kRadPerM, rules, swapped);
    for (let i = 0; i < 8; i++) {
      const j = i === 2 || i === 3 ? i + 2 : i === 4 || i === 5 ? i - 2 : i; // K10(q,p) = K01(p,q)
      out[i] = 0.5 * (out[i] + swapped[j]);
    }
    if (rules.exactNear) collinearCorrection(mesh, p, q, Math.sqrt(a2), out);
    return;
  }
  // segments n apart on a straight piece sit at ratio n exactly: the small margin keeps such ties on
  // the finer rule whatever the rounding, so mirror-image pairs get the same rule
  const rule = rules.far[ratio < 5 + RATIO_TIE ? 4 : ratio < 10 + RATIO_TIE ? 3 : 2];
  smoothPart(px, py, pz, upx, upy, upz, qx, qy, qz, uqx, uqy, uqz, a2, kRadPerM, rule, false, out);
  const scale = lp * lq;
  for (let i = 0; i < 8; i++) out[i] *= scale;
}

/** Gauss–Legendre over t and t' of e^{−jkR}/R, or of (e^{−jkR} − 1)/R when `subtractStatic`. */
function smoothPart(
  px: number, py: number, pz: number, upx: number, upy: number, upz: number,
  qx: number, qy: number, qz: number, uqx: number, uqy: number, uqz: number,
  a2: number, k: number, rule: GaussRule, subtractStatic: boolean, out: Float64Array,
): void {
  const { t, w } = rule;
  const n = t.length;
  for (let i = 0; i < n; i++) {
    const ti = t[i];
    const rx = px + ti * upx - qx, ry = py + ti * upy - qy, rz = pz + ti * upz - qz;
    let s0r = 0, s0i = 0, s1r = 0, s1i = 0; // Σ_j w_j g, Σ_j w_j t'_j g
    for (let j = 0; j < n; j++) {
      const tj = t[j];
      const dx = rx - tj * uqx, dy = ry - tj * uqy, dz = rz - tj * uqz;
      const r = Math.sqrt(dx * dx + dy * dy + dz * dz + a2);
      const kr = k * r;
      const sh = Math.sin(0.5 * kr);
      // e^{−jkR} − 1 = (cos kR − 1) − j sin kR, with cos kR − 1 = −2 sin²(kR/2) for accuracy
      const gr = (subtractStatic ? -2 * sh * sh : Math.cos(kr)) / r;
      const gi = -Math.sin(kr) / r;
      const wj = w[j];
      s0r += wj * gr; s0i += wj * gi;
      s1r += wj * tj * gr; s1i += wj * tj * gi;
    }
    const wi = w[i];
    out[0] += wi * s0r; out[1] += wi * s0i;
    out[2] += wi * ti * s0r; out[3] += wi * ti * s0i;
    out[4] += wi * s1r; out[5] += wi * s1i;
    out[6] += wi * ti * s1r; out[7] += wi * ti * s1i;
  }
}

function nearPair(
  px: number, py: number, pz: number, upx: number, upy: number, upz: number,
  qx: number, qy: number, qz: number, uqx: number, uqy: number, uqz: number,
  lp: number, lq: number, a2: number, k: number, rules: KernelRules, out: Float64Array,
): void {
  smoothPart(px, py, pz, upx, upy, upz, qx, qy, qz, uqx, uqy, uqz, a2, k, rules.nearSmooth, true, out);
  // static part 1/R: closed-form inner integral over q, Gauss–Legendre outer over p
  const ex = uqx / lq, ey = uqy / lq, ez = uqz / lq;
  const { t, w } = rules.nearOuter;
  let i0 = 0, i1 = 0, i2 = 0, i3 = 0;
  for (let i = 0; i < t.length; i++) {
    const ti = t[i];
    const dx = px + ti * upx - qx, dy = py + ti * upy - qy, dz = pz + ti * upz - qz;
    const s0 = dx * ex + dy * ey + dz * ez;
    // ρ⊥² = |d × ê|², not |d|² − s0²: no cancellation for collinear neighbours (ρ⊥ ≈ 0)
    const cx = dy * ez - dz * ey, cy = dz * ex - dx * ez, cz = dx * ey - dy * ex;
    const rho2 = cx * cx + cy * cy + cz * cz + a2;
    const rho = Math.sqrt(rho2);
    const f0 = Math.asinh((lq - s0) / rho) + Math.asinh(s0 / rho); // ∫ ds / R
    const f1 = Math.sqrt((lq - s0) ** 2 + rho2) - Math.sqrt(s0 * s0 + rho2) + s0 * f0; // ∫ s ds / R
    const g0 = f0 / lq; // ∫ dt' / R
    const g1 = f1 / (lq * lq); // ∫ t' dt' / R
    const wi = w[i];
    i0 += wi * g0;
    i1 += wi * ti * g0;
    i2 += wi * g1;
    i3 += wi * ti * g1;
  }
  out[0] += i0; out[2] += i1; out[4] += i2; out[6] += i3;
  const scale = lp * lq;
  for (let i = 0; i < 8; i++) out[i] *= scale;
}

/** Adds the exact-kernel correction when q lies on p's axis (parallel or antiparallel). */
function collinearCorrection(mesh: Mesh, p: number, q: number, radiusM: number, out: Float64Array): void {
  const { start, dir, lengthM } = mesh;
  const ex = dir[3 * p], ey = dir[3 * p + 1], ez = dir[3 * p + 2];
  const fx = dir[3 * q], fy = dir[3 * q + 1], fz = dir[3 * q + 2];
  const cross = Math.hypot(ey * fz - ez * fy, ez * fx - ex * fz, ex * fy - ey * fx);
  if (cross > COLLINEAR_TOLERANCE) return;
  const dx = start[3 * q] - start[3 * p], dy = start[3 * q + 1] - start[3 * p + 1], dz = start[3 * q + 2] - start[3 * p + 2];
  const q0 = dx * ex + dy * ey + dz * ez;
  const off = Math.hypot(dy * ez - dz * ey, dz * ex - dx * ez, dx * ey - dy * ex);
  if (off > COLLINEAR_TOLERANCE * Math.max(lengthM[p], lengthM[q])) return;
  const sense = ex * fx + ey * fy + ez * fz > 0 ? 1 : -1;
  addCollinearCorrection(lengthM[p], q0, sense, lengthM[q], radiusM, out);
}

/** Direction and offset tolerance (relative) for treating two segments as on one axis. */
const COLLINEAR_TOLERANCE = 1e-9;
