// Optimizer table: for K = 1…4 pieces per arm on a 1.5λ lossless wire (radius 1e-3 λ), over 5 seeds,
// the evaluations and wall time each run needed to come within 0.05 dB of the best gain any seed
// found; median and worst.
import { designBentArm } from "../generator/design/designBentArm.js";
import { parseDesignRequest } from "../generator/design/request.js";

export interface OptimizerCase {
  piecesPerArm: number;
  bestGainDbi: number;
  medianEvaluations: number;
  worstEvaluations: number;
  medianSeconds: number;
  worstSeconds: number;
  medianTotalEvaluations: number;
}

const median = (xs: number[]) => [...xs].sort((a, b) => a - b)[Math.floor(xs.length / 2)];

export function benchOptimizer(seeds = [1, 2, 3, 4, 5], pieces = [1, 2, 3, 4]): OptimizerCase[] {
  return pieces.map((k) => {
    const runs = seeds.map((seed) => {
      const trace: { evaluations: number; seconds: number; gain: number }[] = [];
      const t0 = performance.now();
      const r = parseDesignRequest({ frequencyHz: 299_792_458, lengthWl: 1.5, piecesPerArm: k, wireDiameterM: 2e-3, conductor: "perfect", seed });
      const outcome = designBentArm(r, {
        onProgress: (p) => p.bestGainDbi !== null && trace.push({ evaluations: p.evaluations, seconds: (performance.now() - t0) / 1000, gain: p.bestGainDbi }),
      });
      return { trace, total: outcome.evaluations, gain: outcome.evaluation.gainDbi ?? -Infinity };
    });
    const best = Math.max(...runs.map((r) => r.gain));
    const reached = runs.map((r) => r.trace.find((t) => t.gain >= best - 0.05) ?? { evaluations: Infinity, seconds: Infinity });
    return {
      piecesPerArm: k,
      bestGainDbi: best,
      medianEvaluations: median(reached.map((t) => t.evaluations)),
      worstEvaluations: Math.max(...reached.map((t) => t.evaluations)),
      medianSeconds: median(reached.map((t) => t.seconds)),
      worstSeconds: Math.max(...reached.map((t) => t.seconds)),
      medianTotalEvaluations: median(runs.map((r) => r.total)),
    };
  });
}
