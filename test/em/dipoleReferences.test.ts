// Straight-wire trends (the fixed reference values are in generator/validation/referenceChecks.ts).
// Straight-wire references. Directivities: Balanis, Antenna Theory, 3rd ed., ch. 4 (sinusoidal
// current, infinitely thin wire; table 4.2 / eqs. 4-91 and 4-62): 0.5λ 2.15 dBi, 1.0λ 3.82 dBi,
// 1.25λ 5.16 dBi, 1.5λ 3.48 dBi; Hertzian (short) dipole 1.76 dBi (eq. 4-31, D = 1.5).
// Half-wave input impedance by the induced-EMF method: 73 + j42.5 Ω (Balanis eq. 8-61).
import { describe, expect, it } from "vitest";
import { solveShape } from "../../generator/em/index.js";
import { straightDipole } from "../helpers/shapes.js";

const balanisDbi: [number, number][] = [[0.5, 2.15], [1.0, 3.82], [1.25, 5.16], [1.5, 3.48]];

describe("straight dipole directivity (Balanis, Antenna Theory, ch. 4)", () => {
  for (const [lengthWl, refDbi] of balanisDbi) {
    it(`${lengthWl}λ dipole comes closer to ${refDbi} dBi as the wire thins (1e-3λ → 1e-5λ)`, () => {
      const thick = solveShape(straightDipole(lengthWl, 1e-3, { segmentsPerWavelength: 50 }));
      const thin = solveShape(straightDipole(lengthWl, 1e-5, { segmentsPerWavelength: 50 }));
      expect(Math.abs(thin.peakDirectivityDbi - refDbi)).toBeLessThan(Math.abs(thick.peakDirectivityDbi - refDbi));
    });
  }

  it("peak of a dipole along x lies broadside, in the y–z plane", () => {
    const s = solveShape(straightDipole(0.5, 1e-3));
    const { theta, phi } = s.peakDirectionRad;
    const x = Math.sin(theta) * Math.cos(phi);
    expect(Math.abs(x)).toBeLessThan(1e-3);
  });
});

describe("half-wave dipole input impedance (Balanis eq. 8-61: 73 + j42.5 Ω)", () => {
  const ref = { re: 73.1, im: 42.5 };
  const distance = (radiusWl: number) => {
    const z = solveShape(straightDipole(0.5, radiusWl, { segmentsPerWavelength: 50 })).inputImpedanceOhm;
    return Math.hypot(z.re - ref.re, z.im - ref.im);
  };

  it("tends to 73 + j42.5 Ω as the wire gets very thin (the 1e-7λ value itself is a reference check)", () => {
    const d = [1e-3, 1e-5, 1e-7].map(distance);
    expect(d[1]).toBeLessThan(d[0]);
    expect(d[2]).toBeLessThan(d[1]);
  });

  // first resonance (Im Z = 0) by bisection on the length
  const resonanceWl = (radiusWl: number) => {
    let lo = 0.4, hi = 0.5;
    for (let i = 0; i < 30; i++) {
      const mid = (lo + hi) / 2;
      const im = solveShape(straightDipole(mid, radiusWl, { segmentsPerWavelength: 60 })).inputImpedanceOhm.im;
      if (im > 0) hi = mid; else lo = mid;
    }
    return (lo + hi) / 2;
  };

  it("resonates a few percent below 0.5λ, closer to 0.5λ as the wire thins (common practice)", () => {
    const thick = resonanceWl(1e-3);
    const thin = resonanceWl(1e-5);
    expect(thick).toBeGreaterThan(0.45);
    expect(thick).toBeLessThan(0.49);
    expect(thin).toBeGreaterThan(thick);
    expect(thin).toBeLessThan(0.5);
  });
});
