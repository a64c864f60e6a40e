// Cuts each polyline into straight segments and numbers the triangle (rooftop) basis functions.
// Every piece between two vertices gets n = max(minPerPiece, ⌈x·(1 − ε)⌉) equal segments, with
// x = pieceLength·segmentsPerWavelength/λ and ε = 1e-3: a piece that is a whole number of segments
// long keeps that number when its end points are rounded (7 significant digits in the entries,
// 1 µm in the coordinate table), instead of gaining one from a rounding error of a few parts per
// million; a piece up to 0.1 % longer than whole gets segments up to 0.1 % longer than nominal.
// Near the feed the mesh resolves the source gap (feedSource.ts): the segment of each feed piece
// that touches the feed vertex is halved, repeatedly and towards the feed, until the segments at
// the feed are no longer than `feedSegmentM` (lengths d/2, d/4, …, d/2^m, d/2^m; neighbours
// differ by at most a factor 2), the same on both sides so mirror-symmetric shapes stay so.
// With `gradeEnds` the end segments of every wire are halved the same way towards the wire's two
// ends until they are no longer than END_SEGMENT_RADII wire radii (so never under half that, the
// thin-wire limit of 4 radii): at an open end the current falls to zero with an unbounded charge
// density, which a uniform mesh resolves only slowly, so the input impedance creeps as the mesh
// doubles (measured: bench/convergenceLadder.ts); a mesh graded geometrically towards a singular
// end is the standard remedy (graded meshes for edge singularities, e.g. Babuška & Guo, the h-p
// finite element method — from memory). The ends then stay resolved the same at every doubling.
// A basis function sits on every node of a wire except its two free ends and spans the segment
// before and the segment after, so current is continuous through bends and zero at free ends
// (Harrington 1968; Gibson, The Method of Moments in Electromagnetics, thin wires).
import { InputError } from "../errors.js";
import { wavelengthM } from "../units.js";
import type { Shape } from "./shapeFile.js";

export const DEFAULT_SEGMENTS_PER_WAVELENGTH = 25;
export const MIN_SEGMENTS_PER_PIECE = 3;
/** End segments (with gradeEnds) are no longer than this many wire radii. */
export const END_SEGMENT_RADII = 8;
/** Relative slack before rounding a segment count up (see the header). */
export const SEGMENT_COUNT_SLACK = 1e-3;

export interface Mesh {
  segmentCount: number;
  /** Segment start points, xyz interleaved (m). */
  start: Float64Array;
  /** Unit direction of each segment, xyz interleaved. */
  dir: Float64Array;
  lengthM: Float64Array;
  radiusM: Float64Array;
  wireOf: Int32Array;
  /** Index of the piece (0-based within its wire) each segment belongs to. */
  pieceOf: Int32Array;
  /** Basis function whose falling half lies on the segment (node at its start), or −1. */
  basisAtStart: Int32Array;
  /** Basis function whose rising half lies on the segment (node at its end), or −1. */
  basisAtEnd: Int32Array;
  unknowns: number;
  feedBasis: number;
}

/** Equal segments of a piece: ⌈x(1 − ε)⌉, at least MIN_SEGMENTS_PER_PIECE. */
export function pieceSegmentCount(lengthM: number, segmentsPerWavelength: number, wavelengthMeters: number): number {
  const x = (lengthM * segmentsPerWavelength) / wavelengthMeters;
  return Math.max(MIN_SEGMENTS_PER_PIECE, Math.ceil(x * (1 - SEGMENT_COUNT_SLACK)));
}

/** Halvings of a segment of length d until it is no longer than h (same slack as the counts). */
export function feedHalvings(segmentM: number, feedSegmentM: number): number {
  let m = 0;
  while (segmentM / 2 ** m > feedSegmentM * (1 + SEGMENT_COUNT_SLACK) && m < 30) m++;
  return m;
}

/** Fractions of the piece at which segments end, from its start (last one is 1). */
function pieceBreaks(n: number, startHalvings: number, endHalvings: number): number[] {
  // graded lengths in units of one uniform segment, from the graded end outward: 2^-m, 2^-m, …, 1/2
  const graded = (m: number) => (m === 0 ? [1] : [2 ** -m, ...Array.from({ length: m }, (_, j) => 2 ** (j - m))]);
  const units: number[] = [];
  for (let k = 0; k < n; k++) {
    if (k === 0 && startHalvings > 0) units.push(...graded(startHalvings));
    else if (k === n - 1 && endHalvings > 0) units.push(...graded(endHalvings).reverse());
    else units.push(1);
  }
  const breaks: number[] = [];
  let acc = 0;
  for (const u of units) { acc += u; breaks.push(acc / n); }
  breaks[breaks.length - 1] = 1;
  return breaks;
}

