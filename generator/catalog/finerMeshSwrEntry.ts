// The finer-mesh SWR check (analysis/finerMeshSwr.ts) on a catalog entry: which entries are published
// as meeting the SWR limit (the as-built rule: feed.toleranceSwr.meetsLimitAsBuilt), and the check's
// inputs from the entry's own shape (over the ground: as hung, with its ground), sweep and recommended feed.
import { checkSwrOnFinerMesh, type FinerMeshSwrCheck } from "../analysis/finerMeshSwr.js";
import { parseShape } from "../em/index.js";
import { siteShapeFileText } from "../site/downloads.js";
import type { OkEntry } from "../site/ok.js";

/** Why an ok entry is not checked, or null when it is published as meeting the limit. */
export function notPublishedAsMeeting(entry: OkEntry): string | null {
  const feed = entry.feed;
  if (!feed || !entry.figures.uncertainty) return "made before the feed options (no feed or uncertainty)";
  if (!feed.toleranceSwr.meetsLimitAsBuilt) return "not published as meeting the limit";
  if (feed.options.recommended === null) return "no recommended feed";
  return null;
}

export function checkEntrySwrOnFinerMesh(entry: OkEntry): FinerMeshSwrCheck {
  const feed = entry.feed!;
  const option = feed.options.options[feed.options.recommended!];
  const inBand = entry.sweep.points.filter((p) => p.inBand);
  return checkSwrOnFinerMesh(parseShape(siteShapeFileText(entry), entry.id), {
    publishedSegmentsPerWavelength: entry.figures.uncertainty!.segmentsPerWavelength,
    bandHz: [entry.inputs.bandLowHz, entry.inputs.bandHighHz],
    publishedBand: inBand.map((p, i) => ({ frequencyHz: p.frequencyHz, swr: option.bandSwr[i] ?? Infinity })),
    circuit: option.circuit,
    partQ: feed.options.partQ,
    lineImpedanceOhm: entry.inputs.lineImpedanceOhm,
    swrLimit: feed.toleranceSwr.swrLimit,
  });
}
