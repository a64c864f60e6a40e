// Smith chart geometry (P. H. Smith, "Transmission line calculator", Electronics, Jan. 1939;
// D. M. Pozar, Microwave Engineering, 4th ed., §2.4): the reflection coefficient
// Γ = (Z − Z0)/(Z + Z0) = (z − 1)/(z + 1) with z = Z/Z0, drawn with Re Γ to the right and Im Γ up.
// Constant-resistance circles: centre (r/(1+r), 0), radius 1/(1+r). Constant-reactance circles:
// centre (1, 1/x), radius 1/|x|; the part inside |Γ| ≤ 1 runs from Γ(jx) to Γ = 1.
import type { Pt } from "./svg.js";
import { num } from "./svg.js";

export interface Complex { re: number; im: number }

/** Γ = (Z − Z0)/(Z + Z0) for a real line impedance Z0. */
export function gammaOf(z: Complex, z0Ohm: number): Complex {
  const nr = z.re - z0Ohm, ni = z.im, dr = z.re + z0Ohm, di = z.im;
  const den = dr * dr + di * di;
  if (den === 0) return { re: 1, im: 0 }; // Z = −Z0 cannot occur for a passive load; treat as open
  return { re: (nr * dr + ni * di) / den, im: (ni * dr - nr * di) / den };
}

/** Where the chart of centre (cx, cy) and radius R draws Γ (SVG y grows downward). */
export interface Chart { cx: number; cy: number; r: number }
export const toXY = (c: Chart, g: Complex): Pt => [c.cx + c.r * g.re, c.cy - c.r * g.im];

/** Full circle of constant normalised resistance r (r = 0 is the rim). */
export function resistanceCircle(c: Chart, r: number): { cx: number; cy: number; r: number } {
  return { cx: c.cx + (c.r * r) / (1 + r), cy: c.cy, r: c.r / (1 + r) };
}

/** SVG path of the constant-reactance arc x inside the unit circle, from the rim to Γ = 1. */
export function reactanceArcPath(c: Chart, x: number): string {
  const rim = toXY(c, gammaOf({ re: 0, im: x }, 1));
  const end = toXY(c, { re: 1, im: 0 });
  const centre = toXY(c, { re: 1, im: 1 / x });
  const rad = c.r / Math.abs(x);
  // The arc inside the chart is always less than a half turn; pick the sweep that runs from
  // the rim point to Γ = 1 the short way round the known centre (screen angles grow clockwise).
  const a0 = Math.atan2(rim[1] - centre[1], rim[0] - centre[0]);
  const a1 = Math.atan2(end[1] - centre[1], end[0] - centre[0]);
  const turn = (((a1 - a0) % (2 * Math.PI)) + 2 * Math.PI) % (2 * Math.PI);
  const sweep = turn < Math.PI ? 1 : 0;
  return `M${num(rim[0])} ${num(rim[1])}A${num(rad)} ${num(rad)} 0 0 ${sweep} ${num(end[0])} ${num(end[1])}`;
}

/** |Γ| for a given SWR: (s − 1)/(s + 1). */
export const gammaMagForSwr = (swr: number): number => (swr - 1) / (swr + 1);
