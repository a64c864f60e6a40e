// The catalog's own look, chosen once for every drawing: a calm paper ground, deep teal for the
// wire and SWR, warm orange for the main lobe and gain, slate greys for grids and secondary text.
export const PALETTE = {
  paper: "#fbfaf7",
  ink: "#24313a",
  inkSoft: "#5d6d79",
  grid: "#d3dadf",
  gridStrong: "#97a5af",
  wire: "#145c5a",
  wireSoft: "#7fb2ae",
  feed: "#24313a",
  lobe: "#d4762a",
  lobeSoft: "#f2c9a2",
  lobeDeep: "#9c4f12",
  band: "#efe5cf",
  floor: "#dfe6ea",
} as const;

/** Generic families only, so the SVG needs no font files. */
export const FONT_FAMILY = "system-ui, sans-serif";

/** Font sizes in viewBox units; drawings are laid out at about 1 unit = 1 px. */
export const FONT = { label: 13, small: 11.5, caption: 13, heading: 15 } as const;

const rgb = (hex: string): [number, number, number] => [1, 3, 5].map((i) => parseInt(hex.slice(i, i + 2), 16)) as [number, number, number];
const hex = (c: number[]): string => `#${c.map((v) => Math.round(Math.max(0, Math.min(255, v))).toString(16).padStart(2, "0")).join("")}`;

/** Linear blend of two #rrggbb colours, t = 0 gives a, t = 1 gives b; `dim` scales the result. */
export function mixColour(a: string, b: string, t: number, dim = 1): string {
  const ca = rgb(a), cb = rgb(b);
  return hex(ca.map((v, i) => (v + (cb[i] - v) * t) * dim));
}
