// The one place where errors turn into a line on stderr and an exit code: 2 for bad input,
// 1 for anything else (a bug: reported in one line too, never as a stack trace).
import { InputError } from "../errors.js";

export async function runReportingErrors(main: () => Promise<void> | void): Promise<void> {
  try {
    await main();
  } catch (err) {
    if (err instanceof InputError) {
      process.stderr.write(`${err.message}\n`);
      process.exitCode = 2;
      return;
    }
    const message = err instanceof Error ? err.message.split("\n")[0] : String(err);
    process.stderr.write(`internal error (please report it with the input that caused it): ${message}\n`);
    if (process.env.BENTWIRE_DEBUG && err instanceof Error) process.stderr.write(`${err.stack}\n`);
    process.exitCode = 1;
  }
}

/** Reads a file for a command, turning a missing or unreadable file into an InputError. */
export async function readInputFile(path: string, what: string): Promise<string> {
  const { readFile } = await import("node:fs/promises");
  try {
    return await readFile(path, "utf8");
  } catch (err) {
    const code = (err as NodeJS.ErrnoException).code ?? "unreadable";
    throw new InputError(`${what}: cannot read ${path} (${code})`);
  }
}
