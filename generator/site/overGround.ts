// Page logic for designs over the ground (issue 13): the words for mounting and purpose, the
// elevation pattern and height curve as SVG text, the height-curve and other-ground tables, the
// support plan (where masts and tie-offs go, from the wire as hung) and the layout plan that takes
// the place of the 1:1 bending template for wires metres long (pegs, distances from the feed in
// metres and feet, as CSV and SVG). Pure functions of an entry; browser-safe (the compare page
// imports the chart). Every label that comes from an entry is escaped.
import { isOk, type Entry, type OkEntry } from "./ok.js";
import * as f from "./format.js";
import { escapeText } from "./compare.js";
import { plain, shown, type Shown } from "./shown.js";
import { METRE_PER_INCH } from "../units.js";

export type GroundInputs = NonNullable<Entry["inputs"]["overGround"]>;
export type GroundFigures = NonNullable<Entry["overGround"]>;
export type GroundEntry = OkEntry & { inputs: OkEntry["inputs"] & { overGround: GroundInputs }; overGround: GroundFigures };

/** An entry computed over the ground, with its over-ground figures. */
export function isOverGround(e: Entry): e is GroundEntry {
  return isOk(e) && e.inputs.overGround !== undefined && e.overGround !== undefined && e.overGround !== null;
}

/** Whether an entry (of any status) was asked for over the ground. */
export const askedOverGround = (e: Entry): boolean => e.inputs.overGround !== undefined;

export const MOUNTING_WORDS = {
  horizontal: "horizontal at a height",
  vertical: "vertical plane, feed at the mast top",
} as const;
export const PURPOSE_WORDS = {
  "long-distance": "long distance (low elevation)",
  "near-vertical": "regional, near-vertical (high elevation)",
  peak: "most gain in any direction", // designs made in the designer only; the catalog's cells have the other two
} as const;
export type Mounting = keyof typeof MOUNTING_WORDS;
export type Purpose = keyof typeof PURPOSE_WORDS;

const METRE_PER_FOOT = METRE_PER_INCH * 12;
/** Metres to the centimetre, trailing zeros dropped ("10 m", "14.88 m"): heights and distances on the ground. */
export const metresShort = (v: number): string => `${f.trimZeros(f.fixed(v, 2))} m`;
const n = (v: number): string => (Math.round(v * 10) / 10).toString();
const rad = (deg: number) => (deg * Math.PI) / 180;

/** One line for lists: "horizontal at 10 m · long distance (5–25°) · average ground". */
export function groundSummary(e: GroundEntry): string {
  const g = e.inputs.overGround;
  const [a, b] = g.elevationWindowDeg;
  return `${g.mounting === "horizontal" ? `horizontal at ${f.trimZeros(f.fixed(g.heightM, 1))} m` : `feed at the top of a ${f.trimZeros(f.fixed(g.heightM, 1))} m mast`} · ${g.purpose === "long-distance" ? "long distance" : "near-vertical"} (${f.fixed(a, 0)}–${f.fixed(b, 0)}°) · ${g.groundName} ground`;
}

// ---------------------------------------------------------------- elevation chart

/**
 * The charts' own styles, carried inside each SVG so that pages without them (every free-space
 * design page) do not load them; they add to the site's svg.overlay rules (rings, traces, labels).
 */
const CHART_STYLE = "<style>svg.ground-chart{width:100%;height:auto;display:block;max-width:28rem;margin:0 auto}" +
  "svg.ground-chart .window{fill:#efe5cf;opacity:.8}svg.ground-chart .mark{stroke:#24313a;stroke-width:1.5}" +
  "svg.ground-chart .groundline{stroke:#5b4a32;stroke-width:1.5}svg.ground-chart .hatch{stroke:#8c7b60}" +
  "svg.ground-chart .takeoff{fill:#d4762a;stroke:#24313a}svg.ground-chart .point{fill:#fbfaf7;stroke:#145c5a;stroke-width:1.5}" +
  "svg.ground-chart .takeofflabel{font-size:12px;font-weight:600;fill:#24313a;paint-order:stroke;stroke:#fbfaf7;stroke-width:3px}</style>";

/** What the site's stylesheet gives every overlay chart, for a chart shown on its own (an image). */
const STANDALONE_STYLE = "<style>svg.ground-chart{background:#fbfaf7;font-family:Inter,system-ui,sans-serif}" +
  "svg.ground-chart .ring{fill:none;stroke:#d3dadf}svg.ground-chart .spoke{stroke:#d3dadf;stroke-dasharray:2 3}" +
  "svg.ground-chart .ringlabel{font-size:12px;fill:#5d6d79;paint-order:stroke;stroke:#fbfaf7;stroke-width:3px;stroke-linejoin:round}" +
  "svg.ground-chart .charttitle{font-size:13px;font-weight:600;fill:#24313a}svg.ground-chart .trace{fill:none;stroke-width:2}" +
  "svg.ground-chart .s1{stroke:#d4762a}svg.ground-chart .s2{stroke:#145c5a}svg.ground-chart .s3{stroke:#6b4fa0}</style>";

