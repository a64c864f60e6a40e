// A small XML well-formedness check for the renderers' SVGs (XML 1.0 §2.1, §3.1, §4.1 in brief):
// one root element, every start tag closed in order, attributes quoted and unique, and no raw
// "<" or stray "&" in text or attribute values. Returns the problem, or null when well formed.
const NAME = /^[A-Za-z_][\w.:-]*/;
const ENTITY = /^&(amp|lt|gt|quot|apos|#\d+|#x[0-9a-fA-F]+);/;

function checkText(s: string, where: string): string | null {
  for (let i = 0; i < s.length; i++) {
    if (s[i] === "<") return `raw "<" in ${where}`;
    if (s[i] === "&" && !ENTITY.test(s.slice(i))) return `stray "&" in ${where}`;
  }
  return null;
}

export function xmlProblem(xml: string): string | null {
  const stack: string[] = [];
  let i = 0, roots = 0;
  const src = xml.replace(/^<\?xml[^?]*\?>/, "");
  while (i < src.length) {
    const lt = src.indexOf("<", i);
    const textPart = lt < 0 ? src.slice(i) : src.slice(i, lt);
    const bad = checkText(textPart, "text");
    if (bad) return bad;
    if (stack.length === 0 && textPart.trim() !== "") return "text outside the root element";
    if (lt < 0) break;
    if (src.startsWith("<!--", lt)) { const end = src.indexOf("-->", lt); if (end < 0) return "unclosed comment"; i = end + 3; continue; }
    const gt = src.indexOf(">", lt);
    if (gt < 0) return "unclosed tag";
    const tag = src.slice(lt + 1, gt);
    if (tag.startsWith("/")) {
      const name = tag.slice(1).trim();
      if (stack.pop() !== name) return `mismatched </${name}>`;
    } else {
      const selfClosing = tag.endsWith("/");
      const body = selfClosing ? tag.slice(0, -1) : tag;
      const m = NAME.exec(body);
      if (!m) return `bad tag name in <${tag.slice(0, 20)}`;
      let rest = body.slice(m[0].length);
      const seen = new Set<string>();
      for (;;) {
        rest = rest.replace(/^\s+/, "");
        if (rest === "") break;
        const a = /^([A-Za-z_][\w.:-]*)\s*=\s*("([^"]*)"|'([^']*)')/.exec(rest);
        if (!a) return `bad attribute in <${m[0]}>: ${rest.slice(0, 30)}`;
        if (seen.has(a[1])) return `duplicate attribute ${a[1]} in <${m[0]}>`;
        seen.add(a[1]);
        const badValue = checkText(a[3] ?? a[4], `attribute ${a[1]}`);
        if (badValue) return badValue;
        rest = rest.slice(a[0].length);
      }
      if (stack.length === 0) roots++;
      if (roots > 1) return "more than one root element";
      if (!selfClosing) stack.push(m[0]);
    }
    i = gt + 1;
  }
  if (stack.length) return `unclosed <${stack[stack.length - 1]}>`;
  return roots === 1 ? null : "no root element";
}
