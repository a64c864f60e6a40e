// A design request from the values a person gives (MHz, mm, a wire length in wavelengths or in
// metres), shared by the `design` command and the in-browser designer so both apply the same rules
// with the same messages: the required values first, then the request schema (request.ts).
// Wire length in metres → wavelengths: L_wl = L_m / λ, λ = c / f.
import type { Ground } from "../em/ground.js";
import { InputError } from "../errors.js";
import { wavelengthM } from "../units.js";
import { parseDesignRequest, type DesignRequest } from "./request.js";

export interface DesignInputs {
  freqMhz?: number;
  /** Band edges in Hz. */
  bandHz?: [number, number];
  lengthWl?: number;
  lengthM?: number;
  pieces?: number;
  wireDiameterMm: number;
  conductor: string;
  variant: string;
  seed: number;
  /** Over ground (absent: free space); see request.ts. */
  ground?: Ground;
  heightM?: number;
  mounting?: string;
  objective?: string;
  /** Vertical only: every wire point at least this many metres up; heightM is then the mast top (the feed). */
  clearanceM?: number;
}

/** What each value is called where it was given (command-line flags by default). */
export interface InputNames {
  freqMhz: string;
  lengthWl: string;
  lengthM: string;
  pieces: string;
}

/**
 * A support height as a person types it (metres): the first rule of the command line's --height-m and
 * of the designer's heightM field, before the request schema's own (above 0, at least 5 wire diameters).
 */
export function heightMOfText(text: string, name: string): number {
  const v = Number(text);
  if (text.trim() === "" || !Number.isFinite(v) || v < 0) throw new InputError(`${name} must be a number of metres, 0 or more`);
  return v;
}

export const FLAG_NAMES: InputNames = { freqMhz: "--freq-mhz", lengthWl: "--length-wl", lengthM: "--length-m", pieces: "--pieces" };

export function requestFromInputs(inputs: DesignInputs, names: InputNames = FLAG_NAMES, label = "design"): DesignRequest {
  if (inputs.freqMhz === undefined) throw new InputError(`${label}: ${names.freqMhz} is required`);
  if (inputs.lengthWl !== undefined && inputs.lengthM !== undefined) {
    throw new InputError(`${label}: give ${names.lengthWl} or ${names.lengthM}, not both`);
  }
  if (inputs.lengthWl === undefined && inputs.lengthM === undefined) {
    throw new InputError(`${label}: ${names.lengthWl} (or ${names.lengthM}) is required`);
  }
  if (inputs.pieces === undefined) throw new InputError(`${label}: ${names.pieces} is required`);
  const frequencyHz = inputs.freqMhz * 1e6;
  const lengthWl = inputs.lengthWl ?? inputs.lengthM! / wavelengthM(frequencyHz);
  return parseDesignRequest(
    {
      frequencyHz,
      lengthWl,
      piecesPerArm: inputs.pieces,
      wireDiameterM: inputs.wireDiameterMm / 1000,
      conductor: inputs.conductor,
      variant: inputs.variant,
      bandHz: inputs.bandHz,
      seed: inputs.seed,
      ground: inputs.ground,
      heightM: inputs.heightM,
      mounting: inputs.mounting,
      objective: inputs.objective,
      verticalClearanceM: inputs.clearanceM,
    },
    label,
  );
}
