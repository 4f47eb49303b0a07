/**
 * Checkpoint-style configs: mixtures of experts and latent attention (docs/metrics.md, "Mixtures of
 * experts and latent attention"), keyed as the published configs write them:
 * - Experts: `num_local_experts`, `num_experts` or `n_routed_experts` (a stated 0 or 1 is a dense
 *   model) with `num_experts_per_tok`; routed width `moe_intermediate_size` (default: the
 *   feed-forward width); shared experts `n_shared_experts` of the routed width (DeepSeek style),
 *   or one shared expert of `shared_expert_intermediate_size` with a `hidden → 1` gate on its
 *   output (Qwen2-MoE style: the published block has `shared_expert_gate`); dense layers:
 *   `first_k_dense_replace` with `moe_layer_freq` (DeepSeek style: layer i is a mixture when
 *   `i >= k` and `i % freq == 0`), or `mlp_only_layers` with `decoder_sparse_step` (Qwen-MoE
 *   style: layer i is a mixture when it is not listed and `(i + 1) % step == 0`).
 * - The same quantities under other names: ERNIE 4.5 (`moe_num_experts`, `moe_k`,
 *   `moe_num_shared_experts` of the routed width; a layer is a mixture when
 *   `moe_layer_start_index <= i <= moe_layer_end_index` (-1: the last layer) and
 *   `(i + 1) % moe_layer_interval == 0`, as the published decoder layer tests it); DBRX
 *   (`ffn_config.moe_num_experts`, `ffn_config.moe_top_k`, every expert `ffn_config.ffn_hidden_size`
 *   wide); Granite-MoE-shared (one ungated shared expert of `shared_intermediate_size`, 0 for none).
 * - Latent attention (Liu et al. 2024, DeepSeek-V2, §2.1): `kv_lora_rank` (d_c), `q_lora_rank`
 *   (d_c', null for a plain query projection), `qk_rope_head_dim` (d_h^R), `qk_nope_head_dim`,
 *   `v_head_dim`.
 */
import type { Experts, LatentAttention } from '../model.js';
import type { FieldReader } from './fields.js';
import { familyOf } from './checkpoint-families.js';
import { isCount } from '../metrics/sizes.js';
import { elementAt } from '../element-at.js';

type SizeReader = (
  field: string,
  candidates: string[],
  what: string,
  required: boolean,
) => number | undefined;

/**
 * Reads the experts block; null for a dense model. Llama-4-style configs (families with
 * `oneSharedExpert`) write the expert width as `intermediate_size` and the dense layers' width as
 * `intermediate_size_mlp`; their mixture layers are `moe_layers`, else every
 * `interleave_moe_layer_step`th layer; `denseFfn` then replaces the feed-forward width.
 */
export function readMixture(
  r: FieldReader,
  size: SizeReader,
  layers: number,
  modelType: string | null,
): { experts: Experts | null; denseFfn?: number } {
  const experts = readExperts(r, size, layers);
  if (experts === null || familyOf(modelType)?.oneSharedExpert !== true) {
    for (const key of ['intermediate_size_mlp', 'moe_layers', 'interleave_moe_layer_step']) {
      if (r.has([key]))
        r.report(
          'key-ignored',
          [key],
          `${r.key([key])} is not read: it belongs to Llama-4-style mixtures (model_type llama4 or llama4_text)${experts === null ? ' and no experts are stated' : ''}`,
        );
    }
    return { experts };
  }
  const width = size(
    'experts.width',
    ['intermediate_size'],
    'the width of one routed expert',
    false,
  );
  if (width !== undefined) experts.width = width;
  experts.shared = 1;
  r.locate('experts.shared', ['model_type']);
  const n = isCount(layers) && layers <= 1 << 16 ? layers : null;
  if (r.has(['moe_layers'])) {
    const list = r.get(['moe_layers']);
    r.locate('experts.denseLayers', ['moe_layers']);
    if (
      !Array.isArray(list) ||
      list.some((x) => typeof x !== 'number' || !Number.isSafeInteger(x) || x < 0)
    ) {
      r.report(
        'value-invalid',
        ['moe_layers'],
        `${r.key(['moe_layers'])} ${r.is(['moe_layers'])}; expected a list of layer indices`,
      );
      experts.denseLayers = NaN;
    } else if (n !== null)
      experts.denseLayers = n - new Set((list as number[]).filter((i) => i < n)).size;
  } else if (r.has(['interleave_moe_layer_step'])) {
    const step = r.count(
      'experts.denseLayers',
      ['interleave_moe_layer_step'],
      'every Nth layer is a mixture',
    );
    if (step === undefined || !isCount(step)) {
      if (step !== undefined && !Number.isNaN(step))
        r.report(
          'value-invalid',
          ['interleave_moe_layer_step'],
          `${r.key(['interleave_moe_layer_step'])} is ${r.quote(['interleave_moe_layer_step'])}; expected a whole number of at least 1`,
        );
      experts.denseLayers = NaN;
    } else if (n !== null) experts.denseLayers = n - countLayers(n, (i) => (i + 1) % step === 0);
  }
  const denseFfn = size(
    'ffn',
    ['intermediate_size_mlp'],
    "the dense layers' feed-forward width",
    false,
  );
  return denseFfn === undefined ? { experts } : { experts, denseFfn };
}

