// Buildable entries: status "ok" with every result section present. No run-time imports, so the
// browser bundles can use it.
import type { Entry } from "../catalog/entrySchema.js";

export type { Entry };
export type OkEntry = Entry & {
  status: "ok";
  shape: NonNullable<Entry["shape"]>;
  figures: NonNullable<Entry["figures"]>;
  sweep: NonNullable<Entry["sweep"]>;
  match: NonNullable<Entry["match"]>;
  tolerance: NonNullable<Entry["tolerance"]>;
  pattern: NonNullable<Entry["pattern"]>;
  checks: NonNullable<Entry["checks"]>;
};

export const isOk = (e: Entry): e is OkEntry =>
  e.status === "ok" && e.shape !== null && e.figures !== null && e.sweep !== null && e.match !== null &&
  e.tolerance !== null && e.pattern !== null && e.checks !== null;
