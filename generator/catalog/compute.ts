// Computes catalog designs. A free-space shape scales with wavelength, so each (length, pieces,
// variant) is searched once in wavelength units (λ = 1 m, reference radius, perfect conductor,
// reference relative bandwidth) and every band only polishes that shape with its own wire, conductor
// and band (Nelder–Mead). If the polished shape misses a constraint that the reference met (a
// direct-feed band wider than the reference one, say), that band gets a full search of its own, and so
// does a most-gain band whose polish ends over POLISH_SHORTFALL_DB under the reference's gain; if
// the reference met none either (a centre-fed 1 λ or 2 λ wire sits at a current minimum, kilohms,
// far from 50 Ω), the entry says so without a search, and when that shape's SWR in the band is also
// above DOOMED_POLISH_SWR_FACTOR × the limit it is not even polished (the entry's optimizer record
// says "startFarFromFeasible"). Pure: same inputs, same bytes.
import { analyzeDesign } from "../analysis/index.js";
import { type DesignOutcome } from "../design/designBentArm.js";
import { shapeOf } from "../design/objective.js";
import { offCentreShapeOf } from "../design/offCentreObjective.js";
import { addPiece } from "../shapes/bentArm.js";
import { parseDesignRequest, type DesignRequest } from "../design/request.js";
import { SOLVER_VERSION } from "../em/index.js";
import { SPEED_OF_LIGHT_M_PER_S } from "../units.js";
import { buildEntry, publishedShapeOf } from "./entryBuild.js";
import { infeasibleMessage } from "./infeasibleMessage.js";
import type { Entry } from "./entrySchema.js";
import { entryId, type CellRequest, type Grid } from "./grid.js";
import { canonicalJson, roundDeep, sha256 } from "./hash.js";

import { DIRECT_FEED_VERSION, GENERATOR_VERSION, POLISH_VERSION, SEARCH_VERSION } from "./versions.js";
import { computeOffCentreReference, designCentreFed, firstHoldingAsBuilt, offCentreStarts, searchPerBand, tryOffCentre, type Family, type OffCentreReference } from "./computeOffCentre.js";

export interface ReferenceKey {
  lengthWl: number;
  piecesPerArm: number;
  variant: CellRequest["variant"];
}

export interface ReferenceResult extends ReferenceKey {
  id: string;
  inputHash: string;
  status: DesignOutcome["status"];
  x: number[];
  gainDbi: number | null;
  evaluations: number;
  stopReasons: DesignOutcome["stopReasons"];
  history: DesignOutcome["history"];
  /** Direct-feed keys: the off-centre-fed search in wavelength units (computeOffCentre.ts). */
  /** Direct feed: the off-centre search from the centre-fed shape, and the one across the whole box. */
  offCentre?: OffCentreReference;
  offCentreBroad?: OffCentreReference;
}

export const referenceId = (k: ReferenceKey): string => entryId("ref", k.lengthWl, k.piecesPerArm, k.variant);

export function referenceRequest(grid: Grid, k: ReferenceKey): DesignRequest {
  const f = SPEED_OF_LIGHT_M_PER_S; // λ = 1 m
  const half = grid.reference.relativeBandwidth / 2;
  return parseDesignRequest({
    frequencyHz: f,
    lengthWl: k.lengthWl,
    piecesPerArm: k.piecesPerArm,
    wireDiameterM: 2 * grid.reference.radiusWl,
    conductor: "perfect",
    variant: k.variant,
    bandHz: [f * (1 - half), f * (1 + half)],
    lineImpedanceOhm: grid.lineImpedanceOhm,
    swrLimit: grid.swrLimit,
    seed: grid.seed,
    segmentsPerWavelength: grid.segmentsPerWavelength,
  });
}

/** The reference one piece shorter per arm, which seeds this one's search (none for K = 1). */
export const previousKey = (k: ReferenceKey): ReferenceKey | null => (k.piecesPerArm > 1 ? { ...k, piecesPerArm: k.piecesPerArm - 1 } : null);

export function referenceHash(grid: Grid, k: ReferenceKey): string {
  const prev = previousKey(k);
  return sha256(canonicalJson({
    request: referenceRequest(grid, k),
    previous: prev ? referenceHash(grid, prev) : null,
    versions: { solver: SOLVER_VERSION, generator: SEARCH_VERSION },
  }));
}

/** Searches in wavelength units, starting from the K − 1 result with its last piece split. */
export function computeReference(grid: Grid, k: ReferenceKey, previous: ReferenceResult | null): ReferenceResult {
  const request = referenceRequest(grid, k);
  const outcome = designCentreFed(request, previous ? addPiece(previous.x, previous.piecesPerArm) : undefined, true);
  const offCentre = computeOffCentreReference(k, request, outcome.x);
  return roundDeep({
    ...k,
    id: referenceId(k),
    inputHash: referenceHash(grid, k),
    status: outcome.status,
    x: outcome.x,
    gainDbi: outcome.evaluation.gainDbi,
    evaluations: outcome.evaluations,
    stopReasons: outcome.stopReasons,
    history: outcome.history,
    ...(offCentre ? { offCentre: offCentre.local, offCentreBroad: offCentre.broad } : {}),
  }, 15); // the start point of every band's polish: keep it exact
}

export function bandRequest(grid: Grid, cell: CellRequest): DesignRequest {
  return parseDesignRequest({
    frequencyHz: cell.band.designMhz * 1e6,
    lengthWl: cell.lengthWl,
    piecesPerArm: cell.piecesPerArm,
    wireDiameterM: cell.band.wireDiameterMm / 1000,
    conductor: cell.band.conductor,
    variant: cell.variant,
    bandHz: [cell.band.lowMhz * 1e6, cell.band.highMhz * 1e6],
    lineImpedanceOhm: grid.lineImpedanceOhm,
    swrLimit: grid.swrLimit,
    seed: grid.seed,
    segmentsPerWavelength: grid.segmentsPerWavelength,
  });
}

