// Catalog timings: (1) a small grid from scratch with 1 and 2 workers (the speed-up); (2) the default
// grid with every entry present (the warm cache); (3) what searching once in wavelength units and
// polishing per band saves against a full search in every band; (4) optionally the whole default
// grid from scratch (`--only catalog-full`, about ten minutes).
import { mkdtempSync, readFileSync } from "node:fs";
import { tmpdir } from "node:os";
import { join } from "node:path";
import { computeReference, bandRequest } from "../generator/catalog/compute.js";
import { generate } from "../generator/catalog/generate.js";
import { expandGrid, parseGrid, type Grid } from "../generator/catalog/grid.js";
import { designBentArm } from "../generator/design/designBentArm.js";

const loadGrid = (path: string) => parseGrid(readFileSync(path, "utf8"), path);

/**
 * Four bands × four lengths × K = 1, 2 × max-gain: 32 entries on 4 short chains of reference
 * searches (K = 1 → 2), so the work, not one long chain, sets the time.
 */
function smallGrid(grid: Grid): Grid {
  return { ...grid, bands: grid.bands.slice(2, 6), lengthsWl: [1, 1.5, 2, 2.5], piecesPerArm: [1, 2], variants: ["max-gain"] };
}

/** Wall seconds of one generate run; CPU seconds (process.cpuUsage: every thread, workers included) go to `cpu`. */
async function timeGenerate(grid: Grid, workers: number, outDir = mkdtempSync(join(tmpdir(), "bentwire-bench-")), cpu: number[] = []): Promise<number> {
  const c0 = process.cpuUsage();
  const report = await generate({ grid, outDir, workers });
  const c = process.cpuUsage(c0);
  cpu.push((c.user + c.system) / 1e6);
  return report.seconds;
}

export async function benchCatalog(full: boolean) {
  const grid = loadGrid("designs/grid.yaml");
  const small = smallGrid(grid);
  const cpu: number[] = [];
  const oneWorkerS = await timeGenerate(small, 1, undefined, cpu);
  const twoWorkersS = await timeGenerate(small, 2, undefined, cpu);
  const warmS = await timeGenerate(grid, 2, "designs/entries");
  // reference + polish per band against a full search per band, for 1.5λ K = 3 max-gain in 3 bands
  const cells = expandGrid(grid).filter((c) => c.lengthWl === 1.5 && c.piecesPerArm === 3 && c.variant === "max-gain").slice(0, 3);
  // the K = 2 reference seeds K = 3 in the catalog too, and serves every band and K = 2 itself
  const k2 = computeReference(grid, { ...cells[0], piecesPerArm: 2 }, computeReference(grid, { ...cells[0], piecesPerArm: 1 }, null));
  let t0 = performance.now();
  const reference = computeReference(grid, cells[0], k2);
  const polished = cells.map((c) => designBentArm(bandRequest(grid, c), { start: reference.x }));
  const sharedS = (performance.now() - t0) / 1000;
  t0 = performance.now();
  const searched = cells.map((c) => designBentArm(bandRequest(grid, c)));
  const perBandS = (performance.now() - t0) / 1000;
  const gainGapDb = Math.max(...cells.map((_, i) => (searched[i].evaluation.gainDbi ?? 0) - (polished[i].evaluation.gainDbi ?? 0)));
  const fullS = full ? await timeGenerate(grid, 2) : null;
  return {
    smallGridEntries: expandGrid(small).length,
    oneWorkerS,
    twoWorkersS,
    oneWorkerCpuS: cpu[0],
    twoWorkersCpuS: cpu[1],
    speedup: oneWorkerS / twoWorkersS,
    warmCacheS: warmS,
    referencePlusPolishS: sharedS,
    searchPerBandS: perBandS,
    polishGainShortfallDb: gainGapDb,
    fullGridFromScratchS: fullS,
  };
}
