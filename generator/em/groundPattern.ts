// Pattern over the ground, upper half-space only (elevation ψ = 90° − θ, azimuth φ):
// peak search within an elevation window [ψlo, ψhi]: a coarse grid, the best few grid maxima refined
// by a compass search in (ψ, φ) that halves its step to the stopping size (Kolda, Lewis & Torczon,
// SIAM Review 45, 2003, §3), ψ clamped to the window. Power into the upper half-space:
//   P = ∫_0^{2π} ∫_0^1 U d(cosθ) dφ, Gauss–Legendre in cosθ ∈ [0, 1], trapezoid rule in φ.
// Over perfect ground the field is that of the shape and its image in free space, symmetric about
// z = 0, so the half-space integrand is smooth and the rule converges as fast as on the full sphere.
// Grid symmetry: a vertical symmetry plane of the shape and its currents (patternSymmetry.ts: a
// mirror plane, or the wire's own plane), with horizontal normal at azimuth α, is one of the shape
// with its image too, and the Fresnel factors depend on elevation alone, so U(ψ, 2α + π − φ) =
// U(ψ, φ). Where that reflection maps the azimuth grid onto itself, mirrored grid values are
// copied, and of two mirrored grid maxima only the first (lower index) is refined. The zenith is
// one direction: its grid row is one sample. The compass search skips trial points that are no new
// direction (clamped onto the current point, an azimuth step at the zenith, the point just left).
import { RAD_PER_DEG } from "../units.js";
import { gaussLegendre01 } from "./gaussLegendre.js";
import { groundIntensityAt, type GroundFarField } from "./groundFarField.js";
import type { PeakOptions } from "./pattern.js";
import { symmetryPlanes } from "./patternSymmetry.js";

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

/**
 * Azimuth grid reflections j → (shift − j) mod np that leave U unchanged: one per vertical
 * symmetry plane whose reflection maps the grid of np azimuths onto itself.
 */
export function azimuthGridReflections(g: GroundFarField, np: number): number[] {
  const shifts: number[] = [];
  for (const { normal } of symmetryPlanes(g.direct)) {
    if (Math.abs(normal[2]) > 1e-9) continue;
    const s = ((2 * Math.atan2(normal[1], normal[0]) + Math.PI) * np) / (2 * Math.PI);
    const r = Math.round(s);
    if (Math.abs(s - r) < 1e-9) shifts.push(((r % np) + np) % np);
  }
  return shifts;
}

/** Strongest direction with elevation in [lo, hi] (rad), 0 ≤ lo ≤ hi ≤ π/2; `symmetric: false` folds no grid. */
export function findGroundPeak(
  g: GroundFarField, options: PeakOptions, elevationWindowRad: [number, number] = [0, HALF_PI], symmetric = true,
): GroundPeak {
  const [lo, hi] = elevationWindowRad;
  const out = new Float64Array(4);
  const ne = Math.max(1, Math.ceil((hi - lo) / (options.gridStepDeg * RAD_PER_DEG)));
  const he = (hi - lo) / ne;
  const np = Math.ceil(360 / options.gridStepDeg);
  const hp = (2 * Math.PI) / np;
  const shifts = symmetric ? azimuthGridReflections(g, np) : [];
  const mirrorOf = (j: number, s: number) => (s - j + np) % np;
  const zenithRow = (i: number) => symmetric && lo + i * he >= HALF_PI - 1e-12;
  const u = new Float64Array((ne + 1) * np);
  for (let i = 0; i <= ne; i++) {
    for (let j = 0; j < np; j++) {
      let from = zenithRow(i) && j > 0 ? 0 : -1;
      for (let t = 0; t < shifts.length && from < 0; t++) if (mirrorOf(j, shifts[t]) < j) from = mirrorOf(j, shifts[t]);
      u[i * np + j] = from >= 0 ? u[i * np + from] : intensityAtElevation(g, lo + i * he, j * hp, out);
    }
  }
  const maxima: number[] = [];
  for (let i = 0; i <= ne; i++) {
    for (let j = 0; j < np; j++) {
      if (zenithRow(i) && j > 0) continue; // one direction
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
  // one of each mirrored pair (the first in this order: the lower index, the values being copies)
  const starts: number[] = [];
  for (const idx of maxima) {
    if (starts.length === options.candidates) break;
    const i = Math.floor(idx / np), j = idx % np;
    if (starts.some((k) => Math.floor(k / np) === i && shifts.some((s) => mirrorOf(j, s) === k % np))) continue;
    starts.push(idx);
  }
  let best: GroundPeak = { elevationRad: lo, azimuthRad: 0, intensityWPerSr: -1 };
  const stop = options.refineToDeg * RAD_PER_DEG;
  for (const idx of starts) {
    let el = lo + Math.floor(idx / np) * he, az = (idx % np) * hp, value = u[idx];
    for (let step = Math.max(he, hp) / 2; step >= stop; step /= 2) {
      let fromEl = NaN, fromAz = NaN; // the point the last move left, known to be lower
      for (let tries = 0; tries < 6; tries++) {
        let moved = false;
        for (const [de, da] of [[1, 0], [-1, 0], [0, 1], [0, -1]]) {
          const e = Math.min(hi, Math.max(lo, el + de * step));
          const a = az + (da * step) / Math.max(Math.cos(e), 0.05);
          // no new direction: clamped onto the current point, an azimuth step at the zenith, or back
          if ((da === 0 && e === el) || (e === el && el >= HALF_PI - 1e-12)) continue;
          if (Math.abs(e - fromEl) <= 1e-12 && Math.abs(a - fromAz) <= 1e-12) continue;
          const val = intensityAtElevation(g, e, a, out);
          if (val > value) { fromEl = el; fromAz = az; el = e; az = a; value = val; moved = true; break; }
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
