// The off-centre-fed family on the existing search: a 1 λ wire on 2 m cannot be fed directly from
// 50 Ω at its centre (each arm is λ/2, so the centre is a current minimum of high impedance — common
// practice), but with the feed moved along the wire the same search finds a direct-feed shape.
import { describe, expect, it } from "vitest";
import { designBentArm } from "../../generator/design/designBentArm.js";
import { designOffCentre, offCentreShapeOf } from "../../generator/design/designOffCentre.js";
import { offCentreSpecOf } from "../../generator/design/offCentreObjective.js";
import { parseDesignRequest } from "../../generator/design/request.js";
import { DEFAULT_LIMITS } from "../../generator/shapes/constraints.js";
import { unpackOffCentre } from "../../generator/shapes/offCentre.js";
import { offCentreViolation } from "../../generator/shapes/offCentreConstraints.js";
import { solveFeed } from "../../generator/em/index.js";
import { swr } from "../../generator/analysis/swr.js";

const request = parseDesignRequest({ frequencyHz: 145e6, lengthWl: 1, piecesPerArm: 1, wireDiameterM: 0.002, variant: "direct-feed", bandHz: [144e6, 146e6], maxEvaluations: 400 });

describe("designOffCentre", () => {
  it("meets SWR ≤ 2 across 144–146 MHz on a 1 λ wire where the centre-fed family cannot", () => {
    expect(designBentArm(request).status).toBe("infeasible");
    const outcome = designOffCentre(request);
    expect(outcome.status).toBe("ok");
    const p = unpackOffCentre(outcome.x, 1);
    expect(p.feedFraction).toBeLessThan(0.45); // clearly off centre
    expect(offCentreViolation(p, offCentreSpecOf(request), DEFAULT_LIMITS, 299_792_458 / 145e6, 1e-3).total).toBe(0);
    // an independent check of the band SWR on the returned shape, at 11 points
    const shape = offCentreShapeOf(outcome.x, request);
    for (let i = 0; i <= 10; i++) {
      const f = 144e6 + 2e5 * i;
      expect(swr(solveFeed(offCentreShapeOf(outcome.x, request, f)).inputImpedanceOhm, 50)).toBeLessThanOrEqual(2 + 1e-9);
    }
    expect(shape.feed.vertex).toBe(1);
    expect(outcome.evaluation.gainDbi).toBeGreaterThan(3); // a bent 1 λ wire: above a dipole's 2.15 dBi (common practice)
  });

  it("is deterministic for a seed", () => {
    const r = { ...request, maxEvaluations: 60 };
    expect(designOffCentre(r).x).toEqual(designOffCentre(r).x);
  });
});
