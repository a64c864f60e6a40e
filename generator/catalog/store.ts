// Reading and writing catalog files. Every file is written atomically; every read checks the schema
// and the content hash, so a truncated or hand-edited file is reported (and then recomputed by
// `generate`), never used.
import { mkdir, readdir, readFile, stat } from "node:fs/promises";
import { InputError } from "../errors.js";
import { join } from "node:path";
import { z } from "zod";
import { writeFileAtomic } from "../fsAtomic.js";
import type { ReferenceResult } from "./compute.js";
import { contentHashOf } from "./entryBuild.js";
import { entrySchema, type Entry } from "./entrySchema.js";
import { canonicalJson, serialize, sha256 } from "./hash.js";

export type Checked<T> = { ok: true; value: T } | { ok: false; problem: string };

export const entryFile = (dir: string, id: string): string => join(dir, `${id}.json`);
export const referenceDir = (entriesDir: string): string => join(entriesDir, "references");

export { serialize };

export function checkEntryText(text: string, label: string): Checked<Entry> {
  let raw: unknown;
  try {
    raw = JSON.parse(text);
  } catch {
    return { ok: false, problem: `${label}: not valid JSON (truncated?)` };
  }
  const parsed = entrySchema.safeParse(raw);
  if (!parsed.success) {
    const issue = parsed.error.issues[0];
    return { ok: false, problem: `${label}: ${issue.path.join(".") || "(top level)"}: ${issue.message}` };
  }
  const { contentHash, ...body } = parsed.data;
  if (contentHashOf(body) !== contentHash) return { ok: false, problem: `${label}: content hash does not match (edited or damaged)` };
  return { ok: true, value: parsed.data };
}

export async function readEntry(dir: string, id: string): Promise<Checked<Entry> | null> {
  const path = entryFile(dir, id);
  let text: string;
  try {
    text = await readFile(path, "utf8");
  } catch {
    return null;
  }
  return checkEntryText(text, path);
}

/** The .json files of a folder, sorted; [] when the folder does not exist (a fresh output). */
export async function listJson(dir: string): Promise<string[]> {
  try {
    return (await readdir(dir)).filter((f) => f.endsWith(".json")).sort();
  } catch {
    return [];
  }
}

/** The .json files of a folder that must exist: a missing folder or a file is an InputError. */
export async function listJsonOf(dir: string, what: string): Promise<string[]> {
  if (dir.trim() === "") throw new InputError(`${what}: the folder name is empty`);
  try {
    if (!(await stat(dir)).isDirectory()) throw new InputError(`${what}: ${dir} is not a folder`);
  } catch (err) {
    if (err instanceof InputError) throw err;
    throw new InputError(`${what}: the folder ${dir} does not exist`);
  }
  return listJson(dir);
}

export async function writeEntry(dir: string, entry: Entry): Promise<void> {
  await mkdir(dir, { recursive: true });
  await writeFileAtomic(entryFile(dir, entry.id), serialize(entry));
}

const referenceSchema = z.object({ id: z.string(), inputHash: z.string(), status: z.enum(["ok", "infeasible"]), x: z.array(z.number()), contentHash: z.string() }).loose();

/** A stored reference search checked for its schema and content hash (not yet for staleness). */
export function checkReferenceText(text: string, label: string): Checked<ReferenceResult> {
  let raw: unknown;
  try {
    raw = JSON.parse(text);
  } catch {
    return { ok: false, problem: `${label}: not valid JSON (truncated?)` };
  }
  const parsed = referenceSchema.safeParse(raw);
  if (!parsed.success) return { ok: false, problem: `${label}: not a reference search (${parsed.error.issues[0].path.join(".") || "top level"}: ${parsed.error.issues[0].message})` };
  const { contentHash, ...body } = parsed.data;
  if (sha256(canonicalJson(body)) !== contentHash) return { ok: false, problem: `${label}: content hash does not match (edited or damaged)` };
  return { ok: true, value: body as unknown as ReferenceResult };
}

export async function readReference(dir: string, id: string, inputHash: string): Promise<ReferenceResult | null> {
  let text: string;
  try {
    text = await readFile(entryFile(dir, id), "utf8");
  } catch {
    return null;
  }
  const c = checkReferenceText(text, id);
  return c.ok && c.value.inputHash === inputHash ? c.value : null;
}

export async function writeReference(dir: string, ref: ReferenceResult): Promise<void> {
  await mkdir(dir, { recursive: true });
  await writeFileAtomic(entryFile(dir, ref.id), serialize({ ...ref, contentHash: sha256(canonicalJson(ref)) }));
}
