// Sorting the band table in the browser: sort keys are written into the rows at build time.

/** Reads a sort key back from a data attribute: numbers stay numbers, "" means missing. */
export function readSortKey(text: string | null | undefined, numeric: boolean): number | string {
  if (!numeric) return text ?? "";
  if (text === null || text === undefined || text === "") return -Infinity;
  const v = Number(text);
  return Number.isFinite(v) ? v : -Infinity;
}

/** Compares two sort keys; missing numeric values (−∞) always go last. */
export function compareSortKeys(a: number | string, b: number | string, descending: boolean): number {
  if (typeof a === "number" && typeof b === "number") {
    if (a === b) return 0;
    if (a === -Infinity) return 1;
    if (b === -Infinity) return -1;
    return descending ? b - a : a - b;
  }
  const r = String(a) < String(b) ? -1 : String(a) > String(b) ? 1 : 0;
  return descending ? -r : r;
}

/** Row order after sorting by one column; ties keep the original order. */
export function sortedOrder(keys: readonly (number | string)[], descending: boolean): number[] {
  return keys.map((k, i) => ({ k, i })).sort((a, b) => compareSortKeys(a.k, b.k, descending) || a.i - b.i).map((x) => x.i);
}
