// Plain words for where the main lobe of a catalog shape points and how to mount it. A catalog shape
// lies in the x–y plane, fed at the origin, its arms mirror images about the y axis (the symmetry
// axis); "the open side" is +y, where the arms' tips lie for V-like shapes.
import { DEG_PER_RAD } from "../units.js";
import { direction } from "./patternFigures.js";

export interface LobeWords {
  lobe: string;
  mounting: string;
}

export function describeLobe(thetaRad: number, phiRad: number, tiltDeg: number): LobeWords {
  const d = direction(thetaRad, phiRad);
  const elevationDeg = Math.asin(Math.min(1, Math.abs(d[2]))) * DEG_PER_RAD;
  // in-plane bearing from the +y axis toward +x
  const bearingDeg = Math.atan2(Math.abs(d[0]), d[1]) * DEG_PER_RAD;
  // major axis of the field at the peak, in x–y–z
  const t = (tiltDeg * Math.PI) / 180;
  const th = [Math.cos(thetaRad) * Math.cos(phiRad), Math.cos(thetaRad) * Math.sin(phiRad), -Math.sin(thetaRad)];
  const ph = [-Math.sin(phiRad), Math.cos(phiRad), 0];
  const e = th.map((v, i) => Math.cos(t) * v + Math.sin(t) * ph[i]);
  const eInPlane = Math.hypot(e[0], e[1]) > 0.7;

  if (elevationDeg > 60) {
    const along = Math.abs(e[0]) > Math.abs(e[1]) ? "the line joining the two tips" : "the symmetry axis";
    return {
      lobe: `The main lobe points out of the plane of the wire (${elevationDeg.toFixed(0)}° from it), equally to both faces.`,
      mounting: `Stand the wire plane vertical to aim the lobe at the horizon; the field is parallel to ${along}, so keep that line horizontal for horizontal polarization or vertical for vertical polarization.`,
    };
  }
  const where =
    bearingDeg < 10 ? "along the symmetry axis, toward the open side of the arms"
    : bearingDeg > 170 ? "along the symmetry axis, away from the open side of the arms"
    : `${bearingDeg.toFixed(0)}° from the symmetry axis (two mirror-image lobes, one each side)`;
  const lift = elevationDeg < 5 ? "in the plane of the wire" : `${elevationDeg.toFixed(0)}° out of the plane of the wire`;
  return {
    lobe: `The main lobe points ${where}, ${lift}.`,
    mounting: eInPlane
      ? "Mount the wire plane horizontal for horizontal polarization with the lobe toward the horizon; turn the plane on edge about the lobe direction for vertical polarization."
      : "Mount the wire plane horizontal for vertical polarization with the lobe toward the horizon; turn the plane on edge about the lobe direction for horizontal polarization.",
  };
}
