// Node phases by recurrence along straight pieces (generator/em/farField.ts) against direct
// e^{jψ} per node: E_{i+1} = E_i·e^{jα} is exact in exact arithmetic (angle addition,
// Abramowitz & Stegun 4.3.16), so the two may differ only by rounding (about 1e-12 of the field).
import { describe, expect, it } from "vitest";
import { shapeOf } from "../../generator/design/objective.js";
import { parseDesignRequest } from "../../generator/design/request.js";
import { createFarFieldPlan, farFieldAt } from "../../generator/em/farField.js";
import { solveFeed } from "../../generator/em/solve.js";

describe("far-field phase recurrence", () => {
  it("matches direct phases per node to 1e-10 of the field over the sphere", () => {
    const r = parseDesignRequest({ frequencyHz: 145e6, lengthWl: 2.5, piecesPerArm: 3, wireDiameterM: 2e-3, conductor: "copper" });
    const feed = solveFeed(shapeOf([1.1, -0.5, 0.6, 0.2, 0.3], r));
    const plan = createFarFieldPlan(feed.mesh, feed.currentRe, feed.currentIm, feed.kRadPerM);
    // six straight pieces, three per arm; the two at the feed split further into runs of equal
    // segments where the feed's finer segments (mesh.ts) change length
    const pieces = 6, feedHalvings = (plan.runFirstNode.length - pieces) / 2;
    expect(Number.isInteger(feedHalvings) && feedHalvings >= 1).toBe(true);
    // the direct reference: a plan whose runs are single steps (every node computed by cos/sin)
    const direct = { ...plan, runFirstNode: Int32Array.from({ length: plan.nodeCount }, (_, i) => i), runNodeCount: new Int32Array(plan.nodeCount).fill(1), runStep: new Float64Array(3 * plan.nodeCount), phaseRe: new Float64Array(plan.nodeCount), phaseIm: new Float64Array(plan.nodeCount) };
    const a = new Float64Array(4), b = new Float64Array(4);
    let worst = 0, scale = 0;
    for (let t = 0; t <= 18; t++) {
      for (let p = 0; p < 36; p++) {
        farFieldAt(plan, (t * Math.PI) / 18, (p * Math.PI) / 18, a);
        farFieldAt(direct, (t * Math.PI) / 18, (p * Math.PI) / 18, b);
        for (let c = 0; c < 4; c++) { worst = Math.max(worst, Math.abs(a[c] - b[c])); scale = Math.max(scale, Math.abs(b[c])); }
      }
    }
    // phase rounding (~1e-14) is amplified by the segment formula's (E2 − E1)/α with α ≥ 1e-3
    expect(worst).toBeLessThan(1e-10 * scale);
    expect(scale).toBeGreaterThan(0);
  });
});
