// The files a builder downloads for one design, as pure functions of its entry: the entry itself,
// a shape file that `bentwire analyze` reads back, node coordinates (CSV), a DXF polyline for a jig,
// 1:1 bending templates tiled over A4 and Letter, and a checksum list over all of them.
import { serialize } from "../catalog/store.js";
import { bendingTemplateSvgs, nodesCsv, sha256Listing, wireDxf, type ExportShape, type PaperName } from "../export/index.js";
import { isOk, type Entry, type OkEntry } from "./ok.js";

export interface DownloadFile {
  name: string;
  /** What the file is, for the download list. */
  label: string;
  mediaType: string;
  content: string;
}

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
const PAPERS: { paper: PaperName; label: string }[] = [
  { paper: "a4", label: "A4" },
  { paper: "letter", label: "Letter" },
];

function templateFiles(entry: OkEntry, shape: ExportShape): DownloadFile[] {
  return PAPERS.flatMap(({ paper, label }) => {
    const pages = bendingTemplateSvgs(shape, { paper });
    return pages.map((svg, i) => ({
      name: pages.length === 1 ? `${entry.id}.template-${paper}.svg` : `${entry.id}.template-${paper}-page${i + 1}.svg`,
      label: pages.length === 1 ? `1:1 bending template, one ${label} page` : `1:1 bending template, ${label} page ${i + 1} of ${pages.length}`,
      mediaType: "image/svg+xml",
      content: svg,
    }));
  });
}

/** Every download of a design, the checksum list last. Infeasible entries get their JSON only. */
export function downloadFiles(entry: Entry): DownloadFile[] {
  const files: DownloadFile[] = [
    { name: `${entry.id}.json`, label: "catalog entry (JSON, every figure)", mediaType: "application/json", content: serialize(entry) },
  ];
  if (isOk(entry)) {
    const shape = exportShapeOf(entry);
    files.push(
      { name: `${entry.id}.shape.json`, label: "shape file (loads into bentwire analyze)", mediaType: "application/json", content: `${JSON.stringify(shapeFileOf(entry), null, 2)}\n` },
      { name: `${entry.id}.nodes.csv`, label: "node coordinates (CSV, metres and inches)", mediaType: "text/csv", content: nodesCsv(shape) },
      { name: `${entry.id}.dxf`, label: "polyline for jig cutting (DXF, millimetres)", mediaType: "application/dxf", content: wireDxf(shape) },
      ...templateFiles(entry, shape),
    );
  }
  files.push({
    name: CHECKSUM_FILE,
    label: "SHA-256 checksums of the files above",
    mediaType: "text/plain",
    content: sha256Listing(files.map((f) => ({ name: f.name, content: f.content }))),
  });
  return files;
}

/** One checksum list over every download of the site, names relative to the site root. */
export function allChecksums(entries: readonly Entry[], filePath: (id: string, name: string) => string): string {
  return sha256Listing(
    entries.flatMap((e) => downloadFiles(e).filter((f) => f.name !== CHECKSUM_FILE).map((f) => ({ name: filePath(e.id, f.name), content: f.content }))),
  );
}
