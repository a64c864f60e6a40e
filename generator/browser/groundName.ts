// The name a ground goes by in the designer's ids and tables: "perfect", a preset's name
// (em/ground.ts GROUND_PRESETS), or "real" for any other permittivity and conductivity.
import { GROUND_PRESETS, type Ground } from "../em/ground.js";

export function groundNameOf(g: Ground): string {
  if (g.type === "perfect") return "perfect";
  const named = Object.entries(GROUND_PRESETS).find(([, p]) => p.relativePermittivity === g.relativePermittivity && p.conductivitySPerM === g.conductivitySPerM);
  return named ? named[0] : "real";
}
