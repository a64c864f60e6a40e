// Every reproduction of issue 15 as a named regression test: crashes on valid-looking files, no
// bound on the problem size, meaningless results, wrong targets that succeeded, results lost,
// leftovers of killed runs, and the smaller points. Validation cases run in-process; the command
// line is spawned where the exit status or the printed text is the point.
import { cpSync, existsSync, readdirSync, readFileSync, rmSync, writeFileSync } from "node:fs";
import { hostname } from "node:os";
import { join } from "node:path";
import { beforeAll, describe, expect, it, vi } from "vitest";
import { ANALYSIS_BOUNDS as A, boundText, GRID_BOUNDS as G, SHAPE_BOUNDS } from "../../generator/bounds.js";
import { parseGrid } from "../../generator/catalog/grid.js";
import { LOCK_FILE } from "../../generator/catalog/lock.js";
import { canonicalJson, sha256 } from "../../generator/catalog/hash.js";
import { parseShape, validateShape } from "../../generator/em/shapeFile.js";
import { InputError } from "../../generator/errors.js";
import { cli, filesOf, microGrid, tmp } from "./helpers.js";

const dipole = { frequencyHz: 145e6, wireRadiusM: 0.001, wires: [{ pointsM: [[-0.5, 0, 0], [0, 0, 0], [0.5, 0, 0]] }], feed: { wire: 0, vertex: 1 } };
const shapeWith = (patch: Record<string, unknown>) => JSON.stringify({ ...dipole, ...patch });
const line = (wires: number[][][]) => shapeWith({ wires: wires.map((pointsM) => ({ pointsM })) });
const GRID = readFileSync("test/fixtures/tiny-grid.yaml", "utf8");

/** The one line an InputError carries, or a failure when the input was accepted. */
function refusal(f: () => unknown): string {
  try {
    f();
  } catch (err) {
    expect(err).toBeInstanceOf(InputError);
    const message = (err as Error).message;
    expect(message).not.toMatch(/\n/);
    return message;
  }
  throw new Error("the input was accepted");
}
const shapeRefusal = (text: string) => refusal(() => parseShape(text, "shape.json"));
const gridRefusal = (text: string) => refusal(() => parseGrid(text, "grid.yaml"));
const writeShape = (dir: string, text: string) => { const f = join(dir, "shape.json"); writeFileSync(f, text); return f; };
const oneLineExit = (run: ReturnType<typeof cli>, status: number, message: RegExp) => {
  expect(run.status, run.stderr + run.stdout).toBe(status);
  expect(run.stderr.trim().split("\n")).toHaveLength(1);
  expect(run.stderr).toMatch(message);
};

describe("issue 15: crashes on small valid-looking files", () => {
  it("frequencyHz 1e300 is refused (exit 2), not an internal error", () => {
    oneLineExit(cli("analyze", writeShape(tmp(), shapeWith({ frequencyHz: 1e300 }))), 2, /frequencyHz must lie between 10000 and 3e11 Hz \(got 1e\+300\)/);
  });
  it("a coordinate of 1e300 or 2^53 is refused", () => {
    expect(shapeRefusal(line([[[-1e300, 0, 0], [0, 0, 0], [0.5, 0, 0]]]))).toMatch(/pointsM\[0\]\[0\]: coordinate must lie between -10000 and 10000 m/);
    expect(shapeRefusal(line([[[-0.5, 0, 0], [0, 0, 0], [2 ** 53, 0, 0]]]))).toMatch(/coordinate must lie between/);
  });
  it("300,000 points are refused by count before the schema walks them (no stack overflow)", () => {
    const raw = { ...dipole, wires: [{ pointsM: Array.from({ length: 300_000 }, (_, i) => [i * 1e-3, 0, 0]) }] };
    expect(refusal(() => validateShape(raw, "shape.json"))).toMatch(/at most 400 points over all wires \(got 300000\)/);
    expect(shapeRefusal(JSON.stringify(raw))).toMatch(/file is \d+ characters; the limit is 1048576/);
  });
  it("--band-mhz on such a shape is refused (exit 2), not 'zLoad must have finite re and im'", () => {
    const run = cli("analyze", writeShape(tmp(), line([[[-1e300, 0, 0], [0, 0, 0], [1e300, 0, 0]]])), "--band-mhz", "144:146");
    oneLineExit(run, 2, /coordinate must lie between/);
  });
  it("grid lineImpedanceOhm 1e300, lengthSigmaPercent 1e300 and lowMhz 1e-300 are refused", () => {
    expect(gridRefusal(GRID.replace("lineImpedanceOhm: 50", "lineImpedanceOhm: 1e300"))).toMatch(/lineImpedanceOhm must lie between 1 and 1000 Ω/);
    expect(gridRefusal(GRID.replace("lengthSigmaPercent: 0.5", "lengthSigmaPercent: 1e300"))).toMatch(/tolerance\.lengthSigmaPercent: lengthSigmaPercent must lie between 0 and 20/);
    expect(gridRefusal(GRID.replace("lowMhz: 144.0", "lowMhz: 1e-300"))).toMatch(/bands\[0\]\.lowMhz: lowMhz must lie between 0\.01 and 3e5 MHz/);
  });
});

