// Converged figures by adaptive mesh refinement. Starting at the shape's segments per wavelength
// (25 by default), the mesh is doubled until two doublings in a row each change the peak gain by
// less than GAIN_TOLERANCE_DB and the input impedance by less than IMPEDANCE_TOLERANCE, relative:
//   |G_2n − G_n| < 0.01 dB   and   |Z_2n − Z_n| / |Z_2n| < 1 %,
// at every check frequency together (the design frequency and the band edges), or until the next
// doubling would pass the cap: MAX_SEGMENTS_PER_WAVELENGTH, or segments shorter than 4 wire radii
// (the thin-wire limit of em/geometryChecks.ts). One small change alone can be a coincidence (the
// error of a coarse mesh changing sign as it shrinks): three meshes that agree pairwise are the
// usual guard against it. The finest mesh's figures are published and the last change is their
// stated uncertainty ("converged" says whether the last change met both thresholds; below the cap
// the one before it met them too).
// A sequence of successive refinements as a convergence check: Gibson, The Method of Moments in
// Electromagnetics, 2nd ed., ch. 4. Solutions are kept in a cache the caller passes in (a Map), so
// the band sweep reuses the solves of the ladder at the same frequency and mesh.
import { SHAPE_BOUNDS } from "../bounds.js";
import { DEFAULT_SEGMENTS_PER_WAVELENGTH, feedGapM as defaultFeedGapM, solveShape, type Shape, type Solution } from "../em/index.js";
import { wavelengthM } from "../units.js";

export const GAIN_TOLERANCE_DB = 0.01;
export const IMPEDANCE_TOLERANCE = 0.01;
export const MAX_SEGMENTS_PER_WAVELENGTH = 200;

export type SolveCache = Map<string, Solution>;

/**
 * The mesh is that of the design frequency: segments per wavelength scale as f0/f off it. Over
 * ground, `elevationWindowDeg` makes the solution's peak the best direction within that window.
 */
export function solveAt(shape: Shape, frequencyHz: number, spwAtDesign: number, feedGapM: number, cache: SolveCache, elevationWindowDeg?: [number, number]): Solution {
  const key = `${frequencyHz}|${spwAtDesign}|${feedGapM}${elevationWindowDeg ? `|${elevationWindowDeg.join(":")}` : ""}`;
  let s = cache.get(key);
  if (!s) {
    s = solveShape(
      { ...shape, frequencyHz },
      { segmentsPerWavelength: (spwAtDesign * shape.frequencyHz) / frequencyHz, feedGapM, energyBalance: frequencyHz === shape.frequencyHz, ...(elevationWindowDeg ? { elevationWindowDeg } : {}) },
    );
    cache.set(key, s);
  }
  return s;
}

export interface MeshChange {
  gainDb: number;
  /** |Z_fine − Z_coarse| / |Z_fine|. */
  impedanceFraction: number;
  impedanceOhm: number;
}

export function meshChange(coarse: Solution, fine: Solution): MeshChange {
  const dz = Math.hypot(fine.inputImpedanceOhm.re - coarse.inputImpedanceOhm.re, fine.inputImpedanceOhm.im - coarse.inputImpedanceOhm.im);
  return {
    gainDb: fine.peakGainDbi - coarse.peakGainDbi,
    impedanceFraction: dz / Math.hypot(fine.inputImpedanceOhm.re, fine.inputImpedanceOhm.im),
    impedanceOhm: dz,
  };
}

export interface Refinement {
  /** The published mesh. */
  segmentsPerWavelength: number;
  /** The mesh it was compared with: half as dense after refinement, twice as dense for a fixed mesh. */
  comparedWithSegmentsPerWavelength: number;
  feedGapM: number;
  /** Largest change over the check frequencies between the two meshes (fixed mesh: design frequency only). */
  change: MeshChange;
  converged: boolean;
  /** Solves made along the way (cache misses). */
  solves: number;
}

export const withinTolerance = (c: MeshChange): boolean => Math.abs(c.gainDb) < GAIN_TOLERANCE_DB && c.impedanceFraction < IMPEDANCE_TOLERANCE;

/** Densest mesh the thin-wire limit (segments of 4 radii) and the bound on unknowns allow, per wavelength. */
export function meshCeiling(shape: Shape): number {
  const radii = shape.wires.map((w) => w.radiusM ?? shape.wireRadiusM);
  const thinLimit = wavelengthM(shape.frequencyHz) / (4 * Math.max(...radii));
  // and the mesh stays within the bound on unknowns (bounds.ts), with room for the feed's finer segments
  const wireWl = shape.wires.reduce((sum, w) => sum + w.pointsM.slice(1).reduce((t, p, i) => t + Math.hypot(p[0] - w.pointsM[i][0], p[1] - w.pointsM[i][1], p[2] - w.pointsM[i][2]), 0), 0) / wavelengthM(shape.frequencyHz);
  const sizeLimit = (0.8 * SHAPE_BOUNDS.unknownsMax) / Math.max(wireWl, 1e-9);
  return Math.min(thinLimit, sizeLimit);
}