/** Reads the experts block; null for a dense model. */
export function readExperts(r: FieldReader, size: SizeReader, layers: number): Experts | null {
  const totalPath = r.first(TOTAL_PATHS);
  if (totalPath === null) return null;
  // Dense configs of mixture-capable families write 0 or 1 experts.
  const stated = r.get(totalPath);
  if (stated === 0 || stated === 1) return null;
  const activePath = r.first(ACTIVE_PATHS);
  const experts: Experts = {
    total: r.count('experts.total', totalPath, 'the number of experts') ?? NaN,
    active:
      activePath === null
        ? r.missing(elementAt(ACTIVE_PATHS, 0), 'the number of experts each token uses')
        : (r.count('experts.active', activePath, 'the number of experts each token uses') ?? NaN),
  };
  const width = size(
    'experts.width',
    ['moe_intermediate_size'],
    'the width of one routed expert',
    false,
  );
  if (width !== undefined) experts.width = width;

  const sharedCount = size(
    'experts.shared',
    ['n_shared_experts', 'moe_num_shared_experts'],
    'shared experts',
    false,
  );
  const sharedWidth = size(
    'experts.sharedWidth',
    ['shared_expert_intermediate_size'],
    'the width of the shared expert',
    false,
  );
  if (sharedCount !== undefined && sharedWidth !== undefined) {
    r.report(
      'key-ignored',
      ['shared_expert_intermediate_size'],
      `${r.key(['shared_expert_intermediate_size'])} is not read: n_shared_experts (${sharedCount}) already states the shared experts, each as wide as a routed expert; remove one of them`,
    );
  }
  if (sharedCount !== undefined) experts.shared = sharedCount;
  else if (sharedWidth !== undefined && sharedWidth !== 0) {
    experts.shared = 1;
    experts.sharedWidth = sharedWidth;
    experts.sharedGate = true;
  } else if (sharedWidth === undefined && r.has(['shared_intermediate_size'])) {
    // Granite-MoE-shared: one shared expert, its output added without a gate.
    const plain = r.count(
      'experts.sharedWidth',
      ['shared_intermediate_size'],
      'the width of the shared expert',
    );
    if (plain !== undefined && plain !== 0) {
      experts.shared = 1;
      experts.sharedWidth = plain;
    }
  }

  const dense = readDenseLayers(r, layers);
  if (dense !== null) experts.denseLayers = dense;
  return experts;
}

/** Where published configs state the number of routed experts, first match. */
const TOTAL_PATHS: string[][] = [
  ['num_local_experts'],
  ['num_experts'],
  ['n_routed_experts'],
  ['moe_num_experts'],
  ['ffn_config', 'moe_num_experts'],
];
/** Where they state the experts each token uses. */
const ACTIVE_PATHS: string[][] = [['num_experts_per_tok'], ['moe_k'], ['ffn_config', 'moe_top_k']];

/** count: the N of "every Nth layer is a mixture" stated at `key` (1 when not stated). */
function layerStep(r: FieldReader, key: string): number | undefined {
  return r.has([key]) ? r.count('experts.denseLayers', [key], 'every Nth layer is a mixture') : 1;
}

/** Whether a layer step read from `key` is not a whole number of at least 1 (reported). */
function badStep(r: FieldReader, key: string, step: number): boolean {
  if (isCount(step)) return false;
  r.report(
    'value-invalid',
    [key],
    `${r.key([key])} is ${r.quote([key])}; expected a whole number of at least 1`,
  );
  return true;
}

