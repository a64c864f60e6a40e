// The method-and-validation table: every reference check the tests assert, as the page shows it.
import type { ReferenceCheck } from "../validation/referenceChecks.js";
import * as f from "./format.js";

/** Decimals for a check's values: enough to show the deviation against its tolerance. */
export function checkDecimals(c: Pick<ReferenceCheck, "unit" | "reference" | "tolerance">): number {
  const scale = Math.min(Math.abs(c.reference) || 1, c.tolerance || 1);
  if (c.unit === "dBi") return 2;
  return scale < 0.01 ? 5 : scale < 0.1 ? 4 : scale < 1 ? 3 : scale < 10 ? 2 : 1;
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
    const unit = c.unit === "°" ? "°" : ` ${c.unit}`;
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
