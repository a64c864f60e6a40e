// Lays out a finished design like a catalog design page (site/pages/designs/[id]/index.astro): the
// same sections, the same table rows (generator/site/tables.ts, computed in the worker) and the same
// plots (generator/render, as SVG text shown through <img src="data:…">, so no markup of theirs runs
// in the page). Every text goes in with textContent; downloads are Blob URLs made here.
import type { DesignResult } from "../../../generator/design/designResult";
import type { JobMessage } from "../../../generator/browser/designJob";
import type { Shown } from "../../../generator/site/shown";
import * as f from "../../../generator/site/format";
import { groundView } from "../../../generator/browser/groundView";
import type { Takeoff } from "../../../generator/browser/designJob";

type Done = Extract<JobMessage, { type: "done" }>;
type Child = Node | string | null | undefined | false;

function h(tag: string, attrs: Record<string, string> = {}, ...children: Child[]): HTMLElement {
  const el = document.createElement(tag);
  for (const [k, v] of Object.entries(attrs)) el.setAttribute(k, v);
  for (const c of children) if (c) el.append(c);
  return el;
}

/** Shown values as the catalog page writes them: text, with data-field/data-unit when tied to a field. */
const shownNodes = (parts: Shown[]): Node[] =>
  parts.map((p) => (p.field ? h("span", { "data-field": p.field, "data-unit": p.unit ?? "si" }, p.text) : document.createTextNode(p.text)));

const factsTable = (name: string, rows: { label: string; parts: Shown[]; note?: string }[]) =>
  h("div", { class: "table-wrap" }, h("table", { class: "facts", "data-table": name }, h("tbody", {},
    ...rows.map((r) => h("tr", {}, h("th", { scope: "row" }, r.label), h("td", {}, ...shownNodes(r.parts), r.note ? h("span", { class: "note-inline" }, r.note) : null))))));

const svgImg = (svg: string, alt: string) => h("img", { src: `data:image/svg+xml;charset=utf-8,${encodeURIComponent(svg)}`, alt });

/** Over ground: the figures `design` reports there, and the gain at the planning elevations (nothing in free space). */
function groundSection(r: DesignResult, takeoff: Takeoff | null): HTMLElement | null {
  const view = groundView(r, takeoff);
  if (!view) return null;
  return h("section", { "data-ground": "" },
    h("h2", {}, "Over the ground"),
    h("div", { class: "two" },
      h("div", { class: "table-wrap" }, h("table", { class: "facts", "data-table": "ground" }, h("tbody", {},
        ...view.rows.map((row) => h("tr", {}, h("th", { scope: "row" }, row.label), h("td", {}, row.text)))))),
      h("div", { class: "table-wrap" }, h("table", { "data-table": "elevations" },
        h("caption", { class: "small" }, "Gain by elevation, at the peak azimuth"),
        h("thead", {}, h("tr", {}, h("th", { scope: "col" }, "Elevation"), h("th", { scope: "col", class: "num" }, "Gain (dBi)"))),
        h("tbody", {}, ...view.elevations.map((e) => h("tr", {}, h("td", {}, e.elevation), h("td", { class: "num" }, e.gain))))))),
    h("p", { class: "muted small" }, r.ground?.type === "perfect"
      ? "Model: image theory over an infinite perfect ground. A real ground absorbs power and lowers the low-angle field."
      : "Model: image theory with plane-wave reflection coefficients for the ground; no surface wave, and approximate for wires within a small fraction of a wavelength of the ground. Gains count the power the ground absorbs as loss."),
    h("p", { class: "note small" }, "Keep masts and wires well clear of power lines (farther than the mast is tall), ground the mast against lightning, and keep people away from low wires while transmitting; local codes and licensed practice come first."),
  );
}

let blobUrls: string[] = [];

export function clearResult(): void {
  blobUrls.forEach((u) => URL.revokeObjectURL(u));
  blobUrls = [];
  const box = document.querySelector<HTMLElement>("[data-result]");
  if (box) { box.hidden = true; box.replaceChildren(); }
  document.getElementById("design-result")?.remove();
}

/** The result as `design --json` prints it, for scripts and tests: <script type="application/json" id="design-result">. */
export function publishResult(result: DesignResult): void {
  const el = document.createElement("script");
  el.type = "application/json";
  el.id = "design-result";
  el.textContent = JSON.stringify(result);
  document.body.append(el);
}

function downloads(m: Done): HTMLElement {
  const byName = new Map(m.files.map((file) => [file.name, file]));
  const link = (name: string, text: string) => {
    const file = byName.get(name)!;
    const url = URL.createObjectURL(new Blob([file.content], { type: file.mediaType }));
    blobUrls.push(url);
    return h("a", { href: url, download: name, "data-download": "", title: name }, text);
  };
  return h("div", { class: "table-wrap" }, h("table", { class: "downloads", "data-table": "downloads" }, h("tbody", {},
    ...m.rows.map((r) => h("tr", {}, h("th", { scope: "row" }, r.label),
      h("td", {}, ...r.files.flatMap((d) => [" ", link(d.name, d.linkText)])),
      h("td", { class: "num small muted" }, `${f.fixed(r.bytes / 1024, 1)} KiB`))))));
}

