// Full-text search excerpts arrive as text with <mark> around the hits and the page text's own
// characters entity-escaped. This splits them into plain runs (entities decoded) that the page
// inserts as text nodes, so nothing from an excerpt is ever parsed as markup.

const ENTITIES: Record<string, string> = { amp: "&", lt: "<", gt: ">", quot: '"', "#39": "'", apos: "'", nbsp: "\u00a0" };

export function decodeEntities(text: string): string {
  return text.replace(/&(#x[0-9a-f]+|#\d+|[a-z]+);/gi, (all, name: string) => {
    if (name[0] === "#") {
      const code = name[1] === "x" || name[1] === "X" ? parseInt(name.slice(2), 16) : parseInt(name.slice(1), 10);
      return Number.isFinite(code) && code > 0 && code <= 0x10ffff ? String.fromCodePoint(code) : all;
    }
    return ENTITIES[name.toLowerCase()] ?? all;
  });
}

export interface ExcerptPart { text: string; marked: boolean }

export function excerptParts(excerpt: string): ExcerptPart[] {
  const out: ExcerptPart[] = [];
  let marked = false;
  for (const piece of excerpt.split(/(<\/?mark>)/)) {
    if (piece === "<mark>") marked = true;
    else if (piece === "</mark>") marked = false;
    else if (piece) out.push({ text: decodeEntities(piece), marked });
  }
  return out;
}
