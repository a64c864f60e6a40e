// `npx tsx bench/convergenceCheck.ts [entries-dir] [--only PATTERN]`: for every ok entry, checks
// that its published gain and impedance lie within its stated uncertainty of a single analysis at
// four times the starting mesh density (generator/analysis/convergenceCheck.ts). Prints one line per
// failing entry and a summary with CPU seconds; exits 1 when any entry fails.
import { readdirSync, readFileSync } from "node:fs";
import { join } from "node:path";
import { checkAgainstFinerMesh } from "../generator/analysis/convergenceCheck.js";
import { parseShape } from "../generator/em/index.js";
import { siteShapeFileText } from "../generator/site/downloads.js";

const args = process.argv.slice(2);
const onlyAt = args.indexOf("--only");
const only = onlyAt >= 0 ? new RegExp(`^${args[onlyAt + 1].replace(/[.]/g, "\\.").replace(/\*/g, ".*")}$`) : null;
const dir = args.find((a, i) => !a.startsWith("--") && (onlyAt < 0 || i !== onlyAt + 1)) ?? "designs/entries";
const t0 = process.cpuUsage();
let checked = 0, failed = 0, stale = 0, worstG = 0, worstZ = 0;
for (const file of readdirSync(dir).filter((f) => f.endsWith(".json")).sort()) {
  const entry = JSON.parse(readFileSync(join(dir, file), "utf8"));
  if (entry.status !== "ok" || (only && !only.test(entry.id))) continue;
  if (!entry.figures.uncertainty) { stale++; continue; }
  // over ground: the shape as hung with its ground, the gain judged in the entry's elevation window
  const r = checkAgainstFinerMesh(parseShape(siteShapeFileText(entry), file), entry.figures, 4, entry.inputs.overGround?.elevationWindowDeg);
  checked++;
  worstG = Math.max(worstG, r.gainDiffDb);
  worstZ = Math.max(worstZ, r.impedanceDiffPercent);
  if (!r.ok) {
    failed++;
    const u = entry.figures.uncertainty;
    console.log(`${entry.id}: at ${r.segmentsPerWavelength}/λ gain differs ${r.gainDiffDb.toFixed(4)} dB (stated ±${u.gainDb.toFixed(4)}), impedance ${r.impedanceDiffPercent.toFixed(2)} % (stated ±${u.impedancePercent.toFixed(2)} %)`);
  }
}
const c = process.cpuUsage(t0);
console.log(`${checked} entries checked against 4× the starting mesh: ${failed} outside their stated uncertainty; ${stale} without an uncertainty (made before solver 2); largest differences ${worstG.toFixed(4)} dB, ${worstZ.toFixed(2)} %; ${((c.user + c.system) / 1e6).toFixed(1)} CPU s`);
process.exitCode = failed > 0 || stale > 0 ? 1 : 0;
