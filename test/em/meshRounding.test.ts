// Segment counts that do not depend on how the coordinates were rounded (generator/em/mesh.ts):
// a piece that is a whole number of segments long must mesh the same from the exact shape, from
// the entry (7 significant digits, catalog/hash.ts) and from the coordinate table (1 µm, export/csv.ts).
import { describe, expect, it } from "vitest";
import { buildMesh, validateShape, type Vec3 } from "../../generator/em/index.js";
import { pieceSegmentCount } from "../../generator/em/mesh.js";
import { roundSignificant } from "../../generator/catalog/hash.js";
import { createRng } from "../../generator/optimize/rng.js";
import { SPEED_OF_LIGHT_M_PER_S } from "../../generator/units.js";

const roundMicrometre = (v: number) => Math.round(v * 1e6) / 1e6;

describe("segment counts under rounding", () => {
  it("the old case: 10m-2wl-k1-max-gain, two pieces of exactly 1 λ, read back from its entry", () => {
    // the entry's coordinates as committed with solver 1 (7 significant digits, 28.85 MHz); each
    // piece is 25.0000005 segments long at 25 per λ, so a plain ⌈x⌉ gave 26 segments where the
    // exact 1 λ piece had 25 (1416.4 − j2028.0 Ω from the shape file, 1425.1 − j2030.9 Ω published)
    const entry = { inputs: { frequencyHz: 28.85e6 } };
    const lambdaM = SPEED_OF_LIGHT_M_PER_S / entry.inputs.frequencyHz;
    const p: Vec3[] = [[-7.289224, 7.405999, 0], [0, 0, 0], [7.289224, 7.405999, 0]];
    const len = Math.hypot(p[1][0] - p[0][0], p[1][1] - p[0][1], p[1][2] - p[0][2]);
    expect(Math.ceil((len * 25) / lambdaM)).toBe(26); // the rule this replaces
    expect(pieceSegmentCount(len, 25, lambdaM)).toBe(25);
    expect(pieceSegmentCount(lambdaM, 25, lambdaM)).toBe(25); // the exact piece
    const shape = (pts: Vec3[]) => validateShape({ frequencyHz: entry.inputs.frequencyHz, wireRadiusM: 0.00125, wires: [{ pointsM: pts }], feed: { wire: 0, vertex: 1 } });
    expect(buildMesh(shape(p)).segmentCount).toBe(50);
  });

  it("whole-segment pieces keep their count after 7-digit and 1 µm rounding (seeded, 2000 pieces)", () => {
    const rng = createRng(7);
    for (let i = 0; i < 2000; i++) {
      const lambdaM = 0.1 + 20 * rng.uniform(); // 2.4 GHz to 15 MHz-ish
      const spw = [25, 50, 100, 200][i % 4];
      const n = 3 + Math.floor(rng.uniform() * (spw * 1.25 - 3)); // up to a 1.25 λ piece
      const len = (n * lambdaM) / spw;
      const heading = 2 * Math.PI * rng.uniform();
      const a: Vec3 = [lambdaM * (rng.uniform() - 0.5), lambdaM * (rng.uniform() - 0.5), 0];
      const b: Vec3 = [a[0] + len * Math.sin(heading), a[1] + len * Math.cos(heading), 0];
      for (const round of [roundSignificant, roundMicrometre]) {
        if (round === roundMicrometre && len < 5e-3) continue; // 1 µm is the table's precision
        const ra = a.map((c) => round(c)), rb = b.map((c) => round(c));
        const rl = Math.hypot(rb[0] - ra[0], rb[1] - ra[1]);
        expect(pieceSegmentCount(rl, spw, lambdaM)).toBe(n);
      }
    }
  });

  it("a piece clearly longer than a whole number of segments still gets one more", () => {
    expect(pieceSegmentCount(1.01, 25, 1)).toBe(26);
    expect(pieceSegmentCount(0.05, 25, 1)).toBe(3); // at least 3 per piece
  });
});
