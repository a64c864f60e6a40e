// `design --length-m`: the wire length in metres instead of wavelengths (λ = c / f, c = 299 792 458 m/s
// exactly, the SI definition of the metre), and the form of the in-browser designer, which shares
// the same rules (generator/design/requestInput.ts) and so the same messages.
import { spawnSync } from "node:child_process";
import { describe, expect, it } from "vitest";
import { requestFromState, stateFromQuery, wantsRun } from "../../generator/browser/designerQuery.js";
import { queryOf, stateOfEntry } from "../../generator/browser/designerLinks.js";
import { requestFromInputs } from "../../generator/design/requestInput.js";

const cli = (...args: string[]) =>
  spawnSync(process.execPath, ["--import", "tsx", "generator/cli/main.ts", ...args], { encoding: "utf8" });
const C = 299_792_458;

describe("design --length-m", () => {
  it("designs a wire of that many metres: the arms' pieces add up to the length given", () => {
    const run = cli("design", "--freq-mhz", "435", "--length-m", "1.2", "--pieces", "1", "--seed", "4", "--json");
    expect(run.status, run.stderr).toBe(0);
    const result = JSON.parse(run.stdout);
    const total = 2 * result.parameters.pieceLengthsM.reduce((s: number, v: number) => s + v, 0);
    expect(Math.abs(total - 1.2)).toBeLessThan(1e-9);
    const [left, feed, right] = result.shape.wires[0].pointsM;
    expect(Math.abs(Math.hypot(left[0] - feed[0], left[1] - feed[1]) + Math.hypot(right[0] - feed[0], right[1] - feed[1]) - 1.2)).toBeLessThan(1e-9);
  });

  const bad: [string, string[], RegExp][] = [
    ["both lengths", ["--freq-mhz", "145", "--length-wl", "1.5", "--length-m", "3", "--pieces", "2"], /^design: give --length-wl or --length-m, not both$/],
    ["no length", ["--freq-mhz", "145", "--pieces", "2"], /^design: --length-wl \(or --length-m\) is required$/],
    ["a length of 20 λ given in metres", ["--freq-mhz", "300", "--length-m", "20", "--pieces", "2"], /^design: lengthWl: lengthWl must lie between 0.2 and 6 wavelengths$/],
    ["a negative length in metres", ["--freq-mhz", "145", "--length-m", "-1", "--pieces", "2"], /--length-m must be a positive number/],
  ];
  for (const [what, args, message] of bad) {
    it(`refuses ${what} with one line and exit code 2`, () => {
      const run = cli("design", ...args);
      expect(run.status).toBe(2);
      expect(run.stdout).toBe("");
      expect(run.stderr.trim().split("\n")).toHaveLength(1);
      expect(run.stderr.trim().replace(/^error: /, "")).toMatch(message);
    });
  }
});

describe("designer form state", () => {
  const q = "freqMhz=147.3&bandMhz=144:148&lengthM=4.2&pieces=3&variant=direct-feed&wireDiameterMm=1.6&conductor=aluminium&seed=7&run=1";

  it("the URL query round-trips and becomes the request the CLI would build", () => {
    const state = stateFromQuery(`?${q}`);
    expect(queryOf(state, wantsRun(`?${q}`))).toBe(q);
    const r = requestFromState(state);
    const cliSide = requestFromInputs({ freqMhz: 147.3, bandHz: [144e6, 148e6], lengthM: 4.2, pieces: 3, variant: "direct-feed", wireDiameterMm: 1.6, conductor: "aluminium", seed: 7 });
    expect(r).toEqual(cliSide);
    expect(r.lengthWl).toBe(4.2 / (C / 147.3e6));
    expect(r.wireDiameterM).toBeCloseTo(1.6e-3, 15);
  });

  it("bad values give one line naming the query key, with the schema's own words", () => {
    const msg = (query: string) => { try { requestFromState(stateFromQuery(query)); return "accepted"; } catch (e) { return (e as Error).message; } };
    expect(msg("?freqMhz=abc&lengthWl=1.5&pieces=2")).toBe("design: freqMhz must be a positive number");
    expect(msg("?freqMhz=145&lengthWl=1.5&pieces=9")).toBe("design: pieces must be a whole number from 1 to 8");
    expect(msg("?freqMhz=145&lengthWl=1.5&pieces=2&bandMhz=150:140")).toBe("design: bandMhz must have LO below HI");
    expect(msg("?freqMhz=145&lengthWl=1.5&lengthM=3&pieces=2")).toBe("design: give lengthWl or lengthM, not both");
    expect(msg("?freqMhz=145&lengthWl=7&pieces=2")).toBe("design: lengthWl: lengthWl must lie between 0.2 and 6 wavelengths");
    expect(msg("?freqMhz=145&lengthWl=1.5&pieces=2&variant=loud")).toBe("design: variant: variant must be one of max-gain, direct-feed");
  });

  it("a catalog design scaled by a factor keeps its length in wavelengths and scales frequency and wire", () => {
    const s = stateOfEntry({ frequencyHz: 145e6, bandLowHz: 144e6, bandHighHz: 146e6, lengthWl: 1.5, piecesPerArm: 3, variant: "max-gain", wireDiameterM: 2e-3, conductor: "copper", seed: 1 }, 145 / 435);
    expect(s).toMatchObject({ freqMhz: "435", bandMhz: "432:438", lengthWl: "1.5", pieces: "3", wireDiameterMm: "0.6666667" });
  });
});
