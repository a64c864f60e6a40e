// `design --family off-centre` end to end: a 1 λ direct-feed wire on 2 m, its JSON shape reproduced
// by `analyze`, the choke note, and one-line errors for a bad family name.
import { spawnSync } from "node:child_process";
import { mkdtempSync, readFileSync } from "node:fs";
import { tmpdir } from "node:os";
import { join } from "node:path";
import { describe, expect, it } from "vitest";

const cli = (...args: string[]) => spawnSync(process.execPath, ["--import", "tsx", "generator/cli/main.ts", ...args], { encoding: "utf8" });

describe("bentwire design --family off-centre", () => {
  it("finds a direct-feed 1 λ wire on 2 m with the feed off centre, and analyze agrees", () => {
    const out = join(mkdtempSync(join(tmpdir(), "bentwire-oc-")), "shape.json");
    const run = cli("design", "--family", "off-centre", "--freq-mhz", "145", "--length-wl", "1", "--pieces", "1", "--variant", "direct-feed", "--band-mhz", "144:146", "--json", "--out", out);
    expect(run.status, run.stderr).toBe(0);
    const result = JSON.parse(run.stdout);
    expect(result.status).toBe("ok");
    expect(result.family).toBe("off-centre");
    expect(result.maxSwrInBand).toBeLessThanOrEqual(2);
    expect(result.parameters.feedFraction).toBeLessThan(0.45);
    expect(result.buildNote).toMatch(/unbalanced.*choke/);
    expect(JSON.parse(readFileSync(out, "utf8"))).toEqual(result.shape);
    const again = JSON.parse(cli("analyze", out, "--json").stdout);
    expect(again.inputImpedanceOhm).toEqual(result.inputImpedanceOhm);
  });

  it("refuses an unknown family with one line and exit code 2", () => {
    const run = cli("design", "--family", "sideways", "--freq-mhz", "145", "--length-wl", "1", "--pieces", "1");
    expect(run.status).toBe(2);
    expect(run.stderr.trim().split("\n")).toHaveLength(1);
    expect(run.stderr).toMatch(/--family must be one of centre, off-centre/);
  });
});
