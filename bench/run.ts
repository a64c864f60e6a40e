// `npm run bench [-- --json] [-- --only solver|ground|optimizer|offcentre|numpy|parity|audit|analysis|converged|catalog|pipeline|designer|site]`: prints timing tables.
// Figures, not assertions: tests never time anything.
import { benchAnalysis } from "./analysis.js";
import { benchCatalog } from "./catalog.js";
import { auditCatalog, AUDIT_SIBLING_DB } from "./catalogAudit.js";
import { benchGround, benchGroundObjective } from "./ground.js";
import { benchConverged } from "./converged.js";
import { benchDesignParity, PARITY_DB } from "./designParity.js";
import { benchNumpyCompare, numpyMissing } from "./numpyCompare.js";
import { benchOffCentre } from "./offCentre.js";
import { benchOptimizer } from "./optimizer.js";
import { benchPipeline } from "./pipeline.js";
import { benchSolver } from "./solver.js";

const args = process.argv.slice(2);
const json = args.includes("--json");
const onlyAt = args.indexOf("--only");
const only = onlyAt >= 0 ? args[onlyAt + 1] : undefined;
const wants = (name: string) => !only || only === name || (name === "catalog" && only === "catalog-full");

const ms = (v: number) => v.toFixed(3);
const out: Record<string, unknown> = {};

if (wants("solver")) {
  const cases = benchSolver();
  out.cases = cases;
  if (!json) {
    console.log("solver (straight wire, 25 segments/λ, median of 200 runs, ms)");
    console.log("unknowns  fill     solve    peak     total    | LDLᵀ     real 2N×2N LU (ml-matrix) | previous fill+LU  mirror fill+solve  ratio");
    for (const c of cases) {
      console.log(`${String(c.unknowns).padEnd(9)} ${ms(c.fillMs).padEnd(8)} ${ms(c.solveMs).padEnd(8)} ${ms(c.peakMs).padEnd(8)} ${ms(c.totalMs).padEnd(8)} | ${ms(c.ldltSolveMs).padEnd(8)} ${ms(c.realFormSolveMs).padEnd(25)} | ${ms(c.previousFillLuMs).padEnd(17)} ${ms(c.mirrorFillSolveMs).padEnd(18)} ${c.previousOverCurrent.toFixed(2)}×`);
    }
  }
}

if (wants("ground")) {
  const cases = [...benchGround(), ...benchGroundObjective()];
  out.ground = cases;
  if (!json) {
    console.log("\nover ground beside free space (solveShape, median of 40 runs after 5 warm-up runs; CPU s per solve)");
    for (const c of cases) console.log(`${c.name.padEnd(52)} ${String(c.unknowns).padEnd(4)} ${ms(c.medianMs).padEnd(9)} ms  ${c.cpuSPerSolve.toFixed(4)} s`);
  }
}

if (wants("optimizer")) {
  const cases = benchOptimizer();
  out.optimizer = cases;
  if (!json) {
    console.log("\noptimizer (1.5λ wire, lossless, 5 seeds): evaluations and seconds to come within 0.05 dB of the best");
    console.log("K  best dBi  evals median  evals worst  s median  s worst  total evals (median)  CPU s (median)  median dBi");
    for (const c of cases) {
      console.log(`${c.piecesPerArm}  ${c.bestGainDbi.toFixed(3).padEnd(8)} ${String(c.medianEvaluations).padEnd(13)} ${String(c.worstEvaluations).padEnd(12)} ${c.medianSeconds.toFixed(2).padEnd(9)} ${c.worstSeconds.toFixed(2).padEnd(8)} ${String(c.medianTotalEvaluations).padEnd(21)} ${c.medianCpuSeconds.toFixed(2).padEnd(15)} ${c.medianGainDbi.toFixed(3)}`);
    }
  }
}

if (only === "offcentre") { // not in the default run: about 2 CPU minutes
  const cases = benchOffCentre();
  out.offCentre = cases;
  if (!json) {
    console.log("\noff-centre reference searches (direct feed, wavelength units, as the catalog runs them; CPU s)");
    console.log("length  K  centre-fed dBi  off-centre dBi  status      evals  to within 0.1 dB  CPU s   stop reasons");
    for (const c of cases) {
      const g = (v: number | null) => (v === null ? "—" : v.toFixed(3));
      console.log(`${`${c.lengthWl} λ`.padEnd(7)} ${String(c.piecesPerArm).padEnd(2)} ${g(c.centreFedGainDbi).padEnd(15)} ${g(c.gainDbi).padEnd(15)} ${c.status.padEnd(11)} ${String(c.evaluations).padEnd(6)} ${String(c.evaluationsToWithin0p1Db ?? "—").padEnd(17)} ${c.cpuSeconds.toFixed(1).padEnd(7)} ${c.stopReasons.join(", ")}`);
    }
  }
}

