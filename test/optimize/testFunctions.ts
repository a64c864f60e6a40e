// Standard test objectives with known minima, used by the optimizer tests.

/** Rosenbrock (1960), Comput. J. 3: Σ 100(x_{i+1} − x_i²)² + (1 − x_i)²; minimum 0 at (1, …, 1). */
export function rosenbrock(x: readonly number[]): number {
  let sum = 0;
  for (let i = 0; i < x.length - 1; i++) sum += 100 * (x[i + 1] - x[i] * x[i]) ** 2 + (1 - x[i]) ** 2;
  return sum;
}

/** Σ (x_i − c_i)²; minimum 0 at c. */
export function shiftedSphere(center: readonly number[]): (x: readonly number[]) => number {
  return (x) => x.reduce((sum, v, i) => sum + (v - center[i]) ** 2, 0);
}

/** Rastrigin (1974) / Mühlenbein et al. (1991): 10n + Σ (x_i² − 10 cos 2πx_i); minimum 0 at 0. */
export function rastrigin(x: readonly number[]): number {
  return 10 * x.length + x.reduce((sum, v) => sum + v * v - 10 * Math.cos(2 * Math.PI * v), 0);
}

export function maxAbsDiff(a: readonly number[], b: readonly number[]): number {
  return a.reduce((m, v, i) => Math.max(m, Math.abs(v - b[i])), 0);
}
