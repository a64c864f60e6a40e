// The over-ground block of an entry (entrySchema.ts overGround), for a catalog cell (computeGround.ts)
// and for a design made in the browser (browser/designJob.ts) alike: the mounted points, feed and
// extreme heights, the peak and the takeoff in the elevation window, the planning elevations, the
// elevation and azimuth cuts (analysis/groundFigures.ts), the ground loss, the same shape re-mounted
// at other heights and over other grounds, and the same shape in free space. Pure; imports nothing
// Node-only, so the browser bundles it.
import type { Analysis } from "../analysis/index.js";
import { solveAt } from "../analysis/converged.js";
import { groundCuts, groundFieldOf } from "../analysis/groundFigures.js";
import { swr } from "../analysis/swr.js";
import { shapeOf } from "../design/objective.js";
import type { DesignRequest } from "../design/request.js";
import { groundByName } from "../em/ground.js";
import type { Shape, Solution } from "../em/index.js";
import { publishedShapeOf } from "./entryBuild.js";
import type { Entry } from "./entrySchema.js";

type OverGroundBlock = NonNullable<Entry["overGround"]>;

/** Window gain, takeoff, impedance and SWR of the same x re-mounted (another height or ground). */
function remounted(x: number[], r: DesignRequest, spw: number, feedGapM: number): { shape: Shape; s: Solution } | null {
  try {
    const shape = publishedShapeOf(shapeOf(x, r));
    return { shape, s: solveAt(shape, shape.frequencyHz, spw, feedGapM, new Map(), r.elevationWindowDeg) };
  } catch {
    return null; // a vertical shape that no longer clears the ground at a lower mast
  }
}

const shortFigures = (s: Solution, lineOhm: number) => ({
  gainDbi: s.peakGainDbi,
  takeoffElevationDeg: 90 - (s.peakDirectionRad.theta * 180) / Math.PI,
  impedanceOhm: s.inputImpedanceOhm,
  swr: Number.isFinite(swr(s.inputImpedanceOhm, lineOhm)) ? swr(s.inputImpedanceOhm, lineOhm) : null,
});

/** Where the height curve and the other grounds are taken: the design's own ground and the rest. */
export interface AroundTheDesign {
  groundName: string;
  /** Support heights of the height curve (m), the design's own left out by the caller. */
  heightsM: readonly number[];
  /** Ground presets to compare with; the design's own is skipped. */
  otherGroundNames: readonly string[];
}

export function overGroundFigures(x: number[], request: DesignRequest, shape: Shape, a: Analysis, around: AroundTheDesign): OverGroundBlock {
  const spw = a.design.uncertainty.segmentsPerWavelength;
  const feedGapM = a.design.feedGapM;
  const s = solveAt(shape, shape.frequencyHz, spw, feedGapM, new Map(), request.elevationWindowDeg);
  const g = s.ground!;
  const takeoff = { elevationDeg: g.peakElevationDeg, azimuthDeg: g.peakAzimuthDeg };
  const cuts = groundCuts(groundFieldOf(shape, s), s.inputPowerW, takeoff);
  const zs = shape.wires.flatMap((w) => w.pointsM.map((p) => p[2]));
  const feedPoint = shape.wires[shape.feed.wire].pointsM[shape.feed.vertex];
  const heightCurve = around.heightsM.flatMap((heightM) => {
    const m = remounted(x, { ...request, heightM }, spw, feedGapM);
    return m ? [{ heightM, ...shortFigures(m.s, request.lineImpedanceOhm) }] : [];
  });
  const otherGrounds = around.otherGroundNames.filter((n) => n !== around.groundName).flatMap((groundName) => {
    const m = remounted(x, { ...request, ground: groundByName(groundName, "overGround.otherGrounds") }, spw, feedGapM);
    return m ? [{ groundName, ...shortFigures(m.s, request.lineImpedanceOhm) }] : [];
  });
  const free = publishedShapeOf(shapeOf(x, { ...request, ground: undefined, heightM: undefined, mounting: undefined, elevationWindowDeg: undefined, verticalClearanceM: undefined }));
  const fs = solveAt(free, free.frequencyHz, spw, feedGapM, new Map());
  return {
    mountedPointsM: shape.wires[0].pointsM.map((p) => [p[0], p[1], p[2]] as [number, number, number]),
    feedHeightM: feedPoint[2],
    lowestPointM: Math.min(...zs),
    highestPointM: Math.max(...zs),
    peakGainDbi: cuts.peakGainDbi,
    peakElevationDeg: cuts.peakElevationDeg,
    peakAzimuthDeg: cuts.peakAzimuthDeg,
    takeoffElevationDeg: takeoff.elevationDeg,
    takeoffAzimuthDeg: takeoff.azimuthDeg,
    gainAtElevationDbi: g.gainAtElevationDbi,
    elevationCut: cuts.elevationCut,
    azimuthCut: cuts.azimuthCut,
    groundLossFraction: g.groundLossW === null || request.ground?.type === "perfect" ? null : g.groundLossW / s.inputPowerW,
    heightCurve,
    otherGrounds,
    freeSpace: { gainDbi: fs.peakGainDbi, impedanceOhm: fs.inputImpedanceOhm },
  };
}
