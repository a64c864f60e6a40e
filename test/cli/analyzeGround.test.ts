// analyze over ground on the command line: the JSON figures and the one-line errors (exit 2).
// Reference: a horizontal half-wave dipole λ/2 up peaks near 30° elevation (image theory's array
// factor sin(kh sinψ), Balanis, Antenna Theory, 3rd ed., §4.7.2; common practice over real ground).
import { spawnSync } from "node:child_process";
import { mkdtempSync, writeFileSync } from "node:fs";
import { tmpdir } from "node:os";
import { join } from "node:path";
import { describe, expect, it } from "vitest";

const cli = (...args: string[]) => spawnSync(process.execPath, ["--import", "tsx", "generator/cli/main.ts", ...args], { encoding: "utf8" });
const example = "designs/examples/half-wave-dipole-2m.json";
const halfWaveUpM = 299_792_458 / 145e6 / 2;

describe("bentwire analyze over ground", () => {
  it("--ground perfect --height-m: elevation figures in --json, energy balance below 1e-3", () => {
    const run = cli("analyze", example, "--json", "--ground", "perfect", "--height-m", String(halfWaveUpM));
    expect(run.status).toBe(0);
    const r = JSON.parse(run.stdout);
    expect(Math.abs(r.peakElevationDeg - 30)).toBeLessThan(1.5);
    expect(r.gainAtElevationDbi.map((e: { elevationDeg: number }) => e.elevationDeg)).toEqual([5, 10, 15, 20, 30, 45, 60, 90]);
    expect(r.elevationCut.gainDbi).toHaveLength(91);
    expect(r.energyBalanceError).toBeLessThan(1e-3);
    expect(r.lowestPointM).toBeCloseTo(halfWaveUpM, 9);
    expect(Math.abs(r.groundLossW)).toBeLessThan(1e-3 * r.inputPowerW);
  });

  it("--ground average: ground loss reported and the report says so", () => {
    const run = cli("analyze", example, "--ground", "average", "--height-m", String(halfWaveUpM));
    expect(run.status).toBe(0);
    expect(run.stdout).toMatch(/over real ground, ε_r 13, σ 0.005 S\/m/);
    expect(run.stdout).toMatch(/ground loss/);
    expect(run.stdout).toMatch(/power lines/);
  });

  it("a ground field in the shape file is honoured, a wire ending on real ground refused", () => {
    const dir = mkdtempSync(join(tmpdir(), "bentwire-ground-"));
    const mono = join(dir, "mono.json");
    writeFileSync(mono, JSON.stringify({ frequencyHz: 7.1e6, wireRadiusM: 1e-3, wires: [{ pointsM: [[0, 0, 0], [0, 0, 10.3]] }], feed: { wire: 0, vertex: 0 }, ground: { type: "perfect" } }));
    const ok = cli("analyze", mono, "--json");
    expect(ok.status).toBe(0);
    expect(JSON.parse(ok.stdout).peakElevationDeg).toBeLessThan(0.5);
    const bad = cli("analyze", mono, "--ground", "average");
    expect(bad.status).toBe(2);
    expect(bad.stderr.trim().split("\n")).toHaveLength(1);
    expect(bad.stderr).toMatch(/may not end on real ground/);
  });

  for (const [args, why] of [
    [["--ground", "swamp"], /--ground must be one of/],
    [["--height-m", "3"], /--height-m needs a ground/],
    [["--ground", "perfect"], /give --height-m/],
    [["--ground", "perfect", "--height-m", "-1"], /--height-m must be/],
    [["--ground", "good", "--height-m", "2", "--elevation-window-deg", "5:25"], /--elevation-window-deg applies only over ground .* with --band-mhz/],
    [["--ground", "good", "--height-m", "2", "--band-mhz", "144:146", "--elevation-window-deg", "30:10"], /--elevation-window-deg must be LO:HI/],
  ] as [string[], RegExp][]) {
    it(`refuses ${args.join(" ")} in one line, exit 2`, () => {
      const run = cli("analyze", example, ...args);
      expect(run.status).toBe(2);
      expect(run.stderr.trim().split("\n")).toHaveLength(1);
      expect(run.stderr).toMatch(why);
    });
  }
});
