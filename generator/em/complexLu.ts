// Solves Z·x = b for a dense complex matrix by LU factorisation with partial pivoting
// (Golub & Van Loan, Matrix Computations, 4th ed., alg. 3.4.1, "Gaussian elimination with partial
// pivoting"): P·Z = L·U, then L·y = P·b, U·x = y. Real and imaginary parts live in separate
// row-major Float64Arrays; the inner loop runs along a row, in memory order.
// Chosen over ml-matrix's real 2N×2N LU by measurement (npm run bench prints both).

export interface ComplexMatrix {
  n: number;
  re: Float64Array;
  im: Float64Array;
}

export function createComplexMatrix(n: number): ComplexMatrix {
  return { n, re: new Float64Array(n * n), im: new Float64Array(n * n) };
}

/**
 * Factorises `a` and solves for one right-hand side; returns x as {re, im}. With `overwrite` the
 * factors replace `a` (no copy: the caller's matrix is scratch); otherwise `a` is left as it was.
 */
export function solveComplex(
  a: ComplexMatrix,
  bRe: Float64Array,
  bIm: Float64Array,
  overwrite = false,
): { re: Float64Array; im: Float64Array } {
  const n = a.n;
  const re = overwrite ? a.re : a.re.slice();
  const im = overwrite ? a.im : a.im.slice();
  const xr = bRe.slice();
  const xi = bIm.slice();
  for (let k = 0; k < n; k++) {
    // pivot: the row with the largest |a_ik| in column k at or below the diagonal
    let p = k;
    let best = -1;
    for (let i = k; i < n; i++) {
      const m = re[i * n + k] ** 2 + im[i * n + k] ** 2;
      if (m > best) {
        best = m;
        p = i;
      }
    }
    if (best === 0) throw new Error("solveComplex: matrix is singular");
    if (p !== k) {
      for (let j = 0; j < n; j++) {
        const a1 = k * n + j;
        const a2 = p * n + j;
        let t = re[a1]; re[a1] = re[a2]; re[a2] = t;
        t = im[a1]; im[a1] = im[a2]; im[a2] = t;
      }
      let t = xr[k]; xr[k] = xr[p]; xr[p] = t;
      t = xi[k]; xi[k] = xi[p]; xi[p] = t;
    }
    const dr = re[k * n + k];
    const di = im[k * n + k];
    const dd = dr * dr + di * di;
    const invR = dr / dd;
    const invI = -di / dd;
    for (let i = k + 1; i < n; i++) {
      const ik = i * n + k;
      // l_ik = a_ik / a_kk
      const lr = re[ik] * invR - im[ik] * invI;
      const li = re[ik] * invI + im[ik] * invR;
      re[ik] = lr;
      im[ik] = li;
      if (lr === 0 && li === 0) continue;
      const rowI = i * n;
      const rowK = k * n;
      // a_ij ← a_ij − l_ik·a_kj
      for (let j = k + 1; j < n; j++) {
        const ur = re[rowK + j];
        const ui = im[rowK + j];
        re[rowI + j] -= lr * ur - li * ui;
        im[rowI + j] -= lr * ui + li * ur;
      }
      // forward substitution folded in: y_i ← y_i − l_ik·y_k
      xr[i] -= lr * xr[k] - li * xi[k];
      xi[i] -= lr * xi[k] + li * xr[k];
    }
  }
  // back substitution: x_i = (y_i − Σ_{j>i} u_ij x_j) / u_ii
  for (let i = n - 1; i >= 0; i--) {
    let sr = xr[i];
    let si = xi[i];
    const row = i * n;
    for (let j = i + 1; j < n; j++) {
      sr -= re[row + j] * xr[j] - im[row + j] * xi[j];
      si -= re[row + j] * xi[j] + im[row + j] * xr[j];
    }
    const dr = re[row + i];
    const di = im[row + i];
    const dd = dr * dr + di * di;
    xr[i] = (sr * dr + si * di) / dd;
    xi[i] = (si * dr - sr * di) / dd;
  }
  return { re: xr, im: xi };
}
