// The shape file: our own JSON description of wires to solve. Validated with zod; every problem
// becomes one line naming the field and the rule (see InputError).
import { z } from "zod";
import { InputError } from "../errors.js";
import { groundSchema } from "./ground.js";
import { checkGroundShape, isGroundedFeed } from "./groundShape.js";

const finite = (what: string) =>
  z.number({ error: `${what} must be a number` }).refine(Number.isFinite, `${what} must be finite`);
const positive = (what: string) => finite(what).refine((v) => v > 0, `${what} must be positive`);

const point = z.tuple([finite("coordinate"), finite("coordinate"), finite("coordinate")], {
  error: "a point must be [x, y, z] in metres",
});

export const conductorSchema = z.union(
  [
    z.enum(["perfect", "copper", "aluminium"]),
    z.strictObject({ conductivitySPerM: positive("conductivitySPerM") }),
  ],
  { error: 'conductor must be "perfect", "copper", "aluminium" or {"conductivitySPerM": number}' },
);

export const shapeSchema = z.strictObject({
  name: z.string().max(200).optional(),
  frequencyHz: positive("frequencyHz"),
  wireRadiusM: positive("wireRadiusM"),
  conductor: conductorSchema.default("perfect"),
  segmentsPerWavelength: positive("segmentsPerWavelength")
    .refine((v) => v >= 5 && v <= 400, "segmentsPerWavelength must lie between 5 and 400")
    .optional(),
  wires: z
    .array(
      z.strictObject({
        pointsM: z.array(point).min(2, "a wire needs at least 2 points"),
        radiusM: positive("radiusM").optional(),
      }),
    )
    .min(1, "at least one wire is needed"),
  feed: z.strictObject({
    wire: z.number().int("feed.wire must be a whole number").nonnegative(),
    vertex: z.number().int("feed.vertex must be a whole number").nonnegative(),
  }),
  /** Absent: free space. Else the plane z = 0, perfect or real (em/ground.ts). */
  ground: groundSchema.optional(),
});

export type ShapeFile = z.input<typeof shapeSchema>;
export type Shape = z.output<typeof shapeSchema>;
export type Conductor = Shape["conductor"];
export type Vec3 = [number, number, number];

/** Joins a zod path the way a person reads it: wires[0].pointsM[2]. */
export function fieldPath(path: readonly PropertyKey[]): string {
  let out = "";
  for (const key of path) {
    out += typeof key === "number" ? `[${key}]` : (out ? "." : "") + String(key);
  }
  return out || "(top level)";
}

/** One line for the first problem zod found. */
export function zodMessage(label: string, error: z.ZodError): string {
  const issue = error.issues[0];
  const where = fieldPath(issue.path);
  if (issue.code === "unrecognized_keys") {
    const keys = (issue as { keys: string[] }).keys.join(", ");
    return `${label}: ${where}: unknown field ${keys} (allowed fields are listed in DEVELOPERS.md)`;
  }
  return `${label}: ${where}: ${issue.message}`;
}

/** Parses shape JSON text; throws InputError with one line on any problem. */
export function parseShape(text: string, label = "shape"): Shape {
  let raw: unknown;
  try {
    raw = JSON.parse(text);
  } catch (err) {
    const why = err instanceof Error ? err.message.split("\n")[0] : String(err);
    throw new InputError(`${label}: not valid JSON (${why})`);
  }
  return validateShape(raw, label);
}

export function validateShape(raw: unknown, label = "shape"): Shape {
  const result = shapeSchema.safeParse(raw);
  if (!result.success) throw new InputError(zodMessage(label, result.error));
  const shape = result.data;
  const wire = shape.wires[shape.feed.wire];
  if (!wire) {
    throw new InputError(
      `${label}: feed.wire must name one of the ${shape.wires.length} wires (0..${shape.wires.length - 1}) (got ${shape.feed.wire})`,
    );
  }
  checkGroundShape(shape, label);
  if (isGroundedFeed(shape)) return shape; // base feed at a wire end on perfect ground
  const last = wire.pointsM.length - 1;
  if (last < 2) {
    throw new InputError(
      `${label}: wires[${shape.feed.wire}].pointsM: a fed wire needs at least 3 points so the feed sits at an interior vertex (got ${last + 1})`,
    );
  }
  if (shape.feed.vertex < 1 || shape.feed.vertex >= last) {
    throw new InputError(
      `${label}: feed.vertex must be an interior vertex of wires[${shape.feed.wire}] (1..${last - 1}); a free end carries no current (got ${shape.feed.vertex})`,
    );
  }
  return shape;
}
