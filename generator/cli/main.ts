#!/usr/bin/env node
// The bentwire command line: analyze a shape, design one, build and check the catalog.
import { Command, CommanderError } from "commander";
import { analyzeCommand } from "./analyzeCommand.js";
import { runReportingErrors } from "./errors.js";
import { DEFAULT_ENTRIES, DEFAULT_GRID, generateCommand, mergeCommand, verifyCommand } from "./catalogCommands.js";
import { designCommand } from "./designCommand.js";
import { shapeCommand } from "./shapeCommand.js";
import { bandMhz, oneOf, positiveNumber, wholeNumber } from "./options.js";
import { VARIANTS } from "../design/request.js";

const program = new Command("bentwire")
  .description("Bent-wire antenna designs: solve, optimize, analyze and catalog")
  .exitOverride()
  .configureOutput({ writeErr: (s) => process.stderr.write(s) });

program
  .command("analyze")
  .description("solve a shape file and report gain, impedance and pattern figures")
  .argument("<shape>", "shape file (JSON)")
  .option("--json", "print one JSON object instead of the readable report")
  .option("--segments-per-wavelength <n>", "segments per wavelength (default 25)", wholeNumber("--segments-per-wavelength", 5, 400))
  .option("--band-mhz <LO:HI>", "band edges in MHz: adds sweep, feed match, tolerance, pattern and checks", bandMhz("--band-mhz"))
  .option("--line-ohm <Z0>", "feed line impedance in Ω", positiveNumber("--line-ohm"), 50)
  .option("--tolerance-samples <N>", "bent copies in the tolerance study", wholeNumber("--tolerance-samples", 1, 100000), 64)
  .option("--seed <S>", "seed of the tolerance study", wholeNumber("--seed", 0, 2 ** 31 - 1), 1)
  .action((shape: string, opts) => analyzeCommand(shape, opts));

program
  .command("design")
  .description("find the bent-arm shape with the most gain for a frequency, wire length and pieces per arm")
  .option("--freq-mhz <F>", "design frequency in MHz", positiveNumber("--freq-mhz"))
  .option("--length-wl <L>", "wire length, tip to tip, in wavelengths", positiveNumber("--length-wl"))
  .option("--pieces <K>", "straight pieces per arm (1 = straight wire or V)", wholeNumber("--pieces", 1, 8))
  .option("--wire-diameter-mm <D>", "wire diameter in mm", positiveNumber("--wire-diameter-mm"), 2)
  .option("--conductor <name>", "perfect, copper or aluminium", oneOf("--conductor", ["perfect", "copper", "aluminium"] as const), "copper")
  .option("--variant <name>", `${VARIANTS.join(" or ")}`, oneOf("--variant", VARIANTS), "max-gain")
  .option("--band-mhz <LO:HI>", "band edges in MHz (default ±2 % around the frequency)", bandMhz("--band-mhz"))
  .option("--seed <S>", "random seed", wholeNumber("--seed", 0, 2 ** 31 - 1), 1)
  .option("--json", "print one JSON object")
  .option("--out <file>", "write the winning shape as a shape file")
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
  .option("--out <dir>", "entries folder", DEFAULT_ENTRIES)
  .option("--workers <n>", "worker threads", wholeNumber("--workers", 1, 64), 2)
  .option("--shard <I/N>", "compute only shard I of N (1-based), for array jobs")
  .option("--only <pattern>", "only ids matching the pattern (* is a wildcard), e.g. '2m-*'")
  .action((opts) => generateCommand(opts));

program
  .command("merge")
  .description("join the entries of several generate runs (shards) into one folder")
  .argument("<dirs...>", "folders written by generate --out")
  .option("--out <dir>", "merged entries folder", DEFAULT_ENTRIES)
  .action((dirs: string[], opts) => mergeCommand(dirs, opts));

program
  .command("verify")
  .description("check every entry's schema and hashes and recompute a sample")
  .option("--grid <file>", "grid file", DEFAULT_GRID)
  .option("--dir <dir>", "entries folder", DEFAULT_ENTRIES)
  .option("--sample <n>", "entries to recompute", wholeNumber("--sample", 0, 100000), 3)
  .option("--seed <s>", "seed choosing the sample", wholeNumber("--seed", 0, 2 ** 31 - 1), 1)
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
