// One solve of a shape at its frequency: mesh → impedance matrix (+ conductor loss) → currents for
// a 1 V source spread over a finite gap at the feed (feedSource.ts) → input impedance, powers, peak
// gain, directivity and efficiency.
//   Z_in = V0 / Ī (Ī the gap-averaged current),  P_in = ½ Re(Σ V_m I_m*) = ½ Re(V0 Ī*),  P_loss = ½ Σ_s R'_s ∫|I(l)|² dl,  P_rad = P_in − P_loss,
//   G = 4πU_max / P_in,  D = 4πU_max / P_rad,  e = P_rad / P_in   (IEEE Std 145-2013 definitions).
// Energy balance: |∫U dΩ − P_rad| / P_rad, a check that the matrix and the far field agree.
import { CONDUCTIVITY_S_PER_M, toDb, wavenumberRadPerM } from "../units.js";
import { createFarFieldPlan, type FarFieldPlan } from "./farField.js";
import { feedGapM as defaultFeedGapM, feedSegmentM, gapCurrent, gapExcitation } from "./feedSource.js";
import { checkMesh } from "./geometryChecks.js";
import { fillImpedanceMirror, solveImpedanceSystem } from "./mirrorSolve.js";
import { detectMirrorSymmetry } from "./mirrorSymmetry.js";
import { addConductorLoss, fillImpedance, surfaceResistancePerM } from "./impedance.js";
import { KERNEL_RULES, type KernelRules } from "./kernel.js";
import { buildMesh, maxRadiusM, segmentEndCurrents, type Mesh } from "./mesh.js";
import { imageFactor } from "./ground.js";
import { addImageCoupling } from "./groundImage.js";
import { withGroundedEnds } from "./groundMesh.js";
import { isGroundedFeed } from "./groundShape.js";
import { solutionOverGround, type GroundFigures } from "./groundSolve.js";
import { DEFAULT_PEAK_OPTIONS, findPeak, integratePattern, patternPointsFor, type PeakOptions } from "./pattern.js";
import type { Conductor, Shape } from "./shapeFile.js";

export const SOLVER_VERSION = "bentwire-em-3";

export interface SolveOptions {
  segmentsPerWavelength?: number;
  /** Feed gap length (m); default λ/50 at the shape's frequency. A sweep passes the design's gap. */
  feedGapM?: number;
  /** Free space and perfect ground: integrate the pattern. Real ground integrates unless false. */
  energyBalance?: boolean;
  peak?: PeakOptions;
  rules?: KernelRules;
  /** Over ground only: search the peak within these elevations (degrees), e.g. [5, 25]. */
  elevationWindowDeg?: [number, number];
  /** Use the mirror-symmetric fill and even-mode solve when the mesh allows (default true). */
  symmetry?: boolean;
}

export interface Solution {
  frequencyHz: number;
  unknowns: number;
  segments: number;
  /** The feed gap the solve used (m). */
  feedGapM: number;
  mesh: Mesh;
  currentRe: Float64Array;
  currentIm: Float64Array;
  inputImpedanceOhm: { re: number; im: number };
  inputPowerW: number;
  lossPowerW: number;
  radiatedPowerW: number;
  farField: FarFieldPlan;
  peakGainDbi: number;
  peakDirectivityDbi: number;
  radiationEfficiency: number;
  peakDirectionRad: { theta: number; phi: number };
  energyBalanceError: number | null;
  warnings: string[];
  /** Over ground only (shape.ground set): elevation figures, ground loss. */
  ground?: GroundFigures;
}

export function conductivityOf(conductor: Conductor): number {
  if (conductor === "perfect") return Infinity;
  if (typeof conductor === "string") return CONDUCTIVITY_S_PER_M[conductor];
  return conductor.conductivitySPerM;
}

export interface FeedSolution {
  mesh: Mesh;
  /** The feed gap the solve used (m). */
  feedGapM: number;
  kRadPerM: number;
  currentRe: Float64Array;
  currentIm: Float64Array;
  inputImpedanceOhm: { re: number; im: number };
  inputPowerW: number;
  lossPowerW: number;
  warnings: string[];
}

/**
 * The right-hand side: the finite gap (feedSource.ts) at the feed; at a wire end on perfect ground
 * (a base-fed monopole) the half of it on the real wire, with 1 V between the wire and the ground.
 */
export function feedExcitation(shape: Shape, mesh: Mesh, gapM: number): Float64Array {
  const grounded = shape.ground?.type === "perfect" && isGroundedFeed(shape) ? (shape.feed.vertex === 0 ? "start" : "end") : null;
  return gapExcitation(mesh, gapM, shape.feed.wire, undefined, grounded);
}

