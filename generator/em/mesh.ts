// Cuts each polyline into straight segments and numbers the triangle (rooftop) basis functions.
// Every piece between two vertices gets n = max(minPerPiece, ⌈pieceLength·segmentsPerWavelength/λ⌉)
// equal segments. A basis function sits on every node of a wire except its two free ends and
// spans the segment before and the segment after, so current is continuous through bends and zero
// at free ends (Harrington 1968; Gibson, The Method of Moments in Electromagnetics, thin wires).
import { InputError } from "../errors.js";
import { wavelengthM } from "../units.js";
import type { Shape } from "./shapeFile.js";

export const DEFAULT_SEGMENTS_PER_WAVELENGTH = 25;
export const MIN_SEGMENTS_PER_PIECE = 3;

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

export function buildMesh(shape: Shape, segmentsPerWavelength?: number): Mesh {
  const spw = segmentsPerWavelength ?? shape.segmentsPerWavelength ?? DEFAULT_SEGMENTS_PER_WAVELENGTH;
  const lambdaM = wavelengthM(shape.frequencyHz);
  const counts: number[][] = shape.wires.map((wire, w) =>
    wire.pointsM.slice(1).map((b, i) => {
      const a = wire.pointsM[i];
      const len = Math.hypot(b[0] - a[0], b[1] - a[1], b[2] - a[2]);
      if (!(len > 0)) {
        throw new InputError(
          `shape: wires[${w}].pointsM[${i + 1}]: piece ${i} has zero length (a point repeats the one before it)`,
        );
      }
      return Math.max(MIN_SEGMENTS_PER_PIECE, Math.ceil((len * spw) / lambdaM));
    }),
  );
  const segmentCount = counts.flat().reduce((s, c) => s + c, 0);
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
      const n = counts[w][i];
      const len = Math.hypot(b[0] - a[0], b[1] - a[1], b[2] - a[2]);
      if (w === shape.feed.wire && i === shape.feed.vertex) mesh.feedBasis = basis + (s - first) - 1;
      for (let k = 0; k < n; k++, s++) {
        for (let c = 0; c < 3; c++) {
          mesh.start[3 * s + c] = a[c] + ((b[c] - a[c]) * k) / n;
          mesh.dir[3 * s + c] = (b[c] - a[c]) / len;
        }
        mesh.lengthM[s] = len / n;
        mesh.radiusM[s] = radiusM;
        mesh.wireOf[s] = w;
        mesh.pieceOf[s] = i;
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
