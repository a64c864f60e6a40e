// The designer's ground fields (ground, heightM, mounting, objective) in the URL query and the step
// to a design request: the same request `bentwire design --ground … --height-m …` builds, the same
// messages for bad values (the command line run beside them is the reference), links from catalog
// entries over ground, and the rows the page shows over ground, read against a `design --json` run.
import { spawnSync } from "node:child_process";
import { beforeAll, describe, expect, it } from "vitest";
import { fieldOfMessage, queryOf, requestFromState, stateFromQuery, wantsRun, DEFAULT_STATE } from "../../generator/browser/designerQuery.js";
import { customHref, stateOfEntry } from "../../generator/browser/designerLinks.js";
import { groundView } from "../../generator/browser/groundView.js";
import { customId } from "../../generator/browser/designJob.js";
import { requestFromFlags } from "../../generator/cli/designCommand.js";
import { GROUND_PRESETS } from "../../generator/em/ground.js";

const cli = (...args: string[]) => spawnSync(process.execPath, ["--import", "tsx", "generator/cli/main.ts", ...args], { encoding: "utf8" });
const msg = (query: string): string => {
  try {
    requestFromState(stateFromQuery(query));
    return "accepted";
  } catch (e) {
    return (e as Error).message;
  }
};
const BASE_Q = "freqMhz=28.5&lengthWl=1&pieces=1";
const BASE_FLAGS = ["design", "--freq-mhz", "28.5", "--length-wl", "1", "--pieces", "1"];
/** The flag a query key stands for on the command line. */
const FLAG_OF: Record<string, string> = { ground: "--ground", heightM: "--height-m", mounting: "--mounting", objective: "--objective" };

describe("designer ground fields: query and request", () => {
  it("a query over ground round-trips and becomes the request the command line builds from the same flags", () => {
    const q = `${BASE_Q}&bandMhz=28:29&seed=3&ground=average&heightM=10&mounting=vertical&objective=long-distance&run=1`;
    const state = stateFromQuery(`?${q}`);
    // the link writes its keys in QUERY_KEYS order, the ground fields last
    expect(queryOf(state, wantsRun(`?${q}`))).toBe("freqMhz=28.5&bandMhz=28:29&lengthWl=1&pieces=1&variant=max-gain&wireDiameterMm=2&conductor=copper&seed=3&ground=average&heightM=10&mounting=vertical&objective=long-distance&run=1");
    const fromCli = requestFromFlags({ freqMhz: 28.5, bandMhz: [28e6, 29e6], lengthWl: 1, pieces: 1, wireDiameterMm: 2, conductor: "copper", variant: "max-gain", seed: 3, ground: GROUND_PRESETS.average, heightM: 10, mounting: "vertical", objective: "long-distance" });
    expect(requestFromState(state)).toEqual(fromCli);
    expect(fromCli.ground).toEqual({ type: "real", relativePermittivity: 13, conductivitySPerM: 5e-3 });
  });

  it("empty mounting and objective mean the command line's defaults over ground (horizontal, peak)", () => {
    const r = requestFromState(stateFromQuery(`?${BASE_Q}&ground=perfect&heightM=7.5`));
    expect(r).toEqual(requestFromFlags({ freqMhz: 28.5, lengthWl: 1, pieces: 1, wireDiameterMm: 2, conductor: "copper", variant: "max-gain", seed: 1, ground: { type: "perfect" }, heightM: 7.5, mounting: "horizontal", objective: "peak" }));
    expect(r.mounting).toBe("horizontal");
    expect(r.objective).toBe("peak");
    expect(customId(r)).toBe("custom-28.5mhz-1wl-k1-max-gain-perfect-h7.5m-horizontal-peak");
  });

  it("in free space the request holds no ground keys at all (the same object, and so the same hash, as before)", () => {
    const r = requestFromState(stateFromQuery(`?${BASE_Q}`));
    for (const k of ["ground", "heightM", "mounting", "objective"]) expect(r[k as keyof typeof r], k).toBeUndefined();
    expect(JSON.stringify(r)).not.toMatch(/ground|heightM|mounting|objective/);
    expect(customId(r)).toBe("custom-28.5mhz-1wl-k1-max-gain");
    expect(queryOf(DEFAULT_STATE)).toBe("variant=max-gain&wireDiameterMm=2&conductor=copper&seed=1");
  });

  // [query tail, the flags the command line gets for it]; the reference message is the CLI's stderr
  const bad: [string, string[]][] = [
    ["ground=mud&heightM=10", ["--ground", "mud", "--height-m", "10"]],
    ["ground=average&heightM=ten", ["--ground", "average", "--height-m", "ten"]],
    ["ground=average&heightM=-2", ["--ground", "average", "--height-m", "-2"]],
    ["ground=average&heightM=0", ["--ground", "average", "--height-m", "0"]],
    ["ground=average&heightM=0.005", ["--ground", "average", "--height-m", "0.005"]],
    ["ground=average", ["--ground", "average"]],
    ["heightM=10", ["--height-m", "10"]],
    ["objective=near-vertical", ["--objective", "near-vertical"]],
    ["mounting=vertical", ["--mounting", "vertical"]],
  ];
  for (const [tail, flags] of bad) {
    it(`${tail}: the command line's message, the key for its flag, and one line`, () => {
      const shown = msg(`?${BASE_Q}&${tail}`);
      const run = cli(...BASE_FLAGS, ...flags, "--json");
      expect(run.status, run.stderr).toBe(2);
      const line = run.stderr.trim();
      expect(line.split("\n")).toHaveLength(1);
      // commander words a bad flag value "error: option '--x <v>' argument 'y' is invalid. <rule>"; the rule is the same text
      const rule = line.replace(/^error: option .* is invalid\. /, "design: ").replace(/^error: /, "");
      const asKeys = Object.entries(FLAG_OF).reduce((t, [key, flag]) => t.replace(new RegExp(`(^design: )${flag}\\b`), `$1${key}`), rule);
      expect(shown).toBe(asKeys);
      expect(shown).not.toMatch(/NaN|undefined|\n/);
    });
  }

  it("mounting and objective outside their lists: the request schema's message, naming the key", () => {
    expect(msg(`?${BASE_Q}&ground=average&heightM=10&mounting=sideways`)).toBe("design: mounting: mounting must be one of horizontal, vertical");
    expect(msg(`?${BASE_Q}&ground=average&heightM=10&objective=far`)).toBe("design: objective: objective must be one of peak, long-distance, near-vertical");
  });

  it("the form marks the field a ground message is about", () => {
    expect(fieldOfMessage(msg(`?${BASE_Q}&ground=mud&heightM=10`))).toBe("ground");
    expect(fieldOfMessage(msg(`?${BASE_Q}&ground=average`))).toBe("heightM");
    expect(fieldOfMessage(msg(`?${BASE_Q}&ground=average&heightM=0`))).toBe("heightM");
    expect(fieldOfMessage(msg(`?${BASE_Q}&heightM=10`))).toBe("ground");
    expect(fieldOfMessage(msg(`?${BASE_Q}&ground=average&heightM=10&mounting=sideways`))).toBe("mounting");
    expect(fieldOfMessage("design: pieces must be a whole number from 1 to 8")).toBe("pieces");
  });
});

