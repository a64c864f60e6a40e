// The wire itself, in drawing coordinates (mm): true-size wire with its centreline, vertex dots,
// piece lengths along each piece, bend angles beside each bend, the feed mark, optional 10 mm grid.
import { fixed } from "./format.js";
import { type Attrs, el, pointList, text } from "./svgText.js";
import type { TemplateDrawing, Vec2 } from "./templateGeometry.js";

const FONT = 3;
/** White outline behind label text so it stays readable across wire and grid lines. */
const HALO = { stroke: "#fff", "stroke-width": 0.6, "paint-order": "stroke", "stroke-linejoin": "round" };
const PIECE_GAP = 1.6;
const BEND_GAP = 4;
const FEED_RADIUS = 2.5;
/** A wire thinner than this is still drawn this wide so it stays visible. */
const MIN_WIRE_STROKE = 0.5;

/** 10 mm grid over the drawing, with lines through the feed point. */
function grid(width: number, height: number, feed: Vec2): string {
  const firstX = feed.x - 10 * Math.floor(feed.x / 10);
  const firstY = feed.y - 10 * Math.floor(feed.y / 10);
  let d = "";
  for (let x = firstX; x <= width; x += 10) d += `M${fixed(x, 3)} 0V${fixed(height, 3)}`;
  for (let y = firstY; y <= height; y += 10) d += `M0 ${fixed(y, 3)}H${fixed(width, 3)}`;
  return el("path", { class: "grid", d, stroke: "#ccc", "stroke-width": 0.1, fill: "none" });
}

function pieceLabel(from: Vec2, to: Vec2, lengthMm: number, centre: Vec2): string {
  const mid = { x: (from.x + to.x) / 2, y: (from.y + to.y) / 2 };
  let angle = (Math.atan2(to.y - from.y, to.x - from.x) * 180) / Math.PI;
  if (angle > 90) angle -= 180;
  if (angle <= -90) angle += 180;
  const rad = (angle * Math.PI) / 180;
  const up = { x: Math.sin(rad), y: -Math.cos(rad) }; // "up" for the rotated text
  // Label on the side facing away from the middle of the shape.
  const outside = (mid.x - centre.x) * up.x + (mid.y - centre.y) * up.y >= 0;
  const shift = outside ? PIECE_GAP : -(PIECE_GAP + FONT * 0.75);
  const at = { x: mid.x + up.x * shift, y: mid.y + up.y * shift };
  return text(at.x, at.y, `${fixed(lengthMm, 1)} mm`, {
    class: "piece-length",
    ...HALO,
    "font-size": FONT,
    "text-anchor": "middle",
    transform: `rotate(${fixed(angle, 3)} ${fixed(at.x, 3)} ${fixed(at.y, 3)})`,
  });
}

/** Horizontal label placed beside `at` in direction `dir` (unit vector), clear of the point. */
function besideLabel(at: Vec2, dir: Vec2, gap: number, content: string, attrs: Attrs): string {
  const p = { x: at.x + dir.x * gap, y: at.y + dir.y * gap };
  const anchor = dir.x > 0.35 ? "start" : dir.x < -0.35 ? "end" : "middle";
  const baseline = dir.y > 0.35 ? FONT * 0.8 : dir.y < -0.35 ? 0 : FONT * 0.35;
  return text(p.x, p.y + baseline, content, { ...HALO, ...attrs, "font-size": FONT, "text-anchor": anchor });
}

function feedMark(drawing: TemplateDrawing): string {
  const { feed } = drawing;
  const atBend = drawing.bends.find((b) => Math.hypot(b.at.x - feed.x, b.at.y - feed.y) < 1e-6);
  const dir = atBend ? { x: -atBend.outward.x, y: -atBend.outward.y } : { x: 0, y: 1 };
  const arm = FEED_RADIUS + 1.5;
  return el(
    "g",
    { class: "feed", stroke: "#000", "stroke-width": 0.3, fill: "none" },
    el("circle", { cx: feed.x, cy: feed.y, r: FEED_RADIUS }) +
      el("path", {
        d: `M${fixed(feed.x - arm, 3)} ${fixed(feed.y, 3)}h${fixed(2 * arm, 3)}M${fixed(feed.x, 3)} ${fixed(feed.y - arm, 3)}v${fixed(2 * arm, 3)}`,
      }) +
      besideLabel(feed, dir, FEED_RADIUS + 3, atBend ? `FEED · arms ${fixed(180 - atBend.angleDeg, 1)}° apart` : "FEED", {
        class: "feed-label",
        fill: "#000",
        "font-weight": "bold",
      }),
  );
}

/** All drawing content; the caller places and clips it. */
export function drawingContent(drawing: TemplateDrawing, withGrid: boolean): string {
  let out = withGrid ? grid(drawing.widthMm, drawing.heightMm, drawing.feed) : "";
  const stroke = Math.max(drawing.wireDiameterMm, MIN_WIRE_STROKE);
  drawing.wires.forEach((points, w) => {
    const attrs = { points: pointList(points), fill: "none", "stroke-linejoin": "round" };
    out += el("polyline", { class: "wire-body", ...attrs, stroke: "#bbb", "stroke-width": stroke, "stroke-linecap": "round" });
    out += el("polyline", { class: "wire-centreline", "data-wire": String(w), ...attrs, stroke: "#000", "stroke-width": 0.25 });
  });
  drawing.wires.forEach((points, w) =>
    points.forEach((p, j) => {
      out += el("circle", { class: "vertex", "data-wire": String(w), "data-vertex": String(j), cx: p.x, cy: p.y, r: 0.8 });
    }),
  );
  for (const piece of drawing.pieces) {
    out += pieceLabel(piece.from, piece.to, piece.lengthMm, drawing.centre);
  }
  // the feed vertex is labelled as the feed (with the angle between the arms), never as a bend;
  // a vertex where the wire runs on straight (shown as 0.0°) gets no bend label
  const isFeed = (p: Vec2) => Math.hypot(p.x - drawing.feed.x, p.y - drawing.feed.y) < 1e-6;
  for (const bend of drawing.bends) {
    if (isFeed(bend.at) || Number(fixed(bend.angleDeg, 1)) === 0) continue;
    out += besideLabel(bend.at, bend.outward, BEND_GAP, `bend ${fixed(bend.angleDeg, 1)}°`, {
      class: "bend-angle",
    });
  }
  out += feedMark(drawing);
  return out;
}
