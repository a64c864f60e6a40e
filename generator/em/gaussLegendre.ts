// Gauss–Legendre nodes and weights on [0, 1] (Abramowitz & Stegun, Handbook of Mathematical
// Functions, 25.4.29): nodes are the roots of P_n, found by Newton's method from
// x ≈ cos(π(i − 1/4)/(n + 1/2)); weights w_i = 2 / ((1 − x_i²) P_n'(x_i)²), then mapped to [0, 1].

export interface GaussRule {
  t: Float64Array;
  w: Float64Array;
}

export function gaussLegendre01(n: number): GaussRule {
  const t = new Float64Array(n);
  const w = new Float64Array(n);
  for (let i = 0; i < n; i++) {
    let x = Math.cos((Math.PI * (i + 0.75)) / (n + 0.5));
    let dp = 0;
    for (let iter = 0; iter < 100; iter++) {
      let p0 = 1;
      let p1 = x;
      for (let k = 2; k <= n; k++) {
        const p2 = ((2 * k - 1) * x * p1 - (k - 1) * p0) / k;
        p0 = p1;
        p1 = p2;
      }
      if (n === 1) p0 = 1;
      dp = (n * (x * p1 - p0)) / (x * x - 1);
      const dx = p1 / dp;
      x -= dx;
      if (Math.abs(dx) < 1e-15) break;
    }
    t[n - 1 - i] = 0.5 * (x + 1);
    w[n - 1 - i] = 1 / ((1 - x * x) * dp * dp);
  }
  return { t, w };
}
