// A polar plot of one principal cut of the gain pattern (IEEE Std 145-2013: the great circle
// through the peak direction d along θ̂ or φ̂, r(α) = d cos α + t sin α). The peak (α = 0) is at
// the top, α grows counter-clockwise, and the radius is linear in dB: the outer ring is the cut's
// peak gain, the centre is 30 dB below it, lower values are clipped to the centre.
import type { Entry } from "../catalog/entrySchema.js";
import { RAD_PER_DEG } from "../units.js";
import { okParts } from "./entryParts.js";
import { FONT, PALETTE } from "./palette.js";
import { el, num, svgDoc, text, type Pt } from "./svg.js";

export interface CutOptions { widthPx?: number }

const W = 580, H = 628, CX = 290, CY = 284, R = 185, RANGE_DB = 30;
const HALO = { "paint-order": "stroke", stroke: PALETTE.paper, "stroke-width": 3, "stroke-linejoin": "round" };
type V3 = [number, number, number];

const dir = (th: number, ph: number): V3 => [Math.sin(th) * Math.cos(ph), Math.sin(th) * Math.sin(ph), Math.cos(th)];
const at = (alphaDeg: number, r: number): Pt => [CX - r * Math.sin(alphaDeg * RAD_PER_DEG), CY - r * Math.cos(alphaDeg * RAD_PER_DEG)];
const dbi = (v: number): string => `${v < 0 ? "\u2212" : ""}${Math.abs(v).toFixed(1)} dBi`;

/** Where a direction points, in one or two short lines: an axis within 2°, else φ (in the
 * x–y plane) or θ and φ, in degrees. */
function directionWords(v: V3): string[] {
  for (let i = 0; i < 3; i++) if (Math.abs(v[i]) > Math.cos(2 * RAD_PER_DEG)) return [`toward ${v[i] > 0 ? "+" : "−"}${"xyz"[i]}`];
  const th = Math.acos(Math.max(-1, Math.min(1, v[2]))) / RAD_PER_DEG;
  const ph = (Math.round(Math.atan2(v[1], v[0]) / RAD_PER_DEG) + 360) % 360;
  return Math.abs(th - 90) < 2 ? [`toward φ ${ph}°`] : ["toward", `θ ${th.toFixed(0)}°, φ ${ph}°`];
}

