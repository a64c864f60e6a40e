// The entries committed under designs/entries/ are the catalog the site renders: each must pass its
// schema, its content hash and the input hash its grid cell expects (what `verify` checks), and the
// default grid must have no cell without an entry.
import { spawnSync } from "node:child_process";
import { describe, expect, it } from "vitest";

describe("committed catalog", () => {
  it("every committed entry passes verify against designs/grid.yaml", () => {
    const run = spawnSync(process.execPath, ["--import", "tsx", "generator/cli/main.ts", "verify", "--sample", "0"], { encoding: "utf8" });
    expect(run.stdout).toMatch(/ 0 problems/);
    expect(run.stdout).not.toMatch(/missing:/);
    expect(run.status).toBe(0);
  });
});
