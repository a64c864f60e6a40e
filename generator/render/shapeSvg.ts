// Draws the wire to scale in its own plane, seen from +z: x to the right, y up, one scale for both
// axes. With dimensions it adds piece lengths, the turn at each bend (drawn from the dashed
// straight-on direction), the angle between the arms at the feed, a scale bar and small x/y axes;
// labels are placed clear of the wire and of each other (labelPlacer.ts). The main lobe is an
// arrow along the peak direction projected onto the x–y plane, with its mirror twin when the shape
// has a mirror line and the lobe lies off it; when the lobe rises more than 45° from the wire plane
// a circled dot (toward the viewer, +z) or circled cross (away, −z) is drawn instead. Both come from
// analysis/lobeWords.ts lobeLayout, as the lobe's words do, so drawing and words agree.
import type { Entry } from "../catalog/entrySchema.js";
import { lobeLayout } from "../analysis/lobeWords.js";
import { DEG_PER_RAD, RAD_PER_DEG } from "../units.js";
import { okParts } from "./entryParts.js";
import { labelAt, Placer, type Candidate } from "./labelPlacer.js";
import { barLabel, lengthLabel, pieceUnit, roundBarLengthM } from "./lengthLabels.js";
import { FONT, PALETTE } from "./palette.js";
import { arrowHead, Bounds, el, num, points, svgDoc, text, type Pt } from "./svg.js";

/** Pieces drawn shorter than this (px) get no length label on the drawing. */
const MIN_LABELLED_PIECE_PX = 48;

export interface ShapeOptions {
  /** Rendered width in CSS px (the viewBox keeps its own units). */
  widthPx?: number;
  /** Piece lengths, bend angles, scale bar and captions; false for thumbnails. */
  dimensions?: boolean;
}

const FIT_W = 560, FIT_H = 300;
const HALO = { fill: PALETTE.ink, "paint-order": "stroke", stroke: PALETTE.paper, "stroke-width": 3, "stroke-linejoin": "round" };
const unit = (x: number, y: number): Pt => { const l = Math.hypot(x, y); return l > 1e-12 ? [x / l, y / l] : [0, 0]; };
const rot = (u: Pt, deg: number): Pt => { const c = Math.cos(deg * RAD_PER_DEG), s = Math.sin(deg * RAD_PER_DEG); return [u[0] * c - u[1] * s, u[0] * s + u[1] * c]; };
const arcPath = (c: Pt, a: Pt, b: Pt, r: number): string =>
  `M${num(c[0] + a[0] * r)} ${num(c[1] + a[1] * r)}A${num(r)} ${num(r)} 0 0 ${a[0] * b[1] - a[1] * b[0] > 0 ? 1 : 0} ${num(c[0] + b[0] * r)} ${num(c[1] + b[1] * r)}`;

function put(c: Candidate, b: Bounds): string {
  b.addText(c.x, c.y, c.words, c.size, c.anchor);
  return text(c.x, c.y, c.words, { ...HALO, "font-size": c.size, "text-anchor": c.anchor });
}

/** Candidates around p: preferred directions first, each at a near and a far distance. */
function around(p: Pt, dirs: Pt[], d: number, words: string, size: number = FONT.label): Candidate[] {
  return [d, d + 14].flatMap((dist) => dirs.map((u) => labelAt(p, u, dist, words, size)));
}
const COMPASS: Pt[] = [0, 45, 90, 135, 180, 225, 270, 315].map((a) => [Math.cos(a * RAD_PER_DEG), Math.sin(a * RAD_PER_DEG)]);

