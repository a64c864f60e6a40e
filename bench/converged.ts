// Converged against single-mesh analysis of a 1.5λ K = 3 design at 145 MHz (sweep of 17
// frequencies, match, 64-sample tolerance study, pattern figures): CPU seconds (process.cpuUsage,
// median of a few runs after one warm-up) and the solves the mesh refinement made.
import { analyzeDesign, refineMesh, bandCheckFrequencies } from "../generator/analysis/index.js";
import { shapeOf } from "../generator/design/objective.js";
import { parseDesignRequest } from "../generator/design/request.js";

// a 1.5λ K = 3 shape near the optimum (parameters from a design run, seed 1), as bench/analysis.ts
const X_K3 = [1.183, -0.528, 0.693, 0.092, 0.427];
const BAND: [number, number] = [144e6, 146e6];
const TOLERANCE = { samples: 64, bendSigmaDeg: 2, lengthSigmaFraction: 0.005, seed: 1 };

const cpuS = (f: () => void): number => {
  const t = process.cpuUsage();
  f();
  const c = process.cpuUsage(t);
  return (c.user + c.system) / 1e6;
};
const median = (v: number[]) => [...v].sort((a, b) => a - b)[Math.floor(v.length / 2)];

export function benchConverged(runs = 3) {
  const r = parseDesignRequest({ frequencyHz: 145e6, lengthWl: 1.5, piecesPerArm: 3, wireDiameterM: 2e-3, conductor: "copper" });
  const shape = shapeOf(X_K3, r);
  const options = { bandHz: BAND, lineImpedanceOhm: 50, tolerance: TOLERANCE };
  analyzeDesign(shape, options); // warm-up
  const single: number[] = [], converged: number[] = [];
  for (let i = 0; i < runs; i++) {
    single.push(cpuS(() => analyzeDesign(shape, { ...options, segmentsPerWavelength: 25 })));
    converged.push(cpuS(() => analyzeDesign(shape, options)));
  }
  const refinement = refineMesh(shape, { checkFrequenciesHz: bandCheckFrequencies(BAND) }, new Map());
  return {
    singleMeshCpuS: median(single),
    convergedCpuS: median(converged),
    runs,
    publishedSegmentsPerWavelength: refinement.segmentsPerWavelength,
    refinementSolves: refinement.solves,
    gainChangeDb: refinement.change.gainDb,
    impedanceChangePercent: 100 * refinement.change.impedanceFraction,
  };
}
