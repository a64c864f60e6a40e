// The design command end to end: its JSON carries a valid shape file that `analyze` reproduces
// exactly, and bad flags get one line and exit code 2.
import { spawnSync } from "node:child_process";
import { mkdtempSync, readFileSync } from "node:fs";
import { tmpdir } from "node:os";
import { join } from "node:path";
import { describe, expect, it } from "vitest";

const cli = (...args: string[]) =>
  spawnSync(process.execPath, ["--import", "tsx", "generator/cli/main.ts", ...args], { encoding: "utf8" });

describe("bentwire design", () => {
  it("--json gives the winning shape, and analyze on that shape gives the same numbers", () => {
    const dir = mkdtempSync(join(tmpdir(), "bentwire-design-"));
    const out = join(dir, "shape.json");
    const run = cli("design", "--freq-mhz", "435", "--length-wl", "1.5", "--pieces", "1", "--seed", "4", "--json", "--out", out);
    expect(run.status).toBe(0);
    const result = JSON.parse(run.stdout);
    for (const key of ["frequencyHz", "unknowns", "inputImpedanceOhm", "peakGainDbi", "peakDirectivityDbi", "radiationEfficiency", "peakDirection", "energyBalanceError", "parameters", "evaluations", "seed", "stopReasons", "shape"]) {
      expect(result).toHaveProperty(key);
    }
    expect(JSON.parse(readFileSync(out, "utf8"))).toEqual(result.shape);
    const analyzed = cli("analyze", out, "--json");
    expect(analyzed.status).toBe(0);
    const again = JSON.parse(analyzed.stdout);
    for (const key of ["inputImpedanceOhm", "peakGainDbi", "peakDirectivityDbi", "radiationEfficiency", "peakDirection"]) {
      expect(again[key]).toEqual(result[key]);
    }
  });

  const bad: [string, string[], RegExp][] = [
    ["a negative length", ["--freq-mhz", "145", "--length-wl", "-1", "--pieces", "2"], /--length-wl must be a positive number/],
    ["K = 0", ["--freq-mhz", "145", "--length-wl", "1.5", "--pieces", "0"], /--pieces must be a whole number from 1 to 8/],
    ["a band without the frequency", ["--freq-mhz", "145", "--length-wl", "1.5", "--pieces", "2", "--band-mhz", "430:440"], /must contain the design frequency 145 MHz/],
    ["an unknown variant", ["--freq-mhz", "145", "--length-wl", "1.5", "--pieces", "2", "--variant", "most-gain"], /--variant must be one of max-gain, direct-feed/],
    ["a missing frequency", ["--length-wl", "1.5", "--pieces", "2"], /--freq-mhz is required/],
  ];
  for (const [what, args, message] of bad) {
    it(`refuses ${what} with one line and exit code 2`, () => {
      const run = cli("design", ...args);
      expect(run.status).toBe(2);
      expect(run.stdout).toBe("");
      expect(run.stderr.trim().split("\n")).toHaveLength(1);
      expect(run.stderr).toMatch(message);
    });
  }
});
