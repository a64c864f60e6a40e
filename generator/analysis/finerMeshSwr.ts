// The finer-mesh SWR check (issue 10): a design published as meeting SWR ≤ limit (the as-built rule
// of toleranceSwr.ts) must still meet it, nominally and after its recommended feed, when the feed
// impedance is solved on twice the published (converged) mesh density. The feed circuit is applied
// as in feedOptions.ts (applyFeed) and SWR = (1 + |Γ|)/(1 − |Γ|), Γ = (Z − Z0)/(Z + Z0) (Pozar,
// Microwave Engineering, 4th ed., §2.3). Twice the density is capped where segments would fall under
// 4 wire radii (the thin-wire limit of em/geometryChecks.ts; Gibson, The Method of Moments in
// Electromagnetics, ch. 4) or the mesh would pass the bound on unknowns (bounds.ts); a capped check
// says so, and one with no room above the published mesh is not run ("noFinerMesh"). A finer mesh
// the solver refuses (short segments at a tight bend that come within the wire's diameter) fails the
// check with the solver's words ("refused").
// Frequencies: the band edges, the design frequency and the in-band point where the published SWR
// after the feed is worst (the sweep's edges and worst point decide the in-band maximum).
import { feedGapM, solveFeed, type Shape } from "../em/index.js";
import { InputError } from "../errors.js";
import type { Complex } from "./complex.js";
import { meshCeiling } from "./converged.js";
import { applyFeed, type FeedCircuit } from "./feedOptions.js";
import type { PartQuality } from "./feedOptionsParts.js";
import { swr } from "./swr.js";

/** Slack for the 7-significant-digit rounding of the entries' figures. */
const SLACK = 1e-6;

export interface FinerMeshSwrInput {
  /** The published (converged) mesh at the design frequency, segments per wavelength. */
  publishedSegmentsPerWavelength: number;
  bandHz: [number, number];
  /** In-band points as published: frequency and SWR after the recommended feed. */
  publishedBand: { frequencyHz: number; swr: number }[];
  circuit: FeedCircuit;
  partQ: PartQuality;
  lineImpedanceOhm: number;
  swrLimit: number;
}

export interface FinerMeshSwrCheck {
  segmentsPerWavelength: number;
  /** True when twice the published density did not fit the thin-wire or size cap. */
  capped: boolean;
  /** True when not even a mesh above the published one fits: nothing was solved. */
  noFinerMesh: boolean;
  /** The solver's refusal of the finer mesh (segments of a tight bend that touch), when it refused. */
  refused?: string;
  frequenciesHz: number[];
  impedancesOhm: Complex[];
  /** SWR after the recommended feed at each frequency, on the finer mesh. */
  swr: number[];
  worstSwr: number;
  ok: boolean;
}

/** The frequencies checked: band edges, design frequency, worst published in-band point (sorted, distinct). */
export function checkFrequencies(designHz: number, input: Pick<FinerMeshSwrInput, "bandHz" | "publishedBand">): number[] {
  const worst = input.publishedBand.reduce((a, p) => (p.swr > a.swr ? p : a), { frequencyHz: designHz, swr: -Infinity });
  return [...new Set([input.bandHz[0], designHz, worst.frequencyHz, input.bandHz[1]])].sort((a, b) => a - b);
}

export function checkSwrOnFinerMesh(shape: Shape, input: FinerMeshSwrInput): FinerMeshSwrCheck {
  const wanted = 2 * input.publishedSegmentsPerWavelength;
  const ceiling = Math.floor(meshCeiling(shape));
  const spw = Math.min(wanted, ceiling);
  const frequenciesHz = checkFrequencies(shape.frequencyHz, input);
  if (spw <= input.publishedSegmentsPerWavelength) {
    return { segmentsPerWavelength: spw, capped: true, noFinerMesh: true, frequenciesHz, impedancesOhm: [], swr: [], worstSwr: NaN, ok: true };
  }
  const gapM = feedGapM(shape.frequencyHz); // the mesh and the gap stay those of the design frequency, as in the sweep
  let impedancesOhm: Complex[];
  try {
    impedancesOhm = frequenciesHz.map((f) => solveFeed({ ...shape, frequencyHz: f }, { segmentsPerWavelength: (spw * shape.frequencyHz) / f, feedGapM: gapM }).inputImpedanceOhm);
  } catch (err) {
    if (!(err instanceof InputError)) throw err;
    return { segmentsPerWavelength: spw, capped: spw < wanted, noFinerMesh: false, refused: err.message, frequenciesHz, impedancesOhm: [], swr: [], worstSwr: NaN, ok: false };
  }
  const values = impedancesOhm.map((z, i) => swr(applyFeed(input.circuit, z, frequenciesHz[i], input.partQ).impedanceOhm, input.lineImpedanceOhm));
  const worstSwr = Math.max(...values);
  return {
    segmentsPerWavelength: spw,
    capped: spw < wanted,
    noFinerMesh: false,
    frequenciesHz,
    impedancesOhm,
    swr: values,
    worstSwr,
    ok: Number.isFinite(worstSwr) && worstSwr <= input.swrLimit * (1 + SLACK),
  };
}
