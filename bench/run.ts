// `npm run bench [-- --json] [-- --only solver|optimizer|analysis|catalog]`: prints timing tables.
// Figures, not assertions: tests never time anything.
import { benchSolver } from "./solver.js";

const args = process.argv.slice(2);
const json = args.includes("--json");
const onlyAt = args.indexOf("--only");
const only = onlyAt >= 0 ? args[onlyAt + 1] : undefined;
const wants = (name: string) => !only || only === name;

const ms = (v: number) => v.toFixed(3);
const out: Record<string, unknown> = {};

if (wants("solver")) {
  const cases = benchSolver();
  out.cases = cases;
  if (!json) {
    console.log("solver (straight wire, 25 segments/λ, median of 200 runs, ms)");
    console.log("unknowns  fill     solve    peak     total    | real 2N×2N LU (ml-matrix)");
    for (const c of cases) {
      console.log(`${String(c.unknowns).padEnd(9)} ${ms(c.fillMs).padEnd(8)} ${ms(c.solveMs).padEnd(8)} ${ms(c.peakMs).padEnd(8)} ${ms(c.totalMs).padEnd(8)} | ${ms(c.realFormSolveMs)}`);
    }
  }
}

if (json) console.log(JSON.stringify(out));
