// Default strategy parameters of CMA-ES for dimension n and population size λ, from Table 1 of
// Hansen, "The CMA Evolution Strategy: A Tutorial", arXiv:1604.00772 (weights with negative
// values for the active covariance update; c_m = 1; α_cov = 2).
// Stopping rule: not applicable (closed-form constants).

export interface CmaEsParameters {
  n: number;
  /** Population size λ. */
  lambda: number;
  /** Parent number μ = ⌊λ/2⌋. */
  mu: number;
  /** Weights w_1 ≥ … ≥ w_λ; the first μ are positive and sum to 1, the rest are ≤ 0. */
  weights: number[];
  /** Variance-effective selection mass μ_eff = (Σ_{i≤μ} w_i)² / Σ_{i≤μ} w_i². */
  muEff: number;
  cSigma: number;
  dSigma: number;
  cc: number;
  c1: number;
  cMu: number;
  /** E‖N(0, I)‖ ≈ √n (1 − 1/(4n) + 1/(21n²)). */
  chiN: number;
}

/** λ = 4 + ⌊3 ln n⌋, the tutorial's default population size. */
export function defaultPopulationSize(n: number): number {
  return 4 + Math.floor(3 * Math.log(n));
}

export function cmaEsParameters(n: number, lambda: number): CmaEsParameters {
  const mu = Math.floor(lambda / 2);
  const raw: number[] = [];
  for (let i = 1; i <= lambda; i++) raw.push(Math.log((lambda + 1) / 2) - Math.log(i)); // w'_i = ln((λ+1)/2) − ln i

  const positive = raw.slice(0, mu);
  const negative = raw.slice(mu);
  const sum = (v: number[]): number => v.reduce((s, x) => s + x, 0);
  const sumSq = (v: number[]): number => v.reduce((s, x) => s + x * x, 0);
  const muEff = sum(positive) ** 2 / sumSq(positive); // μ_eff = (Σ w'_i)² / Σ w'_i², i ≤ μ
  const muEffMinus = negative.length > 0 && sumSq(negative) > 0 ? sum(negative) ** 2 / sumSq(negative) : 0;

  const alphaCov = 2;
  const c1 = alphaCov / ((n + 1.3) ** 2 + muEff); // c1 = 2 / ((n+1.3)² + μ_eff)
  const cMu = Math.min(
    1 - c1,
    (alphaCov * (0.25 + muEff + 1 / muEff - 2)) / ((n + 2) ** 2 + (alphaCov * muEff) / 2),
  ); // cμ = min(1 − c1, α_cov(¼ + μ_eff + 1/μ_eff − 2)/((n+2)² + α_cov μ_eff/2))

  const cSigma = (muEff + 2) / (n + muEff + 5); // cσ = (μ_eff + 2)/(n + μ_eff + 5)
  const dSigma = 1 + 2 * Math.max(0, Math.sqrt((muEff - 1) / (n + 1)) - 1) + cSigma; // dσ = 1 + 2 max(0, √((μ_eff−1)/(n+1)) − 1) + cσ
  const cc = (4 + muEff / n) / (n + 4 + (2 * muEff) / n); // cc = (4 + μ_eff/n)/(n + 4 + 2μ_eff/n)

  // Negative weights scaled by min(α_μ⁻, α_μeff⁻, α_posdef⁻) / Σ|w'⁻|:
  const alphaMuMinus = 1 + c1 / cMu; // α_μ⁻ = 1 + c1/cμ
  const alphaMuEffMinus = 1 + (2 * muEffMinus) / (muEff + 2); // α_μeff⁻ = 1 + 2μ_eff⁻/(μ_eff + 2)
  const alphaPosDefMinus = (1 - c1 - cMu) / (n * cMu); // α_posdef⁻ = (1 − c1 − cμ)/(n cμ)
  const negativeScale = Math.min(alphaMuMinus, alphaMuEffMinus, alphaPosDefMinus);
  const sumPositive = sum(positive);
  const sumAbsNegative = -sum(negative);
  const weights = raw.map((w) =>
    w >= 0 ? w / sumPositive : sumAbsNegative > 0 ? (negativeScale * w) / sumAbsNegative : 0,
  );

  const chiN = Math.sqrt(n) * (1 - 1 / (4 * n) + 1 / (21 * n * n));
  return { n, lambda, mu, weights, muEff, cSigma, dSigma, cc, c1, cMu, chiN };
}
