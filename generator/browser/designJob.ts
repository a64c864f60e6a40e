// One design as the browser designer's worker runs it, start to end, with the same modules the
// command line and the catalog use: designBentArm (search + polish), designResult (the fields of
// `design --json`), analyzeDesign (sweep, feed match, tolerance, pattern), buildEntry (an entry like
// a catalog one), the catalog's renderers and download writers. No DOM, no Node: the caller passes
// `post`, which the worker wires to postMessage. The result is posted ("designed") as soon as the
// search ends; the full analysis (64 bent copies for gain and SWR, feed options) follows in "done".
// Over ground (request.ground) the search, the result and the analysis are the command line's over
// ground: the objective's elevation window judges gain, and the shape file offered is the one
// `design --out` writes (the wire as mounted, with its ground), so `analyze` on it gives the result.
import { analyzeDesign, DEFAULT_TOLERANCE, type SolveCache } from "../analysis/index.js";
import { solveAt } from "../analysis/converged.js";
import { groundCuts, groundFieldOf } from "../analysis/groundFigures.js";
import { elevationChartSvg } from "../site/overGround.js";
import { buildEntry, type EntryParts } from "../catalog/entryBuild.js";
import { overGroundFigures } from "../catalog/overGroundFigures.js";
import type { CellRequest, Grid } from "../catalog/grid.js";
import { canonicalJson, roundSignificant, sha256 } from "../catalog/hash.js";
import { designBentArm } from "../design/designBentArm.js";
import { designResult, type DesignResult } from "../design/designResult.js";
import { shapeOf } from "../design/objective.js";
import { bandOf, type DesignRequest } from "../design/request.js";
import { ELEVATION_WINDOWS_DEG, objectiveSolveOptions } from "../design/groundObjective.js";
import { groundNameOf } from "./groundName.js";
import { sha256Listing } from "../export/index.js";
import { CHECKSUM_FILE } from "../site/downloads.js";
import { patternCutSvg } from "../render/patternCutSvg.js";
import { pattern3dSvg } from "../render/pattern3dSvg.js";
import { shapeSvg } from "../render/shapeSvg.js";
import { smithSvg } from "../render/smithSvg.js";
import { sweepSvg } from "../render/sweepSvg.js";
import { downloadFiles, downloadRows, type DownloadFile, type DownloadRow } from "../site/downloads.js";
import { isOk, type Entry } from "../site/ok.js";
import { checkRows, keyFigures, matchRows, pieceRows, toleranceRows, vertexRows } from "../site/tables.js";
import { unpack, wirePointsM } from "../shapes/bentArm.js";
import { wavelengthM } from "../units.js";

export type JobMessage =
  | { type: "progress"; evaluations: number; budget: number; bestGainDbi: number | null; pointsM: number[][] | null }
  | { type: "analysing"; evaluations: number }
  /** The search's result as `design --json` gives it, sent before the slower analysis so the page can show it at once. */
  | { type: "designed"; result: DesignResult }
  | { type: "done"; result: DesignResult; entry: Entry; figures: Figures | null; tables: Tables | null; files: DownloadFile[]; rows: DownloadRow[]; takeoff: Takeoff | null }
  | { type: "error"; message: string; input: boolean };

/** Over ground: the strongest direction within the objective's elevation window, on the analysis's converged mesh. */
export interface Takeoff { elevationDeg: number; azimuthDeg: number; gainDbi: number; windowDeg: [number, number] }

export interface Figures {
  shape: string; phi: string; theta: string; sweep: string; smith: string; pattern3d: string;
  /** Over ground: gain against elevation through the takeoff azimuth, as the catalog page draws it. */
  elevation?: string;
}
export interface Tables {
  keyFigures: ReturnType<typeof keyFigures>;
  pieces: ReturnType<typeof pieceRows>;
  vertices: ReturnType<typeof vertexRows>;
  match: ReturnType<typeof matchRows>;
  tolerance: ReturnType<typeof toleranceRows>;
  checks: ReturnType<typeof checkRows>;
}

/** Evaluations the search may spend plus the polish (the same budget the CLI's progress bar shows). */
export const evaluationBudget = (r: DesignRequest): number => {
  const n = 2 * r.piecesPerArm - 1;
  return (r.maxEvaluations ?? 500 * n + 500) + 60 * n;
};

