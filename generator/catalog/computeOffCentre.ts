// The catalog's direct-feed fallbacks (issue 10), kept apart from compute.ts:
// 1. a ladder of SWR margins (MARGIN_LADDER): the band is first searched at the limit itself, and only
//    when that design's 90th-percentile as-built SWR (analysis/feedAnalysis.ts) misses the limit is it
//    searched again at 1 + (limit − 1) × SEARCH_SWR_MARGIN (1.8 for a limit of 2), which keeps room for
//    the mesh error and hand bending; the first design that holds as built is published. Measured
//    (issue 10, item 4; /tmp script, fresh searches, one run): at the limit 2m-1.5wl-k3 6.69 dBi,
//    433mhz-1.5wl-k3 6.93, 70cm-1.5wl-k2 4.64, all three holding as built (worst 90th percentile
//    after the recommended feed 1.43, 1.23, 1.98); at 1.8 they gave 5.87, 6.65, 4.46 dBi.
//    A band with no design at the limit itself is not searched again (the margin is stricter).
//    With a margin, a shape that reaches the limit but not the margin is still polished at the limit
//    itself and left to the as-built check.
// 2. the off-centre-fed family where the centre-fed one cannot meet the limit (a centre feed on a
//    1 λ or 2 λ wire sits at a current minimum): searched once per (length, K) in wavelength units
//    like the centre-fed reference (compute.ts), then polished per band.
import { designBentArm, type DesignOutcome } from "../design/designBentArm.js";
import { designOffCentre } from "../design/designOffCentre.js";
import type { DesignRequest } from "../design/request.js";
import { addPieceOffCentre, mirrorAsOffCentre } from "../shapes/offCentre.js";
import type { ReferenceKey } from "./compute.js";

/** The direct-feed search keeps this fraction of the limit's excess over 1: SWR 2 → 1.8. */
export const SEARCH_SWR_MARGIN = 0.8;

/** Margins tried in turn for a direct-feed band: the limit itself, then SEARCH_SWR_MARGIN. */
export const MARGIN_LADDER: readonly number[] = [1, SEARCH_SWR_MARGIN];

/** 1 + (limit − 1) × margin: always above 1, so any limit the request allows has a margin. */
export const searchSwrLimit = (limit: number, margin = SEARCH_SWR_MARGIN): number => 1 + (limit - 1) * margin;

export type Family = "centre-fed" | "off-centre";

/** The request the optimizer sees: direct-feed SWR limit tightened by the margin. */
export function searchRequestOf(r: DesignRequest, margin = SEARCH_SWR_MARGIN): DesignRequest {
  return r.variant === "direct-feed" ? { ...r, swrLimit: searchSwrLimit(r.swrLimit, margin) } : r;
}

export interface OffCentreReference {
  status: DesignOutcome["status"];
  x: number[];
  gainDbi: number | null;
  evaluations: number;
}


/**
 * The off-centre searches in wavelength units for one direct-feed (length, K), both with the
 * centre-fed reference's shape (fed in the middle) as a start, so neither ends worse than that shape
 * at the same limits: `local` begins at that shape, `broad` searches the whole box from its centre
 * (designOffCentre.ts). Both become starts of every band's polish: measured on the catalog
 * (bentwire-catalog-6, local only), the local search gave 1.5 λ cells up to 1.7 dB more than the broad
 * one had, while 2 and 2.5 λ cells came up to 2.3 dB under what the broad one's shape gave them.
 * Null for max-gain keys.
 */
export function computeOffCentreReference(k: ReferenceKey, request: DesignRequest, centreX?: readonly number[]): { local: OffCentreReference; broad: OffCentreReference } | null {
  if (k.variant !== "direct-feed") return null;
  const start = centreX ? { start: mirrorAsOffCentre(centreX, k.piecesPerArm) } : {};
  const of = (o: DesignOutcome): OffCentreReference => ({ status: o.status, x: o.x, gainDbi: o.evaluation.gainDbi, evaluations: o.evaluations });
  return { local: of(designOffCentre(searchRequestOf(request), start)), broad: of(designOffCentre(searchRequestOf(request), { ...start, broad: true })) };
}

/**
 * Polishes at the margin, then at the limit itself from where that ended, when the margin was
 * missed but the shape came near the limit (within 25 %; a shape kilohms off is not retried).
 */
