// The 1200 × 630 share card: title, band, gain, wire length, pieces and the shape drawing, laid
// out by satori (element tree as plain objects) with the Inter font files, then rasterised by sharp.
import { readFileSync } from "node:fs";
import { createRequire } from "node:module";
import satori from "satori";
import sharp from "sharp";
import type { Entry } from "../catalog/entrySchema.js";
import { mhz, okParts } from "./entryParts.js";
import { PALETTE } from "./palette.js";
import { shapeSvg } from "./shapeSvg.js";

export const CARD_WIDTH_PX = 1200, CARD_HEIGHT_PX = 630;
const IMAGE_BOX = { w: 460, h: 440 };

type Style = Record<string, string | number>;
interface Node { type: string; props: { style?: Style; src?: string; width?: number; height?: number; children?: (Node | string)[] | Node | string } }
const div = (style: Style, ...children: (Node | string)[]): Node => ({ type: "div", props: { style: { display: "flex", ...style }, children } });

export interface CardFont { name: string; data: Buffer; weight: 400 | 700; style: "normal" }

/**
 * Inter 400/700, Latin plus Greek (for λ, θ, φ), resolved from the installed package. A caller
 * drawing many cards loads them once and passes the same array to each: satori keeps the fonts it
 * has parsed keyed by these very Buffers, so the same objects spare it parsing them per card.
 */
export function loadCardFonts(): CardFont[] {
  const require = createRequire(import.meta.url);
  const fonts: CardFont[] = [];
  for (const subset of ["latin", "greek"]) for (const weight of [400, 700] as const) {
    let path: string;
    try { path = require.resolve(`@fontsource/inter/files/inter-${subset}-${weight}-normal.woff`); } catch { continue; }
    // Distinct names: satori keeps one face per name and weight, and falls back across names.
    fonts.push({ name: subset === "latin" ? "Inter" : "Inter Greek", data: readFileSync(path), weight, style: "normal" });
  }
  if (!fonts.some((f) => f.weight === 400)) throw new Error("render shareCardPng: @fontsource/inter's inter-latin-400-normal.woff not found");
  return fonts;
}

const wireLength = (m: number): string => (m >= 1 ? `${m.toFixed(2)} m` : `${(m * 100).toFixed(1)} cm`);

function figure(value: string, label: string): Node {
  return div({ flexDirection: "column", marginRight: 30 },
    div({ fontSize: 40, fontWeight: 700, color: PALETTE.ink, whiteSpace: "nowrap" }, value),
    div({ fontSize: 22, color: PALETTE.inkSoft, marginTop: 2, whiteSpace: "nowrap" }, label));
}

/** The card as satori's SVG (text already turned into paths); exported for tests. */
export async function shareCardSvg(entry: Entry, fonts: CardFont[] = loadCardFonts()): Promise<string> {
  const { figures } = okParts(entry, "shareCardPng");
  const i = entry.inputs;
  const shape = shapeSvg(entry, { dimensions: false, widthPx: IMAGE_BOX.w });
  const m = /<svg[^>]* width="([\d.]+)" height="([\d.]+)"/.exec(shape);
  if (!m) throw new Error("render shareCardPng: shape SVG lacks width/height");
  const aspect = Number(m[1]) / Number(m[2]);
  const w = Math.min(IMAGE_BOX.w, IMAGE_BOX.h * aspect), h = w / aspect;
  const pieces = 2 * i.piecesPerArm;
  const tree = div({ width: CARD_WIDTH_PX - 112, height: CARD_HEIGHT_PX - 112, backgroundColor: PALETTE.paper, fontFamily: "Inter, Inter Greek", padding: 56, flexDirection: "row", justifyContent: "space-between" },
    div({ flexDirection: "column", width: 550, justifyContent: "space-between" },
      div({ flexDirection: "column" },
        div({ fontSize: 24, fontWeight: 700, color: PALETTE.wire, letterSpacing: 1 }, "Bentwire Atlas"),
        div({ fontSize: 42, fontWeight: 700, color: PALETTE.ink, marginTop: 22, lineHeight: 1.15 }, entry.title),
        div({ fontSize: 26, color: PALETTE.inkSoft, marginTop: 18 }, `${i.bandName}, ${mhz(i.bandLowHz)}–${mhz(i.bandHighHz)} MHz`)),
      div({ flexDirection: "row" },
        figure(`${figures.gainDbi.toFixed(1)} dBi`, "gain"),
        figure(wireLength(i.lengthM), "wire length"),
        figure(String(pieces), `pieces (${i.piecesPerArm} per arm)`))),
    div({ width: IMAGE_BOX.w + 40, height: CARD_HEIGHT_PX - 112 - 4, alignItems: "center", justifyContent: "center", backgroundColor: PALETTE.paper, borderRadius: 20, border: `2px solid ${PALETTE.grid}` },
      { type: "img", props: { src: `data:image/svg+xml;base64,${Buffer.from(shape).toString("base64")}`, width: Math.round(w), height: Math.round(h) } }));
  // satori's types name React's element type; the plain object tree is what it reads at run time.
  return satori(tree as never, { width: CARD_WIDTH_PX, height: CARD_HEIGHT_PX, fonts });
}

export async function shareCardPng(entry: Entry, fonts: CardFont[] = loadCardFonts()): Promise<Buffer> {
  const svg = await shareCardSvg(entry, fonts);
  return sharp(Buffer.from(svg)).resize(CARD_WIDTH_PX, CARD_HEIGHT_PX).flatten({ background: PALETTE.paper }).png().toBuffer();
}
