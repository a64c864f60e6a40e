// Catalog entries for the renderer tests: every "ok" entry in designs/entries/, read as JSON.
import { readdirSync, readFileSync } from "node:fs";
import { join } from "node:path";
import type { Entry } from "../../generator/catalog/entrySchema.js";

const DIR = join(import.meta.dirname, "../../designs/entries");

export function okEntries(): Entry[] {
  const files = readdirSync(DIR).filter((f) => f.endsWith(".json")).sort();
  const entries = files.map((f) => JSON.parse(readFileSync(join(DIR, f), "utf8")) as Entry).filter((e) => e.status === "ok");
  if (entries.length === 0) throw new Error(`no "ok" entries in ${DIR}`);
  return entries;
}

/** A deep copy, so a test can change an entry without touching the others. */
export const copy = (e: Entry): Entry => structuredClone(e);

/** An entry whose words try to inject markup. */
export function hostile(e: Entry): Entry {
  const h = copy(e);
  const bad = "<script>alert(1)</script> & \"quotes\" 'too'";
  h.title = `Evil ${bad}`;
  h.inputs.bandName = `Band ${bad}`;
  h.inputs.bandNote = `Note ${bad}`;
  return h;
}

/** Numbers from a path's "M x y L x y …" data, as points. */
export function pathPoints(d: string): [number, number][] {
  const nums = d.match(/-?\d+(\.\d+)?/g)!.map(Number);
  const out: [number, number][] = [];
  for (let i = 0; i + 1 < nums.length; i += 2) out.push([nums[i], nums[i + 1]]);
  return out;
}

/** The value of one attribute on the first element carrying data-role="role". */
export function roleAttr(svg: string, role: string, attr: string): string {
  const tag = new RegExp(`<[a-z]+[^>]*data-role="${role}"[^>]*>`).exec(svg);
  if (!tag) throw new Error(`no element with data-role="${role}"`);
  const m = new RegExp(` ${attr}="([^"]*)"`).exec(tag[0]);
  if (!m) throw new Error(`data-role="${role}" has no ${attr}`);
  return m[1];
}

/** The value of an attribute on the root <svg>. */
export function rootAttr(svg: string, attr: string): string {
  const root = /<svg[^>]*>/.exec(svg)![0];
  const m = new RegExp(` ${attr}="([^"]*)"`).exec(root);
  if (!m) throw new Error(`root has no ${attr}`);
  return m[1];
}
