// The grid file (YAML): bands × wire lengths × pieces per arm × variants. Validated with zod; every
// problem is one line naming the file, the place and the rule. Expansion is deterministic: requests
// come out sorted by id.
import { parse as parseYaml, YAMLParseError } from "yaml";
import { z } from "zod";
import { fieldPath } from "../em/shapeFile.js";
import { InputError } from "../errors.js";
import { VARIANTS, type Variant } from "../design/request.js";

const positive = (what: string) => z.number({ error: `${what} must be a number` }).refine((v) => Number.isFinite(v) && v > 0, `${what} must be a positive number`);

const bandSchema = z.strictObject({
  id: z.string({ error: "id must be a string" }).regex(/^[a-z0-9][a-z0-9.]*$/, "id must be lower-case letters, digits and dots"),
  name: z.string({ error: "name must be a string" }).min(1),
  lowMhz: positive("lowMhz"),
  highMhz: positive("highMhz"),
  designMhz: positive("designMhz"),
  wireDiameterMm: positive("wireDiameterMm"),
  conductor: z.enum(["perfect", "copper", "aluminium"], { error: "conductor must be perfect, copper or aluminium" }),
  note: z.string({ error: "note must be a string" }),
});

export const gridSchema = z
  .strictObject({
    version: z.literal(1, { error: "version must be 1" }),
    seed: z.number().int("seed must be a whole number").nonnegative("seed must be 0 or more"),
    lineImpedanceOhm: positive("lineImpedanceOhm"),
    swrLimit: positive("swrLimit").refine((v) => v > 1, "swrLimit must exceed 1"),
    segmentsPerWavelength: positive("segmentsPerWavelength").refine((v) => v >= 10 && v <= 200, "segmentsPerWavelength must lie between 10 and 200"),
    tolerance: z.strictObject({
      samples: z.number().int("samples must be a whole number").positive("samples must be above 0"),
      bendSigmaDeg: z.number().nonnegative("bendSigmaDeg must be 0 or more"),
      lengthSigmaPercent: z.number().nonnegative("lengthSigmaPercent must be 0 or more"),
    }),
    reference: z.strictObject({
      radiusWl: positive("radiusWl"),
      relativeBandwidth: positive("relativeBandwidth").refine((v) => v < 0.5, "relativeBandwidth must be below 0.5"),
    }),
    lengthsWl: z.array(positive("a wire length").refine((v) => v >= 0.2 && v <= 6, "wire lengths must lie between 0.2 and 6 wavelengths")).min(1, "lengthsWl needs at least one length"),
    piecesPerArm: z.array(z.number().int("pieces per arm must be whole numbers").min(1, "pieces per arm start at 1").max(8, "pieces per arm stop at 8")).min(1),
    variants: z.array(z.enum(VARIANTS, { error: `variants must be ${VARIANTS.join(" or ")}` })).min(1),
    bands: z.array(bandSchema).min(1, "bands needs at least one band"),
  })
  .superRefine((g, ctx) => {
    const seen = new Set<string>();
    g.bands.forEach((b, i) => {
      if (seen.has(b.id)) ctx.addIssue({ code: "custom", path: ["bands", i, "id"], message: `duplicate band id "${b.id}"` });
      seen.add(b.id);
      if (!(b.lowMhz < b.highMhz)) {
        ctx.addIssue({ code: "custom", path: ["bands", i, "lowMhz"], message: `lowMhz must be below highMhz (got ${b.lowMhz} ≥ ${b.highMhz})` });
      } else if (b.designMhz < b.lowMhz || b.designMhz > b.highMhz) {
        ctx.addIssue({ code: "custom", path: ["bands", i, "designMhz"], message: `designMhz must lie inside the band ${b.lowMhz}–${b.highMhz} (got ${b.designMhz})` });
      }
    });
    for (const [key, list] of [["lengthsWl", g.lengthsWl], ["piecesPerArm", g.piecesPerArm], ["variants", g.variants]] as const) {
      if (new Set(list as readonly unknown[]).size !== list.length) ctx.addIssue({ code: "custom", path: [key], message: `${key} repeats a value` });
    }
  });

export type Grid = z.output<typeof gridSchema>;
export type Band = Grid["bands"][number];

export function parseGrid(text: string, label: string): Grid {
  let raw: unknown;
  try {
    raw = parseYaml(text);
  } catch (err) {
    if (err instanceof YAMLParseError) {
      const pos = err.linePos?.[0];
      throw new InputError(`${label}${pos ? `:${pos.line}:${pos.col}` : ""}: YAML syntax error: ${err.message.split("\n")[0]}`);
    }
    throw new InputError(`${label}: cannot be read as YAML`);
  }
  const result = gridSchema.safeParse(raw);
  if (!result.success) {
    const issue = result.error.issues[0];
    const where = fieldPath(issue.path);
    if (issue.code === "unrecognized_keys") throw new InputError(`${label}: ${where}: unknown field ${(issue as { keys: string[] }).keys.join(", ")}`);
    throw new InputError(`${label}: ${where}: ${issue.message}`);
  }
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
