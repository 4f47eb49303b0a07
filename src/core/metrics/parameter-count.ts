/**
 * Parameter counts of a transformer (docs/metrics.md, context budget: `params`, `activeParams`,
 * `nonEmbeddingParams`; Kaplan et al. 2020, §2.1 and Table 1 for what "non-embedding" leaves out;
 * mixtures of experts and latent attention as docs/metrics.md, "Mixtures of experts and latent
 * attention", the latter after Liu et al. 2024, DeepSeek-V2, §2.1).
 */
import type { ModelSpec } from '../model.js';
import { crossLayers } from './layer-kinds.js';
import { positiveCount, nonNegativeCount } from './sizes.js';

export interface ParameterCounts {
  params: number;
  activeParams: number;
  nonEmbeddingParams: number;
}

/**
 * Where the parameters sit, for weight formats that store some tensors narrower than others.
 * `params = embedding + output + matrices + vectors`.
 */
export interface ParameterBreakdown extends ParameterCounts {
  /** count: token embedding table plus a learned position table. */
  embedding: number;
  /** count: a separate (untied) output matrix; 0 when tied. */
  output: number;
  /** count: every linear weight matrix inside the layers (attention, latent projections, feed-forward, every expert, routers, gates). */
  matrices: number;
  /** count: norms and biases. */
  vectors: number;
  /** count: `matrices` with `k` routed experts instead of `E`. */
  activeMatrices: number;
  /** count: the routed experts' matrices, all `E` of every mixture layer (0 for a dense model). */
  expertMatrices: number;
}

/** A count split into weight matrices and vectors (norms, biases). */
interface Part {
  matrices: number;
  vectors: number;
}

const add = (...parts: Part[]): Part => ({
  matrices: parts.reduce((s, p) => s + p.matrices, 0),
  vectors: parts.reduce((s, p) => s + p.vectors, 0),
});
const times = (n: number, p: Part): Part => ({ matrices: n * p.matrices, vectors: n * p.vectors });
const total = (p: Part): number => p.matrices + p.vectors;

/**
 * count: one attention block, `hidden·heads·headDim + 2·hidden·kvHeads·headDim +
 * heads·headDim·hidden` (q, k, v, o; Ainslie et al. 2023 for kvHeads < heads), plus q, k, v, o
 * biases when on.
 */
export function attentionParams(
  hidden: number,
  heads: number,
  kvHeads: number,
  headDim: number,
  bias: boolean,
): number {
  return total(attentionPart(hidden, heads, kvHeads, headDim, bias));
}

function attentionPart(
  hidden: number,
  heads: number,
  kvHeads: number,
  headDim: number,
  bias: boolean,
): Part {
  return {
    matrices: hidden * heads * headDim + 2 * hidden * kvHeads * headDim + heads * headDim * hidden,
    vectors: bias ? heads * headDim + 2 * kvHeads * headDim + hidden : 0,
  };
}

/**
 * count: one latent attention block (Liu et al. 2024, DeepSeek-V2, §2.1, eqs. 9–10 and 12–16):
 * queries `hidden·heads·(d_h + d_h^R)` (W^Q and W^QR), or with a query latent `d_c'`
 * `hidden·d_c' + d_c'·heads·(d_h + d_h^R)` (W^DQ, then W^UQ and W^QR); the key/value latent and
 * the shared rotary key `hidden·(d_c + d_h^R)` (W^DKV and W^KR); keys and values up from the
 * latent `d_c·heads·(d_h + d_v)` (W^UK, W^UV); output `heads·d_v·hidden` (W^O). Vectors: the
 * published implementation's RMS norms on each latent (`d_c`, and `d_c'` when queries are
 * compressed), plus biases on the down-projections and the output when on.
 */
function latentPart(
  hidden: number,
  heads: number,
  kvRank: number,
  qRank: number | null,
  rope: number,
  nope: number,
  value: number,
  bias: boolean,
): Part {
  const query =
    qRank === null
      ? hidden * heads * (nope + rope)
      : hidden * qRank + qRank * heads * (nope + rope);
  return {
    matrices:
      query + hidden * (kvRank + rope) + kvRank * heads * (nope + value) + heads * value * hidden,
    vectors: kvRank + (qRank ?? 0) + (bias ? (qRank ?? 0) + kvRank + rope + hidden : 0),
  };
}

