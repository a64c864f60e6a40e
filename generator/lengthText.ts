// Lengths in builder's words for messages: metres from 1 m up, millimetres below, with four
// significant digits (two below 1 mm, three decimals below 0.01 mm), so a shortfall of a fraction
// of a millimetre still shows.
export function lengthText(m: number): string {
  if (m >= 1) return `${m.toPrecision(4)} m`;
  const mm = m * 1000;
  return `${mm >= 1 ? mm.toPrecision(4) : mm >= 0.01 ? mm.toPrecision(2) : mm.toFixed(3)} mm`;
}
