// analyze on the command line: the JSON contract and the one-line errors.
import { spawnSync } from "node:child_process";
import { describe, expect, it } from "vitest";

const cli = (...args: string[]) => spawnSync(process.execPath, ["--import", "tsx", "generator/cli/main.ts", ...args], { encoding: "utf8" });
const example = "designs/examples/half-wave-dipole-2m.json";

describe("bentwire analyze", () => {
  it("--json prints exactly one JSON object with the solver's figures", () => {
    const run = cli("analyze", example, "--json");
    expect(run.status).toBe(0);
    expect(run.stdout.trim().split("\n")).toHaveLength(1);
    const r = JSON.parse(run.stdout);
    for (const key of ["frequencyHz", "unknowns", "inputImpedanceOhm", "peakGainDbi", "peakDirectivityDbi", "radiationEfficiency", "peakDirection", "energyBalanceError"]) {
      expect(r).toHaveProperty(key);
    }
    expect(r.peakDirection).toHaveProperty("thetaDeg");
    expect(r.energyBalanceError).toBeLessThan(1e-3);
  });

  it("reports converged figures with their uncertainty; --segments-per-wavelength fixes one mesh", () => {
    const r = JSON.parse(cli("analyze", example, "--json").stdout);
    // a half-wave dipole of 2 mm wire at 145 MHz: about 1 % per doubling at 100 → 200 per λ
    expect(r.uncertainty.impedancePercent).toBeLessThan(2);
    expect(r.uncertainty.converged).toBe(r.uncertainty.gainDb < 0.01 && r.uncertainty.impedancePercent < 1);
    expect(r.uncertainty.segmentsPerWavelength).toBeGreaterThan(25);
    expect(r.feedGapM).toBeCloseTo(299792458 / r.frequencyHz / 50, 12); // λ/50
    const fixed = JSON.parse(cli("analyze", example, "--json", "--segments-per-wavelength", "30").stdout);
    expect(fixed.uncertainty.segmentsPerWavelength).toBe(30);
    expect(fixed.uncertainty.comparedWithSegmentsPerWavelength).toBe(60);
  });

  it("--band-mhz adds sweep, match, tolerance, pattern and checks", () => {
    const run = cli("analyze", example, "--json", "--band-mhz", "144:146", "--tolerance-samples", "8");
    expect(run.status).toBe(0);
    const r = JSON.parse(run.stdout);
    for (const key of ["sweep", "match", "tolerance", "pattern", "checks"]) expect(r).toHaveProperty(key);
    expect(r.tolerance.samples).toBe(8);
  });

  it("the readable report names the sections", () => {
    const run = cli("analyze", example, "--band-mhz", "144:146", "--tolerance-samples", "4");
    expect(run.status).toBe(0);
    for (const word of ["band sweep", "feed:", "tolerance", "pattern:", "trust:"]) expect(run.stdout).toContain(word);
  });

  const bad: [string, string[], RegExp][] = [
    ["a band without the design frequency", ["--band-mhz", "430:440"], /must contain the design frequency 145 MHz/],
    ["a negative line impedance", ["--band-mhz", "144:146", "--line-ohm", "-50"], /--line-ohm must be a positive number/],
    ["zero samples", ["--band-mhz", "144:146", "--tolerance-samples", "0"], /--tolerance-samples must be a whole number/],
    ["reversed band edges", ["--band-mhz", "146:144"], /--band-mhz must have LO below HI/],
  ];
  for (const [what, args, message] of bad) {
    it(`refuses ${what} with one line and exit code 2`, () => {
      const run = cli("analyze", example, ...args);
      expect(run.status).toBe(2);
      expect(run.stdout).toBe("");
      expect(run.stderr.trim().split("\n")).toHaveLength(1);
      expect(run.stderr).toMatch(message);
    });
  }
});
