// Every download of every design, written at build time (see generator/site/downloads.ts).
import type { APIRoute, GetStaticPaths } from "astro";
import { allEntries, downloadsOf } from "../../../../data";
import type { DownloadFile } from "../../../../../generator/site/downloads";

export const getStaticPaths = (async () => {
  const entries = await allEntries();
  const out = [];
  for (const entry of entries) for (const file of await downloadsOf(entry)) out.push({ params: { id: entry.id, name: file.name }, props: { file } });
  return out;
}) satisfies GetStaticPaths;

export const GET: APIRoute = ({ props }) => {
  const { file } = props as { file: DownloadFile };
  return new Response(typeof file.content === "string" ? file.content : new Uint8Array(file.content), { headers: { "Content-Type": file.mediaType } });
};
