// `npx tsx bench/convergenceLadder.ts FILE...`: the mesh-doubling ladder (25, 50, 100, 200 segments per
// wavelength, capped as generator/analysis/converged.ts caps it) of each shape file at its design
// frequency: input impedance, peak gain, and the change per doubling (|ΔZ|/|Z|, ΔG), with CPU seconds.
// `--exact-kernel`: add the exact-kernel correction on collinear near pairs (kernel.ts, off by default).
import { readFileSync } from "node:fs";
import { basename } from "node:path";
import { refinementCap } from "../generator/analysis/converged.js";
import { parseShape, solveShape } from "../generator/em/index.js";
import { createKernelRules } from "../generator/em/kernel.js";

const rules = createKernelRules(process.argv.includes("--exact-kernel"));

for (const file of process.argv.slice(2).filter((a) => !a.startsWith("--"))) {
  const shape = parseShape(readFileSync(file, "utf8"), file);
  const cap = refinementCap(shape, 25);
  console.log(`${basename(file)} (ladder to ${cap}/λ)`);
  let prev: { re: number; im: number; g: number } | null = null;
  for (let spw = 25; spw <= cap; spw *= 2) {
    const t0 = process.cpuUsage();
    const s = solveShape({ ...shape, segmentsPerWavelength: spw }, { rules });
    const c = process.cpuUsage(t0);
    const z = s.inputImpedanceOhm;
    const change = prev ? `  ΔZ ${((100 * Math.hypot(z.re - prev.re, z.im - prev.im)) / Math.hypot(z.re, z.im)).toFixed(2)} %  ΔG ${(s.peakGainDbi - prev.g).toFixed(4)} dB` : "";
    console.log(`  ${String(spw).padStart(3)}/λ  ${String(s.unknowns).padStart(4)} unknowns  Z ${z.re.toFixed(1)} ${z.im < 0 ? "−" : "+"} j${Math.abs(z.im).toFixed(1)} Ω  G ${s.peakGainDbi.toFixed(4)} dBi${change}  ${((c.user + c.system) / 1e6).toFixed(2)} CPU s`);
    prev = { re: z.re, im: z.im, g: s.peakGainDbi };
  }
}
