// `generate`: expands the grid, keeps every entry whose input hash is present and valid, and
// computes the rest on a worker pool (piscina): first the wavelength-unit reference searches the
// missing entries need, then the entries themselves, each as soon as its reference is ready. Every
// result is written atomically as it arrives.
import { rm } from "node:fs/promises";
import { cpus } from "node:os";
import { join } from "node:path";
import { Piscina } from "piscina";
import { InputError } from "../errors.js";
import { previousKey, referenceHash, referenceId, type ReferenceKey, type ReferenceResult } from "./compute.js";
import type { Entry } from "./entrySchema.js";
import { shardOf, type CellRequest, type Grid } from "./grid.js";
import { allCells, cellInputHash, type AnyCell } from "./cells.js";
import { readEntry, readReference, referenceDir, writeEntry, writeReference } from "./store.js";
import { createScheduler } from "./scheduler.js";
import { lockFolder } from "./lock.js";
import { strayTempFiles } from "../fsAtomic.js";
import type { Task } from "./worker.js";

export interface GenerateOptions {
  grid: Grid;
  outDir: string;
  workers: number;
  shard?: { index: number; count: number };
  only?: string;
  onProgress?: (p: { done: number; total: number; label: string }) => void;
}

export interface GenerateReport {
  /** Temporary files of killed runs that this run removed. */
  removedTemporary: string[];
  selected: number;
  upToDate: number;
  computed: number;
  recomputed: string[];
  referencesComputed: number;
  infeasible: number;
  seconds: number;
}

/** `--only` pattern: * matches any run of characters; anything else is literal. */
export function onlyMatcher(pattern: string): (id: string) => boolean {
  if (!/^[a-z0-9.*-]+$/.test(pattern)) throw new InputError(`--only: pattern may hold lower-case letters, digits, '.', '-' and '*' (got ${pattern})`);
  const re = new RegExp(`^${pattern.replace(/\./g, "\\.").replace(/\*/g, ".*")}$`);
  return (id) => re.test(id);
}

export async function selectWork(o: GenerateOptions): Promise<{ cells: AnyCell[]; todo: AnyCell[]; recomputed: string[] }> {
  let cells = allCells(o.grid);
  if (o.only) {
    const matches = onlyMatcher(o.only);
    cells = cells.filter((c) => matches(c.id));
  }
  if (o.shard) cells = shardOf(cells, o.shard);
  const todo: AnyCell[] = [];
  const recomputed: string[] = [];
  for (const cell of cells) {
    const found = await readEntry(o.outDir, cell.id);
    if (found && found.ok && found.value.inputHash === cellInputHash(o.grid, cell)) continue;
    if (found) recomputed.push(found.ok ? `${cell.id}: inputs changed` : found.problem);
    todo.push(cell);
  }
  return { cells, todo, recomputed };
}

const keyOf = (c: CellRequest): ReferenceKey => ({ lengthWl: c.lengthWl, piecesPerArm: c.piecesPerArm, variant: c.variant });

/** Removes the temporary files killed runs left (only writeFileAtomic's pattern, only dead pids). */
async function removeStrayTemporaries(dirs: string[]): Promise<string[]> {
  const removed: string[] = [];
  for (const dir of dirs) {
    for (const name of await strayTempFiles(dir)) {
      await rm(join(dir, name), { force: true });
      removed.push(join(dir, name));
    }
  }
  return removed;
}

export async function generate(o: GenerateOptions): Promise<GenerateReport> {
  if (o.outDir.trim() === "") throw new InputError("generate: the output folder name is empty");
  if (o.only) onlyMatcher(o.only); // a bad pattern is refused before the folder is touched
  const release = await lockFolder(o.outDir, "generate");
  try {
    return await generateLocked(o);
  } finally {
    await release();
  }
}

async function generateLocked(o: GenerateOptions): Promise<GenerateReport> {
  const t0 = performance.now();
  const refDir = referenceDir(o.outDir);
  const removedTemporary = await removeStrayTemporaries([o.outDir, refDir]);
  const { cells, todo, recomputed } = await selectWork(o);
  // every reference the missing entries need, and the chain of shorter ones each starts from
  const keys = new Map<string, ReferenceKey>();
  for (const c of todo.flatMap((t) => (t.kind === "free" ? [t.cell] : []))) {
    for (let k: ReferenceKey | null = keyOf(c); k; k = previousKey(k)) keys.set(referenceId(k), k);
  }
  const stored = new Map<string, ReferenceResult>();
  for (const [id, key] of keys) {
    const found = await readReference(refDir, id, referenceHash(o.grid, key));
    if (found) stored.set(id, found);
  }
  const needRefs = [...keys.values()].filter((k) => !stored.has(referenceId(k)));
  const refs = new Map<string, Promise<ReferenceResult>>();
  const total = todo.length + needRefs.length;
  let done = 0;
  let infeasible = 0;
  const tick = (label: string) => o.onProgress?.({ done: ++done, total, label });
  if (total === 0) return { removedTemporary, selected: cells.length, upToDate: cells.length, computed: 0, recomputed, referencesComputed: 0, infeasible: 0, seconds: (performance.now() - t0) / 1000 };

  const workers = Math.max(1, Math.min(o.workers, cpus().length * 4));
  const execArgv = process.execArgv.some((a) => a.includes("tsx")) ? process.execArgv : [...process.execArgv, "--import", "tsx"];
  const pool = new Piscina({ filename: new URL("./worker.ts", import.meta.url).href, minThreads: workers, maxThreads: workers, idleTimeout: 1000, execArgv });
  const scheduler = createScheduler(pool, workers);
  try {
    const referenceOf = (key: ReferenceKey): Promise<ReferenceResult> => {
      const id = referenceId(key);
      if (!refs.has(id)) {
        const have = stored.get(id);
        const prev = previousKey(key);
        refs.set(id, have ? Promise.resolve(have) : (async () => {
          const previous = prev ? await referenceOf(prev) : null;
          const r = await scheduler.run<ReferenceResult>({ kind: "reference", grid: o.grid, key, previous } satisfies Task, 0);
          await writeReference(refDir, r);
          tick(id);
          return r;
        })());
      }
      return refs.get(id)!;
    };
    const previousOf = (key: ReferenceKey): Promise<ReferenceResult | null> => {
      const prev = previousKey(key);
      return prev ? referenceOf(prev) : Promise.resolve(null);
    };
    await Promise.all(todo.map(async (c) => {
      const cell = c.cell;
      const task: Task = c.kind === "free"
        ? { kind: "entry", grid: o.grid, cell: c.cell, reference: await referenceOf(keyOf(c.cell)), previous: await previousOf(keyOf(c.cell)) }
        : { kind: "ground", grid: o.grid, cell: c.cell };
      const entry = await scheduler.run<Entry>(task, 1);
      await writeEntry(o.outDir, entry);
      if (entry.status !== "ok") infeasible++;
      tick(cell.id);
    }));
  } finally {
    await pool.destroy();
  }
  return {
    removedTemporary,
    selected: cells.length,
    upToDate: cells.length - todo.length,
    computed: todo.length,
    recomputed,
    referencesComputed: needRefs.length,
    infeasible,
    seconds: (performance.now() - t0) / 1000,
  };
}
