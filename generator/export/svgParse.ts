// A reader for the SVG this folder writes (svgText.ts): elements with attributes, nesting and
// escaped character data, nothing else (no CSS, no entities beyond the five XML ones). It is not
// a general SVG parser; the template PDF uses it so its pages are drawn from the very same sheets.

export interface SvgNode {
  name: string;
  attrs: Record<string, string>;
  children: SvgNode[];
  /** Character data directly inside the element (for <text> and <title>). */
  text: string;
}

const XML_ENTITIES: Record<string, string> = { amp: "&", lt: "<", gt: ">", quot: '"', apos: "'", "#39": "'" };
const unescape = (s: string): string => s.replace(/&(amp|lt|gt|quot|apos|#39);/g, (_, e: string) => XML_ENTITIES[e]);

const TOKEN = /<\?[^>]*\?>|<!--[\s\S]*?-->|<(\/?)([a-zA-Z][\w:-]*)((?:\s+[\w:-]+="[^"]*")*)\s*(\/?)>|([^<]+)/g;
const ATTR = /([\w:-]+)="([^"]*)"/g;

/** The root element of an SVG document written by svgText.ts. Throws on markup it does not know. */
export function parseSvg(svg: string): SvgNode {
  const root: SvgNode = { name: "#root", attrs: {}, children: [], text: "" };
  const stack = [root];
  for (const m of svg.matchAll(TOKEN)) {
    const [, close, name, attrText, selfClose, chars] = m;
    const top = stack[stack.length - 1];
    if (chars !== undefined) {
      top.text += unescape(chars);
    } else if (name === undefined) {
      continue; // declaration or comment
    } else if (close) {
      if (top.name !== name) throw new Error(`parseSvg: </${name}> closes <${top.name}>`);
      stack.pop();
    } else {
      const attrs: Record<string, string> = {};
      for (const a of (attrText ?? "").matchAll(ATTR)) attrs[a[1]] = unescape(a[2]);
      const node: SvgNode = { name, attrs, children: [], text: "" };
      top.children.push(node);
      if (!selfClose) stack.push(node);
    }
  }
  if (stack.length !== 1) throw new Error(`parseSvg: <${stack[stack.length - 1].name}> is not closed`);
  const svgRoot = root.children.find((c) => c.name === "svg");
  if (!svgRoot) throw new Error("parseSvg: no <svg> element");
  return svgRoot;
}

/** Every node below `node` (depth first), for look-ups such as clip paths by id. */
export function allNodes(node: SvgNode): SvgNode[] {
  return [node, ...node.children.flatMap(allNodes)];
}
