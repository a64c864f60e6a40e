// Reads a V8 .cpuprofile (node --cpu-prof) and splits the CPU time spent under one function by the
// outermost of the named functions below it: `npx tsx bench/profileStages.ts FILE TOP SUB...`.
import { readFileSync } from "node:fs";

interface ProfileNode { id: number; callFrame: { functionName: string }; children?: number[] }
interface Profile { nodes: ProfileNode[]; samples: number[]; timeDeltas: number[] }

export function stageSeconds(profile: Profile, top: string, subs: readonly string[]): Map<string, number> {
  const byId = new Map(profile.nodes.map((n) => [n.id, n]));
  const parent = new Map<number, number>();
  for (const n of profile.nodes) for (const c of n.children ?? []) parent.set(c, n.id);
  const out = new Map<string, number>();
  profile.samples.forEach((id, i) => {
    const chain: string[] = []; // innermost first
    for (let cur: number | undefined = id; cur !== undefined; cur = parent.get(cur)) chain.push(byId.get(cur)!.callFrame.functionName);
    const at = chain.indexOf(top);
    if (at < 0) return;
    const hit = chain.slice(0, at).reverse().find((fn) => subs.includes(fn)) ?? "(own or other)";
    for (const k of ["all", hit]) out.set(k, (out.get(k) ?? 0) + (profile.timeDeltas[i] ?? 0) / 1e6);
  });
  return out;
}

if (process.argv[1]?.endsWith("profileStages.ts")) {
  const [file, top, ...subs] = process.argv.slice(2);
  for (const [k, s] of stageSeconds(JSON.parse(readFileSync(file, "utf8")) as Profile, top, subs)) console.log(`${top}  ${k.padEnd(28)} ${s.toFixed(1)} s`);
}
