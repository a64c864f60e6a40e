// The feed advice lines of a readable report: SWR at the design frequency, the L-networks (exact
// and E12) with their band SWR, a quarter-wave transformer where one fits, and the balun note.
// Shared by `analyze --band-mhz` and `design`, so both give the same advice in the same words.
import type { MatchComponent, MatchSuggestion } from "../analysis/feedMatch.js";
import { fixed } from "./format.js";

export function componentText(c: MatchComponent): string {
  const value = c.kind === "inductor" ? `${fixed(c.value * 1e9, 1)} nH` : `${fixed(c.value * 1e12, 2)} pF`;
  return `${c.position} ${c.kind} ${value}`;
}

const range = (xs: number[]) => `${fixed(Math.min(...xs), 2)}–${fixed(Math.max(...xs), 2)}`;

export function feedLines(match: MatchSuggestion): string[] {
  const out = [`feed: SWR ${fixed(match.swrAtDesign, 2)} at the design frequency`];
  if (!match.needed) out.push("  no matching network needed");
  match.networks.forEach((n, i) => {
    out.push(`  L-network ${i + 1}: ${n.topology}`);
    out.push(`    exact: ${n.components.map(componentText).join(", ")}; band SWR ${range(n.bandSwr)}`);
    out.push(`    E12:   ${n.e12Components.map(componentText).join(", ")}; band SWR ${range(n.bandSwrE12)}`);
  });
  const q = match.quarterWave;
  if (q) out.push(`  quarter-wave transformer: ideal ${fixed(q.idealImpedanceOhm, 1)} Ω; use ${q.cable}, ${fixed(q.physicalLengthM, 3)} m at velocity factor ${q.velocityFactor}; band SWR ${range(q.bandSwr)}`);
  out.push(`  ${match.balunNote}`);
  return out;
}
