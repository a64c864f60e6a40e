// Ways to feed a design from 50 Ω coax, each with what to buy or build, its worst in-band SWR, its
// loss and the realized gain after it, ranked by that realized gain (at the design frequency) among
// the options whose worst in-band SWR meets the limit; the recommendation is the first, unless a
// balun alone comes within NO_PARTS_PREFERENCE_DB of it. Options:
//   direct through a 1:1 current balun; a 1:4, 1:6 or 1:9 current balun (ideal transformer Z/n plus
//   its stated loss, feedOptionsStock.ts); an L-network (Pozar, Microwave Engineering, 4th ed., §5.1)
//   of practical E12 parts with finite Q (feedOptionsParts.ts), behind a 1:1 or a step-down balun;
//   a quarter-wave transformer (Pozar §2.5) of common coax behind a 1:1 balun.
// Realized gain after the feed at each frequency: G_r = G + 10·log10(1 − |Γ_in|²) + 10·log10 η_feed
// (IEEE Std 145-2013 "realized gain", with the feed's efficiency η_feed in front of the antenna).
// Quarter-wave line loss, to first order in the matched loss αl (Pozar §2.7, forward plus reflected
// power each lose 2αl): P_loss/P_load = 2αl·(1 + |Γ_t|²)/(1 − |Γ_t|²), Γ_t the load on the line's Z_t.
import { abs, type Complex } from "./complex.js";
import type { MatchComponent } from "./feedMatch.js";
import { DEFAULT_PART_Q, e12Combinations, formatPart, lossyNetworkResponse, partProblem, type PartQuality } from "./feedOptionsParts.js";
import { BALUNS, matchedLossNp, QUARTER_WAVE_COAX, type BalunStock } from "./feedOptionsStock.js";
import { designLNetworks, describeTopology, type MatchingComponent } from "./lNetwork.js";
import { quarterWaveInputImpedance } from "./quarterWave.js";
import { reflectionCoefficient, swr } from "./swr.js";
import { SPEED_OF_LIGHT_M_PER_S, toDb } from "../units.js";

/** The circuit between the coax and the feed point, enough to apply it to any impedance. */
export interface FeedCircuit {
  balunRatio: number;
  balunLossDb: number;
  /** L-network parts, load (balun side) → line. */
  network?: MatchComponent[];
  quarterWave?: { impedanceOhm: number; designFrequencyHz: number; lengthM: number; lossDbPer100mAt100MHz: number };
}

export interface FeedOption {
  kind: "balun" | "l-network" | "quarter-wave";
  /** What to buy or build, in words. */
  build: string;
  /** True when nothing but a bought balun sits between the coax and the wire. */
  needsNoParts: boolean;
  circuit: FeedCircuit;
  bandSwr: number[];
  worstSwr: number;
  meetsLimit: boolean;
  lossDb: number;
  realizedGainDbi: number;
  worstRealizedGainDbi: number;
  /** Set by feedAnalysis.ts: whether 9 in 10 bent copies keep SWR ≤ limit across the band with this feed. */
  holdsAsBuilt?: boolean;
}

export interface FeedOptions {
  swrLimit: number;
  partQ: PartQuality;
  /** Options meeting the limit first, best realized gain first; then the rest by worst SWR. */
  options: FeedOption[];
  /** Index into options of the recommended feed, or null when no practical option meets the limit. */
  recommended: number | null;
  /** Plain words: what to use, or that no practical match exists and what to do instead. */
  verdict: string;
  /** Parts rejected as impractical, one line each (e.g. a capacitor under 1 pF). */
  rejected: string[];
}

export interface FeedPoint {
  frequencyHz: number;
  impedanceOhm: Complex;
  gainDbi: number;
}

export interface FeedOptionsInput {
  /** The design frequency's figures (used for the headline realized gain and to design networks). */
  design: FeedPoint;
  /** In-band sweep points (SWR and worst realized gain are taken over these). */
  band: FeedPoint[];
  lineImpedanceOhm: number;
  swrLimit: number;
  partQ?: PartQuality;
}

