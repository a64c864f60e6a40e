// Frozen copy of generator/em/impedance.ts as of commit fb07cb0 (before the mirror fill), kept only so
// the solver bench can time the previous fill against the current one in the same run. Not used elsewhere.
// Galerkin impedance matrix of the mixed-potential thin-wire EFIE with triangle basis functions
// (Harrington, Field Computation by Moment Methods, 1968, ch. 4; Gibson, ch. 4):
//   Z_mn = jωμ∬ Λm Λn (ŝm·ŝn) G dl dl' + (1/jωε)∬ Λm' Λn' G dl dl',   G = e^{−jkR}/(4πR)
//        = jη/(4π) · [ k (ŝp·ŝq) ∬ fp fq e^{−jkR}/R − (σp σq / k) ∬ e^{−jkR}/R ]  summed over the
// segment halves p ∈ m, q ∈ n, with f = t (rising half, σ = +1/Lp) or 1 − t (falling, σ = −1/Lp).
// Conductor loss adds ∫ Zs Λm Λn dl, Zs = (1+j)/(2πa)·√(ωμ0/2σ) per unit length (skin-effect
// surface impedance of a round wire; Balanis, Antenna Theory, eq. 2-90b), on the diagonal blocks.
// Z is complex symmetric; the fill visits each unordered segment pair once.
import { ETA0_OHM, MU0_H_PER_M } from "../../generator/units.js";
import { createComplexMatrix, type ComplexMatrix } from "../../generator/em/complexLu.js";
import { KERNEL_RULES, pairIntegrals, type KernelRules } from "./kernel.js";
import type { Mesh } from "../../generator/em/mesh.js";

export function fillImpedance(
  mesh: Mesh,
  kRadPerM: number,
  rules: KernelRules = KERNEL_RULES,
): ComplexMatrix {
  const z = createComplexMatrix(mesh.unknowns);
  const n = mesh.unknowns;
  const c = ETA0_OHM / (4 * Math.PI); // jη/(4π) applied at the end
  const out = new Float64Array(8);
  const { dir, basisAtStart, basisAtEnd } = mesh;
  const mm = [0, 0];
  for (let p = 0; p < mesh.segmentCount; p++) {
    const pa = basisAtStart[p], pb = basisAtEnd[p];
    if (pa < 0 && pb < 0) continue;
    for (let q = p; q < mesh.segmentCount; q++) {
      const qa = basisAtStart[q], qb = basisAtEnd[q];
      if (qa < 0 && qb < 0) continue;
      pairIntegrals(mesh, p, q, kRadPerM, rules, out);
      const dot = dir[3 * p] * dir[3 * q] + dir[3 * p + 1] * dir[3 * q + 1] + dir[3 * p + 2] * dir[3 * q + 2];
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
          const lpq = mesh.lengthM[p] * mesh.lengthM[q];
          const br = kRadPerM * dot * vr - (sign * out[0]) / (kRadPerM * lpq);
          const bi = kRadPerM * dot * vi - (sign * out[1]) / (kRadPerM * lpq);
          mm[0] = m * n + nn;
          mm[1] = nn * n + m;
          const copies = p === q ? 1 : 2;
          for (let r = 0; r < copies; r++) {
            z.re[mm[r]] -= c * bi;
            z.im[mm[r]] += c * br;
          }
        }
      }
    }
  }
  return z;
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
