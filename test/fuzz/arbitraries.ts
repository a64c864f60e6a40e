// Seeded generators shared by the fuzz tests: hostile numbers, strings and structures around a
// valid base document, so most cases sit near the edge of what the schemas accept.
import fc from "fast-check";

export const SEED = 15_2026;

/** Numbers a person or a program might put in a field: edges, extremes, wrong types. */
export const wildNumber = (): fc.Arbitrary<unknown> =>
  fc.oneof(
    fc.constantFrom(0, -0, 1, -1, 0.5, 2, 3, 5, 1e-300, 1e300, -1e300, 2 ** 53, -(2 ** 53), 1e15, 1e-9, 1e-6, 1e4, 3e11, 145e6, 1e6, 0.001, 1e5, 1e8, 400, 1200),
    fc.double({ noNaN: true, noDefaultInfinity: true }),
    fc.double({ min: -2, max: 2, noNaN: true }),
    fc.integer({ min: -5, max: 2000 }),
    fc.constantFrom("NaN", "1", "", null, true, [], {}, "Infinity"),
  );

/** Strings with control characters, escapes, bidi overrides and a BOM. */
export const wildString = (): fc.Arbitrary<string> =>
  fc.oneof(
    fc.string({ maxLength: 30 }),
    fc.string({ unit: "binary", maxLength: 30 }),
    fc.constantFrom("\u001b[31mred\u001b[0m", "\u202eevil", "a\nb", "\u0000", "\uFEFFx", "[[[[", "}}", "perfect", "copper"),
  );

export const oneLine = (text: string): boolean => text.length > 0 && !/[\r\n]/.test(text);
