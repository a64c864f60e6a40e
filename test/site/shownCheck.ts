// Shared by the browser tests: every number a page shows in a [data-field] element equals its
// entry field within the shown precision (half a unit of the last digit shown).
import { expect } from "vitest";
import type { Page } from "playwright-core";
import { parseShown, shownDecimals } from "../../generator/site/format.js";
import { SHOWN_UNITS, valueAt, type ShownUnit } from "../../generator/site/shown.js";
import type { Entry } from "../../generator/site/ok.js";

/** Checks every `[data-field]` under `selector` against `entry`; returns how many were checked. */
export async function expectShownEqualsEntry(page: Page, selector: string, entry: Entry): Promise<number> {
  const shown = await page.$$eval(`${selector} [data-field]`, (els) => els.map((e) => ({ field: e.getAttribute("data-field")!, unit: e.getAttribute("data-unit")!, text: e.textContent ?? "" })));
  for (const s of shown) {
    const value = valueAt(entry, s.field) as number;
    expect(typeof value, s.field).toBe("number");
    const scaled = value * SHOWN_UNITS[s.unit as ShownUnit];
    const tol = 0.5 * 10 ** -shownDecimals(s.text) + 1e-9 * Math.abs(scaled);
    expect(Math.abs(parseShown(s.text) - scaled), `${s.field} shown as "${s.text}"`).toBeLessThanOrEqual(tol);
  }
  return shown.length;
}
