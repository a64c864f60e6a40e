// The result of one design as `design --json` prints it and the browser designer publishes it: the
// outcome, the winning shape solved once more with the energy balance, its parameters in builder's
// units, and the optimizer's record. One function, so both front ends give the same fields.
import { solutionSummary } from "../analysis/solutionSummary.js";
import { convergedSolution, type SolveCache } from "../analysis/converged.js";
import { pieceLengthsM, unpack } from "../shapes/bentArm.js";
import { DEG_PER_RAD, SPEED_OF_LIGHT_M_PER_S } from "../units.js";
import type { DesignOutcome } from "./designBentArm.js";
import { shapeOf } from "./objective.js";
import type { DesignRequest } from "./request.js";
import { ELEVATION_WINDOWS_DEG } from "./groundObjective.js";

/** The parameters in the units a builder reads. */
export function parametersReport(x: number[], r: DesignRequest) {
  const p = unpack(x, r.piecesPerArm);
  const lengths = pieceLengthsM(p, { piecesPerArm: r.piecesPerArm, wireLengthM: (r.lengthWl * SPEED_OF_LIGHT_M_PER_S) / r.frequencyHz });
  return {
    vector: x,
    firstAngleDeg: p.firstAngleRad * DEG_PER_RAD,
    bendAnglesDeg: p.bendAnglesRad.map((b) => b * DEG_PER_RAD),
    pieceLengthsM: lengths,
  };
}

/** The shape file of the winning design, named after its request. */
export function designShape(x: number[], r: DesignRequest) {
  const mountedWords = r.ground ? `, ${r.mounting ?? "horizontal"} over ${r.ground.type} ground` : "";
  return { ...shapeOf(x, r), name: `${r.lengthWl} λ wire, ${r.piecesPerArm} ${r.piecesPerArm === 1 ? "piece" : "pieces"} per arm, ${r.variant}, ${r.frequencyHz / 1e6} MHz${mountedWords}` };
}

/** Over ground: the mounting, the objective's elevation window and gain in it, the feed height (and a vertical clearance when given). */
export function overGroundReport(request: DesignRequest, outcome: DesignOutcome, shape: ReturnType<typeof designShape>) {
  if (!request.ground) return undefined;
  const objective = request.objective ?? "peak";
  return {
    mounting: request.mounting ?? "horizontal",
    objective,
    elevationWindowDeg: ELEVATION_WINDOWS_DEG[objective],
    objectiveGainDbi: outcome.evaluation.gainDbi,
    feedHeightM: shape.wires[shape.feed.wire].pointsM[shape.feed.vertex][2],
    ...(request.verticalClearanceM !== undefined ? { verticalClearanceM: request.verticalClearanceM } : {}),
  };
}

/** `cache` may be passed on to analyzeDesign of the same shape, which then reuses these solves. */
export function designResult(request: DesignRequest, outcome: DesignOutcome, message = outcome.message, cache: SolveCache = new Map()) {
  const shape = designShape(outcome.x, request);
  // the figures converged as `analyze` reports them (the search itself runs on the starting mesh)
  const { solution, refinement } = convergedSolution(shape, {}, cache);
  const summary = solutionSummary(solution, refinement);
  return {
    status: outcome.status,
    message,
    variant: request.variant,
    ...summary,
    maxSwrInBand: outcome.evaluation.maxSwr,
    parameters: parametersReport(outcome.x, request),
    evaluations: outcome.evaluations,
    seed: request.seed,
    stopReasons: outcome.stopReasons,
    ...overGroundReport(request, outcome, shape),
    shape,
  };
}

export type DesignResult = ReturnType<typeof designResult>;
