// The catalog site (built in a later step of the pipeline): source in site/, output in dist/.
import { defineConfig } from "astro/config";

export default defineConfig({
  srcDir: "./site",
  outDir: "./dist",
  base: process.env.BENTWIRE_BASE ?? "/",
  trailingSlash: "ignore",
  build: { format: "directory" },
});