export interface ElevationSeries {
  label: string;
  /** Gain every stepDeg from the horizon (0°) over the zenith (90°) to the far horizon (180°). */
  gainDbi: readonly number[];
  stepDeg: number;
  /** Colour class; by default the series' place (s1, s2, s3). */
  cls?: string;
}

export interface ElevationChart {
  series: readonly ElevationSeries[];
  title: string;
  /** The planning window, shaded on both sides of the zenith. */
  windowDeg?: readonly [number, number];
  /** Elevations marked with a spoke and their label. */
  marksDeg?: readonly number[];
  /** The takeoff of the first series, marked with a dot. */
  takeoff?: { elevationDeg: number; gainDbi: number };
  rangeDb?: number;
  widthPx?: number;
  /** Shown on its own (an <img>, a download), not inside a site page: carries the page's chart styles too. */
  standalone?: boolean;
}

export const ELEVATION_RANGE_DB = 30;

/**
 * A half-disc chart of gain against elevation: the ground line along the bottom, the horizon at
 * both ends, the zenith at the top; the radius is gain in dB from (best − range) at the centre to
 * the best gain rounded up at the rim. Up to three series (classes s1–s3).
 */
export function elevationChartSvg(c: ElevationChart): string {
  // drawn small (360 wide) so that on a phone it shows near 1:1 and its 12 px labels stay readable
  const w = c.widthPx ?? 360;
  const range = c.rangeDb ?? ELEVATION_RANGE_DB;
  const rMax = w / 2 - 30;
  const cx = w / 2, cy = rMax + 44;
  const h = cy + 44;
  const all = c.series.flatMap((s) => s.gainDbi);
  const top = Math.ceil(all.length ? Math.max(...all) : 0);
  const floor = top - range;
  const radius = (g: number) => ((Math.max(g, floor) - floor) / range) * rMax;
  const at = (elDeg: number, r: number): [number, number] => [cx + r * Math.cos(rad(elDeg)), cy - r * Math.sin(rad(elDeg))];
  const arc = (r: number) => { const [x0, y0] = at(0, r), [x1, y1] = at(180, r); return `M${n(x0)},${n(y0)}A${n(r)},${n(r)} 0 0 0 ${n(x1)},${n(y1)}`; };
  const parts: string[] = [];
  parts.push(`<text x="${n(cx)}" y="16" class="charttitle" text-anchor="middle">${escapeText(c.title)}</text>`);
  if (c.windowDeg) {
    const [a, b] = c.windowDeg;
    // a window reaching the zenith is one wedge over it; a lower one shows on both sides
    const wedges: [number, number][] = b >= 90 ? [[a, 180 - a]] : [[a, b], [180 - b, 180 - a]];
    for (const [lo, hi] of wedges) {
      const [x0, y0] = at(lo, rMax), [x1, y1] = at(hi, rMax);
      parts.push(`<path d="M${n(cx)},${n(cy)}L${n(x0)},${n(y0)}A${n(rMax)},${n(rMax)} 0 0 0 ${n(x1)},${n(y1)}Z" class="window"/>`);
    }
  }
  for (const d of [0, 10, 20, 30].filter((d) => d <= range)) {
    const r = radius(top - d);
    if (r <= 0) continue;
    parts.push(`<path d="${arc(r)}" class="ring"/>`);
    const [x, y] = at(0, r);
    parts.push(`<text x="${n(x)}" y="${n(y + 21)}" class="ringlabel" text-anchor="middle">${escapeText(f.fixed(top - d, 0))}${d === 0 ? " dBi" : ""}</text>`);
  }
  for (const el of [30, 60, 90, 120, 150]) {
    const [x, y] = at(el, rMax);
    parts.push(`<line x1="${n(cx)}" y1="${n(cy)}" x2="${n(x)}" y2="${n(y)}" class="spoke"/>`);
  }
  for (const el of [30, 60, 90]) {
    const [x, y] = at(el, rMax + 12);
    parts.push(`<text x="${n(x)}" y="${n(y + 4)}" class="ringlabel" text-anchor="middle">${el}°</text>`);
  }
  parts.push(`<text x="${n(cx + rMax + 4)}" y="${n(cy - 4)}" class="ringlabel">0°</text>`);
  for (const el of c.marksDeg ?? []) {
    const [x0, y0] = at(el, rMax), [x1, y1] = at(el, rMax + 5);
    parts.push(`<line x1="${n(x0)}" y1="${n(y0)}" x2="${n(x1)}" y2="${n(y1)}" class="mark" data-mark-deg="${n(el)}"/>`);
  }
  parts.push(`<line x1="6" y1="${n(cy)}" x2="${n(w - 6)}" y2="${n(cy)}" class="groundline"/>`);
  for (let x = 10; x < w - 6; x += 12) parts.push(`<line x1="${x}" y1="${n(cy)}" x2="${x - 7}" y2="${n(cy + 7)}" class="hatch"/>`);
  parts.push(`<text x="${n(cx)}" y="${n(cy + 34)}" class="ringlabel" text-anchor="middle">ground</text>`);
  parts.push(`<text x="8" y="${n(cy + 34)}" class="ringlabel">← far side</text>`);
  parts.push(`<text x="${n(w - 8)}" y="${n(cy + 34)}" class="ringlabel" text-anchor="end">toward the takeoff →</text>`);
  c.series.slice(0, 3).forEach((s, k) => {
    const d = s.gainDbi.map((g, i) => { const [x, y] = at(i * s.stepDeg, radius(g)); return `${i === 0 ? "M" : "L"}${n(x)},${n(y)}`; }).join("");
    parts.push(`<path d="${d}" class="trace ${s.cls ?? `s${k + 1}`}"><title>${escapeText(s.label)}</title></path>`);
  });
  if (c.takeoff) {
    const [x, y] = at(c.takeoff.elevationDeg, radius(c.takeoff.gainDbi));
    parts.push(`<circle cx="${n(x)}" cy="${n(y)}" r="4" class="takeoff"/>`);
    // the label sits on the zenith side of the dot, so it stays inside the chart at low takeoffs
    const right = c.takeoff.elevationDeg > 60;
    const high = c.takeoff.elevationDeg > 80; // below the dot, clear of the zenith's angle label
    parts.push(`<text x="${n(x + (right ? 8 : -8))}" y="${n(high ? y + 18 : y - 8)}" class="takeofflabel" text-anchor="${right ? "start" : "end"}">takeoff ${escapeText(f.degrees(c.takeoff.elevationDeg))}</text>`);
  }
  return `<svg xmlns="http://www.w3.org/2000/svg" viewBox="0 0 ${w} ${n(h)}" width="${w}" height="${n(h)}" role="img" aria-label="${escapeText(c.title)}" class="overlay elevation ground-chart">${c.standalone ? STANDALONE_STYLE : ""}${CHART_STYLE}${parts.join("")}</svg>`;
}

