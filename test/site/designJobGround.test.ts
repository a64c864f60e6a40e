// A design made in the browser over ground downloads an entry like a catalog cell over ground: the
// over-ground inputs (ground, support height, mounting, purpose, window, clearance) and the block of
// figures (takeoff, cuts, height curve, other grounds, free space), valid against the entry schema.
// The height curve is checked against `bentwire analyze` of the downloaded shape file re-mounted at
// the other height (an independent path through the command line), the takeoff against the entry's
// own gain.
import { spawnSync } from "node:child_process";
import { mkdtempSync, writeFileSync } from "node:fs";
import { tmpdir } from "node:os";
import { join } from "node:path";
import { beforeAll, describe, expect, it } from "vitest";
import { runDesignJob, type JobMessage } from "../../generator/browser/designJob.js";
import { requestFromState, DEFAULT_STATE } from "../../generator/browser/designerQuery.js";
import { entrySchema } from "../../generator/catalog/entrySchema.js";

const cli = (...args: string[]) => spawnSync(process.execPath, ["--import", "tsx", "generator/cli/main.ts", ...args], { encoding: "utf8" });

async function done(state: Partial<typeof DEFAULT_STATE>) {
  const messages: JobMessage[] = [];
  await runDesignJob(requestFromState({ ...DEFAULT_STATE, freqMhz: "28.5", bandMhz: "28:29", lengthWl: "1", pieces: "1", ...state }), (m) => messages.push(m));
  const last = messages.at(-1)!;
  if (last.type !== "done") throw new Error(`the job ended with ${last.type}`);
  return last;
}

describe("a custom design over ground carries the catalog's over-ground blocks", () => {
  let horizontal: Awaited<ReturnType<typeof done>>;
  let vertical: Awaited<ReturnType<typeof done>>;
  beforeAll(async () => {
    horizontal = await done({ ground: "average", heightM: "10", objective: "long-distance" });
    vertical = await done({ ground: "average", heightM: "10", mounting: "vertical", clearanceM: "2" });
  }, 300_000);

  it("horizontal: inputs and figures as a catalog cell's, valid against the entry schema", () => {
    const e = horizontal.entry;
    expect(entrySchema.safeParse(e).success).toBe(true);
    expect(e.inputs.overGround).toMatchObject({ groundName: "average", heightM: 10, mounting: "horizontal", purpose: "long-distance", elevationWindowDeg: [5, 25] });
    const g = e.overGround!;
    expect(g.heightCurve.map((h) => h.heightM)).toEqual([7, 13]);
    expect(g.otherGrounds.map((o) => o.groundName)).toEqual(["poor", "good"]);
    expect(g.takeoffElevationDeg).toBeGreaterThanOrEqual(5);
    expect(g.takeoffElevationDeg).toBeLessThanOrEqual(25);
    expect(Math.abs(g.lowestPointM - 10)).toBeLessThan(1e-6); // a level wire plane at the height asked
    expect(e.title).toMatch(/horizontal at 10 m, long-distance$/);
  });

  it("the height curve agrees with analyze on the downloaded shape re-mounted 3 m higher", () => {
    const shapeFile = horizontal.files.find((f) => f.group === "shape")!;
    const dir = mkdtempSync(join(tmpdir(), "bentwire-custom-ground-"));
    const free = JSON.parse(String(shapeFile.content));
    const path = join(dir, "shape.json");
    // the shape as mounted, lifted 3 m: its lowest point 13 m up, as the height curve's 13 m copy
    const lifted = { ...free, wires: free.wires.map((w: { pointsM: number[][] }) => ({ ...w, pointsM: w.pointsM.map(([x, y, z]) => [x, y, z + 3]) })) };
    writeFileSync(path, JSON.stringify(lifted));
    const run = cli("analyze", path, "--json", "--segments-per-wavelength", String(horizontal.entry.figures!.uncertainty!.segmentsPerWavelength));
    expect(run.status, run.stderr).toBe(0);
    const a = JSON.parse(run.stdout);
    const at13 = horizontal.entry.overGround!.heightCurve.find((h) => h.heightM === 13)!;
    expect(at13.impedanceOhm.re).toBeCloseTo(a.inputImpedanceOhm.re, 0);
    expect(at13.impedanceOhm.im).toBeCloseTo(a.inputImpedanceOhm.im, 0);
  }, 120_000);

  it("vertical from a mast top with a clearance: the mast top as the support height, the clearance kept", () => {
    const e = vertical.entry;
    expect(entrySchema.safeParse(e).success).toBe(true);
    expect(e.inputs.overGround).toMatchObject({ heightM: 10, mounting: "vertical", purpose: "peak", elevationWindowDeg: [0, 90], verticalClearanceM: 2 });
    const g = e.overGround!;
    expect(g.feedHeightM).toBeCloseTo(10, 6);
    expect(g.lowestPointM).toBeGreaterThanOrEqual(2 - 1e-9);
    expect(g.heightCurve.map((h) => h.heightM)).toEqual([7, 13]);
    expect(e.figures!.mounting).toMatch(/top of a 10 m mast, no point lower than 2 m/);
  });
});