/** The search's result at once, while the worker runs the slower analysis: gain, impedance, the
 * pieces and bends (the live drawing above shows the shape). renderResult replaces it. */
export function renderDesigned(r: DesignResult, box: HTMLElement): void {
  box.hidden = false;
  const p = r.parameters;
  box.replaceChildren(
    h("h2", {}, "Your design"),
    h("p", { class: "muted small" }, `${r.message}; ${r.evaluations} evaluations, seed ${r.seed}.`),
    r.status === "ok" && h("ul", { class: "chips", "aria-label": "Summary" },
      h("li", {}, "gain ", h("strong", {}, f.gainDbi(r.peakGainDbi))),
      h("li", {}, `feed impedance ${f.impedance(r.inputImpedanceOhm)}`),
      h("li", {}, `worst SWR in band ${f.swr(r.maxSwrInBand)} (search mesh)`),
      h("li", {}, `first piece ${f.degrees(p.firstAngleDeg)} from the symmetry axis`)),
    r.status === "ok" && h("div", { class: "table-wrap" }, h("table", { "data-table": "early-pieces" },
      h("thead", {}, h("tr", {}, ...["Piece (from the feed)", "Length (mm)", "Length (in)", "Bend at its outer end"].map((c, k) => h("th", { scope: "col", class: k ? "num" : "" }, c)))),
      h("tbody", {}, ...p.pieceLengthsM.map((len, k) => h("tr", {}, h("td", {}, String(k + 1)), h("td", { class: "num" }, f.millimetresNumber(len)), h("td", { class: "num" }, f.inchesNumber(len)),
        h("td", { class: "num" }, k < p.bendAnglesDeg.length ? f.degrees(p.bendAnglesDeg[k]) : "tip")))))),
    groundSection(r, null),
    h("p", { class: "note", "data-analysing": "" }, "The drawings, band sweep, feed options, bending tolerance and downloads follow when the analysis ends (see the progress above)."),
  );
}