/** The design page's elevation pattern: the cut through the takeoff azimuth, window and planning elevations marked. */
export function elevationSvgOf(e: GroundEntry): string {
  const g = e.overGround;
  return elevationChartSvg({
    series: [{ label: e.title, gainDbi: g.elevationCut.gainDbi, stepDeg: g.elevationCut.stepDeg }],
    title: `Gain against elevation, azimuth ${f.degrees(g.elevationCut.azimuthDeg)}`,
    windowDeg: e.inputs.overGround.elevationWindowDeg,
    marksDeg: g.gainAtElevationDbi.map((p) => p.elevationDeg),
    takeoff: { elevationDeg: g.takeoffElevationDeg, gainDbi: g.elevationCut.gainDbi[Math.round(g.takeoffElevationDeg / g.elevationCut.stepDeg)] ?? e.figures.gainDbi },
  });
}

// ---------------------------------------------------------------- figures and tables

export interface Row { label: string; parts: Shown[]; note?: string }

export function groundFigureRows(e: GroundEntry): Row[] {
  const g = e.overGround, i = e.inputs.overGround;
  const [a, b] = i.elevationWindowDeg;
  return [
    { label: "Mounting", parts: [plain(i.mounting === "horizontal" ? "wire plane horizontal, " : "wire plane vertical, feed at the top of the mast, "), plain("feed "), shown(metresShort(g.feedHeightM), "overGround.feedHeightM"), plain(" up")] },
    { label: "Wire height", parts: [plain("lowest "), shown(metresShort(g.lowestPointM), "overGround.lowestPointM"), plain(", highest "), shown(metresShort(g.highestPointM), "overGround.highestPointM")] },
    { label: "Ground", parts: [plain(`${i.groundName}`), plain(i.ground.type === "real" ? ` (relative permittivity ${f.trimZeros(f.fixed(i.ground.relativePermittivity ?? 0, 1))}, conductivity ${f.trimZeros(f.fixed(i.ground.conductivitySPerM ?? 0, 4))} S/m)` : " (perfect conductor)")] },
    { label: "Planning window", parts: [plain(`${f.fixed(a, 0)}–${f.fixed(b, 0)}° elevation, for ${i.purpose === "long-distance" ? "long distance" : "regional near-vertical coverage"}`)] },
    { label: "Takeoff (best in the window)", parts: [shown(f.degrees(g.takeoffElevationDeg), "overGround.takeoffElevationDeg"), plain(" up at azimuth "), shown(f.degrees(g.takeoffAzimuthDeg), "overGround.takeoffAzimuthDeg"), plain(", "), shown(f.gainDbi(e.figures.gainDbi), "figures.gainDbi")] },
    { label: "Strongest in the whole sky", parts: [shown(f.gainDbi(g.peakGainDbi), "overGround.peakGainDbi"), plain(" at "), shown(f.degrees(g.peakElevationDeg), "overGround.peakElevationDeg"), plain(" elevation")] },
    { label: "Power lost in the ground", parts: g.groundLossFraction === null ? [plain("none (perfect ground)")] : [shown(f.percent(g.groundLossFraction), "overGround.groundLossFraction", "pct")] },
    { label: "Same wire in free space", parts: [shown(f.gainDbi(g.freeSpace.gainDbi), "overGround.freeSpace.gainDbi"), plain(", R "), shown(f.ohms(g.freeSpace.impedanceOhm.re), "overGround.freeSpace.impedanceOhm.re"), plain(", X "), shown(f.ohms(g.freeSpace.impedanceOhm.im), "overGround.freeSpace.impedanceOhm.im")], note: "the ground's reflection adds to the gain" },
  ];
}

