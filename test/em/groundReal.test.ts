// Real ground: Fresnel coefficients and the reflection-coefficient approximation. Sources:
// - Balanis, Antenna Theory, 3rd ed., §4.8 (ground effects, vertical and horizontal polarization),
//   and any optics text for the plane-wave limits: at normal incidence |Γ| = (n − 1)/(n + 1)
//   (n = √ε_r for a lossless dielectric), at grazing incidence Γ = −1 for both polarizations, and
//   the vertical coefficient vanishes at the Brewster angle tanψ_B = 1/√ε_r (ψ from the surface).
//   In our convention the perfect-ground image's sign is taken out, so R_v = Γ_∥ and R_h = −Γ_⊥.
// - Common practice: a horizontal dipole λ/2 over average ground has its main lobe near 30°
//   elevation, where image theory's array factor sin(kh sinψ) peaks (Balanis §4.7.2, from memory).
import { describe, expect, it } from "vitest";
import { solveFeed, solveShape, validateShape } from "../../generator/em/index.js";
import { GROUND_PRESETS, complexPermittivity, imageFactor } from "../../generator/em/ground.js";
import { fresnelCoefficients } from "../../generator/em/groundFarField.js";
import { ONE_METRE_WAVELENGTH_HZ as F } from "../helpers/shapes.js";

const DEG = Math.PI / 180;
const abs = (c: { re: number; im: number }) => Math.hypot(c.re, c.im);

describe("Fresnel coefficients (Balanis §4.8)", () => {
  it("normal incidence on a lossless dielectric: (√ε_r − 1)/(√ε_r + 1) for both polarizations", () => {
    for (const er of [4, 9, 81]) {
      const { v, h } = fresnelCoefficients({ re: er, im: 0 }, 90 * DEG);
      const ref = (Math.sqrt(er) - 1) / (Math.sqrt(er) + 1);
      expect(v.re).toBeCloseTo(ref, 12);
      expect(h.re).toBeCloseTo(ref, 12);
      expect(Math.abs(v.im) + Math.abs(h.im)).toBeLessThan(1e-12);
    }
  });

  it("normal incidence equals the matrix's image factor for a lossy ground", () => {
    const g = GROUND_PRESETS.average;
    const f = 7.1e6;
    const { v, h } = fresnelCoefficients(complexPermittivity(g, f), 90 * DEG);
    const m = imageFactor(g, f);
    for (const c of [v, h]) expect(Math.hypot(c.re - m.re, c.im - m.im)).toBeLessThan(1e-12);
  });

  it("grazing incidence: Γ = −1 for both (R_v → −1, R_h → +1 in our sign)", () => {
    const eps = complexPermittivity(GROUND_PRESETS.average, 14e6);
    const { v, h } = fresnelCoefficients(eps, 1e-7);
    expect(v.re).toBeCloseTo(-1, 5);
    expect(h.re).toBeCloseTo(1, 5);
  });

  it("the vertical coefficient vanishes at the Brewster angle of a lossless dielectric", () => {
    const er = 9;
    const psi = Math.atan(1 / Math.sqrt(er));
    expect(abs(fresnelCoefficients({ re: er, im: 0 }, psi).v)).toBeLessThan(1e-12);
    expect(abs(fresnelCoefficients({ re: er, im: 0 }, psi + 5 * DEG).v)).toBeGreaterThan(0.05);
  });

  it("both tend to 1 as σ → ∞ at every elevation", () => {
    const eps = complexPermittivity({ type: "real", relativePermittivity: 13, conductivitySPerM: 1e12 }, 14e6);
    for (const e of [1, 10, 45, 90]) {
      const { v, h } = fresnelCoefficients(eps, e * DEG);
      expect(Math.hypot(v.re - 1, v.im)).toBeLessThan(1e-3);
      expect(Math.hypot(h.re - 1, h.im)).toBeLessThan(1e-3);
    }
  });

  it("a lossy ground reflects less than 1 in magnitude", () => {
    const eps = complexPermittivity(GROUND_PRESETS.poor, 3.6e6);
    for (const e of [2, 20, 60, 90]) {
      const { v, h } = fresnelCoefficients(eps, e * DEG);
      expect(abs(v)).toBeLessThan(1);
      expect(abs(h)).toBeLessThan(1);
    }
  });
});

const dipole = (h: number, ground: object) =>
  validateShape({
    frequencyHz: F, wireRadiusM: 1e-3, segmentsPerWavelength: 40, conductor: "perfect",
    wires: [{ pointsM: [[-0.25, 0, h], [0, 0, h], [0.25, 0, h]] }], feed: { wire: 0, vertex: 1 }, ground,
  });

describe("real ground in the solver", () => {
  it("σ → ∞ gives the perfect-ground answer (impedance, gain, elevation)", () => {
    const p = solveShape(dipole(0.5, { type: "perfect" }), { energyBalance: true });
    const r = solveShape(dipole(0.5, { type: "real", relativePermittivity: 13, conductivitySPerM: 1e12 }));
    expect(Math.hypot(r.inputImpedanceOhm.re - p.inputImpedanceOhm.re, r.inputImpedanceOhm.im - p.inputImpedanceOhm.im)).toBeLessThan(1e-3);
    expect(r.peakGainDbi).toBeCloseTo(p.peakGainDbi, 3);
    expect(r.ground!.peakElevationDeg).toBeCloseTo(p.ground!.peakElevationDeg, 1);
    expect(Math.abs(r.ground!.groundLossW!)).toBeLessThan(1e-3 * r.inputPowerW);
  });

  it("horizontal dipole λ/2 over average ground at 14 MHz: main lobe near 30°, ground loss > 0, gain below perfect ground", () => {
    const lambda = 299_792_458 / 14e6;
    const s = (ground: object) => solveShape(validateShape({
      frequencyHz: 14e6, wireRadiusM: 1e-3, conductor: "perfect",
      wires: [{ pointsM: [[-lambda / 4, 0, lambda / 2], [0, 0, lambda / 2], [lambda / 4, 0, lambda / 2]] }], feed: { wire: 0, vertex: 1 }, ground,
    }), { energyBalance: true });
    const avg = s(GROUND_PRESETS.average);
    const perfect = s({ type: "perfect" });
    expect(Math.abs(avg.ground!.peakElevationDeg - 30)).toBeLessThan(3);
    expect(avg.ground!.groundLossW!).toBeGreaterThan(0.02 * avg.inputPowerW);
    expect(avg.peakGainDbi).toBeLessThan(perfect.peakGainDbi);
    expect(avg.energyBalanceError).toBeNull(); // no balance to check: the ground absorbs power
  });

  it("the impedance change with height over real ground lies between free space and perfect ground at λ/4", () => {
    const free = solveFeed(validateShape({ ...dipole(0.25, { type: "perfect" }), ground: undefined })).inputImpedanceOhm;
    const perfect = solveFeed(dipole(0.25, { type: "perfect" })).inputImpedanceOhm;
    const avg = solveFeed(dipole(0.25, GROUND_PRESETS.average)).inputImpedanceOhm;
    expect(avg.re).toBeGreaterThan(free.re);
    expect(avg.re).toBeLessThan(perfect.re);
  });
});
