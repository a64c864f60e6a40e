// The 1:1 bending template as SVG pages. Width and height are given in mm with a matching viewBox,
// so one user unit is one millimetre and printing at 100 % gives true size. Every page carries the
// title block, its row/column label and the 100 mm / 4 in scale bars.
import { fixed } from "./format.js";
import { drawingContent } from "./svgDrawing.js";
import { scaleBlock } from "./svgScaleBar.js";
import { el, escapeXml, text } from "./svgText.js";
import { overlapGuides, pageGuides } from "./svgTiling.js";
import { type TemplateDrawing, templateDrawing, drawingTouchesRect } from "./templateGeometry.js";
import {
  PAPER_MM,
  TEMPLATE_LAYOUT_MM,
  type TemplatePagePlan,
  type TemplatePlan,
  planTemplatePages,
} from "./templateLayout.js";
import type { ExportShape, TemplateOptions } from "./types.js";
import { assertExportShape, assertFlatInXY } from "./validate.js";

/** A tiled sheet is printed when the wire crosses its core or a label anchor is this close to it. */
const LABEL_REACH_MM = 22;

function planFor(drawing: TemplateDrawing, options: TemplateOptions): TemplatePlan {
  return planTemplatePages(drawing.widthMm, drawing.heightMm, options, (core) =>
    drawingTouchesRect(drawing, core, LABEL_REACH_MM),
  );
}

function headerBlock(shape: ExportShape, drawing: TemplateDrawing, plan: TemplatePlan, page: TemplatePagePlan): string {
  const m = plan.marginMm;
  const right = page.widthMm - m;
  const sheet = `${PAPER_MM[plan.paper].label} ${plan.orientation}`;
  const where = plan.tiled
    ? `page ${page.label}, sheet ${plan.pages.indexOf(page) + 1} of ${plan.pages.length} ` +
      `(grid ${plan.rows} rows × ${plan.columns} columns, blank sheets left out) · ${sheet}`
    : `single page · fits ${sheet}`;
  const facts =
    `${shape.id} · ${fixed(shape.frequencyHz / 1e6, 3)} MHz · wire Ø ${fixed(drawing.wireDiameterMm, 2)} mm · ` +
    `total wire ${fixed(drawing.totalLengthMm, 1)} mm`;
  return (
    text(m, m + 5, shape.title, { class: "title", "font-size": 5, "font-weight": "bold" }) +
    text(m, m + 10.5, facts, { class: "facts", "font-size": 3 }) +
    text(m, m + 15.5, `1:1 bending template · ${where} · print at 100 % (actual size)`, {
      class: "page-info",
      "font-size": 3,
    }) +
    text(right, m + 5, page.label, { class: "page-label", "font-size": 6, "font-weight": "bold", "text-anchor": "end" })
  );
}

function legend(withGrid: boolean): string[] {
  const lines = ["lengths: mm along the centreline", "bends: degrees away from straight", "view from above (+z)"];
  return withGrid ? [...lines, "grid: 10 mm"] : lines;
}

function pageSvg(
  shape: ExportShape,
  drawing: TemplateDrawing,
  plan: TemplatePlan,
  page: TemplatePagePlan,
  withGrid: boolean,
): string {
  const { widthMm: w, heightMm: h, window: win } = page;
  const dx = page.windowAtMm.x - win.x;
  const dy = page.windowAtMm.y - win.y;
  const guides = plan.tiled ? overlapGuides(plan, page) : "";
  const body =
    el("title", {}, escapeXml(`${shape.title} (${shape.id}), bending template ${page.label}`)) +
    el("rect", { class: "paper", x: 0, y: 0, width: w, height: h, fill: "#fff" }) +
    el("defs", {}, el("clipPath", { id: "window" }, el("rect", { id: "window-rect", x: win.x, y: win.y, width: win.width, height: win.height }))) +
    headerBlock(shape, drawing, plan, page) +
    el(
      "g",
      { id: "drawing", transform: `translate(${fixed(dx, 3)} ${fixed(dy, 3)})`, "clip-path": "url(#window)" },
      guides + drawingContent(drawing, withGrid),
    ) +
    (plan.tiled ? pageGuides(plan, page) : "") +
    scaleBlock(plan.marginMm, h - plan.marginMm - TEMPLATE_LAYOUT_MM.footer, legend(withGrid));
  const root = el(
    "svg",
    {
      xmlns: "http://www.w3.org/2000/svg",
      width: `${fixed(w, 3)}mm`,
      height: `${fixed(h, 3)}mm`,
      viewBox: `0 0 ${fixed(w, 3)} ${fixed(h, 3)}`,
      "font-family": "Helvetica, Arial, sans-serif",
    },
    "\n" + body + "\n",
  );
  return `<?xml version="1.0" encoding="UTF-8"?>\n${root}\n`;
}

/** Plans the template's pages without drawing them (page labels, windows, sizes). */
export function planBendingTemplate(shape: ExportShape, options: TemplateOptions = {}): TemplatePlan {
  assertExportShape(shape);
  assertFlatInXY(shape);
  return planFor(templateDrawing(shape), options);
}

/**
 * The bending template as one SVG document per sheet, in row-major order (R1 C1, R1 C2, ...).
 * A design that fits one sheet gives a one-element array sized to the drawing plus margins.
 */
export function bendingTemplateSvgs(shape: ExportShape, options: TemplateOptions = {}): string[] {
  assertExportShape(shape);
  assertFlatInXY(shape);
  const drawing = templateDrawing(shape);
  const pages = planFor(drawing, options);
  const withGrid = options.grid ?? false;
  return pages.pages.map((page) => pageSvg(shape, drawing, pages, page, withGrid));
}
