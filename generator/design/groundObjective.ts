// Design over ground: the mounted shape and the objective's elevation window. Objectives:
//   peak            the most gain in any direction of the upper half-space
//   long-distance   the most gain with elevation 5–25° (low-angle skywave paths)
//   near-vertical   the most gain with elevation 60–90° (regional near-vertical-incidence skywave)
// The windows are common practice for HF planning. Gain is 4πU/P_in, so ground loss counts.
import type { Shape } from "../em/index.js";
import type { SolveOptions } from "../em/solve.js";
import { mountShape, mountVerticalAtMastTop } from "../shapes/mounting.js";
import type { DesignRequest } from "./request.js";

export const ELEVATION_OBJECTIVES = ["peak", "long-distance", "near-vertical"] as const;
export type ElevationObjective = (typeof ELEVATION_OBJECTIVES)[number];

export const ELEVATION_WINDOWS_DEG: Record<ElevationObjective, [number, number]> = {
  peak: [0, 90],
  "long-distance": [5, 25],
  "near-vertical": [60, 90],
};

/**
 * The free-space bent-arm shape placed over the request's ground (unchanged in free space). With
 * `verticalClearanceM` a vertical request's height is the mast top (the feed); a shape whose arms
 * come lower than the clearance throws InputError, which the objective scores as infeasible.
 */
export function groundedShape(shape: Shape, r: DesignRequest): Shape {
  if (!r.ground || r.heightM === undefined) return shape;
  if (r.mounting === "vertical" && r.verticalClearanceM !== undefined) {
    return { ...mountVerticalAtMastTop(shape, r.heightM, r.verticalClearanceM), ground: r.ground };
  }
  return { ...mountShape(shape, r.mounting ?? "horizontal", r.heightM), ground: r.ground };
}

/**
 * Solve options for the objective: over ground the elevation window, and no pattern integral (the
 * score is gain, 4πU/P_in, which needs none); nothing in free space.
 */
export function objectiveSolveOptions(r: DesignRequest): SolveOptions {
  if (!r.ground) return {};
  const objective = r.objective ?? "peak";
  const window = r.elevationWindowDeg ?? (objective !== "peak" ? ELEVATION_WINDOWS_DEG[objective] : undefined);
  return { energyBalance: false, ...(window ? { elevationWindowDeg: window } : {}) };
}
