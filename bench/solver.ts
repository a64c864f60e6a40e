// Solver timings: matrix fill, factorisation + solve, far-field peak search, for straight wires of
// about 31, 61 and 121 unknowns; the median of many runs. Also the real 2N×2N route through
// ml-matrix's LU, which the complex LU replaced (kept here so the choice stays measured).
import { LuDecomposition, Matrix } from "ml-matrix";
import { buildMesh, createFarFieldPlan, fillImpedance, findPeak, solveComplex } from "../generator/em/index.js";
import { straightDipole } from "../test/helpers/shapes.js";

export interface SolverCase {
  unknowns: number;
  fillMs: number;
  solveMs: number;
  peakMs: number;
  totalMs: number;
  realFormSolveMs: number;
}

const median = (xs: number[]) => {
  const s = [...xs].sort((a, b) => a - b);
  return s[Math.floor(s.length / 2)];
};

function realFormSolve(re: Float64Array, im: Float64Array, n: number, feed: number): number {
  // [Zr −Zi; Zi Zr]·[xr; xi] = [br; bi]
  const m = new Matrix(2 * n, 2 * n);
  for (let i = 0; i < n; i++) {
    for (let j = 0; j < n; j++) {
      const r = re[i * n + j], c = im[i * n + j];
      m.set(i, j, r); m.set(i, j + n, -c); m.set(i + n, j, c); m.set(i + n, j + n, r);
    }
  }
  const b = Matrix.zeros(2 * n, 1);
  b.set(feed, 0, 1);
  return new LuDecomposition(m).solve(b).get(feed, 0);
}

export function benchSolver(runs = 200): SolverCase[] {
  const cases: SolverCase[] = [];
  for (const armSegments of [16, 31, 61]) {
    const shape = straightDipole((2 * armSegments) / 25, 1e-3, { segmentsPerWavelength: 25 });
    const mesh = buildMesh(shape);
    const k = 2 * Math.PI;
    const fill: number[] = [], solve: number[] = [], peak: number[] = [], real: number[] = [];
    for (let r = 0; r < runs; r++) {
      const t0 = performance.now();
      const z = fillImpedance(mesh, k);
      const t1 = performance.now();
      const b = new Float64Array(mesh.unknowns);
      b[mesh.feedBasis] = 1;
      const x = solveComplex(z, b, new Float64Array(mesh.unknowns));
      const t2 = performance.now();
      findPeak(createFarFieldPlan(mesh, x.re, x.im, k));
      const t3 = performance.now();
      if (r % 4 === 0) {
        realFormSolve(z.re, z.im, z.n, mesh.feedBasis);
        real.push(performance.now() - t3);
      }
      fill.push(t1 - t0); solve.push(t2 - t1); peak.push(t3 - t2);
    }
    const [f, s, p] = [median(fill), median(solve), median(peak)];
    cases.push({ unknowns: mesh.unknowns, fillMs: f, solveMs: s, peakMs: p, totalMs: f + s + p, realFormSolveMs: median(real) });
  }
  return cases;
}
