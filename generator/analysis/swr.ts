// Mismatch figures of a load on a line of real characteristic impedance Z0 (Pozar, Microwave
// Engineering, 4th ed., §2.3): Γ = (Z_L − Z0)/(Z_L + Z0), SWR = (1 + |Γ|)/(1 − |Γ|),
// return loss RL = −20·log10|Γ| dB, mismatch efficiency (power delivered / available) = 1 − |Γ|².
// The SWR span is read from a sampled sweep by linear interpolation between samples.

import { abs, add, div, formatComplex, requireFiniteComplex, sub, type Complex } from "./complex.js";
import { requirePositiveFinite } from "./complex.js";


/** Γ = (Z_L − Z0)/(Z_L + Z0). */
export function reflectionCoefficient(zLoad: Complex, z0Ohm: number): Complex {
  requireFiniteComplex("zLoad", zLoad);
  requirePositiveFinite("z0Ohm", z0Ohm);
  if (zLoad.re === -z0Ohm && zLoad.im === 0) {
    throw new Error(`zLoad must not equal -z0Ohm (got ${formatComplex(zLoad)} on ${z0Ohm} Ω)`);
  }
  const z0 = { re: z0Ohm, im: 0 };
  return div(sub(zLoad, z0), add(zLoad, z0));
}

/** SWR from |Γ|: (1+|Γ|)/(1−|Γ|); Infinity when |Γ| ≥ 1 (lossless reactive or active load). */
export function swrFromReflectionMagnitude(gammaAbs: number): number {
  if (typeof gammaAbs !== "number" || Number.isNaN(gammaAbs) || gammaAbs < 0) {
    throw new Error(`gammaAbs must be a non-negative number (got ${gammaAbs})`);
  }
  if (gammaAbs >= 1) return Infinity;
  return (1 + gammaAbs) / (1 - gammaAbs);
}

/** Standing-wave ratio of zLoad on a line of z0Ohm. */
export function swr(zLoad: Complex, z0Ohm: number): number {
  return swrFromReflectionMagnitude(abs(reflectionCoefficient(zLoad, z0Ohm)));
}

/** Return loss in dB, positive for a passive mismatch; Infinity for a perfect match. */
export function returnLossDb(zLoad: Complex, z0Ohm: number): number {
  return -20 * Math.log10(abs(reflectionCoefficient(zLoad, z0Ohm)));
}

/** Fraction of available power delivered to the load, 1 − |Γ|² (negative only for active loads). */
export function mismatchEfficiency(zLoad: Complex, z0Ohm: number): number {
  const g = abs(reflectionCoefficient(zLoad, z0Ohm));
  return 1 - g * g;
}

export interface SwrSample {
  frequencyHz: number;
  swr: number;
}

export interface SwrSpan {
  lowHz: number;
  highHz: number;
  widthHz: number;
  /** True when the span runs to the first or last sample, so the true span may be wider. */
  touchesSweepEdge: boolean;
}

/**
 * Contiguous frequency span where SWR ≤ swrLimit, from a sweep sorted by ascending frequency.
 * The span chosen is the one containing `aroundHz` (default: the sample with the lowest SWR);
 * its edges are the linearly interpolated crossings of swrLimit. An infinite SWR sample puts the
 * crossing on its in-band neighbour. Returns null when that point is not within the limit.
 */
export function swrSpanBelow(
  sweep: readonly SwrSample[],
  swrLimit: number,
  aroundHz?: number,
): SwrSpan | null {
  if (!Array.isArray(sweep) || sweep.length === 0) {
    throw new Error(`sweep must be a non-empty array (got ${Array.isArray(sweep) ? "[]" : sweep})`);
  }
  if (typeof swrLimit !== "number" || !Number.isFinite(swrLimit) || swrLimit < 1) {
    throw new Error(`swrLimit must be a finite number ≥ 1 (got ${swrLimit})`);
  }
  for (let i = 0; i < sweep.length; i++) {
    const { frequencyHz, swr: s } = sweep[i];
    if (!Number.isFinite(frequencyHz)) {
      throw new Error(`sweep[${i}].frequencyHz must be finite (got ${frequencyHz})`);
    }
    if (i > 0 && !(frequencyHz > sweep[i - 1].frequencyHz)) {
      throw new Error(
        `sweep[${i}].frequencyHz must be greater than the previous sample (got ${frequencyHz} after ${sweep[i - 1].frequencyHz})`,
      );
    }
    if (typeof s !== "number" || Number.isNaN(s) || s < 1) {
      throw new Error(`sweep[${i}].swr must be a number ≥ 1 (got ${s})`);
    }
  }

  let seed = 0;
  if (aroundHz === undefined) {
    for (let i = 1; i < sweep.length; i++) if (sweep[i].swr < sweep[seed].swr) seed = i;
  } else {
    if (!Number.isFinite(aroundHz)) throw new Error(`aroundHz must be finite (got ${aroundHz})`);
    for (let i = 1; i < sweep.length; i++) {
      if (Math.abs(sweep[i].frequencyHz - aroundHz) < Math.abs(sweep[seed].frequencyHz - aroundHz)) {
        seed = i;
      }
    }
  }
  if (sweep[seed].swr > swrLimit) return null;

  let lo = seed;
  while (lo > 0 && sweep[lo - 1].swr <= swrLimit) lo--;
  let hi = seed;
  while (hi < sweep.length - 1 && sweep[hi + 1].swr <= swrLimit) hi++;

  const crossing = (inside: SwrSample, outside: SwrSample): number => {
    const t = (swrLimit - inside.swr) / (outside.swr - inside.swr); // 0 when outside.swr = ∞
    return inside.frequencyHz + t * (outside.frequencyHz - inside.frequencyHz);
  };
  const lowHz = lo > 0 ? crossing(sweep[lo], sweep[lo - 1]) : sweep[0].frequencyHz;
  const last = sweep.length - 1;
  const highHz = hi < last ? crossing(sweep[hi], sweep[hi + 1]) : sweep[last].frequencyHz;
  return { lowHz, highHz, widthHz: highHz - lowHz, touchesSweepEdge: lo === 0 || hi === last };
}
