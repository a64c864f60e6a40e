// Node coordinates as CSV (RFC 4180: comma separated, CRLF line ends, a header row, fields quoted
// only when they hold a comma, quote or line break). One row per polyline vertex, in metres
// (6 decimals) and international inches (4 decimals; 1 in = 0.0254 m exactly).
import { METRE_PER_INCH } from "../units.js";
import { fixed } from "./format.js";
import type { ExportShape } from "./types.js";
import { assertExportShape } from "./validate.js";

export const CSV_COLUMNS = [
  "wire_index",
  "vertex_index",
  "x_m",
  "y_m",
  "z_m",
  "x_in",
  "y_in",
  "z_in",
] as const;

const CRLF = "\r\n";

/** One CSV field, quoted and with inner quotes doubled when RFC 4180 requires it. */
export function csvField(text: string): string {
  return /[",\r\n]/.test(text) ? `"${text.replace(/"/g, '""')}"` : text;
}

function csvRow(fields: readonly string[]): string {
  return fields.map(csvField).join(",") + CRLF;
}

/** CSV of every vertex of every wire; indices count from 0 in input order. */
export function nodesCsv(shape: ExportShape): string {
  assertExportShape(shape);
  let out = csvRow(CSV_COLUMNS);
  shape.wires.forEach((wire, w) => {
    wire.pointsM.forEach((p, j) => {
      out += csvRow([
        String(w),
        String(j),
        ...p.map((m) => fixed(m, 6)),
        ...p.map((m) => fixed(m / METRE_PER_INCH, 4)),
      ]);
    });
  });
  return out;
}
