// Which catalog bands a typed frequency belongs to. Inside a band: that band. A little outside one
// (within NEAR_BAND_FRACTION of the frequency from its nearer edge, e.g. 147 MHz against a 2 m band
// set to 144–146 MHz): that band's designs, with a note that says how far out it is, the band's own
// regional note (where other ITU regions allocate more) and that the scale calculator retunes any
// design. Farther: no band, and the note names the nearest one.
import * as f from "./format.js";

/** How far outside a band edge a frequency may be and still be offered that band (2 % of it). */
export const NEAR_BAND_FRACTION = 0.02;

export interface FitBand {
  id: string;
  name: string;
  lowHz: number;
  highHz: number;
  /** The band's note from the grid (regional differences); optional in older indexes. */
  note?: string;
}

export interface FrequencyFit {
  /** Bands whose designs fit the frequency (empty when none is close). */
  bandIds: string[];
  /** What the finder says about the frequency; null when it lies inside a band. */
  note: string | null;
  /** Whether the frequency lies outside every band. */
  outside: boolean;
}

/** Distance from a frequency to a band (0 inside it). */
const distanceHz = (hz: number, b: FitBand): number => (hz < b.lowHz ? b.lowHz - hz : hz > b.highHz ? hz - b.highHz : 0);

export function fitFrequency(bands: readonly FitBand[], frequencyHz: number): FrequencyFit {
  if (!(frequencyHz > 0) || bands.length === 0) return { bandIds: [], note: bands.length ? "Type a frequency above 0 MHz." : null, outside: true };
  const inside = bands.filter((b) => distanceHz(frequencyHz, b) === 0);
  if (inside.length) return { bandIds: inside.map((b) => b.id), note: null, outside: false };
  const nearest = [...bands].sort((a, b) => distanceHz(frequencyHz, a) - distanceHz(frequencyHz, b) || (a.id < b.id ? -1 : 1))[0];
  const gap = distanceHz(frequencyHz, nearest);
  const side = frequencyHz > nearest.highHz ? "above" : "below";
  const where = `${nearest.name} (${f.bandEdges(nearest.lowHz, nearest.highHz)} here)`;
  if (gap <= NEAR_BAND_FRACTION * frequencyHz) {
    const regional = nearest.note ? ` ${nearest.note}` : "";
    return {
      bandIds: [nearest.id],
      note: `${f.mhz(frequencyHz)} is ${f.mhz(gap)} ${side} the ${where}; showing that band's designs.${regional} Check that your licence allows ${f.mhz(frequencyHz)}, then retune a design with the scale calculator on its page.`,
      outside: true,
    };
  }
  return {
    bandIds: [],
    note: `No band in the catalog holds ${f.mhz(frequencyHz)}. The nearest is the ${where}, ${f.mhz(gap)} ${side === "above" ? "below" : "above"} it; any design can be retuned with the scale calculator on its page.`,
    outside: true,
  };
}
