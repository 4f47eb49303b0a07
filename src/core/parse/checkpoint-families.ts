/**
 * Checkpoint families (`model_type`): what a family's architecture implies where its config file
 * is silent. One row per family; a family not listed gets nothing from its name. The published
 * defaults (`published`) are the family's config class defaults (the checkpoint library's
 * `<Family>Config.__init__` keyword defaults), as the source names them, for sparse files that
 * state only the values that differ (multimodal `text_config` blocks most of all); only keys that
 * change a metric are listed. A default taken for a missing key is reported
 * (`family-default-taken`, info), so nothing is silent.
 */
import type { SourceValue } from './source.js';

export interface FamilyDefaults {
  /** Where the values come from. */
  source: string;
  values: Readonly<Record<string, SourceValue>>;
}

/** What one checkpoint family implies; every trait is absent for "no" (default: absent). */
export interface CheckpointFamily {
  /**
   * The position code of the architecture when the file states none: `relative` for position
   * biases no modelled code describes (DeBERTa), `buckets` for T5-style relative buckets
   * (Raffel et al. 2020, section 2.1), a code of their own.
   */
  position?: 'rotary' | 'learned' | 'sinusoidal' | 'alibi' | 'relative' | 'buckets';
  /** The feed-forward block is always gated (three matrices), whatever activation the file names. */
  gated?: true;
  /** Biases are on when the file does not say. */
  bias?: true;
  /** An encoder-decoder architecture. */
  encoderDecoder?: true;
  /** Encoder only (no decoding cache) unless the file says `is_decoder: true`. */
  encoderOnly?: true;
  /** Embeddings are multiplied by sqrt(hidden) (Gemma). */
  scaledEmbedding?: true;
  /** Four norms per decoder layer, before and after attention and feed-forward (Gemma 2 report, §2). */
  fourNorms?: true;
  /** Per-head RMS norms on queries and keys (`q_norm`, `k_norm` of the head width in the published code). */
  qkNorms?: true;
  /** The config class turns the sliding window off unless `use_sliding_window` is true. */
  windowOff?: true;
  /** With a window and no layer pattern stated, every Nth layer is global (the config class's pattern). */
  globalEvery?: number;
  /** Without `no_rope_layers`, every Nth layer has no position code (the config class's interval). */
  noRopeEvery?: number;
  /**
   * Only the sliding-window layers rotate: the global layers of a windowed model have no position
   * code (Cohere2: its attention applies the rotary code only when the layer has a window).
   */
  ropeOnSlidingOnly?: true;
  /** Per-head query/key norms (as `qkNorms`) only when this key is true (GLM-4.5: `use_qk_norm`). */
  qkNormsKey?: string;
  /**
   * Query/key norms over every head at once (OLMoE: `q_norm` of `heads·headDim`, `k_norm` of
   * `kvHeads·headDim`), which the count does not model: a finding says by how much params are low.
   */
  qkNormsAllHeads?: true;
  /**
   * `attention_bias` puts biases on the query, key and value projections only (GLM-4.5: no output,
   * feed-forward or norm biases), which the count does not model: a finding says by how much.
   */
  qkvBiasOnly?: true;
  /**
   * The experts and router have no biases whatever the bias keys say (Phi-3.5-MoE: `attention_bias`
   * biases the attention only), which the count does not model: a finding says by how much.
   */
  unbiasedExperts?: true;
  /** Mixture layers always add one shared expert as wide as a routed one (Llama-4 style). */
  oneSharedExpert?: true;
  /** The published config class defaults (default: none taken). */
  published?: FamilyDefaults;
}

