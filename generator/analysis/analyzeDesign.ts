// Everything a builder needs to know about one shape, in one pure function: the design-frequency
// figures, a band sweep, a feed-match suggestion, a tolerance study, pattern figures and cuts, and
// the trust figures. The CLI's `analyze --band-mhz` and the catalog both call this.
// Mesh: converged.ts refines from the shape's segments per wavelength until gain and impedance
// settle at the design frequency and both band edges; the sweep, the pattern and the match use that
// mesh. The tolerance Monte Carlo stays on the starting mesh (64 solves of the finest mesh would
// cost too much) and compares its samples with that mesh's own nominal gain.
// Over ground (shape.ground set) every gain is 4πU/P_in over the upper half-space and, with
// `elevationWindowDeg`, the best within that window (the takeoff): the design figures, the sweep,
// the mesh convergence and the tolerance copies alike; impedance and SWR are those at the height as
// mounted. The pattern figures use the field over ground (groundFigures.ts).
import { DEFAULT_SEGMENTS_PER_WAVELENGTH, findPeak, type Shape } from "../em/index.js";
import { InputError } from "../errors.js";
import { DEG_PER_RAD } from "../units.js";
import { feedAnalysis, type FeedAnalysis } from "./feedAnalysis.js";
import { suggestMatch, type MatchSuggestion } from "./feedMatch.js";
import { describeLobe, type LobeWords } from "./lobeWords.js";
import {
  cutGainsDbi, frontToBackDb, gainGridDbi, halfPowerBeamwidthDeg, polarizationAt, principalCuts, type Polarization,
} from "./patternFigures.js";
import { refineMesh, solveAt, uncertaintyOf, type SolveCache, type Uncertainty } from "./converged.js";
import { bandSweep, sweepFrequencies, type Sweep } from "./sweep.js";
import { DEFAULT_TOLERANCE, toleranceStudy, type ToleranceOptions, type ToleranceStudy } from "./tolerance.js";
import { trustFigures, type TrustFigures } from "./trust.js";
import { groundFieldOf, groundFrontToBackDb } from "./groundFigures.js";

export const CUT_STEP_DEG = 2;
export const GRID_THETA_STEP_DEG = 5;
export const GRID_PHI_STEP_DEG = 10;

export interface AnalysisOptions {
  bandHz: [number, number];
  lineImpedanceOhm: number;
  tolerance: Omit<ToleranceOptions, "lineImpedanceOhm">;
  /** SWR limit the feed options and the as-built rule judge against (default 2). */
  swrLimit?: number;
  /** Fix this one mesh (no refinement), for comparisons. */
  segmentsPerWavelength?: number;
  /** Over ground: the elevation window (degrees) the gain is judged in; default the whole upper half-space. */
  elevationWindowDeg?: [number, number];
}

export interface PatternFigures {
  beamwidthAlongThetaDeg: number | null;
  beamwidthAlongPhiDeg: number | null;
  frontToBackDb: number;
  polarization: Polarization;
  words: LobeWords;
  /** Gain every CUT_STEP_DEG from −180° to 180° − step, 0 = the peak. */
  cutAlongThetaDbi: number[];
  cutAlongPhiDbi: number[];
  /** Rows θ = 0…180° by GRID_THETA_STEP_DEG, columns φ = 0…350° by GRID_PHI_STEP_DEG. */
  gridDbi: number[][];
}

export interface Analysis {
  design: {
    frequencyHz: number;
    unknowns: number;
    inputImpedanceOhm: { re: number; im: number };
    gainDbi: number;
    directivityDbi: number;
    radiationEfficiency: number;
    peakDirection: { thetaDeg: number; phiDeg: number };
    /** Length of the feed gap the source is spread over (m). */
    feedGapM: number;
    uncertainty: Uncertainty;
  };
  sweep: Sweep;
  match: MatchSuggestion;
  tolerance: ToleranceStudy;
  pattern: PatternFigures;
  checks: TrustFigures;
  warnings: string[];
  /** Ranked feed options, as-built SWR percentiles and the tolerance verdict over gain and SWR. */
  feed?: FeedAnalysis;
}

export function checkAnalysisOptions(frequencyHz: number, o: AnalysisOptions): void {
  const [lo, hi] = o.bandHz;
  if (!(lo < hi)) throw new InputError(`band: low edge must be below the high edge (got ${lo / 1e6} ≥ ${hi / 1e6} MHz)`);
  if (frequencyHz < lo || frequencyHz > hi) {
    throw new InputError(`band: ${lo / 1e6}–${hi / 1e6} MHz must contain the design frequency ${frequencyHz / 1e6} MHz`);
  }
  if (!(o.lineImpedanceOhm > 0)) throw new InputError(`line impedance must be positive (got ${o.lineImpedanceOhm} Ω)`);
  if (!(Number.isInteger(o.tolerance.samples) && o.tolerance.samples > 0)) {
    throw new InputError(`tolerance samples must be a whole number above 0 (got ${o.tolerance.samples})`);
  }
}

