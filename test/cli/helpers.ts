// Shared by the command-line tests: run the CLI, make temporary folders, and a micro grid (one
// band, one length, one piece per arm, two tolerance samples) so a whole catalog costs seconds.
import { spawnSync } from "node:child_process";
import { mkdtempSync, readdirSync, readFileSync, statSync, writeFileSync } from "node:fs";
import { tmpdir } from "node:os";
import { join } from "node:path";

export const cli = (...args: string[]) => spawnSync(process.execPath, ["--import", "tsx", "generator/cli/main.ts", ...args], { encoding: "utf8" });
export const tmp = (what = "cli") => mkdtempSync(join(tmpdir(), `bentwire-${what}-`));

/** The tiny test grid cut down to one cell. */
export function microGrid(dir: string): string {
  const text = readFileSync("test/fixtures/tiny-grid.yaml", "utf8")
    .replace("samples: 8", "samples: 2")
    .replace("piecesPerArm: [1, 2]", "piecesPerArm: [1]")
    .replace(/\n  - id: 70cm[\s\S]*$/, "\n");
  const path = join(dir, "micro-grid.yaml");
  writeFileSync(path, text);
  return path;
}

/** Every file under dir (recursively), name → bytes, sorted: what "identical output" compares. */
export function filesOf(dir: string, prefix = ""): Record<string, string> {
  const out: Record<string, string> = {};
  for (const name of readdirSync(dir).sort()) {
    const path = join(dir, name);
    if (statSync(path).isDirectory()) Object.assign(out, filesOf(path, `${prefix}${name}/`));
    else out[`${prefix}${name}`] = readFileSync(path, "utf8");
  }
  return out;
}