/** Gain at each planning elevation, in the takeoff azimuth's vertical plane. */
export function elevationRows(e: GroundEntry): { elevation: string; gain: Shown; inWindow: boolean }[] {
  const [a, b] = e.inputs.overGround.elevationWindowDeg;
  return e.overGround.gainAtElevationDbi.map((p, k) => ({
    elevation: f.degrees(p.elevationDeg),
    gain: shown(f.gainDbi(p.gainDbi), `overGround.gainAtElevationDbi.${k}.gainDbi`),
    inWindow: p.elevationDeg >= a - 1e-9 && p.elevationDeg <= b + 1e-9,
  }));
}

export interface HeightRow {
  heightM: number;
  height: Shown;
  gain: Shown;
  takeoff: Shown;
  swr: Shown;
  impedance: Shown[];
  /** The height the design was made for. */
  current: boolean;
  gainDbi: number;
  takeoffDeg: number;
}

/** The height curve with the design's own height in its place (from the main figures), lowest first. */
export function heightRows(e: GroundEntry): HeightRow[] {
  const rows: HeightRow[] = e.overGround.heightCurve.map((h, k) => ({
    heightM: h.heightM,
    height: shown(metresShort(h.heightM), `overGround.heightCurve.${k}.heightM`),
    gain: shown(f.gainDbi(h.gainDbi), `overGround.heightCurve.${k}.gainDbi`),
    takeoff: shown(f.degrees(h.takeoffElevationDeg), `overGround.heightCurve.${k}.takeoffElevationDeg`),
    swr: h.swr === null ? plain("–") : shown(f.swr(h.swr), `overGround.heightCurve.${k}.swr`),
    impedance: [plain("R "), shown(f.ohms(h.impedanceOhm.re), `overGround.heightCurve.${k}.impedanceOhm.re`), plain(", X "), shown(f.ohms(h.impedanceOhm.im), `overGround.heightCurve.${k}.impedanceOhm.im`)],
    current: false,
    gainDbi: h.gainDbi,
    takeoffDeg: h.takeoffElevationDeg,
  }));
  const own = e.inputs.overGround.heightM;
  if (!rows.some((r) => Math.abs(r.heightM - own) < 1e-9)) {
    rows.push({
      heightM: own,
      height: shown(metresShort(own), "inputs.overGround.heightM"),
      gain: shown(f.gainDbi(e.figures.gainDbi), "figures.gainDbi"),
      takeoff: shown(f.degrees(e.overGround.takeoffElevationDeg), "overGround.takeoffElevationDeg"),
      swr: shown(f.swr(e.figures.swr), "figures.swr"),
      impedance: [plain("R "), shown(f.ohms(e.figures.inputImpedanceOhm.re), "figures.inputImpedanceOhm.re"), plain(", X "), shown(f.ohms(e.figures.inputImpedanceOhm.im), "figures.inputImpedanceOhm.im")],
      current: true,
      gainDbi: e.figures.gainDbi,
      takeoffDeg: e.overGround.takeoffElevationDeg,
    });
  } else for (const r of rows) r.current = Math.abs(r.heightM - own) < 1e-9;
  return rows.sort((x, y) => x.heightM - y.heightM);
}

