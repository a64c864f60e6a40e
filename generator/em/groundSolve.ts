// The figures of a solve over ground (the matrix already holds the image coupling):
//   G(ψ, φ) = 4πU(ψ, φ)/P_in   (IEEE Std 145-2013: power absorbed by the ground counts as loss),
//   P_upper = ∫_{upper half-space} U dΩ,   P_ground = P_in − P_conductor − P_upper,
//   D = 4πU_max/P_upper,   e = P_upper/P_in.
// Over perfect ground P_ground is 0 in theory, so |P_upper − (P_in − P_conductor)|/(P_in − P_conductor)
// is the energy balance check. Peak and elevation figures are over the upper half-space only.
import { DEG_PER_RAD, RAD_PER_DEG, toDb } from "../units.js";
import type { Ground } from "./ground.js";
import { createGroundFarField, type GroundFarField } from "./groundFarField.js";
import { findGroundPeak, integrateUpperHalf, intensityAtElevation } from "./groundPattern.js";
import { maxRadiusM, type Mesh } from "./mesh.js";
import type { Shape } from "./shapeFile.js";
import type { FeedSolution, Solution, SolveOptions } from "./solve.js";
import { DEFAULT_PEAK_OPTIONS, patternPointsFor, type PeakOptions } from "./pattern.js";

/** Elevations operators plan with (degrees): long-distance paths low, near-vertical skywave high. */
export const PLANNING_ELEVATIONS_DEG = [5, 10, 15, 20, 30, 45, 60, 90] as const;
export const ELEVATION_CUT_STEP_DEG = 1;
/** Gains below this are shown as this value (a null of the pattern is −∞ dBi). */
export const GAIN_FLOOR_DBI = -100;

export interface GroundFigures {
  ground: Ground;
  peakElevationDeg: number;
  peakAzimuthDeg: number;
  gainAtElevationDbi: { elevationDeg: number; gainDbi: number }[];
  /** Gain every ELEVATION_CUT_STEP_DEG from 0° (horizon) to 90° (zenith) at the peak azimuth. */
  elevationCut: { azimuthDeg: number; stepDeg: number; gainDbi: number[] };
  /** Power into the upper half-space and absorbed by the ground (null when not integrated). */
  upperHalfPowerW: number | null;
  groundLossW: number | null;
}

export interface GroundResult {
  figures: GroundFigures;
  field: GroundFarField;
  peakIntensityWPerSr: number;
  peakThetaRad: number;
  peakPhiRad: number;
  /** P_upper when integrated, else P_in − P_conductor (exact for perfect ground). */
  radiatedPowerW: number;
  energyBalanceError: number | null;
}

export function gainDbiOf(intensityWPerSr: number, inputPowerW: number): number {
  const g = (4 * Math.PI * intensityWPerSr) / inputPowerW;
  return g > 0 ? Math.max(GAIN_FLOOR_DBI, toDb(g)) : GAIN_FLOOR_DBI;
}

export interface GroundSolveInput {
  mesh: Mesh;
  currentRe: Float64Array;
  currentIm: Float64Array;
  kRadPerM: number;
  frequencyHz: number;
  inputPowerW: number;
  lossPowerW: number;
}

export function groundResult(
  ground: Ground, s: GroundSolveInput, options: { peak?: PeakOptions; integrate: boolean; elevationWindowDeg?: [number, number] },
): GroundResult {
  const field = createGroundFarField(s.mesh, s.currentRe, s.currentIm, s.kRadPerM, ground, s.frequencyHz);
  const [lo, hi] = options.elevationWindowDeg ?? [0, 90];
  const peak = findGroundPeak(field, options.peak ?? DEFAULT_PEAK_OPTIONS, [lo * RAD_PER_DEG, hi * RAD_PER_DEG]);
  const out = new Float64Array(4);
  const gainAt = (elDeg: number) => gainDbiOf(intensityAtElevation(field, elDeg * RAD_PER_DEG, peak.azimuthRad, out), s.inputPowerW);
  const cutCount = Math.round(90 / ELEVATION_CUT_STEP_DEG) + 1;
  const available = s.inputPowerW - s.lossPowerW;
  let upper: number | null = null;
  if (options.integrate) upper = integrateUpperHalf(field, patternPointsFor(s.kRadPerM, maxRadiusM(s.mesh)));
  const groundLossW = upper === null ? (ground.type === "perfect" ? 0 : null) : available - upper;
  return {
    field,
    figures: {
      ground,
      peakElevationDeg: peak.elevationRad * DEG_PER_RAD,
      peakAzimuthDeg: peak.azimuthRad * DEG_PER_RAD,
      gainAtElevationDbi: PLANNING_ELEVATIONS_DEG.map((e) => ({ elevationDeg: e, gainDbi: gainAt(e) })),
      elevationCut: {
        azimuthDeg: peak.azimuthRad * DEG_PER_RAD,
        stepDeg: ELEVATION_CUT_STEP_DEG,
        gainDbi: Array.from({ length: cutCount }, (_, i) => gainAt(i * ELEVATION_CUT_STEP_DEG)),
      },
      upperHalfPowerW: upper,
      groundLossW,
    },
    peakIntensityWPerSr: peak.intensityWPerSr,
    peakThetaRad: Math.PI / 2 - peak.elevationRad,
    peakPhiRad: peak.azimuthRad,
    radiatedPowerW: upper ?? available,
    energyBalanceError: upper !== null && ground.type === "perfect" ? Math.abs(upper - available) / available : null,
  };
}

/** Over ground: the peak over the upper half-space, gain 4πU/P_in, ground loss (em/groundSolve.ts). */
export function solutionOverGround(shape: Shape, feed: FeedSolution, options: SolveOptions): Solution {
  const ground = shape.ground!;
  // real ground needs the integral for its loss, directivity and efficiency; `energyBalance: false`
  // (given explicitly: the optimizer, which scores gain alone) skips it, and those then count the
  // ground loss as radiated
  const integrate = options.energyBalance === true || (ground.type === "real" && options.energyBalance !== false);
  const g = groundResult(ground, { ...feed, frequencyHz: shape.frequencyHz }, { peak: options.peak, integrate, elevationWindowDeg: options.elevationWindowDeg });
  const { mesh, inputPowerW } = feed;
  return {
    frequencyHz: shape.frequencyHz,
    unknowns: mesh.unknowns,
    segments: mesh.segmentCount,
    feedGapM: feed.feedGapM,
    mesh,
    currentRe: feed.currentRe,
    currentIm: feed.currentIm,
    inputImpedanceOhm: feed.inputImpedanceOhm,
    inputPowerW,
    lossPowerW: feed.lossPowerW,
    radiatedPowerW: g.radiatedPowerW,
    farField: g.field.direct,
    peakGainDbi: toDb((4 * Math.PI * g.peakIntensityWPerSr) / inputPowerW),
    peakDirectivityDbi: toDb((4 * Math.PI * g.peakIntensityWPerSr) / g.radiatedPowerW),
    radiationEfficiency: g.radiatedPowerW / inputPowerW,
    peakDirectionRad: { theta: g.peakThetaRad, phi: g.peakPhiRad },
    energyBalanceError: g.energyBalanceError,
    warnings: feed.warnings,
    ground: g.figures,
  };
}

