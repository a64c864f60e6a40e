// The tables of the site as plain data: the band table, a design's key figures, its dimensions in
// metric and imperial, the feed-match parts and the tolerance result. Pages only lay these out.
import { isOk, type Entry, type OkEntry } from "./ok.js";
import * as f from "./format.js";
import { plain, shown, type Shown } from "./shown.js";
import { needsNoPartsOf, realizedGainOf } from "./feedRows.js";

export interface Row {
  label: string;
  parts: Shown[];
  note?: string;
}

// ---------------------------------------------------------------- band table

export const BAND_COLUMNS = [
  { key: "gain", label: "Gain", numeric: true },
  { key: "length", label: "Wire length", numeric: true },
  { key: "pieces", label: "Pieces per arm", numeric: true },
  { key: "span", label: "Span (x × y)", numeric: true },
  { key: "bandwidth", label: "SWR < 2 bandwidth", numeric: true },
  { key: "variant", label: "Feed variant", numeric: false },
  { key: "realized", label: "Gain after the feed", numeric: true },
  { key: "noParts", label: "Needs no parts", numeric: false },
] as const;
export type BandColumn = (typeof BAND_COLUMNS)[number]["key"];

export interface BandCell {
  parts: Shown[];
  /** Sort key: a number for numeric columns, text otherwise. */
  sort: number | string;
}

export interface BandRow {
  id: string;
  title: string;
  ok: boolean;
  message: string;
  cells: Record<BandColumn, BandCell>;
}

/** The SWR-below-limit bandwidth of a design as shown (kHz or MHz), tied to its field. */
export function bandwidthShown(e: OkEntry): Shown {
  const span = e.sweep.swr2Span;
  if (span === null) return plain(e.match.needed ? "needs a match" : "none");
  const text = f.bandwidth(span.widthHz);
  return shown(span.touchesSweepEdge ? `≥ ${text}` : text, "sweep.swr2Span.widthHz", text.endsWith("kHz") ? "kHz" : "MHz");
}

/** A design's title without its band name in front (for lists inside one band). */
export function shortTitle(e: Entry): string {
  const prefix = `${e.inputs.bandName}: `;
  return e.title.startsWith(prefix) ? e.title.slice(prefix.length) : e.title;
}

export function bandRow(e: Entry): BandRow {
  const i = e.inputs;
  const length: BandCell = {
    parts: [plain(f.wavelengths(i.lengthWl)), plain(" · "), shown(f.metres(i.lengthM), "inputs.lengthM")],
    sort: i.lengthWl,
  };
  const pieces: BandCell = { parts: [shown(String(i.piecesPerArm), "inputs.piecesPerArm")], sort: i.piecesPerArm };
  const variant: BandCell = { parts: [plain(f.variantShort(i.variant))], sort: i.variant };
  if (!isOk(e)) {
    const none: BandCell = { parts: [plain("–")], sort: -Infinity };
    return { id: e.id, title: shortTitle(e), ok: false, message: e.message, cells: { gain: none, length, pieces, span: none, bandwidth: none, variant, realized: none, noParts: none } };
  }
  return {
    id: e.id,
    title: shortTitle(e),
    ok: true,
    message: e.message,
    cells: {
      gain: { parts: [shown(f.gainDbi(e.figures.gainDbi), "figures.gainDbi")], sort: e.figures.gainDbi },
      length,
      pieces,
      span: {
        parts: [shown(f.fixed(e.shape.spanM.x, f.DISPLAY.metres), "shape.spanM.x"), plain(" × "), shown(f.fixed(e.shape.spanM.y, f.DISPLAY.metres), "shape.spanM.y"), plain(" m")],
        sort: Math.max(e.shape.spanM.x, e.shape.spanM.y),
      },
      bandwidth: { parts: [bandwidthShown(e)], sort: e.sweep.swr2Span?.widthHz ?? 0 },
      variant,
      ...feedCells(e),
    },
  };
}

/** Band-table cells for the feed (issue 10): realized gain after the recommended feed, needs no parts. */
function feedCells(e: Entry): Pick<BandRow["cells"], "realized" | "noParts"> {
  const g = realizedGainOf(e), none = needsNoPartsOf(e);
  return {
    realized: g === null ? { parts: [plain("no feed")], sort: -Infinity } : { parts: [shown(f.gainDbi(g), "feed.realizedGainDbi")], sort: g },
    noParts: { parts: [plain(none ? "yes" : "no")], sort: none ? "yes" : "no" },
  };
}

// ---------------------------------------------------------------- design page

