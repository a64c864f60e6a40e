// Plain words for where the main lobe points and how to mount the wire, read off the shape itself
// rather than off a fixed layout: the feed point F, the two arm tips T1, T2 (the ends of the fed
// wire), the wire plane (when the wire is flat) and its mirror line (when it has one).
//   - "toward the tips" is the in-plane direction from F to the tips' midpoint, a = ((T1+T2)/2 − F);
//     when the tips balance about the feed (a straight wire, a Z) the reference is the line joining
//     the tips instead, and the lobe is "broadside" or "along" it;
//   - the lobe's elevation from the wire plane is asin|d·n|; its bearing is the angle between its
//     in-plane part and a (0° toward the tips, 180° away from them, behind the feed);
//   - a lobe off the mirror line has a mirror twin of equal gain.
// The drawing (render/shapeSvg.ts) takes its arrow, twin and "out of the page" mark from
// lobeLayout too, so the words, the arrow and the numbers (θ, φ) always agree.
import { DEG_PER_RAD } from "../units.js";
import { direction } from "./patternFigures.js";

type V3 = [number, number, number];

/** Above this elevation from the wire plane the lobe is "out of the plane" (words and drawing). */
export const OUT_OF_PLANE_DEG = 45;

export interface LobeWords {
  lobe: string;
  mounting: string;
}

export interface LobeLayout {
  /** Unit normal of the wire plane, or null when the wire is not flat. */
  normal: V3 | null;
  /** Elevation of the lobe from the wire plane (°), or null when the wire is not flat. */
  elevationDeg: number | null;
  outOfPlane: boolean;
  /** Unit in-plane direction of the lobe (or the lobe itself for a wire that is not flat). */
  inPlane: V3;
  /** The mirror twin of inPlane, when the shape has a mirror line and the lobe lies off it. */
  twin: V3 | null;
  /** Unit direction from the feed toward the tips, or null when the tips balance about the feed. */
  towardTips: V3 | null;
  /** Unit direction along the line joining the tips. */
  tipLine: V3;
  /** Angle between inPlane and towardTips (°), or, with no tips side, between inPlane and the tip line (0…90°). */
  bearingDeg: number;
}

const sub = (a: readonly number[], b: readonly number[]): V3 => [a[0] - b[0], a[1] - b[1], a[2] - b[2]];
const dot = (a: readonly number[], b: readonly number[]) => a[0] * b[0] + a[1] * b[1] + a[2] * b[2];
const cross = (a: readonly number[], b: readonly number[]): V3 => [a[1] * b[2] - a[2] * b[1], a[2] * b[0] - a[0] * b[2], a[0] * b[1] - a[1] * b[0]];
const norm = (a: readonly number[]) => Math.hypot(a[0], a[1], a[2]);
const unit = (a: readonly number[]): V3 => { const l = norm(a); return [a[0] / l, a[1] / l, a[2] / l]; };
const along = (a: readonly number[], n: readonly number[] | null): V3 => (n ? sub(a, n.map((x) => x * dot(a, n))) : [a[0], a[1], a[2]]);
const angleDeg = (a: readonly number[], b: readonly number[]) => Math.acos(Math.max(-1, Math.min(1, dot(a, b)))) * DEG_PER_RAD;

