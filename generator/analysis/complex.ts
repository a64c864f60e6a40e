// Minimal complex arithmetic for impedances and reflection coefficients (textbook identities:
// (a+jb)(c+jd) = (ac−bd) + j(ad+bc); (a+jb)/(c+jd) = (a+jb)(c−jd)/(c²+d²); |a+jb| = √(a²+b²)).
// Values are plain {re, im} objects so they serialise to JSON unchanged.

export interface Complex {
  re: number;
  im: number;
}

export function complex(re: number, im = 0): Complex {
  return { re, im };
}

export function add(a: Complex, b: Complex): Complex {
  return { re: a.re + b.re, im: a.im + b.im };
}

export function sub(a: Complex, b: Complex): Complex {
  return { re: a.re - b.re, im: a.im - b.im };
}

export function mul(a: Complex, b: Complex): Complex {
  return { re: a.re * b.re - a.im * b.im, im: a.re * b.im + a.im * b.re };
}

/** a / b. Division by exactly zero gives non-finite parts (IEEE arithmetic), not an error. */
export function div(a: Complex, b: Complex): Complex {
  const d = b.re * b.re + b.im * b.im;
  return {
    re: (a.re * b.re + a.im * b.im) / d,
    im: (a.im * b.re - a.re * b.im) / d,
  };
}

export function abs(a: Complex): number {
  return Math.hypot(a.re, a.im);
}

export function conj(a: Complex): Complex {
  return { re: a.re, im: -a.im };
}

/** Throws `<name> must have finite re and im (got …)` unless both parts are finite numbers. */
export function requireFiniteComplex(name: string, z: Complex): void {
  if (
    z === null ||
    typeof z !== "object" ||
    !Number.isFinite(z.re) ||
    !Number.isFinite(z.im)
  ) {
    throw new Error(`${name} must have finite re and im (got ${formatComplex(z)})`);
  }
}

/** Short human form, e.g. "200-100j"; tolerant of malformed input (used in messages). */
export function formatComplex(z: Complex): string {
  if (z === null || typeof z !== "object") return String(z);
  const sign = z.im < 0 || Object.is(z.im, -0) ? "-" : "+";
  return `${z.re}${sign}${Math.abs(z.im)}j`;
}

/** Throws one line unless value is a positive finite number. */
export function requirePositiveFinite(name: string, value: number): void {
  if (typeof value !== "number" || !Number.isFinite(value) || value <= 0) {
    throw new Error(`${name} must be a positive finite number (got ${value})`);
  }
}
