// The finder: a small JSON index with one record per buildable design, and the filter over it that
// runs in the browser on every keystroke. Pure functions; the page script only wires them to the form.
import type { Band } from "./catalog.js";
import { isOk, sharedBandIds, siteBandId, type Entry } from "./ok.js";
import { paths } from "./paths.js";
import { needsNoPartsOf, realizedGainOf } from "./feedRows.js";
import { fitFrequency } from "./frequencyFit.js";
import { groundRecordOf, type GroundRecord, type Mounting, type Purpose } from "./overGround.js";

export type Variant = "max-gain" | "direct-feed";

export interface FinderRecord {
  id: string;
  band: string;
  frequencyHz: number;
  gainDbi: number;
  lengthWl: number;
  lengthM: number;
  pieces: number;
  spanXM: number;
  spanYM: number;
  /** Width of the SWR-below-limit span (Hz), 0 when there is none. */
  swr2WidthHz: number;
  variant: Variant;
  /** Realized gain after the recommended feed (dBi), null when no feed option exists (issue 10). */
  realizedGainDbi?: number | null;
  /** The recommended feed is a bought balun alone. */
  needsNoParts?: boolean;
  /** Over the ground (issue 13): height, tallest support, mounting, purpose; absent in free space. */
  ground?: GroundRecord;
  /** Base-relative page and thumbnail paths. */
  url: string;
  thumb: string;
}

export interface FinderBand {
  id: string;
  name: string;
  lowHz: number;
  highHz: number;
  /** The band's regional note, shown when a frequency falls just outside it. */
  note?: string;
}

export interface FinderIndex {
  version: 1;
  bands: FinderBand[];
  designs: FinderRecord[];
}

export function finderIndex(bands: readonly Band[], entries: readonly Entry[]): FinderIndex {
  const shared = sharedBandIds(entries);
  return {
    version: 1,
    bands: bands.map((b) => ({ id: b.id, name: b.name, lowHz: b.lowHz, highHz: b.highHz, note: b.note })),
    designs: entries.filter(isOk).map((e) => ({
      id: e.id,
      band: siteBandId(e, shared),
      frequencyHz: e.inputs.frequencyHz,
      gainDbi: e.figures.gainDbi,
      lengthWl: e.inputs.lengthWl,
      lengthM: e.inputs.lengthM,
      pieces: e.inputs.piecesPerArm,
      spanXM: e.shape.spanM.x,
      spanYM: e.shape.spanM.y,
      swr2WidthHz: e.sweep.swr2Span?.widthHz ?? 0,
      variant: e.inputs.variant,
      realizedGainDbi: realizedGainOf(e),
      needsNoParts: needsNoPartsOf(e),
      ...(groundRecordOf(e) ? { ground: groundRecordOf(e) } : {}),
      url: paths.design(e.id),
      thumb: paths.thumb(e.id),
    })),
  };
}

export const SORTS = ["gain", "span", "bandwidth", "length", "realized"] as const;
export type SortKey = (typeof SORTS)[number];

export interface FinderFilters {
  band: string | null;
  frequencyMhz: number | null;
  minGainDbi: number | null;
  maxSpanM: number | null;
  pieces: number | null;
  variant: Variant | null;
  minBandwidthKhz: number | null;
  /** Longest wire (tip to tip) in `lengthUnit`. */
  maxLength: number | null;
  lengthUnit: LengthUnit;
  sort: SortKey;
  /** true: only designs whose recommended feed needs no parts; null: all. */
  noParts?: true | null;
  /** Tallest support at hand (m): only designs over the ground whose highest wire point it reaches. */
  maxMastM?: number | null;
  mounting?: Mounting | null;
  purpose?: Purpose | null;
}

export const LENGTH_UNITS = { m: 1, ft: 0.3048 } as const;
export type LengthUnit = keyof typeof LENGTH_UNITS;

export const NO_FILTERS: FinderFilters = {
  band: null, frequencyMhz: null, minGainDbi: null, maxSpanM: null, pieces: null, variant: null, minBandwidthKhz: null, maxLength: null, lengthUnit: "m", sort: "gain", noParts: null, maxMastM: null, mounting: null, purpose: null,
};

/** Query-string names of the filters (also the form field names). */
export const PARAM = {
  band: "band", frequencyMhz: "mhz", minGainDbi: "gain", maxSpanM: "span", pieces: "pieces", variant: "variant", minBandwidthKhz: "bw", maxLength: "wire", lengthUnit: "unit", sort: "sort", noParts: "noparts", maxMastM: "mast", mounting: "mounting", purpose: "purpose",
} as const;

const num = (text: string | null | undefined): number | null => {
  if (text === null || text === undefined || text.trim() === "") return null;
  const v = Number(text.trim().replace(",", "."));
  return Number.isFinite(v) ? v : null;
};

