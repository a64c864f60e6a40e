// The site build, timed: `npx tsx bench/siteBuild.ts [--entries N] [--free-space] [--small M] [--root DIR]`
// (or `npm run bench -- --only site`). Builds the site (astro build only: no pagefind, no stamp) twice,
// from M (default 8) and from N (default 160) entries picked evenly from designs/entries (with
// --free-space only the free-space part, as the browser tests build it; N ≥ 320 takes all of it), each
// into a fresh folder under the system temp dir with its own Astro content store. Reports the
// build's CPU seconds (user + system of the build process and its children, from /usr/bin/time),
// the wall time, the peak memory, and the CPU per design page beyond the small build: (CPU(N) −
// CPU(M)) / (N − M), which is what each design adds (its page, figures, rasters and downloads).
// --root builds another checkout's site from the same entries (to compare with an older commit; its
// astro.config.mjs must honour BENTWIRE_CACHE_DIR, else it shares node_modules/.astro); the artefact
// table is always this checkout's code.
// Then the CPU per artefact kind of bench/siteArtefacts.ts for 24 of the N entries. Figures, not assertions.
import { spawnSync } from "node:child_process";
import { copyFileSync, mkdirSync, mkdtempSync, readdirSync, readFileSync, rmSync } from "node:fs";
import { tmpdir } from "node:os";
import { join, resolve } from "node:path";
import { benchSiteArtefacts, pickEntries, printSiteArtefacts, type ArtefactRow } from "./siteArtefacts.js";

const ROOT = resolve(import.meta.dirname, "..");
const ENTRIES = join(ROOT, "designs/entries");
const TIME = "/usr/bin/time";

export interface SiteBuildRun { entries: number; cpuS: number; wallS: number; maxRssMb: number; pages: number }
export interface SiteBuildBench { small: SiteBuildRun; large: SiteBuildRun; cpuSPerDesign: number; root: string; artefacts: ArtefactRow[] }

/** Names of `n` entries spread evenly over designs/entries (free-space ones only if asked). */
function pickNames(n: number, freeSpace: boolean): string[] {
  let names = readdirSync(ENTRIES).filter((f) => f.endsWith(".json")).sort();
  if (freeSpace) names = names.filter((f) => (JSON.parse(readFileSync(join(ENTRIES, f), "utf8")) as { inputs: { overGround?: unknown } }).inputs.overGround === undefined);
  const step = Math.max(1, names.length / n);
  return Array.from({ length: Math.min(n, names.length) }, (_, k) => names[Math.floor(k * step)]);
}

/** One `astro build` of `names` in `root`, its CPU from /usr/bin/time (-f: user, system, wall, max RSS in KiB). */
function build(root: string, names: readonly string[], work: string): SiteBuildRun {
  const dir = join(work, `entries-${names.length}`), out = join(work, `out-${names.length}`);
  mkdirSync(dir, { recursive: true });
  for (const n of names) copyFileSync(join(ENTRIES, n), join(dir, n));
  const env = { ...process.env, BENTWIRE_ENTRIES: dir, BENTWIRE_OUT_DIR: out, BENTWIRE_CACHE_DIR: join(work, `astro-cache-${names.length}`), ASTRO_TELEMETRY_DISABLED: "1", NO_COLOR: "1" };
  const r = spawnSync(TIME, ["-f", "BENCH %U %S %e %M", process.execPath, join(root, "node_modules/astro/astro.js"), "build"], { cwd: root, env, encoding: "utf8", maxBuffer: 1 << 28 });
  const line = /BENCH ([\d.]+) ([\d.]+) ([\d.]+) (\d+)/.exec(r.stderr ?? "");
  if (r.status !== 0 || !line) throw new Error(`site build of ${names.length} entries in ${root} failed (exit ${r.status}):\n${(r.stdout ?? "").slice(-3000)}\n${(r.stderr ?? "").slice(-3000)}`);
  const pages = Number(/(\d+) page\(s\) built/.exec(r.stdout)?.[1] ?? NaN);
  return { entries: names.length, cpuS: Number(line[1]) + Number(line[2]), wallS: Number(line[3]), maxRssMb: Number(line[4]) / 1024, pages };
}

export async function benchSiteBuild(opts: { entries?: number; small?: number; freeSpace?: boolean; root?: string } = {}): Promise<SiteBuildBench> {
  const root = resolve(opts.root ?? ROOT), n = opts.entries ?? 160, m = opts.small ?? 8;
  const work = mkdtempSync(join(tmpdir(), "bentwire-site-bench-"));
  try {
    const small = build(root, pickNames(m, opts.freeSpace ?? false), work);
    const large = build(root, pickNames(n, opts.freeSpace ?? false), work);
    const artefacts = await benchSiteArtefacts(pickEntries(join(work, `entries-${large.entries}`), Math.min(24, large.entries)));
    return { small, large, cpuSPerDesign: (large.cpuS - small.cpuS) / (large.entries - small.entries), root, artefacts };
  } finally {
    rmSync(work, { recursive: true, force: true });
  }
}

export function printSiteBuild(b: SiteBuildBench): void {
  console.log(`site build (astro build of ${b.root}; CPU = user + system from /usr/bin/time)`);
  console.log("entries  pages   CPU s    wall s   peak MB");
  for (const r of [b.small, b.large]) console.log(`${String(r.entries).padEnd(8)} ${String(r.pages).padEnd(7)} ${r.cpuS.toFixed(1).padEnd(8)} ${r.wallS.toFixed(1).padEnd(8)} ${r.maxRssMb.toFixed(0)}`);
  console.log(`CPU per design beyond the small build: ${b.cpuSPerDesign.toFixed(3)} s`);
  console.log("");
  printSiteArtefacts(b.artefacts);
}

if (process.argv[1]?.endsWith("siteBuild.ts")) {
  const args = process.argv.slice(2);
  const opt = (name: string) => { const k = args.indexOf(name); return k >= 0 ? args[k + 1] : undefined; };
  const b = await benchSiteBuild({
    entries: opt("--entries") ? Number(opt("--entries")) : undefined,
    small: opt("--small") ? Number(opt("--small")) : undefined,
    freeSpace: args.includes("--free-space"),
    root: opt("--root"),
  });
  if (args.includes("--json")) console.log(JSON.stringify(b));
  else printSiteBuild(b);
}
