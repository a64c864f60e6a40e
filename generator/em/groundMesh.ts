// Mesh additions for a perfect ground by image theory (Balanis, Antenna Theory, 3rd ed., §4.7).
// A wire end on the ground is no free end: its current flows on into the image wire. The end node
// gets a basis function of its own, a half-triangle on the segment above ground joined to the
// mirrored half on the image segment; the image half enters the matrix through the image coupling
// (em/groundImage.ts), so in the mesh it is just one more "half" on the grounded segment.
// The mirror of a mesh: every point (x, y, z) → (x, y, −z), every direction likewise; the image
// current flows reversed along the mirrored path, I'(M r) = −I(r) on the mirrored direction
// (horizontal components reverse, vertical ones keep their direction).
import type { Mesh } from "./mesh.js";
import { groundedEnds, isGroundedFeed } from "./groundShape.js";
import type { Shape } from "./shapeFile.js";

/** The mesh with a basis function on every grounded wire end (new unknowns numbered after the others). */
export function withGroundedEnds(mesh: Mesh, shape: Shape): Mesh {
  if (shape.ground?.type !== "perfect") return mesh;
  const basisAtStart = Int32Array.from(mesh.basisAtStart);
  const basisAtEnd = Int32Array.from(mesh.basisAtEnd);
  let unknowns = mesh.unknowns;
  let feedBasis = mesh.feedBasis;
  const grounded = isGroundedFeed(shape);
  shape.wires.forEach((wire, w) => {
    const [atStart, atEnd] = groundedEnds(shape, w);
    if (!atStart && !atEnd) return;
    let first = -1, last = -1;
    for (let s = 0; s < mesh.segmentCount; s++) {
      if (mesh.wireOf[s] !== w) continue;
      if (first < 0) first = s;
      last = s;
    }
    if (atStart) {
      basisAtStart[first] = unknowns;
      if (grounded && shape.feed.wire === w && shape.feed.vertex === 0) feedBasis = unknowns;
      unknowns++;
    }
    if (atEnd) {
      basisAtEnd[last] = unknowns;
      if (grounded && shape.feed.wire === w && shape.feed.vertex === wire.pointsM.length - 1) feedBasis = unknowns;
      unknowns++;
    }
  });
  return { ...mesh, basisAtStart, basisAtEnd, unknowns, feedBasis };
}

/** The mirror image of the mesh geometry in z = 0 (same basis numbering). */
export function mirroredMesh(mesh: Mesh): Mesh {
  const start = Float64Array.from(mesh.start);
  const dir = Float64Array.from(mesh.dir);
  for (let s = 0; s < mesh.segmentCount; s++) {
    start[3 * s + 2] = -start[3 * s + 2];
    dir[3 * s + 2] = -dir[3 * s + 2];
  }
  return { ...mesh, start, dir };
}

/**
 * The segments of the mesh followed by their mirror images: 2N segments whose geometry arrays
 * the pair integrals read (segment N + q is the image of q).
 */
export function meshWithImage(mesh: Mesh): Mesh {
  const n = mesh.segmentCount;
  const image = mirroredMesh(mesh);
  const cat = <T extends Float64Array | Int32Array>(a: T, b: T, make: (len: number) => T): T => {
    const out = make(a.length + b.length);
    out.set(a);
    out.set(b, a.length);
    return out;
  };
  const f64 = (len: number) => new Float64Array(len);
  const i32 = (len: number) => new Int32Array(len);
  return {
    ...mesh,
    segmentCount: 2 * n,
    start: cat(mesh.start, image.start, f64),
    dir: cat(mesh.dir, image.dir, f64),
    lengthM: cat(mesh.lengthM, mesh.lengthM, f64),
    radiusM: cat(mesh.radiusM, mesh.radiusM, f64),
    wireOf: cat(mesh.wireOf, mesh.wireOf, i32),
    pieceOf: cat(mesh.pieceOf, mesh.pieceOf, i32),
    basisAtStart: cat(mesh.basisAtStart, mesh.basisAtStart, i32),
    basisAtEnd: cat(mesh.basisAtEnd, mesh.basisAtEnd, i32),
  };
}
