// Induced-EMF mutual resistance of two side-by-side parallel half-wave dipoles, the reference for
// a horizontal dipole over perfect ground (its image is the second dipole, 2h away, current reversed):
//   R12(d) = η/(4π)·[2 Ci(u0) − Ci(u1) − Ci(u2)],  u0 = kd,  u1 = k(√(d² + l²) + l),  u2 = k(√(d² + l²) − l)
// (Balanis, Antenna Theory, 3rd ed., §8.6, eq. 8-71a; equation number from memory). As d → 0 it
// tends to the self resistance η/(4π)·Cin(2π) ≈ 73.1 Ω of eq. 8-61.
// Si and Ci by their power series (Abramowitz & Stegun 5.2.14 and 5.2.16), accurate to ~1e-12 for x < 20.
import { ETA0_OHM } from "../units.js";

const EULER_GAMMA = 0.5772156649015329;

/** [Si(x), Ci(x)] for 0 < x < 20. */
export function sineCosineIntegrals(x: number): [number, number] {
  let si = 0, ci = EULER_GAMMA + Math.log(x), term = x; // term = (−1)^n x^(2n+1)/(2n+1)!
  for (let n = 0; n < 60; n++) {
    si += term / (2 * n + 1);
    const even = (-term * x) / (2 * n + 2); // (−1)^(n+1) x^(2n+2)/(2n+2)!
    ci += even / (2 * n + 2);
    term = (even * x) / (2 * n + 3);
  }
  return [si, ci];
}

/** R12 (Ω) of side-by-side half-wave dipoles spaced spacingWl wavelengths apart. */
export function halfWaveMutualResistanceOhm(spacingWl: number): number {
  const k = 2 * Math.PI, l = 0.5, r = Math.hypot(spacingWl, l);
  const ci = (u: number) => sineCosineIntegrals(u)[1];
  return (ETA0_OHM / (4 * Math.PI)) * (2 * ci(k * spacingWl) - ci(k * (r + l)) - ci(k * (r - l)));
}
