// Page logic for designs over the ground (generator/site/overGround.ts and its use in the finder,
// downloads and compare logic), on the committed fixture entries in test/fixtures/entries-hf.
import { join } from "node:path";
import { describe, expect, it } from "vitest";
import { parseShape } from "../../generator/em/shapeFile.js";
import { compareCharts, compareRows, type CompareDesign, type CompareGround } from "../../generator/site/compare.js";
import { downloadFiles, siteShapeFileText } from "../../generator/site/downloads.js";
import { filterDesigns, filterParams, finderIndex, NO_FILTERS, parseFilters } from "../../generator/site/finder.js";
import { bandsOf } from "../../generator/site/catalog.js";
import { isOk, type OkEntry } from "../../generator/site/ok.js";
import {
  elevationChartSvg, elevationSvgOf, groundBandCells, groundRows, heightCurveSvg, heightRows, isOverGround, layoutCsv, layoutSvg, LAYOUT_CSV_HEADER,
  planPoints, supportPlan, type GroundEntry,
} from "../../generator/site/overGround.js";
import { xmlProblem } from "../render/xmlCheck.js";
import { shapeSvg } from "../../generator/render/index.js";
import { readEntries, resealed } from "./entries.js";
import { sharedBandIds, siteBandId } from "../../generator/site/ok.js";

export const HF_FIXTURES = join(import.meta.dirname, "../fixtures/entries-hf");
const hf = readEntries(HF_FIXTURES);
const ground = hf.filter(isOverGround);
const byId = (id: string) => {
  const e = ground.find((g) => g.id === id);
  if (!e) throw new Error(`fixture ${id} missing from ${HF_FIXTURES}`);
  return e;
};
const horizontal = byId("20m-1wl-k1-max-gain-h10m-horizontal-long-distance");
const vertical = byId("20m-1wl-k2-max-gain-h10m-vertical-long-distance");
const nvis = byId("60m-0.5wl-k1-max-gain-h10m-horizontal-near-vertical");
/** International foot, exactly 0.3048 m (international yard and pound agreement, 1959). */
const FOOT_M = 0.3048;

describe("over-ground fixtures", () => {
  it("are entries over the ground, and free-space entries are not", () => {
    expect(ground).toHaveLength(4);
    // the committed catalog holds both: an entry is over the ground exactly when its inputs ask for it
    const committed = readEntries().filter(isOk);
    const free = committed.filter((e) => e.inputs.overGround === undefined);
    expect(free.length).toBeGreaterThan(0);
    expect(free.some(isOverGround)).toBe(false);
    expect(committed.filter((e) => e.inputs.overGround !== undefined).every(isOverGround)).toBe(true);
  });
});

