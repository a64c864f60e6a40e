// `verify`: every entry in the folder must pass its schema and content hash and carry the input
// hash its grid cell expects; a seeded sample is recomputed and must come out byte for byte the same.
import { computeEntry, computeReference, entryInputHash, previousKey, referenceHash, referenceId, type ReferenceKey, type ReferenceResult } from "./compute.js";
import { expandGrid, type Grid } from "./grid.js";
import { createRng } from "../optimize/rng.js";
import { checkEntryText, entryFile, listJson, readReference, referenceDir, serialize } from "./store.js";
import { readFile } from "node:fs/promises";

export interface VerifyReport {
  checked: number;
  problems: string[];
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
  const cells = new Map(expandGrid(grid).map((c) => [c.id, c]));
  const names = await listJson(dir);
  const problems: string[] = [];
  const good: string[] = [];
  for (const name of names) {
    const id = name.replace(/\.json$/, "");
    const text = await readFile(entryFile(dir, id), "utf8");
    const c = checkEntryText(text, entryFile(dir, id));
    if (!c.ok) { problems.push(c.problem); continue; }
    const cell = cells.get(id);
    if (!cell) { problems.push(`${id}: not a cell of the grid`); continue; }
    if (c.value.inputHash !== entryInputHash(grid, cell)) { problems.push(`${id}: input hash differs from the grid's (stale: run generate)`); continue; }
    good.push(id);
  }
  const present = new Set(names.map((n) => n.replace(/\.json$/, "")));
  const missing = [...cells.keys()].filter((id) => !present.has(id));
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
    const cell = cells.get(id)!;
    const key = { lengthWl: cell.lengthWl, piecesPerArm: cell.piecesPerArm, variant: cell.variant };
    const reference = await referenceFor(grid, dir, key);
    const again = serialize(computeEntry(grid, cell, reference));
    const stored = await readFile(entryFile(dir, id), "utf8");
    if (again !== stored) problems.push(`${id}: recomputing it gives different bytes`);
  }
  return { checked: names.length, problems, missing, recomputed: picked };
}