/** The hash of everything an entry depends on: its request, tolerance settings, reference, versions. */
export function entryInputHash(grid: Grid, cell: CellRequest): string {
  return sha256(canonicalJson({
    request: bandRequest(grid, cell),
    band: cell.band,
    tolerance: grid.tolerance,
    reference: referenceHash(grid, cell),
    versions: { solver: SOLVER_VERSION, generator: GENERATOR_VERSION, polish: POLISH_VERSION, ...(cell.variant === "direct-feed" ? { directFeed: DIRECT_FEED_VERSION } : {}) },
  }));
}

/**
 * A most-gain polish that ends more than this under the reference's own gain (lossless, reference
 * wire, in wavelength units) gets a search of its band. Conductor loss and a thicker wire cost
 * tenths of a dB on the catalog's bands; more than 1 dB is a polish stuck in a worse optimum
 * (2.4ghz-1wl-k4-max-gain ended 2.10 dB under its reference and 1.76 dB under its K = 3 sibling).
 */
export const POLISH_SHORTFALL_DB = 1;

const polishFellShort = (o: DesignOutcome, reference: ReferenceResult): boolean =>
  o.evaluation.gainDbi !== null && reference.gainDbi !== null && o.evaluation.gainDbi < reference.gainDbi - POLISH_SHORTFALL_DB;

/** A reference that met no constraint is not polished when its band SWR exceeds this × the limit. */
export const DOOMED_POLISH_SWR_FACTOR = 2;

/** `previous`: the reference with one piece fewer per arm (none for K = 1), an off-centre start. */
export function computeEntry(grid: Grid, cell: CellRequest, reference: ReferenceResult, previous: ReferenceResult | null): Entry {
  const request = bandRequest(grid, cell);
  const tolerance = { samples: grid.tolerance.samples, bendSigmaDeg: grid.tolerance.bendSigmaDeg, lengthSigmaFraction: grid.tolerance.lengthSigmaPercent / 100, seed: grid.seed };
  // direct feed: the limit itself first, a margin only when that design does not hold as built (computeOffCentre.ts)
  const { outcome, startedFrom, family, analysis } = firstHoldingAsBuilt(request, (margin) => {
    const d = designCell(grid, request, reference, previous, margin);
    const analysis = d.outcome.status === "ok"
      ? analyzeDesign(shapeFor(d.outcome, request, d.family), { bandHz: request.bandHz!, lineImpedanceOhm: request.lineImpedanceOhm, tolerance })
      : null;
    return { ...d, analysis };
    // no design at the limit itself: a stricter margin cannot find one, so the ladder stops there too
  }, (r) => r.analysis === null || r.analysis.feed?.toleranceSwr.meetsLimitAsBuilt === true);
  return buildEntry({ grid, cell, request, outcome, startedFrom, analysis, inputHash: entryInputHash(grid, cell), tolerance, family });
}

function designCell(grid: Grid, request: DesignRequest, reference: ReferenceResult, previous: ReferenceResult | null, margin: number) {
  // polish the reference shape (or, when the reference met no constraint, its least-bad attempt,
  // unless that attempt is too far from the SWR limit for a local polish to reach it)
  const perBand = searchPerBand(request, reference.status); // direct feed: a polish alone loses (computeOffCentre.ts)
  const skipPolishAboveSwr = reference.status === "ok" ? undefined : DOOMED_POLISH_SWR_FACTOR * request.swrLimit;
  let outcome = designCentreFed(request, reference.x, perBand, skipPolishAboveSwr, margin);
  let startedFrom: "reference" | "search" = perBand ? "search" : "reference";
  if (!perBand && outcome.status !== "ok" && reference.status === "ok") {
    // the band asks more than the reference did (a wider band, a thicker wire): search it afresh
    outcome = designCentreFed(request, reference.x, true, undefined, margin);
    startedFrom = "search";
  }
  if (request.variant === "max-gain" && outcome.status === "ok" && polishFellShort(outcome, reference)) {
    // the polish ended far under the reference's gain (a thicker wire or a loss that moves the
    // optimum): a search of the band's own, the reference shape competing as a start
    const fresh = designCentreFed(request, reference.x, true, undefined, margin);
    if (fresh.status === "ok" && fresh.evaluation.gainDbi! > outcome.evaluation.gainDbi!) {
      outcome = { ...fresh, evaluations: outcome.evaluations + fresh.evaluations };
      startedFrom = "search";
    }
  }
  if (outcome.status !== "ok") {
    outcome = { ...outcome, message: infeasibleMessage(outcome, request, reference.status !== "ok", grid.reference.relativeBandwidth) };
  }
  let family: Family;
  ({ outcome, family } = tryOffCentre(request, outcome, offCentreStarts(offCentreOf(reference), previous ? offCentreOf(previous) : [], request.piecesPerArm), margin));
  return { outcome, startedFrom, family };
}

const offCentreOf = (r: ReferenceResult): OffCentreReference[] => [r.offCentre, r.offCentreBroad].filter((o): o is OffCentreReference => o !== undefined);

// analysed as published (rounded), so the entry reproduces from its own shape file
const shapeFor = (o: DesignOutcome, r: DesignRequest, family: Family) => publishedShapeOf(family === "off-centre" ? offCentreShapeOf(o.x, r) : shapeOf(o.x, r));
