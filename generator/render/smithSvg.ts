// The input impedance across the sweep on a Smith chart normalised to the sweep's line impedance
// Z0: resistance circles r = 0, 0.2, 0.5, 1, 2, 5 and reactance arcs x = ±0.2 … ±5 inside the rim,
// the locus as a polyline (in-band part drawn bold), the design-frequency point, and the SWR = 2
// circle |Γ| = 1/3 dashed. Mapping Γ = (Z − Z0)/(Z + Z0): see smithMath.ts.
import type { Entry } from "../catalog/entrySchema.js";
import { mhz, okParts } from "./entryParts.js";
import { FONT, PALETTE } from "./palette.js";
import { gammaMagForSwr, gammaOf, reactanceArcPath, resistanceCircle, toXY, type Chart } from "./smithMath.js";
import { el, num, points, svgDoc, text, textWidth, type Pt } from "./svg.js";

export interface SmithOptions { widthPx?: number }

const W = 600, H = 680;
const CHART: Chart = { cx: 300, cy: 300, r: 230 };
const R_VALUES = [0.2, 0.5, 1, 2, 5], X_VALUES = [0.2, 0.5, 1, 2, 5];
const HALO = { "paint-order": "stroke", stroke: PALETTE.paper, "stroke-width": 3, "stroke-linejoin": "round" };
const small = { "font-size": FONT.small, fill: PALETTE.inkSoft };

function grid(): string {
  const { cx, cy, r } = CHART, out: string[] = [];
  out.push(el("circle", { cx, cy, r, fill: "#ffffff", stroke: PALETTE.gridStrong, "stroke-width": 1.5 }));
  out.push(el("line", { x1: cx - r, y1: cy, x2: cx + r, y2: cy, stroke: PALETTE.grid, "stroke-width": 1 }));
  for (const rv of R_VALUES) {
    const c = resistanceCircle(CHART, rv);
    out.push(el("circle", { cx: c.cx, cy: c.cy, r: c.r, fill: "none", stroke: PALETTE.grid, "stroke-width": rv === 1 ? 1.4 : 1 }));
  }
  for (const xv of X_VALUES) for (const s of [1, -1]) {
    out.push(el("path", { d: reactanceArcPath(CHART, s * xv), fill: "none", stroke: PALETTE.grid, "stroke-width": xv === 1 ? 1.4 : 1 }));
  }
  // Labels: r along the real axis, x just outside the rim, the ends of the axis by name.
  for (const rv of [0, ...R_VALUES]) {
    const [x, y] = toXY(CHART, gammaOf({ re: rv, im: 0 }, 1));
    out.push(text(x + 3, y - 4, String(rv), { ...small, ...HALO }));
  }
  for (const xv of X_VALUES) for (const s of [1, -1]) {
    const g = gammaOf({ re: 0, im: s * xv }, 1), [x, y] = toXY(CHART, { re: g.re * 1.07, im: g.im * 1.07 });
    const anchor = g.re > 0.3 ? "start" : g.re < -0.3 ? "end" : "middle";
    out.push(text(x, y + (g.im > 0 ? 0 : 9), `${s > 0 ? "+" : "−"}j${xv}`, { ...small, "text-anchor": anchor }));
  }
  out.push(text(cx - r - 6, cy + 4, "short", { ...small, "text-anchor": "end" }));
  out.push(text(cx + r + 6, cy + 4, "open", { ...small, "text-anchor": "start" }));
  return out.join("");
}

