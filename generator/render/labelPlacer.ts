// Greedy label placement for the shape drawing: each label comes with candidate positions in order
// of preference; the first that overlaps nothing already placed (wire pieces, arrows, other labels)
// wins, else the one with the least overlap. Overlap of a label box with a thick segment is the
// length of the segment clipped to the box grown by the half-width (Liang–Barsky clipping,
// Liang & Barsky, "A new concept and method for line clipping", ACM TOG 3(1), 1984).
import { textWidth, type Pt } from "./svg.js";

export interface Box { x0: number; y0: number; x1: number; y1: number }
export type Anchor = "start" | "middle" | "end";
export interface Candidate { x: number; y: number; anchor: Anchor; words: string; size: number }

const anchorFor = (ux: number): Anchor => (ux > 0.35 ? "start" : ux < -0.35 ? "end" : "middle");
/** Baseline shift so a label offset along u sits clear of its point. */
const baseShift = (uy: number, size: number): number => (uy > 0.35 ? size * 0.85 : uy < -0.35 ? -size * 0.15 : size * 0.35);

/** A label a distance d from point p in direction u (unit), anchored on the side facing p. */
export function labelAt(p: Pt, u: Pt, d: number, words: string, size: number): Candidate {
  return { x: p[0] + u[0] * d, y: p[1] + u[1] * d + baseShift(u[1], size), anchor: anchorFor(u[0]), words, size };
}

export function boxOf(c: Candidate, margin = 2): Box {
  const w = textWidth(c.words, c.size), x0 = c.anchor === "start" ? c.x : c.anchor === "end" ? c.x - w : c.x - w / 2;
  return { x0: x0 - margin, y0: c.y - c.size * 0.8 - margin, x1: x0 + w + margin, y1: c.y + c.size * 0.25 + margin };
}

function boxOverlap(a: Box, b: Box): number {
  const w = Math.min(a.x1, b.x1) - Math.max(a.x0, b.x0), h = Math.min(a.y1, b.y1) - Math.max(a.y0, b.y0);
  return w > 0 && h > 0 ? w * h : 0;
}

/** Length of segment a–b inside box b0 (Liang–Barsky). */
function clippedLength(a: Pt, b: Pt, box: Box): number {
  const dx = b[0] - a[0], dy = b[1] - a[1];
  let t0 = 0, t1 = 1;
  const edges: [number, number][] = [[-dx, a[0] - box.x0], [dx, box.x1 - a[0]], [-dy, a[1] - box.y0], [dy, box.y1 - a[1]]];
  for (const [p, q] of edges) {
    if (p === 0) { if (q < 0) return 0; continue; }
    const r = q / p;
    if (p < 0) { if (r > t1) return 0; if (r > t0) t0 = r; } else { if (r < t0) return 0; if (r < t1) t1 = r; }
  }
  return (t1 - t0) * Math.hypot(dx, dy);
}

export class Placer {
  private boxes: Box[] = [];
  private segments: { a: Pt; b: Pt; half: number }[] = [];

  blockSegment(a: Pt, b: Pt, halfWidth: number): void { this.segments.push({ a, b, half: halfWidth }); }
  blockBox(box: Box): void { this.boxes.push(box); }

  overlap(box: Box): number {
    let total = 0;
    for (const o of this.boxes) total += boxOverlap(box, o);
    for (const s of this.segments) {
      const grown = { x0: box.x0 - s.half, y0: box.y0 - s.half, x1: box.x1 + s.half, y1: box.y1 + s.half };
      total += clippedLength(s.a, s.b, grown) * 2 * s.half * 4; // a line through words reads worse than a touching box
    }
    return total;
  }

  /** Pick the best candidate and keep its box out of later labels' way. */
  place(candidates: Candidate[]): Candidate {
    let best = candidates[0], bestCost = Infinity;
    for (const c of candidates) {
      const cost = this.overlap(boxOf(c));
      if (cost < bestCost - 1e-9) { best = c; bestCost = cost; }
      if (cost === 0) break;
    }
    this.boxes.push(boxOf(best));
    return best;
  }
}
