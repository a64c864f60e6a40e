// Writes a file so that readers see the old content or the new, never half of it: write a
// temporary file beside it, then rename (atomic on one POSIX file system). The temporary name,
// `.<name>.<pid>.<8 hex>.tmp`, is recognised by TEMP_FILE so a later run can remove what a killed
// one left, and only that.
import { randomBytes } from "node:crypto";
import { open, readdir, rename, rm, writeFile } from "node:fs/promises";
import { basename, dirname, join } from "node:path";

/** The temporary files writeFileAtomic makes; group 1 is the pid that made it. */
export const TEMP_FILE = /^\..+\.(\d+)\.[0-9a-f]{8}\.tmp$/;

const tempName = (path: string): string => join(dirname(path), `.${basename(path)}.${process.pid}.${randomBytes(4).toString("hex")}.tmp`);

export async function writeFileAtomic(path: string, content: string | Uint8Array): Promise<void> {
  const tmp = tempName(path);
  try {
    await writeFile(tmp, content);
    await rename(tmp, path);
  } catch (err) {
    await rm(tmp, { force: true });
    throw err;
  }
}

/** True when a process with this pid is running (EPERM: it runs under another user). */
export function processAlive(pid: number): boolean {
  if (!Number.isSafeInteger(pid) || pid <= 0) return false;
  try {
    process.kill(pid, 0);
    return true;
  } catch (err) {
    return (err as NodeJS.ErrnoException).code === "EPERM";
  }
}

/** Temporary files of writeFileAtomic in dir whose writer is gone (its pid no longer runs). */
export async function strayTempFiles(dir: string): Promise<string[]> {
  let names: string[];
  try {
    names = await readdir(dir);
  } catch {
    return [];
  }
  return names.filter((n) => {
    const m = TEMP_FILE.exec(n);
    return m !== null && (Number(m[1]) === process.pid ? false : !processAlive(Number(m[1])));
  }).sort();
}

/** Creates and removes a temporary file in dir: the one sure test that we may write there. */
export async function probeWritable(dir: string): Promise<string | null> {
  const tmp = tempName(join(dir, "probe"));
  try {
    const h = await open(tmp, "wx");
    await h.close();
    await rm(tmp, { force: true });
    return null;
  } catch (err) {
    return (err as NodeJS.ErrnoException).code ?? "unwritable";
  }
}
