// CMA-ES, the (μ/μ_W, λ) evolution strategy with covariance matrix adaptation, minimizing f over a
// box by ask/tell. Source: Hansen, "The CMA Evolution Strategy: A Tutorial", arXiv:1604.00772
// (Fig. 6 algorithm, Table 1 defaults with active negative weights, App. B.3 termination).
// Stopping rule (see cmaEsStop.ts): stop() ≠ [] when e.g. evaluations + λ > maxEvaluations, or
// max(range of best f over 10 + ⌈30n/λ⌉ gens, range of f in last gen) < tolFun, or
// max_i max(σ√C_ii, σ|p_c,i|) < tolX, or cond(C) > 1e14, or noEffectAxis/Coord, or range of best f
// over H gens < tolHistFun, or stagnation of the best and median f (App. B.3).
//
// Bounds: the distribution N(m, σ²C) stays unbounded; every sample x is mapped into the box by the
// periodic reflection of boxBounds.ts and the caller evaluates only that mapped point. Chosen over
// clip-plus-penalty because it needs no penalty weight to tune against f's scale, the evaluated
// point is the one reported, and the map is continuous and the identity inside the box.
// Non-finite scores (NaN, ±∞) rank as the worst, ties keep the sampling order.

import { checkBox, checkStartInBox, reflectIntoBox, wrapIntoPeriod, type Box } from "./boxBounds.js";
import { checkInteger, checkNonNegative, checkPositive, checkSeed } from "./checkOptions.js";
import { cmaEsParameters, defaultPopulationSize, type CmaEsParameters } from "./cmaEsParameters.js";
import { cmaEsStopReasons, historyWindow, STAGNATION_HISTORY_CAP } from "./cmaEsStop.js";
import { eigenSymmetric } from "./eigenSymmetric.js";
import { createRng, type Rng } from "./rng.js";
import { rankKey, type StopReason } from "./types.js";

export interface CmaEsOptions {
  /** Initial mean, inside the box. */
  x0: readonly number[];
  /** Initial step size σ0 (same unit as x); about a quarter of the box width is typical. */
  sigma0: number;
  lowerBounds?: readonly number[];
  upperBounds?: readonly number[];
  /** λ; default 4 + ⌊3 ln n⌋. */
  populationSize?: number;
  seed: number;
  /** Default 10⁴·n. */
  maxEvaluations?: number;
  /** Default 1e-12. */
  tolFun?: number;
  /** Default 1e-12·σ0. */
  tolX?: number;
  /** Range of the best f over the last 10 + ⌈30n/λ⌉ generations; default 0 (rule off). */
  tolHistFun?: number;
  /** Default 1e14. */
  conditionLimit?: number;
}

/** The whole strategy state: plain data plus the caller-owned random stream. */
export interface CmaEsState {
  params: CmaEsParameters;
  box: Box;
  rng: Rng;
  generation: number;
  evaluations: number;
  maxEvaluations: number;
  tolFun: number;
  tolX: number;
  tolHistFun: number;
  conditionLimit: number;
  sigma0: number;
  sigma: number;
  mean: number[];
  cov: number[][];
  eigenBasis: number[][];
  eigenValues: number[];
  /** √ of the eigenvalues, the axis lengths d_k. */
  axisLengths: number[];
  pSigma: number[];
  pc: number[];
  bestHistory: number[];
  lastGenerationRange: number;
  /** Best and median f per generation for the stagnation rule (last ≤ 20000 generations). */
  stagnationBest: number[];
  stagnationMedian: number[];
  bestX: number[];
  bestF: number;
  /** Samples of the outstanding ask(): z ~ N(0, I), y = B·D·z, mapped candidates. */
  pending: { z: number[][]; y: number[][]; candidates: number[][] } | null;
}

export interface CmaEs {
  readonly state: CmaEsState;
  /** λ candidates inside the box. Asking again before tell() returns the same batch. */
  ask(): number[][];
  /** Scores for the batch of the last ask(), same order (minimization). */
  tell(candidates: readonly (readonly number[])[], scores: readonly number[]): void;
  /** Empty while the run should continue. */
  stop(): StopReason[];
  /** Best evaluated point so far (f = +Infinity before any finite score). */
  best(): { x: number[]; f: number };
}

export function createCmaEs(options: CmaEsOptions): CmaEs {
  const state = initialCmaEsState(options);
  return {
    state,
    ask: () => askCmaEs(state),
    tell: (candidates, scores) => tellCmaEs(state, candidates, scores),
    stop: () => cmaEsStopReasons({ ...state, n: state.params.n, lambda: state.params.lambda }),
    best: () => ({ x: [...state.bestX], f: state.bestF }),
  };
}

