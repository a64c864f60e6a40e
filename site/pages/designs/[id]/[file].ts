// The figures of every buildable design, written at build time: plot SVGs, a PNG thumbnail and a
// share card. The drawing itself lives in generator/render.
import type { APIRoute, GetStaticPaths } from "astro";
import { allEntries, figureCache } from "../../../data";
import { figureFiles, renderFigure, type FigureFile } from "../../../../generator/site/figures";
import { isOk, type OkEntry } from "../../../../generator/site/ok";

export const getStaticPaths = (async () => {
  const entries = (await allEntries()).filter(isOk);
  return entries.flatMap((entry) => figureFiles.map((file) => ({ params: { id: entry.id, file }, props: { entry, file } })));
}) satisfies GetStaticPaths;

export const GET: APIRoute = async ({ props }) => {
  const { entry, file } = props as { entry: OkEntry; file: FigureFile };
  const { body, mediaType } = await renderFigure(entry, file, figureCache);
  return new Response(body, { headers: { "Content-Type": mediaType } });
};
