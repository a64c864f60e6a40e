// Practical parts for an L-network and the power they lose.
// Bounds (what a builder can buy or wind, and set to value):
//   capacitors 1 pF … 10 nF: under ~1 pF the strays of leads and board are of the same size, so the
//     value cannot be set; above 10 nF no match in this catalog's bands needs it, and larger parts
//     self-resonate low (common practice).
//   inductors 10 nH … 100 µH: 10 nH is about 1 cm of lead (≈ 1 nH/mm, common practice), so less
//     cannot be set apart from the wiring; above 100 µH a wound coil's own capacitance resonates it
//     inside HF (common practice).
// Part quality (unloaded Q at HF/VHF, common practice): inductor Q_L = 100 (air or powdered-iron
//   coil), capacitor Q_C = 1000 (C0G/NP0 ceramic or silver mica). Each part is its reactance in series
//   with a loss resistance r = |X|/Q: inductor Z = ωL/Q_L + jωL, capacitor Z = 1/(ωC·Q_C) − j/(ωC).
// Loss: the network is walked from the load toward the line carrying voltage V and current I
//   (series Z: V ← V + Z·I; shunt Z: I ← I + V/Z), starting from I = 1 A into the load. Efficiency
//   η = P_load / P_in = Re(Z_L)|1|² / Re(V·I*), loss = −10·log10 η dB (Kirchhoff's laws; the
//   small-loss hand form, loss fraction ≈ Q_n/Q_L + Q_n/Q_C with Q_n = √(R_high/R_low − 1), is what
//   the test checks it against).
// E12 values: each part is tried at the E12 value just below and just above its exact value, and
// the combination with the lowest worst-in-band SWR (with the lossy parts) is kept.
import { add, div, mul, type Complex } from "./complex.js";
import { E12_MANTISSAS } from "./e12.js";
import type { MatchComponent } from "./feedMatch.js";

export interface PartBounds {
  minCapacitanceF: number;
  maxCapacitanceF: number;
  minInductanceH: number;
  maxInductanceH: number;
}

export const PRACTICAL_PART_BOUNDS: PartBounds = { minCapacitanceF: 1e-12, maxCapacitanceF: 10e-9, minInductanceH: 10e-9, maxInductanceH: 100e-6 };

export interface PartQuality {
  inductorQ: number;
  capacitorQ: number;
}

/** Common practice at HF/VHF: inductor Q 100, capacitor Q 1000. */
export const DEFAULT_PART_Q: PartQuality = { inductorQ: 100, capacitorQ: 1000 };

export function partInBounds(c: MatchComponent, b: PartBounds = PRACTICAL_PART_BOUNDS): boolean {
  return c.kind === "capacitor"
    ? c.value >= b.minCapacitanceF * (1 - 1e-9) && c.value <= b.maxCapacitanceF * (1 + 1e-9)
    : c.value >= b.minInductanceH * (1 - 1e-9) && c.value <= b.maxInductanceH * (1 + 1e-9);
}

/** Why a part is out of bounds, in words, or null. */
export function partProblem(c: MatchComponent, b: PartBounds = PRACTICAL_PART_BOUNDS): string | null {
  if (partInBounds(c, b)) return null;
  if (c.kind === "capacitor") {
    return c.value < b.minCapacitanceF ? `needs a ${formatPart(c)} capacitor, under the ${formatPart({ ...c, value: b.minCapacitanceF })} that strays allow` : `needs a ${formatPart(c)} capacitor, over ${formatPart({ ...c, value: b.maxCapacitanceF })}`;
  }
  return c.value < b.minInductanceH ? `needs a ${formatPart(c)} inductor, under the ${formatPart({ ...c, value: b.minInductanceH })} of its own leads` : `needs a ${formatPart(c)} inductor, over ${formatPart({ ...c, value: b.maxInductanceH })}`;
}

/** "4.7 pF", "220 nH": engineering prefix, up to 3 significant digits. */
export function formatPart(c: MatchComponent): string {
  const unit = c.kind === "capacitor" ? "F" : "H";
  const prefixes: [number, string][] = [[1e-12, "p"], [1e-9, "n"], [1e-6, "µ"], [1e-3, "m"], [1, ""]];
  let [scale, p] = prefixes[0];
  for (const [s, q] of prefixes) if (c.value >= s * 0.9995) [scale, p] = [s, q];
  return `${Number((c.value / scale).toPrecision(3))} ${p}${unit}`;
}

/** The E12 values just below and just above v (one value when v is itself an E12 value). */
export function e12Neighbours(v: number): number[] {
  const decade = Math.floor(Math.log10(v));
  const values: number[] = [];
  for (let d = decade - 1; d <= decade + 1; d++) for (const m of E12_MANTISSAS) values.push(Number((m * 10 ** d).toPrecision(2)));
  values.sort((a, b) => a - b);
  const below = values.filter((x) => x <= v * (1 + 1e-9)).pop();
  const above = values.find((x) => x >= v * (1 - 1e-9));
  return [...new Set([below, above].filter((x): x is number => x !== undefined))];
}

/** Every combination of E12 neighbours of the parts (2^n at most). */
export function e12Combinations(parts: readonly MatchComponent[]): MatchComponent[][] {
  let combos: MatchComponent[][] = [[]];
  for (const c of parts) combos = combos.flatMap((pre) => e12Neighbours(c.value).map((v) => [...pre, { ...c, value: v }]));
  return combos;
}

function lossyImpedance(c: MatchComponent, omega: number, q: PartQuality): Complex {
  if (c.kind === "inductor") {
    const x = omega * c.value;
    return { re: x / q.inductorQ, im: x };
  }
  const x = 1 / (omega * c.value);
  return { re: x / q.capacitorQ, im: -x };
}

/**
 * Impedance seen from the line and the network's efficiency (power into the load / power into the
 * network) when `parts` (load → line) with finite Q drive zLoad at frequencyHz.
 */
export function lossyNetworkResponse(
  parts: readonly MatchComponent[],
  zLoad: Complex,
  frequencyHz: number,
  q: PartQuality = DEFAULT_PART_Q,
): { inputImpedanceOhm: Complex; efficiency: number } {
  const omega = 2 * Math.PI * frequencyHz;
  let v: Complex = zLoad; // V across the load for I = 1 A into it
  let i: Complex = { re: 1, im: 0 };
  for (const c of parts) {
    const z = lossyImpedance(c, omega, q);
    if (c.position === "series") v = add(v, mul(z, i));
    else i = add(i, div(v, z));
  }
  const pIn = v.re * i.re + v.im * i.im; // Re(V·I*)
  return { inputImpedanceOhm: div(v, i), efficiency: zLoad.re / pIn };
}
