// The feed part of a design page as plain data (issue 10): the recommended feed and its SWR across
// the band bare and after it, the alternatives with what to buy, loss and realized gain; both arms
// of an off-centre-fed shape; and, for a cell with no buildable option, why in plain words and the
// nearest buildable design. Pages only lay these out. No run-time imports beyond formatting.
import type { Entry, OkEntry } from "./ok.js";
import { isOk } from "./ok.js";
import * as f from "./format.js";

type Feed = NonNullable<Entry["feed"]>;
type Option = Feed["options"]["options"][number];

export interface FeedOptionRow {
  build: string;
  worstSwr: string;
  lossDb: string;
  realizedGain: string;
  needsNoParts: boolean;
  meetsLimit: boolean;
  holdsAsBuilt: string;
}

export interface SwrPoint {
  frequency: string;
  bare: string;
  afterFeed: string;
}

export interface FeedLead {
  verdict: string;
  recommended: FeedOptionRow | null;
  /** SWR across the band, bare and after the recommended feed (the sweep's in-band points). */
  swr: SwrPoint[];
  alternatives: FeedOptionRow[];
  rejected: string[];
  asBuilt: string;
  buildNote: string;
  offCentre: string | null;
}

const dbLoss = (v: number | null) => (v === null ? "–" : `${f.fixed(v, 2)} dB`);

export function optionRow(o: Option): FeedOptionRow {
  return {
    build: o.build,
    worstSwr: f.swr(o.worstSwr),
    lossDb: dbLoss(o.lossDb),
    realizedGain: o.realizedGainDbi === null ? "–" : f.gainDbi(o.realizedGainDbi),
    needsNoParts: o.needsNoParts,
    meetsLimit: o.meetsLimit,
    holdsAsBuilt: o.holdsAsBuilt === undefined ? "not checked" : o.holdsAsBuilt ? "yes" : "no",
  };
}

/** Where an off-centre feed sits, in words; null for a centre feed. */
export function offCentreWords(e: OkEntry): string | null {
  const oc = e.shape.offCentre;
  if (e.family !== "off-centre" || !oc) return null;
  return `The feed is off centre: ${f.metres(oc.feedFromTipM)} (${f.millimetres(oc.feedFromTipM)}, ${f.inches(oc.feedFromTipM)}) from the left tip, ${f.percent(oc.feedFraction)} of the wire; the right arm is ${f.metres(oc.right.lengthM)}.`;
}

export function feedLead(e: OkEntry): FeedLead | null {
  const feed = e.feed;
  if (!feed) return null;
  const opts = feed.options;
  const rec = opts.recommended === null ? null : opts.options[opts.recommended];
  const inBand = e.sweep.points.filter((p) => p.inBand);
  const swr = inBand.map((p, i) => ({
    frequency: f.mhz(p.frequencyHz),
    bare: f.swr(p.swr),
    afterFeed: rec ? f.swr(rec.bandSwr[i] ?? null) : "–",
  }));
  const p90 = Math.max(...feed.toleranceSwr.perFrequency.map((q) => (q.afterFeed ?? q.bare).p90 ?? Infinity));
  const asBuilt = feed.toleranceSwr.meetsLimitAsBuilt
    ? `9 in 10 hand-bent copies (${feed.toleranceSwr.samples} simulated) keep SWR ≤ ${f.trimZeros(f.fixed(feed.toleranceSwr.swrLimit, 2))} across the band${rec ? " with this feed" : ""} (worst 90th percentile ${f.swr(p90)}).`
    : `Hand-bent copies may miss SWR ${f.trimZeros(f.fixed(feed.toleranceSwr.swrLimit, 2))}: the 90th percentile of ${feed.toleranceSwr.samples} simulated copies reaches ${Number.isFinite(p90) ? f.swr(p90) : "no finite value"}. Bend carefully and check the SWR after building.`;
  return {
    verdict: opts.verdict,
    recommended: rec ? optionRow(rec) : null,
    swr,
    alternatives: opts.options.filter((_, i) => i !== opts.recommended).map(optionRow),
    rejected: opts.rejected,
    asBuilt,
    buildNote: feed.buildNote,
    offCentre: offCentreWords(e),
  };
}

export interface ArmRow {
  piece: number;
  lengthMm: string;
  lengthIn: string;
  bend: string;
}

export interface ArmTable {
  name: string;
  length: string;
  rows: ArmRow[];
}

