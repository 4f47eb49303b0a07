/**
 * ALiBi head slopes and the distance at which they fade a key out (Press et al. 2022, ALiBi, §3).
 */
import { positiveCount } from './sizes.js';

/** heads: most heads a slope list is built for; more is degenerate input (null). */
export const MAX_ALIBI_HEADS = 65536;

/** per token: `m_j = 2^(-8j/n)`, `j = 1..n` for n a power of two (Press et al. 2022, §3). */
function powerOfTwoSlopes(n: number): number[] {
  const slopes: number[] = [];
  for (let j = 1; j <= n; j++) slopes.push(2 ** ((-8 * j) / n));
  return slopes;
}

/**
 * per token: `alibiSlopes` for n heads: `2^(-8j/n)` for n a power of two (Press et al. 2022,
 * §3); otherwise the authors' published code (`get_slopes` in fairseq's
 * `models/transformer.py`): the slopes for the largest power of two `n0 < n`, then every other
 * slope of the `2 n0` sequence from the first, until n slopes. Null for n not a whole number in [1, MAX_ALIBI_HEADS].
 */
export function alibiSlopes(heads: number): number[] | null {
  const n = positiveCount(heads);
  if (n === null || n > MAX_ALIBI_HEADS) return null;
  const n0 = 2 ** Math.floor(Math.log2(n));
  if (n0 === n) return powerOfTwoSlopes(n);
  const extra = powerOfTwoSlopes(2 * n0).filter((_, j) => j % 2 === 0);
  return powerOfTwoSlopes(n0).concat(extra.slice(0, n - n0));
}

/**
 * tokens: `alibiHorizon = ceil(ln(10^4) / min_j m_j)`, the distance at which even the slowest head
 * scales a key's weight down by 10^4 (docs/metrics.md; the bias `-m·distance` of Press et al. 2022, §3).
 */
export function alibiHorizon(slopes: readonly number[] | null): number | null {
  if (slopes === null || slopes.length === 0) return null;
  let slowest = Infinity;
  for (const m of slopes) if (m < slowest) slowest = m;
  return slowest > 0 && Number.isFinite(slowest) ? Math.ceil(Math.log(1e4) / slowest) : null;
}
