// The readable feed report: the ranked feed options, the as-built SWR percentiles (bare and after
// the recommended feed) and the tolerance verdict over gain and SWR (feedText); and the L-network
// lines (exact and E12) with their band SWR, a quarter-wave transformer where one fits and the balun
// note (feedLines), shared by `analyze --band-mhz` and `design` so both give the same advice.
import type { FeedAnalysis } from "../analysis/feedAnalysis.js";
import type { MatchComponent, MatchSuggestion } from "../analysis/feedMatch.js";
import { fixed, table } from "./format.js";

export function feedText(f: FeedAnalysis): string {
  const o = f.options;
  const out: string[] = [`feed options (ranked by realized gain at the design frequency among those with SWR ≤ ${o.swrLimit} across the band; parts: inductor Q ${o.partQ.inductorQ}, capacitor Q ${o.partQ.capacitorQ}, common practice):`];
  const rows = [["#", "worst SWR", "loss dB", "realized dBi", "worst realized dBi", "what to buy or build"]];
  o.options.forEach((x, i) => rows.push([`${i + 1}${x.meetsLimit ? "" : "✗"}`, fixed(x.worstSwr, 2), fixed(x.lossDb, 2), fixed(x.realizedGainDbi, 2), fixed(x.worstRealizedGainDbi, 2), x.build]));
  out.push(table(rows), `  ${o.verdict}`, `  ${f.buildNote}`);
  const t = f.toleranceSwr;
  out.push("", `SWR as built (${t.samples} bent copies; 50/90/95 % per frequency; published as meeting SWR ≤ ${t.swrLimit} only if every 90 % figure does):`);
  const srows = [["MHz", "bare", "after the feed"]];
  for (const r of t.perFrequency) {
    const p = (q: { p50: number; p90: number; p95: number } | undefined) => (q ? `${fixed(q.p50, 2)} / ${fixed(q.p90, 2)} / ${fixed(q.p95, 2)}` : "–");
    srows.push([fixed(r.frequencyHz / 1e6, 3), p(r.bare), p(r.afterFeed)]);
  }
  out.push(table(srows), `  ${t.meetsLimitAsBuilt ? "meets" : "does NOT meet"} SWR ≤ ${t.swrLimit} as built`, `  verdict: ${f.verdict.words}`);
  return out.join("\n");
}

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