/**
 * A file-name-safe id for a custom design: custom-<MHz>mhz-<L>wl-k<K>-<variant>, and over ground
 * -<ground>-h<H>m-<mounting>-<objective>.
 */
export function customId(r: DesignRequest): string {
  const mhz = roundSignificant(r.frequencyHz / 1e6, 7);
  const free = `custom-${mhz}mhz-${roundSignificant(r.lengthWl, 6)}wl-k${r.piecesPerArm}-${r.variant}`;
  if (!r.ground) return free;
  return `${free}-${groundNameOf(r.ground)}-h${roundSignificant(r.heightM!, 6)}m-${r.mounting ?? "horizontal"}-${r.objective ?? "peak"}`;
}

const f1 = (v: number) => v.toFixed(1);

/** The lobe and mounting sentences of a design over ground. */
function groundWords(r: DesignRequest, result: DesignResult, t: Takeoff): { lobe: string; mounting: string } {
  const [lo, hi] = t.windowDeg;
  const sky = result.peakElevationDeg === undefined || result.peakAzimuthDeg === undefined
    ? ""
    : `; in the whole sky the strongest is ${f1(result.peakElevationDeg)}° up at ${f1(result.peakAzimuthDeg)}°, ${result.peakGainDbi.toFixed(2)} dBi`;
  const lobe = `Within ${lo}–${hi}° elevation the strongest direction is ${f1(t.elevationDeg)}° up at azimuth ${f1(t.azimuthDeg)}° (from +x toward +y)${sky}.`;
  const h = roundSignificant(r.heightM!, 6);
  const lowest = result.lowestPointM === undefined ? "" : `; its lowest point is ${f1(result.lowestPointM)} m above the ground`;
  const mounting = (r.mounting ?? "horizontal") !== "vertical"
    ? `The wire plane is level at ${h} m above the ground: supports at the feed, at each bend and at each tip hold it there.`
    : r.verticalClearanceM !== undefined
      ? `The wire hangs in a vertical plane from the feed at the top of a ${h} m mast, no point lower than ${roundSignificant(r.verticalClearanceM, 6)} m${lowest}.`
      : `The wire hangs in a vertical plane from the feed at the top, ${f1(result.feedHeightM ?? h)} m up; its lowest point is ${h} m above the ground.`;
  return { lobe, mounting };
}

/** The sentence a custom entry carries as its band note. */
function noteOf(r: DesignRequest): string {
  if (!r.ground) return "Designed in the browser for the values in the form.";
  const h = roundSignificant(r.heightM!, 6);
  const support = (r.mounting ?? "horizontal") !== "vertical"
    ? `horizontal at ${h} m`
    : r.verticalClearanceM !== undefined ? `vertical from a ${h} m mast top, clearance ${roundSignificant(r.verticalClearanceM, 6)} m` : `vertical, lowest point ${h} m up`;
  return `Designed in the browser for the values in the form, over ${groundNameOf(r.ground)} ground, ${support}, objective ${r.objective ?? "peak"}.`;
}

/** The height curve of a custom design: its support height this far lower and higher (the catalog grid's offsets). */
export const CUSTOM_HEIGHT_OFFSETS_M = [-3, 3] as const;
/** The grounds a custom design is compared over (its own left out). */
export const CUSTOM_OTHER_GROUNDS = ["poor", "average", "good"] as const;

/**
 * The entry's over-ground inputs and block, as a catalog cell over ground carries them. heightM is
 * the support height in the catalog's sense: the wire plane, or for a vertical design the feed at the
 * mast top (with no clearance given, where the search put the feed above the lowest point). The
 * height curve keeps to heights the request itself allows (above 5 wire diameters, above the
 * clearance); figures are null when no shape met the limits.
 */
