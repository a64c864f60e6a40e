import { describe, expect, it } from "vitest";
import { createCmaEs, type CmaEsOptions } from "../../generator/optimize/cmaEs.js";
import { cmaEsParameters } from "../../generator/optimize/cmaEsParameters.js";
import { maxAbsDiff, rosenbrock, shiftedSphere } from "./testFunctions.js";

/** Plain ask/tell loop; also returns every point that was handed to the objective. */
function run(objective: (x: number[]) => number, options: CmaEsOptions) {
  const es = createCmaEs(options);
  const asked: number[][] = [];
  while (es.stop().length === 0) {
    const xs = es.ask();
    asked.push(...xs);
    es.tell(xs, xs.map(objective));
  }
  return { ...es.best(), evaluations: es.state.evaluations, stopReasons: es.stop(), asked, es };
}

describe("CMA-ES default parameters", () => {
  it("follow the tutorial's table for n = 10 (λ = 10, μ = 5)", () => {
    const p = cmaEsParameters(10, 10);
    expect(p.mu).toBe(5);
    expect(p.weights.slice(0, 5).reduce((s, w) => s + w, 0)).toBeCloseTo(1, 15);
    expect(p.weights.slice(5).every((w) => w < 0)).toBe(true);
    expect(p.muEff).toBeCloseTo(3.1673, 4); // (Σw')²/Σw'², w'_i = ln 5.5 − ln i
    expect(p.cSigma).toBeCloseTo((p.muEff + 2) / (10 + p.muEff + 5), 15);
    expect(p.c1).toBeCloseTo(2 / (11.3 ** 2 + p.muEff), 15);
    expect(p.c1 + p.cMu).toBeLessThanOrEqual(1);
  });
});

describe("createCmaEs", () => {
  it("reaches the Rosenbrock minimum f = 0 at (1, 1) in 2-D", () => {
    const r = run(rosenbrock, { x0: [0, 0], sigma0: 0.5, seed: 1 });
    expect(r.f).toBeLessThan(1e-14);
    expect(maxAbsDiff(r.x, [1, 1])).toBeLessThan(1e-6);
    expect(r.stopReasons.map((s) => s.reason)).toContain("tolFun");
  });

  it("reaches the Rosenbrock minimum f = 0 at (1, …, 1) in 5-D", () => {
    const r = run(rosenbrock, { x0: [0, 0, 0, 0, 0], sigma0: 0.5, seed: 1 });
    expect(r.f).toBeLessThan(1e-13);
    expect(maxAbsDiff(r.x, [1, 1, 1, 1, 1])).toBeLessThan(1e-6);
  });

  it("finds the centre of a shifted sphere", () => {
    const center = [1.5, -2, 0.25, 3, -0.75, 0.1];
    const r = run(shiftedSphere(center), { x0: [0, 0, 0, 0, 0, 0], sigma0: 1, seed: 5 });
    expect(r.f).toBeLessThan(1e-12);
    expect(maxAbsDiff(r.x, center)).toBeLessThan(1e-6);
  });

  it("uses exactly the pinned number of evaluations for seed 1 (regression pin)", () => {
    expect(run(rosenbrock, { x0: [0, 0], sigma0: 0.5, seed: 1 }).evaluations).toBe(594);
    expect(run(rosenbrock, { x0: [0, 0, 0, 0, 0], sigma0: 0.5, seed: 1 }).evaluations).toBe(2000);
  });

  it("gives bit-identical runs for the same seed and different runs for another seed", () => {
    const options = { x0: [0, 0, 0], sigma0: 0.5, seed: 11 };
    const a = run(rosenbrock, options);
    const b = run(rosenbrock, options);
    expect(b.asked).toEqual(a.asked);
    expect(b.x).toEqual(a.x);
    expect(b.f).toBe(a.f);
    expect(b.evaluations).toBe(a.evaluations);
    expect(run(rosenbrock, { ...options, seed: 12 }).asked).not.toEqual(a.asked);
  });

  it("evaluates only points inside the box and converges to a minimum on its face", () => {
    const lowerBounds = [-2, -2];
    const upperBounds = [0.5, 2];
    const r = run(rosenbrock, { x0: [-1, 1], sigma0: 1.5, lowerBounds, upperBounds, seed: 3 });
    for (const x of r.asked) {
      x.forEach((v, i) => {
        expect(v).toBeGreaterThanOrEqual(lowerBounds[i]);
        expect(v).toBeLessThanOrEqual(upperBounds[i]);
      });
    }
    // On x₀ = 0.5 the minimum of (1 − x₀)² + 100(x₁ − x₀²)² is 0.25 at x₁ = 0.25.
    expect(r.f).toBeCloseTo(0.25, 10);
    expect(maxAbsDiff(r.x, [0.5, 0.25])).toBeLessThan(1e-6);
  });

  it("survives NaN and Infinity scores by ranking them worst", () => {
    const sphere = shiftedSphere([0.5, 0.5, 0.5]);
    let calls = 0;
    const objective = (x: number[]): number => {
      calls += 1;
      if (x[0] < 0) return NaN; // an undefined region
      if (x[1] > 2) return Infinity;
      return calls % 7 === 0 ? NaN : sphere(x); // sporadic failures
    };
    const r = run(objective, { x0: [0.1, 0.1, 0.1], sigma0: 1, seed: 2 });
    expect(Number.isFinite(r.f)).toBe(true);
    expect(r.f).toBeLessThan(1e-10);
    expect(maxAbsDiff(r.x, [0.5, 0.5, 0.5])).toBeLessThan(1e-5);
  });

  it("reports maxEvaluations, never exceeding it, when every score is NaN", () => {
    const r = run(() => NaN, { x0: [0, 0], sigma0: 1, seed: 1, maxEvaluations: 100 });
    expect(r.evaluations).toBe(96); // λ = 6: 16 generations fit, a 17th would exceed 100
    expect(r.f).toBe(Infinity);
    expect(r.stopReasons).toEqual([{ reason: "maxEvaluations", value: 96 }]);
  });

  it("rejects bad options with one line naming the field and the rule", () => {
    expect(() => createCmaEs({ x0: [0], sigma0: -1, seed: 1 })).toThrow(
      "cmaEs: sigma0 must be positive and finite (got -1)",
    );
    expect(() => createCmaEs({ x0: [0, 0], sigma0: 1, seed: 1, populationSize: 1 })).toThrow(
      "cmaEs: populationSize must be an integer ≥ 2 (got 1)",
    );
    expect(() => createCmaEs({ x0: [3], sigma0: 1, seed: 1, lowerBounds: [0], upperBounds: [1] })).toThrow(
      "cmaEs: x0[0] must lie within [lowerBounds[0], upperBounds[0]] (got 3 outside [0, 1])",
    );
    expect(() => createCmaEs({ x0: [NaN], sigma0: 1, seed: 1 })).toThrow("cmaEs: x0[0] must be a finite number (got NaN)");
  });

  it("rejects a tell() that does not match the last ask()", () => {
    const es = createCmaEs({ x0: [0, 0], sigma0: 1, seed: 1 });
    expect(() => es.tell([], [])).toThrow("cmaEs: tell() must follow ask()");
    const xs = es.ask();
    expect(es.ask()).toEqual(xs); // asking twice returns the same outstanding batch
    const altered = xs.map((x) => [...x]);
    altered[2][0] += 1e-3;
    expect(() => es.tell(altered, xs.map(() => 0))).toThrow("cmaEs: candidates[2] must be the point returned by the last ask(), in order");
  });
});
