// IPOP-CMA-ES: CMA-ES restarted with the population size doubled at each restart, λ_k = 2^k·λ_0.
// Source: Auger & Hansen, "A restart CMA evolution strategy with increasing population size",
// IEEE CEC 2005. Restarts begin at a point drawn uniformly in the box when it is finite (else at
// x0), with the same σ0 and a fresh seed drawn from the driver's stream.
// Stopping rule: stop when f_best ≤ target, or Σ evaluations + λ_k > maxEvaluations, or a run
// stops (cmaEsStop.ts) with k = maxRestarts, or (restartsStale) R = staleRestarts restarts in a row
// each lowered the best-so-far by less than ε = minRestartGain, i.e. f_best(before run k) −
// f_best(after run k) < ε for the last R runs k ≥ 1 (off when staleRestarts is unset); otherwise
// restart with λ_{k+1} = 2λ_k. The restart rule is the usual practical reading of IPOP's budget: once
// larger populations stop finding better basins, further restarts only spend evaluations.

import { checkInteger, checkNonNegative, checkTarget } from "./checkOptions.js";
import { checkStartOptions, createCmaEs, type CmaEs, type CmaEsOptions } from "./cmaEs.js";
import { createRng, type Rng } from "./rng.js";
import type { HistoryEntry, OptimizeResult, StopReason } from "./types.js";

/**
 * The CMA-ES options (populationSize is λ of the first run; maxEvaluations the total over all runs,
 * never exceeded; tolFun and tolX apply per run), plus the restart budget and a target.
 */
export interface IpopOptions extends Omit<CmaEsOptions, "conditionLimit"> {
  /** Default 9. */
  maxRestarts?: number;
  /** Stop as soon as f ≤ target; default −Infinity (never). */
  target?: number;
  /** R: stop after this many restarts in a row gained less than minRestartGain; default off. */
  staleRestarts?: number;
  /** ε for staleRestarts (same unit as f); default 0. */
  minRestartGain?: number;
}

export interface IpopRun {
  populationSize: number;
  evaluations: number;
  bestF: number;
  stopReasons: StopReason[];
  /** How much this run lowered the best-so-far of the runs before it (null for the first run). */
  gain: number | null;
}

export interface IpopResult extends OptimizeResult {
  /** One entry per CMA-ES run, in order. */
  runs: IpopRun[];
}

export interface Ipop {
  /** Candidates of the current generation (inside the box). */
  ask(): number[][];
  /** Scores for the last ask(), same order. Non-finite scores rank worst. */
  tell(candidates: readonly (readonly number[])[], scores: readonly number[]): void;
  /** Empty while running; the final reasons once finished. */
  stop(): StopReason[];
  result(): IpopResult;
}

interface IpopState {
  options: IpopOptions;
  rng: Rng;
  /** λ of the first run. */
  lambda0: number;
  maxEvaluations: number;
  maxRestarts: number;
  target: number;
  staleRestarts: number;
  minRestartGain: number;
  /** Restarts in a row that gained less than minRestartGain. */
  staleCount: number;
  /** Best-so-far when the current run began. */
  runStartBestF: number;
  es: CmaEs;
  runStartEvaluations: number;
  evaluations: number;
  restarts: number;
  bestX: number[];
  bestF: number;
  history: HistoryEntry[];
  runs: IpopRun[];
  stopReasons: StopReason[];
}

export function createIpop(options: IpopOptions): Ipop {
  const name = "ipop";
  const { box, x0, lambda: lambda0, seed, maxEvaluations } = checkStartOptions(name, options);
  if (options.tolFun !== undefined) checkNonNegative(name, "tolFun", options.tolFun);
  if (options.tolX !== undefined) checkNonNegative(name, "tolX", options.tolX);
  if (options.tolHistFun !== undefined) checkNonNegative(name, "tolHistFun", options.tolHistFun);
  const rng = createRng(seed);
  const runOptions = { ...options, lowerBounds: box.lower, upperBounds: box.upper, populationSize: lambda0 };
  const s: IpopState = {
    options: runOptions,
    rng,
    lambda0,
    maxEvaluations,
    maxRestarts: checkInteger(name, "maxRestarts", options.maxRestarts ?? 9, 0),
    target: checkTarget(name, options.target ?? -Infinity),
    staleRestarts: options.staleRestarts === undefined ? Infinity : checkInteger(name, "staleRestarts", options.staleRestarts, 1),
    minRestartGain: checkNonNegative(name, "minRestartGain", options.minRestartGain ?? 0),
    staleCount: 0,
    runStartBestF: Infinity,
    es: startRun(runOptions, x0, lambda0, rng, maxEvaluations),
    runStartEvaluations: 0,
    evaluations: 0,
    restarts: 0,
    bestX: [...x0],
    bestF: Infinity,
    history: [],
    runs: [],
    stopReasons: [],
  };
  checkBudget(s);
  return {
    ask: () => (s.stopReasons.length > 0 ? [] : s.es.ask()),
    tell: (candidates, scores) => tellIpop(s, candidates, scores),
    stop: () => s.stopReasons.map((r) => ({ ...r })),
    result: () => ({
      x: [...s.bestX],
      f: s.bestF,
      evaluations: s.evaluations,
      restarts: s.restarts,
      stopReasons: s.stopReasons.map((r) => ({ ...r })),
      history: s.history.map((h) => ({ ...h })),
      runs: s.runs.map((r) => ({ ...r, stopReasons: r.stopReasons.map((q) => ({ ...q })) })),
    }),
  };
}

