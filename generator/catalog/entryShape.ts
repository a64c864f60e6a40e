// The entry's shape data for either family. A centre-fed shape has mirror-image arms, so one arm's
// pieces and bends describe it. An off-centre-fed one (shapes/offCentre.ts) has two different arms:
// `offCentre` holds each arm from the feed outward and where the feed sits, as a distance from the
// left tip (the first point) and as a fraction of the wire; the mirror-arm fields then describe the
// right (longer) arm, so readers that know nothing of the family still get one true arm.
import type { DesignRequest } from "../design/request.js";
import type { Vec3 } from "../em/index.js";
import { pieceLengthsM, unpack, wirePointsM } from "../shapes/bentArm.js";
import { armLengthsM, armPieceLengthsM, offCentrePointsM, unpackOffCentre } from "../shapes/offCentre.js";
import { DEG_PER_RAD, wavelengthM } from "../units.js";
import type { Family } from "./computeOffCentre.js";

export interface ArmData {
  lengthM: number;
  pieceLengthsM: number[];
  bendAnglesDeg: number[];
}

export interface ShapeData {
  pointsM: Vec3[];
  feedVertex: number;
  pieceLengthsM: number[];
  firstAngleDeg: number;
  bendAnglesDeg: number[];
  spanM: { x: number; y: number };
  offCentre?: {
    feedFromTipM: number;
    feedFraction: number;
    halfApexDeg: number;
    left: ArmData;
    right: ArmData;
  };
}

const span = (points: Vec3[]) => {
  const xs = points.map((q) => q[0]), ys = points.map((q) => q[1]);
  return { x: Math.max(...xs) - Math.min(...xs), y: Math.max(...ys) - Math.min(...ys) };
};

export function shapeData(x: readonly number[], request: DesignRequest, family: Family = "centre-fed"): ShapeData {
  const spec = { piecesPerArm: request.piecesPerArm, wireLengthM: request.lengthWl * wavelengthM(request.frequencyHz) };
  if (family === "off-centre") {
    const p = unpackOffCentre(x, request.piecesPerArm);
    const points = offCentrePointsM(p, spec);
    const { leftM, rightM } = armLengthsM(p, spec);
    const arm = (a: typeof p.left, lengthM: number): ArmData => ({ lengthM, pieceLengthsM: armPieceLengthsM(a, lengthM), bendAnglesDeg: a.bendAnglesRad.map((b) => b * DEG_PER_RAD) });
    const right = arm(p.right, rightM);
    return {
      pointsM: points,
      feedVertex: request.piecesPerArm,
      pieceLengthsM: right.pieceLengthsM,
      firstAngleDeg: p.halfApexRad * DEG_PER_RAD,
      bendAnglesDeg: right.bendAnglesDeg,
      spanM: span(points),
      offCentre: { feedFromTipM: leftM, feedFraction: p.feedFraction, halfApexDeg: p.halfApexRad * DEG_PER_RAD, left: arm(p.left, leftM), right },
    };
  }
  const params = unpack(x, request.piecesPerArm);
  const points = wirePointsM(params, spec);
  return {
    pointsM: points,
    feedVertex: request.piecesPerArm,
    pieceLengthsM: pieceLengthsM(params, spec),
    firstAngleDeg: params.firstAngleRad * DEG_PER_RAD,
    bendAnglesDeg: params.bendAnglesRad.map((b) => b * DEG_PER_RAD),
    spanM: span(points),
  };
}