/** Both arms of an off-centre-fed shape, each from the feed outward; null for mirror-image arms. */
export function armTables(e: OkEntry): ArmTable[] | null {
  const oc = e.shape.offCentre;
  if (e.family !== "off-centre" || !oc) return null;
  const arm = (name: string, a: typeof oc.left): ArmTable => ({
    name,
    length: `${f.metres(a.lengthM)} (${f.inches(a.lengthM)})`,
    rows: a.pieceLengthsM.map((len, i) => ({
      piece: i + 1,
      lengthMm: f.millimetresNumber(len),
      lengthIn: f.inchesNumber(len),
      bend: i < a.bendAnglesDeg.length ? f.degrees(a.bendAnglesDeg[i]) : "tip",
    })),
  });
  return [arm("Left (short) arm", oc.left), arm("Right (long) arm", oc.right)];
}

// ---------------------------------------------------------------- ranking keys for tables and the finder

/** Realized gain after the recommended feed (dBi), or null when the entry has no feed option. */
export const realizedGainOf = (e: Entry): number | null => (isOk(e) && e.feed ? e.feed.realizedGainDbi : null);
/** True when the recommended feed is a bought balun alone. */
export const needsNoPartsOf = (e: Entry): boolean => isOk(e) && e.feed !== null && e.feed !== undefined && e.feed.needsNoParts && e.feed.options.recommended !== null;

// ---------------------------------------------------------------- cells with no option

/** Why a cell has no buildable design, in plain words rooted in the physics. */
export function noOptionReason(e: Entry): string {
  const i = e.inputs;
  const halfWaves = i.lengthWl * 2;
  if (i.variant === "direct-feed" && Math.abs(halfWaves - Math.round(halfWaves)) < 1e-9 && Math.round(halfWaves) % 2 === 0) {
    return `A ${f.wavelengths(i.lengthWl)} wire fed in the middle is fed at a current minimum: its feed resistance is kilohms, far from ${f.fixed(i.lineImpedanceOhm, 0)} Ω, and no bending of mirror-image arms moves it. An off-centre feed was tried too and met no SWR ${f.trimZeros(f.fixed(i.swrLimit, 2))} across this band. Use a tuner at the feed point, or a design from the list below.`;
  }
  if (i.variant === "direct-feed") {
    return `No shape of this length kept the SWR at or below ${f.trimZeros(f.fixed(i.swrLimit, 2))} across the whole ${f.bandEdges(i.bandLowHz, i.bandHighHz)}: a bent wire's feed impedance changes too fast with frequency for a band this wide. Use a matching network or a tuner, or a design from the list below.`;
  }
  return `The optimizer found no shape of this length and number of pieces that meets the building rules (minimum piece length, bend angles, clearance between pieces). Try fewer pieces per arm, or a design from the list below.`;
}

/** The nearest buildable design to a cell: same band, same variant if possible, closest length then pieces. */
export function nearestBuildable(e: Entry, all: readonly Entry[]): OkEntry | null {
  const i = e.inputs;
  const candidates = all.filter((o): o is OkEntry => isOk(o) && o.id !== e.id && o.inputs.bandId === i.bandId && (o.inputs.overGround === undefined) === (i.overGround === undefined));
  const cost = (o: OkEntry) =>
    (o.inputs.variant === i.variant ? 0 : 100) + 10 * Math.abs(o.inputs.lengthWl - i.lengthWl) + Math.abs(o.inputs.piecesPerArm - i.piecesPerArm);
  return candidates.reduce<OkEntry | null>((best, o) => (best === null || cost(o) < cost(best) || (cost(o) === cost(best) && o.id < best.id) ? o : best), null);
}

/**
 * The pieces the "scale to my frequency" calculator lists: one arm's for mirror-image arms, both
 * arms' (left then right, each from the feed outward) for an off-centre-fed shape.
 */
export function scalePieces(e: OkEntry): { pieceLengthsM: number[]; labels: string[] } {
  const oc = e.shape.offCentre;
  if (e.family !== "off-centre" || !oc) return { pieceLengthsM: e.shape.pieceLengthsM, labels: e.shape.pieceLengthsM.map((_, k) => `Piece ${k + 1} of each arm`) };
  return {
    pieceLengthsM: [...oc.left.pieceLengthsM, ...oc.right.pieceLengthsM],
    labels: [...oc.left.pieceLengthsM.map((_, k) => `Left arm piece ${k + 1}`), ...oc.right.pieceLengthsM.map((_, k) => `Right arm piece ${k + 1}`)],
  };
}
