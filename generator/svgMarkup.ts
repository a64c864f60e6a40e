// SVG markup shared by the export templates and the plot renderers: escaping for character data and
// attribute values, and an element writer whose attribute order is the order given (byte-stable).

/** Characters XML 1.0 forbids outright (C0 controls except tab, LF, CR; U+FFFE/U+FFFF). */
const FORBIDDEN_XML = /[\u0000-\u0008\u000B\u000C\u000E-\u001F\uFFFE\uFFFF]/g;

/** Escapes &, <, >, " and ' and replaces characters XML cannot hold with U+FFFD. */
export function escapeXml(text: string): string {
  return text
    .replace(FORBIDDEN_XML, "\uFFFD")
    .replace(/&/g, "&amp;")
    .replace(/</g, "&lt;")
    .replace(/>/g, "&gt;")
    .replace(/"/g, "&quot;")
    .replace(/'/g, "&#39;");
}

export type Attrs = Record<string, string | number | undefined>;

/** Writes an element with numbers in attributes formatted by `formatNumber`. */
export function svgElement(name: string, attrs: Attrs, children: string | undefined, formatNumber: (v: number) => string): string {
  let a = "";
  for (const [key, value] of Object.entries(attrs)) {
    if (value === undefined) continue;
    a += ` ${key}="${typeof value === "number" ? formatNumber(value) : escapeXml(value)}"`;
  }
  return children === undefined ? `<${name}${a}/>` : `<${name}${a}>${children}</${name}>`;
}
