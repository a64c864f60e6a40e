// Searches the whole sphere for the direction of peak radiation intensity and integrates the
// pattern. Peak: a coarse grid (step h0 in θ and φ) plus, sampled at h0/2, the great circles of the
// planes the pattern is mirror-symmetric about (the wire plane of a planar shape, the mirror plane of
// a symmetric one: patternSymmetry.ts), where a maximum often lies exactly and a θ–φ grid may step
// over it; the best few local maxima of the grid and the best of each circle are refined by a
// compass search on the tangent plane that halves its step until h < hMin (Kolda, Lewis & Torczon,
// "Optimization by direct search", SIAM Review 45, 2003, §3). A warm start (PeakOptions.starts, for
// slightly changed copies of a solved shape) skips the grid and refines from the given directions
// only, from a smaller first step. Integral: P = ∫U dΩ = ∫_{−1}^{1} d(cosθ) ∫_0^{2π} U dφ,
// Gauss–Legendre in cosθ and the trapezoid rule in φ (exact for trigonometric polynomials of
// degree below the point count). Shapes in the x–y plane are mirror-symmetric in |E| about it,
// so only the upper hemisphere is visited for them.
import { RAD_PER_DEG } from "../units.js";
import { intensityAt, type FarFieldPlan } from "./farField.js";
import { gaussLegendre01 } from "./gaussLegendre.js";
import { mirrorDirection, symmetryPlanes, type SymmetryPlane, type V3 } from "./patternSymmetry.js";

export interface Direction {
  thetaRad: number;
  phiRad: number;
}

export interface PeakOptions {
  gridStepDeg: number;
  refineToDeg: number;
  /** Grid maxima refined (the best of each symmetry circle is refined as well). */
  candidates: number;
  /** Warm start: refine from these directions only, first step warmStepDeg (default gridStepDeg/4). */
  starts?: readonly Direction[];
  warmStepDeg?: number;
}

export const DEFAULT_PEAK_OPTIONS: PeakOptions = { gridStepDeg: 12, refineToDeg: 0.01, candidates: 3 };

export interface Peak {
  thetaRad: number;
  phiRad: number;
  intensityWPerSr: number;
  /** Far-field evaluations spent. */
  evaluations: number;
  /** Distinct refined maxima, best first, with their mirror images: the starts for a warm search. */
  maxima: Direction[];
  planes: SymmetryPlane[];
}

const toDirection = (v: readonly number[]): Direction => {
  const rho = Math.hypot(v[0], v[1]);
  return { thetaRad: Math.atan2(rho, v[2]), phiRad: rho < 1e-12 ? 0 : (Math.atan2(v[1], v[0]) + 2 * Math.PI) % (2 * Math.PI) };
};
const unitOf = (d: Direction): V3 => [Math.sin(d.thetaRad) * Math.cos(d.phiRad), Math.sin(d.thetaRad) * Math.sin(d.phiRad), Math.cos(d.thetaRad)];

/** Far-field evaluations one refinement may spend. */
const MAX_REFINE_EVALUATIONS = 400;

interface Start { theta: number; phi: number; value: number }

export function findPeak(plan: FarFieldPlan, options: PeakOptions = DEFAULT_PEAK_OPTIONS): Peak {
  const scratch = new Float64Array(4);
  let evaluations = 0;
  const U = (theta: number, phi: number) => { evaluations++; return intensityAt(plan, theta, phi, scratch); };
  const warm = options.starts !== undefined && options.starts.length > 0;
  const planes = warm ? [] : symmetryPlanes(plan);
  const starts = warm
    ? options.starts!.map((d) => ({ theta: d.thetaRad, phi: d.phiRad, value: U(d.thetaRad, d.phiRad) }))
    : coarseStarts(plan, options, planes, U);
  const step0 = (warm ? options.warmStepDeg ?? options.gridStepDeg / 4 : options.gridStepDeg / 2) * RAD_PER_DEG;
  const refined = starts.map((s) => refine(plan, s.theta, s.phi, s.value, step0, options, U));
  refined.sort((a, b) => b.intensityWPerSr - a.intensityWPerSr);
  const best = refined[0];
  return { ...best, evaluations, maxima: distinctMaxima(refined, planes), planes };
}

