// Fixed number formatting shared by the writers: the same number always gives the same text, and
// negative zero never shows as "-0".

/** `value` with exactly `decimals` decimals; "-0.000" becomes "0.000". */
export function fixed(value: number, decimals: number): string {
  if (!Number.isFinite(value)) throw new Error(`fixed: value must be finite (got ${value})`);
  const text = value.toFixed(decimals);
  return /^-0\.?0*$/.test(text) ? text.slice(1) : text;
}

/** Compact form for SVG attributes: at most 3 decimals, trailing zeros dropped ("12.5", "100"). */
export function svgNumber(value: number): string {
  const text = fixed(value, 3);
  return text.includes(".") ? text.replace(/\.?0+$/, "") : text;
}
