// Galerkin impedance matrix of the mixed-potential thin-wire EFIE with triangle basis functions
// (Harrington, Field Computation by Moment Methods, 1968, ch. 4; Gibson, ch. 4):
//   Z_mn = jωμ∬ Λm Λn (ŝm·ŝn) G dl dl' + (1/jωε)∬ Λm' Λn' G dl dl',   G = e^{−jkR}/(4πR)
//        = jη/(4π) · [ k (ŝp·ŝq) ∬ fp fq e^{−jkR}/R − (σp σq / k) ∬ e^{−jkR}/R ]  summed over the
// segment halves p ∈ m, q ∈ n, with f = t (rising half, σ = +1/Lp) or 1 − t (falling, σ = −1/Lp).
// Conductor loss adds ∫ Zs Λm Λn dl, Zs = (1+j)/(2πa)·√(ωμ0/2σ) per unit length (skin-effect
// surface impedance of a round wire; Balanis, Antenna Theory, eq. 2-90b), on the diagonal blocks.
// Z is complex symmetric; the fill visits each unordered segment pair once.
import { ETA0_OHM, MU0_H_PER_M } from "../units.js";
import { createComplexMatrix, type ComplexMatrix } from "./complexLu.js";
import { KERNEL_RULES, pairIntegrals, type KernelRules } from "./kernel.js";
import type { Mesh } from "./mesh.js";

export function fillImpedance(
  mesh: Mesh,
  kRadPerM: number,
  rules: KernelRules = KERNEL_RULES,
): ComplexMatrix {
  const z = createComplexMatrix(mesh.unknowns);
  const out = new Float64Array(8);
  const block = new Float64Array(4 * BLOCK_STRIDE);
  for (let p = 0; p < mesh.segmentCount; p++) {
    if (mesh.basisAtStart[p] < 0 && mesh.basisAtEnd[p] < 0) continue;
    for (let q = p; q < mesh.segmentCount; q++) {
      if (mesh.basisAtStart[q] < 0 && mesh.basisAtEnd[q] < 0) continue;
      const count = pairBlock(mesh, p, q, kRadPerM, rules, out, block);
      scatterBlock(z, block, count, p === q, null);
    }
  }
  return z;
}

/** Entries of a pair block: [m, n, Z_re, Z_im] per basis pair. */
export const BLOCK_STRIDE = 4;

/**
 * The up-to-4 matrix contributions of the segment pair (p, q), written as [m, n, re, im] rows into
 * `block`; returns the count. Extra pair terms (e.g. image coupling) can be added per pair the same way.
 */
export function pairBlock(
  mesh: Mesh,
  p: number,
  q: number,
  kRadPerM: number,
  rules: KernelRules,
  out: Float64Array,
  block: Float64Array,
): number {
  const c = ETA0_OHM / (4 * Math.PI); // jη/(4π) applied at the end
  const { dir, basisAtStart, basisAtEnd } = mesh;
  const pa = basisAtStart[p], pb = basisAtEnd[p];
  const qa = basisAtStart[q], qb = basisAtEnd[q];
  pairIntegrals(mesh, p, q, kRadPerM, rules, out);
  const dot = dir[3 * p] * dir[3 * q] + dir[3 * p + 1] * dir[3 * q + 1] + dir[3 * p + 2] * dir[3 * q + 2];
  const lpq = mesh.lengthM[p] * mesh.lengthM[q];
  let count = 0;
  // halves on p: (basis, weight kind) — falling 1−t for pa, rising t for pb
  for (let hp = 0; hp < 2; hp++) {
    const m = hp === 0 ? pa : pb;
    if (m < 0) continue;
    for (let hq = 0; hq < 2; hq++) {
      const nn = hq === 0 ? qa : qb;
      if (nn < 0) continue;
      // ∬ fp fq g with f = 1 − t (h = 0) or t (h = 1): combine K00, K10, K01, K11
      let vr: number, vi: number;
      if (hp === 1 && hq === 1) { vr = out[6]; vi = out[7]; }
      else if (hp === 1) { vr = out[2] - out[6]; vi = out[3] - out[7]; }
      else if (hq === 1) { vr = out[4] - out[6]; vi = out[5] - out[7]; }
      else { vr = out[0] - out[2] - out[4] + out[6]; vi = out[1] - out[3] - out[5] + out[7]; }
      const sign = hp === hq ? 1 : -1; // σp σq Lp Lq
      // bracket B = k·dot·V − sign·K00/(k·Lp·Lq); Z += jc·B → re −= c·B_im, im += c·B_re
      const br = kRadPerM * dot * vr - (sign * out[0]) / (kRadPerM * lpq);
      const bi = kRadPerM * dot * vi - (sign * out[1]) / (kRadPerM * lpq);
      const o = BLOCK_STRIDE * count++;
      block[o] = m; block[o + 1] = nn; block[o + 2] = -c * bi; block[o + 3] = c * br;
    }
  }
  return count;
}

/**
 * Adds a pair block to Z at (m, n) and, for two different segments, at (n, m) (Z is symmetric).
 * With `mirror`, adds σ_m σ_n times the same value at (P(m), P(n)) instead (the mirrored pair).
 */
export function scatterBlock(
  z: ComplexMatrix,
  block: Float64Array,
  count: number,
  selfPair: boolean,
  mirror: { basis: Int32Array; sign: Int8Array } | null,
): void {
  const n = z.n;
  for (let e = 0; e < count; e++) {
    const o = BLOCK_STRIDE * e;
    let m = block[o], nn = block[o + 1];
    let vr = block[o + 2], vi = block[o + 3];
    if (mirror) {
      const s = mirror.sign[m] * mirror.sign[nn];
      m = mirror.basis[m]; nn = mirror.basis[nn];
      vr *= s; vi *= s;
    }
    z.re[m * n + nn] += vr;
    z.im[m * n + nn] += vi;
    if (!selfPair) {
      z.re[nn * n + m] += vr;
      z.im[nn * n + m] += vi;
    }
  }
}

/** Surface impedance per unit length of a round wire, Zs = (1+j)/(2πa)·√(ωμ0/2σ) (Ω/m, re = im). */
export function surfaceResistancePerM(frequencyHz: number, radiusM: number, conductivitySPerM: number): number {
  const omega = 2 * Math.PI * frequencyHz;
  return Math.sqrt((omega * MU0_H_PER_M) / (2 * conductivitySPerM)) / (2 * Math.PI * radiusM);
}

/**
 * Loss matrix entries ∫ Zs Λm Λn dl: a segment of length L carrying halves of m and n adds
 * Zs·L/3 when m = n and Zs·L/6 when they differ (overlap integrals of linear functions).
 * Returns the per-unit-length resistance per segment so callers can form I^H R I too.
 */
export function addConductorLoss(
  z: ComplexMatrix,
  mesh: Mesh,
  resistancePerMOfSegment: Float64Array,
): void {
  const n = z.n;
  for (let s = 0; s < mesh.segmentCount; s++) {
    const rs = resistancePerMOfSegment[s] * mesh.lengthM[s];
    const a = mesh.basisAtStart[s], b = mesh.basisAtEnd[s];
    if (a >= 0) { z.re[a * n + a] += rs / 3; z.im[a * n + a] += rs / 3; }
    if (b >= 0) { z.re[b * n + b] += rs / 3; z.im[b * n + b] += rs / 3; }
    if (a >= 0 && b >= 0) {
      z.re[a * n + b] += rs / 6; z.im[a * n + b] += rs / 6;
      z.re[b * n + a] += rs / 6; z.im[b * n + a] += rs / 6;
    }
  }
}
