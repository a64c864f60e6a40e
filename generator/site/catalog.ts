// The catalog as the site sees it: checked entries grouped into bands, the designs of a band in
// table order, the best few per band. Pure functions over entries; the pages only lay them out.
import { checkEntryText } from "../catalog/store.js";
import { isOk, sharedBandIds, siteBandId, siteBandName, type Entry, type OkEntry } from "./ok.js";

export { isOk, type Entry, type OkEntry };

/** Band ids and design ids become URL path pieces: only this alphabet is allowed. */
export const URL_SAFE_ID = /^[a-z0-9][a-z0-9.-]*$/;

/**
 * Checks one entry file as the site needs it: the schema and content hash (checkEntryText), a file
 * name that matches the id, and a band id that is safe in a URL. Throws one line naming the file.
 */
export function checkSiteEntry(text: string, fileName: string): Entry {
  const checked = checkEntryText(text, fileName);
  if (!checked.ok) {
    throw new Error(`site entries: ${checked.problem}; run \`npm run -s bentwire -- generate\` to recompute it`);
  }
  const entry = checked.value;
  if (`${entry.id}.json` !== fileName.replace(/^.*[\\/]/, "")) {
    throw new Error(`site entries: ${fileName}: id "${entry.id}" does not match the file name`);
  }
  if (!URL_SAFE_ID.test(entry.inputs.bandId)) {
    throw new Error(`site entries: ${fileName}: inputs.bandId must be lower-case letters, digits, dots and dashes`);
  }
  if (entry.status === "ok" && !isOk(entry)) {
    throw new Error(`site entries: ${fileName}: status is ok but a result section is missing`);
  }
  return entry;
}

export interface Band {
  id: string;
  name: string;
  note: string;
  lowHz: number;
  highHz: number;
  designHz: number;
  wireDiameterM: number;
  conductor: Entry["inputs"]["conductor"];
  entries: Entry[];
  ok: OkEntry[];
}

/** Table order inside a band: gain, best first; then id for a stable order. */
export function byGain(a: Entry, b: Entry): number {
  const ga = a.figures?.gainDbi ?? -Infinity, gb = b.figures?.gainDbi ?? -Infinity;
  return gb - ga || (a.id < b.id ? -1 : a.id > b.id ? 1 : 0);
}

/** Designs grouped by band, bands in frequency order. Band facts come from the band's first entry. */
export function bandsOf(entries: readonly Entry[]): Band[] {
  const map = new Map<string, Entry[]>();
  const shared = sharedBandIds(entries);
  for (const e of [...entries].sort((a, b) => (a.id < b.id ? -1 : a.id > b.id ? 1 : 0))) {
    const key = siteBandId(e, shared);
    const list = map.get(key) ?? [];
    list.push(e);
    map.set(key, list);
  }
  return [...map.values()]
    .map((list): Band => {
      const i = list[0].inputs;
      const sorted = [...list].sort(byGain);
      return {
        id: siteBandId(list[0], shared), name: siteBandName(list[0], shared), note: i.bandNote, lowHz: i.bandLowHz, highHz: i.bandHighHz, designHz: i.frequencyHz,
        wireDiameterM: i.wireDiameterM, conductor: i.conductor, entries: sorted, ok: sorted.filter(isOk),
      };
    })
    .sort((a, b) => a.lowHz - b.lowHz || (a.id < b.id ? -1 : 1));
}

/** The best `n` buildable designs of a band, at most one per (length, pieces) so the list varies. */
export function bestOf(band: Band, n: number): OkEntry[] {
  const seen = new Set<string>();
  const out: OkEntry[] = [];
  for (const e of band.ok) {
    const key = `${e.inputs.lengthWl}/${e.inputs.piecesPerArm}`;
    if (seen.has(key)) continue;
    seen.add(key);
    out.push(e);
    if (out.length === n) break;
  }
  return out;
}

/** Bare SWR above which a compact design's match gets impractical (common practice, rough). */
export const COMPACT_MAX_SWR = 6;

export interface Highlight {
  kind: "gain" | "direct" | "compact" | "simple";
  label: string;
  entry: OkEntry;
}

/**
 * The band at a glance: the design with the most gain, the one with the most gain that needs no
 * matching network, a compact one (the most gain with its larger side within half a wavelength
 * and a bare SWR a simple match handles) or else the best of the fewest pieces per arm (the easiest
 * to bend). A design picked once is not picked again; three at most.
 */
export function highlights(band: Band): Highlight[] {
  const out: Highlight[] = [];
  const taken = (e: OkEntry) => out.some((h) => h.entry.id === e.id);
  const first = (list: OkEntry[]) => list.find((e) => !taken(e));
  const push = (kind: Highlight["kind"], label: string, e: OkEntry | undefined) => { if (e) out.push({ kind, label, entry: e }); };
  push("gain", "most gain", first(band.ok));
  push("direct", "direct 50 Ω feed", first(band.ok.filter((e) => e.inputs.variant === "direct-feed")));
  const lambda = 299_792_458 / band.designHz;
  const size = (e: OkEntry) => Math.max(e.shape.spanM.x, e.shape.spanM.y);
  push("compact", "compact", first(band.ok.filter((e) => size(e) <= lambda / 2 && e.figures.swr <= COMPACT_MAX_SWR)));
  const fewest = Math.min(...band.ok.map((e) => e.inputs.piecesPerArm));
  push("simple", "simplest to bend", first(band.ok.filter((e) => e.inputs.piecesPerArm === fewest)));
  return out.slice(0, 3);
}

/** The buildable design with the widest SWR-below-limit span in a band, if any has one. */
export function widestMatch(band: Band): OkEntry | null {
  let best: OkEntry | null = null;
  for (const e of band.ok) {
    const w = e.sweep.swr2Span?.widthHz ?? 0;
    if (w > 0 && (best === null || w > (best.sweep.swr2Span?.widthHz ?? 0))) best = e;
  }
  return best;
}

/** Catalog totals for the home page. */
export function totals(entries: readonly Entry[]): { designs: number; buildable: number; bands: number } {
  return {
    designs: entries.length,
    buildable: entries.filter(isOk).length,
    bands: new Set(entries.map((e) => e.inputs.bandId)).size,
  };
}