describe("support and layout plans", () => {
  it("puts the feed at the origin and measures each point from it on the ground and along the wire", () => {
    const pts = planPoints(vertical);
    const m = vertical.overGround.mountedPointsM, feed = vertical.shape.feedVertex;
    expect(pts[feed]).toMatchObject({ role: "feed", xM: 0, yM: 0, groundFromFeedM: 0, wireFromFeedM: 0 });
    expect(pts[0].role).toBe("end");
    expect(pts[pts.length - 1].role).toBe("end");
    for (const p of pts) {
      expect(p.groundFromFeedM).toBeCloseTo(Math.hypot(m[p.index][0] - m[feed][0], m[p.index][1] - m[feed][1]), 9);
      expect(p.heightM).toBe(m[p.index][2]);
    }
    // along the wire the tips lie half the wire away from a centre feed (the arms are mirror images)
    expect(pts[0].wireFromFeedM).toBeCloseTo(vertical.inputs.lengthM / 2, 3);
    expect(pts[pts.length - 1].wireFromFeedM).toBeCloseTo(vertical.inputs.lengthM / 2, 3);
    // the straight line on the ground is never longer than the wire to the same point
    for (const p of pts) expect(p.groundFromFeedM).toBeLessThanOrEqual(p.wireFromFeedM + 1e-9);
  });

  it("says when a tie-off hangs higher than the mast top", () => {
    const v = supportPlan(vertical);
    expect(vertical.overGround.highestPointM).toBeGreaterThan(vertical.overGround.feedHeightM);
    expect(v.aboveFeed).toBe(2);
    expect(v.tallestM).toBe(vertical.overGround.highestPointM);
    const h = supportPlan(horizontal);
    expect(h.aboveFeed).toBe(0);
    expect(h.supports).toBe(horizontal.overGround.mountedPointsM.length - 1);
    expect(h.points.every((p) => Math.abs(p.heightM - 10) < 1e-9)).toBe(true);
  });

  it("writes a layout CSV that parses back to the wire as hung, in metres and feet", () => {
    for (const e of ground) {
      const lines = layoutCsv(e).trimEnd().split("\n");
      expect(lines[0].startsWith("# ")).toBe(true);
      expect(lines[1]).toBe(LAYOUT_CSV_HEADER);
      const cols = LAYOUT_CSV_HEADER.split(",");
      const rows = lines.slice(2).map((l) => Object.fromEntries(l.split(",").map((v, k) => [cols[k], v])));
      const m = e.overGround.mountedPointsM, feed = e.shape.feedVertex;
      expect(rows).toHaveLength(m.length);
      rows.forEach((r, k) => {
        expect(Number(r.ground_x_m)).toBeCloseTo(m[k][0] - m[feed][0], 3);
        expect(Number(r.ground_y_m)).toBeCloseTo(m[k][1] - m[feed][1], 3);
        expect(Number(r.height_m)).toBeCloseTo(m[k][2], 3);
        expect(Number(r.ground_from_feed_ft)).toBeCloseTo(Number(r.ground_from_feed_m) / FOOT_M, 1);
        expect(Number(r.wire_from_feed_ft)).toBeCloseTo(Number(r.wire_from_feed_m) / FOOT_M, 1);
      });
      expect(rows[feed].point).toBe("F");
    }
  });

  it("draws the layout plan as well-formed SVG with a peg per point, and a side view for a vertical wire", () => {
    for (const e of ground) {
      const svg = layoutSvg(e);
      expect(xmlProblem(svg), e.id).toBeNull();
      expect(svg.match(/class="peg"|class="feedpeg"/g)!.length).toBeGreaterThanOrEqual(e.overGround.mountedPointsM.length);
    }
    expect(layoutSvg(vertical)).toContain("Side view");
    expect(layoutSvg(horizontal)).not.toContain("Side view");
  });
});

