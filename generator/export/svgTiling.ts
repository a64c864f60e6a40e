// Guides for a template tiled over several sheets. Inside the drawing (drawing coordinates, so they
// print in the same place on both neighbouring sheets): shaded overlap strips, the dashed line the
// next sheet's cut edge goes on, and alignment crosses. On the page: the window frame and "cut" notes.
import { fixed } from "./format.js";
import { el, text } from "./svgText.js";
import { TEMPLATE_LAYOUT_MM, type TemplatePagePlan, type TemplatePlan } from "./templateLayout.js";

const O = TEMPLATE_LAYOUT_MM.overlap;
/** Where along a seam the alignment crosses sit, as fractions of the window; clear of neighbours. */
const CROSS_AT = [0.2, 0.5, 0.8];
const NOTE = { "font-size": 2.5, fill: "#444" };
const DASH = { stroke: "#000", "stroke-width": 0.3, "stroke-dasharray": "2 1.5" };

const tileLabel = (row: number, column: number): string => `R${row + 1} C${column + 1}`;
const kept = (plan: TemplatePlan, row: number, column: number): boolean =>
  plan.pages.some((p) => p.row === row && p.column === column);

function cross(x: number, y: number): string {
  const d = `M${fixed(x - 3, 3)} ${fixed(y, 3)}h6M${fixed(x, 3)} ${fixed(y - 3, 3)}v6`;
  return (
    el("path", { class: "align-cross", d, stroke: "#000", "stroke-width": 0.2 }) +
    el("circle", { cx: x, cy: y, r: 1.5, fill: "none", stroke: "#000", "stroke-width": 0.2 })
  );
}

/** Crosses on this page's four seams, each shared with a neighbour that is printed too. */
function crosses(plan: TemplatePlan, page: TemplatePagePlan): string {
  const w = page.window;
  const { row, column } = page;
  let out = "";
  for (const [dc, x] of [[-1, w.x + O / 2], [1, w.x + w.width - O / 2]]) {
    if (kept(plan, row, column + dc)) for (const f of CROSS_AT) out += cross(x, w.y + f * w.height);
  }
  for (const [dr, y] of [[-1, w.y + O / 2], [1, w.y + w.height - O / 2]]) {
    if (kept(plan, row + dr, column)) for (const f of CROSS_AT) out += cross(w.x + f * w.width, y);
  }
  return out;
}

/** Overlap strips and crosses for one page, in drawing coordinates (placed under the wire). */
export function overlapGuides(plan: TemplatePlan, page: TemplatePagePlan): string {
  const w = page.window;
  const { row, column } = page;
  let out = "";
  if (kept(plan, row, column + 1)) {
    const x = w.x + w.width - O;
    out += el("rect", { class: "overlap", x, y: w.y, width: O, height: w.height, fill: "#eee" });
    out += el("path", { d: `M${fixed(x, 3)} ${fixed(w.y, 3)}v${fixed(w.height, 3)}`, ...DASH });
    const cx = x + O / 2 + 0.9;
    const cy = w.y + w.height * 0.35;
    out += text(cx, cy, `overlap: ${tileLabel(row, column + 1)} goes on top`, {
      ...NOTE,
      "text-anchor": "middle",
      transform: `rotate(-90 ${fixed(cx, 3)} ${fixed(cy, 3)})`,
    });
  }
  if (kept(plan, row + 1, column)) {
    const y = w.y + w.height - O;
    out += el("rect", { class: "overlap", x: w.x, y, width: w.width, height: O, fill: "#eee" });
    out += el("path", { d: `M${fixed(w.x, 3)} ${fixed(y, 3)}h${fixed(w.width, 3)}`, ...DASH });
    out += text(w.x + w.width * 0.35, y + O / 2 + 0.9, `overlap: ${tileLabel(row + 1, column)} goes on top`, {
      ...NOTE,
      "text-anchor": "middle",
    });
  }
  return out + crosses(plan, page);
}

/** Window frame and cutting notes, in page coordinates. */
export function pageGuides(plan: TemplatePlan, page: TemplatePagePlan): string {
  const { x, y } = page.windowAtMm;
  const { width, height } = page.window;
  const { row, column } = page;
  let out = el("rect", { class: "window-frame", x, y, width, height, fill: "none", stroke: "#000", "stroke-width": 0.2 });
  if (kept(plan, row, column - 1)) {
    const cx = x - 1.5;
    const cy = y + height / 2;
    const note = `cut along this edge and lay it on the dashed line of ${tileLabel(row, column - 1)}`;
    out += text(cx, cy, note, { ...NOTE, "text-anchor": "middle", transform: `rotate(-90 ${fixed(cx, 3)} ${fixed(cy, 3)})` });
  }
  if (kept(plan, row - 1, column)) {
    const note = `cut along this edge and lay it on the dashed line of ${tileLabel(row - 1, column)}`;
    out += text(x + width, y - 1.2, note, { ...NOTE, "text-anchor": "end" });
  }
  return out;
}
