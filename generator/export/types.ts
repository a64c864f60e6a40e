// The input every download writer takes: one catalog design's geometry, in SI units (metres).

/** A point in metres, [x, y, z]. */
export type PointM = [number, number, number];

export interface ExportShape {
  /** Catalog id, e.g. "2m-1.5wl-k3-max-gain". */
  id: string;
  /** Human title. */
  title: string;
  frequencyHz: number;
  wireDiameterM: number;
  /** Polylines; catalog shapes lie in the x–y plane (z = 0) with the feed at the origin. */
  wires: { pointsM: PointM[] }[];
  feedPointM: PointM;
}

export type PaperName = "a4" | "letter";

export interface TemplateOptions {
  /** Paper to tile over when the drawing does not fit one sheet. Default "a4". */
  paper?: PaperName;
  /** White border on every side of every page, in millimetres. Default 10. */
  marginMm?: number;
  /** Draw a thin 10 mm grid behind the wire. Default false. */
  grid?: boolean;
}

/** One file to list in a checksum file. Strings are hashed as their UTF-8 bytes. */
export interface ChecksumEntry {
  name: string;
  content: string | Uint8Array;
}