/** The option checks CMA-ES and IPOP share: start point, box, σ0, λ, seed and budget. */
export function checkStartOptions(name: string, options: Omit<CmaEsOptions, "conditionLimit">) {
  if (!Array.isArray(options.x0)) throw new Error(`${name}: x0 must be an array of numbers`);
  const n = options.x0.length;
  const box = checkBox(name, n, options.lowerBounds, options.upperBounds);
  return {
    n,
    box,
    x0: checkStartInBox(name, options.x0, box),
    sigma0: checkPositive(name, "sigma0", options.sigma0),
    lambda: checkInteger(name, "populationSize", options.populationSize ?? defaultPopulationSize(n), 2),
    seed: checkSeed(name, options.seed),
    maxEvaluations: checkInteger(name, "maxEvaluations", options.maxEvaluations ?? 1e4 * n, 1, true),
  };
}

export function initialCmaEsState(options: CmaEsOptions): CmaEsState {
  const name = "cmaEs";
  const { n, box, x0, sigma0, lambda, seed, maxEvaluations } = checkStartOptions(name, options);
  const tolFun = checkNonNegative(name, "tolFun", options.tolFun ?? 1e-12);
  const tolX = checkNonNegative(name, "tolX", options.tolX ?? 1e-12 * sigma0);
  const tolHistFun = checkNonNegative(name, "tolHistFun", options.tolHistFun ?? 0);
  const conditionLimit = checkPositive(name, "conditionLimit", options.conditionLimit ?? 1e14);
  const identity = (): number[][] => x0.map((_, i) => x0.map((_, j) => (i === j ? 1 : 0)));
  return {
    params: cmaEsParameters(n, lambda),
    box,
    rng: createRng(seed),
    generation: 0,
    evaluations: 0,
    maxEvaluations,
    tolFun,
    tolX,
    tolHistFun,
    conditionLimit,
    sigma0,
    sigma: sigma0,
    mean: x0,
    cov: identity(),
    eigenBasis: identity(),
    eigenValues: new Array<number>(n).fill(1),
    axisLengths: new Array<number>(n).fill(1),
    pSigma: new Array<number>(n).fill(0),
    pc: new Array<number>(n).fill(0),
    bestHistory: [],
    lastGenerationRange: Infinity,
    stagnationBest: [],
    stagnationMedian: [],
    bestX: [...x0],
    bestF: Infinity,
    pending: null,
  };
}

export function askCmaEs(s: CmaEsState): number[][] {
  if (s.pending === null) {
    const { n, lambda } = s.params;
    const z: number[][] = [];
    const y: number[][] = [];
    const candidates: number[][] = [];
    for (let k = 0; k < lambda; k++) {
      const zk = Array.from({ length: n }, () => s.rng.normal()); // z_k ~ N(0, I)
      const yk = new Array<number>(n).fill(0);
      for (let i = 0; i < n; i++) {
        for (let j = 0; j < n; j++) yk[i] += s.eigenBasis[i][j] * s.axisLengths[j] * zk[j]; // y_k = B·D·z_k ~ N(0, C)
      }
      const xk = s.mean.map((m, i) => m + s.sigma * yk[i]); // x_k = m + σ y_k
      z.push(zk);
      y.push(yk);
      candidates.push(reflectIntoBox(xk, s.box));
    }
    s.pending = { z, y, candidates };
  }
  return s.pending.candidates.map((c) => [...c]);
}

