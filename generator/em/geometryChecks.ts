// Thin-wire validity of a mesh. The reduced kernel assumes segments much longer than the wire
// radius and wires that do not come close (Gibson, ch. 4, "thin-wire approximation": error grows
// as L/a falls below a few). Refused: segments shorter than the radius; segments that touch or
// cross (axis distance below the sum of radii). Warned: segments shorter than 4 radii; segments
// closer than 4 radii that do not share a node.
import { InputError } from "../errors.js";
import { segmentDistanceM } from "../geometry.js";
import type { Mesh } from "./mesh.js";
import type { Vec3 } from "./shapeFile.js";

const fmt = (v: number) => Number(v.toPrecision(3));

/** Both ends of every mesh segment, for distance checks. */
function segmentEnds(mesh: Mesh): [Vec3, Vec3][] {
  const ends: [Vec3, Vec3][] = [];
  for (let s = 0; s < mesh.segmentCount; s++) {
    const a: Vec3 = [mesh.start[3 * s], mesh.start[3 * s + 1], mesh.start[3 * s + 2]];
    const l = mesh.lengthM[s];
    ends.push([a, [a[0] + l * mesh.dir[3 * s], a[1] + l * mesh.dir[3 * s + 1], a[2] + l * mesh.dir[3 * s + 2]]]);
  }
  return ends;
}

const where = (mesh: Mesh, s: number) => `wires[${mesh.wireOf[s]}] piece ${mesh.pieceOf[s]}`;

/** Throws InputError for shapes the solver must refuse; returns warnings for doubtful ones. */
export function checkMesh(mesh: Mesh): string[] {
  const warnings = new Set<string>();
  for (let s = 0; s < mesh.segmentCount; s++) {
    const len = mesh.lengthM[s], a = mesh.radiusM[s];
    if (len < a) {
      throw new InputError(
        `shape: ${where(mesh, s)}: segments of ${fmt(len)} m are shorter than the wire radius ${fmt(a)} m; lengthen the piece or use fewer segments per wavelength`,
      );
    }
    if (len < 4 * a) warnings.add(`${where(mesh, s)}: segments of ${fmt(len)} m are under 4 wire radii; the thin-wire model loses accuracy`);
  }
  const ends = segmentEnds(mesh);
  for (let p = 0; p < mesh.segmentCount; p++) {
    for (let q = p + 1; q < mesh.segmentCount; q++) {
      const sameWire = mesh.wireOf[p] === mesh.wireOf[q];
      if (sameWire && q === p + 1) continue; // neighbours share a node
      const dist = segmentDistanceM(ends[p][0], ends[p][1], ends[q][0], ends[q][1]);
      const touch = mesh.radiusM[p] + mesh.radiusM[q];
      if (dist < touch) {
        throw new InputError(
          `shape: ${where(mesh, p)} and ${where(mesh, q)} touch or cross (${fmt(dist)} m apart, wire radii sum to ${fmt(touch)} m); wires must not intersect`,
        );
      }
      if (dist < 2 * touch) {
        warnings.add(`${where(mesh, p)} and ${where(mesh, q)} come within ${fmt(dist)} m, under 4 wire radii; the thin-wire model loses accuracy`);
      }
    }
  }
  return [...warnings];
}
