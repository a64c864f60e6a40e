// Feed options: the L-network behind them reproduces Pozar's worked example with lossless parts,
// the part-Q loss matches a hand calculation, balun ratios move the SWR as an ideal transformer does
// (common practice), the quarter-wave option's length and loss follow from the stated cable figures,
// only practical E12 parts are offered, and "no practical match" is said plainly.
import { describe, expect, it } from "vitest";
import { applyFeed, feedOptions, type FeedPoint } from "../../generator/analysis/feedOptions.js";
import { e12Combinations, e12Neighbours, formatPart, lossyNetworkResponse, partProblem, PRACTICAL_PART_BOUNDS } from "../../generator/analysis/feedOptionsParts.js";
import { BALUNS, QUARTER_WAVE_COAX } from "../../generator/analysis/feedOptionsStock.js";
import { E12_MANTISSAS } from "../../generator/analysis/e12.js";
import { designLNetworks } from "../../generator/analysis/lNetwork.js";
import { swr } from "../../generator/analysis/swr.js";
import type { MatchComponent } from "../../generator/analysis/feedMatch.js";

const flat = (net: ReturnType<typeof designLNetworks>[number]): MatchComponent[] =>
  net.components.map((c) => (c.kind === "inductor" ? { kind: c.kind, position: c.position, value: c.inductanceH } : { kind: c.kind, position: c.position, value: c.capacitanceF }));

/** A band of `n` points around f0 where the load does not change with frequency. */
const flatBand = (z: { re: number; im: number }, f0: number, gainDbi = 5, n = 11): FeedPoint[] =>
  Array.from({ length: n }, (_, i) => ({ frequencyHz: f0 * (0.99 + (0.02 * i) / (n - 1)), impedanceOhm: z, gainDbi }));

describe("lossy L-network walk (Pozar, Microwave Engineering, 4th ed., §5.1, Example 5.1)", () => {
  // Z_L = 200 − j100 Ω on a 100 Ω line at 500 MHz: both solutions match exactly with ideal parts.
  it("gives Z_in = 100 Ω and efficiency 1 with (practically) lossless parts", () => {
    for (const net of designLNetworks({ re: 200, im: -100 }, 100, 500e6)) {
      const r = lossyNetworkResponse(flat(net), { re: 200, im: -100 }, 500e6, { inductorQ: 1e12, capacitorQ: 1e12 });
      expect(r.inputImpedanceOhm.re).toBeCloseTo(100, 6);
      expect(r.inputImpedanceOhm.im).toBeCloseTo(0, 6);
      expect(r.efficiency).toBeCloseTo(1, 9);
    }
  });
});

describe("part-Q loss against a hand calculation", () => {
  // 200 Ω to 50 Ω at 10 MHz with a shunt capacitor across the load and a series inductor toward
  // the line. Hand calculation: network Q_n = √(200/50 − 1) = √3. The series inductor (X = Q_n·50 Ω)
  // has r = X/Q_L in series with the 50 Ω it presents, so it passes 1/(1 + Q_n/Q_L); the capacitor
  // (B = Q_n/200 S) across the load has conductance ≈ B/Q_C, so the load gets 1/(1 + Q_n/Q_C).
  // With Q_L = 100, Q_C = 1000: loss = 10·log10(1.017321) + 10·log10(1.0017321) = 0.08210 dB.
  const hand = 10 * Math.log10(1 + Math.sqrt(3) / 100) + 10 * Math.log10(1 + Math.sqrt(3) / 1000);
  it(`loses ${hand.toFixed(4)} dB with inductor Q 100 and capacitor Q 1000`, () => {
    const net = designLNetworks({ re: 200, im: 0 }, 50, 10e6).find((n) => n.components[0].kind === "capacitor")!;
    const r = lossyNetworkResponse(flat(net), { re: 200, im: 0 }, 10e6, { inductorQ: 100, capacitorQ: 1000 });
    expect(-10 * Math.log10(r.efficiency)).toBeCloseTo(hand, 3);
    // the loss resistances hardly detune the match
    expect(swr(r.inputImpedanceOhm, 50)).toBeLessThan(1.05);
  });
  it("loses about ten times less with Q ten times higher (loss ∝ 1/Q to first order; the second-order term keeps it just under 10)", () => {
    const net = designLNetworks({ re: 200, im: 0 }, 50, 10e6)[0];
    const loss = (q: number) => -10 * Math.log10(lossyNetworkResponse(flat(net), { re: 200, im: 0 }, 10e6, { inductorQ: q, capacitorQ: 10 * q }).efficiency);
    const ratio = loss(100) / loss(1000);
    expect(ratio).toBeGreaterThan(9.7);
    expect(ratio).toBeLessThan(10);
  });
});

