/**
 * Checkpoint-style configs: the `config.json` keys widely used by published open models
 * (`hidden_size`, `num_hidden_layers`, `rope_theta`, `rope_scaling`, …), including the compact
 * GPT-2 keys (`n_embd`, `n_layer`, …), encoder-decoder keys (`d_model`, `encoder_layers`, …) and
 * the T5 keys (`num_layers`, `d_kv`, `d_ff`). `null` means "not set", as those files write it.
 *
 * Where a file is silent, these choices apply (each is a documented default, and a guessed
 * position code is reported as `position-code-assumed`):
 * - Position code, first match: `position_embedding_type` (absolute → learned, sinusoidal, rotary,
 *   alibi, none; relative_key / relative_key_query → none, reported as assumed); `alibi: true` (also
 *   under `attn_config`); `sinusoidal_pos_embds: true`; any rotary key (`rope_theta`,
 *   `rotary_emb_base`, `rope_parameters`, `rope_scaling`, `partial_rotary_factor`, `rotary_pct`,
 *   `rotary_dim`) → rotary; otherwise the code of the `model_type` family (the family table,
 *   `checkpoint-families.ts`; rotary families without `rope_theta` get base 10000, reported as
 *   assumed); otherwise GPT-2
 *   compact keys → learned; otherwise none, reported as assumed.
 * - Gated feed-forward: the activation (`hidden_act`, `hidden_activation`, `activation_function`,
 *   `dense_act_fn`) is one that gated models are configured with: silu, swish, swiglu, geglu,
 *   reglu; or T5's `feed_forward_proj` starts with `gated-`; or the `model_type` is one whose
 *   block is always gated (`gated` in the family table: Llama, Mistral, Qwen, Gemma, … — Gemma
 *   writes `gelu_pytorch_tanh`, which non-gated models use too, so the name alone is not enough).
 * - Output matrix tied unless `tie_word_embeddings` is false (the checkpoint libraries' default).
 * - Biases: `attention_bias`, `mlp_bias`, `bias` or `use_bias` when stated; otherwise on for the
 *   families with `bias` in the family table and for GPT-2 style configs, off for the rest.
 * - Layers that differ (sliding windows, layer patterns, chunked attention, layers without a
 *   position code, the local layers' rotary base): see `checkpoint-layers.ts`.
 * - Experts and latent attention: see `checkpoint-experts.ts`.
 * - Encoder-only families (`encoderOnly`, unless `is_decoder: true`) keep no decoding
 *   cache; Gemma-2/3 families have four norms per layer; Qwen3 and Gemma-3 families per-head
 *   query/key norms.
 * - Weight format: `dtype` or `torch_dtype` (float32 → fp32, bfloat16 → bf16, float16 → fp16).
 * - Embedding multiplier: `scale_embedding: true` → sqrt(hidden); Gemma families → sqrt(hidden).
 * - Declared span: `max_position_embeddings`, else `n_positions`, `n_ctx`, `max_seq_len`,
 *   `seq_length`, or the decoder's `max_target_positions`.
 */
import type { StorageDType } from '../model.js';
import { orderedRamp, type FieldReader } from './fields.js';
import { quoteText } from './quote.js';
import { readQuantization } from './quantization.js';
import type { PathSegment } from './quote.js';
import type { PositionDraft, ScalingDraft, SpecDraft } from './spec-defaults.js';
import {
  DEFAULT_BANDED_HIGH,
  DEFAULT_BANDED_LOW,
  DEFAULT_ROTARY_BASE,
  DEFAULT_YARN_ALPHA,
  DEFAULT_YARN_BETA,
  defaultHeadDim,
} from './spec-defaults.js';
import type { SourceMapping, SourceValue } from './source.js';
import { readLatent, readMixture } from './checkpoint-experts.js';
import { readLayerPlan } from './checkpoint-layers.js';
import { familyOf } from './checkpoint-families.js';
import {
  checkSections,
  readPairwise,
  reportDualChunk,
  rotaryPairs,
  type RotaryContext,
} from './checkpoint-scaling.js';
import { readMptAttention } from './checkpoint-mpt.js';
import { isCount } from '../metrics/sizes.js';
import { elementAt } from '../element-at.js';

/** Keys whose presence marks a mapping as a checkpoint-style model config. */
export const CHECKPOINT_MARKERS: readonly string[] = [
  'hidden_size',
  'num_hidden_layers',
  'num_attention_heads',
  'n_embd',
  'n_layer',
  'n_head',
  'd_model',
  'encoder_layers',
  'decoder_layers',
  'num_layers',
  'num_heads',
];

