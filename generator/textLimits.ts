// Limits checked on an input file's text before any parser sees it: size, nesting depth (and, for
// YAML, indentation and the number of keys), so a hostile file costs a scan, not a parse. A leading
// UTF-8 byte-order mark is dropped (editors on some systems add one).
import { InputError } from "./errors.js";

export interface TextLimits {
  maxChars: number;
  maxDepth: number;
  syntax: "json" | "yaml";
  /** YAML only: deepest indentation (columns) and most `key:` tokens. */
  maxIndent?: number;
  maxKeys?: number;
}

export const stripBom = (text: string): string => (text.charCodeAt(0) === 0xfeff ? text.slice(1) : text);

/** Returns the text without its BOM, or throws InputError naming the limit. */
export function checkTextLimits(text: string, label: string, limits: TextLimits): string {
  const body = stripBom(text);
  if (body.length > limits.maxChars) throw new InputError(`${label}: file is ${body.length} characters; the limit is ${limits.maxChars}`);
  const yaml = limits.syntax === "yaml";
  let depth = 0, deepest = 0, keys = 0, indent = 0, lineStart = true, inString = false, comment = false;
  for (let i = 0; i < body.length; i++) {
    const ch = body[i];
    if (ch === "\n") { comment = false; lineStart = true; indent = 0; if (yaml) inString = false; continue; }
    if (comment) continue;
    if (lineStart) {
      if (ch === " ") { indent++; continue; }
      lineStart = false;
      if (yaml && limits.maxIndent !== undefined && indent > limits.maxIndent) throw new InputError(`${label}:${lineOf(body, i)}: indented ${indent} columns; the limit is ${limits.maxIndent}`);
    }
    if (!yaml) {
      // JSON strings may hold brackets; skip them (a backslash escapes the next character)
      if (inString) { if (ch === "\\") i++; else if (ch === '"') inString = false; continue; }
      if (ch === '"') { inString = true; continue; }
    } else if (ch === "#" && (i === 0 || body[i - 1] === " " || body[i - 1] === "\n")) { comment = true; continue; }
    if (ch === "[" || ch === "{") {
      if (++depth > deepest) deepest = depth;
      if (deepest > limits.maxDepth) throw new InputError(`${label}: nested more than ${limits.maxDepth} levels deep`);
    } else if (ch === "]" || ch === "}") depth--;
    else if (yaml && ch === ":" && (body[i + 1] === " " || body[i + 1] === "\n" || i + 1 === body.length)) {
      if (limits.maxKeys !== undefined && ++keys > limits.maxKeys) throw new InputError(`${label}: more than ${limits.maxKeys} keys; a grid file needs far fewer`);
    }
  }
  return body;
}

const lineOf = (text: string, at: number): number => {
  let n = 1;
  for (let i = 0; i < at; i++) if (text.charCodeAt(i) === 10) n++;
  return n;
};
