// The printed scale check at the foot of every template page: a 100 mm bar and a 4 in bar, with
// the instruction to measure it. Drawn in millimetre user units starting at (x, y).
import { el, text } from "./svgText.js";

export const SCALE_BAR_MM = 100;
export const SCALE_BAR_IN_MM = 4 * 25.4; // 4 international inches
export const SCALE_CAPTION =
  "measure this bar: it must be 100 mm; if not, set printing to 100 % / actual size";

const BAR_HEIGHT = 3;
const LABEL = { "font-size": 2.5 };

/** Alternating black and white cells along a bar, with an outline of class `cls`. */
function bar(x: number, y: number, cells: number, cellMm: number, cls: string): string {
  let out = "";
  for (let i = 0; i < cells; i += 2) {
    out += el("rect", { x: x + i * cellMm, y, width: cellMm, height: BAR_HEIGHT, fill: "#000" });
  }
  out += el("rect", {
    class: cls,
    x,
    y,
    width: cells * cellMm,
    height: BAR_HEIGHT,
    fill: "none",
    stroke: "#000",
    "stroke-width": 0.2,
  });
  return out;
}

/** Scale bars, caption and a short legend; occupies about 30 mm × 160 mm. */
export function scaleBlock(x: number, y: number, legend: readonly string[]): string {
  let out = "";
  // 100 mm bar in 10 mm cells, labels above.
  const mmY = y + 5;
  out += bar(x, mmY, 10, 10, "scale-bar-mm");
  out += text(x, mmY - 1, "0", { ...LABEL, "text-anchor": "middle" });
  out += text(x + 50, mmY - 1, "50", { ...LABEL, "text-anchor": "middle" });
  out += text(x + SCALE_BAR_MM, mmY - 1, "100 mm", { ...LABEL, "text-anchor": "middle" });
  // 4 in bar in quarter-inch cells, labels below.
  const inY = mmY + BAR_HEIGHT + 3;
  out += bar(x, inY, 16, SCALE_BAR_IN_MM / 16, "scale-bar-in");
  for (let inch = 0; inch <= 4; inch++) {
    const label = inch === 4 ? "4 in" : String(inch);
    out += text(x + inch * 25.4, inY + BAR_HEIGHT + 3, label, { ...LABEL, "text-anchor": "middle" });
  }
  out += text(x, inY + BAR_HEIGHT + 9, SCALE_CAPTION, { "font-size": 3, "font-weight": "bold" });
  legend.forEach((line, i) => {
    out += text(x + SCALE_BAR_IN_MM + 8, mmY + 1 + i * 4, line, LABEL);
  });
  return el("g", { class: "scale" }, out);
}
