#!/usr/bin/env node
// The bentwire command line: analyze a shape, design one, build and check the catalog.
import { Command, CommanderError } from "commander";
import { analyzeCommand } from "./analyzeCommand.js";
import { runReportingErrors } from "./errors.js";
import { wholeNumber } from "./options.js";

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
  .action((shape: string, opts) => analyzeCommand(shape, opts));

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
