// The reference checks over the ground plane z = 0 (the rows "over ground" of the validation table).
// Perfect ground: image theory against the free-space textbook values. Real ground: the Fresnel
// reflection coefficient read back from the solver's pattern against its closed form (fresnel.ts).
// Lengths in wavelengths with λ = 1 m (frequency = c), except the real-ground rows, at 7.1 MHz.
import { intensityAt, solveShape, validateShape, type Shape, type Vec3 } from "../em/index.js";
import { GROUND_PRESETS } from "../em/ground.js";
import { DEG_PER_RAD, RAD_PER_DEG, SPEED_OF_LIGHT_M_PER_S, wavelengthM } from "../units.js";
import { fresnelMagnitude } from "./fresnel.js";
import { halfWaveMutualResistanceOhm } from "./inducedEmf.js";
import type { ReferenceCase } from "./referenceChecks.js";

const BALANIS_IMAGES = "Balanis, Antenna Theory, 3rd ed., §4.7 (image theory; section number from memory)";
const REAL_GROUND_HZ = 7.1e6;
const AVERAGE = GROUND_PRESETS.average;
const AVERAGE_TEXT = `average ground (ε_r ${AVERAGE.relativePermittivity}, σ ${AVERAGE.conductivitySPerM * 1e3} mS/m) at ${REAL_GROUND_HZ / 1e6} MHz`;

function overGround(pointsM: Vec3[], radiusM: number, feedVertex: number, ground: Shape["ground"], frequencyHz = SPEED_OF_LIGHT_M_PER_S, segmentsPerWavelength = 50): Shape {
  return validateShape({ frequencyHz, wireRadiusM: radiusM, segmentsPerWavelength, wires: [{ pointsM }], feed: { wire: 0, vertex: feedVertex }, ground });
}

/** Base-fed 0.25 λ monopole over perfect ground. */
const monopole = (radiusWl: number) => overGround([[0, 0, 0], [0, 0, 0.25]], radiusWl, 0, { type: "perfect" });

/** Centre-fed 0.5 λ dipole, horizontal (along x) or vertical, centred at heightM; λ = c/frequencyHz. */
function halfWave(orientation: "horizontal" | "vertical", heightM: number, radiusM: number, ground: Shape["ground"], frequencyHz = SPEED_OF_LIGHT_M_PER_S, segmentsPerWavelength = 50): Shape {
  const q = wavelengthM(frequencyHz) / 4;
  const pts: Vec3[] = orientation === "horizontal" ? [[-q, 0, heightM], [0, 0, heightM], [q, 0, heightM]] : [[0, 0, heightM - q], [0, 0, heightM], [0, 0, heightM + q]];
  return overGround(pts, radiusM, 1, ground, frequencyHz, segmentsPerWavelength);
}

/**
 * |Γ| at elevation ψ over average ground, read from the solver's pattern of a half-wave dipole whose
 * field is E = E_d(1 + Γ e^{−ja}), a = 2kh sin ψ: the direct ray plus the ray reflected at the ground,
 * 2h sin ψ longer (Balanis §4.8). At a = π, |E/E_d|² = |1 − Γ|²; at a = 2π, |1 + Γ|²; their mean is
 * 1 + |Γ|². E_d is the solution's direct (free-space) field of the same currents, in the same direction.
 * Over real ground the vertical dipole's current is slightly asymmetric, so there the reflected ray
 * is not exactly Γ times the direct one (a deviation of order 1e-4).
 */
function reflectionFromPattern(orientation: "horizontal" | "vertical", elevationDeg: number): number {
  const lambdaM = wavelengthM(REAL_GROUND_HZ);
  const ratioSquared = (phaseHalfTurns: number) => {
    const heightM = (phaseHalfTurns * lambdaM) / (4 * Math.sin(elevationDeg * RAD_PER_DEG));
    const s = solveShape(halfWave(orientation, heightM, 1e-3, AVERAGE, REAL_GROUND_HZ, 25), { energyBalance: false });
    const at = s.ground!.gainAtElevationDbi.find((e) => e.elevationDeg === elevationDeg);
    if (!at) throw new Error(`${elevationDeg}° is not one of the planning elevations`);
    const totalWPerSr = (10 ** (at.gainDbi / 10) * s.inputPowerW) / (4 * Math.PI); // U = G·P_in/(4π)
    const directWPerSr = intensityAt(s.farField, (90 - elevationDeg) * RAD_PER_DEG, s.ground!.peakAzimuthDeg * RAD_PER_DEG, new Float64Array(4));
    return totalWPerSr / directWPerSr;
  };
  return Math.sqrt((ratioSquared(1) + ratioSquared(2)) / 2 - 1);
}