describe("balun ratios applied to SWR (ideal transformer Z/n plus stated loss; common practice)", () => {
  const cases: [number, number, number][] = [
    [200, 4, 1], // 200 Ω through 1:4 → 50 Ω
    [450, 9, 1], // 450 Ω through 1:9 → 50 Ω
    [300, 4, 1.5], // 300 Ω through 1:4 → 75 Ω, SWR 75/50
    [50, 1, 1],
  ];
  for (const [r, n, expected] of cases) {
    it(`${r} Ω through 1:${n} gives SWR ${expected} and realized gain = gain − balun loss`, () => {
      const out = feedOptions({ design: { frequencyHz: 14e6, impedanceOhm: { re: r, im: 0 }, gainDbi: 5 }, band: flatBand({ re: r, im: 0 }, 14e6), lineImpedanceOhm: 50, swrLimit: 2 });
      const balun = BALUNS.find((b) => b.ratio === n)!;
      const o = out.options.find((x) => x.kind === "balun" && x.circuit.balunRatio === n)!;
      expect(o.worstSwr).toBeCloseTo(expected, 9);
      expect(o.lossDb).toBeCloseTo(balun.lossDb, 9);
      // mismatch loss 10·log10(1 − |Γ|²) with |Γ| = (SWR − 1)/(SWR + 1)
      const g = (expected - 1) / (expected + 1);
      expect(o.realizedGainDbi).toBeCloseTo(5 - balun.lossDb + 10 * Math.log10(1 - g * g), 9);
      expect(o.needsNoParts).toBe(true);
    });
  }
  it("prefers a balun alone over a network within 0.1 dB of realized gain (common practice)", () => {
    // 63 − j6 Ω: the 1:1 balun alone gives SWR ≈ 1.3; a network does a few hundredths of a dB better
    const z = { re: 63, im: -6 };
    const out = feedOptions({ design: { frequencyHz: 145e6, impedanceOhm: z, gainDbi: 5 }, band: flatBand(z, 145e6), lineImpedanceOhm: 50, swrLimit: 2 });
    const rec = out.options[out.recommended!];
    expect(rec.kind).toBe("balun");
    expect(rec.circuit.balunRatio).toBe(1);
    expect(out.options[0].realizedGainDbi - rec.realizedGainDbi).toBeLessThanOrEqual(0.1);
  });
  it("ranks the options that meet the limit by realized gain and recommends the first or a balun close to it", () => {
    const out = feedOptions({ design: { frequencyHz: 14e6, impedanceOhm: { re: 200, im: 0 }, gainDbi: 5 }, band: flatBand({ re: 200, im: 0 }, 14e6), lineImpedanceOhm: 50, swrLimit: 2 });
    const rec = out.options[out.recommended!];
    expect(rec === out.options[0] || (rec.needsNoParts && rec.realizedGainDbi >= out.options[0].realizedGainDbi - 0.1)).toBe(true);
    const meeting = out.options.filter((o) => o.meetsLimit);
    for (let i = 1; i < meeting.length; i++) expect(meeting[i].realizedGainDbi).toBeLessThanOrEqual(meeting[i - 1].realizedGainDbi);
    expect(out.options.slice(0, meeting.length).every((o) => o.meetsLimit)).toBe(true);
    expect(out.verdict).toMatch(/^Recommended: /);
  });
});

