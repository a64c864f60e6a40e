// A catalog design reproduces from its own shape file: `bentwire shape <id>` prints the site's
// download byte for byte, and analysing that file gives the entry's published gain, impedance and
// uncertainty to display precision (0.01 dB, 0.1 Ω). Runs on a fixed sample of committed entries
// (a converged analysis of all of them takes minutes; bench/convergenceCheck.ts covers the whole
// catalog), or on every entry of BENTWIRE_ROUNDTRIP_ENTRIES when that names a folder.
import { spawnSync } from "node:child_process";
import { readdirSync, readFileSync } from "node:fs";
import { join } from "node:path";
import { describe, expect, it } from "vitest";
import { bandCheckFrequencies, convergedSolution } from "../../generator/analysis/index.js";
import { parseShape } from "../../generator/em/index.js";
import { shapeText } from "../../generator/cli/shapeCommand.js";
import { shapeFileText, siteShapeFileText } from "../../generator/site/downloads.js";

const dir = process.env.BENTWIRE_ROUNDTRIP_ENTRIES ?? "designs/entries";
const SAMPLE = ["10m-2wl-k1-max-gain", "2m-1.5wl-k3-max-gain", "23cm-1wl-k2-max-gain", "6m-2wl-k3-direct-feed", "70cm-2.5wl-k4-direct-feed"];
const ids = process.env.BENTWIRE_ROUNDTRIP_ENTRIES
  ? readdirSync(dir).filter((f) => f.endsWith(".json")).map((f) => f.slice(0, -5))
  : SAMPLE;
const cli = (...args: string[]) => spawnSync(process.execPath, ["--import", "tsx", "generator/cli/main.ts", ...args], { encoding: "utf8" });

describe("shape file round trip", () => {
  it("the command prints the site's shape-file download byte for byte; unknown ids exit 2 with one line", () => {
    const run = cli("shape", ids[0], "--entries", dir);
    expect(run.status).toBe(0);
    const entry = JSON.parse(readFileSync(join(dir, `${ids[0]}.json`), "utf8"));
    expect(run.stdout).toBe(shapeFileText(entry));
    const bad = cli("shape", "no-such-design", "--entries", dir);
    expect(bad.status).toBe(2);
    expect(bad.stderr.trim().split("\n")).toHaveLength(1);
  });

  it("over ground the command prints the site's download too: the mounted wire with its ground", () => {
    const id = "20m-1wl-k1-max-gain-h10m-horizontal-long-distance";
    const run = cli("shape", id, "--entries", "designs/entries");
    expect(run.status).toBe(0);
    const entry = JSON.parse(readFileSync(join("designs/entries", `${id}.json`), "utf8"));
    expect(run.stdout).toBe(siteShapeFileText(entry));
    const shape = parseShape(run.stdout, id);
    expect(shape.ground).toEqual(entry.inputs.overGround.ground);
    for (const p of shape.wires[0].pointsM) expect(p[2]).toBeCloseTo(entry.inputs.overGround.heightM, 6); // horizontal: the wire plane at the height
  });

  for (const id of ids) {
    it(`${id}: analysing the downloaded shape file gives the published figures`, async () => {
      const entry = JSON.parse(readFileSync(join(dir, `${id}.json`), "utf8"));
      if (entry.status !== "ok") return expect(shapeText(id, dir)).rejects.toThrow(/has no shape/);
      const shape = parseShape(await shapeText(id, dir), id);
      const { solution, refinement } = convergedSolution(shape, { checkFrequenciesHz: bandCheckFrequencies([entry.inputs.bandLowHz, entry.inputs.bandHighHz]) });
      const f = entry.figures;
      expect(Math.abs(solution.peakGainDbi - f.gainDbi)).toBeLessThan(0.005);
      expect(Math.abs(solution.inputImpedanceOhm.re - f.inputImpedanceOhm.re)).toBeLessThan(0.05);
      expect(Math.abs(solution.inputImpedanceOhm.im - f.inputImpedanceOhm.im)).toBeLessThan(0.05);
      expect(refinement.segmentsPerWavelength).toBe(f.uncertainty.segmentsPerWavelength);
    });
  }
});
