// The ground under a shape: the plane z = 0, perfect or real, its schema and named presets.
// Real ground is a half-space of complex relative permittivity (time convention e^{jωt})
//   ε_c = ε_r − jσ/(ωε₀),
// and the impedance matrix uses the normal-incidence reflection coefficient written so that it
// tends to +1 as σ → ∞ (the perfect-ground image already carries the sign of a perfect conductor):
//   Γ₀ = (√ε_c − 1)/(√ε_c + 1)   (Balanis, Antenna Theory, 3rd ed., §4.8, normal incidence).
// √ is the principal root (Re ≥ 0), so |Γ₀| < 1 for any lossy or lossless ground with ε_r > 1.
import { z } from "zod";
import { InputError } from "../errors.js";
import { EPS0_F_PER_M } from "../units.js";

const finite = (what: string) =>
  z.number({ error: `${what} must be a number` }).refine(Number.isFinite, `${what} must be finite`);

export const groundSchema = z.union(
  [
    z.strictObject({ type: z.literal("perfect") }),
    z.strictObject({
      type: z.literal("real"),
      relativePermittivity: finite("ground.relativePermittivity").refine((v) => v >= 1, "ground.relativePermittivity must be at least 1"),
      conductivitySPerM: finite("ground.conductivitySPerM").refine((v) => v >= 0, "ground.conductivitySPerM must be 0 or more"),
    }),
  ],
  { error: 'ground must be {"type": "perfect"} or {"type": "real", "relativePermittivity": ε_r ≥ 1, "conductivitySPerM": σ ≥ 0}' },
);

export type Ground = z.output<typeof groundSchema>;
export type RealGround = Extract<Ground, { type: "real" }>;

/**
 * Named grounds. Values: ITU-R Recommendation P.527 ("Electrical characteristics of the surface of
 * the Earth"), the curves at HF as commonly tabulated; recalled from memory, not read from the
 * document, so treat them as typical rather than authoritative:
 *   sea water ε_r 70, σ 5 S/m; fresh water ε_r 80, σ 3e-3 S/m (P.527 gives 80 and 3e-3 at low HF);
 *   good (wet) ground ε_r 30, σ 1e-2; average ground ε_r 13, σ 5e-3 (the common "average" pair);
 *   poor (dry) ground ε_r 5, σ 1e-3 S/m (a common "poor ground" pair, between P.527's medium-dry
 *   ground, ε_r 15, σ 1e-3, and its very dry ground, ε_r 3, σ 1e-4).
 */
export const GROUND_PRESETS: Readonly<Record<string, RealGround>> = {
  poor: { type: "real", relativePermittivity: 5, conductivitySPerM: 1e-3 },
  average: { type: "real", relativePermittivity: 13, conductivitySPerM: 5e-3 },
  good: { type: "real", relativePermittivity: 30, conductivitySPerM: 1e-2 },
  "fresh-water": { type: "real", relativePermittivity: 80, conductivitySPerM: 3e-3 },
  "sea-water": { type: "real", relativePermittivity: 70, conductivitySPerM: 5 },
};

export const GROUND_NAMES = ["perfect", ...Object.keys(GROUND_PRESETS)] as const;

/** "perfect" or a preset name → the ground; anything else is one clear line. */
export function groundByName(name: string, label = "--ground"): Ground {
  if (name === "perfect") return { type: "perfect" };
  const g = GROUND_PRESETS[name];
  if (!g) throw new InputError(`${label} must be one of ${GROUND_NAMES.join(", ")} (got ${JSON.stringify(name)})`);
  return g;
}

export interface Complex {
  re: number;
  im: number;
}

/** ε_c = ε_r − jσ/(ωε₀) (e^{jωt}). */
export function complexPermittivity(ground: RealGround, frequencyHz: number): Complex {
  return { re: ground.relativePermittivity, im: -ground.conductivitySPerM / (2 * Math.PI * frequencyHz * EPS0_F_PER_M) };
}

export const cmul = (a: Complex, b: Complex): Complex => ({ re: a.re * b.re - a.im * b.im, im: a.re * b.im + a.im * b.re });
export const cdiv = (a: Complex, b: Complex): Complex => {
  const d = b.re * b.re + b.im * b.im;
  return { re: (a.re * b.re + a.im * b.im) / d, im: (a.im * b.re - a.re * b.im) / d };
};
/** Principal square root, Re ≥ 0. */
export function csqrt(a: Complex): Complex {
  const m = Math.hypot(a.re, a.im);
  const re = Math.sqrt(Math.max(0, (m + a.re) / 2));
  const im = Math.sqrt(Math.max(0, (m - a.re) / 2));
  return { re, im: a.im < 0 ? -im : im };
}

/**
 * The factor on the perfect-ground image term in the matrix: 1 for perfect ground, else
 * Γ₀ = (√ε_c − 1)/(√ε_c + 1). For σ → ∞ the real ground's value tends to 1.
 */
export function imageFactor(ground: Ground, frequencyHz: number): Complex {
  if (ground.type === "perfect") return { re: 1, im: 0 };
  const s = csqrt(complexPermittivity(ground, frequencyHz));
  return cdiv({ re: s.re - 1, im: s.im }, { re: s.re + 1, im: s.im });
}
