// Page planning for the bending template. A drawing that fits one sheet (either way round) gets one
// page sized to the drawing plus header, footer and margins. A larger drawing is tiled over
// full sheets: each page shows a window onto the drawing, and neighbouring windows overlap by
// TEMPLATE_LAYOUT_MM.overlap so the printed sheets can be laid over each other and taped. Sheets
// the caller does not need (no wire near their window) are left out; labels keep grid positions.
import { InputError, shown } from "../errors.js";
import type { PaperName, TemplateOptions } from "./types.js";

export const PAPER_MM: Record<PaperName, { width: number; height: number; label: string }> = {
  a4: { width: 210, height: 297, label: "A4" },
  letter: { width: 215.9, height: 279.4, label: "Letter" },
};

/** Fixed parts of every page, mm. */
export const TEMPLATE_LAYOUT_MM = {
  /** Title block above the drawing. */
  header: 20,
  /** Scale bar and caption below the drawing. */
  footer: 30,
  /** Shared strip between neighbouring tiles. */
  overlap: 15,
  /** Narrowest content, so header and scale bar always fit. */
  minContentWidth: 160,
} as const;

export const DEFAULT_MARGIN_MM = 10;
const MAX_MARGIN_MM = 50;

export type Orientation = "portrait" | "landscape";

export interface Rect {
  x: number;
  y: number;
  width: number;
  height: number;
}

export interface TemplatePagePlan {
  /** 0-based position in the full tiling grid. */
  row: number;
  column: number;
  /** "R1 C2": row and column counted from 1. */
  label: string;
  widthMm: number;
  heightMm: number;
  /** Part of the drawing this page shows, drawing coordinates (mm). */
  window: Rect;
  /** Where the window's top-left corner sits on the page, page coordinates (mm). */
  windowAtMm: { x: number; y: number };
}

export interface TemplatePlan {
  paper: PaperName;
  /** How the sheet is turned: for a one-page template, the way the page fits the sheet. */
  orientation: Orientation;
  tiled: boolean;
  marginMm: number;
  /** Size of the full tiling grid; `pages` may leave out sheets that would be blank. */
  rows: number;
  columns: number;
  pages: TemplatePagePlan[];
}

interface Resolved {
  paper: PaperName;
  marginMm: number;
}

function resolveOptions(options: TemplateOptions): Resolved {
  const paper = options.paper ?? "a4";
  if (paper !== "a4" && paper !== "letter") {
    throw new InputError(`template options: paper: must be "a4" or "letter" (got ${shown(paper)})`);
  }
  const marginMm = options.marginMm ?? DEFAULT_MARGIN_MM;
  if (typeof marginMm !== "number" || !(marginMm >= 0 && marginMm <= MAX_MARGIN_MM)) {
    throw new InputError(
      `template options: marginMm: must be a number from 0 to ${MAX_MARGIN_MM} (got ${shown(marginMm)})`,
    );
  }
  return { paper, marginMm };
}

function sheet(paper: PaperName, orientation: Orientation): { width: number; height: number } {
  const { width, height } = PAPER_MM[paper];
  return orientation === "portrait" ? { width, height } : { width: height, height: width };
}

function tilesAlong(extent: number, window: number): number {
  const step = window - TEMPLATE_LAYOUT_MM.overlap;
  return extent <= window ? 1 : Math.ceil((extent - TEMPLATE_LAYOUT_MM.overlap) / step);
}

const label = (row: number, column: number): string => `R${row + 1} C${column + 1}`;

/**
 * The part of a window no earlier or later neighbour claims: the window less half the overlap on
 * every side that has a neighbour. The cores of a tiling meet edge to edge and cover the drawing.
 */
function coreOf(window: Rect, row: number, column: number, rows: number, columns: number): Rect {
  const half = TEMPLATE_LAYOUT_MM.overlap / 2;
  const left = column > 0 ? half : 0;
  const right = column + 1 < columns ? half : 0;
  const top = row > 0 ? half : 0;
  const bottom = row + 1 < rows ? half : 0;
  return {
    x: window.x + left,
    y: window.y + top,
    width: window.width - left - right,
    height: window.height - top - bottom,
  };
}

/**
 * Plans the pages for a drawing of the given size (mm). When tiling, a sheet is kept only if
 * `needed` says so for its core (see coreOf); a one-sheet plan always keeps its page.
 */
export function planTemplatePages(
  drawingWidthMm: number,
  drawingHeightMm: number,
  options: TemplateOptions = {},
  needed: (core: Rect) => boolean = () => true,
): TemplatePlan {
  const { paper, marginMm } = resolveOptions(options);
  const { header, footer, overlap, minContentWidth } = TEMPLATE_LAYOUT_MM;
  const contentWidth = Math.max(drawingWidthMm, minContentWidth);
  const pageWidth = contentWidth + 2 * marginMm;
  const pageHeight = header + drawingHeightMm + footer + 2 * marginMm;

  const orientations: Orientation[] = ["portrait", "landscape"];
  const fitting = orientations.find((o) => {
    const s = sheet(paper, o);
    return pageWidth <= s.width && pageHeight <= s.height;
  });
  if (fitting) {
    const page: TemplatePagePlan = {
      row: 0,
      column: 0,
      label: label(0, 0),
      widthMm: pageWidth,
      heightMm: pageHeight,
      window: { x: 0, y: 0, width: drawingWidthMm, height: drawingHeightMm },
      windowAtMm: { x: marginMm + (contentWidth - drawingWidthMm) / 2, y: marginMm + header },
    };
    return { paper, orientation: fitting, tiled: false, marginMm, rows: 1, columns: 1, pages: [page] };
  }

  const candidates = orientations.flatMap((orientation) => {
    const s = sheet(paper, orientation);
    const winW = s.width - 2 * marginMm;
    const winH = s.height - 2 * marginMm - header - footer;
    if (winW < minContentWidth || winH <= 2 * overlap) return [];
    const columns = tilesAlong(drawingWidthMm, winW);
    const rows = tilesAlong(drawingHeightMm, winH);
    const pages: TemplatePagePlan[] = [];
    for (let row = 0; row < rows; row++) {
      for (let column = 0; column < columns; column++) {
        const window = { x: column * (winW - overlap), y: row * (winH - overlap), width: winW, height: winH };
        if (!needed(coreOf(window, row, column, rows, columns))) continue;
        pages.push({
          row,
          column,
          label: label(row, column),
          widthMm: s.width,
          heightMm: s.height,
          window,
          windowAtMm: { x: marginMm, y: marginMm + header },
        });
      }
    }
    return pages.length > 0 ? [{ orientation, rows, columns, pages }] : [];
  });
  if (candidates.length === 0) {
    throw new InputError(
      `template options: marginMm: leaves too little room for a drawing on ${PAPER_MM[paper].label} paper (got ${marginMm})`,
    );
  }
  // Fewest sheets wins; portrait on a tie.
  const best = candidates.reduce((a, b) => (b.pages.length < a.pages.length ? b : a));
  return {
    paper,
    orientation: best.orientation,
    tiled: true,
    marginMm,
    rows: best.rows,
    columns: best.columns,
    pages: best.pages,
  };
}
