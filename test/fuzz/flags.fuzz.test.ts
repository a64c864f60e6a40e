// Property-based fuzzing of the command-line values (fast-check, seeded): every parser in
// generator/cli/options.ts either returns a finite value inside its bound or throws commander's
// InvalidArgumentError with one line; a handful of fuzzed command lines, spawned, exit 2 with one
// line on stderr (or 0).
import { spawnSync } from "node:child_process";
import { InvalidArgumentError } from "commander";
import fc from "fast-check";
import { describe, expect, it } from "vitest";
import { ANALYSIS_BOUNDS as A, SHAPE_BOUNDS as S } from "../../generator/bounds.js";
import { bandMhz, nonEmpty, numberIn, oneOf, positiveNumber, wholeNumber } from "../../generator/cli/options.js";
import { oneLine, SEED } from "./arbitraries.js";

const flagText = fc.oneof(
  fc.constantFrom("", " ", "0", "-0", "1", "-1", "0x10", "1e300", "1e-300", "Infinity", "NaN", "1_000", "1.5", ".5", "5.", "1e3", "2147483648", "144:146", "146:144", "1:1", ":", "1:2:3", "0:1", "1e-3:1e-2", "max-gain", "\u001b[31m", "a\nb"),
  fc.string({ maxLength: 16 }),
  fc.double({ noNaN: true }).map(String),
  fc.integer({ min: -100, max: 3_000_000_000 }).map(String),
  fc.tuple(fc.double({ noNaN: true }), fc.double({ noNaN: true })).map(([a, b]) => `${a}:${b}`),
);

type Check = (v: unknown) => void;
const PARSERS: [string, (t: string) => unknown, Check][] = [
  ["positiveNumber", positiveNumber("--length-wl"), (v) => expect(v as number).toBeGreaterThan(0)],
  ["--line-ohm", numberIn("--line-ohm", A.lineImpedanceOhm.min, A.lineImpedanceOhm.max), (v) => expect(v as number).toBeLessThanOrEqual(A.lineImpedanceOhm.max)],
  ["--freq-mhz", numberIn("--freq-mhz", S.frequencyHz.min / 1e6, S.frequencyHz.max / 1e6), (v) => expect(v as number).toBeGreaterThanOrEqual(S.frequencyHz.min / 1e6)],
  ["--seed", wholeNumber("--seed", A.seed.min, A.seed.max), (v) => expect(Number.isInteger(v)).toBe(true)],
  ["--tolerance-samples", wholeNumber("--tolerance-samples", 1, A.toleranceSamples.max), (v) => expect(v as number).toBeLessThanOrEqual(A.toleranceSamples.max)],
  ["--band-mhz", bandMhz("--band-mhz"), (v) => { const [lo, hi] = v as number[]; expect(lo).toBeLessThan(hi); expect(hi).toBeLessThanOrEqual(S.frequencyHz.max); }],
  ["--variant", oneOf("--variant", ["max-gain", "direct-feed"]), (v) => expect(["max-gain", "direct-feed"]).toContain(v)],
  ["--out", nonEmpty("--out"), (v) => expect((v as string).trim()).not.toBe("")],
];

describe("command-line value fuzzing", () => {
  it("1,600 fuzzed values through the flag parsers: a value inside the bound, or one line", () => {
    fc.assert(
      fc.property(fc.nat({ max: PARSERS.length - 1 }), flagText, (which, text) => {
        const [, parse, check] = PARSERS[which];
        let v: unknown;
        try {
          v = parse(text);
        } catch (err) {
          expect(err).toBeInstanceOf(InvalidArgumentError);
          expect(oneLine((err as Error).message)).toBe(true);
          return;
        }
        if (typeof v === "number") expect(Number.isFinite(v)).toBe(true);
        check(v);
      }),
      { seed: SEED, numRuns: 1600 },
    );
  });

  it("a handful of fuzzed command lines, spawned: exit 2 and one line on stderr", () => {
    const commands = fc.sample(
      fc.tuple(fc.constantFrom("analyze", "design", "verify", "generate", "merge"), fc.constantFrom("--seed", "--sample", "--out", "--band-mhz", "--freq-mhz", "--line-ohm", "--workers"), fc.constantFrom("", "-1", "0x1", "1e300", "\u001b[2J")),
      { seed: SEED, numRuns: 5 },
    );
    for (const [command, flag, value] of commands) {
      const args = command === "analyze" ? ["analyze", "designs/examples/none.json", flag, value] : [command, flag, value];
      const run = spawnSync(process.execPath, ["--import", "tsx", "generator/cli/main.ts", ...args], { encoding: "utf8" });
      expect(run.status, `${args.join(" ")}: ${run.stderr}`).toBe(2);
      expect(run.stderr.trim().split("\n")).toHaveLength(1);
      expect(run.stderr).not.toMatch(/\u001b/);
    }
  });
});
