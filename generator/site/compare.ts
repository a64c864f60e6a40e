// The compare page's overlaid pattern cuts: several designs' gain around one principal plane on one
// polar chart, each turned so its own main lobe points up. Returns SVG text; every label is
// escaped, so it is safe to place even when it came from an entry.
import * as f from "./format.js";

export interface PolarSeries {
  label: string;
  /** Gain every `stepDeg` from −180° to 180° − step, 0 = the main lobe. */
  valuesDbi: readonly number[];
  stepDeg: number;
  /** Colour class; by default the series' place (s1, s2, s3). */
  cls?: string;
}

export const SERIES_CLASSES = ["s1", "s2", "s3"] as const;
export const RANGE_DB = 30;

export function escapeText(text: string): string {
  return text.replace(/&/g, "&amp;").replace(/</g, "&lt;").replace(/>/g, "&gt;").replace(/"/g, "&quot;").replace(/'/g, "&#39;");
}

const n = (v: number): string => (Math.round(v * 10) / 10).toString();

/** One polar chart with up to three series; the outer ring is the best peak rounded up to 1 dB. */
export function overlayPolarSvg(series: readonly PolarSeries[], title: string, sizePx = 360): string {
  const cx = sizePx / 2, cy = sizePx / 2 + 6, rMax = sizePx / 2 - 34;
  const all = series.flatMap((s) => s.valuesDbi);
  const top = Math.ceil(all.length ? Math.max(...all) : 0);
  const floor = top - RANGE_DB;
  const radius = (g: number) => (Math.max(g, floor) - floor) / RANGE_DB * rMax;
  // ring labels sit along a spoke 105° clockwise from the top (just below the right-hand axis, clear
  // of the main lobe and its label) and carry a paper-coloured halo, so a trace under one stays readable
  const labelAngle = (105 * Math.PI) / 180;
  const rings = [0, 10, 20, 30].map((d) => {
    const r = radius(top - d);
    const label = d === 30 ? "" : `<text x="${n(cx + r * Math.sin(labelAngle) + 3)}" y="${n(cy - r * Math.cos(labelAngle) + 12)}" class="ringlabel">${escapeText(f.fixed(top - d, 0))} dBi</text>`;
    return `<circle cx="${n(cx)}" cy="${n(cy)}" r="${n(r)}" class="ring"/>` + label;
  }).join("");
  const spokes = Array.from({ length: 12 }, (_, i) => {
    const a = (i * 30 * Math.PI) / 180;
    return `<line x1="${n(cx)}" y1="${n(cy)}" x2="${n(cx + rMax * Math.sin(a))}" y2="${n(cy - rMax * Math.cos(a))}" class="spoke"/>`;
  }).join("");
  const paths = series.slice(0, SERIES_CLASSES.length).map((s, k) => {
    const d = s.valuesDbi.map((g, i) => {
      const a = ((-180 + i * s.stepDeg) * Math.PI) / 180;
      const r = radius(g);
      return `${i === 0 ? "M" : "L"}${n(cx + r * Math.sin(a))},${n(cy - r * Math.cos(a))}`;
    }).join("") + "Z";
    return `<path d="${d}" class="trace ${s.cls ?? SERIES_CLASSES[k]}"><title>${escapeText(s.label)}</title></path>`;
  }).join("");
  return `<svg xmlns="http://www.w3.org/2000/svg" viewBox="0 0 ${sizePx} ${sizePx + 12}" role="img" aria-label="${escapeText(title)}" class="overlay">` +
    `<text x="${n(cx)}" y="16" class="charttitle" text-anchor="middle">${escapeText(title)}</text>` +
    rings + spokes + paths +
    `<text x="${n(cx)}" y="${n(cy - rMax - 6)}" class="ringlabel" text-anchor="middle">main lobe</text></svg>`;
}

export interface CompareDesign {
  id: string;
  title: string;
  inputs: { bandName: string; frequencyHz: number; lengthWl: number; lengthM: number; piecesPerArm: number; variant: f.Variant; wireDiameterM: number };
  figures: { gainDbi: number; swr: number; radiationEfficiency: number; frontToBackDb: number; beamwidthAlongPhiDeg: number | null; beamwidthAlongThetaDeg: number | null };
  shape: { spanM: { x: number; y: number } };
  sweep: { swr2Span: { widthHz: number } | null };
  tolerance: { fragile: boolean; gainDbi: { p5: number | null } };
  pattern: { cutStepDeg: number; cutAlongPhiDbi: number[]; cutAlongThetaDbi: number[] };
}

/** The over-ground part a compared design may carry (issue 13). */
export interface CompareGround {
  inputs: { overGround?: { heightM: number; mounting: "horizontal" | "vertical"; purpose: "long-distance" | "near-vertical" | "peak"; groundName: string; elevationWindowDeg: [number, number] } };
  overGround?: { takeoffElevationDeg: number; highestPointM: number; elevationCut: { azimuthDeg: number; stepDeg: number; gainDbi: number[] }; freeSpace: { gainDbi: number } } | null;
}

export interface CompareCharts {
  /** Designs in free space, for the two polar cuts (with their place among all compared designs). */
  polar: { design: CompareDesign; k: number }[];
  /** Designs over the ground, for the elevation overlay. */
  elevation: { design: CompareDesign & CompareGround; k: number }[];
}

/** Which designs go on which chart: the polar cuts for free space, the elevation pattern over the ground. */
export function compareCharts(designs: readonly (CompareDesign & CompareGround)[]): CompareCharts {
  const out: CompareCharts = { polar: [], elevation: [] };
  designs.forEach((design, k) => (design.overGround && design.inputs.overGround ? out.elevation : out.polar).push({ design, k }));
  return out;
}

/** The side-by-side table: one row per figure, one text per design. */
export function compareRows(designs: readonly (CompareDesign & Partial<CompareGround>)[]): { label: string; values: string[] }[] {
  const row = (label: string, pick: (d: CompareDesign) => string) => ({ label, values: designs.map(pick) });
  const bw = (v: number | null) => (v === null ? "–" : f.degrees(v));
  return [
    row("Band", (d) => `${d.inputs.bandName}, ${f.mhz(d.inputs.frequencyHz)}`),
    row("Gain", (d) => f.gainDbi(d.figures.gainDbi)),
    row("Gain, 5 % worst build", (d) => (d.tolerance.gainDbi.p5 === null ? "–" : f.gainDbi(d.tolerance.gainDbi.p5))),
    row("SWR at the design frequency", (d) => f.swr(d.figures.swr)),
    row("SWR < 2 bandwidth", (d) => f.bandwidth(d.sweep.swr2Span?.widthHz ?? null)),
    row("Wire length", (d) => `${f.wavelengths(d.inputs.lengthWl)} · ${f.metres(d.inputs.lengthM)}`),
    row("Pieces per arm", (d) => String(d.inputs.piecesPerArm)),
    row("Span", (d) => f.span(d.shape.spanM)),
    row("Feed variant", (d) => f.variantWords(d.inputs.variant)),
    row("Radiation efficiency", (d) => f.percent(d.figures.radiationEfficiency)),
    row("Front-to-back", (d) => `${f.fixed(d.figures.frontToBackDb, 1)} dB`),
    row("Beamwidth along φ / θ", (d) => `${bw(d.figures.beamwidthAlongPhiDeg)} / ${bw(d.figures.beamwidthAlongThetaDeg)}`),
    row("Bending tolerance", (d) => (d.tolerance.fragile ? "sensitive" : "forgiving")),
    ...groundCompareRows(designs),
  ];
}

/** Rows for designs over the ground, present only when one of the compared designs is. */
function groundCompareRows(designs: readonly (CompareDesign & CompareGround)[]): { label: string; values: string[] }[] {
  if (!designs.some((d) => d.overGround && d.inputs.overGround)) return [];
  const pick = (fn: (g: NonNullable<CompareGround["inputs"]["overGround"]>, o: NonNullable<CompareGround["overGround"]>) => string) =>
    designs.map((d) => (d.overGround && d.inputs.overGround ? fn(d.inputs.overGround, d.overGround) : "free space"));
  return [
    { label: "Mounting and height", values: pick((g) => `${g.mounting === "horizontal" ? "horizontal" : "vertical, feed on top"} at ${f.trimZeros(f.fixed(g.heightM, 1))} m`) },
    { label: "Highest wire point", values: pick((_, o) => f.metres(o.highestPointM)) },
    { label: "Purpose (elevation window)", values: pick((g) => `${g.purpose === "long-distance" ? "long distance" : g.purpose === "peak" ? "most gain anywhere" : "near-vertical"} (${f.fixed(g.elevationWindowDeg[0], 0)}–${f.fixed(g.elevationWindowDeg[1], 0)}°)`) },
    { label: "Takeoff elevation", values: pick((_, o) => f.degrees(o.takeoffElevationDeg)) },
    { label: "Ground", values: pick((g) => g.groundName) },
    { label: "Same wire in free space", values: pick((_, o) => f.gainDbi(o.freeSpace.gainDbi)) },
  ];
}

/** Design ids from the compare page's address: at most three, no repeats, URL-safe only. */
export function idsFromQuery(value: string | null): string[] {
  if (!value) return [];
  const out: string[] = [];
  for (const id of value.split(",").map((s) => s.trim())) {
    if (/^[a-z0-9][a-z0-9.-]*$/.test(id) && !out.includes(id)) out.push(id);
    if (out.length === 3) break;
  }
  return out;
}

export const MAX_COMPARED = SERIES_CLASSES.length;

export interface CompareRequest {
  /** Known designs to show, in the order asked, at most MAX_COMPARED. */
  ids: string[];
  /** Messages for what was asked but left out (unknown ids, more than MAX_COMPARED); empty when none. */
  problems: string[];
}

/**
 * The designs a compare address asks for, checked against the catalog: unknown or malformed ids and
 * any beyond the third are named in a message instead of being dropped without a word.
 */
export function readCompareIds(value: string | null, known: ReadonlySet<string>): CompareRequest {
  const asked = (value ?? "").split(",").map((s) => s.trim()).filter((s) => s !== "");
  const unique = asked.filter((id, i) => asked.indexOf(id) === i);
  const unknown = unique.filter((id) => !known.has(id));
  const found = unique.filter((id) => known.has(id));
  const ids = found.slice(0, MAX_COMPARED);
  const extra = found.slice(MAX_COMPARED);
  const problems: string[] = [];
  const list = (xs: string[]) => xs.map((x) => `“${x.length > 60 ? `${x.slice(0, 60)}…` : x}”`).join(", ");
  if (unknown.length) problems.push(`${unknown.length === 1 ? "No design has the id" : "No designs have the ids"} ${list(unknown)} in this catalog, so ${unknown.length === 1 ? "it was" : "they were"} left out. Pick designs from the lists above.`);
  if (extra.length) problems.push(`At most ${MAX_COMPARED} designs can be compared at once: ${list(extra)} ${extra.length === 1 ? "was" : "were"} left out. Drop one of the three to compare ${extra.length === 1 ? "it" : "them"}.`);
  return { ids, problems };
}

/** What the band page says when more designs are ticked than the compare page can show. */
export function tooManyTicked(count: number): string | null {
  return count > MAX_COMPARED ? `${count} designs are ticked, but at most ${MAX_COMPARED} can be compared at once: untick ${count - MAX_COMPARED === 1 ? "one" : count - MAX_COMPARED} of them.` : null;
}

/** The label of a design in the compare page's lists: gain first, so a narrow list never hides it. */
export function optionLabel(d: { gainDbi: number; lengthWl: number; pieces: number; variant: f.Variant }): string {
  return `${f.gainDbi(d.gainDbi)} · ${f.wavelengths(d.lengthWl)} · ${d.pieces}/arm · ${f.variantShort(d.variant)}`;
}