if (only === "audit") { // not in the default run: reads designs/entries, solves nothing
  const a = auditCatalog();
  out.audit = a;
  if (!json) {
    const fs = a.freeSpace;
    console.log(`\ncatalog audit (designs/entries): ${a.entries} entries`);
    console.log(`free space: ${fs.buildable} of ${fs.cells} cells buildable; direct feed ${fs.directFeedBuildable} of ${fs.directFeedCells} (${fs.offCentre} fed off centre)`);
    console.log(`over ground: ${a.overGround.buildable} of ${a.overGround.cells} cells buildable`);
    console.log(`direct feed as built (90th percentile of the bent copies): bare SWR holds ${a.directFeedBareHolds}, holds only after the recommended feed ${a.directFeedHoldsAfterFeed}, neither ${a.directFeedHoldsNeither.length}${a.directFeedHoldsNeither.length ? ` (${a.directFeedHoldsNeither.join(", ")})` : ""}`);
    console.log(`bands with no direct-feed design: ${a.bandsWithoutDirectFeed.join(", ") || "none"}`);
    console.log(`${a.underSibling.length} entries more than ${AUDIT_SIBLING_DB} dB under the same cell with one piece fewer per arm${a.underSibling.length ? ":" : ""}`);
    for (const u of a.underSibling) console.log(`  ${u.id.padEnd(58)} ${u.gainDbi.toFixed(3)} vs ${u.siblingGainDbi.toFixed(3)} dBi (${u.differenceDb.toFixed(3)} dB)`);
  }
}

if (only === "numpy") { // not in the default run: needs python3 with numpy and scipy; about 20 CPU s
  const missing = numpyMissing();
  if (missing) {
    if (json) out.numpy = { skipped: missing };
    else console.log(`numpy comparison skipped: ${missing}`);
  } else {
    const c = benchNumpyCompare();
    out.numpy = c;
    if (!json) {
      const { python, numpy, scipy } = c.versions;
      console.log(`\nnumpy reference (bench/numpyReference.py, python ${python}, numpy ${numpy}, scipy ${scipy}, one BLAS thread): straight wire, 25 segments/λ, unit voltage at the feed; median CPU ms per solve, ${c.rounds} rounds alternating ${c.runs} of ours with ${c.numpyRepetitions} of numpy`);
      console.log("unknowns  our fill  our LU+solve  numpy fill  numpy LU+solve  ours/numpy | mirror fill+solve  ours/numpy | Z_in ours (Ω)           Z_in numpy (Ω)          rel. diff");
      const z = (v: { re: number; im: number }) => `${v.re.toFixed(6)} ${v.im >= 0 ? "+" : "−"} j${Math.abs(v.im).toFixed(6)}`;
      const t = (s: number) => (s * 1e3).toFixed(3);
      for (const r of c.cases) {
        console.log(`${String(r.unknowns).padEnd(9)} ${t(r.oursFillS).padEnd(9)} ${t(r.oursLuSolveS).padEnd(13)} ${t(r.numpyFillS).padEnd(11)} ${t(r.numpyLuSolveS).padEnd(15)} ${`${r.ratio.toFixed(3)}×`.padEnd(10)} | ${t(r.oursMirrorS).padEnd(18)} ${`${r.mirrorRatio.toFixed(3)}×`.padEnd(10)} | ${z(r.oursImpedanceOhm).padEnd(23)} ${z(r.numpyImpedanceOhm).padEnd(23)} ${r.relativeDifference.toExponential(1)}`);
      }
      const g = c.gap;
      console.log(`finite gap, solveFeed's mesh (${g.lengthWl} λ, ${g.unknowns} unknowns): solveFeed ${z(g.oursImpedanceOhm)} Ω, numpy ${z(g.numpyImpedanceOhm)} Ω, rel. diff ${g.relativeDifference.toExponential(1)}`);
    }
  }
}

