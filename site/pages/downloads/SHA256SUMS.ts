// One checksum list over every download of the site; names are paths from the site root.
import type { APIRoute } from "astro";
import { allEntries, downloadsOf, pdfCache } from "../../data";
import { allChecksums } from "../../../generator/site/downloads";
import { paths } from "../../../generator/site/paths";

export const GET: APIRoute = async () =>
  new Response(await allChecksums(await allEntries(), paths.file, pdfCache, downloadsOf), { headers: { "Content-Type": "text/plain" } });