/** Activations gated feed-forward configs are written with. */
export const GATED_ACTIVATIONS: readonly string[] = ['silu', 'swish', 'swiglu', 'geglu', 'reglu'];

const BUCKET_KEYS = ['relative_attention_num_buckets', 'relative_attention_max_distance'];

const POSITION_TYPES: Readonly<Record<string, PositionDraft['kind']>> = {
  absolute: 'learned',
  learned: 'learned',
  sinusoidal: 'sinusoidal',
  rotary: 'rotary',
  rope: 'rotary',
  alibi: 'alibi',
  none: 'none',
};
const RELATIVE_POSITION_TYPES = new Set(['relative_key', 'relative_key_query']);

/** `rope_type` / `type` of a scaling block to our kind; `default` is no scaling. */
const SCALING_TYPES: Readonly<Record<string, ScalingDraft['kind'] | 'default'>> = {
  default: 'default',
  linear: 'linear',
  dynamic: 'dynamic',
  yarn: 'yarn',
  llama3: 'banded',
  longrope: 'pairwise',
  su: 'pairwise',
  // Multimodal rotary sections (Qwen2-VL): text positions see the plain rotary spectrum.
  mrope: 'default',
};

const DTYPES: Readonly<Record<string, StorageDType>> = {
  float32: 'fp32',
  bfloat16: 'bf16',
  float16: 'fp16',
};

const ROTARY_KEYS = [
  'rope_theta',
  'rotary_emb_base',
  'rope_parameters',
  'rope_scaling',
  'partial_rotary_factor',
  'rotary_pct',
  'rotary_dim',
];

function isMapping(v: SourceValue | undefined): v is SourceMapping {
  return v !== null && v !== undefined && typeof v === 'object' && !Array.isArray(v);
}

/** Whether `value` looks like a checkpoint-style model config. */
export function isCheckpointConfig(value: SourceMapping): boolean {
  return CHECKPOINT_MARKERS.some(
    (k) => Object.prototype.hasOwnProperty.call(value, k) && value[k] !== null,
  );
}