/** The height curve as a small chart: gain against support height, each point labelled with its takeoff. */
export function heightCurveSvg(e: GroundEntry, widthPx = 360): string {
  const rows = heightRows(e);
  const h = 230, left = 40, right = 16, topPad = 36, bottom = 40;
  const xs = rows.map((r) => r.heightM), gs = rows.map((r) => r.gainDbi);
  const x0 = Math.floor(Math.min(...xs)) - 1, x1 = Math.ceil(Math.max(...xs)) + 1;
  const g0 = Math.floor(Math.min(...gs)) - 1, g1 = Math.ceil(Math.max(...gs)) + 1;
  const X = (v: number) => left + ((v - x0) / (x1 - x0)) * (widthPx - left - right);
  const Y = (v: number) => topPad + ((g1 - v) / (g1 - g0)) * (h - topPad - bottom);
  const parts: string[] = [`<text x="${n(widthPx / 2)}" y="16" class="charttitle" text-anchor="middle">Gain in the window by support height</text>`];
  const gStep = g1 - g0 > 8 ? 2 : 1;
  for (let g = g0; g <= g1; g += gStep) parts.push(`<line x1="${left}" y1="${n(Y(g))}" x2="${widthPx - right}" y2="${n(Y(g))}" class="ring"/><text x="${left - 6}" y="${n(Y(g) + 4)}" class="ringlabel" text-anchor="end">${escapeText(f.fixed(g, 0))}</text>`);
  const xStep = x1 - x0 > 12 ? 5 : x1 - x0 > 6 ? 2 : 1;
  for (let x = Math.ceil(x0 / xStep) * xStep; x <= x1; x += xStep) parts.push(`<line x1="${n(X(x))}" y1="${h - bottom}" x2="${n(X(x))}" y2="${h - bottom + 4}" class="spoke"/><text x="${n(X(x))}" y="${h - bottom + 16}" class="ringlabel" text-anchor="middle">${x}</text>`);
  parts.push(`<text x="${n(widthPx / 2)}" y="${h - 6}" class="ringlabel" text-anchor="middle">support height (m)</text>`);
  parts.push(`<text x="6" y="${n(topPad - 14)}" class="ringlabel">dBi</text>`);
  parts.push(`<line x1="${left}" y1="${h - bottom}" x2="${widthPx - right}" y2="${h - bottom}" class="groundline"/>`);
  parts.push(`<path d="${rows.map((r, k) => `${k ? "L" : "M"}${n(X(r.heightM))},${n(Y(r.gainDbi))}`).join("")}" class="trace s2"/>`);
  for (const r of rows) {
    parts.push(`<circle cx="${n(X(r.heightM))}" cy="${n(Y(r.gainDbi))}" r="${r.current ? 5 : 3.5}" class="${r.current ? "takeoff" : "point"}"${r.current ? ' data-current=""' : ""}/>`);
    parts.push(`<text x="${n(X(r.heightM))}" y="${n(Y(r.gainDbi) - 9)}" class="ringlabel" text-anchor="middle">${escapeText(f.fixed(r.takeoffDeg, 0))}°</text>`);
  }
  return `<svg xmlns="http://www.w3.org/2000/svg" viewBox="0 0 ${widthPx} ${h}" width="${widthPx}" height="${h}" role="img" aria-label="Gain in the planning window against support height; labels give the takeoff elevation" class="overlay heightcurve ground-chart">${CHART_STYLE}${parts.join("")}</svg>`;
}

export interface GroundRow { ground: string; gain: Shown; takeoff: Shown; swr: Shown; current: boolean }

/** The same wire at the same height over each ground, the design's own ground included. */
export function groundRows(e: GroundEntry): GroundRow[] {
  const own: GroundRow = {
    ground: e.inputs.overGround.groundName,
    gain: shown(f.gainDbi(e.figures.gainDbi), "figures.gainDbi"),
    takeoff: shown(f.degrees(e.overGround.takeoffElevationDeg), "overGround.takeoffElevationDeg"),
    swr: shown(f.swr(e.figures.swr), "figures.swr"),
    current: true,
  };
  const others = e.overGround.otherGrounds.map((g, k): GroundRow => ({
    ground: g.groundName,
    gain: shown(f.gainDbi(g.gainDbi), `overGround.otherGrounds.${k}.gainDbi`),
    takeoff: shown(f.degrees(g.takeoffElevationDeg), `overGround.otherGrounds.${k}.takeoffElevationDeg`),
    swr: g.swr === null ? plain("–") : shown(f.swr(g.swr), `overGround.otherGrounds.${k}.swr`),
    current: false,
  }));
  const order = ["poor", "average", "good"];
  const rank = (r: GroundRow) => { const i = order.indexOf(r.ground); return i < 0 ? order.length : i; };
  return [own, ...others].sort((a, b) => rank(a) - rank(b) || (a.ground < b.ground ? -1 : a.ground > b.ground ? 1 : 0));
}

// ---------------------------------------------------------------- support and layout plans

export type PointRole = "feed" | "bend" | "end";

export interface PlanPoint {
  /** Vertex index along the wire (0 = the left tip). */
  index: number;
  role: PointRole;
  /** Ground position below the point: x across, y along the symmetry axis, feed at the origin (m). */
  xM: number;
  yM: number;
  heightM: number;
  /** Straight-line distance on the ground from the spot below the feed (m). */
  groundFromFeedM: number;
  /** Distance along the wire from the feed (m). */
  wireFromFeedM: number;
  /** "left" or "right" arm, "" for the feed. */
  arm: "left" | "right" | "";
}

/** Every wire vertex as hung, with its ground position, height and distances from the feed. */
export function planPoints(e: GroundEntry): PlanPoint[] {
  const pts = e.overGround.mountedPointsM;
  const feed = e.shape.feedVertex;
  const wire: number[] = pts.map(() => 0);
  for (let k = feed + 1; k < pts.length; k++) wire[k] = wire[k - 1] + Math.hypot(pts[k][0] - pts[k - 1][0], pts[k][1] - pts[k - 1][1], pts[k][2] - pts[k - 1][2]);
  for (let k = feed - 1; k >= 0; k--) wire[k] = wire[k + 1] + Math.hypot(pts[k][0] - pts[k + 1][0], pts[k][1] - pts[k + 1][1], pts[k][2] - pts[k + 1][2]);
  const [fx, fy] = pts[feed];
  return pts.map((p, k) => ({
    index: k,
    role: k === feed ? "feed" : k === 0 || k === pts.length - 1 ? "end" : "bend",
    xM: p[0] - fx,
    yM: p[1] - fy,
    heightM: p[2],
    groundFromFeedM: Math.hypot(p[0] - fx, p[1] - fy),
    wireFromFeedM: wire[k],
    arm: k === feed ? "" : k < feed ? "left" : "right",
  }));
}