describe("issue 15: a bound on the problem size", () => {
  it("a 125-byte file with frequencyHz 1e15 is refused", () => {
    expect(shapeRefusal(shapeWith({ frequencyHz: 1e15 }))).toMatch(/frequencyHz must lie between/);
  });
  it("a dipole moved to x = 1e6 m is refused", () => {
    expect(shapeRefusal(line([[[1e6 - 0.5, 0, 0], [1e6, 0, 0], [1e6 + 0.5, 0, 0]]]))).toMatch(/coordinate must lie between -10000 and 10000 m/);
    // inside the coordinate bound but far out in wavelengths: the extent bound
    expect(shapeRefusal(line([[[99.5, 0, 0], [100, 0, 0], [100.5, 0, 0]]]))).toMatch(/48\.6 wavelengths from the origin; keep every point within 10 λ/);
  });
  it("a 100 m wire at 145 MHz is refused with its size in wavelengths", () => {
    expect(shapeRefusal(line([[[-50, 0, 0], [0, 0, 0], [50, 0, 0]]]))).toMatch(/24\.2 wavelengths from the origin/);
  });
  it("a mesh over the bound on unknowns is refused, saying how many it would need and the limit", () => {
    // 9 λ of wire at 400 segments per wavelength: 3,600 segments (λ = 2.0675 m at 145 MHz)
    const half = 4.5 * (299_792_458 / 145e6);
    const message = shapeRefusal(shapeWith({ segmentsPerWavelength: 400, wires: [{ pointsM: [[-half, 0, 0], [0, 0, 0], [half, 0, 0]] }] }));
    expect(message).toMatch(/the mesh would need 3599 unknowns \(3600 segments at 400 per wavelength\); the limit is 1200 unknowns/);
  });
  it("analyze --segments-per-wavelength that pushes the mesh over the bound is refused (exit 2)", () => {
    const half = 4.5 * (299_792_458 / 145e6);
    const file = writeShape(tmp(), shapeWith({ wires: [{ pointsM: [[-half, 0, 0], [0, 0, 0], [half, 0, 0]] }] }));
    oneLineExit(cli("analyze", file, "--segments-per-wavelength", "400"), 2, /would need 3599 unknowns/);
  });
  it("a band spanning decades is refused before the sweep meshes the wire at its high edge", () => {
    oneLineExit(cli("analyze", writeShape(tmp(), JSON.stringify(dipole)), "--band-mhz", "0.01:300000"), 2, /--band-mhz HI may be at most 2 × LO/);
  });
  it("grid tolerance.samples 1000000000 is refused", () => {
    expect(gridRefusal(GRID.replace("samples: 8", "samples: 1000000000"))).toMatch(/tolerance\.samples: samples must lie between 1 and 1000/);
  });
});

describe("issue 15: no meaningless result accepted", () => {
  it("radius 1e-300, frequency 1 Hz and 1.91 Hz are refused (they gave NaN figures)", () => {
    expect(shapeRefusal(shapeWith({ wireRadiusM: 1e-300 }))).toMatch(/wireRadiusM must lie between 1e-9 and 1 m/);
    expect(shapeRefusal(shapeWith({ frequencyHz: 1 }))).toMatch(/frequencyHz must lie between/);
    expect(shapeRefusal(shapeWith({ frequencyHz: 1.91 }))).toMatch(/frequencyHz must lie between/);
  });
  it("conductivity 1e-300 is refused (it gave −1524.7 dBi)", () => {
    expect(shapeRefusal(shapeWith({ conductor: { conductivitySPerM: 1e-300 } }))).toMatch(/conductivitySPerM must lie between 1e5 and 1e8 S\/m/);
  });
  it("a shape electrically too small to solve is refused", () => {
    expect(shapeRefusal(shapeWith({ frequencyHz: 1e4, wires: [{ pointsM: [[-0.1, 0, 0], [0, 0, 0], [0.1, 0, 0]] }] }))).toMatch(/spans 6\.67e-6 wavelengths; the solver needs at least 1e-4 λ/);
  });
});