export const GROUND_CASES: ReferenceCase[] = [
  {
    id: "ground-monopole-resistance", quantity: "input resistance of a base-fed 0.25 λ monopole over perfect ground, radius 1e-7 λ", unit: "Ω",
    reference: 36.5, source: `${BALANIS_IMAGES}: half the 0.5 λ dipole's 73.1 Ω (eq. 8-61, induced EMF, infinitely thin)`, tolerance: 2,
    compute: () => solveShape(monopole(1e-7)).inputImpedanceOhm.re,
  },
  {
    id: "ground-monopole-directivity", quantity: "directivity of a 0.25 λ monopole over perfect ground, radius 1e-3 λ", unit: "dBi",
    reference: 5.16, source: `${BALANIS_IMAGES}: twice the 0.5 λ dipole's (2.15 dBi + 3.01 dB)`, tolerance: 0.2,
    compute: () => solveShape(monopole(1e-3)).peakDirectivityDbi,
  },
  {
    id: "ground-horizontal-0.5wl-resistance", quantity: "input resistance of a horizontal 0.5 λ dipole 0.5 λ over perfect ground, radius 1e-7 λ", unit: "Ω",
    // the image is a second dipole 2h = 1 λ away carrying the opposite current: R = R11 − R12(2h)
    reference: 73.1 - halfWaveMutualResistanceOhm(1),
    source: "Balanis, Antenna Theory, 3rd ed., eq. 8-71a (induced EMF): R11 − R12(2h), R11 = 73.1 Ω (eq. 8-61), R12 at 1 λ spacing (equation numbers from memory)",
    tolerance: 4,
    compute: () => solveShape(halfWave("horizontal", 0.5, 1e-7, { type: "perfect" })).inputImpedanceOhm.re,
  },
  {
    id: "ground-horizontal-1wl-lobe", quantity: "elevation of the lowest lobe of a horizontal 0.5 λ dipole 1 λ over perfect ground", unit: "°",
    reference: Math.asin(1 / 4) * DEG_PER_RAD, source: `${BALANIS_IMAGES}: array factor 2 sin(kh sin ψ), lowest maximum at sin ψ = λ/(4h)`, tolerance: 0.1,
    // the next lobe, at sin ψ = 3λ/(4h) (48.6°), is as strong: search below it
    compute: () => solveShape(halfWave("horizontal", 1, 1e-3, { type: "perfect" }, SPEED_OF_LIGHT_M_PER_S, 25), { elevationWindowDeg: [0, 30] }).ground!.peakElevationDeg,
  },
  {
    id: "ground-average-reflection-horizontal", quantity: `|Γ| for horizontal polarization at 30° elevation over ${AVERAGE_TEXT}, from the pattern of a horizontal dipole`, unit: "",
    reference: fresnelMagnitude("horizontal", AVERAGE.relativePermittivity, AVERAGE.conductivitySPerM, REAL_GROUND_HZ, 30 * RAD_PER_DEG),
    source: "Balanis, Antenna Theory, 3rd ed., §4.8 (Fresnel reflection coefficient, closed form); the ground is the usual \"average\" pair (common practice)", tolerance: 0.005,
    compute: () => reflectionFromPattern("horizontal", 30),
  },
  {
    id: "ground-average-reflection-vertical", quantity: `|Γ| for vertical polarization at 15° elevation over ${AVERAGE_TEXT}, from the pattern of a vertical dipole`, unit: "",
    reference: fresnelMagnitude("vertical", AVERAGE.relativePermittivity, AVERAGE.conductivitySPerM, REAL_GROUND_HZ, 15 * RAD_PER_DEG),
    source: "Balanis, Antenna Theory, 3rd ed., §4.8 (Fresnel reflection coefficient, closed form); the ground is the usual \"average\" pair (common practice)", tolerance: 0.005,
    compute: () => reflectionFromPattern("vertical", 15),
  },
];
