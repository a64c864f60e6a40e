// Rounding to IEC 60063 E12 preferred values (1.0 1.2 1.5 1.8 2.2 2.7 3.3 3.9 4.7 5.6 6.8 8.2 per
// decade). "Nearest" is measured in log scale, |ln(v) − ln(e)|, because the series is (roughly)
// geometric; the listed values are used as printed, not 10^(k/12). An exact tie goes to the lower.

import type { LNetwork, MatchingComponent } from "./lNetwork.js";

export const E12_MANTISSAS: readonly number[] = [1.0, 1.2, 1.5, 1.8, 2.2, 2.7, 3.3, 3.9, 4.7, 5.6, 6.8, 8.2];

/** Nearest E12 value to a positive finite value, e.g. 4.3 → 4.7, 1.1e-12 → 1.2e-12. */
export function roundToE12(value: number): number {
  if (typeof value !== "number" || !Number.isFinite(value) || value <= 0) {
    throw new Error(`value must be a positive finite number (got ${value})`);
  }
  const decade = Math.floor(Math.log10(value));
  const lnValue = Math.log(value);
  let best = NaN;
  let bestDistance = Infinity;
  // Neighbouring decades too, so float error in log10 near a decade edge cannot mislead.
  for (let d = decade - 1; d <= decade + 1; d++) {
    for (const m of E12_MANTISSAS) {
      // toPrecision(2) yields the double nearest to the printed value, e.g. exactly 4.7e-12.
      const candidate = Number((m * 10 ** d).toPrecision(2));
      const distance = Math.abs(lnValue - Math.log(candidate));
      if (distance < bestDistance) {
        bestDistance = distance;
        best = candidate;
      }
    }
  }
  return best;
}

function roundComponent(c: MatchingComponent): MatchingComponent {
  return c.kind === "inductor"
    ? { ...c, inductanceH: roundToE12(c.inductanceH) }
    : { ...c, capacitanceF: roundToE12(c.capacitanceF) };
}

/**
 * The same network with each component rounded to E12; seriesReactanceOhm and shuntSusceptanceS
 * are recomputed from the rounded parts at the design frequency, so the record stays consistent.
 */
export function roundLNetworkToE12(network: LNetwork): LNetwork {
  const omega = 2 * Math.PI * network.designFrequencyHz;
  const components = network.components.map(roundComponent);
  let seriesReactanceOhm = 0;
  let shuntSusceptanceS = 0;
  for (const c of components) {
    if (c.position === "series") {
      seriesReactanceOhm = c.kind === "inductor" ? omega * c.inductanceH : -1 / (omega * c.capacitanceF);
    } else {
      shuntSusceptanceS = c.kind === "capacitor" ? omega * c.capacitanceF : -1 / (omega * c.inductanceH);
    }
  }
  return { ...network, components, seriesReactanceOhm, shuntSusceptanceS };
}
