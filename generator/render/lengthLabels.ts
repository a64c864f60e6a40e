// Length words for drawings (SI, metres inside): piece lengths in mm or cm (one unit per drawing),
// and a scale-bar length picked from 1–2–5 × 10ⁿ m so the bar is a round number.

export type PieceUnit = "mm" | "cm";

/** cm when any piece reaches a metre, else mm. */
export const pieceUnit = (longestM: number): PieceUnit => (longestM >= 1 ? "cm" : "mm");

/** "8.4 mm", "290 mm", "87.7 cm", "155.1 cm". */
export function lengthLabel(m: number, unit: PieceUnit): string {
  if (unit === "cm") return `${(m * 100).toFixed(1)} cm`;
  const mm = m * 1000;
  return `${mm < 100 ? mm.toFixed(1) : mm.toFixed(0)} mm`;
}

/** The largest 1–2–5 × 10ⁿ metre length not above `maxM`. */
export function roundBarLengthM(maxM: number): number {
  const decade = 10 ** Math.floor(Math.log10(maxM));
  for (const k of [5, 2, 1]) if (k * decade <= maxM * (1 + 1e-9)) return k * decade;
  return decade;
}

/** "1 m", "50 cm", "5 mm". */
export function barLabel(m: number): string {
  if (m >= 1) return `${Number(m.toPrecision(3))} m`;
  if (m >= 0.01) return `${Number((m * 100).toPrecision(3))} cm`;
  return `${Number((m * 1000).toPrecision(3))} mm`;
}
