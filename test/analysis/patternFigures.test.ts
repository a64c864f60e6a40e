// Pattern figures against textbook values: half-power beamwidth of a short (Hertzian) dipole 90° and
// of a half-wave dipole 78° (Balanis, Antenna Theory, 3rd ed., §4.2.6 and table 4.2 / §4.6); a
// straight dipole radiates the same both ways (front-to-back 0 dB) with linear polarization along
// the wire.
import { describe, expect, it } from "vitest";
import { cutGainsDbi, frontToBackDb, halfPowerBeamwidthDeg, polarizationAt, principalCuts } from "../../generator/analysis/patternFigures.js";
import { solveShape } from "../../generator/em/index.js";
import { straightDipole } from "../helpers/shapes.js";

/** The E-plane cut of a dipole along x through a broadside peak is the cut that contains x. */
function ePlaneBeamwidth(lengthWl: number): number {
  const s = solveShape(straightDipole(lengthWl, 1e-4));
  const { theta, phi } = s.peakDirectionRad;
  const cuts = principalCuts(theta, phi);
  const widths = [halfPowerBeamwidthDeg(s.farField, cuts.alongTheta), halfPowerBeamwidthDeg(s.farField, cuts.alongPhi)];
  return Math.min(...widths.filter((w): w is number => w !== null));
}

describe("pattern figures", () => {
  it("short dipole (0.05λ) half-power beamwidth is about 90° (Balanis §4.2)", () => {
    expect(ePlaneBeamwidth(0.05)).toBeCloseTo(90, 0);
  });

  it("half-wave dipole half-power beamwidth is about 78° (Balanis §4.6)", () => {
    expect(Math.abs(ePlaneBeamwidth(0.5) - 78)).toBeLessThan(1);
  });

  it("a straight dipole has front-to-back 0 dB and linear polarization along the wire", () => {
    const s = solveShape(straightDipole(0.5, 1e-3));
    const { theta, phi } = s.peakDirectionRad;
    expect(Math.abs(frontToBackDb(s.farField, theta, phi))).toBeLessThan(1e-6);
    const pol = polarizationAt(s.farField, theta, phi);
    expect(pol.sense).toBe("linear");
    expect(pol.axialRatioDb).toBeGreaterThan(40);
    // the field's major axis lies along x, the wire
    const t = (pol.tiltDeg * Math.PI) / 180;
    const ex = Math.cos(t) * Math.cos(theta) * Math.cos(phi) - Math.sin(t) * Math.sin(phi);
    expect(Math.abs(ex)).toBeGreaterThan(0.999);
  });

  it("the cut's value at 0° is the peak gain", () => {
    const s = solveShape(straightDipole(1.5, 1e-3));
    const { theta, phi } = s.peakDirectionRad;
    const cut = cutGainsDbi(s.farField, principalCuts(theta, phi).alongPhi, s.inputPowerW, 2);
    expect(cut).toHaveLength(180);
    expect(cut[90]).toBeCloseTo(s.peakGainDbi, 9);
    expect(Math.max(...cut)).toBeCloseTo(s.peakGainDbi, 6);
  });
});
