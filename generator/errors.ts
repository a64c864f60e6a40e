// Errors a person can act on. An InputError carries one line: the field, the rule it breaks, the
// value it got. Command-line front ends print its message alone and exit with code 2.

export class InputError extends Error {
  constructor(message: string) {
    super(message);
    this.name = "InputError";
  }
}

/** Formats a value for an error message: short, never multi-line. */
export function shown(value: unknown): string {
  if (typeof value === "number") return Number.isNaN(value) ? "NaN" : String(value);
  const text = JSON.stringify(value) ?? String(value);
  return text.length > 60 ? text.slice(0, 57) + "..." : text;
}
