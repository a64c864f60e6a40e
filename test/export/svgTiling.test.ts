import { describe, expect, it } from "vitest";
import { PAPER_MM, bendingTemplateSvgs, planBendingTemplate } from "../../generator/export/index.js";
import type { ExportShape } from "../../generator/export/index.js";
import { longShape } from "./fixtures.js";
import { drawingOffset, pageSize, rectByClass, textByClass, vertexDots, windowRect } from "./svgRead.js";

const inside = (p: { x: number; y: number }, r: { x: number; y: number; width: number; height: number }) =>
  p.x >= r.x && p.x <= r.x + r.width && p.y >= r.y && p.y <= r.y + r.height;

/** A straight 3 m wire: longer than any sheet. */
const straight3m: ExportShape = {
  ...longShape,
  id: "straight-3m",
  wires: [{ pointsM: [[-1.5, 0, 0], [0, 0, 0], [1.5, 0, 0]] }],
};

describe("tiled bending template", () => {
  for (const shape of [straight3m, longShape]) {
    it(`tiles ${shape.id} over several A4 sheets of true A4 size`, () => {
      const pages = bendingTemplateSvgs(shape, { paper: "a4" });
      expect(pages.length).toBeGreaterThan(1);
      for (const svg of pages) {
        const { widthMm, heightMm, viewBox } = pageSize(svg);
        expect([widthMm, heightMm].sort((a, b) => a - b)).toEqual([210, 297]);
        expect(viewBox).toEqual([0, 0, widthMm, heightMm]);
      }
    });

    it(`shows every vertex of ${shape.id} on at least one page`, () => {
      const pages = bendingTemplateSvgs(shape);
      const seen = new Set<string>();
      for (const svg of pages) {
        const win = windowRect(svg);
        for (const [key, dot] of vertexDots(svg)) if (inside(dot, win)) seen.add(key);
      }
      const all = shape.wires.flatMap((w, wi) => w.pointsM.map((_, j) => `${wi}/${j}`));
      expect([...seen].sort()).toEqual(all.sort());
    });
  }

  it("puts a row/column label, cut guides and the 100 mm scale bar on every page", () => {
    const pages = bendingTemplateSvgs(longShape);
    const plan = planBendingTemplate(longShape);
    expect(plan.tiled).toBe(true);
    pages.forEach((svg, i) => {
      expect(textByClass(svg, "page-label")).toBe(plan.pages[i].label);
      expect(textByClass(svg, "page-label")).toMatch(/^R\d+ C\d+$/);
      expect(rectByClass(svg, "scale-bar-mm").width).toBe(100);
      expect(svg).toContain('class="window-frame"');
    });
    expect(pages.filter((svg) => svg.includes('class="overlap"')).length).toBeGreaterThan(0);
    expect(pages.filter((svg) => svg.includes("cut along this edge")).length).toBeGreaterThan(0);
  });

  it("makes neighbouring windows overlap and keeps each window inside the margins", () => {
    const pages = bendingTemplateSvgs(straight3m, { marginMm: 10 });
    const wins = pages.map(windowRect);
    for (let i = 1; i < wins.length; i++) {
      if (wins[i].y !== wins[i - 1].y) continue;
      expect(wins[i].x).toBeLessThan(wins[i - 1].x + wins[i - 1].width);
    }
    for (const svg of pages) {
      const { widthMm, heightMm } = pageSize(svg);
      const win = windowRect(svg);
      const { dx, dy } = drawingOffset(svg);
      expect(win.x + dx).toBeCloseTo(10, 9);
      expect(win.x + dx + win.width).toBeCloseTo(widthMm - 10, 9);
      expect(win.y + dy + win.height).toBeLessThanOrEqual(heightMm - 10);
    }
  });

  it("uses Letter sheets when asked", () => {
    for (const svg of bendingTemplateSvgs(straight3m, { paper: "letter" })) {
      const { widthMm, heightMm } = pageSize(svg);
      const { width, height } = PAPER_MM.letter;
      expect([widthMm, heightMm].sort((a, b) => a - b)).toEqual([width, height]);
    }
  });

  it("leaves out sheets with no wire near them but keeps the tiling grid labels", () => {
    const plan = planBendingTemplate(longShape);
    expect(plan.pages.length).toBeLessThan(plan.rows * plan.columns);
    const labels = plan.pages.map((p) => p.label);
    expect(new Set(labels).size).toBe(labels.length);
  });
});
