// Catalog entries for the site tests, read straight from designs/entries (getCollection does not
// run inside vitest) and checked the same way the site checks them.
import { mkdirSync, readdirSync, readFileSync, rmSync, writeFileSync } from "node:fs";
import { join, resolve } from "node:path";
import { checkSiteEntry } from "../../generator/site/catalog.js";
import { isOk, type Entry, type OkEntry } from "../../generator/site/ok.js";
import { sealEntry } from "../../generator/catalog/entryBuild.js";

/** designs/entries, or the folder BENTWIRE_ENTRIES names (as for the site build). */
export const ENTRIES_DIR = process.env.BENTWIRE_ENTRIES ? resolve(process.env.BENTWIRE_ENTRIES) : join(import.meta.dirname, "../../designs/entries");

/**
 * The entries folder the browser tests build "main" from: BENTWIRE_ENTRIES when set, else a copy of
 * the free-space part of designs/entries in the test cache (these tests pick entries that have
 * templates, polar cuts and a scale calculator; pages over the ground are tested on their own
 * fixtures in overGround.browser.test.ts), rewritten only when it differs (the build's fingerprint
 * covers the folder's contents). The whole catalog's site takes about 3 CPU minutes to build.
 */
export function siteTestEntriesDir(): string {
  if (process.env.BENTWIRE_ENTRIES) return ENTRIES_DIR;
  const cache = process.env.BENTWIRE_TEST_CACHE ? resolve(process.env.BENTWIRE_TEST_CACHE) : join(import.meta.dirname, "../../node_modules/.cache/bentwire-site-tests");
  const dir = join(cache, "site-test-entries"); // the same folder as harness.ts's CACHE
  mkdirSync(dir, { recursive: true });
  const wanted = new Map<string, string>();
  for (const name of readdirSync(ENTRIES_DIR).filter((n) => n.endsWith(".json")).sort()) {
    const text = readFileSync(join(ENTRIES_DIR, name), "utf8");
    if ((JSON.parse(text) as { inputs: { overGround?: unknown } }).inputs.overGround === undefined) wanted.set(name, text);
  }
  for (const name of readdirSync(dir)) if (!wanted.has(name)) rmSync(join(dir, name), { recursive: true, force: true });
  for (const [name, text] of wanted) {
    let old = "";
    try { old = readFileSync(join(dir, name), "utf8"); } catch { /* new */ }
    if (old !== text) writeFileSync(join(dir, name), text);
  }
  return dir;
}

export function readEntries(dir = ENTRIES_DIR): Entry[] {
  return readdirSync(dir)
    .filter((n) => n.endsWith(".json"))
    .sort()
    .map((n) => checkSiteEntry(readFileSync(join(dir, n), "utf8"), join(dir, n)));
}

export function firstOk(entries: Entry[] = readEntries()): OkEntry {
  const ok = entries.find(isOk);
  if (!ok) throw new Error(`no entry with status "ok" in ${ENTRIES_DIR}: run npm run -s bentwire -- generate`);
  return ok;
}

/** A copy of an entry with some fields changed, sealed again so it passes the content-hash check. */
export function resealed(entry: Entry, change: (body: Entry) => void): Entry {
  const copy = structuredClone(entry);
  change(copy);
  const { contentHash: _drop, ...body } = copy;
  return sealEntry(body);
}

export const HOSTILE = {
  marker: "window.__pwned",
  title: `Field day <script>window.__pwned=1</script><img src=x onerror="window.__pwned=2"> test`,
  bandName: `Hostile <b>band</b> <script>window.__pwned=3</script>`,
  bandNote: `<script>window.__pwned=1</script><img src=x onerror="window.__pwned=4"> & "quotes" 'single'`,
};

/** An entry whose title and band text carry markup that must show as text and never run. */
export function hostileEntry(from: OkEntry): Entry {
  return resealed(from, (e) => {
    e.id = "hostile-1.5wl-k1-max-gain";
    e.title = HOSTILE.title;
    e.inputs.bandId = "hostile";
    e.inputs.bandName = HOSTILE.bandName;
    e.inputs.bandNote = HOSTILE.bandNote;
    e.message = HOSTILE.bandNote;
    if (e.figures) e.figures.lobe = HOSTILE.bandNote;
  });
}
