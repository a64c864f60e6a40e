// The files a builder downloads for one design, as pure functions of its entry: the entry itself,
// a shape file that `bentwire analyze` reads back, node coordinates (CSV), a DXF polyline for a jig,
// 1:1 bending templates tiled over A4 and Letter (one SVG per sheet, and all sheets of a paper in one
// printable PDF), and a checksum list over all of them.
import { serialize } from "../catalog/hash.js";
import { bendingTemplateSvgs, nodesCsv, planBendingTemplate, sha256Listing, wireDxf, type ExportShape, type PaperName } from "../export/index.js";
import { isOk, type Entry, type OkEntry } from "./ok.js";
import { groundShapeFileOf } from "../catalog/groundShapeFile.js";
import { isOverGround, layoutCsv, layoutNames, layoutSvg } from "./overGround.js";

export type DownloadGroup = "entry" | "shape" | "layout-csv" | "layout-svg" | "nodes" | "dxf" | "pdf-a4" | "pdf-letter" | "template-a4" | "template-letter" | "checksums";

/**
 * Made PDFs by file name, so the pages, the file endpoint and the checksum lists of one build make
 * each PDF once. The caller owns it (a Map it keeps for the build).
 */
export type PdfCache = Map<string, Promise<Uint8Array>>;

export interface TemplateSheet {
  paper: PaperName;
  /** 0-based place in the full tiling grid, and the grid's size. */
  row: number;
  column: number;
  rows: number;
  columns: number;
  /** Whether the template is tiled over several sheets (else one sheet holds it all). */
  tiled: boolean;
  /** "R1 C2", as printed on the sheet. */
  label: string;
}

export interface DownloadFile {
  name: string;
  group: DownloadGroup;
  /** Set for the sheets of a bending template. */
  sheet?: TemplateSheet;
  /** What the file is, for the download list. */
  label: string;
  mediaType: string;
  content: string | Uint8Array;
}

/** Byte length of a file's content (strings as UTF-8). */
/** Size in bytes of a text (UTF-8, by TextEncoder: the same in Node and the browser designer) or of binary content. */
export const contentBytes = (content: string | Uint8Array): number => (typeof content === "string" ? new TextEncoder().encode(content).length : content.byteLength);

/** The shape-file form of a design (our own JSON, metres and hertz) for `bentwire analyze`. */
export function shapeFileOf(entry: OkEntry) {
  return {
    name: entry.title.slice(0, 200),
    frequencyHz: entry.inputs.frequencyHz,
    wireRadiusM: entry.inputs.wireDiameterM / 2,
    conductor: entry.inputs.conductor,
    segmentsPerWavelength: entry.inputs.segmentsPerWavelength,
    wires: [{ pointsM: entry.shape.pointsM.map((p) => [p[0], p[1], p[2]]) }],
    feed: { wire: 0, vertex: entry.shape.feedVertex },
  };
}

/** The shape file's bytes, as the site offers them (and `bentwire shape <id>` prints them). */
export const shapeFileText = (entry: OkEntry): string => `${JSON.stringify(shapeFileOf(entry), null, 2)}\n`;

/**
 * The shape file the site offers: for a design over the ground the wire as hung with the ground
 * (groundShapeFileOf), so `bentwire analyze` reproduces the entry; else the free-space shape file.
 */
export const siteShapeFileText = (entry: OkEntry): string =>
  isOverGround(entry) ? `${JSON.stringify(groundShapeFileOf(entry), null, 2)}\n` : shapeFileText(entry);

/** The geometry the export writers take. */
export function exportShapeOf(entry: OkEntry): ExportShape {
  return {
    id: entry.id,
    title: entry.title,
    frequencyHz: entry.inputs.frequencyHz,
    wireDiameterM: entry.inputs.wireDiameterM,
    wires: [{ pointsM: entry.shape.pointsM.map((p): [number, number, number] => [p[0], p[1], p[2]]) }],
    feedPointM: entry.shape.pointsM[entry.shape.feedVertex] as [number, number, number],
  };
}

export const CHECKSUM_FILE = "SHA256SUMS";
export const PAPERS: { paper: PaperName; label: string }[] = [
  { paper: "a4", label: "A4" },
  { paper: "letter", label: "US Letter" },
];

/**
 * A 1:1 template that needs more sheets than this is not offered: a design that large (an HF wire
 * many metres across) is laid out on the ground or a board from the coordinate table instead.
 */
export const MAX_TEMPLATE_SHEETS = 40;

