import { describe, expect, it } from "vitest";
import { createIpop, minimizeIpop, minimizeIpopBatched, type IpopOptions } from "../../generator/optimize/ipop.js";
import { maxAbsDiff, rastrigin, rosenbrock } from "./testFunctions.js";

const n = 5;
const rastriginOptions: IpopOptions = {
  x0: new Array<number>(n).fill(3),
  sigma0: 2.5,
  lowerBounds: new Array<number>(n).fill(-5.12),
  upperBounds: new Array<number>(n).fill(5.12),
  seed: 2,
  maxEvaluations: 100_000,
  target: 1e-10,
};

describe("minimizeIpop", () => {
  it("reaches the 5-D Rastrigin global minimum f = 0 at the origin by restarting with larger populations", () => {
    const r = minimizeIpop(rastrigin, rastriginOptions);
    expect(r.f).toBeLessThanOrEqual(1e-10);
    expect(maxAbsDiff(r.x, [0, 0, 0, 0, 0])).toBeLessThan(1e-5);
    expect(r.restarts).toBeGreaterThanOrEqual(1);
    expect(r.stopReasons).toEqual([{ reason: "target", value: r.f }]);
    expect(r.runs.map((run) => run.populationSize)).toEqual(r.runs.map((_, k) => 8 * 2 ** k)); // λ_k = 2^k·λ_0
    expect(r.runs[0].bestF).toBeGreaterThan(0.5); // the first small-population run is trapped
  });

  it("uses exactly the pinned number of evaluations and restarts for seed 2 (regression pin)", () => {
    const r = minimizeIpop(rastrigin, rastriginOptions);
    expect(r.evaluations).toBe(8464);
    expect(r.restarts).toBe(2);
  });

  it("keeps a compact best-so-far history that only improves and ends at the final count", () => {
    const r = minimizeIpop(rastrigin, rastriginOptions);
    for (let i = 1; i < r.history.length; i++) {
      expect(r.history[i].evaluations).toBeGreaterThan(r.history[i - 1].evaluations);
      expect(r.history[i].bestF).toBeLessThan(r.history[i - 1].bestF);
    }
    expect(r.history[r.history.length - 1]).toEqual({ evaluations: r.evaluations, bestF: r.f });
    expect(r.history.length).toBeLessThan(r.evaluations / 20);
  });

  it("gives bit-identical results for the same seed", () => {
    const options = { ...rastriginOptions, seed: 9, maxEvaluations: 5000 };
    expect(minimizeIpop(rastrigin, options)).toEqual(minimizeIpop(rastrigin, options));
  });

  it("never exceeds the evaluation budget and reports it as the stop reason", () => {
    const r = minimizeIpop(rastrigin, { ...rastriginOptions, maxEvaluations: 3000 });
    expect(r.evaluations).toBeLessThanOrEqual(3000);
    expect(r.stopReasons.map((s) => s.reason)).toEqual(["maxEvaluations"]);
    expect(r.stopReasons[0].value).toBe(r.evaluations);
  });

  it("stops after maxRestarts with the last run's reasons and the restart count", () => {
    const r = minimizeIpop(rastrigin, { ...rastriginOptions, maxRestarts: 0 });
    expect(r.restarts).toBe(0);
    expect(r.runs).toHaveLength(1);
    const reasons = r.stopReasons.map((s) => s.reason);
    expect(reasons[reasons.length - 1]).toBe("maxRestarts");
    expect(reasons.length).toBeGreaterThan(1);
  });

  it("also minimizes a smooth problem in its first run without restarting", () => {
    const r = minimizeIpop(rosenbrock, { x0: [0, 0, 0], sigma0: 0.5, seed: 4, target: 1e-12 });
    expect(r.f).toBeLessThanOrEqual(1e-12);
    expect(r.restarts).toBe(0);
  });

  it("rejects bad options with one line naming the field and the rule", () => {
    expect(() => createIpop({ ...rastriginOptions, maxRestarts: -1 })).toThrow(
      "ipop: maxRestarts must be an integer ≥ 0 (got -1)",
    );
    expect(() => createIpop({ ...rastriginOptions, target: NaN })).toThrow("ipop: target must be a number (got NaN)");
  });
});

describe("minimizeIpopBatched", () => {
  it("matches the synchronous driver exactly, one batch of λ_k points per generation", async () => {
    const options = { ...rastriginOptions, maxEvaluations: 20_000 };
    const batchSizes = new Set<number>();
    const batched = await minimizeIpopBatched(async (xs) => {
      batchSizes.add(xs.length);
      return xs.map(rastrigin);
    }, options);
    expect(batched).toEqual(minimizeIpop(rastrigin, options));
    expect([...batchSizes].every((size) => size % 8 === 0)).toBe(true);
  });

  it("lets the caller own the loop through ask/tell", () => {
    const ipop = createIpop({ x0: [0.5, 0.5], sigma0: 0.3, seed: 1, lowerBounds: [0, 0], upperBounds: [1, 1] });
    let generations = 0;
    while (ipop.stop().length === 0) {
      const xs = ipop.ask();
      ipop.tell(xs, xs.map((x) => (x[0] - 0.2) ** 2 + (x[1] - 0.7) ** 2));
      generations += 1;
    }
    expect(ipop.ask()).toEqual([]);
    expect(generations).toBeGreaterThan(10);
    expect(maxAbsDiff(ipop.result().x, [0.2, 0.7])).toBeLessThan(1e-6);
  });
});
