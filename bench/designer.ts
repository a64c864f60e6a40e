// The in-browser designer, timed: `npx tsx bench/designer.ts [built site dir] [base]` (or
// `npm run bench -- --only designer`). Without a dir it builds the site from two catalog entries
// into node_modules/.cache (reused while the sources are unchanged). For a 1.5 λ K = 3 and a
// 2.5 λ K = 4 design at 145 MHz (seed 1) it reports, from headless Debian chromium: the wall time from
// opening `custom/?…&run=1` to the first result on screen and to the full analysis, the CPU seconds
// of every chromium process (from /proc: utime + stime, what counts on a shared machine), the
// evaluations, and the split between the search and the analysis after it (page-side arrival times
// of the worker's messages). The same job under Node (tsx, this process, process.cpuUsage) runs first
// for comparison. Also the bytes the page loads before a run and the worker bundle (gzip -9).
// Figures, not assertions.
import { mkdirSync, readdirSync, readFileSync, rmSync, writeFileSync } from "node:fs";
import { join } from "node:path";
import { gzipSync } from "node:zlib";
import { runDesignJob, type JobMessage } from "../generator/browser/designJob.js";
import { parseDesignRequest } from "../generator/design/request.js";
import { readEntries } from "../test/site/entries.js";
import { isOk } from "../generator/site/ok.js";
import { CACHE, ensureSite, launchChromium, serve, watchedPage } from "../test/site/harness.js";

const CASES = [{ lengthWl: 1.5, pieces: 3 }, { lengthWl: 2.5, pieces: 4 }];
const INPUTS = { freqMhz: 145, bandMhz: [144, 146] as const, wireDiameterMm: 2, conductor: "copper", seed: 1 };

/** CPU seconds (user + system) of every process this one started (chromium's), from /proc, in all
 * and by chromium's process type (--type=renderer, gpu-process, utility; "browser" without one). */
function childCpuSeconds(): Record<string, number> {
  const stats = readdirSync("/proc").filter((d) => /^\d+$/.test(d)).flatMap((pid) => {
    try {
      const text = readFileSync(`/proc/${pid}/stat`, "utf8");
      const f = text.slice(text.lastIndexOf(")") + 2).split(" "); // fields from "state" on: ppid, …, utime, stime
      const type = /--type=([a-z-]+)/.exec(readFileSync(`/proc/${pid}/cmdline`, "utf8"))?.[1] ?? "browser";
      return [{ pid: Number(pid), ppid: Number(f[1]), ticks: Number(f[11]) + Number(f[12]), type }];
    } catch { return []; }
  });
  const mine = new Set([process.pid]);
  for (let grew = true; grew;) { grew = false; for (const s of stats) if (!mine.has(s.pid) && mine.has(s.ppid)) { mine.add(s.pid); grew = true; } }
  mine.delete(process.pid);
  const out: Record<string, number> = { total: 0 };
  for (const s of stats) if (mine.has(s.pid)) { out[s.type] = (out[s.type] ?? 0) + s.ticks / 100; out.total += s.ticks / 100; } // USER_HZ = 100 on Linux
  return out;
}
const cpuSince = (a: Record<string, number>, b: Record<string, number>) => Object.fromEntries(Object.entries(b).map(([k, v]) => [k, v - (a[k] ?? 0)]));

const cpuNow = () => { const u = process.cpuUsage(); return (u.user + u.system) / 1e6; };

/** Seconds from the start to the first message of each type (and the evaluations), however the job ran. */
interface Marks { first: Record<string, number>; evaluations: number; gainDbi: number | null }

function node(lengthWl: number, pieces: number): Promise<Marks & { cpuS: number }> {
  const request = parseDesignRequest({
    frequencyHz: INPUTS.freqMhz * 1e6, bandHz: INPUTS.bandMhz.map((v) => v * 1e6), lengthWl, piecesPerArm: pieces,
    wireDiameterM: INPUTS.wireDiameterMm / 1000, conductor: INPUTS.conductor, seed: INPUTS.seed,
  });
  const t0 = performance.now(), c0 = cpuNow();
  const marks: Marks = { first: {}, evaluations: 0, gainDbi: null };
  const post = (m: JobMessage) => {
    marks.first[m.type] ??= (performance.now() - t0) / 1000;
    if (m.type === "designed" || m.type === "done") { marks.evaluations = m.result.evaluations; marks.gainDbi = m.result.peakGainDbi; }
  };
  return runDesignJob(request, post).then(() => ({ ...marks, cpuS: cpuNow() - c0 }));
}

function fixture(): string {
  const dir = join(CACHE, "designer-bench-entries");
  rmSync(dir, { recursive: true, force: true });
  mkdirSync(dir, { recursive: true });
  for (const e of readEntries().filter(isOk).slice(0, 2)) writeFileSync(join(dir, `${e.id}.json`), `${JSON.stringify(e)}\n`);
  return dir;
}

/** Records, in the page, when the designer's worker first sent each message type (ms since navigation). */
const RECORD_WORKER_MESSAGES = () => {
  const marks: Record<string, number> = {};
  (window as unknown as { __designerMarks: Record<string, number> }).__designerMarks = marks;
  const Original = window.Worker;
  window.Worker = class extends Original {
    constructor(url: string | URL, options?: WorkerOptions) {
      super(url, options);
      marks.workerStarted = performance.now();
      this.addEventListener("message", (e: MessageEvent<{ type: string }>) => { marks[e.data.type] ??= performance.now(); });
    }
  };
};

