// One checksum list over every download of the site; names are paths from the site root.
import type { APIRoute } from "astro";
import { allEntries } from "../../data";
import { allChecksums } from "../../../generator/site/downloads";
import { paths } from "../../../generator/site/paths";

export const GET: APIRoute = async () =>
  new Response(allChecksums(await allEntries(), paths.file), { headers: { "Content-Type": "text/plain" } });
