// Words from an entry (title, band name, band note) are escaped wherever they land in an SVG,
// so a hostile entry cannot inject markup.
import { describe, expect, it } from "vitest";
import { pattern3dSvg, patternCutSvg, shapeSvg, smithSvg, sweepSvg } from "../../generator/render/index.js";
import { shareCardSvg } from "../../generator/render/shareCardPng.js";
import { hostile, okEntries } from "./fixtures.js";
import { xmlProblem } from "./xmlCheck.js";

const evil = hostile(okEntries()[0]);

describe("hostile text", () => {
  it.each([
    ["shapeSvg", () => shapeSvg(evil)],
    ["patternCutSvg", () => patternCutSvg(evil, "phi")],
    ["pattern3dSvg", () => pattern3dSvg(evil)],
    ["sweepSvg", () => sweepSvg(evil)],
    ["smithSvg", () => smithSvg(evil)],
  ])("is escaped in %s", (_name, render) => {
    const svg = render();
    expect(svg).not.toContain("<script");
    expect(svg).toContain("&lt;script&gt;alert(1)&lt;/script&gt; &amp; &quot;quotes&quot; &#39;too&#39;");
    expect(xmlProblem(svg)).toBeNull();
  });

  it("shows the escaped band name in the sweep caption", () => {
    expect(sweepSvg(evil)).toContain("Shaded: Band &lt;script&gt;");
  });

  it("cannot reach the share card's markup", async () => {
    const svg = await shareCardSvg(evil);
    expect(svg).not.toContain("<script");
    expect(svg).not.toContain("alert(1)");
  });
});
