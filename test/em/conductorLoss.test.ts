// Conductor loss. Skin-effect resistance per unit length of a round wire R' = (1/(2πa))·√(ωμ0/2σ)
// (Balanis, Antenna Theory, 3rd ed., eq. 2-90b); for a half-wave dipole with a sinusoidal current
// the loss resistance referred to the feed is R_L = R'·l/2 (Balanis, §4.5.4 / Example 2.13: half
// the uniform-current value because ∫ sin²(…) dz = l/2). Copper σ = 5.8e7 S/m (handbook value).
import { describe, expect, it } from "vitest";
import { solveShape, validateShape } from "../../generator/em/index.js";
import { surfaceResistancePerM } from "../../generator/em/impedance.js";
import { SPEED_OF_LIGHT_M_PER_S } from "../../generator/units.js";

const dipoleAt = (frequencyHz: number, radiusM: number, conductor: unknown) => {
  const h = (0.48 * SPEED_OF_LIGHT_M_PER_S) / frequencyHz / 2;
  return validateShape({
    frequencyHz,
    wireRadiusM: radiusM,
    conductor,
    wires: [{ pointsM: [[-h, 0, 0], [0, 0, 0], [h, 0, 0]] }],
    feed: { wire: 0, vertex: 1 },
    segmentsPerWavelength: 60,
  });
};

describe("conductor loss", () => {
  it("copper half-wave dipole of 2 mm wire at 145 MHz is more than 99 % efficient", () => {
    const s = solveShape(dipoleAt(145e6, 1e-3, "copper"));
    expect(s.radiationEfficiency).toBeGreaterThan(0.99);
    expect(s.radiationEfficiency).toBeLessThan(1);
  });

  it("gain = directivity + 10·log10(efficiency) (IEEE Std 145 definitions)", () => {
    const s = solveShape(dipoleAt(145e6, 1e-3, "copper"));
    expect(s.peakGainDbi).toBeCloseTo(s.peakDirectivityDbi + 10 * Math.log10(s.radiationEfficiency), 10);
  });

  it("thin lossy wire's loss resistance agrees with R'·l/2 for a sinusoidal current (Balanis eq. 2-90b)", () => {
    // 0.2 mm wire of σ = 1.4e6 S/m (a stainless-steel-like value) at 14 MHz: loss is large enough to measure
    const frequencyHz = 14e6;
    const radiusM = 1e-4;
    const sigma = 1.4e6;
    const s = solveShape(dipoleAt(frequencyHz, radiusM, { conductivitySPerM: sigma }));
    const i = 1 / Math.hypot(s.inputImpedanceOhm.re, s.inputImpedanceOhm.im); // |I| for 1 V
    const lossOhm = (2 * s.lossPowerW) / (i * i);
    const lengthM = (0.48 * SPEED_OF_LIGHT_M_PER_S) / frequencyHz;
    const textbookOhm = (surfaceResistancePerM(frequencyHz, radiusM, sigma) * lengthM) / 2;
    expect(Math.abs(lossOhm - textbookOhm) / textbookOhm).toBeLessThan(0.05);
  });

  it("a perfect conductor loses nothing and copper loses more at a thinner radius", () => {
    expect(solveShape(dipoleAt(145e6, 1e-3, "perfect")).radiationEfficiency).toBe(1);
    const thick = solveShape(dipoleAt(145e6, 1e-3, "copper")).radiationEfficiency;
    const thin = solveShape(dipoleAt(145e6, 1e-4, "copper")).radiationEfficiency;
    expect(thin).toBeLessThan(thick);
  });
});
