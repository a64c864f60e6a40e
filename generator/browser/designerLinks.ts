// Links into the designer (<base>/custom/?…): the query keys and the query string of a form state,
// and the state a catalog design stands for (scaled to another frequency by the scale calculator).
// No schema here, so a design page that links in carries none of the designer's code.
import { at } from "../site/paths.js";

/** Query keys, in the order a link writes them. Ground fields join here once the solver has ground. */
export const QUERY_KEYS = ["freqMhz", "bandMhz", "lengthWl", "lengthM", "pieces", "variant", "wireDiameterMm", "conductor", "seed"] as const;
export type QueryKey = (typeof QUERY_KEYS)[number];
export type FormState = Record<QueryKey, string>;

/** The query string of a state: empty fields left out; `run` adds run=1. */
export function queryOf(state: FormState, run = false): string {
  const q = new URLSearchParams();
  for (const k of QUERY_KEYS) if (state[k].trim() !== "") q.set(k, state[k].trim());
  if (run) q.set("run", "1");
  // a colon may stand as it is in a query (RFC 3986 §3.4): bandMhz=144:146 stays readable
  return q.toString().replace(/%3A/gi, ":");
}

export const customHref = (base: string, state: FormState): string => `${at(base, "custom/")}?${queryOf(state)}`;

/** A number for a form field: at most 7 significant digits, no trailing zeros. */
const num = (v: number): string => String(Number(v.toPrecision(7)));

export interface DesignInputsOfEntry {
  frequencyHz: number;
  bandLowHz: number;
  bandHighHz: number;
  lengthWl: number;
  piecesPerArm: number;
  variant: string;
  wireDiameterM: number;
  conductor: string;
  seed: number;
}

/**
 * The form state that redesigns an entry, every length × `factor` = f_design / f_new (the scale
 * calculator's factor; 1 for "re-optimize for my wire"): frequency and band edges ÷ factor, the wire
 * length in wavelengths unchanged, the wire diameter × factor.
 */
export function stateOfEntry(i: DesignInputsOfEntry, factor = 1): FormState {
  return {
    freqMhz: num(i.frequencyHz / factor / 1e6),
    bandMhz: `${num(i.bandLowHz / factor / 1e6)}:${num(i.bandHighHz / factor / 1e6)}`,
    lengthWl: num(i.lengthWl),
    lengthM: "",
    pieces: String(i.piecesPerArm),
    variant: i.variant,
    wireDiameterMm: num(i.wireDiameterM * factor * 1000),
    conductor: i.conductor,
    seed: String(i.seed),
  };
}
