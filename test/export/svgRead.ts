// Small regex readers for the SVG pages our template writer produces (tests only).

export interface Rect {
  x: number;
  y: number;
  width: number;
  height: number;
}

function attr(tag: string, name: string): string {
  const m = new RegExp(`\\s${name}="([^"]*)"`).exec(tag);
  if (!m) throw new Error(`attribute ${name} missing in ${tag.slice(0, 80)}`);
  return m[1];
}

const num = (tag: string, name: string): number => Number(attr(tag, name));

function tags(svg: string, pattern: RegExp): string[] {
  return [...svg.matchAll(pattern)].map((m) => m[0]);
}

/** Width and height attributes in mm and the viewBox numbers. */
export function pageSize(svg: string): { widthMm: number; heightMm: number; viewBox: number[] } {
  const root = tags(svg, /<svg\s[^>]*>/g)[0];
  const width = attr(root, "width");
  const height = attr(root, "height");
  if (!width.endsWith("mm") || !height.endsWith("mm")) throw new Error("width/height not in mm");
  return {
    widthMm: Number(width.slice(0, -2)),
    heightMm: Number(height.slice(0, -2)),
    viewBox: attr(root, "viewBox").split(" ").map(Number),
  };
}

/** The drawing window of a page, drawing coordinates. */
export function windowRect(svg: string): Rect {
  const tag = tags(svg, /<rect id="window-rect"[^>]*>/g)[0];
  return { x: num(tag, "x"), y: num(tag, "y"), width: num(tag, "width"), height: num(tag, "height") };
}

/** The translate() that places drawing coordinates on the page. */
export function drawingOffset(svg: string): { dx: number; dy: number } {
  const m = /<g id="drawing" transform="translate\(([-\d.]+) ([-\d.]+)\)"/.exec(svg);
  if (!m) throw new Error("drawing group missing");
  return { dx: Number(m[1]), dy: Number(m[2]) };
}

/** Vertex dots keyed "wire/vertex", drawing coordinates. */
export function vertexDots(svg: string): Map<string, { x: number; y: number }> {
  const out = new Map<string, { x: number; y: number }>();
  for (const tag of tags(svg, /<circle class="vertex"[^>]*>/g)) {
    out.set(`${attr(tag, "data-wire")}/${attr(tag, "data-vertex")}`, { x: num(tag, "cx"), y: num(tag, "cy") });
  }
  return out;
}

/** The first <rect> with the given class. */
export function rectByClass(svg: string, cls: string): Rect {
  const tag = tags(svg, new RegExp(`<rect [^>]*class="${cls}"[^>]*>`, "g"))[0];
  if (!tag) throw new Error(`no rect of class ${cls}`);
  return { x: num(tag, "x"), y: num(tag, "y"), width: num(tag, "width"), height: num(tag, "height") };
}

/** Character data of the first <text> with the given class. */
export function textByClass(svg: string, cls: string): string {
  const m = new RegExp(`<text [^>]*class="${cls}"[^>]*>([^<]*)</text>`).exec(svg);
  if (!m) throw new Error(`no text of class ${cls}`);
  return m[1];
}
