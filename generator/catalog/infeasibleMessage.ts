// The message of a catalog cell for which no shape met every constraint, in a builder's words:
// what was asked, what the closest shape found still misses and by how much, and what to try.
// A centre-fed wire of a whole number of wavelengths has a current minimum at its feed, so its
// feed impedance is kilohms and no bending brings it near 50 Ω (common practice); 1.5 λ and 2.5 λ
// wires are fed near a current maximum, about 100–130 Ω, within reach of a balun or a bend.
import type { DesignOutcome } from "../design/designBentArm.js";
import type { DesignRequest } from "../design/request.js";
import { bandOf } from "../design/request.js";
import { lengthText } from "../lengthText.js";
import { SPEED_OF_LIGHT_M_PER_S } from "../units.js";

const mhz = (hz: number) => `${Number((hz / 1e6).toPrecision(6))} MHz`;

export function infeasibleMessage(outcome: DesignOutcome, r: DesignRequest, referenceAlsoFailed: boolean, referenceBandFraction: number): string {
  const wireM = (r.lengthWl * SPEED_OF_LIGHT_M_PER_S) / r.frequencyHz;
  const [lo, hi] = bandOf(r);
  const pieces = `${r.piecesPerArm} piece${r.piecesPerArm === 1 ? "" : "s"} per arm`;
  const asked = r.variant === "direct-feed"
    ? `Asked: a ${r.lengthWl} λ wire (${lengthText(wireM)}) with ${pieces}, fed straight from a ${r.lineImpedanceOhm} Ω line with SWR at most ${r.swrLimit} from ${mhz(lo)} to ${mhz(hi)}.`
    : `Asked: a ${r.lengthWl} λ wire (${lengthText(wireM)}) with ${pieces} for the most gain at ${mhz(r.frequencyHz)}.`;
  const { maxSwr, reasons } = outcome.evaluation;
  const misses = reasons.filter((x) => !x.startsWith("SWR reaches"));
  if (maxSwr !== null && maxSwr > r.swrLimit) {
    misses.push(`SWR reaches ${maxSwr.toFixed(2)} in the band, ${(maxSwr - r.swrLimit).toFixed(2)} above the limit ${r.swrLimit} (${(maxSwr / r.swrLimit).toFixed(1)} times it)`);
  }
  const closest = misses.length ? `The closest shape found: ${misses.join("; ")}.` : "The closest shape found misses a constraint.";
  const searched = referenceAlsoFailed
    ? ` No shape of this length and piece count met them in the general search either (done once for all bands, on a ${Number((referenceBandFraction * 100).toPrecision(3))} % wide band, and scaled to each band).`
    : "";
  const swrShort = maxSwr !== null && maxSwr > r.swrLimit;
  const whole = Math.abs(r.lengthWl - Math.round(r.lengthWl)) < 1e-9;
  const tryInstead = swrShort
    ? whole
      ? `Try instead: the most-gain design of this wire with a matching network (a centre-fed ${r.lengthWl} λ wire has a feed impedance of kilohms), or a 1.5 λ or 2.5 λ wire fed straight.`
      : `Try instead: the most-gain design of this wire with a matching network or balun, or a narrower band.`
    : `Try instead: fewer pieces per arm or another wire length.`;
  return `${asked} ${closest}${searched} ${tryInstead}`;
}