export function patternCutSvg(entry: Entry, which: "phi" | "theta", opts: CutOptions = {}): string {
  if (which !== "phi" && which !== "theta") throw new Error(`render patternCutSvg: cut must be "phi" or "theta" (got ${String(which)})`);
  const { pattern, figures } = okParts(entry, "patternCutSvg");
  const cut = which === "phi" ? pattern.cutAlongPhiDbi : pattern.cutAlongThetaDbi;
  const step = pattern.cutStepDeg, n = Math.round(360 / step);
  if (cut.length !== n) throw new Error(`render patternCutSvg: expected ${n} cut samples every ${step}°, got ${cut.length}`);
  const peak = Math.max(...cut), floor = peak - RANGE_DB;
  const radius = (g: number): number => (R * Math.max(0, Math.min(RANGE_DB, g - floor))) / RANGE_DB;
  const th = figures.peakDirection.thetaDeg * RAD_PER_DEG, ph = figures.peakDirection.phiDeg * RAD_PER_DEG;
  const d = dir(th, ph);
  const t: V3 = which === "phi" ? [-Math.sin(ph), Math.cos(ph), 0] : [Math.cos(th) * Math.cos(ph), Math.cos(th) * Math.sin(ph), -Math.sin(th)];
  const along = (a: number): V3 => { const c = Math.cos(a * RAD_PER_DEG), s = Math.sin(a * RAD_PER_DEG); return [d[0] * c + t[0] * s, d[1] * c + t[1] * s, d[2] * c + t[2] * s]; };
  const hat = which === "phi" ? "φ̂" : "θ̂";
  const body: string[] = [];

  // Grid: spokes every 30°, rings every 10 dB.
  for (let a = -150; a <= 180; a += 30) {
    const [x, y] = at(a, R);
    body.push(el("line", { x1: CX, y1: CY, x2: x, y2: y, stroke: PALETTE.grid, "stroke-width": 1 }));
  }
  for (let k = 1; k <= 3; k++) {
    body.push(el("circle", { "data-role": k === 3 ? "ring-peak" : undefined, cx: CX, cy: CY, r: (R * k) / 3, fill: "none", stroke: k === 3 ? PALETTE.gridStrong : PALETTE.grid, "stroke-width": k === 3 ? 1.5 : 1 }));
  }

  // The gain along the cut: sample i is at α = i·step − 180°.
  const pts = cut.map((g, i) => at(i * step - 180, radius(g)));
  const dPath = pts.map(([x, y], i) => `${i ? "L" : "M"}${num(x)} ${num(y)}`).join("") + "Z";
  body.push(el("path", { "data-role": "gain", d: dPath, fill: PALETTE.lobeSoft, "fill-opacity": 0.55, stroke: PALETTE.lobe, "stroke-width": 2.2, "stroke-linejoin": "round" }));

  // Ring labels on the 180° spoke just inside each ring, with a halo so the curve never hides them.
  for (let k = 1; k <= 3; k++) {
    const words = `${dbi(floor + 10 * k)}${k === 3 ? " (peak)" : ""}`;
    body.push(text(CX, CY + (R * k) / 3 - 6, words, { "font-size": FONT.small, fill: PALETTE.inkSoft, "text-anchor": "middle", ...HALO }));
  }

  // Spoke labels: angle from the peak, and where the ±90° and 180° directions point.
  for (let a = -150; a <= 180; a += 30) {
    const [x, y] = at(a, R + 16), s = Math.sin(a * RAD_PER_DEG), c = Math.cos(a * RAD_PER_DEG);
    const anchor = s > 0.3 ? "end" : s < -0.3 ? "start" : "middle";
    const yb = y + (c < -0.5 ? 11 : c > 0.5 ? -2 : 4);
    const words = a === 0 ? "0° peak" : a === 180 ? "180°" : `${a > 0 ? "+" : "−"}${Math.abs(a)}°`;
    body.push(text(x, yb, words, { "font-size": FONT.label, fill: PALETTE.ink, "text-anchor": anchor, "font-weight": a === 0 ? 700 : undefined }));
    if (a === 0 || a === 90 || a === -90 || a === 180) {
      const dirWords = directionWords(along(a)), up = c > 0.5;
      (up ? [...dirWords].reverse() : dirWords).forEach((w, j) => {
        body.push(text(x, yb + (up ? -15 : 15) * (j + 1), w, { "font-size": FONT.small, fill: PALETTE.inkSoft, "text-anchor": anchor }));
      });
    }
  }
  body.push(el("circle", { cx: pts[n / 2][0], cy: pts[n / 2][1], r: 4.5, fill: PALETTE.lobe, stroke: PALETTE.paper, "stroke-width": 1.5 }));

  // Heading and caption.
  const beam = which === "phi" ? figures.beamwidthAlongPhiDeg : figures.beamwidthAlongThetaDeg;
  const lines = [
    which === "phi" ? "Cut through the peak along φ̂ (in the wire's plane when the lobe is in it)." : "Cut through the peak along θ̂ (across the wire's plane when the lobe is in it).",
    `Peak at the top; angles from the peak, positive counter-clockwise (toward +${hat}).`,
    `Rings every 10 dB below the ${dbi(peak)} peak; 30 dB below it and less sits at the centre.`,
    `Half-power beamwidth: ${beam === null ? "none (gain stays within 3 dB)" : `${beam.toFixed(0)}°`}.`,
  ];
  const capY = CY + R + 82;
  body.push(text(20, 28, `Gain along ${hat} through the peak (dBi)`, { "font-size": FONT.heading, "font-weight": 700, fill: PALETTE.ink }));
  lines.forEach((l, i) => body.push(text(20, capY + i * 18, l, { "font-size": FONT.small, fill: PALETTE.inkSoft })));
  return svgDoc({
    viewBox: [0, 0, W, H],
    widthPx: opts.widthPx ?? W,
    title: `Gain pattern cut along ${which === "phi" ? "φ" : "θ"}: ${entry.title}`,
    attrs: { "data-center": `${CX} ${CY}`, "data-outer-radius": String(R) },
    body: body.join(""),
  });
}