if (only === "parity") { // not in the default run: about 10 CPU s per direct-feed cell (--shard i/n splits it)
  const shardAt = args.indexOf("--shard");
  const [index, count] = shardAt >= 0 ? args[shardAt + 1].split("/").map(Number) : [1, 1];
  if (!(Number.isInteger(index) && Number.isInteger(count) && index >= 1 && index <= count)) {
    console.error("bench: --shard must be i/n with 1 ≤ i ≤ n, e.g. 1/2");
    process.exit(2);
  }
  const cases = benchDesignParity("designs/entries", { index, count });
  out.parity = cases;
  if (!json) {
    console.log(`\ncatalog direct-feed entries against a fresh design (same inputs and seed; a miss: more than ${PARITY_DB} dB under a fresh design that holds as built)`);
    console.log("entry                              catalog          fresh            holds  catalog − fresh  verdict               CPU s");
    const g = (v: number | null) => (v === null ? "—" : v.toFixed(3));
    for (const c of cases) {
      console.log(`${c.id.padEnd(34)} ${`${g(c.catalogGainDbi)} ${c.catalogFamily === "off-centre" ? "off" : "ctr"}`.padEnd(16)} ${`${g(c.freshGainDbi)} ${c.freshFamily === "off-centre" ? "off" : "ctr"}`.padEnd(16)} ${String(c.freshHoldsAsBuilt ?? "—").padEnd(6)} ${(c.differenceDb === null ? "—" : c.differenceDb.toFixed(3)).padEnd(16)} ${c.verdict.padEnd(21)} ${c.cpuSeconds.toFixed(1)}`);
    }
    const counts = new Map<string, number>();
    for (const c of cases) counts.set(c.verdict, (counts.get(c.verdict) ?? 0) + 1);
    console.log(`${cases.length} cells: ${[...counts].map(([k, v]) => `${v} ${k}`).join(", ")}; ${cases.reduce((a, c) => a + c.cpuSeconds, 0).toFixed(0)} CPU s`);
  }
}

if (wants("analysis")) {
  const a = benchAnalysis();
  out.analysis = a;
  if (!json) console.log(`\nanalysis of a 1.5λ K = 3 design (sweep, match, 64-sample tolerance, convergence): median ${a.medianMs.toFixed(0)} ms of ${a.runs}`);
}

if (wants("converged")) {
  const c = benchConverged();
  out.converged = c;
  if (!json) {
    console.log(`\nconverged vs single-mesh analysis, 1.5λ K = 3 (CPU s, median of ${c.runs}): 25/λ only ${c.singleMeshCpuS.toFixed(2)} s, converged ${c.convergedCpuS.toFixed(2)} s`);
    console.log(`  refinement: published at ${c.publishedSegmentsPerWavelength}/λ after ${c.refinementSolves} solves; last doubling moved gain ${c.gainChangeDb.toFixed(4)} dB, impedance ${c.impedanceChangePercent.toFixed(2)} %`);
  }
}

if (wants("catalog")) {
  const c = await benchCatalog(only === "catalog-full");
  out.catalog = c;
  if (!json) {
    console.log(`\ncatalog: ${c.smallGridEntries}-entry grid from scratch: 1 worker ${c.oneWorkerS.toFixed(1)} s, 2 workers ${c.twoWorkersS.toFixed(1)} s (speed-up ${c.speedup.toFixed(2)}×); CPU ${c.oneWorkerCpuS.toFixed(1)} s and ${c.twoWorkersCpuS.toFixed(1)} s`);
    console.log(`  default grid with a warm cache: ${c.warmCacheS.toFixed(2)} s`);
    console.log(`  1.5λ K = 3 in 3 bands: reference + polish ${c.referencePlusPolishS.toFixed(1)} s, full search per band ${c.searchPerBandS.toFixed(1)} s; polish gives up at most ${c.polishGainShortfallDb.toFixed(3)} dB`);
    if (c.fullGridFromScratchS !== null) console.log(`  default grid from scratch, 2 workers: ${(c.fullGridFromScratchS / 60).toFixed(1)} min`);
  }
}

if (only === "pipeline") { // about 4 CPU min, so only when asked
  const p = benchPipeline();
  out.pipeline = p;
  if (!json) for (const [k, s] of Object.entries(p)) console.log(`pipeline (2 bands × 1.5, 2 λ × K ≤ 3, both variants): ${k.padEnd(22)} ${s.toFixed(1)} CPU s`);
}

// only when asked: it builds the site (if no matching build is cached) and needs Debian's chromium
if (only === "designer") {
  const { benchDesigner, printDesigner } = await import("./designer.js");
  const d = await benchDesigner();
  out.designer = d;
  if (!json) printDesigner(d);
}

// only when asked: two site builds (8 and 160 entries), about 2 CPU min
if (only === "site") {
  const { benchSiteBuild, printSiteBuild } = await import("./siteBuild.js");
  const b = await benchSiteBuild();
  out.site = b;
  if (!json) printSiteBuild(b);
}

if (json) console.log(JSON.stringify(out));
