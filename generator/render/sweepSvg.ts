// SWR, gain and realized gain across the sweep frequencies, as two stacked panels sharing one
// frequency axis in MHz: SWR on top (with the SWR = 2 line dashed), gain and realized gain in dBi
// below. The band is shaded in both panels and the design frequency is a dotted line. Linear
// scales and 1–2–5 ticks come from d3-scale.
import { scaleLinear, scaleLog, type ScaleContinuousNumeric } from "d3-scale";
import type { Entry } from "../catalog/entrySchema.js";
import { mhz, okParts } from "./entryParts.js";
import { FONT, PALETTE } from "./palette.js";
import { el, num, pathWithGaps, svgDoc, text, textWidth, type Pt } from "./svg.js";

export interface SweepOptions { widthPx?: number }

const W = 640, H = 526, L = 66, RGT = 24;
const SWR_PANEL = { top: 96, height: 150 }, GAIN_PANEL = { top: 274, height: 150 };
const SWR_CAP = 1000;
const tickLabel = (v: number, step: number): string => {
  const s = v.toFixed(Math.max(0, -Math.floor(Math.log10(step) + 1e-9)));
  return Number(s) === 0 ? s.replace("-", "") : s.replace("-", "\u2212");
};
const small = { "font-size": FONT.small, fill: PALETTE.inkSoft };

type Scale = ScaleContinuousNumeric<number, number>;

function yAxis(y: Scale, ticks: number[], x0: number, x1: number, title: string, panel: { top: number; height: number }): string {
  const step = ticks.length > 1 ? Math.min(...ticks.slice(1).map((v, i) => v - ticks[i])) : 1, out: string[] = [];
  for (const v of ticks) {
    out.push(el("line", { x1: x0, y1: y(v), x2: x1, y2: y(v), stroke: PALETTE.grid, "stroke-width": 1 }));
    out.push(text(x0 - 6, y(v) + 4, tickLabel(v, step), { ...small, "text-anchor": "end" }));
  }
  const cy = panel.top + panel.height / 2;
  out.push(text(18, cy, title, { "font-size": FONT.label, fill: PALETTE.ink, "text-anchor": "middle", transform: `rotate(-90 18 ${num(cy)})` }));
  return out.join("");
}

