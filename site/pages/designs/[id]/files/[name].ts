// Every download of every design, written at build time (see generator/site/downloads.ts).
import type { APIRoute, GetStaticPaths } from "astro";
import { allEntries } from "../../../../data";
import { downloadFiles, type DownloadFile } from "../../../../../generator/site/downloads";

export const getStaticPaths = (async () => {
  const entries = await allEntries();
  return entries.flatMap((entry) => downloadFiles(entry).map((file) => ({ params: { id: entry.id, name: file.name }, props: { file } })));
}) satisfies GetStaticPaths;

export const GET: APIRoute = ({ props }) => {
  const { file } = props as { file: DownloadFile };
  return new Response(file.content, { headers: { "Content-Type": file.mediaType } });
};
