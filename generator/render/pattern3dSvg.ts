// A static 3D view of the gain surface from the entry's θ–φ grid: each direction (θ, φ) is pushed
// out to a radius proportional to the gain in dB above a floor of (peak − 30 dB), zero below it,
// p = ρ (sin θ cos φ, sin θ sin φ, cos θ). The surface is a shaded quadrilateral mesh under an
// orthographic (parallel) projection seen from an oblique direction above the x–y plane, screen
// x = p·r̂, y = p·û with r̂ = ẑ × v̂ normalised and û = v̂ × r̂ (Foley, van Dam, Feiner & Hughes,
// Computer Graphics: Principles and Practice, 2nd ed., §6.1–6.5). Faces are painted far to near
// (painter's algorithm, Newell, Newell & Sancha 1972; depth = centroid · v̂) and shaded by
// Lambert's cosine law |n̂·l̂|. The x/y/z axes and the wire (not to the pattern's scale) are on top.
import type { Entry } from "../catalog/entrySchema.js";
import { RAD_PER_DEG } from "../units.js";
import { okParts } from "./entryParts.js";
import { FONT, mixColour, PALETTE } from "./palette.js";
import { arrowHead, el, points, svgDoc, text, type Pt } from "./svg.js";

export interface Pattern3dOptions { widthPx?: number }

type V3 = [number, number, number];
const W = 600, H = 620, CX = 300, CY = 300, R = 200, RANGE_DB = 30;
/** Viewing direction (toward the viewer): θ = 55° from +z, φ = 35° from +x. */
const VIEW_THETA_DEG = 55, VIEW_PHI_DEG = 35;

const dot = (a: V3, b: V3): number => a[0] * b[0] + a[1] * b[1] + a[2] * b[2];
const cross = (a: V3, b: V3): V3 => [a[1] * b[2] - a[2] * b[1], a[2] * b[0] - a[0] * b[2], a[0] * b[1] - a[1] * b[0]];
const norm = (a: V3): V3 => { const l = Math.hypot(...a); return l > 0 ? [a[0] / l, a[1] / l, a[2] / l] : [0, 0, 0]; };
const sph = (th: number, ph: number, r: number): V3 => [r * Math.sin(th) * Math.cos(ph), r * Math.sin(th) * Math.sin(ph), r * Math.cos(th)];

const vt = VIEW_THETA_DEG * RAD_PER_DEG, vp = VIEW_PHI_DEG * RAD_PER_DEG;
const VIEW: V3 = sph(vt, vp, 1);
const RIGHT: V3 = [-Math.sin(vp), Math.cos(vp), 0];
const UP: V3 = cross(VIEW, RIGHT);
const LIGHT: V3 = norm([VIEW[0] + 0.6 * UP[0] - 0.4 * RIGHT[0], VIEW[1] + 0.6 * UP[1] - 0.4 * RIGHT[1], VIEW[2] + 0.6 * UP[2] - 0.4 * RIGHT[2]]);
const project = (p: V3): Pt => [CX + R * dot(p, RIGHT), CY - R * dot(p, UP)];
/** Colour by level: pale slate at the floor, through apricot, to deep orange at the peak. */
function levelColour(t: number, dim = 1): string {
  const u = Math.pow(Math.max(0, Math.min(1, t)), 1.6);
  return u < 0.5 ? mixColour(PALETTE.floor, PALETTE.lobeSoft, u / 0.5, dim) : mixColour(PALETTE.lobeSoft, PALETTE.lobe, (u - 0.5) / 0.5, dim);
}

