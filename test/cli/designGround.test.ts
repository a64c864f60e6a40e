// design over ground on the command line: the JSON carries the mounting and objective figures, the
// shape it writes keeps its ground so analyze reproduces it, and bad flags get one line, exit 2.
import { spawnSync } from "node:child_process";
import { mkdtempSync, readFileSync } from "node:fs";
import { tmpdir } from "node:os";
import { join } from "node:path";
import { describe, expect, it } from "vitest";

const cli = (...args: string[]) => spawnSync(process.execPath, ["--import", "tsx", "generator/cli/main.ts", ...args], { encoding: "utf8" });

describe("bentwire design over ground", () => {
  it("vertical mounting, near-vertical objective: figures in --json, analyze agrees on the written shape", () => {
    const out = join(mkdtempSync(join(tmpdir(), "bentwire-design-ground-")), "shape.json");
    const run = cli("design", "--freq-mhz", "145", "--length-wl", "1", "--pieces", "1", "--ground", "perfect", "--height-m", "0.5",
      "--mounting", "vertical", "--objective", "near-vertical", "--json", "--out", out);
    expect(run.status).toBe(0);
    const r = JSON.parse(run.stdout);
    expect(r.mounting).toBe("vertical");
    expect(r.elevationWindowDeg).toEqual([60, 90]);
    expect(r.objectiveGainDbi).toBeLessThanOrEqual(r.peakGainDbi + 1e-9);
    const zs = r.shape.wires[0].pointsM.map((p: number[]) => p[2]);
    expect(Math.min(...zs)).toBeCloseTo(0.5, 9);
    expect(r.feedHeightM).toBeCloseTo(Math.max(...zs), 9);
    const shape = JSON.parse(readFileSync(out, "utf8"));
    expect(shape.ground).toEqual({ type: "perfect" });
    const again = JSON.parse(cli("analyze", out, "--json").stdout);
    expect(again.peakGainDbi).toBe(r.peakGainDbi);
    expect(again.peakElevationDeg).toBe(r.peakElevationDeg);
    expect(again.energyBalanceError).toBeLessThan(1e-3);
  });

  it("vertical from a mast top with --clearance-m: the feed at the height given, no point under the clearance", () => {
    const run = cli("design", "--freq-mhz", "145", "--length-wl", "1.5", "--pieces", "2", "--ground", "average", "--height-m", "3",
      "--mounting", "vertical", "--clearance-m", "1", "--json");
    expect(run.status, run.stderr).toBe(0);
    const r = JSON.parse(run.stdout);
    const zs = r.shape.wires[0].pointsM.map((p: number[]) => p[2]);
    expect(r.feedHeightM).toBeCloseTo(3, 9);
    expect(Math.max(...zs)).toBeCloseTo(3, 9); // the feed is the top
    expect(Math.min(...zs)).toBeGreaterThanOrEqual(1 - 1e-9);
    expect(r.verticalClearanceM).toBe(1);
  }, 120_000);

  for (const [args, why] of [
    [["--mounting", "vertical"], /needs a ground/],
    [["--ground", "average", "--height-m", "5", "--clearance-m", "1"], /clearance \(--clearance-m\) applies to the vertical mounting only/],
    [["--ground", "average", "--height-m", "5", "--mounting", "vertical", "--clearance-m", "5"], /must be below the mast height 5 m/],
    [["--ground", "average", "--height-m", "5", "--mounting", "vertical", "--clearance-m", "x"], /--clearance-m must be a number of metres/],
    [["--ground", "average"], /needs a height/],
    [["--ground", "average", "--height-m", "2", "--objective", "dx"], /--objective must be one of/],
  ] as [string[], RegExp][]) {
    it(`refuses ${args.join(" ")} in one line, exit 2`, () => {
      const run = cli("design", "--freq-mhz", "145", "--length-wl", "1", "--pieces", "1", ...args);
      expect(run.status).toBe(2);
      expect(run.stderr.trim().split("\n")).toHaveLength(1);
      expect(run.stderr).toMatch(why);
    });
  }
});
