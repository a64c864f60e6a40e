// The figure files of a design page and how each is made: plots as SVG text from generator/render,
// a PNG thumbnail (sharp), a 1200×630 share card (satori), and the 3D view rasterised to WebP for
// the page itself (its SVG holds some 1300 facets, ~140 KB; the SVG stays linked for full detail).
import sharp from "sharp";
import { pattern3dSvg, patternCutSvg, shapeSvg, shareCardPng, smithSvg, sweepSvg, thumbnailPng } from "../render/index.js";
import { loadCardFonts, type CardFont } from "../render/shareCardPng.js";
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

function drawPlotSvg(entry: OkEntry, file: (typeof PLOTS)[number]): string {
  switch (file) {
    case "shape.svg": return shapeSvg(entry, { widthPx: SHAPE_WIDTH_PX, dimensions: true });
    case "pattern-phi.svg": return patternCutSvg(entry, "phi");
    case "pattern-theta.svg": return patternCutSvg(entry, "theta");
    case "pattern-3d.svg": return pattern3dSvg(entry);
    case "sweep.svg": return sweepSvg(entry);
    case "smith.svg": return smithSvg(entry);
  }
}

/**
 * What one build's figures share, so each is drawn once a design and not once a use: the plot SVGs
 * of the last few designs drawn (the 3D view's SVG is both a file and the source of its WebP, ~140 KB
 * each, so only a few are kept), every plot's drawn size (the design page sets its <img> sizes from
 * them, long after the figure files were written), and the share card's fonts. Only time depends on
 * it: the bytes are those of a fresh draw. The caller owns it (site/data.ts keeps one for the build).
 */
export interface FigureCache {
  svgs: Map<string, string>;
  sizes: Map<string, { width: number; height: number }>;
  cardFonts: CardFont[] | null;
}
export const newFigureCache = (): FigureCache => ({ svgs: new Map(), sizes: new Map(), cardFonts: null });
/** SVGs kept: a design draws six, and the build renders two designs' figures at a time. */
const KEPT_SVGS = 24;

function plotSvg(entry: OkEntry, file: (typeof PLOTS)[number], cache: FigureCache): string {
  const key = `${entry.id}/${file}`;
  const kept = cache.svgs.get(key);
  if (kept !== undefined) return kept;
  const svg = drawPlotSvg(entry, file);
  cache.svgs.set(key, svg);
  cache.sizes.set(key, svgSize(svg));
  for (const old of cache.svgs.keys()) { if (cache.svgs.size <= KEPT_SVGS) break; cache.svgs.delete(old); } // oldest first
  return svg;
}

function plotSize(entry: OkEntry, file: (typeof PLOTS)[number], cache: FigureCache): { width: number; height: number } {
  return cache.sizes.get(`${entry.id}/${file}`) ?? svgSize(plotSvg(entry, file, cache));
}

export async function renderFigure(entry: OkEntry, file: FigureFile, cache: FigureCache = newFigureCache()): Promise<{ body: string | Uint8Array; mediaType: string }> {
  if (file === "thumb.png") return { body: new Uint8Array(await thumbnailPng(entry, 160)), mediaType: "image/png" };
  if (file === "card.png") {
    cache.cardFonts ??= loadCardFonts();
    return { body: new Uint8Array(await shareCardPng(entry, cache.cardFonts)), mediaType: "image/png" };
  }
  if (file === "pattern-3d.webp") {
    const webp = await sharp(Buffer.from(plotSvg(entry, "pattern-3d.svg", cache)), { density: 96 }).resize({ width: PATTERN_3D_RASTER_PX }).webp({ quality: PATTERN_3D_WEBP_QUALITY }).toBuffer();
    return { body: new Uint8Array(webp), mediaType: "image/webp" };
  }
  return { body: plotSvg(entry, file, cache), mediaType: "image/svg+xml" };
}

/** Width and height an SVG declares (for <img> attributes, so the page does not jump). */
export function svgSize(svg: string): { width: number; height: number } {
  const head = /<svg\b[^>]*>/.exec(svg)?.[0] ?? "";
  const w = Number(/\swidth="([\d.]+)"/.exec(head)?.[1]), h = Number(/\sheight="([\d.]+)"/.exec(head)?.[1]);
  return Number.isFinite(w) && Number.isFinite(h) && w > 0 && h > 0 ? { width: Math.round(w), height: Math.round(h) } : { width: 600, height: 600 };
}

/** The size each page figure is drawn at (from `cache` where the figure files were drawn already). */
export function figureSizes(entry: OkEntry, cache: FigureCache = newFigureCache()): Record<"shape" | "phi" | "theta" | "pattern3d" | "sweep" | "smith", { width: number; height: number }> {
  const p3 = plotSize(entry, "pattern-3d.svg", cache);
  return {
    shape: plotSize(entry, "shape.svg", cache),
    phi: plotSize(entry, "pattern-phi.svg", cache),
    theta: plotSize(entry, "pattern-theta.svg", cache),
    pattern3d: { width: PATTERN_3D_RASTER_PX, height: Math.round((p3.height * PATTERN_3D_RASTER_PX) / p3.width) },
    sweep: plotSize(entry, "sweep.svg", cache),
    smith: plotSize(entry, "smith.svg", cache),
  };
}
