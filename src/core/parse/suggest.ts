/**
 * The known key an unknown one was most likely meant to be: a close spelling (after reading
 * `_` as `-`), or the context-reach name of a checkpoint key written in the wrong dialect.
 */
import { editDistance } from './nearest.js';

/** Checkpoint key names people carry over into the own dialect, and the key that replaces them. */
const CHECKPOINT_SYNONYMS: Readonly<Record<string, string>> = {
  num_hidden_layers: 'layers',
  n_layer: 'layers',
  hidden_size: 'hidden',
  n_embd: 'hidden',
  d_model: 'hidden',
  num_attention_heads: 'heads',
  n_head: 'heads',
  num_key_value_heads: 'kv-heads',
  head_dim: 'head-dim',
  intermediate_size: 'feed-forward',
  vocab_size: 'vocab',
  tie_word_embeddings: 'tied-output',
  max_position_embeddings: 'declared-span',
  n_positions: 'declared-span',
  rope_theta: 'position',
  rope_scaling: 'position',
  sliding_window: 'sliding-window',
  torch_dtype: 'dtypes',
  dtype: 'dtypes',
  initializer_range: 'embedding-init',
  num_local_experts: 'experts',
  original_max_position_embeddings: 'original-span',
  rope_type: 'kind',
  type: 'kind',
  max_seq_len: 'span',
};

function normalise(name: string): string {
  return name.toLowerCase().replace(/[_\s]+/g, '-');
}

/** The known key closest to `name`, or null when none is close enough to be a likely typo. */
export function suggestKey(name: string, known: readonly string[]): string | null {
  if (known.length === 0) return null;
  const synonym = Object.prototype.hasOwnProperty.call(CHECKPOINT_SYNONYMS, name)
    ? CHECKPOINT_SYNONYMS[name]
    : undefined;
  if (synonym !== undefined && known.includes(synonym)) return synonym;
  const probe = normalise(name.slice(0, 100));
  let best: string | null = null;
  let bestDistance = Infinity;
  for (const candidate of known) {
    const distance = editDistance(probe, normalise(candidate));
    if (distance < bestDistance) {
      best = candidate;
      bestDistance = distance;
    }
  }
  // A third of the name may be wrong before a guess stops helping: "kv-head" → "kv-heads" yes, "foo" → "bias" no.
  const allowed = Math.max(1, Math.floor(probe.length / 3));
  return bestDistance <= allowed ? best : null;
}