/** Sheets a 1:1 template of the design needs per paper, and whether it is offered. */
export function templateSheetCounts(shape: ExportShape): { paper: PaperName; sheets: number; offered: boolean }[] {
  return PAPERS.map(({ paper }) => {
    const sheets = planBendingTemplate(shape, { paper }).pages.length;
    return { paper, sheets, offered: sheets <= MAX_TEMPLATE_SHEETS };
  });
}

function templateFiles(entry: OkEntry, shape: ExportShape): DownloadFile[] {
  return PAPERS.flatMap(({ paper, label }) => {
    const plan = planBendingTemplate(shape, { paper });
    if (plan.pages.length > MAX_TEMPLATE_SHEETS) return [];
    const pages = bendingTemplateSvgs(shape, { paper });
    if (pages.length !== plan.pages.length) throw new Error(`site downloads: ${entry.id}: template plan and pages disagree`);
    return pages.map((svg, i): DownloadFile => {
      const p = plan.pages[i];
      const single = !plan.tiled;
      return {
        group: `template-${paper}`,
        name: single ? `${entry.id}.template-${paper}.svg` : `${entry.id}.template-${paper}-r${p.row + 1}c${p.column + 1}.svg`,
        label: single ? `1:1 bending template, one ${label} sheet` : `1:1 bending template, ${label} sheet ${p.label}`,
        mediaType: "image/svg+xml",
        content: svg,
        sheet: { paper, row: p.row, column: p.column, rows: plan.rows, columns: plan.columns, tiled: plan.tiled, label: p.label },
      };
    });
  });
}

/** The SVG sheets of a design's templates alone (no PDF, no checksums), e.g. for its sheet maps. */
export function templateSheets(entry: Entry): DownloadFile[] {
  return isOk(entry) && !isOverGround(entry) ? templateFiles(entry, exportShapeOf(entry)) : [];
}

/** One PDF per paper holding every sheet of that paper's template, made from the same SVG sheets. */
async function pdfFiles(entry: OkEntry, sheets: readonly DownloadFile[], cache: PdfCache): Promise<DownloadFile[]> {
  // loaded only when PDFs are wanted: pdf-lib stays out of the designer's worker bundle
  const { templatePdf } = await import("../export/pdfTemplate.js");
  const out: DownloadFile[] = [];
  for (const { paper, label } of PAPERS) {
    const svgs = sheets.filter((f) => f.sheet?.paper === paper);
    if (svgs.length === 0) continue;
    const name = `${entry.id}.template-${paper}.pdf`;
    if (!cache.has(name)) cache.set(name, templatePdf(svgs.map((f) => f.content as string), `${entry.title}: 1:1 bending template, ${label}`));
    out.push({
      group: `pdf-${paper}`,
      name,
      label: `1:1 bending template, ${label}, ${svgs.length === 1 ? "one page" : `all ${svgs.length} sheets`} in one PDF`,
      mediaType: "application/pdf",
      content: await cache.get(name)!,
    });
  }
  return out;
}

/**
 * Every download of a design, the checksum list last. Infeasible entries get their JSON only.
 * Async because the printable PDFs are written by pdf-lib; `cache` keeps them for the build.
 */
/** `pdf: false` leaves out the printable PDFs (the in-browser designer offers the SVG sheets only). */
export async function downloadFiles(entry: Entry, cache: PdfCache, options: { pdf?: boolean } = {}): Promise<DownloadFile[]> {
  const files: DownloadFile[] = [
    { group: "entry", name: `${entry.id}.json`, label: "catalog entry (JSON, every figure)", mediaType: "application/json", content: serialize(entry) },
  ];
  if (isOverGround(entry)) {
    // a wire metres long hung over the ground: a layout plan (pegs and distances) instead of the 1:1 template
    const names = layoutNames(entry.id);
    files.push(
      { group: "shape", name: `${entry.id}.shape.json`, label: "shape file with the ground (loads into bentwire analyze)", mediaType: "application/json", content: siteShapeFileText(entry) },
      { group: "layout-csv", name: names.csv, label: "layout plan: pegs and distances from the feed (CSV, metres and feet)", mediaType: "text/csv", content: layoutCsv(entry) },
      { group: "layout-svg", name: names.svg, label: "layout plan drawing (SVG, to scale)", mediaType: "image/svg+xml", content: layoutSvg(entry) },
    );
  } else if (isOk(entry)) {
    const shape = exportShapeOf(entry);
    files.push(
      { group: "shape", name: `${entry.id}.shape.json`, label: "shape file (loads into bentwire analyze)", mediaType: "application/json", content: shapeFileText(entry) },
      { group: "nodes", name: `${entry.id}.nodes.csv`, label: "node coordinates (CSV, metres and inches)", mediaType: "text/csv", content: nodesCsv(shape) },
      { group: "dxf", name: `${entry.id}.dxf`, label: "polyline for jig cutting (DXF, millimetres)", mediaType: "application/dxf", content: wireDxf(shape) },
    );
    const sheets = templateFiles(entry, shape);
    files.push(...(options.pdf === false ? [] : await pdfFiles(entry, sheets, cache)), ...sheets);
  }
  files.push({
    group: "checksums",
    name: CHECKSUM_FILE,
    label: "SHA-256 checksums of the files above",
    mediaType: "text/plain",
    content: sha256Listing(files.map((f) => ({ name: f.name, content: f.content }))),
  });
  return files;
}