/** Grid local maxima (best `candidates`) and the best sample of each symmetry circle. */
function coarseStarts(plan: FarFieldPlan, options: PeakOptions, planes: SymmetryPlane[], U: (t: number, p: number) => number): Start[] {
  const thetaMaxDeg = plan.planarXy ? 90 : 180;
  const nt = Math.ceil(thetaMaxDeg / options.gridStepDeg);
  const ht = (thetaMaxDeg / nt) * RAD_PER_DEG;
  const np = Math.ceil(360 / options.gridStepDeg);
  const hp = (2 * Math.PI) / np;
  // grid, poles visited once
  const u = new Float64Array((nt + 1) * np);
  for (let i = 0; i <= nt; i++) {
    const pole = i === 0 || (i === nt && !plan.planarXy);
    for (let j = 0; j < np; j++) u[i * np + j] = pole && j > 0 ? u[i * np] : U(i * ht, j * hp);
  }
  // local maxima of the grid (φ wraps; the equator of a planar shape mirrors onto itself)
  const maxima: number[] = [];
  for (let i = 0; i <= nt; i++) {
    for (let j = 0; j < np; j++) {
      const v = u[i * np + j];
      let isMax = true;
      for (let di = -1; di <= 1 && isMax; di++) {
        let ii = i + di;
        if (ii > nt) ii = plan.planarXy ? nt - 1 : -1;
        if (ii < 0) continue;
        for (let dj = -1; dj <= 1; dj++) {
          if (di === 0 && dj === 0) continue;
          if (u[ii * np + ((j + dj + np) % np)] > v) { isMax = false; break; }
        }
      }
      if (isMax) maxima.push(i * np + j);
    }
  }
  maxima.sort((a, b) => u[b] - u[a] || a - b);
  const out: Start[] = maxima.slice(0, options.candidates).map((idx) => ({ theta: Math.floor(idx / np) * ht, phi: (idx % np) * hp, value: u[idx] }));
  // symmetry circles: r̂(α) = a cos α + b sin α with a, b spanning the plane (the equator of an
  // x–y shape is a grid row already)
  const nc = 2 * np;
  for (const { normal: m } of planes) {
    if (plan.planarXy && Math.abs(m[2]) > 1 - 1e-9) continue;
    const a = Math.abs(m[2]) < 0.9 ? unitCross(m, [0, 0, 1]) : unitCross(m, [1, 0, 0]);
    const b = unitCross(m, a);
    let bestStart: Start | null = null;
    for (let j = 0; j < nc; j++) {
      const al = (2 * Math.PI * j) / nc;
      const d = toDirection([a[0] * Math.cos(al) + b[0] * Math.sin(al), a[1] * Math.cos(al) + b[1] * Math.sin(al), a[2] * Math.cos(al) + b[2] * Math.sin(al)]);
      if (plan.planarXy && d.thetaRad > Math.PI / 2 + 1e-12) continue; // the lower half mirrors the upper
      const value = U(d.thetaRad, d.phiRad);
      if (!bestStart || value > bestStart.value) bestStart = { theta: d.thetaRad, phi: d.phiRad, value };
    }
    if (!bestStart) continue;
    // a grid start within one step and lower would climb the same hill: the circle's start replaces it
    const near = out.findIndex((o) => angleBetween(o, bestStart!) < ht * 1.01 && o.value <= bestStart!.value);
    if (near >= 0) out[near] = bestStart; else out.push(bestStart);
  }
  return out;
}

function angleBetween(a: Start, b: Start): number {
  const u = unitOf({ thetaRad: a.theta, phiRad: a.phi }), v = unitOf({ thetaRad: b.theta, phiRad: b.phi });
  return Math.acos(Math.min(1, u[0] * v[0] + u[1] * v[1] + u[2] * v[2]));
}

function unitCross(p: readonly number[], q: readonly number[]): V3 {
  const c: V3 = [p[1] * q[2] - p[2] * q[1], p[2] * q[0] - p[0] * q[2], p[0] * q[1] - p[1] * q[0]];
  const l = Math.hypot(c[0], c[1], c[2]);
  return [c[0] / l, c[1] / l, c[2] / l];
}

/** Refined maxima more than 1° apart, best first, each followed by its mirror images. */
function distinctMaxima(refined: Peak[], planes: SymmetryPlane[]): Direction[] {
  const out: V3[] = [];
  const add = (v: V3) => { if (out.every((w) => w[0] * v[0] + w[1] * v[1] + w[2] * v[2] < Math.cos(RAD_PER_DEG))) out.push(v); };
  for (const p of refined) {
    const v = unitOf(p);
    add(v);
    for (const { normal, kind } of planes) if (kind === "mirror") add(mirrorDirection(v, normal));
  }
  return out.map(toDirection);
}