/** Keyed by `model_type` in lower case. */
export const CHECKPOINT_FAMILIES: Readonly<Record<string, CheckpointFamily>> = {
  llama: {
    position: 'rotary',
    gated: true,
    published: {
      source: 'from the published config class LlamaConfig',
      values: {
        vocab_size: 32000,
        hidden_size: 4096,
        intermediate_size: 11008,
        num_hidden_layers: 32,
        num_attention_heads: 32,
        max_position_embeddings: 2048,
        rope_theta: 10000,
        tie_word_embeddings: false,
        hidden_act: 'silu',
      },
    },
  },
  mistral: {
    position: 'rotary',
    gated: true,
    published: {
      source: 'from the published config class MistralConfig',
      values: {
        vocab_size: 32000,
        hidden_size: 4096,
        intermediate_size: 14336,
        num_hidden_layers: 32,
        num_attention_heads: 32,
        num_key_value_heads: 8,
        max_position_embeddings: 131072,
        rope_theta: 10000,
        sliding_window: 4096,
        tie_word_embeddings: false,
        hidden_act: 'silu',
      },
    },
  },
  mixtral: { position: 'rotary', gated: true },
  qwen2: {
    position: 'rotary',
    gated: true,
    windowOff: true,
    published: {
      source: 'from the published config class Qwen2Config',
      values: {
        vocab_size: 151936,
        hidden_size: 4096,
        intermediate_size: 22016,
        num_hidden_layers: 32,
        num_attention_heads: 32,
        num_key_value_heads: 32,
        max_position_embeddings: 32768,
        rope_theta: 10000,
        tie_word_embeddings: false,
        hidden_act: 'silu',
      },
    },
  },
  qwen2_moe: { position: 'rotary', gated: true, windowOff: true },
  qwen3: { position: 'rotary', gated: true, qkNorms: true, windowOff: true },
  qwen3_moe: { position: 'rotary', gated: true, qkNorms: true, windowOff: true },
  gemma: {
    position: 'rotary',
    gated: true,
    scaledEmbedding: true,
    published: {
      source: 'from the published config class GemmaConfig',
      values: {
        vocab_size: 256000,
        hidden_size: 3072,
        intermediate_size: 24576,
        num_hidden_layers: 28,
        num_attention_heads: 16,
        num_key_value_heads: 16,
        head_dim: 256,
        max_position_embeddings: 8192,
        rope_theta: 10000,
        tie_word_embeddings: true,
      },
    },
  },
  gemma2: {
    position: 'rotary',
    gated: true,
    scaledEmbedding: true,
    fourNorms: true,
    globalEvery: 2,
    published: {
      source: 'from the published config class Gemma2Config',
      values: {
        vocab_size: 256000,
        hidden_size: 2304,
        intermediate_size: 9216,
        num_hidden_layers: 26,
        num_attention_heads: 8,
        num_key_value_heads: 4,
        head_dim: 256,
        max_position_embeddings: 8192,
        rope_theta: 10000,
        sliding_window: 4096,
        tie_word_embeddings: true,
      },
    },
  },
  gemma3_text: {
    position: 'rotary',
    gated: true,
    scaledEmbedding: true,
    fourNorms: true,
    qkNorms: true,
    globalEvery: 6,
    published: {
      source: 'from the published config class Gemma3TextConfig',
      values: {
        vocab_size: 262208,
        hidden_size: 2304,
        intermediate_size: 9216,
        num_hidden_layers: 26,
        num_attention_heads: 8,
        num_key_value_heads: 4,
        head_dim: 256,
        max_position_embeddings: 131072,
        rope_theta: 1000000,
        rope_local_base_freq: 10000,
        sliding_window: 4096,
        tie_word_embeddings: true,
      },
    },
  },
  phi: { position: 'rotary', bias: true },
  phi3: { position: 'rotary', gated: true },
  gpt_neox: { position: 'rotary', bias: true },
  gptj: { position: 'rotary' },
  stablelm: { position: 'rotary' },
  starcoder2: { position: 'rotary' },
  olmo: { position: 'rotary', gated: true },
  olmo2: { position: 'rotary', gated: true },
  cohere: { position: 'rotary', gated: true },
  internlm2: { position: 'rotary', gated: true },
  deepseek_v2: { position: 'rotary', gated: true },
  deepseek_v3: { position: 'rotary', gated: true },
  granite: { position: 'rotary', gated: true },
  falcon: {
    position: 'rotary',
    published: {
      source: 'from the published config class FalconConfig',
      values: {
        vocab_size: 65024,
        hidden_size: 4544,
        num_hidden_layers: 32,
        num_attention_heads: 71,
        max_position_embeddings: 2048,
        rope_theta: 10000,
        tie_word_embeddings: true,
      },
    },
  },
  // SmolLM3Config: every 4th layer without a position code unless no_rope_layers says otherwise;
  // the window applies only with use_sliding_window.
  smollm3: { position: 'rotary', gated: true, noRopeEvery: 4, windowOff: true },
  llama4: { position: 'rotary', gated: true, oneSharedExpert: true, noRopeEvery: 4 },
  llama4_text: { position: 'rotary', gated: true, oneSharedExpert: true, noRopeEvery: 4 },
  qwen3_next: { position: 'rotary' },
  glm4_moe: { position: 'rotary', gated: true, qkNormsKey: 'use_qk_norm', qkvBiasOnly: true },
  olmoe: { position: 'rotary', gated: true, qkNormsAllHeads: true },
  // Gated experts without biases (PhimoeBlockSparseTop2MLP: w1, w2, w3 without bias).
  phimoe: { position: 'rotary', gated: true, unbiasedExperts: true },
  granitemoe: { position: 'rotary', gated: true },
  granitemoeshared: { position: 'rotary', gated: true },
  ernie4_5_moe: {
    position: 'rotary',
    gated: true,
    published: {
      source: 'from the published config class Ernie4_5_MoeConfig',
      values: {
        vocab_size: 103424,
        hidden_size: 2560,
        intermediate_size: 12288,
        num_hidden_layers: 28,
        num_attention_heads: 20,
        num_key_value_heads: 4,
        max_position_embeddings: 131072,
        rope_theta: 500000,
        tie_word_embeddings: true,
        hidden_act: 'silu',
        use_bias: false,
        moe_intermediate_size: 1536,
        moe_k: 6,
        moe_num_experts: 64,
        moe_num_shared_experts: 2,
        moe_layer_start_index: 1,
        moe_layer_end_index: -1,
        moe_layer_interval: 1,
      },
    },
  },
  // DbrxConfig nests its attention and feed-forward values (attn_config, ffn_config; their defaults in
  // checkpoint-dialect.ts); its experts are gated (DbrxExpertGLU: w1, v1, w2).
  dbrx: { position: 'rotary', gated: true },
  cohere2: { position: 'rotary', gated: true, globalEvery: 4, ropeOnSlidingOnly: true },
  // Exaone4Attention applies the rotary code only when the model has no window or the layer slides
  // ("global NoPE"), with per-head query/key norms; the class's pattern default is 4.
  exaone4: {
    position: 'rotary',
    gated: true,
    qkNorms: true,
    globalEvery: 4,
    ropeOnSlidingOnly: true,
  },
  gpt2: { position: 'learned', bias: true },
  gpt_bigcode: { position: 'learned', bias: true },
  gpt_neo: { position: 'learned', bias: true },
  opt: { position: 'learned', bias: true },
  bert: { position: 'learned', bias: true, encoderOnly: true },
  roberta: { position: 'learned', bias: true, encoderOnly: true },
  'xlm-roberta': { position: 'learned', bias: true, encoderOnly: true },
  camembert: { position: 'learned', bias: true, encoderOnly: true },
  distilbert: { position: 'learned', bias: true, encoderOnly: true },
  electra: { position: 'learned', bias: true, encoderOnly: true },
  bart: { position: 'learned', bias: true, encoderDecoder: true },
  mbart: { position: 'learned', bias: true, encoderDecoder: true },
  biogpt: { position: 'learned', bias: true },
  blenderbot: { position: 'learned', bias: true, encoderDecoder: true },
  whisper: { position: 'learned', bias: true, encoderDecoder: true },
  marian: { position: 'sinusoidal', bias: true, encoderDecoder: true },
  fsmt: { position: 'sinusoidal', bias: true, encoderDecoder: true },
  pegasus: { position: 'sinusoidal', bias: true, encoderDecoder: true },
  m2m_100: { position: 'sinusoidal', bias: true, encoderDecoder: true },
  xglm: { position: 'sinusoidal', bias: true },
  speech_to_text: { position: 'sinusoidal', encoderDecoder: true },
  bloom: {
    position: 'alibi',
    bias: true,
    published: {
      // BloomConfig's size defaults describe a two-layer test model, not a published checkpoint: only the vocabulary is taken.
      source: 'from the published config class BloomConfig',
      values: { vocab_size: 250880, tie_word_embeddings: true },
    },
  },
  mpt: {
    position: 'alibi',
    published: {
      source: 'from the published config class MptConfig',
      values: {
        d_model: 2048,
        n_heads: 16,
        n_layers: 24,
        expansion_ratio: 4,
        max_seq_len: 2048,
        vocab_size: 50368,
        no_bias: true,
        tie_word_embeddings: true,
      },
    },
  },
  t5: { position: 'buckets', encoderDecoder: true },
  mt5: { position: 'buckets', encoderDecoder: true },
  umt5: { position: 'buckets', encoderDecoder: true },
  longt5: { position: 'buckets', encoderDecoder: true },
  switch_transformers: { position: 'buckets', encoderDecoder: true },
  deberta: { position: 'relative', encoderOnly: true },
  'deberta-v2': { position: 'relative', encoderOnly: true },
  albert: { encoderOnly: true },
  modernbert: { encoderOnly: true },
  gemma3: { fourNorms: true, qkNorms: true, globalEvery: 6 },
};

/** The row of `modelType`; undefined when none (or no type), never an inherited property. */
export function familyOf(modelType: string | null): CheckpointFamily | undefined {
  return modelType !== null && Object.prototype.hasOwnProperty.call(CHECKPOINT_FAMILIES, modelType)
    ? CHECKPOINT_FAMILIES[modelType]
    : undefined;
}
