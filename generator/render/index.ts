// The catalog's image renderers: pure functions from an "ok" entry to SVG strings or PNG buffers.
export { shapeSvg, type ShapeOptions } from "./shapeSvg.js";
export { patternCutSvg, type CutOptions } from "./patternCutSvg.js";
export { pattern3dSvg, type Pattern3dOptions } from "./pattern3dSvg.js";
export { sweepSvg, type SweepOptions } from "./sweepSvg.js";
export { smithSvg, type SmithOptions } from "./smithSvg.js";
export { thumbnailPng } from "./thumbnailPng.js";
export { shareCardPng } from "./shareCardPng.js";
