// Safe building blocks for SVG text: escaping for character data and attribute values, and a tiny
// element writer whose attribute order is the order given (so output is byte-stable).
import { escapeXml, svgElement, type Attrs } from "../svgMarkup.js";
import { svgNumber } from "./format.js";

export { escapeXml, type Attrs } from "../svgMarkup.js";

/** An element; `children` is markup already built (use `text()` for character data). */
export function el(name: string, attrs: Attrs, children?: string): string {
  return svgElement(name, attrs, children, svgNumber);
}

/** A <text> element holding escaped character data. */
export function text(x: number, y: number, content: string, attrs: Attrs = {}): string {
  return el("text", { x, y, ...attrs }, escapeXml(content));
}

/** "x1,y1 x2,y2 ..." for polyline points. */
export function pointList(points: readonly { x: number; y: number }[]): string {
  return points.map((p) => `${svgNumber(p.x)},${svgNumber(p.y)}`).join(" ");
}