describe("elevation chart and height curve", () => {
  it("puts the takeoff dot at the takeoff elevation, on the ground-line half disc", () => {
    const svg = elevationSvgOf(horizontal);
    expect(xmlProblem(svg)).toBeNull();
    expect(svg).toContain('class="groundline"');
    expect(svg.match(/class="window"/g)).toHaveLength(2); // both sides of the zenith
    expect(svg.match(/data-mark-deg=/g)).toHaveLength(horizontal.overGround.gainAtElevationDbi.length);
    // geometry: the dot's angle seen from the centre of the half disc is the takeoff elevation
    const ground = /<line x1="6" y1="([\d.]+)" x2="([\d.]+)"/.exec(svg)!;
    const cy = Number(ground[1]), cx = (6 + Number(ground[2])) / 2;
    const dot = /<circle cx="([\d.]+)" cy="([\d.]+)" r="4" class="takeoff"/.exec(svg)!;
    const angle = (Math.atan2(cy - Number(dot[2]), Number(dot[1]) - cx) * 180) / Math.PI;
    expect(angle).toBeCloseTo(horizontal.overGround.takeoffElevationDeg, 0);
  });

  it("shades one wedge when the window reaches the zenith", () => {
    const svg = elevationSvgOf(nvis);
    expect(nvis.inputs.overGround.elevationWindowDeg).toEqual([60, 90]);
    expect(svg.match(/class="window"/g)).toHaveLength(1);
    expect(svg).toMatch(/class="takeoff"/);
    const one = elevationChartSvg({ series: [{ label: "x", gainDbi: [0, 1, 2], stepDeg: 90 }], title: "t", windowDeg: [80, 100] });
    expect(one.match(/class="window"/g)).toHaveLength(1);
  });

  it("escapes every label", () => {
    const svg = elevationChartSvg({ series: [{ label: "<script>x</script>", gainDbi: [0, 1, 2], stepDeg: 90 }], title: `a "b" & <c>` });
    expect(xmlProblem(svg)).toBeNull();
    expect(svg).not.toContain("<script>");
  });

  it("lists the height curve lowest first with the design's own height in its place", () => {
    const rows = heightRows(horizontal);
    const heights = rows.map((r) => r.heightM);
    expect(heights).toEqual([...heights].sort((a, b) => a - b));
    expect(rows.filter((r) => r.current)).toHaveLength(1);
    const own = rows.find((r) => r.current)!;
    expect(own.heightM).toBe(10);
    expect(own.gainDbi).toBe(horizontal.figures.gainDbi);
    expect(rows).toHaveLength(horizontal.overGround.heightCurve.length + 1);
    // the grid's offsets of ±3 m are on the curve (designs/grid.yaml heightOffsetsM)
    expect(heights).toEqual(expect.arrayContaining([7, 13]));
    expect(xmlProblem(heightCurveSvg(horizontal))).toBeNull();
    expect(heightCurveSvg(horizontal).match(/data-current/g)).toHaveLength(1);
  });

  it("orders the grounds poor, average, good", () => {
    expect(groundRows(horizontal).map((r) => r.ground)).toEqual(["poor", "average", "good"]);
    expect(groundRows(horizontal).find((r) => r.current)!.ground).toBe("average");
  });

  it("fills the band table's ground columns", () => {
    const c = groundBandCells(vertical);
    expect(c.height.sort).toBe(10);
    expect(c.mounting.sort).toBe("vertical");
    expect(c.takeoff.sort).toBe(vertical.overGround.takeoffElevationDeg);
  });
});

describe("a band id used both in free space and over the ground", () => {
  it("gives two site bands, the free-space one keeping its id", () => {
    const free = readEntries().filter(isOk).find((e) => e.inputs.bandId === "10m" && e.inputs.overGround === undefined)!;
    expect(free).toBeDefined();
    const hung = resealed(horizontal, (e) => { e.id = "10m-1wl-k1-max-gain-h10m-horizontal-long-distance"; e.inputs.bandId = "10m"; e.inputs.bandName = free.inputs.bandName; });
    const all = [free, hung, vertical];
    const shared = sharedBandIds(all);
    expect([...shared]).toEqual(["10m"]);
    expect(siteBandId(free, shared)).toBe("10m");
    expect(siteBandId(hung, shared)).toBe("10m-over-ground");
    expect(siteBandId(vertical, shared)).toBe("20m");
    const bands = bandsOf(all);
    expect(bands.map((b) => b.id).sort()).toEqual(["10m", "10m-over-ground", "20m"]);
    expect(bands.find((b) => b.id === "10m-over-ground")!.name).toBe(`${free.inputs.bandName}, over the ground`);
    expect(bands.find((b) => b.id === "10m")!.entries.map((e) => e.id)).toEqual([free.id]);
    const index = finderIndex(bands, all.filter(isOk));
    expect(index.designs.find((d) => d.id === hung.id)!.band).toBe("10m-over-ground");
    expect(index.designs.find((d) => d.id === free.id)!.band).toBe("10m");
  });
});

describe("the shape drawing of a straight wire with its lobe straight up", () => {
  it("marks the lobe as out of the page instead of an arrow of no length", () => {
    expect(nvis.shape.pointsM.every((p) => Math.abs(p[1]) < 1e-9)).toBe(true);
    expect(nvis.figures.peakDirection.thetaDeg).toBe(0);
    const svg = shapeSvg(nvis, { widthPx: 800, dimensions: true });
    expect(xmlProblem(svg)).toBeNull();
    expect(svg).toContain('data-role="lobe-out-of-page"');
  });
});

