// What a builder reads when a cell is infeasible or a shape is refused, word for word: what was
// asked, what fell short and by how much (in mm and λ, with digits enough to show the shortfall),
// and what to try instead. Also the mesh check's rule: neighbouring segments of one wire joined by
// a segment between one and two radii long are not a crossing.
import { describe, expect, it } from "vitest";
import { infeasibleMessage } from "../../generator/catalog/infeasibleMessage.js";
import type { DesignOutcome } from "../../generator/design/designBentArm.js";
import { parseDesignRequest } from "../../generator/design/request.js";
import { buildMesh, validateShape } from "../../generator/em/index.js";
import { checkMesh } from "../../generator/em/geometryChecks.js";
import { InputError } from "../../generator/errors.js";
import { lengthText } from "../../generator/lengthText.js";
import { unpack } from "../../generator/shapes/bentArm.js";
import { constraintViolation, DEFAULT_LIMITS } from "../../generator/shapes/constraints.js";

const spec = { piecesPerArm: 3, wireLengthM: 1.5 };
const reasons = (x: number[]) => constraintViolation(unpack(x, 3), spec, DEFAULT_LIMITS, 1, 1e-3).reasons;
const C = 299_792_458;
const refusal = (raw: unknown): string => {
  try { checkMesh(buildMesh(validateShape(raw))); } catch (e) { expect(e).toBeInstanceOf(InputError); return (e as Error).message; }
  throw new Error("not refused");
};
const outcome = (evaluation: DesignOutcome["evaluation"]): DesignOutcome =>
  ({ status: "infeasible", message: "", x: [], evaluation, evaluations: 0, searchEvaluations: 0, stopReasons: [], history: [] });

describe("constraint messages (λ = 1 m, 1.5 m wire, 3 pieces per arm)", () => {
  it("a piece just under the minimum shows the shortfall that rounding used to hide", () => {
    // the last piece is 0.04994 λ: "0.050 λ, under the minimum 0.05 λ" in the old words
    expect(reasons([0.9, 0.4, -0.3, 0.3, 1 - 0.3 - 0.0499 / 0.75 - 0.00004 / 0.75])[0]).toBe(
      "piece 3 of each arm (counted from the feed) is 49.94 mm (0.04994 λ), 0.060 mm short of the minimum 50.00 mm (0.05 λ) a piece needs to be bent by hand and modelled; try fewer pieces per arm or a longer wire",
    );
  });
  it("narrow arms, a hairpin bend, pieces too close", () => {
    expect(reasons([0.1, 0, 0, 0.3, 0.3])).toEqual([
      "the arms meet at 11.5° at the feed, 18.5° under the 30° that leaves room for the feed and balun; open the arms wider",
    ]);
    expect(reasons([0.9, 2.9, 0, 0.3, 0.3])).toEqual([
      "bend 1 of each arm (counted from the feed) turns 166.2°, 16.2° beyond the ±150° that can be bent repeatably (a sharper turn folds the wire back on itself); try fewer pieces per arm",
    ]);
    expect(reasons([1.4, 2.5, 0.5, 0.3, 0.3])[0]).toBe(
      "pieces 1 and 6 (counted from one tip to the other) come within 0.000 mm (0.000 λ) of each other, 20.00 mm closer than the 20.00 mm clearance that keeps them from coupling like a feed line; try fewer pieces per arm or a shorter wire",
    );
  });
  it("lengths in m or mm with the digits a shortfall needs", () => {
    expect([1.5, 0.05, 0.00006, 0.000004].map(lengthText)).toEqual(["1.500 m", "50.00 mm", "0.060 mm", "0.004 mm"]);
  });
});