/** The x/y/z axes; `lobeAxis` (0–2, or −1) is the one the main lobe lies along, drawn in the lobe's colour. */
function axes(radiusAlong: (axis: number) => number, lobeAxis: number): string {
  const out: string[] = [];
  const unit: V3[] = [[1, 0, 0], [0, 1, 0], [0, 0, 1]];
  for (let i = 0; i < 3; i++) {
    const inner = radiusAlong(i), o = project([0, 0, 0]), s = project(unit[i].map((v) => v * inner) as V3);
    const e = project(unit[i].map((v) => v * 1.22) as V3);
    const u = norm([e[0] - o[0], e[1] - o[1], 0]);
    out.push(el("line", { x1: o[0], y1: o[1], x2: s[0], y2: s[1], stroke: PALETTE.ink, "stroke-width": 1, "stroke-dasharray": "3 3", "stroke-opacity": 0.55 }));
    const lobe = i === lobeAxis, colour = lobe ? PALETTE.lobeDeep : PALETTE.ink;
    out.push(el("line", { x1: s[0], y1: s[1], x2: e[0] - u[0] * 8, y2: e[1] - u[1] * 8, stroke: colour, "stroke-width": lobe ? 3 : 1.4 }));
    out.push(arrowHead(e, [u[0], u[1]], lobe ? 13 : 10, colour));
    out.push(text(e[0] + u[0] * 14, e[1] + u[1] * 14 + 5, "xyz"[i], { "font-size": FONT.heading, "font-style": "italic", fill: PALETTE.ink, "text-anchor": "middle" }));
  }
  return out.join("");
}

