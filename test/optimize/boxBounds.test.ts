import { describe, expect, it } from "vitest";
import { checkBox, reflectIntoBox, wrapIntoPeriod } from "../../generator/optimize/boxBounds.js";

describe("reflectIntoBox", () => {
  const box = checkBox("test", 2, [0, -1], [1, 1]);

  it("leaves points inside the box unchanged", () => {
    expect(reflectIntoBox([0.25, -0.5], box)).toEqual([0.25, -0.5]);
  });

  it("mirrors points across the nearest face and is periodic with period 2(u − l)", () => {
    expect(reflectIntoBox([1.25, -1.5], box)).toEqual([0.75, -0.5]);
    expect(reflectIntoBox([-0.25, 1.5], box)).toEqual([0.25, 0.5]);
    const far = reflectIntoBox([1.25 + 2 * 7, -1.5 - 4 * 3], box);
    expect(far[0]).toBeCloseTo(0.75, 12);
    expect(far[1]).toBeCloseTo(-0.5, 12);
  });

  it("mirrors at a single finite bound and ignores infinite ones", () => {
    const half = checkBox("test", 2, [0, -Infinity], [Infinity, Infinity]);
    expect(reflectIntoBox([-3, -1e9], half)).toEqual([3, -1e9]);
  });

  it("keeps the reflected image when an internal point is moved by whole periods", () => {
    const x = [5.3, -7.9];
    const wrapped = wrapIntoPeriod(x, box);
    expect(wrapped[0]).toBeGreaterThanOrEqual(0);
    expect(wrapped[0]).toBeLessThan(2);
    const a = reflectIntoBox(x, box);
    const b = reflectIntoBox(wrapped, box);
    expect(b[0]).toBeCloseTo(a[0], 12);
    expect(b[1]).toBeCloseTo(a[1], 12);
  });

  it("rejects bounds that are crossed or NaN with a one-line message naming the field", () => {
    expect(() => checkBox("cmaEs", 1, [1], [0])).toThrow("cmaEs: lowerBounds[0] must be below upperBounds[0] (got 1 ≥ 0)");
    expect(() => checkBox("cmaEs", 1, [NaN], [0])).toThrow("cmaEs: lowerBounds[0] must be a number (got NaN)");
  });
});
