// One writer per entries folder. `generate` and `merge` hold `<dir>/.bentwire.lock` while they write;
// it holds the writer's pid and host. A second run refuses while that process lives; a lock left by
// a killed run (its pid no longer runs on this host) is taken over, so it can never stay stuck.
import { hostname } from "node:os";
import { join } from "node:path";
import { mkdir, open, readFile, rm, stat } from "node:fs/promises";
import { InputError } from "../errors.js";
import { processAlive } from "../fsAtomic.js";

export const LOCK_FILE = ".bentwire.lock";

interface Holder { pid: number; host: string; command: string }

async function holder(path: string): Promise<Holder | null> {
  try {
    const raw = JSON.parse(await readFile(path, "utf8")) as Partial<Holder>;
    return { pid: Number(raw.pid), host: String(raw.host), command: String(raw.command) };
  } catch {
    return null; // unreadable or half-written (killed while writing it): nobody holds it
  }
}

/** Takes the folder's lock or throws InputError naming who holds it; returns the release. */
export async function lockFolder(dir: string, command: string): Promise<() => Promise<void>> {
  await mkdir(dir, { recursive: true });
  const path = join(dir, LOCK_FILE);
  const me: Holder = { pid: process.pid, host: hostname(), command };
  for (let attempt = 0; attempt < 3; attempt++) {
    try {
      const h = await open(path, "wx");
      await h.writeFile(`${JSON.stringify(me)}\n`);
      await h.close();
      return async () => {
        const now = await holder(path);
        if (now && now.pid === me.pid && now.host === me.host) await rm(path, { force: true });
      };
    } catch (err) {
      if ((err as NodeJS.ErrnoException).code !== "EEXIST") throw err;
    }
    const other = await holder(path);
    if (!other && Date.now() - (await stat(path).then((s) => s.mtimeMs, () => 0)) < 5000) {
      throw new InputError(`${dir}: another run is taking the lock ${path} right now; wait for it to finish`);
    }
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
