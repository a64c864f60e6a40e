// The physical bounds on every input, stated once. The shape file schema (em/shapeFile.ts), the grid
// file schema (catalog/grid.ts) and the command-line flags (cli/options.ts) all read them from here,
// and README.md ("Input bounds") lists the same numbers (a test keeps the two in step).
// Why these numbers: generous for real wire antennas (VLF whips to millimetre-wave wires), and small
// enough that any accepted shape solves in seconds on one core with finite figures:
//  - the dense moment matrix costs 16 N² bytes and N³/3 operations: N = 1,200 unknowns is 23 MB and
//    about 2 s of CPU; the far-field search grows with the distance of the wire from the origin in
//    wavelengths, hence the 10 λ bound on it;
//  - below a span of 1e-4 λ, or a radius below 1 nm, the thin-wire kernel loses every digit (reference
//    checks use radii down to 1e-7 λ);
//  - the surface-resistance loss model (skin depth ≪ radius) is meaningless for poor conductors,
//    so conductivity is held to metals (stainless steel ≈ 1.4e6 S/m, silver ≈ 6.3e7 S/m).

export const SHAPE_BOUNDS = {
  /** Design frequency (Hz): 10 kHz … 300 GHz. */
  frequencyHz: { min: 1e4, max: 3e11 },
  /** Wire radius (m), also per wire. */
  radiusM: { min: 1e-9, max: 1 },
  /** Wire radius at most this many wavelengths (thin-wire model). */
  radiusMaxWl: 0.01,
  /** Each coordinate (m), absolute. */
  coordinateAbsM: 1e4,
  /** Farthest point from the origin, in wavelengths. */
  farthestPointMaxWl: 10,
  /** Size of the whole shape (largest side of its bounding box), in wavelengths. */
  spanMinWl: 1e-4,
  /** Mesh segments; unknowns are segments minus one per wire. */
  segmentsMax: 1300,
  unknownsMax: 1200,
  /** Vertices over all wires, and wires. */
  verticesMax: 400,
  wiresMax: 50,
  /** Conductivity of a {"conductivitySPerM"} conductor (S/m). */
  conductivitySPerM: { min: 1e5, max: 1e8 },
  segmentsPerWavelength: { min: 5, max: 400 },
  nameMaxChars: 200,
  /** Shape file size before parsing (bytes) and bracket nesting depth. */
  fileBytesMax: 1_048_576,
  nestingMax: 16,
} as const;

export const ANALYSIS_BOUNDS = {
  /** Feed line impedance (Ω): 1 … 1000. */
  lineImpedanceOhm: { min: 1, max: 1000 },
  /** Bent copies in a tolerance study. */
  toleranceSamples: { min: 1, max: 1000 },
  /** Standard deviations of the bending errors. */
  bendSigmaDeg: { min: 0, max: 20 },
  lengthSigmaPercent: { min: 0, max: 20 },
  /** Band edges: inside the frequency bound, high edge at most twice the low edge. */
  bandRatioMax: 2,
  seed: { min: 0, max: 2 ** 31 - 1 },
} as const;

export const GRID_BOUNDS = {
  /** Grid file size before parsing (bytes), bracket depth, indentation (columns) and `key:` count. */
  fileBytesMax: 262_144,
  nestingMax: 16,
  indentMax: 64,
  keysMax: 1000,
  bandsMax: 50,
  lengthsMax: 50,
  lengthWl: { min: 0.2, max: 6 },
  piecesPerArm: { min: 1, max: 8 },
  segmentsPerWavelength: { min: 10, max: 200 },
  swrLimit: { min: 1, max: 10 },
  referenceRadiusWl: { min: 1e-6, max: 0.01 },
  relativeBandwidth: { min: 0, max: 0.5 },
  wireDiameterMm: { min: 2e-6, max: 2000 },
  /** Over ground: support heights, minimum heights and the vertical clearance (m). */
  heightM: { min: 0.5, max: 100 },
} as const;

/** "1e4 and 3e11" style text for messages ("must lie between …"). */
export const rangeText = (r: { min: number; max: number }): string => `${boundText(r.min)} and ${boundText(r.max)}`;

/** 1e-6, 0.01, 1000, 3e11: exponent form outside 0.001 … 99,999. */
export const boundText = (v: number): string =>
  v !== 0 && (Math.abs(v) < 1e-3 || Math.abs(v) >= 1e5) ? v.toExponential().replace("e+", "e").replace(/\.0+e/, "e") : String(v);
