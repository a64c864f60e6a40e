// SWR that holds as built: the bending-tolerance Monte Carlo of tolerance.ts (the same seeded
// copies, from the same perturbShape and seed) solved for the feed impedance at several frequencies
// across the band, reported bare and after the chosen feed as the 50th, 90th and 95th percentiles
// per frequency (Hyndman & Fan 1996 definition 7, as in tolerance.ts).
// The publishing rule: a design is published as meeting SWR ≤ limit only when the 90th percentile
// of its copies meets the limit at every checked frequency of the band (so at most one hand-built
// copy in ten exceeds it anywhere in the band). The verdict joins that with the gain verdict.
import { DEFAULT_SEGMENTS_PER_WAVELENGTH, feedGapM, solveFeed, type Shape } from "../em/index.js";
import { InputError } from "../errors.js";
import { createRng } from "../optimize/rng.js";
import type { Complex } from "./complex.js";
import { swr } from "./swr.js";
import { perturbShape, percentile, type ToleranceOptions, type ToleranceStudy } from "./tolerance.js";

export const AS_BUILT_PERCENTILE = 0.9;

export interface SwrPercentiles {
  p50: number;
  p90: number;
  p95: number;
}

export interface SwrAtFrequency {
  frequencyHz: number;
  bare: SwrPercentiles;
  /** After the chosen feed; absent when no feed was given. */
  afterFeed?: SwrPercentiles;
}

export interface ToleranceSwrStudy {
  samples: number;
  failedSamples: number;
  seed: number;
  swrLimit: number;
  perFrequency: SwrAtFrequency[];
  /** The rule: the 90th percentile (after the feed when given) meets the limit at every frequency. */
  meetsLimitAsBuilt: boolean;
}

/** Maps an antenna impedance at a frequency to the impedance on the coax (the chosen feed). */
export type FeedTransform = (zAntenna: Complex, frequencyHz: number) => Complex;

const swrPercentiles = (values: number[]): SwrPercentiles => {
  const s = [...values].sort((a, b) => a - b);
  return { p50: percentile(s, 0.5), p90: percentile(s, AS_BUILT_PERCENTILE), p95: percentile(s, 0.95) };
};

/** The publishing rule on per-frequency 90th percentiles: every one at or under the limit. */
export function meetsSwrAsBuilt(p90PerFrequency: readonly number[], swrLimit: number): boolean {
  if (p90PerFrequency.length === 0) return false;
  return p90PerFrequency.every((v) => v <= swrLimit); // NaN or Infinity fails
}

/** `count` frequencies evenly from the band's low to its high edge. */
export function toleranceFrequencies(bandHz: [number, number], count: number): number[] {
  if (!(Number.isInteger(count) && count >= 2)) throw new InputError(`tolerance: SWR frequencies must be a whole number of 2 or more (got ${count})`);
  return Array.from({ length: count }, (_, i) => bandHz[0] + ((bandHz[1] - bandHz[0]) * i) / (count - 1));
}

/** Feed impedances of the seeded bent copies at each frequency: impedances[copy][frequency]. */
export interface CopyImpedances {
  frequenciesHz: number[];
  impedances: Complex[][];
  samples: number;
  failedSamples: number;
  seed: number;
  lineImpedanceOhm: number;
}

