// `analyze <shape.json>`: solves one shape and reports its figures, readable or as one JSON object.
import { analyzeDesign, bandCheckFrequencies, checkAnalysisOptions, convergedSolution, DEFAULT_TOLERANCE, uncertaintyOf, type Refinement } from "../analysis/index.js";
import { parseShape, SOLVER_VERSION, type Shape, type Solution } from "../em/index.js";
import { analysisText } from "./analysisText.js";
import { DEG_PER_RAD } from "../units.js";
import { readInputFile } from "./errors.js";
import { complexText, fixed } from "./format.js";

export interface AnalyzeOptions {
  json?: boolean;
  segmentsPerWavelength?: number;
  bandMhz?: [number, number];
  lineOhm: number;
  toleranceSamples: number;
  seed: number;
}

/** The figures every analysis reports (the JSON contract of `analyze --json`). */
export function solutionSummary(solution: Solution, refinement?: Refinement) {
  return {
    solverVersion: SOLVER_VERSION,
    frequencyHz: solution.frequencyHz,
    unknowns: solution.unknowns,
    segments: solution.segments,
    inputImpedanceOhm: solution.inputImpedanceOhm,
    peakGainDbi: solution.peakGainDbi,
    peakDirectivityDbi: solution.peakDirectivityDbi,
    radiationEfficiency: solution.radiationEfficiency,
    peakDirection: {
      thetaDeg: solution.peakDirectionRad.theta * DEG_PER_RAD,
      phiDeg: solution.peakDirectionRad.phi * DEG_PER_RAD,
    },
    energyBalanceError: solution.energyBalanceError,
    feedGapM: solution.feedGapM,
    ...(refinement && { uncertainty: uncertaintyOf(refinement) }),
    warnings: solution.warnings,
  };
}

export type SolutionSummary = ReturnType<typeof solutionSummary>;

export function summaryText(label: string, s: SolutionSummary): string {
  const lines = [
    `${label}`,
    `  frequency            ${fixed(s.frequencyHz / 1e6, 4)} MHz`,
    `  unknowns / segments  ${s.unknowns} / ${s.segments}`,
    `  input impedance      ${complexText(s.inputImpedanceOhm, 2)}`,
    `  peak gain            ${fixed(s.peakGainDbi, 2)} dBi`,
    `  peak directivity     ${fixed(s.peakDirectivityDbi, 2)} dBi`,
    `  efficiency           ${fixed(100 * s.radiationEfficiency, 3)} %`,
    `  peak direction       θ ${fixed(s.peakDirection.thetaDeg, 1)}°, φ ${fixed(s.peakDirection.phiDeg, 1)}° (θ from +z, φ from +x toward +y)`,
  ];
  if (s.uncertainty) {
    const u = s.uncertainty;
    lines.push(`  mesh                 ${u.segmentsPerWavelength} segments per wavelength; against ${u.comparedWithSegmentsPerWavelength} per wavelength gain moves ${fixed(u.gainDb, 3)} dB, impedance ${fixed(u.impedancePercent, 2)} %${u.converged ? "" : " (above the 0.01 dB / 1 % aim)"}`);
  }
  lines.push(`  feed gap             ${fixed(s.feedGapM * 1000, 1)} mm (the source voltage spread evenly over it)`);
  if (s.energyBalanceError !== null) lines.push(`  energy balance error ${s.energyBalanceError.toExponential(2)} (pattern integral vs. radiated power)`);
  for (const w of s.warnings) lines.push(`  warning: ${w}`);
  return lines.join("\n");
}

export async function loadShape(path: string): Promise<Shape> {
  return parseShape(await readInputFile(path, "analyze"), path);
}

export async function analyzeCommand(path: string, options: AnalyzeOptions): Promise<void> {
  const shape = await loadShape(path);
  // converged by default (analysis/converged.ts); --segments-per-wavelength fixes one mesh
  const fixedSpw = options.segmentsPerWavelength;
  const analysisOptions = options.bandMhz && {
    bandHz: options.bandMhz,
    lineImpedanceOhm: options.lineOhm,
    tolerance: { ...DEFAULT_TOLERANCE, samples: options.toleranceSamples, seed: options.seed },
    segmentsPerWavelength: fixedSpw,
  };
  if (analysisOptions) checkAnalysisOptions(shape.frequencyHz, analysisOptions);
  const cache = new Map();
  const checkFrequenciesHz = options.bandMhz ? bandCheckFrequencies(options.bandMhz) : [];
  const { solution, refinement } = convergedSolution(shape, { fixedSegmentsPerWavelength: fixedSpw, checkFrequenciesHz }, cache);
  const summary = solutionSummary(solution, refinement);
  const analysis = analysisOptions ? analyzeDesign(shape, analysisOptions, cache) : null;
  if (options.json) {
    const extra = analysis && { sweep: analysis.sweep, match: analysis.match, tolerance: analysis.tolerance, pattern: analysis.pattern, checks: analysis.checks };
    process.stdout.write(`${JSON.stringify({ ...summary, ...extra })}\n`);
    return;
  }
  const text = [summaryText(shape.name ?? path, summary)];
  if (analysis) text.push("", analysisText(analysis));
  process.stdout.write(`${text.join("\n")}\n`);
}
