// The shape file: our own JSON description of wires to solve. Validated with zod; every problem
// becomes one line naming the field and the rule (see InputError). The bounds are in ../bounds.ts
// (and README.md); a shape whose mesh would be too large is refused here, before any allocation.
// To add a field, add it to shapeSchema below (optional fields keep old files valid).
import { z } from "zod";
import { groundSchema } from "./ground.js";
import { checkGroundShape, isGroundedFeed } from "./groundShape.js";
import { boundText, rangeText, SHAPE_BOUNDS as B } from "../bounds.js";
import { InputError, shown } from "../errors.js";
import { wavelengthM } from "../units.js";
import { DEFAULT_SEGMENTS_PER_WAVELENGTH, MIN_SEGMENTS_PER_PIECE } from "./mesh.js";
import { checkTextLimits } from "../textLimits.js";

/** A number field: "x is required" when absent, "must be a number" for other types, then the range. */
export const boundedNumber = (what: string, r: { min: number; max: number }, unit = "") =>
  z
    .number({ error: (iss) => (iss.input === undefined ? `${what} is required` : `${what} must be a number (got ${shown(iss.input)})`) })
    .refine(Number.isFinite, `${what} must be finite`)
    .refine((v) => r.min <= 0 || v > 0, `${what} must be positive`)
    .refine((v) => v >= r.min && v <= r.max, { error: (iss) => `${what} must lie between ${rangeText(r)}${unit} (got ${shown(iss.input)})` });

const coordinate = boundedNumber("coordinate", { min: -B.coordinateAbsM, max: B.coordinateAbsM }, " m");
const point = z.tuple([coordinate, coordinate, coordinate], { error: "a point must be [x, y, z] in metres" });

export const conductorSchema = z.union(
  [
    z.enum(["perfect", "copper", "aluminium"]),
    z.strictObject({ conductivitySPerM: boundedNumber("conductivitySPerM", B.conductivitySPerM, " S/m") }),
  ],
  { error: 'conductor must be "perfect", "copper", "aluminium" or {"conductivitySPerM": number}' },
);

const wholeIndex = (what: string) =>
  z
    .number({ error: (iss) => (iss.input === undefined ? `${what} is required` : `${what} must be a whole number`) })
    .int(`${what} must be a whole number`)
    .nonnegative(`${what} must be 0 or more`);

const FEED_HELP = 'feed is required: {"wire": W, "vertex": V} names the wire (0 = first) and the interior vertex where the source sits';

export const shapeSchema = z.strictObject({
  name: z.string({ error: "name must be a string" }).max(B.nameMaxChars, `name must be at most ${B.nameMaxChars} characters`).optional(),
  frequencyHz: boundedNumber("frequencyHz", B.frequencyHz, " Hz"),
  wireRadiusM: boundedNumber("wireRadiusM", B.radiusM, " m"),
  conductor: conductorSchema.default("perfect"),
  segmentsPerWavelength: boundedNumber("segmentsPerWavelength", B.segmentsPerWavelength).optional(),
  wires: z
    .array(
      z.strictObject({
        pointsM: z.array(point, { error: "pointsM must be a list of [x, y, z] points" }).min(2, "a wire needs at least 2 points"),
        radiusM: boundedNumber("radiusM", B.radiusM, " m").optional(),
      }),
      { error: "wires is required: a list of wires, each {\"pointsM\": [[x, y, z], ...]}" },
    )
    .min(1, "at least one wire is needed"),
  /** Absent: free space. Else the plane z = 0, perfect or real (em/ground.ts). */
  ground: groundSchema.optional(),
  feed: z.strictObject({ wire: wholeIndex("feed.wire"), vertex: wholeIndex("feed.vertex") }, { error: FEED_HELP }),
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
    const keys = (issue as { keys: string[] }).keys;
    const name = (k: string) => (/^[A-Za-z0-9_.-]{1,40}$/.test(k) ? k : shown(k));
    const named = keys.length > 3 ? `${keys.slice(0, 3).map(name).join(", ")} and ${keys.length - 3} more` : keys.map(name).join(", ");
    return `${label}: ${where}: unknown field ${named} (allowed fields are listed in README.md)`;
  }
  return `${label}: ${where}: ${issue.message}`;
}

