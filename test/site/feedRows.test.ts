// Site logic for cells with no buildable design (issue 10): the plain-words reason rooted in the
// physics and the nearest buildable design of the band, on entries built from the committed catalog.
import { readdirSync, readFileSync } from "node:fs";
import { describe, expect, it } from "vitest";
import { nearestBuildable, noOptionReason } from "../../generator/site/feedRows.js";
import type { Entry } from "../../generator/site/ok.js";

const DIR = "designs/entries";
const all: Entry[] = readdirSync(DIR).filter((f) => f.endsWith(".json") && f.startsWith("2m-")).map((f) => JSON.parse(readFileSync(`${DIR}/${f}`, "utf8")) as Entry);
const byId = (id: string) => all.find((e) => e.id === id)!;
const as = (e: Entry, change: Partial<Entry>): Entry => ({ ...e, ...change });

describe("no-option reason and nearest buildable design", () => {
  const oneWave = as(byId("2m-1wl-k1-direct-feed"), { status: "infeasible" });

  it("a centre feed on a whole number of wavelengths is at a current minimum (common practice)", () => {
    expect(noOptionReason(oneWave)).toMatch(/1 λ wire fed in the middle is fed at a current minimum/);
    const twoWaves = as(oneWave, { inputs: { ...oneWave.inputs, lengthWl: 2 } });
    expect(noOptionReason(twoWaves)).toMatch(/current minimum/);
    // an odd number of half waves has a current maximum at the centre: the reason is bandwidth instead
    const threeHalves = as(oneWave, { inputs: { ...oneWave.inputs, lengthWl: 1.5 } });
    expect(noOptionReason(threeHalves)).toMatch(/feed impedance changes too fast with frequency/);
  });

  it("links a buildable design of the same band, the same variant when there is one, closest in length", () => {
    const near = nearestBuildable(oneWave, all)!;
    expect(near.status).toBe("ok");
    expect(near.inputs.bandId).toBe("2m");
    const sameVariant = all.filter((e) => e.status === "ok" && e.inputs.variant === "direct-feed");
    if (sameVariant.length > 0) {
      expect(near.inputs.variant).toBe("direct-feed");
      const best = Math.min(...sameVariant.map((e) => Math.abs(e.inputs.lengthWl - 1)));
      expect(Math.abs(near.inputs.lengthWl - 1)).toBe(best);
    }
    expect(nearestBuildable(oneWave, [oneWave])).toBeNull();
  });
});