/** The band edges as the sweep computes them, checked by the mesh refinement with the design frequency. */
export function bandCheckFrequencies(bandHz: [number, number]): number[] {
  const inBand = sweepFrequencies(bandHz).filter((p) => p.inBand).map((p) => p.frequencyHz);
  return [inBand[0], inBand[inBand.length - 1]];
}

/** `cache` may be shared with a caller that solves the same shape (the CLI's summary). */
export function analyzeDesign(shape: Shape, options: AnalysisOptions, cache: SolveCache = new Map()): Analysis {
  checkAnalysisOptions(shape.frequencyHz, options);
  const w = shape.ground ? options.elevationWindowDeg : undefined;
  const refinement = refineMesh(shape, { fixedSegmentsPerWavelength: options.segmentsPerWavelength, checkFrequenciesHz: bandCheckFrequencies(options.bandHz), elevationWindowDeg: w }, cache);
  const { segmentsPerWavelength, feedGapM } = refinement;
  const s = solveAt(shape, shape.frequencyHz, segmentsPerWavelength, feedGapM, cache, w);
  const baseSpw = options.segmentsPerWavelength ?? shape.segmentsPerWavelength ?? DEFAULT_SEGMENTS_PER_WAVELENGTH;
  const base = solveAt(shape, shape.frequencyHz, baseSpw, feedGapM, cache, w);
  const field = shape.ground ? groundFieldOf(shape, s) : s.farField;
  const { theta, phi } = s.peakDirectionRad;
  const cuts = principalCuts(theta, phi);
  const polarization = polarizationAt(field, theta, phi);
  // a refined mesh: sweep on the coarser mesh of the last doubling, corrected to the finest (sweep.ts)
  const refined = options.segmentsPerWavelength === undefined;
  const sweep = bandSweep(shape, options.bandHz, options.lineImpedanceOhm, refined
    ? {
      segmentsPerWavelength: refinement.comparedWithSegmentsPerWavelength,
      feedGapM,
      cache,
      elevationWindowDeg: w,
      correction: { fineSegmentsPerWavelength: segmentsPerWavelength, frequenciesHz: [...new Set([shape.frequencyHz, ...bandCheckFrequencies(options.bandHz)])] },
    }
    : { segmentsPerWavelength, feedGapM, cache, elevationWindowDeg: w });
  // the bent copies run on the starting mesh, against that mesh's own nominal (their spread is what counts)
  const baseShape = { ...shape, segmentsPerWavelength: baseSpw };
  const toleranceOptions = { ...DEFAULT_TOLERANCE, ...options.tolerance, lineImpedanceOhm: options.lineImpedanceOhm, ...(w ? { elevationWindowDeg: w } : {}) };
  // warm-started peaks in free space; over ground each copy searches its window afresh
  const tolerance = toleranceStudy(baseShape, base.peakGainDbi, toleranceOptions, shape.ground ? undefined : findPeak(base.farField).maxima);
  return {
    design: {
      frequencyHz: shape.frequencyHz,
      unknowns: s.unknowns,
      inputImpedanceOhm: s.inputImpedanceOhm,
      gainDbi: s.peakGainDbi,
      directivityDbi: s.peakDirectivityDbi,
      radiationEfficiency: s.radiationEfficiency,
      peakDirection: { thetaDeg: theta * DEG_PER_RAD, phiDeg: phi * DEG_PER_RAD },
      feedGapM,
      uncertainty: uncertaintyOf(refinement),
    },
    sweep,
    match: suggestMatch(sweep, shape.frequencyHz, s.inputImpedanceOhm),
    tolerance,
    pattern: {
      beamwidthAlongThetaDeg: halfPowerBeamwidthDeg(field, cuts.alongTheta),
      beamwidthAlongPhiDeg: halfPowerBeamwidthDeg(field, cuts.alongPhi),
      frontToBackDb: "direct" in field ? groundFrontToBackDb(field, theta, phi) : frontToBackDb(field, theta, phi),
      polarization,
      words: describeLobe(shape.wires[shape.feed.wire].pointsM, shape.feed.vertex, theta, phi, polarization.tiltDeg),
      cutAlongThetaDbi: cutGainsDbi(field, cuts.alongTheta, s.inputPowerW, CUT_STEP_DEG),
      cutAlongPhiDbi: cutGainsDbi(field, cuts.alongPhi, s.inputPowerW, CUT_STEP_DEG),
      gridDbi: gainGridDbi(field, s.inputPowerW, GRID_THETA_STEP_DEG, GRID_PHI_STEP_DEG),
    },
    checks: trustFigures(refinement, s),
    warnings: s.warnings,
    feed: feedAnalysis(baseShape, sweep, s, toleranceOptions, tolerance, { bandHz: options.bandHz, lineImpedanceOhm: options.lineImpedanceOhm, swrLimit: options.swrLimit }),
  };
}
