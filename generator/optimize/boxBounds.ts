// Box constraints l ≤ x ≤ u: validation, clipping, and the periodic reflection that maps an
// unbounded search point into the box (the "mirroring" repair of Hansen, "The CMA Evolution
// Strategy: A Tutorial", arXiv:1604.00772, App. B.5 discusses repair and penalty approaches).
// Stopping rule: not applicable (pure maps).
//
// Reflection, coordinate-wise with width w = u − l:  t = (x − l) mod 2w,
// x' = l + (t ≤ w ? t : 2w − t). It is continuous, identity inside the box and periodic with
// period 2w, so the search distribution can stay unbounded; an optimum on a face is met by the
// mirrored landscape from both sides. With one finite bound: x' = l + |x − l| or u − |u − x|.

import { checkFiniteVector } from "./checkOptions.js";

export interface Box {
  /** Lower bounds; −Infinity where a coordinate has none. */
  lower: number[];
  /** Upper bounds; +Infinity where a coordinate has none. */
  upper: number[];
}

/**
 * Validates optional bound vectors of length n (entries may be ±Infinity, not NaN) and l < u.
 * Missing vectors mean unbounded.
 */
export function checkBox(
  routine: string,
  n: number,
  lowerBounds: readonly number[] | undefined,
  upperBounds: readonly number[] | undefined,
): Box {
  const lower = lowerBounds === undefined ? new Array<number>(n).fill(-Infinity) : [...lowerBounds];
  const upper = upperBounds === undefined ? new Array<number>(n).fill(Infinity) : [...upperBounds];
  for (const [field, v] of [["lowerBounds", lower], ["upperBounds", upper]] as const) {
    if (v.length !== n) throw new Error(`${routine}: ${field} must have length ${n} (got ${v.length})`);
    v.forEach((b, i) => {
      if (typeof b !== "number" || Number.isNaN(b)) {
        throw new Error(`${routine}: ${field}[${i}] must be a number (got ${String(b)})`);
      }
    });
  }
  for (let i = 0; i < n; i++) {
    if (!(lower[i] < upper[i]) || lower[i] === Infinity || upper[i] === -Infinity) {
      throw new Error(
        `${routine}: lowerBounds[${i}] must be below upperBounds[${i}] (got ${lower[i]} ≥ ${upper[i]})`,
      );
    }
  }
  return { lower, upper };
}

/** Checks x0 is finite, of length n and inside the box. */
export function checkStartInBox(routine: string, x0: readonly number[], box: Box): number[] {
  const x = checkFiniteVector(routine, "x0", x0, box.lower.length);
  x.forEach((v, i) => {
    if (v < box.lower[i] || v > box.upper[i]) {
      throw new Error(
        `${routine}: x0[${i}] must lie within [lowerBounds[${i}], upperBounds[${i}]] (got ${v} outside [${box.lower[i]}, ${box.upper[i]}])`,
      );
    }
  });
  return x;
}

export function clipToBox(x: readonly number[], box: Box): number[] {
  return x.map((v, i) => Math.min(box.upper[i], Math.max(box.lower[i], v)));
}

/** Periodic reflection of an unbounded point into the box (see header). */
export function reflectIntoBox(x: readonly number[], box: Box): number[] {
  return x.map((v, i) => {
    const l = box.lower[i];
    const u = box.upper[i];
    const lowFinite = Number.isFinite(l);
    const highFinite = Number.isFinite(u);
    let r: number;
    if (lowFinite && highFinite) {
      const w = u - l;
      const t = positiveMod(v - l, 2 * w); // t ∈ [0, 2w)
      r = l + (t <= w ? t : 2 * w - t); // mirror the second half-period
    } else if (lowFinite) {
      r = l + Math.abs(v - l);
    } else if (highFinite) {
      r = u - Math.abs(u - v);
    } else {
      r = v;
    }
    return Math.min(u, Math.max(l, r)); // guard against rounding just outside
  });
}

/**
 * Moves an internal point by whole periods 2w so each doubly bounded coordinate lies in
 * [l, l + 2w). reflectIntoBox gives the same image before and after, so only the stored number
 * changes; this keeps the unbounded internal mean from drifting far away.
 */
export function wrapIntoPeriod(x: readonly number[], box: Box): number[] {
  return x.map((v, i) => {
    const l = box.lower[i];
    const u = box.upper[i];
    if (!Number.isFinite(l) || !Number.isFinite(u)) return v;
    return l + positiveMod(v - l, 2 * (u - l));
  });
}

export function isInBox(x: readonly number[], box: Box): boolean {
  return x.every((v, i) => v >= box.lower[i] && v <= box.upper[i]);
}

function positiveMod(a: number, m: number): number {
  const r = a % m;
  return r < 0 ? r + m : r;
}