/**
 * One checksum list over every download of the site, names relative to the site root. `filesOf`
 * gives a design's downloads (the site passes the lists its pages made already).
 */
export async function allChecksums(entries: readonly Entry[], filePath: (id: string, name: string) => string, cache: PdfCache, filesOf = (e: Entry) => downloadFiles(e, cache)): Promise<string> {
  const all: { name: string; content: string | Uint8Array }[] = [];
  for (const e of entries) {
    for (const f of await filesOf(e)) if (f.name !== CHECKSUM_FILE) all.push({ name: filePath(e.id, f.name), content: f.content });
  }
  return sha256Listing(all);
}

const GROUP_LABELS: Record<DownloadGroup, string> = {
  entry: "Catalog entry (JSON, every figure)",
  shape: "Shape file (loads into bentwire analyze)",
  "layout-csv": "Layout plan: pegs and distances from the feed (CSV, metres and feet)",
  "layout-svg": "Layout plan drawing (SVG, to scale)",
  nodes: "Node coordinates (CSV, metres and inches)",
  dxf: "Wire polyline for jig cutting (DXF, millimetres)",
  "pdf-a4": "Printable 1:1 bending template, A4 (one PDF)",
  "pdf-letter": "Printable 1:1 bending template, US Letter (one PDF)",
  "template-a4": "1:1 bending template, A4",
  "template-letter": "1:1 bending template, US Letter",
  checksums: "SHA-256 checksums of all files above",
};

export interface DownloadRow {
  group: DownloadGroup;
  label: string;
  files: { name: string; linkText: string; bytes: number }[];
  bytes: number;
  /** For a template tiled over several sheets: its paper (the site adds a sheet map page). */
  tiledPaper: PaperName | null;
}

/** Tiled templates with more sheets than this are linked through their sheet map only. */
export const INLINE_SHEETS = 24;

/** The download list as the page shows it: one row per kind, template sheets side by side. */
export function downloadRows(files: readonly DownloadFile[]): DownloadRow[] {
  const rows: DownloadRow[] = [];
  for (const f of files) {
    let row = rows.find((r) => r.group === f.group);
    if (!row) {
      row = { group: f.group, label: GROUP_LABELS[f.group], files: [], bytes: 0, tiledPaper: null };
      rows.push(row);
    }
    const bytes = contentBytes(f.content);
    row.files.push({ name: f.name, linkText: f.sheet?.tiled ? f.sheet.label : f.name, bytes });
    row.bytes += bytes;
    if (f.sheet?.tiled) row.tiledPaper = f.sheet.paper;
  }
  for (const r of rows) {
    if (r.group.startsWith("pdf-")) {
      const sheets = files.filter((f) => f.group === r.group.replace("pdf-", "template-")).length;
      r.label += sheets === 1 ? ", one page" : `, ${sheets} pages to tape together`;
    }
    if (!r.group.startsWith("template-")) continue;
    if (r.tiledPaper === null) r.label += ", one sheet";
    else r.label += `, ${r.files.length} sheets to tape together`;
  }
  return rows;
}

export interface SheetMap {
  paper: PaperName;
  paperLabel: string;
  rows: number;
  columns: number;
  /** Row-major grid; null where the sheet would be blank and is left out. */
  cells: ({ name: string; label: string; bytes: number } | null)[][];
}

/** The sheets of a tiled template laid out as they go together, for the sheet map page. */
export function sheetMaps(files: readonly DownloadFile[]): SheetMap[] {
  const maps: SheetMap[] = [];
  for (const { paper, label } of PAPERS) {
    const sheets = files.filter((f) => f.sheet?.paper === paper);
    if (sheets.length === 0 || !sheets[0].sheet!.tiled) continue;
    const { rows, columns } = sheets[0].sheet!;
    const cells: SheetMap["cells"] = Array.from({ length: rows }, () => Array.from({ length: columns }, () => null));
    for (const f of sheets) cells[f.sheet!.row][f.sheet!.column] = { name: f.name, label: f.sheet!.label, bytes: contentBytes(f.content) };
    maps.push({ paper, paperLabel: label, rows, columns, cells });
  }
  return maps;
}
