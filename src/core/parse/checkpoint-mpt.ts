/**
 * MPT-style keys (MosaicML): `n_layers`, `n_heads`, `d_model`, `expansion_ratio`, `no_bias`,
 * `max_seq_len`, and the `attn_config` / `ffn_config` blocks. The size keys are aliases read by
 * the main reader; here: key/value heads from `attn_config.attn_type`, the feed-forward width
 * from `ffn_config` or `expansion_ratio · d_model`, and a gated block from `ffn_config.ffn_type`.
 */
import type { FieldReader } from './fields.js';
import { isCount } from '../metrics/sizes.js';

export interface MptAttention {
  /** Key/value heads implied by `attn_config.attn_type`, when it says. */
  kvHeads: number | undefined;
  /** Feed-forward width from `ffn_config.ffn_hidden_size` or `expansion_ratio · hidden`, when stated. */
  ffn(hidden: number): number | undefined;
  /** `ffn_config.ffn_type` "mptglu" is gated. */
  gated: boolean | undefined;
}

/** ALiBi's largest bias exponent as the ALiBi paper sets it (Press et al. 2022, section 3: slopes 2^(-8j/n)). */
const ALIBI_BIAS_MAX = 8;

export function readMptAttention(r: FieldReader): MptAttention {
  let kvHeads: number | undefined;
  const type = r.text(null, ['attn_config', 'attn_type'], 'an attention type');
  if (type === 'multiquery_attention') {
    r.locate('kvHeads', ['attn_config', 'attn_type']);
    kvHeads = 1;
  } else if (type === 'grouped_query_attention') {
    kvHeads =
      r.count('kvHeads', ['attn_config', 'kv_n_heads'], 'key/value heads') ??
      r.missing(
        ['attn_config', 'kv_n_heads'],
        'the number of key/value heads of grouped-query attention',
      );
  } else if (type !== undefined && type !== 'multihead_attention') {
    r.report(
      'value-invalid',
      ['attn_config', 'attn_type'],
      `${r.key(['attn_config', 'attn_type'])} is ${r.quote(['attn_config', 'attn_type'])}; expected multihead_attention, multiquery_attention or grouped_query_attention`,
    );
  }
  const biasMax = r.real(
    'position.alibiBiasMax',
    ['attn_config', 'alibi_bias_max'],
    'largest ALiBi bias exponent',
  );
  if (
    biasMax !== undefined &&
    !Number.isNaN(biasMax) &&
    biasMax !== ALIBI_BIAS_MAX &&
    r.get(['attn_config', 'alibi']) === true
  ) {
    r.report(
      'key-ignored',
      ['attn_config', 'alibi_bias_max'],
      `${r.key(['attn_config', 'alibi_bias_max'])} is ${biasMax}; alibiSlopes and alibiHorizon use the ALiBi paper's slopes 2^(-8j/n) (bias max ${ALIBI_BIAS_MAX}, Press et al. 2022, section 3), so they do not follow this value`,
    );
  }
  if (r.get(['attn_config', 'qk_ln']) === true) {
    r.report(
      'key-ignored',
      ['attn_config', 'qk_ln'],
      `${r.key(['attn_config', 'qk_ln'])} is true: the query and key LayerNorms it adds (a few thousand weights per layer) are not counted in params`,
    );
  }
  const ffnType = r.text(null, ['ffn_config', 'ffn_type'], 'a feed-forward type');
  return {
    kvHeads,
    gated: ffnType === undefined ? undefined : ffnType === 'mptglu',
    ffn(hidden: number): number | undefined {
      const stated = r.count('ffn', ['ffn_config', 'ffn_hidden_size'], 'feed-forward width');
      if (stated !== undefined) return stated;
      const ratio = r.real('ffn', ['expansion_ratio'], 'feed-forward width over model width', {
        test: (n) => n > 0,
        expected: 'a ratio above 0',
      });
      if (ratio === undefined) return undefined;
      return isCount(hidden) && Number.isFinite(ratio) ? Math.round(ratio * hidden) : NaN;
    },
  };
}