describe("issue 15: wrong targets fail", () => {
  let catalog: string;
  let grid: string;
  beforeAll(() => {
    const dir = tmp("catalog");
    grid = microGrid(dir);
    catalog = join(dir, "entries");
    const run = cli("generate", "--grid", grid, "--out", catalog, "--workers", "1");
    expect(run.status, run.stderr).toBe(0);
  });
  const copy = () => { const d = join(tmp("copy"), "entries"); cpSync(catalog, d, { recursive: true }); return d; };

  it("verify --dir on a missing folder or on a file: exit 2, not '0 entries checked'", () => {
    oneLineExit(cli("verify", "--grid", grid, "--dir", join(tmp(), "nothing")), 2, /verify: the folder .* does not exist/);
    oneLineExit(cli("verify", "--grid", grid, "--dir", grid), 2, /is not a folder/);
  });
  it("a complete catalog verifies with exit 0", () => {
    const run = cli("verify", "--grid", grid, "--dir", catalog, "--sample", "0");
    expect(run.status, run.stdout).toBe(0);
    expect(run.stdout).toMatch(/1 entries checked, 0 recomputed, 0 problems \(1 reference searches checked\)/);
  });
  it("a deleted entry: verify exits 1 and counts it", () => {
    const d = copy();
    rmSync(join(d, "2m-1wl-k1-max-gain.json"));
    const run = cli("verify", "--grid", grid, "--dir", d, "--sample", "0");
    expect(run.status).toBe(1);
    expect(run.stdout).toMatch(/problems by kind: 1 missing entries/);
  });
  it("a damaged and a stale reference search are reported and counted", () => {
    const d = copy();
    const ref = join(d, "references", "ref-1wl-k1-max-gain.json");
    const body = JSON.parse(readFileSync(ref, "utf8"));
    const { contentHash: _, ...rest } = body;
    const stale = { ...rest, inputHash: "0".repeat(64) };
    writeFileSync(join(d, "references", "ref-9wl-k1-max-gain.json"), readFileSync(ref, "utf8").slice(0, 40));
    writeFileSync(ref, `${JSON.stringify({ ...stale, contentHash: sha256(canonicalJson(stale)) })}\n`);
    const run = cli("verify", "--grid", grid, "--dir", d, "--sample", "0");
    expect(run.status).toBe(1);
    expect(run.stdout).toMatch(/ref-9wl-k1-max-gain\.json: not valid JSON/);
    expect(run.stdout).toMatch(/ref-1wl-k1-max-gain\.json: input hash differs/);
    expect(run.stdout).toMatch(/1 damaged reference searches, 1 stale reference searches/);
  });
  it("merge of a missing folder, a folder without entries, or --out '': exit 2 and nothing written", () => {
    oneLineExit(cli("merge", join(tmp(), "nothing"), "--out", tmp()), 2, /merge: the folder .* does not exist/);
    oneLineExit(cli("merge", tmp(), "--out", tmp()), 2, /holds no entries/);
    const before = readdirSync(".").length;
    oneLineExit(cli("merge", catalog, "--out", ""), 2, /--out must not be empty/);
    expect(readdirSync(".").length).toBe(before);
  });
  it("--seed '' and --sample '' are refused, not read as 0", () => {
    oneLineExit(cli("verify", "--grid", grid, "--dir", catalog, "--sample", ""), 2, /--sample must be a whole number from 0 to 100000 \(got ""\)/);
    oneLineExit(cli("verify", "--grid", grid, "--dir", catalog, "--seed", ""), 2, /--seed must be a whole number/);
  });
  it("--line-ohm without --band-mhz is refused, saying it needs the band", () => {
    oneLineExit(cli("analyze", writeShape(tmp(), JSON.stringify(dipole)), "--line-ohm", "75"), 2, /--line-ohm applies only with --band-mhz/);
  });

  it("a stray temporary file: verify reports it, merge refuses the folder, generate removes it (and only its own)", () => {
    const d = copy();
    const stray = ".2m-1wl-k1-max-gain.json.999999999.0badf00d.tmp";
    writeFileSync(join(d, stray), "{");
    writeFileSync(join(d, "notes.tmp"), "mine");
    const v = cli("verify", "--grid", grid, "--dir", d, "--sample", "0");
    expect(v.status).toBe(1);
    expect(v.stdout).toMatch(/1 temporary files of a stopped run/);
    oneLineExit(cli("merge", d, "--out", tmp()), 2, /holds 1 temporary file\(s\) of a stopped run/);
    const g = cli("generate", "--grid", grid, "--out", d);
    expect(g.status, g.stderr).toBe(0);
    expect(g.stderr).toMatch(/removed 1 temporary file/);
    expect(existsSync(join(d, stray))).toBe(false);
    expect(readFileSync(join(d, "notes.tmp"), "utf8")).toBe("mine");
  });
  it("a second generate on a folder a live run holds refuses; a lock left by a killed run is taken over", () => {
    const d = copy();
    writeFileSync(join(d, LOCK_FILE), JSON.stringify({ pid: process.pid, host: hostname(), command: "generate" }));
    oneLineExit(cli("generate", "--grid", grid, "--out", d), 2, new RegExp(`another generate \\(pid ${process.pid}\\) is writing to this folder`));
    writeFileSync(join(d, LOCK_FILE), JSON.stringify({ pid: 999_999_999, host: hostname(), command: "generate" }));
    const run = cli("generate", "--grid", grid, "--out", d);
    expect(run.status, run.stderr).toBe(0);
    expect(existsSync(join(d, LOCK_FILE))).toBe(false);
    expect(filesOf(d)).toEqual(filesOf(catalog));
  });
});