function customOverGround(r: DesignRequest, result: DesignResult, x: number[], analysed: ReturnType<typeof analyzeDesign> | null): EntryParts["overGround"] {
  const objective = r.objective ?? "peak";
  const mounting = r.mounting ?? "horizontal";
  const groundName = groundNameOf(r.ground!);
  const supportM = mounting === "vertical" && r.verticalClearanceM === undefined ? result.feedHeightM ?? r.heightM! : r.heightM!;
  const inputs = {
    groundName,
    ground: r.ground!,
    heightM: roundSignificant(supportM, 7),
    mounting,
    purpose: objective,
    elevationWindowDeg: r.elevationWindowDeg ?? ELEVATION_WINDOWS_DEG[objective],
    ...(r.verticalClearanceM !== undefined ? { verticalClearanceM: r.verticalClearanceM } : {}),
  };
  if (!analysed) return { inputs, figures: null };
  const heightsM = CUSTOM_HEIGHT_OFFSETS_M.map((d) => r.heightM! + d).filter((h) => h >= 5 * r.wireDiameterM && (r.verticalClearanceM === undefined || h > r.verticalClearanceM));
  const figures = overGroundFigures(x, r, shapeOf(x, r), analysed, { groundName, heightsM, otherGroundNames: CUSTOM_OTHER_GROUNDS });
  return { inputs, figures };
}

/** The catalog cell a custom design stands in (a band of its own, named by its edges). */
function cellOf(r: DesignRequest, band: [number, number]): CellRequest {
  const conductor = typeof r.conductor === "string" ? r.conductor : "copper";
  const [lo, hi] = band.map((v) => roundSignificant(v / 1e6, 7));
  return {
    id: customId(r),
    band: { id: "custom", name: `Custom ${lo}–${hi} MHz`, lowMhz: lo, highMhz: hi, designMhz: r.frequencyHz / 1e6, wireDiameterMm: r.wireDiameterM * 1000, conductor, note: noteOf(r) },
    lengthWl: r.lengthWl,
    piecesPerArm: r.piecesPerArm,
    variant: r.variant,
  };
}

/** Wire points (m) of a parameter vector, for the live drawing. */
export function pointsOf(x: number[], r: DesignRequest): number[][] {
  return wirePointsM(unpack(x, r.piecesPerArm), { piecesPerArm: r.piecesPerArm, wireLengthM: r.lengthWl * wavelengthM(r.frequencyHz) });
}

export async function runDesignJob(request: DesignRequest, post: (m: JobMessage) => void, opts: { progressEveryMs?: number; now?: () => number } = {}): Promise<void> {
  const budget = evaluationBudget(request);
  const now = opts.now ?? (() => Date.now());
  const every = opts.progressEveryMs ?? 100;
  let last = -Infinity;
  let lastBest: number | null = null;
  const outcome = designBentArm(request, {
    onProgress: (p) => {
      // a new best is always shown; otherwise a few updates a second are enough
      if (p.bestGainDbi === lastBest && now() - last < every) return;
      last = now();
      lastBest = p.bestGainDbi;
      post({ type: "progress", evaluations: p.evaluations, budget, bestGainDbi: p.bestGainDbi, pointsM: p.bestX ? pointsOf(p.bestX, request) : null });
    },
  });
  post({ type: "analysing", evaluations: outcome.evaluations });
  // one solve cache for the result's mesh ladder and the analysis's (same shape, same keys): the
  // design-frequency solves are made once
  const cache: SolveCache = new Map();
  const result = designResult(request, outcome, outcome.message, cache);
  post({ type: "designed", result });
  const band = bandOf(request);
  const tolerance = { samples: DEFAULT_TOLERANCE.samples, bendSigmaDeg: DEFAULT_TOLERANCE.bendSigmaDeg, lengthSigmaFraction: DEFAULT_TOLERANCE.lengthSigmaFraction, seed: request.seed };
  // over ground the objective's window, as the search judged gain (none for peak, none in free space)
  const window = objectiveSolveOptions(request).elevationWindowDeg;
  const analysed = outcome.status === "ok"
    ? analyzeDesign(shapeOf(outcome.x, request), { bandHz: band, lineImpedanceOhm: request.lineImpedanceOhm, tolerance, ...(window ? { elevationWindowDeg: window } : {}) }, cache)
    : null;
  const takeoff: Takeoff | null = request.ground && analysed ? {
    elevationDeg: 90 - analysed.design.peakDirection.thetaDeg,
    azimuthDeg: analysed.design.peakDirection.phiDeg,
    gainDbi: analysed.design.gainDbi,
    windowDeg: window ?? [0, 90],
  } : null;
  // over ground the mounting is given, so the free-space advice on turning the plane gives way to
  // words about the lobe over the ground and the supports
  const analysis = analysed && takeoff ? { ...analysed, pattern: { ...analysed.pattern, words: groundWords(request, result, takeoff) } } : analysed;
  const entry = buildEntry({
    grid: {} as Grid, // buildEntry reads nothing from the grid; a custom design has none
    cell: cellOf(request, band),
    request: { ...request, bandHz: band },
    outcome,
    startedFrom: "search",
    analysis,
    inputHash: sha256(canonicalJson(request)),
    tolerance,
    ...(request.ground ? { overGround: customOverGround(request, result, outcome.x, analysed) } : {}),
  });
  const ok = isOk(entry) ? entry : null;
  const figures: Figures | null = ok && {
    shape: shapeSvg(ok, { widthPx: 800, dimensions: true }), // as the catalog page (site/figures.ts SHAPE_WIDTH_PX)
    phi: patternCutSvg(ok, "phi"),
    theta: patternCutSvg(ok, "theta"),
    sweep: sweepSvg(ok),
    smith: smithSvg(ok),
    pattern3d: pattern3dSvg(ok),
    ...(takeoff && analysed ? { elevation: elevationSvg(shapeOf(outcome.x, request), analysed.design, takeoff, result, cache) } : {}),
  };
  const tables: Tables | null = ok && {
    keyFigures: keyFigures(ok), pieces: pieceRows(ok), vertices: vertexRows(ok), match: matchRows(ok), tolerance: toleranceRows(ok), checks: checkRows(ok),
  };
  const files = groundShapeFile(await downloadFiles(entry, new Map(), { pdf: false }), request, result); // the 1:1 SVG sheets; no PDF in the worker
  post({ type: "done", result, entry, figures, tables, files, rows: downloadRows(files), takeoff });
}

