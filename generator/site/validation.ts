// The method-and-validation table: every reference check the tests assert, as the page shows it.
import type { ReferenceCheck } from "../validation/referenceChecks.js";
import * as f from "./format.js";

/** Decimals for a check's values: one digit finer than its tolerance (dBi always two). */
export function checkDecimals(c: Pick<ReferenceCheck, "unit" | "tolerance">): number {
  if (c.unit === "dBi") return 2;
  if (!(c.tolerance > 0)) return 2;
  return Math.min(6, Math.max(0, Math.ceil(-Math.log10(c.tolerance))) + 1);
}

export interface ValidationRow {
  id: string;
  quantity: string;
  source: string;
  reference: string;
  ours: string;
  deviation: string;
  tolerance: string;
  pass: boolean;
}

export function validationRows(checks: readonly ReferenceCheck[]): ValidationRow[] {
  return checks.map((c) => {
    const d = checkDecimals(c);
    const unit = c.unit === "°" || c.unit === "" ? c.unit : ` ${c.unit}`; // "" for a ratio such as |Γ|
    return {
      id: c.id,
      quantity: c.quantity,
      source: c.source,
      reference: `${f.fixed(c.reference, d)}${unit}`,
      ours: `${f.fixed(c.ours, d)}${unit}`,
      deviation: `${f.signed(c.deviation, d)}${unit}`,
      tolerance: `±${f.fixed(c.tolerance, d)}${unit}`,
      pass: c.pass,
    };
  });
}
