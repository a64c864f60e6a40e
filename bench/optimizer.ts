// Optimizer table: for K = 1…4 pieces per arm on a 1.5λ lossless wire (radius 1e-3 λ, 25 segments/λ),
// over 5 seeds, the evaluations, wall and CPU time each run needed to come within 0.05 dB of the best
// gain any seed found; median and worst; and per design the total evaluations, the CPU seconds
// (process.cpuUsage, user + system: a figure that holds on a busy machine), the gain and the stop
// reasons.
import { designBentArm } from "../generator/design/designBentArm.js";
import { parseDesignRequest } from "../generator/design/request.js";

export interface OptimizerDesign {
  seed: number;
  evaluations: number;
  searchEvaluations: number;
  cpuSeconds: number;
  wallSeconds: number;
  gainDbi: number | null;
  stopReasons: string[];
}

export interface OptimizerCase {
  piecesPerArm: number;
  bestGainDbi: number;
  medianGainDbi: number;
  worstGainDbi: number;
  medianEvaluations: number;
  worstEvaluations: number;
  medianSeconds: number;
  worstSeconds: number;
  medianTotalEvaluations: number;
  medianCpuSeconds: number;
  designs: OptimizerDesign[];
}

const median = (xs: number[]) => [...xs].sort((a, b) => a - b)[Math.floor(xs.length / 2)];
const cpuSecondsSince = (c0: NodeJS.CpuUsage) => {
  const c = process.cpuUsage(c0);
  return (c.user + c.system) / 1e6;
};

export function benchOptimizer(seeds = [1, 2, 3, 4, 5], pieces = [1, 2, 3, 4]): OptimizerCase[] {
  return pieces.map((k) => {
    const runs = seeds.map((seed) => {
      const trace: { evaluations: number; seconds: number; gain: number }[] = [];
      const t0 = performance.now();
      const c0 = process.cpuUsage();
      const r = parseDesignRequest({ frequencyHz: 299_792_458, lengthWl: 1.5, piecesPerArm: k, wireDiameterM: 2e-3, conductor: "perfect", seed });
      const outcome = designBentArm(r, {
        onProgress: (p) => p.bestGainDbi !== null && trace.push({ evaluations: p.evaluations, seconds: (performance.now() - t0) / 1000, gain: p.bestGainDbi }),
      });
      const design: OptimizerDesign = {
        seed,
        evaluations: outcome.evaluations,
        searchEvaluations: outcome.searchEvaluations,
        cpuSeconds: cpuSecondsSince(c0),
        wallSeconds: (performance.now() - t0) / 1000,
        gainDbi: outcome.evaluation.gainDbi,
        stopReasons: outcome.stopReasons.map((s) => `${s.reason}=${Number(s.value.toPrecision(3))}`),
      };
      return { trace, design, gain: outcome.evaluation.gainDbi ?? -Infinity };
    });
    const best = Math.max(...runs.map((r) => r.gain));
    const reached = runs.map((r) => r.trace.find((t) => t.gain >= best - 0.05) ?? { evaluations: Infinity, seconds: Infinity });
    return {
      piecesPerArm: k,
      bestGainDbi: best,
      medianGainDbi: median(runs.map((r) => r.gain)),
      worstGainDbi: Math.min(...runs.map((r) => r.gain)),
      medianEvaluations: median(reached.map((t) => t.evaluations)),
      worstEvaluations: Math.max(...reached.map((t) => t.evaluations)),
      medianSeconds: median(reached.map((t) => t.seconds)),
      worstSeconds: Math.max(...reached.map((t) => t.seconds)),
      medianTotalEvaluations: median(runs.map((r) => r.design.evaluations)),
      medianCpuSeconds: median(runs.map((r) => r.design.cpuSeconds)),
      designs: runs.map((r) => r.design),
    };
  });
}
