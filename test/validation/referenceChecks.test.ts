// Every published reference value the solver is held to (the list lives in
// generator/validation/referenceChecks.ts with its source beside each value; the site prints the
// same list). A check passes when |ours − reference| ≤ its tolerance.
import { describe, expect, it } from "vitest";
import { referenceChecks } from "../../generator/validation/referenceChecks.js";

describe("reference checks", () => {
  const checks = referenceChecks();
  it("covers directivity, impedance, beamwidth and the 1.5λ check values", () => {
    expect(checks.length).toBeGreaterThanOrEqual(12); // 12 today: directivity ×5, impedance ×2, beamwidth ×2, loss, the two 1.5λ values
    for (const c of checks) expect(c.source.length).toBeGreaterThan(5);
  });
  for (const c of checks) {
    it(`${c.quantity}: ${c.reference} ${c.unit} within ${c.tolerance} (${c.source})`, () => {
      expect(Math.abs(c.ours - c.reference)).toBeLessThanOrEqual(c.tolerance);
      expect(c.pass).toBe(true);
    });
  }
});
