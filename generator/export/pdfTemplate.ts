// The bending template as one printable PDF: every SVG sheet of bendingTemplateSvgs becomes one
// page of the same paper size, drawn at 1:1 (1 mm = 72 / 25.4 pt, the PDF user unit being 1/72 in,
// ISO 32000-1 §8.3.2.3). Pages are drawn from the SVG sheets themselves (svgParse.ts reads them), so
// the PDF and the SVGs cannot drift apart. Rectangles are written as plain `re` operators in points,
// so a reader can measure the 100 mm check bar straight from the file. Text uses the PDF standard
// fonts (Helvetica, as the SVG asks for, and Symbol for λ and Ω), so nothing is embedded: the file
// stays small, builds fast and the module runs in the browser too.
import {
  clip, degrees, endPath, fill, fillAndStroke, popGraphicsState, pushGraphicsState, rectangle, rgb,
  setFillingColor, setLineWidth, setStrokingColor, stroke, PDFDocument, StandardFonts, type PDFFont, type PDFPage, type RGB,
} from "pdf-lib";
import { allNodes, parseSvg, type SvgNode } from "./svgParse.js";

export const PT_PER_MM = 72 / 25.4;

interface FontPair { main: PDFFont; greek: PDFFont; mainSet: Set<number>; greekSet: Set<number> }
interface Ctx { page: PDFPage; heightPt: number; fonts: { regular: FontPair; bold: FontPair }; clips: Map<string, SvgNode> }
interface Xf { dx: number; dy: number }

const num = (v: string | undefined, fallback = 0): number => {
  const n = Number.parseFloat(v ?? "");
  return Number.isFinite(n) ? n : fallback;
};

function colour(v: string | undefined): RGB | null {
  if (!v || v === "none") return null;
  const hex = /^#([0-9a-f]{3}|[0-9a-f]{6})$/i.exec(v);
  if (!hex) return rgb(0, 0, 0);
  const h = hex[1].length === 3 ? hex[1].replace(/./g, "$&$&") : hex[1];
  return rgb(parseInt(h.slice(0, 2), 16) / 255, parseInt(h.slice(2, 4), 16) / 255, parseInt(h.slice(4, 6), 16) / 255);
}

/** Inherited presentation attributes (fill, stroke, fonts) down the tree. */
type Style = Record<string, string>;
const INHERITED = ["fill", "stroke", "stroke-width", "font-size", "font-weight", "text-anchor", "stroke-dasharray", "stroke-linecap"];
function styleOf(parent: Style, n: SvgNode): Style {
  const s = { ...parent };
  for (const k of INHERITED) if (n.attrs[k] !== undefined) s[k] = n.attrs[k];
  return s;
}

const X = (c: Ctx, xf: Xf, x: number) => (x + xf.dx) * PT_PER_MM;
const Y = (c: Ctx, xf: Xf, y: number) => c.heightPt - (y + xf.dy) * PT_PER_MM;

function paintOps(fillC: RGB | null, strokeC: RGB | null, widthMm: number) {
  return [
    fillC ? setFillingColor(fillC) : null,
    strokeC ? setStrokingColor(strokeC) : null,
    strokeC ? setLineWidth(widthMm * PT_PER_MM) : null,
  ].filter((o) => o !== null);
}

function drawRect(c: Ctx, xf: Xf, n: SvgNode, s: Style) {
  const fillC = colour(s.fill ?? "#000"), strokeC = colour(s.stroke);
  if (!fillC && !strokeC) return;
  const x = num(n.attrs.x), y = num(n.attrs.y), w = num(n.attrs.width), h = num(n.attrs.height);
  const paint = fillC && strokeC ? fillAndStroke() : fillC ? fill() : stroke();
  c.page.pushOperators(pushGraphicsState(), ...paintOps(fillC, strokeC, num(s["stroke-width"], 1)),
    rectangle(X(c, xf, x), Y(c, xf, y + h), w * PT_PER_MM, h * PT_PER_MM), paint, popGraphicsState());
}

/** Paths, polylines and circles go through pdf-lib's SVG path drawing, scaled to points. */
function drawPathData(c: Ctx, xf: Xf, d: string, s: Style, closed: boolean) {
  const fillC = closed ? colour(s.fill ?? "#000") : null;
  const strokeC = colour(s.stroke);
  if (!fillC && !strokeC) return;
  const dash = s["stroke-dasharray"]?.split(/[\s,]+/).map(Number).filter((v) => v > 0);
  c.page.drawSvgPath(d, {
    x: X(c, xf, 0), y: Y(c, xf, 0), scale: PT_PER_MM,
    color: fillC ?? undefined, borderColor: strokeC ?? undefined,
    borderWidth: strokeC ? num(s["stroke-width"], 1) : undefined,
    borderDashArray: dash?.length ? dash : undefined,
  });
}

function circlePath(n: SvgNode): string {
  const cx = num(n.attrs.cx), cy = num(n.attrs.cy), r = num(n.attrs.r);
  return `M${cx - r} ${cy}a${r} ${r} 0 1 0 ${2 * r} 0a${r} ${r} 0 1 0 ${-2 * r} 0Z`;
}

/** Text in runs of one font: Helvetica where it has the glyph, Symbol (Greek) elsewhere; a character
 * neither has becomes "?" rather than failing the whole file. */
