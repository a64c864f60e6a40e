// throwaway screenshot script (not committed)
import { launchChromium, serve } from "./harness.js";
const dir = process.argv[2], pages = process.argv.slice(3);
const server = await serve(dir, "/");
const b = await launchChromium();
for (const width of [390, 1280]) {
  const p = await b.context.newPage();
  await p.setViewportSize({ width, height: 900 });
  const errs: string[] = [];
  p.on("console", (m) => { if (m.type() === "error" || m.type() === "warning") errs.push(m.text()); });
  p.on("pageerror", (e) => errs.push(e.message));
  for (const path of pages) {
    await p.goto(server.origin + path, { waitUntil: "networkidle" });
    await p.waitForTimeout(300);
    const name = `/tmp/shots/${width}-${path.replace(/[^a-z0-9]+/gi, "_")}.png`;
    await p.screenshot({ path: name, fullPage: true });
    const overflow = await p.evaluate(() => document.documentElement.scrollWidth - window.innerWidth);
    console.log(name, "overflow", overflow, errs.splice(0).join(" | "));
  }
  await p.close();
}
await b.close(); await server.close();