export function tellCmaEs(
  s: CmaEsState,
  candidates: readonly (readonly number[])[],
  scores: readonly number[],
): void {
  const pending = s.pending;
  const { n, lambda, mu, weights, muEff, cSigma, dSigma, cc, c1, cMu, chiN } = s.params;
  if (pending === null) throw new Error("cmaEs: tell() must follow ask()");
  if (candidates.length !== lambda || scores.length !== lambda) {
    throw new Error(
      `cmaEs: tell() needs ${lambda} candidates and scores (got ${candidates.length} and ${scores.length})`,
    );
  }
  candidates.forEach((c, k) => {
    if (c.length !== n || c.some((v, i) => v !== pending.candidates[k][i])) {
      throw new Error(`cmaEs: candidates[${k}] must be the point returned by the last ask(), in order`);
    }
  });
  s.pending = null;
  s.evaluations += lambda;

  const order = Array.from({ length: lambda }, (_, k) => k).sort(
    (a, b) => rankKey(scores[a]) - rankKey(scores[b]) || a - b,
  ); // i:λ, the i-th best; non-finite last
  const genBest = rankKey(scores[order[0]]);
  const genWorst = rankKey(scores[order[lambda - 1]]);
  s.lastGenerationRange = genWorst - genBest; // +∞ if any score is non-finite (NaN if all are)
  if (Number.isNaN(s.lastGenerationRange)) s.lastGenerationRange = Infinity;
  s.bestHistory.push(genBest);
  if (s.bestHistory.length > historyWindow(n, lambda)) s.bestHistory.shift();
  s.stagnationBest.push(genBest);
  s.stagnationMedian.push(rankKey(scores[order[Math.floor(lambda / 2)]]));
  if (s.stagnationBest.length > STAGNATION_HISTORY_CAP) {
    s.stagnationBest.shift();
    s.stagnationMedian.shift();
  }
  if (genBest < s.bestF) {
    s.bestF = genBest;
    s.bestX = [...pending.candidates[order[0]]];
  }

  const yw = new Array<number>(n).fill(0); // ⟨y⟩_w = Σ_{i≤μ} w_i y_{i:λ}
  const zw = new Array<number>(n).fill(0); // ⟨z⟩_w = Σ_{i≤μ} w_i z_{i:λ}
  for (let r = 0; r < mu; r++) {
    for (let i = 0; i < n; i++) {
      yw[i] += weights[r] * pending.y[order[r]][i];
      zw[i] += weights[r] * pending.z[order[r]][i];
    }
  }
  for (let i = 0; i < n; i++) s.mean[i] += s.sigma * yw[i]; // m ← m + c_m σ ⟨y⟩_w, c_m = 1

  const cSigmaNorm = Math.sqrt(cSigma * (2 - cSigma) * muEff);
  for (let i = 0; i < n; i++) {
    let bz = 0; // (C^{-1/2} ⟨y⟩_w)_i = (B ⟨z⟩_w)_i
    for (let j = 0; j < n; j++) bz += s.eigenBasis[i][j] * zw[j];
    s.pSigma[i] = (1 - cSigma) * s.pSigma[i] + cSigmaNorm * bz; // pσ ← (1−cσ)pσ + √(cσ(2−cσ)μ_eff) C^{-1/2}⟨y⟩_w
  }
  const pSigmaNorm = Math.hypot(...s.pSigma);
  const hSigma =
    pSigmaNorm / Math.sqrt(1 - (1 - cSigma) ** (2 * (s.generation + 1))) < (1.4 + 2 / (n + 1)) * chiN
      ? 1
      : 0; // hσ = 1 iff ‖pσ‖/√(1−(1−cσ)^{2(g+1)}) < (1.4 + 2/(n+1)) E‖N(0,I)‖
  const ccNorm = Math.sqrt(cc * (2 - cc) * muEff);
  for (let i = 0; i < n; i++) s.pc[i] = (1 - cc) * s.pc[i] + hSigma * ccNorm * yw[i]; // pc ← (1−cc)pc + hσ√(cc(2−cc)μ_eff)⟨y⟩_w

  const wCirc = order.map((k, r) => {
    const zSq = pending.z[k].reduce((acc, v) => acc + v * v, 0); // ‖C^{-1/2} y‖² = ‖z‖²
    return weights[r] >= 0 ? weights[r] : (weights[r] * n) / zSq; // w°_i = w_i · (1 or n/‖C^{-1/2}y_i‖²)
  });
  const deltaH = (1 - hSigma) * cc * (2 - cc); // δ(hσ) = (1−hσ)cc(2−cc)
  const sumWeights = weights.reduce((acc, w) => acc + w, 0);
  const decay = 1 + c1 * deltaH - c1 - cMu * sumWeights;
  for (let i = 0; i < n; i++) {
    for (let j = 0; j <= i; j++) {
      let rankMu = 0;
      for (let r = 0; r < lambda; r++) rankMu += wCirc[r] * pending.y[order[r]][i] * pending.y[order[r]][j];
      // C ← (1 + c1δ(hσ) − c1 − cμΣw_j)C + c1·pc·pcᵀ + cμ·Σ w°_i y_i y_iᵀ, rank-one and rank-μ update
      const cij = decay * s.cov[i][j] + c1 * s.pc[i] * s.pc[j] + cMu * rankMu;
      s.cov[i][j] = cij;
      s.cov[j][i] = cij;
    }
  }
  s.sigma *= Math.exp((cSigma / dSigma) * (pSigmaNorm / chiN - 1)); // σ ← σ·exp((cσ/dσ)(‖pσ‖/E‖N(0,I)‖ − 1))

  const eigen = eigenSymmetric(s.cov); // C = B·D²·Bᵀ, every generation (cheap for n ≤ 12)
  s.eigenBasis = eigen.vectors;
  s.eigenValues = eigen.values;
  s.axisLengths = eigen.values.map((v) => Math.sqrt(Math.max(v, 0)));
  s.mean = wrapIntoPeriod(s.mean, s.box); // same image under the reflection, bounded storage
  s.generation += 1;
}
