// What the trade sells for a feed: current baluns by impedance ratio and the common coax for a
// quarter-wave transformer, with the figures the feed options use.
// Baluns: a current (Guanella-type) balun on ferrite, treated as an ideal transformer Z → Z/n plus a
// fixed insertion loss. 1:1 (choke), 1:4 (200 Ω), 1:6 (300 Ω) and 1:9 (450 Ω) are the ratios sold
// ready-made (common practice). Loss 0.2 dB (1:1) to 0.5 dB (1:9): typical makers' figures for
// ferrite current baluns at rated power, from memory; a well-wound part can do better.
// Coax: matched loss per 100 m at 100 MHz (typical datasheet figures, from memory), scaled as √f
// (conductor loss dominates below ~1 GHz, Pozar §2.7); velocity factor 0.66 for solid
// polyethylene, 0.84 for the air-spaced 93 Ω cable (common practice). Two equal cables in parallel
// halve the impedance and keep the per-length loss.
export interface BalunStock {
  ratio: number;
  name: string;
  lossDb: number;
}

export const BALUNS: readonly BalunStock[] = [
  { ratio: 1, name: "1:1 current balun (common-mode choke)", lossDb: 0.2 },
  { ratio: 4, name: "1:4 current balun (200 Ω to 50 Ω)", lossDb: 0.3 },
  { ratio: 6, name: "1:6 current balun (300 Ω to 50 Ω)", lossDb: 0.4 },
  { ratio: 9, name: "1:9 current balun (450 Ω to 50 Ω)", lossDb: 0.5 },
];

export const BALUN_LOSS_SOURCE = "typical makers' insertion loss for ferrite current baluns, from memory (common practice)";

export interface CoaxStock {
  impedanceOhm: number;
  name: string;
  velocityFactor: number;
  /** Matched loss in dB per 100 m at 100 MHz. */
  lossDbPer100mAt100MHz: number;
}

export const QUARTER_WAVE_COAX: readonly CoaxStock[] = [
  { impedanceOhm: 25, name: "two RG-58 (50 Ω) in parallel", velocityFactor: 0.66, lossDbPer100mAt100MHz: 16 },
  { impedanceOhm: 37.5, name: "two RG-59 (75 Ω) in parallel", velocityFactor: 0.66, lossDbPer100mAt100MHz: 11 },
  { impedanceOhm: 50, name: "RG-58 (50 Ω)", velocityFactor: 0.66, lossDbPer100mAt100MHz: 16 },
  { impedanceOhm: 75, name: "RG-59 (75 Ω)", velocityFactor: 0.66, lossDbPer100mAt100MHz: 11 },
  { impedanceOhm: 93, name: "RG-62 (93 Ω)", velocityFactor: 0.84, lossDbPer100mAt100MHz: 10 },
];

export const COAX_LOSS_SOURCE = "typical datasheet matched loss, from memory, scaled as √f";

/** Matched loss of `lengthM` of the cable at frequencyHz, in nepers (1 Np = 8.686 dB). */
export function matchedLossNp(c: CoaxStock, lengthM: number, frequencyHz: number): number {
  const db = (c.lossDbPer100mAt100MHz * Math.sqrt(frequencyHz / 100e6) * lengthM) / 100;
  return db / (20 / Math.LN10);
}

/** Build note for a centre-fed (balanced) wire. */
export const CENTRE_FEED_NOTE =
  "The wire is fed at its centre and is balanced: put a 1:1 current balun or a common-mode choke at the feed point so the coax shield does not radiate (common practice).";

/** Build note for an off-centre feed (common practice). */
export const OFF_CENTRE_FEED_NOTE =
  "The feed is off centre, so it is unbalanced: the two arms present unequal voltages and the coax shield carries common-mode current unless it is choked. Put a current choke right at the feed point with at least about 1 kΩ of common-mode impedance across the band (several turns of the coax through a ferrite ring, or a string of clamp-on ferrite beads, of a ferrite mix meant for the band), or a current balun of the ratio the feed options name; add a second choke about a quarter wave further down the coax if the shield still shows current (common practice).";
