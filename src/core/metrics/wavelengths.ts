/**
 * Wavelengths of frequency pairs, `λ_i = 2π/θ'_i` (Vaswani et al. 2017, §3.5; Peng et al. 2023,
 * YaRN, Eq. 13).
 */

import { elementAt } from '../element-at.js';

/** tokens: `min_i 2π/θ'_i` and `max_i 2π/θ'_i`; null for no pairs. */
export function wavelengthRange(theta: Float64Array): { fastest: number; slowest: number } | null {
  if (theta.length === 0) return null;
  let fastest = Infinity;
  let slowest = 0;
  for (const th of theta) {
    const lambda = (2 * Math.PI) / th;
    if (lambda < fastest) fastest = lambda;
    if (lambda > slowest) slowest = lambda;
  }
  return Number.isFinite(fastest) && Number.isFinite(slowest) ? { fastest, slowest } : null;
}

/** count: pairs with `2π/θ'_i > L0`: they never finish one turn over the trained span (docs/metrics.md). */
export function unturnedPairs(theta: Float64Array, trained: number): number {
  let n = 0;
  for (const th of theta) if ((2 * Math.PI) / th > trained) n++;
  return n;
}

/**
 * count: pairs with `θ_i L0 < 2π` and `θ'_i T > θ_i L0 (1 + 1e-9)`: at the span's end they reach
 * angles never seen in training (docs/metrics.md; the 1e-9 keeps rounding noise from counting).
 */
export function exposedPairs(
  theta: Float64Array,
  scaled: Float64Array,
  trained: number,
  span: number,
): number {
  let n = 0;
  for (const [i, th] of theta.entries()) {
    const seen = th * trained;
    if (seen < 2 * Math.PI && elementAt(scaled, i) * span > seen * (1 + 1e-9)) n++;
  }
  return n;
}
