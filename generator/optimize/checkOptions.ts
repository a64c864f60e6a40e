// Option checks shared by the optimizers. Each failure throws one Error whose single line names
// the routine, the field and the rule, e.g. "cmaEs: sigma0 must be positive (got -1)".
// Stopping rule: not applicable (validation only).

export function checkFiniteVector(
  routine: string,
  field: string,
  value: readonly number[] | undefined,
  length?: number,
): number[] {
  if (!Array.isArray(value) || value.length === 0) {
    throw new Error(`${routine}: ${field} must be a non-empty array of numbers (got ${String(value)})`);
  }
  if (length !== undefined && value.length !== length) {
    throw new Error(`${routine}: ${field} must have length ${length} (got ${value.length})`);
  }
  value.forEach((v, i) => {
    if (typeof v !== "number" || !Number.isFinite(v)) {
      throw new Error(`${routine}: ${field}[${i}] must be a finite number (got ${String(v)})`);
    }
  });
  return [...value];
}

export function checkPositive(routine: string, field: string, value: number): number {
  if (typeof value !== "number" || !(value > 0) || !Number.isFinite(value)) {
    throw new Error(`${routine}: ${field} must be positive and finite (got ${String(value)})`);
  }
  return value;
}

export function checkNonNegative(routine: string, field: string, value: number): number {
  if (typeof value !== "number" || !(value >= 0) || !Number.isFinite(value)) {
    throw new Error(`${routine}: ${field} must be non-negative and finite (got ${String(value)})`);
  }
  return value;
}

/** Integer ≥ min; `Infinity` allowed when `allowInfinity` (an unlimited budget). */
export function checkInteger(
  routine: string,
  field: string,
  value: number,
  min: number,
  allowInfinity = false,
): number {
  const ok =
    typeof value === "number" &&
    ((allowInfinity && value === Infinity) || (Number.isSafeInteger(value) && value >= min));
  if (!ok) {
    throw new Error(`${routine}: ${field} must be an integer ≥ ${min} (got ${String(value)})`);
  }
  return value;
}

export function checkSeed(routine: string, seed: number): number {
  if (!Number.isSafeInteger(seed)) {
    throw new Error(`${routine}: seed must be a safe integer (got ${String(seed)})`);
  }
  return seed;
}

/** Target value: any number, −∞ (never reached) by default. NaN is rejected. */
export function checkTarget(routine: string, value: number): number {
  if (typeof value !== "number" || Number.isNaN(value)) {
    throw new Error(`${routine}: target must be a number (got ${String(value)})`);
  }
  return value;
}