/** Reads a checkpoint-style config from `r.root` into a draft; every problem becomes a finding on `r`. */
export function readCheckpoint(r: FieldReader): SpecDraft {
  const modelType = ((t) => (typeof t === 'string' ? t.toLowerCase() : null))(
    r.get(['model_type']),
  );
  const family = familyOf(modelType);
  if (family?.published !== undefined) r.useDefaults(family.published.values);
  const gpt2Style = r.has(['n_embd']) || r.has(['n_layer']);
  const encoderDecoder =
    r.get(['is_encoder_decoder']) === true ||
    r.has(['encoder_layers']) ||
    r.has(['num_decoder_layers']) ||
    family?.encoderDecoder === true;

  const size = (
    field: string,
    candidates: string[],
    what: string,
    required: boolean,
  ): number | undefined => {
    const path = r.first(candidates.map((k) => [k]));
    if (path !== null) return r.count(field, path, what);
    if (!required) return undefined;
    const also =
      candidates.length > 1 ? ` (read from ${candidates.join(', ')}, the first present)` : '';
    return r.missing([elementAt(candidates, 0)], `${what}${also}`);
  };

  const hidden = size('hidden', ['hidden_size', 'n_embd', 'd_model'], 'the model width', true)!;
  const layers = size(
    'layers',
    encoderDecoder
      ? ['decoder_layers', 'num_decoder_layers', 'num_layers', 'num_hidden_layers', 'n_layer']
      : ['num_hidden_layers', 'n_layer', 'num_layers', 'n_layers'],
    encoderDecoder ? 'the number of decoder layers' : 'the number of layers',
    true,
  )!;
  const heads = size(
    'heads',
    encoderDecoder
      ? ['decoder_attention_heads', 'num_heads', 'num_attention_heads', 'n_head']
      : ['num_attention_heads', 'n_head', 'num_heads', 'n_heads'],
    'the number of attention heads',
    true,
  )!;
  let kvHeads = size(
    'kvHeads',
    ['num_key_value_heads', 'num_kv_heads', 'n_head_kv'],
    'key/value heads',
    false,
  );
  if (kvHeads === undefined && r.get(['multi_query']) === true) {
    r.locate('kvHeads', ['multi_query']);
    kvHeads = 1;
  }
  const mpt = readMptAttention(r);
  if (kvHeads === undefined && mpt.kvHeads !== undefined) kvHeads = mpt.kvHeads;
  if (kvHeads === undefined && modelType === 'dbrx') kvHeads = dbrxKvHeads(r);
  // DBRX's experts are GLU blocks (DbrxExpertGLU) whatever activation ffn_act_fn names.
  if (modelType === 'dbrx') r.get(['ffn_config', 'ffn_act_fn']);
  const headDim = size('headDim', ['head_dim', 'd_kv'], 'the width of one head', false);
  const ffn =
    size(
      'ffn',
      encoderDecoder
        ? ['decoder_ffn_dim', 'd_ff', 'intermediate_size', 'ffn_dim']
        : ['intermediate_size', 'n_inner', 'ffn_dim', 'd_ff', 'ffn_hidden_size'],
      'the feed-forward width',
      false,
    ) ?? mpt.ffn(hidden);
  const vocab = size('vocab', ['vocab_size'], 'the vocabulary size', true)!;
  const spanKeys = [
    'max_position_embeddings',
    'n_positions',
    'n_ctx',
    'max_seq_len',
    'seq_length',
    'max_target_positions',
  ];
  const declaredSpan =
    size(
      'declaredSpan',
      spanKeys,
      'the maximum positions',
      !alibiWithoutSpan(r, modelType, spanKeys),
    ) ?? spanNotStated(r, spanKeys);

  const encoder = encoderDecoder
    ? {
        layers: size(
          'encoder.layers',
          ['encoder_layers', 'num_layers'],
          'the number of encoder layers',
          true,
        )!,
        heads: size(
          'encoder.heads',
          ['encoder_attention_heads', 'num_heads'],
          'the number of encoder heads',
          true,
        )!,
        headDim: size('encoder.headDim', ['d_kv'], 'the width of one head', false),
        ffn: size(
          'encoder.ffn',
          ['encoder_ffn_dim', 'd_ff'],
          'the encoder feed-forward width',
          false,
        ),
      }
    : null;

  const mixture = readMixture(r, size, layers, modelType);
  const experts = mixture.experts;
  const latent = readLatent(r, size);
  const position = readPosition(
    r,
    modelType,
    gpt2Style,
    latent ? latent.ropeDim : (headDim ?? defaultHeadDim(hidden, heads)),
    declaredSpan,
  );
  reportDualChunk(r, declaredSpan);
  // Consulted even when the window is off: then they have no effect.
  r.get(['max_window_layers']);
  r.get(['use_sliding_window']);
  const plan = readLayerPlan(r, modelType, layers);
  const headWidth = headDim ?? defaultHeadDim(hidden, heads);
  const qkvBiasOnly =
    family?.qkvBiasOnly === true &&
    r.get(['attention_bias']) === true &&
    !['mlp_bias', 'bias', 'use_bias', 'no_bias'].some((k) => r.has([k]));
  if (qkvBiasOnly) {
    const low = layers * (heads + 2 * (kvHeads ?? heads)) * headWidth;
    r.report(
      'key-ignored',
      ['attention_bias'],
      `${r.key(['attention_bias'])} is true: for model_type "${modelType}" it puts biases on the query, key and value projections only, which the count does not model, so they are left out: params and activeParams are low by ${Number.isFinite(low) ? low.toLocaleString('en-US') : 'layers · (heads + 2 · kvHeads) · headDim'}`,
    );
  }
  if (family?.qkNormsAllHeads === true && !latent) {
    const low = layers * (heads + (kvHeads ?? heads)) * headWidth;
    r.report(
      'key-ignored',
      ['model_type'],
      `model_type "${modelType}" normalises queries and keys over all heads at once (q_norm of heads · headDim, k_norm of kvHeads · headDim weights per layer), which the count does not model, so they are left out: params and activeParams are low by ${Number.isFinite(low) ? low.toLocaleString('en-US') : 'layers · (heads + kvHeads) · headDim'}`,
    );
  }
  readNextTokenLayers(r);
  // Read in the order the report's locations have always listed them: gated, tied, bias.
  const gated = readGated(r, modelType) ?? mpt.gated;
  const tied = r.flag('tied', ['tie_word_embeddings']);
  const bias = qkvBiasOnly ? false : readBias(r, modelType, gpt2Style);
  if (bias === true && family?.unbiasedExperts === true && experts) {
    const width = experts.width ?? ffn ?? NaN;
    const perExpert = 2 * width + hidden;
    const moeLayers = layers - (experts.denseLayers ?? 0);
    const high = moeLayers * experts.total * perExpert;
    const activeHigh = moeLayers * experts.active * perExpert;
    const at = r.has(['attention_bias']) ? ['attention_bias'] : ['model_type'];
    r.report(
      'key-ignored',
      at,
      `${r.key(at)} turns biases on, but model_type "${modelType}" has none in its experts, which the count does not model, so it gives every expert biases: params is high by ${Number.isFinite(high) ? high.toLocaleString('en-US') : 'the expert biases'}, activeParams by ${Number.isFinite(activeHigh) ? activeHigh.toLocaleString('en-US') : 'those of the active experts'}`,
    );
  }
  if (r.get(['lm_head_bias']) === true)
    r.report(
      'key-ignored',
      ['lm_head_bias'],
      `${r.key(['lm_head_bias'])} is true: the output layer's bias (${Number.isFinite(vocab) ? vocab.toLocaleString('en-US') : 'vocab'} weights) is not counted, so params is low by that many`,
    );
  const encoderOnly =
    !encoderDecoder && family?.encoderOnly === true && r.get(['is_decoder']) !== true;

  return {
    name: null,
    layers,
    hidden,
    heads,
    kvHeads,
    headDim,
    ffn: mixture.denseFfn ?? ffn,
    gated,
    vocab,
    tied,
    bias,
    experts,
    encoder,
    position,
    declaredSpan,
    trainedSpan: null,
    slidingWindow: plan.slidingWindow,
    windowLayers: plan.windowLayers,
    latent,
    layerTypes: plan.layerTypes,
    positionFreeLayers: plan.positionFreeLayers,
    chunkSize: plan.chunkSize,
    localBase: plan.localBase,
    layerNorms: family?.fourNorms === true ? 4 : null,
    qkNorms:
      family?.qkNorms === true ||
      (family?.qkNormsKey !== undefined && r.get([family.qkNormsKey]) === true),
    encoderOnly,
    dtypes: { weights: readWeights(r), cache: null, positions: null },
    embeddingInitStd:
      r.real('embeddingInitStd', ['initializer_range'], 'standard deviation', {
        test: (n) => n > 0,
        expected: 'a standard deviation above 0',
      }) ?? null,
    embeddingMultiplier: readMultiplier(r, modelType, hidden),
    quantization: readQuantization(r, hidden, experts !== null && experts !== undefined),
  };
}