function withMargin(request: DesignRequest, run: (r: DesignRequest, start?: number[]) => DesignOutcome, margin: number): DesignOutcome {
  const first = run(searchRequestOf(request, margin));
  const near = first.evaluation.maxSwr !== null && first.evaluation.maxSwr <= 1.25 * request.swrLimit;
  if (first.status === "ok" || request.variant !== "direct-feed" || !near || margin >= 1) return first;
  const second = run(request, first.x);
  const shifted = second.history.map((h) => ({ ...h, evaluations: h.evaluations + first.evaluations }));
  return { ...second, evaluations: first.evaluations + second.evaluations, searchEvaluations: first.searchEvaluations, history: [...first.history, ...shifted] };
}

/**
 * A centre-fed design with the margin: a polish from `start` only, or (search) the full search,
 * from the box centre with `start` competing when one is given.
 */
export function designCentreFed(request: DesignRequest, start: number[] | undefined, search: boolean, skipPolishAboveSwr?: number, margin = SEARCH_SWR_MARGIN): DesignOutcome {
  return withMargin(request, (r, from) => {
    if (from) return designBentArm(r, { start: from });
    if (!search && start) return designBentArm(r, { start, skipPolishAboveSwr });
    return start ? designBentArm(r, { start, polishOnly: false }) : designBentArm(r);
  }, margin);
}

/** A start for the off-centre polish: a reference's x and its gain in wavelength units. */
export interface OffCentreStart {
  x: number[];
  gainDbi: number | null;
}

/**
 * The off-centre starts of one direct-feed cell: its own off-centre references and, for each
 * reference with one piece fewer per arm that found more gain than all of its own, that shape with
 * a piece added on each arm (the same wire, so a polish from it cannot end worse than the K − 1
 * shape at the same limits). Measured on the committed catalog (bentwire-catalog-5): 20 off-centre
 * direct-feed entries came 0.10–0.86 dB under their K − 1 sibling because the K reference search
 * ended in a worse optimum.
 */
export function offCentreStarts(own: readonly OffCentreReference[], previous: readonly OffCentreReference[], piecesPerArm: number): OffCentreStart[] {
  const starts: OffCentreStart[] = own.map((o) => ({ x: o.x, gainDbi: o.gainDbi }));
  const ownBest = Math.max(...own.map((o) => o.gainDbi ?? -Infinity));
  for (const p of previous) {
    if (p.gainDbi !== null && p.gainDbi > ownBest) starts.push({ x: addPieceOffCentre(p.x, piecesPerArm - 1), gainDbi: p.gainDbi });
  }
  return starts;
}

/**
 * A centre-fed design that met the limit is still compared with the off-centre family when an
 * off-centre reference found this much more gain than the band's centre-fed design (conductor loss
 * and wire thickness move a band's figure by tenths of a dB, not more): 2.5 λ K = 3 centre-fed
 * cells came 1.5–2.3 dB under their off-centre K = 2 siblings.
 */
export const OFF_CENTRE_ADVANTAGE_DB = 0.5;

/**
 * The band's local off-centre search is skipped when neither the band's centre-fed outcome nor any
 * polish of an off-centre start came within this many times the SWR limit (the 1 λ and 2 λ wires of
 * 10 m and 6 m: SWR 17–85 centre-fed): a search with σ0 = START_SIGMA0 around a shape that far off
 * does not reach the limit. A centre-fed outcome far off alone is no reason: on 1 λ wires the centre
 * feed sits at a current minimum (SWR 60 and more), yet moving the feed of that shape gave 433mhz-1wl-k4
 * 0.28 dB more than the catalog's polishes of the references.
 */
export const BAND_SEARCH_SWR_FACTOR = 2;

const within = (o: DesignOutcome, request: DesignRequest): boolean =>
  o.evaluation.maxSwr !== null && o.evaluation.maxSwr <= BAND_SEARCH_SWR_FACTOR * request.swrLimit;

