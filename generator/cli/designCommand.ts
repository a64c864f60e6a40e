// `design`: finds the bent-arm shape with the most gain for a frequency, wire length and number of
// pieces, and reports it like `analyze` does, plus the parameters and the optimizer's record.
import { SingleBar } from "cli-progress";
import { designBentArm, type DesignProgress } from "../design/designBentArm.js";
import { designResult, overGroundReport, parametersReport } from "../design/designResult.js";
import type { DesignRequest } from "../design/request.js";
import { requestFromInputs } from "../design/requestInput.js";
import { writeFileAtomic } from "../fsAtomic.js";
import { summaryText } from "./analyzeCommand.js";
import { designOffCentreCommand } from "./designOffCentreCommand.js";
import { fixed, table } from "./format.js";
import type { Ground } from "../em/ground.js";
import { InputError } from "../errors.js";

export { parametersReport };

export interface DesignFlags {
  freqMhz?: number;
  lengthWl?: number;
  lengthM?: number;
  pieces?: number;
  wireDiameterMm: number;
  conductor: string;
  variant: string;
  bandMhz?: [number, number];
  seed: number;
  json?: boolean;
  out?: string;
  /** "centre" (default) or "off-centre" (designOffCentreCommand.ts). */
  family?: string;
  ground?: Ground;
  heightM?: number;
  mounting?: string;
  objective?: string;
}

export function requestFromFlags(flags: DesignFlags): DesignRequest {
  return requestFromInputs({ ...flags, bandHz: flags.bandMhz });
}

export async function designCommand(flags: DesignFlags): Promise<void> {
  const request = requestFromFlags(flags);
  if (flags.family === "off-centre") {
    if (request.ground) throw new InputError("design: --family off-centre is computed in free space only for now; leave out --ground and --height-m");
    return designOffCentreCommand(request, flags);
  }
  const bar = process.stderr.isTTY && !flags.json ? new SingleBar({ format: "designing [{bar}] {value}/{total} evaluations, best {best} dBi", stream: process.stderr, hideCursor: true }) : null;
  const budget = request.maxEvaluations ?? 500 * (2 * request.piecesPerArm - 1) + 500;
  bar?.start(budget + 60 * (2 * request.piecesPerArm - 1), 0, { best: "–" });
  const onProgress = (p: DesignProgress) => bar?.update(p.evaluations, { best: p.bestGainDbi === null ? "–" : p.bestGainDbi.toFixed(2) });
  const outcome = designBentArm(request, { onProgress });
  bar?.stop();
  const result = designResult(request, outcome);
  const { shape, parameters } = result;
  if (flags.out) await writeFileAtomic(flags.out, `${JSON.stringify(shape, null, 2)}\n`);
  if (flags.json) {
    process.stdout.write(`${JSON.stringify(result)}\n`);
    return;
  }
  const rows = [["piece", "length (m)", "turn before it (°)"]];
  parameters.pieceLengthsM.forEach((len, i) => {
    const turn = i === 0 ? `${fixed(parameters.firstAngleDeg, 1)} from the symmetry axis` : fixed(parameters.bendAnglesDeg[i - 1], 1);
    rows.push([String(i + 1), fixed(len, 4), turn]);
  });
  const lines = [
    `status: ${outcome.status} (${outcome.message}); ${outcome.evaluations} evaluations, seed ${request.seed}`,
    summaryText(shape.name, result),
    "",
    "right arm, from the feed outward (the left arm is its mirror image):",
    table(rows),
  ];
  const overGround = overGroundReport(request, outcome, shape);
  if (overGround) {
    const [lo, hi] = overGround.elevationWindowDeg;
    if (overGround.mounting === "vertical") lines.push("vertical mounting: the wire hangs in a vertical plane and the symmetry axis points straight down from the feed");
    lines.push(`mounting: ${overGround.mounting}, feed ${fixed(overGround.feedHeightM, 3)} m above the ground, lowest point ${fixed(request.heightM!, 3)} m; objective ${overGround.objective}: ${overGround.objectiveGainDbi === null ? "no feasible shape" : `${fixed(overGround.objectiveGainDbi, 2)} dBi`} best gain at ${lo}–${hi}° elevation`);
  }
  if (outcome.evaluation.maxSwr !== null) lines.push(`highest SWR in the band: ${fixed(outcome.evaluation.maxSwr, 2)} re ${request.lineImpedanceOhm} Ω`);
  if (flags.out) lines.push(`shape written to ${flags.out}`);
  process.stdout.write(`${lines.join("\n")}\n`);
}
