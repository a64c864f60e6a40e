// Figures of a solution over ground that the catalog publishes besides the solver's own
// (em/groundSolve.ts): the whole-half-space peak, the elevation cut from the horizon over the zenith
// to the far horizon (0–180°, the vertical plane through the takeoff azimuth), the azimuth cut at the
// takeoff elevation, and the front-to-back ratio at the takeoff elevation (U(ψ, φ)/U(ψ, φ + 180°):
// the direction through the antenna, −d, lies below the ground). Gain G = 4πU/P_in (IEEE Std
// 145-2013), so the power the ground absorbs counts as loss.
import { DEFAULT_PEAK_OPTIONS } from "../em/pattern.js";
import { createGroundFarField, type GroundFarField } from "../em/groundFarField.js";
import { findGroundPeak, intensityAtElevation } from "../em/groundPattern.js";
import { gainDbiOf } from "../em/groundSolve.js";
import type { Shape, Solution } from "../em/index.js";
import { DEG_PER_RAD, RAD_PER_DEG, toDb, wavenumberRadPerM } from "../units.js";

export const ELEVATION_CUT_STEP_DEG = 1;
export const AZIMUTH_CUT_STEP_DEG = 2;

/** The far field over ground of a solved shape (direct and reflected). */
export function groundFieldOf(shape: Shape, s: Solution): GroundFarField {
  if (!shape.ground) throw new Error("groundFieldOf: the shape has no ground");
  return createGroundFarField(s.mesh, s.currentRe, s.currentIm, wavenumberRadPerM(s.frequencyHz), shape.ground, s.frequencyHz);
}

export interface GroundCuts {
  peakGainDbi: number;
  peakElevationDeg: number;
  peakAzimuthDeg: number;
  elevationCut: { azimuthDeg: number; stepDeg: number; gainDbi: number[] };
  azimuthCut: { elevationDeg: number; stepDeg: number; gainDbi: number[] };
}

/** Gain at elevation ψ (degrees, 0–180: beyond 90° the far side, azimuth + 180°). */
export function gainAtDbi(field: GroundFarField, inputPowerW: number, elevationDeg: number, azimuthDeg: number): number {
  const out = new Float64Array(4);
  const far = elevationDeg > 90;
  const e = far ? 180 - elevationDeg : elevationDeg;
  const az = far ? azimuthDeg + 180 : azimuthDeg;
  return gainDbiOf(intensityAtElevation(field, e * RAD_PER_DEG, az * RAD_PER_DEG, out), inputPowerW);
}

export function groundCuts(field: GroundFarField, inputPowerW: number, takeoff: { elevationDeg: number; azimuthDeg: number }): GroundCuts {
  const peak = findGroundPeak(field, DEFAULT_PEAK_OPTIONS);
  const elevations = Math.round(180 / ELEVATION_CUT_STEP_DEG) + 1;
  const azimuths = Math.round(360 / AZIMUTH_CUT_STEP_DEG);
  return {
    peakGainDbi: gainDbiOf(peak.intensityWPerSr, inputPowerW),
    peakElevationDeg: peak.elevationRad * DEG_PER_RAD,
    peakAzimuthDeg: peak.azimuthRad * DEG_PER_RAD,
    elevationCut: {
      azimuthDeg: takeoff.azimuthDeg,
      stepDeg: ELEVATION_CUT_STEP_DEG,
      gainDbi: Array.from({ length: elevations }, (_, i) => gainAtDbi(field, inputPowerW, i * ELEVATION_CUT_STEP_DEG, takeoff.azimuthDeg)),
    },
    azimuthCut: {
      elevationDeg: takeoff.elevationDeg,
      stepDeg: AZIMUTH_CUT_STEP_DEG,
      gainDbi: Array.from({ length: azimuths }, (_, j) => gainAtDbi(field, inputPowerW, takeoff.elevationDeg, j * AZIMUTH_CUT_STEP_DEG)),
    },
  };
}

/** U(ψ, φ)/U(ψ, φ + 180°) in dB at the direction θ, φ (radians, θ from the zenith). */
export function groundFrontToBackDb(field: GroundFarField, thetaRad: number, phiRad: number): number {
  const out = new Float64Array(4);
  const e = Math.PI / 2 - thetaRad;
  const back = intensityAtElevation(field, e, phiRad + Math.PI, out);
  const front = intensityAtElevation(field, e, phiRad, out);
  return back > 0 ? toDb(front / back) : 60;
}
