// The finite-gap feed (generator/em/feedSource.ts): its excitation, and input impedance that
// converges as the mesh is refined. Induced-EMF impedance of a half-wave dipole: 73.1 + j42.5 Ω
// (Balanis, Antenna Theory, 3rd ed., §8.5, eq. 8-61: sinusoidal current, infinitely thin wire).
import { describe, expect, it } from "vitest";
import { buildMesh, fillImpedance, solveComplex, solveFeed, validateShape } from "../../generator/em/index.js";
import { feedGapM, feedSegmentM, gapCurrent, gapExcitation } from "../../generator/em/feedSource.js";
import { straightDipole, vee } from "../helpers/shapes.js";

describe("gap excitation", () => {
  it("spreads 1 V over the basis functions the gap overlaps (triangles sum to 1 along a wire)", () => {
    for (const spw of [25, 50, 100, 200]) {
      const mesh = buildMesh(vee(1.5, 50, 1e-3), spw, 0.005);
      const v = gapExcitation(mesh, 0.02, 0);
      expect(v.reduce((s, x) => s + x, 0)).toBeCloseTo(1, 12);
      expect(v.filter((x) => x > 0).length).toBeGreaterThan(2); // several basis functions, not one
    }
  });

  it("tends to the delta gap (1 V on the feed basis alone) as the gap shrinks", () => {
    const mesh = buildMesh(straightDipole(0.5, 1e-3), 50);
    const v = gapExcitation(mesh, 1e-9, 0);
    expect(v[mesh.feedBasis]).toBeCloseTo(1, 6);
  });

  it("is mirror-symmetric on a mirror-symmetric mesh", () => {
    const mesh = buildMesh(vee(1, 40, 1e-3), 25, feedSegmentM(feedGapM(299792458), 1e-3));
    const v = gapExcitation(mesh, 0.02, 0);
    for (let m = 0; m < v.length; m++) expect(v[m]).toBeCloseTo(v[v.length - 1 - m], 12);
  });
});

describe("half-wave dipole (Balanis §8.5, eq. 8-61: 73.1 + j42.5 Ω)", () => {
  it("tends to the induced-EMF value as the wire thins", () => {
    const ref = { re: 73.1, im: 42.5 };
    const d = [1e-5, 1e-7, 1e-9, 1e-12].map((a) => {
      // at λ = 1 km, so the thinnest radius (1e-12 λ = 1 nm) stays inside the shape file's bounds
      const d0 = straightDipole(0.5, 1e-3);
      const km = validateShape({ ...d0, frequencyHz: d0.frequencyHz / 1000, wireRadiusM: a * 1000, wires: d0.wires.map((w) => ({ pointsM: w.pointsM.map((p) => p.map((c) => c * 1000) as [number, number, number]) })) });
      const z = solveFeed(km, { segmentsPerWavelength: 100 }).inputImpedanceOhm;
      return Math.hypot(z.re - ref.re, z.im - ref.im);
    });
    for (let i = 1; i < d.length; i++) expect(d[i]).toBeLessThan(d[i - 1]);
    expect(d[3]).toBeLessThan(2.5); // within 2.5 Ω at a = 1e-12 λ (the approach is slow, ~1/ln(λ/a))
  });
});

describe("1 λ centre-fed wire, a current minimum at the feed", () => {
  const radiusWl = 1e-4;
  const gapZ = (spw: number) => solveFeed(straightDipole(1, radiusWl), { segmentsPerWavelength: spw }).inputImpedanceOhm;
  /** The former source: 1 V on the feed basis only, uniform mesh. */
  const deltaZ = (spw: number) => {
    const mesh = buildMesh(straightDipole(1, radiusWl), spw);
    const v = new Float64Array(mesh.unknowns);
    v[mesh.feedBasis] = 1;
    const { re, im } = solveComplex(fillImpedance(mesh, 2 * Math.PI), v, new Float64Array(mesh.unknowns), true);
    const i = gapCurrent(v, re, im), i2 = i.re ** 2 + i.im ** 2;
    return { re: i.re / i2, im: -i.im / i2 };
  };
  const steps = (z: (spw: number) => { re: number; im: number }) => {
    const zs = [50, 100, 200].map(z);
    return zs.slice(1).map((b, i) => ({ re: Math.abs(b.re / zs[i].re - 1), im: Math.abs(b.im / zs[i].im - 1) }));
  };

  it("R and X settle within 1 % between successive doublings (50 → 100 → 200 per λ)", () => {
    for (const s of steps(gapZ)) {
      expect(s.re).toBeLessThan(0.01);
      expect(s.im).toBeLessThan(0.01);
    }
  });

  it("where a delta gap on the same meshes does not (its own capacitance grows as segments shrink)", () => {
    expect(Math.max(...steps(deltaZ).map((s) => s.re))).toBeGreaterThan(0.01);
  });
});
