// Feed-match suggestion for a design: when the SWR at the design frequency exceeds the threshold,
// both L-network solutions (exact values and rounded to E12, with the SWR each gives across the
// band) and, for a near-real load, a quarter-wave transformer from common coax. Always the note that
// a centre-fed wire is balanced and wants a 1:1 current balun or choke at the feed (common practice).
import { roundLNetworkToE12 } from "./e12.js";
import { designLNetworks, inputImpedanceOfMatchedLoad, type LNetwork, type MatchingComponent } from "./lNetwork.js";
import { designQuarterWave, quarterWaveInputImpedance } from "./quarterWave.js";
import { swr } from "./swr.js";
import type { Sweep } from "./sweep.js";

export const MATCH_SWR_THRESHOLD = 1.5;
export const DEFAULT_VELOCITY_FACTOR = 0.66; // solid polyethylene coax, common practice
export const BALUN_NOTE =
  "The wire is fed at its centre and is balanced: put a 1:1 current balun or a common-mode choke (ferrite or a coiled feed line) at the feed point so the coax shield does not radiate.";

export interface MatchComponent {
  kind: "inductor" | "capacitor";
  position: "series" | "shunt";
  /** Henries for inductors, farads for capacitors. */
  value: number;
}

export interface NetworkSuggestion {
  topology: string;
  components: MatchComponent[];
  e12Components: MatchComponent[];
  /** SWR with exact values and with E12 values at each in-band sweep frequency. */
  bandSwr: number[];
  bandSwrE12: number[];
}

export interface QuarterWaveSuggestion {
  idealImpedanceOhm: number;
  cableImpedanceOhm: number;
  cable: string;
  velocityFactor: number;
  physicalLengthM: number;
  bandSwr: number[];
}

export interface MatchSuggestion {
  swrAtDesign: number;
  needed: boolean;
  networks: NetworkSuggestion[];
  quarterWave: QuarterWaveSuggestion | null;
  balunNote: string;
}

const flat = (c: MatchingComponent): MatchComponent =>
  c.kind === "inductor" ? { kind: "inductor", position: c.position, value: c.inductanceH } : { kind: "capacitor", position: c.position, value: c.capacitanceF };

export function suggestMatch(sweep: Sweep, designHz: number, designImpedanceOhm: { re: number; im: number }): MatchSuggestion {
  const z0 = sweep.lineImpedanceOhm;
  const swrAtDesign = swr(designImpedanceOhm, z0);
  const inBand = sweep.points.filter((p) => p.inBand);
  const needed = swrAtDesign > MATCH_SWR_THRESHOLD;
  const result: MatchSuggestion = { swrAtDesign, needed, networks: [], quarterWave: null, balunNote: BALUN_NOTE };
  if (!needed || !(designImpedanceOhm.re > 0)) return result;
  const bandSwrOf = (net: LNetwork) => inBand.map((p) => swr(inputImpedanceOfMatchedLoad(net, p.impedanceOhm, p.frequencyHz), z0));
  result.networks = designLNetworks(designImpedanceOhm, z0, designHz).map((net) => {
    const rounded = roundLNetworkToE12(net);
    return {
      topology: net.topology,
      components: net.components.map(flat),
      e12Components: rounded.components.map(flat),
      bandSwr: bandSwrOf(net),
      bandSwrE12: bandSwrOf(rounded),
    };
  });
  // near-real load: |X| under a fifth of R
  if (Math.abs(designImpedanceOhm.im) < 0.2 * designImpedanceOhm.re) {
    const q = designQuarterWave(designImpedanceOhm, z0, designHz, DEFAULT_VELOCITY_FACTOR);
    result.quarterWave = {
      idealImpedanceOhm: q.idealImpedanceOhm,
      cableImpedanceOhm: q.chosen.impedanceOhm,
      cable: q.chosen.description,
      velocityFactor: q.velocityFactor,
      physicalLengthM: q.physicalLengthM,
      bandSwr: inBand.map((p) => swr(quarterWaveInputImpedance(p.impedanceOhm, q.chosen.impedanceOhm, designHz, p.frequencyHz), z0)),
    };
  }
  return result;
}
