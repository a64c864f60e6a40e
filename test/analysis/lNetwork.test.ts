import { describe, expect, it } from "vitest";
import {
  designLNetworks,
  inputImpedanceOfMatchedLoad,
  type LNetwork,
  type MatchingComponent,
} from "../../generator/analysis/lNetwork.js";
import { reflectionCoefficient } from "../../generator/analysis/swr.js";
import { abs } from "../../generator/analysis/complex.js";

function value(c: MatchingComponent): number {
  return c.kind === "inductor" ? c.inductanceH : c.capacitanceF;
}

function gammaAtDesign(n: LNetwork, zLoad: { re: number; im: number }): number {
  const zIn = inputImpedanceOfMatchedLoad(n, zLoad, n.designFrequencyHz);
  return abs(reflectionCoefficient(zIn, n.lineImpedanceOhm));
}

describe("L-network for Pozar's worked example (Microwave Engineering, 4th ed., Example 5.1)", () => {
  // Load 200 − j100 Ω, 100 Ω line, 500 MHz. Closed form from the §5.1 formulas:
  // B = (−1 ± √6)/500 S, X = ±50√6 Ω. Printed results (from memory, not checked against the book):
  // B = 0.0029 S → C = 0.92 pF, X = 122.5 Ω → L = 38.8 nH; B = −0.0069 S → L = 46.1 nH, X → C = 2.61 pF.
  // The book's 38.8 nH and 2.61 pF come from the rounded normalised x = ±1.22; exact x = ±1.2247
  // gives 38.98 nH and 2.599 pF, so those two are compared at 1 %.
  const f = 500e6;
  const omega = 2 * Math.PI * f;
  const [first, second] = designLNetworks({ re: 200, im: -100 }, 100, f);

  it("finds B = (−1 + √6)/500 S and X = 50√6 Ω for the first solution", () => {
    expect(first.shuntSusceptanceS).toBeCloseTo((-1 + Math.sqrt(6)) / 500, 15);
    expect(first.seriesReactanceOhm).toBeCloseTo(50 * Math.sqrt(6), 10);
  });

  it("builds the first solution from a shunt capacitor at the load and a series inductor", () => {
    expect(first.topology).toBe("shunt capacitor across the load, then series inductor toward the line");
    expect(first.components.map((c) => [c.kind, c.position])).toEqual([
      ["capacitor", "shunt"],
      ["inductor", "series"],
    ]);
    const [c, l] = first.components.map(value);
    expect(c).toBeCloseTo((-1 + Math.sqrt(6)) / 500 / omega, 25);
    expect(l).toBeCloseTo((50 * Math.sqrt(6)) / omega, 20);
    expect(c / 0.92e-12).toBeCloseTo(1, 2); // printed 0.92 pF (from memory)
    expect(Math.abs(l / 38.8e-9 - 1)).toBeLessThan(0.01); // printed 38.8 nH (from memory)
  });

  it("finds B = (−1 − √6)/500 S and X = −50√6 Ω for the second solution, built from L then C", () => {
    expect(second.shuntSusceptanceS).toBeCloseTo((-1 - Math.sqrt(6)) / 500, 15);
    expect(second.seriesReactanceOhm).toBeCloseTo(-50 * Math.sqrt(6), 10);
    expect(second.topology).toBe("shunt inductor across the load, then series capacitor toward the line");
    const [l, c] = second.components.map(value);
    expect(l).toBeCloseTo(500 / ((1 + Math.sqrt(6)) * omega), 20);
    expect(c).toBeCloseTo(1 / (50 * Math.sqrt(6) * omega), 25);
    expect(Math.abs(l / 46.1e-9 - 1)).toBeLessThan(0.01); // printed 46.1 nH (from memory)
    expect(Math.abs(c / 2.61e-12 - 1)).toBeLessThan(0.01); // printed 2.61 pF (from memory)
  });

  it("matches at 500 MHz and mismatches away from it with the same components", () => {
    expect(gammaAtDesign(first, { re: 200, im: -100 })).toBeLessThan(1e-12);
    const zOff = inputImpedanceOfMatchedLoad(first, { re: 200, im: -100 }, 600e6);
    expect(abs(reflectionCoefficient(zOff, 100))).toBeGreaterThan(0.05);
  });
});