/** Filters from form or query values; anything unreadable counts as "no filter". */
export function parseFilters(get: (name: string) => string | null | undefined): FinderFilters {
  const band = get(PARAM.band)?.trim() || null;
  const variant = get(PARAM.variant);
  const sort = get(PARAM.sort);
  const pieces = num(get(PARAM.pieces));
  const unit = get(PARAM.lengthUnit);
  const mounting = get(PARAM.mounting);
  const purpose = get(PARAM.purpose);
  return {
    band,
    frequencyMhz: num(get(PARAM.frequencyMhz)),
    minGainDbi: num(get(PARAM.minGainDbi)),
    maxSpanM: num(get(PARAM.maxSpanM)),
    pieces: pieces !== null && Number.isInteger(pieces) ? pieces : null,
    variant: variant === "max-gain" || variant === "direct-feed" ? variant : null,
    minBandwidthKhz: num(get(PARAM.minBandwidthKhz)),
    maxLength: num(get(PARAM.maxLength)),
    lengthUnit: unit === "ft" ? "ft" : "m",
    sort: (SORTS as readonly string[]).includes(sort ?? "") ? (sort as SortKey) : "gain",
    noParts: get(PARAM.noParts) === "1" ? true : null,
    maxMastM: num(get(PARAM.maxMastM)),
    mounting: mounting === "horizontal" || mounting === "vertical" ? mounting : null,
    purpose: purpose === "long-distance" || purpose === "near-vertical" ? purpose : null,
  };
}

/** The filters as query pairs, defaults left out (for a shareable URL). */
export function filterParams(fl: FinderFilters): [string, string][] {
  const out: [string, string][] = [];
  for (const key of Object.keys(PARAM) as (keyof FinderFilters)[]) {
    const v = fl[key];
    if (v === null || v === undefined || (key === "sort" && v === "gain") || (key === "lengthUnit" && (v === "m" || fl.maxLength === null))) continue;
    out.push([PARAM[key], v === true ? "1" : String(v)]);
  }
  return out;
}

const ORDER: Record<SortKey, (a: FinderRecord, b: FinderRecord) => number> = {
  gain: (a, b) => b.gainDbi - a.gainDbi,
  span: (a, b) => Math.max(a.spanXM, a.spanYM) - Math.max(b.spanXM, b.spanYM),
  bandwidth: (a, b) => b.swr2WidthHz - a.swr2WidthHz,
  length: (a, b) => a.lengthWl - b.lengthWl,
  // realized gain after the feed, best first; designs without a feed option last
  realized: (a, b) => (b.realizedGainDbi ?? -Infinity) - (a.realizedGainDbi ?? -Infinity) || 0,
};

/** Heights are shown to 0.01 m: a wire point that high above the mast top still counts as reached. */
export const MAST_SLACK_M = 0.005;

/** The designs that pass every filter, in the chosen order (ties by id). */
export function filterDesigns(index: FinderIndex, fl: FinderFilters): FinderRecord[] {
  const fit = fl.frequencyMhz === null ? null : new Set(fitFrequency(index.bands, fl.frequencyMhz * 1e6).bandIds);
  const maxLengthM = fl.maxLength === null ? null : fl.maxLength * LENGTH_UNITS[fl.lengthUnit];
  const out = index.designs.filter((d) => {
    if (fl.band !== null && d.band !== fl.band) return false;
    if (fit !== null && !fit.has(d.band)) return false;
    if (maxLengthM !== null && !(d.lengthM <= maxLengthM * (1 + 1e-12))) return false;
    if (fl.minGainDbi !== null && !(d.gainDbi >= fl.minGainDbi)) return false;
    if (fl.maxSpanM !== null && !(Math.max(d.spanXM, d.spanYM) <= fl.maxSpanM)) return false;
    if (fl.pieces !== null && d.pieces !== fl.pieces) return false;
    if (fl.variant !== null && d.variant !== fl.variant) return false;
    if (fl.minBandwidthKhz !== null && !(d.swr2WidthHz >= fl.minBandwidthKhz * 1e3)) return false;
    if (fl.noParts === true && !d.needsNoParts) return false;
    // a mast height, mounting or purpose asks for designs over the ground; free-space ones have none
    if (fl.maxMastM != null && !(d.ground && d.ground.supportHeightM <= fl.maxMastM + MAST_SLACK_M)) return false;
    if (fl.mounting != null && d.ground?.mounting !== fl.mounting) return false;
    if (fl.purpose != null && d.ground?.purpose !== fl.purpose) return false;
    return true;
  });
  const order = ORDER[fl.sort];
  return out.sort((a, b) => order(a, b) || (a.id < b.id ? -1 : a.id > b.id ? 1 : 0));
}
