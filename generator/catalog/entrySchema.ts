// The catalog entry: one JSON file per design, shared by the generator (zod 4) and the site's
// content collection (Astro's bundled zod 3). The schema is built by a factory over the small part
// of the zod API that both versions share, so there is one definition for both.
import { z as z4 } from "zod";

/** Typed as zod 4; at run time only the part of the API that zod 3 shares is called. */
type Z = typeof z4;

export const ENTRY_SCHEMA_VERSION = 1;

export function makeEntrySchema(z: Z) {
  const num = z.number();
  const complex = z.object({ re: num, im: num }).strict();
  const groundValue = z.object({ type: z.enum(["perfect", "real"]), relativePermittivity: num.optional(), conductivitySPerM: num.optional() }).strict();
  const percentiles = z.object({ p5: num.nullable(), p50: num.nullable(), p95: num.nullable() }).strict();
  const component = z.object({ kind: z.enum(["inductor", "capacitor"]), position: z.enum(["series", "shunt"]), value: num }).strict();
  const inputs = z.object({
    bandId: z.string(),
    bandName: z.string(),
    bandNote: z.string(),
    bandLowHz: num,
    bandHighHz: num,
    frequencyHz: num,
    lengthWl: num,
    lengthM: num,
    piecesPerArm: z.number().int(),
    variant: z.enum(["max-gain", "direct-feed"]),
    wireDiameterM: num,
    conductor: z.enum(["perfect", "copper", "aluminium"]),
    lineImpedanceOhm: num,
    swrLimit: num,
    seed: z.number().int(),
    segmentsPerWavelength: num,
    tolerance: z.object({ samples: z.number().int(), bendSigmaDeg: num, lengthSigmaFraction: num }).strict(),
    // over ground (issue 13): absent means free space, as every entry before it
    overGround: z.object({
      /** Preset name of the ground the design was made over ("average" by default). */
      groundName: z.string(),
      ground: groundValue,
      /** The support height the cell asks for: the wire plane (horizontal) or the feed at the mast top (vertical). */
      heightM: num,
      mounting: z.enum(["horizontal", "vertical"]),
      /** The catalog's purposes; "peak" (most gain anywhere, window 0–90°) only in designs made in the designer. */
      purpose: z.enum(["long-distance", "near-vertical", "peak"]),
      /** Elevation window the purpose plans with, degrees above the horizon (long-distance 5–25, near-vertical 60–90). */
      elevationWindowDeg: z.tuple([num, num]),
      /** Vertical only: no wire point lower than this above the ground (heightM is then the mast top). */
      verticalClearanceM: num.optional(),
    }).strict().optional(),
  }).strict();
  const shape = z.object({
    pointsM: z.array(z.tuple([num, num, num])),
    feedVertex: z.number().int(),
    pieceLengthsM: z.array(num),
    firstAngleDeg: num,
    bendAnglesDeg: z.array(num),
    spanM: z.object({ x: num, y: num }).strict(),
    // off-centre-fed shapes (issue 10): both arms from the feed outward, and where the feed sits
    offCentre: z.object({
      feedFromTipM: num,
      feedFraction: num,
      halfApexDeg: num,
      left: z.object({ lengthM: num, pieceLengthsM: z.array(num), bendAnglesDeg: z.array(num) }).strict(),
      right: z.object({ lengthM: num, pieceLengthsM: z.array(num), bendAnglesDeg: z.array(num) }).strict(),
    }).strict().optional(),
  }).strict();
  const figures = z.object({
    gainDbi: num,
    directivityDbi: num,
    radiationEfficiency: num,
    inputImpedanceOhm: complex,
    swr: num,
    peakDirection: z.object({ thetaDeg: num, phiDeg: num }).strict(),
    beamwidthAlongPhiDeg: num.nullable(),
    beamwidthAlongThetaDeg: num.nullable(),
    frontToBackDb: num,
    polarization: z.object({ tiltDeg: num, axialRatioDb: num, sense: z.enum(["linear", "right-hand", "left-hand"]) }).strict(),
    lobe: z.string(),
    mounting: z.string(),
    /** Length of the feed gap the source is spread over (m); absent in entries before solver 2. */
    feedGapM: num.optional(),
    /** Change of gain and impedance at the last mesh doubling (analysis/converged.ts). */
    uncertainty: z.object({
      gainDb: num,
      impedancePercent: num,
      segmentsPerWavelength: num,
      comparedWithSegmentsPerWavelength: num,
      converged: z.boolean(),
    }).strict().optional(),
  }).strict();
  const sweep = z.object({
    lineImpedanceOhm: num,
    points: z.array(z.object({ frequencyHz: num, inBand: z.boolean(), impedanceOhm: complex, swr: num.nullable(), gainDbi: num, realizedGainDbi: num.nullable() }).strict()),
    swr2Span: z.object({ lowHz: num, highHz: num, widthHz: num, touchesSweepEdge: z.boolean() }).strict().nullable(),
  }).strict();
  const match = z.object({
    swrAtDesign: num.nullable(),
    needed: z.boolean(),
    networks: z.array(z.object({ topology: z.string(), components: z.array(component), e12Components: z.array(component), bandSwr: z.array(num.nullable()), bandSwrE12: z.array(num.nullable()) }).strict()),
    quarterWave: z.object({ idealImpedanceOhm: num, cableImpedanceOhm: num, cable: z.string(), velocityFactor: num, physicalLengthM: num, bandSwr: z.array(num.nullable()) }).strict().nullable(),
    balunNote: z.string(),
  }).strict();
  const tolerance = z.object({
    samples: z.number().int(),
    failedSamples: z.number().int(),
    bendSigmaDeg: num,
    lengthSigmaFraction: num,
    seed: z.number().int(),
    nominalGainDbi: num,
    gainDbi: percentiles,
    swr: percentiles,
    fragile: z.boolean(),
  }).strict();
  const pattern = z.object({
    cutStepDeg: num,
    cutAlongPhiDbi: z.array(num),
    cutAlongThetaDbi: z.array(num),
    gridThetaStepDeg: num,
    gridPhiStepDeg: num,
    gridDbi: z.array(z.array(num)),
  }).strict();
  const checks = z.object({
    segmentsPerWavelength: z.tuple([num, num]),
    gainChangeDb: num,
    impedanceChangeOhm: num,
    /** Null over real ground (issue 13), where the ground absorbs power and no balance is checked. */
    energyBalanceError: num.nullable(),
    warnings: z.array(z.string()),
  }).strict();
  const optimizer = z.object({
    evaluations: z.number().int(),
    searchEvaluations: z.number().int(),
    startedFrom: z.enum(["search", "reference"]),
    stopReasons: z.array(z.object({ reason: z.string(), value: num.nullable() }).strict()),
    history: z.array(z.object({ evaluations: z.number().int(), bestF: num.nullable() }).strict()),
  }).strict();
  // feed options (issue 10): optional so entries written before them still parse
  const swrPct = z.object({ p50: num.nullable(), p90: num.nullable(), p95: num.nullable() }).strict();
  const feedOption = z.object({
    kind: z.enum(["balun", "l-network", "quarter-wave"]),
    build: z.string(),
    needsNoParts: z.boolean(),
    circuit: z.object({
      balunRatio: num,
      balunLossDb: num,
      network: z.array(component).optional(),
      quarterWave: z.object({ impedanceOhm: num, designFrequencyHz: num, lengthM: num, lossDbPer100mAt100MHz: num }).strict().optional(),
    }).strict(),
    bandSwr: z.array(num.nullable()),
    worstSwr: num.nullable(),
    meetsLimit: z.boolean(),
    lossDb: num.nullable(),
    realizedGainDbi: num.nullable(),
    worstRealizedGainDbi: num.nullable(),
    holdsAsBuilt: z.boolean().optional(),
  }).strict();
  const feed = z.object({
    buildNote: z.string(),
    feedFraction: num,
    options: z.object({
      swrLimit: num,
      partQ: z.object({ inductorQ: num, capacitorQ: num }).strict(),
      options: z.array(feedOption),
      recommended: z.number().int().nullable(),
      verdict: z.string(),
      rejected: z.array(z.string()),
    }).strict(),
    realizedGainDbi: num.nullable(),
    needsNoParts: z.boolean(),
    toleranceSwr: z.object({
      samples: z.number().int(),
      failedSamples: z.number().int(),
      seed: z.number().int(),
      swrLimit: num,
      perFrequency: z.array(z.object({ frequencyHz: num, bare: swrPct, afterFeed: swrPct.optional() }).strict()),
      meetsLimitAsBuilt: z.boolean(),
    }).strict(),
    verdict: z.object({ sensitive: z.boolean(), words: z.string() }).strict(),
  }).strict();
  // over ground (issue 13). Conventions for entries over ground: shape.pointsM stays the drawing in the
  // x–y plane (feed at the origin, as for free space); mountedPointsM holds the wire as hung (z up,
  // ground at z = 0) and is what the downloadable shape file carries, with the ground.
  // figures.gainDbi is the gain at the takeoff direction (the best within the purpose's elevation
  // window), figures.peakDirection that direction as θ from the zenith and φ; the sweep's gainDbi
  // is the same window gain per frequency, its impedance and SWR those at the cell's height.
  const groundFigures = z.object({
    gainDbi: num,
    takeoffElevationDeg: num,
    impedanceOhm: complex,
    swr: num.nullable(),
  }).strict();
  const overGround = z.object({
    mountedPointsM: z.array(z.tuple([num, num, num])),
    /** Feed-point height, lowest and highest wire point above the ground (m). */
    feedHeightM: num,
    lowestPointM: num,
    highestPointM: num,
    /** Best gain in the whole upper half-space and where it points (it may lie outside the window). */
    peakGainDbi: num,
    peakElevationDeg: num,
    peakAzimuthDeg: num,
    /** The takeoff: the strongest direction inside the elevation window (= figures.gainDbi). */
    takeoffElevationDeg: num,
    takeoffAzimuthDeg: num,
    gainAtElevationDbi: z.array(z.object({ elevationDeg: num, gainDbi: num }).strict()),
    /** Gain every stepDeg from the horizon (0°) to the zenith (90°) in the vertical plane through the takeoff azimuth, and on to 180° (the far side). */
    elevationCut: z.object({ azimuthDeg: num, stepDeg: num, gainDbi: z.array(num) }).strict(),
    /** Gain every stepDeg of azimuth from 0° to 360° (exclusive) at the takeoff elevation. */
    azimuthCut: z.object({ elevationDeg: num, stepDeg: num, gainDbi: z.array(num) }).strict(),
    /** Fraction of the input power absorbed by the ground (null over perfect ground). */
    groundLossFraction: num.nullable(),
    /** The same shape at neighbouring support heights, same ground ("what if my mast is 3 m lower"). */
    heightCurve: z.array(groundFigures.extend({ heightM: num })),
    /** The same shape at the same height over other grounds (poor, good). */
    otherGrounds: z.array(groundFigures.extend({ groundName: z.string() })),
    /** The same shape in free space, for comparison. */
    freeSpace: z.object({ gainDbi: num, impedanceOhm: complex }).strict(),
  }).strict();
  return z.object({
    schemaVersion: z.literal(ENTRY_SCHEMA_VERSION),
    id: z.string().regex(/^[a-z0-9][a-z0-9.-]*$/),
    title: z.string(),
    status: z.enum(["ok", "infeasible"]),
    message: z.string(),
    inputs,
    versions: z.object({ solver: z.string(), generator: z.string() }).strict(),
    inputHash: z.string().regex(/^[0-9a-f]{64}$/),
    /** Shape family; absent means centre-fed (mirror-image arms). */
    family: z.enum(["centre-fed", "off-centre"]).optional(),
    shape: shape.nullable(),
    figures: figures.nullable(),
    sweep: sweep.nullable(),
    match: match.nullable(),
    tolerance: tolerance.nullable(),
    pattern: pattern.nullable(),
    checks: checks.nullable(),
    feed: feed.nullable().optional(),
    /** Over-ground figures (issue 13); absent for free-space entries, null when no shape was found. */
    overGround: overGround.nullable().optional(),
    optimizer,
    contentHash: z.string().regex(/^[0-9a-f]{64}$/),
  }).strict();
}

export const entrySchema = makeEntrySchema(z4);

export type Entry = z4.infer<typeof entrySchema>;
