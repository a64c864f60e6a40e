// Test harness for the site: builds it (or reuses a build whose fingerprint still matches), serves
// a build folder on 127.0.0.1 with a tiny static server of our own, and starts Debian's chromium
// through playwright-core. Nothing here skips: a missing browser is a failure that says what to install.
import { spawn } from "node:child_process";
import { existsSync } from "node:fs";
import { mkdtemp, readFile, rm, stat } from "node:fs/promises";
import { createServer, type Server } from "node:http";
import { tmpdir } from "node:os";
import { extname, join, normalize, resolve, sep } from "node:path";
import { chromium, type BrowserContext, type Page } from "playwright-core";
import { stampMatches, writeStamp, type StampInputs } from "../../generator/site/buildStamp.js";

export const ROOT = resolve(import.meta.dirname, "../..");
export const CHROMIUM = "/usr/bin/chromium";
/** Test builds and fixtures; BENTWIRE_TEST_CACHE moves them (node_modules may be shared by several checkouts). */
export const CACHE = process.env.BENTWIRE_TEST_CACHE ? resolve(process.env.BENTWIRE_TEST_CACHE) : join(ROOT, "node_modules/.cache/bentwire-site-tests");

/** Vitest puts Vite's own variables into process.env; a child build must not inherit them (a
 * BASE_URL of "/" there would override the base path of a sub-path build). */
const VITE_VARS = new Set(["BASE_URL", "MODE", "DEV", "PROD", "SSR", "NODE_ENV"]);

function childEnv(extra: Record<string, string>): NodeJS.ProcessEnv {
  const env: NodeJS.ProcessEnv = {};
  for (const [k, v] of Object.entries(process.env)) if (!VITE_VARS.has(k) && !k.startsWith("VITEST")) env[k] = v;
  return { ...env, ...extra };
}

function run(cmd: string, args: string[], env: Record<string, string>): Promise<void> {
  return new Promise((ok, fail) => {
    const child = spawn(cmd, args, { cwd: ROOT, env: childEnv(env), stdio: ["ignore", "pipe", "pipe"] });
    let log = "";
    child.stdout.on("data", (d) => { log = (log + d).slice(-8000); });
    child.stderr.on("data", (d) => { log = (log + d).slice(-8000); });
    child.on("error", fail);
    child.on("close", (code) => (code === 0 ? ok() : fail(new Error(`${cmd} ${args.join(" ")} failed (exit ${code}):\n${log}`))));
  });
}

export interface SiteBuild {
  dir: string;
  base: string;
  /** Whether this run built it (false: a matching earlier build was reused). */
  built: boolean;
  seconds: number;
}

/**
 * A site built from `entriesDir` under `base`. Reuses dist/ when `npm run build` left a matching
 * fingerprint there, else a cached test build with a matching fingerprint, else builds into the cache.
 */
export async function ensureSite(name: string, entriesDir: string, base: string, opts: { reuseDist?: boolean } = {}): Promise<SiteBuild> {
  const inputs: StampInputs = { root: ROOT, entriesDir, base };
  const dist = join(ROOT, "dist");
  if (opts.reuseDist && (await stampMatches(dist, inputs))) return { dir: dist, base, built: false, seconds: 0 };
  const dir = join(CACHE, name);
  if (await stampMatches(dir, inputs)) return { dir, base, built: false, seconds: 0 };
  const t0 = Date.now();
  await rm(dir, { recursive: true, force: true });
  // Astro's content store goes beside the build: two builds at once (another checkout's tests) must not share one
  const env = { BENTWIRE_ENTRIES: entriesDir, BENTWIRE_BASE: base, BENTWIRE_OUT_DIR: dir, BENTWIRE_CACHE_DIR: `${dir}.astro-cache`, ASTRO_TELEMETRY_DISABLED: "1", NO_COLOR: "1" };
  await run(process.execPath, [join(ROOT, "node_modules/astro/astro.js"), "build"], env);
  await run(join(ROOT, "node_modules/.bin/pagefind"), ["--site", dir], env);
  await writeStamp(dir, inputs);
  return { dir, base, built: true, seconds: (Date.now() - t0) / 1000 };
}

const TYPES: Record<string, string> = {
  ".html": "text/html; charset=utf-8", ".css": "text/css; charset=utf-8", ".js": "text/javascript; charset=utf-8",
  ".json": "application/json", ".svg": "image/svg+xml", ".png": "image/png", ".webp": "image/webp",
  ".woff2": "font/woff2", ".woff": "font/woff", ".wasm": "application/wasm", ".csv": "text/csv; charset=utf-8",
  ".dxf": "application/dxf", ".txt": "text/plain; charset=utf-8", ".pagefind": "application/octet-stream",
};

