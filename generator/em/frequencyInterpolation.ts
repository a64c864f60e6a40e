// Input impedance over a narrow band on one fixed mesh, with the moment matrix filled at three
// frequencies and interpolated in between (model-based parameter estimation of the matrix: Newman,
// "Matrix interpolation for the method of moments", and the matrix interpolation of Virga &
// Rahmat-Samii, IEEE Trans. AP 45, 1997 — from memory). Each entry is made smooth in frequency by
// removing its propagation phase and the 1/k of its charge term (Z = jη/4π·[k·A − Φ/k], see
// impedance.ts, so k·Z is a quadratic in k apart from the phase), then interpolated quadratically
// (Lagrange) in f:
//   Z̃_mn(f) = k·Z_mn(f)·e^{+jk(f)R_mn},  Z̃_mn(f) ≈ Σ_j ℓ_j(f) Z̃_mn(f_j),  Z_mn(f) = e^{−jk(f)R_mn} Z̃_mn(f)/k,
// R_mn the distance between the nodes of bases m and n, f_j the band's low edge, centre and high
// edge. Conductor loss (∝ √f) is added exactly at each f. Above MAX_RELATIVE_BANDWIDTH the matrix is
// filled directly at every frequency (same fixed mesh). The error against direct fills is checked
// in test/em/frequencyInterpolation.test.ts.
import { SPEED_OF_LIGHT_M_PER_S } from "../units.js";
import { createComplexMatrix, type ComplexMatrix } from "./complexLu.js";
import { addConductorLoss, fillImpedance, surfaceResistancePerM } from "./impedance.js";
import { buildMesh, DEFAULT_SEGMENTS_PER_WAVELENGTH, type Mesh } from "./mesh.js";
import { fillImpedanceMirror, solveImpedanceSystem } from "./mirrorSolve.js";
import { detectMirrorSymmetry, type MirrorSymmetry } from "./mirrorSymmetry.js";
import type { Shape } from "./shapeFile.js";
import { feedGapM, feedSegmentM, gapCurrent } from "./feedSource.js";
import { conductivityOf, feedExcitation, solveFeed } from "./solve.js";

/** (f_max − f_min)/f_centre above which every frequency gets its own fill. */
export const MAX_RELATIVE_BANDWIDTH = 0.08;

const wavenumber = (f: number) => (2 * Math.PI * f) / SPEED_OF_LIGHT_M_PER_S;

function fill(mesh: Mesh, f: number, sym: MirrorSymmetry | null): ComplexMatrix {
  return sym ? fillImpedanceMirror(mesh, wavenumber(f), sym) : fillImpedance(mesh, wavenumber(f));
}

/** Node position of every basis function (the node shared by its two segments). */
function basisNodes(mesh: Mesh): Float64Array {
  const xyz = new Float64Array(3 * mesh.unknowns);
  for (let s = 0; s < mesh.segmentCount; s++) {
    const b = mesh.basisAtEnd[s];
    if (b < 0) continue;
    for (let c = 0; c < 3; c++) xyz[3 * b + c] = mesh.start[3 * s + c] + mesh.dir[3 * s + c] * mesh.lengthM[s];
  }
  return xyz;
}

/**
 * Input impedance at each frequency, on the mesh of `shape` at its own frequency (fixed across the
 * band). `interpolate: false` forces direct fills (the reference the interpolation is tested against).
 */
