// The finder's search plan, near-band frequencies and the compare page's id checks: pure logic the
// browser tests then exercise on the built site.
import { describe, expect, it } from "vitest";
import { bandAliases, mergeRanked, planSearch, searchPage } from "../../generator/site/searchPlan.js";
import { fitFrequency } from "../../generator/site/frequencyFit.js";
import { readCompareIds, tooManyTicked, optionLabel } from "../../generator/site/compare.js";

const bands = [
  { id: "10m", name: "10 m amateur band" },
  { id: "2m", name: "2 m amateur band" },
  { id: "70cm", name: "70 cm amateur band" },
  { id: "433mhz", name: "433 MHz ISM / short-range devices" },
  { id: "2.4ghz", name: "2.4 GHz ISM band" },
];

describe("search plan", () => {
  it("names a band by id, spaced id or the name's head", () => {
    expect(bandAliases(bands[2])).toEqual(["70 cm", "70cm"]);
    expect(bandAliases(bands[3])).toContain("433 mhz");
    expect(bandAliases(bands[4])).toContain("2.4 ghz");
  });

  it("splits a band and a feed word off the query", () => {
    expect(planSearch("70 cm direct feed", bands)).toEqual({ terms: null, filters: { band: "70cm", feed: "direct-feed" } });
    expect(planSearch("balun 2m most gain", bands)).toEqual({ terms: "balun", filters: { band: "2m", feed: "max-gain" } });
    expect(planSearch("direct 50 ohm feed 433 MHz", bands)).toEqual({ terms: null, filters: { band: "433mhz", feed: "direct-feed" } });
  });

  it("does not read a band inside another number, and leaves plain words alone", () => {
    expect(planSearch("12 m mast", bands).filters.band).toBeUndefined();
    expect(planSearch("10 m", bands).filters.band).toBe("10m");
    expect(planSearch("quarter-wave transformer", bands)).toEqual({ terms: "quarter-wave transformer", filters: {} });
    expect(planSearch("70cm-1.5wl-k2-max-gain", bands)).toEqual({ terms: "70cm-1.5wl-k2-max-gain", filters: {} });
  });

  it("puts facet hits first, each result once", () => {
    const r = (id: string) => ({ id });
    expect(mergeRanked([r("c"), r("a")], [r("a"), r("b"), r("c"), r("d")]).map((x) => x.id)).toEqual(["c", "a", "b", "d"]);
  });

  it("pages through results ten at a time", () => {
    expect(searchPage(46, 1)).toMatchObject({ from: 0, to: 10, pages: 5 });
    expect(searchPage(46, 5)).toMatchObject({ from: 40, to: 46, words: "46 pages found; showing 41–46, page 5 of 5." });
    expect(searchPage(46, 9).from).toBe(40); // clamped to the last page
    expect(searchPage(3, 1).words).toBe("3 pages found.");
  });
});

describe("a frequency just outside a band", () => {
  // 2 m: 144–146 MHz in ITU Region 1, 144–148 MHz in Regions 2 and 3 (ITU Radio Regulations,
  // Article 5, Table of Frequency Allocations; from memory), as the grid's band note says.
  const fitBands = [
    { id: "2m", name: "2 m amateur band", lowHz: 144e6, highHz: 146e6, note: "144–146 MHz in Region 1; Regions 2 and 3 extend to 148 MHz." },
    { id: "70cm", name: "70 cm amateur band", lowHz: 430e6, highHz: 440e6 },
  ];

  it("offers the 2 m band for 147 MHz with its regional note", () => {
    const fit = fitFrequency(fitBands, 147e6);
    expect(fit.bandIds).toEqual(["2m"]);
    expect(fit.note).toContain("1 MHz above the 2 m amateur band");
    expect(fit.note).toContain("Regions 2 and 3 extend to 148 MHz");
  });

  it("takes a frequency inside a band without a note, and names the nearest band when far off", () => {
    expect(fitFrequency(fitBands, 145.5e6)).toEqual({ bandIds: ["2m"], note: null, outside: false });
    const far = fitFrequency(fitBands, 200e6);
    expect(far.bandIds).toEqual([]);
    expect(far.note).toContain("nearest is the 2 m amateur band");
    expect(fitFrequency(fitBands, 415e6).bandIds).toEqual([]); // 15 MHz below 430 is more than 2 % of 415 MHz
    expect(fitFrequency(fitBands, 415e6).note).toContain("70 cm"); expect(fitFrequency(fitBands, 425e6).bandIds).toEqual(["70cm"]);
  });
});

describe("compare page ids", () => {
  const known = new Set(["a", "b", "c", "d"]);
  it("names unknown ids and a fourth design instead of dropping them", () => {
    const r = readCompareIds("a,nope,b,c,d", known);
    expect(r.ids).toEqual(["a", "b", "c"]);
    expect(r.problems).toHaveLength(2);
    expect(r.problems[0]).toContain("“nope”");
    expect(r.problems[1]).toContain("“d” was left out");
    expect(readCompareIds("a,b", known)).toEqual({ ids: ["a", "b"], problems: [] });
    expect(tooManyTicked(4)).toContain("untick one");
    expect(tooManyTicked(3)).toBeNull();
  });

  it("labels an option with its gain first", () => {
    expect(optionLabel({ gainDbi: 6.923, lengthWl: 1.5, pieces: 2, variant: "max-gain" })).toBe("6.92 dBi · 1.5 λ · 2/arm · most gain");
  });
});
