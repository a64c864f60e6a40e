// Reference checks of the solver against published values, in one list: the tests assert them and
// the site's method-and-validation page prints them, so both show the same numbers.
// Shapes are built with λ = 1 m (frequency = c), lengths in wavelengths. The checks over the ground
// are in groundChecks.ts and come after the free-space ones.
import { frontHalfPowerBeamwidthDeg } from "./beamwidth.js";
import { GROUND_CASES } from "./groundChecks.js";
import { solveShape, validateShape, type Shape } from "../em/index.js";
import { surfaceResistancePerM } from "../em/impedance.js";
import { SPEED_OF_LIGHT_M_PER_S } from "../units.js";

export interface ReferenceCheck {
  id: string;
  quantity: string;
  unit: string;
  reference: number;
  source: string;
  ours: number;
  deviation: number;
  tolerance: number;
  pass: boolean;
}

const BALANIS = "Balanis, Antenna Theory, 3rd ed., ch. 4 (sinusoidal current, thin wire)";
const COMMON = "common practice";

export function dipole(lengthWl: number, radiusWl: number, segmentsPerWavelength = 50): Shape {
  const h = lengthWl / 2;
  return validateShape({
    frequencyHz: SPEED_OF_LIGHT_M_PER_S, wireRadiusM: radiusWl, segmentsPerWavelength,
    wires: [{ pointsM: [[-h, 0, 0], [0, 0, 0], [h, 0, 0]] }], feed: { wire: 0, vertex: 1 },
  });
}

export function veeShape(lengthWl: number, armDeg: number, radiusWl: number): Shape {
  const h = lengthWl / 2, a = (armDeg * Math.PI) / 180;
  return validateShape({
    frequencyHz: SPEED_OF_LIGHT_M_PER_S, wireRadiusM: radiusWl,
    wires: [{ pointsM: [[-h * Math.sin(a), h * Math.cos(a), 0], [0, 0, 0], [h * Math.sin(a), h * Math.cos(a), 0]] }], feed: { wire: 0, vertex: 1 },
  });
}

export interface ReferenceCase {
  id: string;
  quantity: string;
  unit: string;
  reference: number;
  source: string;
  tolerance: number;
  compute: () => number;
}

const FREE_SPACE_CASES: ReferenceCase[] = [
  ...([[0.5, 2.15], [1.0, 3.82], [1.25, 5.16], [1.5, 3.48]] as const).map(([l, d]): ReferenceCase => ({
    id: `dipole-${l}wl-directivity`, quantity: `directivity of a ${l} λ dipole, radius 1e-3 λ`, unit: "dBi", reference: d, source: BALANIS, tolerance: 0.2,
    compute: () => solveShape(dipole(l, 1e-3)).peakDirectivityDbi,
  })),
  {
    id: "short-dipole-directivity", quantity: "directivity of a 0.05 λ dipole (Hertzian limit D = 1.5)", unit: "dBi", reference: 1.76, source: `${BALANIS}, eq. 4-31`, tolerance: 0.05,
    compute: () => solveShape(dipole(0.05, 1e-4, 25)).peakDirectivityDbi,
  },
  {
    id: "half-wave-resistance", quantity: "input resistance of a 0.5 λ dipole, radius 1e-7 λ", unit: "Ω", reference: 73.1, source: "Balanis, eq. 8-61 (induced EMF, infinitely thin)", tolerance: 4,
    compute: () => solveShape(dipole(0.5, 1e-7)).inputImpedanceOhm.re,
  },
  {
    id: "half-wave-reactance", quantity: "input reactance of a 0.5 λ dipole, radius 1e-7 λ", unit: "Ω", reference: 42.5, source: "Balanis, eq. 8-61 (induced EMF, infinitely thin)", tolerance: 4,
    compute: () => solveShape(dipole(0.5, 1e-7)).inputImpedanceOhm.im,
  },
  {
    id: "short-dipole-beamwidth", quantity: "half-power beamwidth of a 0.05 λ dipole", unit: "°", reference: 90, source: "Balanis §4.2", tolerance: 0.5,
    compute: () => frontHalfPowerBeamwidthDeg(dipole(0.05, 1e-4, 25)),
  },
  {
    id: "half-wave-beamwidth", quantity: "half-power beamwidth of a 0.5 λ dipole", unit: "°", reference: 78, source: "Balanis §4.6", tolerance: 1,
    compute: () => frontHalfPowerBeamwidthDeg(dipole(0.5, 1e-4, 25)),
  },
  {
    id: "straight-1.5wl-gain", quantity: "gain of a straight 1.5 λ wire, radius 1e-3 λ", unit: "dBi", reference: 3.6, source: COMMON, tolerance: 0.1,
    compute: () => solveShape(dipole(1.5, 1e-3, 25)).peakGainDbi,
  },
  {
    id: "vee-1.5wl-gain", quantity: "gain of a 1.5 λ V, arms 54.3° from the axis", unit: "dBi", reference: 6.0, source: COMMON, tolerance: 0.2,
    compute: () => solveShape(veeShape(1.5, 54.3, 1e-3)).peakGainDbi,
  },
  {
    id: "loss-resistance", quantity: "loss resistance of a 0.48 λ dipole of 0.2 mm wire, σ = 1.4e6 S/m, at 14 MHz", unit: "Ω",
    reference: lossReferenceOhm(), source: "Balanis, eq. 2-90b: R'·l/2 for a sinusoidal current", tolerance: 0.05 * lossReferenceOhm(),
    compute: () => {
      const s = solveShape(lossyDipole());
      const i2 = 1 / (s.inputImpedanceOhm.re ** 2 + s.inputImpedanceOhm.im ** 2); // |I|² for 1 V
      return (2 * s.lossPowerW) / i2;
    },
  },
];

function lossyDipole(): Shape {
  const f = 14e6, h = (0.48 * SPEED_OF_LIGHT_M_PER_S) / f / 2;
  return validateShape({
    frequencyHz: f, wireRadiusM: 1e-4, conductor: { conductivitySPerM: 1.4e6 }, segmentsPerWavelength: 60,
    wires: [{ pointsM: [[-h, 0, 0], [0, 0, 0], [h, 0, 0]] }], feed: { wire: 0, vertex: 1 },
  });
}

function lossReferenceOhm(): number {
  const f = 14e6;
  return (surfaceResistancePerM(f, 1e-4, 1.4e6) * (0.48 * SPEED_OF_LIGHT_M_PER_S)) / f / 2;
}

const CASES: ReferenceCase[] = [...FREE_SPACE_CASES, ...GROUND_CASES];

export function referenceChecks(): ReferenceCheck[] {
  return CASES.map(({ compute, ...c }) => {
    const ours = compute();
    const deviation = ours - c.reference;
    return { ...c, ours, deviation, pass: Math.abs(deviation) <= c.tolerance };
  });
}
