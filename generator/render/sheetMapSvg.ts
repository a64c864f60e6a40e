// The sheet map of a tiled bending template as SVG: every sheet of the tiling grid at its place
// (drawing millimetres, so the overlaps show), the wire drawn over them, the feed marked, each
// printed sheet a link to its file and each blank one dashed. The view box spans the whole grid, so
// no row is cut off; the caller sets the shown width, and `minWidthPx` keeps labels ≥ 11 px.
import { templateDrawing } from "../export/templateGeometry.js";
import { planBendingTemplate } from "../export/svgTemplate.js";
import type { ExportShape, PaperName } from "../export/types.js";
import { escapeXml } from "../svgMarkup.js";
import { PALETTE } from "./palette.js";

/** Smallest label size the map may be shown at, CSS px (the site's rule for diagram text). */
export const MIN_LABEL_PX = 11;

export interface SheetMapDrawing {
  svg: string;
  /** Narrowest width at which every label is still MIN_LABEL_PX or more. */
  minWidthPx: number;
}

const n = (v: number) => (Math.round(v * 10) / 10).toString();

/** `href(row, column)` gives a printed sheet's link (null for a sheet left out). */
export function sheetMapSvg(shape: ExportShape, paper: PaperName, href: (row: number, column: number) => string | null): SheetMapDrawing {
  const plan = planBendingTemplate(shape, { paper });
  const drawing = templateDrawing(shape);
  const first = plan.pages[0];
  const winW = first.window.width, winH = first.window.height;
  const stepX = plan.columns > 1 ? plan.pages.find((p) => p.column === 1)?.window.x ?? winW : winW;
  const stepY = plan.rows > 1 ? plan.pages.find((p) => p.row === 1)?.window.y ?? winH : winH;
  const W = (plan.columns - 1) * stepX + winW, H = (plan.rows - 1) * stepY + winH;
  const pad = Math.max(W, H) * 0.01;
  const font = Math.min(winW, winH) * 0.2;
  const out: string[] = [];
  for (let row = 0; row < plan.rows; row++) {
    for (let column = 0; column < plan.columns; column++) {
      const x = column * stepX, y = row * stepY;
      const link = href(row, column);
      const cx = x + winW / 2, cy = y + winH / 2;
      const label = `<text x="${n(cx)}" y="${n(cy - font * 0.15)}" font-size="${n(font)}" text-anchor="middle" fill="${link ? PALETTE.wire : PALETTE.inkSoft}">R${row + 1}</text>` +
        `<text x="${n(cx)}" y="${n(cy + font * 0.95)}" font-size="${n(font)}" text-anchor="middle" fill="${link ? PALETTE.wire : PALETTE.inkSoft}">C${column + 1}</text>`;
      const rect = `<rect x="${n(x + pad / 2)}" y="${n(y + pad / 2)}" width="${n(winW - pad)}" height="${n(winH - pad)}" rx="${n(pad)}" class="${link ? "sheet" : "blank"}"/>`;
      out.push(link
        ? `<a href="${escapeXml(link)}" data-sheet="R${row + 1} C${column + 1}"><title>sheet R${row + 1} C${column + 1}</title>${rect}${label}</a>`
        : `<g class="blank-sheet">${rect}${label}</g>`);
    }
  }
  const stroke = Math.max(W, H) * 0.006;
  const wires = drawing.wires.map((pts) => `<polyline points="${pts.map((p) => `${n(p.x)},${n(p.y)}`).join(" ")}" class="wire" stroke-width="${n(stroke)}"/>`).join("");
  const feed = `<circle cx="${n(drawing.feed.x)}" cy="${n(drawing.feed.y)}" r="${n(stroke * 2.2)}" class="feed"><title>feed point</title></circle>`;
  const svg = `<svg xmlns="http://www.w3.org/2000/svg" viewBox="${n(-pad)} ${n(-pad)} ${n(W + 2 * pad)} ${n(H + 2 * pad)}" class="sheet-map-svg" role="img" aria-label="How the ${plan.pages.length} sheets go together, with the wire drawn over them">${out.join("")}${wires}${feed}</svg>`;
  return { svg, minWidthPx: Math.ceil((MIN_LABEL_PX * (W + 2 * pad)) / font) };
}
