// Command-line ground options shared by `analyze` and `design`: --ground NAME|perfect puts a shape
// over a ground, --height-m H lifts it so its LOWEST point is at H metres (the feed height follows
// from the shape), and the ground figures of a solution in the report and in --json.
import { InvalidArgumentError } from "commander";
import { groundByName, GROUND_NAMES, type Ground } from "../em/ground.js";
import { validateShape, type Shape } from "../em/index.js";
import type { Solution } from "../em/solve.js";
import { InputError } from "../errors.js";
import { heightMOfText } from "../design/requestInput.js";
import { fixed } from "./format.js";
import { groundSummary, type GroundSummary } from "../analysis/solutionSummary.js";

export { groundSummary, type GroundSummary };

export const GROUND_FLAG_HELP = `ground under the shape: ${GROUND_NAMES.join(", ")} (default: the shape file's, else free space)`;

export function groundName(flag: string) {
  return (text: string): Ground => {
    try {
      return groundByName(text, flag);
    } catch (err) {
      throw new InvalidArgumentError((err as Error).message);
    }
  };
}

export function heightM(flag: string) {
  return (text: string): number => {
    try {
      return heightMOfText(text, flag);
    } catch (err) {
      throw new InvalidArgumentError((err as Error).message);
    }
  };
}

export function elevationWindow(flag: string) {
  return (text: string): [number, number] => {
    const parts = text.split(":").map((t) => (t.trim() === "" ? NaN : Number(t)));
    if (parts.length !== 2 || !parts.every((v) => Number.isFinite(v) && v >= 0 && v <= 90) || !(parts[0] < parts[1])) {
      throw new InvalidArgumentError(`${flag} must be LO:HI in degrees of elevation, 0 ≤ LO < HI ≤ 90`);
    }
    return [parts[0], parts[1]];
  };
}

/** The shape with the flags' ground and height applied, validated again over the ground. */
export function applyGroundFlags(shape: Shape, flags: { ground?: Ground; heightM?: number }, label: string): Shape {
  const ground = flags.ground ?? shape.ground;
  if (flags.heightM !== undefined && !ground) throw new InputError(`${label}: --height-m needs a ground (--ground NAME or the shape file's "ground" field)`);
  if (!ground) return shape;
  const lowest = Math.min(...shape.wires.flatMap((w) => w.pointsM.map((p) => p[2])));
  if (flags.heightM === undefined && !shape.ground && lowest <= 0) {
    throw new InputError(`${label}: the shape reaches down to z = ${lowest} m, at or below the ground; give --height-m H to lift its lowest point to H metres`);
  }
  let wires = shape.wires;
  if (flags.heightM !== undefined) {
    const dz = flags.heightM - lowest;
    wires = shape.wires.map((w) => ({ ...w, pointsM: w.pointsM.map(([x, y, z]): [number, number, number] => [x, y, z + dz]) }));
  }
  return validateShape({ ...shape, wires, ground }, label);
}


const groundWords = (g: Ground) =>
  g.type === "perfect" ? "perfect ground" : `real ground, ε_r ${g.relativePermittivity}, σ ${g.conductivitySPerM} S/m`;

/** Report lines over ground (none in free space). */
export function groundText(s: GroundSummary): string[] {
  if (!("ground" in s) || !s.ground) return [];
  const inputPowerW = s.inputPowerW;
  const lines = [
    `  over ${groundWords(s.ground)} (plane z = 0; lowest point ${fixed(s.lowestPointM, 3)} m up)`,
    `  peak                 elevation ${fixed(s.peakElevationDeg, 1)}°, azimuth ${fixed(s.peakAzimuthDeg, 1)}° (from +x toward +y); upper half-space only`,
    `  gain by elevation    ${s.gainAtElevationDbi.map((e) => `${e.elevationDeg}° ${fixed(e.gainDbi, 1)}`).join(", ")} dBi (at the peak azimuth)`,
  ];
  if (s.ground.type === "perfect") lines.push("  ground loss          none (perfect ground; the computed residual is the energy balance error)");
  else if (s.groundLossW !== null) {
    const share = inputPowerW ? ` (${fixed((100 * s.groundLossW) / inputPowerW, 1)} % of the input power)` : "";
    lines.push(`  ground loss          ${s.groundLossW.toExponential(3)} W per ${inputPowerW ? fixed(inputPowerW * 1000, 3) + " mW" : "input"} in${share}`);
  }
  lines.push(
    s.ground.type === "perfect"
      ? "  model limits: image theory over an infinite perfect ground; a real ground absorbs power and lowers the low-angle field, and a grounded wire needs a radial system"
      : "  model limits: image theory with plane-wave reflection coefficients; no surface wave; approximate for wires within a small fraction of a wavelength of real ground",
    "  caution: keep masts and wires well clear of power lines (more than the mast's height), ground the mast against lightning, keep people out of the near field of low wires when transmitting; follow local codes and licensed practice",
  );
  return lines;
}
