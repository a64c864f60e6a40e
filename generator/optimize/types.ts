// Result and stop-reason shapes shared by the optimizers. Numerical outcomes are reported in
// these objects, never thrown. Stopping rule: not applicable (types only).

export type StopReasonName =
  | "tolFun" // range of recent f values below tolFun
  | "tolX" // search spread below tolX in every coordinate
  | "tolXUp" // σ·max √λ_i grew more than 10⁴-fold: σ0 too small or divergence
  | "tolHistFun" // range of the best f over the recent-generation window below tolHistFun
  | "stagnation" // recent median best and median f no better than older ones
  | "restartsStale" // IPOP: restarts in a row that improved the best by less than the threshold
  | "equalFunValues" // best f identical over the recent-generation window
  | "conditionCov" // cond(C) above the limit
  | "noEffectAxis" // adding 0.1σ√λ_i b_i leaves the mean unchanged
  | "noEffectCoord" // adding 0.2σ√C_ii e_i leaves m_i unchanged
  | "maxEvaluations" // the next generation or step would exceed the evaluation budget
  | "maxRestarts" // restart budget used up
  | "target" // best f ≤ target
  | "startFarFromFeasible"; // design level: the polish was skipped, its start is far from feasible (value: its worst SWR)

/** Why a run stopped, with the measured value that triggered it (in the criterion's own unit). */
export interface StopReason {
  reason: StopReasonName;
  value: number;
}

/** Best-so-far objective after `evaluations` evaluations. */
export interface HistoryEntry {
  evaluations: number;
  bestF: number;
}

export interface OptimizeResult {
  /** Best evaluated point (always inside the box). */
  x: number[];
  /** Its objective value; +Infinity if no evaluation returned a finite number. */
  f: number;
  evaluations: number;
  restarts: number;
  stopReasons: StopReason[];
  /** One entry per generation (or step) that improved the best-so-far, plus the final one. */
  history: HistoryEntry[];
}

/** Non-finite scores (NaN, ±Infinity) rank as the worst value. */
export function rankKey(f: number): number {
  return Number.isFinite(f) ? f : Infinity;
}
