import { describe, expect, it } from "vitest";
import {
  mismatchEfficiency,
  reflectionCoefficient,
  returnLossDb,
  swr,
  swrFromReflectionMagnitude,
  swrSpanBelow,
  type SwrSample,
} from "../../generator/analysis/swr.js";
import { abs } from "../../generator/analysis/complex.js";

// Expected values follow from Pozar, Microwave Engineering, 4th ed., §2.3 (Γ, SWR, return loss),
// recomputed by hand below each case.

describe("reflection coefficient and SWR", () => {
  it("gives SWR 2 for 100 Ω on a 50 Ω line (Γ = 50/150 = 1/3)", () => {
    const g = reflectionCoefficient({ re: 100, im: 0 }, 50);
    expect(g.re).toBeCloseTo(1 / 3, 15);
    expect(g.im).toBe(0);
    expect(swr({ re: 100, im: 0 }, 50)).toBeCloseTo(2, 12);
  });

  it("gives SWR 2 for 25 Ω on a 50 Ω line (Γ = −25/75 = −1/3)", () => {
    expect(reflectionCoefficient({ re: 25, im: 0 }, 50).re).toBeCloseTo(-1 / 3, 15);
    expect(swr({ re: 25, im: 0 }, 50)).toBeCloseTo(2, 12);
  });

  it("gives |Γ| = 1/√5 and SWR φ² ≈ 2.618 for 50 + j50 Ω on 50 Ω (Γ = (1 + 2j)/5)", () => {
    const g = reflectionCoefficient({ re: 50, im: 50 }, 50);
    expect(g.re).toBeCloseTo(0.2, 15);
    expect(g.im).toBeCloseTo(0.4, 15);
    expect(abs(g)).toBeCloseTo(1 / Math.sqrt(5), 15);
    expect(swr({ re: 50, im: 50 }, 50)).toBeCloseTo((3 + Math.sqrt(5)) / 2, 12);
  });

  it("reports a perfect match as Γ = 0, SWR 1, infinite return loss, full power", () => {
    expect(abs(reflectionCoefficient({ re: 75, im: 0 }, 75))).toBe(0);
    expect(swr({ re: 75, im: 0 }, 75)).toBe(1);
    expect(returnLossDb({ re: 75, im: 0 }, 75)).toBe(Infinity);
    expect(mismatchEfficiency({ re: 75, im: 0 }, 75)).toBe(1);
  });

  it("reports infinite SWR for a purely reactive load (|Γ| = 1)", () => {
    expect(swr({ re: 0, im: 50 }, 50)).toBe(Infinity);
    expect(swrFromReflectionMagnitude(1)).toBe(Infinity);
    expect(swrFromReflectionMagnitude(1.2)).toBe(Infinity);
  });

  it("gives return loss 9.54 dB and mismatch efficiency 8/9 when |Γ| = 1/3", () => {
    // −20·log10(1/3) = 9.5424 dB; 1 − 1/9 = 0.8889
    expect(returnLossDb({ re: 100, im: 0 }, 50)).toBeCloseTo(9.5424, 4);
    expect(mismatchEfficiency({ re: 100, im: 0 }, 50)).toBeCloseTo(8 / 9, 14);
  });

  it("gives return loss 6.99 dB when |Γ| = 1/√5", () => {
    // −20·log10(0.44721) = 6.9897 dB
    expect(returnLossDb({ re: 50, im: 50 }, 50)).toBeCloseTo(6.9897, 4);
  });

  it("rejects bad arguments with a one-line message naming the field", () => {
    expect(() => swr({ re: 50, im: 0 }, -50)).toThrow(/^z0Ohm must be a positive finite number \(got -50\)$/);
    expect(() => swr({ re: NaN, im: 0 }, 50)).toThrow(/^zLoad must have finite re and im \(got NaN\+0j\)$/);
    expect(() => swr({ re: -50, im: 0 }, 50)).toThrow(/^zLoad must not equal -z0Ohm/);
    expect(() => swrFromReflectionMagnitude(-0.1)).toThrow(/^gammaAbs must be a non-negative number \(got -0.1\)$/);
  });
});

