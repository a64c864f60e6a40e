// The readable report of `design`: the parameters a builder bends to, with the sign of every turn
// said in words, the overall span of the bent wire, the band the design was searched over and the
// feed advice (the same lines `analyze --band-mhz` prints).
import type { MatchSuggestion } from "../analysis/feedMatch.js";
import type { Shape } from "../em/index.js";
import { feedLines } from "./feedText.js";
import { fixed, table } from "./format.js";

export interface DesignTextInput {
  parameters: { firstAngleDeg: number; bendAnglesDeg: number[]; pieceLengthsM: number[] };
  shape: Shape;
  bandHz: [number, number];
  /** Whether the band came from --band-mhz (else the default ±2 % around the frequency). */
  bandGiven: boolean;
  match: MatchSuggestion;
}

export const TURN_CONVENTION =
  "turns, seen from above (+z): + turns the right arm clockwise, toward +x; − turns it counter-clockwise, back toward the symmetry axis (+y); the left arm mirrors every turn";

/** A signed turn in words: "12.5° clockwise", "straight on" for one that rounds to 0.0°. */
export function turnWords(deg: number): string {
  const text = fixed(Math.abs(deg), 1);
  if (Number(text) === 0) return "0.0° (straight on)";
  return `${deg > 0 ? "+" : "−"}${text}° (${deg > 0 ? "clockwise" : "counter-clockwise"})`;
}

/** Width across (x) and depth along the symmetry axis (y) of all wires, metres. */
export function spanOf(shape: Shape): { xM: number; yM: number } {
  const pts = shape.wires.flatMap((w) => w.pointsM);
  const ext = (k: 0 | 1) => Math.max(...pts.map((p) => p[k])) - Math.min(...pts.map((p) => p[k]));
  return { xM: ext(0), yM: ext(1) };
}

const metresAndFeet = (m: number) => `${fixed(m, 3)} m (${fixed(m / 0.3048, 2)} ft)`;

export function designText(d: DesignTextInput): string[] {
  const p = d.parameters;
  const rows = [["piece", "length (m)", "turn before it"]];
  p.pieceLengthsM.forEach((len, i) => {
    const turn = i === 0 ? `leaves the feed ${fixed(p.firstAngleDeg, 1)}° from the +y axis, toward +x` : turnWords(p.bendAnglesDeg[i - 1]);
    rows.push([String(i + 1), fixed(len, 4), turn]);
  });
  const span = spanOf(d.shape);
  const [lo, hi] = d.bandHz;
  return [
    "right arm, from the feed outward (the left arm is its mirror image across the y axis):",
    table(rows),
    TURN_CONVENTION,
    "",
    `overall span: ${metresAndFeet(span.xM)} across (x) × ${metresAndFeet(span.yM)} along the symmetry axis (y)`,
    `band: ${fixed(lo / 1e6, 3)}–${fixed(hi / 1e6, 3)} MHz${d.bandGiven ? "" : " (default ±2 % around the frequency; set it with --band-mhz)"}`,
    "",
    ...feedLines(d.match),
  ];
}
