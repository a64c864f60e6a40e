import { describe, expect, it } from "vitest";
import {
  bendingTemplateSvgs,
  nodesCsv,
  sha256Listing,
  wireDxf,
} from "../../generator/export/index.js";
import { longShape, smallShape, twoWireShape } from "./fixtures.js";

const clone = <T>(value: T): T => structuredClone(value);

describe("byte-identical output", () => {
  it("gives the same bytes for the same input, every writer", () => {
    for (const shape of [smallShape, longShape, twoWireShape]) {
      expect(nodesCsv(clone(shape))).toBe(nodesCsv(clone(shape)));
      expect(wireDxf(clone(shape))).toBe(wireDxf(clone(shape)));
      expect(bendingTemplateSvgs(clone(shape))).toEqual(bendingTemplateSvgs(clone(shape)));
      const files = [
        { name: `${shape.id}.csv`, content: nodesCsv(shape) },
        { name: `${shape.id}.dxf`, content: wireDxf(shape) },
      ];
      expect(sha256Listing(files)).toBe(sha256Listing([...files].reverse()));
    }
  });

  it("leaves its input untouched", () => {
    const shape = clone(longShape);
    nodesCsv(shape);
    wireDxf(shape);
    bendingTemplateSvgs(shape, { grid: true });
    expect(shape).toEqual(longShape);
  });
});

describe("bad input", () => {
  it("throws one line naming the field and the rule", () => {
    const cases: [unknown, RegExp][] = [
      [{ ...smallShape, frequencyHz: 0 }, /^export shape: frequencyHz: must be a positive finite number/],
      [{ ...smallShape, wireDiameterM: Number.NaN }, /^export shape: wireDiameterM: must be a positive/],
      [{ ...smallShape, id: " " }, /^export shape: id: must be a non-empty string/],
      [{ ...smallShape, wires: [] }, /^export shape: wires: must hold at least one wire/],
      [{ ...smallShape, wires: [{ pointsM: [[0, 0, 0]] }] }, /^export shape: wires\[0\]\.pointsM: a wire needs at least 2 points/],
      [{ ...smallShape, wires: [{ pointsM: [[0, 0, 0], [0, Infinity, 0]] }] }, /^export shape: wires\[0\]\.pointsM\[1\]\[1\]: must be a finite number/],
      [{ ...smallShape, wires: [{ pointsM: [[0, 0, 0], [0, 0, 0]] }] }, /^export shape: wires\[0\]\.pointsM\[1\]: must differ/],
      [{ ...smallShape, feedPointM: [0, 0] }, /^export shape: feedPointM: must be \[x, y, z\]/],
    ];
    for (const [shape, message] of cases) {
      for (const write of [nodesCsv, wireDxf, bendingTemplateSvgs]) {
        let error: unknown;
        try {
          write(shape as never);
        } catch (e) {
          error = e;
        }
        expect(error).toBeInstanceOf(Error);
        expect((error as Error).message).toMatch(message);
        expect((error as Error).message).not.toContain("\n");
      }
    }
  });
});
