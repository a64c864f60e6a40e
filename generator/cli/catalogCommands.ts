// generate, merge and verify: the catalog from the command line.
import { SingleBar } from "cli-progress";
import { generate } from "../catalog/generate.js";
import { parseGrid } from "../catalog/grid.js";
import { mergeDirs } from "../catalog/merge.js";
import { verifyCatalog } from "../catalog/verify.js";
import { InputError } from "../errors.js";
import { printable, readInputFile } from "./errors.js";
import { checkOutputDir } from "./targets.js";
import { GRID_BOUNDS } from "../bounds.js";
import { KIND_WORDS, PROBLEM_KINDS } from "../catalog/verify.js";

export const DEFAULT_GRID = "designs/grid.yaml";
export const DEFAULT_ENTRIES = "designs/entries";

export function parseShard(text: string): { index: number; count: number } {
  const m = /^(\d+)\/(\d+)$/.exec(text);
  const index = m ? Number(m[1]) : NaN, count = m ? Number(m[2]) : NaN;
  if (!m || count < 1 || index < 1 || index > count) throw new InputError(`--shard must be I/N with 1 ≤ I ≤ N, e.g. 2/3 (got ${text})`);
  return { index, count };
}

export async function loadGrid(path: string) {
  return parseGrid(await readInputFile(path, "grid", GRID_BOUNDS.fileBytesMax), path);
}

export async function generateCommand(opts: { grid: string; out: string; workers: number; shard?: string; only?: string }): Promise<void> {
  const grid = await loadGrid(opts.grid);
  const shard = opts.shard ? parseShard(opts.shard) : undefined;
  await checkOutputDir("--out", opts.out);
  const bar = process.stderr.isTTY ? new SingleBar({ format: "catalog [{bar}] {value}/{total} | ETA {eta_formatted} | {label}", stream: process.stderr, hideCursor: true, etaBuffer: 20 }) : null;
  let started = false;
  const report = await generate({
    grid, outDir: opts.out, workers: opts.workers, shard, only: opts.only,
    onProgress: (p) => {
      if (!bar) return;
      if (!started) { bar.start(p.total, 0, { label: "" }); started = true; }
      bar.update(p.done, { label: p.label });
    },
  });
  bar?.stop();
  if (report.removedTemporary.length) process.stderr.write(`removed ${report.removedTemporary.length} temporary file(s) left by a stopped run\n`);
  for (const line of report.recomputed) process.stderr.write(`recomputed: ${line}\n`);
  process.stdout.write(
    `${report.selected} designs selected: ${report.upToDate} up to date, ${report.computed} computed (${report.infeasible} without a buildable shape), ${report.referencesComputed} reference searches; ${report.seconds.toFixed(1)} s\n`,
  );
}

export async function mergeCommand(dirs: string[], opts: { out: string }): Promise<void> {
  await checkOutputDir("--out", opts.out);
  const r = await mergeDirs(dirs, opts.out);
  process.stdout.write(`merged ${r.entries} entries and ${r.references} reference searches from ${r.sources} folders into ${opts.out}\n`);
}

export async function verifyCommand(opts: { grid: string; dir: string; sample: number; seed: number }): Promise<void> {
  const grid = await loadGrid(opts.grid);
  const r = await verifyCatalog(grid, opts.dir, opts.sample, opts.seed);
  for (const p of r.problems) process.stdout.write(`problem: ${printable(p)}\n`);
  process.stdout.write(`${r.checked} entries checked, ${r.recomputed.length} recomputed, ${r.problems.length} problems (${r.referencesChecked} reference searches checked)\n`);
  const kinds = PROBLEM_KINDS.filter((k) => r.counts[k] > 0);
  if (kinds.length) process.stdout.write(`problems by kind: ${kinds.map((k) => `${r.counts[k]} ${KIND_WORDS[k]}`).join(", ")}\n`);
  if (r.problems.length) process.exitCode = 1;
}
