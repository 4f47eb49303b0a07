import type { MetricPath } from '../metrics/types.js';
import { formatMetric } from '../format/metric-format.js';
import { formatNumber, percentChange } from '../format/units.js';
import type { Limit } from './judging.js';

/** Which bounds of `limit` the head value (and its change over base) crosses, and whether any was judged. */
export function checkLimit(
  limit: Limit,
  base: number | null,
  head: number | null,
  metric: MetricPath | null = null,
): { crossed: string[]; judged: boolean } {
  const crossed: string[] = [];
  let judged = false;
  if (head !== null) {
    if (limit.max !== undefined) {
      judged = true;
      if (head > limit.max)
        crossed.push(
          `above the maximum ${metric ? formatMetric(metric, limit.max) : formatNumber(limit.max, 6)}`,
        );
    }
    if (limit.min !== undefined) {
      judged = true;
      if (head < limit.min)
        crossed.push(
          `below the minimum ${metric ? formatMetric(metric, limit.min) : formatNumber(limit.min, 6)}`,
        );
    }
  }
  if (limit.maxIncreasePct !== undefined && base !== null && head !== null) {
    const pct = percentChange(base, head);
    judged = true;
    if (pct === null ? head > base : pct > limit.maxIncreasePct) {
      crossed.push(
        `${pct === null ? 'up from 0' : `up ${formatNumber(pct, 3)} %`} over base, more than the ${formatNumber(limit.maxIncreasePct, 3)} % allowed`,
      );
    }
  }
  return { crossed, judged };
}
