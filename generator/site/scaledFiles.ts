// The scale calculator's downloads: the design scaled in every dimension by f_design / f_new (as
// scale.ts explains), written by the same export code the catalog's own downloads use: a shape file
// for `bentwire analyze`, node coordinates (CSV), a DXF polyline, and the 1:1 template sheets (the
// page turns them into one PDF); browser/designerLinks.ts gives the designer's address. Browser-safe: imports no Node module (the export index would bring node:crypto).
import { nodesCsv } from "../export/csv.js";
import { wireDxf } from "../export/dxf.js";
import { bendingTemplateSvgs } from "../export/svgTemplate.js";
import type { ExportShape, PaperName } from "../export/types.js";

/** What the page writes into its data for the calculator's files. */
export interface ScaleSource {
  id: string;
  title: string;
  frequencyHz: number;
  wireDiameterM: number;
  conductor: string;
  segmentsPerWavelength: number;
  pointsM: [number, number, number][];
  feedVertex: number;
  lengthWl: number;
  piecesPerArm: number;
  variant: string;
  bandHz: [number, number];
  seed: number;
}

export interface ScaledFiles {
  /** File names carry the new frequency, e.g. "2m-1.5wl-k2-max-gain.at-147MHz.shape.json". */
  stem: string;
  shapeJson: string;
  csv: string;
  dxf: string;
  exportShape: ExportShape;
}

const mhzText = (hz: number) => `${Number((hz / 1e6).toFixed(3))}MHz`;

export function scaledFiles(s: ScaleSource, targetHz: number): ScaledFiles {
  const k = s.frequencyHz / targetHz;
  const pointsM = s.pointsM.map((p) => p.map((v) => v * k) as [number, number, number]);
  const title = `${s.title}, scaled to ${Number((targetHz / 1e6).toFixed(3))} MHz`;
  const exportShape: ExportShape = {
    id: `${s.id}.at-${mhzText(targetHz)}`, title, frequencyHz: targetHz, wireDiameterM: s.wireDiameterM * k,
    wires: [{ pointsM }], feedPointM: pointsM[s.feedVertex],
  };
  const shape = {
    name: title.slice(0, 200), frequencyHz: targetHz, wireRadiusM: (s.wireDiameterM * k) / 2, conductor: s.conductor,
    segmentsPerWavelength: s.segmentsPerWavelength, wires: [{ pointsM }], feed: { wire: 0, vertex: s.feedVertex },
  };
  return { stem: exportShape.id, shapeJson: `${JSON.stringify(shape, null, 2)}\n`, csv: nodesCsv(exportShape), dxf: wireDxf(exportShape), exportShape };
}

/** The template sheets of the scaled design for one paper (SVG text, one per sheet). */
export const scaledSheets = (files: ScaledFiles, paper: PaperName): string[] => bendingTemplateSvgs(files.exportShape, { paper });
