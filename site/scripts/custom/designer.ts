// The designer page's controller: URL ↔ form, validation with the generator's own rules (before any
// worker starts), the worker's life (start, progress, cancel), and handing the result to render.ts:
// the search's result as soon as it ends (published in #design-result), the full analysis after.
// User text only ever reaches the page through textContent, attribute values and URL encoding.
import { fieldOfMessage, queryOf, requestFromState, stateFromQuery, wantsRun, type FormState, type QueryKey } from "../../../generator/browser/designerQuery";
import type { JobMessage } from "../../../generator/browser/designJob";
import { renderDesigned, renderResult, publishResult, clearResult } from "./render";

interface CatalogBand { id: string; lowMhz: number; highMhz: number; designMhz: number; wireDiameterMm: number; conductor: string }

const form = document.querySelector<HTMLFormElement>("[data-designer]")!;
const message = form.querySelector<HTMLElement>("[data-form-message]")!;
const runButton = form.querySelector<HTMLButtonElement>("[data-run]")!;
const cancelButton = form.querySelector<HTMLButtonElement>("[data-cancel]")!;
const permalink = form.querySelector<HTMLAnchorElement>("[data-permalink]")!;
const progress = document.querySelector<HTMLElement>("[data-progress]")!;
const progressText = progress.querySelector<HTMLElement>("[data-progress-text]")!;
const progressBar = progress.querySelector<HTMLProgressElement>("[data-progress-bar]")!;
const live = progress.querySelector<SVGPolylineElement>("[data-live-shape] polyline")!;
const liveSvg = progress.querySelector<SVGSVGElement>("[data-live-shape]")!;
const resultBox = document.querySelector<HTMLElement>("[data-result]")!;
const bands = JSON.parse(form.dataset.bands ?? "[]") as CatalogBand[];
const field = (name: string) => form.elements.namedItem(name) as HTMLInputElement | HTMLSelectElement;

/** A select shows the value asked for, even one it does not list (added as text), so the check names it. */
function setSelect(name: string, value: string): void {
  const sel = field(name) as HTMLSelectElement;
  if (value !== "" && ![...sel.options].some((o) => o.value === value)) {
    const o = document.createElement("option");
    o.value = value;
    o.textContent = value;
    sel.append(o);
  }
  sel.value = value;
}

function writeForm(s: FormState): void {
  field("freqMhz").value = s.freqMhz;
  const [lo, hi] = s.bandMhz.includes(":") ? s.bandMhz.split(":") : [s.bandMhz, ""];
  field("bandLo").value = lo;
  field("bandHi").value = hi;
  const metres = s.lengthM !== "" && s.lengthWl === "";
  field("lengthUnit").value = metres ? "m" : "wl";
  field("length").value = metres ? s.lengthM : s.lengthWl;
  field("pieces").value = s.pieces;
  setSelect("variant", s.variant);
  field("wireDiameterMm").value = s.wireDiameterMm;
  setSelect("conductor", s.conductor);
  field("seed").value = s.seed;
  setSelect("ground", s.ground);
  field("heightM").value = s.heightM;
  setSelect("mounting", s.mounting || "horizontal");
  setSelect("objective", s.objective || "peak");
  field("clearanceM").value = s.clearanceM;
}

function readForm(): FormState {
  const v = (name: string) => field(name).value.trim();
  const lo = v("bandLo"), hi = v("bandHi");
  const metres = v("lengthUnit") === "m";
  return {
    freqMhz: v("freqMhz"),
    bandMhz: lo === "" && hi === "" ? "" : `${lo}:${hi}`,
    lengthWl: metres ? "" : v("length"),
    lengthM: metres ? v("length") : "",
    pieces: v("pieces"),
    variant: v("variant"),
    wireDiameterMm: v("wireDiameterMm"),
    conductor: v("conductor"),
    seed: v("seed"),
    ground: v("ground"),
    heightM: v("heightM"),
    // the command line's defaults stay out of the URL (an empty field means the default)
    mounting: v("mounting") === "horizontal" ? "" : v("mounting"),
    objective: v("objective") === "peak" ? "" : v("objective"),
    clearanceM: v("clearanceM"),
  };
}

const INPUT_OF: Partial<Record<QueryKey, string>> = { bandMhz: "bandLo", lengthWl: "length", lengthM: "length" };

function showMessage(text: string | null, key: QueryKey | null = null): void {
  form.querySelectorAll("[aria-invalid]").forEach((el) => el.removeAttribute("aria-invalid"));
  message.hidden = text === null;
  message.textContent = text ?? "";
  if (key) field(INPUT_OF[key] ?? key)?.setAttribute("aria-invalid", "true");
}

function updatePermalink(s: FormState): void {
  permalink.href = `${location.pathname}?${queryOf(s)}`; // absolute, so it holds under any sub-path
}

