/**
 * Decoder layers grouped by kind (docs/metrics.md, "Layers that differ"): full attention, a sliding
 * window (Beltagy et al. 2020, Longformer, §3.1; Jiang et al. 2023, Mistral 7B, §2), or chunked
 * local attention (each token sees the earlier tokens of its own fixed chunk), each with or
 * without a position code.
 */
import type { LayerAttention, ModelSpec } from '../model.js';
import { nonNegativeCount, positiveCount } from './sizes.js';

export interface LayerGroup {
  attention: LayerAttention;
  /** False for layers without any position code. */
  positional: boolean;
  /** count: decoder layers of this kind. */
  layers: number;
  /**
   * tokens: the most earlier tokens one query sees (window or chunk); null for full attention; 0
   * for cross-attention layers, which see no earlier text token.
   */
  window: number | null;
}

/**
 * count: decoder layers with a sliding window, 0 without a window; null when the window or the
 * count is degenerate or the count exceeds the layers (default: every layer when a window is set).
 * With an explicit list of layer kinds, the sliding entries of the list.
 */
export function windowedLayers(spec: ModelSpec): number | null {
  const layers = positiveCount(spec.layers);
  if (layers === null) return null;
  if (spec.layerTypes) {
    if (spec.layerTypes.length !== layers) return null;
    const n = spec.layerTypes.filter((t) => t === 'sliding').length;
    return n > 0 && positiveCount(spec.slidingWindow) === null ? null : n;
  }
  if (spec.slidingWindow === null || spec.slidingWindow === undefined) return 0;
  if (positiveCount(spec.slidingWindow) === null) return null;
  if (spec.windowLayers === null || spec.windowLayers === undefined) return layers;
  const n = nonNegativeCount(spec.windowLayers);
  return n === null || n > layers ? null : n;
}

/**
 * The attention of each decoder layer in order: the explicit list, else the last `windowLayers`
 * layers windowed (as Qwen-style `max_window_layers` counts them), else every layer alike. An
 * encoder-only model attends over the whole input in every layer. Null when degenerate: a list of
 * the wrong length, a sliding or chunked layer without a usable window or chunk.
 */
export function layerAttentions(spec: ModelSpec): LayerAttention[] | null {
  const layers = positiveCount(spec.layers);
  if (layers === null || layers > 1 << 20) return null;
  if (spec.encoderOnly === true) return new Array<LayerAttention>(layers).fill('full');
  let kinds: LayerAttention[];
  if (spec.layerTypes) {
    if (spec.layerTypes.length !== layers) return null;
    kinds = [...spec.layerTypes];
  } else {
    const windowed = windowedLayers(spec);
    if (windowed === null) return null;
    kinds = Array.from({ length: layers }, (_, i): LayerAttention =>
      i >= layers - windowed ? 'sliding' : 'full',
    );
  }
  if (kinds.includes('sliding') && positiveCount(spec.slidingWindow) === null) return null;
  if (kinds.includes('chunked') && positiveCount(spec.chunkSize) === null) return null;
  return kinds;
}

/**
 * The layers grouped by attention and position code, in first-seen order; null when degenerate
 * (see `layerAttentions`) or when a position-free index is not a layer.
 */
export function layerGroups(spec: ModelSpec): LayerGroup[] | null {
  const kinds = layerAttentions(spec);
  if (kinds === null) return null;
  const free = spec.positionFreeLayers ?? [];
  if (free.some((i) => nonNegativeCount(i) === null || i >= kinds.length)) return null;
  const groups: LayerGroup[] = [];
  kinds.forEach((attention, i) => {
    const positional = !free.includes(i);
    const found = groups.find((g) => g.attention === attention && g.positional === positional);
    if (found) found.layers += 1;
    else {
      const window =
        attention === 'sliding'
          ? (spec.slidingWindow as number)
          : attention === 'chunked'
            ? (spec.chunkSize as number)
            : attention === 'cross'
              ? 0
              : null;
      groups.push({ attention, positional, layers: 1, window });
    }
  });
  return groups;
}

/** count: decoder layers that cross-attend to image tokens (`cross` in the layer list), 0 without a list. */
export function crossLayers(spec: ModelSpec): number {
  return spec.layerTypes ? spec.layerTypes.filter((t) => t === 'cross').length : 0;
}

/** tokens: what one layer of the group holds and attends to at span `T`: `min(T, window)`, or T. */
export function visibleSpan(group: LayerGroup, span: number): number {
  return group.window === null ? span : Math.min(span, group.window);
}
