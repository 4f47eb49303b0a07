/**
 * The rule "a key that changes a metric is never ignored in silence", built on what the reader
 * consulted: after a checkpoint config is read, every key of the model block (and of the blocks
 * listed in `READ_BLOCKS`) that the reader never looked up, that has no finding yet and that is not
 * on the list of keys known to change no metric, gets a `key-unread` finding naming it and its
 * line. A reader that starts reading a key (in any file) makes it count without editing a list.
 */
import { FieldReader } from './fields.js';
import type { PathSegment } from './quote.js';
import type { SourceMapping, SourceValue } from './source.js';
import { TOWER_KEY } from './nested-model.js';

/** Blocks whose own keys are checked one by one once the reader looked into them. */
const READ_BLOCKS = new Set([
  'rope_scaling',
  'rope_parameters',
  'attn_config',
  'ffn_config',
  'quantization_config',
]);

/**
 * Keys of published configs that change no metric of the contract: token ids, dropout and
 * initialisation, norm epsilons, runtime and generation switches, labels, bookkeeping.
 */
const NO_METRIC_KEYS = new Set([
  'architectures',
  'model_type',
  'transformers_version',
  '_name_or_path',
  '_commit_hash',
  'auto_map',
  'use_cache',
  'output_attentions',
  'output_hidden_states',
  'return_dict',
  'use_return_dict',
  'torchscript',
  'use_bfloat16',
  'pruned_heads',
  'tie_encoder_decoder',
  'is_decoder',
  'add_cross_attention',
  'chunk_size_feed_forward',
  'id2label',
  'label2id',
  'num_labels',
  'problem_type',
  'finetuning_task',
  'task_specific_params',
  'tokenizer_class',
  'prefix',
  'max_length',
  'min_length',
  'do_sample',
  'temperature',
  'top_k',
  'top_p',
  'typical_p',
  'num_beams',
  'num_beam_groups',
  'length_penalty',
  'repetition_penalty',
  'diversity_penalty',
  'early_stopping',
  'no_repeat_ngram_size',
  'encoder_no_repeat_ngram_size',
  'num_return_sequences',
  'bad_words_ids',
  'suppress_tokens',
  'begin_suppress_tokens',
  'forced_decoder_ids',
  'remove_invalid_values',
  'exponential_decay_length_penalty',
  'return_dict_in_generate',
  'output_scores',
  'output_past',
  'tf_legacy_loss',
  'sep_token',
  'gradient_checkpointing',
  // quantization_config switches that change how the weights were found or run, not what is stored
  // (GPTQ keeps zero points whether or not `sym` is set; the stored width is `bits`).
  'desc_act',
  'sym',
  'true_sequential',
  'damp_percent',
  'damp_auto_increment',
  'static_groups',
  'checkpoint_format',
  'model_name_or_path',
  'model_file_base_name',
  'quantizer',
  'version',
  'backend',
  'use_exllama',
  'exllama_config',
  'use_cuda_fp16',
  'activation_scheme',
  'bnb_4bit_compute_dtype',
  'llm_int8_threshold',
  'llm_int8_has_fp16_weight',
  // Runtime and implementation switches: the same weights and cache whatever they say.
  'pretraining_tp',
  'slow_but_exact',
  'masked_softmax_fusion',
  'bias_dropout_fusion',
  '_attn_implementation',
  'attn_implementation',
  'use_flash_attn',
  'use_flash_attention_2',
  '_flash_attn_2_enabled',
  'cache_implementation',
  'attn_impl',
  'init_device',
  'verbose',
  'use_parallel_residual',
  'parallel_attn',
  'use_memory_efficient_attention',
  // Output and score scaling: no weights, no cache, no positions.
  'logit_scale',
  'final_logit_softcapping',
  'attn_logit_softcapping',
  'query_pre_attn_scalar',
  'softmax_scale',
  'scale_attn_weights',
  'scale_attn_by_inverse_layer_idx',
  'reorder_and_upcast_attn',
  'embedding_fraction',
  'apply_residual_connection_post_layernorm',
  'normalize_before',
  'clip_qkv',
  'prefix_lm',
  'attn_uses_sequence_id',
  // Norm implementation variants (MPT's low_precision_layernorm is a LayerNorm computed in low precision;
  // Falcon's new_decoder_architecture and num_ln_in_parallel_attn lay out its norms, key/value heads come from num_kv_heads).
  'norm_type',
  'new_decoder_architecture',
  'num_ln_in_parallel_attn',
  // Mixture-of-experts training losses.
  'output_router_logits',
  'router_aux_loss_coef',
  'router_z_loss_coef',
  'router_jitter_noise',
  // Routing rules: which experts a token picks and how their outputs are weighted, never how many
  // there are or how wide (DeepSeek-V3 and Kimi K2, GLM-4.5, OLMoE, Phi-3.5-MoE, DBRX, ERNIE 4.5).
  'norm_topk_prob',
  'n_group',
  'topk_group',
  'topk_method',
  'routed_scaling_factor',
  'scoring_func',
  'seq_aux',
  'aux_loss_alpha',
  'input_jitter_noise',
  'moe_jitter_eps',
  'moe_loss_weight',
  'moe_normalize_expert_weights',
  'uniform_expert_assignment',
  'moe_gate',
  'moe_capacity',
  'moe_use_aux_free',
  'moe_norm_min',
  // Granite's scalings of attention scores, residuals and logits change no size or span.
  'attention_multiplier',
  'residual_multiplier',
  'logits_scaling',
  // Multimodal rotary: text positions share one id (the spectrum is the plain rotary one).
  'mrope_interleaved',
  // GPT-2 sequence-summary head, not part of the language model.
  'summary_type',
  'summary_use_proj',
  'summary_activation',
  'summary_proj_to_labels',
  'summary_first_dropout',
]);

