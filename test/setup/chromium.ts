// Global setup for `npm test`: the browser tests drive Debian's chromium. When it is missing, install
// it as root (apt-get), or stop with the exact command to run; never skip the browser tests.
import { execFileSync } from "node:child_process";
import { existsSync } from "node:fs";

const CHROMIUM = "/usr/bin/chromium";

export default function setup(): void {
  if (existsSync(CHROMIUM)) return;
  const root = typeof process.getuid === "function" && process.getuid() === 0;
  if (!root) {
    throw new Error(`Chromium is missing at ${CHROMIUM}: run \`sudo apt-get update && sudo apt-get install -y chromium\`, then npm test again.`);
  }
  process.stderr.write("Installing Debian's chromium for the browser tests (apt-get install -y chromium)...\n");
  const env = { ...process.env, DEBIAN_FRONTEND: "noninteractive" };
  execFileSync("apt-get", ["update", "-qq"], { stdio: "inherit", env });
  execFileSync("apt-get", ["install", "-y", "-qq", "chromium"], { stdio: "inherit", env });
  if (!existsSync(CHROMIUM)) throw new Error(`apt-get finished but ${CHROMIUM} is still missing`);
}
