// `merge DIR…`: joins the entries (and reference searches) of several runs, shards for instance,
// into one folder. Every source must be a folder holding entries and no temporary file of a stopped
// run; every file is checked first; the same id with different content is a conflict and nothing
// is written. The output folder is locked like `generate` locks it.
import { mkdir, readFile } from "node:fs/promises";
import { join, resolve } from "node:path";
import { InputError } from "../errors.js";
import { strayTempFiles, writeFileAtomic } from "../fsAtomic.js";
import { lockFolder } from "./lock.js";
import { checkEntryText, checkReferenceText, listJson, listJsonOf, referenceDir } from "./store.js";

export interface MergeReport {
  entries: number;
  references: number;
  sources: number;
}

type Files = Map<string, { text: string; from: string }>;

async function collect(dirs: string[], sub: (d: string) => string, check: typeof checkEntryText | typeof checkReferenceText, files: Files): Promise<void> {
  for (const dir of dirs) {
    for (const name of await listJson(sub(dir))) {
      const path = join(sub(dir), name);
      const text = await readFile(path, "utf8");
      const c = check(text, path);
      if (!c.ok) throw new InputError(`merge: ${c.problem}; regenerate it before merging`);
      const seen = files.get(name);
      if (seen && seen.text !== text) {
        throw new InputError(`merge: ${name.replace(/\.json$/, "")} differs between ${seen.from} and ${dir}; the runs used different grids or versions`);
      }
      files.set(name, { text, from: dir });
    }
  }
}

/** Each source: an existing folder with at least one entry and no leftovers of a stopped run. */
async function checkSource(dir: string): Promise<void> {
  const names = await listJsonOf(dir, "merge");
  for (const d of [dir, referenceDir(dir)]) {
    const stray = await strayTempFiles(d);
    if (stray.length) throw new InputError(`merge: ${d} holds ${stray.length} temporary file(s) of a stopped run (first: ${stray[0]}); run generate on it again to finish it`);
  }
  if (names.length === 0) throw new InputError(`merge: ${dir} holds no entries; name the folders generate --out wrote`);
}

export async function mergeDirs(dirs: string[], outDir: string): Promise<MergeReport> {
  if (dirs.length === 0) throw new InputError("merge: name at least one folder to merge");
  if (outDir.trim() === "") throw new InputError("merge: --out must name a folder");
  for (const dir of dirs) await checkSource(dir);
  const sources = [...new Set([...dirs.map((d) => resolve(d)), resolve(outDir)])];
  const entries: Files = new Map(), refs: Files = new Map();
  await collect(sources, (d) => d, checkEntryText, entries);
  await collect(sources, referenceDir, checkReferenceText, refs);
  const release = await lockFolder(outDir, "merge");
  try {
    await mkdir(referenceDir(outDir), { recursive: true });
    for (const [name, { text }] of entries) await writeFileAtomic(join(outDir, name), text);
    for (const [name, { text }] of refs) await writeFileAtomic(join(referenceDir(outDir), name), text);
  } finally {
    await release();
  }
  return { entries: entries.size, references: refs.size, sources: dirs.length };
}
