// `design`: finds the bent-arm shape with the most gain for a frequency, wire length and number of
// pieces, and reports it like `analyze` does, plus the parameters and the optimizer's record.
import { SingleBar } from "cli-progress";
import { suggestMatch } from "../analysis/feedMatch.js";
import { bandSweep } from "../analysis/sweep.js";
import { designBentArm, type DesignProgress } from "../design/designBentArm.js";
import { shapeOf } from "../design/objective.js";
import { bandOf, parseDesignRequest, type DesignRequest } from "../design/request.js";
import { solveShape } from "../em/index.js";
import { InputError } from "../errors.js";
import { writeFileAtomic } from "../fsAtomic.js";
import { pieceLengthsM, unpack } from "../shapes/bentArm.js";
import { DEG_PER_RAD } from "../units.js";
import { solutionSummary, summaryText } from "./analyzeCommand.js";
import { designText } from "./designText.js";
import { fixed } from "./format.js";

export interface DesignFlags {
  freqMhz?: number;
  lengthWl?: number;
  pieces?: number;
  wireDiameterMm: number;
  conductor: string;
  variant: string;
  bandMhz?: [number, number];
  seed: number;
  json?: boolean;
  out?: string;
}

export function requestFromFlags(flags: DesignFlags): DesignRequest {
  if (flags.freqMhz === undefined) throw new InputError("design: --freq-mhz is required");
  if (flags.lengthWl === undefined) throw new InputError("design: --length-wl is required");
  if (flags.pieces === undefined) throw new InputError("design: --pieces is required");
  const request = parseDesignRequest(
    {
      frequencyHz: flags.freqMhz * 1e6,
      lengthWl: flags.lengthWl,
      piecesPerArm: flags.pieces,
      wireDiameterM: flags.wireDiameterMm / 1000,
      conductor: flags.conductor,
      variant: flags.variant,
      bandHz: flags.bandMhz,
      seed: flags.seed,
    },
    "design",
  );
  return request;
}

/** The parameters in the units a builder reads. */
export function parametersReport(x: number[], r: DesignRequest) {
  const p = unpack(x, r.piecesPerArm);
  const lengths = pieceLengthsM(p, { piecesPerArm: r.piecesPerArm, wireLengthM: (r.lengthWl * 299_792_458) / r.frequencyHz });
  return {
    vector: x,
    firstAngleDeg: p.firstAngleRad * DEG_PER_RAD,
    bendAnglesDeg: p.bendAnglesRad.map((b) => b * DEG_PER_RAD),
    pieceLengthsM: lengths,
  };
}

export async function designCommand(flags: DesignFlags): Promise<void> {
  const request = requestFromFlags(flags);
  const bar = process.stderr.isTTY && !flags.json ? new SingleBar({ format: "designing [{bar}] {value}/{total} evaluations, best {best} dBi", stream: process.stderr, hideCursor: true }) : null;
  const budget = request.maxEvaluations ?? 500 * (2 * request.piecesPerArm - 1) + 500;
  bar?.start(budget + 60 * (2 * request.piecesPerArm - 1), 0, { best: "–" });
  const onProgress = (p: DesignProgress) => bar?.update(p.evaluations, { best: p.bestGainDbi === null ? "–" : p.bestGainDbi.toFixed(2) });
  const outcome = designBentArm(request, { onProgress });
  bar?.stop();
  const shape = { ...shapeOf(outcome.x, request), name: `${request.lengthWl} λ wire, ${request.piecesPerArm} ${request.piecesPerArm === 1 ? "piece" : "pieces"} per arm, ${request.variant}, ${request.frequencyHz / 1e6} MHz` };
  const summary = solutionSummary(solveShape(shape, { energyBalance: true }));
  const parameters = parametersReport(outcome.x, request);
  if (flags.out) await writeFileAtomic(flags.out, `${JSON.stringify(shape, null, 2)}\n`);
  const result = {
    status: outcome.status,
    message: outcome.message,
    variant: request.variant,
    ...summary,
    maxSwrInBand: outcome.evaluation.maxSwr,
    parameters,
    evaluations: outcome.evaluations,
    seed: request.seed,
    stopReasons: outcome.stopReasons,
    shape,
  };
  if (flags.json) {
    process.stdout.write(`${JSON.stringify(result)}\n`);
    return;
  }
  // feed advice over the band, as `analyze --band-mhz` gives it
  const bandHz = bandOf(request);
  const match = suggestMatch(bandSweep(shape, bandHz, request.lineImpedanceOhm), request.frequencyHz, summary.inputImpedanceOhm);
  const lines = [
    `status: ${outcome.status} (${outcome.message}); ${outcome.evaluations} evaluations, seed ${request.seed}`,
    summaryText(shape.name, summary),
    "",
    ...designText({ parameters, shape, bandHz, bandGiven: request.bandHz !== undefined, match }),
  ];
  if (outcome.evaluation.maxSwr !== null) lines.push(`highest SWR in the band: ${fixed(outcome.evaluation.maxSwr, 2)} re ${request.lineImpedanceOhm} Ω`);
  if (flags.out) lines.push(`shape written to ${flags.out}`);
  process.stdout.write(`${lines.join("\n")}\n`);
}
