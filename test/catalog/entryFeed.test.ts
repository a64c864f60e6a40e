// The entry's optional feed field: what feedAnalysis returns, rounded as entries are, passes the
// entry schema (the same factory the site's content collection uses), and entries without it still do.
import { describe, expect, it } from "vitest";
import { feedAnalysis } from "../../generator/analysis/feedAnalysis.js";
import { bandSweep } from "../../generator/analysis/sweep.js";
import { DEFAULT_TOLERANCE, toleranceStudy } from "../../generator/analysis/tolerance.js";
import { entrySchema } from "../../generator/catalog/entrySchema.js";
import { roundDeep } from "../../generator/catalog/hash.js";
import { solveShape } from "../../generator/em/index.js";
import { vee } from "../helpers/shapes.js";

describe("entry feed field", () => {
  it("holds the ranked feed options, the as-built SWR study and the verdict", () => {
    const shape = vee(1.5, 60, 1e-3);
    const f0 = shape.frequencyHz;
    const bandHz: [number, number] = [0.99 * f0, 1.01 * f0];
    const s = solveShape(shape);
    const sweep = bandSweep(shape, bandHz, 50);
    const tol = { ...DEFAULT_TOLERANCE, samples: 4 };
    const feed = feedAnalysis(shape, sweep, s, tol, toleranceStudy(shape, s.peakGainDbi, tol), { bandHz, lineImpedanceOhm: 50, toleranceSwrFrequencies: 3 });
    expect(feed.options.options.length).toBeGreaterThan(3);
    expect(feed.toleranceSwr.perFrequency).toHaveLength(3);
    expect(feed.feedFraction).toBeCloseTo(0.5, 12);
    expect(feed.buildNote).toMatch(/balanced/);
    const rec = feed.options.recommended === null ? null : feed.options.options[feed.options.recommended];
    expect(feed.realizedGainDbi).toBe(rec ? rec.realizedGainDbi : null);
    expect(feed.needsNoParts).toBe(rec ? rec.needsNoParts : false);
    // every option is judged on the bent copies; the recommended one holds as built when any does
    expect(feed.options.options.every((o) => typeof o.holdsAsBuilt === "boolean")).toBe(true);
    expect(feed.options.options.every((o) => !o.holdsAsBuilt || o.meetsLimit)).toBe(true);
    if (feed.options.options.some((o) => o.holdsAsBuilt)) expect(feed.options.options[feed.options.recommended!].holdsAsBuilt).toBe(true);
    expect(feed.toleranceSwr.meetsLimitAsBuilt).toBe(feed.options.recommended !== null && feed.options.options[feed.options.recommended].holdsAsBuilt === true);
    const parsed = entrySchema.shape.feed.safeParse(roundDeep(feed));
    expect(parsed.success, JSON.stringify(parsed.error?.issues?.[0])).toBe(true);
    expect(entrySchema.shape.feed.safeParse(undefined).success).toBe(true);
    expect(entrySchema.shape.feed.safeParse(null).success).toBe(true);
  });
});
