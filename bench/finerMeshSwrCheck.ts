// `npx tsx bench/finerMeshSwrCheck.ts [entries-dir] [--only PATTERN]`: for every entry published as
// meeting its SWR limit as built, solves the feed impedance on twice the published mesh density (capped
// at the thin-wire limit) at the band edges, the design frequency and the worst published in-band point,
// applies the recommended feed and reports the entries whose SWR then passes the limit
// (generator/analysis/finerMeshSwr.ts). One line per violation, a summary with CPU seconds; exit 1 on any.
import { readdirSync, readFileSync } from "node:fs";
import { join } from "node:path";
import { checkEntrySwrOnFinerMesh, notPublishedAsMeeting } from "../generator/catalog/finerMeshSwrEntry.js";

const args = process.argv.slice(2);
const onlyAt = args.indexOf("--only");
const only = onlyAt >= 0 ? new RegExp(`^${args[onlyAt + 1].replace(/[.]/g, "\\.").replace(/\*/g, ".*")}$`) : null;
const dir = args.find((a, i) => !a.startsWith("--") && (onlyAt < 0 || i !== onlyAt + 1)) ?? "designs/entries";
const t0 = process.cpuUsage();
let checked = 0, violations = 0, refused = 0, capped = 0, noFiner = 0, skipped = 0, worstMargin = -Infinity;
for (const file of readdirSync(dir).filter((f) => f.endsWith(".json")).sort()) {
  const entry = JSON.parse(readFileSync(join(dir, file), "utf8"));
  if (entry.status !== "ok" || (only && !only.test(entry.id))) continue;
  if (notPublishedAsMeeting(entry)) { skipped++; continue; }
  const r = checkEntrySwrOnFinerMesh(entry);
  if (r.noFinerMesh) { noFiner++; console.log(`${entry.id}: no mesh above the published ${entry.figures.uncertainty.segmentsPerWavelength}/λ fits the thin-wire limit; not checked`); continue; }
  if (r.refused) { refused++; console.log(`${entry.id}: the solver refuses ${r.segmentsPerWavelength}/λ: ${r.refused}`); continue; }
  checked++;
  if (r.capped) capped++;
  const limit = entry.feed.toleranceSwr.swrLimit;
  worstMargin = Math.max(worstMargin, r.worstSwr - limit);
  if (!r.ok) {
    violations++;
    const at = r.frequenciesHz[r.swr.indexOf(r.worstSwr)];
    console.log(`${entry.id}: SWR ${r.worstSwr.toFixed(3)} after the recommended feed at ${(at / 1e6).toFixed(3)} MHz on ${r.segmentsPerWavelength}/λ${r.capped ? " (capped)" : ""}, above ${limit}`);
  }
}
const c = process.cpuUsage(t0);
console.log(`${checked} entries published as meeting SWR ≤ limit checked at twice the published mesh (${capped} capped at the thin-wire limit): ${violations} over the limit; ${refused} refused by the solver at the finer mesh; ${noFiner} with no finer mesh; ${skipped} ok entries not published as meeting it; worst SWR − limit ${worstMargin.toFixed(3)}; ${((c.user + c.system) / 1e6).toFixed(1)} CPU s`);
process.exitCode = violations + refused > 0 ? 1 : 0;