export function pattern3dSvg(entry: Entry, opts: Pattern3dOptions = {}): string {
  const { pattern, shape, figures } = okParts(entry, "pattern3dSvg");
  const g = pattern.gridDbi, dth = pattern.gridThetaStepDeg, dph = pattern.gridPhiStepDeg;
  const rows = Math.round(180 / dth) + 1, cols = Math.round(360 / dph);
  if (g.length !== rows || g.some((r) => r.length !== cols)) {
    throw new Error(`render pattern3dSvg: expected a ${rows} × ${cols} gain grid (θ by ${dth}°, φ by ${dph}°)`);
  }
  const peak = Math.max(figures.gainDbi, ...g.map((r) => Math.max(...r))), floor = peak - RANGE_DB;
  const level = (v: number): number => Math.max(0, Math.min(1, (v - floor) / RANGE_DB));
  const P: V3[][] = g.map((row, i) => row.map((v, j) => sph(i * dth * RAD_PER_DEG, j * dph * RAD_PER_DEG, level(v))));

  // Faces, far to near.
  const faces: { depth: number; d: string; fill: string }[] = [];
  for (let i = 0; i + 1 < rows; i++) for (let j = 0; j < cols; j++) {
    const k = (j + 1) % cols, q = [P[i][j], P[i][k], P[i + 1][k], P[i + 1][j]];
    const t = (level(g[i][j]) + level(g[i][k]) + level(g[i + 1][k]) + level(g[i + 1][j])) / 4;
    if (t <= 0) continue;
    const n = norm(cross([q[2][0] - q[0][0], q[2][1] - q[0][1], q[2][2] - q[0][2]], [q[3][0] - q[1][0], q[3][1] - q[1][1], q[3][2] - q[1][2]]));
    const c: V3 = [0, 1, 2].map((a) => (q[0][a] + q[1][a] + q[2][a] + q[3][a]) / 4) as V3;
    const lit = 0.72 + 0.28 * Math.abs(dot(n, LIGHT));
    faces.push({ depth: dot(c, VIEW), d: points(q.map(project)), fill: levelColour(t, lit) });
  }
  faces.sort((a, b) => a.depth - b.depth);
  const body: string[] = [];
  // One thin translucent stroke for every face: the mesh lines, and no hairline gaps between faces.
  body.push(el("g", { "data-role": "surface", stroke: PALETTE.ink, "stroke-opacity": 0.16, "stroke-width": 0.6, "stroke-linejoin": "round" },
    faces.map((f) => el("polygon", { points: f.d, fill: f.fill })).join("")));

  // The main-lobe arrow just outside the surface; painted under it when it points away from us.
  const pd = sph(figures.peakDirection.thetaDeg * RAD_PER_DEG, figures.peakDirection.phiDeg * RAD_PER_DEG, 1);
  const a0 = project(pd.map((v) => v * 1.04) as V3), a1 = project(pd.map((v) => v * 1.3) as V3);
  const au = norm([a1[0] - a0[0], a1[1] - a0[1], 0]);
  const lobeAxis = pd.findIndex((v) => v > Math.cos(8 * RAD_PER_DEG));
  const arrow = lobeAxis >= 0 || Math.hypot(a1[0] - a0[0], a1[1] - a0[1]) < 12 ? "" : el("g", { "data-role": "lobe-arrow" },
    el("line", { x1: a0[0], y1: a0[1], x2: a1[0] - au[0] * 10, y2: a1[1] - au[1] * 10, stroke: PALETTE.lobeDeep, "stroke-width": 3, "stroke-linecap": "round" }) +
    arrowHead(a1, [au[0], au[1]], 13, PALETTE.lobeDeep));
  if (dot(pd, VIEW) < 0) body.unshift(arrow); else body.push(arrow);

  // Axes: dashed inside the surface, solid beyond it.
  const along = [level(g[Math.round(90 / dth)][0]), level(g[Math.round(90 / dth)][Math.round(90 / dph) % cols]), level(g[0][0])];
  body.push(axes((i) => along[i], lobeAxis));

  // The wire at the centre, its larger half-span drawn at 0.3 of the full radius.
  const half = Math.max(...shape.pointsM.map((p) => Math.hypot(p[0], p[1], p[2])));
  const feedM = shape.pointsM[shape.feedVertex];
  const wire = shape.pointsM.map((p) => project([(p[0] - feedM[0]) / half * 0.3, (p[1] - feedM[1]) / half * 0.3, (p[2] - feedM[2]) / half * 0.3]));
  body.push(el("polyline", { "data-role": "wire", points: points(wire), fill: "none", stroke: PALETTE.paper, "stroke-width": 6, "stroke-linejoin": "round", "stroke-linecap": "round" }));
  body.push(el("polyline", { points: points(wire), fill: "none", stroke: PALETTE.wire, "stroke-width": 3.2, "stroke-linejoin": "round", "stroke-linecap": "round" }));
  const fc = project([0, 0, 0]);
  body.push(el("circle", { cx: fc[0], cy: fc[1], r: 3.8, fill: PALETTE.feed, stroke: PALETTE.paper, "stroke-width": 1.2 }));

  // Heading, colour key, caption.
  const dbi = (v: number) => `${v < 0 ? "\u2212" : ""}${Math.abs(v).toFixed(1)} dBi`;
  body.push(text(20, 28, "Gain surface in 3D", { "font-size": FONT.heading, "font-weight": 700, fill: PALETTE.ink }));
  [0, 10, 20, 30].forEach((db, i) => {
    const x = 20 + i * 120, y = H - 92;
    body.push(el("rect", { x, y: y - 10, width: 18, height: 12, fill: levelColour(db / RANGE_DB), stroke: PALETTE.gridStrong, "stroke-width": 0.6 }));
    body.push(text(x + 24, y, db === 30 ? `peak ${dbi(peak)}` : `${dbi(floor + db)}`, { "font-size": FONT.small, fill: PALETTE.ink }));
  });
  const caption = [
    `Distance from the centre and colour grow with dB above ${dbi(floor)} (30 dB below the peak).`,
    `Parallel projection seen from θ ${VIEW_THETA_DEG}°, φ ${VIEW_PHI_DEG}°; axes dashed inside the surface.`,
    "Orange arrow: the main lobe. Wire at the centre, not to the pattern's scale; dot: the feed.",
  ];
  caption.forEach((l, i) => body.push(text(20, H - 58 + i * 18, l, { "font-size": FONT.small, fill: PALETTE.inkSoft })));
  return svgDoc({ viewBox: [0, 0, W, H], widthPx: opts.widthPx ?? W, title: `3D gain pattern: ${entry.title}`, body: body.join("") });
}