let worker: Worker | null = null;

function stop(status: string): void {
  worker?.terminate();
  worker = null;
  cancelButton.hidden = true;
  runButton.disabled = false;
  progress.dataset.state = status;
}

function drawLive(points: number[][]): void {
  const xs = points.map((p) => p[0]), ys = points.map((p) => p[1]);
  const [x0, x1, y0, y1] = [Math.min(...xs), Math.max(...xs), Math.min(...ys), Math.max(...ys)];
  const size = Math.max(x1 - x0, y1 - y0, 1e-9), pad = size * 0.08;
  // screen y runs down; the antenna's +y runs up
  liveSvg.setAttribute("viewBox", `${x0 - pad} ${-y1 - pad} ${x1 - x0 + 2 * pad} ${y1 - y0 + 2 * pad}`);
  live.setAttribute("stroke-width", String(size / 120));
  live.setAttribute("points", points.map((p) => `${p[0]},${-p[1]}`).join(" "));
}

function onMessage(m: JobMessage): void {
  if (m.type === "progress") {
    progressBar.max = m.budget;
    progressBar.value = Math.min(m.evaluations, m.budget);
    progressText.textContent = `${m.evaluations} evaluations; best gain so far ${m.bestGainDbi === null ? "– (no shape has met every rule yet)" : `${m.bestGainDbi.toFixed(2)} dBi`}`;
    progress.dataset.evaluations = String(m.evaluations);
    if (m.pointsM) drawLive(m.pointsM);
  } else if (m.type === "analysing") {
    progressBar.value = progressBar.max;
    progressText.textContent = `${m.evaluations} evaluations; search done, checking the mesh…`;
  } else if (m.type === "designed") {
    // the result as the CLI gives it, shown and published now; the analysis goes on in the worker
    progress.dataset.state = "analysing";
    progressBar.removeAttribute("value"); // indeterminate while the analysis runs
    progressText.textContent = `Search done: ${m.result.evaluations} evaluations, ${m.result.status === "ok" ? `${m.result.peakGainDbi.toFixed(2)} dBi` : "no shape met every rule"}. Now the band sweep, feed options and bending tolerance (64 bent copies)…`;
    renderDesigned(m.result, resultBox);
    publishResult(m.result);
  } else if (m.type === "done") {
    stop("done");
    progressBar.value = progressBar.max;
    progressText.textContent = `Done: ${m.result.evaluations} evaluations, ${m.result.status === "ok" ? `${m.result.peakGainDbi.toFixed(2)} dBi` : "no shape met every rule"}.`;
    renderResult(m, resultBox);
  } else {
    stop("error");
    progressText.textContent = "";
    showMessage(m.message);
  }
}

function start(): void {
  const state = readForm();
  updatePermalink(state);
  history.replaceState(null, "", `?${queryOf(state)}`);
  let request;
  try {
    request = requestFromState(state);
  } catch (e) {
    showMessage(e instanceof Error ? e.message : String(e), fieldOfMessage(e instanceof Error ? e.message : ""));
    return; // nothing starts on bad input
  }
  showMessage(null);
  stop("cancelled");
  clearResult();
  progress.hidden = false;
  progress.dataset.state = "running";
  progress.dataset.evaluations = "0";
  progressText.textContent = "Starting…";
  progressBar.value = 0;
  live.setAttribute("points", "");
  runButton.disabled = true;
  cancelButton.hidden = false;
  worker = new Worker(new URL("../../workers/designer.ts", import.meta.url), { type: "module" });
  worker.onmessage = (e: MessageEvent<JobMessage>) => onMessage(e.data);
  worker.onerror = (e) => { stop("error"); showMessage(`The designer could not run: ${e.message || "worker error"}`); };
  worker.postMessage({ request });
}

form.addEventListener("submit", (e) => { e.preventDefault(); start(); });
form.addEventListener("input", () => updatePermalink(readForm()));
cancelButton.addEventListener("click", () => {
  const analysing = progress.dataset.state === "analysing";
  stop("cancelled");
  progressText.textContent = analysing
    ? "Analysis cancelled: the search's result stays below, without the sweep, feed options, tolerance and downloads."
    : `Cancelled after ${progress.dataset.evaluations ?? 0} evaluations.`;
});
field("catalogBand").addEventListener("change", () => {
  const b = bands.find((x) => x.id === field("catalogBand").value);
  if (!b) return;
  field("freqMhz").value = String(b.designMhz);
  field("bandLo").value = String(b.lowMhz);
  field("bandHi").value = String(b.highMhz);
  field("wireDiameterMm").value = String(b.wireDiameterMm);
  field("conductor").value = b.conductor;
  updatePermalink(readForm());
});

const initial = stateFromQuery(location.search);
writeForm(initial);
updatePermalink(initial);
if (wantsRun(location.search)) start();
