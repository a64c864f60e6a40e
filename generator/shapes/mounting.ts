// How a bent-arm shape (drawn in the x–y plane, feed at the origin, symmetry axis +y) is hung over
// the ground plane z = 0:
//   horizontal: the wire plane horizontal at height H:          (x, y, 0) → (x, y, H)
//   vertical:   the wire plane vertical (the x–z plane), feed at the top of one mast, the arms
//               running down from it to tie-down points:        (x, y, 0) → (x, 0, z_feed − y),
//               z_feed = H + max y, so the lowest point is exactly at the stated minimum height H.
// The mast height of the vertical mounting (z_feed) follows from the shape and is reported with it.
// The catalog's vertical cells give the support instead (mountVerticalAtMastTop): the feed at the top
// of a mast of height H, (x, y, 0) → (x, 0, H − y), and every point at least a stated clearance up.
import type { Shape, Vec3 } from "../em/index.js";
import { InputError } from "../errors.js";

/**
 * A shape the mounting cannot hang (a point under the clearance or above the feed), with by how much
 * (metres), so the optimizer's penalty grows with the shortfall and the search can walk back.
 */
export class MountingError extends InputError {
  constructor(message: string, readonly shortfallM: number) {
    super(message);
    this.name = "MountingError";
  }
}

export const MOUNTINGS = ["horizontal", "vertical"] as const;
export type Mounting = (typeof MOUNTINGS)[number];

/** Feed height above the ground (m) for the mounting: H, or H + the arms' drop for vertical. */
export function feedHeightM(shape: Shape, mounting: Mounting, heightM: number): number {
  if (mounting === "horizontal") return heightM;
  return heightM + Math.max(...shape.wires.flatMap((w) => w.pointsM.map((p) => p[1])));
}

/** The free-space shape moved over the ground as mounted (the ground field is set by the caller). */
export function mountShape(shape: Shape, mounting: Mounting, heightM: number): Shape {
  const top = feedHeightM(shape, mounting, heightM);
  const place = ([x, y, z]: Vec3): Vec3 => (mounting === "horizontal" ? [x, y, z + heightM] : [x, z, top - y]);
  return { ...shape, wires: shape.wires.map((w) => ({ ...w, pointsM: w.pointsM.map(place) })) };
}

/** A point may sit this far above the feed (rounding of a level piece), no more. */
export const RISE_TOLERANCE_M = 1e-6;

/**
 * Vertical mounting with the feed at the top of a mast H metres high; throws InputError (an
 * infeasible shape to the optimizer) when a point comes lower than `clearanceM` above the ground,
 * or rises above the feed (the mast top is the highest support).
 */
export function mountVerticalAtMastTop(shape: Shape, mastHeightM: number, clearanceM: number): Shape {
  const ys = shape.wires.flatMap((w) => w.pointsM.map((p) => p[1]));
  const lowest = mastHeightM - Math.max(...ys);
  if (lowest < clearanceM) {
    throw new MountingError(`vertical mounting: the arms come down to ${lowest.toFixed(2)} m, below the ${clearanceM} m clearance under a ${mastHeightM} m mast`, clearanceM - lowest + Math.max(0, -Math.min(...ys)));
  }
  // the feed is the top: a point above it would need a support taller than the mast
  const rise = -Math.min(...ys);
  if (rise > RISE_TOLERANCE_M) {
    throw new MountingError(`vertical mounting: a point rises ${rise.toFixed(2)} m above the feed at the top of the ${mastHeightM} m mast; the arms must run down from the feed`, rise);
  }
  const place = ([x, y, z]: Vec3): Vec3 => [x, z, mastHeightM - y];
  return { ...shape, wires: shape.wires.map((w) => ({ ...w, pointsM: w.pointsM.map(place) })) };
}
