// The grid file (YAML): bands × wire lengths × pieces per arm × variants. Validated with zod; every
// problem is one line naming the file, the place and the rule. The bounds are in ../bounds.ts (and
// README.md). Expansion is deterministic: requests come out sorted by id.
import { parseDocument } from "yaml";
import { z } from "zod";
import { ANALYSIS_BOUNDS as A, GRID_BOUNDS as G, SHAPE_BOUNDS as S } from "../bounds.js";
import { boundedNumber, zodMessage } from "../em/shapeFile.js";
import { InputError } from "../errors.js";
import { checkTextLimits } from "../textLimits.js";
import { wavelengthM } from "../units.js";
import { VARIANTS, type Variant } from "../design/request.js";
import type { Mounting } from "../shapes/mounting.js";
import { bandSchema, whole, overGroundIssues, overGroundSchema } from "./gridHf.js";

export const gridSchema = z
  .strictObject({
    version: z.literal(1, { error: "version must be 1" }),
    seed: whole("seed", A.seed),
    lineImpedanceOhm: boundedNumber("lineImpedanceOhm", A.lineImpedanceOhm, " Ω"),
    swrLimit: boundedNumber("swrLimit", G.swrLimit).refine((v) => v > 1, "swrLimit must exceed 1"),
    segmentsPerWavelength: boundedNumber("segmentsPerWavelength", G.segmentsPerWavelength),
    tolerance: z.strictObject({
      samples: whole("samples", A.toleranceSamples),
      bendSigmaDeg: boundedNumber("bendSigmaDeg", A.bendSigmaDeg, "°"),
      lengthSigmaPercent: boundedNumber("lengthSigmaPercent", A.lengthSigmaPercent, " %"),
    }, { error: "tolerance is required: {samples, bendSigmaDeg, lengthSigmaPercent}" }),
    reference: z.strictObject({
      radiusWl: boundedNumber("radiusWl", G.referenceRadiusWl, " λ"),
      relativeBandwidth: boundedNumber("relativeBandwidth", G.relativeBandwidth).refine((v) => v > 0 && v < G.relativeBandwidth.max, `relativeBandwidth must lie above 0 and below ${G.relativeBandwidth.max}`),
    }, { error: "reference is required: {radiusWl, relativeBandwidth}" }),
    lengthsWl: z.array(boundedNumber("a wire length", G.lengthWl, " wavelengths"), { error: "lengthsWl must be a list of wire lengths" })
      .min(1, "lengthsWl needs at least one length").max(G.lengthsMax, `lengthsWl holds at most ${G.lengthsMax} lengths`),
    piecesPerArm: z.array(whole("pieces per arm", G.piecesPerArm), { error: "piecesPerArm must be a list of whole numbers" }).min(1, "piecesPerArm needs at least one value"),
    variants: z.array(z.enum(VARIANTS, { error: `variants must be ${VARIANTS.join(" or ")}` }), { error: "variants must be a list" }).min(1, "variants needs at least one"),
    bands: z.array(bandSchema, { error: "bands must be a list of bands" }).min(1, "bands needs at least one band").max(G.bandsMax, `bands holds at most ${G.bandsMax} bands`),
    /** HF bands over ground (gridHf.ts); absent: the free-space grid alone. */
    overGround: overGroundSchema.optional(),
  })
  .superRefine((g, ctx) => {
    if (g.overGround) for (const issue of overGroundIssues(g.overGround)) ctx.addIssue(issue);
    [...g.bands, ...(g.overGround?.bands ?? [])].forEach((b, n) => {
      const place = n < g.bands.length ? ["bands", n] : ["overGround", "bands", n - g.bands.length];
      for (const issue of bandIssues(b)) ctx.addIssue({ ...issue, path: [...place, ...issue.path] });
    });
    const seen = new Set<string>();
    g.bands.forEach((b, i) => {
      if (seen.has(b.id)) ctx.addIssue({ code: "custom", path: ["bands", i, "id"], message: `duplicate band id "${b.id}"` });
      seen.add(b.id);
    });
    for (const [key, list] of [["lengthsWl", g.lengthsWl], ["piecesPerArm", g.piecesPerArm], ["variants", g.variants]] as const) {
      if (new Set(list as readonly unknown[]).size !== list.length) ctx.addIssue({ code: "custom", path: [key], message: `${key} repeats a value` });
    }
  });

