// Designs one bent-arm antenna: IPOP-CMA-ES over the box-normalised parameters (z = (x − lo)/(hi − lo)
// ∈ [0,1]^n, σ0 = 0.25), then a Nelder–Mead polish from the best point (step 0.01 in z). Both are
// seeded; the search never throws for a numerical outcome: a design that meets no constraint is
// returned with status "infeasible" and the reasons. For direct-feed designs the search checks SWR
// at the band edges and centre against 97.5 % of the limit, the polish at all 11 against the limit itself.
// `start` skips the search and only polishes (a shape found in wavelength units, re-used per band);
// with `polishOnly: false` the search runs from the box centre as usual and the polish begins from
// whichever of `start` and the search's best scores better. With `skipPolishAboveSwr`, a polish-only
// call whose start's worst in-band SWR exceeds that value is not run at all (a Nelder–Mead polish
// moves the shape locally; from SWR far above the limit it only spends evaluations to end
// infeasible); the outcome says so in its message and stop reason.
import { createIpop, nelderMead, type HistoryEntry, type StopReason } from "../optimize/index.js";
import { parameterBounds } from "../shapes/constraints.js";
import { wavelengthM } from "../units.js";
import { checkFrequencies, evaluate, isFeasible, shapeOf, specOf, type Evaluation } from "./objective.js";
import { limitsOf, type DesignRequest } from "./request.js";

export const SWEEP_POINTS_IN_BAND = 11;
const SEARCH_SWR_POINTS = 3; // band edges and centre; the polish checks all 11

/**
 * When the search stops (scores in dB, parameters in box units z ∈ [0, 1]): a CMA-ES run ends when its
 * best and latest scores span less than tolFun dB over 10 + ⌈30n/λ⌉ generations, or its spread falls
 * below tolX (Hansen's tutorial, App. B.3); IPOP ends once `staleRestarts` restarts in a row each
 * raised the best gain by less than `minRestartGain` dB. The polish that follows refines to POLISH_TOL.
 * tolX 0.03 rather than 0.01: the polish does the last part of the climb for fewer evaluations.
 * Measured (npm run bench -- --only optimizer, 1.5 λ lossless, seeds 1–5, one run): median total
 * evaluations K = 1…4 118, 832, 1,560, 2,769 at tolX 0.01 with a polish from step 0.02 to 1e-4;
 * 78, 672, 1,142, 2,359 now, median gains within 0.001 dB of the former.
 */
export const SEARCH_STOPPING: SearchStopping = { tolFun: 0.01, tolX: 0.03, staleRestarts: 1, minRestartGain: 0.03 };

/**
 * Direct feed keeps tolX 0.01: its feasible region is a narrow band of shapes, and at 0.03 the
 * catalog's centre-fed direct-feed cells came out both ways, up to 1.3 dB (bentwire-catalog-6:
 * 6 worse than at 0.01 by more than 0.02 dB, 3 better).
 */
export const DIRECT_FEED_STOPPING: SearchStopping = { ...SEARCH_STOPPING, tolX: 0.01 };

/** Nelder–Mead polish: simplex within this in z and its scores within this in dB. */
export const POLISH_TOL = 1e-3;

export interface SearchStopping {
  tolFun: number;
  tolX: number;
  tolHistFun?: number;
  /** Omitted: restarts continue until maxRestarts or the budget. */
  staleRestarts?: number;
  minRestartGain?: number;
}

export interface DesignOutcome {
  status: "ok" | "infeasible";
  message: string;
  x: number[];
  evaluation: Evaluation;
  evaluations: number;
  searchEvaluations: number;
  stopReasons: StopReason[];
  history: HistoryEntry[];
}

export interface DesignProgress {
  evaluations: number;
  bestGainDbi: number | null;
  /** Parameters of the best feasible shape so far (for a live drawing), null before one is found. */
  bestX: number[] | null;
}