/** What holds each point up, in words. */
export function supportWords(e: GroundEntry, p: PlanPoint): string {
  const h = metresShort(p.heightM);
  const vertical = e.inputs.overGround.mounting === "vertical";
  if (p.role === "feed") return vertical ? `top of the mast, ${h}: the feed point and the feed line hang here` : `centre support (mast or halyard) at ${h}: the feed point; run the feed line down square to the wire`;
  if (p.role === "end") return `end insulator at ${h}, then rope to a tie-off (tree, mast or post) at the same height or higher, pulled in line with the last piece`;
  return `bend held at ${h}: a support or a rope pulling outward along the bisector of the bend, through an insulator`;
}

export interface SupportPlan {
  points: (PlanPoint & { words: string })[];
  /** Supports needed besides the feed: one per bend and end. */
  supports: number;
  tallestM: number;
  /** Points higher than the feed (a vertical design whose wire rises past the mast top). */
  aboveFeed: number;
  /** Largest ground distance from the feed: the radius the layout needs clear. */
  reachM: number;
}

export function supportPlan(e: GroundEntry): SupportPlan {
  const pts = planPoints(e);
  const feedH = e.overGround.feedHeightM;
  return {
    points: pts.map((p) => ({ ...p, words: supportWords(e, p) })),
    supports: pts.length - 1,
    tallestM: Math.max(...pts.map((p) => p.heightM)),
    aboveFeed: pts.filter((p) => p.heightM > feedH + 0.05).length,
    reachM: Math.max(...pts.map((p) => p.groundFromFeedM)),
  };
}

/** Fall distance to keep clear of power lines and people (common practice: the tallest support plus the wire's reach, then a margin). */
export function clearanceM(plan: SupportPlan): number {
  return plan.tallestM + plan.reachM;
}

export const LAYOUT_CSV_HEADER = "point,role,arm,ground_x_m,ground_y_m,height_m,ground_from_feed_m,ground_from_feed_ft,wire_from_feed_m,wire_from_feed_ft";

const roleWord = (p: PlanPoint) => (p.role === "feed" ? "feed" : p.role === "end" ? "end" : "bend");

/** The layout plan as CSV: one peg per wire point, metres (3 decimals) and feet (2 decimals). */
export function layoutCsv(e: GroundEntry): string {
  const rows = planPoints(e).map((p) => [
    p.role === "feed" ? "F" : `P${p.index}`,
    roleWord(p),
    p.arm || "centre",
    p.xM.toFixed(3),
    p.yM.toFixed(3),
    p.heightM.toFixed(3),
    p.groundFromFeedM.toFixed(3),
    (p.groundFromFeedM / METRE_PER_FOOT).toFixed(2),
    p.wireFromFeedM.toFixed(3),
    (p.wireFromFeedM / METRE_PER_FOOT).toFixed(2),
  ].join(","));
  return [`# ${e.title.replace(/[\r\n]+/g, " ")}: layout plan, one peg below each wire point; ground x/y from the spot below the feed`, LAYOUT_CSV_HEADER, ...rows].join("\n") + "\n";
}

/** Rows for the page's layout table. */
export function layoutRows(e: GroundEntry): { label: string; role: string; ground: string; groundFt: string; wire: string; wireFt: string; height: string; heightFt: string; xy: string }[] {
  return planPoints(e).map((p) => ({
    label: p.role === "feed" ? "F" : `P${p.index}`,
    role: p.role === "feed" ? "feed point" : p.role === "end" ? `${p.arm} end` : `${p.arm} bend`,
    ground: metresShort(p.groundFromFeedM),
    groundFt: f.feet(p.groundFromFeedM),
    wire: metresShort(p.wireFromFeedM),
    wireFt: f.feet(p.wireFromFeedM),
    height: metresShort(p.heightM),
    heightFt: f.feet(p.heightM),
    xy: `${f.fixed(p.xM, 2)}, ${f.fixed(p.yM, 2)}`,
  }));
}

interface Box { x0: number; y0: number; x1: number; y1: number }
const overlaps = (a: Box, b: Box) => a.x0 < b.x1 && b.x0 < a.x1 && a.y0 < b.y1 && b.y0 < a.y1;
/** Approximate advance of a character at the layout plan's label sizes (px): wide enough to keep labels apart. */
const CHAR_PX = 6.8;

/**
 * Greedy label placement: each block (lines of text) goes to the first of its candidate vertical
 * offsets where it overlaps no block placed before it, its x kept inside the drawing. Returns the
 * top-left corner of each block.
 */
function placeBlocks(items: { x: number; y: number; lines: string[] }[], offsets: readonly number[], widthPx: number, taken: Box[]): { x: number; y: number }[] {
  return items.map((it) => {
    const w = Math.max(...it.lines.map((l) => l.length)) * CHAR_PX, h = it.lines.length * 13 + 2;
    const x0 = Math.min(Math.max(it.x - w / 2, 4), widthPx - 4 - w);
    let best: Box | null = null;
    for (const dy of offsets) {
      const box = { x0, y0: it.y + dy, x1: x0 + w, y1: it.y + dy + h };
      if (!taken.some((t) => overlaps(t, box))) { best = box; break; }
    }
    best ??= { x0, y0: it.y + offsets[offsets.length - 1], x1: x0 + w, y1: it.y + offsets[offsets.length - 1] + h };
    taken.push(best);
    return { x: best.x0, y: best.y0 };
  });
}

