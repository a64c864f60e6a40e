// What the turnable 3D view needs from an entry: its gain grid (rounded to 0.01 dB, which is finer
// than anything the drawing can show) and the wire, feed at the origin.
import type { PatternGrid } from "../render/pattern3dScene.js";
import type { OkEntry } from "./ok.js";

const r2 = (v: number) => Math.round(v * 100) / 100;

export function patternGridOf(e: OkEntry): PatternGrid {
  const feed = e.shape.pointsM[e.shape.feedVertex];
  return {
    thetaStepDeg: e.pattern.gridThetaStepDeg,
    phiStepDeg: e.pattern.gridPhiStepDeg,
    gridDbi: e.pattern.gridDbi.map((row) => row.map(r2)),
    peakDbi: Math.max(e.figures.gainDbi, ...e.pattern.gridDbi.map((row) => Math.max(...row))),
    wireM: e.shape.pointsM.map((p) => [p[0] - feed[0], p[1] - feed[1], p[2] - feed[2]]),
  };
}