export function sweepSvg(entry: Entry, opts: SweepOptions = {}): string {
  const { sweep } = okParts(entry, "sweepSvg");
  const pts = sweep.points;
  if (pts.length < 2) throw new Error(`render sweepSvg: entry "${entry.id}" has ${pts.length} sweep point(s); need at least 2`);
  const fMHz = pts.map((p) => p.frequencyHz / 1e6);
  const x = scaleLinear().domain([fMHz[0], fMHz[fMHz.length - 1]]).range([L, W - RGT]);
  const swrs = pts.flatMap((p) => (p.swr === null ? [] : [p.swr]));
  // SWR up to 6 on a linear axis; beyond that a log axis to the next decade (at most 1000).
  const swrMax = Math.max(1, ...swrs), logSwr = swrMax > 6;
  const swrTop = logSwr ? Math.min(SWR_CAP, 10 ** Math.ceil(Math.log10(swrMax) - 1e-9)) : Math.max(3, Math.ceil(swrMax));
  const swrRange = [SWR_PANEL.top + SWR_PANEL.height, SWR_PANEL.top];
  const ySwr: Scale = logSwr ? scaleLog().domain([1, swrTop]).range(swrRange) : scaleLinear().domain([1, swrTop]).range(swrRange);
  const swrTicks = logSwr ? [1, 2, 5, 10, 20, 50, 100, 200, 500, 1000].filter((v) => v <= swrTop) : ySwr.ticks(5);
  const gains = pts.flatMap((p) => (p.realizedGainDbi === null ? [p.gainDbi] : [p.gainDbi, p.realizedGainDbi]));
  let lo = Math.min(...gains), hi = Math.max(...gains);
  if (hi - lo < 2) { const mid = (hi + lo) / 2; lo = mid - 1; hi = mid + 1; }
  const yGain = scaleLinear().domain([lo, hi]).nice(4).range([GAIN_PANEL.top + GAIN_PANEL.height, GAIN_PANEL.top]);
  const body: string[] = [];
  const panels = [SWR_PANEL, GAIN_PANEL];

  // Band shading and the design frequency, behind everything.
  const b0 = x(Math.max(fMHz[0], entry.inputs.bandLowHz / 1e6)), b1 = x(Math.min(fMHz[fMHz.length - 1], entry.inputs.bandHighHz / 1e6));
  for (const p of panels) body.push(el("rect", { "data-role": "band", x: b0, y: p.top, width: Math.max(0, b1 - b0), height: p.height, fill: PALETTE.band }));
  const fd = x(entry.inputs.frequencyHz / 1e6);
  for (const p of panels) body.push(el("line", { x1: fd, y1: p.top, x2: fd, y2: p.top + p.height, stroke: PALETTE.inkSoft, "stroke-width": 1.2, "stroke-dasharray": "2 3" }));

  // Axes and grids.
  body.push(yAxis(ySwr, swrTicks, L, W - RGT, logSwr ? "SWR (log scale)" : "SWR", SWR_PANEL), yAxis(yGain, yGain.ticks(4), L, W - RGT, "gain (dBi)", GAIN_PANEL));
  const xt = x.ticks(7), xStep = xt.length > 1 ? xt[1] - xt[0] : 1;
  const bottom = GAIN_PANEL.top + GAIN_PANEL.height;
  for (const v of xt) {
    for (const p of panels) body.push(el("line", { x1: x(v), y1: p.top, x2: x(v), y2: p.top + p.height, stroke: PALETTE.grid, "stroke-width": 1, "stroke-opacity": 0.7 }));
    body.push(text(x(v), bottom + 18, tickLabel(v, xStep), { ...small, "text-anchor": "middle" }));
  }
  body.push(text((L + W - RGT) / 2, bottom + 40, "frequency (MHz)", { "font-size": FONT.label, fill: PALETTE.ink, "text-anchor": "middle" }));
  for (const p of panels) body.push(el("rect", { x: L, y: p.top, width: W - RGT - L, height: p.height, fill: "none", stroke: PALETTE.gridStrong, "stroke-width": 1 }));

  // SWR 2 line, then the curves.
  body.push(el("line", { "data-role": "swr2", x1: L, y1: ySwr(2), x2: W - RGT, y2: ySwr(2), stroke: PALETTE.ink, "stroke-width": 1.3, "stroke-dasharray": "7 4" }));
  // Label the SWR 2 line at the end where the curve is farther from it, on the other side of it.
  const first = swrs[0] ?? 2, last = swrs[swrs.length - 1] ?? 2, atLeft = Math.abs(first - 2) > Math.abs(last - 2);
  const curveAbove = (atLeft ? first : last) > 2;
  body.push(text(atLeft ? L + 6 : W - RGT - 6, ySwr(2) + (curveAbove ? 15 : -5), "SWR 2", { ...small, fill: PALETTE.ink, "text-anchor": atLeft ? "start" : "end", "paint-order": "stroke", stroke: PALETTE.paper, "stroke-width": 3 }));
  const swrPts: (Pt | null)[] = pts.map((p, i) => (p.swr === null ? null : [x(fMHz[i]), ySwr(Math.min(swrTop, p.swr))]));
  const clipped = swrs.some((s) => s > swrTop);
  body.push(el("path", { "data-role": "swr", d: pathWithGaps(swrPts), fill: "none", stroke: PALETTE.wire, "stroke-width": 2.4, "stroke-linejoin": "round" }));
  const gPts: Pt[] = pts.map((p, i) => [x(fMHz[i]), yGain(p.gainDbi)]);
  const rPts: (Pt | null)[] = pts.map((p, i) => (p.realizedGainDbi === null ? null : [x(fMHz[i]), yGain(p.realizedGainDbi)]));
  body.push(el("path", { "data-role": "gain", d: pathWithGaps(gPts), fill: "none", stroke: PALETTE.lobe, "stroke-width": 2.4, "stroke-linejoin": "round" }));
  body.push(el("path", { "data-role": "realized-gain", d: pathWithGaps(rPts), fill: "none", stroke: PALETTE.lobeDeep, "stroke-width": 2, "stroke-dasharray": "6 3", "stroke-linejoin": "round" }));

  // Heading, legend, caption.
  body.push(text(20, 28, "SWR and gain across the sweep", { "font-size": FONT.heading, "font-weight": 700, fill: PALETTE.ink }));
  const items: [string, string][] = [
    [el("line", { x1: 0, y1: 0, x2: 26, y2: 0, stroke: PALETTE.wire, "stroke-width": 2.4 }), `SWR (${num(sweep.lineImpedanceOhm, 1)} Ω line)`],
    [el("line", { x1: 0, y1: 0, x2: 26, y2: 0, stroke: PALETTE.lobe, "stroke-width": 2.4 }), "gain"],
    [el("line", { x1: 0, y1: 0, x2: 26, y2: 0, stroke: PALETTE.lobeDeep, "stroke-width": 2, "stroke-dasharray": "6 3" }), "realized gain"],
    [el("rect", { x: 0, y: -6, width: 26, height: 12, fill: PALETTE.band }), "band"],
    [el("line", { x1: 13, y1: -7, x2: 13, y2: 7, stroke: PALETTE.inkSoft, "stroke-width": 1.2, "stroke-dasharray": "2 3" }), "design frequency"],
  ];
  let lx = L, ly = 54;
  items.forEach(([mark, words], i) => {
    if (i === 3) { lx = L; ly += 20; }
    body.push(el("g", { transform: `translate(${num(lx)} ${ly})` }, mark + text(32, 4, words, { "font-size": FONT.label, fill: PALETTE.ink })));
    lx += 32 + textWidth(words, FONT.label) + 22;
  });
  const cap = [`Shaded: ${entry.inputs.bandName}, ${mhz(entry.inputs.bandLowHz)}–${mhz(entry.inputs.bandHighHz)} MHz; design frequency ${mhz(entry.inputs.frequencyHz)} MHz.`];
  if (clipped) cap.push(`SWR above ${swrTop} is drawn at the top edge.`);
  cap.forEach((line, i) => body.push(text(20, H - 30 + i * 17, line, { ...small })));
  return svgDoc({ viewBox: [0, 0, W, H], widthPx: opts.widthPx ?? W, title: `SWR and gain across the sweep: ${entry.title}`, body: body.join("") });
}