export interface StaticServer {
  origin: string;
  /** Every path asked for, with its status. */
  log: { path: string; status: number }[];
  close: () => Promise<void>;
}

/** Serves `dir` under `base` (e.g. "/club/atlas/") on 127.0.0.1; GET and HEAD only, no listing. */
export async function serve(dir: string, base: string): Promise<StaticServer> {
  const root = resolve(dir);
  const log: StaticServer["log"] = [];
  const server: Server = createServer(async (req, res) => {
    const send = (status: number, body: Buffer | string, type = "text/plain; charset=utf-8") => {
      log.push({ path: req.url ?? "", status });
      res.writeHead(status, { "Content-Type": type, "Cache-Control": "no-store" });
      res.end(req.method === "HEAD" ? undefined : body);
    };
    if (req.method !== "GET" && req.method !== "HEAD") return send(405, "method not allowed");
    const path = decodeURIComponent(new URL(req.url ?? "/", "http://x").pathname);
    if (!path.startsWith(base)) return send(404, "outside the site");
    let file = normalize(join(root, path.slice(base.length)));
    if (file !== root && !file.startsWith(root + sep)) return send(403, "forbidden");
    try {
      if ((await stat(file)).isDirectory()) file = join(file, "index.html");
      const body = await readFile(file);
      return send(200, body, TYPES[extname(file)] ?? "application/octet-stream");
    } catch {
      const notFound = await readFile(join(root, "404.html")).catch(() => Buffer.from("not found"));
      return send(404, notFound, "text/html; charset=utf-8");
    }
  });
  await new Promise<void>((ok) => server.listen(0, "127.0.0.1", ok));
  const port = (server.address() as { port: number }).port;
  return {
    origin: `http://127.0.0.1:${port}`,
    log,
    close: () => new Promise<void>((ok) => { server.closeAllConnections(); server.close(() => ok()); }),
  };
}

export const MISSING_CHROMIUM =
  `Chromium is missing at ${CHROMIUM}. The browser tests need Debian's package: run \`apt-get install -y chromium\` as root (bash .ci/run does this).`;

export interface Browser {
  context: BrowserContext;
  /** Every URL any page of the browser asked for (workers included). */
  allRequests: string[];
  close: () => Promise<void>;
}

export async function launchChromium(): Promise<Browser> {
  if (!existsSync(CHROMIUM)) throw new Error(MISSING_CHROMIUM);
  const profile = await mkdtemp(join(tmpdir(), "bentwire-chromium-"));
  const context = await chromium.launchPersistentContext(profile, {
    executablePath: CHROMIUM,
    headless: true,
    viewport: { width: 1280, height: 900 },
    args: ["--no-sandbox", "--disable-gpu", "--disable-quic", "--no-first-run", "--disable-background-networking", "--disable-component-update", "--disable-sync"],
  });
  const allRequests: string[] = [];
  context.on("request", (r) => { allRequests.push(r.url()); });
  return {
    context,
    allRequests,
    close: async () => {
      await context.close();
      await rm(profile, { recursive: true, force: true });
    },
  };
}

export interface PageWatch {
  page: Page;
  /** Every URL the page asked for. */
  requests: string[];
  /** Console errors and warnings (CSP violations show here), and uncaught page errors. */
  problems: string[];
  /** Bytes of every response body received. */
  bytes: () => Promise<number>;
}

export async function watchedPage(b: Browser): Promise<PageWatch> {
  const page = await b.context.newPage();
  const requests: string[] = [];
  const problems: string[] = [];
  const sizes: Promise<number>[] = [];
  page.on("request", (r) => {
    requests.push(r.url());
  });
  page.on("requestfinished", (r) => {
    sizes.push(r.sizes().then((s) => s.responseBodySize + s.responseHeadersSize).catch(() => 0));
  });
  page.on("console", (m) => {
    if (m.type() === "error" || m.type() === "warning") problems.push(`${m.type()}: ${m.text()}`);
  });
  page.on("pageerror", (e) => problems.push(`pageerror: ${e.message}`));
  return { page, requests, problems, bytes: async () => (await Promise.all(sizes)).reduce((s, v) => s + v, 0) };
}
