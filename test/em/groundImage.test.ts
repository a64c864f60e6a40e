// Perfect ground by image theory. Sources beside each check:
// - Balanis, Antenna Theory, 3rd ed., §4.7 (image theory): a shape over a perfect ground plane is
//   the shape plus its mirror image in free space, horizontal image currents reversed, vertical
//   ones not; so the ground solve must equal the free-space solve of the pair fed accordingly.
// - Balanis §8.6 (mutual impedance of side-by-side parallel half-wave dipoles, induced-EMF method,
//   eqs. 8-71a/b; equation numbers from memory): a horizontal dipole at height h sees its image at
//   spacing 2h carrying the opposite current, Z_in = Z11 − Z12(2h).
import { describe, expect, it } from "vitest";
import { buildMesh, fillImpedance, solveComplex, solveFeed, solveShape, validateShape } from "../../generator/em/index.js";
import { ETA0_OHM } from "../../generator/units.js";
import { feedGapM, gapCurrent, gapExcitation } from "../../generator/em/feedSource.js";
import { ONE_METRE_WAVELENGTH_HZ as F } from "../helpers/shapes.js";
import { sineCosineIntegrals } from "../../generator/validation/inducedEmf.js";

const horizontal = (h: number, a: number, ground = true) =>
  validateShape({
    frequencyHz: F, wireRadiusM: a, segmentsPerWavelength: 200,
    wires: [{ pointsM: [[-0.25, 0, h], [0, 0, h], [0.25, 0, h]] }], feed: { wire: 0, vertex: 1 },
    ...(ground ? { ground: { type: "perfect" as const } } : {}),
  });
const vertical = (centreM: number, a: number) =>
  validateShape({
    frequencyHz: F, wireRadiusM: a, segmentsPerWavelength: 200,
    wires: [{ pointsM: [[0, 0, centreM - 0.25], [0, 0, centreM], [0, 0, centreM + 0.25]] }], feed: { wire: 0, vertex: 1 },
    ground: { type: "perfect" },
  });

/** The free-space pair: the dipole and its mirror, the mirror fed with `imageVolts`. */
function pairImpedance(points: [number, number, number][], a: number, imageVolts: number) {
  const mirror = points.map(([x, y, z]): [number, number, number] => [x, y, -z]);
  const shape = validateShape({ frequencyHz: F, wireRadiusM: a, segmentsPerWavelength: 200, wires: [{ pointsM: points }, { pointsM: mirror }], feed: { wire: 0, vertex: 1 } });
  // at 200 per wavelength the segments are already as short as the feed gap asks (λ/200 = g/4), so
  // both wires get the same uniform mesh and the same finite-gap source (feedSource.ts)
  const mesh = buildMesh(shape);
  const z = fillImpedance(mesh, 2 * Math.PI);
  const own = gapExcitation(mesh, feedGapM(F), 0);
  const half = mesh.unknowns / 2; // the mirror's basis functions follow the dipole's, in the same order
  const re = own.map((v, m) => (m < half ? v : imageVolts * own[m - half]));
  const x = solveComplex(z, re, new Float64Array(mesh.unknowns));
  const i = gapCurrent(own, x.re, x.im), d = i.re * i.re + i.im * i.im;
  return { re: i.re / d, im: -i.im / d };
}

describe("image coupling equals the free-space pair (Balanis §4.7)", () => {
  it("horizontal dipole: the image is fed in opposition (current reversed)", () => {
    for (const h of [0.1, 0.3, 0.7]) {
      const g = solveFeed(horizontal(h, 1e-3)).inputImpedanceOhm;
      const p = pairImpedance([[-0.25, 0, h], [0, 0, h], [0.25, 0, h]], 1e-3, -1);
      expect(Math.abs(g.re - p.re) + Math.abs(g.im - p.im)).toBeLessThan(1e-6 * Math.hypot(p.re, p.im));
    }
  });

  it("vertical dipole: the image is fed in the same sense (current along the same direction)", () => {
    // wire from bottom to top; its mirror runs from top (z = −c + 0.25) to bottom, so the same
    // current direction in space means the mirrored wire is fed with −1 along its own path
    for (const c of [0.3, 0.6]) {
      const g = solveFeed(vertical(c, 1e-3)).inputImpedanceOhm;
      const p = pairImpedance([[0, 0, c - 0.25], [0, 0, c], [0, 0, c + 0.25]], 1e-3, -1);
      const wrong = pairImpedance([[0, 0, c - 0.25], [0, 0, c], [0, 0, c + 0.25]], 1e-3, 1);
      expect(Math.abs(g.re - p.re) + Math.abs(g.im - p.im)).toBeLessThan(1e-6 * Math.hypot(p.re, p.im));
      expect(Math.abs(g.re - wrong.re)).toBeGreaterThan(1); // the sign matters
    }
  });
});

