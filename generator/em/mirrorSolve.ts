// Mirror-symmetric fill and even-mode solve for a mesh symmetric about the y–z plane
// (mirrorSymmetry.ts gives P and σ with Z_{P(m),P(n)} = σ_m σ_n Z_{mn}).
// Fill: the segment pairs {p, q} and {M(p), M(q)} carry the same integrals, so each unordered pair
// orbit is integrated once and scattered to both places (about half the kernel work). This relies on
// pairIntegrals being symmetric in its two segments (kernel.ts: near pairs use both orders).
// Solve: a right-hand side with b_{P(i)} = τ σ_i b_i for one τ = ±1 (a feed on the mirror plane,
// delta gap or a source spread symmetrically over a few basis functions) has a solution with the same
// symmetry, x_{P(i)} = c_i x_i, c_i = τσ_i, because Z commutes with that signed permutation. Keeping
// one basis per mirror pair (and each self-mirror basis with c = +1; one with c = −1 carries 0) gives
//   Σ_r A_{mr} x_r = s_m b_m,   A_{mr} = s_m (Z_{mr} + [P(r) ≠ r] c_r Z_{m,P(r)}),
// s_m = ½ for a self-mirror row and 1 otherwise, which makes A complex symmetric (with the identities
// above), solved by LDLᵀ (complexLdlt.ts) at about half the size: an eighth of the factorisation work.
// Source: the even/odd mode decomposition of symmetric structures (Harrington, Field Computation by
// Moment Methods, 1968, on exploiting symmetry); the algebra above is checked in
// test/em/mirrorSolve.test.ts against the general fill and LU to 1e-9.
import { createComplexMatrix, solveComplex, type ComplexMatrix } from "./complexLu.js";
import { solveComplexSymmetric } from "./complexLdlt.js";
import { BLOCK_STRIDE, pairBlock, scatterBlock } from "./impedance.js";
import { KERNEL_RULES, type KernelRules } from "./kernel.js";
import type { Mesh } from "./mesh.js";
import type { MirrorSymmetry } from "./mirrorSymmetry.js";

/** The same matrix as fillImpedance, integrating each mirror orbit of segment pairs once. */
export function fillImpedanceMirror(mesh: Mesh, kRadPerM: number, sym: MirrorSymmetry, rules: KernelRules = KERNEL_RULES): ComplexMatrix {
  const z = createComplexMatrix(mesh.unknowns);
  const ns = mesh.segmentCount;
  const out = new Float64Array(8);
  const block = new Float64Array(4 * BLOCK_STRIDE);
  for (let p = 0; p < ns; p++) {
    if (mesh.basisAtStart[p] < 0 && mesh.basisAtEnd[p] < 0) continue;
    for (let q = p; q < ns; q++) {
      if (mesh.basisAtStart[q] < 0 && mesh.basisAtEnd[q] < 0) continue;
      const mp = sym.segment[p], mq = sym.segment[q];
      const key = p * ns + q;
      const mirrorKey = Math.min(mp, mq) * ns + Math.max(mp, mq);
      if (mirrorKey < key) continue; // integrated as its mirror image
      const count = pairBlock(mesh, p, q, kRadPerM, rules, out, block);
      scatterBlock(z, block, count, p === q, null);
      if (mirrorKey !== key) scatterBlock(z, block, count, p === q, sym);
    }
  }
  return z;
}

/** τ with b_{P(i)} = τσ_i b_i for every i (to a tight relative tolerance), or null if neither. */
export function excitationParity(sym: MirrorSymmetry, bRe: Float64Array, bIm: Float64Array): 1 | -1 | null {
  let scale = 0;
  for (let i = 0; i < bRe.length; i++) scale = Math.max(scale, Math.abs(bRe[i]), Math.abs(bIm[i]));
  if (scale === 0) return null;
  const tol = 1e-12 * scale;
  for (const tau of [1, -1] as const) {
    let ok = true;
    for (let i = 0; i < bRe.length && ok; i++) {
      const c = tau * sym.sign[i], j = sym.basis[i];
      ok = Math.abs(bRe[j] - c * bRe[i]) <= tol && Math.abs(bIm[j] - c * bIm[i]) <= tol;
    }
    if (ok) return tau;
  }
  return null;
}

/**
 * Solves Z x = b on the symmetric subspace; null when b has no mirror parity (use the general solve).
 * Z is read, not changed.
 */
export function solveMirrorSymmetric(z: ComplexMatrix, sym: MirrorSymmetry, bRe: Float64Array, bIm: Float64Array): { re: Float64Array; im: Float64Array } | null {
  const tau = excitationParity(sym, bRe, bIm);
  if (tau === null) return null;
  const n = z.n;
  const reps: number[] = [];
  for (let i = 0; i < n; i++) {
    const j = sym.basis[i];
    if (j > i || (j === i && tau * sym.sign[i] === 1)) reps.push(i);
  }
  const h = reps.length;
  const a = createComplexMatrix(h);
  const rRe = new Float64Array(h), rIm = new Float64Array(h);
  for (let u = 0; u < h; u++) {
    const m = reps[u];
    const s = sym.basis[m] === m ? 0.5 : 1;
    rRe[u] = s * bRe[m]; rIm[u] = s * bIm[m];
    for (let v = 0; v <= u; v++) { // LDLᵀ reads the lower triangle only
      const r = reps[v], pr = sym.basis[r];
      let vr = z.re[m * n + r], vi = z.im[m * n + r];
      if (pr !== r) {
        const c = tau * sym.sign[r];
        vr += c * z.re[m * n + pr]; vi += c * z.im[m * n + pr];
      }
      a.re[u * h + v] = s * vr; a.im[u * h + v] = s * vi;
    }
  }
  const x = solveComplexSymmetric(a, rRe, rIm, true);
  const re = new Float64Array(n), im = new Float64Array(n);
  for (let u = 0; u < h; u++) {
    const r = reps[u], pr = sym.basis[r], c = tau * sym.sign[r];
    re[r] = x.re[u]; im[r] = x.im[u];
    if (pr !== r) { re[pr] = c * x.re[u]; im[pr] = c * x.im[u]; }
  }
  return { re, im };
}

/**
 * The solve solveFeed uses: the even-mode solve when `sym` and b allow it, else LDLᵀ of the whole
 * (symmetric) matrix; a zero pivot in either (no pivoting) falls back to the pivoted LU. Z unchanged.
 */
export function solveImpedanceSystem(z: ComplexMatrix, sym: MirrorSymmetry | null, bRe: Float64Array, bIm: Float64Array): { re: Float64Array; im: Float64Array } {
  try {
    return (sym && solveMirrorSymmetric(z, sym, bRe, bIm)) || solveComplexSymmetric(z, bRe, bIm);
  } catch {
    return solveComplex(z, bRe, bIm);
  }
}
