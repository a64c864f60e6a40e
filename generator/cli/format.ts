// Small number formatting helpers shared by the readable reports.
import { DEG_PER_RAD } from "../units.js";

/** `v` with `digits` decimals; a value that rounds to zero never shows a sign ("-0.0" → "0.0"). */
export const fixed = (v: number, digits: number): string => {
  if (!Number.isFinite(v)) return String(v);
  const text = v.toFixed(digits);
  return /^-0(\.0*)?$/.test(text) ? text.slice(1) : text;
};
export const deg = (rad: number): number => round(rad * DEG_PER_RAD, 2);
export const round = (v: number, digits: number): number => {
  const f = 10 ** digits;
  return Math.round(v * f) / f;
};
export const complexText = (z: { re: number; im: number }, digits = 1): string =>
  `${fixed(z.re, digits)} ${z.im < 0 ? "−" : "+"} j${fixed(Math.abs(z.im), digits)} Ω`;
export const table = (rows: string[][]): string => {
  const widths = rows[0].map((_, c) => Math.max(...rows.map((r) => (r[c] ?? "").length)));
  return rows.map((r) => r.map((cell, c) => cell.padEnd(widths[c])).join("  ").trimEnd()).join("\n");
};
