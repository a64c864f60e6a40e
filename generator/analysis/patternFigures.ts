// Figures of the pattern around its peak (IEEE Std 145-2013 terms):
// - principal cuts: the two great circles through the peak direction d, one along θ̂ and one along
//   φ̂ at d: r(α) = d cos α + t sin α;
// - half-power beamwidth in each cut: the angular width between the first points either side of
//   the peak where U falls to U_max/2 (stepped 1°, then bisection to 0.01°);
// - front-to-back ratio: 10 log10 U(d)/U(−d);
// - polarization at the peak from Eθ, Eφ (Balanis, Antenna Theory, 3rd ed., §2.12.2, with the
//   Stokes parameters): tilt τ = ½ atan2(S2, S1) from θ̂ toward φ̂, axial ratio
//   AR = (|E|² + √(S1²+S2²)) / (|E|² − √(S1²+S2²)), square-rooted to a field ratio.
import { farFieldAt as freeFieldAt, intensityAt as freeIntensityAt, type FarFieldPlan } from "../em/farField.js";
import { groundFieldAt, groundIntensityAt, type GroundFarField } from "../em/groundFarField.js";
import { DEG_PER_RAD, RAD_PER_DEG, toDb } from "../units.js";

/** A free-space far field, or one over ground (direct + reflected; zero below the horizon). */
export type PatternField = FarFieldPlan | GroundFarField;
const isGround = (f: PatternField): f is GroundFarField => "direct" in f;
const farFieldAt = (f: PatternField, t: number, p: number, out: Float64Array): void => (isGround(f) ? groundFieldAt(f, t, p, out) : freeFieldAt(f, t, p, out));
const intensityAt = (f: PatternField, t: number, p: number, out: Float64Array): number => (isGround(f) ? groundIntensityAt(f, t, p, out) : freeIntensityAt(f, t, p, out));

type V3 = [number, number, number];

export const direction = (theta: number, phi: number): V3 => [Math.sin(theta) * Math.cos(phi), Math.sin(theta) * Math.sin(phi), Math.cos(theta)];
const thetaHat = (theta: number, phi: number): V3 => [Math.cos(theta) * Math.cos(phi), Math.cos(theta) * Math.sin(phi), -Math.sin(theta)];
const phiHat = (phi: number): V3 => [-Math.sin(phi), Math.cos(phi), 0];
const toAngles = (v: V3): [number, number] => {
  const rho = Math.hypot(v[0], v[1]);
  return [Math.atan2(rho, v[2]), rho < 1e-12 ? 0 : (Math.atan2(v[1], v[0]) + 2 * Math.PI) % (2 * Math.PI)];
};

export interface Cut {
  /** Unit vectors spanning the cut plane: r(α) = d cos α + t sin α. */
  d: V3;
  t: V3;
}

export function principalCuts(thetaRad: number, phiRad: number): { alongTheta: Cut; alongPhi: Cut } {
  const d = direction(thetaRad, phiRad);
  return { alongTheta: { d, t: thetaHat(thetaRad, phiRad) }, alongPhi: { d, t: phiHat(phiRad) } };
}

export function intensityOnCut(plan: PatternField, cut: Cut, alphaRad: number, scratch = new Float64Array(4)): number {
  const c = Math.cos(alphaRad), s = Math.sin(alphaRad);
  const [theta, phi] = toAngles([cut.d[0] * c + cut.t[0] * s, cut.d[1] * c + cut.t[1] * s, cut.d[2] * c + cut.t[2] * s]);
  return intensityAt(plan, theta, phi, scratch);
}

