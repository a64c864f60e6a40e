// The address of the in-browser designer (<base>custom/) for a catalog design moved to a new
// frequency, kept apart from scaledFiles.ts so the design page loads the export code only on a click.
import type { ScaleSource } from "./scaledFiles.js";

/**
 * The in-browser designer's address for this design at the new frequency: the band scaled with the
 * frequency (same relative width), the same wire length in wavelengths, pieces, variant and seed,
 * and the scaled wire diameter. Parameter names are the designer page's.
 */
export function designerHref(base: string, s: ScaleSource, targetHz: number): string {
  const k = targetHz / s.frequencyHz;
  const q = new URLSearchParams({
    freqMhz: String(Number((targetHz / 1e6).toFixed(4))),
    bandMhz: `${Number(((s.bandHz[0] * k) / 1e6).toFixed(4))}:${Number(((s.bandHz[1] * k) / 1e6).toFixed(4))}`,
    lengthWl: String(s.lengthWl),
    pieces: String(s.piecesPerArm),
    variant: s.variant,
    wireDiameterMm: String(Number(((s.wireDiameterM / k) * 1000).toFixed(3))),
    conductor: s.conductor,
    seed: String(s.seed),
  });
  return `${base}custom/?${q}`;
}
