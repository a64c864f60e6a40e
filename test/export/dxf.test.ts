import DxfParser from "dxf-parser";
import { describe, expect, it } from "vitest";
import { wireDxf } from "../../generator/export/index.js";
import { longShape, twoWireShape } from "./fixtures.js";

interface Vertex {
  x: number;
  y: number;
  z: number;
}

describe("DXF drawing", () => {
  it("parses with dxf-parser, one WIRE polyline per wire with vertices equal to the input in mm", () => {
    for (const shape of [twoWireShape, longShape]) {
      const dxf = new DxfParser().parseSync(wireDxf(shape));
      expect(dxf).not.toBeNull();
      const polylines = dxf!.entities.filter((e) => e.type === "POLYLINE");
      expect(polylines).toHaveLength(shape.wires.length);
      polylines.forEach((entity, w) => {
        expect(entity.layer).toBe("WIRE");
        const vertices = (entity as unknown as { vertices: Vertex[] }).vertices;
        expect(vertices).toHaveLength(shape.wires[w].pointsM.length);
        vertices.forEach((v, j) => {
          const [x, y, z] = shape.wires[w].pointsM[j];
          expect(Math.abs(v.x - x * 1000)).toBeLessThanOrEqual(1e-6);
          expect(Math.abs(v.y - y * 1000)).toBeLessThanOrEqual(1e-6);
          expect(Math.abs(v.z - z * 1000)).toBeLessThanOrEqual(1e-6);
        });
      });
    }
  });

  it("marks the feed with a POINT and a CIRCLE on layer FEED", () => {
    const shape = { ...twoWireShape, feedPointM: [0.001, -0.002, 0] as [number, number, number] };
    const dxf = new DxfParser().parseSync(wireDxf(shape))!;
    const feed = dxf.entities.filter((e) => e.layer === "FEED");
    expect(feed.map((e) => e.type).sort()).toEqual(["CIRCLE", "POINT"]);
    const point = feed.find((e) => e.type === "POINT") as unknown as { position: Vertex };
    expect(point.position).toEqual({ x: 1, y: -2, z: 0 });
    const circle = feed.find((e) => e.type === "CIRCLE") as unknown as { center: Vertex; radius: number };
    expect(circle.center).toEqual({ x: 1, y: -2, z: 0 });
    expect(circle.radius).toBeGreaterThan(0);
  });

  it("declares millimetres in the header and both layers in the layer table", () => {
    const dxf = new DxfParser().parseSync(wireDxf(twoWireShape))!;
    expect(dxf.header.$INSUNITS).toBe(4);
    const layers = (dxf.tables as unknown as { layer: { layers: Record<string, unknown> } }).layer.layers;
    expect(Object.keys(layers).sort()).toEqual(["FEED", "WIRE"]);
  });

  it("uses \\n line ends, fixed 6-decimal coordinates and ends with EOF", () => {
    const text = wireDxf(twoWireShape);
    expect(text).not.toContain("\r");
    expect(text.endsWith("  0\nEOF\n")).toBe(true);
    const lines = text.split("\n");
    for (let i = 0; i + 1 < lines.length; i += 2) {
      const code = Number(lines[i]);
      if (code >= 10 && code <= 40) expect(lines[i + 1]).toMatch(/^-?\d+\.\d{6}$/);
    }
  });
});
