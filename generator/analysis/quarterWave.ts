// Quarter-wave transformer (Pozar, Microwave Engineering, 4th ed., §2.5): a λ/4 line of
// Z_t = √(Z0·R_L) turns a real load R_L into Z0. Input impedance of a lossless line of Z_t and
// electrical length βl terminated in Z_L (Pozar eq. 2.44), written with cos/sin to avoid tan(π/2):
//   Z_in = Z_t (Z_L cos βl + jZ_t sin βl) / (Z_t cos βl + jZ_L sin βl),  βl = (π/2)·f/f0.
// Physical length = velocity factor × λ0/4, λ0 = c/f0 (velocity factor: solid polyethylene
// dielectric ≈ 0.66, foam ≈ 0.82 — common practice; the caller supplies the real cable's figure).

import { div, formatComplex, requireFiniteComplex, type Complex } from "./complex.js";
import { requirePositiveFinite } from "./complex.js";
import { swr } from "./swr.js";
import { SPEED_OF_LIGHT_M_PER_S } from "../units.js";


export interface CoaxOption {
  impedanceOhm: number;
  description: string;
}

/** Common coax impedances; paralleled pairs of one cable type halve the impedance. */
export const COMMON_COAX: readonly CoaxOption[] = [
  { impedanceOhm: 25, description: "two 50 Ω cables in parallel" },
  { impedanceOhm: 37.5, description: "two 75 Ω cables in parallel" },
  { impedanceOhm: 50, description: "50 Ω coax" },
  { impedanceOhm: 75, description: "75 Ω coax" },
  { impedanceOhm: 93, description: "93 Ω coax" },
  { impedanceOhm: 95, description: "95 Ω coax" },
];

export interface QuarterWaveDesign {
  /** √(Z0·R_L), the ideal transformer impedance. */
  idealImpedanceOhm: number;
  /** The available cable nearest in log ratio (which is also the one with the lowest SWR at f0). */
  chosen: CoaxOption;
  designFrequencyHz: number;
  velocityFactor: number;
  physicalLengthM: number;
  lineImpedanceOhm: number;
  /** SWR on the main line at f0 with the chosen cable and the full (possibly complex) load. */
  swrAtDesignFrequency: number;
}


/** Input impedance of a lossless line (lineImpedanceOhm, electricalLengthRad = βl) ending in zLoad. */
export function lineInputImpedance(
  zLoad: Complex,
  lineImpedanceOhm: number,
  electricalLengthRad: number,
): Complex {
  requireFiniteComplex("zLoad", zLoad);
  requirePositiveFinite("lineImpedanceOhm", lineImpedanceOhm);
  if (!Number.isFinite(electricalLengthRad)) {
    throw new Error(`electricalLengthRad must be finite (got ${electricalLengthRad})`);
  }
  const zt = lineImpedanceOhm;
  const c = Math.cos(electricalLengthRad);
  const s = Math.sin(electricalLengthRad);
  const numerator = { re: zLoad.re * c, im: zLoad.im * c + zt * s };
  const denominator = { re: zt * c - zLoad.im * s, im: zLoad.re * s };
  const ratio = div(numerator, denominator);
  return { re: zt * ratio.re, im: zt * ratio.im };
}

/** Input impedance at frequencyHz of a line that is a quarter wave at designFrequencyHz. */
export function quarterWaveInputImpedance(
  zLoad: Complex,
  transformerImpedanceOhm: number,
  designFrequencyHz: number,
  frequencyHz: number,
): Complex {
  requirePositiveFinite("designFrequencyHz", designFrequencyHz);
  requirePositiveFinite("frequencyHz", frequencyHz);
  return lineInputImpedance(zLoad, transformerImpedanceOhm, (Math.PI / 2) * (frequencyHz / designFrequencyHz));
}

/**
 * Quarter-wave transformer for a near-real load: uses Re(zLoad) for Z_t = √(Z0·R_L), picks the
 * nearest of `options` (default COMMON_COAX), and reports its physical length and resulting SWR.
 */
export function designQuarterWave(
  zLoad: Complex,
  lineImpedanceOhm: number,
  frequencyHz: number,
  velocityFactor: number,
  options: readonly CoaxOption[] = COMMON_COAX,
): QuarterWaveDesign {
  requireFiniteComplex("zLoad", zLoad);
  if (!(zLoad.re > 0)) throw new Error(`zLoad.re must be positive (got ${formatComplex(zLoad)})`);
  requirePositiveFinite("lineImpedanceOhm", lineImpedanceOhm);
  requirePositiveFinite("frequencyHz", frequencyHz);
  if (!(velocityFactor > 0 && velocityFactor <= 1)) {
    throw new Error(`velocityFactor must be in (0, 1] (got ${velocityFactor})`);
  }
  if (!Array.isArray(options) || options.length === 0) {
    throw new Error(`options must be a non-empty array of coax options (got ${options})`);
  }
  options.forEach((o, i) => requirePositiveFinite(`options[${i}].impedanceOhm`, o.impedanceOhm));

  const idealImpedanceOhm = Math.sqrt(lineImpedanceOhm * zLoad.re);
  let chosen = options[0];
  for (const o of options) {
    const d = Math.abs(Math.log(o.impedanceOhm / idealImpedanceOhm));
    if (d < Math.abs(Math.log(chosen.impedanceOhm / idealImpedanceOhm))) chosen = o;
  }
  const wavelengthM = SPEED_OF_LIGHT_M_PER_S / frequencyHz;
  const zIn = quarterWaveInputImpedance(zLoad, chosen.impedanceOhm, frequencyHz, frequencyHz);
  return {
    idealImpedanceOhm,
    chosen,
    designFrequencyHz: frequencyHz,
    velocityFactor,
    physicalLengthM: (velocityFactor * wavelengthM) / 4,
    lineImpedanceOhm,
    swrAtDesignFrequency: swr(zIn, lineImpedanceOhm),
  };
}
