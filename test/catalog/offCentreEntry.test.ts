// The catalog's off-centre fallback on a tiny direct-feed grid (1 λ wire, one piece per arm, one
// band): a centre feed on a 1 λ wire sits at a current minimum, so the centre-fed family cannot meet
// SWR 2 and the entry must come from the off-centre family, with both arms, the feed position and a
// buildable feed. Also the SWR margin the direct-feed search keeps (computeOffCentre.ts).
import { readFileSync } from "node:fs";
import { beforeAll, describe, expect, it } from "vitest";
import { computeEntry, computeReference, referenceRequest, type ReferenceResult } from "../../generator/catalog/compute.js";
import { SEARCH_SWR_MARGIN, searchSwrLimit } from "../../generator/catalog/computeOffCentre.js";
import { unpack, wirePointsM } from "../../generator/shapes/bentArm.js";
import { mirrorAsOffCentre, offCentrePointsM, unpackOffCentre } from "../../generator/shapes/offCentre.js";
import { entrySchema, type Entry } from "../../generator/catalog/entrySchema.js";
import { expandGrid, parseGrid } from "../../generator/catalog/grid.js";
import { checkFrequencies } from "../../generator/design/objective.js";
import { evaluateOffCentre } from "../../generator/design/offCentreObjective.js";
import { SPEED_OF_LIGHT_M_PER_S } from "../../generator/units.js";
import { armTables, feedLead, needsNoPartsOf, realizedGainOf } from "../../generator/site/feedRows.js";
import { filterDesigns, finderIndex, NO_FILTERS } from "../../generator/site/finder.js";
import { bandsOf, isOk } from "../../generator/site/catalog.js";
import { bandRow } from "../../generator/site/tables.js";
import { shapeSvg } from "../../generator/render/shapeSvg.js";
import { wireDxf } from "../../generator/export/dxf.js";
import { exportShapeOf } from "../../generator/site/downloads.js";

const GRID = "test/fixtures/tiny-grid-offcentre.yaml";
const grid = parseGrid(readFileSync(GRID, "utf8"), GRID);
const cell = expandGrid(grid).find((c) => c.id === "2m-1wl-k1-direct-feed")!;
const key = { lengthWl: 1, piecesPerArm: 1, variant: "direct-feed" as const };

describe("the centre-fed start for the off-centre search", () => {
  it("a centre-fed shape read as off-centre (t = ½, both arms alike) has the same vertices", () => {
    const x = [0.6, 0.3, -0.2, 0.3, 0.25]; // K = 3: φ1, β1, β2, u1, u2
    const spec = { piecesPerArm: 3, wireLengthM: 2 };
    const a = wirePointsM(unpack(x, 3), spec);
    const b = offCentrePointsM(unpackOffCentre(mirrorAsOffCentre(x, 3), 3), spec);
    expect(b).toHaveLength(a.length);
    b.forEach((p, i) => p.forEach((v, j) => expect(v).toBeCloseTo(a[i][j], 12)));
  });
});

// one reference search and one entry, shared by every check below (CPU: a few seconds)
let reference: ReferenceResult;
let entry: Entry;
beforeAll(() => {
  reference = computeReference(grid, key, null);
  entry = computeEntry(grid, cell, reference, null); // no K − 1 start: the own reference alone
});

