// `verify`: every entry in the folder must pass its schema and content hash and carry the input
// hash its grid cell expects; every grid cell must have its entry; every reference search the grid
// needs must be present, intact and current; no temporary file of a stopped run may remain; a seeded
// sample is recomputed and must come out byte for byte the same. Each kind of problem is counted.
import { computeEntry, computeReference, previousKey, referenceHash, referenceId, type ReferenceKey, type ReferenceResult } from "./compute.js";
import type { Grid } from "./grid.js";
import { allCells, cellInputHash } from "./cells.js";
import { computeGroundEntry } from "./computeGround.js";
import { createRng } from "../optimize/rng.js";
import { checkEntryText, checkReferenceText, entryFile, listJson, listJsonOf, readReference, referenceDir, serialize } from "./store.js";
import { strayTempFiles } from "../fsAtomic.js";
import { readFile } from "node:fs/promises";
import { join } from "node:path";

export const PROBLEM_KINDS = ["damaged", "stale", "notInGrid", "missing", "referenceDamaged", "referenceStale", "referenceMissing", "temporary", "differs"] as const;
export type ProblemKind = (typeof PROBLEM_KINDS)[number];

export const KIND_WORDS: Record<ProblemKind, string> = {
  damaged: "damaged entries",
  stale: "stale entries",
  notInGrid: "entries not in the grid",
  missing: "missing entries",
  referenceDamaged: "damaged reference searches",
  referenceStale: "stale reference searches",
  referenceMissing: "missing reference searches",
  temporary: "temporary files of a stopped run",
  differs: "entries that recompute differently",
};

export interface VerifyReport {
  checked: number;
  referencesChecked: number;
  problems: string[];
  counts: Record<ProblemKind, number>;
  missing: string[];
  recomputed: string[];
}

/** A stored reference, or the chain of searches that makes it. */
async function referenceFor(grid: Grid, dir: string, key: ReferenceKey): Promise<ReferenceResult> {
  const stored = await readReference(referenceDir(dir), referenceId(key), referenceHash(grid, key));
  if (stored) return stored;
  const prev = previousKey(key);
  return computeReference(grid, key, prev ? await referenceFor(grid, dir, prev) : null);
}

export async function verifyCatalog(grid: Grid, dir: string, sample: number, seed = 1): Promise<VerifyReport> {
  const names = await listJsonOf(dir, "verify"); // a missing folder or a file is an InputError
  const cells = new Map(allCells(grid).map((c) => [c.id, c]));
  const problems: string[] = [];
  const counts = Object.fromEntries(PROBLEM_KINDS.map((k) => [k, 0])) as Record<ProblemKind, number>;
  const report = (kind: ProblemKind, line: string) => { counts[kind]++; problems.push(line); };
  const good: string[] = [];
  for (const name of names) {
    const id = name.replace(/\.json$/, "");
    const text = await readFile(entryFile(dir, id), "utf8");
    const c = checkEntryText(text, entryFile(dir, id));
    if (!c.ok) { report("damaged", c.problem); continue; }
    const cell = cells.get(id);
    if (!cell) { report("notInGrid", `${id}: not a cell of the grid`); continue; }
    if (c.value.inputHash !== cellInputHash(grid, cell)) { report("stale", `${id}: input hash differs from the grid's (stale: run generate)`); continue; }
    good.push(id);
  }
  const present = new Set(names.map((n) => n.replace(/\.json$/, "")));
  const missing = [...cells.keys()].filter((id) => !present.has(id));
  for (const id of missing) report("missing", `${id}: no entry (run generate)`);

  // every reference search the grid's cells start from, and the chain of shorter ones
  const refDir = referenceDir(dir);
  const needed = new Map<string, ReferenceKey>();
  for (const { cell: c } of [...cells.values()].filter((x) => x.kind === "free")) { // over-ground cells search without one
    for (let k: ReferenceKey | null = { lengthWl: c.lengthWl, piecesPerArm: c.piecesPerArm, variant: c.variant }; k; k = previousKey(k)) needed.set(referenceId(k), k);
  }
  const refNames = await listJson(refDir);
  for (const name of refNames) {
    const id = name.replace(/\.json$/, "");
    const c = checkReferenceText(await readFile(join(refDir, name), "utf8"), join(refDir, name));
    if (!c.ok) { report("referenceDamaged", c.problem); continue; }
    const key = needed.get(id);
    if (!key) report("referenceStale", `${join(refDir, name)}: not a reference search of this grid`);
    else if (c.value.inputHash !== referenceHash(grid, key)) report("referenceStale", `${join(refDir, name)}: input hash differs from the grid's (stale: run generate)`);
  }
  const refPresent = new Set(refNames.map((n) => n.replace(/\.json$/, "")));
  for (const id of needed.keys()) if (!refPresent.has(id)) report("referenceMissing", `${join(refDir, `${id}.json`)}: no reference search (run generate)`);
  for (const d of [dir, refDir]) for (const t of await strayTempFiles(d)) report("temporary", `${join(d, t)}: temporary file of a stopped run (the next generate removes it)`);

  // seeded sample without replacement (partial Fisher–Yates)
  const rng = createRng(seed);
  const pool = [...good];
  const picked: string[] = [];
  for (let i = 0; i < Math.min(sample, pool.length); i++) {
    const j = i + Math.floor(rng.uniform() * (pool.length - i));
    [pool[i], pool[j]] = [pool[j], pool[i]];
    picked.push(pool[i]);
  }
  for (const id of picked) {
    const c = cells.get(id)!;
    let again: string;
    if (c.kind === "ground") again = serialize(computeGroundEntry(grid, c.cell));
    else {
      const cell = c.cell;
      const key: ReferenceKey = { lengthWl: cell.lengthWl, piecesPerArm: cell.piecesPerArm, variant: cell.variant };
      const prev = previousKey(key);
      again = serialize(computeEntry(grid, cell, await referenceFor(grid, dir, key), prev ? await referenceFor(grid, dir, prev) : null));
    }
    const stored = await readFile(entryFile(dir, id), "utf8");
    if (again !== stored) report("differs", `${id}: recomputing it gives different bytes`);
  }
  return { checked: names.length, referencesChecked: refNames.length, problems, counts, missing, recomputed: picked };
}
