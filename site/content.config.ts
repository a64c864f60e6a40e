// The catalog entries as an Astro content collection. The loader reads designs/entries/*.json (or
// the folder named by BENTWIRE_ENTRIES), checks every file's schema and content hash with the
// generator's own checker and stops the build with one line naming a damaged file; the collection
// schema is the entries' own zod schema, built with Astro's zod.
import { readdir, readFile } from "node:fs/promises";
import { isAbsolute, join, resolve } from "node:path";
import { fileURLToPath } from "node:url";
import { defineCollection, z } from "astro:content";
import type { Loader } from "astro/loaders";
import { makeEntrySchema } from "../generator/catalog/entrySchema";
import { checkSiteEntry } from "../generator/site/catalog";

export const DEFAULT_ENTRIES_DIR = "designs/entries";

function entriesLoader(): Loader {
  return {
    name: "bentwire-entries",
    load: async ({ store, parseData, config, logger }) => {
      const root = fileURLToPath(config.root);
      const wanted = process.env.BENTWIRE_ENTRIES || DEFAULT_ENTRIES_DIR;
      const dir = isAbsolute(wanted) ? wanted : resolve(root, wanted);
      let names: string[];
      try {
        names = (await readdir(dir)).filter((n) => n.endsWith(".json")).sort();
      } catch {
        throw new Error(`site entries: cannot read the folder ${dir} (set BENTWIRE_ENTRIES or run \`npm run -s bentwire -- generate\`)`);
      }
      store.clear();
      for (const name of names) {
        const path = join(dir, name);
        const entry = checkSiteEntry(await readFile(path, "utf8"), path);
        const data = await parseData({ id: entry.id, data: entry as unknown as Record<string, unknown>, filePath: path });
        store.set({ id: entry.id, data });
      }
      logger.info(`${names.length} entries from ${dir}`);
    },
  };
}

const schema = makeEntrySchema(z as unknown as Parameters<typeof makeEntrySchema>[0]);

export const collections = {
  entries: defineCollection({ loader: entriesLoader(), schema }),
};
