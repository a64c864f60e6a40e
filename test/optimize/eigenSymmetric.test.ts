import { describe, expect, it } from "vitest";
import { eigenSymmetric } from "../../generator/optimize/eigenSymmetric.js";
import { createRng } from "../../generator/optimize/rng.js";

function randomSpd(n: number, seed: number): number[][] {
  const rng = createRng(seed);
  const b = Array.from({ length: n }, () => Array.from({ length: n }, () => rng.normal()));
  return b.map((_, i) => b.map((_, j) => b[i].reduce((s, v, k) => s + v * b[j][k], 0) + (i === j ? 1e-3 : 0)));
}

function reconstructionError(a: number[][]): { recon: number; ortho: number } {
  const n = a.length;
  const { values, vectors } = eigenSymmetric(a);
  let recon = 0;
  let ortho = 0;
  for (let i = 0; i < n; i++) {
    for (let j = 0; j < n; j++) {
      let vlv = 0;
      let vtv = 0;
      for (let k = 0; k < n; k++) {
        vlv += vectors[i][k] * values[k] * vectors[j][k];
        vtv += vectors[k][i] * vectors[k][j];
      }
      recon = Math.max(recon, Math.abs(vlv - a[i][j]));
      ortho = Math.max(ortho, Math.abs(vtv - (i === j ? 1 : 0)));
    }
  }
  return { recon, ortho };
}

describe("eigenSymmetric", () => {
  it.each([1, 2, 5, 12])("reconstructs a random %i×%i SPD matrix as V·Λ·Vᵀ with orthonormal V", (n) => {
    const { recon, ortho } = reconstructionError(randomSpd(n, n));
    expect(recon).toBeLessThan(1e-11);
    expect(ortho).toBeLessThan(1e-13);
  });

  it("returns the known eigenvalues 1 and 3 of [[2, 1], [1, 2]]", () => {
    const values = eigenSymmetric([[2, 1], [1, 2]]).values.sort((a, b) => a - b);
    expect(values[0]).toBeCloseTo(1, 14);
    expect(values[1]).toBeCloseTo(3, 14);
  });

  it("handles repeated eigenvalues and an already diagonal matrix in zero sweeps", () => {
    const result = eigenSymmetric([[4, 0, 0], [0, 4, 0], [0, 0, 1]]);
    expect(result.sweeps).toBe(0);
    expect(result.values).toEqual([4, 4, 1]);
  });
});
