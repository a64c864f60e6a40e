// `merge DIR…`: joins the entries (and reference searches) of several runs, shards for instance,
// into one folder. Every file is checked first; the same id with different content is a conflict and
// nothing is written.
import { readFile } from "node:fs/promises";
import { join } from "node:path";
import { InputError } from "../errors.js";
import { writeFileAtomic } from "../fsAtomic.js";
import { mkdir } from "node:fs/promises";
import { checkEntryText, listJson, referenceDir } from "./store.js";

export interface MergeReport {
  entries: number;
  references: number;
  sources: number;
}

async function collect(dirs: string[], sub: (d: string) => string, check: boolean): Promise<Map<string, { text: string; from: string }>> {
  const files = new Map<string, { text: string; from: string }>();
  for (const dir of dirs) {
    for (const name of await listJson(sub(dir))) {
      const path = join(sub(dir), name);
      const text = await readFile(path, "utf8");
      if (check) {
        const c = checkEntryText(text, path);
        if (!c.ok) throw new InputError(`merge: ${c.problem}; regenerate it before merging`);
      }
      const seen = files.get(name);
      if (seen && seen.text !== text) {
        throw new InputError(`merge: ${name.replace(/\.json$/, "")} differs between ${seen.from} and ${dir}; the runs used different grids or versions`);
      }
      files.set(name, { text, from: dir });
    }
  }
  return files;
}

export async function mergeDirs(dirs: string[], outDir: string): Promise<MergeReport> {
  if (dirs.length === 0) throw new InputError("merge: name at least one folder to merge");
  const sources = [...dirs, outDir];
  const entries = await collect(sources, (d) => d, true);
  const refs = await collect(sources, referenceDir, false);
  await mkdir(referenceDir(outDir), { recursive: true });
  for (const [name, { text }] of entries) await writeFileAtomic(join(outDir, name), text);
  for (const [name, { text }] of refs) await writeFileAtomic(join(referenceDir(outDir), name), text);
  return { entries: entries.size, references: refs.size, sources: dirs.length };
}
