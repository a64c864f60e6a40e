import sharp from "sharp";
import { describe, expect, it } from "vitest";
import {
  LABEL_PAD_MM,
  SCALE_CAPTION,
  TEMPLATE_LAYOUT_MM,
  bendingTemplateSvgs,
  escapeXml,
} from "../../generator/export/index.js";
import type { ExportShape } from "../../generator/export/index.js";
import { smallShape, twoWireShape } from "./fixtures.js";
import { drawingOffset, pageSize, rectByClass, textByClass, vertexDots, windowRect } from "./svgRead.js";

const span = (shape: ExportShape, axis: 0 | 1): number => {
  const values = [...shape.wires.flatMap((w) => w.pointsM.map((p) => p[axis])), shape.feedPointM[axis]];
  return (Math.max(...values) - Math.min(...values)) * 1000;
};

describe("one-page bending template", () => {
  it("is a single page for a design that fits one sheet", () => {
    expect(bendingTemplateSvgs(smallShape)).toHaveLength(1);
  });

  it("has width and height in mm equal to the drawing's extent plus margins, with a matching viewBox", () => {
    for (const marginMm of [0, 5, 10]) {
      const [svg] = bendingTemplateSvgs(smallShape, { marginMm });
      const size = pageSize(svg);
      const { header, footer } = TEMPLATE_LAYOUT_MM;
      expect(size.widthMm).toBeCloseTo(span(smallShape, 0) + 2 * LABEL_PAD_MM + 2 * marginMm, 9);
      expect(size.heightMm).toBeCloseTo(span(smallShape, 1) + 2 * LABEL_PAD_MM + header + footer + 2 * marginMm, 9);
      expect(size.viewBox).toEqual([0, 0, size.widthMm, size.heightMm]);
    }
  });

  it("draws the wire at true size: vertex spacing in user units equals the input in mm", () => {
    const [svg] = bendingTemplateSvgs(smallShape);
    const dots = vertexDots(svg);
    const pts = smallShape.wires[0].pointsM;
    const first = dots.get("0/0")!;
    pts.forEach((p, j) => {
      const dot = dots.get(`0/${j}`)!;
      expect(dot.x - first.x).toBeCloseTo((p[0] - pts[0][0]) * 1000, 2);
      expect(dot.y - first.y).toBeCloseTo(-(p[1] - pts[0][1]) * 1000, 2); // y points down on paper
    });
  });

  it("has a scale bar exactly 100 mm long in user units, a 4 in bar and the printing caption", () => {
    const [svg] = bendingTemplateSvgs(smallShape);
    expect(rectByClass(svg, "scale-bar-mm").width).toBe(100);
    expect(rectByClass(svg, "scale-bar-in").width).toBe(101.6);
    expect(svg).toContain(SCALE_CAPTION);
    expect(SCALE_CAPTION).toBe("measure this bar: it must be 100 mm; if not, set printing to 100 % / actual size");
  });

  it("labels every piece with its length in mm and every bend with its angle", () => {
    const [svg] = bendingTemplateSvgs(smallShape);
    const lengths = [...svg.matchAll(/class="piece-length"[^>]*>([^<]*)</g)].map((m) => m[1]);
    expect(lengths).toEqual(["100.1 mm", "93.9 mm", "93.9 mm", "100.1 mm"]);
    const bends = [...svg.matchAll(/class="bend-angle"[^>]*>([^<]*)</g)].map((m) => m[1]);
    // the two outer bends only: the feed vertex is labelled as the feed, never as a bend
    expect(bends).toHaveLength(2);
    // At the feed the two arms meet at 2·atan(85/40) inside (plane geometry of the test shape).
    const inside = (2 * Math.atan2(85, 40) * 180) / Math.PI;
    const feed = /class="feed-label"[^>]*>([^<]*)</.exec(svg)![1];
    expect(feed).toBe(`FEED · arms ${inside.toFixed(1)}° apart`);
  });

  it("shows the title, the id and a row/column label", () => {
    const [svg] = bendingTemplateSvgs(smallShape);
    expect(textByClass(svg, "title")).toBe(smallShape.title);
    expect(textByClass(svg, "facts")).toContain(smallShape.id);
    expect(textByClass(svg, "page-label")).toBe("R1 C1");
  });

  it("escapes hostile text in the title and id", async () => {
    const hostile = {
      ...twoWireShape,
      title: `<script>alert("x")</script> & 'quote'`,
      id: `id"><img src=x onerror=1>`,
    };
    for (const svg of bendingTemplateSvgs(hostile)) {
      expect(svg).not.toContain("<script");
      expect(svg).not.toContain("<img");
      expect(textByClass(svg, "title")).toBe(
        "&lt;script&gt;alert(&quot;x&quot;)&lt;/script&gt; &amp; &#39;quote&#39;",
      );
      await expect(sharp(Buffer.from(svg)).png().toBuffer()).resolves.toBeInstanceOf(Buffer);
    }
    expect(escapeXml("a\u0000b")).toBe("a\uFFFDb");
  });

  it("places the drawing window inside the margins", () => {
    const [svg] = bendingTemplateSvgs(smallShape, { marginMm: 12 });
    const size = pageSize(svg);
    const win = windowRect(svg);
    const { dx, dy } = drawingOffset(svg);
    expect(win.x + dx).toBeGreaterThanOrEqual(12);
    expect(win.y + dy).toBeGreaterThanOrEqual(12);
    expect(win.x + dx + win.width).toBeLessThanOrEqual(size.widthMm - 12 + 1e-9);
    expect(win.y + dy + win.height).toBeLessThanOrEqual(size.heightMm - 12 + 1e-9);
  });

  it("draws the optional 10 mm grid only when asked", () => {
    expect(bendingTemplateSvgs(smallShape)[0]).not.toContain('class="grid"');
    expect(bendingTemplateSvgs(smallShape, { grid: true })[0]).toContain('class="grid"');
  });

  it("rejects a shape that leaves the x-y plane and unknown options, naming the field", () => {
    const tilted = { ...smallShape, wires: [{ pointsM: [[0, 0, 0], [0.1, 0, 0.01]] as [number, number, number][] }] };
    expect(() => bendingTemplateSvgs(tilted)).toThrow(/^export shape: wires\[0\]\.pointsM\[1\]\[2\]: must be 0/);
    expect(() => bendingTemplateSvgs(smallShape, { paper: "a3" as "a4" })).toThrow(/paper: must be "a4" or "letter"/);
    expect(() => bendingTemplateSvgs(smallShape, { marginMm: -1 })).toThrow(/marginMm: must be a number/);
  });
});
