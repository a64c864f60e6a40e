// Bad input over ground: one clear line naming the field and the rule (InputError).
import { describe, expect, it } from "vitest";
import { validateShape } from "../../generator/em/index.js";
import { groundByName } from "../../generator/em/ground.js";
import { InputError } from "../../generator/errors.js";

const base = (points: number[][], ground: object, feedVertex = 1) => ({
  frequencyHz: 14e6, wireRadiusM: 1e-3, wires: [{ pointsM: points }], feed: { wire: 0, vertex: feedVertex }, ground,
});
const message = (f: () => unknown) => {
  try { f(); } catch (err) { expect(err).toBeInstanceOf(InputError); return (err as Error).message; }
  throw new Error("no error thrown");
};

describe("shape over ground: refusals", () => {
  it("a wire below the ground", () => {
    const m = message(() => validateShape(base([[-5, 0, 3], [0, 0, 3], [5, 0, -1]], { type: "perfect" })));
    expect(m).toMatch(/wires\[0\]\.pointsM\[2\].*below the ground/);
    expect(m.split("\n")).toHaveLength(1);
  });
  it("a wire ending on real ground", () => {
    const m = message(() => validateShape(base([[0, 0, 0], [0, 0, 5], [0, 0, 10]], { type: "real", relativePermittivity: 13, conductivitySPerM: 0.005 })));
    expect(m).toMatch(/may not end on real ground/);
  });
  it("a bend on the ground, and a wire lying along it", () => {
    expect(message(() => validateShape(base([[-5, 0, 3], [0, 0, 0], [5, 0, 3]], { type: "perfect" })))).toMatch(/only a wire's end may touch/);
    expect(message(() => validateShape(base([[0, 0, 0], [5, 0, 0], [5, 0, 3]], { type: "perfect" }, 0)))).toMatch(/rise from the ground/);
  });
  it("a wire end closer to the ground than its radius", () => {
    expect(message(() => validateShape(base([[0, 0, 1e-4], [0, 0, 5], [0, 0, 10]], { type: "perfect" })))).toMatch(/within the wire radius/);
  });
  it("negative permittivity or conductivity, an unknown ground type", () => {
    expect(message(() => validateShape(base([[-5, 0, 3], [0, 0, 3], [5, 0, 3]], { type: "real", relativePermittivity: -2, conductivitySPerM: 0.005 })))).toMatch(/relativePermittivity must be at least 1/);
    expect(message(() => validateShape(base([[-5, 0, 3], [0, 0, 3], [5, 0, 3]], { type: "real", relativePermittivity: 13, conductivitySPerM: -1 })))).toMatch(/conductivitySPerM must be 0 or more/);
    expect(message(() => validateShape(base([[-5, 0, 3], [0, 0, 3], [5, 0, 3]], { type: "clay" })))).toMatch(/^shape: ground/);
  });
  it("a free end fed is still refused without a ground, and on real ground", () => {
    expect(message(() => validateShape({ ...base([[0, 0, 0], [0, 0, 5]], { type: "perfect" }, 0), ground: undefined }))).toMatch(/feed/);
  });
  it("an unknown preset", () => {
    expect(message(() => groundByName("swamp"))).toMatch(/--ground must be one of perfect, poor, average, good, fresh-water, sea-water/);
  });
});
