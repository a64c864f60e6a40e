// Every URL the site writes, in one place, relative to the base path it is built for (BENTWIRE_BASE,
// "/" by default, "/club/atlas/" for a club server). Pages pass import.meta.env.BASE_URL in.

/** The base with exactly one slash at each end: "/", "/club/atlas/". */
export function normalBase(base: string): string {
  const inner = base.split("/").filter(Boolean).join("/");
  return inner ? `/${inner}/` : "/";
}

/** A site URL: `at("/club/atlas", "designs/x/")` → "/club/atlas/designs/x/". */
export function at(base: string, path = ""): string {
  return normalBase(base) + path.replace(/^\/+/, "");
}

export const PLOTS = ["shape.svg", "pattern-phi.svg", "pattern-theta.svg", "pattern-3d.svg", "sweep.svg", "smith.svg"] as const;
/** Rasters: the shape thumbnail, the share card, and the 3D view as WebP for the page (its SVG is heavy). */
export const RASTERS = ["thumb.png", "card.png", "pattern-3d.webp"] as const;
export type PlotFile = (typeof PLOTS)[number] | (typeof RASTERS)[number];

export const paths = {
  home: "",
  band: (bandId: string) => `bands/${bandId}/`,
  design: (id: string) => `designs/${id}/`,
  plot: (id: string, file: PlotFile) => `designs/${id}/${file}`,
  patternGrid: (id: string) => `designs/${id}/pattern-grid.json`,
  thumb: (id: string) => `designs/${id}/thumb.png`,
  card: (id: string) => `designs/${id}/card.png`,
  file: (id: string, name: string) => `designs/${id}/files/${name}`,
  sheets: (id: string, paper: string) => `designs/${id}/template-${paper}/`,
  finder: "finder/",
  finderIndex: "finder/index.json",
  compare: (ids: readonly string[] = []) => (ids.length ? `compare/?ids=${ids.map(encodeURIComponent).join(",")}` : "compare/"),
  method: "method/",
  safety: "safety/",
  allChecksums: "downloads/SHA256SUMS",
  pagefind: "pagefind/pagefind.js",
} as const;
