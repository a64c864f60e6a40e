// A minimal PDF reader for tests, independent of the library that writes our PDFs: page boxes by
// regular expression, page content streams inflated with zlib, rectangle operators read as numbers.
// It reads what pdf-lib writes with useObjectStreams: false and nothing more general.
import { inflateSync } from "node:zlib";

export interface PdfReadBack {
  pages: { widthPt: number; heightPt: number }[];
  /** Every `x y w h re` rectangle in the page content streams, in points. */
  rects: { w: number; h: number }[];
  text: string;
}

/** Reads page boxes and rectangles from an uncompressed-object PDF whose streams are Flate-coded. */
export function readPdf(bytes: Uint8Array): PdfReadBack {
  const raw = Buffer.from(bytes).toString("latin1");
  const pages = [...raw.matchAll(/\/Type \/Page\b[\s\S]*?\/MediaBox \[ ([\d.]+) ([\d.]+) ([\d.]+) ([\d.]+) \]/g)].map((m) => ({ widthPt: Number(m[3]) - Number(m[1]), heightPt: Number(m[4]) - Number(m[2]) }));
  const rects: PdfReadBack["rects"] = [];
  let text = "";
  for (const m of raw.matchAll(/\/Filter \/FlateDecode[^>]*>>\s*stream\r?\n/g)) {
    const start = m.index! + m[0].length;
    const end = raw.indexOf("endstream", start);
    let body: string;
    try { body = inflateSync(Buffer.from(raw.slice(start, end), "latin1")).toString("latin1"); } catch { continue; }
    text += body;
    for (const r of body.matchAll(/(-?[\d.]+) (-?[\d.]+) (-?[\d.]+) (-?[\d.]+) re\b/g)) rects.push({ w: Number(r[3]), h: Number(r[4]) });
  }
  return { pages, rects, text };
}

