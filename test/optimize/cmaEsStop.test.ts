// Each CMA-ES / IPOP stop rule fires on a function where it should. The rules are those of
// Hansen, "The CMA Evolution Strategy: A Tutorial", arXiv:1604.00772, App. B.3 (tolFun, tolX,
// stagnation; tolHistFun as in the tutorial's companion code), and the IPOP stale-restart rule
// stated in generator/optimize/ipop.ts.
import { describe, expect, it } from "vitest";
import { createCmaEs, type CmaEsOptions } from "../../generator/optimize/cmaEs.js";
import { stagnationProgress } from "../../generator/optimize/cmaEsStop.js";
import { minimizeIpop } from "../../generator/optimize/ipop.js";
import { createRng } from "../../generator/optimize/rng.js";
import { rastrigin, shiftedSphere } from "./testFunctions.js";

function run(objective: (x: number[]) => number, options: CmaEsOptions) {
  const es = createCmaEs(options);
  while (es.stop().length === 0) {
    const xs = es.ask();
    es.tell(xs, xs.map(objective));
  }
  return { reasons: es.stop().map((r) => r.reason), stop: es.stop(), evaluations: es.state.evaluations, es };
}

const sphere = shiftedSphere([0.3, -0.2, 0.1]);
const base = { x0: [1, 1, 1], sigma0: 0.5, seed: 3, maxEvaluations: 200_000 };

describe("CMA-ES stop rules", () => {
  it("tolFun fires on a flat function as soon as the history window is full", () => {
    const r = run(() => 1, { ...base, tolFun: 1e-9 });
    expect(r.reasons).toContain("tolFun");
    expect(r.stop.find((s) => s.reason === "tolFun")?.value).toBe(0);
  });

  it("tolX fires on the sphere once the spread is below it, with tolFun off", () => {
    const r = run(sphere, { ...base, tolFun: 0, tolX: 1e-6 });
    expect(r.reasons).toEqual(["tolX"]);
    expect(r.stop[0].value).toBeLessThan(1e-6);
    expect(r.es.best().f).toBeLessThan(1e-10);
  });

  it("tolHistFun fires on the sphere when the best f stops moving by more than it", () => {
    const r = run(sphere, { ...base, tolFun: 0, tolX: 0, tolHistFun: 1e-4 });
    expect(r.reasons).toContain("tolHistFun");
    expect(r.reasons).not.toContain("tolX");
    const h = r.es.state.bestHistory;
    expect(Math.max(...h) - Math.min(...h)).toBeLessThan(1e-4);
  });

  it("stagnation fires on pure noise, where no median ever improves", () => {
    const rng = createRng(7);
    const r = run(() => rng.uniform(), { ...base, tolFun: 0, tolX: 0 });
    expect(r.reasons).toContain("stagnation");
    expect(r.es.state.generation).toBeGreaterThanOrEqual(120 + Math.ceil(90 / r.es.state.params.lambda));
  });

  it("stagnation never fires while the medians keep improving", () => {
    const best = Array.from({ length: 400 }, (_, g) => 1 / (g + 1));
    expect(stagnationProgress({ n: 3, lambda: 7, generation: 400, stagnationBest: best, stagnationMedian: best })).toBeGreaterThan(0);
    const flat = new Array(400).fill(1);
    expect(stagnationProgress({ n: 3, lambda: 7, generation: 400, stagnationBest: flat, stagnationMedian: best })).toBeGreaterThan(0);
    expect(stagnationProgress({ n: 3, lambda: 7, generation: 400, stagnationBest: flat, stagnationMedian: flat })).toBe(0);
    expect(stagnationProgress({ n: 3, lambda: 7, generation: 100, stagnationBest: flat.slice(0, 100), stagnationMedian: flat.slice(0, 100) })).toBeNull();
  });
});

describe("IPOP stale-restart rule", () => {
  it("stops after one restart that cannot improve a unimodal function", () => {
    const r = minimizeIpop(sphere, { ...base, tolFun: 1e-12, staleRestarts: 1, minRestartGain: 1e-9 });
    expect(r.runs).toHaveLength(2);
    expect(r.runs[1].gain).toBeLessThan(1e-9);
    expect(r.stopReasons[r.stopReasons.length - 1]).toEqual({ reason: "restartsStale", value: r.runs[1].gain });
  });

  it("keeps restarting on Rastrigin while larger populations still find better basins", () => {
    const n = 5;
    const options = {
      x0: new Array<number>(n).fill(3), sigma0: 2.5, seed: 2, maxEvaluations: 100_000, target: 1e-10,
      lowerBounds: new Array<number>(n).fill(-5.12), upperBounds: new Array<number>(n).fill(5.12),
    };
    const r = minimizeIpop(rastrigin, { ...options, staleRestarts: 1, minRestartGain: 0.5 });
    expect(r.restarts).toBeGreaterThanOrEqual(1);
    expect(r.runs.slice(1).every((run) => (run.gain ?? 0) >= 0.5)).toBe(true); // every restart paid off
    expect(r.stopReasons.map((s) => s.reason)).toEqual(["target"]);
  });

  it("rejects a stale-restart count below 1", () => {
    expect(() => minimizeIpop(sphere, { ...base, staleRestarts: 0 })).toThrow("ipop: staleRestarts must be an integer ≥ 1 (got 0)");
  });
});
