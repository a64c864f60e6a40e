// Energy balance over the upper half-space for perfect ground, on every kind of case: the power
// radiated into z > 0 (pattern integral of direct + image field) must equal P_in − P_conductor,
// since a perfect ground absorbs nothing (Balanis, Antenna Theory, 3rd ed., §4.7: the half-space
// field is that of the shape and its image in free space). Also: an interior-fed wire grounded at
// one or both ends carries current into the ground (nonzero end current).
import { describe, expect, it } from "vitest";
import { segmentEndCurrents } from "../../generator/em/mesh.js";
import { solveShape, validateShape } from "../../generator/em/index.js";
import { ONE_METRE_WAVELENGTH_HZ as F } from "../helpers/shapes.js";

const perfect = { type: "perfect" as const };
const shape = (wires: number[][][], feed: { wire: number; vertex: number }, conductor = "perfect") =>
  validateShape({ frequencyHz: F, wireRadiusM: 1e-3, segmentsPerWavelength: 30, conductor, wires: wires.map((pointsM) => ({ pointsM })), feed, ground: perfect });

const cases: [string, ReturnType<typeof shape>][] = [
  ["horizontal dipole 0.1 λ up", shape([[[-0.25, 0, 0.1], [0, 0, 0.1], [0.25, 0, 0.1]]], { wire: 0, vertex: 1 })],
  ["horizontal dipole 1.3 λ up, copper", shape([[[-0.25, 0, 1.3], [0, 0, 1.3], [0.25, 0, 1.3]]], { wire: 0, vertex: 1 }, "copper")],
  ["slanted V 0.4 λ up", shape([[[-0.3, 0.4, 0.2], [0, 0, 0.4], [0.3, 0.4, 0.6]]], { wire: 0, vertex: 1 })],
  ["inverted-L fed at its grounded base", shape([[[0, 0, 0], [0, 0, 0.15], [0.2, 0, 0.15]]], { wire: 0, vertex: 0 })],
  ["half loop grounded at both ends, fed at the top", shape([[[-0.2, 0, 0], [-0.2, 0, 0.25], [0, 0, 0.25], [0.2, 0, 0.25], [0.2, 0, 0]]], { wire: 0, vertex: 2 })],
  ["monopole with a parasitic monopole", shape([[[0, 0, 0], [0, 0, 0.25]], [[0.2, 0, 0], [0.2, 0, 0.27]]], { wire: 0, vertex: 0 })],
];

describe("energy balance over perfect ground below 1e-3 (Balanis §4.7)", () => {
  for (const [name, s] of cases) {
    it(name, () => {
      const sol = solveShape(s, { energyBalance: true });
      expect(sol.energyBalanceError!).toBeLessThan(1e-3);
      expect(sol.ground!.groundLossW! / sol.inputPowerW).toBeLessThan(1e-3);
      expect(sol.inputPowerW).toBeGreaterThan(0);
    });
  }

  it("the grounded ends of the half loop carry current into the ground", () => {
    const sol = solveShape(cases[4][1]);
    const first = 0, last = sol.mesh.segmentCount - 1;
    const [r0, i0] = segmentEndCurrents(sol.mesh, first, sol.currentRe, sol.currentIm);
    const [, , r1, i1] = segmentEndCurrents(sol.mesh, last, sol.currentRe, sol.currentIm);
    const feed = Math.hypot(sol.currentRe[sol.mesh.feedBasis], sol.currentIm[sol.mesh.feedBasis]);
    expect(Math.hypot(r0, i0)).toBeGreaterThan(0.1 * feed);
    expect(Math.hypot(r1, i1)).toBeGreaterThan(0.1 * feed);
  });
});
