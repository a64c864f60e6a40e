// The non-null parts of an "ok" catalog entry, checked once; every renderer starts here.
import type { Entry } from "../catalog/entrySchema.js";

type Ok = {
  shape: NonNullable<Entry["shape"]>;
  figures: NonNullable<Entry["figures"]>;
  sweep: NonNullable<Entry["sweep"]>;
  pattern: NonNullable<Entry["pattern"]>;
};

/** Throws a clear Error for an infeasible entry or one with a missing part. */
export function okParts(entry: Entry, what: string): Ok {
  if (entry.status !== "ok") {
    throw new Error(`render ${what}: entry "${entry.id}" has status "${entry.status}"; only "ok" entries can be drawn`);
  }
  const { shape, figures, sweep, pattern } = entry;
  if (!shape || !figures || !sweep || !pattern) {
    throw new Error(`render ${what}: entry "${entry.id}" is "ok" but lacks shape, figures, sweep or pattern`);
  }
  return { shape, figures, sweep, pattern };
}

/** Frequency in MHz as a label, e.g. "145" or "433.5". */
export const mhz = (hz: number): string => String(Number((hz / 1e6).toFixed(3)));
