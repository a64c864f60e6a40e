// Solves over ground beside the same shapes in free space: a half-wave dipole (λ/2 up over perfect
// and average ground), a 1.5λ three-piece-per-arm bent wire (λ/2 up) and a base-fed monopole beside
// its free-space dipole. Median wall ms and CPU seconds (process.cpuUsage) per solveShape, peak
// search included, no pattern integral (as the optimizer calls it) except where noted.
import { solveShape, validateShape, type Shape } from "../generator/em/index.js";
import { GROUND_PRESETS } from "../generator/em/ground.js";
import { evaluate } from "../generator/design/objective.js";
import { parseDesignRequest } from "../generator/design/request.js";

export interface GroundCase {
  name: string;
  unknowns: number;
  medianMs: number;
  cpuSPerSolve: number;
}

const C = 299_792_458;
const wire = (points: number[][], extra: Partial<Shape> = {}): Shape =>
  validateShape({ frequencyHz: C, wireRadiusM: 1e-3, wires: [{ pointsM: points }], feed: { wire: 0, vertex: Math.floor(points.length / 2) }, ...extra });
const lift = (points: number[][], h: number) => points.map(([x, y, z]) => [x, y, z + h]);

// a 1.5λ bent wire, three pieces per arm (a shape of the kind the catalog holds)
const bent = [[-0.52, 0.42, 0], [-0.42, 0.2, 0], [-0.2, 0.15, 0], [0, 0, 0], [0.2, 0.15, 0], [0.42, 0.2, 0], [0.52, 0.42, 0]];
const dipole = [[-0.25, 0, 0], [0, 0, 0], [0.25, 0, 0]];

/** CPU seconds per optimizer evaluation of a 1.5λ K = 3 shape on 20 m: free space vs over ground. */
export function benchGroundObjective(runs = 40): GroundCase[] {
  const base = { frequencyHz: 14.1e6, lengthWl: 1.5, piecesPerArm: 3, wireDiameterM: 2e-3 };
  const requests: [string, object][] = [
    ["objective 1.5λ K=3, free space", {}],
    ["objective 1.5λ K=3, 10.6 m over perfect ground, peak", { ground: { type: "perfect" }, heightM: 10.6 }],
    ["objective 1.5λ K=3, 10.6 m over average ground, 5–25°", { ground: GROUND_PRESETS.average, heightM: 10.6, objective: "long-distance" }],
  ];
  const x = [0.9, 0.3, 0.3, 0.3, 0.3];
  return requests.map(([name, extra]) => {
    const r = parseDesignRequest({ ...base, ...extra });
    for (let i = 0; i < 5; i++) evaluate(x, r, [], 2);
    const times: number[] = [];
    const cpu0 = process.cpuUsage();
    for (let i = 0; i < runs; i++) {
      const t0 = performance.now();
      evaluate(x, r, [], 2);
      times.push(performance.now() - t0);
    }
    const cpu = process.cpuUsage(cpu0);
    times.sort((a, b) => a - b);
    return { name, unknowns: 0, medianMs: times[Math.floor(runs / 2)], cpuSPerSolve: (cpu.user + cpu.system) / 1e6 / runs };
  });
}

export function benchGround(runs = 40): GroundCase[] {
  const cases: [string, Shape][] = [
    ["dipole 0.5λ, free space", wire(dipole)],
    ["dipole 0.5λ, λ/2 over perfect ground", wire(lift(dipole, 0.5), { ground: { type: "perfect" } })],
    ["dipole 0.5λ, λ/2 over average ground (+ integral)", wire(lift(dipole, 0.5), { ground: GROUND_PRESETS.average })],
    ["bent 1.5λ K=3, free space", wire(bent)],
    ["bent 1.5λ K=3, λ/2 over perfect ground", wire(lift(bent, 0.5), { ground: { type: "perfect" } })],
    ["bent 1.5λ K=3, λ/2 over average ground (+ integral)", wire(lift(bent, 0.5), { ground: GROUND_PRESETS.average })],
    ["monopole 0.25λ over perfect ground", validateShape({ frequencyHz: C, wireRadiusM: 1e-3, wires: [{ pointsM: [[0, 0, 0], [0, 0, 0.25]] }], feed: { wire: 0, vertex: 0 }, ground: { type: "perfect" } })],
  ];
  return cases.map(([name, shape]) => {
    const times: number[] = [];
    for (let r = 0; r < 5; r++) solveShape(shape); // warm-up: compiled code, not first-call costs
    const cpu0 = process.cpuUsage();
    let unknowns = 0;
    for (let r = 0; r < runs; r++) {
      const t0 = performance.now();
      unknowns = solveShape(shape).unknowns;
      times.push(performance.now() - t0);
    }
    const cpu = process.cpuUsage(cpu0);
    times.sort((a, b) => a - b);
    return { name, unknowns, medianMs: times[Math.floor(runs / 2)], cpuSPerSolve: (cpu.user + cpu.system) / 1e6 / runs };
  });
}
