/**
 * Device memory as a function of the span, for charts (the `memoryBytes` of METRICS.md at any span).
 */
import type { ModelSpec } from '../model.js';
import { cacheBytesAtSpan } from './kv-cache.js';
import { DEFAULT_RESERVE, memoryBytes, weightBytes } from './memory-fit.js';
import { parameterCounts } from './parameter-count.js';
import { positiveCount, positiveFinite } from './sizes.js';

/** bytes: `weightBytes + cacheBytesAtSpan` with T = `span`; null for degenerate input. */
export function memoryAtSpan(spec: ModelSpec, span: number): number | null {
  const t = positiveCount(span);
  const counts = parameterCounts(spec);
  return memoryBytes(weightBytes(spec, counts ? counts.params : null), cacheBytesAtSpan(spec, t));
}

/** bytes: `deviceGiB · 2^30 · (1 - reserve)`, null without a device budget (reserve default: `0.1`). */
export function usableDeviceBytes(spec: ModelSpec): number | null {
  const device = positiveFinite(spec.serving?.deviceGiB);
  const stated = spec.serving?.reserve;
  const reserve = stated === null || stated === undefined ? DEFAULT_RESERVE : stated;
  if (device === null || !(Number.isFinite(reserve) && reserve >= 0 && reserve < 1)) return null;
  return device * 2 ** 30 * (1 - reserve);
}
