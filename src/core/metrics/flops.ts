/**
 * Forward-pass compute per token (Kaplan et al. 2020, Table 1: `C_forward = 2N + 2 n_layer n_ctx d_attn`).
 */

/**
 * FLOP: `flopsPerToken = 2·nonEmbeddingParams + 2·layers·T·heads·headDim` (Kaplan et al. 2020,
 * Table 1, with `d_attn = heads·headDim`, `n_ctx = T`); null for degenerate input.
 */
export function flopsPerToken(nonEmbeddingParams: number | null, layers: number | null, span: number | null, heads: number | null, headDim: number | null): number | null {
  if (nonEmbeddingParams === null || layers === null || span === null || heads === null || headDim === null) return null;
  const f = 2 * nonEmbeddingParams + 2 * layers * span * heads * headDim;
  return Number.isFinite(f) ? f : null;
}
