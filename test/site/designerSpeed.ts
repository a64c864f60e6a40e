// Measurement, not a test: time from opening <base>/custom/?…&run=1 to the published result in
// headless chromium, and the bytes the page loads before a run (gzip -9 of each file, as a server
// would send it compressed). Usage: npx tsx test/site/designerSpeed.ts <built site dir> <base>
import { readdirSync, readFileSync } from "node:fs";
import { join } from "node:path";
import { gzipSync } from "node:zlib";
import { launchChromium, serve, watchedPage } from "./harness.js";

const [dir, base = "/"] = process.argv.slice(2);

/** CPU seconds (user + system) of every process this script started (chromium's), from /proc. */
function childCpuSeconds(): number {
  const stats = readdirSync("/proc").filter((d) => /^\d+$/.test(d)).flatMap((pid) => {
    try {
      const text = readFileSync(`/proc/${pid}/stat`, "utf8");
      const f = text.slice(text.lastIndexOf(")") + 2).split(" "); // fields from "state" on: ppid, …, utime, stime
      return [{ pid: Number(pid), ppid: Number(f[1]), ticks: Number(f[11]) + Number(f[12]) }];
    } catch { return []; }
  });
  const mine = new Set([process.pid]);
  for (let grew = true; grew;) { grew = false; for (const s of stats) if (!mine.has(s.pid) && mine.has(s.ppid)) { mine.add(s.pid); grew = true; } }
  mine.delete(process.pid);
  return stats.filter((s) => mine.has(s.pid)).reduce((sum, s) => sum + s.ticks, 0) / 100; // USER_HZ = 100 on Linux
}
const server = await serve(dir, base);
const browser = await launchChromium();
const gz = (path: string) => gzipSync(readFileSync(path), { level: 9 }).length;
const fileOf = (u: string) => { const p = decodeURIComponent(new URL(u).pathname).slice(base.length); return join(dir, p.endsWith("/") || p === "" ? `${p}index.html` : p); };

const idle = await watchedPage(browser);
await idle.page.goto(`${server.origin}${base}custom/`, { waitUntil: "networkidle" });
const before = [...new Set(idle.requests)].filter((u) => !u.startsWith("data:"));
const kb = before.reduce((s, u) => s + gz(fileOf(u)), 0) / 1024;
const scripts = before.filter((u) => u.endsWith(".js")).reduce((s, u) => s + gz(fileOf(u)), 0) / 1024;
console.log(`before a run: ${before.length} files, ${kb.toFixed(1)} KiB gzip (scripts ${scripts.toFixed(1)} KiB)`);
await idle.page.close();

for (const [lengthWl, pieces] of [["1.5", "3"], ["2.5", "4"]]) {
  const w = await watchedPage(browser);
  const t0 = Date.now(), cpu0 = childCpuSeconds();
  await w.page.goto(`${server.origin}${base}custom/?freqMhz=145&bandMhz=144:146&lengthWl=${lengthWl}&pieces=${pieces}&seed=1&run=1`);
  await w.page.waitForSelector("#design-result", { state: "attached", timeout: 600_000 });
  const s = (Date.now() - t0) / 1000, cpu = childCpuSeconds() - cpu0;
  const r = JSON.parse((await w.page.locator("#design-result").textContent())!);
  const worker = [...new Set(w.requests)].filter((u) => /designer-.*\.js$/.test(u)).reduce((sum, u) => sum + gz(fileOf(u)), 0) / 1024;
  console.log(`${lengthWl} λ K=${pieces}: ${s.toFixed(1)} s from run=1 to the result (chromium ${cpu.toFixed(1)} CPU s), ${r.evaluations} evaluations, ${r.peakGainDbi.toFixed(3)} dBi; worker bundle ${worker.toFixed(1)} KiB gzip; problems ${JSON.stringify(w.problems)}`);
  await w.page.close();
}
await browser.close();
await server.close();
