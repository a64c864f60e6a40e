import { describe, expect, it } from "vitest";
import { nelderMead } from "../../generator/optimize/nelderMead.js";
import { maxAbsDiff, rosenbrock, shiftedSphere } from "./testFunctions.js";

describe("nelderMead", () => {
  it("reaches the 2-D Rosenbrock minimum f = 0 at (1, 1) from the classic start (−1.2, 1)", () => {
    const r = nelderMead(rosenbrock, { x0: [-1.2, 1], initialStep: 0.5 });
    expect(r.f).toBeLessThan(1e-15);
    expect(maxAbsDiff(r.x, [1, 1])).toBeLessThan(1e-7);
    expect(r.stopReasons.map((s) => s.reason)).toEqual(["tolX", "tolFun"]);
    expect(r.restarts).toBe(0);
  });

  it("uses exactly the pinned number of evaluations on that problem (regression pin)", () => {
    expect(nelderMead(rosenbrock, { x0: [-1.2, 1], initialStep: 0.5 }).evaluations).toBe(245);
  });

  it("clips every trial point into the box and finds the minimum on its face", () => {
    const lowerBounds = [-2, -2];
    const upperBounds = [0.5, 2];
    const seen: number[][] = [];
    const r = nelderMead(
      (x) => {
        seen.push(x);
        return rosenbrock(x);
      },
      { x0: [-1.2, 1], initialStep: 0.5, lowerBounds, upperBounds },
    );
    expect(seen.every((x) => x.every((v, i) => v >= lowerBounds[i] && v <= upperBounds[i]))).toBe(true);
    expect(r.f).toBeCloseTo(0.25, 10);
    expect(maxAbsDiff(r.x, [0.5, 0.25])).toBeLessThan(1e-6);
  });

  it("with Gao–Han adaptive coefficients finds the centre of a 6-D shifted sphere", () => {
    const center = [0.3, -0.2, 0.1, 0.5, -0.4, 0.25];
    const r = nelderMead(shiftedSphere(center), {
      x0: [0, 0, 0, 0, 0, 0],
      initialStep: 0.2,
      adaptive: true,
      maxEvaluations: 5000,
    });
    expect(r.f).toBeLessThan(1e-12);
    expect(maxAbsDiff(r.x, center)).toBeLessThan(1e-6);
  });

  it("survives NaN scores and stops at the evaluation budget without exceeding it", () => {
    const r = nelderMead((x) => (x[0] > 0.9 ? NaN : rosenbrock(x)), {
      x0: [-1.2, 1],
      initialStep: 0.5,
      maxEvaluations: 60,
    });
    expect(r.evaluations).toBeLessThanOrEqual(60);
    expect(r.stopReasons).toEqual([{ reason: "maxEvaluations", value: r.evaluations }]);
    expect(Number.isFinite(r.f)).toBe(true);
    expect(r.history.every((h, i) => i === 0 || h.bestF <= r.history[i - 1].bestF)).toBe(true);
  });

  it("stops at the target", () => {
    const r = nelderMead(rosenbrock, { x0: [-1.2, 1], initialStep: 0.5, target: 1e-3 });
    expect(r.stopReasons).toEqual([{ reason: "target", value: r.f }]);
    expect(r.f).toBeLessThanOrEqual(1e-3);
  });

  it("rejects bad options with one line naming the field and the rule", () => {
    expect(() => nelderMead(rosenbrock, { x0: [0, 0], initialStep: [0.1, 0] })).toThrow(
      "nelderMead: initialStep[1] must be positive (got 0)",
    );
    expect(() => nelderMead(rosenbrock, { x0: [0, 0], initialStep: 0.1, tolX: -1 })).toThrow(
      "nelderMead: tolX must be non-negative and finite (got -1)",
    );
  });
});
