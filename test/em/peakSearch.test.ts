// The peak search against a brute-force search on a 1° grid (the grid maximum is a lower bound of
// the true maximum, so our search must reach it), on every committed catalog entry and on shapes
// laid out off the usual axes; the symmetry planes it uses, derived from the geometry; the warm
// start from a nominal shape's maxima on its bent copies.
import { describe, expect, it } from "vitest";
import { perturbShape, DEFAULT_TOLERANCE } from "../../generator/analysis/tolerance.js";
import { intensityAt, solveShape, validateShape, type FarFieldPlan, type Shape } from "../../generator/em/index.js";
import { DEFAULT_PEAK_OPTIONS, findPeak } from "../../generator/em/pattern.js";
import { symmetryPlanes } from "../../generator/em/patternSymmetry.js";
import { createRng } from "../../generator/optimize/rng.js";
import { shapeFileOf } from "../../generator/site/downloads.js";
import { isOk } from "../../generator/site/ok.js";
import { readEntries } from "../site/entries.js";
import { vee } from "../helpers/shapes.js";

const RAD = Math.PI / 180;
const db = (u: number) => 10 * Math.log10(u);

/** Largest U on a 1° grid over θ ∈ [0°, θmax], φ ∈ [φ0, φ1], and where it lies (degrees). */
function bruteForce(plan: FarFieldPlan, thetaMaxDeg: number, phi0Deg = 0, phi1Deg = 359): { u: number; t: number; p: number } {
  const scratch = new Float64Array(4);
  let best = { u: 0, t: 0, p: 0 };
  for (let t = 0; t <= thetaMaxDeg; t++) for (let p = phi0Deg; p <= phi1Deg; p++) {
    const u = intensityAt(plan, t * RAD, p * RAD, scratch);
    if (u > best.u) best = { u, t, p };
  }
  return best;
}
const bruteForceMax = (plan: FarFieldPlan, thetaMaxDeg: number) => bruteForce(plan, thetaMaxDeg).u;

/** Rotates every point of a shape by the rotation matrix r (rows). */
function rotated(shape: Shape, r: number[][]): Shape {
  const rot = (p: number[]) => r.map((row) => row[0] * p[0] + row[1] * p[1] + row[2] * p[2]) as [number, number, number];
  return validateShape({ ...shape, wires: shape.wires.map((w) => ({ ...w, pointsM: w.pointsM.map(rot) })) });
}

