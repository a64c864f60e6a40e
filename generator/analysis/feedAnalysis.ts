// The feed part of a design's analysis: the ranked feed options from the band sweep (feedOptions.ts),
// the bending-tolerance SWR percentiles bare and after the recommended feed (toleranceSwr.ts), the
// publishing rule on their 90th percentile, and the tolerance verdict over gain and SWR together.
// The recommendation is the best-ranked feed whose 90th percentile over the bent copies meets the
// limit across the band; only when no feed does is it the best on the nominal shape alone.
import type { Shape } from "../em/index.js";
import { CENTRE_FEED_NOTE, OFF_CENTRE_FEED_NOTE } from "./feedOptionsStock.js";
import { applyFeed, feedOptions, recommend, recommendationWords, type FeedOption, type FeedOptions } from "./feedOptions.js";
import type { Sweep } from "./sweep.js";
import type { ToleranceOptions, ToleranceStudy } from "./tolerance.js";
import { copyImpedances, swrStudyOf, toleranceFrequencies, toleranceVerdict, type ToleranceSwrStudy, type ToleranceVerdict } from "./toleranceSwr.js";

/** SWR limit a design is judged against when the caller names none (common practice for amateur gear). */
export const DEFAULT_SWR_LIMIT = 2;
/** Frequencies across the band at which the bent copies' SWR is solved (edges, quartiles, centre). */
export const DEFAULT_TOLERANCE_SWR_FREQUENCIES = 5;

/** Lengths along the fed wire from the feed to either tip (m), and whether they differ by over 1 %. */
export function feedPosition(shape: Shape): { toStartM: number; toEndM: number; offCentre: boolean } {
  const points = shape.wires[shape.feed.wire].pointsM;
  const run = (a: number, b: number) => {
    let s = 0;
    for (let i = a; i < b; i++) s += Math.hypot(points[i + 1][0] - points[i][0], points[i + 1][1] - points[i][1], points[i + 1][2] - points[i][2]);
    return s;
  };
  const toStartM = run(0, shape.feed.vertex);
  const toEndM = run(shape.feed.vertex, points.length - 1);
  return { toStartM, toEndM, offCentre: Math.abs(toStartM - toEndM) > 0.01 * (toStartM + toEndM) };
}

export interface FeedAnalysis {
  /** What to put at the feed point against common-mode current (centre or off-centre feed). */
  buildNote: string;
  /** The feed's distance from the wire's first tip, as a fraction of the fed wire. */
  feedFraction: number;
  options: FeedOptions;
  /** Realized gain after the recommended feed at the design frequency (the figure to rank by), or null. */
  realizedGainDbi: number | null;
  /** True when the recommended feed is a bought balun alone (no matching parts to build). */
  needsNoParts: boolean;
  toleranceSwr: ToleranceSwrStudy;
  verdict: ToleranceVerdict;
}

export interface FeedAnalysisOptions {
  bandHz: [number, number];
  lineImpedanceOhm: number;
  swrLimit?: number;
  toleranceSwrFrequencies?: number;
}

export function feedAnalysis(
  shape: Shape,
  sweep: Sweep,
  design: { inputImpedanceOhm: { re: number; im: number }; peakGainDbi: number },
  tolerance: ToleranceOptions,
  gainStudy: Pick<ToleranceStudy, "fragile">,
  o: FeedAnalysisOptions,
): FeedAnalysis {
  const swrLimit = o.swrLimit ?? DEFAULT_SWR_LIMIT;
  const band = sweep.points.filter((p) => p.inBand).map((p) => ({ frequencyHz: p.frequencyHz, impedanceOhm: p.impedanceOhm, gainDbi: p.gainDbi }));
  const options = feedOptions({
    design: { frequencyHz: shape.frequencyHz, impedanceOhm: design.inputImpedanceOhm, gainDbi: design.peakGainDbi },
    band,
    lineImpedanceOhm: o.lineImpedanceOhm,
    swrLimit,
  });
  // the bent copies are solved once; every feed that meets the limit nominally is then judged on them
  const copyFrequenciesHz = toleranceFrequencies(o.bandHz, o.toleranceSwrFrequencies ?? DEFAULT_TOLERANCE_SWR_FREQUENCIES);
  const copies = copyImpedances(shape, copyFrequenciesHz, { ...tolerance, nominalOhm: copyFrequenciesHz.map((f) => sweepImpedanceAt(sweep, f)) });
  const transformOf = (x: FeedOption) => (z: { re: number; im: number }, f: number) => applyFeed(x.circuit, z, f, options.partQ).impedanceOhm;
  for (const x of options.options) x.holdsAsBuilt = x.meetsLimit && swrStudyOf(copies, swrLimit, transformOf(x)).meetsLimitAsBuilt;
  // prefer the best feed that also holds as built; when none does, keep the nominal choice and say so
  const robust = recommend(options.options, (x) => x.holdsAsBuilt === true);
  if (robust !== null) {
    options.recommended = robust;
    options.verdict = recommendationWords(options.options[robust]);
  } else if (options.recommended !== null) {
    options.verdict += ` No feed keeps 9 in 10 hand-bent copies at SWR ≤ ${swrLimit} across the band: bend carefully and check the SWR after building.`;
  }
  const chosen = options.recommended === null ? null : options.options[options.recommended];
  const toleranceSwr = swrStudyOf(copies, swrLimit, chosen ? transformOf(chosen) : undefined);
  const at = feedPosition(shape);
  return {
    buildNote: at.offCentre ? OFF_CENTRE_FEED_NOTE : CENTRE_FEED_NOTE,
    feedFraction: at.toStartM / (at.toStartM + at.toEndM),
    options,
    realizedGainDbi: chosen ? chosen.realizedGainDbi : null,
    needsNoParts: chosen ? chosen.needsNoParts : false,
    toleranceSwr,
    verdict: toleranceVerdict(gainStudy, toleranceSwr),
  };
}

/** The sweep's impedance at f, linear between its neighbouring points (the sweep is dense in the band). */
export function sweepImpedanceAt(sweep: Sweep, frequencyHz: number): { re: number; im: number } {
  const p = sweep.points;
  let i = 0;
  while (i < p.length - 2 && p[i + 1].frequencyHz < frequencyHz) i++;
  const a = p[i], b = p[i + 1] ?? a;
  const t = b.frequencyHz === a.frequencyHz ? 0 : (frequencyHz - a.frequencyHz) / (b.frequencyHz - a.frequencyHz);
  return { re: a.impedanceOhm.re + t * (b.impedanceOhm.re - a.impedanceOhm.re), im: a.impedanceOhm.im + t * (b.impedanceOhm.im - a.impedanceOhm.im) };
}
