// The sweep plot marks the band, the SWR 2 line and all three curves; the 3D view paints a face
// for every grid cell above the floor and draws the axes and the wire.
import { describe, expect, it } from "vitest";
import { pattern3dSvg, sweepSvg } from "../../generator/render/index.js";
import { copy, okEntries } from "./fixtures.js";

const entry = okEntries()[0];

describe("sweepSvg", () => {
  it("shades the band in both panels and draws SWR, gain, realized gain and the SWR 2 line", () => {
    const svg = sweepSvg(entry);
    expect(svg.match(/data-role="band"/g)).toHaveLength(2);
    for (const role of ["swr", "gain", "realized-gain", "swr2"]) expect(svg).toContain(`data-role="${role}"`);
    expect(svg).toContain("frequency (MHz)");
    expect(svg).toContain("gain (dBi)");
  });

  it("switches SWR to a log axis when it climbs past 6", () => {
    const e = copy(entry);
    e.sweep!.points.forEach((p, i) => { p.swr = 1.5 + i * 5; });
    const svg = sweepSvg(e);
    expect(svg).toContain("SWR (log scale)");
    expect(svg).toMatch(/>100<\/text>/);
    expect(sweepSvg(entry)).not.toContain("log scale");
  });

  it("leaves a gap where SWR or realized gain is missing", () => {
    const e = copy(entry);
    e.sweep!.points[3].swr = null;
    const d = /data-role="swr" d="([^"]*)"/.exec(sweepSvg(e))![1];
    expect(d.match(/M/g)).toHaveLength(2);
  });
});

describe("pattern3dSvg", () => {
  it("paints one face per grid cell above the floor, with axes and the wire", () => {
    const svg = pattern3dSvg(entry);
    const p = entry.pattern!, cells = (p.gridDbi.length - 1) * p.gridDbi[0].length;
    const surface = /<g data-role="surface"[^>]*>(.*?)<\/g>/.exec(svg)![1];
    const faces = surface.match(/<polygon points="[^"]*" fill="#[0-9a-f]{6}"\/>/g)!.length;
    expect(surface.replace(/<polygon[^>]*\/>/g, "")).toBe("");
    expect(faces).toBeGreaterThan(cells / 2);
    expect(faces).toBeLessThanOrEqual(cells);
    expect(svg).toContain('data-role="wire"');
    for (const axis of ["x", "y", "z"]) expect(svg).toContain(`>${axis}</text>`);
  });

  it("rejects a grid of the wrong size", () => {
    const e = copy(entry);
    e.pattern!.gridDbi.pop();
    expect(() => pattern3dSvg(e)).toThrow(/gain grid/);
  });
});