export function bandImpedances(shape: Shape, frequenciesHz: readonly number[], options: { interpolate?: boolean } = {}): { re: number; im: number }[] {
  if (frequenciesHz.length === 0) return [];
  const gapM = feedGapM(shape.frequencyHz); // the design's gap, fixed in metres across the band
  if (shape.ground) {
    // over ground the image terms join the matrix (solve.ts): solve each frequency on the same mesh
    const spw = shape.segmentsPerWavelength ?? DEFAULT_SEGMENTS_PER_WAVELENGTH;
    return frequenciesHz.map((f) => solveFeed({ ...shape, frequencyHz: f }, { segmentsPerWavelength: (spw * shape.frequencyHz) / f, feedGapM: gapM }).inputImpedanceOhm);
  }
  const mesh = buildMesh(shape, undefined, feedSegmentM(gapM, shape.wires[shape.feed.wire].radiusM ?? shape.wireRadiusM), true); // as solveFeed meshes it
  const sym = detectMirrorSymmetry(mesh);
  const n = mesh.unknowns;
  const lo = Math.min(...frequenciesHz), hi = Math.max(...frequenciesHz);
  const mid = 0.5 * (lo + hi);
  const interpolate = options.interpolate !== false && hi > lo && (hi - lo) / mid <= MAX_RELATIVE_BANDWIDTH && frequenciesHz.length > 3;
  const sigma = conductivityOf(shape.conductor);
  const bRe = feedExcitation(shape, mesh, gapM), bIm = new Float64Array(n); // as in solveFeed
  let nodes: { f: number[]; tilde: ComplexMatrix[]; dist: Float64Array } | null = null;
  if (interpolate) {
    const f = [lo, mid, hi];
    const xyz = basisNodes(mesh);
    const dist = new Float64Array(n * n);
    for (let m = 0; m < n; m++) for (let q = 0; q < n; q++) {
      dist[m * n + q] = Math.hypot(xyz[3 * m] - xyz[3 * q], xyz[3 * m + 1] - xyz[3 * q + 1], xyz[3 * m + 2] - xyz[3 * q + 2]);
    }
    const tilde = f.map((fj) => {
      const z = fill(mesh, fj, sym);
      const k = wavenumber(fj);
      for (let e = 0; e < n * n; e++) { // Z̃ = k·Z·e^{+jkR}
        const c = k * Math.cos(k * dist[e]), s = k * Math.sin(k * dist[e]);
        const r = z.re[e], i = z.im[e];
        z.re[e] = r * c - i * s;
        z.im[e] = r * s + i * c;
      }
      return z;
    });
    nodes = { f, tilde, dist };
  }
  return frequenciesHz.map((f) => {
    let z: ComplexMatrix;
    if (nodes) {
      const [f0, f1, f2] = nodes.f;
      const l0 = ((f - f1) * (f - f2)) / ((f0 - f1) * (f0 - f2));
      const l1 = ((f - f0) * (f - f2)) / ((f1 - f0) * (f1 - f2));
      const l2 = ((f - f0) * (f - f1)) / ((f2 - f0) * (f2 - f1));
      const [a, b, c] = nodes.tilde;
      const k = wavenumber(f);
      z = createComplexMatrix(n);
      for (let e = 0; e < n * n; e++) {
        const tr = l0 * a.re[e] + l1 * b.re[e] + l2 * c.re[e];
        const ti = l0 * a.im[e] + l1 * b.im[e] + l2 * c.im[e];
        const cs = Math.cos(k * nodes.dist[e]) / k, sn = Math.sin(k * nodes.dist[e]) / k; // Z = Z̃·e^{−jkR}/k
        z.re[e] = tr * cs + ti * sn;
        z.im[e] = ti * cs - tr * sn;
      }
    } else {
      z = fill(mesh, f, sym);
    }
    if (Number.isFinite(sigma)) {
      const rPerM = new Float64Array(mesh.segmentCount);
      for (let s = 0; s < mesh.segmentCount; s++) rPerM[s] = surfaceResistancePerM(f, mesh.radiusM[s], sigma);
      addConductorLoss(z, mesh, rPerM);
    }
    const x = solveImpedanceSystem(z, sym, bRe, bIm);
    const { re: ir, im: ii } = gapCurrent(bRe, x.re, x.im);
    const i2 = ir * ir + ii * ii;
    return { re: ir / i2, im: -ii / i2 };
  });
}
