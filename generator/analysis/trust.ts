// How far to trust a design's numbers: segment convergence (gain and impedance change between the
// published mesh and the one it was compared with, converged.ts; a converged discretisation changes
// little, Gibson ch. 4) and the energy balance |∫U dΩ − P_rad| / P_rad from the solve itself.
import type { Solution } from "../em/index.js";
import type { Refinement } from "./converged.js";

export interface TrustFigures {
  /** [published, compared with]. */
  segmentsPerWavelength: [number, number];
  gainChangeDb: number;
  impedanceChangeOhm: number;
  energyBalanceError: number;
}

export function trustFigures(refinement: Refinement, nominal: Solution): TrustFigures {
  return {
    segmentsPerWavelength: [refinement.segmentsPerWavelength, refinement.comparedWithSegmentsPerWavelength],
    gainChangeDb: refinement.change.gainDb, // finer minus coarser mesh

    impedanceChangeOhm: refinement.change.impedanceOhm,
    energyBalanceError: nominal.energyBalanceError ?? NaN,
  };
}
