/**
 * Integer positions rounded into a number format, `fl_D(p)` (docs/metrics.md, number formats).
 * Counted per binade in closed form: `fl_D` is monotone, so no position is visited.
 */
import type { FloatFormat } from '../model.js';
import { overflowThreshold, roundToFormat, significantBits } from './float-format.js';
import { isCount } from './sizes.js';

/** token: first position `p` with `fl_D(p)` infinite, `ceil((2 - 2^-p) 2^emax)` (binary16: 65520). */
export function positionOverflowStart(format: FloatFormat): number {
  return Math.ceil(overflowThreshold(format));
}

/**
 * count: integers in [0, x] that format D holds exactly: all up to `2^p`, then in each binade
 * `[2^e, 2^(e+1))` one in every `2^(e-p+1)` (IEEE 754-2008 §3.3). `x` a whole number below the
 * overflow threshold.
 */
export function representableIntegersUpTo(x: number, format: FloatFormat): number {
  const m = significantBits(format);
  const exact = 2 ** m;
  if (x <= exact) return x + 1;
  let total = exact + 1;
  for (let e = m; 2 ** e < x; e++) {
    const spacing = 2 ** (e - m + 1);
    const top = Math.min(x, 2 ** (e + 1));
    total += Math.floor((top - 2 ** e) / spacing);
  }
  return total;
}

/**
 * count: `collidingPositions`, positions p in [1, T) with `fl_D(p) == fl_D(p-1)`, overflowing
 * positions counted as colliding (docs/metrics.md). Below the overflow start N positions take
 * `representableIntegersUpTo(N-1)` distinct values, one more when `fl_D(N-1)` rounds up past
 * `N-1`; every other position repeats its predecessor's value. Null for `T` not a positive
 * whole number.
 */
export function collidingPositions(format: FloatFormat, span: number): number | null {
  if (!isCount(span)) return null;
  const start = positionOverflowStart(format);
  const n = Math.min(span, start);
  const distinct =
    representableIntegersUpTo(n - 1, format) + (roundToFormat(n - 1, format) > n - 1 ? 1 : 0);
  return n - distinct + (span > start ? span - start : 0);
}
