#!/usr/bin/env node
// The bentwire command line: analyze a shape, design one, build and check the catalog.
import { Command, CommanderError } from "commander";
import { analyzeCommand } from "./analyzeCommand.js";
import { runReportingErrors } from "./errors.js";
import { designCommand } from "./designCommand.js";
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
