// The 1.5-wavelength check values: straight about 3.6 dBi, best V about 6 dBi with arms 54.3° from
// the symmetry axis (common practice).
import { describe, expect, it } from "vitest";
import { solveShape } from "../../generator/em/index.js";
import { straightDipole, vee } from "../helpers/shapes.js";

describe("1.5λ wire check values (common practice)", () => {
  it("straight 1.5λ wire gives about 3.6 dBi", () => {
    const s = solveShape(straightDipole(1.5, 1e-3));
    expect(s.peakGainDbi).toBeGreaterThan(3.5);
    expect(s.peakGainDbi).toBeLessThan(3.7);
  });

  it("V of the same wire, arms 54.3° from the symmetry axis, gives about 6 dBi", () => {
    const s = solveShape(vee(1.5, 54.3, 1e-3));
    expect(s.peakGainDbi).toBeGreaterThan(5.9);
    expect(s.peakGainDbi).toBeLessThan(6.2);
  });

  it("doubling the segments changes the peak gain by less than 0.05 dB on the 1.5λ cases", () => {
    for (const shape of [straightDipole(1.5, 1e-3), vee(1.5, 54.3, 1e-3)]) {
      const coarse = solveShape(shape, { segmentsPerWavelength: 25 });
      const fine = solveShape(shape, { segmentsPerWavelength: 50 });
      expect(Math.abs(fine.peakGainDbi - coarse.peakGainDbi)).toBeLessThan(0.05);
    }
  });
});
