// Nelder–Mead downhill simplex minimization of f over a box. Source: Nelder & Mead, "A simplex
// method for function minimization", Computer Journal 7 (1965); step order and tie rules as in
// Lagarias, Reeds, Wright & Wright, SIAM J. Optim. 9 (1998). Coefficients: standard reflection
// α = 1, expansion χ = 2, contraction γ = 0.5, shrink δ = 0.5; with `adaptive: true` those of Gao &
// Han, Comput. Optim. Appl. 51 (2012): α = 1, χ = 1 + 2/n, γ = 0.75 − 1/(2n), δ = 1 − 1/n.
// Bounds: every trial point is clipped into the box before evaluation (contractions and shrinks
// of in-box points stay inside). Non-finite values rank as the worst (+∞).
// Stopping rule: max_i ‖x_i − x_1‖_∞ ≤ tolX ∧ f_{n+1} − f_1 ≤ tolFun, or f_1 ≤ target, or the next
// evaluation would exceed maxEvaluations.

import { checkBox, checkStartInBox, clipToBox } from "./boxBounds.js";
import { checkFiniteVector, checkInteger, checkNonNegative, checkTarget } from "./checkOptions.js";
import { rankKey, type HistoryEntry, type OptimizeResult, type StopReason } from "./types.js";

export interface NelderMeadOptions {
  x0: readonly number[];
  /** Initial simplex x0 + step_i·e_i (−step_i if that leaves the box); a number applies to all. */
  initialStep: number | readonly number[];
  lowerBounds?: readonly number[];
  upperBounds?: readonly number[];
  /** Default 200·n. */
  maxEvaluations?: number;
  /** Simplex size limit, same unit as x. Default 1e-10. */
  tolX?: number;
  /** Spread of f over the simplex. Default 1e-12. */
  tolFun?: number;
  /** Stop as soon as f ≤ target; default −Infinity. */
  target?: number;
  /** Gao–Han dimension-dependent coefficients; default false (standard ones). */
  adaptive?: boolean;
}

export function nelderMead(objective: (x: number[]) => number, options: NelderMeadOptions): OptimizeResult {
  const name = "nelderMead";
  if (!Array.isArray(options.x0)) throw new Error(`${name}: x0 must be an array of numbers`);
  const n = options.x0.length;
  const box = checkBox(name, n, options.lowerBounds, options.upperBounds);
  const x0 = checkStartInBox(name, options.x0, box);
  const steps =
    typeof options.initialStep === "number"
      ? new Array<number>(n).fill(options.initialStep)
      : checkFiniteVector(name, "initialStep", options.initialStep, n);
  steps.forEach((h, i) => {
    if (!(h > 0) || !Number.isFinite(h)) throw new Error(`${name}: initialStep[${i}] must be positive (got ${h})`);
  });
  const maxEvaluations = checkInteger(name, "maxEvaluations", options.maxEvaluations ?? 200 * n, n + 1, true);
  const tolX = checkNonNegative(name, "tolX", options.tolX ?? 1e-10);
  const tolFun = checkNonNegative(name, "tolFun", options.tolFun ?? 1e-12);
  const target = checkTarget(name, options.target ?? -Infinity);
  const adaptive = options.adaptive ?? false;
  const alpha = 1;
  const chi = adaptive ? 1 + 2 / n : 2;
  const gamma = adaptive ? 0.75 - 1 / (2 * n) : 0.5;
  const delta = adaptive ? 1 - 1 / n : 0.5;

  let evaluations = 0;
  const evaluate = (x: number[]): number => {
    evaluations += 1;
    return rankKey(objective([...x]));
  };
  const history: HistoryEntry[] = [];
  let bestF = Infinity;
  const noteBest = (f: number): void => {
    if (f < bestF) {
      bestF = f;
      history.push({ evaluations, bestF });
    }
  };

  const simplex: { x: number[]; f: number }[] = [{ x: x0, f: evaluate(x0) }];
  for (let i = 0; i < n; i++) {
    const x = [...x0];
    const up = x0[i] + steps[i];
    const down = x0[i] - steps[i];
    const roomUp = box.upper[i] - x0[i];
    x[i] = up <= box.upper[i] ? up : down >= box.lower[i] ? down : roomUp >= x0[i] - box.lower[i] ? box.upper[i] : box.lower[i];
    simplex.push({ x, f: evaluate(x) });
  }

  let stopReasons: StopReason[] = [];
  for (;;) {
    simplex.sort((a, b) => a.f - b.f || 0); // stable: ties keep their older order
    noteBest(simplex[0].f);
    const best = simplex[0];
    const worst = simplex[n];
    let size = 0;
    for (const v of simplex) for (let i = 0; i < n; i++) size = Math.max(size, Math.abs(v.x[i] - best.x[i]));
    const spread = worst.f - best.f; // +∞ (or NaN for ∞ − ∞) when some value is non-finite
    if (best.f <= target) {
      stopReasons = [{ reason: "target", value: best.f }];
      break;
    }
    if (size <= tolX && spread <= tolFun) {
      stopReasons = [{ reason: "tolX", value: size }, { reason: "tolFun", value: spread }];
      break;
    }
    if (evaluations + 1 > maxEvaluations) {
      stopReasons = [{ reason: "maxEvaluations", value: evaluations }];
      break;
    }

    const centroid = new Array<number>(n).fill(0); // x̄ = (1/n) Σ_{i≤n} x_i
    for (let k = 0; k < n; k++) for (let i = 0; i < n; i++) centroid[i] += simplex[k].x[i] / n;
    const along = (t: number): number[] =>
      clipToBox(centroid.map((c, i) => c + t * (c - worst.x[i])), box); // x̄ + t(x̄ − x_{n+1})

    const xr = along(alpha); // reflection x_r = x̄ + α(x̄ − x_{n+1})
    const fr = evaluate(xr);
    let accepted: { x: number[]; f: number } | null = null;
    if (fr < best.f) {
      if (evaluations + 1 > maxEvaluations) {
        accepted = { x: xr, f: fr };
      } else {
        const xe = along(alpha * chi); // expansion x_e = x̄ + χ(x_r − x̄)
        const fe = evaluate(xe);
        accepted = fe < fr ? { x: xe, f: fe } : { x: xr, f: fr };
      }
    } else if (fr < simplex[n - 1].f) {
      accepted = { x: xr, f: fr };
    } else if (evaluations + 1 <= maxEvaluations) {
      const outside = fr < worst.f;
      const xc = along(outside ? alpha * gamma : -gamma); // x_oc = x̄ + γ(x_r − x̄), x_ic = x̄ − γ(x̄ − x_{n+1})
      const fc = evaluate(xc);
      if (outside ? fc <= fr : fc < worst.f) accepted = { x: xc, f: fc };
    }
    if (accepted !== null) {
      simplex[n] = accepted;
      continue;
    }
    // Shrink toward the best vertex: x_i ← x_1 + δ(x_i − x_1), i = 2..n+1 (as budget allows).
    for (let k = 1; k <= n && evaluations < maxEvaluations; k++) {
      const x = simplex[k].x.map((v, i) => best.x[i] + delta * (v - best.x[i]));
      simplex[k] = { x, f: evaluate(x) };
    }
  }

  const last = history[history.length - 1];
  if (last === undefined || last.evaluations !== evaluations) history.push({ evaluations, bestF });
  return { x: [...simplex[0].x], f: simplex[0].f, evaluations, restarts: 0, stopReasons, history };
}
