// Links into the designer (<base>/custom/?…): the query keys and the query string of a form state,
// and the state a catalog design stands for (scaled to another frequency by the scale calculator).
// No schema here, so a design page that links in carries none of the designer's code.
import { at } from "../site/paths.js";

/**
 * Query keys, in the order a link writes them. The ground fields last: `ground` (empty = free space,
 * else perfect or a preset name), `heightM`, `mounting` and `objective` (empty = the command line's
 * defaults, horizontal and peak), then `clearanceM` (vertical only: `heightM` is then the mast top and
 * no wire point comes lower than the clearance, as `design --clearance-m`).
 */
export const QUERY_KEYS = ["freqMhz", "bandMhz", "lengthWl", "lengthM", "pieces", "variant", "wireDiameterMm", "conductor", "seed", "ground", "heightM", "mounting", "objective", "clearanceM"] as const;
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
  /** An entry over ground (entrySchema.ts inputs.overGround): its ground preset, support height, mounting and purpose. */
  overGround?: { groundName: string; heightM: number; mounting: string; purpose: string; verticalClearanceM?: number };
}

/**
 * The ground fields of an entry: its preset, mounting and purpose (the designer's objective of the
 * same name and window). A horizontal entry's height is its wire plane, as the designer reads it
 * (× factor, a length like any other). A vertical entry's height is its mast top with a clearance
 * (inputs.overGround.verticalClearanceM), which the designer takes as heightM and clearanceM, both
 * × factor; a vertical entry without a clearance leaves the height empty, since the designer's
 * vertical height without one is the lowest point: the visitor gives it and the form says so.
 */
function groundStateOf(o: DesignInputsOfEntry["overGround"], factor: number): Pick<FormState, "ground" | "heightM" | "mounting" | "objective" | "clearanceM"> {
  if (!o) return { ground: "", heightM: "", mounting: "", objective: "", clearanceM: "" };
  const atMastTop = o.mounting === "vertical" && o.verticalClearanceM !== undefined;
  return {
    ground: o.groundName,
    heightM: o.mounting === "horizontal" || atMastTop ? num(o.heightM * factor) : "",
    mounting: o.mounting,
    objective: o.purpose,
    clearanceM: atMastTop ? num(o.verticalClearanceM! * factor) : "",
  };
}

/**
 * The form state that redesigns an entry, every length × `factor` = f_design / f_new (the scale
 * calculator's factor; 1 for "re-optimize for my wire"): frequency and band edges ÷ factor, the wire
 * length in wavelengths unchanged, the wire diameter × factor; over ground the ground fields too.
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
    ...groundStateOf(i.overGround, factor),
  };
}
