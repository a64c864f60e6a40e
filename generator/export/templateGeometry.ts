// The bending template's drawing in millimetres: wire polylines seen from +z (x to the right, y up
// on paper, so the drawing's y axis is flipped), piece lengths, bend angles and the feed point.
// Drawing coordinates start at the top-left of the wire's bounding box widened by LABEL_PAD_MM.
import { DEG_PER_RAD } from "../units.js";
import type { ExportShape } from "./types.js";

/** Room kept around the wire for labels, mm. */
export const LABEL_PAD_MM = 16;

export interface Vec2 {
  x: number;
  y: number;
}

export interface TemplatePiece {
  wire: number;
  /** Piece k joins vertex k and vertex k + 1. */
  index: number;
  from: Vec2;
  to: Vec2;
  lengthMm: number;
}

export interface TemplateBend {
  wire: number;
  vertex: number;
  at: Vec2;
  /** How far the wire turns away from straight at this vertex, 0..180 degrees. */
  angleDeg: number;
  /** Unit vector (drawing coordinates) pointing away from the inside of the bend. */
  outward: Vec2;
}

export interface TemplateDrawing {
  widthMm: number;
  heightMm: number;
  /** Vertices of each wire, drawing coordinates. */
  wires: Vec2[][];
  pieces: TemplatePiece[];
  bends: TemplateBend[];
  feed: Vec2;
  /** Centroid of all vertices, used to put labels on the outer side of pieces. */
  centre: Vec2;
  totalLengthMm: number;
  wireDiameterMm: number;
}

const MM_PER_M = 1000;

const unit = (v: Vec2): Vec2 => {
  const n = Math.hypot(v.x, v.y);
  return { x: v.x / n, y: v.y / n };
};

function bendAt(wire: number, vertex: number, prev: Vec2, at: Vec2, next: Vec2): TemplateBend {
  const u1 = unit({ x: at.x - prev.x, y: at.y - prev.y });
  const u2 = unit({ x: next.x - at.x, y: next.y - at.y });
  const cross = u1.x * u2.y - u1.y * u2.x;
  const dot = u1.x * u2.x + u1.y * u2.y;
  const angleDeg = Math.atan2(Math.abs(cross), dot) * DEG_PER_RAD;
  const away = { x: u1.x - u2.x, y: u1.y - u2.y };
  // Nearly straight: no inside to speak of; put the label on the left of the wire.
  const outward = Math.hypot(away.x, away.y) > 1e-9 ? unit(away) : { x: u1.y, y: -u1.x };
  return { wire, vertex, at, angleDeg, outward };
}

/** Lays the shape out in drawing millimetres (the shape must lie in the x–y plane). */
export function templateDrawing(shape: ExportShape): TemplateDrawing {
  const all = [...shape.wires.flatMap((w) => w.pointsM), shape.feedPointM];
  const minX = Math.min(...all.map((p) => p[0]));
  const maxX = Math.max(...all.map((p) => p[0]));
  const minY = Math.min(...all.map((p) => p[1]));
  const maxY = Math.max(...all.map((p) => p[1]));
  const toDrawing = (p: readonly number[]): Vec2 => ({
    x: (p[0] - minX) * MM_PER_M + LABEL_PAD_MM,
    y: (maxY - p[1]) * MM_PER_M + LABEL_PAD_MM,
  });

  const wires = shape.wires.map((w) => w.pointsM.map(toDrawing));
  const pieces: TemplatePiece[] = [];
  const bends: TemplateBend[] = [];
  let totalLengthMm = 0;
  shape.wires.forEach((w, wi) => {
    const pts = w.pointsM;
    for (let k = 0; k + 1 < pts.length; k++) {
      const a = pts[k];
      const b = pts[k + 1];
      const lengthMm = Math.hypot(b[0] - a[0], b[1] - a[1], b[2] - a[2]) * MM_PER_M;
      totalLengthMm += lengthMm;
      pieces.push({ wire: wi, index: k, from: wires[wi][k], to: wires[wi][k + 1], lengthMm });
    }
    for (let j = 1; j + 1 < pts.length; j++) {
      bends.push(bendAt(wi, j, wires[wi][j - 1], wires[wi][j], wires[wi][j + 1]));
    }
  });

  const vertices = wires.flat();
  const centre = {
    x: vertices.reduce((s, v) => s + v.x, 0) / vertices.length,
    y: vertices.reduce((s, v) => s + v.y, 0) / vertices.length,
  };
  return {
    widthMm: (maxX - minX) * MM_PER_M + 2 * LABEL_PAD_MM,
    heightMm: (maxY - minY) * MM_PER_M + 2 * LABEL_PAD_MM,
    wires,
    pieces,
    bends,
    feed: toDrawing(shape.feedPointM),
    centre,
    totalLengthMm,
    wireDiameterMm: shape.wireDiameterM * MM_PER_M,
  };
}

/** Does the segment a–b touch the rectangle? (Liang–Barsky clipping.) */
function segmentTouchesRect(a: Vec2, b: Vec2, x0: number, y0: number, x1: number, y1: number): boolean {
  let t0 = 0;
  let t1 = 1;
  const dx = b.x - a.x;
  const dy = b.y - a.y;
  const edges: [number, number][] = [
    [-dx, a.x - x0],
    [dx, x1 - a.x],
    [-dy, a.y - y0],
    [dy, y1 - a.y],
  ];
  for (const [p, q] of edges) {
    if (p === 0) {
      if (q < 0) return false;
    } else {
      const t = q / p;
      if (p < 0) t0 = Math.max(t0, t);
      else t1 = Math.min(t1, t);
      if (t0 > t1) return false;
    }
  }
  return true;
}

/**
 * True when a piece of wire crosses the rectangle, or a label's anchor (piece middle, bend, feed)
 * lies within `labelReachMm` of it (drawing coordinates).
 */
export function drawingTouchesRect(
  drawing: TemplateDrawing,
  rect: { x: number; y: number; width: number; height: number },
  labelReachMm: number,
): boolean {
  const x0 = rect.x;
  const y0 = rect.y;
  const x1 = rect.x + rect.width;
  const y1 = rect.y + rect.height;
  if (drawing.pieces.some((p) => segmentTouchesRect(p.from, p.to, x0, y0, x1, y1))) return true;
  const r = labelReachMm;
  const near = (p: Vec2) => p.x >= x0 - r && p.x <= x1 + r && p.y >= y0 - r && p.y <= y1 + r;
  const middles = drawing.pieces.map((p) => ({ x: (p.from.x + p.to.x) / 2, y: (p.from.y + p.to.y) / 2 }));
  return near(drawing.feed) || middles.some(near) || drawing.bends.some((b) => near(b.at));
}
