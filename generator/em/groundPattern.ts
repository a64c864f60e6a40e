// Pattern over the ground, upper half-space only (elevation ψ = 90° − θ, azimuth φ):
// peak search within an elevation window [ψlo, ψhi]: a coarse grid, the best few grid maxima refined
// by a compass search in (ψ, φ) that halves its step to the stopping size (Kolda, Lewis & Torczon,
// SIAM Review 45, 2003, §3), ψ clamped to the window. Power into the upper half-space:
//   P = ∫_0^{2π} ∫_0^1 U d(cosθ) dφ, Gauss–Legendre in cosθ ∈ [0, 1], trapezoid rule in φ.
// Over perfect ground the field is that of the shape and its image in free space, symmetric about
// z = 0, so the half-space integrand is smooth and the rule converges as fast as on the full sphere.
import { RAD_PER_DEG } from "../units.js";
import { gaussLegendre01 } from "./gaussLegendre.js";
import { groundIntensityAt, type GroundFarField } from "./groundFarField.js";
import type { PeakOptions } from "./pattern.js";

export interface GroundPeak {
  elevationRad: number;
  azimuthRad: number;
  intensityWPerSr: number;
}

const HALF_PI = Math.PI / 2;

/** U at elevation ψ and azimuth φ. */
export function intensityAtElevation(g: GroundFarField, elevationRad: number, azimuthRad: number, out: Float64Array): number {
  return groundIntensityAt(g, HALF_PI - elevationRad, azimuthRad, out);
}

/** Strongest direction with elevation in [lo, hi] (rad), 0 ≤ lo ≤ hi ≤ π/2. */
export function findGroundPeak(
  g: GroundFarField, options: PeakOptions, elevationWindowRad: [number, number] = [0, HALF_PI],
): GroundPeak {
  const [lo, hi] = elevationWindowRad;
  const out = new Float64Array(4);
  const ne = Math.max(1, Math.ceil((hi - lo) / (options.gridStepDeg * RAD_PER_DEG)));
  const he = (hi - lo) / ne;
  const np = Math.ceil(360 / options.gridStepDeg);
  const hp = (2 * Math.PI) / np;
  const u = new Float64Array((ne + 1) * np);
  for (let i = 0; i <= ne; i++) for (let j = 0; j < np; j++) u[i * np + j] = intensityAtElevation(g, lo + i * he, j * hp, out);
  const maxima: number[] = [];
  for (let i = 0; i <= ne; i++) {
    for (let j = 0; j < np; j++) {
      const v = u[i * np + j];
      let isMax = true;
      for (let di = -1; di <= 1 && isMax; di++) {
        const ii = i + di;
        if (ii < 0 || ii > ne) continue;
        for (let dj = -1; dj <= 1; dj++) {
          if ((di || dj) && u[ii * np + ((j + dj + np) % np)] > v) { isMax = false; break; }
        }
      }
      if (isMax) maxima.push(i * np + j);
    }
  }
  maxima.sort((a, b) => u[b] - u[a] || a - b);
  let best: GroundPeak = { elevationRad: lo, azimuthRad: 0, intensityWPerSr: -1 };
  const stop = options.refineToDeg * RAD_PER_DEG;
  for (const idx of maxima.slice(0, options.candidates)) {
    let el = lo + Math.floor(idx / np) * he, az = (idx % np) * hp, value = u[idx];
    for (let step = Math.max(he, hp) / 2; step >= stop; step /= 2) {
      for (let tries = 0; tries < 6; tries++) {
        let moved = false;
        for (const [de, da] of [[1, 0], [-1, 0], [0, 1], [0, -1]]) {
          const e = Math.min(hi, Math.max(lo, el + de * step));
          const a = az + (da * step) / Math.max(Math.cos(e), 0.05);
          const val = intensityAtElevation(g, e, a, out);
          if (val > value) { el = e; az = a; value = val; moved = true; break; }
        }
        if (!moved) break;
      }
    }
    az = ((az % (2 * Math.PI)) + 2 * Math.PI) % (2 * Math.PI);
    if (value > best.intensityWPerSr) best = { elevationRad: el, azimuthRad: hi - el < 1e-12 && el >= HALF_PI ? 0 : az, intensityWPerSr: value };
  }
  return best;
}

/** ∫U dΩ over the upper half-space (W), nTheta Gauss points in cosθ ∈ [0, 1] and 2·nTheta in φ. */
export function integrateUpperHalf(g: GroundFarField, nTheta: number): number {
  const out = new Float64Array(4);
  const rule = gaussLegendre01(nTheta);
  const nPhi = 2 * nTheta;
  const hp = (2 * Math.PI) / nPhi;
  let total = 0;
  for (let i = 0; i < nTheta; i++) {
    const theta = Math.acos(rule.t[i]);
    let ring = 0;
    for (let j = 0; j < nPhi; j++) ring += groundIntensityAt(g, theta, j * hp, out);
    total += rule.w[i] * ring * hp;
  }
  return total;
}