describe("peak search against a 1° brute-force search", () => {
  it("reaches the brute-force peak gain on every committed entry", () => {
    // free-space entries: an entry over the ground is checked against a 1° search over the ground
    // (test/catalog/groundEntry.test.ts)
    const entries = readEntries().filter(isOk).filter((e) => e.inputs.overGround === undefined);
    expect(entries.length).toBeGreaterThan(0);
    let worstShortfallDb = 0;
    for (const entry of entries) {
      const s = solveShape(validateShape(shapeFileOf(entry)));
      // every catalog shape lies in the x–y plane, where |E| mirrors about it (physics, see
      // patternSymmetry.ts): the upper hemisphere holds the maximum
      expect(s.farField.planarXy).toBe(true);
      // its mirror about the y–z plane (rounded stored coordinates leave ~1e-4 of asymmetry) is
      // checked on two rings before the scan uses it: φ ∈ [90°, 270°], then the 3×3 cells around
      // the mirror image of the best cell, where the other half's maximum lies
      const ours = findPeak(s.farField).intensityWPerSr;
      const scratch = new Float64Array(4);
      if (entry.family === "off-centre") {
        // an off-centre-fed shape has no mirror: scan the whole upper hemisphere
        worstShortfallDb = Math.max(worstShortfallDb, db(bruteForce(s.farField, 90).u) - db(ours));
        continue;
      }
      for (const t of [45, 90]) for (let p = 0; p < 360; p += 7) {
        const a = intensityAt(s.farField, t * RAD, p * RAD, scratch), b = intensityAt(s.farField, t * RAD, (180 - p) * RAD, scratch);
        expect(Math.abs(a - b) / ours).toBeLessThan(1e-3);
      }
      const half = bruteForce(s.farField, 90, 90, 270);
      let brute = half.u;
      for (let dt = -1; dt <= 1; dt++) for (let dp = -1; dp <= 1; dp++) {
        brute = Math.max(brute, intensityAt(s.farField, Math.min(90, half.t + dt) * RAD, (180 - half.p + dp) * RAD, scratch));
      }
      const shortfallDb = db(brute) - db(ours);
      worstShortfallDb = Math.max(worstShortfallDb, shortfallDb);
    }
    expect(worstShortfallDb).toBeLessThan(1e-3);
  }, 120_000);

  it("finds the in-plane maximum of a V laid in a tilted plane (no x–y shortcut, full sphere)", () => {
    // a 1 λ V: its lobe lies in the wire plane, which here is turned 30° about x and 20° about z
    const a = 30 * RAD, b = 20 * RAD;
    const rx = [[1, 0, 0], [0, Math.cos(a), -Math.sin(a)], [0, Math.sin(a), Math.cos(a)]];
    const rz = [[Math.cos(b), -Math.sin(b), 0], [Math.sin(b), Math.cos(b), 0], [0, 0, 1]];
    const r = rz.map((row) => [0, 1, 2].map((j) => row[0] * rx[0][j] + row[1] * rx[1][j] + row[2] * rx[2][j]));
    const s = solveShape(rotated(vee(1, 70, 1e-3), r));
    expect(s.farField.planarXy).toBe(false);
    const peak = findPeak(s.farField);
    expect(db(bruteForceMax(s.farField, 180)) - db(peak.intensityWPerSr)).toBeLessThan(1e-3);
    // the planes it searched are the rotated wire plane (normal r·ẑ) and mirror plane (normal r·x̂)
    const normalOf = (kind: string) => peak.planes.find((p) => p.kind === kind)!.normal;
    const dotAbs = (n: number[], c: number) => Math.abs(n[0] * r[0][c] + n[1] * r[1][c] + n[2] * r[2][c]);
    expect(dotAbs(normalOf("wire"), 2)).toBeCloseTo(1, 9);
    expect(dotAbs(normalOf("mirror"), 0)).toBeCloseTo(1, 9);
  });
});

describe("symmetry planes from the geometry", () => {
  it("a V in the x–y plane: its wire plane (z) and its mirror plane (x)", () => {
    const planes = symmetryPlanes(solveShape(vee(1.5, 54.3, 1e-3)).farField);
    expect(planes.map((p) => [p.kind, p.normal.map((x) => Math.round(Math.abs(x)))])).toEqual(
      expect.arrayContaining([["wire", [0, 0, 1]], ["mirror", [1, 0, 0]]]),
    );
    expect(planes).toHaveLength(2);
  });

  it("no mirror plane when the feed sits off-centre (currents no longer mirror)", () => {
    const s = solveShape(validateShape({
      frequencyHz: vee(1, 60, 1e-3).frequencyHz, wireRadiusM: 1e-3,
      wires: [{ pointsM: [[-0.433, 0.25, 0], [-0.2, 0.1155, 0], [0, 0, 0], [0.2, 0.1155, 0], [0.433, 0.25, 0]] }], feed: { wire: 0, vertex: 1 },
    }));
    expect(symmetryPlanes(s.farField).map((p) => p.kind)).toEqual(["wire"]);
  });
});

describe("warm-started peak search on bent copies", () => {
  it("finds the same peak as a full search from the nominal maxima, for fewer evaluations", () => {
    const entry = readEntries().filter(isOk).find((e) => e.id === "2m-1.5wl-k3-max-gain") ?? readEntries().filter(isOk)[0];
    const shape = validateShape(shapeFileOf(entry));
    const starts = findPeak(solveShape(shape).farField).maxima;
    const rng = createRng(1);
    let full = 0, warm = 0;
    for (let i = 0; i < 16; i++) {
      const s = solveShape(perturbShape(shape, rng, DEFAULT_TOLERANCE));
      const a = findPeak(s.farField), b = findPeak(s.farField, { ...DEFAULT_PEAK_OPTIONS, starts });
      expect(db(a.intensityWPerSr) - db(b.intensityWPerSr)).toBeLessThan(1e-4);
      full += a.evaluations;
      warm += b.evaluations;
    }
    expect(warm).toBeLessThan(full / 2);
  });
});
