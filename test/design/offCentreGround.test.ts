// The off-centre family over ground against the centre-fed family over the same ground: with the
// feed at the middle (t = ½) and both arms alike, the off-centre shape is the centre-fed bent-arm
// shape (shapes/offCentre.ts, its header), so mounting and scoring must give the same gain, the
// same elevation figures and the same feed impedance (image theory, Balanis, Antenna Theory, 3rd
// ed., §4.7, is applied to both by the same solver: a check of the wiring, not of the physics).
// Over perfect ground a level half-wave dipole at height h also sees Z11 − Z12(2h) (Balanis §8.6),
// so its resistance must differ from free space; the check here is only that the ground is applied.
import { describe, expect, it } from "vitest";
import { evaluate, shapeOf } from "../../generator/design/objective.js";
import { evaluateOffCentre, offCentreShapeOf } from "../../generator/design/offCentreObjective.js";
import { objectiveSolveOptions } from "../../generator/design/groundObjective.js";
import { parseDesignRequest } from "../../generator/design/request.js";
import { GROUND_PRESETS, type Ground } from "../../generator/em/ground.js";
import { solveShape } from "../../generator/em/solve.js";

const base = { frequencyHz: 14.1e6, lengthWl: 1.5, piecesPerArm: 3, wireDiameterM: 2e-3 };
// centre-fed x = [φ1, β1, β2, u1, u2]; off-centre x = [t, φ1, βR…, uR…, βL…, uL…]
const centre = [0.9, 0.3, 0.3, 0.3, 0.3];
const offCentre = [0.5, 0.9, 0.3, 0.3, 0.3, 0.3, 0.3, 0.3, 0.3, 0.3];

const cases: [string, { ground: Ground; heightM: number; mounting?: "horizontal" | "vertical"; objective?: "peak" | "long-distance" | "near-vertical" }][] = [
  ["perfect ground, horizontal, peak", { ground: { type: "perfect" }, heightM: 10.6 }],
  ["perfect ground, vertical, peak", { ground: { type: "perfect" }, heightM: 3, mounting: "vertical" }],
  ["average ground, horizontal, long-distance", { ground: GROUND_PRESETS.average, heightM: 10.6, objective: "long-distance" }],
  ["average ground, vertical, near-vertical", { ground: GROUND_PRESETS.average, heightM: 3, mounting: "vertical", objective: "near-vertical" }],
];

describe("off-centre family over ground, feed at the middle = centre-fed family", () => {
  for (const [name, over] of cases) {
    it(`${name}: same score, gain, peak elevation and feed impedance`, () => {
      const r = parseDesignRequest({ ...base, ...over });
      const a = evaluateOffCentre(offCentre, r, [], 2), b = evaluate(centre, r, [], 2);
      expect(a.gainDbi).not.toBeNull();
      expect(Math.abs(a.gainDbi! - b.gainDbi!)).toBeLessThan(1e-6);
      const sa = solveShape(offCentreShapeOf(offCentre, r), objectiveSolveOptions(r));
      const sb = solveShape(shapeOf(centre, r), objectiveSolveOptions(r));
      expect(sa.ground).toBeDefined();
      expect(Math.abs(sa.ground!.peakElevationDeg - sb.ground!.peakElevationDeg)).toBeLessThan(0.05);
      const za = sa.inputImpedanceOhm, zb = sb.inputImpedanceOhm;
      expect(Math.hypot(za.re - zb.re, za.im - zb.im)).toBeLessThan(1e-6 * Math.hypot(zb.re, zb.im));
      // the ground is applied: the figures differ from the same shape in free space
      const free = solveShape(offCentreShapeOf(offCentre, parseDesignRequest(base)));
      expect(free.ground).toBeUndefined();
      expect(Math.abs(free.inputImpedanceOhm.re - za.re)).toBeGreaterThan(0.5);
    });
  }

  it("an off-centre feed over perfect ground is solved and mounted at the stated height", () => {
    const r = parseDesignRequest({ ...base, ground: { type: "perfect" }, heightM: 10.6 });
    const x = [0.35, 0.9, 0.3, 0.3, 0.3, 0.3, 0.2, 0.2, 0.4, 0.3];
    const shape = offCentreShapeOf(x, r);
    expect(shape.ground).toEqual({ type: "perfect" });
    for (const p of shape.wires[0].pointsM) expect(p[2]).toBeCloseTo(10.6, 12);
    const e = evaluateOffCentre(x, r, [], 2);
    expect(e.gainDbi).not.toBeNull();
    // a level wire λ/2 over perfect ground gains several dB by the ground reflection, up to 6 dB
    // where direct and reflected waves add in phase (image theory's array factor, Balanis §4.7),
    // give or take the change of feed resistance with height
    const free = evaluateOffCentre(x, parseDesignRequest(base), [], 2);
    expect(e.gainDbi! - free.gainDbi!).toBeGreaterThan(3);
    expect(e.gainDbi! - free.gainDbi!).toBeLessThan(6.1);
  });
});