describe("quarter-wave transformer option (Pozar §2.5; cable figures of feedOptionsStock.ts)", () => {
  // 112.5 Ω wants Z_t = √(50·112.5) = 75 Ω exactly: RG-59, SWR 1 at f0, length 0.66·λ/4.
  // Loss: matched 11 dB/100 m·√1.45 over 0.66·λ/4 at 145 MHz, times (1 + |Γ_t|²)/(1 − |Γ_t|²) with
  // Γ_t = (112.5 − 75)/(112.5 + 75) = 0.2, plus the 1:1 balun's 0.2 dB.
  it("picks 75 Ω coax for 112.5 Ω, gives SWR 1 at f0 and the stated length and loss", () => {
    const f0 = 145e6;
    const out = feedOptions({ design: { frequencyHz: f0, impedanceOhm: { re: 112.5, im: 0 }, gainDbi: 5 }, band: flatBand({ re: 112.5, im: 0 }, f0), lineImpedanceOhm: 50, swrLimit: 2 });
    const q = out.options.find((o) => o.kind === "quarter-wave")!;
    const cable = QUARTER_WAVE_COAX.find((c) => c.impedanceOhm === 75)!;
    expect(q.circuit.quarterWave!.impedanceOhm).toBe(75);
    const lengthM = (0.66 * 299_792_458) / f0 / 4;
    expect(q.circuit.quarterWave!.lengthM).toBeCloseTo(lengthM, 9);
    expect(swr(applyFeed(q.circuit, { re: 112.5, im: 0 }, f0).impedanceOhm, 50)).toBeCloseTo(1, 9);
    const matchedDb = (cable.lossDbPer100mAt100MHz * Math.sqrt(1.45) * lengthM) / 100;
    const expectedDb = 0.2 + 10 * Math.log10(1 + (matchedDb / 8.685889638) * 2 * (1.04 / 0.96));
    expect(q.lossDb).toBeCloseTo(expectedDb, 4);
  });
  it("is not offered for a strongly reactive load", () => {
    const out = feedOptions({ design: { frequencyHz: 145e6, impedanceOhm: { re: 112.5, im: 80 }, gainDbi: 5 }, band: flatBand({ re: 112.5, im: 80 }, 145e6), lineImpedanceOhm: 50, swrLimit: 2 });
    expect(out.options.some((o) => o.kind === "quarter-wave")).toBe(false);
  });
});

describe("practical parts only", () => {
  it("E12 neighbours bracket a value (IEC 60063 E12)", () => {
    expect(e12Neighbours(4.3e-12)).toEqual([3.9e-12, 4.7e-12]);
    expect(e12Neighbours(4.7e-9)).toEqual([4.7e-9]);
    expect(e12Combinations([{ kind: "capacitor", position: "shunt", value: 4.3e-12 }, { kind: "inductor", position: "series", value: 110e-9 }])).toHaveLength(4);
  });
  it("names parts outside the bounds (1 pF … 10 nF, 10 nH … 100 µH)", () => {
    expect(partProblem({ kind: "capacitor", position: "shunt", value: 0.47e-12 })).toMatch(/0\.47 pF capacitor, under the 1 pF/);
    expect(partProblem({ kind: "inductor", position: "series", value: 4.7e-9 })).toMatch(/4\.7 nH inductor, under the 10 nH/);
    expect(partProblem({ kind: "capacitor", position: "shunt", value: 1e-12 })).toBeNull();
    expect(formatPart({ kind: "inductor", position: "series", value: 220e-9 })).toBe("220 nH");
  });
  it("offers no network with a part out of bounds and every part an E12 value, at 1270 MHz on a high impedance", () => {
    // 3000 − j1500 Ω at 1270 MHz through a 1:1 balun wants a shunt capacitor well under 1 pF
    const z = { re: 3000, im: -1500 };
    const out = feedOptions({ design: { frequencyHz: 1270e6, impedanceOhm: z, gainDbi: 6 }, band: flatBand(z, 1270e6), lineImpedanceOhm: 50, swrLimit: 2 });
    expect(out.rejected.some((r) => /pF capacitor, under the 1 pF/.test(r))).toBe(true);
    for (const o of out.options.filter((x) => x.kind === "l-network")) {
      for (const c of o.circuit.network!) {
        expect(c.value).toBeGreaterThanOrEqual(c.kind === "capacitor" ? PRACTICAL_PART_BOUNDS.minCapacitanceF : PRACTICAL_PART_BOUNDS.minInductanceH);
        const mantissa = Number((c.value / 10 ** Math.floor(Math.log10(c.value) + 1e-9)).toPrecision(2));
        expect(E12_MANTISSAS).toContain(mantissa);
      }
    }
  });
  it("says plainly that no practical match exists, and what to do instead", () => {
    // a small, strongly capacitive load whose reactance swings across the band: nothing holds SWR ≤ 2
    const band = Array.from({ length: 11 }, (_, i) => ({ frequencyHz: 144e6 + 2e5 * i, impedanceOhm: { re: 8, im: -200 + 40 * (i - 5) }, gainDbi: 5 }));
    const out = feedOptions({ design: { frequencyHz: 145e6, impedanceOhm: { re: 8, im: -200 }, gainDbi: 5 }, band, lineImpedanceOhm: 50, swrLimit: 2 });
    expect(out.recommended).toBeNull();
    expect(out.options.every((o) => !o.meetsLimit)).toBe(true);
    expect(out.verdict).toMatch(/No practical match exists/);
    expect(out.verdict).toMatch(/tuner at the feed point/);
    expect(out.verdict).toMatch(/off-centre/);
  });
});
