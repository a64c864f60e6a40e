// Solves Z·x = b for a complex symmetric matrix (Z = Zᵀ, no conjugation: the Galerkin moment matrix
// of a reciprocal medium) by the factorisation Z = L·D·Lᵀ, L unit lower triangular, D diagonal,
// without pivoting (Golub & Van Loan, Matrix Computations, 4th ed., §4.1.2, alg. 4.1.2 "LDLᵀ",
// with complex arithmetic in place of real: the algorithm uses no conjugate, so it carries over):
//   for row i: w_ij = z_ij − Σ_{p<j} w_ip·l_jp,  l_ij = w_ij / d_j   (j < i),
//              d_i  = z_ii − Σ_{p<i} w_ip·l_ip,
// then L·y = b, D·u = y, Lᵀ·x = u. About n³/6 complex multiply-adds against n³/3 for LU; only the
// lower triangle of Z is read. Without pivoting a tiny d_i would lose accuracy: the solver bench
// and test/em/complexLdlt.test.ts compare it with the pivoted LU (moment matrices are strongly
// diagonal; a d_i that is exactly 0 throws).
import type { ComplexMatrix } from "./complexLu.js";

/** Factorises the lower triangle of `a` (overwritten when `overwrite`) and solves for one b. */
export function solveComplexSymmetric(
  a: ComplexMatrix,
  bRe: Float64Array,
  bIm: Float64Array,
  overwrite = false,
): { re: Float64Array; im: Float64Array } {
  const n = a.n;
  const re = overwrite ? a.re : a.re.slice();
  const im = overwrite ? a.im : a.im.slice();
  const wr = new Float64Array(n); // row i of W = L·D, built left to right
  const wi = new Float64Array(n);
  const dr = new Float64Array(n);
  const di = new Float64Array(n);
  for (let i = 0; i < n; i++) {
    const rowI = i * n;
    for (let j = 0; j < i; j++) {
      const rowJ = j * n;
      let sr = re[rowI + j], si = im[rowI + j];
      for (let p = 0; p < j; p++) {
        const lr = re[rowJ + p], li = im[rowJ + p];
        sr -= wr[p] * lr - wi[p] * li;
        si -= wr[p] * li + wi[p] * lr;
      }
      wr[j] = sr; wi[j] = si; // w_ij
      const ddr = dr[j], ddi = di[j], dd = ddr * ddr + ddi * ddi;
      re[rowI + j] = (sr * ddr + si * ddi) / dd; // l_ij = w_ij / d_j
      im[rowI + j] = (si * ddr - sr * ddi) / dd;
    }
    let sr = re[rowI + i], si = im[rowI + i];
    for (let p = 0; p < i; p++) {
      const lr = re[rowI + p], li = im[rowI + p];
      sr -= wr[p] * lr - wi[p] * li;
      si -= wr[p] * li + wi[p] * lr;
    }
    if (sr === 0 && si === 0) throw new Error("solveComplexSymmetric: zero pivot (matrix singular or needs pivoting)");
    dr[i] = sr; di[i] = si;
    re[rowI + i] = sr; im[rowI + i] = si;
  }
  const xr = bRe.slice();
  const xi = bIm.slice();
  for (let i = 0; i < n; i++) { // L·y = b
    const row = i * n;
    let sr = xr[i], si = xi[i];
    for (let p = 0; p < i; p++) {
      sr -= re[row + p] * xr[p] - im[row + p] * xi[p];
      si -= re[row + p] * xi[p] + im[row + p] * xr[p];
    }
    xr[i] = sr; xi[i] = si;
  }
  for (let i = 0; i < n; i++) { // D·u = y
    const ddr = dr[i], ddi = di[i], dd = ddr * ddr + ddi * ddi;
    const sr = xr[i], si = xi[i];
    xr[i] = (sr * ddr + si * ddi) / dd;
    xi[i] = (si * ddr - sr * ddi) / dd;
  }
  for (let j = n - 1; j >= 0; j--) { // Lᵀ·x = u: x_j is final, remove l_jp·x_j from every u_p, p < j
    const row = j * n;
    const vr = xr[j], vi = xi[j];
    for (let p = 0; p < j; p++) {
      xr[p] -= re[row + p] * vr - im[row + p] * vi;
      xi[p] -= re[row + p] * vi + im[row + p] * vr;
    }
  }
  return { re: xr, im: xi };
}
