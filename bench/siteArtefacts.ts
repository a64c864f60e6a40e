// CPU per artefact kind of one design page's build, measured around the generator functions the
// site's routes call (no Astro): `npx tsx bench/siteArtefacts.ts [--entries N] [--dir FOLDER]`.
// N entries (default 16) picked evenly from designs/entries (or FOLDER); each kind is made for every
// entry in turn and timed with process.cpuUsage(), which counts sharp's and librsvg's worker threads
// too. "made before → now" is how often a build made it per design before the build-wide caches of
// site/data.ts and with them (a page's CPU is roughly the sum of CPU × made).
// Figures, not assertions.
import { readdirSync, readFileSync } from "node:fs";
import { join } from "node:path";
import { checkSiteEntry } from "../generator/site/catalog.js";
import { isOk, type Entry, type OkEntry } from "../generator/site/ok.js";
import { figureFiles, figureSizes, newFigureCache, renderFigure } from "../generator/site/figures.js";
import { downloadFiles, exportShapeOf, sheetMaps } from "../generator/site/downloads.js";
import { sheetMapSvg } from "../generator/render/sheetMapSvg.js";
import { patternGridOf } from "../generator/site/patternGrid.js";

export interface ArtefactRow {
  kind: string;
  cpuMsPerDesign: number;
  designs: number;
  /** How often a build made it per design before the figure and download caches, and now. */
  callsBefore: number;
  callsNow: number;
}

const cpuMs = () => { const u = process.cpuUsage(); return (u.user + u.system) / 1000; };

/** `n` entries spread evenly over the folder's sorted file names. */
export function pickEntries(dir: string, n: number): Entry[] {
  const names = readdirSync(dir).filter((f) => f.endsWith(".json")).sort();
  const step = Math.max(1, names.length / n);
  const picked = Array.from({ length: Math.min(n, names.length) }, (_, k) => names[Math.floor(k * step)]);
  return picked.map((name) => checkSiteEntry(readFileSync(join(dir, name), "utf8"), join(dir, name)));
}

async function timeKind(kind: string, calls: [number, number], entries: readonly Entry[], make: (e: Entry) => Promise<unknown> | unknown): Promise<ArtefactRow> {
  for (const e of entries.slice(0, 1)) await make(e); // warm-up: module loading, JIT, sharp start-up
  const c0 = cpuMs();
  for (const e of entries) await make(e);
  return { kind, cpuMsPerDesign: (cpuMs() - c0) / entries.length, designs: entries.length, callsBefore: calls[0], callsNow: calls[1] };
}

export async function benchSiteArtefacts(entries: readonly Entry[]): Promise<ArtefactRow[]> {
  const ok = entries.filter(isOk) as OkEntry[];
  const rows: ArtefactRow[] = [];
  const fresh = () => newFigureCache();
  // each plot SVG: its file, plus the page's sizes (and the 3D view's WebP) drew it again before
  for (const file of figureFiles.filter((f) => f.endsWith(".svg"))) rows.push(await timeKind(`figure ${file}`, [file === "pattern-3d.svg" ? 3 : 2, 1], ok, (e) => renderFigure(e as OkEntry, file, fresh())));
  rows.push(await timeKind("figure thumb.png", [1, 1], ok, (e) => renderFigure(e as OkEntry, "thumb.png", fresh())));
  rows.push(await timeKind("figure card.png, fonts loaded for each card", [1, 0], ok, (e) => renderFigure(e as OkEntry, "card.png", fresh())));
  const build = fresh(); // one cache for the run, as site/data.ts keeps it
  rows.push(await timeKind("figure card.png, fonts loaded once", [0, 1], ok, (e) => renderFigure(e as OkEntry, "card.png", build)));
  rows.push(await timeKind("figure pattern-3d.webp (its SVG from the cache)", [1, 1], ok, async (e) => { renderFigure(e as OkEntry, "pattern-3d.svg", build); await renderFigure(e as OkEntry, "pattern-3d.webp", build); }));
  rows.push(await timeKind("page figure sizes (the 3D view's from the cache)", [0, 1], ok, (e) => figureSizes(e as OkEntry, build)));
  rows.push(await timeKind("downloads without PDFs (sheets, checksums)", [4, 1], entries, (e) => downloadFiles(e, new Map(), { pdf: false })));
  rows.push(await timeKind("downloads with the two PDFs", [1, 1], entries, async (e) => { await downloadFiles(e, new Map()); }));
  rows.push(await timeKind("sheet map SVGs", [1, 1], ok, async (e) => {
    const sheets = (await downloadFiles(e, new Map(), { pdf: false })).filter((f) => f.sheet);
    for (const m of sheetMaps(sheets)) sheetMapSvg(exportShapeOf(e as OkEntry), m.paper, () => null);
  }));
  rows.push(await timeKind("pattern grid JSON", [1, 1], ok, (e) => JSON.stringify(patternGridOf(e as OkEntry))));
  return rows;
}

export function printSiteArtefacts(rows: readonly ArtefactRow[]): void {
  console.log("site artefacts (CPU ms per design, process.cpuUsage, after one warm-up design; made per design before → now)");
  console.log("kind                                          CPU ms   designs  made before → now");
  for (const r of rows) console.log(`${r.kind.padEnd(45)} ${r.cpuMsPerDesign.toFixed(1).padStart(7)}   ${String(r.designs).padEnd(8)} ${r.callsBefore} → ${r.callsNow}`);
}

if (process.argv[1]?.endsWith("siteArtefacts.ts")) {
  const args = process.argv.slice(2);
  const opt = (name: string) => { const k = args.indexOf(name); return k >= 0 ? args[k + 1] : undefined; };
  const dir = opt("--dir") ?? join(import.meta.dirname, "../designs/entries");
  const n = Number(opt("--entries") ?? 16);
  printSiteArtefacts(await benchSiteArtefacts(pickEntries(dir, n)));
}