export function designBentArm(
  r: DesignRequest,
  options: {
    start?: number[];
    polishOnly?: boolean;
    onProgress?: (p: DesignProgress) => void;
    stopping?: SearchStopping;
    skipPolishAboveSwr?: number;
  } = {},
): DesignOutcome {
  const n = 2 * r.piecesPerArm - 1;
  const { lower, upper } = parameterBounds(specOf(r), limitsOf(r), wavelengthM(r.frequencyHz));
  const toX = (z: readonly number[]) => z.map((v, i) => lower[i] + v * (upper[i] - lower[i]));
  const toZ = (x: readonly number[]) => x.map((v, i) => (upper[i] > lower[i] ? (v - lower[i]) / (upper[i] - lower[i]) : 0));
  const searchFrequencies = checkFrequencies(r, SEARCH_SWR_POINTS);
  const polishFrequencies = checkFrequencies(r, SWEEP_POINTS_IN_BAND);
  let evaluations = 0;
  let bestGain: number | null = null;
  let bestX: number[] | null = null;
  const score = (z: readonly number[], freqs: number[], limit: number) => {
    const x = toX(z);
    const e = evaluate(x, r, freqs, limit);
    evaluations++;
    const improved = isFeasible(e) && (bestGain === null || -e.score > bestGain);
    if (improved) [bestGain, bestX] = [-e.score, x];
    if (options.onProgress && (improved || evaluations % 20 === 0)) options.onProgress({ evaluations, bestGainDbi: bestGain, bestX });
    return e.score;
  };

  const clamp01 = (v: number) => Math.min(1, Math.max(0, v));
  const polishOnly = options.start !== undefined && options.polishOnly !== false;
  const zStart = options.start ? toZ(options.start).map(clamp01) : null;
  // the search starts at the box centre; a given start point competes with its best
  let z0 = polishOnly && zStart ? zStart : new Array(n).fill(0.5);
  let stopReasons: StopReason[] = [];
  let history: HistoryEntry[] = [];
  let searchEvaluations = 0;
  if (!polishOnly) {
    // a given start point competes with the search's best: the search never ends worse than it
    const startScore = zStart ? score(zStart, searchFrequencies, r.swrLimit * 0.975) : Infinity;
    const ipop = createIpop({
      x0: z0,
      sigma0: 0.25,
      lowerBounds: new Array(n).fill(0),
      upperBounds: new Array(n).fill(1),
      seed: r.seed,
      maxEvaluations: r.maxEvaluations ?? 500 * n + 500,
      maxRestarts: 4,
      ...(options.stopping ?? (r.variant === "direct-feed" ? DIRECT_FEED_STOPPING : SEARCH_STOPPING)),
    });
    while (ipop.stop().length === 0) {
      const zs = ipop.ask();
      ipop.tell(zs, zs.map((z) => score(z, searchFrequencies, r.swrLimit * 0.975)));
    }
    const result = ipop.result();
    z0 = result.f <= startScore || !zStart ? result.x : zStart;
    stopReasons = result.stopReasons;
    history = result.history.map((h) => ({ evaluations: h.evaluations, bestF: h.bestF }));
    searchEvaluations = result.evaluations;
  }
  if (polishOnly && zStart && options.skipPolishAboveSwr !== undefined) {
    const x = toX(zStart);
    const evaluation = evaluate(x, r, polishFrequencies, r.swrLimit);
    evaluations++;
    if (!isFeasible(evaluation) && evaluation.maxSwr !== null && !(evaluation.maxSwr <= options.skipPolishAboveSwr)) {
      const swrText = Number.isFinite(evaluation.maxSwr) ? evaluation.maxSwr.toFixed(1) : "∞";
      return {
        status: "infeasible",
        message: `no shape met every constraint: ${evaluation.reasons.join("; ")}; polish skipped, the start's SWR ${swrText} is above ${options.skipPolishAboveSwr}, too far from the limit for a local polish`,
        x,
        evaluation,
        evaluations,
        searchEvaluations: 0,
        stopReasons: [{ reason: "startFarFromFeasible", value: Number.isFinite(evaluation.maxSwr) ? evaluation.maxSwr : 1e9 }],
        history: [{ evaluations, bestF: evaluation.score }],
      };
    }
  }
  const polish = nelderMead((z) => score(z, polishFrequencies, r.swrLimit), {
    x0: z0.map(clamp01),
    initialStep: 0.01,
    lowerBounds: new Array(n).fill(0),
    upperBounds: new Array(n).fill(1),
    maxEvaluations: 60 * n,
    tolX: POLISH_TOL,
    tolFun: POLISH_TOL,
  });
  history.push(...polish.history.map((h) => ({ evaluations: h.evaluations + searchEvaluations, bestF: h.bestF })));
  const x = toX(polish.x);
  const evaluation = evaluate(x, r, polishFrequencies, r.swrLimit);
  const feasible = isFeasible(evaluation);
  return {
    status: feasible ? "ok" : "infeasible",
    message: feasible ? "constraints met" : `no shape met every constraint: ${evaluation.reasons.join("; ")}`,
    x,
    evaluation,
    evaluations,
    searchEvaluations,
    stopReasons: [...stopReasons, ...polish.stopReasons],
    history,
  };
}

export { shapeOf };
