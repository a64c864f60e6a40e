// The designer form's state as it lives in the page URL (?freqMhz=…&bandMhz=LO:HI&lengthWl=…&run=1),
// and the step from its text fields to a DesignRequest. Text → number here (messages in the words of
// the command line's parsers), then requestFromInputs: the same required checks and request schema,
// so the same value fails with the same message in the page and in `bentwire design`.
import { InputError } from "../errors.js";
import type { DesignRequest } from "../design/request.js";
import { heightMOfText, requestFromInputs, type DesignInputs, type InputNames } from "../design/requestInput.js";
import { groundByName, type Ground } from "../em/ground.js";
import { QUERY_KEYS, type FormState, type QueryKey } from "./designerLinks.js";

export { queryOf, QUERY_KEYS, type FormState, type QueryKey } from "./designerLinks.js";

/** What the form shows before anyone types: the CLI's defaults where it has them. */
export const DEFAULT_STATE: FormState = {
  freqMhz: "", bandMhz: "", lengthWl: "", lengthM: "", pieces: "", variant: "max-gain", wireDiameterMm: "2", conductor: "copper", seed: "1",
  ground: "", heightM: "", mounting: "", objective: "", clearanceM: "",
};

export const QUERY_NAMES: InputNames = { freqMhz: "freqMhz", lengthWl: "lengthWl", lengthM: "lengthM", pieces: "pieces" };

/** Cap on the text of one field, so a pasted page of text never reaches a message or the URL whole. */
const MAX_FIELD_CHARS = 40;

export function stateFromQuery(search: string): FormState {
  const q = new URLSearchParams(search);
  const state = { ...DEFAULT_STATE };
  for (const k of QUERY_KEYS) {
    const v = q.get(k);
    if (v !== null) state[k] = v.trim().slice(0, MAX_FIELD_CHARS);
  }
  return state;
}

export const wantsRun = (search: string): boolean => new URLSearchParams(search).get("run") === "1";

const fail = (message: string): never => { throw new InputError(`design: ${message}`); };

function positive(key: QueryKey, text: string): number | undefined {
  if (text.trim() === "") return undefined;
  const v = Number(text);
  if (!Number.isFinite(v) || v <= 0) fail(`${key} must be a positive number`);
  return v;
}

function whole(key: QueryKey, text: string, min: number, max: number): number | undefined {
  if (text.trim() === "") return undefined;
  const v = Number(text);
  if (!Number.isInteger(v) || v < min || v > max) fail(`${key} must be a whole number from ${min} to ${max}`);
  return v;
}

function band(text: string): [number, number] | undefined {
  if (text.trim() === "") return undefined;
  const parts = text.split(":").map((p) => (p.trim() === "" ? NaN : Number(p)));
  if (parts.length !== 2 || !parts.every((v) => Number.isFinite(v) && v > 0)) fail("bandMhz must be LO:HI in MHz, two positive numbers");
  if (!(parts[0] < parts[1])) fail("bandMhz must have LO below HI");
  return [parts[0] * 1e6, parts[1] * 1e6];
}

/** Over ground: "perfect" or a preset name, by the command line's own lookup (empty: free space). */
function groundOf(text: string): Ground | undefined {
  return text.trim() === "" ? undefined : groundByName(text.trim(), "design: ground");
}

/** Request fields as the schema names them → the query key the form shows them in. */
const FIELD_KEYS: Record<string, QueryKey> = { frequencyHz: "freqMhz", piecesPerArm: "pieces", wireDiameterM: "wireDiameterMm", bandHz: "bandMhz", verticalClearanceM: "clearanceM" };

/**
 * The field a message is about, so the form can mark it: the request field a schema message starts
 * with ("design: verticalClearanceM: …"), else the query key it names first, else a request field or
 * the word "band" anywhere in it.
 */
export function fieldOfMessage(message: string): QueryKey | null {
  const keyOf = (name: string): QueryKey | undefined => ((QUERY_KEYS as readonly string[]).includes(name) ? (name as QueryKey) : FIELD_KEYS[name]);
  const path = /^design: (\w+)(?:\[\d+\])?: /.exec(message);
  const fromPath = path ? keyOf(path[1]) : undefined;
  if (fromPath) return fromPath;
  const at = (k: QueryKey) => message.search(new RegExp(`\\b${k}\\b`));
  const named = QUERY_KEYS.filter((k) => at(k) >= 0).sort((a, b) => at(a) - at(b));
  if (named.length) return named[0];
  const field = Object.keys(FIELD_KEYS).find((f) => new RegExp(`\\b${f}\\b`).test(message));
  return field ? FIELD_KEYS[field] : /\bband\b/.test(message) ? "bandMhz" : null;
}

/** The request a form state asks for; throws InputError with one line naming the field. */
export function requestFromState(state: FormState): DesignRequest {
  const inputs: DesignInputs = {
    freqMhz: positive("freqMhz", state.freqMhz),
    bandHz: band(state.bandMhz),
    lengthWl: positive("lengthWl", state.lengthWl),
    lengthM: positive("lengthM", state.lengthM),
    pieces: whole("pieces", state.pieces, 1, 8),
    wireDiameterMm: positive("wireDiameterMm", state.wireDiameterMm) ?? 2,
    conductor: state.conductor || "copper",
    variant: state.variant || "max-gain",
    seed: whole("seed", state.seed, 0, 2 ** 31 - 1) ?? 1,
    ground: groundOf(state.ground),
    heightM: state.heightM.trim() === "" ? undefined : heightMOfText(state.heightM, "design: heightM"),
    clearanceM: state.clearanceM.trim() === "" ? undefined : heightMOfText(state.clearanceM, "design: clearanceM"),
  };
  // the command line's defaults over ground (horizontal, peak); in free space only what was given, so
  // a free-space request stays the object it was before the ground fields existed
  const mounting = state.mounting.trim() || (inputs.ground ? "horizontal" : "");
  const objective = state.objective.trim() || (inputs.ground ? "peak" : "");
  if (mounting) inputs.mounting = mounting;
  if (objective) inputs.objective = objective;
  return requestFromInputs(inputs, QUERY_NAMES, "design");
}
