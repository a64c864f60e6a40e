// The one place pages read the catalog: the content collection's entries, typed as the generator's
// Entry (the collection schema is the same zod schema, built with Astro's zod).
import { getCollection } from "astro:content";
import type { Entry } from "../generator/site/catalog";
import { bandsOf } from "../generator/site/catalog";
import type { PdfCache } from "../generator/site/downloads";

/** The build's printable PDFs, made once and shared by the pages, the files and the checksum lists. */
export const pdfCache: PdfCache = new Map();

export async function allEntries(): Promise<Entry[]> {
  const list = await getCollection("entries");
  return list.map((e) => e.data as unknown as Entry).sort((a, b) => (a.id < b.id ? -1 : a.id > b.id ? 1 : 0));
}

export async function allBands() {
  return bandsOf(await allEntries());
}
