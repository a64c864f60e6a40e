// `design`: finds the bent-arm shape with the most gain for a frequency, wire length and number of
// pieces, and reports it like `analyze` does, plus the parameters and the optimizer's record.
import { infeasibleMessage } from "../catalog/infeasibleMessage.js";
import { SingleBar } from "cli-progress";
import { suggestMatch } from "../analysis/feedMatch.js";
import { bandSweep } from "../analysis/sweep.js";
import { designBentArm, type DesignProgress } from "../design/designBentArm.js";
import { designResult, overGroundReport, parametersReport } from "../design/designResult.js";
import { bandOf, type DesignRequest } from "../design/request.js";
import { requestFromInputs } from "../design/requestInput.js";
import type { Ground } from "../em/ground.js";
import { InputError } from "../errors.js";
import { writeFileAtomic } from "../fsAtomic.js";
import { SHAPE_BOUNDS } from "../bounds.js";
import { wavelengthM } from "../units.js";
import { summaryText } from "./analyzeCommand.js";
import { designOffCentreCommand } from "./designOffCentreCommand.js";
import { overGroundLines, reportUnsolvable, shapeFileLines, writesShape } from "./designOutput.js";
import { designText } from "./designText.js";
import { fixed } from "./format.js";
import { checkOutputFile } from "./targets.js";

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
  /** Write --out even when no shape met the limits. */
  keepInfeasible?: boolean;
  /** "centre" (default) or "off-centre" (designOffCentreCommand.ts). */
  family?: string;
  ground?: Ground;
  heightM?: number;
  mounting?: string;
  /** Vertical only: the lowest a wire point may come, metres; --height-m is then the mast top. */
  clearanceM?: number;
  objective?: string;
}

/** Exit status of a design whose search found no shape meeting every limit (README.md says so). */
export const INFEASIBLE_EXIT = 3;

/** The solver's advice names a shape-file option; design's own flags are the wire and its length. */
const forDesign = (message: string): string =>
  message.replace(/lengthen the piece or use fewer segments per wavelength/g, "use a thinner wire (--wire-diameter-mm) or a longer one (--length-wl)");

export function requestFromFlags(flags: DesignFlags): DesignRequest {
  const request = requestFromInputs({ ...flags, bandHz: flags.bandMhz });
  const lambdaM = wavelengthM(request.frequencyHz);
  if (flags.wireDiameterMm / 2000 > SHAPE_BOUNDS.radiusMaxWl * lambdaM) {
    throw new InputError(`design: --wire-diameter-mm ${flags.wireDiameterMm} is too thick for ${flags.freqMhz} MHz; the thin-wire model needs at most ${Number((2000 * SHAPE_BOUNDS.radiusMaxWl * lambdaM).toPrecision(3))} mm (${2 * SHAPE_BOUNDS.radiusMaxWl} wavelengths)`);
  }
  return request;
}

export async function designCommand(flags: DesignFlags): Promise<void> {
  const request = requestFromFlags(flags);
  if (flags.out !== undefined) await checkOutputFile("--out", flags.out); // before the search, not after it
  if (flags.family === "off-centre") return designOffCentreCommand(request, flags);
  const bar = process.stderr.isTTY && !flags.json ? new SingleBar({ format: "designing [{bar}] {value}/{total} evaluations, best {best} dBi", stream: process.stderr, hideCursor: true }) : null;
  const budget = request.maxEvaluations ?? 500 * (2 * request.piecesPerArm - 1) + 500;
  bar?.start(budget + 60 * (2 * request.piecesPerArm - 1), 0, { best: "–" });
  const onProgress = (p: DesignProgress) => bar?.update(p.evaluations, { best: p.bestGainDbi === null ? "–" : p.bestGainDbi.toFixed(2) });
  const outcome = designBentArm(request, { onProgress });
  bar?.stop();
  const feasible = outcome.status === "ok";
  if (!feasible) process.exitCode = INFEASIBLE_EXIT;
  const message = forDesign(outcome.status === "ok" ? outcome.message : infeasibleMessage(outcome, request, false, 0));
  let result;
  try {
    result = designResult(request, outcome, message);
  } catch (err) {
    if (feasible || !(err instanceof InputError)) throw err;
    return reportUnsolvable(flags, outcome, message, request.seed);
  }
  const { shape, parameters } = result;
  const written = writesShape(flags, feasible);
  if (written) await writeFileAtomic(flags.out!, `${JSON.stringify(shape, null, 2)}\n`);
  if (flags.json) {
    process.stdout.write(`${JSON.stringify(result)}\n`);
    return;
  }
  // feed advice over the band, as `analyze --band-mhz` gives it
  const bandHz = bandOf(request);
  const match = suggestMatch(bandSweep(shape, bandHz, request.lineImpedanceOhm), request.frequencyHz, result.inputImpedanceOhm);
  const lines = [
    `status: ${outcome.status} (${message}); ${outcome.evaluations} evaluations, seed ${request.seed}`,
    summaryText(shape.name, result),
    "",
    ...designText({ parameters, shape, bandHz, bandGiven: request.bandHz !== undefined, match }),
  ];
  lines.push(...overGroundLines(request, overGroundReport(request, outcome, shape)));
  if (outcome.evaluation.maxSwr !== null) lines.push(`highest SWR in the band: ${fixed(outcome.evaluation.maxSwr, 2)} re ${request.lineImpedanceOhm} Ω`);
  lines.push(...shapeFileLines(flags, written));
  process.stdout.write(`${lines.join("\n")}\n`);
}