/** Half-power beamwidth in degrees along a cut, or null when U never halves within ±180°. */
export function halfPowerBeamwidthDeg(plan: PatternField, cut: Cut): number | null {
  const scratch = new Float64Array(4);
  const half = intensityOnCut(plan, cut, 0, scratch) / 2;
  const edge = (sign: 1 | -1): number | null => {
    let prev = 0;
    for (let deg = 1; deg <= 180; deg++) {
      const a = sign * deg * RAD_PER_DEG;
      if (intensityOnCut(plan, cut, a, scratch) < half) {
        let lo = prev, hi = a;
        while (Math.abs(hi - lo) > 0.01 * RAD_PER_DEG) {
          const mid = (lo + hi) / 2;
          if (intensityOnCut(plan, cut, mid, scratch) < half) hi = mid; else lo = mid;
        }
        return Math.abs((lo + hi) / 2);
      }
      prev = a;
    }
    return null;
  };
  const plus = edge(1), minus = edge(-1);
  return plus === null || minus === null ? null : (plus + minus) * DEG_PER_RAD;
}

export function frontToBackDb(plan: PatternField, thetaRad: number, phiRad: number): number {
  const scratch = new Float64Array(4);
  const front = intensityAt(plan, thetaRad, phiRad, scratch);
  const d = direction(thetaRad, phiRad);
  const [tb, pb] = toAngles([-d[0], -d[1], -d[2]]);
  return toDb(front / intensityAt(plan, tb, pb, scratch));
}

export interface Polarization {
  /** Angle of the major axis from θ̂ toward φ̂, in (−90°, 90°]. */
  tiltDeg: number;
  /** Field axial ratio in dB (0 = circular, large = linear); capped at 60 dB. */
  axialRatioDb: number;
  sense: "linear" | "right-hand" | "left-hand";
}

export function polarizationAt(plan: PatternField, thetaRad: number, phiRad: number): Polarization {
  const e = new Float64Array(4);
  farFieldAt(plan, thetaRad, phiRad, e);
  const [tr, ti, pr, pi] = e;
  const s0 = tr * tr + ti * ti + pr * pr + pi * pi;
  const s1 = tr * tr + ti * ti - (pr * pr + pi * pi);
  const s2 = 2 * (tr * pr + ti * pi);
  const s3 = 2 * (tr * pi - ti * pr); // sign gives the sense for e^{jωt}, wave along r̂
  const lin = Math.hypot(s1, s2);
  const ratio = Math.sqrt((s0 + lin) / Math.max(s0 - lin, s0 * 1e-12));
  const axialRatioDb = Math.min(60, 20 * Math.log10(ratio));
  return {
    tiltDeg: 0.5 * Math.atan2(s2, s1) * DEG_PER_RAD,
    axialRatioDb,
    sense: axialRatioDb > 20 ? "linear" : s3 > 0 ? "left-hand" : "right-hand",
  };
}

/** Gain in dBi along a cut every stepDeg over a full turn (α from −180° to 180° − step). */
export function cutGainsDbi(plan: PatternField, cut: Cut, inputPowerW: number, stepDeg: number): number[] {
  const scratch = new Float64Array(4);
  const n = Math.round(360 / stepDeg);
  return Array.from({ length: n }, (_, i) => {
    const u = intensityOnCut(plan, cut, (-180 + i * stepDeg) * RAD_PER_DEG, scratch);
    return Math.max(-60, toDb((4 * Math.PI * u) / inputPowerW));
  });
}

/** Gain in dBi on a θ–φ grid: rows θ = 0…180° by thetaStepDeg, columns φ = 0…360° − step. */
export function gainGridDbi(plan: PatternField, inputPowerW: number, thetaStepDeg: number, phiStepDeg: number): number[][] {
  const scratch = new Float64Array(4);
  const rows = Math.round(180 / thetaStepDeg) + 1;
  const cols = Math.round(360 / phiStepDeg);
  return Array.from({ length: rows }, (_, i) =>
    Array.from({ length: cols }, (_, j) => {
      const u = intensityAt(plan, i * thetaStepDeg * RAD_PER_DEG, j * phiStepDeg * RAD_PER_DEG, scratch);
      return Math.max(-60, toDb((4 * Math.PI * u) / inputPowerW));
    }),
  );
}
