import { describe, expect, it } from "vitest";
import {
  designQuarterWave,
  lineInputImpedance,
  quarterWaveInputImpedance,
} from "../../generator/analysis/quarterWave.js";
import { swr } from "../../generator/analysis/swr.js";

// Pozar, Microwave Engineering, 4th ed., §2.5 (Z_t = √(Z0·R_L)) and eq. 2.44 (line input
// impedance); expected values recomputed by hand.

describe("quarter-wave transformer design", () => {
  it("needs √(50·100) = 70.7 Ω to match 100 Ω to 50 Ω and picks 75 Ω coax (SWR 56.25/50 = 1.125)", () => {
    const d = designQuarterWave({ re: 100, im: 0 }, 50, 14.2e6, 0.66);
    expect(d.idealImpedanceOhm).toBeCloseTo(Math.SQRT2 * 50, 12);
    expect(d.chosen.impedanceOhm).toBe(75);
    expect(d.swrAtDesignFrequency).toBeCloseTo(1.125, 12);
  });

  it("gives a physical length of velocity factor × λ/4 (0.66 × 21.112 m / 4 = 3.4835 m at 14.2 MHz)", () => {
    const d = designQuarterWave({ re: 100, im: 0 }, 50, 14.2e6, 0.66);
    expect(d.physicalLengthM).toBeCloseTo((0.66 * 299_792_458) / (4 * 14.2e6), 12);
    expect(d.physicalLengthM).toBeCloseTo(3.4835, 4);
  });

  it("picks two 75 Ω cables in parallel (37.5 Ω) to match 25 Ω to 50 Ω (ideal 35.4 Ω)", () => {
    const d = designQuarterWave({ re: 25, im: 0 }, 50, 7e6, 0.82);
    expect(d.idealImpedanceOhm).toBeCloseTo(Math.sqrt(1250), 12);
    expect(d.chosen.impedanceOhm).toBe(37.5);
  });

  it("gives SWR 1 at f0 with an exact cable and rises away from f0", () => {
    const zLoad = { re: 100, im: 0 };
    const zt = Math.sqrt(50 * 100);
    const d = designQuarterWave(zLoad, 50, 10e6, 0.66, [{ impedanceOhm: zt, description: "ideal" }]);
    expect(d.swrAtDesignFrequency).toBeLessThan(1 + 1e-9);
    const swrAt = (f: number) => swr(quarterWaveInputImpedance(zLoad, zt, 10e6, f), 50);
    expect(swrAt(10e6)).toBeLessThan(1 + 1e-9);
    expect(swrAt(9e6)).toBeGreaterThan(1.01);
    expect(swrAt(8e6)).toBeGreaterThan(swrAt(9e6));
    expect(swrAt(11e6)).toBeGreaterThan(1.01);
    expect(swrAt(12e6)).toBeGreaterThan(swrAt(11e6));
    // At 2·f0 the line is a half wave and repeats the load: SWR of 100 Ω on 50 Ω = 2.
    expect(swrAt(20e6)).toBeCloseTo(2, 9);
  });

  it("rejects bad arguments with a one-line message", () => {
    expect(() => designQuarterWave({ re: 0, im: 0 }, 50, 1e6, 0.66)).toThrow(/^zLoad\.re must be positive \(got 0\+0j\)$/);
    expect(() => designQuarterWave({ re: 100, im: 0 }, -50, 1e6, 0.66)).toThrow(
      /^lineImpedanceOhm must be a positive finite number \(got -50\)$/,
    );
    expect(() => designQuarterWave({ re: 100, im: 0 }, 50, 1e6, 1.2)).toThrow(/^velocityFactor must be in \(0, 1\] \(got 1.2\)$/);
    expect(() => designQuarterWave({ re: 100, im: 0 }, 50, 1e6, 0.66, [])).toThrow(/^options must be a non-empty array/);
    expect(() => quarterWaveInputImpedance({ re: 1, im: 0 }, 50, 0, 1e6)).toThrow(
      /^designFrequencyHz must be a positive finite number \(got 0\)$/,
    );
  });
});

describe("input impedance of a lossless line", () => {
  it("turns a complex load into Zt²/Z_L at a quarter wave", () => {
    // 70² / (30 + 40j) = 4900·(30 − 40j)/2500 = 58.8 − 78.4j
    const z = lineInputImpedance({ re: 30, im: 40 }, 70, Math.PI / 2);
    expect(z.re).toBeCloseTo(58.8, 9);
    expect(z.im).toBeCloseTo(-78.4, 9);
  });

  it("shows a shorted eighth-wave line as +jZt (tan 45° = 1)", () => {
    const z = lineInputImpedance({ re: 0, im: 0 }, 50, Math.PI / 4);
    expect(z.re).toBeCloseTo(0, 12);
    expect(z.im).toBeCloseTo(50, 12);
  });

  it("returns the load unchanged at zero length", () => {
    const z = lineInputImpedance({ re: 12, im: -7 }, 50, 0);
    expect(z.re).toBeCloseTo(12, 12);
    expect(z.im).toBeCloseTo(-7, 12);
  });
});
