// Image coupling over the ground plane z = 0, added to an already filled free-space matrix
// (image theory: Balanis, Antenna Theory, 3rd ed., §4.7; the matrix form as in em/impedance.ts):
//   Z_mn += −Γ · jη/(4π) · [ k (ŝp·Mŝq) ∬ fp fq e^{−jkR'}/R' − (σp σq / k) ∬ e^{−jkR'}/R' ],
//   R' = √(|r − M r'|² + a_p a_q),  M(x, y, z) = (x, y, −z),
// summed over the halves p ∈ m and q ∈ n. The image of segment q is the mirrored segment Mq, and
// its current flows reversed along the mirrored path (−1: horizontal currents reverse, vertical
// ones keep their direction, image charges change sign). The pair integrals are kernel.ts's, on the
// mesh followed by its image, so near and far pairs get the same treatment as the direct coupling.
// Γ = 1 for perfect ground; for real ground the normal-incidence coefficient of em/ground.ts
// (the reflection-coefficient approximation). Z^img is complex symmetric because
// |r − M r'| = |M r − r'|, so each unordered pair is visited once. The image M_z commutes with the
// y–z mirror M_x of a symmetric mesh (mirrorSymmetry.ts), so Z^img_{P(m),P(n)} = σ_m σ_n Z^img_{mn}
// as for the direct coupling: with `sym`, each mirror orbit of pairs is integrated once and
// scattered to both places (mirrorSolve.ts's fill, applied to the image terms).
import type { ComplexMatrix } from "./complexLu.js";
import type { Complex } from "./ground.js";
import { BLOCK_STRIDE, scatterBlock } from "./impedance.js";
import { KERNEL_RULES, pairIntegrals, type KernelRules } from "./kernel.js";
import { meshWithImage } from "./groundMesh.js";
import type { Mesh } from "./mesh.js";
import type { MirrorSymmetry } from "./mirrorSymmetry.js";
import { ETA0_OHM } from "../units.js";

export function addImageCoupling(
  z: ComplexMatrix,
  mesh: Mesh,
  kRadPerM: number,
  factor: Complex,
  rules: KernelRules = KERNEL_RULES,
  sym: MirrorSymmetry | null = null,
): void {
  const both = meshWithImage(mesh);
  const ns = mesh.segmentCount;
  const out = new Float64Array(8);
  const block = new Float64Array(4 * BLOCK_STRIDE);
  const { basisAtStart, basisAtEnd } = mesh;
  for (let p = 0; p < ns; p++) {
    if (basisAtStart[p] < 0 && basisAtEnd[p] < 0) continue;
    for (let q = p; q < ns; q++) {
      if (basisAtStart[q] < 0 && basisAtEnd[q] < 0) continue;
      let mirrored = false;
      if (sym) {
        const mp = sym.segment[p], mq = sym.segment[q];
        const key = p * ns + q, mirrorKey = Math.min(mp, mq) * ns + Math.max(mp, mq);
        if (mirrorKey < key) continue; // integrated as its mirror image
        mirrored = mirrorKey !== key;
      }
      const count = imagePairBlock(both, p, q, kRadPerM, rules, factor, out, block);
      scatterBlock(z, block, count, p === q, null);
      if (mirrored) scatterBlock(z, block, count, p === q, sym);
    }
  }
}

/** The image contributions −Γ·Z(p, M q) of the segment pair as [m, n, re, im] rows (impedance.ts pairBlock's layout). */
function imagePairBlock(
  both: Mesh, p: number, q: number, kRadPerM: number, rules: KernelRules, factor: Complex, out: Float64Array, block: Float64Array,
): number {
  const c = ETA0_OHM / (4 * Math.PI);
  const { dir, basisAtStart, basisAtEnd, lengthM } = both;
  const pa = basisAtStart[p], pb = basisAtEnd[p];
  const qa = basisAtStart[q], qb = basisAtEnd[q];
  const ns = both.segmentCount / 2;
  pairIntegrals(both, p, ns + q, kRadPerM, rules, out);
  // ŝp · Mŝq
  const dot = dir[3 * p] * dir[3 * q] + dir[3 * p + 1] * dir[3 * q + 1] - dir[3 * p + 2] * dir[3 * q + 2];
  const lpq = lengthM[p] * lengthM[q];
  let count = 0;
  for (let hp = 0; hp < 2; hp++) {
    const m = hp === 0 ? pa : pb;
    if (m < 0) continue;
    for (let hq = 0; hq < 2; hq++) {
      const nn = hq === 0 ? qa : qb;
      if (nn < 0) continue;
      let vr: number, vi: number;
      if (hp === 1 && hq === 1) { vr = out[6]; vi = out[7]; }
      else if (hp === 1) { vr = out[2] - out[6]; vi = out[3] - out[7]; }
      else if (hq === 1) { vr = out[4] - out[6]; vi = out[5] - out[7]; }
      else { vr = out[0] - out[2] - out[4] + out[6]; vi = out[1] - out[3] - out[5] + out[7]; }
      const sign = hp === hq ? 1 : -1;
      const br = kRadPerM * dot * vr - (sign * out[0]) / (kRadPerM * lpq);
      const bi = kRadPerM * dot * vi - (sign * out[1]) / (kRadPerM * lpq);
      // W = jc·B; the image adds −Γ·W
      const wr = -c * bi, wi = c * br;
      const o = BLOCK_STRIDE * count++;
      block[o] = m; block[o + 1] = nn;
      block[o + 2] = -(factor.re * wr - factor.im * wi);
      block[o + 3] = -(factor.re * wi + factor.im * wr);
    }
  }
  return count;
}