/** DbrxAttentionConfig's default key/value heads when `attn_config.kv_n_heads` is not stated. */
const DBRX_KV_HEADS = 1;

/** DBRX states its key/value heads in `attn_config.kv_n_heads` (DbrxAttentionConfig, default 1). */
function dbrxKvHeads(r: FieldReader): number | undefined {
  const at = ['attn_config', 'kv_n_heads'];
  if (r.has(at)) return r.count('kvHeads', at, 'key/value heads');
  r.report(
    'family-default-taken',
    ['model_type'],
    `${r.key(at)} is not stated; the published config class DbrxAttentionConfig takes ${DBRX_KV_HEADS} key/value head for model_type "dbrx"; state it if the model differs`,
  );
  return DBRX_KV_HEADS;
}

/**
 * Multi-token-prediction layers (`num_nextn_predict_layers`, DeepSeek-V3 and GLM-4.5 style) sit
 * after the last decoder layer and are used in training and speculative decoding; they are not
 * counted, which a finding says when there are any.
 */
function readNextTokenLayers(r: FieldReader): void {
  const at = ['num_nextn_predict_layers'];
  const n = r.get(at);
  if (typeof n === 'number' && n > 0)
    r.report(
      'key-ignored',
      at,
      `${r.key(at)} is ${n}: the multi-token-prediction layer${n === 1 ? '' : 's'} it adds after the last decoder layer (each a full decoder layer plus a 2 · hidden → hidden projection) ${n === 1 ? 'is' : 'are'} not counted, so params is low by about ${n} layer${n === 1 ? '' : 's'}; the cache and activeParams of ordinary decoding are unaffected`,
    );
}

/** ALiBi configs (BLOOM) may state no maximum positions: ALiBi has no hard limit. */
function alibiWithoutSpan(r: FieldReader, modelType: string | null, spanKeys: string[]): boolean {
  if (r.first(spanKeys.map((k) => [k])) !== null) return false;
  return (
    r.get(['alibi']) === true || r.get(['attn_config', 'alibi']) === true || modelType === 'bloom'
  );
}

