// Public surface of the optimizer package: re-exports only.

export { createRng, type Rng } from "./rng.js";
export { eigenSymmetric, type SymmetricEigen } from "./eigenSymmetric.js";
export { checkBox, clipToBox, isInBox, reflectIntoBox, type Box } from "./boxBounds.js";
export { cmaEsParameters, defaultPopulationSize, type CmaEsParameters } from "./cmaEsParameters.js";
export { cmaEsStopReasons, historyWindow, type CmaEsStopInputs } from "./cmaEsStop.js";
export {
  askCmaEs,
  createCmaEs,
  initialCmaEsState,
  tellCmaEs,
  type CmaEs,
  type CmaEsOptions,
  type CmaEsState,
} from "./cmaEs.js";
export {
  createIpop,
  minimizeIpop,
  minimizeIpopBatched,
  type Ipop,
  type IpopOptions,
  type IpopResult,
  type IpopRun,
} from "./ipop.js";
export { nelderMead, type NelderMeadOptions } from "./nelderMead.js";
export type { HistoryEntry, OptimizeResult, StopReason, StopReasonName } from "./types.js";
