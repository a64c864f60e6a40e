// Catalog direct-feed entries against a fresh `design` for the same inputs and seed: per free-space
// direct-feed cell of designs/grid.yaml, the search `design` runs (designBentArm on the cell's band
// request, and for an entry published with the feed off centre also `design --family off-centre`,
// designOffCentreFromCentreFed), then whether that fresh shape holds as built (the catalog's own
// rule: the 90th percentile of the bending-tolerance Monte Carlo within the SWR limit across the band,
// analysis/feedAnalysis.ts). A catalog entry more than 0.1 dB under a fresh design that holds as built
// is a miss; under a fresh design that does not hold as built it is the price of the as-built rule.
// `npm run -s bench -- --only parity [--shard i/n]` (about 10 CPU s per cell; not in the default run).
import { readFileSync } from "node:fs";
import { join } from "node:path";
import { analyzeDesign } from "../generator/analysis/index.js";
import { bandRequest } from "../generator/catalog/compute.js";
import { publishedShapeOf } from "../generator/catalog/entryBuild.js";
import { expandGrid, parseGrid, shardOf } from "../generator/catalog/grid.js";
import { designBentArm, type DesignOutcome } from "../generator/design/designBentArm.js";
import { designOffCentreFromCentreFed } from "../generator/design/designOffCentre.js";
import { shapeOf } from "../generator/design/objective.js";
import { offCentreShapeOf } from "../generator/design/offCentreObjective.js";
import type { DesignRequest } from "../generator/design/request.js";

/** A catalog entry this far under a fresh design that holds as built counts as a miss (issue 10). */
export const PARITY_DB = 0.1;

export interface ParityCase {
  id: string;
  catalogFamily: string;
  catalogStatus: string;
  catalogGainDbi: number | null;
  freshFamily: string;
  freshStatus: string;
  freshGainDbi: number | null;
  /** Whether the fresh design's tolerance 90th percentile meets the SWR limit; null when infeasible. */
  freshHoldsAsBuilt: boolean | null;
  /** catalog − fresh, dB; null when either has no design. */
  differenceDb: number | null;
  verdict: "within" | "catalog better" | "fresh fails as built" | "miss" | "both infeasible" | "catalog only" | "fresh only";
  cpuSeconds: number;
}

const cpuS = () => { const c = process.cpuUsage(); return (c.user + c.system) / 1e6; };

function holdsAsBuilt(o: DesignOutcome, r: DesignRequest, offCentre: boolean, tolerance: { samples: number; bendSigmaDeg: number; lengthSigmaFraction: number; seed: number }): boolean | null {
  if (o.status !== "ok") return null;
  const shape = publishedShapeOf(offCentre ? offCentreShapeOf(o.x, r) : shapeOf(o.x, r));
  const a = analyzeDesign(shape, { bandHz: r.bandHz!, lineImpedanceOhm: r.lineImpedanceOhm, tolerance });
  return a.feed?.toleranceSwr.meetsLimitAsBuilt === true;
}

function verdictOf(c: Omit<ParityCase, "verdict" | "cpuSeconds">): ParityCase["verdict"] {
  const catalogOk = c.catalogStatus === "ok" && c.catalogGainDbi !== null;
  const freshOk = c.freshStatus === "ok" && c.freshGainDbi !== null;
  if (!catalogOk && !freshOk) return "both infeasible";
  if (!freshOk) return "catalog only";
  if (!catalogOk) return c.freshHoldsAsBuilt ? "fresh only" : "fresh fails as built";
  if (c.differenceDb! >= -PARITY_DB) return c.differenceDb! > PARITY_DB ? "catalog better" : "within";
  return c.freshHoldsAsBuilt ? "miss" : "fresh fails as built";
}

export function benchDesignParity(entriesDir = "designs/entries", shard = { index: 1, count: 1 }): ParityCase[] {
  const grid = parseGrid(readFileSync("designs/grid.yaml", "utf8"), "designs/grid.yaml");
  const tolerance = { samples: grid.tolerance.samples, bendSigmaDeg: grid.tolerance.bendSigmaDeg, lengthSigmaFraction: grid.tolerance.lengthSigmaPercent / 100, seed: grid.seed };
  const cells = shardOf(expandGrid(grid).filter((c) => c.variant === "direct-feed"), shard);
  const out: ParityCase[] = [];
  for (const cell of cells) {
    const entry = JSON.parse(readFileSync(join(entriesDir, `${cell.id}.json`), "utf8"));
    const request = bandRequest(grid, cell);
    const catalogFamily: string = entry.feed?.feedFraction !== undefined && entry.feed.feedFraction !== 0.5 ? "off-centre" : "centre-fed";
    const c0 = cpuS();
    const centre = designBentArm(request);
    let fresh = centre;
    let freshFamily = "centre-fed";
    if (catalogFamily === "off-centre") {
      const off = designOffCentreFromCentreFed(request);
      if (off.status === "ok" && (centre.status !== "ok" || off.evaluation.gainDbi! > centre.evaluation.gainDbi!)) [fresh, freshFamily] = [off, "off-centre"];
    }
    const freshHoldsAsBuilt = holdsAsBuilt(fresh, request, freshFamily === "off-centre", tolerance);
    const catalogGainDbi: number | null = entry.status === "ok" ? entry.figures?.gainDbi ?? null : null;
    const freshGainDbi = fresh.status === "ok" ? fresh.evaluation.gainDbi : null;
    const base = {
      id: cell.id,
      catalogFamily,
      catalogStatus: entry.status,
      catalogGainDbi,
      freshFamily,
      freshStatus: fresh.status,
      freshGainDbi,
      freshHoldsAsBuilt,
      differenceDb: catalogGainDbi !== null && freshGainDbi !== null ? catalogGainDbi - freshGainDbi : null,
    };
    out.push({ ...base, verdict: verdictOf(base), cpuSeconds: cpuS() - c0 });
  }
  return out;
}
