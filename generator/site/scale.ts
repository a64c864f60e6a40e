// "Scale to my frequency": a wire antenna scaled in every dimension (wire diameter included) by
// f_design / f_new behaves at f_new as the original did at f_design; only conductor loss changes a
// little (skin depth scales as 1/√f). Bend angles stay. Pure function; the design page runs it live.
import * as f from "./format.js";

export interface ScaleInput {
  frequencyHz: number;
  lengthM: number;
  pieceLengthsM: number[];
  spanXM: number;
  spanYM: number;
  wireDiameterM: number;
}

export interface ScaleResult {
  ok: boolean;
  /** One line for the reader: the factor, or why nothing was scaled. */
  message: string;
  factor: number;
  lengthM: number;
  pieceLengthsM: number[];
  spanXM: number;
  spanYM: number;
  wireDiameterM: number;
  /** Set when the scaled design is far from the original or the wire gets very thin or thick. */
  caution: string | null;
}

/** Target frequencies the calculator accepts (MHz): anything a wire antenna is sensible for. */
export const SCALE_LIMITS_MHZ = { min: 1, max: 30000 } as const;

export function scaleDesign(d: ScaleInput, targetMhz: number | null): ScaleResult {
  const none = (message: string): ScaleResult => ({
    ok: false, message, factor: 1, lengthM: d.lengthM, pieceLengthsM: d.pieceLengthsM, spanXM: d.spanXM, spanYM: d.spanYM, wireDiameterM: d.wireDiameterM, caution: null,
  });
  if (targetMhz === null || !Number.isFinite(targetMhz)) return none("Enter a frequency in MHz.");
  if (targetMhz < SCALE_LIMITS_MHZ.min || targetMhz > SCALE_LIMITS_MHZ.max) {
    return none(`Enter a frequency between ${SCALE_LIMITS_MHZ.min} and ${SCALE_LIMITS_MHZ.max} MHz.`);
  }
  const factor = d.frequencyHz / (targetMhz * 1e6);
  const wire = d.wireDiameterM * factor;
  let caution: string | null = null;
  if (factor > 2 || factor < 0.5) {
    caution = "This is more than a factor of two from the design: scale the wire diameter as shown, and check the result with bentwire analyze on the scaled shape.";
  } else if (wire < 0.3e-3) {
    caution = "The scaled wire is thinner than 0.3 mm: use the thinnest wire that holds its shape and expect the SWR to move; check it with bentwire analyze.";
  }
  return {
    ok: true,
    message: `Every length × ${f.fixed(factor, 4)}; bend angles unchanged.`,
    factor,
    lengthM: d.lengthM * factor,
    pieceLengthsM: d.pieceLengthsM.map((l) => l * factor),
    spanXM: d.spanXM * factor,
    spanYM: d.spanYM * factor,
    wireDiameterM: wire,
    caution,
  };
}

/** The numbers the calculator needs from a design (written into the page as data). */
export function scaleInputOf(e: {
  inputs: { frequencyHz: number; lengthM: number; wireDiameterM: number };
  shape: { pieceLengthsM: number[]; spanM: { x: number; y: number } };
}): ScaleInput {
  return {
    frequencyHz: e.inputs.frequencyHz,
    lengthM: e.inputs.lengthM,
    pieceLengthsM: e.shape.pieceLengthsM,
    spanXM: e.shape.spanM.x,
    spanYM: e.shape.spanM.y,
    wireDiameterM: e.inputs.wireDiameterM,
  };
}
