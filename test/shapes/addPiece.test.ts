// One more piece per arm with a 0° bend is the same wire (plane geometry: a straight piece cut in
// two is still straight), so a search or polish started there can only improve on the shape with
// fewer pieces; and the off-centre starts of a catalog cell (generator/catalog/computeOffCentre.ts).
import { describe, expect, it } from "vitest";
import { offCentreStarts } from "../../generator/catalog/computeOffCentre.js";
import { addPiece, unpack, wirePointsM } from "../../generator/shapes/bentArm.js";
import { addPieceOffCentre, offCentrePointsM, unpackOffCentre } from "../../generator/shapes/offCentre.js";

/** The polyline's vertices with the collinear ones (0° bends) dropped. */
function corners(points: number[][]): number[][] {
  return points.filter((p, i) => {
    if (i === 0 || i === points.length - 1) return true;
    const a = points[i - 1], b = points[i + 1];
    const cross = (p[0] - a[0]) * (b[1] - a[1]) - (p[1] - a[1]) * (b[0] - a[0]);
    return Math.abs(cross) > 1e-12;
  });
}

describe("one more piece per arm", () => {
  it("mirror family: the same corners, one more vertex per arm", () => {
    const x = [0.6, 0.3, -0.2, 0.3, 0.25]; // K = 3
    const spec = { piecesPerArm: 3, wireLengthM: 2 };
    const a = wirePointsM(unpack(x, 3), spec);
    const b = wirePointsM(unpack(addPiece(x, 3), 4), { ...spec, piecesPerArm: 4 });
    expect(b).toHaveLength(a.length + 2);
    const cb = corners(b);
    expect(cb).toHaveLength(a.length);
    cb.forEach((p, i) => p.forEach((v, j) => expect(v).toBeCloseTo(a[i][j], 12)));
  });
  it("off-centre family: each arm's last piece split, the same corners", () => {
    // K = 2: [t, φ1, βR, uR, βL, uL], arms of 0.35·2 m and 0.65·2 m
    const x = [0.35, 0.7, 0.4, 0.55, -0.3, 0.4];
    const spec = { piecesPerArm: 2, wireLengthM: 2 };
    const a = offCentrePointsM(unpackOffCentre(x, 2), spec);
    const y = addPieceOffCentre(x, 2);
    expect(y).toHaveLength(4 * 3 - 2);
    const b = offCentrePointsM(unpackOffCentre(y, 3), { ...spec, piecesPerArm: 3 });
    expect(b).toHaveLength(a.length + 2);
    const cb = corners(b);
    expect(cb).toHaveLength(a.length);
    cb.forEach((p, i) => p.forEach((v, j) => expect(v).toBeCloseTo(a[i][j], 12)));
  });
});

describe("off-centre starts of a direct-feed cell", () => {
  const own = { status: "ok" as const, x: [0.3, 0.7, 0.1, 0.5, 0.1, 0.5], gainDbi: 5, evaluations: 1 };
  const previous = { status: "ok" as const, x: [0.3, 0.7], gainDbi: 5.4, evaluations: 1 };
  it("the K − 1 shape competes only when it found more gain", () => {
    expect(offCentreStarts([own], [previous], 2).map((s) => s.gainDbi)).toEqual([5, 5.4]);
    expect(offCentreStarts([own], [{ ...previous, gainDbi: 4.9 }], 2).map((s) => s.gainDbi)).toEqual([5]);
    expect(offCentreStarts([own], [], 2)).toHaveLength(1);
    expect(offCentreStarts([{ ...own, gainDbi: null }], [previous], 2).map((s) => s.x.length)).toEqual([6, 6]);
  });
  it("both own searches start a polish; a K − 1 shape only when it beat the better of them", () => {
    const broad = { ...own, x: [0.2, 0.6, 0.1, 0.4, 0.1, 0.4], gainDbi: 5.6 };
    expect(offCentreStarts([own, broad], [previous], 2).map((s) => s.gainDbi)).toEqual([5, 5.6]);
    expect(offCentreStarts([own, broad], [previous, { ...previous, gainDbi: 5.7 }], 2).map((s) => s.gainDbi)).toEqual([5, 5.6, 5.7]);
  });
});
