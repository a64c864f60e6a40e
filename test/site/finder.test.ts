import { describe, expect, it } from "vitest";
import { filterDesigns, filterParams, finderIndex, NO_FILTERS, parseFilters, PARAM, type FinderIndex, type FinderRecord } from "../../generator/site/finder.js";
import { bandsOf } from "../../generator/site/catalog.js";
import { isOk } from "../../generator/site/ok.js";
import { readEntries } from "./entries.js";

const rec = (id: string, over: Partial<FinderRecord>): FinderRecord => ({
  id, band: "2m", frequencyHz: 145e6, gainDbi: 5, lengthWl: 1.5, lengthM: 3.1, pieces: 2, spanXM: 2, spanYM: 0.5,
  swr2WidthHz: 1e6, variant: "max-gain", url: `designs/${id}/`, thumb: `designs/${id}/thumb.png`, ...over,
});

const index: FinderIndex = {
  version: 1,
  bands: [
    { id: "2m", name: "2 m", lowHz: 144e6, highHz: 146e6 },
    { id: "70cm", name: "70 cm", lowHz: 430e6, highHz: 440e6 },
  ],
  designs: [
    rec("a", { gainDbi: 6.9 }),
    rec("b", { gainDbi: 5.5, pieces: 1, variant: "direct-feed", swr2WidthHz: 2.5e6 }),
    rec("c", { band: "70cm", frequencyHz: 435e6, gainDbi: 7.1, spanXM: 0.6, spanYM: 0.2, lengthWl: 2.5 }),
    rec("d", { band: "70cm", frequencyHz: 435e6, gainDbi: 4.2, swr2WidthHz: 0, spanXM: 0.3 }),
  ],
};
const ids = (r: FinderRecord[]) => r.map((d) => d.id);

describe("finder filter", () => {
  it("returns everything, best gain first, without filters", () => {
    expect(ids(filterDesigns(index, NO_FILTERS))).toEqual(["c", "a", "b", "d"]);
  });

  it("filters by band and minimum gain", () => {
    expect(ids(filterDesigns(index, { ...NO_FILTERS, band: "2m", minGainDbi: 6 }))).toEqual(["a"]);
    expect(ids(filterDesigns(index, { ...NO_FILTERS, band: "70cm" }))).toEqual(["c", "d"]);
    expect(ids(filterDesigns(index, { ...NO_FILTERS, minGainDbi: 6.9 }))).toEqual(["c", "a"]); // inclusive
  });

  it("filters by a frequency inside the band", () => {
    expect(ids(filterDesigns(index, { ...NO_FILTERS, frequencyMhz: 145.5 }))).toEqual(["a", "b"]);
    expect(ids(filterDesigns(index, { ...NO_FILTERS, frequencyMhz: 200 }))).toEqual([]);
  });

  it("filters by span, pieces, variant and SWR bandwidth", () => {
    expect(ids(filterDesigns(index, { ...NO_FILTERS, maxSpanM: 0.6 }))).toEqual(["c", "d"]);
    expect(ids(filterDesigns(index, { ...NO_FILTERS, pieces: 1 }))).toEqual(["b"]);
    expect(ids(filterDesigns(index, { ...NO_FILTERS, variant: "direct-feed" }))).toEqual(["b"]);
    expect(ids(filterDesigns(index, { ...NO_FILTERS, minBandwidthKhz: 2000 }))).toEqual(["b"]);
  });

  it("sorts by the chosen key with ties broken by id", () => {
    expect(ids(filterDesigns(index, { ...NO_FILTERS, sort: "span" }))).toEqual(["d", "c", "a", "b"]);
    expect(ids(filterDesigns(index, { ...NO_FILTERS, sort: "bandwidth" }))).toEqual(["b", "a", "c", "d"]);
  });

  it("reads filters from a form or a query and writes them back", () => {
    const q = new URLSearchParams("band=2m&gain=6,5&span=&pieces=2.5&variant=nonsense&bw=abc&sort=span");
    const fl = parseFilters((n) => q.get(n));
    expect(fl).toEqual({ ...NO_FILTERS, band: "2m", minGainDbi: 6.5, sort: "span" });
    expect(filterParams(fl)).toEqual([[PARAM.band, "2m"], [PARAM.minGainDbi, "6.5"], [PARAM.sort, "span"]]);
    expect(filterParams(NO_FILTERS)).toEqual([]);
  });

  it("indexes every buildable catalog entry with the entry's own numbers", () => {
    const entries = readEntries();
    const idx = finderIndex(bandsOf(entries), entries);
    const ok = entries.filter(isOk);
    expect(idx.designs.map((d) => d.id).sort()).toEqual(ok.map((e) => e.id).sort());
    for (const d of idx.designs) {
      const e = ok.find((x) => x.id === d.id)!;
      expect(d.gainDbi).toBe(e.figures.gainDbi);
      expect(d.spanXM).toBe(e.shape.spanM.x);
      expect(d.swr2WidthHz).toBe(e.sweep.swr2Span?.widthHz ?? 0);
    }
  });

  it("filters a catalog-sized index well within a keystroke", () => {
    const big: FinderIndex = { ...index, designs: Array.from({ length: 2000 }, (_, i) => rec(`x${i}`, { gainDbi: (i * 7919) % 90 / 10 })) };
    const t0 = performance.now();
    for (let k = 0; k < 20; k++) filterDesigns(big, { ...NO_FILTERS, band: "2m", minGainDbi: 4 });
    expect((performance.now() - t0) / 20).toBeLessThan(20);
  });
});

describe("finder: wire length and frequencies near a band", () => {
  it("filters by the longest wire in metres or feet", () => {
    // 1 ft = 0.3048 m exactly (international foot, 1959 agreement)
    expect(ids(filterDesigns(index, { ...NO_FILTERS, maxLength: 3.1 }))).toEqual(["c", "a", "b", "d"]);
    expect(ids(filterDesigns(index, { ...NO_FILTERS, maxLength: 3.0 }))).toEqual([]);
    expect(ids(filterDesigns(index, { ...NO_FILTERS, maxLength: 10.2, lengthUnit: "ft" }))).toEqual(["c", "a", "b", "d"]); // 3.109 m
    expect(ids(filterDesigns(index, { ...NO_FILTERS, maxLength: 10, lengthUnit: "ft" }))).toEqual([]); // 3.048 m
    const q = new URLSearchParams("wire=10&unit=ft");
    const fl = parseFilters((n) => q.get(n));
    expect(fl).toMatchObject({ maxLength: 10, lengthUnit: "ft" });
    expect(filterParams(fl)).toEqual([[PARAM.maxLength, "10"], [PARAM.lengthUnit, "ft"]]);
  });

  it("offers a band's designs for a frequency just outside it", () => {
    expect(ids(filterDesigns(index, { ...NO_FILTERS, frequencyMhz: 147 }))).toEqual(["a", "b"]);
  });
});