/**
 * Over ground the shape file is the one `design --out` writes (the result's shape: mounted, with its
 * ground), and the checksum list is made again over the files; in free space the files stay as made.
 */
export function groundShapeFile(files: DownloadFile[], request: DesignRequest, result: DesignResult): DownloadFile[] {
  if (!request.ground || !files.some((f) => f.group === "shape")) return files;
  const swapped = files
    .filter((f) => f.name !== CHECKSUM_FILE)
    .map((f) => (f.group === "shape" ? { ...f, label: "shape file over ground (loads into bentwire analyze)", content: `${JSON.stringify(result.shape, null, 2)}\n` } : f));
  const sums = files.find((f) => f.name === CHECKSUM_FILE)!;
  return [...swapped, { ...sums, content: sha256Listing(swapped.map((f) => ({ name: f.name, content: f.content }))) }];
}

/**
 * Over ground: the elevation cut through the takeoff azimuth (analysis/groundFigures.ts, 1° steps from
 * the horizon over the zenith to the far horizon) on the analysis's converged mesh — the solve is
 * already in the cache — drawn as the catalog's design page draws it (site/overGround.ts).
 */
function elevationSvg(shape: ReturnType<typeof shapeOf>, design: { uncertainty: { segmentsPerWavelength: number }; feedGapM: number }, t: Takeoff, r: DesignResult, cache: SolveCache): string {
  const s = solveAt(shape, shape.frequencyHz, design.uncertainty.segmentsPerWavelength, design.feedGapM, cache, t.windowDeg);
  const cut = groundCuts(groundFieldOf(shape, s), s.inputPowerW, t).elevationCut;
  return elevationChartSvg({
    series: [{ label: "Your design", gainDbi: cut.gainDbi, stepDeg: cut.stepDeg }],
    title: `Gain against elevation, azimuth ${roundSignificant(cut.azimuthDeg, 3)}°`,
    windowDeg: t.windowDeg,
    marksDeg: (r.gainAtElevationDbi ?? []).map((p) => p.elevationDeg),
    takeoff: { elevationDeg: t.elevationDeg, gainDbi: t.gainDbi },
    standalone: true, // the page shows it as an image, out of reach of the site's stylesheet
  });
}
