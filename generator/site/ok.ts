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

/**
 * The site's band of an entry. A band id the grid uses both in free space and over the ground (10 m
 * and 6 m) gives two site bands: the free-space one keeps the id, the over-ground one gets
 * "-over-ground" after it, so a band page never mixes gains in free space with gains over the ground.
 * `shared` is sharedBandIds() of the whole catalog.
 */
export function siteBandId(e: Entry, shared: ReadonlySet<string>): string {
  return e.inputs.overGround !== undefined && shared.has(e.inputs.bandId) ? `${e.inputs.bandId}-over-ground` : e.inputs.bandId;
}

/** The band's name as the site shows it (", over the ground" added where siteBandId adds its suffix). */
export function siteBandName(e: Entry, shared: ReadonlySet<string>): string {
  return e.inputs.overGround !== undefined && shared.has(e.inputs.bandId) ? `${e.inputs.bandName}, over the ground` : e.inputs.bandName;
}

/** Band ids that have entries both in free space and over the ground. */
export function sharedBandIds(entries: readonly Entry[]): Set<string> {
  const free = new Set<string>(), ground = new Set<string>();
  for (const e of entries) (e.inputs.overGround !== undefined ? ground : free).add(e.inputs.bandId);
  return new Set([...free].filter((id) => ground.has(id)));
}
