// Download writers for catalog designs: pure functions from an ExportShape to file contents.
export type { ChecksumEntry, ExportShape, PaperName, PointM, TemplateOptions } from "./types.js";
export { assertExportShape, assertFlatInXY } from "./validate.js";
export { CSV_COLUMNS, csvField, nodesCsv } from "./csv.js";
export { DXF_FEED_MARK_RADIUS_MM, wireDxf } from "./dxf.js";
export { sha256Hex, sha256Listing } from "./checksums.js";
export { bendingTemplateSvgs, planBendingTemplate } from "./svgTemplate.js";
export { SCALE_BAR_IN_MM, SCALE_BAR_MM, SCALE_CAPTION } from "./svgScaleBar.js";
export { escapeXml } from "./svgText.js";
export { LABEL_PAD_MM } from "./templateGeometry.js";
export {
  DEFAULT_MARGIN_MM,
  PAPER_MM,
  TEMPLATE_LAYOUT_MM,
  type Orientation,
  type TemplatePagePlan,
  type TemplatePlan,
} from "./templateLayout.js";
