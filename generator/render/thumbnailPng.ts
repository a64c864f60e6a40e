// A square PNG thumbnail of the wire shape (no dimensions): the shape SVG rasterised by sharp
// (librsvg) at twice the size, then fitted inside size × size on the paper colour.
import sharp from "sharp";
import type { Entry } from "../catalog/entrySchema.js";
import { PALETTE } from "./palette.js";
import { shapeSvg } from "./shapeSvg.js";

export async function thumbnailPng(entry: Entry, sizePx = 160): Promise<Buffer> {
  if (!Number.isInteger(sizePx) || sizePx < 16 || sizePx > 4096) {
    throw new Error(`render thumbnailPng: size must be a whole number of pixels from 16 to 4096 (got ${sizePx})`);
  }
  const svg = shapeSvg(entry, { widthPx: sizePx, dimensions: false });
  return sharp(Buffer.from(svg), { density: 144 })
    .resize(sizePx, sizePx, { fit: "contain", background: PALETTE.paper })
    .flatten({ background: PALETTE.paper })
    .png()
    .toBuffer();
}
