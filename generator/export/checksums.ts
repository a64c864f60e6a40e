// A checksum listing in the usual "sha256sum" text layout: "<64 hex digits>  <name>\n" per file,
// sorted by name (plain code-unit order, so the result never depends on locale).
// SHA-256 from @noble/hashes (FIPS 180-4), a pure-JS implementation: the same code runs in Node and
// in the browser designer's worker, where node:crypto does not exist.
import { sha256 } from "@noble/hashes/sha2.js";
import { bytesToHex, utf8ToBytes } from "@noble/hashes/utils.js";
import { InputError } from "../errors.js";
import type { ChecksumEntry } from "./types.js";

/** Lowercase hex SHA-256 of a string (as UTF-8) or of raw bytes. */
export function sha256Hex(content: string | Uint8Array): string {
  return bytesToHex(sha256(typeof content === "string" ? utf8ToBytes(content) : content));
}

/** The listing for `entries`; names must be non-empty, unique and free of line breaks. */
export function sha256Listing(entries: readonly ChecksumEntry[]): string {
  const seen = new Set<string>();
  entries.forEach((entry, i) => {
    if (typeof entry.name !== "string" || entry.name === "") {
      throw new InputError(`checksums: entries[${i}].name: must be a non-empty string`);
    }
    if (/[\r\n\\]/.test(entry.name)) {
      throw new InputError(`checksums: entries[${i}].name: must not hold a line break or backslash`);
    }
    if (seen.has(entry.name)) {
      throw new InputError(`checksums: entries[${i}].name: must be unique (repeats an earlier name)`);
    }
    if (typeof entry.content !== "string" && !(entry.content instanceof Uint8Array)) {
      throw new InputError(`checksums: entries[${i}].content: must be a string or a Uint8Array`);
    }
    seen.add(entry.name);
  });
  return [...entries]
    .sort((a, b) => (a.name < b.name ? -1 : a.name > b.name ? 1 : 0))
    .map((entry) => `${sha256Hex(entry.content)}  ${entry.name}\n`)
    .join("");
}
