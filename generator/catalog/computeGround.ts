// Computes an over-ground catalog entry (issue 13). Over ground a shape does not scale with the
// wavelength (the height in metres, the ground's permittivity per frequency), so every cell runs its
// own search (designBentArm with the request's ground, support height, mounting and elevation
// window), then the analysis over ground (analyzeDesign with the window: sweep, feed options at that
// height, tolerance), and the over-ground block: the mounted points, takeoff, planning elevations,
// elevation and azimuth cuts, ground loss, the height curve, the other grounds and the free-space
// figure. Pure: same inputs, same bytes.
import { analyzeDesign, type Analysis } from "../analysis/index.js";
import { designBentArm, type DesignOutcome } from "../design/designBentArm.js";
import { shapeOf } from "../design/objective.js";
import { parseDesignRequest, type DesignRequest } from "../design/request.js";
import { groundByName } from "../em/ground.js";
import { SOLVER_VERSION, type Shape } from "../em/index.js";
import { buildEntry, publishedShapeOf } from "./entryBuild.js";
import type { Entry } from "./entrySchema.js";
import type { Grid } from "./grid.js";
import { heightCurveHeightsM, type GroundCellRequest, type OverGroundGrid } from "./gridHf.js";
import { canonicalJson, sha256 } from "./hash.js";
import { overGroundFigures } from "./overGroundFigures.js";
import { GENERATOR_VERSION } from "./versions.js";

export function groundRequest(grid: Grid, cell: GroundCellRequest, over: { heightM?: number; groundName?: string } = {}): DesignRequest {
  const o = grid.overGround!;
  return parseDesignRequest({
    frequencyHz: cell.band.designMhz * 1e6,
    lengthWl: cell.lengthWl,
    piecesPerArm: cell.piecesPerArm,
    wireDiameterM: cell.band.wireDiameterMm / 1000,
    conductor: cell.band.conductor,
    variant: cell.variant,
    bandHz: [cell.band.lowMhz * 1e6, cell.band.highMhz * 1e6],
    lineImpedanceOhm: grid.lineImpedanceOhm,
    swrLimit: grid.swrLimit,
    seed: grid.seed,
    segmentsPerWavelength: grid.segmentsPerWavelength,
    ground: groundByName(over.groundName ?? cell.groundName, "overGround.ground"),
    heightM: over.heightM ?? cell.heightM,
    mounting: cell.mounting,
    elevationWindowDeg: cell.elevationWindowDeg,
    ...(cell.mounting === "vertical" ? { verticalClearanceM: o.verticalClearanceM } : {}),
  }, cell.id);
}

export function groundEntryInputHash(grid: Grid, cell: GroundCellRequest): string {
  const o = grid.overGround!;
  return sha256(canonicalJson({
    request: groundRequest(grid, cell),
    band: cell.band,
    tolerance: grid.tolerance,
    heightCurveM: heightCurveHeightsM(o, cell),
    otherGrounds: o.otherGrounds,
    versions: { solver: SOLVER_VERSION, generator: GENERATOR_VERSION },
  }));
}

type OverGroundBlock = NonNullable<Entry["overGround"]>;

/** The over-ground block of a catalog cell: its height curve and other grounds from the grid. */
export function overGroundBlock(grid: Grid, cell: GroundCellRequest, x: number[], request: DesignRequest, shape: Shape, a: Analysis): OverGroundBlock {
  const o: OverGroundGrid = grid.overGround!;
  return overGroundFigures(x, request, shape, a, { groundName: cell.groundName, heightsM: heightCurveHeightsM(o, cell), otherGroundNames: o.otherGrounds });
}

const f1 = (v: number) => v.toFixed(1);

/** The lobe and mounting sentences over ground (the free-space ones speak of turning the plane). */
export function groundWords(cell: GroundCellRequest, g: OverGroundBlock): { lobe: string; mounting: string } {
  const [lo, hi] = cell.elevationWindowDeg;
  const lobe = `Within the ${cell.purpose} window (${lo}–${hi}° elevation) the strongest direction is ${f1(g.takeoffElevationDeg)}° up at azimuth ${f1(g.takeoffAzimuthDeg)}° (from +x toward +y); the strongest in the whole sky is ${f1(g.peakElevationDeg)}° up at ${f1(g.peakAzimuthDeg)}°, ${f1(g.peakGainDbi)} dBi.`;
  const mounting = cell.mounting === "vertical"
    ? `Feed at the top of a ${cell.heightM} m mast, the wire in a vertical plane sloping down to tie-offs; its lowest point is ${f1(g.lowestPointM)} m above the ground.`
    : `Wire plane level at ${cell.heightM} m: masts or trees at the feed and at each bend and tip hold it at that height.`;
  return { lobe, mounting };
}

export function computeGroundEntry(grid: Grid, cell: GroundCellRequest): Entry {
  const request = groundRequest(grid, cell);
  const outcome: DesignOutcome = designBentArm(request);
  const tolerance = { samples: grid.tolerance.samples, bendSigmaDeg: grid.tolerance.bendSigmaDeg, lengthSigmaFraction: grid.tolerance.lengthSigmaPercent / 100, seed: grid.seed };
  let analysis: Analysis | null = null;
  let overGround: OverGroundBlock | null = null;
  if (outcome.status === "ok") {
    const shape = publishedShapeOf(shapeOf(outcome.x, request));
    analysis = analyzeDesign(shape, { bandHz: request.bandHz!, lineImpedanceOhm: request.lineImpedanceOhm, swrLimit: request.swrLimit, tolerance, elevationWindowDeg: request.elevationWindowDeg });
    overGround = overGroundBlock(grid, cell, outcome.x, request, shape, analysis);
    analysis = { ...analysis, pattern: { ...analysis.pattern, words: groundWords(cell, overGround) } };
  }
  const inputsOverGround = {
    groundName: cell.groundName,
    ground: request.ground!,
    heightM: cell.heightM,
    mounting: cell.mounting,
    purpose: cell.purpose as "long-distance" | "near-vertical",
    elevationWindowDeg: cell.elevationWindowDeg,
    ...(request.verticalClearanceM !== undefined ? { verticalClearanceM: request.verticalClearanceM } : {}),
  };
  return buildEntry({
    grid, cell, request, outcome, startedFrom: "search", analysis, inputHash: groundEntryInputHash(grid, cell), tolerance,
    overGround: { inputs: inputsOverGround, figures: overGround },
  });
}
