import { describe, expect, it } from "vitest";
import { roundLNetworkToE12, roundToE12 } from "../../generator/analysis/e12.js";
import { designLNetworks, inputImpedanceOfMatchedLoad } from "../../generator/analysis/lNetwork.js";
import { swr } from "../../generator/analysis/swr.js";

// E12 series per IEC 60063: 1.0 1.2 1.5 1.8 2.2 2.7 3.3 3.9 4.7 5.6 6.8 8.2. Expected results are
// worked by hand in log distance, ln(a/b).

describe("rounding to E12 preferred values (nearest in log scale)", () => {
  it("rounds 4.3 up to 4.7 (ln(4.7/4.3) = 0.089 < ln(4.3/3.9) = 0.098)", () => {
    expect(roundToE12(4.3)).toBe(4.7);
  });

  it("rounds 1.1 pF up to 1.2 pF (ln(1.2/1.1) = 0.087 < ln(1.1/1.0) = 0.095)", () => {
    expect(roundToE12(1.1e-12)).toBe(1.2e-12);
  });

  it("splits 1.0 and 1.2 at their geometric mean √1.2 = 1.0954", () => {
    expect(roundToE12(1.095)).toBe(1);
    expect(roundToE12(1.096)).toBe(1.2);
  });

  it("rounds across a decade boundary (9.5 → 10, 0.0009 → 0.00082)", () => {
    expect(roundToE12(9.5)).toBe(10);
    expect(roundToE12(0.0009)).toBe(0.00082);
  });

  it("returns the exact printed double for picofarad and nanohenry values", () => {
    expect(roundToE12(4.71e-12)).toBe(4.7e-12);
    expect(roundToE12(38.98e-9)).toBe(39e-9);
    expect(roundToE12(1e-12)).toBe(1e-12);
    expect(roundToE12(330)).toBe(330);
  });

  it("rejects non-positive or non-finite values with a one-line message", () => {
    expect(() => roundToE12(0)).toThrow(/^value must be a positive finite number \(got 0\)$/);
    expect(() => roundToE12(-3)).toThrow(/^value must be a positive finite number \(got -3\)$/);
    expect(() => roundToE12(Infinity)).toThrow(/^value must be a positive finite number \(got Infinity\)$/);
  });
});

describe("rounding an L-network to E12 parts", () => {
  // Pozar Example 5.1 load (200 − j100 Ω, 100 Ω, 500 MHz): 0.923 pF → 1.0 pF, 38.98 nH → 39 nH.
  const zLoad = { re: 200, im: -100 };
  const [exact] = designLNetworks(zLoad, 100, 500e6);
  const rounded = roundLNetworkToE12(exact);

  it("rounds each component and keeps order and topology", () => {
    expect(rounded.topology).toBe(exact.topology);
    expect(rounded.components).toEqual([
      { kind: "capacitor", position: "shunt", capacitanceF: 1e-12 },
      { kind: "inductor", position: "series", inductanceH: 39e-9 },
    ]);
  });

  it("recomputes the design reactances from the rounded parts", () => {
    const omega = 2 * Math.PI * 500e6;
    expect(rounded.shuntSusceptanceS).toBeCloseTo(omega * 1e-12, 15);
    expect(rounded.seriesReactanceOhm).toBeCloseTo(omega * 39e-9, 10);
  });

  it("still gives a usable match with rounded parts (SWR below 1.5, not exactly 1)", () => {
    const s = swr(inputImpedanceOfMatchedLoad(rounded, zLoad, 500e6), 100);
    expect(s).toBeGreaterThan(1.001);
    expect(s).toBeLessThan(1.5);
  });
});