export function smithSvg(entry: Entry, opts: SmithOptions = {}): string {
  const { sweep, figures } = okParts(entry, "smithSvg");
  const z0 = sweep.lineImpedanceOhm;
  if (!(z0 > 0)) throw new Error(`render smithSvg: line impedance must be positive (got ${z0} Ω)`);
  const all: Pt[] = sweep.points.map((p) => toXY(CHART, gammaOf(p.impedanceOhm, z0)));
  const inBand = sweep.points.flatMap((p, i) => (p.inBand ? [all[i]] : []));
  const design = toXY(CHART, gammaOf(figures.inputImpedanceOhm, z0));
  const body: string[] = [grid()];
  const s2 = gammaMagForSwr(2) * CHART.r;
  body.push(el("circle", { "data-role": "swr2", cx: CHART.cx, cy: CHART.cy, r: s2, fill: "none", stroke: PALETTE.inkSoft, "stroke-width": 1.3, "stroke-dasharray": "6 4" }));
  body.push(text(CHART.cx, CHART.cy - s2 - 5, "SWR 2", { ...small, "text-anchor": "middle", ...HALO }));
  if (all.length > 1) body.push(el("polyline", { "data-role": "locus", points: points(all), fill: "none", stroke: PALETTE.wireSoft, "stroke-width": 2, "stroke-linejoin": "round" }));
  if (inBand.length > 1) body.push(el("polyline", { "data-role": "locus-in-band", points: points(inBand), fill: "none", stroke: PALETTE.wire, "stroke-width": 4.5, "stroke-linejoin": "round", "stroke-linecap": "round" }));
  for (const p of all) body.push(el("circle", { cx: p[0], cy: p[1], r: 2.2, fill: PALETTE.wire }));

  // Frequencies at the two ends of the sweep, pushed away from the chart centre, kept inside the
  // drawing and apart from each other.
  if (all.length > 1) {
    const ends = [0, all.length - 1].map((i) => {
      const p = all[i], dx = p[0] - CHART.cx, dy = p[1] - CHART.cy, l = Math.hypot(dx, dy) || 1;
      const words = `${mhz(sweep.points[i].frequencyHz)} MHz`, w = textWidth(words, FONT.small);
      let x = p[0] + (dx / l) * 10, anchor: "start" | "end" = dx >= 0 ? "start" : "end";
      if (anchor === "start" && x + w > W - 6) { x = p[0] - 10; anchor = "end"; }
      if (anchor === "end" && x - w < 6) { x = p[0] + 10; anchor = "start"; }
      return { x, y: p[1] + (dy / l) * 10 + 4, words, anchor };
    });
    if (Math.abs(ends[0].y - ends[1].y) < 14 && Math.abs(ends[0].x - ends[1].x) < 90) {
      const [hi, lo] = ends[0].y <= ends[1].y ? [ends[0], ends[1]] : [ends[1], ends[0]];
      const mid = (hi.y + lo.y) / 2;
      hi.y = mid - 8; lo.y = mid + 8;
    }
    for (const e of ends) body.push(text(e.x, e.y, e.words, { ...small, fill: PALETTE.ink, "text-anchor": e.anchor, ...HALO }));
  }
  body.push(el("circle", { "data-role": "design-point", cx: design[0], cy: design[1], r: 6, fill: PALETTE.lobe, stroke: PALETTE.ink, "stroke-width": 1.5 }));
  const zin = figures.inputImpedanceOhm;
  const zWords = `${zin.re.toFixed(1)} ${zin.im < 0 ? "−" : "+"} j${Math.abs(zin.im).toFixed(1)} Ω at ${mhz(entry.inputs.frequencyHz)} MHz`;

  // Heading and legend.
  body.push(text(20, 28, `Input impedance on a Smith chart, Z0 = ${num(z0, 1)} Ω`, { "font-size": FONT.heading, "font-weight": 700, fill: PALETTE.ink }));
  const ly = CHART.cy + CHART.r + 44, lx = 40;
  const row = (i: number, mark: string, words: string) => body.push(mark, text(lx + 40, ly + i * 21 + 4, words, { "font-size": FONT.label, fill: PALETTE.ink }));
  const y = (i: number) => ly + i * 21;
  row(0, el("line", { x1: lx, y1: y(0), x2: lx + 30, y2: y(0), stroke: PALETTE.wire, "stroke-width": 4.5, "stroke-linecap": "round" }), `in band, ${mhz(entry.inputs.bandLowHz)}–${mhz(entry.inputs.bandHighHz)} MHz`);
  row(1, el("line", { x1: lx, y1: y(1), x2: lx + 30, y2: y(1), stroke: PALETTE.wireSoft, "stroke-width": 2 }), `whole sweep, ${mhz(sweep.points[0]?.frequencyHz ?? 0)}–${mhz(sweep.points.at(-1)?.frequencyHz ?? 0)} MHz (dots: computed frequencies)`);
  row(2, el("circle", { cx: lx + 15, cy: y(2), r: 6, fill: PALETTE.lobe, stroke: PALETTE.ink, "stroke-width": 1.5 }), `design frequency: Z = ${zWords}`);
  row(3, el("line", { x1: lx, y1: y(3), x2: lx + 30, y2: y(3), stroke: PALETTE.inkSoft, "stroke-width": 1.3, "stroke-dasharray": "6 4" }), "SWR 2 circle: inside it, SWR < 2");
  return svgDoc({
    viewBox: [0, 0, W, H],
    widthPx: opts.widthPx ?? W,
    title: `Smith chart of the input impedance: ${entry.title}`,
    attrs: { "data-center": `${CHART.cx} ${CHART.cy}`, "data-radius": String(CHART.r) },
    body: body.join(""),
  });
}
