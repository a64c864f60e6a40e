// The closed forms that some reference values are computed from (generator/validation/inducedEmf.ts
// and fresnel.ts), checked against published numbers and limits, so a slip in them cannot pass as a
// reference.
import { describe, expect, it } from "vitest";
import { fresnelMagnitude } from "../../generator/validation/fresnel.js";
import { halfWaveMutualResistanceOhm, sineCosineIntegrals } from "../../generator/validation/inducedEmf.js";

const DEG = Math.PI / 180;

describe("sine and cosine integrals and the induced-EMF mutual resistance", () => {
  it("Si(1) = 0.946083, Ci(1) = 0.337404 and Si(5) = 1.549931, Ci(5) = −0.190030 (Abramowitz & Stegun, table 5.1; values from memory)", () => {
    const [si1, ci1] = sineCosineIntegrals(1), [si5, ci5] = sineCosineIntegrals(5);
    expect(si1).toBeCloseTo(0.946083, 6);
    expect(ci1).toBeCloseTo(0.337404, 6);
    expect(si5).toBeCloseTo(1.549931, 6);
    expect(ci5).toBeCloseTo(-0.19003, 5);
  });

  it("R12 at 0.5 λ is about −12.5 Ω (Balanis, Antenna Theory, 3rd ed., fig. 8.20, read from the curve, from memory)", () => {
    expect(halfWaveMutualResistanceOhm(0.5)).toBeCloseTo(-12.5, 0);
  });

  it("R12 tends to the self resistance 73.1 Ω as the spacing shrinks (Balanis eq. 8-61)", () => {
    expect(halfWaveMutualResistanceOhm(1e-5)).toBeCloseTo(73.1, 1);
  });
});

describe("Fresnel reflection magnitudes (Balanis §4.8; any optics text)", () => {
  it("normal incidence on a lossless dielectric: (√ε_r − 1)/(√ε_r + 1) for both polarizations", () => {
    for (const pol of ["horizontal", "vertical"] as const) expect(fresnelMagnitude(pol, 9, 0, 7e6, 90 * DEG)).toBeCloseTo(0.5, 12);
  });

  it("the vertical coefficient vanishes at the Brewster angle tan ψ = 1/√ε_r; the horizontal one does not", () => {
    const psi = Math.atan(1 / 3);
    expect(fresnelMagnitude("vertical", 9, 0, 7e6, psi)).toBeLessThan(1e-12);
    expect(fresnelMagnitude("horizontal", 9, 0, 7e6, psi)).toBeGreaterThan(0.5);
  });

  it("grazing incidence reflects fully; a lossy ground less than fully above it", () => {
    for (const pol of ["horizontal", "vertical"] as const) {
      expect(fresnelMagnitude(pol, 13, 5e-3, 7.1e6, 1e-9)).toBeCloseTo(1, 6);
      expect(fresnelMagnitude(pol, 13, 5e-3, 7.1e6, 20 * DEG)).toBeLessThan(1);
    }
  });

  it("conductivity enters as σ/(ωε₀): a very good conductor reflects fully at every elevation", () => {
    for (const pol of ["horizontal", "vertical"] as const) expect(fresnelMagnitude(pol, 13, 1e9, 7.1e6, 30 * DEG)).toBeCloseTo(1, 3);
  });
});