/** The declared span of an ALiBi config that states none: not stated (NaN), reported as info. */
function spanNotStated(r: FieldReader, spanKeys: string[]): number {
  r.report(
    'span-not-stated',
    r.has(['model_type']) ? ['model_type'] : null,
    `no maximum-positions key (${spanKeys.join(', ')}) is stated; the ALiBi code has no hard limit, so nothing blocks, and the positional and cache metrics are computed only at a served span (--served-span or the policy's serving block)`,
  );
  return NaN;
}

function readGated(r: FieldReader, modelType: string | null): boolean | undefined {
  const proj = r.text(null, ['feed_forward_proj'], 'the feed-forward kind, e.g. "gated-gelu"');
  if (proj !== undefined) {
    r.locate('gated', ['feed_forward_proj']);
    return proj.startsWith('gated-');
  }
  const path = r.first([
    ['hidden_act'],
    ['hidden_activation'],
    ['activation_function'],
    ['dense_act_fn'],
  ]);
  const act = path === null ? undefined : r.text('gated', path, 'an activation name');
  if (act !== undefined && GATED_ACTIVATIONS.includes(act.toLowerCase())) return true;
  // The architecture decides, whatever activation it is configured with.
  if (familyOf(modelType)?.gated === true) {
    r.locate('gated', ['model_type']);
    return true;
  }
  return path === null ? undefined : false;
}

function readBias(
  r: FieldReader,
  modelType: string | null,
  gpt2Style: boolean,
): boolean | undefined {
  const noBias = r.flag('bias', ['no_bias']);
  if (noBias !== undefined) return !noBias;
  const stated = [['attention_bias'], ['mlp_bias'], ['bias'], ['use_bias']].filter((p) => r.has(p));
  if (stated.length > 0) {
    const values = stated.map((p) => ({ p, v: r.flag('bias', p) }));
    const on = values.find((x) => x.v === true);
    if (on) r.locate('bias', on.p);
    else r.locate('bias', elementAt(values, 0).p);
    return on ? true : values.some((x) => x.v === false) ? false : undefined;
  }
  if (familyOf(modelType)?.bias === true || (modelType === null && gpt2Style)) {
    r.locate(
      'bias',
      modelType !== null ? ['model_type'] : r.has(['n_embd']) ? ['n_embd'] : ['n_layer'],
    );
    return true;
  }
  return undefined;
}

function readWeights(r: FieldReader): StorageDType | null {
  const path = r.first([['dtype'], ['torch_dtype']]);
  if (path === null) return null;
  const name = r.text('dtypes.weights', path, 'a weight format');
  if (name === undefined) return null;
  if (name === 'auto') {
    r.report(
      'key-ignored',
      path,
      `${r.key(path)} is "auto", which names no format; the weights are read at the default bf16, so state float32, bfloat16 or float16`,
    );
    return null;
  }
  const dtype = DTYPES[name];
  if (dtype === undefined) {
    r.report(
      'value-invalid',
      path,
      `${r.key(path)} is ${r.quote(path)}; expected one of ${Object.keys(DTYPES).join(', ')}`,
    );
    return null;
  }
  return dtype;
}

function readMultiplier(r: FieldReader, modelType: string | null, hidden: number): number | null {
  const scale = r.flag('embeddingMultiplier', ['scale_embedding']);
  const root = isCount(hidden) ? Math.sqrt(hidden) : NaN;
  if (scale !== undefined) return scale ? root : 1;
  // Granite states its factor outright (embedding_multiplier 12 in granite-3.0 configs).
  const stated = r.real('embeddingMultiplier', ['embedding_multiplier'], 'embedding multiplier', {
    test: (n) => n > 0,
    expected: 'a factor above 0',
  });
  if (stated !== undefined) return stated;
  if (familyOf(modelType)?.scaledEmbedding === true) {
    r.locate('embeddingMultiplier', ['model_type']);
    return root;
  }
  return null;
}

