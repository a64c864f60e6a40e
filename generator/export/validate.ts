// Checks an ExportShape before any writer uses it. Every failure is one line naming the field and
// the rule it breaks (an InputError), so the caller can print it as is.
import { InputError, shown } from "../errors.js";
import type { ExportShape, PointM } from "./types.js";

function fail(field: string, rule: string, value?: unknown): never {
  const got = value === undefined ? "" : ` (got ${shown(value)})`;
  throw new InputError(`export shape: ${field}: ${rule}${got}`);
}

function checkPoint(field: string, point: unknown): asserts point is PointM {
  if (!Array.isArray(point) || point.length !== 3) fail(field, "must be [x, y, z] in metres");
  point.forEach((v, axis) => {
    if (typeof v !== "number" || !Number.isFinite(v)) {
      fail(`${field}[${axis}]`, "must be a finite number", v);
    }
  });
}

/** Throws an InputError unless `shape` is a usable ExportShape. */
export function assertExportShape(shape: ExportShape): void {
  if (typeof shape !== "object" || shape === null) fail("shape", "must be an object");
  if (typeof shape.id !== "string" || shape.id.trim() === "") {
    fail("id", "must be a non-empty string", shape.id);
  }
  if (typeof shape.title !== "string") fail("title", "must be a string", shape.title);
  if (typeof shape.frequencyHz !== "number" || !(shape.frequencyHz > 0 && Number.isFinite(shape.frequencyHz))) {
    fail("frequencyHz", "must be a positive finite number", shape.frequencyHz);
  }
  if (typeof shape.wireDiameterM !== "number" || !(shape.wireDiameterM > 0 && Number.isFinite(shape.wireDiameterM))) {
    fail("wireDiameterM", "must be a positive finite number", shape.wireDiameterM);
  }
  if (!Array.isArray(shape.wires) || shape.wires.length === 0) {
    fail("wires", "must hold at least one wire");
  }
  shape.wires.forEach((wire, w) => {
    const points: unknown = wire?.pointsM;
    if (!Array.isArray(points) || points.length < 2) {
      fail(`wires[${w}].pointsM`, "a wire needs at least 2 points");
    }
    points.forEach((p: unknown, j: number) => checkPoint(`wires[${w}].pointsM[${j}]`, p));
    for (let j = 1; j < points.length; j++) {
      const a = points[j - 1] as PointM;
      const b = points[j] as PointM;
      if (!(Math.hypot(b[0] - a[0], b[1] - a[1], b[2] - a[2]) > 0)) {
        fail(`wires[${w}].pointsM[${j}]`, "must differ from the point before it (zero-length piece)");
      }
    }
  });
  checkPoint("feedPointM", shape.feedPointM);
}

/** Throws unless every point lies in the x–y plane (z = 0), as a flat bending template needs. */
export function assertFlatInXY(shape: ExportShape): void {
  const toleranceM = 1e-9;
  shape.wires.forEach((wire, w) =>
    wire.pointsM.forEach((p, j) => {
      if (Math.abs(p[2]) > toleranceM) {
        fail(`wires[${w}].pointsM[${j}][2]`, "must be 0: a flat bending template needs the wire in the x-y plane", p[2]);
      }
    }),
  );
  if (Math.abs(shape.feedPointM[2]) > toleranceM) {
    fail("feedPointM[2]", "must be 0: a flat bending template needs the feed in the x-y plane", shape.feedPointM[2]);
  }
}
