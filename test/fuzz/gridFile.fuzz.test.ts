// Property-based fuzzing of the grid file (fast-check, seeded): the tiny test grid with values
// replaced by hostile tokens, lines dropped, duplicated or added, a BOM, deep nesting or floods of
// keys. Every text is refused with one InputError line or accepted as a grid inside the bounds.
import { readFileSync } from "node:fs";
import fc from "fast-check";
import { describe, expect, it } from "vitest";
import { ANALYSIS_BOUNDS as A, GRID_BOUNDS as G } from "../../generator/bounds.js";
import { expandGrid, parseGrid } from "../../generator/catalog/grid.js";
import { InputError } from "../../generator/errors.js";
import { oneLine, SEED } from "./arbitraries.js";

const BASE = readFileSync("test/fixtures/tiny-grid.yaml", "utf8").split("\n");
const VALUE_LINES = BASE.map((l, i) => [l, i] as const).filter(([l]) => /^\s*-?\s*[A-Za-z]+: \S/.test(l)).map(([, i]) => i);

const token = fc.oneof(
  fc.constantFrom("0", "-1", "1e300", "1e-300", "-0", ".nan", ".inf", "~", "null", "[]", "{}", "1000000000", "9007199254740993", "0x10", "'x'", "\"\\u001b[31m\"", "*a", "&a 1", "[[[[[[[[[[[[[[[[[[[[1]]]]]]]]]]]]]]]]]]]", "! !bad", "|", "perfect", "max-gain", "2.5"),
  fc.string({ maxLength: 12 }),
  fc.double({ noNaN: true }).map(String),
  fc.integer({ min: -10, max: 10_000 }).map(String),
);

const edit = fc.oneof(
  fc.record({ kind: fc.constant("value" as const), line: fc.constantFrom(...VALUE_LINES), value: token }),
  fc.record({ kind: fc.constant("drop" as const), line: fc.nat({ max: BASE.length - 1 }) }),
  fc.record({ kind: fc.constant("dup" as const), line: fc.nat({ max: BASE.length - 1 }) }),
  fc.record({ kind: fc.constant("add" as const), text: fc.constantFrom("colour: red", "  extra: 1", "bands: []", "\t- x", "seed: 2", "---", "a: &a [1, *a]") }),
);

const gridText = fc.tuple(fc.array(edit, { maxLength: 4 }), fc.constantFrom("plain", "bom", "flood", "indent")).map(([edits, form]) => {
  const lines = [...BASE];
  for (const e of edits) {
    if (e.kind === "value") lines[e.line] = lines[e.line].replace(/: .*$/, `: ${e.value}`);
    else if (e.kind === "drop") lines.splice(e.line, 1);
    else if (e.kind === "dup") lines.splice(e.line, 0, lines[e.line] ?? "");
    else lines.push(e.text);
  }
  let text = lines.join("\n");
  if (form === "bom") text = `\uFEFF${text}`;
  if (form === "flood") text += Array.from({ length: 1500 }, (_, i) => `\nk${i}: 1`).join("");
  if (form === "indent") text += `\nx:\n${" ".repeat(80)}y: 1`;
  return text;
});

describe("grid file fuzzing", () => {
  it("1,000 fuzzed grid files: one InputError line, or a grid inside every bound", () => {
    let accepted = 0;
    fc.assert(
      fc.property(gridText, (text) => {
        let grid;
        try {
          grid = parseGrid(text, "fuzz.yaml");
        } catch (err) {
          expect(err).toBeInstanceOf(InputError);
          expect(oneLine((err as Error).message)).toBe(true);
          expect((err as Error).message.startsWith("fuzz.yaml")).toBe(true);
          return;
        }
        accepted++;
        expect(grid.tolerance.samples).toBeLessThanOrEqual(A.toleranceSamples.max);
        expect(grid.lineImpedanceOhm).toBeLessThanOrEqual(A.lineImpedanceOhm.max);
        expect(grid.bands.length).toBeLessThanOrEqual(G.bandsMax);
        for (const b of grid.bands) expect(b.highMhz).toBeLessThanOrEqual(A.bandRatioMax * b.lowMhz);
        expect(expandGrid(grid).length).toBeGreaterThan(0);
      }),
      { seed: SEED, numRuns: 1000 },
    );
    expect(accepted).toBeGreaterThan(0);
  });
});