describe("every L-network solution matches its load at the design frequency", () => {
  const lines = [50, 100];
  const resistances = [1, 12.5, 49, 49.999, 50.001, 51, 75, 100.01, 300, 2000];
  const reactances = [-500, -60, -1, 0, 1, 60, 500];
  for (const z0 of lines) {
    for (const r of resistances) {
      if (r === z0) continue;
      it(`gives two exact matches for loads R = ${r} Ω with X from −500 to 500 Ω on ${z0} Ω`, () => {
        for (const x of reactances) {
          for (const f of [1.8e6, 146e6]) {
            const networks = designLNetworks({ re: r, im: x }, z0, f);
            expect(networks).toHaveLength(2);
            for (const n of networks) {
              expect(gammaAtDesign(n, { re: r, im: x })).toBeLessThan(1e-9);
              expect(n.components.length).toBeGreaterThanOrEqual(1);
              for (const c of n.components) expect(value(c)).toBeGreaterThan(0);
            }
          }
        }
      });
    }
  }

  it("puts the series element next to the load when R_L < Z0", () => {
    const [a, b] = designLNetworks({ re: 10, im: 5 }, 50, 14e6);
    expect(a.components[0].position).toBe("series");
    expect(b.components[0].position).toBe("series");
    expect(a.topology).toMatch(/^series .* at the load, then shunt .* across the line$/);
  });
});

describe("L-network special cases", () => {
  it("needs only a series capacitor when R_L = Z0 and the load is inductive", () => {
    const nets = designLNetworks({ re: 50, im: 30 }, 50, 10e6);
    expect(nets).toHaveLength(1);
    expect(nets[0].topology).toBe("series capacitor at the load only");
    expect(nets[0].seriesReactanceOhm).toBe(-30);
    expect(gammaAtDesign(nets[0], { re: 50, im: 30 })).toBeLessThan(1e-12);
  });

  it("needs nothing when the load already equals the line impedance", () => {
    const nets = designLNetworks({ re: 50, im: 0 }, 50, 10e6);
    expect(nets).toHaveLength(1);
    expect(nets[0].components).toEqual([]);
    expect(nets[0].topology).toMatch(/^no matching needed/);
  });

  it("omits the series element when the match needs none (R_L < Z0, X = −X_L ± √(R_L(Z0−R_L)) = 0)", () => {
    // R = 25, Z0 = 50: √(25·25) = 25, so X_L = 25 makes the first solution's series X zero.
    const [a] = designLNetworks({ re: 25, im: 25 }, 50, 10e6);
    expect(a.components).toHaveLength(1);
    expect(a.topology).toBe("shunt capacitor across the load only");
    expect(gammaAtDesign(a, { re: 25, im: 25 })).toBeLessThan(1e-12);
  });

  it("rejects loads with R_L ≤ 0 and other bad arguments with a one-line message", () => {
    expect(() => designLNetworks({ re: 0, im: 10 }, 50, 1e6)).toThrow(
      /^zLoadOhm\.re must be positive for an L-network match \(got 0\+10j\)$/,
    );
    expect(() => designLNetworks({ re: -5, im: 0 }, 50, 1e6)).toThrow(/^zLoadOhm\.re must be positive/);
    expect(() => designLNetworks({ re: 50, im: 0 }, -50, 1e6)).toThrow(
      /^lineImpedanceOhm must be a positive finite number \(got -50\)$/,
    );
    expect(() => designLNetworks({ re: 50, im: 0 }, 50, 0)).toThrow(/^frequencyHz must be a positive finite number \(got 0\)$/);
    expect(() => inputImpedanceOfMatchedLoad({ components: [] }, { re: 1, im: Infinity }, 1e6)).toThrow(
      /^zLoadAtF must have finite re and im/,
    );
  });
});