/** Currents and input impedance only: what a band sweep needs at frequencies off the design one. */
export function solveFeed(shape: Shape, options: SolveOptions = {}): FeedSolution {
  const gapM = options.feedGapM ?? defaultFeedGapM(shape.frequencyHz);
  const feedRadiusM = shape.wires[shape.feed.wire].radiusM ?? shape.wireRadiusM;
  const mesh = withGroundedEnds(buildMesh(shape, options.segmentsPerWavelength, feedSegmentM(gapM, feedRadiusM), true), shape); // ends graded (mesh.ts); withGroundedEnds: no-op in free space
  const warnings = checkMesh(mesh);
  const k = wavenumberRadPerM(shape.frequencyHz);
  const sym = options.symmetry === false ? null : detectMirrorSymmetry(mesh); // dispatch: mirrorSolve.ts
  const z = sym ? fillImpedanceMirror(mesh, k, sym, options.rules) : fillImpedance(mesh, k, options.rules ?? KERNEL_RULES);
  // the image in z = 0 commutes with the y–z mirror, so the even-mode solve below still holds
  if (shape.ground) addImageCoupling(z, mesh, k, imageFactor(shape.ground, shape.frequencyHz), options.rules ?? KERNEL_RULES, sym);
  const sigma = conductivityOf(shape.conductor);
  const rPerM = new Float64Array(mesh.segmentCount);
  if (Number.isFinite(sigma)) {
    for (let s = 0; s < mesh.segmentCount; s++) rPerM[s] = surfaceResistancePerM(shape.frequencyHz, mesh.radiusM[s], sigma);
    addConductorLoss(z, mesh, rPerM);
  }
  const bRe = feedExcitation(shape, mesh, gapM); // V0 = 1 V over the gap (a delta gap at a grounded base)
  const bIm = new Float64Array(mesh.unknowns);
  const { re, im } = solveImpedanceSystem(z, sym, bRe, bIm); // even mode, LDLᵀ, or LU (mirrorSolve.ts)
  const { re: ir, im: ii } = gapCurrent(bRe, re, im);
  const i2 = ir * ir + ii * ii;
  return {
    mesh,
    feedGapM: gapM,
    kRadPerM: k,
    currentRe: re,
    currentIm: im,
    inputImpedanceOhm: { re: ir / i2, im: -ii / i2 },
    inputPowerW: 0.5 * ir, // ½ Re(Σ V_m I_m*) = ½ Re Ī with V0 = 1 V
    lossPowerW: conductorLossW(mesh, re, im, rPerM),
    warnings,
  };
}

export function solveShape(shape: Shape, options: SolveOptions = {}): Solution {
  const feed = solveFeed(shape, options);
  const { mesh, currentRe: re, currentIm: im, inputPowerW, kRadPerM: k } = feed;
  if (shape.ground) return solutionOverGround(shape, feed, options);
  const radiatedPowerW = inputPowerW - feed.lossPowerW;
  const farField = createFarFieldPlan(mesh, re, im, k);
  const peak = findPeak(farField, options.peak ?? DEFAULT_PEAK_OPTIONS);
  let energyBalanceError: number | null = null;
  if (options.energyBalance) {
    const pattern = integratePattern(farField, patternPointsFor(k, maxRadiusM(mesh)));
    energyBalanceError = Math.abs(pattern - radiatedPowerW) / radiatedPowerW;
  }
  return {
    frequencyHz: shape.frequencyHz,
    unknowns: mesh.unknowns,
    segments: mesh.segmentCount,
    feedGapM: feed.feedGapM,
    mesh,
    currentRe: re,
    currentIm: im,
    inputImpedanceOhm: feed.inputImpedanceOhm,
    inputPowerW,
    lossPowerW: feed.lossPowerW,
    radiatedPowerW,
    farField,
    peakGainDbi: toDb((4 * Math.PI * peak.intensityWPerSr) / inputPowerW),
    peakDirectivityDbi: toDb((4 * Math.PI * peak.intensityWPerSr) / radiatedPowerW),
    radiationEfficiency: radiatedPowerW / inputPowerW,
    peakDirectionRad: { theta: peak.thetaRad, phi: peak.phiRad },
    energyBalanceError,
    warnings: feed.warnings,
  };
}

/** ½ Σ_s R'_s ∫_0^L |I1(1−t) + I2 t|² dl = ½ Σ R'_s L (|I1|² + Re(I1 I2*) + |I2|²)/3. */
function conductorLossW(mesh: Mesh, re: Float64Array, im: Float64Array, rPerM: Float64Array): number {
  let p = 0;
  for (let s = 0; s < mesh.segmentCount; s++) {
    if (rPerM[s] === 0) continue;
    const [r1, i1, r2, i2] = segmentEndCurrents(mesh, s, re, im);
    p += (rPerM[s] * mesh.lengthM[s] * (r1 * r1 + i1 * i1 + r1 * r2 + i1 * i2 + r2 * r2 + i2 * i2)) / 3;
  }
  return 0.5 * p;
}