/**
 * The layout plan as a drawing to scale (not 1:1): seen from above, the spot below the feed at the
 * centre, a peg below each wire point labelled with its ground distance from the feed in metres
 * and feet and the height it hangs at; for a vertical design a side view below shows the heights.
 */
export function layoutSvg(e: GroundEntry, widthPx = 640): string {
  const pts = planPoints(e);
  const vertical = e.inputs.overGround.mounting === "vertical";
  const pad = 56;
  const xs = pts.map((p) => p.xM), ys = pts.map((p) => p.yM);
  const minX = Math.min(...xs, 0), maxX = Math.max(...xs, 0), maxY = Math.max(...ys, 0);
  const spanX = Math.max(maxX - minX, 1);
  const scale = (widthPx - 2 * pad) / spanX;
  // plan coordinates first (y down from the topmost peg), shifted at the end to fit every label
  const px = (x: number) => pad + (x - minX) * scale;
  const py = (y: number) => (maxY - y) * scale;
  const parts: string[] = [];
  const taken: Box[] = pts.map((p) => ({ x0: px(p.xM) - 5, y0: py(p.yM) - 5, x1: px(p.xM) + 5, y1: py(p.yM) + 5 }));
  parts.push(`<path d="${pts.map((p, k) => `${k ? "L" : "M"}${n(px(p.xM))},${n(py(p.yM))}`).join("")}" class="wire"/>`);
  for (const p of pts) parts.push(`<circle cx="${n(px(p.xM))}" cy="${n(py(p.yM))}" r="${p.role === "feed" ? 5 : 4}" class="${p.role === "feed" ? "feedpeg" : "peg"}"/>`);
  // the feed first (it anchors the plan), then outward from it
  const order = [...pts].sort((a, b) => (a.role === "feed" ? -1 : b.role === "feed" ? 1 : a.groundFromFeedM - b.groundFromFeedM || a.index - b.index));
  const blocks = order.map((p) => ({
    x: px(p.xM), y: py(p.yM),
    lines: p.role === "feed" ? [`F (feed), ${metresShort(p.heightM)} up`] : [`P${p.index}: ${metresShort(p.groundFromFeedM)} / ${f.feet(p.groundFromFeedM)}`, `${metresShort(p.heightM)} up`],
  }));
  const at = placeBlocks(blocks, [8, -36, 36, -64, 64, -92, 92], widthPx, taken);
  blocks.forEach((b, k) => {
    parts.push(`<text x="${n(at[k].x)}" y="${n(at[k].y + 11)}" class="peglabel">${escapeText(b.lines[0])}</text>`);
    if (b.lines[1]) parts.push(`<text x="${n(at[k].x)}" y="${n(at[k].y + 24)}" class="ringlabel">${escapeText(b.lines[1])}</text>`);
  });
  // scale bar: a round number of metres near a fifth of the width, below everything drawn so far
  const target = spanX / 5;
  const bar = [1, 2, 5, 10, 20, 50].find((v) => v >= target) ?? 50;
  const by = Math.max(...taken.map((t) => t.y1)) + 18;
  parts.push(`<line x1="${pad}" y1="${n(by)}" x2="${n(pad + bar * scale)}" y2="${n(by)}" class="scalebar"/><text x="${n(pad + bar * scale + 6)}" y="${n(by + 4)}" class="ringlabel">${bar} m (${escapeText(f.feet(bar))})</text>`);
  let bottom = by + 16;
  if (vertical) {
    const maxH = Math.max(...pts.map((p) => p.heightM));
    const titleY = bottom + 22;
    const top = titleY + 40;
    const gy = top + maxH * scale;
    const sy = (hM: number) => gy - hM * scale;
    parts.push(`<text x="${n(widthPx / 2)}" y="${n(titleY)}" class="charttitle" text-anchor="middle">Side view: heights above the ground</text>`);
    parts.push(`<line x1="8" y1="${n(gy)}" x2="${widthPx - 8}" y2="${n(gy)}" class="groundline"/>`);
    parts.push(`<line x1="${n(px(0))}" y1="${n(gy)}" x2="${n(px(0))}" y2="${n(sy(e.overGround.feedHeightM))}" class="mast"/>`);
    parts.push(`<path d="${pts.map((p, k) => `${k ? "L" : "M"}${n(px(p.xM))},${n(sy(p.heightM))}`).join("")}" class="wire"/>`);
    const side: Box[] = [{ x0: 0, y0: titleY - 14, x1: widthPx, y1: titleY + 4 }];
    for (const p of pts) {
      parts.push(`<line x1="${n(px(p.xM))}" y1="${n(gy)}" x2="${n(px(p.xM))}" y2="${n(sy(p.heightM))}" class="drop"/><circle cx="${n(px(p.xM))}" cy="${n(gy)}" r="3" class="peg"/>`);
      side.push({ x0: px(p.xM) - 4, y0: sy(p.heightM) - 4, x1: px(p.xM) + 4, y1: sy(p.heightM) + 4 });
    }
    const sideBlocks = order.map((p) => ({ x: px(p.xM), y: sy(p.heightM), lines: [`${p.role === "feed" ? "F" : `P${p.index}`} ${metresShort(p.heightM)}`] }));
    const sat = placeBlocks(sideBlocks, [-22, 8, -38, 24, -54], widthPx, side);
    sideBlocks.forEach((b, k) => parts.push(`<text x="${n(sat[k].x)}" y="${n(sat[k].y + 11)}" class="ringlabel">${escapeText(b.lines[0])}</text>`));
    bottom = Math.max(gy, ...side.map((t) => t.y1)) + 16;
  }
  const minTop = Math.min(0, ...taken.map((t) => t.y0));
  const dy = 34 - minTop; // room for the title above the highest label
  const total = bottom + dy;
  return `<svg xmlns="http://www.w3.org/2000/svg" viewBox="0 0 ${widthPx} ${n(total)}" width="${widthPx}" height="${n(total)}" role="img" aria-label="Layout plan: pegs below each wire point with distances from the feed" class="overlay layout" data-layout-plan="${escapeText(e.id)}">` +
    `<style>.wire{fill:none;stroke:#145c5a;stroke-width:2}.peg{fill:#fbfaf7;stroke:#24313a;stroke-width:1.5}.feedpeg{fill:#d4762a;stroke:#24313a}.peglabel{font:11px sans-serif;fill:#24313a}.ringlabel{font:11px sans-serif;fill:#56636c}.charttitle{font:600 13px sans-serif;fill:#24313a}.groundline{stroke:#5b4a32;stroke-width:1.5}.mast{stroke:#24313a;stroke-width:3}.drop{stroke:#9aa5ad;stroke-dasharray:3 3}.scalebar{stroke:#24313a;stroke-width:3}.peglabel,.ringlabel{paint-order:stroke;stroke:#fbfaf7;stroke-width:3px;stroke-linejoin:round}` +
    // on a page: full width on a screen, natural size (scrolling sideways) on a phone so labels stay readable
    `.layout-fig svg.layout{width:100%;height:auto;display:block}@media (max-width:40rem){.layout-fig{overflow-x:auto}.layout-fig svg.layout{width:${widthPx}px;max-width:none}}</style>` +
    `<text x="${n(widthPx / 2)}" y="20" class="charttitle" text-anchor="middle">Layout plan, seen from above (to scale, not 1:1)</text>` +
    `<g transform="translate(0 ${n(dy)})">${parts.join("")}</g></svg>`;
}

