// Assembles a catalog entry from a design outcome and its analysis, rounds it (hash.ts) and seals it
// with a content hash over its canonical JSON (everything but the hash itself).
import type { Analysis } from "../analysis/index.js";
import type { DesignOutcome } from "../design/designBentArm.js";
import { GEOMETRY_PENALTY } from "../design/objective.js";
import type { DesignRequest } from "../design/request.js";
import { SOLVER_VERSION } from "../em/index.js";
import { wavelengthM } from "../units.js";
import type { Family } from "./computeOffCentre.js";
import { shapeData } from "./entryShape.js";
import { CUT_STEP_DEG, GRID_PHI_STEP_DEG, GRID_THETA_STEP_DEG } from "../analysis/analyzeDesign.js";
import { ENTRY_SCHEMA_VERSION, type Entry } from "./entrySchema.js";
import type { CellRequest, Grid } from "./grid.js";
import { canonicalJson, roundDeep, roundSignificant, sha256 } from "./hash.js";
import type { Shape } from "../em/index.js";
import { GENERATOR_VERSION } from "./versions.js";


export interface EntryParts {
  grid: Grid;
  cell: CellRequest;
  request: DesignRequest;
  outcome: DesignOutcome;
  startedFrom: "reference" | "search";
  analysis: Analysis | null;
  inputHash: string;
  tolerance: { samples: number; bendSigmaDeg: number; lengthSigmaFraction: number };
  /** Which shape family `outcome.x` belongs to (default centre-fed). */
  family?: Family;
  /** Over-ground cells (computeGround.ts): the inputs block and the figures (null when infeasible). */
  overGround?: { inputs: NonNullable<Entry["inputs"]["overGround"]>; figures: Entry["overGround"] };
}

/**
 * The shape exactly as its entry publishes it (7 significant digits, hash.ts), which is what the
 * site's shape file holds: analysing this one makes the entry reproduce from its own download.
 */
export function publishedShapeOf(shape: Shape): Shape {
  return {
    ...shape,
    frequencyHz: roundSignificant(shape.frequencyHz),
    wireRadiusM: roundSignificant(2 * shape.wireRadiusM) / 2,
    wires: shape.wires.map((w) => ({ ...w, pointsM: w.pointsM.map((p) => p.map((c) => roundSignificant(c)) as [number, number, number]) })),
  };
}

/** A direct-feed claim checked on the published sweep: the message says when it does not hold. */
export function sweepHonestMessage(message: string, request: DesignRequest, analysis: Analysis): string {
  if (request.variant !== "direct-feed") return message;
  const worst = Math.max(...analysis.sweep.points.filter((p) => p.inBand).map((p) => p.swr));
  if (!(worst > request.swrLimit)) return message;
  const spw = request.segmentsPerWavelength ?? 25;
  return `the search kept the SWR at or below ${request.swrLimit} on its ${spw}-per-wavelength mesh, but on the published converged sweep it reaches ${worst.toFixed(2)} in the band; trim the tips or add a match network after building`;
}

const variantWords = { "max-gain": "most gain", "direct-feed": "direct 50 Ω feed" } as const;

export function entryTitle(cell: CellRequest, over?: { heightM: number; mounting: string; purpose: string }): string {
  const pieces = cell.piecesPerArm === 1 ? "1 piece" : `${cell.piecesPerArm} pieces`;
  const base = `${cell.band.name}: ${cell.lengthWl} λ wire, ${pieces} per arm, ${variantWords[cell.variant]}`;
  if (!over) return base;
  const support = over.mounting === "vertical" ? `vertical from a ${over.heightM} m mast` : `horizontal at ${over.heightM} m`;
  return `${base}, ${support}, ${over.purpose}`;
}