describe("catalog: off-centre-fed entry where the centre feed cannot meet the limit", () => {
  it("the centre-fed reference misses SWR 2 on a 1 λ wire; the off-centre reference meets it", () => {
    // common practice: a centre feed on a full-wave wire sits at a current minimum (kilohms)
    expect(reference.status).toBe("infeasible");
    expect(reference.offCentre?.status).toBe("ok");
  });

  it("the reference search keeps the SWR margin: ≤ 1.8 at all 11 band points, not just ≤ 2", () => {
    expect(searchSwrLimit(2)).toBeCloseTo(1.8, 12);
    expect(SEARCH_SWR_MARGIN).toBeLessThan(1);
    const r = referenceRequest(grid, key);
    const e = evaluateOffCentre(reference.offCentre!.x, r, checkFrequencies(r, 11), searchSwrLimit(r.swrLimit));
    expect(e.maxSwr).not.toBeNull();
    expect(e.maxSwr!).toBeLessThanOrEqual(1.8);
  });

  it("publishes a valid off-centre entry with both arms and the feed position", () => {
    expect(entrySchema.safeParse(entry).success).toBe(true);
    expect(entry.status).toBe("ok");
    expect(entry.family).toBe("off-centre");
    const oc = entry.shape!.offCentre!;
    const wireM = SPEED_OF_LIGHT_M_PER_S / cell.band.designMhz / 1e6; // 1 λ at the design frequency
    expect(oc.left.lengthM + oc.right.lengthM).toBeCloseTo(wireM, 4);
    expect(oc.feedFromTipM).toBeCloseTo(oc.left.lengthM, 6);
    expect(oc.feedFraction).toBeCloseTo(oc.left.lengthM / wireM, 4);
    // the current maxima of a full-wave wire lie λ/4 from each tip (standing-wave current on a thin
    // wire, Kraus, Antennas, ch. 5 — from memory): a low-impedance feed lies near there, far from the middle
    expect(oc.feedFraction).toBeGreaterThan(0.1);
    expect(oc.feedFraction).toBeLessThan(0.4);
    // the drawn polyline really is the two arms: first point to feed vertex = the left arm
    const p = entry.shape!.pointsM, k = entry.shape!.feedVertex;
    expect(Math.hypot(p[0][0] - p[k][0], p[0][1] - p[k][1])).toBeCloseTo(oc.left.lengthM, 5); // one straight piece
  });

  it("has a buildable recommended feed that holds as built, and a choke note for the unbalanced feed", () => {
    const feed = entry.feed!;
    expect(feed.options.recommended).not.toBeNull();
    const chosen = feed.options.options[feed.options.recommended!];
    expect(chosen.worstSwr!).toBeLessThanOrEqual(2);
    expect(feed.toleranceSwr.meetsLimitAsBuilt).toBe(true);
    expect(feed.buildNote).toMatch(/choke/);
    expect(feed.feedFraction).toBeCloseTo(entry.shape!.offCentre!.feedFraction, 4);
  });
});

describe("site: feed rows, both arms and ranking for an off-centre entry", () => {
  it("leads with the recommended feed; SWR bare and after it at every in-band sweep point", () => {
    if (!isOk(entry)) throw new Error("entry not buildable");
    const lead = feedLead(entry)!;
    const rec = entry.feed!.options.options[entry.feed!.options.recommended!];
    expect(lead.recommended!.build).toBe(rec.build);
    const inBand = entry.sweep.points.filter((p) => p.inBand);
    expect(lead.swr).toHaveLength(inBand.length);
    // the worst "after the feed" value shown is the option's worst in-band SWR
    expect(Math.max(...lead.swr.map((p) => Number(p.afterFeed)))).toBeCloseTo(rec.worstSwr!, 1);
    expect(lead.alternatives).toHaveLength(entry.feed!.options.options.length - 1);
    expect(lead.offCentre).toMatch(/off centre: .* m .* from the left tip/);
    expect(lead.buildNote).toMatch(/choke/);
  });

  it("lists both arms from the feed outward; their lengths add up to the wire", () => {
    if (!isOk(entry)) throw new Error("entry not buildable");
    const arms = armTables(entry)!;
    expect(arms.map((a) => a.name)).toEqual(["Left (short) arm", "Right (long) arm"]);
    const totalMm = arms.flatMap((a) => a.rows.map((r) => Number(r.lengthMm))).reduce((s, v) => s + v, 0);
    expect(totalMm).toBeCloseTo(entry.inputs.lengthM * 1000, -1);
  });

  it("band table and finder rank by realized gain after the feed and filter by needs-no-parts", () => {
    const row = bandRow(entry);
    expect(row.cells.realized.sort).toBe(realizedGainOf(entry));
    expect(row.cells.noParts.sort).toBe(needsNoPartsOf(entry) ? "yes" : "no");
    const index = finderIndex(bandsOf([entry]), [entry]);
    expect(index.designs[0].realizedGainDbi).toBe(entry.feed!.realizedGainDbi);
    const noParts = filterDesigns(index, { ...NO_FILTERS, noParts: true });
    expect(noParts.length).toBe(entry.feed!.needsNoParts ? 1 : 0);
  });

  it("the drawing marks the feed off centre with no mirror-twin lobe; the DXF circles the feed at its vertex", () => {
    if (!isOk(entry)) throw new Error("entry not buildable");
    const svg = shapeSvg(entry, { dimensions: true });
    expect(svg).toMatch(/feed, off centre: [\d.]+ (mm|cm) from the left tip/);
    expect(svg).not.toMatch(/lobe-arrow-twin/);
    const shape = exportShapeOf(entry);
    expect(shape.feedPointM).toEqual(entry.shape.pointsM[entry.shape.feedVertex]);
    expect(wireDxf(shape)).toMatch(/CIRCLE/);
  });
});
