// How far to trust a design's numbers: segment convergence (gain and impedance change when the
// segments per wavelength double; a converged discretisation changes little, Gibson ch. 4) and the
// energy balance |∫U dΩ − P_rad| / P_rad from the solve itself.
import { DEFAULT_SEGMENTS_PER_WAVELENGTH, solveShape, type Shape, type Solution } from "../em/index.js";

export interface TrustFigures {
  segmentsPerWavelength: [number, number];
  gainChangeDb: number;
  impedanceChangeOhm: number;
  energyBalanceError: number;
}

export function trustFigures(shape: Shape, nominal: Solution): TrustFigures {
  const spw = shape.segmentsPerWavelength ?? DEFAULT_SEGMENTS_PER_WAVELENGTH;
  const fine = solveShape(shape, { segmentsPerWavelength: 2 * spw });
  return {
    segmentsPerWavelength: [spw, 2 * spw],
    gainChangeDb: fine.peakGainDbi - nominal.peakGainDbi,
    impedanceChangeOhm: Math.hypot(fine.inputImpedanceOhm.re - nominal.inputImpedanceOhm.re, fine.inputImpedanceOhm.im - nominal.inputImpedanceOhm.im),
    energyBalanceError: nominal.energyBalanceError ?? NaN,
  };
}
