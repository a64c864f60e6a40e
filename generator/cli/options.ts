// Parsers for command-line values: each rejects bad input with one line naming the flag and rule.
import { InvalidArgumentError } from "commander";

export function positiveNumber(flag: string) {
  return (text: string): number => {
    const v = Number(text);
    if (text.trim() === "" || !Number.isFinite(v) || v <= 0) throw new InvalidArgumentError(`${flag} must be a positive number`);
    return v;
  };
}

export function wholeNumber(flag: string, min: number, max: number) {
  return (text: string): number => {
    const v = Number(text);
    if (!Number.isInteger(v) || v < min || v > max) throw new InvalidArgumentError(`${flag} must be a whole number from ${min} to ${max}`);
    return v;
  };
}

/** "LO:HI" in MHz → [lowHz, highHz]. */
export function bandMhz(flag: string) {
  return (text: string): [number, number] => {
    const parts = text.split(":").map(Number);
    if (parts.length !== 2 || !parts.every((v) => Number.isFinite(v) && v > 0)) {
      throw new InvalidArgumentError(`${flag} must be LO:HI in MHz, two positive numbers`);
    }
    if (!(parts[0] < parts[1])) throw new InvalidArgumentError(`${flag} must have LO below HI`);
    return [parts[0] * 1e6, parts[1] * 1e6];
  };
}

export function oneOf<T extends string>(flag: string, allowed: readonly T[]) {
  return (text: string): T => {
    if (!(allowed as readonly string[]).includes(text)) throw new InvalidArgumentError(`${flag} must be one of ${allowed.join(", ")}`);
    return text as T;
  };
}
