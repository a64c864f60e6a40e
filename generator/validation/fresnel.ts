// Plane-wave reflection coefficients of a flat lossy ground, written out here as the reference the
// solver's over-ground pattern is checked against (the solver has its own copy in em/groundFarField.ts).
// Ground of complex relative permittivity ε_c = ε_r − jσ/(ωε₀) (e^{jωt}); ψ the elevation
// (grazing angle), so cos θ_i = sin ψ for the angle of incidence θ_i from the normal:
//   Γ_h = (sin ψ − √(ε_c − cos²ψ)) / (sin ψ + √(ε_c − cos²ψ))          (E parallel to the ground)
//   Γ_v = (ε_c sin ψ − √(ε_c − cos²ψ)) / (ε_c sin ψ + √(ε_c − cos²ψ))  (E in the plane of incidence)
// (Balanis, Antenna Theory, 3rd ed., §4.8, the reflection coefficients for horizontal and vertical
// polarization; the same Fresnel formulas as in any optics text). Only |Γ| is used: it does not
// depend on the sign convention.
import { EPS0_F_PER_M } from "../units.js";

type C = [number, number];
const div = ([a, b]: C, [c, d]: C): C => [(a * c + b * d) / (c * c + d * d), (b * c - a * d) / (c * c + d * d)];
const sqrt = ([a, b]: C): C => { // principal root
  const m = Math.hypot(a, b), re = Math.sqrt((m + a) / 2), im = Math.sqrt((m - a) / 2);
  return [re, b < 0 ? -im : im];
};

/** |Γ| for the polarization at elevation elevationRad over a ground (ε_r, σ) at frequencyHz. */
export function fresnelMagnitude(
  polarization: "horizontal" | "vertical", relativePermittivity: number, conductivitySPerM: number, frequencyHz: number, elevationRad: number,
): number {
  const eps: C = [relativePermittivity, -conductivitySPerM / (2 * Math.PI * frequencyHz * EPS0_F_PER_M)];
  const s = Math.sin(elevationRad), c = Math.cos(elevationRad);
  const root = sqrt([eps[0] - c * c, eps[1]]);
  const a: C = polarization === "horizontal" ? [s, 0] : [eps[0] * s, eps[1] * s];
  const [re, im] = div([a[0] - root[0], a[1] - root[1]], [a[0] + root[0], a[1] + root[1]]);
  return Math.hypot(re, im);
}
