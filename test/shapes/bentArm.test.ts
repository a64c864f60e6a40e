import { describe, expect, it } from "vitest";
import { buildMesh, validateShape } from "../../generator/em/index.js";
import { checkMesh } from "../../generator/em/geometryChecks.js";
import { fromShape, pack, pieceLengthsM, toShape, unpack, wirePointsM } from "../../generator/shapes/bentArm.js";
import { constraintViolation, DEFAULT_LIMITS, parameterBounds } from "../../generator/shapes/constraints.js";

const spec = { piecesPerArm: 3, wireLengthM: 1.5 };
const ctx = { frequencyHz: 299_792_458, wireRadiusM: 1e-3, conductor: "perfect" as const };

describe("bent-arm shape family", () => {
  it("has 2K − 1 parameters and pieces that sum to half the wire", () => {
    const p = unpack([0.9, 0.4, -0.3, 0.3, 0.25], 3);
    expect(pack(p)).toHaveLength(5);
    const lengths = pieceLengthsM(p, spec);
    expect(lengths).toHaveLength(3);
    expect(lengths.reduce((s, v) => s + v, 0)).toBeCloseTo(0.75, 12);
  });

  it("arms are mirror images about the y–z plane with the feed at the origin", () => {
    const points = wirePointsM(unpack([0.9, 0.4, -0.3, 0.3, 0.25], 3), spec);
    expect(points).toHaveLength(7);
    expect(points[3]).toEqual([0, 0, 0]);
    for (let i = 0; i < 3; i++) {
      expect(points[i][0]).toBeCloseTo(-points[6 - i][0], 14);
      expect(points[i][1]).toBeCloseTo(points[6 - i][1], 14);
    }
  });

  it("parameter vector → shape file → parameter vector gives the vector back", () => {
    const x = [0.9, 0.4, -0.3, 0.3, 0.25];
    const shape = validateShape(JSON.parse(JSON.stringify(toShape(unpack(x, 3), spec, ctx))));
    const back = fromShape(shape);
    expect(back.spec.piecesPerArm).toBe(3);
    expect(back.spec.wireLengthM).toBeCloseTo(1.5, 12);
    pack(back.params).forEach((v, i) => expect(v).toBeCloseTo(x[i], 12));
  });

  it("K = 1 with the first angle at 90° is the straight wire", () => {
    const points = wirePointsM(unpack([Math.PI / 2], 1), spec);
    for (const p of points) expect(Math.abs(p[1])).toBeLessThan(1e-12);
  });

  it("flags short pieces, a narrow feed angle, hairpin bends and pieces that come too close", () => {
    const wl = 1;
    expect(constraintViolation(unpack([0.9, 0.4, -0.3, 0.3, 0.25], 3), spec, DEFAULT_LIMITS, wl, 1e-3).total).toBe(0);
    expect(constraintViolation(unpack([0.9, 0.4, -0.3, 0.01, 0.25], 3), spec, DEFAULT_LIMITS, wl, 1e-3).reasons[0]).toMatch(/piece 1 of each arm \(counted from the feed\) is 7.500 mm \(0.007 λ\), 42.50 mm short of the minimum 50.00 mm \(0.05 λ\)/);
    expect(constraintViolation(unpack([0.1, 0, 0, 0.3, 0.3], 3), spec, DEFAULT_LIMITS, wl, 1e-3).reasons[0]).toMatch(/arms meet at/);
    expect(constraintViolation(unpack([0.9, 2.9, 0, 0.3, 0.3], 3), spec, DEFAULT_LIMITS, wl, 1e-3).reasons[0]).toMatch(/bend 1 of each arm \(counted from the feed\) turns/);
    // a spiral folding back onto the other arm
    const folded = constraintViolation(unpack([1.4, 2.5, 0.5, 0.3, 0.3], 3), spec, DEFAULT_LIMITS, wl, 1e-3);
    expect(folded.total).toBeGreaterThan(0);
  });

  it("a shape that meets the constraints passes the solver's thin-wire checks", () => {
    const shape = toShape(unpack([0.9, 0.4, -0.3, 0.3, 0.25], 3), spec, ctx);
    expect(() => checkMesh(buildMesh(shape))).not.toThrow();
  });

  it("bounds hold every parameter of a feasible shape", () => {
    const { lower, upper } = parameterBounds(spec, DEFAULT_LIMITS, 1);
    expect(lower).toHaveLength(5);
    lower.forEach((lo, i) => expect(lo).toBeLessThan(upper[i]));
  });
});
