// The direct-feed margin ladder (computeOffCentre.ts, issue 10 item 4): the band is designed at the
// SWR limit itself first and with the margin (limit 2 → 1.8) only when that design does not hold as
// built; other variants are designed once. The margin arithmetic 1 + (limit − 1) × m is checked by hand.
import { describe, expect, it } from "vitest";
import { firstHoldingAsBuilt, MARGIN_LADDER, SEARCH_SWR_MARGIN, searchRequestOf, searchSwrLimit } from "../../generator/catalog/computeOffCentre.js";
import { parseDesignRequest } from "../../generator/design/request.js";

const request = (variant: "direct-feed" | "max-gain") => parseDesignRequest({
  frequencyHz: 145e6, lengthWl: 1.5, piecesPerArm: 2, wireDiameterM: 0.002, conductor: "copper", variant,
  bandHz: [144e6, 146e6], lineImpedanceOhm: 50, swrLimit: 2, seed: 1, segmentsPerWavelength: 25,
});

describe("direct-feed margin ladder", () => {
  it("tries the limit itself, then the margin (hand calculation: 1 + (2 − 1) × 0.8 = 1.8)", () => {
    expect(MARGIN_LADDER).toEqual([1, SEARCH_SWR_MARGIN]);
    expect(searchSwrLimit(2, 1)).toBe(2);
    expect(searchSwrLimit(2.5, 0.8)).toBeCloseTo(2.2, 12);
    expect(searchRequestOf(request("direct-feed"), 1).swrLimit).toBe(2);
    expect(searchRequestOf(request("direct-feed")).swrLimit).toBeCloseTo(1.8, 12);
    expect(searchRequestOf(request("max-gain"), 0.8).swrLimit).toBe(2);
  });
  it("stops at the first design that holds as built", () => {
    const tried: number[] = [];
    const r = firstHoldingAsBuilt(request("direct-feed"), (m) => { tried.push(m); return m; }, () => true);
    expect(tried).toEqual([1]);
    expect(r).toBe(1);
  });
  it("falls back to the margin when the limit's design does not hold, and keeps the last when none does", () => {
    const tried: number[] = [];
    expect(firstHoldingAsBuilt(request("direct-feed"), (m) => { tried.push(m); return m; }, (m) => m < 1)).toBe(SEARCH_SWR_MARGIN);
    expect(firstHoldingAsBuilt(request("direct-feed"), (m) => m, () => false)).toBe(SEARCH_SWR_MARGIN);
    expect(tried).toEqual([1, SEARCH_SWR_MARGIN]);
  });
  it("designs other variants once", () => {
    const tried: number[] = [];
    firstHoldingAsBuilt(request("max-gain"), (m) => { tried.push(m); return m; }, () => false);
    expect(tried).toHaveLength(1);
  });
});
