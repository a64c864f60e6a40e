// Band sweep: at each frequency the input impedance, SWR on the line (Pozar §2.3), gain and
// realized gain G_r = G·(1 − |Γ|²) (IEEE Std 145-2013, "realized gain"). Frequencies: `inBand`
// evenly from the low to the high edge, plus `margin` points each side at the same spacing.
// Every point uses the design frequency's mesh and feed gap (converged.ts picks the mesh).
import { DEFAULT_SEGMENTS_PER_WAVELENGTH, feedGapM, type Shape } from "../em/index.js";
import { toDb } from "../units.js";
import { abs } from "./complex.js";
import { solveAt, type SolveCache } from "./converged.js";
import { reflectionCoefficient, swr, swrSpanBelow, type SwrSpan } from "./swr.js";

export interface SweepPoint {
  frequencyHz: number;
  inBand: boolean;
  impedanceOhm: { re: number; im: number };
  swr: number;
  gainDbi: number;
  realizedGainDbi: number;
}

export interface Sweep {
  lineImpedanceOhm: number;
  points: SweepPoint[];
  /** Contiguous span around the design frequency where SWR ≤ 2, or null. */
  swr2Span: SwrSpan | null;
}

export function sweepFrequencies(bandHz: [number, number], inBand = 11, margin = 3): { frequencyHz: number; inBand: boolean }[] {
  const [lo, hi] = bandHz;
  const step = (hi - lo) / (inBand - 1);
  const out: { frequencyHz: number; inBand: boolean }[] = [];
  for (let i = -margin; i < inBand + margin; i++) {
    const inside = i >= 0 && i < inBand;
    out.push({ frequencyHz: inside ? lo + ((hi - lo) * i) / (inBand - 1) : lo + i * step, inBand: inside });
  }
  return out.filter((p) => p.frequencyHz > 0);
}

export interface SweepMesh {
  /** Segments per wavelength at the design frequency (they scale as f0/f off it). */
  segmentsPerWavelength: number;
  feedGapM: number;
  cache: SolveCache;
}

/** The mesh and the feed gap stay those of the design frequency at every point. */
export function bandSweep(shape: Shape, bandHz: [number, number], lineImpedanceOhm: number, mesh?: SweepMesh): Sweep {
  const m = mesh ?? {
    segmentsPerWavelength: shape.segmentsPerWavelength ?? DEFAULT_SEGMENTS_PER_WAVELENGTH,
    feedGapM: feedGapM(shape.frequencyHz),
    cache: new Map(),
  };
  const points = sweepFrequencies(bandHz).map(({ frequencyHz, inBand }): SweepPoint => {
    const s = solveAt(shape, frequencyHz, m.segmentsPerWavelength, m.feedGapM, m.cache);
    const gamma = abs(reflectionCoefficient(s.inputImpedanceOhm, lineImpedanceOhm));
    return {
      frequencyHz,
      inBand,
      impedanceOhm: s.inputImpedanceOhm,
      swr: swr(s.inputImpedanceOhm, lineImpedanceOhm),
      gainDbi: s.peakGainDbi,
      realizedGainDbi: s.peakGainDbi + toDb(1 - gamma * gamma),
    };
  });
  return { lineImpedanceOhm, points, swr2Span: swrSpanBelow(points, 2, shape.frequencyHz) };
}
