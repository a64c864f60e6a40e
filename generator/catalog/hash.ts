// Canonical JSON, rounding and hashes for catalog entries. Canonical form: object keys sorted,
// no whitespace, numbers as JavaScript prints them (shortest round-trip), non-finite numbers as null.
// Rounding keeps entries small and stable: 7 significant digits (≈ 0.1 µm on a 1 m piece).
import { sha256Hex } from "../export/checksums.js";

export const SIGNIFICANT_DIGITS = 7;

export function roundSignificant(v: number, digits = SIGNIFICANT_DIGITS): number {
  if (!Number.isFinite(v) || v === 0) return v;
  return Number(v.toPrecision(digits));
}

/** Deep copy with every finite number rounded and every non-finite number turned to null. */
export function roundDeep<T>(value: T, digits = SIGNIFICANT_DIGITS): T {
  if (typeof value === "number") return (Number.isFinite(value) ? roundSignificant(value, digits) : null) as T;
  if (Array.isArray(value)) return value.map((v) => roundDeep(v, digits)) as T;
  if (value && typeof value === "object") {
    const out: Record<string, unknown> = {};
    for (const [k, v] of Object.entries(value)) if (v !== undefined) out[k] = roundDeep(v, digits);
    return out as T;
  }
  return value;
}

export function canonicalJson(value: unknown): string {
  if (value === null || typeof value !== "object") {
    if (typeof value === "number" && !Number.isFinite(value)) return "null";
    return JSON.stringify(value);
  }
  if (Array.isArray(value)) return `[${value.map(canonicalJson).join(",")}]`;
  const keys = Object.keys(value).filter((k) => (value as Record<string, unknown>)[k] !== undefined).sort();
  return `{${keys.map((k) => `${JSON.stringify(k)}:${canonicalJson((value as Record<string, unknown>)[k])}`).join(",")}}`;
}

/** Pure JS (no node:crypto), so entries can also be built in the browser designer. */
export const sha256 = (text: string): string => sha256Hex(text);

/** The text of a catalog file: one line of JSON (pure, so the browser designer writes the same). */
export const serialize = (value: unknown): string => `${JSON.stringify(value)}\n`;
