// The mirror-symmetric fill and even-mode solve against the general fill and pivoted LU
// (Golub & Van Loan, Matrix Computations, alg. 3.4.1), and the complex-symmetric LDLᵀ
// (Golub & Van Loan §4.1.2) against the same LU. Mirror invariance of the moment matrix,
// Z_{P(m),P(n)} = σ_m σ_n Z_{mn}, follows from invariance of the integrals under a reflection
// (Harrington, Field Computation by Moment Methods, 1968).
import { describe, expect, it } from "vitest";
import { shapeOf } from "../../generator/design/objective.js";
import { parseDesignRequest } from "../../generator/design/request.js";
import { solveComplexSymmetric } from "../../generator/em/complexLdlt.js";
import { solveComplex } from "../../generator/em/complexLu.js";
import { fillImpedance } from "../../generator/em/impedance.js";
import { buildMesh } from "../../generator/em/mesh.js";
import { fillImpedanceMirror, solveMirrorSymmetric } from "../../generator/em/mirrorSolve.js";
import { detectMirrorSymmetry } from "../../generator/em/mirrorSymmetry.js";
import { solveFeed, solveShape } from "../../generator/em/solve.js";
import { validateShape } from "../../generator/em/index.js";
import { straightDipole, vee } from "../helpers/shapes.js";

const relDiff = (a: { re: Float64Array; im: Float64Array }, b: { re: Float64Array; im: Float64Array }) => {
  let d = 0, m = 0;
  for (let i = 0; i < a.re.length; i++) {
    d = Math.max(d, Math.hypot(a.re[i] - b.re[i], a.im[i] - b.im[i]));
    m = Math.max(m, Math.hypot(b.re[i], b.im[i]));
  }
  return d / m;
};

// a catalog-like 1.5λ three-piece bent wire in copper at 145 MHz
const bent = shapeOf([1.183, -0.528, 0.693, 0.092, 0.427], parseDesignRequest({ frequencyHz: 145e6, lengthWl: 1.5, piecesPerArm: 3, wireDiameterM: 2e-3, conductor: "copper" }));

