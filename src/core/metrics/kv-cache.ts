/**
 * Key/value cache size (METRICS.md: `cachePerTokenBytes`, `cacheBytesAtSpan`; common practice,
 * SOURCES.md §11: 524,288 bytes per token for 32 layers, 32 kv heads, head 128, fp16).
 */
import type { ModelSpec } from '../model.js';
import { nonNegativeCount, positiveCount } from './sizes.js';
import { bytesPerElement, cacheDType } from './storage-bytes.js';

/** Concurrent sequences when the serving block states none (default: `1`). */
export const DEFAULT_SEQUENCES = 1;

/** bytes: one layer's keys and values for one token, `2·kvHeads·headDim·bytes`; null if degenerate. */
function layerTokenBytes(spec: ModelSpec): number | null {
  const kv = positiveCount(spec.kvHeads);
  const headDim = positiveCount(spec.headDim);
  const bytes = bytesPerElement(cacheDType(spec));
  return kv === null || headDim === null || bytes === null ? null : 2 * kv * headDim * bytes;
}

/**
 * count: decoder layers with a sliding window, 0 without a window; null when the window or the
 * count is degenerate or the count exceeds the layers (default: every layer when a window is set).
 */
export function windowedLayers(spec: ModelSpec): number | null {
  const layers = positiveCount(spec.layers);
  if (layers === null) return null;
  if (spec.slidingWindow === null || spec.slidingWindow === undefined) return 0;
  if (positiveCount(spec.slidingWindow) === null) return null;
  if (spec.windowLayers === null || spec.windowLayers === undefined) return layers;
  const n = nonNegativeCount(spec.windowLayers);
  return n === null || n > layers ? null : n;
}

/** bytes: `cachePerTokenBytes = Σ_decoder layers 2·kvHeads·headDim·bytes(cache dtype)` (common practice). */
export function cachePerTokenBytes(spec: ModelSpec): number | null {
  const layers = positiveCount(spec.layers);
  const perLayer = layerTokenBytes(spec);
  return layers === null || perLayer === null ? null : finite(layers * perLayer);
}

/** count: sequences held in the cache; null when stated but not a positive whole number (default: `1`). */
export function servedSequences(spec: ModelSpec): number | null {
  const s = spec.serving?.sequences;
  return s === null || s === undefined ? DEFAULT_SEQUENCES : positiveCount(s);
}

/**
 * bytes: `cacheBytesAtSpan = sequences · Σ_layers 2·kvHeads·headDim·bytes·min(T, window of that
 * layer)` (METRICS.md); windowed layers hold `min(T, w)` tokens, the others T.
 */
export function cacheBytesAtSpan(spec: ModelSpec, span: number | null): number | null {
  const layers = positiveCount(spec.layers);
  const perLayer = layerTokenBytes(spec);
  const windowed = windowedLayers(spec);
  const sequences = servedSequences(spec);
  if (span === null || layers === null || perLayer === null || windowed === null || sequences === null) return null;
  const w = windowed > 0 ? Math.min(span, spec.slidingWindow as number) : span;
  return finite(sequences * perLayer * ((layers - windowed) * span + windowed * w));
}

function finite(x: number): number | null {
  return Number.isFinite(x) ? x : null;
}
