// The faster paths over ground against the plain ones they replace:
// - the image coupling filled once per mirror orbit of segment pairs equals the image coupling of
//   every pair: the image in z = 0 commutes with the y–z mirror, so Z^img(P m, P n) = σm σn Z^img(m, n)
//   (Balanis, Antenna Theory, 3rd ed., §4.7, image theory; Harrington, Field Computation by Moment
//   Methods, 1968, on symmetric structures);
// - a level shape's image field −e^{−j2kh cosθ} E_direct equals the field of its own mirrored plan
//   (the same image theory, the phase of a point 2h lower);
// - the peak search with the azimuth grid folded by a vertical symmetry plane finds the peak the
//   unfolded search finds (the same value; the direction itself or its mirror image).
import { describe, expect, it } from "vitest";
import { shapeOf } from "../../generator/design/objective.js";
import { parseDesignRequest } from "../../generator/design/request.js";
import { createComplexMatrix } from "../../generator/em/complexLu.js";
import { GROUND_PRESETS, imageFactor } from "../../generator/em/ground.js";
import { createGroundFarField, groundFieldAt } from "../../generator/em/groundFarField.js";
import { addImageCoupling } from "../../generator/em/groundImage.js";
import { findGroundPeak } from "../../generator/em/groundPattern.js";
import { detectMirrorSymmetry } from "../../generator/em/mirrorSymmetry.js";
import { solveFeed } from "../../generator/em/solve.js";
import { DEFAULT_PEAK_OPTIONS } from "../../generator/em/pattern.js";
import type { Ground } from "../../generator/em/ground.js";

const base = { frequencyHz: 14.1e6, lengthWl: 1.5, piecesPerArm: 3, wireDiameterM: 2e-3 };
const x = [1.183, -0.528, 0.693, 0.092, 0.427];
const mounted = (ground: Ground, mounting: "horizontal" | "vertical") =>
  shapeOf(x, parseDesignRequest({ ...base, ground, heightM: mounting === "horizontal" ? 10.6 : 3, mounting }));
const k = (2 * Math.PI * base.frequencyHz) / 299_792_458;

describe("over ground, the symmetric shortcuts give the plain results", () => {
  for (const mounting of ["horizontal", "vertical"] as const) {
    for (const [name, ground] of [["perfect", { type: "perfect" }], ["average", GROUND_PRESETS.average]] as [string, Ground][]) {
      it(`${mounting} bent wire over ${name} ground: the image fill per mirror orbit equals the fill of every pair (1e-12)`, () => {
        const shape = mounted(ground, mounting);
        const mesh = solveFeed(shape).mesh;
        const sym = detectMirrorSymmetry(mesh);
        expect(sym).not.toBeNull();
        const factor = imageFactor(ground, base.frequencyHz);
        const a = createComplexMatrix(mesh.unknowns), b = createComplexMatrix(mesh.unknowns);
        addImageCoupling(a, mesh, k, factor, undefined, sym);
        addImageCoupling(b, mesh, k, factor, undefined, null);
        let d = 0, m = 0;
        for (let i = 0; i < a.re.length; i++) {
          d = Math.max(d, Math.hypot(a.re[i] - b.re[i], a.im[i] - b.im[i]));
          m = Math.max(m, Math.hypot(b.re[i], b.im[i]));
        }
        expect(m).toBeGreaterThan(0);
        expect(d / m).toBeLessThan(1e-12);
      });
    }
  }

  it("a level shape's image field from the phase shortcut equals its mirrored plan's (1e-12), over average ground", () => {
    const shape = mounted(GROUND_PRESETS.average, "horizontal");
    const s = solveFeed(shape);
    const fast = createGroundFarField(s.mesh, s.currentRe, s.currentIm, k, GROUND_PRESETS.average, base.frequencyHz);
    const plain = createGroundFarField(s.mesh, s.currentRe, s.currentIm, k, GROUND_PRESETS.average, base.frequencyHz, false);
    expect(fast.levelHeightM).toBeCloseTo(10.6, 9);
    expect(fast.image).toBeNull();
    expect(plain.image).not.toBeNull();
    const a = new Float64Array(4), b = new Float64Array(4);
    for (const [t, p] of [[0.1, 0.3], [0.7, 1.9], [1.2, 4.0], [1.55, 5.5]]) {
      groundFieldAt(fast, t, p, a);
      groundFieldAt(plain, t, p, b);
      const scale = Math.hypot(...b);
      expect(scale).toBeGreaterThan(0);
      expect(Math.hypot(a[0] - b[0], a[1] - b[1], a[2] - b[2], a[3] - b[3]) / scale).toBeLessThan(1e-12);
    }
    // a vertical mounting is not level: it keeps the image's own plan
    const v = solveFeed(mounted({ type: "perfect" }, "vertical"));
    expect(createGroundFarField(v.mesh, v.currentRe, v.currentIm, k, { type: "perfect" }, base.frequencyHz).image).not.toBeNull();
  });

  for (const mounting of ["horizontal", "vertical"] as const) {
    for (const window of [[0, Math.PI / 2], [(5 * Math.PI) / 180, (25 * Math.PI) / 180], [Math.PI / 3, Math.PI / 2]] as [number, number][]) {
      it(`${mounting}, elevations ${window.map((w) => ((w * 180) / Math.PI).toFixed(0)).join("–")}°: the folded peak search finds the unfolded one's peak`, () => {
        const s = solveFeed(mounted(GROUND_PRESETS.average, mounting));
        const g = createGroundFarField(s.mesh, s.currentRe, s.currentIm, k, GROUND_PRESETS.average, base.frequencyHz);
        const folded = findGroundPeak(g, DEFAULT_PEAK_OPTIONS, window);
        const plain = findGroundPeak(g, DEFAULT_PEAK_OPTIONS, window, false);
        expect(Math.abs(folded.intensityWPerSr - plain.intensityWPerSr) / plain.intensityWPerSr).toBeLessThan(1e-6);
        expect(Math.abs(folded.elevationRad - plain.elevationRad)).toBeLessThan(1e-3);
        // the same azimuth or its mirror image about the x = 0 plane (π − φ) or the wire plane (−φ)
        const wrap = (a: number) => Math.abs(Math.atan2(Math.sin(a), Math.cos(a)));
        const az = folded.azimuthRad, pz = plain.azimuthRad;
        const gap = Math.min(wrap(az - pz), wrap(Math.PI - az - pz), wrap(-az - pz), wrap(Math.PI + az - pz));
        if (folded.elevationRad < Math.PI / 2 - 1e-9) expect(gap).toBeLessThan(1e-3);
      });
    }
  }
});
