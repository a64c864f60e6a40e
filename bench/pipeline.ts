// Per-entry pipeline cost on a small grid (2 bands × 1.5, 2 λ × K = 1…3 references, entries at
// K = 2, 3, both variants), CPU seconds (process.cpuUsage) per reference kind and entry kind, in
// one process (no workers), so a CPU profile covers all of it:
//   node --cpu-prof --cpu-prof-dir=/tmp/prof --import tsx bench/pipeline.ts
//   npx tsx bench/profileStages.ts /tmp/prof/<file>.cpuprofile computeEntry designCentreFed tryOffCentre analyzeDesign
import { readFileSync } from "node:fs";
import { computeEntry, computeReference, previousKey, type ReferenceResult } from "../generator/catalog/compute.js";
import { expandGrid, parseGrid } from "../generator/catalog/grid.js";

const cpuS = () => { const c = process.cpuUsage(); return (c.user + c.system) / 1e6; };

export function benchPipeline(bandIds = ["2m", "70cm"], lengthsWl = [1.5, 2.0]) {
  const full = parseGrid(readFileSync("designs/grid.yaml", "utf8"), "designs/grid.yaml");
  const grid = { ...full, bands: full.bands.filter((b) => bandIds.includes(b.id)), lengthsWl, piecesPerArm: [1, 2, 3] };
  const refs = new Map<string, ReferenceResult>();
  const cpu: Record<string, number> = {};
  const add = (k: string, s: number) => { cpu[k] = (cpu[k] ?? 0) + s; };
  for (const lengthWl of grid.lengthsWl) for (const variant of grid.variants) for (const piecesPerArm of grid.piecesPerArm) {
    const k = { lengthWl, piecesPerArm, variant };
    const prev = previousKey(k);
    const c0 = cpuS();
    refs.set(`${lengthWl}|${piecesPerArm}|${variant}`, computeReference(grid, k, prev ? refs.get(`${lengthWl}|${prev.piecesPerArm}|${variant}`)! : null));
    add(`reference ${variant}`, cpuS() - c0);
  }
  for (const cell of expandGrid(grid).filter((c) => c.piecesPerArm > 1)) {
    const c0 = cpuS();
    computeEntry(grid, cell, refs.get(`${cell.lengthWl}|${cell.piecesPerArm}|${cell.variant}`)!, refs.get(`${cell.lengthWl}|${cell.piecesPerArm - 1}|${cell.variant}`) ?? null);
    add(`entry ${cell.variant}`, cpuS() - c0);
  }
  return cpu;
}

if (process.argv[1]?.endsWith("pipeline.ts")) console.log(JSON.stringify(benchPipeline()));