export function copyImpedances(shape: Shape, frequenciesHz: readonly number[], options: ToleranceOptions & { nominalOhm?: readonly Complex[] }): CopyImpedances {
  if (!(Number.isInteger(options.samples) && options.samples > 0)) {
    throw new InputError(`tolerance: samples must be a whole number above 0 (got ${options.samples})`);
  }
  const rng = createRng(options.seed);
  // the mesh stays the one of the design frequency, as in the band sweep (sweep.ts), and so does the
  // feed gap in metres (em/feedSource.ts)
  const spw0 = shape.segmentsPerWavelength ?? DEFAULT_SEGMENTS_PER_WAVELENGTH;
  const gapM = feedGapM(shape.frequencyHz);
  const solveAt = (s: Shape, f: number) => solveFeed({ ...s, frequencyHz: f }, { segmentsPerWavelength: (spw0 * shape.frequencyHz) / f, feedGapM: gapM }).inputImpedanceOhm;
  // each copy's impedance moves by the nominal's own mesh correction (converged − starting mesh), so
  // the copies scatter around the published sweep rather than around the coarser mesh's figures
  const shift = options.nominalOhm
    ? frequenciesHz.map((f, k) => { const z = solveAt(shape, f); return { re: options.nominalOhm![k].re - z.re, im: options.nominalOhm![k].im - z.im }; })
    : frequenciesHz.map(() => ({ re: 0, im: 0 }));
  const impedances: Complex[][] = [];
  let failed = 0;
  for (let i = 0; i < options.samples; i++) {
    const copy = perturbShape(shape, rng, options);
    try {
      // solve every frequency first so a failed copy adds nothing
      impedances.push(frequenciesHz.map((f, k) => { const z = solveAt(copy, f); return { re: z.re + shift[k].re, im: z.im + shift[k].im }; }));
    } catch (err) {
      if (!(err instanceof InputError)) throw err;
      failed++; // the bent copy touched itself: counted, not solved
    }
  }
  return { frequenciesHz: [...frequenciesHz], impedances, samples: options.samples, failedSamples: failed, seed: options.seed, lineImpedanceOhm: options.lineImpedanceOhm };
}

/** The per-frequency SWR percentiles of solved copies, bare and (when given) after a feed, and the rule. */
export function swrStudyOf(c: CopyImpedances, swrLimit: number, feed?: FeedTransform): ToleranceSwrStudy {
  const none: SwrPercentiles = { p50: NaN, p90: NaN, p95: NaN };
  const of = (values: number[]) => (values.length ? swrPercentiles(values) : none);
  const perFrequency = c.frequenciesHz.map((frequencyHz, k): SwrAtFrequency => {
    const row: SwrAtFrequency = { frequencyHz, bare: of(c.impedances.map((z) => swr(z[k], c.lineImpedanceOhm))) };
    if (feed) row.afterFeed = of(c.impedances.map((z) => swr(feed(z[k], frequencyHz), c.lineImpedanceOhm)));
    return row;
  });
  const judged = perFrequency.map((r) => (r.afterFeed ?? r.bare).p90);
  return { samples: c.samples, failedSamples: c.failedSamples, seed: c.seed, swrLimit, perFrequency, meetsLimitAsBuilt: meetsSwrAsBuilt(judged, swrLimit) };
}

export function toleranceSwrStudy(
  shape: Shape,
  frequenciesHz: readonly number[],
  options: ToleranceOptions,
  swrLimit: number,
  feed?: FeedTransform,
): ToleranceSwrStudy {
  return swrStudyOf(copyImpedances(shape, frequenciesHz, options), swrLimit, feed);
}

export interface ToleranceVerdict {
  /** True when either the gain or the SWR does not hold up as built. */
  sensitive: boolean;
  words: string;
}

/** Joins the gain verdict (tolerance.ts) with the SWR rule. */
export function toleranceVerdict(gain: Pick<ToleranceStudy, "fragile">, swrStudy: ToleranceSwrStudy): ToleranceVerdict {
  const swrHolds = swrStudy.meetsLimitAsBuilt;
  const judged = swrStudy.perFrequency.map((r) => (r.afterFeed ?? r.bare).p90);
  const worst = Math.max(...judged.map((v) => (Number.isNaN(v) ? Infinity : v)));
  const where = swrStudy.perFrequency.some((r) => r.afterFeed) ? "after the recommended feed" : "with no matching";
  const swrWords = swrHolds
    ? `SWR holds: 9 in 10 bent copies stay at or under ${swrStudy.swrLimit} across the band ${where} (worst 90th percentile ${worst.toFixed(2)})`
    : `SWR does not hold as built: the 90th percentile of the bent copies reaches ${Number.isFinite(worst) ? worst.toFixed(2) : "no finite value"} ${where}, above ${swrStudy.swrLimit}; bend carefully and check the SWR after building`;
  const gainWords = gain.fragile ? "gain is sensitive to bending errors" : "gain is forgiving of ordinary bending errors";
  return { sensitive: gain.fragile || !swrHolds, words: `${gainWords}; ${swrWords}` };
}
