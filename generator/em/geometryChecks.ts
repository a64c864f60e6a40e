// Thin-wire validity of a mesh. The reduced kernel assumes segments much longer than the wire
// radius and wires that do not come close (Gibson, ch. 4, "thin-wire approximation": error grows
// as L/a falls below a few). Refused: segments shorter than the radius (their own message: the
// piece, its segments, the shortfall and what to change); segments that touch or cross (axis
// distance below the sum of radii). Warned: segments shorter than 4 radii; segments closer than 4
// radii. Two segments of one wire joined by less wire than the sum of their radii (neighbours,
// or neighbours but for very short segments between them) are close because the wire runs on,
// not because it comes back: they are neither a crossing nor a warning of one. Two straight pieces
// that share a bend can come close only near that bend: at run d from it the other piece's axis is
// d·sin α away (α the angle between them, ≤ 90°), so their segments are not compared pair by pair
// (a finer mesh would turn every sharp bend into a "crossing"); instead the bend itself is judged:
// refused when the pieces lie within the two radii of each other, touch / sin α, for more than half
// of the shorter piece (the wire folds back on itself), warned when they lie within 4 radii for
// more than 8 radii (α under 30°).
import { InputError } from "../errors.js";
import { segmentDistanceM } from "../geometry.js";
import { lengthText } from "../lengthText.js";
import { MIN_SEGMENTS_PER_PIECE, type Mesh } from "./mesh.js";
import type { Vec3 } from "./shapeFile.js";

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

/** "wires[w] piece p (pointsM[p] to pointsM[p+1])": the names a shape file uses. */
const where = (mesh: Mesh, s: number) => `wires[${mesh.wireOf[s]}] piece ${mesh.pieceOf[s]} (pointsM[${mesh.pieceOf[s]}] to pointsM[${mesh.pieceOf[s] + 1}])`;

function segmentsOfPiece(mesh: Mesh, s: number): number {
  let n = 0;
  for (let t = 0; t < mesh.segmentCount; t++) if (mesh.wireOf[t] === mesh.wireOf[s] && mesh.pieceOf[t] === mesh.pieceOf[s]) n++;
  return n;
}

function shortSegmentMessage(mesh: Mesh, s: number): string {
  const len = mesh.lengthM[s], a = mesh.radiusM[s], n = segmentsOfPiece(mesh, s);
  const fewer = n > MIN_SEGMENTS_PER_PIECE ? "use fewer segments per wavelength, " : "";
  return `shape: ${where(mesh, s)} is ${lengthText(n * len)} long and is cut into ${n} segments of ${lengthText(len)}, ` +
    `${lengthText(a - len)} shorter than the wire radius ${lengthText(a)} (the thin-wire model needs segments longer than the radius); ` +
    `${fewer}make the piece at least ${lengthText(n * a)} long, or use a wire of radius under ${lengthText(len)}`;
}

