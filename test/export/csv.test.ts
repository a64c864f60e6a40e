import { describe, expect, it } from "vitest";
import { CSV_COLUMNS, csvField, nodesCsv } from "../../generator/export/index.js";
import { longShape, twoWireShape } from "./fixtures.js";

const rows = (csv: string): string[][] =>
  csv
    .split("\r\n")
    .filter((line) => line !== "")
    .map((line) => line.split(","));

describe("node coordinate CSV", () => {
  it("starts with a header row naming the units", () => {
    const [header] = rows(nodesCsv(twoWireShape));
    expect(header).toEqual([...CSV_COLUMNS]);
    expect(header).toEqual(["wire_index", "vertex_index", "x_m", "y_m", "z_m", "x_in", "y_in", "z_in"]);
  });

  it("has one row per vertex whose metre columns equal the input", () => {
    for (const shape of [twoWireShape, longShape]) {
      const body = rows(nodesCsv(shape)).slice(1);
      const expected = shape.wires.flatMap((w, wi) => w.pointsM.map((p, j) => ({ wi, j, p })));
      expect(body).toHaveLength(expected.length);
      expected.forEach(({ wi, j, p }, k) => {
        const row = body[k];
        expect(row[0]).toBe(String(wi));
        expect(row[1]).toBe(String(j));
        for (let axis = 0; axis < 3; axis++) {
          expect(row[2 + axis]).toMatch(/^-?\d+\.\d{6}$/);
          expect(Math.abs(Number(row[2 + axis]) - p[axis])).toBeLessThanOrEqual(5e-7);
        }
      });
    }
  });

  it("gives inches as metres / 0.0254 (international inch) to 4 decimals", () => {
    const body = rows(nodesCsv(twoWireShape)).slice(1);
    const points = twoWireShape.wires.flatMap((w) => w.pointsM);
    body.forEach((row, k) => {
      for (let axis = 0; axis < 3; axis++) {
        expect(row[5 + axis]).toMatch(/^-?\d+\.\d{4}$/);
        expect(row[5 + axis]).toBe((points[k][axis] / 0.0254).toFixed(4).replace(/^-(0\.0+)$/, "$1"));
      }
    });
    const oneInch = { ...twoWireShape, wires: [{ pointsM: [[0.0254, 1, 0], [0, 0, 0]] as [number, number, number][] }] };
    expect(rows(nodesCsv(oneInch))[1].slice(5)).toEqual(["1.0000", "39.3701", "0.0000"]);
  });

  it("never prints negative zero", () => {
    const shape = { ...twoWireShape, wires: [{ pointsM: [[-1e-9, -0, 0], [1, 0, 0]] as [number, number, number][] }] };
    expect(nodesCsv(shape)).not.toMatch(/-0\.0+(,|\r)/);
  });

  it("ends every line with CRLF", () => {
    const csv = nodesCsv(twoWireShape);
    expect(csv.endsWith("\r\n")).toBe(true);
    expect(csv.replace(/\r\n/g, "")).not.toMatch(/[\r\n]/);
  });

  it("quotes fields only when RFC 4180 requires it", () => {
    expect(csvField("plain")).toBe("plain");
    expect(csvField("a,b")).toBe('"a,b"');
    expect(csvField('say "hi"')).toBe('"say ""hi"""');
    expect(csvField("two\nlines")).toBe('"two\nlines"');
  });
});
