// `design --family off-centre`: finds the off-centre-fed bent wire with the most gain (for
// direct-feed: within the SWR limit across the band) and reports it like `design` does, plus where
// the feed sits and the choke an unbalanced feed needs. Over ground (--ground, --height-m,
// --mounting, --objective) the shape is mounted and scored as the centre-fed family's is. No
// feasible shape: exit status 3, and --out is written only with --keep-infeasible (as `design`).
// The search is the catalog's: the centre-fed optimum, fed in the middle, starts the off-centre one.
import { designOffCentreFromCentreFed, offCentreShapeOf } from "../design/designOffCentre.js";
import type { DesignRequest } from "../design/request.js";
import { OFF_CENTRE_FEED_NOTE } from "../analysis/feedOptionsStock.js";
import { convergedSolution } from "../analysis/converged.js";
import { writeFileAtomic } from "../fsAtomic.js";
import { armLengthsM, armPieceLengthsM, unpackOffCentre } from "../shapes/offCentre.js";
import { offCentreSpecOf } from "../design/offCentreObjective.js";
import { DEG_PER_RAD } from "../units.js";
import { overGroundReport } from "../design/designResult.js";
import { InputError } from "../errors.js";
import { solutionSummary, summaryText } from "./analyzeCommand.js";
import { INFEASIBLE_EXIT } from "./designCommand.js";
import { overGroundLines, reportUnsolvable, shapeFileLines, writesShape } from "./designOutput.js";
import { fixed, table } from "./format.js";

/** The parameters in the units a builder reads. */
export function offCentreParametersReport(x: number[], r: DesignRequest) {
  const p = unpackOffCentre(x, r.piecesPerArm);
  const spec = offCentreSpecOf(r);
  const { leftM, rightM } = armLengthsM(p, spec);
  const arm = (a: typeof p.right, lengthM: number) => ({
    lengthM,
    pieceLengthsM: armPieceLengthsM(a, lengthM),
    bendAnglesDeg: a.bendAnglesRad.map((b) => b * DEG_PER_RAD),
  });
  return {
    vector: x,
    family: "off-centre" as const,
    feedFromTipM: leftM,
    feedFraction: p.feedFraction,
    apexAngleDeg: 2 * p.halfApexRad * DEG_PER_RAD,
    shortArm: arm(p.left, leftM),
    longArm: arm(p.right, rightM),
  };
}

export async function designOffCentreCommand(request: DesignRequest, flags: { json?: boolean; out?: string; keepInfeasible?: boolean }): Promise<void> {
  const outcome = designOffCentreFromCentreFed(request);
  const feasible = outcome.status === "ok";
  if (!feasible) process.exitCode = INFEASIBLE_EXIT;
  const shape = { ...offCentreShapeOf(outcome.x, request), name: `${request.lengthWl} λ wire fed off centre, ${request.piecesPerArm === 1 ? "1 piece" : `${request.piecesPerArm} pieces`} per arm, ${request.variant}, ${request.frequencyHz / 1e6} MHz` };
  // the figures converged as `analyze` reports them (the search itself runs on the starting mesh)
  let converged;
  try {
    converged = convergedSolution(shape);
  } catch (err) {
    if (feasible || !(err instanceof InputError)) throw err;
    return reportUnsolvable(flags, outcome, outcome.message, request.seed);
  }
  const summary = solutionSummary(converged.solution, converged.refinement);
  const parameters = offCentreParametersReport(outcome.x, request);
  const overGround = overGroundReport(request, outcome, shape);
  const written = writesShape(flags, feasible);
  if (written) await writeFileAtomic(flags.out!, `${JSON.stringify(shape, null, 2)}\n`);
  const result = {
    status: outcome.status,
    message: outcome.message,
    variant: request.variant,
    family: "off-centre",
    ...summary,
    maxSwrInBand: outcome.evaluation.maxSwr,
    parameters,
    buildNote: OFF_CENTRE_FEED_NOTE,
    evaluations: outcome.evaluations,
    seed: request.seed,
    stopReasons: outcome.stopReasons,
    ...overGround,
    shape,
  };
  if (flags.json) {
    process.stdout.write(`${JSON.stringify(result)}\n`);
    return;
  }
  const armRows = (name: string, a: typeof parameters.shortArm) => {
    const rows = [[`${name} arm piece`, "length (m)", "turn before it (°)"]];
    a.pieceLengthsM.forEach((len, i) => rows.push([String(i + 1), fixed(len, 4), i === 0 ? `${fixed(parameters.apexAngleDeg / 2, 1)} from the apex bisector` : fixed(a.bendAnglesDeg[i - 1], 1)]));
    return table(rows);
  };
  const lines = [
    `status: ${outcome.status} (${outcome.message}); ${outcome.evaluations} evaluations, seed ${request.seed}`,
    summaryText(shape.name, summary),
    "",
    `feed point: ${fixed(parameters.feedFromTipM, 4)} m from one tip (${fixed(parameters.feedFraction, 3)} of the wire); the arms meet there at ${fixed(parameters.apexAngleDeg, 1)}°`,
    "short arm, from the feed outward:",
    armRows("short", parameters.shortArm),
    "long arm, from the feed outward:",
    armRows("long", parameters.longArm),
  ];
  lines.push(...overGroundLines(request, overGround));
  if (outcome.evaluation.maxSwr !== null) lines.push(`highest SWR in the band: ${fixed(outcome.evaluation.maxSwr, 2)} re ${request.lineImpedanceOhm} Ω`);
  lines.push("", OFF_CENTRE_FEED_NOTE, ...shapeFileLines(flags, written));
  process.stdout.write(`${lines.join("\n")}\n`);
}
