// Solver timings: matrix fill, factorisation + solve, far-field peak search, for straight wires of
// about 31, 61 and 121 unknowns; the median of many runs. Also the real 2N×2N route through
// ml-matrix's LU, which the complex LU replaced (kept here so the choice stays measured), and the
// same-run comparison of the previous fill + LU (bench/previous/, commit fb07cb0) with today's path
// (mirror fill + even-mode LDLᵀ where the mesh is symmetric; general fill + LU otherwise), as a
// median-time ratio and in CPU seconds over all runs (process.cpuUsage).
import { LuDecomposition, Matrix } from "ml-matrix";
import { buildMesh, createFarFieldPlan, fillImpedance, findPeak, solveComplex } from "../generator/em/index.js";
import { solveComplexSymmetric } from "../generator/em/complexLdlt.js";
import { fillImpedanceMirror, solveMirrorSymmetric } from "../generator/em/mirrorSolve.js";
import { detectMirrorSymmetry } from "../generator/em/mirrorSymmetry.js";
import { straightDipole } from "../test/helpers/shapes.js";
import { fillImpedance as previousFill } from "./previous/impedance.js";

export interface SolverCase {
  unknowns: number;
  fillMs: number;
  solveMs: number;
  ldltSolveMs: number;
  peakMs: number;
  totalMs: number;
  realFormSolveMs: number;
  /** Previous fill + LU against today's symmetric fill + even-mode solve (median ms each). */
  previousFillLuMs: number;
  mirrorFillSolveMs: number;
  previousOverCurrent: number;
  previousCpuS: number;
  currentCpuS: number;
}

const median = (xs: number[]) => {
  const s = [...xs].sort((a, b) => a - b);
  return s[Math.floor(s.length / 2)];
};
const cpuS = (c: NodeJS.CpuUsage) => (c.user + c.system) / 1e6;

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
    const fill: number[] = [], solve: number[] = [], ldlt: number[] = [], peak: number[] = [], real: number[] = [];
    const previous: number[] = [], current: number[] = [];
    let previousCpu = 0, currentCpu = 0;
    for (let r = 0; r < runs; r++) {
      const t0 = performance.now();
      const z = fillImpedance(mesh, k);
      const t1 = performance.now();
      const b = new Float64Array(mesh.unknowns);
      b[mesh.feedBasis] = 1;
      const zero = new Float64Array(mesh.unknowns);
      const x = solveComplex(z, b, zero);
      const t2 = performance.now();
      findPeak(createFarFieldPlan(mesh, x.re, x.im, k));
      const t3 = performance.now();
      solveComplexSymmetric(z, b, zero);
      ldlt.push(performance.now() - t3);
      if (r % 4 === 0) {
        const t4 = performance.now();
        realFormSolve(z.re, z.im, z.n, mesh.feedBasis);
        real.push(performance.now() - t4);
      }
      fill.push(t1 - t0); solve.push(t2 - t1); peak.push(t3 - t2);
      // previous against current, alternating so machine load hits both alike
      let c0 = process.cpuUsage();
      const t5 = performance.now();
      solveComplex(previousFill(mesh, k), b, zero, true);
      previous.push(performance.now() - t5);
      previousCpu += cpuS(process.cpuUsage(c0));
      c0 = process.cpuUsage();
      const t6 = performance.now();
      const sym = detectMirrorSymmetry(mesh);
      if (sym) solveMirrorSymmetric(fillImpedanceMirror(mesh, k, sym), sym, b, zero);
      else solveComplex(fillImpedance(mesh, k), b, zero, true);
      current.push(performance.now() - t6);
      currentCpu += cpuS(process.cpuUsage(c0));
    }
    const [f, s, p] = [median(fill), median(solve), median(peak)];
    const [pm, cm] = [median(previous), median(current)];
    cases.push({
      unknowns: mesh.unknowns, fillMs: f, solveMs: s, ldltSolveMs: median(ldlt), peakMs: p, totalMs: f + s + p, realFormSolveMs: median(real),
      previousFillLuMs: pm, mirrorFillSolveMs: cm, previousOverCurrent: pm / cm, previousCpuS: previousCpu, currentCpuS: currentCpu,
    });
  }
  return cases;
}