/** Highest doubling of `start` the cap allows (at least one doubling). */
export function refinementCap(shape: Shape, start: number): number {
  const cap = Math.min(MAX_SEGMENTS_PER_WAVELENGTH, meshCeiling(shape));
  let spw = 2 * start;
  while (2 * spw <= cap) spw *= 2;
  return spw;
}

export interface RefineOptions {
  /** Fix this mesh exactly: no refinement. */
  fixedSegmentsPerWavelength?: number;
  feedGapM?: number;
  /** Frequencies checked besides the design frequency (band edges). */
  checkFrequenciesHz?: number[];
  /** Over ground: converge the gain within this elevation window (degrees). */
  elevationWindowDeg?: [number, number];
}

/** Runs the doubling ladder; every solve lands in `cache` for the caller to reuse. */
export function refineMesh(shape: Shape, options: RefineOptions, cache: SolveCache): Refinement {
  const feedGapM = options.feedGapM ?? defaultFeedGapM(shape.frequencyHz);
  const before = cache.size;
  const w = options.elevationWindowDeg;
  const freqs = [shape.frequencyHz, ...(options.checkFrequenciesHz ?? []).filter((f) => f !== shape.frequencyHz)];
  if (options.fixedSegmentsPerWavelength !== undefined) {
    const spw = options.fixedSegmentsPerWavelength;
    const change = meshChange(solveAt(shape, shape.frequencyHz, spw, feedGapM, cache, w), solveAt(shape, shape.frequencyHz, 2 * spw, feedGapM, cache, w));
    return { segmentsPerWavelength: spw, comparedWithSegmentsPerWavelength: 2 * spw, feedGapM, change, converged: withinTolerance(change), solves: cache.size - before };
  }
  const start = shape.segmentsPerWavelength ?? DEFAULT_SEGMENTS_PER_WAVELENGTH;
  const cap = refinementCap(shape, start);
  let coarse = start;
  let previousSmall = false;
  for (;;) {
    const fine = 2 * coarse;
    const change = largestChange(shape, freqs, coarse, fine, feedGapM, cache, w);
    const small = withinTolerance(change);
    const atCap = fine >= cap;
    // at the cap there is no further doubling to confirm with: the last change is the verdict
    if ((small && previousSmall) || atCap) {
      return { segmentsPerWavelength: fine, comparedWithSegmentsPerWavelength: coarse, feedGapM, change, converged: small, solves: cache.size - before };
    }
    previousSmall = small;
    coarse = fine;
  }
}

/** The largest gain and impedance changes from `coarse` to `fine` over the check frequencies. */
function largestChange(shape: Shape, freqs: number[], coarse: number, fine: number, feedGapM: number, cache: SolveCache, w?: [number, number]): MeshChange {
  const change: MeshChange = { gainDb: 0, impedanceFraction: 0, impedanceOhm: 0 };
  for (const f of freqs) {
    const c = meshChange(solveAt(shape, f, coarse, feedGapM, cache, w), solveAt(shape, f, fine, feedGapM, cache, w));
    if (Math.abs(c.gainDb) > Math.abs(change.gainDb)) change.gainDb = c.gainDb;
    if (c.impedanceFraction > change.impedanceFraction) Object.assign(change, { impedanceFraction: c.impedanceFraction, impedanceOhm: c.impedanceOhm });
  }
  return change;
}

/** The published solution at the design frequency and how it was reached (for `analyze` alone). */
export function convergedSolution(shape: Shape, options: RefineOptions = {}, cache: SolveCache = new Map()): { solution: Solution; refinement: Refinement } {
  const refinement = refineMesh(shape, options, cache);
  return { solution: solveAt(shape, shape.frequencyHz, refinement.segmentsPerWavelength, refinement.feedGapM, cache, options.elevationWindowDeg), refinement };
}

/** The stated uncertainty of published figures: the last change, as magnitudes. */
export function uncertaintyOf(r: Refinement) {
  return {
    gainDb: Math.abs(r.change.gainDb),
    impedancePercent: 100 * r.change.impedanceFraction,
    segmentsPerWavelength: r.segmentsPerWavelength,
    comparedWithSegmentsPerWavelength: r.comparedWithSegmentsPerWavelength,
    converged: r.converged,
  };
}

export type Uncertainty = ReturnType<typeof uncertaintyOf>;