export function keyFigures(e: OkEntry): Row[] {
  const fig = e.figures, i = e.inputs;
  const over = i.overGround;
  const span = e.sweep.swr2Span;
  return [
    over
      ? { label: "Gain at the takeoff", parts: [shown(f.gainDbi(fig.gainDbi), "figures.gainDbi")], note: `the best in the ${f.fixed(over.elevationWindowDeg[0], 0)}–${f.fixed(over.elevationWindowDeg[1], 0)}° elevation window, over ${over.groundName} ground` }
      : { label: "Gain at the peak", parts: [shown(f.gainDbi(fig.gainDbi), "figures.gainDbi")] },
    { label: "Directivity", parts: [shown(f.gainDbi(fig.directivityDbi), "figures.directivityDbi")] },
    { label: "Radiation efficiency", parts: [shown(f.percent(fig.radiationEfficiency), "figures.radiationEfficiency", "pct")], note: `${i.conductor} wire, ${f.millimetres(i.wireDiameterM)} diameter` },
    {
      label: "Feed-point impedance",
      parts: [plain("R "), shown(f.ohms(fig.inputImpedanceOhm.re), "figures.inputImpedanceOhm.re"), plain(", X "), shown(f.ohms(fig.inputImpedanceOhm.im), "figures.inputImpedanceOhm.im")],
      note: `at ${f.mhz(i.frequencyHz)}`,
    },
    { label: `SWR on ${f.fixed(i.lineImpedanceOhm, 0)} Ω line`, parts: [shown(f.swr(fig.swr), "figures.swr")], note: "at the design frequency, before any matching" },
    {
      label: `SWR < ${f.trimZeros(f.fixed(i.swrLimit, 2))} from`,
      parts: span
        ? [shown(f.mhz(span.lowHz), "sweep.swr2Span.lowHz", "MHz"), plain(" to "), shown(f.mhz(span.highHz), "sweep.swr2Span.highHz", "MHz"), plain(" ("), bandwidthShown(e), plain(")")]
        : [plain("nowhere in the sweep without a match")],
      note: span?.touchesSweepEdge ? "at least: the span reaches the edge of the computed sweep" : undefined,
    },
    {
      label: over ? "Takeoff direction" : "Main lobe toward",
      parts: [plain("θ "), shown(f.degrees(fig.peakDirection.thetaDeg), "figures.peakDirection.thetaDeg"), plain(", φ "), shown(f.degrees(fig.peakDirection.phiDeg), "figures.peakDirection.phiDeg")],
      note: "θ from +z, φ from +x toward +y",
    },
    {
      label: "Half-power beamwidth",
      parts: [
        plain("along φ "), fig.beamwidthAlongPhiDeg === null ? plain("–") : shown(f.degrees(fig.beamwidthAlongPhiDeg), "figures.beamwidthAlongPhiDeg"),
        plain(", along θ "), fig.beamwidthAlongThetaDeg === null ? plain("–") : shown(f.degrees(fig.beamwidthAlongThetaDeg), "figures.beamwidthAlongThetaDeg"),
      ],
    },
    { label: "Front-to-back ratio", parts: [shown(`${f.fixed(fig.frontToBackDb, 1)} dB`, "figures.frontToBackDb")] },
    {
      label: "Polarization",
      parts: fig.polarization.sense === "linear"
        ? [plain("linear, in the plane of the wire")]
        : [plain(`${fig.polarization.sense} elliptical, axial ratio `), shown(`${f.fixed(fig.polarization.axialRatioDb, 1)} dB`, "figures.polarization.axialRatioDb")],
    },
    {
      label: "Wire length (tip to tip)",
      parts: [shown(f.metres(i.lengthM), "inputs.lengthM"), plain(" · "), shown(f.inches(i.lengthM), "inputs.lengthM", "in"), plain(` · ${f.wavelengths(i.lengthWl)}`)],
    },
    {
      label: "Span",
      parts: [shown(f.fixed(e.shape.spanM.x, f.DISPLAY.metres), "shape.spanM.x"), plain(" × "), shown(f.fixed(e.shape.spanM.y, f.DISPLAY.metres), "shape.spanM.y"), plain(" m · "),
        shown(f.inchesNumber(e.shape.spanM.x), "shape.spanM.x", "in"), plain(" × "), shown(f.inchesNumber(e.shape.spanM.y), "shape.spanM.y", "in"), plain(" in")],
    },
  ];
}

export interface PieceRow {
  piece: number;
  lengthMm: Shown;
  lengthIn: Shown;
  /** Turn at the piece's outer end (degrees away from straight), or null at the tip. */
  bend: Shown | null;
}

/** The pieces of one arm from the feed outward; the other arm is its mirror image. */
export function pieceRows(e: OkEntry): PieceRow[] {
  return e.shape.pieceLengthsM.map((len, k) => ({
    piece: k + 1,
    lengthMm: shown(f.millimetresNumber(len), `shape.pieceLengthsM.${k}`, "mm"),
    lengthIn: shown(f.inchesNumber(len), `shape.pieceLengthsM.${k}`, "in"),
    bend: k < e.shape.bendAnglesDeg.length ? shown(f.degrees(e.shape.bendAnglesDeg[k]), `shape.bendAnglesDeg.${k}`) : null,
  }));
}

export interface VertexRow {
  index: number;
  what: string;
  xMm: Shown;
  yMm: Shown;
  xIn: Shown;
  yIn: Shown;
}

