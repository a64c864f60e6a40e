// How the finder's full-text search ranks: a query that names a band ("70 cm", "2m", "433 MHz")
// and/or a feed variant ("direct feed", "50 ohm", "most gain") is split into those facets and the
// remaining words. The page then asks the index twice: first for design pages that carry the named
// facets (Pagefind filters set on every design page), then for the whole query, and shows the
// first list ahead of the rest with repeats removed. Pure functions; the page script runs them.

export const FEED_FILTER_VALUES = { "direct-feed": "direct-feed", "max-gain": "max-gain" } as const;
export type FeedFacet = keyof typeof FEED_FILTER_VALUES;

/** Phrases that name a feed variant, longest first so "direct 50 ohm feed" wins over "direct". */
const FEED_PHRASES: [RegExp, FeedFacet][] = [
  [/\bdirect(?:ly)?[\s-]*(?:50[\s-]*(?:ω|ohms?)[\s-]*)?fe(?:e)?d(?:s|ing)?\b/giu, "direct-feed"],
  [/\b(?:50[\s-]*(?:ω|ohms?)|no[\s-]+match(?:ing)?)\b/giu, "direct-feed"],
  [/\bdirect\b/giu, "direct-feed"],
  [/\b(?:most|max(?:imum)?)[\s-]*gain\b/giu, "max-gain"],
];

export interface SearchBand { id: string; name: string }

export interface SearchPlan {
  /** The words left once the facets are taken out (null when nothing is left). */
  terms: string | null;
  /** Pagefind filters for the first pass; empty when the query names no facet. */
  filters: { band?: string; feed?: FeedFacet };
}

/** The ways a query may name a band: its id ("70cm"), the id with a space ("70 cm"), the name's head. */
export function bandAliases(b: SearchBand): string[] {
  const spaced = b.id.replace(/^([\d.]+)([a-z]+)$/i, "$1 $2");
  const head = b.name.replace(/\s+(amateur band|ism\b.*|band\b.*)$/i, "").trim();
  return [...new Set([b.id, spaced, head].map((s) => s.toLowerCase()).filter((s) => s.length > 1))].sort((a, c) => c.length - a.length);
}

const escapeRe = (s: string): string => s.replace(/[.*+?^${}()|[\]\\]/g, "\\$&");

export function planSearch(query: string, bands: readonly SearchBand[]): SearchPlan {
  // a catalog id typed whole ("70cm-1.5wl-k2-max-gain") is looked up as it is
  if (/^[a-z0-9.]+(?:-[a-z0-9.]+)+$/i.test(query.trim())) return { terms: query.trim(), filters: {} };
  let rest = ` ${query.toLowerCase()} `;
  const filters: SearchPlan["filters"] = {};
  // a band: the longest alias that appears as whole words (so "2 m" does not match inside "12 m")
  const hits = bands.flatMap((b) => bandAliases(b).map((alias) => ({ b, alias }))).sort((a, c) => c.alias.length - a.alias.length);
  for (const { b, alias } of hits) {
    const re = new RegExp(`(^|[^\\p{L}\\p{N}.])${escapeRe(alias).replace(/ /g, "\\s*")}(?=$|[^\\p{L}\\p{N}])`, "iu");
    if (re.test(rest)) {
      filters.band = b.id;
      rest = rest.replace(re, "$1 ");
      break;
    }
  }
  for (const [re, facet] of FEED_PHRASES) {
    if (filters.feed === undefined && re.test(rest)) filters.feed = facet;
    if (filters.feed === facet) rest = rest.replace(re, " ");
    re.lastIndex = 0;
  }
  const terms = rest.replace(/\s+/g, " ").trim();
  return { terms: terms === "" ? null : terms, filters };
}

/** The facet-matching results first, then the rest of the plain query's results, each once. */
export function mergeRanked<T extends { id: string }>(first: readonly T[], rest: readonly T[]): T[] {
  const seen = new Set<string>();
  const out: T[] = [];
  for (const r of [...first, ...rest]) if (!seen.has(r.id)) { seen.add(r.id); out.push(r); }
  return out;
}

export const SEARCH_PAGE_SIZE = 10;

/** Which results one page of the list shows, and the words for it. */
export function searchPage(total: number, page: number, size = SEARCH_PAGE_SIZE): { from: number; to: number; pages: number; words: string } {
  const pages = Math.max(1, Math.ceil(total / size));
  const p = Math.min(Math.max(1, Math.floor(page)), pages);
  const from = total === 0 ? 0 : (p - 1) * size;
  const to = Math.min(total, p * size);
  const words = total === 0 ? "" : total <= size ? `${total} ${total === 1 ? "page" : "pages"} found.` : `${total} pages found; showing ${from + 1}–${to}, page ${p} of ${pages}.`;
  return { from, to, pages, words };
}