/** Name patterns of keys that change no metric. */
const NO_METRIC_PATTERNS: readonly RegExp[] = [
  /_token_ids?$/,
  /_token_index$/,
  /dropout/,
  /_pdrop$/,
  /^init/,
  /initializer/,
  /_eps$/,
  /epsilon$/,
  /^output_/,
];

export function changesNoMetric(key: string): boolean {
  return NO_METRIC_KEYS.has(key) || NO_METRIC_PATTERNS.some((p) => p.test(key));
}

function isMapping(v: SourceValue | undefined): v is SourceMapping {
  return v !== null && v !== undefined && typeof v === 'object' && !Array.isArray(v);
}

/** Whether the reader looked up `path` or anything under it. */
function touched(r: FieldReader, path: PathSegment[]): boolean {
  const id = FieldReader.pathId(path);
  if (r.consulted.has(id)) return true;
  const open = id.slice(0, -1) + ',';
  for (const c of r.consulted) if (c.startsWith(open)) return true;
  return false;
}

/** Adds a `key-unread` finding to `r` for every key of its root nobody consulted (see the file comment). */
export function reportUnreadKeys(r: FieldReader): void {
  const visit = (block: SourceMapping, at: PathSegment[]): void => {
    for (const key of Object.keys(block)) {
      const path = [...at, key];
      const value = block[key];
      if (value === null || changesNoMetric(key) || r.reported(path)) continue;
      // A vision tower beside the language model is read (and reported) on its own.
      if (at.length === 0 && isMapping(value) && TOWER_KEY.test(key)) continue;
      if (isMapping(value) && READ_BLOCKS.has(key) && at.length === 0) {
        if (touched(r, path)) {
          visit(value, path);
          continue;
        }
      } else if (
        r.consulted.has(FieldReader.pathId(path)) ||
        (isMapping(value) && touched(r, path))
      )
        continue;
      r.report(
        'key-unread',
        path,
        r.full('key-unread')
          ? '' // counted, not listed: the message is not shown
          : `${r.key(path)} is not read: no metric follows it. If it changes the model's shape, position code or memory, the figures here leave it out; describe the model in the context-reach format to state it`,
      );
    }
  };
  visit(r.root, []);
}