describe("finder over the ground", () => {
  const entries = [...readEntries().filter(isOk).slice(0, 4), ...hf];
  const index = finderIndex(bandsOf(entries), entries);
  const find = (q: Record<string, string>) => filterDesigns(index, parseFilters((k) => q[k] ?? null)).map((d) => d.id);

  it("finds the 20 m design for a 10 m mast and at most 30 m of wire", () => {
    expect(find({ mast: "10", wire: "30" })).toEqual(["20m-1wl-k1-max-gain-h10m-horizontal-long-distance", "60m-0.5wl-k1-max-gain-h10m-horizontal-near-vertical"]);
    expect(find({ mast: "10", wire: "30", mhz: "14.2" })).toEqual(["20m-1wl-k1-max-gain-h10m-horizontal-long-distance"]);
  });

  it("leaves out designs whose highest point a mast cannot reach, and free-space designs once a mast is given", () => {
    expect(find({ mast: "11" })).not.toContain(vertical.id);
    expect(find({ mast: "12" })).toContain(vertical.id);
    expect(find({ mast: "100" }).every((id) => ground.some((g) => g.id === id))).toBe(true);
  });

  it("filters by mounting and purpose, and keeps them in the shared address", () => {
    expect(find({ mounting: "vertical" })).toEqual([vertical.id]);
    expect(find({ purpose: "near-vertical" })).toEqual([nvis.id]);
    const fl = parseFilters((k) => ({ mast: "10", mounting: "horizontal", purpose: "long-distance" } as Record<string, string>)[k] ?? null);
    expect(filterParams(fl)).toEqual([["mast", "10"], ["mounting", "horizontal"], ["purpose", "long-distance"]]);
    expect(parseFilters((k) => ({ mounting: "sideways", purpose: "x" } as Record<string, string>)[k] ?? null)).toMatchObject({ mounting: null, purpose: null });
  });

  it("finds every design with no filters set, as before", () => {
    expect(filterDesigns(index, NO_FILTERS)).toHaveLength(index.designs.length);
  });
});

describe("downloads over the ground", () => {
  it("offers the shape file with the ground and the layout plan instead of a paper template", async () => {
    const files = await downloadFiles(horizontal, new Map());
    const groups = files.map((f) => f.group);
    expect(groups).toEqual(["entry", "shape", "layout-csv", "layout-svg", "checksums"]);
    const shape = parseShape(files.find((f) => f.group === "shape")!.content as string);
    expect(shape.wires[0].pointsM).toEqual(horizontal.overGround.mountedPointsM);
    expect(shape.ground).toEqual(horizontal.inputs.overGround.ground);
  });

  it("leaves the free-space shape file as it was", () => {
    const free = readEntries().filter(isOk)[0] as OkEntry;
    const shape = JSON.parse(siteShapeFileText(free));
    expect(shape.ground).toBeUndefined();
    expect(shape.wires[0].pointsM).toEqual(free.shape.pointsM);
  });
});

describe("compare over the ground", () => {
  it("puts free-space designs on the polar cuts and designs over the ground on the elevation chart", () => {
    const free = readEntries().filter(isOk)[0];
    const designs = [free, horizontal, vertical] as unknown as (CompareDesign & CompareGround)[];
    const charts = compareCharts(designs);
    expect(charts.polar.map((c) => c.k)).toEqual([0]);
    expect(charts.elevation.map((c) => c.k)).toEqual([1, 2]);
    const rows = compareRows(designs);
    const takeoff = rows.find((r) => r.label === "Takeoff elevation")!;
    expect(takeoff.values[0]).toBe("free space");
    expect(takeoff.values[1]).toBe("25.0°");
    expect(compareRows([free] as unknown as CompareDesign[]).some((r) => r.label === "Takeoff elevation")).toBe(false);
  });
});

export type { GroundEntry };