/** Parses shape JSON text; throws InputError with one line on any problem. */
export function parseShape(text: string, label = "shape"): Shape {
  const body = checkTextLimits(text, label, { maxChars: B.fileBytesMax, maxDepth: B.nestingMax, syntax: "json" });
  let raw: unknown;
  try {
    raw = JSON.parse(body);
  } catch (err) {
    const why = err instanceof Error ? err.message.split("\n")[0] : String(err);
    throw new InputError(`${label}: not valid JSON (${why})`);
  }
  return validateShape(raw, label);
}

/** Cheap counts on the raw value, so a huge list is refused before the schema walks it. */
function checkCounts(raw: unknown, label: string): void {
  const wires = (raw as { wires?: unknown } | null)?.wires;
  if (!Array.isArray(wires)) return;
  if (wires.length > B.wiresMax) throw new InputError(`${label}: wires: at most ${B.wiresMax} wires (got ${wires.length})`);
  let vertices = 0;
  for (const w of wires) {
    const pts = (w as { pointsM?: unknown } | null)?.pointsM;
    if (Array.isArray(pts)) vertices += pts.length;
  }
  if (vertices > B.verticesMax) throw new InputError(`${label}: wires: at most ${B.verticesMax} points over all wires (got ${vertices})`);
}

export function validateShape(raw: unknown, label = "shape"): Shape {
  checkCounts(raw, label);
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
  checkProblemSize(shape, undefined, label);
  return shape;
}

const g3 = (v: number) => boundText(Number(v.toPrecision(3)));

/**
 * Electrical size checks and the mesh size, counted the way em/mesh.ts cuts pieces
 * (max(3, ⌈L·spw/λ⌉) segments a piece) without allocating anything. Call again when
 * segmentsPerWavelength is overridden (analyze --segments-per-wavelength).
 */
export function checkProblemSize(shape: Shape, segmentsPerWavelength?: number, label = "shape"): { segments: number; unknowns: number } {
  const spw = segmentsPerWavelength ?? shape.segmentsPerWavelength ?? DEFAULT_SEGMENTS_PER_WAVELENGTH;
  const lambdaM = wavelengthM(shape.frequencyHz);
  const lo = [Infinity, Infinity, Infinity], hi = [-Infinity, -Infinity, -Infinity];
  let farthestM = 0, segments = 0;
  shape.wires.forEach((wire, w) => {
    const radiusM = wire.radiusM ?? shape.wireRadiusM;
    if (radiusM > B.radiusMaxWl * lambdaM) {
      const field = wire.radiusM === undefined ? "wireRadiusM" : `wires[${w}].radiusM`;
      throw new InputError(`${label}: ${field}: a radius of ${g3(radiusM)} m is ${g3(radiusM / lambdaM)} wavelengths; the thin-wire model needs at most ${B.radiusMaxWl} λ (${g3(B.radiusMaxWl * lambdaM)} m at this frequency)`);
    }
    wire.pointsM.forEach((p, i) => {
      farthestM = Math.max(farthestM, Math.hypot(p[0], p[1], p[2]));
      for (let c = 0; c < 3; c++) { lo[c] = Math.min(lo[c], p[c]); hi[c] = Math.max(hi[c], p[c]); }
      if (i > 0) {
        const a = wire.pointsM[i - 1];
        segments += Math.max(MIN_SEGMENTS_PER_PIECE, Math.ceil((Math.hypot(p[0] - a[0], p[1] - a[1], p[2] - a[2]) * spw) / lambdaM));
      }
    });
  });
  if (farthestM > B.farthestPointMaxWl * lambdaM) {
    throw new InputError(`${label}: wires: a point lies ${g3(farthestM / lambdaM)} wavelengths from the origin; keep every point within ${B.farthestPointMaxWl} λ (${g3(B.farthestPointMaxWl * lambdaM)} m at this frequency)`);
  }
  const spanM = Math.max(hi[0] - lo[0], hi[1] - lo[1], hi[2] - lo[2]);
  if (spanM < B.spanMinWl * lambdaM) {
    throw new InputError(`${label}: wires: the shape spans ${g3(spanM / lambdaM)} wavelengths; the solver needs at least ${boundText(B.spanMinWl)} λ (${g3(B.spanMinWl * lambdaM)} m at this frequency)`);
  }
  const unknowns = segments - shape.wires.length;
  if (segments > B.segmentsMax || unknowns > B.unknownsMax) {
    throw new InputError(`${label}: the mesh would need ${unknowns} unknowns (${segments} segments at ${spw} per wavelength); the limit is ${B.unknownsMax} unknowns (${B.segmentsMax} segments): shorten the wires or lower segmentsPerWavelength`);
  }
  return { segments, unknowns };
}