/** The layout plan's file names. */
export const layoutNames = (id: string) => ({ csv: `${id}.layout.csv`, svg: `${id}.layout.svg` });

// ---------------------------------------------------------------- finder

export interface GroundRecord {
  heightM: number;
  supportHeightM: number;
  mounting: Mounting;
  purpose: Purpose;
  takeoffDeg: number;
  groundName: string;
}

export function groundRecordOf(e: Entry): GroundRecord | undefined {
  if (!isOverGround(e)) return undefined;
  const g = e.inputs.overGround;
  return { heightM: g.heightM, supportHeightM: e.overGround.highestPointM, mounting: g.mounting, purpose: g.purpose, takeoffDeg: e.overGround.takeoffElevationDeg, groundName: g.groundName };
}

// ---------------------------------------------------------------- band table

export const GROUND_COLUMNS = [
  { key: "height", label: "Height", numeric: true },
  { key: "mounting", label: "Mounting", numeric: false },
  { key: "purpose", label: "Purpose", numeric: false },
  { key: "takeoff", label: "Takeoff", numeric: true },
] as const;
export type GroundColumn = (typeof GROUND_COLUMNS)[number]["key"];

/** The band table's extra cells for a design over the ground (the same shape as tables.ts's cells). */
export function groundBandCells(e: Entry): Record<GroundColumn, { parts: Shown[]; sort: number | string }> {
  const g = e.inputs.overGround;
  const none = { parts: [plain("–")], sort: -Infinity };
  if (!g) return { height: none, mounting: none, purpose: none, takeoff: none };
  return {
    height: { parts: [shown(metresShort(g.heightM), "inputs.overGround.heightM")], sort: g.heightM },
    mounting: { parts: [plain(g.mounting === "horizontal" ? "horizontal" : "vertical, feed on top")], sort: g.mounting },
    purpose: { parts: [plain(g.purpose === "long-distance" ? "long distance" : "near-vertical")], sort: g.purpose },
    takeoff: isOverGround(e) ? { parts: [shown(f.degrees(e.overGround.takeoffElevationDeg), "overGround.takeoffElevationDeg")], sort: e.overGround.takeoffElevationDeg } : none,
  };
}

/** Whether a band's designs are computed over the ground (any of them asked for it). */
export const bandOverGround = (entries: readonly Entry[]): boolean => entries.some(askedOverGround);
