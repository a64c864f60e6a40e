// Checks of the exact-kernel correction (generator/em/exactKernel.ts) and of mesh convergence with
// the ends graded (generator/em/mesh.ts).
import { describe, expect, it } from "vitest";
import { ellipticKComplement, exactMinusReduced } from "../../generator/em/exactKernel.js";
import { solveShape } from "../../generator/em/index.js";
import { straightDipole } from "../helpers/shapes.js";

describe("complete elliptic integral K(m) (Abramowitz & Stegun, table 17.1)", () => {
  it("K(0) = π/2, K(0.5) = 1.8540746773, K(0.9) = 2.5780921134", () => {
    expect(ellipticKComplement(1)).toBeCloseTo(Math.PI / 2, 12);
    expect(ellipticKComplement(0.5)).toBeCloseTo(1.8540746773, 9);
    expect(ellipticKComplement(0.1)).toBeCloseTo(2.5780921134, 9);
  });
  it("near m = 1 follows K ≈ ln(4/√(1 − m)) (A&S 17.3.26)", () => {
    const m1 = 1e-12;
    expect(ellipticKComplement(m1)).toBeCloseTo(Math.log(4 / Math.sqrt(m1)), 9);
  });
});

describe("exact minus reduced kernel", () => {
  it("tends to −(mean ρ² − a²)/(2u³) = −a²/(2u³) far from the source (ring average of ρ² is 2a²)", () => {
    const a = 1, u = 200;
    expect(exactMinusReduced(u, a) / (-(a * a) / (2 * u ** 3))).toBeCloseTo(1, 3);
  });
});

describe("half-wave dipole impedance settles as the mesh doubles", () => {
  // induced-EMF limit 73 + j42.5 Ω (Balanis, Antenna Theory, eq. 8-61) is for an infinitely thin
  // wire; here the check is the convergence itself: Gibson, ch. 4 (successive refinements)
  it("changes < 0.2 % from 100 to 200 segments per wavelength (radius 4.8e-4 λ), and < 0.1 % from 200 to 400", () => {
    const z = [100, 200, 400].map((spw) => solveShape(straightDipole(0.5, 4.8e-4, { segmentsPerWavelength: spw })).inputImpedanceOhm);
    const change = (p: { re: number; im: number }, q: { re: number; im: number }) => Math.hypot(q.re - p.re, q.im - p.im) / Math.hypot(q.re, q.im);
    expect(change(z[0], z[1])).toBeLessThan(0.002);
    expect(change(z[1], z[2])).toBeLessThan(0.001);
  });
  it("1 λ centre-fed wire (high-impedance feed) changes < 1 % between 50 and 100 per wavelength (radius 2.3e-3 λ)", () => {
    const z = [50, 100].map((spw) => solveShape(straightDipole(1, 2.3e-3, { segmentsPerWavelength: spw })).inputImpedanceOhm);
    expect(Math.hypot(z[1].re - z[0].re, z[1].im - z[0].im) / Math.hypot(z[1].re, z[1].im)).toBeLessThan(0.01);
  });
});
