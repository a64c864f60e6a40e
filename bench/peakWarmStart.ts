// Warm-started peak search against the full one, on what the analysis really solves: the 64
// tolerance copies (seed 1, σ = 2°, 0.5 %) and the 17 sweep points of committed entries. For each
// copy or sweep point the far field is searched twice: from scratch (coarse grid + symmetry circles)
// and from the nominal shape's maxima. Reported: far-field evaluations per search (mean), CPU
// seconds of each, and misses (warm-start peak gain more than 1e-4 dB below the full search's).
//   npx tsx bench/peakWarmStart.ts [entry-id-prefix] (default "2m-")
import { readdirSync, readFileSync } from "node:fs";
import { perturbShape, DEFAULT_TOLERANCE } from "../generator/analysis/tolerance.js";
import { sweepFrequencies } from "../generator/analysis/sweep.js";
import { solveShape, validateShape, type Shape } from "../generator/em/index.js";
import { DEFAULT_PEAK_OPTIONS, findPeak, type Direction } from "../generator/em/pattern.js";
import { createRng } from "../generator/optimize/rng.js";

interface Tally { searches: number; fullEvaluations: number; warmEvaluations: number; fullCpuS: number; warmCpuS: number; misses: number; worstMissDb: number }
const tally = (): Tally => ({ searches: 0, fullEvaluations: 0, warmEvaluations: 0, fullCpuS: 0, warmCpuS: 0, misses: 0, worstMissDb: 0 });
const cpuS = (f: () => void): number => { const a = process.cpuUsage(); f(); const b = process.cpuUsage(a); return (b.user + b.system) / 1e6; };

function compare(t: Tally, shape: Shape, starts: readonly Direction[], segmentsPerWavelength?: number): void {
  const s = solveShape(shape, { segmentsPerWavelength });
  let full = findPeak(s.farField), warm = full;
  t.fullCpuS += cpuS(() => { full = findPeak(s.farField); });
  t.warmCpuS += cpuS(() => { warm = findPeak(s.farField, { ...DEFAULT_PEAK_OPTIONS, starts }); });
  const missDb = 10 * Math.log10(full.intensityWPerSr / warm.intensityWPerSr);
  t.searches++;
  t.fullEvaluations += full.evaluations;
  t.warmEvaluations += warm.evaluations;
  if (missDb > 1e-4 && process.env.VERBOSE) console.error(JSON.stringify({ full: [full.thetaRad * 57.3, full.phiRad * 57.3], warm: [warm.thetaRad * 57.3, warm.phiRad * 57.3], missDb, starts: starts.map((d) => [d.thetaRad * 57.3, d.phiRad * 57.3].map((x) => +x.toFixed(1))) }));
  if (missDb > 1e-4) { t.misses++; t.worstMissDb = Math.max(t.worstMissDb, missDb); }
}

const prefix = process.argv[2] ?? "2m-";
const dir = "designs/entries";
const copies = tally(), sweep = tally();
let entries = 0;
for (const f of readdirSync(dir).filter((x) => x.startsWith(prefix) && x.endsWith(".json")).sort()) {
  const e = JSON.parse(readFileSync(`${dir}/${f}`, "utf8"));
  if (e.status !== "ok") continue;
  entries++;
  const shape = validateShape({
    frequencyHz: e.inputs.frequencyHz, wireRadiusM: e.inputs.wireDiameterM / 2, conductor: e.inputs.conductor,
    segmentsPerWavelength: e.inputs.segmentsPerWavelength, wires: [{ pointsM: e.shape.pointsM }], feed: { wire: 0, vertex: e.shape.feedVertex },
  });
  const starts = findPeak(solveShape(shape).farField).maxima;
  const rng = createRng(e.inputs.seed);
  const o = { ...DEFAULT_TOLERANCE, samples: e.inputs.tolerance.samples, bendSigmaDeg: e.inputs.tolerance.bendSigmaDeg, lengthSigmaFraction: e.inputs.tolerance.lengthSigmaFraction };
  for (let i = 0; i < o.samples; i++) {
    try { compare(copies, perturbShape(shape, rng, o), starts); } catch { /* a copy that touches itself is not solved */ }
  }
  for (const { frequencyHz } of sweepFrequencies([e.inputs.bandLowHz, e.inputs.bandHighHz])) {
    compare(sweep, { ...shape, frequencyHz }, starts, (e.inputs.segmentsPerWavelength * e.inputs.frequencyHz) / frequencyHz);
  }
}
const report = (t: Tally) => ({
  searches: t.searches,
  meanEvaluationsFull: +(t.fullEvaluations / t.searches).toFixed(1),
  meanEvaluationsWarm: +(t.warmEvaluations / t.searches).toFixed(1),
  cpuSFull: +t.fullCpuS.toFixed(3),
  cpuSWarm: +t.warmCpuS.toFixed(3),
  misses: t.misses,
  worstMissDb: +t.worstMissDb.toExponential(2),
});
console.log(JSON.stringify({ prefix, entries, toleranceCopies: report(copies), sweepPoints: report(sweep) }, null, 2));