export async function benchDesigner(dirArg?: string, baseArg?: string) {
  const base = baseArg ?? "/";
  const dir = dirArg ?? (await ensureSite("designer-bench", fixture(), base)).dir;
  const nodeRuns = [];
  for (const c of CASES) nodeRuns.push({ ...c, ...(await node(c.lengthWl, c.pieces)) });

  const server = await serve(dir, base);
  const browser = await launchChromium();
  const gz = (path: string) => gzipSync(readFileSync(path), { level: 9 }).length;
  const fileOf = (u: string) => { const p = decodeURIComponent(new URL(u).pathname).slice(base.length); return join(dir, p.endsWith("/") || p === "" ? `${p}index.html` : p); };
  const idle = await watchedPage(browser);
  await idle.page.goto(`${server.origin}${base}custom/`, { waitUntil: "networkidle" });
  const before = [...new Set(idle.requests)].filter((u) => !u.startsWith("data:"));
  const pageKiB = before.reduce((s, u) => s + gz(fileOf(u)), 0) / 1024;
  await idle.page.close();
  const workerFile = readdirSync(join(dir, "_astro")).find((n) => /^designer-.*\.js$/.test(n))!;
  const workerKiB = gz(join(dir, "_astro", workerFile)) / 1024;
  const workerRawKiB = readFileSync(join(dir, "_astro", workerFile)).length / 1024;

  const browserRuns = [];
  for (const c of CASES) {
    const w = await watchedPage(browser);
    await w.page.addInitScript(RECORD_WORKER_MESSAGES);
    const q = new URLSearchParams({ freqMhz: String(INPUTS.freqMhz), bandMhz: INPUTS.bandMhz.join(":"), lengthWl: String(c.lengthWl), pieces: String(c.pieces), seed: String(INPUTS.seed), run: "1" });
    const t0 = Date.now(), cpu0 = childCpuSeconds();
    await w.page.goto(`${server.origin}${base}custom/?${q}`);
    await w.page.waitForSelector("#design-result", { state: "attached", timeout: 600_000 });
    const resultS = (Date.now() - t0) / 1000, resultCpuS = cpuSince(cpu0, childCpuSeconds()).total;
    await w.page.waitForSelector('[data-progress][data-state="done"]', { state: "attached", timeout: 600_000 });
    const doneS = (Date.now() - t0) / 1000, cpuBy = cpuSince(cpu0, childCpuSeconds()), cpuS = cpuBy.total;
    const r = JSON.parse((await w.page.locator("#design-result").textContent())!);
    const ms = await w.page.evaluate(() => (window as unknown as { __designerMarks: Record<string, number> }).__designerMarks);
    const rel = (k: string) => (ms[k] === undefined ? null : (ms[k] - ms.workerStarted) / 1000);
    browserRuns.push({ ...c, resultS, resultCpuS, doneS, cpuS, evaluations: r.evaluations as number, gainDbi: r.peakGainDbi as number, searchS: rel("analysing"), designedS: rel("designed"), analysedS: rel("done"), cpuBy, problems: w.problems });
    await w.page.close();
  }
  await browser.close();
  await server.close();
  return { pageKiB, pageFiles: before.length, workerKiB, workerRawKiB, nodeRuns, browserRuns };
}

export function printDesigner(b: Awaited<ReturnType<typeof benchDesigner>>): void {
  const s = (v: number | null | undefined) => (v == null ? "–" : v.toFixed(2));
  console.log(`designer page before a run: ${b.pageFiles} files, ${b.pageKiB.toFixed(1)} KiB gzip; worker bundle ${b.workerKiB.toFixed(1)} KiB gzip (${b.workerRawKiB.toFixed(0)} KiB raw), loaded on a run`);
  console.log("case        where     evals  dBi     search s  shown s  analysed s  | wall to shown  wall to done  CPU s (to shown / to done)");
  for (const [k, c] of CASES.entries()) {
    const n = b.nodeRuns[k], w = b.browserRuns[k];
    const name = `${c.lengthWl} λ K=${c.pieces}`.padEnd(11);
    console.log(`${name} node      ${String(n.evaluations).padEnd(6)} ${s(n.gainDbi).padEnd(7)} ${s(n.first.analysing).padEnd(9)} ${s(n.first.designed).padEnd(8)} ${s(n.first.done).padEnd(11)} | ${"".padEnd(14)} ${"".padEnd(13)} ${s(n.cpuS)} (this process)`);
    console.log(`${name} chromium  ${String(w.evaluations).padEnd(6)} ${s(w.gainDbi).padEnd(7)} ${s(w.searchS).padEnd(9)} ${s(w.designedS).padEnd(8)} ${s(w.analysedS).padEnd(11)} | ${s(w.resultS).padEnd(14)} ${s(w.doneS).padEnd(13)} ${s(w.resultCpuS)} / ${s(w.cpuS)} (${Object.entries(w.cpuBy).filter(([k]) => k !== "total").map(([k, v]) => `${k} ${v.toFixed(2)}`).join(", ")})${w.problems.length ? `  problems ${JSON.stringify(w.problems)}` : ""}`);
  }
  console.log("search/shown/analysed: seconds from the worker's start (chromium) or the job's start (node) to the search's end, the design on screen, the full analysis");
}

if (import.meta.url === `file://${process.argv[1]}`) {
  const [dir, base] = process.argv.slice(2);
  printDesigner(await benchDesigner(dir, base));
}
