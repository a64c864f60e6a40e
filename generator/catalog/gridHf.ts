// The over-ground part of the grid file (issue 13): HF bands with their own wire lengths, support
// heights, mountings and purposes. Every problem is one line naming the file, the place and the rule
// (grid.ts prints it). Heights are the support a user has: for the horizontal mounting the height of
// the wire plane (both masts), for the vertical one the top of the one mast where the feed sits, the
// arms sloping down from it and staying at least `verticalClearanceM` above the ground.
import { z } from "zod";
import { GRID_BOUNDS as G, SHAPE_BOUNDS as S } from "../bounds.js";
import { VARIANTS } from "../design/request.js";
import { GROUND_PRESETS } from "../em/ground.js";
import { boundedNumber } from "../em/shapeFile.js";
import { MOUNTINGS } from "../shapes/mounting.js";

const MHZ = { min: S.frequencyHz.min / 1e6, max: S.frequencyHz.max / 1e6 };
const mhz = (what: string) => boundedNumber(what, MHZ, " MHz");
export const whole = (what: string, r: { min: number; max: number }) => boundedNumber(what, r).refine(Number.isInteger, `${what} must be a whole number`);
const text = (what: string) => z.string({ error: `${what} must be a string` });

export const bandSchema = z.strictObject({
  id: text("id").regex(/^[a-z0-9][a-z0-9.]*$/, "id must be lower-case letters, digits and dots").max(40, "id must be at most 40 characters"),
  name: text("name").min(1, "name must not be empty").max(200, "name must be at most 200 characters"),
  lowMhz: mhz("lowMhz"),
  highMhz: mhz("highMhz"),
  designMhz: mhz("designMhz"),
  wireDiameterMm: boundedNumber("wireDiameterMm", G.wireDiameterMm, " mm"),
  conductor: z.enum(["perfect", "copper", "aluminium"], { error: "conductor must be perfect, copper or aluminium" }),
  note: text("note").max(2000, "note must be at most 2000 characters"),
});

const GROUND_PRESET_NAMES = Object.keys(GROUND_PRESETS);
const metres = (what: string) => boundedNumber(what, G.heightM, " m");
const groundName = (what: string) => z.string({ error: `${what} must be a string` })
  .refine((v) => GROUND_PRESET_NAMES.includes(v), `${what} must be one of ${GROUND_PRESET_NAMES.join(", ")}`);
const purposeName = z.string({ error: "a purpose must be a string" }).regex(/^[a-z][a-z-]*$/, "a purpose must be lower-case letters and hyphens");

export const hfBandSchema = bandSchema.extend({
    minHeightM: metres("minHeightM"),
    lengthsWl: z.array(boundedNumber("a wire length", G.lengthWl, " wavelengths"), { error: "lengthsWl must be a list of wire lengths" }).min(1, "lengthsWl needs at least one length"),
    heightsM: z.array(metres("a height"), { error: "heightsM must be a list of heights in metres" }).min(1, "heightsM needs at least one height"),
    mountings: z.array(z.enum(MOUNTINGS, { error: `mounting must be one of ${MOUNTINGS.join(", ")}` }), { error: "mountings must be a list" }).min(1, "mountings needs at least one"),
    purposes: z.array(purposeName, { error: "purposes must be a list" }).min(1, "purposes needs at least one"),
});

export const overGroundSchema = z.strictObject({
    ground: groundName("ground"),
    otherGrounds: z.array(groundName("an other ground"), { error: "otherGrounds must be a list of ground names" }),
    verticalClearanceM: metres("verticalClearanceM"),
    /** The height curve: these offsets from the cell's height, besides the band's other heights. */
    heightOffsetsM: z.array(boundedNumber("a height offset", { min: -G.heightM.max, max: G.heightM.max }, " m"), { error: "heightOffsetsM must be a list" }),
    piecesPerArm: z.array(whole("pieces per arm", G.piecesPerArm)).min(1, "piecesPerArm needs at least one value"),
    variants: z.array(z.enum(VARIANTS, { error: `variants must be ${VARIANTS.join(" or ")}` })).min(1, "variants needs at least one"),
    /** Elevation window per purpose, degrees above the horizon. */
    purposes: z.record(purposeName, z.tuple([boundedNumber("an elevation", { min: 0, max: 90 }, "°"), boundedNumber("an elevation", { min: 0, max: 90 }, "°")], { error: "a purpose's window must be [low, high] in degrees" })),
    bands: z.array(hfBandSchema, { error: "bands must be a list of bands" }).min(1, "bands needs at least one band").max(G.bandsMax, `bands holds at most ${G.bandsMax} bands`),
});

