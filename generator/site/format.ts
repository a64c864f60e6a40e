// Every number the site shows goes through this module, so one value always reads the same on the
// home page, the band table, the design page and the finder. Fixed decimals per quantity (the
// DISPLAY table), a true minus sign, no locale, and never "−0". Imperial lengths use the
// international inch of 1959: 1 in = 0.0254 m exactly.
import { METRE_PER_INCH } from "../units.js";

/** Decimals shown for each quantity; the browser tests read the page back with the same table. */
export const DISPLAY = {
  gainDbi: 2,
  swr: 2,
  wavelengths: 2,
  metres: 3,
  millimetres: 1,
  inches: 2,
  feet: 2,
  degrees: 1,
  ohms: 1,
  percent: 1,
  mhz: 3,
  khz: 0,
  wideMhz: 2,
  picofarads: 2,
  nanohenries: 1,
} as const;

export const MINUS = "\u2212";
export const THIN_SPACE = "\u2009";

/** `value` with exactly `decimals` decimals, a true minus sign, and no negative zero. */
export function fixed(value: number, decimals: number): string {
  if (!Number.isFinite(value)) return "–";
  const text = value.toFixed(decimals);
  if (/^-0\.?0*$/.test(text)) return text.slice(1);
  return text.startsWith("-") ? MINUS + text.slice(1) : text;
}

/** Like `fixed` but with a leading "+" for positive values (relative figures, deviations). */
export function signed(value: number, decimals: number): string {
  const text = fixed(value, decimals);
  return /^[0.]+$/.test(text) || text.startsWith(MINUS) ? text : `+${text}`;
}

/** Reads back a number the site printed: true minus sign, thin spaces and units are ignored. */
export function parseShown(text: string): number {
  const m = /[-\u2212+]?\d+(?:\.\d+)?(?:e[-+]?\d+)?/i.exec(text.replace(/\u2009/g, ""));
  if (!m) return NaN;
  return Number(m[0].replace(MINUS, "-"));
}

/** Number of decimals in the first number of `text` (for "equal within display precision"). */
export function shownDecimals(text: string): number {
  const m = /\d+(?:\.(\d+))?/.exec(text);
  return m?.[1]?.length ?? 0;
}

export const gainDbi = (v: number): string => `${fixed(v, DISPLAY.gainDbi)} dBi`;
export const gainNumber = (v: number): string => fixed(v, DISPLAY.gainDbi);
export const swr = (v: number | null): string => (v === null ? "–" : fixed(v, DISPLAY.swr));
export const wavelengths = (v: number): string => `${trimZeros(fixed(v, DISPLAY.wavelengths))} λ`;
export const metres = (v: number): string => `${fixed(v, DISPLAY.metres)} m`;
export const millimetres = (v: number): string => `${fixed(v * 1000, DISPLAY.millimetres)} mm`;
export const millimetresNumber = (vM: number): string => fixed(vM * 1000, DISPLAY.millimetres);
export const inchesOf = (vM: number): number => vM / METRE_PER_INCH;
export const inches = (vM: number): string => `${fixed(inchesOf(vM), DISPLAY.inches)} in`;
export const inchesNumber = (vM: number): string => fixed(inchesOf(vM), DISPLAY.inches);
export const feet = (vM: number): string => `${fixed(inchesOf(vM) / 12, DISPLAY.feet)} ft`;
export const degrees = (v: number): string => `${fixed(v, DISPLAY.degrees)}°`;
export const percent = (fraction: number): string => `${fixed(fraction * 100, DISPLAY.percent)} %`;

/** Drops trailing zeros after the point ("1.50" → "1.5", "2.00" → "2"). */
export function trimZeros(text: string): string {
  return text.includes(".") ? text.replace(/\.?0+$/, "") : text;
}

/** A frequency in MHz with up to three decimals, trailing zeros dropped: "145 MHz", "433.92 MHz". */
export const mhz = (hz: number): string => `${trimZeros(fixed(hz / 1e6, DISPLAY.mhz))} MHz`;

/** A band's edges: "144–146 MHz". */
export const bandEdges = (lowHz: number, highHz: number): string =>
  `${trimZeros(fixed(lowHz / 1e6, DISPLAY.mhz))}–${trimZeros(fixed(highHz / 1e6, DISPLAY.mhz))} MHz`;

/** A bandwidth: whole kHz below 1 MHz, MHz with three decimals below 10 MHz, two above. */
export function bandwidth(hz: number | null): string {
  if (hz === null || hz <= 0) return "none";
  if (hz < 1e6) return `${fixed(hz / 1e3, DISPLAY.khz)} kHz`;
  return `${fixed(hz / 1e6, hz < 10e6 ? DISPLAY.mhz : DISPLAY.wideMhz)} MHz`;
}

/** A complex impedance: "96.8 − j12.6 Ω". */
export function impedance(z: { re: number; im: number }): string {
  const sign = z.im < 0 && fixed(Math.abs(z.im), DISPLAY.ohms) !== fixed(0, DISPLAY.ohms) ? MINUS : "+";
  return `${fixed(z.re, DISPLAY.ohms)} ${sign} j${fixed(Math.abs(z.im), DISPLAY.ohms)} Ω`;
}

export const ohms = (v: number): string => `${fixed(v, DISPLAY.ohms)} Ω`;

/** A capacitor or inductor value in the unit a builder buys it in. */
export function component(kind: "inductor" | "capacitor", value: number): string {
  return kind === "capacitor" ? `${fixed(value * 1e12, DISPLAY.picofarads)} pF` : `${fixed(value * 1e9, DISPLAY.nanohenries)} nH`;
}

/** An E12 part value, shown the way it is printed on the part: "10 pF", "56 nH", "2.2 pF". */
export function e12Component(kind: "inductor" | "capacitor", value: number): string {
  const scaled = kind === "capacitor" ? value * 1e12 : value * 1e9;
  return `${trimZeros(fixed(scaled, 2))} ${kind === "capacitor" ? "pF" : "nH"}`;
}

const VARIANT_WORDS = { "max-gain": "most gain", "direct-feed": "direct 50 Ω feed" } as const;
export type Variant = keyof typeof VARIANT_WORDS;
export const variantWords = (v: Variant): string => VARIANT_WORDS[v];
export const variantShort = (v: Variant): string => (v === "max-gain" ? "most gain" : "direct feed");

export const piecesPerArm = (k: number): string => (k === 1 ? "1 piece per arm" : `${k} pieces per arm`);

/** "2.530 × 0.736 m" for a span. */
export const span = (s: { x: number; y: number }): string => `${fixed(s.x, DISPLAY.metres)} × ${fixed(s.y, DISPLAY.metres)} m`;
export const spanInches = (s: { x: number; y: number }): string =>
  `${fixed(inchesOf(s.x), DISPLAY.inches)} × ${fixed(inchesOf(s.y), DISPLAY.inches)} in`;
