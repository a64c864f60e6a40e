// Parsers for command-line values: each rejects bad input with one line naming the flag and rule.
// Only plain decimal numbers are read ("", " ", "0x10", "1_000", "Infinity" are refused), and every
// number has the range of ../bounds.ts.
import { InvalidArgumentError } from "commander";
import { ANALYSIS_BOUNDS, rangeText, SHAPE_BOUNDS } from "../bounds.js";

const DECIMAL = /^[+-]?(\d+\.?\d*|\.\d+)([eE][+-]?\d+)?$/;
const WHOLE = /^\d+$/;

/** A decimal number, or NaN for anything else. */
export const decimal = (text: string): number => (DECIMAL.test(text) ? Number(text) : NaN);

export function positiveNumber(flag: string) {
  return (text: string): number => {
    const v = decimal(text);
    if (!Number.isFinite(v) || v <= 0) throw new InvalidArgumentError(`${flag} must be a positive number (got ${quoted(text)})`);
    return v;
  };
}

/** A number within [min, max], both given in the flag's unit. */
export function numberIn(flag: string, min: number, max: number, unit = "") {
  return (text: string): number => {
    const v = decimal(text);
    if (min > 0 && !(v > 0)) throw new InvalidArgumentError(`${flag} must be a positive number (got ${quoted(text)})`);
    if (!Number.isFinite(v) || v < min || v > max) throw new InvalidArgumentError(`${flag} must be a number between ${rangeText({ min, max })}${unit} (got ${quoted(text)})`);
    return v;
  };
}

export function wholeNumber(flag: string, min: number, max: number) {
  return (text: string): number => {
    const v = WHOLE.test(text) ? Number(text) : NaN;
    if (!Number.isSafeInteger(v) || v < min || v > max) throw new InvalidArgumentError(`${flag} must be a whole number from ${min} to ${max} (got ${quoted(text)})`);
    return v;
  };
}

const MHZ = { min: SHAPE_BOUNDS.frequencyHz.min / 1e6, max: SHAPE_BOUNDS.frequencyHz.max / 1e6 };

/** "LO:HI" in MHz → [lowHz, highHz], both inside the frequency bound. */
export function bandMhz(flag: string) {
  return (text: string): [number, number] => {
    const parts = text.split(":").map(decimal);
    if (parts.length !== 2 || !parts.every((v) => Number.isFinite(v) && v > 0)) {
      throw new InvalidArgumentError(`${flag} must be LO:HI in MHz, two positive numbers (got ${quoted(text)})`);
    }
    if (!parts.every((v) => v >= MHZ.min && v <= MHZ.max)) throw new InvalidArgumentError(`${flag} edges must lie between ${rangeText(MHZ)} MHz`);
    if (!(parts[0] < parts[1])) throw new InvalidArgumentError(`${flag} must have LO below HI`);
    // every sweep point is a solve: a band spanning decades would mesh the wire at a frequency
    // where it is thousands of wavelengths long
    if (parts[1] > ANALYSIS_BOUNDS.bandRatioMax * parts[0]) throw new InvalidArgumentError(`${flag} HI may be at most ${ANALYSIS_BOUNDS.bandRatioMax} × LO (got ${quoted(text)})`);
    return [parts[0] * 1e6, parts[1] * 1e6];
  };
}

export function oneOf<T extends string>(flag: string, allowed: readonly T[]) {
  return (text: string): T => {
    if (!(allowed as readonly string[]).includes(text)) throw new InvalidArgumentError(`${flag} must be one of ${allowed.join(", ")} (got ${quoted(text)})`);
    return text as T;
  };
}

/** A path or other free text: must not be empty. */
export function nonEmpty(flag: string) {
  return (text: string): string => {
    if (text.trim() === "") throw new InvalidArgumentError(`${flag} must not be empty`);
    return text;
  };
}

/** The value as typed, quoted, shortened, with control characters escaped: safe in one line. */
export const quoted = (text: string): string => {
  const short = text.length > 40 ? `${text.slice(0, 37)}...` : text;
  return JSON.stringify(short);
};
