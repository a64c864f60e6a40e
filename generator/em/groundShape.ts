// Geometry rules for a shape over the ground plane z = 0 (image theory needs every wire above it):
// every point has z ≥ 0; only a wire's end may touch the ground, and only a perfect one (the end then
// carries current into the ground, a monopole or a wire grounded at one end); a real ground would
// need a radial system, which this solver does not model. A shape over perfect ground may be fed at
// such a grounded end (the base feed of a monopole).
import { InputError } from "../errors.js";
import type { Shape } from "./shapeFile.js";

/** A point counts as on the ground when |z| is below this (m): file values of 0 are exact. */
export const ON_GROUND_M = 1e-9;

export const onGround = (zM: number): boolean => Math.abs(zM) <= ON_GROUND_M;

/** The ends of wire w that lie on a perfect ground: [start, end]. */
export function groundedEnds(shape: Pick<Shape, "wires" | "ground">, w: number): [boolean, boolean] {
  if (shape.ground?.type !== "perfect") return [false, false];
  const pts = shape.wires[w].pointsM;
  return [onGround(pts[0][2]), onGround(pts[pts.length - 1][2])];
}

/** True when the shape is fed at a grounded wire end (the feed vertex is 0 or the last). */
export function isGroundedFeed(shape: Pick<Shape, "wires" | "ground" | "feed">): boolean {
  const { wire, vertex } = shape.feed;
  if (!shape.wires[wire]) return false;
  const [a, b] = groundedEnds(shape, wire);
  const last = shape.wires[wire].pointsM.length - 1;
  return (vertex === 0 && a) || (vertex === last && b);
}

/** Throws InputError with one line when a wire breaks a ground rule. */
export function checkGroundShape(shape: Shape, label: string): void {
  const ground = shape.ground;
  if (!ground) return;
  shape.wires.forEach((wire, w) => {
    const radiusM = wire.radiusM ?? shape.wireRadiusM;
    const last = wire.pointsM.length - 1;
    wire.pointsM.forEach((p, i) => {
      const where = `${label}: wires[${w}].pointsM[${i}]`;
      const isEnd = i === 0 || i === last;
      if (p[2] < -ON_GROUND_M) throw new InputError(`${where}: z = ${p[2]} m is below the ground; every wire must lie in z ≥ 0`);
      if (onGround(p[2])) {
        if (!isEnd) throw new InputError(`${where}: only a wire's end may touch the ground (z = 0); lift this bend above it`);
        if (ground.type === "real") {
          throw new InputError(`${where}: a wire may not end on real ground (it would need a radial system); lift the end at least one wire radius or use a perfect ground`);
        }
        const q = wire.pointsM[i === 0 ? 1 : last - 1];
        if (onGround(q[2])) throw new InputError(`${where}: the piece from a grounded end must rise from the ground, not lie on it`);
        return;
      }
      if (p[2] < radiusM) {
        throw new InputError(`${where}: z = ${p[2]} m is within the wire radius ${radiusM} m of the ground; put the end on the ground (z = 0) or lift it`);
      }
    });
  });
}
