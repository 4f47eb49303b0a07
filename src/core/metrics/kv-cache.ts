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

/** Decoder layers alike in their cache: how many, bytes per token each holds, and their window (null: full attention). */
export interface CacheLayerGroup {
  layers: number;
  tokenBytes: number;
  window: number | null;
}

/**
 * bytes: the decoder layers' cache per token as one of `t` tensor ranks holds it, grouped by
 * kind: each layer `2·ceil(kvHeads/t)·headDim·bytes` (a rank with `t > kvHeads` keeps a copy of
 * one head: common practice), full-attention layers and windowed layers apart. With `t = 1` the
 * groups sum to `cachePerTokenBytes`. Null when a size is degenerate.
 */
export function cacheLayerGroups(spec: ModelSpec, t: number): CacheLayerGroup[] | null {
  const layers = positiveCount(spec.layers);
  const kv = positiveCount(spec.kvHeads);
  const degree = positiveCount(t);
  const windowed = windowedLayers(spec);
  if (layers === null || kv === null || degree === null || windowed === null) return null;
  const perLayer = layerTokenBytes({ ...spec, kvHeads: Math.ceil(kv / degree) });
  if (perLayer === null) return null;
  const groups: CacheLayerGroup[] = [];
  if (layers - windowed > 0) groups.push({ layers: layers - windowed, tokenBytes: perLayer, window: null });
  if (windowed > 0) groups.push({ layers: windowed, tokenBytes: perLayer, window: spec.slidingWindow as number });
  return groups;
}
