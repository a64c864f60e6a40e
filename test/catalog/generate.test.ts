// The catalog pipeline on a tiny grid (2 bands × 1 length × 2 pieces × 1 variant = 4 entries):
// byte-identical results however the work is split, resumable after SIGKILL, damaged entries found
// by their hash and recomputed, and one-line errors for bad grids.
import { spawn, spawnSync } from "node:child_process";
import { cpSync, existsSync, mkdtempSync, readdirSync, readFileSync, writeFileSync } from "node:fs";
import { tmpdir } from "node:os";
import { join } from "node:path";
import { beforeAll, describe, expect, it } from "vitest";

const GRID = "test/fixtures/tiny-grid.yaml";
const cli = (...args: string[]) => spawnSync(process.execPath, ["--import", "tsx", "generator/cli/main.ts", ...args], { encoding: "utf8" });
const tmp = () => mkdtempSync(join(tmpdir(), "bentwire-catalog-"));
const entriesOf = (dir: string) =>
  Object.fromEntries(readdirSync(dir).filter((f) => f.endsWith(".json")).sort().map((f) => [f, readFileSync(join(dir, f), "utf8")]));

describe("catalog generate", () => {
  let single: string;
  beforeAll(() => {
    single = tmp();
    const run = cli("generate", "--grid", GRID, "--out", single, "--workers", "1");
    expect(run.status, run.stderr).toBe(0);
  });

  it("writes one valid entry per grid cell, named by a readable id", () => {
    expect(Object.keys(entriesOf(single))).toEqual(["2m-1wl-k1-max-gain.json", "2m-1wl-k2-max-gain.json", "70cm-1wl-k1-max-gain.json", "70cm-1wl-k2-max-gain.json"]);
    const verify = cli("verify", "--grid", GRID, "--dir", single, "--sample", "1");
    expect(verify.status, verify.stdout).toBe(0);
    expect(verify.stdout).toMatch(/4 entries checked, 1 recomputed, 0 problems/);
  });

  it("gives byte-identical entries from 2 workers and from 3 shards merged", () => {
    const two = tmp();
    expect(cli("generate", "--grid", GRID, "--out", two, "--workers", "2").status).toBe(0);
    expect(entriesOf(two)).toEqual(entriesOf(single));
    const shards = [1, 2, 3].map((i) => {
      const dir = tmp();
      expect(cli("generate", "--grid", GRID, "--out", dir, "--shard", `${i}/3`).status).toBe(0);
      return dir;
    });
    const merged = tmp();
    const m = cli("merge", ...shards, "--out", merged);
    expect(m.status, m.stderr).toBe(0);
    expect(entriesOf(merged)).toEqual(entriesOf(single));
  });

  it("a second run with everything present recomputes nothing", () => {
    const run = cli("generate", "--grid", GRID, "--out", single);
    expect(run.stdout).toMatch(/4 up to date, 0 computed/);
  });

  it("finds a truncated and a hand-edited entry by their hashes and recomputes them", () => {
    const dir = tmp();
    cpSync(single, dir, { recursive: true });
    const truncated = join(dir, "2m-1wl-k1-max-gain.json");
    writeFileSync(truncated, readFileSync(truncated, "utf8").slice(0, 500));
    const edited = join(dir, "70cm-1wl-k2-max-gain.json");
    writeFileSync(edited, readFileSync(edited, "utf8").replace(/"gainDbi":(\d)/, (_, d) => `"gainDbi":${Number(d) + 1}`));
    const verify = cli("verify", "--grid", GRID, "--dir", dir, "--sample", "0");
    expect(verify.status).toBe(1);
    expect(verify.stdout).toMatch(/2m-1wl-k1-max-gain.json: not valid JSON/);
    expect(verify.stdout).toMatch(/70cm-1wl-k2-max-gain.json: content hash does not match/);
    const run = cli("generate", "--grid", GRID, "--out", dir);
    expect(run.stdout).toMatch(/2 up to date, 2 computed/);
    expect(entriesOf(dir)).toEqual(entriesOf(single));
  });

  it("a run killed with SIGKILL part-way, then run again, ends with every entry present and valid", async () => {
    const dir = tmp();
    const child = spawn(process.execPath, ["--import", "tsx", "generator/cli/main.ts", "generate", "--grid", GRID, "--out", dir, "--workers", "1"], { stdio: "ignore" });
    const exited = new Promise((resolve) => child.on("exit", resolve));
    // kill as soon as the first entry lands
    const poll = setInterval(() => {
      if (existsSync(dir) && readdirSync(dir).some((f) => f.endsWith(".json"))) child.kill("SIGKILL");
    }, 20);
    await exited;
    clearInterval(poll);
    const before = readdirSync(dir).filter((f) => f.endsWith(".json")).length;
    expect(before).toBeLessThan(4);
    const run = cli("generate", "--grid", GRID, "--out", dir);
    expect(run.status).toBe(0);
    expect(entriesOf(dir)).toEqual(entriesOf(single));
    // no temporary files left behind by the killed run are mistaken for entries
    expect(readdirSync(dir).filter((f) => f.endsWith(".json"))).toHaveLength(4);
  });

  it("refuses conflicting entries when merging", () => {
    const a = tmp(), b = tmp();
    cpSync(single, a, { recursive: true });
    cpSync(single, b, { recursive: true });
    const file = join(b, "2m-1wl-k1-max-gain.json");
    writeFileSync(file, readFileSync(file, "utf8").replace('"seed":1', '"seed":1 '));
    const m = cli("merge", a, b, "--out", tmp());
    expect(m.status).toBe(2);
    expect(m.stderr.trim().split("\n")).toHaveLength(1);
    expect(m.stderr).toMatch(/2m-1wl-k1-max-gain differs between/);
  });
});

describe("bad grid files", () => {
  const base = readFileSync(GRID, "utf8");
  const cases: [string, string, RegExp][] = [
    ["band edges reversed", base.replace("lowMhz: 144.0", "lowMhz: 148.0"), /bands\[0\]\.lowMhz: lowMhz must be below highMhz \(got 148 ≥ 146\)/],
    ["an unknown variant", base.replace("variants: [max-gain]", "variants: [most-gain]"), /variants\[0\]: variants must be max-gain or direct-feed/],
    ["a duplicate band id", base.replace("id: 70cm", "id: 2m"), /bands\[1\]\.id: duplicate band id "2m"/],
    ["a YAML syntax error", base.replace("variants: [max-gain]", "variants: [max-gain"), /:\d+:\d+: YAML syntax error/],
  ];
  for (const [what, text, message] of cases) {
    it(`${what}: one line naming the place, exit 2`, () => {
      const dir = tmp();
      const file = join(dir, "grid.yaml");
      writeFileSync(file, text);
      const run = cli("generate", "--grid", file, "--out", join(dir, "out"));
      expect(run.status).toBe(2);
      expect(run.stderr.trim().split("\n")).toHaveLength(1);
      expect(run.stderr).toMatch(message);
      expect(run.stderr).toContain(file);
      expect(existsSync(join(dir, "out"))).toBe(false);
    });
  }
});
