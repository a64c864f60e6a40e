// deploy/shard.sh, the entry point of the CI-matrix and Kubernetes examples, maps a 0-based task
// index to `generate --shard I/N`; its shards merge into the same entries as one run.
import { spawnSync } from "node:child_process";
import { mkdtempSync, readdirSync, readFileSync } from "node:fs";
import { tmpdir } from "node:os";
import { join } from "node:path";
import { describe, expect, it } from "vitest";

const files = (dir: string) => Object.fromEntries(readdirSync(dir).filter((f) => f.endsWith(".json")).sort().map((f) => [f, readFileSync(join(dir, f), "utf8")]));

describe("deploy/shard.sh", () => {
  it("two array tasks plus merge equal a single run", () => {
    const root = mkdtempSync(join(tmpdir(), "bentwire-shards-"));
    const grid = "test/fixtures/tiny-grid.yaml";
    for (const index of [0, 1]) {
      const run = spawnSync("bash", ["deploy/shard.sh"], {
        encoding: "utf8", env: { ...process.env, SHARD_INDEX: String(index), SHARD_COUNT: "2", OUT_ROOT: root, GRID: grid, WORKERS: "1" },
      });
      expect(run.status, run.stderr).toBe(0);
    }
    const merged = join(root, "merged");
    expect(spawnSync(process.execPath, ["--import", "tsx", "generator/cli/main.ts", "merge", join(root, "shard-0"), join(root, "shard-1"), "--out", merged]).status).toBe(0);
    const single = join(root, "single");
    expect(spawnSync(process.execPath, ["--import", "tsx", "generator/cli/main.ts", "generate", "--grid", grid, "--out", single]).status).toBe(0);
    expect(files(merged)).toEqual(files(single));
  });
});
