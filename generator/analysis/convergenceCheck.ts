// The published-figure check: gain and impedance at the default settings (converged.ts) must lie
// within their stated uncertainty of a single analysis at `factor` times the starting mesh density
// (4 × 25 = 100 per wavelength by default). Differences:
//   ΔG = |G_pub − G_fine| ≤ u_G,   ΔZ = |Z_pub − Z_fine| / |Z_pub| ≤ u_Z   (u_Z is relative to the
// published impedance, as converged.ts states it). The finer mesh stops at the refinement's own
// thin-wire cap (segments of 4 radii), as the published ladder does.
// with a slack of 1e-6 (relative) for the 7-significant-digit rounding of the entries.
import { DEFAULT_SEGMENTS_PER_WAVELENGTH, solveShape, type Shape } from "../em/index.js";
import { refinementCap } from "./converged.js";

export interface PublishedFigures {
  gainDbi: number;
  inputImpedanceOhm: { re: number; im: number };
  uncertainty: { gainDb: number; impedancePercent: number };
}

export interface FinerMeshCheck {
  segmentsPerWavelength: number;
  gainDiffDb: number;
  impedanceDiffPercent: number;
  gainOk: boolean;
  impedanceOk: boolean;
  ok: boolean;
}

const SLACK = 1e-6;

/** Over ground, `elevationWindowDeg` is the window the published gain was judged in (the entry's purpose). */
export function checkAgainstFinerMesh(shape: Shape, published: PublishedFigures, factor = 4, elevationWindowDeg?: [number, number]): FinerMeshCheck {
  const start = shape.segmentsPerWavelength ?? DEFAULT_SEGMENTS_PER_WAVELENGTH;
  const spw = Math.min(factor * start, refinementCap(shape, start));
  const fine = solveShape(shape, { segmentsPerWavelength: spw, ...(shape.ground && elevationWindowDeg ? { elevationWindowDeg } : {}) });
  const z = fine.inputImpedanceOhm, p = published.inputImpedanceOhm;
  const gainDiffDb = Math.abs(published.gainDbi - fine.peakGainDbi);
  const impedanceDiffPercent = (100 * Math.hypot(p.re - z.re, p.im - z.im)) / Math.hypot(p.re, p.im);
  const u = published.uncertainty;
  const gainOk = gainDiffDb <= u.gainDb + SLACK * (1 + Math.abs(fine.peakGainDbi));
  const impedanceOk = impedanceDiffPercent <= u.impedancePercent * (1 + SLACK) + 100 * SLACK;
  return { segmentsPerWavelength: spw, gainDiffDb, impedanceDiffPercent, gainOk, impedanceOk, ok: gainOk && impedanceOk };
}
