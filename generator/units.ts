// Physical constants and unit conversions, defined once (SI, CODATA 2018 exact or recommended values).

/** Speed of light in vacuum, exact by the 2019 SI definition of the metre. */
export const SPEED_OF_LIGHT_M_PER_S = 299_792_458;
/** Vacuum permeability μ0 (CODATA 2018; 4π·1e-7 to 10 digits). */
export const MU0_H_PER_M = 1.25663706212e-6;
/** Vacuum permittivity ε0 = 1/(μ0 c²). */
export const EPS0_F_PER_M = 1 / (MU0_H_PER_M * SPEED_OF_LIGHT_M_PER_S ** 2);
/** Free-space wave impedance η0 = μ0 c ≈ 376.73 Ω. */
export const ETA0_OHM = MU0_H_PER_M * SPEED_OF_LIGHT_M_PER_S;

/** Conductivities, handbook values at 20 °C. */
export const CONDUCTIVITY_S_PER_M = {
  copper: 5.8e7,
  aluminium: 3.5e7,
} as const;

export const METRE_PER_INCH = 0.0254; // international inch, 1959
export const DEG_PER_RAD = 180 / Math.PI;
export const RAD_PER_DEG = Math.PI / 180;

export const wavelengthM = (frequencyHz: number): number => SPEED_OF_LIGHT_M_PER_S / frequencyHz;
export const wavenumberRadPerM = (frequencyHz: number): number =>
  (2 * Math.PI * frequencyHz) / SPEED_OF_LIGHT_M_PER_S;
export const toDb = (ratio: number): number => 10 * Math.log10(ratio);