describe("links from catalog entries over ground", () => {
  const free = { frequencyHz: 14.15e6, bandLowHz: 14e6, bandHighHz: 14.35e6, lengthWl: 1.5, piecesPerArm: 2, variant: "max-gain", wireDiameterM: 2e-3, conductor: "copper", seed: 1 };

  it("a free-space entry's link is unchanged: no ground keys", () => {
    expect(customHref("/atlas/", stateOfEntry(free))).toBe("/atlas/custom/?freqMhz=14.15&bandMhz=14:14.35&lengthWl=1.5&pieces=2&variant=max-gain&wireDiameterMm=2&conductor=copper&seed=1");
  });

  it("a horizontal entry over ground carries its ground, height, mounting and purpose, and the link designs over that ground", () => {
    const i = { ...free, overGround: { groundName: "average", heightM: 12, mounting: "horizontal", purpose: "long-distance" } };
    const s = stateOfEntry(i);
    expect(s).toMatchObject({ ground: "average", heightM: "12", mounting: "horizontal", objective: "long-distance" });
    const r = requestFromState(stateFromQuery(new URL(customHref("/", s), "http://127.0.0.1").search));
    expect(r).toMatchObject({ ground: GROUND_PRESETS.average, heightM: 12, mounting: "horizontal", objective: "long-distance" });
    // the scale calculator scales the height with every other length (× f_design / f_new)
    expect(stateOfEntry(i, 0.5).heightM).toBe("6");
  });

  it("a vertical entry with its clearance carries the mast top and the clearance, and the link designs from that mast", () => {
    const i = { ...free, overGround: { groundName: "average", heightM: 10, mounting: "vertical", purpose: "long-distance", verticalClearanceM: 2 } };
    const s = stateOfEntry(i);
    expect(s).toMatchObject({ ground: "average", heightM: "10", mounting: "vertical", objective: "long-distance", clearanceM: "2" });
    const href = customHref("/", s);
    expect(href).toMatch(/&clearanceM=2$/);
    const r = requestFromState(stateFromQuery(new URL(href, "http://127.0.0.1").search));
    expect(r).toMatchObject({ ground: GROUND_PRESETS.average, heightM: 10, mounting: "vertical", verticalClearanceM: 2 });
    // scaled like every other length
    expect(stateOfEntry(i, 0.5)).toMatchObject({ heightM: "5", clearanceM: "1" });
  });

  it("a clearance on a horizontal design, or at the mast top, is refused with the field named", () => {
    const base = { ...stateOfEntry({ ...free, overGround: { groundName: "average", heightM: 10, mounting: "vertical", purpose: "long-distance", verticalClearanceM: 2 } }) };
    const fails = (s: typeof base) => { try { requestFromState(s); return ""; } catch (e) { return (e as Error).message; } };
    const horizontal = fails({ ...base, mounting: "" });
    expect(horizontal).toBe("design: verticalClearanceM: a clearance (--clearance-m) applies to the vertical mounting only (--mounting vertical)");
    expect(fieldOfMessage(horizontal)).toBe("clearanceM");
    expect(fails({ ...base, clearanceM: "10" })).toMatch(/clearance \(--clearance-m\) must be below the mast height 10 m/);
    expect(fieldOfMessage(fails({ ...base, clearanceM: "-1" }))).toBe("clearanceM");
  });

  it("a vertical entry without a clearance (height = mast top) leaves the height for the visitor, and the form asks for it", () => {
    const s = stateOfEntry({ ...free, overGround: { groundName: "poor", heightM: 12, mounting: "vertical", purpose: "near-vertical" } });
    expect(s).toMatchObject({ ground: "poor", heightM: "", mounting: "vertical", objective: "near-vertical" });
    expect(() => requestFromState(s)).toThrow("design: heightM: a design over ground needs a height (--height-m)");
  });
});

