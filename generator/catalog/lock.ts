// One writer per entries folder. `generate` and `merge` hold `<dir>/.bentwire.lock` while they write;
// it holds the writer's pid and host. A second run refuses while that process lives; a lock left by
// a killed run (its pid no longer runs on this host) is taken over, so it can never stay stuck.
import { hostname } from "node:os";
import { join } from "node:path";
import { randomBytes } from "node:crypto";
import { link, mkdir, readFile, rm, writeFile } from "node:fs/promises";
import { InputError } from "../errors.js";
import { processAlive } from "../fsAtomic.js";

export const LOCK_FILE = ".bentwire.lock";

interface Holder { pid: number; host: string; command: string }

async function holder(path: string): Promise<Holder | null> {
  try {
    const raw = JSON.parse(await readFile(path, "utf8")) as Partial<Holder>;
    return { pid: Number(raw.pid), host: String(raw.host), command: String(raw.command) };
  } catch {
    return null; // unreadable: not a lock any run of ours wrote (ours appear whole), so nobody holds it
  }
}

/** Takes the folder's lock or throws InputError naming who holds it; returns the release. */
export async function lockFolder(dir: string, command: string): Promise<() => Promise<void>> {
  await mkdir(dir, { recursive: true });
  const path = join(dir, LOCK_FILE);
  const me: Holder = { pid: process.pid, host: hostname(), command };
  for (let attempt = 0; attempt < 3; attempt++) {
    // write the holder to a temporary file, then hard-link it into place: the lock appears whole
    // or not at all (link fails with EEXIST when another run holds it)
    const tmp = join(dir, `${LOCK_FILE}.${process.pid}.${randomBytes(4).toString("hex")}.tmp`);
    await writeFile(tmp, `${JSON.stringify(me)}\n`);
    let linked = false;
    try {
      await link(tmp, path);
      linked = true;
    } catch (err) {
      if ((err as NodeJS.ErrnoException).code !== "EEXIST") throw err;
    } finally {
      await rm(tmp, { force: true });
    }
    if (linked) {
      return async () => {
        const now = await holder(path);
        if (now && now.pid === me.pid && now.host === me.host) await rm(path, { force: true });
      };
    }
    const other = await holder(path);
    if (other && other.host !== me.host) {
      throw new InputError(`${dir}: locked by ${other.command} (pid ${other.pid}) on ${other.host}; wait for it, or delete ${path} if no run is active there`);
    }
    if (other && processAlive(other.pid) && other.pid !== me.pid) {
      throw new InputError(`${dir}: another ${other.command} (pid ${other.pid}) is writing to this folder; wait for it to finish or stop it`);
    }
    await rm(path, { force: true }); // left by a run that no longer exists
  }
  throw new InputError(`${dir}: could not take the lock ${path}; another run keeps taking it`);
}