export function buildEntry(p: EntryParts): Entry {
  const { cell, request, outcome, analysis } = p;
  const lambdaM = wavelengthM(request.frequencyHz);
  const ok = outcome.status === "ok" && analysis !== null;
  const a = analysis!;
  const body: Omit<Entry, "contentHash"> = {
    schemaVersion: ENTRY_SCHEMA_VERSION,
    id: cell.id,
    title: entryTitle(cell, p.overGround?.inputs),
    status: ok ? "ok" : "infeasible",
    message: ok ? sweepHonestMessage(outcome.message, request, a) : outcome.message,
    inputs: {
      bandId: cell.band.id,
      bandName: cell.band.name,
      bandNote: cell.band.note,
      bandLowHz: request.bandHz![0],
      bandHighHz: request.bandHz![1],
      frequencyHz: request.frequencyHz,
      lengthWl: request.lengthWl,
      lengthM: request.lengthWl * lambdaM,
      piecesPerArm: request.piecesPerArm,
      variant: request.variant,
      wireDiameterM: request.wireDiameterM,
      conductor: cell.band.conductor,
      lineImpedanceOhm: request.lineImpedanceOhm,
      swrLimit: request.swrLimit,
      seed: request.seed,
      segmentsPerWavelength: request.segmentsPerWavelength ?? 25,
      tolerance: { samples: p.tolerance.samples, bendSigmaDeg: p.tolerance.bendSigmaDeg, lengthSigmaFraction: p.tolerance.lengthSigmaFraction },
      ...(p.overGround ? { overGround: p.overGround.inputs } : {}),
    },
    versions: { solver: SOLVER_VERSION, generator: GENERATOR_VERSION },
    inputHash: p.inputHash,
    ...(p.family === "off-centre" ? { family: "off-centre" as const } : {}),
    shape: ok ? shapeData(outcome.x, request, p.family) : null,
    figures: ok ? {
      gainDbi: a.design.gainDbi,
      directivityDbi: a.design.directivityDbi,
      radiationEfficiency: a.design.radiationEfficiency,
      inputImpedanceOhm: a.design.inputImpedanceOhm,
      swr: a.match.swrAtDesign,
      peakDirection: a.design.peakDirection,
      beamwidthAlongPhiDeg: a.pattern.beamwidthAlongPhiDeg,
      beamwidthAlongThetaDeg: a.pattern.beamwidthAlongThetaDeg,
      frontToBackDb: a.pattern.frontToBackDb,
      polarization: a.pattern.polarization,
      lobe: a.pattern.words.lobe,
      mounting: a.pattern.words.mounting,
      feedGapM: a.design.feedGapM,
      uncertainty: a.design.uncertainty,
    } : null,
    sweep: ok ? a.sweep : null,
    match: ok ? a.match : null,
    // the published verdict covers SWR as built (feed.verdict) as well as gain
    tolerance: ok ? { ...a.tolerance, fragile: a.feed ? a.feed.verdict.sensitive : a.tolerance.fragile } : null,
    pattern: ok ? {
      cutStepDeg: CUT_STEP_DEG,
      cutAlongPhiDbi: a.pattern.cutAlongPhiDbi,
      cutAlongThetaDbi: a.pattern.cutAlongThetaDbi,
      gridThetaStepDeg: GRID_THETA_STEP_DEG,
      gridPhiStepDeg: GRID_PHI_STEP_DEG,
      gridDbi: a.pattern.gridDbi,
    } : null,
    checks: ok ? { ...a.checks, warnings: a.warnings } : null,
    feed: ok && a.feed ? a.feed : null,
    ...(p.overGround ? { overGround: ok ? p.overGround.figures : null } : {}),
    optimizer: {
      evaluations: outcome.evaluations,
      searchEvaluations: outcome.searchEvaluations,
      startedFrom: p.startedFrom,
      stopReasons: outcome.stopReasons,
      // best-so-far as gain in dBi where feasible (scores below 0 are −gain)
      history: outcome.history.filter((h) => h.bestF < GEOMETRY_PENALTY).map((h) => ({ evaluations: h.evaluations, bestF: h.bestF })),
    },
  };
  return sealEntry(roundDeep(body) as Omit<Entry, "contentHash">);
}

export const contentHashOf = (body: Omit<Entry, "contentHash">): string => sha256(canonicalJson(body));

export function sealEntry(body: Omit<Entry, "contentHash">): Entry {
  return { ...body, contentHash: contentHashOf(body) } as Entry;
}
