// Exact-kernel correction for collinear near segment pairs (self, neighbours on one straight run).
// The reduced kernel puts the source current on the wire axis: 1/√(u² + a²). The exact kernel
// spreads it uniformly round the surface and observes on the surface; its static part is the ring
// average (Werner, "A method of moments approach for the efficient and accurate modeling of
// moderately thick cylindrical wire antennas", IEEE Trans. AP-46, 1998; Wilton & Champagne,
// "Evaluation and integration of the thin wire kernel", IEEE Trans. AP-54, 2006 — from memory):
//   K_ex(u) = (1/2π)∫_0^{2π} dφ / √(u² + 4a² sin²(φ/2)) = (2/π) K(m) / √(u² + 4a²),  m = 4a²/(u² + 4a²),
// K the complete elliptic integral of the first kind, by the arithmetic–geometric mean
// K(m) = π / (2·AGM(1, √(1 − m))) (Abramowitz & Stegun 17.6). K_ex has a logarithmic singularity
// at u = 0 and agrees with the reduced kernel to O(a²/u³) for u ≫ a; the difference
//   D(u) = K_ex(u) − 1/√(u² + a²)
// is added to the static (1/R) part of the pair integrals. The dynamic part (e^{−jkR} − 1)/R is smooth
// and differs between the two kernels only at O((ka)²), so it keeps the reduced kernel.
// For collinear segments the double integral is one-dimensional in u = s − s':
//   ∬ f(s) g(s') D(s − s') ds ds' = ∫ D(u) W(u) du,  W(u) = ∫ f(s) g(s − u) ds,
// with W evaluated exactly (2-point Gauss–Legendre on a quadratic) and the u integral split at the
// singularity u = 0 and graded geometrically towards it (a standard treatment of a log singularity).
import { gaussLegendre01 } from "./gaussLegendre.js";

const UNIT_RULE = gaussLegendre01(4);
const OVERLAP_RULE = gaussLegendre01(2);
/** Geometric grading towards u = 0: intervals [A·2^−(k+1), A·2^−k], k < GRADING_LEVELS. */
const GRADING_LEVELS = 30;

/** Complete elliptic integral K(m) via the arithmetic–geometric mean, given m1 = 1 − m ∈ (0, 1]. */
export function ellipticKComplement(m1: number): number {
  let a = 1, b = Math.sqrt(m1);
  for (let i = 0; i < 60 && Math.abs(a - b) > 1e-15 * a; i++) {
    const an = 0.5 * (a + b);
    b = Math.sqrt(a * b);
    a = an;
  }
  return Math.PI / (a + b);
}

/** Ring-averaged static kernel of a wire of radius a at axial distance u (1/m). */
export function exactStaticKernel(u: number, radiusM: number): number {
  const d2 = u * u + 4 * radiusM * radiusM;
  return (2 / Math.PI) * ellipticKComplement((u * u) / d2) / Math.sqrt(d2); // 1 − m = u²/d², no cancellation
}

/** D(u) = K_ex(u) − 1/√(u² + a²). */
export function exactMinusReduced(u: number, radiusM: number): number {
  return exactStaticKernel(u, radiusM) - 1 / Math.sqrt(u * u + radiusM * radiusM);
}

/**
 * Adds ∬ t^α t'^β D(s − s') ds ds' (α, β ∈ {0, 1}) to the real parts of out = [K00, K10, K01, K11]
 * (re, im interleaved) for segment p = [0, lp] on its axis and q starting at axial position `q0`
 * running in direction `sense` (±1) for lq, both of radius `radiusM`.
 */
export function addCollinearCorrection(lp: number, q0: number, sense: number, lq: number, radiusM: number, out: Float64Array): void {
  // q covers s' ∈ [qa, qb]; s − s' spans [−qb, lp − qa]
  const qa = Math.min(q0, q0 + sense * lq), qb = Math.max(q0, q0 + sense * lq);
  const lo = -qb, hi = lp - qa;
  const w = new Float64Array(4);
  const acc = new Float64Array(4);
  const addAt = (u: number, weight: number) => {
    overlapWeights(u, lp, q0, sense, lq, w);
    const d = weight * exactMinusReduced(u, radiusM);
    for (let i = 0; i < 4; i++) acc[i] += d * w[i];
  };
  // the W kinks lie at u = s − s' for s ∈ {0, lp}, s' ∈ {qa, qb}: split there and at 0
  const cuts = [lo, hi, 0, -qa, lp - qb].filter((x) => x >= lo && x <= hi).sort((x, y) => x - y);
  for (let c = 0; c + 1 < cuts.length; c++) {
    const x0 = cuts[c], x1 = cuts[c + 1];
    if (!(x1 > x0)) continue;
    if (x0 === 0 || x1 === 0) {
      // graded towards u = 0: the log singularity, and D's scale a next to it
      const sign = x1 === 0 ? -1 : 1, len = x1 === 0 ? -x0 : x1;
      for (let k = 0; k < GRADING_LEVELS; k++) {
        const b = len * 2 ** -k, a = b / 2;
        gauss(a, b, (u, wt) => addAt(sign * u, wt));
      }
    } else {
      // D varies on the scale of a: subdivide so no piece is longer than its distance from 0 allows
      const pieces = Math.min(64, Math.max(1, Math.ceil((x1 - x0) / Math.max(radiusM, 0.5 * Math.min(Math.abs(x0), Math.abs(x1))))));
      for (let j = 0; j < pieces; j++) gauss(x0 + ((x1 - x0) * j) / pieces, x0 + ((x1 - x0) * (j + 1)) / pieces, addAt);
    }
  }
  out[0] += acc[0]; out[2] += acc[1]; out[4] += acc[2]; out[6] += acc[3];
}

function gauss(a: number, b: number, f: (u: number, weight: number) => void): void {
  const { t, w } = UNIT_RULE;
  for (let i = 0; i < t.length; i++) f(a + (b - a) * t[i], (b - a) * w[i]);
}

/** W(u) for the four weights: ∫ (s/lp)^α (t'(s − u))^β ds over s ∈ [0, lp] ∩ (q shifted by u). */
function overlapWeights(u: number, lp: number, q0: number, sense: number, lq: number, out: Float64Array): void {
  const qa = Math.min(q0, q0 + sense * lq), qb = Math.max(q0, q0 + sense * lq);
  const s0 = Math.max(0, qa + u), s1 = Math.min(lp, qb + u);
  out.fill(0);
  if (!(s1 > s0)) return;
  const { t, w } = OVERLAP_RULE;
  for (let i = 0; i < t.length; i++) {
    const s = s0 + (s1 - s0) * t[i];
    const ws = (s1 - s0) * w[i];
    const tp = s / lp;
    const tq = (sense * (s - u - q0)) / lq;
    out[0] += ws; out[1] += ws * tp; out[2] += ws * tq; out[3] += ws * tp * tq;
  }
}
