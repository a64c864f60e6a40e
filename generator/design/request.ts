// What a design asks for, validated once with zod so the CLI, the catalog and tests share the rules.
import { z } from "zod";
import { conductorSchema } from "../em/shapeFile.js";
import { InputError } from "../errors.js";
import { DEFAULT_LIMITS, type BentArmLimits } from "../shapes/constraints.js";
import { groundSchema } from "../em/ground.js";
import { MOUNTINGS } from "../shapes/mounting.js";
import { ELEVATION_OBJECTIVES } from "./groundObjective.js";

export const VARIANTS = ["max-gain", "direct-feed"] as const;
export type Variant = (typeof VARIANTS)[number];

const positive = (what: string) =>
  z.number({ error: `${what} must be a number` }).refine((v) => Number.isFinite(v) && v > 0, `${what} must be a positive number`);

export const designRequestSchema = z
  .strictObject({
    frequencyHz: positive("frequencyHz"),
    lengthWl: positive("lengthWl").refine((v) => v >= 0.2 && v <= 6, "lengthWl must lie between 0.2 and 6 wavelengths"),
    piecesPerArm: z.number().int("piecesPerArm must be a whole number").min(1, "piecesPerArm must be at least 1").max(8, "piecesPerArm must be at most 8"),
    wireDiameterM: positive("wireDiameterM"),
    conductor: conductorSchema.default("copper"),
    variant: z.enum(VARIANTS, { error: `variant must be one of ${VARIANTS.join(", ")}` }).default("max-gain"),
    bandHz: z.tuple([positive("bandHz[0]"), positive("bandHz[1]")]).optional(),
    lineImpedanceOhm: positive("lineImpedanceOhm").default(50),
    swrLimit: positive("swrLimit").refine((v) => v > 1, "swrLimit must exceed 1").default(2),
    seed: z.number().int("seed must be a whole number").min(0, "seed must be 0 or more").default(1),
    segmentsPerWavelength: positive("segmentsPerWavelength").optional(),
    maxEvaluations: z.number().int().positive().optional(),
    // over ground (design/groundObjective.ts): absent = free space. No defaults here: a free-space
    // request must parse to the same object as before, since the catalog hashes it
    ground: groundSchema.optional(),
    heightM: positive("heightM").optional(),
    mounting: z.enum(MOUNTINGS, { error: `mounting must be one of ${MOUNTINGS.join(", ")}` }).optional(), // default horizontal
    /** Vertical only: heightM is the mast top (the feed) and every point stays this far above the ground. */
    verticalClearanceM: positive("verticalClearanceM").optional(),
    /** Over ground: the objective's elevation window in degrees, instead of its default (groundObjective.ts). */
    elevationWindowDeg: z.tuple([z.number(), z.number()]).refine(([lo, hi]) => lo >= 0 && lo < hi && hi <= 90, "elevationWindowDeg must satisfy 0 ≤ low < high ≤ 90").optional(),
    objective: z.enum(ELEVATION_OBJECTIVES, { error: `objective must be one of ${ELEVATION_OBJECTIVES.join(", ")}` }).optional(), // default peak
  })
  .superRefine((r, ctx) => {
    if (r.ground && r.heightM === undefined) ctx.addIssue({ code: "custom", path: ["heightM"], message: "a design over ground needs a height (--height-m)" });
    if (!r.ground && (r.heightM !== undefined || (r.objective ?? "peak") !== "peak" || (r.mounting ?? "horizontal") !== "horizontal")) {
      ctx.addIssue({ code: "custom", path: ["ground"], message: "a height, a mounting or an elevation objective needs a ground (--ground)" });
    }
    if (r.verticalClearanceM !== undefined && r.mounting !== "vertical") {
      ctx.addIssue({ code: "custom", path: ["verticalClearanceM"], message: "a clearance (--clearance-m) applies to the vertical mounting only (--mounting vertical)" });
    }
    if (r.verticalClearanceM !== undefined && r.heightM !== undefined && r.verticalClearanceM >= r.heightM) {
      ctx.addIssue({ code: "custom", path: ["verticalClearanceM"], message: `the clearance (--clearance-m) must be below the mast height ${r.heightM} m (--height-m)` });
    }
    if (r.heightM !== undefined && r.heightM < 5 * r.wireDiameterM) {
      ctx.addIssue({ code: "custom", path: ["heightM"], message: `height must be at least 5 wire diameters (${5 * r.wireDiameterM} m)` });
    }
    if (r.bandHz) {
      const [lo, hi] = r.bandHz;
      if (!(lo < hi)) ctx.addIssue({ code: "custom", path: ["bandHz"], message: `band low edge must be below its high edge (got ${lo} ≥ ${hi})` });
      else if (r.frequencyHz < lo || r.frequencyHz > hi) {
        ctx.addIssue({ code: "custom", path: ["bandHz"], message: `band ${lo / 1e6}–${hi / 1e6} MHz must contain the design frequency ${r.frequencyHz / 1e6} MHz` });
      }
    }
  });

export type DesignRequest = z.output<typeof designRequestSchema> & { limits?: BentArmLimits };

/** Default band when none is given: ±2 % around the design frequency. */
export const bandOf = (r: DesignRequest): [number, number] => r.bandHz ?? [r.frequencyHz * 0.98, r.frequencyHz * 1.02];
export const limitsOf = (r: DesignRequest): BentArmLimits => r.limits ?? DEFAULT_LIMITS;

export function parseDesignRequest(raw: unknown, label = "design"): DesignRequest {
  const result = designRequestSchema.safeParse(raw);
  if (!result.success) {
    const issue = result.error.issues[0];
    const path = issue.path.length ? issue.path.join(".") : "(top level)";
    throw new InputError(`${label}: ${path}: ${issue.message}`);
  }
  return result.data;
}
