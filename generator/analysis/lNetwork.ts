// Two-element L-network matching a load Z_L = R_L + jX_L to a real line impedance Z0
// (Pozar, Microwave Engineering, 4th ed., §5.1 "Matching with lumped elements (L networks)").
// R_L > Z0: shunt jB across the load, series jX toward the line, with
//   B = [X_L ± √(R_L/Z0)·√(R_L² + X_L² − Z0·R_L)] / (R_L² + X_L²),
//   X = 1/B + X_L·Z0/R_L − Z0/(B·R_L).
// R_L < Z0: series jX at the load, shunt jB across the line, with
//   X = ±√(R_L(Z0 − R_L)) − X_L,  B = ±√((Z0 − R_L)/R_L)/Z0  (same sign in both).
// R_L = Z0: a single series X = −X_L. Components at ω = 2πf: series X > 0 → L = X/ω,
// X < 0 → C = −1/(ωX); shunt B > 0 → C = B/ω, B < 0 → L = −1/(ωB).

import { add, div, formatComplex, mul, requireFiniteComplex, type Complex } from "./complex.js";
import { requirePositiveFinite } from "./complex.js";

export type ComponentPosition = "series" | "shunt";

export type MatchingComponent =
  | { kind: "inductor"; position: ComponentPosition; inductanceH: number }
  | { kind: "capacitor"; position: ComponentPosition; capacitanceF: number };

export interface LNetwork {
  /** Plain-words layout, reading from the load toward the line. */
  topology: string;
  /** Ordered from the load toward the line; a zero-valued element is left out. */
  components: MatchingComponent[];
  /** Series reactance at the design frequency (0 when absent). */
  seriesReactanceOhm: number;
  /** Shunt susceptance at the design frequency (0 when absent). */
  shuntSusceptanceS: number;
  designFrequencyHz: number;
  lineImpedanceOhm: number;
}

/** Relative tolerance under which R_L is treated as equal to Z0. */
const EQUAL_RESISTANCE_TOLERANCE = 1e-12;


function seriesComponent(reactanceOhm: number, omega: number): MatchingComponent | null {
  if (reactanceOhm > 0) return { kind: "inductor", position: "series", inductanceH: reactanceOhm / omega };
  if (reactanceOhm < 0) return { kind: "capacitor", position: "series", capacitanceF: -1 / (omega * reactanceOhm) };
  return null;
}

function shuntComponent(susceptanceS: number, omega: number): MatchingComponent | null {
  if (susceptanceS > 0) return { kind: "capacitor", position: "shunt", capacitanceF: susceptanceS / omega };
  if (susceptanceS < 0) return { kind: "inductor", position: "shunt", inductanceH: -1 / (omega * susceptanceS) };
  return null;
}

/** Describes an ordered component list (load → line) in words. */
export function describeTopology(components: readonly MatchingComponent[]): string {
  if (components.length === 0) return "no matching needed: the load already equals the line impedance";
  const phrase = (c: MatchingComponent, first: boolean): string => {
    if (c.position === "shunt") return `shunt ${c.kind} across the ${first ? "load" : "line"}`;
    return first ? `series ${c.kind} at the load` : `series ${c.kind} toward the line`;
  };
  const parts = components.map((c, i) => phrase(c, i === 0));
  return components.length === 1 ? `${parts[0]} only` : parts.join(", then ");
}

function buildNetwork(
  order: "shuntFirst" | "seriesFirst",
  reactanceOhm: number,
  susceptanceS: number,
  frequencyHz: number,
  lineImpedanceOhm: number,
): LNetwork {
  const omega = 2 * Math.PI * frequencyHz;
  const s = seriesComponent(reactanceOhm, omega);
  const p = shuntComponent(susceptanceS, omega);
  const ordered = order === "shuntFirst" ? [p, s] : [s, p];
  const components = ordered.filter((c): c is MatchingComponent => c !== null);
  return {
    topology: describeTopology(components),
    components,
    seriesReactanceOhm: reactanceOhm,
    shuntSusceptanceS: susceptanceS,
    designFrequencyHz: frequencyHz,
    lineImpedanceOhm,
  };
}