/** Every vertex of the wire, left tip to right tip, in mm and inches (z is 0 throughout). */
export function vertexRows(e: OkEntry): VertexRow[] {
  const last = e.shape.pointsM.length - 1;
  return e.shape.pointsM.map((p, j) => ({
    index: j,
    what: j === e.shape.feedVertex ? "feed point" : j === 0 ? "left tip" : j === last ? "right tip" : "bend",
    xMm: shown(f.millimetresNumber(p[0]), `shape.pointsM.${j}.0`, "mm"),
    yMm: shown(f.millimetresNumber(p[1]), `shape.pointsM.${j}.1`, "mm"),
    xIn: shown(f.inchesNumber(p[0]), `shape.pointsM.${j}.0`, "in"),
    yIn: shown(f.inchesNumber(p[1]), `shape.pointsM.${j}.1`, "in"),
  }));
}

export interface MatchRow {
  topology: string;
  parts: { kind: string; position: string; exact: Shown; e12: string }[];
  worstSwr: string;
  worstSwrE12: string;
}

const worst = (list: readonly (number | null)[]): string => {
  const vals = list.filter((v): v is number => v !== null);
  return vals.length ? f.swr(Math.max(...vals)) : "–";
};

export function matchRows(e: OkEntry): MatchRow[] {
  return e.match.networks.map((n, k) => ({
    topology: n.topology,
    parts: n.components.map((c, j) => ({
      kind: c.kind,
      position: c.position,
      exact: shown(f.component(c.kind, c.value), `match.networks.${k}.components.${j}.value`, c.kind === "capacitor" ? "pF" : "nH"),
      e12: f.e12Component(n.e12Components[j].kind, n.e12Components[j].value),
    })),
    worstSwr: worst(n.bandSwr),
    worstSwrE12: worst(n.bandSwrE12),
  }));
}

/** The tolerance study in one sentence plus its figures. */
export function toleranceRows(e: OkEntry): Row[] {
  const t = e.tolerance;
  const pct = (p: number | null, field: string): Shown => (p === null ? plain("–") : shown(f.gainDbi(p), field));
  const swrPart = (p: number | null, field: string): Shown => (p === null ? plain("–") : shown(f.swr(p), field));
  return [
    { label: "Bending errors simulated", parts: [plain(`${t.samples} builds, bends ±${f.fixed(t.bendSigmaDeg, 1)}° and lengths ±${f.fixed(t.lengthSigmaFraction * 100, 1)} % (one standard deviation)`)] },
    { label: "Gain (5 % / median / 95 %)", parts: [pct(t.gainDbi.p5, "tolerance.gainDbi.p5"), plain(" / "), pct(t.gainDbi.p50, "tolerance.gainDbi.p50"), plain(" / "), pct(t.gainDbi.p95, "tolerance.gainDbi.p95")] },
    { label: "SWR (5 % / median / 95 %)", parts: [swrPart(t.swr.p5, "tolerance.swr.p5"), plain(" / "), swrPart(t.swr.p50, "tolerance.swr.p50"), plain(" / "), swrPart(t.swr.p95, "tolerance.swr.p95")] },
    {
      label: "Verdict",
      parts: [plain(t.fragile ? "sensitive: bend carefully and check the SWR after building" : "forgiving: ordinary care with pliers and a printed template is enough")],
      note: t.failedSamples > 0 ? `${t.failedSamples} of ${t.samples} simulated builds failed to solve` : undefined,
    },
  ];
}

/** Trust figures: how the result was checked. */
export function checkRows(e: OkEntry): Row[] {
  const c = e.checks;
  const u = e.figures.uncertainty;
  const gap = e.figures.feedGapM;
  return [
    { label: "Segments per wavelength", parts: [plain(`${c.segmentsPerWavelength[0]}, checked at ${c.segmentsPerWavelength[1]}`)] },
    ...(u ? [{
      label: "Stated uncertainty",
      parts: [
        shown(`±${f.fixed(u.gainDb, 3)} dB`, "figures.uncertainty.gainDb"), plain(" gain, "),
        shown(`±${f.fixed(u.impedancePercent, 1)} %`, "figures.uncertainty.impedancePercent", "si"),
        plain(u.converged ? " impedance (last mesh doubling)" : " impedance (last mesh doubling; above the 0.01 dB / 1 % aim on the finest mesh allowed)"),
      ],
    }] : []),
    ...(gap !== undefined ? [{ label: "Feed gap assumed", parts: [shown(`${f.fixed(gap * 1000, 1)} mm`, "figures.feedGapM", "mm"), plain(" between the terminals (λ/50), the source voltage spread evenly over it")] }] : []),
    { label: "Gain change on refinement", parts: [shown(`${f.fixed(c.gainChangeDb, 3)} dB`, "checks.gainChangeDb")] },
    { label: "Impedance change on refinement", parts: [shown(f.ohms(c.impedanceChangeOhm), "checks.impedanceChangeOhm")] },
    { label: "Energy balance error", parts: [plain(c.energyBalanceError === null ? "not checked (real ground absorbs power)" : c.energyBalanceError.toExponential(1))] },
  ];
}