function readPosition(
  r: FieldReader,
  modelType: string | null,
  gpt2Style: boolean,
  headDim: number,
  declaredSpan: number,
): PositionDraft {
  const typePath = ['position_embedding_type'];
  const alibiPath =
    r.get(['alibi']) === true
      ? ['alibi']
      : r.get(['attn_config', 'alibi']) === true
        ? ['attn_config', 'alibi']
        : null;
  const bucketKeys = BUCKET_KEYS.filter((k) => r.has([k]));
  if (
    !r.has(typePath) &&
    alibiPath === null &&
    (bucketKeys.length > 0 || familyOf(modelType)?.position === 'buckets')
  ) {
    return readBuckets(r, modelType, bucketKeys);
  }
  const mptRotary =
    alibiPath === null &&
    (r.get(['attn_config', 'rope']) === true ||
      (modelType === 'dbrx' && r.has(['attn_config', 'rope_theta'])));
  // Family defaults stand in for rotary keys only when the file states no other code.
  const rotaryKeys = ROTARY_KEYS.filter((k) =>
    alibiPath === null && !r.stated(typePath) ? r.has([k]) : r.stated([k]),
  );
  let kind: PositionDraft['kind'];
  let assumed: string | null = null;
  const familyCode = familyOf(modelType)?.position;

  const stated = r.text('position', typePath, 'a position embedding type');
  if (stated !== undefined) {
    const lower = stated.toLowerCase();
    if (POSITION_TYPES[lower] !== undefined) kind = POSITION_TYPES[lower];
    else if (RELATIVE_POSITION_TYPES.has(lower)) {
      kind = 'none';
      assumed = `${r.key(typePath)} is ${r.quote(typePath)}: relative position embeddings are not one of the modelled codes (learned, sinusoidal, rotary, alibi), so the code is read as none and positional-range metrics are not computed`;
    } else {
      r.report(
        'value-invalid',
        typePath,
        `${r.key(typePath)} is ${r.quote(typePath)}; expected one of ${[...Object.keys(POSITION_TYPES), ...RELATIVE_POSITION_TYPES].join(', ')}`,
      );
      kind = 'none';
    }
  } else if (r.has(typePath)) {
    kind = 'none';
  } else if (alibiPath !== null) {
    r.locate('position', alibiPath);
    kind = 'alibi';
    // MPT's learned_pos_emb has no effect beside ALiBi (the MPT code adds the table only without it).
    r.get(['learned_pos_emb']);
  } else if (r.get(['sinusoidal_pos_embds']) === true) {
    r.locate('position', ['sinusoidal_pos_embds']);
    kind = 'sinusoidal';
  } else if (rotaryKeys.length > 0 || mptRotary) {
    r.locate(
      'position',
      rotaryKeys.length > 0
        ? [elementAt(rotaryKeys, 0)]
        : r.has(['attn_config', 'rope'])
          ? ['attn_config', 'rope']
          : ['attn_config', 'rope_theta'],
    );
    kind = 'rotary';
  } else if (
    modelType === 'mpt' &&
    r.get(['attn_config', 'alibi']) === false &&
    r.get(['learned_pos_emb']) !== false
  ) {
    // MPT without ALiBi or rotary keys: its learned table (learned_pos_emb, default true in MptConfig).
    r.locate(
      'position',
      r.has(['learned_pos_emb']) ? ['learned_pos_emb'] : ['attn_config', 'alibi'],
    );
    kind = 'learned';
  } else if (modelType !== null && familyCode !== undefined) {
    r.locate('position', ['model_type']);
    if (familyCode === 'rotary') {
      kind = 'rotary';
      assumed = `model_type "${modelType}" uses a rotary code, but no rotary key (rope_theta, rope_parameters) is stated, so the base is read as ${DEFAULT_ROTARY_BASE}; state rope_theta`;
    } else if (familyCode === 'relative' || familyCode === 'buckets') {
      kind = 'none';
      assumed = `model_type "${modelType}" uses relative position biases, which are not one of the modelled codes (learned, sinusoidal, rotary, alibi), so the code is read as none and positional-range metrics are not computed`;
    } else {
      kind = familyCode;
    }
  } else if (gpt2Style) {
    r.locate('position', r.has(['n_positions']) ? ['n_positions'] : ['n_embd']);
    kind = 'learned';
  } else {
    kind = 'none';
    assumed = `no position code is stated (no rope_theta, position_embedding_type or alibi key) and model_type ${modelType === null ? 'is not stated' : `${quoteText(modelType)} is not a known family`}, so the code is read as none and positional-range metrics are not computed; state rope_theta for a rotary code or position_embedding_type otherwise`;
  }
  if (assumed !== null)
    r.report(
      'position-code-assumed',
      r.has(typePath) ? typePath : r.has(['model_type']) ? ['model_type'] : null,
      assumed,
    );

  if (alibiPath !== null && kind !== 'alibi') {
    r.report(
      'key-ignored',
      alibiPath,
      `${r.key(alibiPath)} has no effect: ${r.key(typePath)} states the ${kind} code; remove one of them`,
    );
  }
  if (kind !== 'rotary') {
    for (const key of rotaryKeys) {
      r.report(
        'key-ignored',
        [key],
        `${r.key([key])} has no effect: it applies to rotary codes, and the code is read as ${kind}${r.has(typePath) ? ` (${r.key(typePath)})` : alibiPath ? ` (${r.key(alibiPath)})` : ''}`,
      );
    }
    return { kind };
  }
  return readRotary(r, headDim, declaredSpan);
}

