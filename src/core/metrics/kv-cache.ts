/**
 * Key/value cache size (docs/metrics.md: `cachePerTokenBytes`, `cacheBytesAtSpan`; common practice,
 * no paper states it, the GQA paper, Ainslie et al. 2023, gives none: 524,288 bytes per token for
 * 32 layers, 32 kv heads, head 128, fp16; latent
 * attention: Liu et al. 2024, DeepSeek-V2, Table 1, `(d_c + d_h^R)` elements per token and layer).
 */
import type { ModelSpec } from '../model.js';
import { crossLayers, layerGroups, visibleSpan } from './layer-kinds.js';
import { positiveCount } from './sizes.js';
import { bytesPerElement, cacheDType } from './storage-bytes.js';

export { windowedLayers } from './layer-kinds.js';

/** Concurrent sequences when the serving block states none (default: `1`). */
export const DEFAULT_SEQUENCES = 1;

/**
 * elements: what one decoder layer caches per token: `2·kvHeads·headDim` (keys and values), or
 * for latent attention the compressed latent and the shared rotary key, `d_c + d_h^R`
 * (DeepSeek-V2, Table 1); null if degenerate.
 */
export function layerTokenElements(spec: ModelSpec): number | null {
  if (spec.latent) {
    const dc = positiveCount(spec.latent.kvRank);
    const dr = positiveCount(spec.latent.ropeDim);
    return dc === null || dr === null ? null : dc + dr;
  }
  const kv = positiveCount(spec.kvHeads);
  const headDim = positiveCount(spec.headDim);
  return kv === null || headDim === null ? null : 2 * kv * headDim;
}

/** bytes: one layer's cache for one token in the cache dtype; null if degenerate. */
function layerTokenBytes(spec: ModelSpec): number | null {
  const elements = layerTokenElements(spec);
  const bytes = bytesPerElement(cacheDType(spec));
  return elements === null || bytes === null ? null : elements * bytes;
}

/**
 * bytes: `cachePerTokenBytes = Σ_decoder layers 2·kvHeads·headDim·bytes(cache dtype)` (common
 * practice; latent attention `(d_c + d_h^R)·bytes`). An encoder-only model keeps no decoding
 * cache: 0. Layers that cross-attend to image tokens hold none per text token.
 */
export function cachePerTokenBytes(spec: ModelSpec): number | null {
  const layers = positiveCount(spec.layers);
  if (layers !== null && spec.encoderOnly === true) return 0;
  const perLayer = layerTokenBytes(spec);
  return layers === null || perLayer === null
    ? null
    : finite((layers - crossLayers(spec)) * perLayer);
}

/** count: sequences held in the cache; null when stated but not a positive whole number (default: `1`). */
export function servedSequences(spec: ModelSpec): number | null {
  const s = spec.serving?.sequences;
  return s === null || s === undefined ? DEFAULT_SEQUENCES : positiveCount(s);
}

/**
 * bytes: `cacheBytesAtSpan = sequences · Σ_layers perLayerTokenBytes·min(T, window of that layer)`
 * (docs/metrics.md): sliding layers hold `min(T, w)` tokens, chunked layers `min(T, chunk)`, full
 * layers T. An encoder-only model: 0.
 */
export function cacheBytesAtSpan(spec: ModelSpec, span: number | null): number | null {
  const groups = layerGroups(spec);
  const sequences = servedSequences(spec);
  if (span === null || groups === null || sequences === null) return null;
  if (spec.encoderOnly === true) return 0;
  const perLayer = layerTokenBytes(spec);
  if (perLayer === null) return null;
  const tokens = groups.reduce((sum, g) => sum + g.layers * visibleSpan(g, span), 0);
  return finite(sequences * perLayer * tokens);
}

function finite(x: number | null): number | null {
  return x !== null && Number.isFinite(x) ? x : null;
}

/** Decoder layers alike in their cache: how many, bytes per token each holds, and their window (null: full attention). */
export interface CacheLayerGroup {
  layers: number;
  tokenBytes: number;
  window: number | null;
}

/**
 * bytes: the decoder layers' cache per token as one of `t` tensor ranks holds it, grouped by
 * layer kind (`layerGroups`): each layer `2·ceil(kvHeads/t)·headDim·bytes` (a rank with
 * `t > kvHeads` keeps a copy of one head: common practice); latent attention keeps its whole
 * `(d_c + d_h^R)` latent on every rank (docs/metrics.md, "Serving across devices"). With `t = 1` the
 * groups sum to `cachePerTokenBytes`. An encoder-only model holds none: no groups. Null when a
 * size is degenerate.
 */
export function cacheLayerGroups(spec: ModelSpec, t: number): CacheLayerGroup[] | null {
  const groups = layerGroups(spec);
  const degree = positiveCount(t);
  if (groups === null || degree === null) return null;
  if (spec.encoderOnly === true) return [];
  let perLayer: number | null;
  if (spec.latent) perLayer = layerTokenBytes(spec);
  else {
    const kv = positiveCount(spec.kvHeads);
    perLayer = kv === null ? null : layerTokenBytes({ ...spec, kvHeads: Math.ceil(kv / degree) });
  }
  if (perLayer === null) return null;
  const tokenBytes = perLayer;
  return groups.map((g) => ({ layers: g.layers, tokenBytes, window: g.window }));
}
