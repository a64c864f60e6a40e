// Report lines both design families print: the mounting over ground, what became of --out, and the
// report of an infeasible search whose best shape the solver refuses.
import type { DesignOutcome } from "../design/designBentArm.js";
import type { DesignRequest } from "../design/request.js";
import type { overGroundReport } from "../design/designResult.js";
import { fixed } from "./format.js";

export function overGroundLines(request: DesignRequest, overGround: ReturnType<typeof overGroundReport>): string[] {
  if (!overGround) return [];
  const [lo, hi] = overGround.elevationWindowDeg;
  const lines: string[] = [];
  if (overGround.mounting === "vertical") lines.push("vertical mounting: the wire hangs in a vertical plane and the symmetry axis points straight down from the feed");
  // with a clearance the height is the mast top and the lowest point is wherever the search left it
  const lowest = request.verticalClearanceM !== undefined ? `clearance ${fixed(request.verticalClearanceM, 3)} m` : `lowest point ${fixed(request.heightM!, 3)} m`;
  lines.push(`mounting: ${overGround.mounting}, feed ${fixed(overGround.feedHeightM, 3)} m above the ground, ${lowest}; objective ${overGround.objective}: ${overGround.objectiveGainDbi === null ? "no feasible shape" : `${fixed(overGround.objectiveGainDbi, 2)} dBi`} best gain at ${lo}–${hi}° elevation`);
  return lines;
}

/** Whether --out is written: a feasible shape, or any with --keep-infeasible. */
export const writesShape = (flags: { out?: string; keepInfeasible?: boolean }, feasible: boolean): boolean =>
  flags.out !== undefined && (feasible || flags.keepInfeasible === true);

export function shapeFileLines(flags: { out?: string }, written: boolean): string[] {
  if (written) return [`shape written to ${flags.out}`];
  return flags.out !== undefined ? ["no shape file written: no shape met every limit (add --keep-infeasible to write it anyway)"] : [];
}

/** An infeasible best shape may be one the solver refuses (wires touching): the search alone. */
export function reportUnsolvable(flags: { json?: boolean; out?: string }, outcome: DesignOutcome, message: string, seed: number): void {
  if (flags.json) process.stdout.write(`${JSON.stringify({ status: outcome.status, message, evaluations: outcome.evaluations, seed, stopReasons: outcome.stopReasons })}\n`);
  else process.stdout.write(`status: ${outcome.status} (${message}); ${outcome.evaluations} evaluations, seed ${seed}\n${flags.out ? "no shape file written: the best shape found cannot be solved\n" : ""}`);
}
