// `design --family off-centre` over ground and its exit status when nothing is feasible, as
// `design` has them (README "design"): exit 3, --out written only with --keep-infeasible.
// A 0.3 λ wire has a feed reactance of hundreds of ohms wherever it is fed (a short dipole:
// Balanis, Antenna Theory, 3rd ed., §4.3, from memory), so SWR 2 against 50 Ω cannot be met.
import { spawnSync } from "node:child_process";
import { existsSync, mkdtempSync, readFileSync } from "node:fs";
import { tmpdir } from "node:os";
import { join } from "node:path";
import { describe, expect, it } from "vitest";

const cli = (...args: string[]) => spawnSync(process.execPath, ["--import", "tsx", "generator/cli/main.ts", ...args], { encoding: "utf8" });
const tmp = () => mkdtempSync(join(tmpdir(), "bentwire-ocg-"));

describe("bentwire design --family off-centre over ground and when infeasible", () => {
  it("designs over perfect ground: the shape keeps its ground and height, analyze reproduces it", () => {
    const out = join(tmp(), "shape.json");
    const run = cli("design", "--family", "off-centre", "--freq-mhz", "145", "--length-wl", "1", "--pieces", "1", "--ground", "perfect", "--height-m", "1.5", "--json", "--out", out);
    expect(run.status, run.stderr).toBe(0);
    const result = JSON.parse(run.stdout);
    expect(result.family).toBe("off-centre");
    expect(result.mounting).toBe("horizontal");
    expect(result.feedHeightM).toBeCloseTo(1.5, 9);
    const shape = JSON.parse(readFileSync(out, "utf8"));
    expect(shape.ground).toEqual({ type: "perfect" });
    for (const p of shape.wires[0].pointsM) expect(p[2]).toBeCloseTo(1.5, 9);
    const again = JSON.parse(cli("analyze", out, "--json").stdout);
    expect(again.inputImpedanceOhm).toEqual(result.inputImpedanceOhm);
  });

  it("no feasible shape: exit 3, no --out file; with --keep-infeasible exit 3 and the file", () => {
    const dir = tmp();
    const args = ["design", "--family", "off-centre", "--freq-mhz", "145", "--length-wl", "0.3", "--pieces", "1", "--variant", "direct-feed", "--band-mhz", "144:146"];
    const plain = cli(...args, "--out", join(dir, "no.json"));
    expect(plain.status, plain.stderr).toBe(3);
    expect(plain.stdout).toMatch(/^status: infeasible/);
    expect(plain.stdout).toMatch(/no shape file written: no shape met every limit \(add --keep-infeasible/);
    expect(existsSync(join(dir, "no.json"))).toBe(false);
    const kept = cli(...args, "--json", "--out", join(dir, "kept.json"), "--keep-infeasible");
    expect(kept.status).toBe(3);
    expect(JSON.parse(kept.stdout).status).toBe("infeasible");
    expect(JSON.parse(readFileSync(join(dir, "kept.json"), "utf8")).wires).toHaveLength(1);
  });
});
