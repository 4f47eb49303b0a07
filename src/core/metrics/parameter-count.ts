/**
 * Parameter counts of a transformer (METRICS.md, context budget: `params`, `activeParams`,
 * `nonEmbeddingParams`; Kaplan et al. 2020, §2.1 and Table 1 for what "non-embedding" leaves out).
 */
import type { ModelSpec } from '../model.js';
import { positiveCount } from './sizes.js';

export interface ParameterCounts {
  params: number;
  activeParams: number;
  nonEmbeddingParams: number;
}

/**
 * count: one attention block, `hidden·heads·headDim + 2·hidden·kvHeads·headDim +
 * heads·headDim·hidden` (q, k, v, o; Ainslie et al. 2023 for kvHeads < heads), plus q, k, v, o
 * biases when on.
 */
export function attentionParams(hidden: number, heads: number, kvHeads: number, headDim: number, bias: boolean): number {
  const weights = hidden * heads * headDim + 2 * hidden * kvHeads * headDim + heads * headDim * hidden;
  return weights + (bias ? heads * headDim + 2 * kvHeads * headDim + hidden : 0);
}

/** count: one feed-forward block, `(gated ? 3 : 2)·hidden·ffn`, plus biases when on (per hidden unit and output). */
export function feedForwardParams(hidden: number, ffn: number, gated: boolean, bias: boolean): number {
  return (gated ? 3 : 2) * hidden * ffn + (bias ? (gated ? 2 : 1) * ffn + hidden : 0);
}

/** count: one normalisation of width `hidden`: a scale, plus a shift when biases are on (LayerNorm). */
export function normParams(hidden: number, bias: boolean): number {
  return bias ? 2 * hidden : hidden;
}

/**
 * count: `params`, `activeParams`, `nonEmbeddingParams` (METRICS.md). Per decoder layer: attention,
 * feed-forward (times E experts, plus a router `hidden·E`; k experts for the active count), two
 * norms; decoder layers of an encoder-decoder add cross-attention (the same q, k, v, o shapes)
 * and a third norm; encoder layers (dense) have attention, feed-forward and two norms; one final
 * norm per stack. Embeddings: `vocab·hidden`, again when untied, and a learned position table
 * `declaredSpan·hidden`. Null when any size it needs is not a positive whole number or the count
 * is not finite.
 */
export function parameterCounts(spec: ModelSpec): ParameterCounts | null {
  const layers = positiveCount(spec.layers);
  const hidden = positiveCount(spec.hidden);
  const heads = positiveCount(spec.heads);
  const kvHeads = positiveCount(spec.kvHeads);
  const headDim = positiveCount(spec.headDim);
  const ffn = positiveCount(spec.ffn);
  const vocab = positiveCount(spec.vocab);
  if (layers === null || hidden === null || heads === null || kvHeads === null || headDim === null || ffn === null || vocab === null) {
    return null;
  }
  const bias = spec.bias === true;
  const gated = spec.gated === true;
  let total = 1;
  let active = 1;
  if (spec.experts !== null && spec.experts !== undefined) {
    const e = positiveCount(spec.experts.total);
    const k = positiveCount(spec.experts.active);
    if (e === null || k === null || k > e) return null;
    total = e;
    active = k;
  }
  const attention = attentionParams(hidden, heads, kvHeads, headDim, bias);
  const ff = feedForwardParams(hidden, ffn, gated, bias);
  const router = spec.experts ? hidden * total : 0;
  const encoderDecoder = spec.encoder !== null && spec.encoder !== undefined;
  const decoderShared = attention + (encoderDecoder ? attention : 0) + (encoderDecoder ? 3 : 2) * normParams(hidden, bias) + router;
  let stacksTotal = layers * (decoderShared + total * ff) + normParams(hidden, bias);
  let stacksActive = layers * (decoderShared + active * ff) + normParams(hidden, bias);
  if (encoderDecoder) {
    const enc = spec.encoder!;
    const eLayers = positiveCount(enc.layers);
    const eHeads = positiveCount(enc.heads);
    const eKv = positiveCount(enc.kvHeads);
    const eHeadDim = positiveCount(enc.headDim);
    const eFfn = positiveCount(enc.ffn);
    if (eLayers === null || eHeads === null || eKv === null || eHeadDim === null || eFfn === null) return null;
    const encoderLayer =
      attentionParams(hidden, eHeads, eKv, eHeadDim, bias) + feedForwardParams(hidden, eFfn, gated, bias) + 2 * normParams(hidden, bias);
    const encoder = eLayers * encoderLayer + normParams(hidden, bias);
    stacksTotal += encoder;
    stacksActive += encoder;
  }
  let embeddings = vocab * hidden * (spec.tied === false ? 2 : 1);
  if (spec.position?.kind === 'learned') {
    const table = positiveCount(spec.declaredSpan);
    if (table === null) return null;
    embeddings += table * hidden;
  }
  const params = stacksTotal + embeddings;
  const activeParams = stacksActive + embeddings;
  if (!Number.isFinite(params) || !Number.isFinite(activeParams)) return null;
  return { params, activeParams, nonEmbeddingParams: stacksActive };
}

/** Where the parameters sit, for counting what a quantization stores at low width. */
export interface ParameterBreakdown extends ParameterCounts {
  /** count: token embedding table(s) plus a learned position table. */
  embedding: number;
  /** count: the untied output matrix, 0 when tied. */
  output: number;
  /** count: every linear weight matrix in the layers (attention, feed-forward, router): what a quantization stores at low width. */
  matrices: number;
  /** count: norms and biases. */
  vectors: number;
}

/**
 * count: `parameterCounts` split into `embedding` (vocab·hidden, plus declaredSpan·hidden for a
 * learned table), `output` (vocab·hidden when untied), `vectors` (every norm's scale and shift,
 * every bias) and `matrices` (the rest: the linear weights of the layers), so `params =
 * embedding + output + matrices + vectors`. Null when `parameterCounts` is.
 */
export function parameterBreakdown(spec: ModelSpec): ParameterBreakdown | null {
  const counts = parameterCounts(spec);
  if (counts === null) return null;
  // parameterCounts checked every size below.
  const { layers, hidden, heads, kvHeads, headDim, ffn, vocab } = spec;
  const bias = spec.bias === true;
  const gated = spec.gated === true;
  const experts = spec.experts ? spec.experts.total : 1;
  const output = spec.tied === false ? vocab * hidden : 0;
  const embedding = vocab * hidden + (spec.position?.kind === 'learned' ? spec.declaredSpan * hidden : 0);
  const attentionBias = (h: number, kv: number, d: number) => (bias ? h * d + 2 * kv * d + hidden : 0);
  const ffBias = (width: number) => (bias ? (gated ? 2 : 1) * width + hidden : 0);
  const encoderDecoder = spec.encoder !== null && spec.encoder !== undefined;
  let vectors = layers * ((encoderDecoder ? 2 : 1) * attentionBias(heads, kvHeads, headDim) + experts * ffBias(ffn)
    + (encoderDecoder ? 3 : 2) * normParams(hidden, bias)) + normParams(hidden, bias);
  if (encoderDecoder) {
    const e = spec.encoder!;
    vectors += e.layers * (attentionBias(e.heads, e.kvHeads, e.headDim) + ffBias(e.ffn) + 2 * normParams(hidden, bias)) + normParams(hidden, bias);
  }
  const matrices = counts.params - embedding - output - vectors;
  if (!Number.isFinite(matrices) || matrices < 0) return null;
  return { ...counts, embedding, output, matrices, vectors };
}