function runs(text: string, pair: FontPair): { text: string; font: PDFFont }[] {
  const out: { text: string; font: PDFFont }[] = [];
  for (const raw of text) {
    const code = raw.codePointAt(0)!;
    const ch = pair.mainSet.has(code) || pair.greekSet.has(code) ? raw : "?";
    const font = pair.mainSet.has(ch.codePointAt(0)!) ? pair.main : pair.greek;
    if (out.length && out[out.length - 1].font === font) out[out.length - 1].text += ch;
    else out.push({ text: ch, font });
  }
  return out;
}

function drawText(c: Ctx, xf: Xf, n: SvgNode, s: Style) {
  const content = n.text.replace(/\s+/g, " ");
  if (!content.trim()) return;
  const sizePt = num(s["font-size"], 3) * PT_PER_MM;
  const pair = s["font-weight"] === "bold" || s["font-weight"] === "700" ? c.fonts.bold : c.fonts.regular;
  const parts = runs(content, pair);
  const width = parts.reduce((w, p) => w + p.font.widthOfTextAtSize(p.text, sizePt), 0);
  const anchor = s["text-anchor"] === "middle" ? 0.5 : s["text-anchor"] === "end" ? 1 : 0;
  // rotate(a cx cy) about the text's own anchor point, clockwise on paper (SVG's y points down)
  const rot = /rotate\(\s*(-?[\d.]+)/.exec(n.attrs.transform ?? "");
  const angleDeg = rot ? -Number(rot[1]) : 0;
  const a = (angleDeg * Math.PI) / 180;
  let x = X(c, xf, num(n.attrs.x)) - anchor * width * Math.cos(a);
  let y = Y(c, xf, num(n.attrs.y)) - anchor * width * Math.sin(a);
  const color = colour(s.fill ?? "#000") ?? rgb(0, 0, 0);
  for (const p of parts) {
    c.page.drawText(p.text, { x, y, size: sizePt, font: p.font, color, rotate: degrees(angleDeg) });
    const w = p.font.widthOfTextAtSize(p.text, sizePt);
    x += w * Math.cos(a);
    y += w * Math.sin(a);
  }
}

function walk(c: Ctx, n: SvgNode, xf: Xf, parent: Style) {
  const s = styleOf(parent, n);
  switch (n.name) {
    case "title": case "defs": case "clipPath": return;
    case "rect": return drawRect(c, xf, n, s);
    case "circle": return drawPathData(c, xf, circlePath(n), s, true);
    case "path": return drawPathData(c, xf, n.attrs.d ?? "", s, false);
    case "polyline": return drawPathData(c, xf, `M${(n.attrs.points ?? "").trim().split(/\s+/).join("L")}`, s, false);
    case "text": return drawText(c, xf, n, s);
    default: break;
  }
  const t = /translate\(\s*(-?[\d.]+)[\s,]+(-?[\d.]+)\s*\)/.exec(n.attrs.transform ?? "");
  const inner = t ? { dx: xf.dx + Number(t[1]), dy: xf.dy + Number(t[2]) } : xf;
  const clipId = /url\(#([\w-]+)\)/.exec(n.attrs["clip-path"] ?? "")?.[1];
  const clipRect = clipId ? c.clips.get(clipId)?.children.find((k) => k.name === "rect") : undefined;
  if (clipRect) {
    const x = num(clipRect.attrs.x), y = num(clipRect.attrs.y), w = num(clipRect.attrs.width), h = num(clipRect.attrs.height);
    c.page.pushOperators(pushGraphicsState(), rectangle(X(c, inner, x), Y(c, inner, y + h), w * PT_PER_MM, h * PT_PER_MM), clip(), endPath());
  }
  for (const k of n.children) walk(c, k, inner, s);
  if (clipRect) c.page.pushOperators(popGraphicsState());
}

const mmOf = (v: string | undefined): number => {
  const m = /^([\d.]+)mm$/.exec(v ?? "");
  if (!m) throw new Error(`templatePdf: sheet size must be given in mm (got ${v})`);
  return Number(m[1]);
};

/**
 * One PDF holding every sheet, in the order given. Deterministic: no dates, fixed metadata, so the
 * same sheets and fonts give the same bytes.
 */
export async function templatePdf(sheets: readonly string[], title: string): Promise<Uint8Array> {
  const doc = await PDFDocument.create({ updateMetadata: false });
  const symbol = doc.embedStandardFont(StandardFonts.Symbol);
  const pair = (main: PDFFont): FontPair => ({ main, greek: symbol, mainSet: new Set(main.getCharacterSet()), greekSet: new Set(symbol.getCharacterSet()) });
  const fontSet = { regular: pair(doc.embedStandardFont(StandardFonts.Helvetica)), bold: pair(doc.embedStandardFont(StandardFonts.HelveticaBold)) };
  doc.setTitle(title);
  doc.setCreator("Bentwire Atlas");
  doc.setProducer("Bentwire Atlas");
  for (const svg of sheets) {
    const root = parseSvg(svg);
    const w = mmOf(root.attrs.width), h = mmOf(root.attrs.height);
    const page = doc.addPage([w * PT_PER_MM, h * PT_PER_MM]);
    const clips = new Map(allNodes(root).filter((k) => k.name === "clipPath" && k.attrs.id).map((k) => [k.attrs.id, k]));
    const ctx: Ctx = { page, heightPt: h * PT_PER_MM, fonts: fontSet, clips };
    for (const k of root.children) walk(ctx, k, { dx: 0, dy: 0 }, { fill: "#000" });
  }
  return doc.save({ useObjectStreams: false });
}