export function shapeSvg(entry: Entry, opts: ShapeOptions = {}): string {
  const { shape, figures } = okParts(entry, "shapeSvg");
  const dims = opts.dimensions ?? true;
  const k = dims ? 1 : 1.9; // bolder strokes when drawn small
  const xs = shape.pointsM.map((p) => p[0]), ys = shape.pointsM.map((p) => p[1]);
  const minX = Math.min(...xs), maxX = Math.max(...xs), minY = Math.min(...ys), maxY = Math.max(...ys);
  const pxPerM = Math.min(maxX > minX ? FIT_W / (maxX - minX) : Infinity, maxY > minY ? FIT_H / (maxY - minY) : Infinity);
  if (!Number.isFinite(pxPerM)) throw new Error(`render shapeSvg: entry "${entry.id}" has a wire of zero extent`);
  const P: Pt[] = shape.pointsM.map(([x, y]) => [(x - minX) * pxPerM, (maxY - y) * pxPerM]);
  const n = P.length, fv = shape.feedVertex, feed = P[fv];
  const boxW = (maxX - minX) * pxPerM, boxH = (maxY - minY) * pxPerM;
  const b = new Bounds(), placer = new Placer();
  for (const p of P) b.add(p[0], p[1], 10 * k);
  for (let i = 0; i + 1 < n; i++) placer.blockSegment(P[i], P[i + 1], 4);
  const under: string[] = [], over: string[] = [], labels: Candidate[][] = [];
  let tiltNote = "";

  // Main lobe.
  const th = figures.peakDirection.thetaDeg * RAD_PER_DEG, ph = figures.peakDirection.phiDeg * RAD_PER_DEG;
  const cosT = Math.cos(th), cx = boxW / 2, cy = boxH / 2;
  const layout = lobeLayout(shape.pointsM, fv, th, ph);
  // a straight wire has no plane: a lobe square to the page (a flat wire's near-vertical lobe) has
  // no part in the page to draw an arrow along, so it is drawn as out of the page too
  if (layout.outOfPlane || Math.hypot(layout.inPlane[0], layout.inPlane[1]) < 1e-6) {
    const s: Pt = [cx, -34 * k], r = 13 * k, toward = cosT > 0, q = r * 0.6;
    const mark = toward
      ? el("circle", { cx: s[0], cy: s[1], r: 3.6 * k, fill: PALETTE.lobe })
      : el("path", { d: `M${num(s[0] - q)} ${num(s[1] - q)}L${num(s[0] + q)} ${num(s[1] + q)}M${num(s[0] - q)} ${num(s[1] + q)}L${num(s[0] + q)} ${num(s[1] - q)}`, stroke: PALETTE.lobe, "stroke-width": 2.4 * k });
    over.push(el("g", { "data-role": "lobe-out-of-page" }, el("circle", { cx: s[0], cy: s[1], r, fill: PALETTE.paper, stroke: PALETTE.lobe, "stroke-width": 2.4 * k }) + mark));
    b.add(s[0], s[1], r + 4);
    placer.blockBox({ x0: s[0] - r, y0: s[1] - r, x1: s[0] + r, y1: s[1] + r });
    if (dims) labels.push([labelAt([s[0] + r, s[1]], [1, 0], 8, `main lobe out of the page, ${toward ? "toward you (+z)" : "away from you (−z)"}`, FONT.caption)]);
  } else {
    // drawing coordinates: x to the right, y down (the page's y is −y)
    const u0 = unit(layout.inPlane[0], -layout.inPlane[1]);
    const twins: Pt[] = layout.twin ? [u0, unit(layout.twin[0], -layout.twin[1])] : [u0];
    const len = dims ? 72 : 120, head = 15 * k;
    twins.forEach((u, i) => {
      const tx = Math.abs(u[0]) > 1e-9 ? boxW / 2 / Math.abs(u[0]) : Infinity, ty = Math.abs(u[1]) > 1e-9 ? boxH / 2 / Math.abs(u[1]) : Infinity;
      const t = Math.min(tx, ty) + 34;
      const s0: Pt = [cx + u[0] * t, cy + u[1] * t], s1: Pt = [s0[0] + u[0] * len, s0[1] + u[1] * len];
      const shaft: Pt = [s1[0] - u[0] * head * 0.8, s1[1] - u[1] * head * 0.8];
      over.push(el("g", { "data-role": i === 0 ? "lobe-arrow" : "lobe-arrow-twin" },
        el("line", { x1: s0[0], y1: s0[1], x2: shaft[0], y2: shaft[1], stroke: PALETTE.lobe, "stroke-width": 3.2 * k, "stroke-linecap": "round" }) +
        arrowHead(s1, u, head, PALETTE.lobe)));
      b.add(s0[0], s0[1], 4).add(s1[0], s1[1], 4);
      placer.blockSegment(s0, s1, 6);
      if (dims && i === 0) {
        const tilt = 90 - figures.peakDirection.thetaDeg;
        if (Math.abs(tilt) >= 3) tiltNote = `Main lobe tilted ${Math.abs(tilt).toFixed(0)}° out of the page, ${tilt > 0 ? "toward you (+z)" : "away from you (−z)"}; the arrow shows its part in the page.`;
        const phi = (Math.round(figures.peakDirection.phiDeg) % 360 + 360) % 360;
        const twinPhi = layout.twin ? (Math.round(Math.atan2(layout.twin[1], layout.twin[0]) * DEG_PER_RAD) % 360 + 360) % 360 : 0;
        const words = layout.twin ? `main lobes (φ ${phi}° and ${twinPhi}°, mirror twins)` : `main lobe (φ ${phi}°)`;
        labels.push(around(s1, [u, rot(u, 90), rot(u, -90)], 10, words));
      }
    });
  }

  // The wire and the feed.
  under.push(el("polyline", { "data-role": "wire", points: points(P), fill: "none", stroke: PALETTE.wire, "stroke-width": 4 * k, "stroke-linejoin": "round", "stroke-linecap": "round" }));
  over.push(el("circle", { "data-role": "feed", cx: feed[0], cy: feed[1], r: 6 * k, fill: PALETTE.feed, stroke: PALETTE.paper, "stroke-width": 2 * k }));

  if (dims) {
    placer.blockBox({ x0: feed[0] - 7, y0: feed[1] - 7, x1: feed[0] + 7, y1: feed[1] + 7 });
    const mean: Pt = [P.reduce((s, p) => s + p[0], 0) / n, P.reduce((s, p) => s + p[1], 0) / n];
    const lens = shape.pointsM.slice(1).map((q, i) => { const m = shape.pointsM[i]; return Math.hypot(q[0] - m[0], q[1] - m[1], q[2] - m[2]); });
    const lu = pieceUnit(Math.max(...lens));
    const pieceLabels: Candidate[][] = [];
    let bends = 0;
    for (let i = 1; i + 1 < n; i++) {
      const back = unit(P[i - 1][0] - P[i][0], P[i - 1][1] - P[i][1]), fwd = unit(P[i + 1][0] - P[i][0], P[i + 1][1] - P[i][1]);
      const opening = Math.acos(Math.max(-1, Math.min(1, back[0] * fwd[0] + back[1] * fwd[1]))) * DEG_PER_RAD;
      if (i === fv) {
        const inside = unit(back[0] + fwd[0], back[1] + fwd[1]), dir: Pt = inside[0] || inside[1] ? inside : [0, -1];
        under.push(el("path", { d: arcPath(P[i], back, fwd, 26), fill: "none", stroke: PALETTE.gridStrong, "stroke-width": 1.2 }));
        labels.push(around(P[i], [dir, rot(dir, 30), rot(dir, -30)], 32, `${opening.toFixed(0)}°`));
        continue;
      }
      bends++;
      const on: Pt = [-back[0], -back[1]], r = 24, ext: Pt = [P[i][0] + on[0] * (r + 8), P[i][1] + on[1] * (r + 8)];
      under.push(el("line", { x1: P[i][0], y1: P[i][1], x2: ext[0], y2: ext[1], stroke: PALETTE.gridStrong, "stroke-width": 1.2, "stroke-dasharray": "3 3" }));
      under.push(el("path", { d: arcPath(P[i], on, fwd, r), fill: "none", stroke: PALETTE.gridStrong, "stroke-width": 1.2 }));
      placer.blockSegment(P[i], ext, 1.5);
      const mid = unit(on[0] + fwd[0], on[1] + fwd[1]), m2: Pt = mid[0] || mid[1] ? mid : on;
      labels.push(around(P[i], [m2, rot(m2, 40), rot(m2, -40), ...COMPASS], r + 6, `${(180 - opening).toFixed(0)}°`));
    }
    const away = fv > 0 && fv < n - 1 ? unit(2 * feed[0] - P[fv - 1][0] - P[fv + 1][0], 2 * feed[1] - P[fv - 1][1] - P[fv + 1][1]) : ([0, 1] as Pt);
    const fu: Pt = away[0] || away[1] ? away : [0, 1];
    const oc = entry.family === "off-centre" ? shape.offCentre : undefined;
    labels.push(around(feed, [fu, [0, 1], [1, 0], [-1, 0]], 14, oc ? `feed, off centre: ${lengthLabel(oc.feedFromTipM, lu)} from the left tip` : "feed"));
    let unlabelled = 0;
    for (let i = 0; i + 1 < n; i++) {
      const a = P[i], c = P[i + 1];
      // a piece drawn shorter than its label would crowd the bends: the dimension table has it
      if (Math.hypot(c[0] - a[0], c[1] - a[1]) < MIN_LABELLED_PIECE_PX) { unlabelled++; continue; }
      let nrm = unit(-(c[1] - a[1]), c[0] - a[0]);
      const mid: Pt = [(a[0] + c[0]) / 2, (a[1] + c[1]) / 2];
      if ((mid[0] - mean[0]) * nrm[0] + (mid[1] - mean[1]) * nrm[1] < 0) nrm = [-nrm[0], -nrm[1]];
      const cands: Candidate[] = [];
      for (const d of [9, 20, 34]) for (const f of [0.5, 0.35, 0.65, 0.2, 0.8]) for (const side of [1, -1]) {
        cands.push(labelAt([a[0] + (c[0] - a[0]) * f, a[1] + (c[1] - a[1]) * f], [nrm[0] * side, nrm[1] * side], d, lengthLabel(lens[i], lu), FONT.label));
      }
      pieceLabels.push(cands);
    }
    // Piece lengths matter most to a builder: they choose their places first.
    for (const cands of [...pieceLabels, ...labels]) over.push(put(placer.place(cands), b));

    // Scale bar and axes in a row under everything else, then the key to the angles.
    const barM = roundBarLengthM(0.3 * Math.max(maxX - minX, maxY - minY)), barPx = barM * pxPerM;
    const y = b.maxY + 36, x0 = b.minX + 4;
    const tick = (x: number) => el("line", { x1: x, y1: y - 5, x2: x, y2: y + 5, stroke: PALETTE.ink, "stroke-width": 1.5 });
    over.push(el("g", { "data-role": "scale-bar", "data-length-m": String(barM), "data-length-px": num(barPx, 3) },
      el("line", { x1: x0, y1: y, x2: x0 + barPx, y2: y, stroke: PALETTE.ink, "stroke-width": 2 }) + tick(x0) + tick(x0 + barPx) +
      text(x0 + barPx + 8, y + 4.5, barLabel(barM), { "font-size": FONT.label, fill: PALETTE.ink })));
    b.add(x0, y + 8).addText(x0 + barPx + 8, y + 4.5, barLabel(barM), FONT.label, "start");
    const ax = Math.max(b.maxX - 30, x0 + barPx + 110), ay = y + 6, al = 26;
    over.push(el("g", { "data-role": "axes", stroke: PALETTE.inkSoft, "stroke-width": 1.4 },
      el("line", { x1: ax, y1: ay, x2: ax + al - 6, y2: ay }) + el("line", { x1: ax, y1: ay, x2: ax, y2: ay - al + 6 }) +
      arrowHead([ax + al, ay], [1, 0], 7, PALETTE.inkSoft) + arrowHead([ax, ay - al], [0, -1], 7, PALETTE.inkSoft)) +
      text(ax + al + 4, ay + 4, "x", { "font-size": FONT.small, fill: PALETTE.inkSoft }) +
      text(ax - 4, ay - al - 3, "y", { "font-size": FONT.small, fill: PALETTE.inkSoft, "text-anchor": "end" }));
    b.add(ax + al + 14, ay + 4).add(ax - 14, ay - al - 14);
    const key = [
      ...(bends ? ["Angle at a bend: how far the wire turns there (dashed: straight on)."] : []),
      "Angle at the feed: between the two arms.",
      ...(unlabelled ? ["Pieces too short to label here: see the dimension table."] : []),
      ...(tiltNote ? [tiltNote] : []),
    ];
    key.forEach((line) => {
      const ky = b.maxY + 18; // b grows with each line, so the next goes below
      over.push(text(x0, ky, line, { "font-size": FONT.small, fill: PALETTE.inkSoft }));
      b.addText(x0, ky, line, FONT.small, "start");
    });
  }

  const pad = 12;
  const vb: [number, number, number, number] = [b.minX - pad, b.minY - pad, b.maxX - b.minX + 2 * pad, b.maxY - b.minY + 2 * pad];
  return svgDoc({
    viewBox: vb,
    widthPx: opts.widthPx ?? Math.round(vb[2]),
    title: `Wire shape: ${entry.title}`,
    attrs: { "data-px-per-m": num(pxPerM, 4) },
    body: under.join("") + over.join(""),
  });
}
