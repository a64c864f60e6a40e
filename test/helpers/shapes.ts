// Shapes used across tests: frequencies chosen so that λ = 1 m, lengths in wavelengths.
import { validateShape, type Shape } from "../../generator/em/index.js";
import { SPEED_OF_LIGHT_M_PER_S } from "../../generator/units.js";

export const ONE_METRE_WAVELENGTH_HZ = SPEED_OF_LIGHT_M_PER_S;

export function straightDipole(lengthWl: number, radiusWl: number, extra: Partial<Shape> = {}): Shape {
  const h = lengthWl / 2;
  return validateShape({
    frequencyHz: ONE_METRE_WAVELENGTH_HZ,
    wireRadiusM: radiusWl,
    wires: [{ pointsM: [[-h, 0, 0], [0, 0, 0], [h, 0, 0]] }],
    feed: { wire: 0, vertex: 1 },
    ...extra,
  });
}

/** Symmetric V in the x–y plane, arms at `armDeg` from the +y symmetry axis. */
export function vee(lengthWl: number, armDeg: number, radiusWl: number, extra: Partial<Shape> = {}): Shape {
  const h = lengthWl / 2;
  const a = (armDeg * Math.PI) / 180;
  return validateShape({
    frequencyHz: ONE_METRE_WAVELENGTH_HZ,
    wireRadiusM: radiusWl,
    wires: [{ pointsM: [[-h * Math.sin(a), h * Math.cos(a), 0], [0, 0, 0], [h * Math.sin(a), h * Math.cos(a), 0]] }],
    feed: { wire: 0, vertex: 1 },
    ...extra,
  });
}