/** The rules across one band's fields, paths relative to the band. */
function bandIssues(b: z.output<typeof bandSchema>): { code: "custom"; path: string[]; message: string }[] {
  const issue = (key: string, message: string) => [{ code: "custom" as const, path: [key], message }];
  if (!(b.lowMhz < b.highMhz)) return issue("lowMhz", `lowMhz must be below highMhz (got ${b.lowMhz} ≥ ${b.highMhz})`);
  if (b.highMhz > A.bandRatioMax * b.lowMhz) return issue("highMhz", `highMhz may be at most ${A.bandRatioMax} × lowMhz (got ${b.lowMhz}–${b.highMhz})`);
  if (b.designMhz < b.lowMhz || b.designMhz > b.highMhz) return issue("designMhz", `designMhz must lie inside the band ${b.lowMhz}–${b.highMhz} (got ${b.designMhz})`);
  if (b.wireDiameterMm / 2000 > S.radiusMaxWl * wavelengthM(b.designMhz * 1e6)) {
    return issue("wireDiameterMm", `wireDiameterMm must be at most ${2 * S.radiusMaxWl} wavelengths (${Number((2000 * S.radiusMaxWl * wavelengthM(b.designMhz * 1e6)).toPrecision(3))} mm at ${b.designMhz} MHz)`);
  }
  return [];
}

export type Grid = z.output<typeof gridSchema>;
export type Band = Grid["bands"][number];

/** Parses grid YAML text; throws InputError with one line on any problem (warnings are not printed). */
export function parseGrid(source: string, label: string): Grid {
  const body = checkTextLimits(source, label, { maxChars: G.fileBytesMax, maxDepth: G.nestingMax, syntax: "yaml", maxIndent: G.indentMax, maxKeys: G.keysMax });
  let raw: unknown;
  try {
    const doc = parseDocument(body, { prettyErrors: true, logLevel: "silent" });
    const err = doc.errors[0];
    if (err) {
      const pos = err.linePos?.[0];
      throw new InputError(`${label}${pos ? `:${pos.line}:${pos.col}` : ""}: YAML syntax error: ${err.message.split("\n")[0]}`);
    }
    raw = doc.toJS({ maxAliasCount: 100 });
  } catch (err) {
    if (err instanceof InputError) throw err;
    throw new InputError(`${label}: cannot be read as YAML (${err instanceof Error ? err.message.split("\n")[0] : String(err)})`);
  }
  const result = gridSchema.safeParse(raw);
  if (!result.success) throw new InputError(zodMessage(label, result.error).replace(" (allowed fields are listed in README.md)", " (the fields are those of designs/grid.yaml)"));
  return result.data;
}


export interface CellRequest {
  id: string;
  band: Band;
  lengthWl: number;
  piecesPerArm: number;
  variant: Variant;
}

export const entryId = (bandId: string, lengthWl: number, k: number, variant: string): string => `${bandId}-${lengthWl}wl-k${k}-${variant}`;

export function expandGrid(grid: Grid): CellRequest[] {
  const out: CellRequest[] = [];
  for (const band of grid.bands) {
    for (const lengthWl of grid.lengthsWl) {
      for (const k of grid.piecesPerArm) {
        for (const variant of grid.variants) out.push({ id: entryId(band.id, lengthWl, k, variant), band, lengthWl, piecesPerArm: k, variant });
      }
    }
  }
  return out.sort((a, b) => (a.id < b.id ? -1 : a.id > b.id ? 1 : 0));
}

/** Shard i of n (1-based): every n-th request of the sorted list, starting at the i-th. */
export function shardOf<T>(items: readonly T[], shard: { index: number; count: number }): T[] {
  return items.filter((_, j) => j % shard.count === shard.index - 1);
}