/**
 * All L-network solutions matching zLoadOhm to a real line of lineImpedanceOhm at frequencyHz:
 * two when R_L ≠ Z0, one when R_L = Z0 (a series reactance, or nothing if already matched).
 */
export function designLNetworks(
  zLoadOhm: Complex,
  lineImpedanceOhm: number,
  frequencyHz: number,
): LNetwork[] {
  requireFiniteComplex("zLoadOhm", zLoadOhm);
  requirePositiveFinite("lineImpedanceOhm", lineImpedanceOhm);
  requirePositiveFinite("frequencyHz", frequencyHz);
  const { re: r, im: x } = zLoadOhm;
  const z0 = lineImpedanceOhm;
  if (!(r > 0)) {
    throw new Error(`zLoadOhm.re must be positive for an L-network match (got ${formatComplex(zLoadOhm)})`);
  }

  if (Math.abs(r - z0) <= EQUAL_RESISTANCE_TOLERANCE * z0) {
    return [buildNetwork("seriesFirst", -x, 0, frequencyHz, z0)];
  }

  if (r > z0) {
    const mag2 = r * r + x * x;
    const root = Math.sqrt(r / z0) * Math.sqrt(mag2 - z0 * r);
    // The root whose sign matches X_L is free of cancellation; the other follows from the
    // product of the roots, B₊·B₋ = −(R_L − Z0)/(Z0·(R_L² + X_L²)), which stays accurate near R_L ≈ Z0.
    const bLarge = (x + (x < 0 ? -root : root)) / mag2;
    const bSmall = -(r - z0) / (z0 * mag2 * bLarge);
    const [bPlus, bMinus] = x < 0 ? [bSmall, bLarge] : [bLarge, bSmall];
    return [bPlus, bMinus].map((b) => {
      const reactance = (r - z0) / (b * r) + (x * z0) / r; // = 1/B + X_L·Z0/R_L − Z0/(B·R_L)
      return buildNetwork("shuntFirst", reactance, b, frequencyHz, z0);
    });
  }

  const xRoot = Math.sqrt(r * (z0 - r));
  const bRoot = Math.sqrt((z0 - r) / r) / z0;
  return [1, -1].map((sign) =>
    buildNetwork("seriesFirst", sign * xRoot - x, sign * bRoot, frequencyHz, z0),
  );
}

function componentImpedance(c: MatchingComponent, omega: number): Complex {
  if (c.kind === "inductor") return { re: 0, im: omega * c.inductanceH };
  return { re: 0, im: -1 / (omega * c.capacitanceF) };
}

/**
 * Impedance seen from the line when the network's fixed components drive zLoadAtF at
 * frequencyHz (any frequency, so a band can be swept). Walks the components load → line:
 * series adds, shunt combines in parallel. A lossless parallel resonance gives non-finite parts.
 */
export function inputImpedanceOfMatchedLoad(
  network: Pick<LNetwork, "components">,
  zLoadAtF: Complex,
  frequencyHz: number,
): Complex {
  requireFiniteComplex("zLoadAtF", zLoadAtF);
  requirePositiveFinite("frequencyHz", frequencyHz);
  const omega = 2 * Math.PI * frequencyHz;
  let z = zLoadAtF;
  for (const c of network.components) {
    const value = c.kind === "inductor" ? c.inductanceH : c.capacitanceF;
    const field = c.kind === "inductor" ? "inductanceH" : "capacitanceF";
    requirePositiveFinite(`component ${field}`, value);
    const zc = componentImpedance(c, omega);
    z = c.position === "series" ? add(z, zc) : div(mul(z, zc), add(z, zc));
  }
  return z;
}
