import { describe, expect, it } from "vitest";
import * as f from "../../generator/site/format.js";

describe("site number formatting", () => {
  it("uses fixed decimals, a true minus sign and never shows negative zero", () => {
    expect(f.fixed(1.005, 1)).toBe("1.0");
    expect(f.fixed(-2.5, 1)).toBe("\u22122.5");
    expect(f.fixed(-0.0004, 2)).toBe("0.00");
    expect(f.fixed(Number.NaN, 2)).toBe("–");
    expect(f.signed(0.25, 2)).toBe("+0.25");
    expect(f.signed(-0.25, 2)).toBe("\u22120.25");
    expect(f.signed(0, 2)).toBe("0.00");
  });

  it("formats each quantity at its display precision", () => {
    expect(f.gainDbi(6.889332)).toBe("6.89 dBi");
    expect(f.swr(1.981537)).toBe("1.98");
    expect(f.swr(null)).toBe("–");
    expect(f.metres(3.101301)).toBe("3.101 m");
    expect(f.millimetres(0.876694)).toBe("876.7 mm");
    expect(f.wavelengths(1.5)).toBe("1.5 λ");
    expect(f.wavelengths(2)).toBe("2 λ");
    expect(f.mhz(145e6)).toBe("145 MHz");
    expect(f.mhz(433.92e6)).toBe("433.92 MHz");
    expect(f.bandEdges(144e6, 146e6)).toBe("144–146 MHz");
    expect(f.degrees(38.94598)).toBe("38.9°");
    expect(f.percent(0.9924174)).toBe("99.2 %");
    expect(f.impedance({ re: 96.84358, im: -12.64618 })).toBe("96.8 \u2212 j12.6 Ω");
    expect(f.impedance({ re: 50, im: -0.01 })).toBe("50.0 + j0.0 Ω");
  });

  it("converts to inches with the exact 1959 inch", () => {
    expect(f.inchesOf(0.0254)).toBe(1);
    expect(f.inches(1)).toBe("39.37 in");
    expect(f.inchesNumber(0.876694)).toBe("34.52");
    expect(f.feet(0.3048)).toBe("1.00 ft");
  });

  it("chooses kHz or MHz for bandwidths", () => {
    expect(f.bandwidth(null)).toBe("none");
    expect(f.bandwidth(0)).toBe("none");
    expect(f.bandwidth(812_345)).toBe("812 kHz");
    expect(f.bandwidth(1_068_867)).toBe("1.069 MHz");
    expect(f.bandwidth(60_123_000)).toBe("60.12 MHz");
  });

  it("names matching parts in the units they are sold in", () => {
    expect(f.component("capacitor", 9.519709e-12)).toBe("9.52 pF");
    expect(f.component("inductor", 5.404872e-8)).toBe("54.0 nH");
    expect(f.e12Component("capacitor", 1e-11)).toBe("10 pF");
    expect(f.e12Component("inductor", 5.6e-8)).toBe("56 nH");
    expect(f.e12Component("capacitor", 2.2e-12)).toBe("2.2 pF");
  });

  it("reads shown numbers back", () => {
    expect(f.parseShown("\u221213.37")).toBe(-13.37);
    expect(f.parseShown("≥ 2.600 MHz")).toBe(2.6);
    expect(f.parseShown("6.89 dBi")).toBe(6.89);
    expect(f.shownDecimals("876.7 mm")).toBe(1);
    expect(f.shownDecimals("4")).toBe(0);
  });
});