/** Impedance on the coax and the feed's efficiency when `circuit` feeds zAntenna at frequencyHz. */
export function applyFeed(circuit: FeedCircuit, zAntenna: Complex, frequencyHz: number, q: PartQuality = DEFAULT_PART_Q): { impedanceOhm: Complex; efficiency: number } {
  const z1 = { re: zAntenna.re / circuit.balunRatio, im: zAntenna.im / circuit.balunRatio };
  let efficiency = 10 ** (-circuit.balunLossDb / 10);
  if (circuit.network) {
    const r = lossyNetworkResponse(circuit.network, z1, frequencyHz, q);
    return { impedanceOhm: r.inputImpedanceOhm, efficiency: efficiency * r.efficiency };
  }
  if (circuit.quarterWave) {
    const t = circuit.quarterWave;
    const g = abs(reflectionCoefficient(z1, t.impedanceOhm));
    const alphaL = matchedLossNp({ impedanceOhm: t.impedanceOhm, name: "", velocityFactor: 1, lossDbPer100mAt100MHz: t.lossDbPer100mAt100MHz }, t.lengthM, frequencyHz);
    efficiency *= 1 / (1 + (2 * alphaL * (1 + g * g)) / (1 - g * g));
    return { impedanceOhm: quarterWaveInputImpedance(z1, t.impedanceOhm, t.designFrequencyHz, frequencyHz), efficiency };
  }
  return { impedanceOhm: z1, efficiency };
}

function evaluateOption(kind: FeedOption["kind"], build: string, circuit: FeedCircuit, input: FeedOptionsInput, q: PartQuality): FeedOption {
  const z0 = input.lineImpedanceOhm;
  const realized = (p: FeedPoint) => {
    const r = applyFeed(circuit, p.impedanceOhm, p.frequencyHz, q);
    const g = abs(reflectionCoefficient(r.impedanceOhm, z0));
    const efficiency = r.efficiency > 0 && r.efficiency <= 1 ? r.efficiency : 1e-30; // a passive feed; guard against a non-physical load
    return { swr: swr(r.impedanceOhm, z0), efficiency, gainDbi: p.gainDbi + toDb(Math.max(1e-30, 1 - g * g)) + toDb(efficiency) };
  };
  const band = input.band.map(realized);
  const at = realized(input.design);
  const worstSwr = Math.max(...band.map((b) => b.swr));
  return {
    kind,
    build,
    needsNoParts: kind === "balun",
    circuit,
    bandSwr: band.map((b) => b.swr),
    worstSwr,
    meetsLimit: worstSwr <= input.swrLimit,
    lossDb: -toDb(at.efficiency),
    realizedGainDbi: at.gainDbi,
    worstRealizedGainDbi: Math.min(...band.map((b) => b.gainDbi)),
  };
}

const flat = (c: MatchingComponent): MatchComponent =>
  c.kind === "inductor" ? { kind: "inductor", position: c.position, value: c.inductanceH } : { kind: "capacitor", position: c.position, value: c.capacitanceF };

const partsWords = (parts: MatchComponent[]): string =>
  `${describeTopology(parts.map((c) => (c.kind === "inductor" ? { kind: c.kind, position: c.position, inductanceH: c.value } : { kind: c.kind, position: c.position, capacitanceF: c.value })))}: ${parts.map((c) => `${c.position} ${formatPart(c)}`).join(", ")}`;

/** L-networks (both solutions) behind one balun, E12 parts only, in-bounds parts only. */
function lNetworkOptions(balun: BalunStock, input: FeedOptionsInput, q: PartQuality, rejected: string[]): FeedOption[] {
  const z = input.design.impedanceOhm;
  const zb = { re: z.re / balun.ratio, im: z.im / balun.ratio };
  if (!(zb.re > 0)) return [];
  const out: FeedOption[] = [];
  for (const net of designLNetworks(zb, input.lineImpedanceOhm, input.design.frequencyHz)) {
    const exact = net.components.map(flat);
    if (exact.length === 0) continue;
    let best: FeedOption | null = null;
    for (const parts of e12Combinations(exact)) {
      const problems = parts.map((c) => partProblem(c)).filter((p): p is string => p !== null);
      if (problems.length) {
        rejected.push(`${net.topology} behind a ${balun.name}: ${problems.join("; ")}`);
        continue;
      }
      const build = `${balun.name} at the feed point, then an L-network toward the coax (${partsWords(parts)}; E12 values)`;
      const o = evaluateOption("l-network", build, { balunRatio: balun.ratio, balunLossDb: balun.lossDb, network: parts }, input, q);
      if (!best || o.worstSwr < best.worstSwr) best = o;
    }
    if (best) out.push(best);
  }
  return out;
}

