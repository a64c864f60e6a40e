// Reading and writing catalog files. Every file is written atomically; every read checks the schema
// and the content hash, so a truncated or hand-edited file is reported (and then recomputed by
// `generate`), never used.
import { mkdir, readdir, readFile } from "node:fs/promises";
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

export async function listJson(dir: string): Promise<string[]> {
  try {
    return (await readdir(dir)).filter((f) => f.endsWith(".json")).sort();
  } catch {
    return [];
  }
}

export async function writeEntry(dir: string, entry: Entry): Promise<void> {
  await mkdir(dir, { recursive: true });
  await writeFileAtomic(entryFile(dir, entry.id), serialize(entry));
}

const referenceSchema = z.object({ id: z.string(), inputHash: z.string(), status: z.enum(["ok", "infeasible"]), x: z.array(z.number()), contentHash: z.string() }).loose();

export async function readReference(dir: string, id: string, inputHash: string): Promise<ReferenceResult | null> {
  try {
    const raw = referenceSchema.parse(JSON.parse(await readFile(entryFile(dir, id), "utf8")));
    const { contentHash, ...body } = raw;
    if (sha256(canonicalJson(body)) !== contentHash || raw.inputHash !== inputHash) return null;
    return body as unknown as ReferenceResult;
  } catch {
    return null;
  }
}

export async function writeReference(dir: string, ref: ReferenceResult): Promise<void> {
  await mkdir(dir, { recursive: true });
  await writeFileAtomic(entryFile(dir, ref.id), serialize({ ...ref, contentHash: sha256(canonicalJson(ref)) }));
}
