// Grid validation of the over-ground part: each problem is one line naming the file, the place and
// the rule (the project's input rule, DEVELOPERS.md). Heights: the band's minimum is the grid's own
// rule; mountings are those of shapes/mounting.ts; a purpose needs its elevation window.
import { readFileSync } from "node:fs";
import { describe, expect, it } from "vitest";
import { parseGrid } from "../../generator/catalog/grid.js";
import { expandOverGround, heightCurveHeightsM } from "../../generator/catalog/gridHf.js";
import { allCells } from "../../generator/catalog/cells.js";

const FILE = "test/fixtures/tiny-grid-hf.yaml";
const text = readFileSync(FILE, "utf8");
const refused = (t: string) => { try { parseGrid(t, "g.yaml"); return ""; } catch (e) { return (e as Error).message; } };

describe("over-ground grid validation", () => {
  it("the fixture parses and expands to ids band-L-K-variant-hHm-mounting-purpose", () => {
    const g = parseGrid(text, FILE);
    expect(expandOverGround(g.overGround).map((c) => c.id)).toEqual([
      "20m-1wl-k1-max-gain-h10m-vertical-long-distance",
      "40m-0.5wl-k1-max-gain-h10m-horizontal-near-vertical",
      "40m-0.5wl-k1-max-gain-h15m-horizontal-near-vertical",
    ]);
    expect(allCells(g).map((c) => c.kind)).toEqual(["ground", "free", "ground", "ground"]); // sorted by id: "20m" < "2m-"
  });
  it("a height below the band's minimum names the file, the place and the rule", () => {
    const m = refused(text.replace("heightsM: [10, 15]", "heightsM: [10, 4]"));
    expect(m.split("\n")).toHaveLength(1);
    expect(m).toMatch(/^g\.yaml/);
    expect(m).toMatch(/overGround\.bands\[0\]\.heightsM\[1\]|overGround\.bands\.0\.heightsM\.1/);
    expect(m).toMatch(/below the band's minimum height 6 m/);
  });
  it("an unknown mounting is refused with the mountings allowed", () => {
    const m = refused(text.replace("mountings: [horizontal]", "mountings: [sloping]"));
    expect(m).toMatch(/^g\.yaml/);
    expect(m).toMatch(/mountings/);
    expect(m).toMatch(/mounting must be one of horizontal, vertical/);
  });
  it("a purpose without an elevation window is refused", () => {
    const m = refused(text.replace("purposes: [near-vertical]", "purposes: [ground-wave]"));
    expect(m).toMatch(/^g\.yaml/);
    expect(m).toMatch(/purposes/);
    expect(m).toMatch(/purpose "ground-wave" has no elevation window/);
  });
  it("an unknown ground name and a vertical height at the clearance are refused", () => {
    expect(refused(text.replace("ground: average", "ground: swamp"))).toMatch(/ground must be one of poor, average, good/);
    expect(refused(text.replace("verticalClearanceM: 2", "verticalClearanceM: 10"))).toMatch(/vertical mounting needs heights above the clearance/);
  });
  it("the height curve holds ±3 m and the band's other heights, never the cell's own or below the minimum", () => {
    const g = parseGrid(text, FILE);
    const c = expandOverGround(g.overGround).find((x) => x.id === "40m-0.5wl-k1-max-gain-h10m-horizontal-near-vertical")!;
    expect(heightCurveHeightsM(g.overGround!, c)).toEqual([7, 13, 15]);
  });
  it("the HF grid's over-ground part parses and keeps the free-space cells as they were", () => {
    const g = parseGrid(readFileSync("designs/grid.yaml", "utf8"), "designs/grid.yaml");
    expect(allCells(g).filter((c) => c.kind === "free")).toHaveLength(g.bands.length * g.lengthsWl.length * g.piecesPerArm.length * g.variants.length);
  });
});
