// Output targets are checked before any computing starts, so a long search never ends in ENOENT:
// a file target needs an existing, writable folder and must not be a folder itself; a folder
// target must be a folder (or not exist yet under a writable folder). Each problem: one line, exit 2.
import { stat } from "node:fs/promises";
import { dirname, resolve } from "node:path";
import { InputError } from "../errors.js";
import { probeWritable } from "../fsAtomic.js";

async function kindOf(path: string): Promise<"file" | "dir" | "other" | null> {
  try {
    const s = await stat(path);
    return s.isDirectory() ? "dir" : s.isFile() ? "file" : "other";
  } catch (err) {
    const code = (err as NodeJS.ErrnoException).code;
    if (code === "ENOENT") return null;
    if (code === "ENOTDIR") throw new InputError(`${path}: a part of this path is a file, not a folder`);
    throw new InputError(`${path}: cannot be checked (${code})`);
  }
}

async function writableDir(flag: string, dir: string): Promise<void> {
  const why = await probeWritable(dir);
  if (why) throw new InputError(`${flag}: cannot write in the folder ${dir} (${why})`);
}

/** `--out FILE`: refused unless the file can be written; nothing is created. */
export async function checkOutputFile(flag: string, path: string): Promise<void> {
  if (path.trim() === "") throw new InputError(`${flag} must name a file`);
  const kind = await kindOf(path);
  if (kind === "dir") throw new InputError(`${flag}: ${path} is a folder; name a file inside it`);
  if (kind === "other") throw new InputError(`${flag}: ${path} is not a regular file`);
  const parent = dirname(resolve(path));
  const parentKind = await kindOf(parent);
  if (parentKind === null) throw new InputError(`${flag}: the folder ${dirname(path)} does not exist; create it first`);
  if (parentKind !== "dir") throw new InputError(`${flag}: ${dirname(path)} is not a folder`);
  await writableDir(flag, parent);
}

/** `--out DIR` for a folder of entries: it may not exist yet, but its nearest existing ancestor
 *  must be a folder we can write in. */
export async function checkOutputDir(flag: string, path: string): Promise<void> {
  if (path.trim() === "") throw new InputError(`${flag} must name a folder`);
  let at = resolve(path);
  for (;;) {
    const kind = await kindOf(at);
    if (kind === "dir") return writableDir(flag, at);
    if (kind !== null) throw new InputError(`${flag}: ${at === resolve(path) ? path : at} is a file, not a folder`);
    const up = dirname(at);
    if (up === at) throw new InputError(`${flag}: no folder of ${path} exists`);
    at = up;
  }
}

/** An input folder (`verify --dir`, `merge DIR`): must exist and be a folder. */
export async function checkInputDir(what: string, path: string): Promise<void> {
  if (path.trim() === "") throw new InputError(`${what}: the folder name is empty`);
  const kind = await kindOf(path);
  if (kind === null) throw new InputError(`${what}: the folder ${path} does not exist`);
  if (kind !== "dir") throw new InputError(`${what}: ${path} is not a folder`);
}
