// Property-based fuzzing of the shape file (fast-check, seeded): every text is either refused with
// one InputError line or accepted as a shape inside the bounds of generator/bounds.ts whose mesh
// size was counted before any allocation; a sample of accepted small shapes solves to finite figures.
import fc from "fast-check";
import { describe, expect, it } from "vitest";
import { SHAPE_BOUNDS as B } from "../../generator/bounds.js";
import { parseShape, solveShape } from "../../generator/em/index.js";
import { checkProblemSize } from "../../generator/em/shapeFile.js";
import { InputError } from "../../generator/errors.js";
import { oneLine, SEED, wildNumber, wildString } from "./arbitraries.js";

const base = { frequencyHz: 145e6, wireRadiusM: 0.001, wires: [{ pointsM: [[-0.5, 0, 0], [0, 0, 0], [0.5, 0, 0]] }], feed: { wire: 0, vertex: 1 } };
const FIELDS = ["name", "frequencyHz", "wireRadiusM", "conductor", "segmentsPerWavelength", "wires", "feed", "colour"];

const point = fc.oneof(fc.tuple(wildNumber(), wildNumber(), wildNumber()), fc.tuple(fc.double({ min: -3, max: 3, noNaN: true }), fc.double({ min: -3, max: 3, noNaN: true }), fc.constant(0)), wildNumber());
const wire = fc.record({ pointsM: fc.oneof(fc.array(point, { maxLength: 6 }), wildNumber()), radiusM: wildNumber() }, { requiredKeys: ["pointsM"] });
const fieldValue: Record<string, fc.Arbitrary<unknown>> = {
  name: wildString(),
  frequencyHz: wildNumber(),
  wireRadiusM: wildNumber(),
  conductor: fc.oneof(fc.constantFrom("perfect", "copper", "aluminium", "gold"), fc.record({ conductivitySPerM: wildNumber() }), wildNumber()),
  segmentsPerWavelength: wildNumber(),
  wires: fc.oneof(fc.array(wire, { maxLength: 3 }), wildNumber()),
  feed: fc.oneof(fc.record({ wire: wildNumber(), vertex: wildNumber() }), fc.constant(undefined), wildNumber()),
  colour: wildString(),
};

/** The base shape with some fields replaced, dropped or added, sometimes with a BOM or cut short. */
const shapeText = fc
  .tuple(
    fc.subarray(FIELDS, { maxLength: 3 }),
    fc.dictionary(fc.constantFrom(...FIELDS), fc.oneof(...Object.values(fieldValue)), { maxKeys: 3 }),
    fc.constantFrom("plain", "bom", "cut", "deep"),
  )
  .map(([changed, extra, form]) => {
    const doc: Record<string, unknown> = { ...base };
    for (const f of changed) if (f in extra) doc[f] = extra[f]; else delete doc[f];
    let text = JSON.stringify(doc);
    if (form === "bom") text = `\uFEFF${text}`;
    if (form === "cut") text = text.slice(0, Math.floor(text.length / 2));
    if (form === "deep") text = `{"wires": ${"[".repeat(40)}${"]".repeat(40)}}`;
    return text;
  });

describe("shape file fuzzing", () => {
  it("1,200 fuzzed shape files: one InputError line, or a shape inside every bound", () => {
    let accepted = 0;
    fc.assert(
      fc.property(shapeText, (text) => {
        let shape;
        try {
          shape = parseShape(text, "fuzz.json");
        } catch (err) {
          expect(err).toBeInstanceOf(InputError);
          expect(oneLine((err as Error).message)).toBe(true);
          return;
        }
        accepted++;
        expect(shape.frequencyHz).toBeGreaterThanOrEqual(B.frequencyHz.min);
        expect(shape.frequencyHz).toBeLessThanOrEqual(B.frequencyHz.max);
        const size = checkProblemSize(shape);
        expect(size.unknowns).toBeLessThanOrEqual(B.unknownsMax);
        for (const w of shape.wires) for (const p of w.pointsM) for (const c of p) expect(Math.abs(c)).toBeLessThanOrEqual(B.coordinateAbsM);
      }),
      { seed: SEED, numRuns: 1200 },
    );
    expect(accepted).toBeGreaterThan(0); // the generator reaches valid shapes too, not only refusals
  });

  it("60 fuzzed near-valid dipoles solve to finite figures or are refused in one line", () => {
    const dipole = fc.record({
      frequencyHz: fc.oneof(fc.constantFrom(B.frequencyHz.min, B.frequencyHz.max, 1e6, 145e6), fc.double({ min: 1e4, max: 3e11, noNaN: true })),
      halfM: fc.oneof(fc.constantFrom(1e-6, 1e-3, 0.5, 5), fc.double({ min: 1e-7, max: 20, noNaN: true })),
      radiusM: fc.oneof(fc.constantFrom(B.radiusM.min, 1e-3, 0.01), fc.double({ min: 1e-6, max: 0.05, noNaN: true })),
      conductor: fc.oneof(fc.constantFrom("perfect", "copper"), fc.record({ conductivitySPerM: fc.constantFrom(B.conductivitySPerM.min, B.conductivitySPerM.max) })),
    });
    let solved = 0;
    fc.assert(
      fc.property(dipole, (d) => {
        const text = JSON.stringify({ frequencyHz: d.frequencyHz, wireRadiusM: d.radiusM, conductor: d.conductor, wires: [{ pointsM: [[-d.halfM, 0, 0], [0, 0, 0], [d.halfM, 0, 0]] }], feed: { wire: 0, vertex: 1 } });
        let s;
        try {
          s = solveShape(parseShape(text, "fuzz.json"));
        } catch (err) {
          expect(err).toBeInstanceOf(InputError);
          expect(oneLine((err as Error).message)).toBe(true);
          return;
        }
        solved++;
        for (const v of [s.inputImpedanceOhm.re, s.inputImpedanceOhm.im, s.peakGainDbi, s.peakDirectivityDbi, s.radiationEfficiency]) expect(Number.isFinite(v)).toBe(true);
        // a dipole's gain lies between a lossy short wire and a long straight wire (common practice)
        expect(s.peakGainDbi).toBeGreaterThan(-80);
        expect(s.peakGainDbi).toBeLessThan(20);
      }),
      { seed: SEED, numRuns: 60 },
    );
    expect(solved).toBeGreaterThan(10); // most of them reach the solver, not only the refusals
  });
});
