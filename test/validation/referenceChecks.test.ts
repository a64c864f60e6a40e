// Every published reference value the solver is held to (the list lives in
// generator/validation/referenceChecks.ts with its source beside each value; the site prints the
// same list). A check passes when |ours − reference| ≤ its tolerance.
import { describe, expect, it } from "vitest";
import { referenceChecks } from "../../generator/validation/referenceChecks.js";

describe("reference checks", () => {
  const checks = referenceChecks();
  it("covers directivity, impedance, beamwidth and the 1.5λ check values", () => {
    expect(checks.length).toBeGreaterThanOrEqual(18); // 18 today: directivity ×5, impedance ×2, beamwidth ×2, loss, the two 1.5λ values, 6 over the ground
    for (const c of checks) expect(c.source.length).toBeGreaterThan(5);
    expect(new Set(checks.map((c) => c.id)).size).toBe(checks.length);
  });
  it("covers the ground: the monopole and horizontal dipole over perfect ground, the reflection from real ground", () => {
    const ids = checks.map((c) => c.id).filter((id) => id.startsWith("ground-"));
    expect(ids).toEqual(expect.arrayContaining(["ground-monopole-resistance", "ground-monopole-directivity", "ground-horizontal-0.5wl-resistance",
      "ground-horizontal-1wl-lobe", "ground-average-reflection-horizontal", "ground-average-reflection-vertical"]));
  });
  for (const c of checks) {
    it(`${c.quantity}: ${c.reference} ${c.unit} within ${c.tolerance} (${c.source})`, () => {
      expect(Math.abs(c.ours - c.reference)).toBeLessThanOrEqual(c.tolerance);
      expect(c.pass).toBe(true);
    });
  }
});
