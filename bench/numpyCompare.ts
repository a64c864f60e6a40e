// Our fill + LU against a numpy/scipy reference of the same computation (bench/numpyReference.py:
// the same thin-wire Galerkin matrix, quadrature and singular-term treatment, ported and vectorised
// over segment pairs, then LAPACK's LU with partial pivoting through scipy), in one process run.
// Straight wires centre-fed with a unit voltage on the feed basis function, as bench/solver.ts
// solves them (25 segments/λ, radius λ/1000, about 31, 61 and 121 unknowns). CPU seconds on both
// sides (ours: process.cpuUsage, user + system; numpy: time.process_time), the median over many
// runs after a warm-up, since the machine is shared. The input impedances are compared too, so the
// two sides are known to compute the same thing; and once with the finite-gap feed and the mesh
// solveFeed builds (feed and ends graded), against solveFeed itself.
import { spawnSync } from "node:child_process";
import { fileURLToPath } from "node:url";
import { buildMesh, fillImpedance, solveComplex, solveFeed } from "../generator/em/index.js";
import { fillImpedanceMirror, solveImpedanceSystem } from "../generator/em/mirrorSolve.js";
import { detectMirrorSymmetry } from "../generator/em/mirrorSymmetry.js";
import { wavenumberRadPerM } from "../generator/units.js";
import { straightDipole } from "../test/helpers/shapes.js";

const REFERENCE = fileURLToPath(new URL("./numpyReference.py", import.meta.url));
const SEGMENTS_PER_WAVELENGTH = 25;
const RADIUS_WL = 1e-3;

interface Impedance { re: number; im: number }

export interface NumpyCase {
  unknowns: number;
  /** Median CPU seconds of one fill and of one LU + solve. */
  oursFillS: number;
  oursLuSolveS: number;
  numpyFillS: number;
  numpyLuSolveS: number;
  /** (our fill + LU + solve) / (numpy's), medians. */
  ratio: number;
  /** The path solveFeed takes on this mesh (mirror fill + even-mode LDLᵀ), median CPU s, and its ratio to numpy's fill + LU. */
  oursMirrorS: number;
  mirrorRatio: number;
  /** numpy's fill + LU + solve median in each round (the spread shows the machine's noise). */
  numpyRoundTotalsS: number[];
  oursImpedanceOhm: Impedance;
  numpyImpedanceOhm: Impedance;
  relativeDifference: number;
}

export interface NumpyComparison {
  /** Our runs and the reference's repetitions per round, and the rounds per wire. */
  runs: number;
  numpyRepetitions: number;
  rounds: number;
  versions: { python: string; numpy: string; scipy: string };
  cases: NumpyCase[];
  /** Finite-gap feed: solveFeed (as solveShape runs it) against the reference on the same wire. */
  gap: { lengthWl: number; unknowns: number; oursImpedanceOhm: Impedance; numpyImpedanceOhm: Impedance; relativeDifference: number };
}

interface ReferenceResult {
  unknowns: number;
  inputImpedanceOhm: Impedance;
  fillS: number;
  luSolveS: number;
  python: string;
  numpy: string;
  scipy: string;
}

/** Why the comparison cannot run (no python3, or no numpy/scipy), or null when it can. */
export function numpyMissing(): string | null {
  const r = spawnSync("python3", ["-c", "import numpy, scipy.linalg"], { encoding: "utf8" });
  if (r.error) return `python3 not found (${r.error.message})`;
  if (r.status !== 0) return `python3 has no numpy/scipy (${r.stderr.trim().split("\n").pop()})`;
  return null;
}

function reference(c: { frequencyHz: number; lengthM: number; radiusM: number; segmentsPerWavelength: number; repetitions: number; feed: "delta" | "gap" }): ReferenceResult {
  const r = spawnSync("python3", [REFERENCE, JSON.stringify(c)], {
    encoding: "utf8",
    env: { ...process.env, OPENBLAS_NUM_THREADS: "1", OMP_NUM_THREADS: "1", MKL_NUM_THREADS: "1" },
  });
  if (r.status !== 0) throw new Error(`numpyReference.py failed: ${r.error?.message ?? r.stderr}`);
  return JSON.parse(r.stdout) as ReferenceResult;
}

const median = (xs: number[]) => {
  const s = [...xs].sort((a, b) => a - b);
  return s[Math.floor(s.length / 2)];
};
const cpuS = () => { const c = process.cpuUsage(); return (c.user + c.system) / 1e6; };
const relDiff = (a: Impedance, b: Impedance) => Math.hypot(a.re - b.re, a.im - b.im) / Math.hypot(a.re, a.im);
const inverse = (re: number, im: number): Impedance => { const d = re * re + im * im; return { re: re / d, im: -im / d }; };

