// The feed: a finite gap of fixed physical length g centred on the feed vertex, across which the
// source voltage V0 appears as a uniform impressed field E = V0/g along the wire (the "finite gap"
// or "uniform gap" source of thin-wire moment methods; Harrington, Field Computation by Moment
// Methods, 1968, ch. 4; Gibson, The Method of Moments in Electromagnetics, 2nd ed., the thin-wire
// chapter on source models — chapters from memory).
// Galerkin testing of that field against the triangle basis functions Λ_m gives the excitation
//   V_m = ∫ E·ŝ Λ_m dl = (V0/g) ∫_gap Λ_m dl,        Σ_m V_m = V0 when the gap lies inside the wire,
// spread over every basis function the gap overlaps (the delta gap is the limit g → 0: V_feed = V0).
// Input figures for this distributed source (reaction form; Rumsey, "Reaction concept in
// electromagnetic theory", Phys. Rev. 94, 1954):
//   Ī = (1/V0) Σ_m V_m I_m = (1/g) ∫_gap I dl   (the current averaged over the gap),
//   Z_in = V0 / Ī,   P_in = ½ Re(Σ_m V_m I_m*) = ½ Re(V0 Ī*) = ½ V0² Re(1/Z_in)   (V_m real),
// so P_in is exactly the power the impressed field delivers (the energy balance holds).
// Once the mesh resolves the gap the excitation stops changing with the mesh, which is what lets
// the feed reactance settle at high-impedance feed points, where a delta gap's own capacitance
// keeps growing as its segments shrink.
// The gap: g = λ0/50 at the design frequency (4.1 cm on a 145 MHz design), a fixed length in metres
// for every other frequency of a sweep. The mesh resolves it (mesh.ts: segments at the feed no
// longer than g/4, or 8 radii on a thick wire, and so never shorter than 4 radii, the thin-wire
// limit of geometryChecks.ts).
import { InputError } from "../errors.js";
import { wavelengthM } from "../units.js";
import type { Mesh } from "./mesh.js";

/** Gap length in design wavelengths. */
export const FEED_GAP_WL = 1 / 50;

/** The gap of a design at `designFrequencyHz` (m): pass it unchanged when solving other frequencies. */
export const feedGapM = (designFrequencyHz: number): number => FEED_GAP_WL * wavelengthM(designFrequencyHz);

/**
 * Longest segment allowed at the feed: g/4, or 8 radii on a thick wire. The mesh halves the feed's
 * segments until they are no longer than this, so they end between half of it and it: never under
 * 4 radii (the thin-wire limit), which also keeps the two arms' segments apart at a 30° apex.
 */
export const feedSegmentM = (gapM: number, radiusM: number): number => Math.max(gapM / 4, 8 * radiusM);

/**
 * Excitation vector (real; V0 = 1 V) of a uniform field over the gap, tested against Λ_m.
 * `grounded`: the feed is at a wire end on perfect ground (a base-fed monopole); the gap is then the
 * half of the dipole gap that lies on the real wire, g/2 long, carrying the same field 2·V0/g as the
 * image-theory dipole driven with 2·V0, so V0 is the wire-to-ground voltage and Z_in = Z_dipole/2.
 */
export function gapExcitation(mesh: Mesh, gapM: number, feedWire: number, out = new Float64Array(mesh.unknowns), grounded: "start" | "end" | null = null): Float64Array {
  if (!(gapM > 0)) throw new Error(`feed gap must be positive (got ${gapM} m)`);
  out.fill(0);
  const e0 = grounded ? 2 / gapM : 1 / gapM; // V/m for V0 = 1 V
  // arc length of the feed node: the end of the segment whose rising half is the feed basis
  let arc = 0;
  let feedArc = NaN;
  const segArc = new Float64Array(mesh.segmentCount);
  for (let s = 0; s < mesh.segmentCount; s++) {
    if (mesh.wireOf[s] !== feedWire) continue;
    segArc[s] = arc;
    arc += mesh.lengthM[s];
    if (Number.isNaN(feedArc) && mesh.basisAtStart[s] === mesh.feedBasis) feedArc = segArc[s]; // a grounded start
    if (mesh.basisAtEnd[s] === mesh.feedBasis) feedArc = arc;
  }
  const lo = grounded === "start" ? feedArc : feedArc - gapM / 2, hi = grounded === "end" ? feedArc : feedArc + gapM / 2;
  if (lo < 0 || hi > arc) {
    throw new InputError(`shape: the feed gap (${Number(gapM.toPrecision(3))} m, λ/50) runs past an end of wires[${feedWire}]; the wire must extend at least half the gap either side of the feed`);
  }
  for (let s = 0; s < mesh.segmentCount; s++) {
    if (mesh.wireOf[s] !== feedWire) continue;
    const len = mesh.lengthM[s];
    const t1 = Math.max(0, (lo - segArc[s]) / len), t2 = Math.min(1, (hi - segArc[s]) / len);
    if (!(t2 > t1)) continue;
    // ∫ t dl and ∫ (1 − t) dl over the overlap [t1, t2] of this segment
    const rising = (len * (t2 * t2 - t1 * t1)) / 2;
    const falling = len * (t2 - t1) - rising;
    const a = mesh.basisAtStart[s], b = mesh.basisAtEnd[s];
    if (a >= 0) out[a] += e0 * falling;
    if (b >= 0) out[b] += e0 * rising;
  }
  return out;
}

/** Reaction Σ V_m I_m: the gap-averaged current Ī for V0 = 1 V (Re Ī = 2 P_in, V_m real). */
export function gapCurrent(v: Float64Array, re: Float64Array, im: Float64Array): { re: number; im: number } {
  let r = 0, i = 0;
  for (let m = 0; m < v.length; m++) {
    if (v[m] === 0) continue;
    r += v[m] * re[m];
    i += v[m] * im[m];
  }
  return { re: r, im: i };
}