/** Throws InputError for shapes the solver must refuse; returns warnings for doubtful ones. */
export function checkMesh(mesh: Mesh): string[] {
  const warnings = new Set<string>();
  for (let s = 0; s < mesh.segmentCount; s++) {
    const len = mesh.lengthM[s], a = mesh.radiusM[s];
    if (len < a) throw new InputError(shortSegmentMessage(mesh, s));
    if (len < 4 * a) {
      warnings.add(`${where(mesh, s)}: segments of ${lengthText(len)} are under 4 wire radii (${lengthText(4 * a)}); the thin-wire model loses accuracy: use fewer segments per wavelength or a longer piece`);
    }
  }
  checkBends(mesh, warnings);
  // wire run between segments of one wire: the lengths strictly between p and q (segments of a
  // wire are consecutive in the mesh)
  const runM = new Float64Array(mesh.segmentCount + 1);
  for (let s = 0; s < mesh.segmentCount; s++) runM[s + 1] = runM[s] + mesh.lengthM[s];
  const ends = segmentEnds(mesh);
  for (let p = 0; p < mesh.segmentCount; p++) {
    for (let q = p + 1; q < mesh.segmentCount; q++) {
      const touch = mesh.radiusM[p] + mesh.radiusM[q];
      const between = mesh.wireOf[p] === mesh.wireOf[q] ? runM[q] - runM[p + 1] : Infinity;
      if (between < touch) continue; // the wire runs on from one to the other
      if (between !== Infinity && Math.abs(mesh.pieceOf[p] - mesh.pieceOf[q]) === 1) continue; // one bend: checkBends
      const dist = segmentDistanceM(ends[p][0], ends[p][1], ends[q][0], ends[q][1]);
      if (dist < touch) {
        throw new InputError(
          `shape: ${where(mesh, p)} and ${where(mesh, q)} touch or cross: their axes come within ${lengthText(dist)}, ` +
          `${lengthText(touch - dist)} less than the ${lengthText(touch)} the two wire radii need; move them apart (wires must not intersect)`,
        );
      }
      if (dist < 2 * touch && between >= 2 * touch) {
        warnings.add(`${where(mesh, p)} and ${where(mesh, q)} come within ${lengthText(dist)}, under 4 wire radii (${lengthText(2 * touch)}); the thin-wire model loses accuracy`);
      }
    }
  }
  return [...warnings];
}

/** The bends of every wire: folds refused, sharp bends warned (see the header). */
function checkBends(mesh: Mesh, warnings: Set<string>): void {
  // per (wire, piece): a direction and the length
  const pieces = new Map<string, { dir: Vec3; lengthM: number; radiusM: number; first: number }>();
  for (let s = 0; s < mesh.segmentCount; s++) {
    const key = `${mesh.wireOf[s]}|${mesh.pieceOf[s]}`;
    const p = pieces.get(key);
    if (p) p.lengthM += mesh.lengthM[s];
    else pieces.set(key, { dir: [mesh.dir[3 * s], mesh.dir[3 * s + 1], mesh.dir[3 * s + 2]], lengthM: mesh.lengthM[s], radiusM: mesh.radiusM[s], first: s });
  }
  for (const [key, a] of pieces) {
    const [w, i] = key.split("|").map(Number);
    const b = pieces.get(`${w}|${i + 1}`);
    if (!b) continue;
    const cosAngle = -(a.dir[0] * b.dir[0] + a.dir[1] * b.dir[1] + a.dir[2] * b.dir[2]);
    if (cosAngle <= 0) continue; // 90° or wider: the pieces move apart from the bend on
    const angleDeg = (Math.acos(Math.min(1, cosAngle)) * 180) / Math.PI;
    const sin = Math.sqrt(Math.max(0, 1 - cosAngle * cosAngle));
    const touch = a.radiusM + b.radiusM;
    const shorter = Math.min(a.lengthM, b.lengthM);
    const bend = `the bend at wires[${w}] pointsM[${i + 1}] (between ${where(mesh, a.first)} and piece ${i + 1})`;
    if (touch > 0.5 * shorter * sin) {
      const run = sin > 0 ? touch / sin : Infinity;
      throw new InputError(
        `shape: ${bend} folds the wire back on itself: the pieces meet at ${angleDeg.toFixed(1)}° and lie within the two wire radii (${lengthText(touch)}) of each other ` +
        `for ${Number.isFinite(run) ? lengthText(run) : "their whole length"} from the bend, more than half the shorter piece (${lengthText(shorter)}); open the bend`,
      );
    }
    if (2 * touch > 8 * Math.max(a.radiusM, b.radiusM) * sin) {
      warnings.add(`${bend}: the pieces meet at ${angleDeg.toFixed(1)}°, under 30°, and lie within 4 wire radii of each other for ${lengthText((2 * touch) / sin)} from the bend; the thin-wire model loses accuracy there`);
    }
  }
}
