// The turnable 3D gain surface: the same surface as pattern3dSvg (radius and colour grow with dB
// above peak − 30 dB, p = ρ (sin θ cos φ, sin θ sin φ, cos θ)) seen from a direction the user turns.
// View direction v̂ from yaw ψ (about +z) and pitch ε (above the x–y plane):
// v̂ = (cos ε cos ψ, cos ε sin ψ, sin ε), r̂ = ẑ × v̂ / |ẑ × v̂|, û = v̂ × r̂; screen x = p·r̂, y = p·û
// (orthographic projection, Foley, van Dam, Feiner & Hughes, Computer Graphics: Principles and
// Practice, 2nd ed., §6.1–6.5). Faces far to near (painter's algorithm), Lambert shading |n̂·l̂|.
// Pure: returns 2D polygons and colours for any painter (the page's canvas script).
import { mixColour, PALETTE } from "./palette.js";

type V3 = [number, number, number];
export const RANGE_DB = 30;
/** Pitch is kept inside ±85° so the up vector stays defined. */
export const MAX_PITCH_RAD = (85 * Math.PI) / 180;

export interface PatternGrid {
  thetaStepDeg: number;
  phiStepDeg: number;
  /** Rows θ = 0…180°, columns φ = 0…360° − step, dBi. */
  gridDbi: number[][];
  peakDbi: number;
  /** The wire, metres, feed at the origin (drawn small at the centre, not to the pattern's scale). */
  wireM: [number, number, number][];
}

export interface SceneFace { pts: [number, number][]; fill: string }
export interface Scene {
  faces: SceneFace[];
  /** Axis ends (unit length along x, y, z) and their label points, screen units (radius 1 = 1). */
  axes: { label: string; end: [number, number]; front: boolean }[];
  wire: [number, number][];
  floorDbi: number;
}

const dot = (a: V3, b: V3): number => a[0] * b[0] + a[1] * b[1] + a[2] * b[2];
const cross = (a: V3, b: V3): V3 => [a[1] * b[2] - a[2] * b[1], a[2] * b[0] - a[0] * b[2], a[0] * b[1] - a[1] * b[0]];
const norm = (a: V3): V3 => { const l = Math.hypot(...a); return l > 0 ? [a[0] / l, a[1] / l, a[2] / l] : [0, 0, 0]; };
const sph = (th: number, ph: number, r: number): V3 => [r * Math.sin(th) * Math.cos(ph), r * Math.sin(th) * Math.sin(ph), r * Math.cos(th)];

/** Colour by level, as the static 3D picture: pale slate at the floor to deep orange at the peak. */
export function levelColour(t: number, dim = 1): string {
  const u = Math.pow(Math.max(0, Math.min(1, t)), 1.6);
  return u < 0.5 ? mixColour(PALETTE.floor, PALETTE.lobeSoft, u / 0.5, dim) : mixColour(PALETTE.lobeSoft, PALETTE.lobe, (u - 0.5) / 0.5, dim);
}

/** The surface seen from yaw/pitch (radians); screen y points up. */
export function patternScene(grid: PatternGrid, yawRad: number, pitchRad: number): Scene {
  const e = Math.max(-MAX_PITCH_RAD, Math.min(MAX_PITCH_RAD, pitchRad));
  const view: V3 = [Math.cos(e) * Math.cos(yawRad), Math.cos(e) * Math.sin(yawRad), Math.sin(e)];
  const right = norm(cross([0, 0, 1], view));
  const up = cross(view, right);
  const light = norm([view[0] + 0.6 * up[0] - 0.4 * right[0], view[1] + 0.6 * up[1] - 0.4 * right[1], view[2] + 0.6 * up[2] - 0.4 * right[2]]);
  const project = (p: V3): [number, number] => [dot(p, right), dot(p, up)];
  const g = grid.gridDbi, rows = g.length, cols = g[0]?.length ?? 0;
  const floor = grid.peakDbi - RANGE_DB;
  const level = (v: number) => Math.max(0, Math.min(1, (v - floor) / RANGE_DB));
  const rad = Math.PI / 180;
  const P: V3[][] = g.map((row, i) => row.map((v, j) => sph(i * grid.thetaStepDeg * rad, j * grid.phiStepDeg * rad, level(v))));
  const faces: (SceneFace & { depth: number })[] = [];
  for (let i = 0; i + 1 < rows; i++) for (let j = 0; j < cols; j++) {
    const k = (j + 1) % cols, q = [P[i][j], P[i][k], P[i + 1][k], P[i + 1][j]];
    const t = (level(g[i][j]) + level(g[i][k]) + level(g[i + 1][k]) + level(g[i + 1][j])) / 4;
    if (t <= 0) continue;
    const n = norm(cross([q[2][0] - q[0][0], q[2][1] - q[0][1], q[2][2] - q[0][2]], [q[3][0] - q[1][0], q[3][1] - q[1][1], q[3][2] - q[1][2]]));
    const c: V3 = [0, 1, 2].map((a) => (q[0][a] + q[1][a] + q[2][a] + q[3][a]) / 4) as V3;
    faces.push({ depth: dot(c, view), pts: q.map(project), fill: levelColour(t, 0.72 + 0.28 * Math.abs(dot(n, light))) });
  }
  faces.sort((a, b) => a.depth - b.depth);
  const unit: V3[] = [[1.2, 0, 0], [0, 1.2, 0], [0, 0, 1.2]];
  const half = Math.max(1e-12, ...grid.wireM.map((p) => Math.hypot(...p)));
  return {
    faces: faces.map(({ pts, fill }) => ({ pts, fill })),
    axes: unit.map((u, i) => ({ label: "xyz"[i], end: project(u), front: dot(u, view) >= 0 })),
    wire: grid.wireM.map((p) => project([(p[0] / half) * 0.3, (p[1] / half) * 0.3, (p[2] / half) * 0.3])),
    floorDbi: floor,
  };
}
