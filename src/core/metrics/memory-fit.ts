/**
 * Device memory: weights plus cache, and how many sequences fit (docs/metrics.md: `weightBytes`,
 * `memoryBytes`, `fitSequences`; common practice).
 */
import type { ModelSpec } from '../model.js';
import { positiveFinite } from './sizes.js';
import { bytesPerElement, weightDType } from './storage-bytes.js';

/**
 * Fraction of device memory kept free when the serving block states none (default: `0.1`): what a
 * serving runtime holds beside weights and cache (activations of the batch in flight, workspace and
 * communication buffers, allocator fragmentation). Common practice: runtimes commonly hand about
 * nine tenths of a device to weights and cache; a rule of thumb, not a measurement (README,
 * "Serve a large model across devices").
 */
export const DEFAULT_RESERVE = 0.1;

/** bytes: `weightBytes = params · bytes(weight dtype)` (weight dtype default: `bf16`). */
export function weightBytes(spec: ModelSpec, params: number | null): number | null {
  const bytes = bytesPerElement(weightDType(spec));
  if (params === null || bytes === null) return null;
  const w = params * bytes;
  return Number.isFinite(w) ? w : null;
}

/** bytes: `memoryBytes = weightBytes + cacheBytesAtSpan`. */
export function memoryBytes(weights: number | null, cache: number | null): number | null {
  if (weights === null || cache === null) return null;
  const m = weights + cache;
  return Number.isFinite(m) ? m : null;
}

/**
 * count: `fitSequences = floor((deviceBytes (1 - reserve) - weightBytes) / (cacheBytesAtSpan /
 * sequences))` with `deviceBytes = deviceGiB · 2^30` (docs/metrics.md); negative when the weights alone
 * do not fit. Null without a device budget, with a reserve outside [0, 1), or an empty cache.
 */
export function fitSequences(
  spec: ModelSpec,
  weights: number | null,
  cache: number | null,
  sequences: number | null,
): number | null {
  const device = positiveFinite(spec.serving?.deviceGiB);
  const reserveStated = spec.serving?.reserve;
  const reserve =
    reserveStated === null || reserveStated === undefined ? DEFAULT_RESERVE : reserveStated;
  if (device === null || weights === null || cache === null || sequences === null) return null;
  if (!(Number.isFinite(reserve) && reserve >= 0 && reserve < 1) || !(cache > 0)) return null;
  const n = Math.floor((device * 2 ** 30 * (1 - reserve) - weights) / (cache / sequences));
  return Number.isFinite(n) ? n : null;
}
