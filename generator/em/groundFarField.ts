// Far field over the ground plane z = 0: the direct field plus the field of the perfect-ground image
// (mirrored currents, reversed along the mirrored path), its θ̂ part (vertical polarization, E in
// the plane of incidence) times R_v and its φ̂ part (horizontal polarization) times R_h:
//   E = E_direct + R_v(ψ) E_image,θ θ̂ + R_h(ψ) E_image,φ φ̂,   ψ = 90° − θ the elevation (grazing angle).
// Fresnel plane-wave reflection coefficients of a half-space of ε_c = ε_r − jσ/(ωε₀) (e^{jωt}),
// with the perfect-ground image's sign taken out so that both tend to +1 as σ → ∞
// (Balanis, Antenna Theory, 3rd ed., §4.8, eqs. for the vertical and horizontal dipole over ground):
//   R_v = (ε_c sinψ − √(ε_c − cos²ψ)) / (ε_c sinψ + √(ε_c − cos²ψ))
//   R_h = (√(ε_c − cos²ψ) − sinψ) / (√(ε_c − cos²ψ) + sinψ)   (= −Γ_⊥ of the usual TE convention)
// Limits: normal incidence (ψ = 90°) both are (√ε_c − 1)/(√ε_c + 1); grazing (ψ → 0) R_v → −1 and
// R_h → +1 (Γ_⊥ → −1) for any finite ground, so the horizon field cancels; lossless ground has
// R_v = 0 at the Brewster angle tanψ_B = 1/√ε_r. Below the horizon (θ > 90°) the field is zero.
// Limits of the model: no surface wave, and the plane-wave coefficients are approximate for
// sources within a small fraction of a wavelength of real ground.
// A level shape (every node at one height h, so every segment horizontal) has the image field
//   E_image = −e^{−j2kh cosθ} E_direct
// (the mirrored nodes sit 2h lower, the horizontal segment vectors are unchanged, the currents
// reversed): one far-field sum per direction instead of two.
import { ETA0_OHM } from "../units.js";
import { createFarFieldPlan, farFieldAt, type FarFieldPlan } from "./farField.js";
import { cdiv, cmul, complexPermittivity, csqrt, type Complex, type Ground } from "./ground.js";
import { mirroredMesh } from "./groundMesh.js";
import type { Mesh } from "./mesh.js";

export interface GroundFarField {
  direct: FarFieldPlan;
  /** The image's own plan; null for a level shape (levelHeightM set). */
  image: FarFieldPlan | null;
  /** The common node height (m) of a level shape, else null. */
  levelHeightM: number | null;
  /** ε_c for real ground, null for perfect. */
  permittivity: Complex | null;
  scratch: Float64Array;
}

/** R_v and R_h at elevation ψ (rad) for ground permittivity ε_c. */
export function fresnelCoefficients(permittivity: Complex, elevationRad: number): { v: Complex; h: Complex } {
  const s = Math.sin(elevationRad), c = Math.cos(elevationRad);
  const root = csqrt({ re: permittivity.re - c * c, im: permittivity.im });
  const es = { re: permittivity.re * s, im: permittivity.im * s };
  const v = cdiv({ re: es.re - root.re, im: es.im - root.im }, { re: es.re + root.re, im: es.im + root.im });
  const h = cdiv({ re: root.re - s, im: root.im }, { re: root.re + s, im: root.im });
  return { v, h };
}

/** The common height of every node when the shape is level (to 1e-12 of that height), else null. */
export function levelHeightOf(plan: FarFieldPlan): number | null {
  const z = plan.nodeXyz;
  const h = z[2];
  for (let i = 1; i < plan.nodeCount; i++) if (Math.abs(z[3 * i + 2] - h) > 1e-12 * Math.abs(h)) return null;
  return h > 0 ? h : null;
}

/** `level: false` keeps the image's own plan even for a level shape (a check of the shortcut). */
export function createGroundFarField(
  mesh: Mesh, re: Float64Array, im: Float64Array, kRadPerM: number, ground: Ground, frequencyHz: number, level = true,
): GroundFarField {
  const direct = createFarFieldPlan(mesh, re, im, kRadPerM);
  const levelHeightM = level ? levelHeightOf(direct) : null;
  return {
    direct,
    image: levelHeightM === null ? createFarFieldPlan(mirroredMesh(mesh), re.map((v) => -v), im.map((v) => -v), kRadPerM) : null,
    levelHeightM,
    permittivity: ground.type === "real" ? complexPermittivity(ground, frequencyHz) : null,
    scratch: new Float64Array(4),
  };
}

/** r·E over ground at (θ, φ) into out = [Eθre, Eθim, Eφre, Eφim]; zero below the horizon. */
export function groundFieldAt(g: GroundFarField, thetaRad: number, phiRad: number, out: Float64Array): void {
  if (thetaRad > Math.PI / 2) { out.fill(0); return; }
  farFieldAt(g.direct, thetaRad, phiRad, out);
  const im = g.scratch;
  if (g.image) farFieldAt(g.image, thetaRad, phiRad, im);
  else { // level shape: E_image = −e^{−ja} E_direct, a = 2kh cosθ
    const a = 2 * g.direct.kRadPerM * g.levelHeightM! * Math.cos(thetaRad);
    const c = Math.cos(a), s = Math.sin(a);
    for (let t = 0; t < 4; t += 2) {
      im[t] = -(c * out[t] + s * out[t + 1]);
      im[t + 1] = -(c * out[t + 1] - s * out[t]);
    }
  }
  let rv: Complex = { re: 1, im: 0 }, rh: Complex = { re: 1, im: 0 };
  if (g.permittivity) ({ v: rv, h: rh } = fresnelCoefficients(g.permittivity, Math.PI / 2 - thetaRad));
  const et = cmul(rv, { re: im[0], im: im[1] });
  const ep = cmul(rh, { re: im[2], im: im[3] });
  out[0] += et.re; out[1] += et.im; out[2] += ep.re; out[3] += ep.im;
}

/** U(θ, φ) = r²|E|²/(2η) over ground, W/sr (zero below the horizon). */
export function groundIntensityAt(g: GroundFarField, thetaRad: number, phiRad: number, out: Float64Array): number {
  groundFieldAt(g, thetaRad, phiRad, out);
  return (out[0] ** 2 + out[1] ** 2 + out[2] ** 2 + out[3] ** 2) / (2 * ETA0_OHM);
}
