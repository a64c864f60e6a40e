// The repeated-kill test: `generate` on a one-cell grid is killed with SIGKILL at ten seeded random
// moments, each run resuming what the last one left; then it runs to the end. The folder must hold
// byte for byte what one uninterrupted run writes, with no temporary file and no lock left over.
// Cost: a one-cell grid with two tolerance samples; kill moments fall within one uninterrupted
// run's duration, so the ten runs together cost a few uninterrupted runs of CPU.
import { spawn } from "node:child_process";
import { join } from "node:path";
import { describe, expect, it } from "vitest";
import { cli, filesOf, microGrid, tmp } from "./helpers.js";

/** mulberry32: a tiny seeded generator for the kill moments (common practice for test schedules). */
function mulberry32(seed: number): () => number {
  let a = seed >>> 0;
  return () => {
    a = (a + 0x6d2b79f5) >>> 0;
    let t = a;
    t = Math.imul(t ^ (t >>> 15), t | 1);
    t ^= t + Math.imul(t ^ (t >>> 7), t | 61);
    return ((t ^ (t >>> 14)) >>> 0) / 4294967296;
  };
}

function runKilledAfter(args: string[], ms: number): Promise<string> {
  return new Promise((resolve) => {
    const child = spawn(process.execPath, ["--import", "tsx", "generator/cli/main.ts", ...args], { stdio: "ignore" });
    const timer = setTimeout(() => child.kill("SIGKILL"), ms);
    child.on("exit", (code, signal) => {
      clearTimeout(timer);
      resolve(signal ?? `exit ${code}`);
    });
  });
}

describe("generate killed ten times, then finished", () => {
  it("ends with the bytes of an uninterrupted run and no leftovers", async () => {
    const dir = tmp("kill");
    const grid = microGrid(dir);
    const whole = join(dir, "whole");
    const t0 = performance.now();
    const first = cli("generate", "--grid", grid, "--out", whole, "--workers", "1");
    const fullMs = performance.now() - t0; // sets the scale of the kill moments, not an assertion
    expect(first.status, first.stderr).toBe(0);

    const killed = join(dir, "killed");
    const rng = mulberry32(15);
    const outcomes: string[] = [];
    for (let i = 0; i < 10; i++) {
      outcomes.push(await runKilledAfter(["generate", "--grid", grid, "--out", killed, "--workers", "1"], 150 + rng() * fullMs));
    }
    expect(outcomes.filter((o) => o === "SIGKILL").length).toBeGreaterThan(0);
    const last = cli("generate", "--grid", grid, "--out", killed, "--workers", "1");
    expect(last.status, last.stderr).toBe(0);
    const files = filesOf(killed);
    expect(Object.keys(files).filter((f) => f.endsWith(".tmp") || f.endsWith(".lock"))).toEqual([]);
    expect(files).toEqual(filesOf(whole));
  });
});
