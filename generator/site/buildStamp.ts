// A fingerprint of everything a site build reads: the site source, the generator (renderers,
// writers, schema), the build configuration, the lock file, the entries and the base path. The
// build script writes it into the output folder; the browser tests reuse a build only when the
// fingerprint still matches, so they never test a stale site and never rebuild a fresh one.
import { createHash } from "node:crypto";
import { readdir, readFile, writeFile } from "node:fs/promises";
import { isAbsolute, join, relative, resolve } from "node:path";

export const STAMP_FILE = ".bentwire-build.json";
const SOURCE_DIRS = ["site", "generator"];
const SOURCE_FILES = ["astro.config.mjs", "package-lock.json", "tsconfig.json"];

async function filesUnder(dir: string): Promise<string[]> {
  let items;
  try {
    items = await readdir(dir, { withFileTypes: true });
  } catch {
    return [];
  }
  const out: string[] = [];
  for (const it of items) {
    const p = join(dir, it.name);
    if (it.isDirectory()) out.push(...(await filesUnder(p)));
    else if (it.isFile()) out.push(p);
  }
  return out;
}

export interface StampInputs {
  /** Project root. */
  root: string;
  /** Entries folder (only its *.json files count, as for the site). */
  entriesDir: string;
  base: string;
}

export async function siteInputsHash(o: StampInputs): Promise<string> {
  const hash = createHash("sha256");
  const entriesDir = isAbsolute(o.entriesDir) ? o.entriesDir : resolve(o.root, o.entriesDir);
  const sources = (await Promise.all(SOURCE_DIRS.map((d) => filesUnder(join(o.root, d))))).flat();
  const entries = (await readdir(entriesDir).catch(() => [] as string[])).filter((n) => n.endsWith(".json")).map((n) => join(entriesDir, n));
  const files = [...sources, ...SOURCE_FILES.map((f) => join(o.root, f))].sort();
  hash.update(`base ${o.base}\n`);
  for (const [label, list] of [["src", files], ["entry", entries.sort()]] as const) {
    for (const f of list) {
      const text = await readFile(f).catch(() => Buffer.from("(missing)"));
      hash.update(`${label} ${label === "src" ? relative(o.root, f) : f.replace(/^.*[\\/]/, "")} ${text.length}\n`).update(text);
    }
  }
  return hash.digest("hex");
}

export async function writeStamp(outDir: string, o: StampInputs): Promise<void> {
  await writeFile(join(outDir, STAMP_FILE), `${JSON.stringify({ inputs: await siteInputsHash(o), base: o.base })}\n`);
}

export async function stampMatches(outDir: string, o: StampInputs): Promise<boolean> {
  try {
    const stamp = JSON.parse(await readFile(join(outDir, STAMP_FILE), "utf8")) as { inputs?: string };
    return stamp.inputs === (await siteInputsHash(o));
  } catch {
    return false;
  }
}

// `tsx generator/site/buildStamp.ts dist` after a full build (see the build script).
if (process.argv[1] && resolve(process.argv[1]) === resolve(new URL(import.meta.url).pathname)) {
  const outDir = process.argv[2] ?? "dist";
  await writeStamp(outDir, {
    root: process.cwd(),
    entriesDir: process.env.BENTWIRE_ENTRIES || "designs/entries",
    base: process.env.BENTWIRE_BASE || "/",
  });
}