describe("issue 15: results never lost", () => {
  const designArgs = ["design", "--freq-mhz", "145", "--length-wl", "1", "--pieces", "1"];
  it("design --out into a missing folder, onto a folder, or somewhere unwritable: exit 2 before the search", () => {
    const dir = tmp();
    oneLineExit(cli(...designArgs, "--out", join(dir, "missing", "x.json")), 2, /--out: the folder .* does not exist; create it first/);
    oneLineExit(cli(...designArgs, "--out", dir), 2, /--out: .* is a folder; name a file inside it/);
    oneLineExit(cli(...designArgs, "--out", "/sys/bentwire-x.json"), 2, /--out: cannot write in the folder \/sys/);
    oneLineExit(cli(...designArgs, "--out", ""), 2, /--out must not be empty/);
  });
  it("generate --out onto a file: exit 2", () => {
    oneLineExit(cli("generate", "--grid", "test/fixtures/tiny-grid.yaml", "--out", "README.md"), 2, /--out: README\.md is a file, not a folder/);
  });
  it("an infeasible design exits 3 and writes its shape only with --keep-infeasible", () => {
    const dir = tmp();
    // a straight 1 λ wire fed at its centre has a feed impedance of kilohms: SWR 2 cannot be met
    const infeasible = [...designArgs, "--variant", "direct-feed", "--json"];
    const plain = cli(...infeasible, "--out", join(dir, "no.json"));
    expect(plain.status, plain.stderr).toBe(3);
    expect(JSON.parse(plain.stdout).status).toBe("infeasible");
    expect(existsSync(join(dir, "no.json"))).toBe(false);
    const kept = cli(...infeasible, "--out", join(dir, "kept.json"), "--keep-infeasible");
    expect(kept.status).toBe(3);
    expect(JSON.parse(readFileSync(join(dir, "kept.json"), "utf8")).wires).toHaveLength(1);
  });
  it("design refuses a wire too thick for the frequency before searching (no advice about a flag design lacks)", () => {
    const run = cli(...designArgs, "--wire-diameter-mm", "100");
    oneLineExit(run, 2, /--wire-diameter-mm 100 is too thick for 145 MHz/);
    expect(run.stderr).not.toMatch(/segments per wavelength/);
  });
});

