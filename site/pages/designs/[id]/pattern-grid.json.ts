// The gain grid of every buildable design as a small JSON file, fetched by the turnable 3D view
// only when it is shown (so the design page itself stays light).
import type { APIRoute, GetStaticPaths } from "astro";
import { allEntries } from "../../../data";
import { isOk, type OkEntry } from "../../../../generator/site/ok";
import { patternGridOf } from "../../../../generator/site/patternGrid";

export const getStaticPaths = (async () => (await allEntries()).filter(isOk).map((entry) => ({ params: { id: entry.id }, props: { entry } }))) satisfies GetStaticPaths;

export const GET: APIRoute = ({ props }) => new Response(JSON.stringify(patternGridOf((props as { entry: OkEntry }).entry)), { headers: { "Content-Type": "application/json" } });
