// ASCII DXF drawing of the wire in millimetres: a minimal R12-style subset that common CAD and
// laser/plotter tools read. Each wire is a 3D POLYLINE (VERTEX ... SEQEND) on layer "WIRE"; the feed
// is a POINT plus a small CIRCLE on layer "FEED". Fixed 6 decimals, "\n" line ends.
import { fixed } from "./format.js";
import type { ExportShape } from "./types.js";
import { assertExportShape } from "./validate.js";

/** Radius of the circle drawn around the feed point, mm (a marker only, not geometry). */
export const DXF_FEED_MARK_RADIUS_MM = 2;

const MM_PER_M = 1000;
const DECIMALS = 6;

/** Collects group-code / value pairs, group codes right-aligned to three places. */
class GroupWriter {
  private readonly lines: string[] = [];

  put(code: number, value: string | number): this {
    this.lines.push(String(code).padStart(3, " "));
    this.lines.push(typeof value === "number" ? fixed(value, DECIMALS) : value);
    return this;
  }

  int(code: number, value: number): this {
    return this.put(code, String(Math.trunc(value)));
  }

  point(x: number, y: number, z: number, base = 10): this {
    return this.put(base, x).put(base + 10, y).put(base + 20, z);
  }

  text(): string {
    return this.lines.join("\n") + "\n";
  }
}

function header(out: GroupWriter): void {
  out.put(0, "SECTION").put(2, "HEADER");
  out.put(9, "$ACADVER").put(1, "AC1009");
  out.put(9, "$INSUNITS").int(70, 4); // 4 = millimetres
  out.put(0, "ENDSEC");
}

function tables(out: GroupWriter): void {
  out.put(0, "SECTION").put(2, "TABLES");
  out.put(0, "TABLE").put(2, "LTYPE").int(70, 1);
  out.put(0, "LTYPE").put(2, "CONTINUOUS").int(70, 0).put(3, "Solid line");
  out.int(72, 65).int(73, 0).put(40, 0);
  out.put(0, "ENDTAB");
  out.put(0, "TABLE").put(2, "LAYER").int(70, 2);
  for (const [name, colour] of [["WIRE", 7], ["FEED", 1]] as const) {
    out.put(0, "LAYER").put(2, name).int(70, 0).int(62, colour).put(6, "CONTINUOUS");
  }
  out.put(0, "ENDTAB");
  out.put(0, "ENDSEC");
}

function entities(out: GroupWriter, shape: ExportShape): void {
  out.put(0, "SECTION").put(2, "ENTITIES");
  for (const wire of shape.wires) {
    // 66 = 1: vertices follow; 70 = 8: 3D polyline (keeps z).
    out.put(0, "POLYLINE").put(8, "WIRE").int(66, 1).point(0, 0, 0).int(70, 8);
    for (const [x, y, z] of wire.pointsM) {
      out.put(0, "VERTEX").put(8, "WIRE");
      out.point(x * MM_PER_M, y * MM_PER_M, z * MM_PER_M).int(70, 32); // 32 = 3D polyline vertex
    }
    out.put(0, "SEQEND").put(8, "WIRE");
  }
  const [fx, fy, fz] = shape.feedPointM.map((m) => m * MM_PER_M);
  out.put(0, "POINT").put(8, "FEED").point(fx, fy, fz);
  out.put(0, "CIRCLE").put(8, "FEED").point(fx, fy, fz).put(40, DXF_FEED_MARK_RADIUS_MM);
  out.put(0, "ENDSEC");
}

/** The whole DXF file as text. Coordinates are the input's, converted to millimetres. */
export function wireDxf(shape: ExportShape): string {
  assertExportShape(shape);
  const out = new GroupWriter();
  header(out);
  tables(out);
  entities(out, shape);
  out.put(0, "EOF");
  return out.text();
}
