#!/usr/bin/env node
// The bentwire command line: analyze a shape, design one, build and check the catalog.
import { Command, CommanderError } from "commander";
import { analyzeCommand } from "./analyzeCommand.js";
import { printable, runReportingErrors } from "./errors.js";
import { DEFAULT_ENTRIES, DEFAULT_GRID, generateCommand, mergeCommand, verifyCommand } from "./catalogCommands.js";
import { designCommand } from "./designCommand.js";
import { elevationWindow } from "./groundOptions.js";
import { bandMhz, nonEmpty, numberIn, oneOf, positiveNumber, wholeNumber } from "./options.js";
import { ANALYSIS_BOUNDS as A, SHAPE_BOUNDS as S } from "../bounds.js";
import { shapeCommand } from "./shapeCommand.js";
import { VARIANTS } from "../design/request.js";
import { GROUND_FLAG_HELP, groundName, heightM } from "./groundOptions.js";
import { MOUNTINGS } from "../shapes/mounting.js";
import { ELEVATION_OBJECTIVES } from "../design/groundObjective.js";

const program = new Command("bentwire")
  .description("Bent-wire antenna designs: solve, optimize, analyze and catalog")
  .exitOverride()
  .configureOutput({ writeErr: (s) => process.stderr.write(`${printable(s.replace(/\n$/, ""))}\n`) });

program
  .command("analyze")
  .description("solve a shape file and report gain, impedance and pattern figures")
  .argument("<shape>", "shape file (JSON)")
  .option("--json", "print one JSON object instead of the readable report")
  .option("--segments-per-wavelength <n>", "segments per wavelength (default 25)", wholeNumber("--segments-per-wavelength", 5, 400))
  .option("--band-mhz <LO:HI>", "band edges in MHz: adds sweep, feed match, tolerance, pattern and checks", bandMhz("--band-mhz"))
  .option("--line-ohm <Z0>", "feed line impedance in Ω (with --band-mhz)", numberIn("--line-ohm", A.lineImpedanceOhm.min, A.lineImpedanceOhm.max, " Ω"), 50)
  .option("--tolerance-samples <N>", "bent copies in the tolerance study (with --band-mhz)", wholeNumber("--tolerance-samples", A.toleranceSamples.min, A.toleranceSamples.max), 64)
  .option("--seed <S>", "seed of the tolerance study (with --band-mhz)", wholeNumber("--seed", A.seed.min, A.seed.max), 1)
  .option("--ground <name>", GROUND_FLAG_HELP, groundName("--ground"))
  .option("--height-m <H>", "lift the shape so its lowest point is H metres above the ground", heightM("--height-m"))
  .option("--elevation-window-deg <LO:HI>", "over ground, with --band-mhz: judge gain within this elevation window, e.g. 5:25 (long-distance) or 60:90 (near-vertical)", elevationWindow("--elevation-window-deg"))
  .action((shape: string, opts, cmd: Command) => analyzeCommand(shape, { ...opts, given: ["lineOhm", "toleranceSamples", "seed"].filter((k) => cmd.getOptionValueSource(k) === "cli") }));

