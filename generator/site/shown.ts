// A number as the page shows it, tied to the entry field it came from. Pages write `field` and
// `unit` as data attributes, so a test can read any shown number back, convert it to the entry's
// SI unit and compare it with the entry within the displayed precision.
import { METRE_PER_INCH } from "../units.js";

export const SHOWN_UNITS = {
  si: 1,
  mm: 1e3,
  in: 1 / METRE_PER_INCH,
  ft: 1 / METRE_PER_INCH / 12,
  MHz: 1e-6,
  kHz: 1e-3,
  pct: 100,
  pF: 1e12,
  nH: 1e9,
} as const;
export type ShownUnit = keyof typeof SHOWN_UNITS;

export interface Shown {
  text: string;
  /** Dotted path into the entry ("figures.gainDbi", "shape.pointsM.2.0"). */
  field?: string;
  /** How the entry value was scaled for display (SI by default). */
  unit?: ShownUnit;
}

export const plain = (text: string): Shown => ({ text });
export const shown = (text: string, field: string, unit: ShownUnit = "si"): Shown => ({ text, field, unit });

/** The value at a dotted path of an object (arrays indexed by number). */
export function valueAt(root: unknown, field: string): unknown {
  let v: unknown = root;
  for (const key of field.split(".")) {
    if (v === null || typeof v !== "object") return undefined;
    v = (v as Record<string, unknown>)[key];
  }
  return v;
}

/** Attributes a page puts on the element that shows `s`. */
export function shownAttrs(s: Shown): Record<string, string> {
  return s.field ? { "data-field": s.field, "data-unit": s.unit ?? "si" } : {};
}
