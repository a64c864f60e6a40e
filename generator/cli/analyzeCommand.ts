// `analyze <shape.json>`: solves one shape and reports its figures, readable or as one JSON object.
import { analyzeDesign, bandCheckFrequencies, checkAnalysisOptions, convergedSolution, DEFAULT_TOLERANCE } from "../analysis/index.js";
import { solutionSummary, type SolutionSummary } from "../analysis/solutionSummary.js";
import { parseShape, type Shape } from "../em/index.js";
import { checkProblemSize } from "../em/shapeFile.js";
import { DEFAULT_SEGMENTS_PER_WAVELENGTH } from "../em/mesh.js";
import { SHAPE_BOUNDS } from "../bounds.js";
import { InputError } from "../errors.js";
import { analysisText } from "./analysisText.js";
import { printable, readInputFile } from "./errors.js";
import { complexText, fixed } from "./format.js";
import { applyGroundFlags, groundSummary, groundText } from "./groundOptions.js";
import type { Ground } from "../em/ground.js";

export interface AnalyzeOptions {
  json?: boolean;
  segmentsPerWavelength?: number;
  bandMhz?: [number, number];
  lineOhm: number;
  toleranceSamples: number;
  seed: number;
  ground?: Ground;
  heightM?: number;
  /** Over ground: the elevation window the gain is judged in (degrees). */
  elevationWindowDeg?: [number, number];
  /** Flags typed on the command line (not defaults): those that need --band-mhz are refused without it. */
  given?: string[];
}

const NEEDS_BAND: Record<string, string> = { lineOhm: "--line-ohm", toleranceSamples: "--tolerance-samples", seed: "--seed" };

/** Refuses a report whose figures are not finite: the input lies outside what the solver handles. */
export function checkFinite(label: string, s: SolutionSummary): void {
  const figures: [string, number][] = [
    ["input impedance", s.inputImpedanceOhm.re], ["input impedance", s.inputImpedanceOhm.im], ["peak gain", s.peakGainDbi],
    ["peak directivity", s.peakDirectivityDbi], ["efficiency", s.radiationEfficiency],
  ];
  for (const [what, v] of figures) {
    if (!Number.isFinite(v)) throw new InputError(`${label}: the solve gives a non-finite ${what}; the shape lies outside what the solver handles (see the input bounds in README.md)`);
  }
}

export { solutionSummary, type SolutionSummary };

export function summaryText(label: string, s: SolutionSummary): string {
  const lines = [
    printable(label), // a name from a file may hold terminal escape sequences
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
  lines.push(...groundText(s));
  for (const w of s.warnings) lines.push(`  warning: ${w}`);
  return lines.join("\n");
}

export async function loadShape(path: string): Promise<Shape> {
  return parseShape(await readInputFile(path, "analyze", SHAPE_BOUNDS.fileBytesMax), path);
}

export async function analyzeCommand(path: string, options: AnalyzeOptions): Promise<void> {
  if (!options.bandMhz) {
    const stray = (options.given ?? []).map((k) => NEEDS_BAND[k]).filter(Boolean);
    if (stray.length) throw new InputError(`analyze: ${stray.join(", ")} ${stray.length > 1 ? "apply" : "applies"} only with --band-mhz LO:HI (the band sweep, feed match and tolerance study)`);
  }
  const loaded = applyGroundFlags(await loadShape(path), options, path);
  if (options.elevationWindowDeg && !(loaded.ground && options.bandMhz)) {
    throw new InputError("analyze: --elevation-window-deg applies only over ground (--ground or the shape file's \"ground\") with --band-mhz LO:HI");
  }
  const shape = loaded;
  // converged by default (analysis/converged.ts); --segments-per-wavelength fixes one mesh
  const fixedSpw = options.segmentsPerWavelength;
  if (fixedSpw) checkProblemSize(shape, fixedSpw, path);
  const analysisOptions = options.bandMhz && {
    bandHz: options.bandMhz,
    lineImpedanceOhm: options.lineOhm,
    tolerance: { ...DEFAULT_TOLERANCE, samples: options.toleranceSamples, seed: options.seed },
    segmentsPerWavelength: fixedSpw,
    elevationWindowDeg: options.elevationWindowDeg,
  };
  if (analysisOptions) {
    checkAnalysisOptions(shape.frequencyHz, analysisOptions);
    // every solve of the analysis stays within the bounds: the sweep keeps the mesh and moves the
    // frequency up to the band's high edge; the convergence check doubles the segments
    const spw = shape.segmentsPerWavelength ?? DEFAULT_SEGMENTS_PER_WAVELENGTH;
    const highHz = analysisOptions.bandHz[1];
    checkProblemSize({ ...shape, frequencyHz: highHz }, (spw * shape.frequencyHz) / highHz, `${path} (at the band's high edge)`);
    checkProblemSize(shape, 2 * spw, `${path} (the convergence check at twice the segments per wavelength)`);
  }
  const cache = new Map();
  const checkFrequenciesHz = options.bandMhz ? bandCheckFrequencies(options.bandMhz) : [];
  const { solution, refinement } = convergedSolution(shape, { fixedSegmentsPerWavelength: fixedSpw, checkFrequenciesHz, elevationWindowDeg: analysisOptions ? options.elevationWindowDeg : undefined }, cache);
  const summary = solutionSummary(solution, refinement);
  checkFinite(path, summary);
  const analysis = analysisOptions ? analyzeDesign(shape, analysisOptions, cache) : null;
  if (options.json) {
    const extra = analysis && { sweep: analysis.sweep, match: analysis.match, tolerance: analysis.tolerance, pattern: analysis.pattern, checks: analysis.checks, feed: analysis.feed };
    process.stdout.write(`${JSON.stringify({ ...summary, ...extra })}\n`);
    return;
  }
  const text = [summaryText(shape.name ?? path, summary)];
  if (analysis) text.push("", analysisText(analysis));
  process.stdout.write(`${text.join("\n")}\n`);
}
