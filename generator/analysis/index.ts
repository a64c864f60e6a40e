export { analyzeDesign, bandCheckFrequencies, checkAnalysisOptions, type Analysis, type AnalysisOptions, type PatternFigures } from "./analyzeDesign.js";
export { bandSweep, sweepFrequencies, type Sweep, type SweepPoint } from "./sweep.js";
export { suggestMatch, BALUN_NOTE, type MatchSuggestion, type MatchComponent } from "./feedMatch.js";
export { toleranceStudy, perturbShape, DEFAULT_TOLERANCE, type ToleranceStudy, type ToleranceOptions } from "./tolerance.js";
export { swr, reflectionCoefficient, returnLossDb, mismatchEfficiency } from "./swr.js";
export { refineMesh, convergedSolution, uncertaintyOf, GAIN_TOLERANCE_DB, IMPEDANCE_TOLERANCE, MAX_SEGMENTS_PER_WAVELENGTH, type Refinement, type Uncertainty, type SolveCache } from "./converged.js";