describe("issue 15: smaller points", () => {
  it("a UTF-8 BOM is accepted in shape and grid files", () => {
    expect(parseShape(`\uFEFF${JSON.stringify(dipole)}`).frequencyHz).toBe(145e6);
    expect(parseGrid(`\uFEFF${GRID}`, "grid.yaml").seed).toBe(1);
  });
  it("a shape name with terminal escape sequences is printed escaped", () => {
    const run = cli("analyze", writeShape(tmp(), shapeWith({ name: "dipole \u001b[31mRED\u001b]0;title\u0007 \u202eevil" })));
    expect(run.status, run.stderr).toBe(0);
    expect(run.stdout).not.toMatch(/[\u001b\u0007\u202e]/);
    expect(run.stdout).toContain("dipole \\u001b[31mRED");
  });
  it("YAML warnings add no lines: an error with a warning is still one line, a warning alone is silent", () => {
    const warn = vi.spyOn(process, "emitWarning");
    const log = vi.spyOn(console, "warn");
    const tagged = GRID.replace("seed: 1", "seed: !unknowntag 1");
    const message = refusal(() => parseGrid(tagged.replace("version: 1", "version: 2"), "grid.yaml"));
    expect(message).toMatch(/version must be 1/);
    expect(warn).not.toHaveBeenCalled();
    expect(log).not.toHaveBeenCalled();
    warn.mockRestore();
    log.mockRestore();
  });
  it("100,000 top-level grid keys are refused by a scan, before the YAML parser", () => {
    const flood = Array.from({ length: 100_000 }, (_, i) => `k${i}: 1`).join("\n");
    expect(gridRefusal(flood)).toMatch(/file is \d+ characters; the limit is 262144/);
    expect(gridRefusal(flood.slice(0, 200_000))).toMatch(/more than 1000 keys/);
  });
  it("an unknown field points to README.md, which lists every shape field", () => {
    expect(shapeRefusal(shapeWith({ colour: "red" }))).toMatch(/unknown field colour \(allowed fields are listed in README\.md\)/);
    const readme = readFileSync("README.md", "utf8");
    for (const field of ["name", "frequencyHz", "wireRadiusM", "conductor", "segmentsPerWavelength", "wires", "pointsM", "radiusM", "feed"]) expect(readme).toMatch(new RegExp(`["\`]${field}["\`]`));
  });
  it("a missing feed is explained in plain words", () => {
    const { feed: _, ...noFeed } = dipole;
    expect(shapeRefusal(JSON.stringify(noFeed))).toBe('shape.json: feed: feed is required: {"wire": W, "vertex": V} names the wire (0 = first) and the interior vertex where the source sits');
  });
  it("the bounds module and README state the same bounds", () => {
    const rows = new Map(readFileSync("README.md", "utf8").split("\n").filter((l) => l.startsWith("| ")).map((l) => [l.split("|")[1].trim(), l] as const));
    const S = SHAPE_BOUNDS, t = boundText;
    const expected: [string, string[]][] = [
      ["frequency", [`${t(S.frequencyHz.min)} to ${t(S.frequencyHz.max)} Hz`]],
      ["wire radius", [`${t(S.radiusM.min)} to ${t(S.radiusM.max)} m`, `at most ${S.radiusMaxWl} wavelengths`]],
      ["wire diameter", [`${t(G.wireDiameterMm.min)} to ${t(G.wireDiameterMm.max)} mm`, `at most ${2 * S.radiusMaxWl} wavelengths`]],
      ["coordinates", [`±${S.coordinateAbsM} m`]],
      ["extent in wavelengths", [`within ${S.farthestPointMaxWl} λ`, `at least ${t(S.spanMinWl)} λ`]],
      ["segments", [`at most ${S.segmentsMax}`]],
      ["unknowns", [`at most ${S.unknownsMax}`]],
      ["vertices", [`at most ${S.verticesMax}`]],
      ["wires", [`at most ${S.wiresMax}`]],
      ["conductivity", [`${t(S.conductivitySPerM.min)} to ${t(S.conductivitySPerM.max)} S/m`]],
      ["segments per wavelength", [`${S.segmentsPerWavelength.min} to ${S.segmentsPerWavelength.max}`, `grid: ${G.segmentsPerWavelength.min} to ${G.segmentsPerWavelength.max}`]],
      ["line impedance", [`${A.lineImpedanceOhm.min} to ${A.lineImpedanceOhm.max} Ω`]],
      ["tolerance samples", [`${A.toleranceSamples.min} to ${A.toleranceSamples.max}`]],
      ["tolerance sigmas", [`${A.bendSigmaDeg.min} to ${A.bendSigmaDeg.max}`]],
      ["band edges", [`at most ${A.bandRatioMax} × the low edge`]],
      ["wire lengths", [`${G.lengthWl.min} to ${G.lengthWl.max} wavelengths`, `at most ${G.lengthsMax} lengths and ${G.bandsMax} bands`]],
      ["seeds", [`${A.seed.min} to ${A.seed.max}`]],
      ["file size", [`${S.fileBytesMax} / ${G.fileBytesMax} bytes`]],
      ["nesting", [`${S.nestingMax} levels`, `up to ${G.indentMax} columns`, `at most ${G.keysMax} keys`]],
    ];
    for (const [row, texts] of expected) {
      expect(rows.has(row), row).toBe(true);
      for (const text of texts) expect(rows.get(row), row).toContain(text);
    }
    expect(A.lengthSigmaPercent.max).toBe(A.bendSigmaDeg.max); // the README states one range for both
  });
});