/** T5-style relative position buckets: `relative_attention_num_buckets` and `relative_attention_max_distance`. */
function readBuckets(r: FieldReader, modelType: string | null, stated: string[]): PositionDraft {
  r.locate('position', stated.length > 0 ? [elementAt(stated, 0)] : ['model_type']);
  const buckets = r.count('position.buckets', ['relative_attention_num_buckets'], 'buckets');
  const maxDistance = r.count(
    'position.maxDistance',
    ['relative_attention_max_distance'],
    'tokens',
  );
  const unstated = BUCKET_KEYS.filter((k) => !stated.includes(k));
  if (unstated.length > 0) {
    r.report(
      'family-default-taken',
      r.has(['model_type']) ? ['model_type'] : null,
      `${unstated.join(' and ')} ${unstated.length === 1 ? 'is' : 'are'} not stated; the T5 defaults apply (32 buckets, max distance 128; Raffel et al. 2020, section 2.1)${modelType === null ? '' : ` for model_type "${modelType}"`}`,
    );
  }
  return { kind: 'relative', buckets, maxDistance };
}

function readRotary(r: FieldReader, headDim: number, declaredSpan: number): PositionDraft {
  // Newer checkpoint libraries put every rotary value in rope_parameters, per layer type where types differ.
  let params: PathSegment[] | null = null;
  const rp = r.get(['rope_parameters']);
  if (isMapping(rp)) {
    const nested = Object.keys(rp).filter((k) => isMapping(rp[k]));
    if (nested.length > 0 && !('rope_type' in rp) && !('rope_theta' in rp)) {
      const chosen = nested.includes('full_attention') ? 'full_attention' : elementAt(nested, 0);
      const chosenPath: PathSegment[] = ['rope_parameters', chosen];
      params = chosenPath;
      // The local layers' block is read by the layer reader (checkpoint-layers.ts).
      for (const other of nested.filter(
        (k) => k !== chosen && !(chosen === 'full_attention' && k === 'sliding_attention'),
      )) {
        r.report(
          'key-ignored',
          ['rope_parameters', other],
          `${r.key(['rope_parameters', other])} is not read: one rotary code describes the model, taken from ${r.key(chosenPath)}`,
        );
      }
    } else params = ['rope_parameters'];
  } else if (rp !== undefined) {
    r.report(
      'value-invalid',
      ['rope_parameters'],
      `${r.key(['rope_parameters'])} ${r.is(['rope_parameters'])}; expected a mapping with rope_type and rope_theta`,
    );
  }

  const basePath = r.first([
    ...(params ? [[...params, 'rope_theta']] : []),
    ['rope_theta'],
    ['rotary_emb_base'],
    ['attn_config', 'rope_theta'],
  ]);
  const base =
    basePath === null
      ? undefined
      : r.real('position.base', basePath, 'rotary base', {
          test: (n) => n > 1,
          expected: 'a rotary base above 1 (commonly 10000 or more)',
        });

  let fraction: number | undefined;
  const fractionPath = r.first([
    ...(params ? [[...params, 'partial_rotary_factor']] : []),
    ['partial_rotary_factor'],
    ['rotary_pct'],
  ]);
  if (fractionPath !== null) {
    fraction = r.real('position.fraction', fractionPath, 'share', {
      test: (n) => n > 0 && n <= 1,
      expected: 'a share of the head above 0 and at most 1',
    });
  } else if (r.has(['rotary_dim'])) {
    const dim = r.count('position.fraction', ['rotary_dim'], 'rotated channels per head');
    if (dim !== undefined && !Number.isNaN(dim)) fraction = isCount(headDim) ? dim / headDim : NaN;
  }

  const ctx: RotaryContext = { pairs: rotaryPairs(headDim, fraction), declaredSpan };
  for (const block of [params, ['rope_scaling']]) {
    if (block !== null) checkSections(r, [...block, 'mrope_section'], ctx);
  }
  let scalingPath: PathSegment[] | null = null;
  if (
    params !== null &&
    typeof r.get([...params, 'rope_type']) === 'string' &&
    r.get([...params, 'rope_type']) !== 'default'
  )
    scalingPath = params;
  else if (r.has(['rope_scaling'])) scalingPath = ['rope_scaling'];
  return {
    kind: 'rotary',
    base,
    fraction,
    scaling: scalingPath === null ? null : readScaling(r, scalingPath, ctx),
  };
}

