// Off-centre reference searches (catalog/computeOffCentre.ts computeOffCentreReference), the largest
// share of a catalog built from scratch: per (length, K) of the direct-feed grid in wavelength units,
// the search exactly as the catalog runs it (the centre-fed reference shape, fed in the middle,
// competing as a start), with its evaluations, CPU seconds (process.cpuUsage, user + system), gain,
// stop reasons and how many evaluations it took to come within 0.1 dB of its own end. One process,
// one seed: run before and after a change to the off-centre search, on the same machine. This is the
// search from the centre-fed shape; the catalog also runs the broad one across the box
// (designOffCentre's `broad`, the search as it was before), whose figures this bench gave first:
// 1 λ K = 2 5.118 dBi in 3,853 evaluations, K = 3 5.084 in 6,101; 1.5 λ K = 2 4.907 in 3,853, K = 3 4.894 in 6,101.
import { readFileSync } from "node:fs";
import { referenceRequest } from "../generator/catalog/compute.js";
import { designCentreFed, searchRequestOf } from "../generator/catalog/computeOffCentre.js";
import { mirrorAsOffCentre } from "../generator/shapes/offCentre.js";
import { parseGrid } from "../generator/catalog/grid.js";
import { designOffCentre } from "../generator/design/designOffCentre.js";

export interface OffCentreCase {
  lengthWl: number;
  piecesPerArm: number;
  centreFedGainDbi: number | null;
  status: string;
  gainDbi: number | null;
  evaluations: number;
  searchEvaluations: number;
  /** Evaluations until a feasible shape within 0.1 dB of the final gain; null if none was feasible. */
  evaluationsToWithin0p1Db: number | null;
  cpuSeconds: number;
  stopReasons: string[];
}

const cpuS = () => { const c = process.cpuUsage(); return (c.user + c.system) / 1e6; };

export function benchOffCentre(lengthsWl = [1, 1.5], pieces = [2, 3]): OffCentreCase[] {
  const grid = parseGrid(readFileSync("designs/grid.yaml", "utf8"), "designs/grid.yaml");
  const cases: OffCentreCase[] = [];
  for (const lengthWl of lengthsWl) for (const piecesPerArm of pieces) {
    const request = referenceRequest(grid, { lengthWl, piecesPerArm, variant: "direct-feed" });
    const centre = designCentreFed(request, undefined, true); // not timed: the start the catalog gives it
    const trace: { evaluations: number; gain: number }[] = [];
    const c0 = cpuS();
    const o = designOffCentre(searchRequestOf(request), {
      start: mirrorAsOffCentre(centre.x, piecesPerArm),
      onProgress: (p) => { if (p.bestGainDbi !== null) trace.push({ evaluations: p.evaluations, gain: p.bestGainDbi }); },
    });
    const cpuSeconds = cpuS() - c0;
    const end = o.evaluation.gainDbi;
    cases.push({
      lengthWl,
      piecesPerArm,
      centreFedGainDbi: centre.evaluation.gainDbi,
      status: o.status,
      gainDbi: end,
      evaluations: o.evaluations,
      searchEvaluations: o.searchEvaluations,
      evaluationsToWithin0p1Db: end === null ? null : trace.find((t) => t.gain >= end - 0.1)?.evaluations ?? null,
      cpuSeconds,
      stopReasons: o.stopReasons.map((s) => `${s.reason}=${Number(s.value.toPrecision(3))}`),
    });
  }
  return cases;
}