export function buildMesh(shape: Shape, segmentsPerWavelength?: number, feedSegmentM = Infinity, gradeEnds = false): Mesh {
  const spw = segmentsPerWavelength ?? shape.segmentsPerWavelength ?? DEFAULT_SEGMENTS_PER_WAVELENGTH;
  const lambdaM = wavelengthM(shape.frequencyHz);
  const lengths: number[][] = shape.wires.map((wire, w) =>
    wire.pointsM.slice(1).map((b, i) => {
      const a = wire.pointsM[i];
      const len = Math.hypot(b[0] - a[0], b[1] - a[1], b[2] - a[2]);
      if (!(len > 0)) {
        throw new InputError(
          `shape: wires[${w}].pointsM[${i + 1}]: piece ${i} has zero length (a point repeats the one before it)`,
        );
      }
      return len;
    }),
  );
  const { wire: fw, vertex: fv } = shape.feed;
  const counts = lengths.map((row) => row.map((len) => pieceSegmentCount(len, spw, lambdaM)));
  // one number of halvings for both feed pieces (the coarser of the two decides), so a mirror
  // image of one arm meshes exactly as the other
  const halvings = Number.isFinite(feedSegmentM)
    ? Math.max(feedHalvings(lengths[fw][fv - 1] / counts[fw][fv - 1], feedSegmentM), feedHalvings(lengths[fw][fv] / counts[fw][fv], feedSegmentM))
    : 0;
  const endHalvings = (w: number, i: number) =>
    gradeEnds ? feedHalvings(lengths[w][i] / counts[w][i], END_SEGMENT_RADII * (shape.wires[w].radiusM ?? shape.wireRadiusM)) : 0;
  const breaks = counts.map((row, w) =>
    row.map((n, i) => {
      const atStart = w === fw && i === fv ? halvings : i === 0 ? endHalvings(w, i) : 0;
      const atEnd = w === fw && i === fv - 1 ? halvings : i === row.length - 1 ? endHalvings(w, i) : 0;
      return pieceBreaks(n, atStart, atEnd);
    }),
  );
  const segmentCount = breaks.flat().reduce((s, b) => s + b.length, 0);
  const mesh: Mesh = {
    segmentCount,
    start: new Float64Array(3 * segmentCount),
    dir: new Float64Array(3 * segmentCount),
    lengthM: new Float64Array(segmentCount),
    radiusM: new Float64Array(segmentCount),
    wireOf: new Int32Array(segmentCount),
    pieceOf: new Int32Array(segmentCount),
    basisAtStart: new Int32Array(segmentCount).fill(-1),
    basisAtEnd: new Int32Array(segmentCount).fill(-1),
    unknowns: 0,
    feedBasis: -1,
  };
  let s = 0;
  let basis = 0;
  shape.wires.forEach((wire, w) => {
    const radiusM = wire.radiusM ?? shape.wireRadiusM;
    const first = s;
    wire.pointsM.slice(1).forEach((b, i) => {
      const a = wire.pointsM[i];
      const len = lengths[w][i];
      if (w === fw && i === fv) mesh.feedBasis = basis + (s - first) - 1;
      let t0 = 0;
      for (const t1 of breaks[w][i]) {
        for (let c = 0; c < 3; c++) {
          mesh.start[3 * s + c] = a[c] + (b[c] - a[c]) * t0;
          mesh.dir[3 * s + c] = (b[c] - a[c]) / len;
        }
        mesh.lengthM[s] = len * (t1 - t0);
        mesh.radiusM[s] = radiusM;
        mesh.wireOf[s] = w;
        mesh.pieceOf[s] = i;
        t0 = t1;
        s++;
      }
    });
    // nodes between consecutive segments of this wire carry basis functions
    for (let k = first; k < s - 1; k++) {
      mesh.basisAtEnd[k] = basis;
      mesh.basisAtStart[k + 1] = basis;
      basis++;
    }
  });
  mesh.unknowns = basis;
  return mesh;
}

/** Node currents at the two ends of segment s from the basis coefficients (0 at free ends). */
export function segmentEndCurrents(
  mesh: Mesh,
  s: number,
  re: Float64Array,
  im: Float64Array,
): [number, number, number, number] {
  const a = mesh.basisAtStart[s];
  const b = mesh.basisAtEnd[s];
  return [a >= 0 ? re[a] : 0, a >= 0 ? im[a] : 0, b >= 0 ? re[b] : 0, b >= 0 ? im[b] : 0];
}

/** Largest distance of any segment end from the origin (sets the pattern's angular detail; an image in z = 0 lies as far out). */
export function maxRadiusM(mesh: Mesh): number {
  let r = 0;
  for (let s = 0; s < mesh.segmentCount; s++) {
    for (const t of [0, 1]) {
      let d2 = 0;
      for (let c = 0; c < 3; c++) d2 += (mesh.start[3 * s + c] + t * mesh.dir[3 * s + c] * mesh.lengthM[s]) ** 2;
      r = Math.max(r, Math.sqrt(d2));
    }
  }
  return r;
}
