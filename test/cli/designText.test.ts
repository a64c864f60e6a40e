// The design report's words: turn signs said in words, no "-0.0", the overall span of the wire.
import { describe, expect, it } from "vitest";
import { spanOf, turnWords, TURN_CONVENTION } from "../../generator/cli/designText.js";
import { fixed } from "../../generator/cli/format.js";

describe("design text", () => {
  it("says which way a turn goes and never prints a signed zero", () => {
    expect(turnWords(12.34)).toBe("+12.3° (clockwise)");
    expect(turnWords(-7.05)).toBe("−7.0° (counter-clockwise)"); // toFixed rounds the binary value 7.0499…
    expect(turnWords(-0.02)).toBe("0.0° (straight on)");
    expect(fixed(-0.04, 1)).toBe("0.0");
    expect(fixed(-0.0, 2)).toBe("0.00");
    expect(fixed(-0.06, 1)).toBe("-0.1");
    expect(TURN_CONVENTION).toContain("clockwise");
  });

  it("measures the span across and along the axis over all wires", () => {
    // a V of two 1 m arms at ±60° from +y (plane trigonometry): across 2 sin 60° = √3 m, along cos 60° = 0.5 m
    const s = Math.sin(Math.PI / 3), c = Math.cos(Math.PI / 3);
    const shape = { frequencyHz: 1e8, wireRadiusM: 1e-3, wires: [{ pointsM: [[-s, c, 0], [0, 0, 0], [s, c, 0]] as [number, number, number][] }], feed: { wire: 0, vertex: 1 } };
    const span = spanOf(shape as never);
    expect(span.xM).toBeCloseTo(Math.sqrt(3), 12);
    expect(span.yM).toBeCloseTo(0.5, 12);
  });
});
