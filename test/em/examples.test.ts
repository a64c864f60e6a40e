// The example shape files under designs/examples/ solve cleanly, and they behave as the trade
// expects: a longer parasitic wire behind a driven one acts as a reflector, so the main lobe points
// away from it (common practice); the catalog example reproduces its catalog entry's gain.
import { readdirSync, readFileSync } from "node:fs";
import { join } from "node:path";
import { describe, expect, it } from "vitest";
import { convergedSolution } from "../../generator/analysis/converged.js";
import { parseShape, solveShape } from "../../generator/em/index.js";

const DIR = "designs/examples";
const load = (name: string) => parseShape(readFileSync(join(DIR, name), "utf8"), name);

describe("example shapes", () => {
  for (const name of readdirSync(DIR).filter((f) => f.endsWith(".json"))) {
    it(`${name} solves with no warning and an energy balance error below 1e-3`, () => {
      const s = solveShape(load(name), { energyBalance: true });
      expect(s.warnings).toEqual([]);
      expect(s.energyBalanceError!).toBeLessThan(1e-3);
    });
  }

  it("a longer parasitic wire behind the driven one reflects: the lobe points away from it (common practice)", () => {
    const s = solveShape(load("driven-and-parasitic-2m.json"));
    const { theta, phi } = s.peakDirectionRad;
    // the parasitic wire lies at −y: the peak must point toward +y
    expect(Math.sin(theta) * Math.sin(phi)).toBeGreaterThan(0.9);
    expect(s.peakGainDbi).toBeGreaterThan(5);
  });

  it("the catalog example gives its catalog entry's gain", () => {
    const entry = JSON.parse(readFileSync("designs/entries/2m-1.5wl-k3-max-gain.json", "utf8"));
    // the entry publishes converged figures: the same refinement as `analyze` (analysis/converged.ts)
    const { solution } = convergedSolution(load("bent-wire-2m-k3.json"));
    expect(Math.abs(solution.peakGainDbi - entry.figures.gainDbi)).toBeLessThan(1e-3);
  });
});
