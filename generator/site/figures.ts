// The figure files of a design page and how each is made: plots as SVG text from generator/render,
// a PNG thumbnail (sharp), a 1200×630 share card (satori), and the 3D view rasterised to WebP for
// the page itself (its SVG holds some 1300 facets, ~140 KB; the SVG stays linked for full detail).
import sharp from "sharp";
import { pattern3dSvg, patternCutSvg, shapeSvg, shareCardPng, smithSvg, sweepSvg, thumbnailPng } from "../render/index.js";
import type { OkEntry } from "./ok.js";
import { PLOTS, RASTERS, type PlotFile } from "./paths.js";

export const figureFiles = [...PLOTS, ...RASTERS] as const;
export type FigureFile = PlotFile;

/** Pixel width the page shows the shape at (the SVG scales; this sets its label sizes). */
export const SHAPE_WIDTH_PX = 800;
export const PATTERN_3D_RASTER_PX = 600;
/** WebP quality of the 3D view's raster: a smooth shaded surface, so 60 shows no loss a reader sees and
 * keeps a design page under its 200 KiB budget (80 took the largest free-space page to 204.7 KiB). */
export const PATTERN_3D_WEBP_QUALITY = 60;

function plotSvg(entry: OkEntry, file: (typeof PLOTS)[number]): string {
  switch (file) {
    case "shape.svg": return shapeSvg(entry, { widthPx: SHAPE_WIDTH_PX, dimensions: true });
    case "pattern-phi.svg": return patternCutSvg(entry, "phi");
    case "pattern-theta.svg": return patternCutSvg(entry, "theta");
    case "pattern-3d.svg": return pattern3dSvg(entry);
    case "sweep.svg": return sweepSvg(entry);
    case "smith.svg": return smithSvg(entry);
  }
}

export async function renderFigure(entry: OkEntry, file: FigureFile): Promise<{ body: string | Uint8Array; mediaType: string }> {
  if (file === "thumb.png") return { body: new Uint8Array(await thumbnailPng(entry, 160)), mediaType: "image/png" };
  if (file === "card.png") return { body: new Uint8Array(await shareCardPng(entry)), mediaType: "image/png" };
  if (file === "pattern-3d.webp") {
    const webp = await sharp(Buffer.from(pattern3dSvg(entry)), { density: 96 }).resize({ width: PATTERN_3D_RASTER_PX }).webp({ quality: PATTERN_3D_WEBP_QUALITY }).toBuffer();
    return { body: new Uint8Array(webp), mediaType: "image/webp" };
  }
  return { body: plotSvg(entry, file), mediaType: "image/svg+xml" };
}

/** Width and height an SVG declares (for <img> attributes, so the page does not jump). */
export function svgSize(svg: string): { width: number; height: number } {
  const head = /<svg\b[^>]*>/.exec(svg)?.[0] ?? "";
  const w = Number(/\swidth="([\d.]+)"/.exec(head)?.[1]), h = Number(/\sheight="([\d.]+)"/.exec(head)?.[1]);
  return Number.isFinite(w) && Number.isFinite(h) && w > 0 && h > 0 ? { width: Math.round(w), height: Math.round(h) } : { width: 600, height: 600 };
}

/** The size each page figure is drawn at. */
export function figureSizes(entry: OkEntry): Record<"shape" | "phi" | "theta" | "pattern3d" | "sweep" | "smith", { width: number; height: number }> {
  const p3 = svgSize(pattern3dSvg(entry));
  return {
    shape: svgSize(plotSvg(entry, "shape.svg")),
    phi: svgSize(plotSvg(entry, "pattern-phi.svg")),
    theta: svgSize(plotSvg(entry, "pattern-theta.svg")),
    pattern3d: { width: PATTERN_3D_RASTER_PX, height: Math.round((p3.height * PATTERN_3D_RASTER_PX) / p3.width) },
    sweep: svgSize(plotSvg(entry, "sweep.svg")),
    smith: svgSize(plotSvg(entry, "smith.svg")),
  };
}