/** count: one feed-forward block, `(gated ? 3 : 2)·hidden·ffn`, plus biases when on (per hidden unit and output). */
export function feedForwardParams(
  hidden: number,
  ffn: number,
  gated: boolean,
  bias: boolean,
): number {
  return total(feedForwardPart(hidden, ffn, gated, bias));
}

function feedForwardPart(hidden: number, ffn: number, gated: boolean, bias: boolean): Part {
  return {
    matrices: (gated ? 3 : 2) * hidden * ffn,
    vectors: bias ? (gated ? 2 : 1) * ffn + hidden : 0,
  };
}

/** count: one normalisation of width `hidden`: a scale, plus a shift when biases are on (LayerNorm). */
export function normParams(hidden: number, bias: boolean): number {
  return bias ? 2 * hidden : hidden;
}

/** Norm vectors per decoder layer when the spec states none (default: `2`, before attention and before the feed-forward). */
export const DEFAULT_LAYER_NORMS = 2;

/**
 * count: `params`, `activeParams`, `nonEmbeddingParams` and where they sit (docs/metrics.md). Per
 * decoder layer: attention (or latent attention), the feed-forward — dense layers `ffn` wide;
 * mixture layers `E` routed experts of width `moeFfn`, `shared` always-active experts, a router
 * `hidden·E` and, where stated, a `hidden → 1` gate on the shared experts; `k` routed experts for
 * the active count — and its norms (`layerNorms` of width hidden, per-head query/key norms where
 * stated); decoder layers of an encoder-decoder add cross-attention (the same shapes) and a third
 * norm; layers that cross-attend to image tokens (`cross`) add per-head query and key norms and
 * two scalar gates; encoder layers (dense) have attention, feed-forward and two norms; one final norm per
 * stack. Embeddings: `vocab·hidden`, a separate output matrix when untied, and a learned position
 * table `declaredSpan·hidden`. Null when any size it needs is not a positive whole number or a
 * count is not finite.
 */
