/**
 * Published defaults of checkpoint config families, for sparse files that state only the values
 * that differ (multimodal `text_config` blocks most of all). Each table is the family's published
 * config class defaults (the checkpoint library's `<Family>Config.__init__` keyword defaults), as
 * the source names; only keys that change a metric are listed. A default taken for a missing key
 * is reported (`family-default-taken`, info), so nothing is silent.
 */
import type { SourceValue } from './source.js';

export interface FamilyDefaults {
  /** Where the values come from. */
  source: string;
  values: Readonly<Record<string, SourceValue>>;
}

/** Keyed by `model_type`. */
export const FAMILY_DEFAULTS: Readonly<Record<string, FamilyDefaults>> = {
  llama: {
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
  mistral: {
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
  qwen2: {
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
  gemma3_text: {
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
  falcon: {
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
  bloom: {
    // BloomConfig's size defaults describe a two-layer test model, not a published checkpoint: only the vocabulary is taken.
    source: 'from the published config class BloomConfig',
    values: { vocab_size: 250880, tie_word_embeddings: true },
  },
  mpt: {
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
};
