// What the designer shows of a design over ground, as rows of text: the figures `design` reports
// over ground (the ground, the mounting, the feed height, the whole-sky peak with its elevation and
// azimuth, the objective's gain in its window, the ground loss, the gain at the planning elevations)
// and, once the analysis has run, the takeoff (the strongest direction within the window). Pure and
// DOM-free, so the page writes the rows with textContent and tests read them here. Nothing in free space.
import type { DesignResult } from "../design/designResult.js";
import * as f from "../site/format.js";
import type { Takeoff } from "./designJob.js";
import { groundNameOf } from "./groundName.js";

export interface GroundRow { label: string; text: string }
export interface GroundView { rows: GroundRow[]; elevations: { elevation: string; gain: string }[] }

const where = (elevationDeg: number, azimuthDeg: number) =>
  `${f.degrees(elevationDeg)} elevation, azimuth ${f.degrees(azimuthDeg)} (from +x toward +y)`;

export function groundView(r: DesignResult, takeoff: Takeoff | null = null): GroundView | null {
  const g = r.ground;
  if (!g || r.status !== "ok" || r.peakElevationDeg === undefined || r.peakAzimuthDeg === undefined || !r.elevationWindowDeg) return null;
  const name = groundNameOf(g);
  const groundText = g.type === "perfect"
    ? "perfect (an ideal conductor)"
    : `${name === "real" ? "real" : name} (ε_r ${g.relativePermittivity}, σ ${g.conductivitySPerM} S/m)`;
  const [lo, hi] = r.elevationWindowDeg;
  const rows: GroundRow[] = [
    { label: "Ground", text: groundText },
    { label: "Mounting", text: r.mounting === "vertical" ? "vertical: the wire hangs in a vertical plane below the feed" : "horizontal: the wire plane level above the ground" },
    { label: "Feed height", text: f.metres(r.feedHeightM!) },
    { label: "Lowest point", text: f.metres(r.lowestPointM!) },
    { label: "Peak gain (whole sky)", text: `${f.gainDbi(r.peakGainDbi)} at ${where(r.peakElevationDeg, r.peakAzimuthDeg)}` },
    { label: `Objective: ${r.objective}`, text: r.objectiveGainDbi === null || r.objectiveGainDbi === undefined ? "no feasible shape" : `${f.gainDbi(r.objectiveGainDbi)} best gain at ${lo}–${hi}° elevation (search mesh)` },
  ];
  if (takeoff) rows.push({ label: "Takeoff", text: `${where(takeoff.elevationDeg, takeoff.azimuthDeg)}: ${f.gainDbi(takeoff.gainDbi)}, the strongest direction within ${takeoff.windowDeg[0]}–${takeoff.windowDeg[1]}°` });
  const lossText = g.type === "perfect" || r.groundLossW === null || r.groundLossW === undefined || !r.inputPowerW
    ? "none (perfect ground)"
    : `${f.percent(r.groundLossW / r.inputPowerW)} of the input power`;
  rows.push({ label: "Ground loss", text: lossText });
  const elevations = (r.gainAtElevationDbi ?? []).map((e) => ({ elevation: `${e.elevationDeg}°`, gain: f.gainNumber(e.gainDbi) }));
  return { rows, elevations };
}