export function lobeLayout(pointsM: readonly (readonly number[])[], feedVertex: number, thetaRad: number, phiRad: number): LobeLayout {
  const f = pointsM[feedVertex], t1 = pointsM[0], t2 = pointsM[pointsM.length - 1];
  const span = Math.max(...pointsM.map((p) => norm(sub(p, f))));
  const tol = 1e-6 * span;
  // wire plane: the normal of the largest cross product of two points seen from the feed
  let best: V3 = [0, 0, 0];
  for (const p of pointsM) for (const q of pointsM) {
    const c = cross(sub(p, f), sub(q, f));
    if (norm(c) > norm(best)) best = c;
  }
  let normal: V3 | null = norm(best) > 1e-9 * span * span ? unit(best) : null;
  if (normal && pointsM.some((p) => Math.abs(dot(sub(p, f), normal!)) > tol)) normal = null;
  const d = direction(thetaRad, phiRad);
  const elevationDeg = normal ? Math.asin(Math.min(1, Math.abs(dot(d, normal)))) * DEG_PER_RAD : null;
  const tipLine = unit(sub(t2, t1));
  const mid = along(sub([(t1[0] + t2[0]) / 2, (t1[1] + t2[1]) / 2, (t1[2] + t2[2]) / 2], f), normal);
  const towardTips = norm(mid) > 0.05 * span ? unit(mid) : null;
  const p = along(d, normal);
  const inPlane: V3 = norm(p) > 1e-9 ? unit(p) : towardTips ?? tipLine;
  const bearingDeg = towardTips ? angleDeg(inPlane, towardTips) : Math.min(angleDeg(inPlane, tipLine), angleDeg(inPlane, tipLine.map((x) => -x)));
  // mirror line: through the feed along towardTips, in the wire plane; every point must have a twin.
  // A lobe within 10° of the line is called on it (the words say "toward"/"away", no twin is drawn).
  let twin: V3 | null = null;
  if (normal && towardTips && bearingDeg >= 10 && bearingDeg <= 170) {
    const m = cross(normal, towardTips); // normal of the mirror plane
    const mirror = (v: readonly number[]): V3 => { const k = 2 * dot(v, m); return [v[0] - k * m[0], v[1] - k * m[1], v[2] - k * m[2]]; };
    const symmetric = pointsM.every((q) => { const r = mirror(sub(q, f)); return pointsM.some((s) => norm(sub(sub(s, f), r)) < 10 * tol); });
    if (symmetric) twin = mirror(inPlane);
  }
  return { normal, elevationDeg, outOfPlane: elevationDeg !== null && elevationDeg > OUT_OF_PLANE_DEG, inPlane, twin, towardTips, tipLine, bearingDeg };
}

export function describeLobe(
  pointsM: readonly (readonly number[])[], feedVertex: number, thetaRad: number, phiRad: number, tiltDeg: number,
): LobeWords {
  const g = lobeLayout(pointsM, feedVertex, thetaRad, phiRad);
  const numbers = `θ ${(thetaRad * DEG_PER_RAD).toFixed(0)}°, φ ${(((phiRad * DEG_PER_RAD) % 360 + 360) % 360).toFixed(0)}°`;
  // major axis of the field at the peak, in x–y–z (tilt from θ̂ toward φ̂)
  const t = (tiltDeg * Math.PI) / 180;
  const th = [Math.cos(thetaRad) * Math.cos(phiRad), Math.cos(thetaRad) * Math.sin(phiRad), -Math.sin(thetaRad)];
  const ph = [-Math.sin(phiRad), Math.cos(phiRad), 0];
  const e = th.map((v, i) => Math.cos(t) * v + Math.sin(t) * ph[i]);
  const axis = g.towardTips ? "the line from the feed toward the tips" : "the line joining the tips";

  if (g.outOfPlane) {
    const parallel = Math.abs(dot(e, g.tipLine)) >= Math.abs(dot(e, g.towardTips ?? g.tipLine)) ? "the line joining the two tips" : axis;
    return {
      lobe: `The main lobe points out of the plane of the wire (${g.elevationDeg!.toFixed(0)}° from it; ${numbers}), equally to both faces.`,
      mounting: `Stand the wire plane vertical to aim the lobe at the horizon; the field is parallel to ${parallel}, so keep that line horizontal for horizontal polarization or vertical for vertical polarization.`,
    };
  }
  const b = g.bearingDeg;
  const twins = g.twin ? " (two mirror-image lobes, one each side)" : "";
  const where = g.towardTips
    ? b < 10 ? "toward the arm tips, along the line from the feed through the middle of the tips"
      : b > 170 ? "away from the arm tips, back past the feed"
      : b >= 80 && b <= 100 ? `to the side, across the line from the feed toward the tips${twins}`
      : `${b.toFixed(0)}° from the line from the feed toward the tips, ${b < 90 ? "on the tips' side" : "on the feed's side, away from the tips"}${twins}`
    : b < 10 ? "along the line joining the tips"
      : b > 80 ? `broadside to the line joining the tips${twins}`
      : `${b.toFixed(0)}° from the line joining the tips${twins}`;
  const lift = g.elevationDeg === null ? "" : g.elevationDeg < 5 ? ", in the plane of the wire" : `, ${g.elevationDeg.toFixed(0)}° out of the plane of the wire`;
  const eInPlane = g.normal ? Math.abs(dot(e, g.normal)) < 0.7 : true;
  return {
    lobe: `The main lobe points ${where}${lift} (${numbers}).`,
    mounting: eInPlane
      ? "Mount the wire plane horizontal for horizontal polarization with the lobe toward the horizon; turn the plane on edge about the lobe direction for vertical polarization."
      : "Mount the wire plane horizontal for vertical polarization with the lobe toward the horizon; turn the plane on edge about the lobe direction for horizontal polarization.",
  };
}