function quarterWaveOptions(input: FeedOptionsInput, q: PartQuality): FeedOption[] {
  const z = input.design.impedanceOhm;
  if (!(z.re > 0) || Math.abs(z.im) > 0.2 * z.re) return []; // needs a near-real load
  const ideal = Math.sqrt(input.lineImpedanceOhm * z.re);
  const cable = [...QUARTER_WAVE_COAX].sort((a, b) => Math.abs(Math.log(a.impedanceOhm / ideal)) - Math.abs(Math.log(b.impedanceOhm / ideal)))[0];
  if (cable.impedanceOhm === input.lineImpedanceOhm) return []; // a 50 Ω piece transforms nothing
  const lengthM = (cable.velocityFactor * SPEED_OF_LIGHT_M_PER_S) / input.design.frequencyHz / 4;
  const balun = BALUNS[0];
  const build = `${balun.name} at the feed point, then a quarter wave of ${cable.name}, ${(lengthM * 100).toFixed(1)} cm (velocity factor ${cable.velocityFactor}), then the 50 Ω coax`;
  const circuit: FeedCircuit = {
    balunRatio: 1,
    balunLossDb: balun.lossDb,
    quarterWave: { impedanceOhm: cable.impedanceOhm, designFrequencyHz: input.design.frequencyHz, lengthM, lossDbPer100mAt100MHz: cable.lossDbPer100mAt100MHz },
  };
  return [evaluateOption("quarter-wave", build, circuit, input, q)];
}

/**
 * A balun alone is preferred over a network within this much realized gain: a network's tuning,
 * joints and weatherproofing are worth more to a builder than 0.1 dB (common practice).
 */
export const NO_PARTS_PREFERENCE_DB = 0.1;

const NO_MATCH_ADVICE =
  "No practical match exists: no balun ratio, L-network of E12 parts within the stated bounds or quarter-wave transformer keeps the SWR within the limit across the band. Use a tuner at the feed point (not at the radio), or choose another wire length, or an off-centre-fed design.";

/**
 * Index of the option to recommend among the eligible ones (options are in rank order): the best,
 * unless a balun alone comes within NO_PARTS_PREFERENCE_DB of it. Null when none is eligible.
 */
export function recommend(options: readonly FeedOption[], eligible: (o: FeedOption) => boolean): number | null {
  const ok = options.filter(eligible);
  if (ok.length === 0) return null;
  const plain = ok.find((o) => o.needsNoParts && o.realizedGainDbi >= ok[0].realizedGainDbi - NO_PARTS_PREFERENCE_DB);
  return options.indexOf(plain ?? ok[0]);
}

export const recommendationWords = (o: FeedOption): string =>
  `Recommended: ${o.build}. Worst in-band SWR ${o.worstSwr.toFixed(2)}, feed loss ${o.lossDb.toFixed(2)} dB, realized gain ${o.realizedGainDbi.toFixed(2)} dBi.`;

export function feedOptions(input: FeedOptionsInput): FeedOptions {
  const q = input.partQ ?? DEFAULT_PART_Q;
  const rejected: string[] = [];
  const all: FeedOption[] = [];
  for (const b of BALUNS) {
    const build = b.ratio === 1 ? `${b.name} at the feed point, coax straight to it` : `${b.name} at the feed point`;
    all.push(evaluateOption("balun", build, { balunRatio: b.ratio, balunLossDb: b.lossDb }, input, q));
  }
  for (const b of BALUNS) all.push(...lNetworkOptions(b, input, q, rejected));
  all.push(...quarterWaveOptions(input, q));
  const meeting = all.filter((o) => o.meetsLimit).sort((a, b) => b.realizedGainDbi - a.realizedGainDbi);
  const rest = all.filter((o) => !o.meetsLimit).sort((a, b) => a.worstSwr - b.worstSwr);
  const options = [...meeting, ...rest];
  const recommended = recommend(options, (o) => o.meetsLimit);
  const verdict = recommended === null ? NO_MATCH_ADVICE : recommendationWords(options[recommended]);
  return { swrLimit: input.swrLimit, partQ: q, options, recommended, verdict, rejected: [...new Set(rejected)] };
}