type Issue = { code: "custom"; path: (string | number)[]; message: string };

/** The rules across fields of the over-ground part; paths start at `overGround`. */
export function overGroundIssues(o: {
  purposes: Record<string, [number, number]>;
  verticalClearanceM: number;
  bands: { id: string; minHeightM: number; heightsM: number[]; mountings: string[]; purposes: string[]; lengthsWl: number[] }[];
}): Issue[] {
  const issues: Issue[] = [];
  const at = (path: (string | number)[], message: string) => issues.push({ code: "custom", path: ["overGround", ...path], message });
  for (const [name, [lo, hi]] of Object.entries(o.purposes)) {
    if (!(lo < hi)) at(["purposes", name], `the elevation window must have low below high (got ${lo}–${hi}°)`);
  }
  const seen = new Set<string>();
  o.bands.forEach((b, i) => {
    if (seen.has(b.id)) at(["bands", i, "id"], `duplicate band id "${b.id}"`);
    seen.add(b.id);
    b.heightsM.forEach((h, j) => {
      if (h < b.minHeightM) at(["bands", i, "heightsM", j], `height ${h} m is below the band's minimum height ${b.minHeightM} m (minHeightM)`);
    });
    if (b.mountings.includes("vertical") && b.heightsM.some((h) => h <= o.verticalClearanceM)) {
      at(["bands", i, "heightsM"], `a vertical mounting needs heights above the clearance verticalClearanceM = ${o.verticalClearanceM} m`);
    }
    b.purposes.forEach((p, j) => {
      if (!(p in o.purposes)) at(["bands", i, "purposes", j], `purpose "${p}" has no elevation window (add it under overGround.purposes)`);
    });
    for (const key of ["lengthsWl", "heightsM", "mountings", "purposes"] as const) {
      if (new Set<unknown>(b[key]).size !== b[key].length) at(["bands", i, key], `${key} repeats a value`);
    }
  });
  return issues;
}

export type HfBand = z.output<typeof hfBandSchema>;
export type OverGroundGrid = z.output<typeof overGroundSchema>;

/** One over-ground cell: a free-space cell's fields plus the support, ground and purpose. */
export interface GroundCellRequest {
  id: string;
  band: HfBand;
  lengthWl: number;
  piecesPerArm: number;
  variant: (typeof VARIANTS)[number];
  groundName: string;
  heightM: number;
  mounting: (typeof MOUNTINGS)[number];
  purpose: string;
  elevationWindowDeg: [number, number];
}

export const groundEntryId = (c: Omit<GroundCellRequest, "id" | "band" | "groundName" | "elevationWindowDeg"> & { band: { id: string } }): string =>
  `${c.band.id}-${c.lengthWl}wl-k${c.piecesPerArm}-${c.variant}-h${c.heightM}m-${c.mounting}-${c.purpose}`;

/** Every over-ground cell, sorted by id (none without an `overGround` part). */
export function expandOverGround(o: OverGroundGrid | undefined): GroundCellRequest[] {
  if (!o) return [];
  const out: GroundCellRequest[] = [];
  for (const band of o.bands) {
    for (const lengthWl of band.lengthsWl) for (const piecesPerArm of o.piecesPerArm) for (const variant of o.variants) {
      for (const heightM of band.heightsM) for (const mounting of band.mountings) for (const purpose of band.purposes) {
        const c = { band, lengthWl, piecesPerArm, variant, heightM, mounting, purpose };
        out.push({ ...c, id: groundEntryId(c), groundName: o.ground, elevationWindowDeg: o.purposes[purpose] });
      }
    }
  }
  return out.sort((a, b) => (a.id < b.id ? -1 : a.id > b.id ? 1 : 0));
}

/** The heights of a cell's height curve: ±offsets and the band's other heights, above the band minimum. */
export function heightCurveHeightsM(o: OverGroundGrid, c: GroundCellRequest): number[] {
  const all = [...o.heightOffsetsM.map((d) => c.heightM + d), ...c.band.heightsM].filter((h) => h !== c.heightM && h >= c.band.minHeightM);
  const usable = c.mounting === "vertical" ? all.filter((h) => h > o.verticalClearanceM) : all;
  return [...new Set(usable)].sort((a, b) => a - b);
}
