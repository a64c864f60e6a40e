// The one place pages read the catalog: the content collection's entries, typed as the generator's
// Entry (the collection schema is the same zod schema, built with Astro's zod).
//
// Read once per build: getCollection deep-copies every entry on each call (it walks the data for
// image references), and the layout of every page asks for the entries, so without this a build
// copied the whole catalog (23 MB of JSON for 704 entries) once per page: 45 % of the CPU of a
// 160-entry build, growing with the square of the catalog. The entries are frozen, so a page that
// changed one by mistake would stop the build instead of changing what later pages see. In dev
// (`astro dev`) every call reads afresh, so edited entries show up.
import { getCollection } from "astro:content";
import type { Entry } from "../generator/site/catalog";
import { bandsOf, type Band } from "../generator/site/catalog";
import { downloadFiles, type DownloadFile, type PdfCache } from "../generator/site/downloads";
import { newFigureCache, type FigureCache } from "../generator/site/figures";

/** The build's printable PDFs, made once and shared by the pages, the files and the checksum lists. */
export const pdfCache: PdfCache = new Map();

/** The build's figures: each plot drawn once, its size kept for the design page, the card fonts loaded once. */
export const figureCache: FigureCache = newFigureCache();

const downloadsMade = new Map<string, Promise<DownloadFile[]>>();

/**
 * A design's downloads, made once for the build: the file route, the design page, its sheet maps
 * and the site's checksum list all read the same list (they made it four times before, template
 * SVGs and checksums included). The file route holds every list as its props anyway.
 */
export function downloadsOf(entry: Entry): Promise<DownloadFile[]> {
  if (import.meta.env.DEV) return downloadFiles(entry, pdfCache);
  let made = downloadsMade.get(entry.id);
  if (!made) downloadsMade.set(entry.id, (made = downloadFiles(entry, pdfCache)));
  return made;
}

function deepFreeze<T>(value: T): T {
  if (value !== null && typeof value === "object" && !Object.isFrozen(value)) {
    Object.freeze(value);
    for (const v of Object.values(value)) deepFreeze(v);
  }
  return value;
}

async function readEntries(): Promise<Entry[]> {
  const list = await getCollection("entries");
  return list.map((e) => e.data as unknown as Entry).sort((a, b) => (a.id < b.id ? -1 : a.id > b.id ? 1 : 0));
}

let entriesOnce: Promise<readonly Entry[]> | null = null;
let bandsOnce: Promise<Band[]> | null = null;

export async function allEntries(): Promise<Entry[]> {
  if (import.meta.env.DEV) return readEntries();
  entriesOnce ??= readEntries().then(deepFreeze);
  // a fresh array each call (callers may sort or filter it); the entries themselves are shared
  return [...(await entriesOnce)];
}

export async function allBands(): Promise<Band[]> {
  if (import.meta.env.DEV) return bandsOf(await readEntries());
  bandsOnce ??= allEntries().then(bandsOf);
  return [...(await bandsOnce)];
}