describe("SWR span from a sweep", () => {
  const mhz = (f: number) => f * 1e6;
  const sweep: SwrSample[] = [
    { frequencyHz: mhz(10), swr: 3 },
    { frequencyHz: mhz(11), swr: 2 },
    { frequencyHz: mhz(12), swr: 1.2 },
    { frequencyHz: mhz(13), swr: 1.8 },
    { frequencyHz: mhz(14), swr: 2.6 },
  ];

  it("interpolates both crossings of the limit linearly", () => {
    // Low edge: sample at 11 MHz is exactly 2. High edge: 13 + (2 − 1.8)/(2.6 − 1.8) = 13.25 MHz.
    const span = swrSpanBelow(sweep, 2);
    expect(span).not.toBeNull();
    expect(span!.lowHz).toBeCloseTo(mhz(11), 6);
    expect(span!.highHz).toBeCloseTo(mhz(13.25), 6);
    expect(span!.widthHz).toBeCloseTo(mhz(2.25), 6);
    expect(span!.touchesSweepEdge).toBe(false);
  });

  it("interpolates a crossing inside an interval on the low side", () => {
    // Limit 2.5: low edge 10 + (3 − 2.5)/(3 − 2) = 10.5 MHz; high edge 13 + 0.7/0.8 = 13.875 MHz.
    const span = swrSpanBelow(sweep, 2.5)!;
    expect(span.lowHz).toBeCloseTo(mhz(10.5), 6);
    expect(span.highHz).toBeCloseTo(mhz(13.875), 6);
  });

  it("returns null when no sample is within the limit", () => {
    expect(swrSpanBelow(sweep, 1.1)).toBeNull();
  });

  it("stops at the sweep edge and says so", () => {
    const span = swrSpanBelow(sweep, 5)!;
    expect(span.lowHz).toBe(mhz(10));
    expect(span.highHz).toBe(mhz(14));
    expect(span.touchesSweepEdge).toBe(true);
  });

  it("picks the dip with the lowest SWR by default, or the one around a given frequency", () => {
    const twoDips: SwrSample[] = [
      { frequencyHz: 1, swr: 4 },
      { frequencyHz: 2, swr: 1.5 },
      { frequencyHz: 3, swr: 4 },
      { frequencyHz: 4, swr: 1.1 },
      { frequencyHz: 5, swr: 4 },
    ];
    const deepest = swrSpanBelow(twoDips, 2)!;
    expect(deepest.lowHz).toBeCloseTo(4 - 0.9 / 2.9, 12);
    expect(deepest.highHz).toBeCloseTo(4 + 0.9 / 2.9, 12);
    const first = swrSpanBelow(twoDips, 2, 1.9)!;
    expect(first.lowHz).toBeCloseTo(2 - 0.5 / 2.5, 12);
    expect(first.highHz).toBeCloseTo(2 + 0.5 / 2.5, 12);
  });

  it("puts the crossing on the in-band sample when its neighbour has infinite SWR", () => {
    const span = swrSpanBelow(
      [
        { frequencyHz: 1, swr: Infinity },
        { frequencyHz: 2, swr: 1.5 },
        { frequencyHz: 3, swr: Infinity },
      ],
      2,
    )!;
    expect(span.lowHz).toBe(2);
    expect(span.highHz).toBe(2);
    expect(span.widthHz).toBe(0);
  });

  it("rejects unsorted, empty or malformed sweeps with a one-line message", () => {
    expect(() => swrSpanBelow([], 2)).toThrow(/^sweep must be a non-empty array/);
    expect(() =>
      swrSpanBelow(
        [
          { frequencyHz: 2, swr: 1.5 },
          { frequencyHz: 1, swr: 1.5 },
        ],
        2,
      ),
    ).toThrow(/^sweep\[1\]\.frequencyHz must be greater than the previous sample \(got 1 after 2\)$/);
    expect(() => swrSpanBelow([{ frequencyHz: 1, swr: 0.5 }], 2)).toThrow(/^sweep\[0\]\.swr must be a number ≥ 1 \(got 0.5\)$/);
    expect(() => swrSpanBelow(sweep, 0.9)).toThrow(/^swrLimit must be a finite number ≥ 1 \(got 0.9\)$/);
  });
});