describe("mirror symmetry about the y–z plane", () => {
  it("is found in a bent catalog wire, a V and a straight dipole, each basis paired with its image", () => {
    for (const shape of [bent, vee(1.5, 55, 1e-3), straightDipole(1.5, 1e-3)]) {
      const mesh = buildMesh(shape);
      const sym = detectMirrorSymmetry(mesh);
      expect(sym).not.toBeNull();
      expect(sym!.basis[mesh.feedBasis]).toBe(mesh.feedBasis); // the feed sits on the mirror plane
      for (let b = 0; b < mesh.unknowns; b++) expect(sym!.basis[sym!.basis[b]]).toBe(b);
    }
  });

  it("is not claimed for a shape that breaks it by a micrometre, nor for an off-centre feed", () => {
    const shifted = validateShape({ ...vee(1.5, 55, 1e-3), wires: [{ pointsM: [[-0.6144, 0.4302, 0], [0, 0, 0], [0.6144 + 1e-6, 0.4302, 0]] }] });
    expect(detectMirrorSymmetry(buildMesh(shifted))).toBeNull();
    // an off-centre feed keeps the mesh symmetric but not the excitation: solve falls back
    const offCentre = validateShape({ ...straightDipole(1.5, 1e-3), wires: [{ pointsM: [[-0.75, 0, 0], [-0.2, 0, 0], [0.2, 0, 0], [0.75, 0, 0]] }], feed: { wire: 0, vertex: 1 } });
    const a = solveFeed(offCentre), b = solveFeed(offCentre, { symmetry: false });
    // the mirror fill still applies (rounding-level differences), the solve takes the general LU
    const za = a.inputImpedanceOhm, zb = b.inputImpedanceOhm;
    expect(Math.hypot(za.re - zb.re, za.im - zb.im)).toBeLessThan(1e-12 * Math.hypot(zb.re, zb.im));
    expect(a.currentRe[a.mesh.feedBasis]).not.toBeCloseTo(a.currentRe[a.mesh.unknowns - 1 - a.mesh.feedBasis], 3); // no mirror parity
  });

  it("the mirror fill gives the general fill's matrix and the matrix obeys Z(P m, P n) = σm σn Z(m, n)", () => {
    const mesh = buildMesh(bent);
    const sym = detectMirrorSymmetry(mesh)!;
    const k = (2 * Math.PI * bent.frequencyHz) / 299_792_458;
    const general = fillImpedance(mesh, k);
    expect(relDiff(fillImpedanceMirror(mesh, k, sym), general)).toBeLessThan(1e-12);
    const n = general.n;
    const image = { re: new Float64Array(n * n), im: new Float64Array(n * n) };
    for (let i = 0; i < n; i++) {
      for (let j = 0; j < n; j++) {
        const s = sym.sign[i] * sym.sign[j];
        image.re[i * n + j] = s * general.re[sym.basis[i] * n + sym.basis[j]];
        image.im[i * n + j] = s * general.im[sym.basis[i] * n + sym.basis[j]];
      }
    }
    expect(relDiff(image, general)).toBeLessThan(1e-12);
  });

  it("the even-mode solve matches the general LU solve to 1e-9 for a delta gap and a symmetric spread source", () => {
    const mesh = buildMesh(bent);
    const sym = detectMirrorSymmetry(mesh)!;
    const z = fillImpedance(mesh, (2 * Math.PI * bent.frequencyHz) / 299_792_458);
    const f = mesh.feedBasis;
    const spread = new Float64Array(mesh.unknowns);
    spread[f] = 0.5; spread[f - 1] = 0.2; spread[f + 1] = 0.2; spread[f - 2] = 0.05; spread[f + 2] = 0.05; // symmetric about the feed
    const gap = new Float64Array(mesh.unknowns);
    gap[f] = 1;
    for (const b of [gap, spread]) {
      const zero = new Float64Array(mesh.unknowns);
      const reduced = solveMirrorSymmetric(z, sym, b, zero)!;
      expect(reduced).not.toBeNull();
      expect(relDiff(reduced, solveComplex(z, b, zero))).toBeLessThan(1e-9);
    }
    const lopsided = new Float64Array(mesh.unknowns);
    lopsided[f] = 1; lopsided[f + 1] = 0.3;
    expect(solveMirrorSymmetric(z, sym, lopsided, new Float64Array(mesh.unknowns))).toBeNull();
  });

  it("solveShape gives the same impedance and gain on both paths (1e-9 relative)", () => {
    const a = solveShape(bent), b = solveShape(bent, { symmetry: false });
    expect(Math.abs(a.inputImpedanceOhm.re - b.inputImpedanceOhm.re)).toBeLessThan(1e-9 * Math.abs(b.inputImpedanceOhm.re));
    expect(Math.abs(a.inputImpedanceOhm.im - b.inputImpedanceOhm.im)).toBeLessThan(1e-9 * Math.hypot(b.inputImpedanceOhm.re, b.inputImpedanceOhm.im));
    expect(Math.abs(a.peakGainDbi - b.peakGainDbi)).toBeLessThan(1e-8);
  });
});

describe("complex-symmetric LDLᵀ", () => {
  it("solves moment matrices as accurately as the pivoted LU (61 and 43 unknowns, lossless and copper)", () => {
    for (const shape of [straightDipole(2.5, 1e-3), bent]) {
      const mesh = buildMesh(shape);
      const z = fillImpedance(mesh, (2 * Math.PI * shape.frequencyHz) / 299_792_458);
      const b = new Float64Array(mesh.unknowns);
      b[mesh.feedBasis] = 1;
      const zero = new Float64Array(mesh.unknowns);
      const ldlt = solveComplexSymmetric(z, b, zero);
      expect(relDiff(ldlt, solveComplex(z, b, zero))).toBeLessThan(1e-11);
      // residual ‖Z x − b‖ / ‖b‖
      const n = z.n;
      let res = 0;
      for (let i = 0; i < n; i++) {
        let sr = -b[i], si = 0;
        for (let j = 0; j < n; j++) {
          sr += z.re[i * n + j] * ldlt.re[j] - z.im[i * n + j] * ldlt.im[j];
          si += z.re[i * n + j] * ldlt.im[j] + z.im[i * n + j] * ldlt.re[j];
        }
        res = Math.max(res, Math.hypot(sr, si));
      }
      expect(res).toBeLessThan(1e-10);
    }
  });

  it("throws on a zero pivot instead of returning NaN", () => {
    const z = { n: 2, re: new Float64Array([0, 1, 1, 0]), im: new Float64Array(4) };
    expect(() => solveComplexSymmetric(z, new Float64Array([1, 0]), new Float64Array(2))).toThrow(/zero pivot/);
  });
});
