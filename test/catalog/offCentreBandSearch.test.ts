// The direct-feed band's own off-centre search (computeOffCentre.ts, tryOffCentre): besides polishing
// the off-centre starts from the references, a band searches off centre around its own centre-fed
// outcome fed in the middle, as `design --family off-centre` does. So when the reference starts are
// poor, the catalog still ends where that search ends, never under it. A 1.5 λ wire with one piece per
// arm on 2 m (copper, 2 mm): the centre-fed V meets SWR 2 there (common practice: a centre feed on a
// 1.5 λ wire sits near a current maximum, about 100 Ω).
import { readFileSync } from "node:fs";
import { describe, expect, it } from "vitest";
import { bandRequest } from "../../generator/catalog/compute.js";
import { designCentreFed, SEARCH_SWR_MARGIN, searchRequestOf, tryOffCentre } from "../../generator/catalog/computeOffCentre.js";
import { expandGrid, parseGrid } from "../../generator/catalog/grid.js";
import { designOffCentre } from "../../generator/design/designOffCentre.js";
import { mirrorAsOffCentre } from "../../generator/shapes/offCentre.js";

const GRID = "test/fixtures/tiny-grid-offcentre.yaml";
const grid = { ...parseGrid(readFileSync(GRID, "utf8"), GRID), lengthsWl: [1.5] };
const cell = expandGrid(grid).find((c) => c.id === "2m-1.5wl-k1-direct-feed")!;
const request = bandRequest(grid, cell);

describe("catalog: a direct-feed band searches off centre around its own centre-fed optimum", () => {
  it("ends at least where that search ends, even when the reference start is poor", () => {
    const centre = designCentreFed(request, undefined, true);
    expect(centre.status).toBe("ok");
    // a reference start that claims more gain than the centre-fed design (so the off-centre family is
    // tried) but is a straight wire fed a tenth of the way along, far from any good shape
    const poor = { x: [0.1, Math.PI / 2], gainDbi: centre.evaluation.gainDbi! + 1 };
    const got = tryOffCentre(request, centre, [poor], SEARCH_SWR_MARGIN);
    const own = designOffCentre(searchRequestOf(request, SEARCH_SWR_MARGIN), { start: mirrorAsOffCentre(centre.x, 1) });
    expect(own.status).toBe("ok");
    const best = Math.max(own.evaluation.gainDbi!, centre.evaluation.gainDbi!);
    expect(got.outcome.status).toBe("ok");
    expect(got.outcome.evaluation.gainDbi!).toBeGreaterThanOrEqual(best - 1e-9);
    expect(got.family).toBe(own.evaluation.gainDbi! > centre.evaluation.gainDbi! ? "off-centre" : "centre-fed");
  });
});
