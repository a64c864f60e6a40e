// Searches the whole sphere for the direction of peak radiation intensity and integrates the
// pattern. Peak: a coarse grid (step h0 in θ and φ), the best few local maxima refined by a compass
// search on the tangent plane that halves its step until h < hMin (Kolda, Lewis & Torczon, "Optimization by
// direct search", SIAM Review 45, 2003, §3). Integral: P = ∫U dΩ = ∫_{−1}^{1} d(cosθ) ∫_0^{2π} U dφ,
// Gauss–Legendre in cosθ and the trapezoid rule in φ (exact for trigonometric polynomials of
// degree below the point count). Shapes in the x–y plane are mirror-symmetric in |E| about it,
// so only the upper hemisphere is visited for them.
import { RAD_PER_DEG } from "../units.js";
import { intensityAt, type FarFieldPlan } from "./farField.js";
import { gaussLegendre01 } from "./gaussLegendre.js";

export interface PeakOptions {
  gridStepDeg: number;
  refineToDeg: number;
  candidates: number;
}

export const DEFAULT_PEAK_OPTIONS: PeakOptions = { gridStepDeg: 12, refineToDeg: 0.01, candidates: 3 };

export interface Peak {
  thetaRad: number;
  phiRad: number;
  intensityWPerSr: number;
}

export function findPeak(plan: FarFieldPlan, options: PeakOptions = DEFAULT_PEAK_OPTIONS): Peak {
  const scratch = new Float64Array(4);
  const thetaMaxDeg = plan.planarXy ? 90 : 180;
  const nt = Math.ceil(thetaMaxDeg / options.gridStepDeg);
  const ht = (thetaMaxDeg / nt) * RAD_PER_DEG;
  const np = Math.ceil(360 / options.gridStepDeg);
  const hp = (2 * Math.PI) / np;
  // grid, poles visited once
  const u = new Float64Array((nt + 1) * np);
  for (let i = 0; i <= nt; i++) {
    const pole = i === 0 || (i === nt && !plan.planarXy);
    for (let j = 0; j < np; j++) {
      u[i * np + j] = pole && j > 0 ? u[i * np] : intensityAt(plan, i * ht, j * hp, scratch);
    }
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
  let best: Peak = { thetaRad: 0, phiRad: 0, intensityWPerSr: -1 };
  for (const idx of maxima.slice(0, options.candidates)) {
    const peak = refine(plan, Math.floor(idx / np) * ht, (idx % np) * hp, u[idx], ht / 2, options, scratch);
    if (peak.intensityWPerSr > best.intensityWPerSr) best = peak;
  }
  return best;
}

/**
 * Compass search on the tangent plane at the start direction d0: d(u, v) = normalise(d0 + u·e1 + v·e2),
 * so the poles are ordinary points. Each step size allows a few moves before it halves, which bounds
 * the work on ridges.
 */
function refine(
  plan: FarFieldPlan, theta0: number, phi0: number, u0: number, step0: number,
  options: PeakOptions, scratch: Float64Array,
): Peak {
  const d0 = [Math.sin(theta0) * Math.cos(phi0), Math.sin(theta0) * Math.sin(phi0), Math.cos(theta0)];
  const e1 = [Math.cos(theta0) * Math.cos(phi0), Math.cos(theta0) * Math.sin(phi0), -Math.sin(theta0)]; // θ̂
  const e2 = [-Math.sin(phi0), Math.cos(phi0), 0]; // φ̂
  const angles = (u: number, v: number): [number, number] => {
    const x = d0[0] + u * e1[0] + v * e2[0];
    const y = d0[1] + u * e1[1] + v * e2[1];
    let z = d0[2] + u * e1[2] + v * e2[2];
    if (plan.planarXy && z < 0) z = -z; // |E| mirrors about the plane of the shape
    const theta = Math.atan2(Math.hypot(x, y), z);
    const phi = Math.hypot(x, y) < 1e-12 ? 0 : (Math.atan2(y, x) + 2 * Math.PI) % (2 * Math.PI);
    return [theta, phi];
  };
  let u = 0, v = 0, value = u0, step = step0;
  const stop = options.refineToDeg * RAD_PER_DEG;
  const moves: [number, number][] = [[1, 0], [-1, 0], [0, 1], [0, -1]];
  while (step >= stop) {
    for (let moved = 0, tries = 0; tries < 6; tries++) {
      let better = false;
      for (const [du, dv] of moves) {
        const [t, p] = angles(u + du * step, v + dv * step);
        const val = intensityAt(plan, t, p, scratch);
        if (val > value) { u += du * step; v += dv * step; value = val; better = true; moved++; break; }
      }
      if (!better) break;
    }
    step /= 2;
  }
  const [theta, phi] = angles(u, v);
  return { thetaRad: theta, phiRad: Math.sin(theta) < 1e-9 ? 0 : phi, intensityWPerSr: value };
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
