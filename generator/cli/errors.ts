// The one place where errors turn into a line on stderr and an exit code: 2 for bad input,
// 1 for anything else (a bug: reported in one line too, never as a stack trace).
import { InputError } from "../errors.js";

/** Control characters (C0, DEL, C1) and bidirectional overrides as \u escapes, so text from a file
 *  cannot move the cursor, recolour the terminal or reorder a line when printed. */
export const printable = (text: string): string =>
  text.replace(/[\u0000-\u001f\u007f-\u009f\u200e\u200f\u2028\u2029\u202a-\u202e\u2066-\u2069]/g, (c) => `\\u${c.charCodeAt(0).toString(16).padStart(4, "0")}`);

export async function runReportingErrors(main: () => Promise<void> | void): Promise<void> {
  try {
    await main();
  } catch (err) {
    if (err instanceof InputError) {
      process.stderr.write(`${printable(err.message)}\n`);
      process.exitCode = 2;
      return;
    }
    const message = err instanceof Error ? err.message.split("\n")[0] : String(err);
    process.stderr.write(`internal error (please report it with the input that caused it): ${printable(message)}\n`);
    if (process.env.BENTWIRE_DEBUG && err instanceof Error) process.stderr.write(`${err.stack}\n`);
    process.exitCode = 1;
  }
}

/** Reads a file for a command, turning a missing, unreadable or too large file into an InputError.
 *  The size is checked before reading, so a huge file costs one stat. */
export async function readInputFile(path: string, what: string, maxBytes = 1_048_576): Promise<string> {
  const { open } = await import("node:fs/promises");
  let handle;
  try {
    handle = await open(path, "r");
  } catch (err) {
    const code = (err as NodeJS.ErrnoException).code ?? "unreadable";
    throw new InputError(`${what}: cannot read ${path} (${code === "ENOENT" ? "no such file" : code})`);
  }
  try {
    const info = await handle.stat();
    if (info.isDirectory()) throw new InputError(`${what}: ${path} is a folder, not a file`);
    if (info.size > maxBytes) throw new InputError(`${what}: ${path} is ${info.size} bytes; the limit is ${maxBytes}`);
    return await handle.readFile("utf8");
  } catch (err) {
    if (err instanceof InputError) throw err;
    throw new InputError(`${what}: cannot read ${path} (${(err as NodeJS.ErrnoException).code ?? "unreadable"})`);
  } finally {
    await handle.close();
  }
}