describe("the rows the page shows over ground", () => {
  let result: Record<string, any>;
  beforeAll(() => {
    const run = cli(...BASE_FLAGS, "--ground", "average", "--height-m", "10", "--json");
    expect(run.status, run.stderr).toBe(0);
    result = JSON.parse(run.stdout);
  }, 120_000);

  it("state the CLI's figures over ground: peak with elevation and azimuth, planning elevations, ground loss", () => {
    const view = groundView(result as never)!;
    const row = (label: string) => view.rows.find((r) => r.label.startsWith(label))!.text;
    expect(row("Ground")).toBe("average (ε_r 13, σ 0.005 S/m)");
    expect(row("Peak gain")).toBe(`${result.peakGainDbi.toFixed(2)} dBi at ${result.peakElevationDeg.toFixed(1)}° elevation, azimuth ${result.peakAzimuthDeg.toFixed(1)}° (from +x toward +y)`);
    expect(row("Feed height")).toMatch(/^10\.0+ m$/);
    // the loss is the share of the input power the ground absorbs (groundLossW / inputPowerW)
    expect(row("Ground loss")).toBe(`${((100 * result.groundLossW) / result.inputPowerW).toFixed(1)} % of the input power`);
    expect(view.elevations.map((e) => e.elevation)).toEqual(["5°", "10°", "15°", "20°", "30°", "45°", "60°", "90°"]);
    expect(view.elevations.map((e) => Number(e.gain.replace("\u2212", "-")))).toEqual(result.gainAtElevationDbi.map((e: { gainDbi: number }) => Number(e.gainDbi.toFixed(2))));
    // a horizontal dipole-like wire 10 m (≈ 0.95 λ) over ground: the lobe rises at 10–20° (textbook
    // image-theory array factor: first maximum where sin ψ = λ / 4h, about 15°), from memory
    expect(result.peakElevationDeg).toBeGreaterThan(10);
    expect(result.peakElevationDeg).toBeLessThan(20);
    const takeoff = groundView(result as never, { elevationDeg: 14.7, azimuthDeg: 90, gainDbi: 9.2, windowDeg: [0, 90] })!;
    expect(takeoff.rows.some((r) => r.label === "Takeoff")).toBe(true);
    expect(view.rows.some((r) => r.label === "Takeoff")).toBe(false);
  });

  it("show nothing in free space", () => {
    const { ground: _g, ...free } = result;
    expect(groundView(free as never)).toBeNull();
  });
});
