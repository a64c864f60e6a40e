import { describe, expect, it } from "vitest";
import { createRng } from "../../generator/optimize/rng.js";

describe("createRng", () => {
  it("gives the same stream for the same seed and a different one for another seed", () => {
    const a = createRng(42);
    const b = createRng(42);
    const c = createRng(43);
    const seqA = Array.from({ length: 50 }, () => [a.uniform(), a.normal()]);
    const seqB = Array.from({ length: 50 }, () => [b.uniform(), b.normal()]);
    const seqC = Array.from({ length: 50 }, () => [c.uniform(), c.normal()]);
    expect(seqB).toEqual(seqA);
    expect(seqC).not.toEqual(seqA);
  });

  it("draws uniforms in [0, 1) and normals with mean ≈ 0 and variance ≈ 1", () => {
    const rng = createRng(7);
    const count = 20_000;
    let sum = 0;
    let sumSq = 0;
    let uniformSum = 0;
    for (let i = 0; i < count; i++) {
      const u = rng.uniform();
      expect(u >= 0 && u < 1).toBe(true);
      uniformSum += u;
      const z = rng.normal();
      sum += z;
      sumSq += z * z;
    }
    expect(Math.abs(uniformSum / count - 0.5)).toBeLessThan(0.01);
    expect(Math.abs(sum / count)).toBeLessThan(0.03); // 4 standard errors
    expect(Math.abs(sumSq / count - 1)).toBeLessThan(0.04);
  });

  it("clones continue with exactly the same values, including a pending Box–Muller spare", () => {
    const rng = createRng(3);
    rng.normal(); // leaves the sine partner in reserve
    const copy = rng.clone();
    expect(Array.from({ length: 10 }, () => copy.normal())).toEqual(Array.from({ length: 10 }, () => rng.normal()));
  });

  it("rejects a seed that is not a safe integer", () => {
    expect(() => createRng(1.5)).toThrow("createRng: seed must be a safe integer (got 1.5)");
  });
});
