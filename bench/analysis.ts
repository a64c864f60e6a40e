// Full analysis of a 1.5λ K = 3 design (sweep of 17 frequencies, match, 64-sample tolerance study,
// pattern figures, segment convergence): median wall time of a few runs.
import { analyzeDesign } from "../generator/analysis/index.js";
import { shapeOf } from "../generator/design/objective.js";
import { parseDesignRequest } from "../generator/design/request.js";

// a 1.5λ K = 3 shape near the optimum (parameters from a design run, seed 1)
const X_K3 = [1.183, -0.528, 0.693, 0.092, 0.427];

export function benchAnalysis(runs = 5): { medianMs: number; runs: number } {
  const r = parseDesignRequest({ frequencyHz: 145e6, lengthWl: 1.5, piecesPerArm: 3, wireDiameterM: 2e-3, conductor: "copper" });
  const shape = shapeOf(X_K3, r);
  const times: number[] = [];
  for (let i = 0; i < runs; i++) {
    const t0 = performance.now();
    analyzeDesign(shape, { bandHz: [144e6, 146e6], lineImpedanceOhm: 50, tolerance: { samples: 64, bendSigmaDeg: 2, lengthSigmaFraction: 0.005, seed: 1 } });
    times.push(performance.now() - t0);
  }
  return { medianMs: [...times].sort((a, b) => a - b)[Math.floor(runs / 2)], runs };
}
