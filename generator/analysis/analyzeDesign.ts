// Everything a builder needs to know about one shape, in one pure function: the design-frequency
// figures, a band sweep, a feed-match suggestion, a tolerance study, pattern figures and cuts, and
// the trust figures. The CLI's `analyze --band-mhz` and the catalog both call this.
import { findPeak, solveShape, type Shape } from "../em/index.js";
import { InputError } from "../errors.js";
import { DEG_PER_RAD } from "../units.js";
import { suggestMatch, type MatchSuggestion } from "./feedMatch.js";
import { describeLobe, type LobeWords } from "./lobeWords.js";
import {
  cutGainsDbi, frontToBackDb, gainGridDbi, halfPowerBeamwidthDeg, polarizationAt, principalCuts, type Polarization,
} from "./patternFigures.js";
import { bandSweep, type Sweep } from "./sweep.js";
import { DEFAULT_TOLERANCE, toleranceStudy, type ToleranceOptions, type ToleranceStudy } from "./tolerance.js";
import { trustFigures, type TrustFigures } from "./trust.js";

export const CUT_STEP_DEG = 2;
export const GRID_THETA_STEP_DEG = 5;
export const GRID_PHI_STEP_DEG = 10;

export interface AnalysisOptions {
  bandHz: [number, number];
  lineImpedanceOhm: number;
  tolerance: Omit<ToleranceOptions, "lineImpedanceOhm">;
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
  };
  sweep: Sweep;
  match: MatchSuggestion;
  tolerance: ToleranceStudy;
  pattern: PatternFigures;
  checks: TrustFigures;
  warnings: string[];
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

export function analyzeDesign(shape: Shape, options: AnalysisOptions): Analysis {
  checkAnalysisOptions(shape.frequencyHz, options);
  const s = solveShape(shape, { energyBalance: true });
  const { theta, phi } = s.peakDirectionRad;
  const cuts = principalCuts(theta, phi);
  const polarization = polarizationAt(s.farField, theta, phi);
  const sweep = bandSweep(shape, options.bandHz, options.lineImpedanceOhm);
  return {
    design: {
      frequencyHz: shape.frequencyHz,
      unknowns: s.unknowns,
      inputImpedanceOhm: s.inputImpedanceOhm,
      gainDbi: s.peakGainDbi,
      directivityDbi: s.peakDirectivityDbi,
      radiationEfficiency: s.radiationEfficiency,
      peakDirection: { thetaDeg: theta * DEG_PER_RAD, phiDeg: phi * DEG_PER_RAD },
    },
    sweep,
    match: suggestMatch(sweep, shape.frequencyHz, s.inputImpedanceOhm),
    tolerance: toleranceStudy(shape, s.peakGainDbi, { ...DEFAULT_TOLERANCE, ...options.tolerance, lineImpedanceOhm: options.lineImpedanceOhm }, findPeak(s.farField).maxima),
    pattern: {
      beamwidthAlongThetaDeg: halfPowerBeamwidthDeg(s.farField, cuts.alongTheta),
      beamwidthAlongPhiDeg: halfPowerBeamwidthDeg(s.farField, cuts.alongPhi),
      frontToBackDb: frontToBackDb(s.farField, theta, phi),
      polarization,
      words: describeLobe(shape.wires[shape.feed.wire].pointsM, shape.feed.vertex, theta, phi, polarization.tiltDeg),
      cutAlongThetaDbi: cutGainsDbi(s.farField, cuts.alongTheta, s.inputPowerW, CUT_STEP_DEG),
      cutAlongPhiDbi: cutGainsDbi(s.farField, cuts.alongPhi, s.inputPowerW, CUT_STEP_DEG),
      gridDbi: gainGridDbi(s.farField, s.inputPowerW, GRID_THETA_STEP_DEG, GRID_PHI_STEP_DEG),
    },
    checks: trustFigures(shape, s),
    warnings: s.warnings,
  };
}