function readScaling(r: FieldReader, at: PathSegment[], ctx: RotaryContext): ScalingDraft | null {
  const block = r.get(at);
  if (!isMapping(block)) {
    r.report(
      'value-invalid',
      at,
      `${r.key(at)} ${r.is(at)}; expected a mapping with rope_type and factor`,
    );
    return null;
  }
  const typePath = r.first([
    [...at, 'rope_type'],
    [...at, 'type'],
  ]);
  if (typePath === null) {
    r.report(
      'scaling-kind-unknown',
      at,
      `${r.key(at)} states no rope_type (or type); known kinds: ${knownKinds()}; without a kind the code is read unscaled`,
    );
    return null;
  }
  const name = r.text('position.scaling', typePath, 'a scaling kind');
  if (name === undefined) return null;
  const kind = SCALING_TYPES[name];
  if (kind === undefined) {
    r.report(
      'scaling-kind-unknown',
      typePath,
      `${r.key(typePath)} is ${r.quote(typePath)}, not a known scaling kind (${knownKinds()}); the code is read unscaled, so its reach is understated or wrong — describe the model in the context-reach format if its scaling is one of linear, ntk, dynamic, yarn or banded`,
    );
    return null;
  }
  if (kind === 'default') return null;
  if (kind === 'pairwise') {
    const originalPath = r.first([
      [...at, 'original_max_position_embeddings'],
      ['original_max_position_embeddings'],
    ]);
    const originalSpan =
      originalPath === null
        ? null
        : r.count('position.scaling.originalSpan', originalPath, 'tokens');
    return { ...readPairwise(r, at, ctx, originalSpan), originalSpan };
  }

  const factor =
    r.real('position.scaling.factor', [...at, 'factor'], 'scaling factor') ??
    r.missing([...at, 'factor'], 'the scaling factor (extended span over original span)');
  const originalPath = r.first([
    [...at, 'original_max_position_embeddings'],
    ['original_max_position_embeddings'],
  ]);
  const draft: ScalingDraft = {
    kind,
    factor,
    originalSpan:
      originalPath === null
        ? null
        : r.count('position.scaling.originalSpan', originalPath, 'tokens'),
  };
  if (kind === 'yarn') {
    draft.alpha = r.real('position.scaling.alpha', [...at, 'beta_slow'], 'ramp start', {
      test: (n) => n >= 0,
      expected: 'a ramp start of at least 0',
    });
    draft.beta = r.real('position.scaling.beta', [...at, 'beta_fast'], 'ramp end', {
      test: (n) => n > 0,
      expected: 'a ramp end above 0',
    });
    orderedRamp(
      r,
      at,
      'beta_slow',
      draft.alpha,
      DEFAULT_YARN_ALPHA,
      'beta_fast',
      draft.beta,
      DEFAULT_YARN_BETA,
      true,
    );
    for (const key of ['attention_factor', 'mscale', 'mscale_all_dim']) {
      if (r.has([...at, key])) {
        r.report(
          'key-ignored',
          [...at, key],
          `${r.key([...at, key])} is not modelled: attentionScale uses 0.1·ln(s) + 1 (YaRN, Peng et al. 2023, eq. 22), whatever this key sets`,
        );
      }
    }
  }
  if (kind === 'banded') {
    draft.low = r.real('position.scaling.low', [...at, 'low_freq_factor'], 'low-frequency factor', {
      test: (n) => n > 0,
      expected: 'a factor above 0',
    });
    draft.high = r.real(
      'position.scaling.high',
      [...at, 'high_freq_factor'],
      'high-frequency factor',
      { test: (n) => n > 0, expected: 'a factor above 0' },
    );
    orderedRamp(
      r,
      at,
      'low_freq_factor',
      draft.low,
      DEFAULT_BANDED_LOW,
      'high_freq_factor',
      draft.high,
      DEFAULT_BANDED_HIGH,
      true,
    );
  }
  return draft;
}

function knownKinds(): string {
  return 'linear, dynamic, yarn, llama3 (read as banded), longrope or su (read as pairwise), mrope (sections, no scaling), default (no scaling)';
}
