// The catalog site: source in site/, output in dist/. BENTWIRE_BASE sets the sub-path the site is
// served under ("/" by default, e.g. "/club/atlas/"); every link and asset follows it.
// BENTWIRE_ENTRIES (read by site/content.config.ts) and BENTWIRE_OUT_DIR let the tests build from
// a fixture folder into a folder of their own. BENTWIRE_CACHE_DIR moves Astro's cache (its content
// store, node_modules/.astro by default) so that builds from worktrees sharing one node_modules do
// not overwrite each other's store.
import { defineConfig } from "astro/config";

export default defineConfig({
  srcDir: "./site",
  outDir: process.env.BENTWIRE_OUT_DIR || "./dist",
  base: process.env.BENTWIRE_BASE || "/",
  cacheDir: process.env.BENTWIRE_CACHE_DIR || "./node_modules/.astro",
  trailingSlash: "ignore",
  build: { format: "directory", inlineStylesheets: "never", concurrency: 2 },
  compressHTML: true,
  devToolbar: { enabled: false },
  vite: {
    // Scripts and fonts stay separate files (no inline scripts: the CSP allows none).
    build: { assetsInlineLimit: 0 },
    // the designer's worker is a module worker: code split, so what it never runs (pdf-lib) it never loads
    worker: { format: "es" },
  },
});
