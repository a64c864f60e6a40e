// Base-fed quarter-wave monopole over perfect ground against the half-wave dipole of the same wire
// and mesh in free space. Image theory (Balanis, Antenna Theory, 3rd ed., §4.7.4): the monopole's
// input impedance is half the dipole's, its directivity twice (+3.01 dB), its peak at the horizon.
import { describe, expect, it } from "vitest";
import { solveShape, validateShape } from "../../generator/em/index.js";
import { ONE_METRE_WAVELENGTH_HZ as F, straightDipole } from "../helpers/shapes.js";

const monopole = (fedAt: "bottom-start" | "bottom-end", radiusWl: number) =>
  validateShape({
    frequencyHz: F, wireRadiusM: radiusWl, segmentsPerWavelength: 50,
    wires: [{ pointsM: fedAt === "bottom-start" ? [[0, 0, 0], [0, 0, 0.25]] : [[0, 0, 0.25], [0, 0, 0]] }],
    feed: { wire: 0, vertex: fedAt === "bottom-start" ? 0 : 1 },
    ground: { type: "perfect" },
  });

describe("base-fed quarter-wave monopole over perfect ground (Balanis §4.7.4)", () => {
  for (const radius of [1e-3, 1e-4]) {
    const dipole = solveShape(straightDipole(0.5, radius, { segmentsPerWavelength: 50 }), { energyBalance: true });
    for (const fedAt of ["bottom-start", "bottom-end"] as const) {
      it(`radius ${radius} λ, grounded end at the ${fedAt}: half the dipole's impedance, +3.01 dB, peak at the horizon`, () => {
        const m = solveShape(monopole(fedAt, radius), { energyBalance: true });
        expect(m.unknowns).toBe((dipole.unknowns + 1) / 2);
        // the same equations; the image runs the other way along its path from the dipole's lower
        // arm, so the quadrature differs slightly: agree to 1e-5 relative
        const zd = dipole.inputImpedanceOhm, zm = m.inputImpedanceOhm;
        expect(Math.hypot(zm.re - zd.re / 2, zm.im - zd.im / 2)).toBeLessThan(1e-5 * Math.hypot(zd.re, zd.im));
        expect(m.peakDirectivityDbi - dipole.peakDirectivityDbi).toBeCloseTo(10 * Math.log10(2), 3);
        expect(m.ground!.peakElevationDeg).toBeLessThan(0.5);
        expect(m.energyBalanceError!).toBeLessThan(1e-3);
      });
    }
  }

  it("a copper monopole loses half the power of the copper dipole at half the input power: same efficiency", () => {
    const d = solveShape(straightDipole(0.5, 1e-3, { segmentsPerWavelength: 50, conductor: "copper" }));
    const m = solveShape(validateShape({ ...monopole("bottom-start", 1e-3), conductor: "copper" }), { energyBalance: true });
    // the monopole's efficiency comes from the pattern integral: agrees to its energy balance
    expect(m.radiationEfficiency).toBeCloseTo(d.radiationEfficiency, 4);
    expect(m.ground!.groundLossW!).toBeLessThan(1e-3 * m.inputPowerW);
  });
});