export function renderResult(m: Done, box: HTMLElement): void {
  box.replaceChildren();
  box.hidden = false;
  const e = m.entry, i = e.inputs;
  box.append(h("h2", {}, "Your design"), h("p", { class: "muted small" }, `${e.title}: ${m.result.message}; ${m.result.evaluations} evaluations, seed ${m.result.seed}.`));
  if (!m.figures || !m.tables || !e.figures || !e.shape || !e.match) {
    box.append(h("p", { class: "note" }, h("strong", {}, "No buildable shape. "), e.message), downloads(m));
    return;
  }
  const t = m.tables, fig = e.figures, match = e.match;
  box.append(
    h("ul", { class: "chips", "aria-label": "Summary" },
      h("li", {}, "gain ", h("strong", {}, h("span", { "data-field": "figures.gainDbi", "data-unit": "si" }, f.gainDbi(fig.gainDbi)))),
      h("li", {}, `SWR ${f.swr(fig.swr)} on ${f.fixed(i.lineImpedanceOhm, 0)} Ω`),
      h("li", {}, `${f.metres(i.lengthM)} of ${f.millimetres(i.wireDiameterM)} ${i.conductor} wire (${f.wavelengths(i.lengthWl)})`),
      h("li", {}, f.piecesPerArm(i.piecesPerArm)), h("li", {}, f.variantWords(i.variant)),
      h("li", {}, `${f.mhz(i.frequencyHz)} in ${f.bandEdges(i.bandLowHz, i.bandHighHz)}`)),
    h("div", { class: "figs" },
      h("figure", { class: "wide shape" }, svgImg(m.figures.shape, "The wire to scale, seen from above, with piece lengths, bend angles and an arrow toward the main lobe")),
      h("figure", {}, svgImg(m.figures.phi, "Gain around the plane cut along φ through the main lobe")),
      h("figure", {}, svgImg(m.figures.theta, "Gain around the plane cut along θ through the main lobe")),
      h("figure", {}, svgImg(m.figures.sweep, "SWR and gain across the band")),
      h("figure", {}, svgImg(m.figures.smith, "Feed-point impedance across the band on a Smith chart")),
      h("figure", {}, svgImg(m.figures.pattern3d, "Three-dimensional view of the radiation pattern")),
      m.figures.elevation ? h("figure", { "data-figure": "elevation" }, svgImg(m.figures.elevation, "Gain against elevation through the takeoff azimuth, the ground line along the bottom, the elevation window shaded and the takeoff marked")) : null,
      h("div", { class: "panel lobe" }, h("h3", {}, "Main lobe and mounting"), h("p", {}, fig.lobe), h("p", {}, fig.mounting),
        h("p", { class: "muted small" }, m.result.ground
          ? "All figures are for the wire over the ground and at the height you gave, as mounted; a mast, guy wires and the feed line change them. The drawing and the templates show the wire flat, as you bend it."
          : "All figures are for the wire alone in free space. Ground, a mast, guy wires and the feed line change them; keep the wire a wavelength or more from other conductors where you can."))),
    groundSection(m.result, m.takeoff),
    h("h2", {}, "Figures"), factsTable("figures", t.keyFigures),
    h("h2", {}, "Dimensions"),
    h("p", {}, `Each arm has ${f.piecesPerArm(i.piecesPerArm).replace(" per arm", "")}; the left arm is the mirror image of the right arm across the symmetry axis (y). The first piece of the right arm leaves the feed at ${f.degrees(e.shape.firstAngleDeg)} from the symmetry axis toward +x. Lengths are along the wire centreline; a bend turns the wire toward +x by the angle given (the left arm turns the other way).`),
    h("div", { class: "two" },
      h("div", { class: "table-wrap" }, h("table", { "data-table": "pieces" },
        h("thead", {}, h("tr", {}, ...["Piece (from the feed)", "Length (mm)", "Length (in)", "Bend at its outer end"].map((c, k) => h("th", { scope: "col", class: k ? "num" : "" }, c)))),
        h("tbody", {}, ...t.pieces.map((p) => h("tr", {}, h("td", {}, String(p.piece)), h("td", { class: "num" }, ...shownNodes([p.lengthMm])), h("td", { class: "num" }, ...shownNodes([p.lengthIn])), h("td", { class: "num" }, ...(p.bend ? shownNodes([p.bend]) : ["tip"]))))))),
      h("div", { class: "table-wrap" }, h("table", { "data-table": "vertices" },
        h("thead", {}, h("tr", {}, ...["Vertex", "Where", "x (mm)", "y (mm)", "x (in)", "y (in)"].map((c, k) => h("th", { scope: "col", class: k > 1 ? "num" : "" }, c)))),
        h("tbody", {}, ...t.vertices.map((v) => h("tr", {}, h("td", {}, String(v.index)), h("td", {}, v.what), ...[v.xMm, v.yMm, v.xIn, v.yIn].map((s) => h("td", { class: "num" }, ...shownNodes([s]))))))))),
    h("p", { class: "muted small" }, "Inches are millimetres ÷ 25.4 exactly. The wire lies in the x–y plane; the feed point is the origin."),
    h("h2", {}, "Build and feed notes"), h("h3", {}, "Balun"), h("p", {}, match.balunNote),
    h("h3", {}, `Matching to ${f.fixed(i.lineImpedanceOhm, 0)} Ω`),
    !match.needed
      ? h("p", {}, `No matching network is needed: the SWR at the design frequency is ${f.swr(match.swrAtDesign)}. Feed it directly through the balun.`)
      : h("div", {},
        h("p", {}, `The SWR at the design frequency is ${f.swr(match.swrAtDesign)} before matching. Either L-network below brings it down; parts go at the feed point, after the balun on the coax side. Values are exact and the nearest E12 part.`),
        h("div", { class: "table-wrap" }, h("table", { "data-table": "match" },
          h("thead", {}, h("tr", {}, h("th", { scope: "col" }, "Network"), h("th", { scope: "col" }, "Parts (exact → E12)"), h("th", { scope: "col", class: "num" }, "Worst SWR in band (exact / E12)"))),
          h("tbody", {}, ...t.match.map((r) => h("tr", {}, h("td", {}, r.topology), h("td", {}, ...r.parts.map((p) => h("div", {}, `${p.position} ${p.kind}: `, ...shownNodes([p.exact]), ` → ${p.e12}`))), h("td", { class: "num" }, `${r.worstSwr} / ${r.worstSwrE12}`)))))),
        match.quarterWave && h("p", {}, `Or a quarter-wave transformer: the ideal line is ${f.ohms(match.quarterWave.idealImpedanceOhm)}; ${match.quarterWave.cable} with velocity factor ${f.fixed(match.quarterWave.velocityFactor, 2)} cut to ${f.millimetres(match.quarterWave.physicalLengthM)} (${f.inches(match.quarterWave.physicalLengthM)}) comes close.`)),
    h("h3", {}, "Bending tolerance"), factsTable("tolerance", t.tolerance),
    h("details", {}, h("summary", { class: "small" }, "How this result was checked"), factsTable("checks", t.checks),
      (e.checks?.warnings.length ?? 0) > 0 && h("ul", {}, ...e.checks!.warnings.map((w) => h("li", {}, w)))),
    h("h2", {}, "Downloads"), downloads(m),
    h("p", { class: "muted small" }, "Print the templates at 100 % (actual size) and check the printed scale bar with a ruler. Tiled sheets are named by row and column (R1 C1 is the top left) and overlap; tape them along the guides. Check any file against SHA256SUMS with sha256sum -c SHA256SUMS."),
  );
}
