export { parseShape, validateShape, shapeSchema, type Shape, type ShapeFile, type Vec3, type Conductor } from "./shapeFile.js";
export { buildMesh, type Mesh, DEFAULT_SEGMENTS_PER_WAVELENGTH } from "./mesh.js";
export { solveShape, solveFeed, conductivityOf, SOLVER_VERSION, type Solution, type SolveOptions, type FeedSolution } from "./solve.js";
export { farFieldAt, intensityAt, createFarFieldPlan, type FarFieldPlan } from "./farField.js";
export { findPeak, integratePattern, patternPointsFor } from "./pattern.js";
export { fillImpedance } from "./impedance.js";
export { solveComplex, createComplexMatrix, type ComplexMatrix } from "./complexLu.js";
export { FEED_GAP_WL, feedGapM, gapExcitation } from "./feedSource.js";
