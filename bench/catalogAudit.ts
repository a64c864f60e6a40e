// What the committed catalog offers a builder, counted from designs/entries alone (no solving):
// buildable cells per variant and family, direct-feed designs whose bare SWR holds as built (the 90th
// percentile of the bending-tolerance copies within the limit at every band point) and those that
// hold only after the recommended feed, entries more than AUDIT_SIBLING_DB under the same cell with
// one piece fewer per arm (the same wire can always be bent the K − 1 way), and the bands with no
// direct-feed design. `npm run -s bench -- --only audit` (a second or two).
import { readdirSync, readFileSync } from "node:fs";
import { join } from "node:path";

/** An entry this far under its K − 1 sibling is counted (dB). */
export const AUDIT_SIBLING_DB = 0.05;

interface AuditEntry {
  id: string;
  status: string;
  inputs: { bandId: string; lengthWl: number; piecesPerArm: number; variant: string; overGround?: { heightM: number; mounting: string; purpose: string } };
  figures?: { gainDbi: number };
  feed?: { feedFraction: number; toleranceSwr: { swrLimit: number; meetsLimitAsBuilt: boolean; perFrequency: { bare: { p90: number } }[] } };
}

export interface CatalogAudit {
  entries: number;
  freeSpace: { cells: number; buildable: number; directFeedCells: number; directFeedBuildable: number; offCentre: number };
  overGround: { cells: number; buildable: number };
  /** Direct-feed designs whose bare 90th-percentile SWR stays within the limit across the band. */
  directFeedBareHolds: number;
  /** Direct-feed designs that hold only after the recommended feed (a balun or a match). */
  directFeedHoldsAfterFeed: number;
  directFeedHoldsNeither: string[];
  underSibling: { id: string; gainDbi: number; siblingGainDbi: number; differenceDb: number }[];
  bandsWithoutDirectFeed: string[];
}

const cellKey = (e: AuditEntry, k: number) => {
  const g = e.inputs.overGround;
  return `${e.inputs.bandId}|${e.inputs.lengthWl}|${k}|${e.inputs.variant}|${g ? `${g.heightM}|${g.mounting}|${g.purpose}` : "free"}`;
};

export function auditCatalog(dir = "designs/entries"): CatalogAudit {
  const entries: AuditEntry[] = readdirSync(dir).filter((f) => f.endsWith(".json")).sort().map((f) => JSON.parse(readFileSync(join(dir, f), "utf8")));
  const ok = (e: AuditEntry) => e.status === "ok" && e.figures !== undefined;
  const free = entries.filter((e) => !e.inputs.overGround);
  const ground = entries.filter((e) => e.inputs.overGround);
  const direct = free.filter((e) => e.inputs.variant === "direct-feed");
  const directOk = direct.filter(ok);
  const bareHolds = (e: AuditEntry) => e.feed!.toleranceSwr.perFrequency.every((p) => p.bare.p90 <= e.feed!.toleranceSwr.swrLimit);
  const byKey = new Map(entries.map((e) => [cellKey(e, e.inputs.piecesPerArm), e]));
  const underSibling = entries.filter(ok).flatMap((e) => {
    const s = e.inputs.piecesPerArm > 1 ? byKey.get(cellKey(e, e.inputs.piecesPerArm - 1)) : undefined;
    if (!s || !ok(s)) return [];
    const differenceDb = e.figures!.gainDbi - s.figures!.gainDbi;
    return differenceDb < -AUDIT_SIBLING_DB ? [{ id: e.id, gainDbi: e.figures!.gainDbi, siblingGainDbi: s.figures!.gainDbi, differenceDb }] : [];
  }).sort((a, b) => a.differenceDb - b.differenceDb);
  const bands = [...new Set(direct.map((e) => e.inputs.bandId))];
  return {
    entries: entries.length,
    freeSpace: {
      cells: free.length,
      buildable: free.filter(ok).length,
      directFeedCells: direct.length,
      directFeedBuildable: directOk.length,
      offCentre: free.filter((e) => ok(e) && e.feed !== undefined && e.feed.feedFraction !== 0.5).length,
    },
    overGround: { cells: ground.length, buildable: ground.filter(ok).length },
    directFeedBareHolds: directOk.filter(bareHolds).length,
    directFeedHoldsAfterFeed: directOk.filter((e) => !bareHolds(e) && e.feed!.toleranceSwr.meetsLimitAsBuilt).length,
    directFeedHoldsNeither: directOk.filter((e) => !bareHolds(e) && !e.feed!.toleranceSwr.meetsLimitAsBuilt).map((e) => e.id),
    underSibling,
    bandsWithoutDirectFeed: bands.filter((b) => !directOk.some((e) => e.inputs.bandId === b)),
  };
}