export function parameterBreakdown(spec: ModelSpec): ParameterBreakdown | null {
  const layers = positiveCount(spec.layers);
  const hidden = positiveCount(spec.hidden);
  const heads = positiveCount(spec.heads);
  const kvHeads = positiveCount(spec.kvHeads);
  const headDim = positiveCount(spec.headDim);
  const ffn = positiveCount(spec.ffn);
  const vocab = positiveCount(spec.vocab);
  if (
    layers === null ||
    hidden === null ||
    heads === null ||
    kvHeads === null ||
    headDim === null ||
    ffn === null ||
    vocab === null
  ) {
    return null;
  }
  const bias = spec.bias === true;
  const gated = spec.gated === true;
  const norm = (): Part => ({ matrices: 0, vectors: normParams(hidden, bias) });

  let attention: Part;
  if (spec.latent) {
    const l = spec.latent;
    const kvRank = positiveCount(l.kvRank);
    const rope = positiveCount(l.ropeDim);
    const nope = nonNegativeCount(l.nopeDim);
    const value = positiveCount(l.valueDim);
    const qRank = l.qRank === null || l.qRank === undefined ? null : positiveCount(l.qRank);
    if (
      kvRank === null ||
      rope === null ||
      nope === null ||
      value === null ||
      (l.qRank !== null && l.qRank !== undefined && qRank === null)
    )
      return null;
    attention = latentPart(hidden, heads, kvRank, qRank, rope, nope, value, bias);
  } else {
    attention = attentionPart(hidden, heads, kvHeads, headDim, bias);
    if (spec.qkNorms === true) attention = add(attention, { matrices: 0, vectors: 2 * headDim });
  }

  const stated = spec.layerNorms;
  const layerNorms =
    stated === null || stated === undefined ? DEFAULT_LAYER_NORMS : nonNegativeCount(stated);
  if (layerNorms === null) return null;
  const encoderDecoder = spec.encoder !== null && spec.encoder !== undefined;
  const shared = add(
    attention,
    encoderDecoder ? attention : { matrices: 0, vectors: 0 },
    times(layerNorms + (encoderDecoder ? 1 : 0), norm()),
  );

  const dense = feedForwardPart(hidden, ffn, gated, bias);
  let mixtureTotal = dense;
  let mixtureActive = dense;
  let routedMatrices = 0;
  let denseLayers = 0;
  if (spec.experts !== null && spec.experts !== undefined) {
    const x = spec.experts;
    const e = positiveCount(x.total);
    const k = positiveCount(x.active);
    const width = x.width === null || x.width === undefined ? ffn : positiveCount(x.width);
    const sharedCount =
      x.shared === null || x.shared === undefined ? 0 : nonNegativeCount(x.shared);
    const sharedWidth =
      x.sharedWidth === null || x.sharedWidth === undefined ? width : positiveCount(x.sharedWidth);
    const denseStated =
      x.denseLayers === null || x.denseLayers === undefined ? 0 : nonNegativeCount(x.denseLayers);
    if (
      e === null ||
      k === null ||
      k > e ||
      width === null ||
      sharedCount === null ||
      sharedWidth === null ||
      denseStated === null ||
      denseStated > layers
    )
      return null;
    denseLayers = denseStated;
    const expert = feedForwardPart(hidden, width, gated, bias);
    const always = add(times(sharedCount, feedForwardPart(hidden, sharedWidth, gated, bias)), {
      matrices: hidden * e + (x.sharedGate === true && sharedCount > 0 ? hidden : 0),
      vectors: 0,
    });
    mixtureTotal = add(times(e, expert), always);
    mixtureActive = add(times(k, expert), always);
    routedMatrices = e * expert.matrices;
  }
  const moeLayers = spec.experts ? layers - denseLayers : 0;
  const denseCount = layers - moeLayers;
  const finalNorm = norm();
  let stackTotal = add(
    times(layers, shared),
    times(denseCount, dense),
    times(moeLayers, mixtureTotal),
    finalNorm,
  );
  let stackActive = add(
    times(layers, shared),
    times(denseCount, dense),
    times(moeLayers, mixtureActive),
    finalNorm,
  );
  // Cross-attention layers (Mllama's MllamaCrossAttentionDecoderLayer) have the shapes of a
  // self-attention layer plus per-head query and key norms and two scalar gates (attention, MLP).
  const cross = crossLayers(spec);
  if (cross > 0) {
    const gates = { matrices: 0, vectors: cross * ((spec.qkNorms === true ? 0 : 2 * headDim) + 2) };
    stackTotal = add(stackTotal, gates);
    stackActive = add(stackActive, gates);
  }

  if (encoderDecoder) {
    const enc = spec.encoder!;
    const eLayers = positiveCount(enc.layers);
    const eHeads = positiveCount(enc.heads);
    const eKv = positiveCount(enc.kvHeads);
    const eHeadDim = positiveCount(enc.headDim);
    const eFfn = positiveCount(enc.ffn);
    if (eLayers === null || eHeads === null || eKv === null || eHeadDim === null || eFfn === null)
      return null;
    const encoderLayer = add(
      attentionPart(hidden, eHeads, eKv, eHeadDim, bias),
      feedForwardPart(hidden, eFfn, gated, bias),
      times(2, norm()),
    );
    const encoder = add(times(eLayers, encoderLayer), norm());
    stackTotal = add(stackTotal, encoder);
    stackActive = add(stackActive, encoder);
  }

  let embedding = vocab * hidden;
  const output = spec.tied === false ? vocab * hidden : 0;
  if (spec.position?.kind === 'learned') {
    const table = positiveCount(spec.declaredSpan);
    if (table === null) return null;
    embedding += table * hidden;
  }
  const params = total(stackTotal) + embedding + output;
  const activeParams = total(stackActive) + embedding + output;
  const expertMatrices = moeLayers * routedMatrices;
  const all = [
    params,
    activeParams,
    stackTotal.matrices,
    stackTotal.vectors,
    stackActive.matrices,
    expertMatrices,
  ];
  if (!all.every(Number.isFinite)) return null;
  return {
    params,
    activeParams,
    nonEmbeddingParams: total(stackActive),
    embedding,
    output,
    matrices: stackTotal.matrices,
    vectors: stackTotal.vectors,
    activeMatrices: stackActive.matrices,
    expertMatrices,
  };
}

/** count: `params`, `activeParams`, `nonEmbeddingParams` (docs/metrics.md); null as `parameterBreakdown`. */
export function parameterCounts(spec: ModelSpec): ParameterCounts | null {
  const b = parameterBreakdown(spec);
  return b === null
    ? null
    : { params: b.params, activeParams: b.activeParams, nonEmbeddingParams: b.nonEmbeddingParams };
}
