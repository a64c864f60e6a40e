// Lobe words read off the shape itself: the same lobe is "toward the tips" on a shape whose tips lie
// at +y and "away from the tips" on its mirror image (tips at −y); in-plane and out-of-plane maxima;
// the drawing's arrow points where the words say.
import { describe, expect, it } from "vitest";
import { describeLobe, lobeLayout } from "../../generator/analysis/lobeWords.js";
import { polarizationAt } from "../../generator/analysis/patternFigures.js";
import { solveShape, validateShape, type Shape } from "../../generator/em/index.js";
import { shapeSvg } from "../../generator/render/index.js";
import { copy, okEntries } from "../render/fixtures.js";
import { vee } from "../helpers/shapes.js";

const RAD = Math.PI / 180;
type P = [number, number, number];
/** A bent shape with its tips at +y: feed at the origin, arms out along ±x, then bent up. */
const TIPS_UP: P[] = [[-0.5, 0.4, 0], [-0.4, 0.05, 0], [0, 0, 0], [0.4, 0.05, 0], [0.5, 0.4, 0]];
const mirrorY = (pts: P[]): P[] => pts.map(([x, y, z]) => [x, -y, z]);

describe("lobe words from the geometry", () => {
  it("the same direction (+y, in the plane) is toward the tips on one shape and away on its mirror image", () => {
    const up = describeLobe(TIPS_UP, 2, 90 * RAD, 90 * RAD, 90);
    const down = describeLobe(mirrorY(TIPS_UP), 2, 90 * RAD, 90 * RAD, 90);
    expect(up.lobe).toBe("The main lobe points toward the arm tips, along the line from the feed through the middle of the tips, in the plane of the wire (θ 90°, φ 90°).");
    expect(down.lobe).toBe("The main lobe points away from the arm tips, back past the feed, in the plane of the wire (θ 90°, φ 90°).");
  });

  it("mirror-image lobes to the sides are named as twins, and the twin is the mirror of the lobe", () => {
    const g = lobeLayout(mirrorY(TIPS_UP), 2, 90 * RAD, 300 * RAD);
    expect(g.bearingDeg).toBeCloseTo(30, 6); // φ 300° is 30° from −y, where these tips lie
    expect(g.twin![0]).toBeCloseTo(-g.inPlane[0], 9);
    expect(g.twin![1]).toBeCloseTo(g.inPlane[1], 9);
    expect(describeLobe(mirrorY(TIPS_UP), 2, 90 * RAD, 300 * RAD, 90).lobe).toBe(
      "The main lobe points 30° from the line from the feed toward the tips, on the tips' side (two mirror-image lobes, one each side), in the plane of the wire (θ 90°, φ 300°).",
    );
  });

  it("a lobe along the wire plane's normal is out of the plane; one 30° up is still in-plane words", () => {
    expect(describeLobe(TIPS_UP, 2, 0, 0, 0).lobe).toBe("The main lobe points out of the plane of the wire (90° from it; θ 0°, φ 0°), equally to both faces.");
    expect(describeLobe(TIPS_UP, 2, 60 * RAD, 270 * RAD, 90).lobe).toBe(
      "The main lobe points away from the arm tips, back past the feed, 30° out of the plane of the wire (θ 60°, φ 270°).",
    );
  });

  it("a straight wire has no tips side: broadside to the line joining the tips", () => {
    const straight: P[] = [[-0.25, 0, 0], [0, 0, 0], [0.25, 0, 0]];
    expect(describeLobe(straight, 1, 90 * RAD, 90 * RAD, 0).lobe).toBe("The main lobe points broadside to the line joining the tips (θ 90°, φ 90°).");
  });

  it("on solved V shapes with tips either side the words follow the tips, not the axes", () => {
    // a 1.5 λ V, arms 54.3° from its axis (best V, common practice), and the same V turned over
    const shapes: Shape[] = [vee(1.5, 54.3, 1e-3)];
    const w = shapes[0].wires[0];
    shapes.push(validateShape({ ...shapes[0], wires: [{ ...w, pointsM: mirrorY(w.pointsM as P[]) }] }));
    const words = shapes.map((shape) => {
      const s = solveShape(shape);
      const { theta, phi } = s.peakDirectionRad;
      const pts = shape.wires[0].pointsM;
      const g = lobeLayout(pts, 1, theta, phi);
      // the numbers: the lobe's in-plane part against the direction from the feed to the tips' midpoint
      const tipsY = (pts[0][1] + pts[2][1]) / 2;
      expect(Math.sign(g.inPlane[1])).toBe(g.bearingDeg < 90 ? Math.sign(tipsY) : -Math.sign(tipsY));
      return describeLobe(pts, 1, theta, phi, polarizationAt(s.farField, theta, phi).tiltDeg).lobe.replace(/\(θ.*\)/, "");
    });
    expect(words[1]).toBe(words[0]);
  });

  it("the drawing's arrow points the way the words say, for a catalog shape and its mirror image", () => {
    const entry = okEntries().find((e) => e.id === "2m-1.5wl-k3-max-gain") ?? okEntries()[0];
    for (const flip of [false, true]) {
      const e = copy(entry);
      if (flip) {
        e.shape!.pointsM = e.shape!.pointsM.map(([x, y, z]) => [x, -y, z]);
        e.figures!.peakDirection.phiDeg = (360 - e.figures!.peakDirection.phiDeg) % 360;
      }
      const { thetaDeg, phiDeg } = e.figures!.peakDirection;
      const g = lobeLayout(e.shape!.pointsM, e.shape!.feedVertex, thetaDeg * RAD, phiDeg * RAD);
      const line = /data-role="lobe-arrow"><line x1="([-\d.]+)" y1="([-\d.]+)" x2="([-\d.]+)" y2="([-\d.]+)"/.exec(shapeSvg(e))!;
      const [x1, y1, x2, y2] = line.slice(1).map(Number);
      // page y runs down: the arrow's page direction is (x, −y) of the lobe's in-plane direction
      // (+ 0 turns a −0 from rounding into 0: only the side matters)
      expect(Math.sign(Math.round(x2 - x1)) + 0).toBe(Math.sign(Math.round(100 * g.inPlane[0])) + 0);
      expect(Math.sign(Math.round(y1 - y2)) + 0).toBe(Math.sign(Math.round(100 * g.inPlane[1])) + 0);
    }
  });
});