/** count: decoder layers with a dense feed-forward; null when none are stated (every layer is a mixture). */
function readDenseLayers(r: FieldReader, layers: number): number | null {
  const n = isCount(layers) && layers <= 1 << 16 ? layers : null;
  if (r.has(['first_k_dense_replace']) || r.has(['moe_layer_freq'])) {
    const k = r.has(['first_k_dense_replace'])
      ? r.count('experts.denseLayers', ['first_k_dense_replace'], 'leading dense layers')
      : 0;
    const freq = layerStep(r, 'moe_layer_freq');
    if (k === undefined || freq === undefined || Number.isNaN(k) || Number.isNaN(freq)) return NaN;
    if (badStep(r, 'moe_layer_freq', freq)) return NaN;
    if (n === null) return null;
    return n - countLayers(n, (i) => i >= k && i % freq === 0);
  }
  if (
    r.has(['moe_layer_start_index']) ||
    r.has(['moe_layer_end_index']) ||
    r.has(['moe_layer_interval'])
  ) {
    const start = r.has(['moe_layer_start_index'])
      ? r.count('experts.denseLayers', ['moe_layer_start_index'], 'the first mixture layer')
      : 0;
    const endStated = r.get(['moe_layer_end_index']);
    const end =
      endStated === undefined || endStated === -1
        ? n === null
          ? NaN
          : n - 1
        : r.count('experts.denseLayers', ['moe_layer_end_index'], 'the last mixture layer');
    const step = layerStep(r, 'moe_layer_interval');
    if (start === undefined || end === undefined || step === undefined) return NaN;
    if (Number.isNaN(start) || Number.isNaN(step) || (Number.isNaN(end) && n !== null)) return NaN;
    if (badStep(r, 'moe_layer_interval', step)) return NaN;
    if (n === null) return null;
    return n - countLayers(n, (i) => i >= start && i <= end && (i + 1) % step === 0);
  }
  if (r.has(['mlp_only_layers']) || r.has(['decoder_sparse_step'])) {
    const listPath = ['mlp_only_layers'];
    const list = r.get(listPath) ?? [];
    if (r.has(listPath)) r.locate('experts.denseLayers', listPath);
    if (
      !Array.isArray(list) ||
      list.some((x) => typeof x !== 'number' || !Number.isSafeInteger(x) || x < 0)
    ) {
      r.report(
        'value-invalid',
        listPath,
        `${r.key(listPath)} ${r.is(listPath)}; expected a list of layer indices`,
      );
      return NaN;
    }
    const step = r.has(['decoder_sparse_step'])
      ? r.count('experts.denseLayers', ['decoder_sparse_step'], 'every Nth layer is a mixture')
      : 1;
    if (step === undefined || Number.isNaN(step)) return NaN;
    if (!isCount(step)) {
      r.report(
        'value-invalid',
        ['decoder_sparse_step'],
        `${r.key(['decoder_sparse_step'])} is ${r.quote(['decoder_sparse_step'])}; expected a whole number of at least 1`,
      );
      return NaN;
    }
    if (n === null) return null;
    const denseListed = new Set(list as number[]);
    return n - countLayers(n, (i) => !denseListed.has(i) && (i + 1) % step === 0);
  }
  return null;
}

function countLayers(n: number, test: (i: number) => boolean): number {
  let c = 0;
  for (let i = 0; i < n; i++) if (test(i)) c++;
  return c;
}

/** Reads latent attention; null when `kv_lora_rank` is absent (plain attention). */
export function readLatent(r: FieldReader, size: SizeReader): LatentAttention | null {
  if (!r.has(['kv_lora_rank'])) {
    for (const key of ['q_lora_rank', 'qk_rope_head_dim', 'qk_nope_head_dim', 'v_head_dim']) {
      if (r.has([key]))
        r.report(
          'key-ignored',
          [key],
          `${r.key([key])} has no effect: it belongs to latent attention, which kv_lora_rank turns on, and kv_lora_rank is not stated`,
        );
    }
    return null;
  }
  return {
    kvRank: size('latent.kvRank', ['kv_lora_rank'], 'the compressed key/value width d_c', true)!,
    qRank: size('latent.qRank', ['q_lora_rank'], 'the compressed query width', false) ?? null,
    ropeDim: size(
      'latent.ropeDim',
      ['qk_rope_head_dim'],
      'the decoupled rotary width per head',
      true,
    )!,
    nopeDim: size(
      'latent.nopeDim',
      ['qk_nope_head_dim'],
      'the query/key width without position code per head',
      true,
    )!,
    valueDim: size('latent.valueDim', ['v_head_dim'], 'the value width per head', true)!,
  };
}
