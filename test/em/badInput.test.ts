// Bad shapes: one line naming the field and the rule, exit code 2, no stack trace.
import { spawnSync } from "node:child_process";
import { mkdtempSync, writeFileSync } from "node:fs";
import { tmpdir } from "node:os";
import { join } from "node:path";
import { describe, expect, it } from "vitest";
import { parseShape, solveShape } from "../../generator/em/index.js";
import { InputError } from "../../generator/errors.js";

const good = {
  frequencyHz: 145e6,
  wireRadiusM: 0.001,
  wires: [{ pointsM: [[-0.5, 0, 0], [0, 0, 0], [0.5, 0, 0]] }],
  feed: { wire: 0, vertex: 1 },
};
const withChange = (patch: Record<string, unknown>) => JSON.stringify({ ...good, ...patch });

const cases: [string, string, RegExp][] = [
  ["malformed JSON", "{\"frequencyHz\": 145e6,", /not valid JSON/],
  ["an unknown field", withChange({ colour: "red" }), /unknown field colour/],
  ["a NaN radius", withChange({ wireRadiusM: "NaN" }), /wireRadiusM: wireRadiusM must be a number/],
  ["a negative radius", withChange({ wireRadiusM: -0.001 }), /wireRadiusM: wireRadiusM must be positive/],
  ["a zero frequency", withChange({ frequencyHz: 0 }), /frequencyHz: frequencyHz must be positive/],
  ["a zero-length piece", withChange({ wires: [{ pointsM: [[-0.5, 0, 0], [0, 0, 0], [0, 0, 0], [0.5, 0, 0]] }] }), /wires\[0\]\.pointsM\[2\]: piece 1 has zero length/],
  ["a feed at a free end", withChange({ feed: { wire: 0, vertex: 0 } }), /feed\.vertex must be an interior vertex/],
  ["a feed on a missing wire", withChange({ feed: { wire: 3, vertex: 1 } }), /feed\.wire must name one of the 1 wires/],
  [
    "crossing wires",
    withChange({ wires: [{ pointsM: [[-0.5, 0, 0], [0, 0, 0], [0.5, 0, 0]] }, { pointsM: [[0.2, -0.3, 0], [0.2, 0.3, 0]] }] }),
    /wires\[0\] piece 1 \(pointsM\[1\] to pointsM\[2\]\) and wires\[1\] piece 0 \(pointsM\[0\] to pointsM\[1\]\) touch or cross/,
  ],
  [
    "segments shorter than the radius",
    withChange({ wireRadiusM: 0.01, wires: [{ pointsM: [[-0.5, 0, 0], [0, 0, 0], [0.02, 0, 0], [0.5, 0, 0]] }] }),
    /cut into 3 segments of .* mm, .* shorter than the wire radius/,
  ],
];

describe("bad shape input", () => {
  for (const [what, text, message] of cases) {
    it(`${what} is refused with one clear line`, () => {
      let error: unknown;
      try {
        solveShape(parseShape(text, "shape.json"));
      } catch (err) {
        error = err;
      }
      expect(error).toBeInstanceOf(InputError);
      const line = (error as Error).message;
      expect(line).toMatch(message);
      expect(line).not.toContain("\n");
    });
  }

  it("the command line prints only that line and exits with 2", () => {
    const dir = mkdtempSync(join(tmpdir(), "bentwire-bad-"));
    for (const [, text, message] of [cases[0], cases[8]]) {
      const file = join(dir, "shape.json");
      writeFileSync(file, text);
      const run = spawnSync(process.execPath, ["--import", "tsx", "generator/cli/main.ts", "analyze", file], { encoding: "utf8" });
      expect(run.status).toBe(2);
      expect(run.stdout).toBe("");
      expect(run.stderr.trim().split("\n")).toHaveLength(1);
      expect(run.stderr).toMatch(message);
    }
  });
});
