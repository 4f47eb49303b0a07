/**
 * Forward-pass compute per token (Kaplan et al. 2020, Table 1: `C_forward = 2N + 2 n_layer n_ctx d_attn`).
 */
import type { ModelSpec } from '../model.js';
import { layerGroups, visibleSpan } from './layer-kinds.js';
import { nonNegativeCount, positiveCount } from './sizes.js';

/**
 * dimensions: `d_attn`, the attention width one query works over: `heads·headDim`; for latent
 * attention `heads·(d_h + d_h^R + d_v)/2`, the mean of the query/key width (scores) and the
 * value width (weighted sum), which is `heads·headDim` when all three are equal.
 */
export function attentionWidth(spec: ModelSpec): number | null {
  const heads = positiveCount(spec.heads);
  if (heads === null) return null;
  if (spec.latent) {
    const rope = positiveCount(spec.latent.ropeDim);
    const nope = nonNegativeCount(spec.latent.nopeDim);
    const value = positiveCount(spec.latent.valueDim);
    return rope === null || nope === null || value === null
      ? null
      : (heads * (nope + rope + value)) / 2;
  }
  const headDim = positiveCount(spec.headDim);
  return headDim === null ? null : heads * headDim;
}

/**
 * FLOP: `flopsPerToken = 2·nonEmbeddingParams + 2·Σ_layers n_ctx(layer)·d_attn` (Kaplan et al.
 * 2020, Table 1, with `n_ctx = T` on full-attention layers and `min(T, window)` on sliding and
 * chunked layers, docs/metrics.md "Layers that differ"); with every layer full this is
 * `2·nonEmbeddingParams + 2·layers·T·heads·headDim`. Null for degenerate input.
 */
export function flopsPerToken(
  spec: ModelSpec,
  nonEmbeddingParams: number | null,
  span: number | null,
): number | null {
  const groups = layerGroups(spec);
  const width = attentionWidth(spec);
  if (nonEmbeddingParams === null || span === null || groups === null || width === null)
    return null;
  const layerTokens = groups.reduce((sum, g) => sum + g.layers * visibleSpan(g, span), 0);
  const f = 2 * nonEmbeddingParams + 2 * layerTokens * width;
  return Number.isFinite(f) ? f : null;
}