/** Synchronous convenience: evaluates `objective` on every candidate. */
export function minimizeIpop(objective: (x: number[]) => number, options: IpopOptions): IpopResult {
  const ipop = createIpop(options);
  while (ipop.stop().length === 0) {
    const xs = ipop.ask();
    ipop.tell(xs, xs.map((x) => objective(x)));
  }
  return ipop.result();
}

/** Batched variant: one call per generation, e.g. to spread evaluations over workers. */
export async function minimizeIpopBatched(
  evaluateBatch: (xs: number[][]) => Promise<number[]>,
  options: IpopOptions,
): Promise<IpopResult> {
  const ipop = createIpop(options);
  while (ipop.stop().length === 0) {
    const xs = ipop.ask();
    const scores = await evaluateBatch(xs.map((x) => [...x]));
    ipop.tell(xs, scores);
  }
  return ipop.result();
}

function startRun(options: IpopOptions, x0: number[], lambda: number, rng: Rng, budget: number): CmaEs {
  return createCmaEs({
    x0,
    sigma0: options.sigma0,
    lowerBounds: options.lowerBounds,
    upperBounds: options.upperBounds,
    populationSize: lambda,
    seed: rng.uint32(),
    maxEvaluations: budget,
    tolFun: options.tolFun,
    tolX: options.tolX,
    tolHistFun: options.tolHistFun,
  });
}

function tellIpop(s: IpopState, candidates: readonly (readonly number[])[], scores: readonly number[]): void {
  if (s.stopReasons.length > 0) throw new Error("ipop: tell() called after the run finished");
  s.es.tell(candidates, scores);
  s.evaluations = s.runStartEvaluations + s.es.state.evaluations;
  const best = s.es.best();
  if (best.f < s.bestF) {
    s.bestF = best.f;
    s.bestX = best.x;
    s.history.push({ evaluations: s.evaluations, bestF: s.bestF }); // best-so-far, only on improvement
  }
  if (s.bestF <= s.target) {
    const reasons: StopReason[] = [{ reason: "target", value: s.bestF }];
    finishRun(s, reasons);
    finish(s, reasons);
    return;
  }
  const runReasons = s.es.stop();
  if (runReasons.length === 0) return;
  const gain = finishRun(s, runReasons);
  if (s.restarts > 0) s.staleCount = gain < s.minRestartGain ? s.staleCount + 1 : 0;
  if (runReasons.some((r) => r.reason === "maxEvaluations")) {
    finish(s, [{ reason: "maxEvaluations", value: s.evaluations }]); // value: total, not per run
  } else if (s.staleCount >= s.staleRestarts) {
    finish(s, [...runReasons, { reason: "restartsStale", value: gain }]); // value: the last run's gain
  } else if (s.restarts >= s.maxRestarts) {
    finish(s, [...runReasons, { reason: "maxRestarts", value: s.restarts }]);
  } else {
    s.restarts += 1;
    const lambda = s.lambda0 * 2 ** s.restarts; // λ_k = 2^k λ_0
    const x0 = restartPoint(s);
    s.runStartEvaluations = s.evaluations;
    s.runStartBestF = s.bestF;
    s.es = startRun(s.options, x0, lambda, s.rng, s.maxEvaluations - s.evaluations);
    checkBudget(s);
  }
}

/** x0 for a restart: uniform in the box when every bound is finite, else the original x0. */
function restartPoint(s: IpopState): number[] {
  const lower = s.options.lowerBounds as number[];
  const upper = s.options.upperBounds as number[];
  const finite = lower.every(Number.isFinite) && upper.every(Number.isFinite);
  if (!finite) return [...s.options.x0];
  return lower.map((l, i) => l + s.rng.uniform() * (upper[i] - l)); // x0 ~ U[l, u)
}

/** A fresh run whose first generation would already exceed the budget ends the whole search. */
function checkBudget(s: IpopState): void {
  if (s.es.stop().length > 0) finish(s, [{ reason: "maxEvaluations", value: s.evaluations }]);
}

/** Records the run that just ended; returns its gain over the best-so-far before it. */
function finishRun(s: IpopState, reasons: StopReason[]): number {
  const bestF = s.es.best().f;
  const gain = s.runStartBestF === Infinity ? Infinity : Math.max(0, s.runStartBestF - bestF);
  s.runs.push({
    populationSize: s.es.state.params.lambda,
    evaluations: s.es.state.evaluations,
    bestF,
    stopReasons: reasons,
    gain: s.runs.length === 0 ? null : gain,
  });
  return gain;
}

function finish(s: IpopState, reasons: StopReason[]): void {
  s.stopReasons = reasons;
  const last = s.history[s.history.length - 1];
  if (last === undefined || last.evaluations !== s.evaluations) {
    s.history.push({ evaluations: s.evaluations, bestF: s.bestF }); // closing entry
  }
}
