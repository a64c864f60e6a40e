// Termination criteria of CMA-ES after Hansen, "The CMA Evolution Strategy: A Tutorial",
// arXiv:1604.00772, Appendix B.3, evaluated on the state after the last tell(). With
// H = 10 + ⌈30n/λ⌉ generations, σ step size, C = B·diag(d²)·Bᵀ, p_c evolution path, m mean:
//   maxEvaluations: evaluations + λ > maxEvaluations (the next generation would exceed it)
//   tolFun:         max(range of best f over last H gens, range of f in last gen) < tolFun
//   equalFunValues: range of best f over the last H gens = 0 (full window only)
//   tolX:           max_i max(σ√C_ii, σ|p_c,i|) < tolX
//   tolXUp:         σ·max_i d_i > 10⁴ · σ0·max_i d_i(0)
//   conditionCov:   max_i d_i² / min_i d_i² > conditionLimit (1e14)
//   noEffectAxis:   m + 0.1σ d_k b_k = m in floating point, k = g mod n
//   noEffectCoord:  m_i + 0.2σ√C_ii = m_i for some i
//   tolHistFun:     range of best f over the last H gens < tolHistFun (off when tolHistFun = 0)
//   stagnation:     with L = min(20000, max(120 + 30n/λ, 0.2 g)) generations of best and median f
//                   (checked once g ≥ 120 + 30n/λ): in both, the median of the most recent 30 % is
//                   not below the median of the oldest 30 %

import type { StopReason } from "./types.js";

export interface CmaEsStopInputs {
  n: number;
  lambda: number;
  generation: number;
  evaluations: number;
  maxEvaluations: number;
  tolFun: number;
  tolX: number;
  /** 0 turns the rule off. */
  tolHistFun: number;
  conditionLimit: number;
  sigma: number;
  sigma0: number;
  /** Internal (unbounded) mean. */
  mean: readonly number[];
  /** Covariance C (rows). */
  cov: readonly (readonly number[])[];
  /** Columns of B: eigenBasis[i][k] is component i of axis k. */
  eigenBasis: readonly (readonly number[])[];
  /** Eigenvalues of C (d_k²). */
  eigenValues: readonly number[];
  pc: readonly number[];
  /** Best f of each of the last (up to) H generations, oldest first; +Infinity if none finite. */
  bestHistory: readonly number[];
  /** max f − min f in the last generation; +Infinity if any score was non-finite. */
  lastGenerationRange: number;
  /** Best and median f of every generation (the last up to 20000), oldest first. */
  stagnationBest: readonly number[];
  stagnationMedian: readonly number[];
}

/** The tutorial's cap on the stagnation history, in generations. */
export const STAGNATION_HISTORY_CAP = 20000;

/** 120 + 30n/λ: the shortest stagnation window, in generations. */
export function stagnationMinimum(n: number, lambda: number): number {
  return 120 + Math.ceil((30 * n) / lambda);
}

const medianOf = (xs: readonly number[]): number => {
  const s = [...xs].sort((a, b) => a - b);
  const h = s.length >> 1;
  return s.length % 2 === 1 ? s[h] : 0.5 * (s[h - 1] + s[h]);
};

/**
 * Stagnation test on the last L values of each history: returns how much the recent-30 % median
 * improved on the old-30 % median (the larger over both histories, so ≤ 0 means neither improved:
 * stagnant), or null while the histories are too short.
 */
export function stagnationProgress(s: Pick<CmaEsStopInputs, "n" | "lambda" | "generation" | "stagnationBest" | "stagnationMedian">): number | null {
  const minimum = stagnationMinimum(s.n, s.lambda);
  if (s.stagnationBest.length < minimum) return null;
  const length = Math.min(STAGNATION_HISTORY_CAP, Math.max(minimum, Math.ceil(0.2 * s.generation)), s.stagnationBest.length);
  const part = Math.max(1, Math.floor(0.3 * length));
  let progress = -Infinity;
  for (const h of [s.stagnationBest, s.stagnationMedian]) {
    const window = h.slice(h.length - length);
    progress = Math.max(progress, medianOf(window.slice(0, part)) - medianOf(window.slice(length - part)));
  }
  return Number.isNaN(progress) ? 0 : progress; // ∞ − ∞: no finite score in either part, stagnant
}

/** H = 10 + ⌈30n/λ⌉, the history window of the f-based criteria. */
export function historyWindow(n: number, lambda: number): number {
  return 10 + Math.ceil((30 * n) / lambda);
}

export function cmaEsStopReasons(s: CmaEsStopInputs): StopReason[] {
  const reasons: StopReason[] = [];
  if (s.evaluations + s.lambda > s.maxEvaluations) {
    reasons.push({ reason: "maxEvaluations", value: s.evaluations });
  }
  if (s.generation === 0) return reasons;

  const window = s.bestHistory;
  const historyRange = Math.max(...window) - Math.min(...window); // NaN-free: entries are finite or +∞
  const funRange = Math.max(Number.isNaN(historyRange) ? Infinity : historyRange, s.lastGenerationRange);
  if (funRange < s.tolFun) reasons.push({ reason: "tolFun", value: funRange });
  const historyFull = window.length >= historyWindow(s.n, s.lambda);
  if (historyFull && historyRange < s.tolHistFun) reasons.push({ reason: "tolHistFun", value: historyRange });
  if (historyFull && historyRange === 0) {
    reasons.push({ reason: "equalFunValues", value: historyRange });
  }

  let spread = 0;
  for (let i = 0; i < s.n; i++) {
    spread = Math.max(spread, s.sigma * Math.sqrt(s.cov[i][i]), s.sigma * Math.abs(s.pc[i]));
  }
  if (spread < s.tolX) reasons.push({ reason: "tolX", value: spread });

  const maxEig = Math.max(...s.eigenValues);
  const minEig = Math.min(...s.eigenValues);
  const growth = (s.sigma * Math.sqrt(Math.max(maxEig, 0))) / s.sigma0; // d_i(0) = 1
  if (growth > 1e4) reasons.push({ reason: "tolXUp", value: growth });
  const condition = minEig > 0 ? maxEig / minEig : Infinity;
  if (!(condition <= s.conditionLimit)) reasons.push({ reason: "conditionCov", value: condition });

  const k = s.generation % s.n;
  const axisStep = 0.1 * s.sigma * Math.sqrt(Math.max(s.eigenValues[k], 0));
  let axisHasEffect = false;
  for (let i = 0; i < s.n && !axisHasEffect; i++) {
    if (s.mean[i] + axisStep * s.eigenBasis[i][k] !== s.mean[i]) axisHasEffect = true;
  }
  if (!axisHasEffect) reasons.push({ reason: "noEffectAxis", value: axisStep });

  for (let i = 0; i < s.n; i++) {
    const coordStep = 0.2 * s.sigma * Math.sqrt(s.cov[i][i]);
    if (s.mean[i] + coordStep === s.mean[i]) {
      reasons.push({ reason: "noEffectCoord", value: coordStep });
      break;
    }
  }
  const progress = stagnationProgress(s);
  if (progress !== null && !(progress > 0)) reasons.push({ reason: "stagnation", value: progress });
  return reasons;
}