program
  .command("design")
  .description("find the bent-arm shape with the most gain for a frequency, wire length and pieces per arm")
  .option("--freq-mhz <F>", "design frequency in MHz", numberIn("--freq-mhz", S.frequencyHz.min / 1e6, S.frequencyHz.max / 1e6, " MHz"))
  .option("--length-wl <L>", "wire length, tip to tip, in wavelengths", positiveNumber("--length-wl"))
  .option("--length-m <L>", "or the wire length, tip to tip, in metres", positiveNumber("--length-m"))
  .option("--pieces <K>", "straight pieces per arm (1 = straight wire or V)", wholeNumber("--pieces", 1, 8))
  .option("--wire-diameter-mm <D>", "wire diameter in mm", numberIn("--wire-diameter-mm", 2000 * S.radiusM.min, 2000 * S.radiusM.max, " mm"), 2)
  .option("--conductor <name>", "perfect, copper or aluminium", oneOf("--conductor", ["perfect", "copper", "aluminium"] as const), "copper")
  .option("--variant <name>", `${VARIANTS.join(" or ")}`, oneOf("--variant", VARIANTS), "max-gain")
  .option("--band-mhz <LO:HI>", "band edges in MHz (default ±2 % around the frequency)", bandMhz("--band-mhz"))
  .option("--seed <S>", "random seed", wholeNumber("--seed", A.seed.min, A.seed.max), 1)
  .option("--json", "print one JSON object")
  .option("--family <name>", "centre (mirror-image arms) or off-centre (the feed point's place along the wire is searched too)", oneOf("--family", ["centre", "off-centre"] as const), "centre")
  .option("--ground <name>", `${GROUND_FLAG_HELP.replace(/ \(default.*$/, "")} (default free space)`, groundName("--ground"))
  .option("--height-m <H>", "over ground: height of the wire plane (horizontal) or of the lowest point (vertical; with --clearance-m the mast top), metres", heightM("--height-m"))
  .option("--mounting <m>", "over ground: horizontal (wire plane level at the height) or vertical (feed at the top of one mast, ends tied down)", oneOf("--mounting", MOUNTINGS), "horizontal")
  .option("--clearance-m <C>", "vertical only: --height-m is the mast top (the feed) and no wire point comes lower than C metres", heightM("--clearance-m"))
  .option("--objective <o>", "over ground: peak, long-distance (best gain at 5–25° elevation) or near-vertical (60–90°)", oneOf("--objective", ELEVATION_OBJECTIVES), "peak")
  .option("--out <file>", "write the winning shape as a shape file (checked before the search)", nonEmpty("--out"))
  .option("--keep-infeasible", "write --out even when no shape meets the limits (exit status 3 all the same)")
  .action((opts) => designCommand(opts));

program
  .command("shape")
  .description("print a catalog design's shape file (the same bytes as the site's download)")
  .argument("<entry-id>", "catalog entry id, e.g. 2m-1.5wl-k3-max-gain")
  .option("--entries <dir>", "entries folder", DEFAULT_ENTRIES)
  .action((id: string, opts) => shapeCommand(id, opts));

program
  .command("generate")
  .description("compute every design of the grid that is missing or stale, on a worker pool")
  .option("--grid <file>", "grid file", DEFAULT_GRID)
  .option("--out <dir>", "entries folder", nonEmpty("--out"), DEFAULT_ENTRIES)
  .option("--workers <n>", "worker threads", wholeNumber("--workers", 1, 64), 2)
  .option("--shard <I/N>", "compute only shard I of N (1-based), for array jobs")
  .option("--only <pattern>", "only ids matching the pattern (* is a wildcard), e.g. '2m-*'")
  .action((opts) => generateCommand(opts));

program
  .command("merge")
  .description("join the entries of several generate runs (shards) into one folder")
  .argument("<dirs...>", "folders written by generate --out")
  .option("--out <dir>", "merged entries folder", nonEmpty("--out"), DEFAULT_ENTRIES)
  .action((dirs: string[], opts) => mergeCommand(dirs, opts));

program
  .command("verify")
  .description("check every entry's schema and hashes and recompute a sample")
  .option("--grid <file>", "grid file", DEFAULT_GRID)
  .option("--dir <dir>", "entries folder", nonEmpty("--dir"), DEFAULT_ENTRIES)
  .option("--sample <n>", "entries to recompute", wholeNumber("--sample", 0, 100000), 3)
  .option("--seed <s>", "seed choosing the sample", wholeNumber("--seed", A.seed.min, A.seed.max), 1)
  .action((opts) => verifyCommand(opts));

await runReportingErrors(async () => {
  try {
    await program.parseAsync(process.argv);
  } catch (err) {
    if (err instanceof CommanderError) {
      // commander has already printed its one line
      process.exitCode = err.exitCode === 0 ? 0 : 2;
      return;
    }
    throw err;
  }
});