describe("mesh check messages and rule", () => {
  const base = { frequencyHz: C, wires: [] as unknown[], feed: { wire: 0, vertex: 1 } };
  it("a segment shorter than the radius has its own message", () => {
    expect(refusal({ ...base, wireRadiusM: 0.01, wires: [{ pointsM: [[-0.5, 0, 0], [0, 0, 0], [0.02, 0, 0], [0.5, 0, 0]] }] })).toBe(
      "shape: wires[0] piece 1 (pointsM[1] to pointsM[2]) is 20.00 mm long and is cut into 3 segments of 6.667 mm, 3.333 mm shorter than the wire radius 10.00 mm (the thin-wire model needs segments longer than the radius); make the piece at least 30.00 mm long, or use a wire of radius under 6.667 mm",
    );
  });
  it("crossing wires are named by their places in the shape file", () => {
    expect(refusal({ ...base, wireRadiusM: 0.001, wires: [{ pointsM: [[-0.5, 0, 0], [0, 0, 0], [0.5, 0, 0]] }, { pointsM: [[0.2, -0.3, 0], [0.2, 0.3, 0]] }] })).toBe(
      "shape: wires[0] piece 1 (pointsM[1] to pointsM[2]) and wires[1] piece 0 (pointsM[0] to pointsM[1]) touch or cross: their axes come within 0.000 mm, 2.000 mm less than the 2.000 mm the two wire radii need; move them apart (wires must not intersect)",
    );
  });
  it("segments of 1.5 radii on one straight wire are a warning, not a crossing of the wire with itself", () => {
    const shape = { ...base, wireRadiusM: 0.004, wires: [{ pointsM: [[-0.5, 0, 0], [0, 0, 0], [0.018, 0, 0], [0.5, 0, 0]] }] };
    expect(checkMesh(buildMesh(validateShape(shape)))).toEqual([
      "wires[0] piece 1 (pointsM[1] to pointsM[2]): segments of 6.000 mm are under 4 wire radii (16.00 mm); the thin-wire model loses accuracy: use fewer segments per wavelength or a longer piece",
    ]);
  });
  it("a wire that folds back onto itself is still refused", () => {
    // out along +x, a 50 mm piece turning back, then back along the first pieces 0.4–0.8 mm away
    const hairpin = { ...base, wireRadiusM: 0.0005, wires: [{ pointsM: [[-0.3, 0, 0], [0, 0, 0], [0.3, 0, 0], [0.35, 0.0004, 0], [-0.2, 0.0008, 0]] }] };
    // the turn at pointsM[3] is the fold (0.4 mm over 50 mm, then back along pieces 0–1)
    expect(refusal(hairpin)).toMatch(/^shape: the bend at wires\[0\] pointsM\[3\] .* folds the wire back on itself/);
    // and without that fold (the return leg starting 3 mm off), the crossing of non-adjacent pieces
    const apart = { ...hairpin, wires: [{ pointsM: [[-0.3, 0, 0], [0, 0, 0], [0.3, 0, 0], [0.35, 0.003, 0], [-0.2, 0.0008, 0]] }] };
    expect(refusal(apart)).toMatch(/^shape: wires\[0\] piece [01] .* and wires\[0\] piece 3 .* touch or cross/);
  });
  // two straight pieces from one bend are d·sin α apart at run d from it (plane geometry)
  it("a sharp bend is not a crossing at any mesh: 20° between two 0.3 m pieces, 1 mm wire, up to 400 per λ", () => {
    const a = (20 * Math.PI) / 180;
    const sharp = { ...base, wireRadiusM: 0.0005, wires: [{ pointsM: [[-0.3, 0, 0], [0, 0, 0], [0.3, 0, 0], [0.3 - 0.3 * Math.cos(a), 0.3 * Math.sin(a), 0]] }] };
    for (const spw of [25, 50, 100, 200, 400]) {
      const warnings = checkMesh(buildMesh(validateShape({ ...sharp, segmentsPerWavelength: spw })));
      // within 4 radii (2 mm) for 2 mm / sin 20° = 5.85 mm from the bend
      expect(warnings).toEqual([
        "the bend at wires[0] pointsM[2] (between wires[0] piece 1 (pointsM[1] to pointsM[2]) and piece 2): the pieces meet at 20.0°, under 30°, and lie within 4 wire radii of each other for 5.848 mm from the bend; the thin-wire model loses accuracy there",
      ]);
    }
  });
  it("a bend that folds the wire back along the piece before it is refused", () => {
    // 0.5° between a 0.3 m piece and a 0.2 m one: within 1 mm for 1 mm / sin 0.5° = 114.6 mm, over half of 0.2 m
    const a = (0.5 * Math.PI) / 180;
    const fold = { ...base, wireRadiusM: 0.0005, wires: [{ pointsM: [[-0.3, 0, 0], [0, 0, 0], [0.3, 0, 0], [0.3 - 0.2 * Math.cos(a), 0.2 * Math.sin(a), 0]] }] };
    expect(refusal(fold)).toBe(
      "shape: the bend at wires[0] pointsM[2] (between wires[0] piece 1 (pointsM[1] to pointsM[2]) and piece 2) folds the wire back on itself: the pieces meet at 0.5° and lie within the two wire radii (1.000 mm) of each other for 114.6 mm from the bend, more than half the shorter piece (200.0 mm); open the bend",
    );
  });
});

describe("infeasible catalog cells", () => {
  it("a direct-feed 1 λ cell: the asked SWR, how far above it, why, and what to try", () => {
    const r = parseDesignRequest({ frequencyHz: 145e6, lengthWl: 1, piecesPerArm: 2, wireDiameterM: 2e-3, conductor: "copper", variant: "direct-feed", bandHz: [144e6, 146e6] });
    expect(infeasibleMessage(outcome({ score: 10, gainDbi: 3, maxSwr: 25.87, reasons: ["SWR reaches 25.87 in the band, above 2"] }), r, true, 0.03)).toBe(
      "Asked: a 1 λ wire (2.068 m) with 2 pieces per arm, fed straight from a 50 Ω line with SWR at most 2 from 144 MHz to 146 MHz. " +
      "The closest shape found: SWR reaches 25.87 in the band, 23.87 above the limit 2 (12.9 times it). " +
      "No shape of this length and piece count met them in the general search either (done once for all bands, on a 3 % wide band, and scaled to each band). " +
      "Try instead: the most-gain design of this wire with a matching network (a centre-fed 1 λ wire has a feed impedance of kilohms), or a 1.5 λ or 2.5 λ wire fed straight.",
    );
  });
  it("a geometry shortfall keeps the constraint's own words", () => {
    const r = parseDesignRequest({ frequencyHz: C, lengthWl: 1.5, piecesPerArm: 3, wireDiameterM: 2e-3, conductor: "perfect" });
    const message = infeasibleMessage(outcome({ score: 10, gainDbi: null, maxSwr: null, reasons: reasons([0.1, 0, 0, 0.3, 0.3]) }), r, false, 0.03);
    expect(message).toBe(
      "Asked: a 1.5 λ wire (1.500 m) with 3 pieces per arm for the most gain at 299.792 MHz. " +
      "The closest shape found: the arms meet at 11.5° at the feed, 18.5° under the 30° that leaves room for the feed and balun; open the arms wider. " +
      "Try instead: fewer pieces per arm or another wire length.",
    );
    expect(message).not.toMatch(/wavelength units/);
  });
});