/**
 * Compass search on the sphere: from the current direction d, trial directions normalise(d ± h·e1)
 * and normalise(d ± h·e2) with e1, e2 an orthonormal tangent frame carried along by parallel
 * transport after each move, so the poles are ordinary points and h stays an angular step. The step
 * halves when no move improves (or after a few moves at one step) and doubles, up to the first step,
 * after three successes in a row the same way, so a ridge is followed at a useful pace (Kolda et al.
 * §3.7, expansion and contraction); a budget bounds the work.
 */
function refine(
  plan: FarFieldPlan, theta0: number, phi0: number, u0: number, step0: number,
  options: PeakOptions, U: (t: number, p: number) => number,
): Peak {
  let d: V3 = unitOf({ thetaRad: theta0, phiRad: phi0 });
  let e1: V3 = [Math.cos(theta0) * Math.cos(phi0), Math.cos(theta0) * Math.sin(phi0), -Math.sin(theta0)]; // θ̂
  const trial = (m: number, h: number): V3 => {
    const t = Math.tan(h), sign = m < 2 ? 1 : -1, e = m % 2 === 0 ? e1 : cross(d, e1);
    const x: V3 = [d[0] + sign * t * e[0], d[1] + sign * t * e[1], d[2] + sign * t * e[2]];
    const l = Math.hypot(x[0], x[1], x[2]);
    x[0] /= l; x[1] /= l; x[2] /= l;
    if (plan.planarXy && x[2] < 0) x[2] = -x[2]; // |E| mirrors about the plane of the shape
    return x;
  };
  let value = u0, step = step0;
  const stop = options.refineToDeg * RAD_PER_DEG;
  // moves: +e1, +e2, −e1, −e2 (m = 0…3)
  let last = 0, streak = 0, movesAtStep = 0, budget = MAX_REFINE_EVALUATIONS;
  while (step >= stop && budget > 0) {
    let moved = -1;
    for (let k = 0; k < 4 && budget > 0; k++) {
      const m = (last + k) % 4;
      const x = trial(m, step);
      const dir = toDirection(x);
      const val = U(dir.thetaRad, dir.phiRad);
      budget--;
      if (val > value) {
        value = val; moved = m;
        // carry e1 to the new point: drop its component along the new direction, renormalise
        const c = e1[0] * x[0] + e1[1] * x[1] + e1[2] * x[2];
        let f: V3 = [e1[0] - c * x[0], e1[1] - c * x[1], e1[2] - c * x[2]];
        if (Math.hypot(f[0], f[1], f[2]) < 1e-6) f = cross(x, cross(d, x)); // e1 ∥ x: fall back
        const fl = Math.hypot(f[0], f[1], f[2]);
        e1 = [f[0] / fl, f[1] / fl, f[2] / fl];
        d = x;
        break;
      }
    }
    if (moved < 0 || ++movesAtStep > 6) { step /= 2; streak = 0; movesAtStep = 0; if (moved < 0) continue; }
    if (moved === last && ++streak >= 3) { step = Math.min(2 * step, step0); streak = 0; movesAtStep = 0; }
    else if (moved !== last) { last = moved; streak = 1; }
  }
  const { thetaRad, phiRad } = toDirection(d);
  return { thetaRad, phiRad: Math.sin(thetaRad) < 1e-9 ? 0 : phiRad, intensityWPerSr: value, evaluations: 0, maxima: [], planes: [] };
}

function cross(p: readonly number[], q: readonly number[]): V3 {
  return [p[1] * q[2] - p[2] * q[1], p[2] * q[0] - p[0] * q[2], p[0] * q[1] - p[1] * q[0]];
}

/** ∫U dΩ over the whole sphere (W), with nTheta Gauss points in cosθ and 2·nTheta in φ. */
export function integratePattern(plan: FarFieldPlan, nTheta: number): number {
  const scratch = new Float64Array(4);
  const rule = gaussLegendre01(nTheta);
  const nPhi = 2 * nTheta;
  const hp = (2 * Math.PI) / nPhi;
  let total = 0;
  // cosθ = −1 + 2t on the full sphere, or 0 + t on the upper half of a planar shape
  const lower = plan.planarXy ? 0 : -1;
  const span = 1 - lower;
  for (let i = 0; i < nTheta; i++) {
    const theta = Math.acos(lower + span * rule.t[i]);
    let ring = 0;
    for (let j = 0; j < nPhi; j++) ring += intensityAt(plan, theta, j * hp, scratch);
    total += rule.w[i] * span * ring * hp;
  }
  return plan.planarXy ? 2 * total : total;
}

/** Enough points for a pattern whose sources lie within radius rM: degree ~ 2kr + margin. */
export function patternPointsFor(kRadPerM: number, radiusM: number): number {
  return Math.max(24, Math.ceil(kRadPerM * radiusM * 2) + 20);
}
