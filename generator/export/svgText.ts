// Safe building blocks for SVG text: escaping for character data and attribute values, and a tiny
// element writer whose attribute order is the order given (so output is byte-stable).
import { svgNumber } from "./format.js";

/** Characters XML 1.0 forbids outright (C0 controls except tab, LF, CR; U+FFFE/U+FFFF). */
const FORBIDDEN_XML = /[\u0000-\u0008\u000B\u000C\u000E-\u001F\uFFFE\uFFFF]/g;

/** Escapes &, <, >, " and ' and replaces characters XML cannot hold with U+FFFD. */
export function escapeXml(text: string): string {
  return text
    .replace(FORBIDDEN_XML, "\uFFFD")
    .replace(/&/g, "&amp;")
    .replace(/</g, "&lt;")
    .replace(/>/g, "&gt;")
    .replace(/"/g, "&quot;")
    .replace(/'/g, "&#39;");
}

export type Attrs = Record<string, string | number | undefined>;

function attrText(attrs: Attrs): string {
  let out = "";
  for (const [name, value] of Object.entries(attrs)) {
    if (value === undefined) continue;
    out += ` ${name}="${typeof value === "number" ? svgNumber(value) : escapeXml(value)}"`;
  }
  return out;
}

/** An element; `children` is markup already built (use `text()` for character data). */
export function el(name: string, attrs: Attrs, children?: string): string {
  return children === undefined
    ? `<${name}${attrText(attrs)}/>`
    : `<${name}${attrText(attrs)}>${children}</${name}>`;
}

/** A <text> element holding escaped character data. */
export function text(x: number, y: number, content: string, attrs: Attrs = {}): string {
  return el("text", { x, y, ...attrs }, escapeXml(content));
}

/** "x1,y1 x2,y2 ..." for polyline points. */
export function pointList(points: readonly { x: number; y: number }[]): string {
  return points.map((p) => `${svgNumber(p.x)},${svgNumber(p.y)}`).join(" ");
}
