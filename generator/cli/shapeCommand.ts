// `shape <entry-id>`: prints a catalog design's shape file, the same bytes as the site's download,
// so a builder can start `analyze` (or their own edits) from a catalog design.
import { readEntry } from "../catalog/store.js";
import { InputError } from "../errors.js";
import { siteShapeFileText } from "../site/downloads.js";
import { isOk } from "../site/ok.js";

const ID = /^[a-z0-9][a-z0-9.-]*$/;

export async function shapeText(id: string, entriesDir: string): Promise<string> {
  if (!ID.test(id)) throw new InputError(`shape: entry id must be lower-case letters, digits, dots and dashes, like 2m-1.5wl-k3-max-gain (got ${JSON.stringify(id)})`);
  const read = await readEntry(entriesDir, id);
  if (read === null) throw new InputError(`shape: no entry ${id} in ${entriesDir} (the ids are the file names there, without .json)`);
  if (!read.ok) throw new InputError(`shape: ${read.problem}`);
  const entry = read.value;
  if (!isOk(entry)) throw new InputError(`shape: entry ${id} has no shape (${entry.message})`);
  return siteShapeFileText(entry); // over ground: the mounted wire with its ground, as the site offers it
}

export async function shapeCommand(id: string, opts: { entries: string }): Promise<void> {
  process.stdout.write(await shapeText(id, opts.entries));
}