/**
 * Where a direct-feed band's centre-fed outcome misses the limit (or an off-centre start promises
 * OFF_CENTRE_ADVANTAGE_DB more), polishes each off-centre start for the band and searches around the
 * band's own centre-fed outcome fed in the middle (unless everything tried so far is
 * BAND_SEARCH_SWR_FACTOR × the limit off). The best off-centre shape that meets the limit is published
 * when the centre-fed one does not, or has less gain; otherwise the centre-fed outcome stays, its
 * message saying the off-centre family found nothing either. Measured (issue 10, item 4; computeEntry
 * on the bentwire-catalog-7 references, one run): the band search lifted 2.4ghz-1.5wl-k3 from 4.15 to
 * 6.71 dBi, 33cm-1.5wl-k3 6.21 → 6.57, 433mhz-1wl-k4 5.45 → 5.73, 70cm-1.5wl-k3 6.35 → 6.52 and
 * 2m-1wl-k4 5.35 → 5.52, all holding as built, where a fresh `design --family off-centre` had beaten
 * the catalog by 0.15–0.44 dB.
 */
export function tryOffCentre(request: DesignRequest, centre: DesignOutcome, starts: OffCentreStart[], margin = SEARCH_SWR_MARGIN): { outcome: DesignOutcome; family: Family } {
  if (request.variant !== "direct-feed" || starts.length === 0) return { outcome: centre, family: "centre-fed" };
  const centreGain = centre.status === "ok" ? centre.evaluation.gainDbi! : null;
  const promising = starts.filter((s) => centreGain === null || (s.gainDbi !== null && s.gainDbi > centreGain + OFF_CENTRE_ADVANTAGE_DB));
  if (promising.length === 0) return { outcome: centre, family: "centre-fed" };
  const tried = promising.map((s) => withMargin(request, (r, from) => designOffCentre(r, { start: from ?? s.x, polishOnly: true }), margin));
  if (within(centre, request) || tried.some((o) => within(o, request))) {
    // the band's own centre-fed optimum, fed in the middle, as the start of a local off-centre search
    // (what `design --family off-centre` runs, designOffCentreFromCentreFed)
    const start = mirrorAsOffCentre(centre.x, request.piecesPerArm);
    tried.push(withMargin(request, (r, from) => designOffCentre(r, { start: from ?? start, polishOnly: from !== undefined }), margin));
  }
  const met = tried.filter((o) => o.status === "ok");
  const best = met.length === 0 ? null : met.reduce((a, b) => (b.evaluation.gainDbi! > a.evaluation.gainDbi! ? b : a));
  const failed = tried.find((o) => o.status !== "ok");
  if (best && (centreGain === null || best.evaluation.gainDbi! > centreGain)) {
    return { outcome: { ...best, message: "constraints met with the feed off centre" }, family: "off-centre" };
  }
  if (centreGain !== null) return { outcome: centre, family: "centre-fed" };
  return { outcome: { ...centre, message: `${centre.message}; an off-centre feed met no limit either (${failed!.evaluation.reasons.join("; ")})` }, family: "centre-fed" };
}

/**
 * Whether a direct-feed band gets its own search (the reference's shape competing as a start)
 * instead of a polish of the reference alone. Measured on a sample (issue 10, item 4): the polish
 * lost 1.1 dB (2m-1.5wl-k3) and 1.7 dB (433mhz-1.5wl-k3) against a fresh search with the same
 * inputs, seed and margin, and tied on 70cm-1.5wl-k2; the SWR constraint makes the reference's
 * optimum a poor start in another band, so every direct-feed band whose reference met the limit is
 * searched (about 10 CPU s a band against 2–3 s for the polish). Max-gain bands keep the polish.
 */
export const searchPerBand = (request: DesignRequest, referenceStatus: DesignOutcome["status"]): boolean =>
  request.variant === "direct-feed" && referenceStatus === "ok";

/**
 * Runs `attempt` at each margin of the ladder (direct feed; other variants once, at margin 1 — the
 * margin never touches them) and returns the first result whose design holds as built, else the last.
 */
export function firstHoldingAsBuilt<T>(request: DesignRequest, attempt: (margin: number) => T, holds: (t: T) => boolean): T {
  const ladder = request.variant === "direct-feed" ? MARGIN_LADDER : [SEARCH_SWR_MARGIN];
  let result = attempt(ladder[0]);
  for (const margin of ladder.slice(1)) {
    if (holds(result)) break;
    result = attempt(margin);
  }
  return result;
}