/** Z12 of side-by-side half-wave dipoles at spacing d (λ = 1 m), Balanis §8.6. */
function mutualImpedance(d: number) {
  const k = 2 * Math.PI, l = 0.5;
  const u0 = k * d, u1 = k * (Math.hypot(d, l) + l), u2 = k * (Math.hypot(d, l) - l);
  const [s0, c0] = sineCosineIntegrals(u0), [s1, c1] = sineCosineIntegrals(u1), [s2, c2] = sineCosineIntegrals(u2);
  const f = ETA0_OHM / (4 * Math.PI);
  return { re: f * (2 * c0 - c1 - c2), im: -f * (2 * s0 - s1 - s2) };
}

describe("horizontal half-wave dipole over perfect ground follows Z11 − Z12(2h) (Balanis §8.6)", () => {
  it("the series gives the tabulated R12(0.5λ) ≈ −12.5 Ω (Balanis fig. 8.20, read from the curve)", () => {
    expect(mutualImpedance(0.5).re).toBeCloseTo(-12.5, 0);
  });

  const a = 1e-5; // thin, so the current is close to the sinusoid the formula assumes
  const free = solveFeed(horizontal(1, a, false)).inputImpedanceOhm;
  for (const h of [0.25, 0.5, 0.75, 1]) {
    it(`h = ${h} λ: the change from free space has the sign and, within 35 %, the size of −Z12(${2 * h} λ)`, () => {
      const z = solveFeed(horizontal(h, a)).inputImpedanceOhm;
      const ref = mutualImpedance(2 * h);
      const dRe = z.re - free.re, dIm = z.im - free.im;
      expect(Math.sign(dRe)).toBe(Math.sign(-ref.re));
      expect(Math.sign(dIm)).toBe(Math.sign(-ref.im));
      expect(Math.abs(dRe + ref.re)).toBeLessThan(0.35 * Math.abs(ref.re) + 0.5);
      expect(Math.abs(dIm + ref.im)).toBeLessThan(0.35 * Math.abs(ref.im) + 0.5);
    });
  }
});

describe("patterns over perfect ground (Balanis §4.7.2 and §4.7.3)", () => {
  it("a horizontal dipole has no field at the horizon; a vertical one has its maximum there", () => {
    const h = solveShape(horizontal(0.5, 1e-3), { energyBalance: true });
    expect(h.ground!.elevationCut.gainDbi[0]).toBeLessThan(h.peakGainDbi - 60);
    const v = solveShape(vertical(0.5, 1e-3), { energyBalance: true });
    expect(v.ground!.peakElevationDeg).toBeLessThan(0.5);
    expect(Math.max(...v.ground!.elevationCut.gainDbi)).toBeCloseTo(v.ground!.elevationCut.gainDbi[0], 6);
    for (const s of [h, v]) expect(s.energyBalanceError!).toBeLessThan(1e-3);
  });

  it("a horizontal dipole λ/2 up peaks at 30° elevation, where sin(kh sinψ) = 1 (array factor of the pair)", () => {
    const s = solveShape(horizontal(0.5, 1e-3), { energyBalance: true });
    expect(Math.abs(s.ground!.peakElevationDeg - 30)).toBeLessThan(0.5);
    expect(s.energyBalanceError!).toBeLessThan(1e-3);
  });
});
