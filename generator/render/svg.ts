// Small string builders shared by every drawing: fixed number formatting (so identical input gives
// identical bytes), XML escaping for all text, elements with attributes in a fixed order, and the
// self-contained <svg> document wrapper (viewBox, width/height, <title>, generic font list).
import { escapeXml, svgElement, type Attrs } from "../svgMarkup.js";
import { FONT_FAMILY, PALETTE } from "./palette.js";

/** Fixed-decimal number for SVG coordinates; trailing zeros trimmed, never "-0". */
export function num(v: number, digits = 2): string {
  if (!Number.isFinite(v)) throw new Error(`render: non-finite coordinate ${v}`);
  let s = v.toFixed(digits);
  if (s.includes(".")) s = s.replace(/0+$/, "").replace(/\.$/, "");
  return s === "-0" ? "0" : s;
}

/** Escape the five XML special characters. */
export const esc = escapeXml;
export type { Attrs };

/** One element; `children` is already-built markup (use `text` for words). */
export function el(name: string, attrs: Attrs, children?: string): string {
  return svgElement(name, attrs, children, (v) => num(v));
}

/** A text element; the words are escaped here. */
export function text(x: number, y: number, words: string, attrs: Attrs = {}): string {
  return el("text", { x, y, ...attrs }, esc(words));
}

export type Pt = [number, number];

/** "x,y x,y …" for polyline/polygon points. */
export const points = (pts: Pt[]): string => pts.map(([x, y]) => `${num(x)},${num(y)}`).join(" ");

/** Path data through points, starting a new sub-path after every null (a gap). */
export function pathWithGaps(pts: (Pt | null)[]): string {
  let d = "", pen = false;
  for (const p of pts) {
    if (!p) { pen = false; continue; }
    d += `${pen ? "L" : "M"}${num(p[0])} ${num(p[1])}`;
    pen = true;
  }
  return d;
}

/** A filled triangular arrowhead with its tip at `tip`, pointing along unit vector `u`. */
export function arrowHead(tip: Pt, u: Pt, size: number, fill: string): string {
  const [ux, uy] = u, bx = tip[0] - ux * size, by = tip[1] - uy * size, w = size * 0.45;
  return el("polygon", { points: points([tip, [bx - uy * w, by + ux * w], [bx + uy * w, by - ux * w]]), fill });
}

/** Rough text width for layout (average glyph ≈ 0.6 em in a sans-serif face). */
export const textWidth = (words: string, fontSize: number): number => words.length * fontSize * 0.6;

/** Growing bounding box of everything placed, for sizing the viewBox. */
export class Bounds {
  minX = Infinity; minY = Infinity; maxX = -Infinity; maxY = -Infinity;
  add(x: number, y: number, pad = 0): this {
    this.minX = Math.min(this.minX, x - pad); this.maxX = Math.max(this.maxX, x + pad);
    this.minY = Math.min(this.minY, y - pad); this.maxY = Math.max(this.maxY, y + pad);
    return this;
  }
  /** A text box of `words` anchored at (x, y) with the given text-anchor. */
  addText(x: number, y: number, words: string, fontSize: number, anchor: "start" | "middle" | "end"): this {
    const w = textWidth(words, fontSize), x0 = anchor === "start" ? x : anchor === "end" ? x - w : x - w / 2;
    return this.add(x0, y - fontSize).add(x0 + w, y + fontSize * 0.3);
  }
}

export interface Doc {
  viewBox: [number, number, number, number];
  widthPx: number;
  title: string;
  /** Extra attributes on the root element (data-* for tests and the site). */
  attrs?: Attrs;
  body: string;
}

/** The self-contained SVG document: no external fonts, links or images. */
export function svgDoc(d: Doc): string {
  const [x, y, w, h] = d.viewBox;
  const heightPx = (d.widthPx * h) / w;
  const root = {
    xmlns: "http://www.w3.org/2000/svg",
    viewBox: `${num(x)} ${num(y)} ${num(w)} ${num(h)}`,
    width: num(d.widthPx, 0),
    height: num(heightPx, 0),
    role: "img",
    "font-family": FONT_FAMILY,
    ...d.attrs,
  };
  const paper = el("rect", { x, y, width: w, height: h, fill: PALETTE.paper });
  return `${el("svg", root, `${el("title", {}, esc(d.title))}${paper}${d.body}`)}\n`;
}