/**
 * Per wire: `rounds` rounds, each `runs` of ours then one reference process of `numpyRepetitions`,
 * so a change in the machine's load falls on both sides; our medians pool all runs, numpy's is the
 * median of its rounds' medians.
 */
export function benchNumpyCompare(runs = 150, numpyRepetitions = 70, rounds = 3, armSegments = [16, 31, 61]): NumpyComparison {
  const cases: NumpyCase[] = [];
  let versions = { python: "", numpy: "", scipy: "" };
  for (const arm of armSegments) {
    const lengthWl = (2 * arm) / SEGMENTS_PER_WAVELENGTH;
    const shape = straightDipole(lengthWl, RADIUS_WL, { segmentsPerWavelength: SEGMENTS_PER_WAVELENGTH });
    const mesh = buildMesh(shape); // uniform, as bench/solver.ts
    const k = wavenumberRadPerM(shape.frequencyHz);
    const b = new Float64Array(mesh.unknowns);
    b[mesh.feedBasis] = 1;
    const zero = new Float64Array(mesh.unknowns);
    const fill: number[] = [], lu: number[] = [], mirror: number[] = [];
    const pyFill: number[] = [], pyLu: number[] = [];
    let x: { re: Float64Array; im: Float64Array } = { re: zero, im: zero };
    let py: ReferenceResult | null = null;
    for (let round = 0; round < rounds; round++) {
      for (let r = 0; r < runs + (round === 0 ? 50 : 0); r++) { // the first 50: warm-up (the JIT)
        const c0 = cpuS();
        const z = fillImpedance(mesh, k);
        const c1 = cpuS();
        x = solveComplex(z, b, zero, true);
        const c2 = cpuS();
        const sym = detectMirrorSymmetry(mesh);
        solveImpedanceSystem(sym ? fillImpedanceMirror(mesh, k, sym) : fillImpedance(mesh, k), sym, b, zero);
        const c3 = cpuS();
        if (round === 0 && r < 50) continue;
        fill.push(c1 - c0); lu.push(c2 - c1); mirror.push(c3 - c2);
      }
      py = reference({ frequencyHz: shape.frequencyHz, lengthM: lengthWl, radiusM: RADIUS_WL, segmentsPerWavelength: SEGMENTS_PER_WAVELENGTH, repetitions: numpyRepetitions, feed: "delta" });
      if (py.unknowns !== mesh.unknowns) throw new Error(`numpyReference.py meshed ${py.unknowns} unknowns, ours ${mesh.unknowns}`);
      pyFill.push(py.fillS); pyLu.push(py.luSolveS);
    }
    if (!py) throw new Error("benchNumpyCompare: rounds must be at least 1");
    versions = { python: py.python, numpy: py.numpy, scipy: py.scipy };
    const ours = inverse(x.re[mesh.feedBasis], x.im[mesh.feedBasis]);
    const [f, s, m, pf, ps] = [median(fill), median(lu), median(mirror), median(pyFill), median(pyLu)];
    cases.push({
      unknowns: mesh.unknowns, oursFillS: f, oursLuSolveS: s, numpyFillS: pf, numpyLuSolveS: ps,
      ratio: (f + s) / (pf + ps), oursMirrorS: m, mirrorRatio: m / (pf + ps), numpyRoundTotalsS: pyFill.map((v, i) => v + pyLu[i]),
      oursImpedanceOhm: ours, numpyImpedanceOhm: py.inputImpedanceOhm, relativeDifference: relDiff(ours, py.inputImpedanceOhm),
    });
  }
  // the finite gap and solveFeed's graded mesh, on the 61-unknown wire (not timed)
  const lengthWl = (2 * 31) / SEGMENTS_PER_WAVELENGTH;
  const shape = straightDipole(lengthWl, RADIUS_WL, { segmentsPerWavelength: SEGMENTS_PER_WAVELENGTH });
  const feed = solveFeed(shape);
  const py = reference({ frequencyHz: shape.frequencyHz, lengthM: lengthWl, radiusM: RADIUS_WL, segmentsPerWavelength: SEGMENTS_PER_WAVELENGTH, repetitions: 1, feed: "gap" });
  if (py.unknowns !== feed.mesh.unknowns) throw new Error(`numpyReference.py meshed ${py.unknowns} unknowns for the gap feed, solveFeed ${feed.mesh.unknowns}`);
  return {
    runs, numpyRepetitions, rounds, versions, cases,
    gap: { lengthWl, unknowns: feed.mesh.unknowns, oursImpedanceOhm: feed.inputImpedanceOhm, numpyImpedanceOhm: py.inputImpedanceOhm, relativeDifference: relDiff(feed.inputImpedanceOhm, py.inputImpedanceOhm) },
  };
}
