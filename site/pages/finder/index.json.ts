// The finder's index: one small record per buildable design.
import type { APIRoute } from "astro";
import { allBands, allEntries } from "../../data";
import { finderIndex } from "../../../generator/site/finder";

export const GET: APIRoute = async () =>
  new Response(JSON.stringify(finderIndex(await allBands(), await allEntries())), { headers: { "Content-Type": "application/json" } });
