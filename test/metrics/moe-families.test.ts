/**
 * Mixture-of-experts families teams run today, read from their config.json as published (the
 * fixtures copy the published key style; GLM-4.5-Air, the Granite shared expert and the ERNIE
 * layer ranges are derived from them in the tests) and checked against the totals their model
 * cards, reports and papers print. Exact counts are hand counts of the published architecture
 * (per layer: attention, norms, dense or mixture feed-forward with router; embeddings); "from
 * memory" marks a published figure recalled and not re-read.
 */
import { describe, expect, it } from 'vitest';
import { computeMetrics, frequencyPlan } from '../../src/core/metrics/compute.js';
import { parameterBreakdown } from '../../src/core/metrics/parameter-count.js';
import type { ModelSpec } from '../../src/core/model.js';
import { readModel } from '../../src/core/parse/read-model.js';
import { specFindings } from '../../src/core/rules/spec-rules.js';
import { configText, fixture } from '../parse/helpers.js';

function readText(text: string, name = 'config.json') {
  const r = readModel(text, name);
  return { ...r, all: [...r.findings, ...specFindings(r.spec, r.locations)] };
}
const read = (name: string) => readText(fixture(name), name);
const json = (name: string) => JSON.parse(fixture(name)) as Record<string, unknown>;

function metricsAt(spec: ModelSpec, span: number) {
  return computeMetrics({ ...spec, serving: { ...spec.serving, span } });
}

const rel = (x: number | null, y: number) => Math.abs((x as number) - y) / y;
const blocking = (all: { severity: string }[]) => all.filter((f) => f.severity === 'block');

describe('GLM-4.5 (model_type glm4_moe)', () => {
  it('reads 355B total and 32B active (GLM-4.5 model card, Zhipu AI 2025: 355B total, 32B active) from the hand count of its shapes', () => {
    const { spec, all } = read('glm4-5-moe.json');
    expect(blocking(all)).toEqual([]);
    expect(spec.experts).toMatchObject({
      total: 160,
      active: 8,
      width: 1536,
      shared: 1,
      denseLayers: 3,
    });
    const m = metricsAt(spec, 4096);
    // Hand count: 92 layers of attention (q 5120·96·128, k and v 5120·8·128, o 96·128·5120) with
    // per-head q/k norms (use_qk_norm) and two RMS norms; 3 dense SwiGLU layers of 12288; 89
    // mixture layers of 160 + 1 shared experts of 1536 and a 5120·160 router; untied embeddings.
    expect(m.params).toBe(352_796_495_872);
    // The card's 355B also holds the multi-token-prediction layer, which a finding names (0.6% here).
    expect(rel(m.params, 355e9)).toBeLessThan(0.01);
    // The card counts the active experts and layers without either embedding table.
    expect(m.nonEmbeddingParams).toBe(32_079_040_512);
    expect(rel(m.nonEmbeddingParams, 32e9)).toBeLessThan(0.01);
  });

  it('GLM-4.5-Air reads 106B total and 12B active (GLM-4.5 model card: 106B total, 12B active); no query/key norms without use_qk_norm', () => {
    const air = {
      ...json('glm4-5-moe.json'),
      hidden_size: 4096,
      intermediate_size: 10944,
      moe_intermediate_size: 1408,
      n_routed_experts: 128,
      first_k_dense_replace: 1,
      num_hidden_layers: 46,
      routed_scaling_factor: 1.0,
      use_qk_norm: false,
    };
    const { spec } = readText(configText(air));
    expect(spec.qkNorms ?? false).toBe(false);
    const m = metricsAt(spec, 4096);
    expect(m.params).toBe(106_851_586_048);
    expect(rel(m.params, 106e9)).toBeLessThan(0.01);
    expect(rel(m.nonEmbeddingParams, 12e9)).toBeLessThan(0.02);
  });

  it('counts use_qk_norm as per-head query and key norms: 2 · 128 weights on each of 92 layers (transformers Glm4MoeAttention: q_norm, k_norm of head_dim)', () => {
    const on = metricsAt(read('glm4-5-moe.json').spec, 4096).params!;
    const off = metricsAt(
      readText(configText({ ...json('glm4-5-moe.json'), use_qk_norm: false })).spec,
      4096,
    ).params!;
    expect(on - off).toBe(92 * 2 * 128);
  });

  it('reads attention_bias as biases on q, k, v only: no feed-forward or norm biases are counted, and a finding names the 1,318,912 left out', () => {
    const { spec, findings } = read('glm4-5-moe.json');
    expect(spec.bias).toBe(false);
    const f = findings.find((x) => x.key === 'attention_bias');
    expect(f?.rule).toBe('key-ignored');
    // 92 · (96 + 2 · 8) · 128: the q, k, v bias vectors of the published attention.
    expect(f?.message).toContain('low by 1,318,912');
  });

  it('names the multi-token-prediction layer it does not count (num_nextn_predict_layers: 1), and none for 0', () => {
    const { findings } = read('glm4-5-moe.json');
    const f = findings.find((x) => x.key === 'num_nextn_predict_layers');
    expect(f?.rule).toBe('key-ignored');
    expect(f?.message).toContain('params is low by about 1 layer');
    const zero = readText(configText({ ...json('glm4-5-moe.json'), num_nextn_predict_layers: 0 }));
    expect(zero.findings.filter((x) => x.key === 'num_nextn_predict_layers')).toEqual([]);
  });

  it('caches 2 · 8 · 128 · 2 bytes on each of 92 layers (376,832 B per token) and rotates half of each 128-wide head at base 10^6 (config.json: partial_rotary_factor 0.5, rope_theta 1000000)', () => {
    const { spec } = read('glm4-5-moe.json');
    const m = metricsAt(spec, 4096);
    expect(m.cachePerTokenBytes).toBe(92 * 2 * 8 * 128 * 2);
    expect(spec.position).toMatchObject({ kind: 'rotary', base: 1e6, fraction: 0.5 });
    // 32 pairs of a 64-wide rotary part: the slowest wavelength is 2π · base^(62/64) (Su et al. 2021, eq. 15).
    expect(rel(m.slowestWavelength, 2 * Math.PI * Math.pow(1e6, 62 / 64))).toBeLessThan(1e-12);
  });
});

describe('OLMoE-1B-7B (model_type olmoe)', () => {
  it('reads 6.9B total and 1.3B active (Muennighoff et al. 2024, OLMoE, Table 1, from memory), 64 experts top 8', () => {
    const { spec, all } = read('olmoe-1b-7b.json');
    expect(blocking(all)).toEqual([]);
    expect(spec.experts).toMatchObject({ total: 64, active: 8 });
    const m = metricsAt(spec, 4096);
    expect(m.params).toBe(6_919_096_320);
    expect(m.activeParams).toBe(1_281_951_744);
    expect(rel(m.params, 6.9e9)).toBeLessThan(0.01);
    expect(rel(m.activeParams, 1.3e9)).toBeLessThan(0.02);
    expect(m.cachePerTokenBytes).toBe(16 * 2 * 16 * 128 * 2);
  });

  it('names the all-head query/key norms it leaves out (transformers OlmoeAttention: q_norm of hidden, k_norm of kvHeads · headDim): 16 · 4,096', () => {
    const { findings } = read('olmoe-1b-7b.json');
    const f = findings.find((x) => x.key === 'model_type' && x.rule === 'key-ignored');
    expect(f?.message).toContain('low by 65,536');
  });
});

describe('Phi-3.5-MoE (model_type phimoe)', () => {
  // The fixture's long_factor and short_factor lists are 64 placeholder 1.0s, not the published
  // values (not re-read): only the shapes, counts and the rotary base are checked here.
  it('reads 41.9B total and 6.6B active (Abdin et al. 2024, Phi-3 technical report, phi-3.5-MoE, from memory), 16 experts top 2', () => {
    const { spec, all } = read('phimoe-longrope.json');
    expect(blocking(all)).toEqual([]);
    expect(spec.experts).toMatchObject({ total: 16, active: 2 });
    const m = metricsAt(spec, 4096);
    expect(rel(m.params, 41.9e9)).toBeLessThan(0.005);
    expect(rel(m.activeParams, 6.6e9)).toBeLessThan(0.01);
    expect(m.cachePerTokenBytes).toBe(32 * 2 * 8 * 128 * 2);
    expect(spec.position).toMatchObject({ kind: 'rotary', base: 10000 });
  });

  it('names what its bias keys make the count miss: no expert biases (transformers PhimoeBlockSparseTop2MLP: w1, w2, w3 without bias) and the output bias (lm_head_bias); with them the hand count is exact', () => {
    const { spec, findings } = read('phimoe-longrope.json');
    const experts = findings.find((f) => f.key === 'attention_bias');
    expect(experts?.rule).toBe('key-ignored');
    // 32 layers · 16 experts · (2 · 6400 + 4096) bias weights; 2 active experts of them.
    expect(experts?.message).toContain('params is high by 8,650,752, activeParams by 1,081,344');
    const head = findings.find((f) => f.key === 'lm_head_bias');
    expect(head?.message).toContain('(32,064 weights)');
    const m = metricsAt(spec, 4096);
    // Hand count: attention with q, k, v, o biases, two LayerNorms with shifts per layer, 16
    // unbiased SwiGLU experts of 6400 and a 4096·16 router, a final LayerNorm, untied embeddings
    // and the output bias: 41,873,153,344 total, 6,640,999,744 active.
    expect(m.params! - 8_650_752 + 32_064).toBe(41_873_153_344);
    expect(m.activeParams! - 1_081_344 + 32_064).toBe(6_640_999_744);
  });
});

describe('DBRX (model_type dbrx, nested attn_config and ffn_config)', () => {
  it('reads 132B total and 36B active (Databricks 2024, DBRX release: 132B total, 36B active, 16 experts choose 4, from memory)', () => {
    const { spec, all } = read('dbrx-nested.json');
    expect(blocking(all)).toEqual([]);
    expect(spec).toMatchObject({ hidden: 6144, heads: 48, kvHeads: 8, layers: 40, gated: true });
    expect(spec.experts).toMatchObject({ total: 16, active: 4 });
    const m = metricsAt(spec, 4096);
    // Hand count: 40 layers of attention (6144·6144 q and o, 6144·8·128 k and v), 16 GLU experts
    // of 10752 and a 6144·16 router, two norms; untied embeddings of 100352.
    expect(m.params).toBe(131_596_523_520);
    expect(m.activeParams).toBe(36_469_708_800);
    expect(rel(m.params, 132e9)).toBeLessThan(0.01);
    expect(rel(m.activeParams, 36e9)).toBeLessThan(0.02);
  });

  it('reads the rotary base from attn_config.rope_theta and caches 8 key/value heads (attn_config.kv_n_heads): 163,840 B per token', () => {
    const { spec, findings } = read('dbrx-nested.json');
    expect(spec.position).toMatchObject({ kind: 'rotary', base: 500000 });
    expect(findings.filter((f) => f.rule === 'position-code-assumed')).toEqual([]);
    expect(metricsAt(spec, 4096).cachePerTokenBytes).toBe(40 * 2 * 8 * 128 * 2);
  });

  it('reads the same figures from the expanded form some copies save (each block with its own config-class fields, ffn_act_fn, uniform_expert_assignment); only the block-level extras are unread', () => {
    const config = json('dbrx-nested.json');
    const attn = config.attn_config as Record<string, unknown>;
    const ffn = config.ffn_config as Record<string, unknown>;
    const expanded = {
      ...config,
      attn_config: { ...attn, return_dict: true, tie_word_embeddings: true, attn_pdrop: 0 },
      ffn_config: {
        ...ffn,
        return_dict: true,
        tie_word_embeddings: true,
        ffn_act_fn: { name: 'silu' },
        moe_normalize_expert_weights: 1,
        uniform_expert_assignment: false,
      },
    };
    const { spec, findings } = readText(configText(expanded));
    expect(findings.filter((f) => f.rule === 'key-unread').map((f) => f.key)).toEqual([
      'attn_config.tie_word_embeddings',
      'ffn_config.tie_word_embeddings',
    ]);
    expect(spec.tied).toBe(false);
    expect(metricsAt(spec, 4096).params).toBe(131_596_523_520);
  });

  it("takes DbrxAttentionConfig's 1 key/value head when attn_config states none, and says so", () => {
    const config = json('dbrx-nested.json');
    const { spec, findings } = readText(
      configText({ ...config, attn_config: { rope_theta: 500000 } }),
    );
    expect(spec.kvHeads).toBe(1);
    expect(findings.find((f) => f.rule === 'family-default-taken')?.message).toContain(
      'attn_config.kv_n_heads',
    );
  });
});

describe('Granite 3.0 mixtures (model_type granitemoe, granitemoeshared)', () => {
  it('granite-3.0-3b-a800m reads 3.3B total and 800M active without embeddings (IBM 2024, Granite 3.0 report, from memory)', () => {
    const { spec, all } = read('granitemoe-3b.json');
    expect(blocking(all)).toEqual([]);
    const m = metricsAt(spec, 4096);
    expect(m.params).toBe(3_298_793_472);
    expect(rel(m.params, 3.3e9)).toBeLessThan(0.01);
    expect(rel(m.nonEmbeddingParams, 800e6)).toBeLessThan(0.01);
    expect(m.cachePerTokenBytes).toBe(32 * 2 * 8 * 64 * 2);
  });

  it('reads embedding_multiplier as the embedding factor (GraniteMoeModel multiplies inputs_embeds by it), and its routing and scaling keys raise no key-unread', () => {
    const { spec, findings } = read('granitemoe-3b.json');
    expect(spec.embeddingMultiplier).toBe(12);
    expect(findings.filter((f) => f.rule === 'key-unread')).toEqual([]);
  });

  it('shared_intermediate_size adds one ungated shared expert to every mixture layer (transformers GraniteMoeSharedMLP: input_linear hidden → 2w, output_linear w → hidden), and 0 adds none', () => {
    const base = { ...json('granitemoe-3b.json'), model_type: 'granitemoeshared' };
    const plain = readText(configText({ ...base, shared_intermediate_size: 0 })).spec;
    const shared = readText(configText({ ...base, shared_intermediate_size: 1024 })).spec;
    expect(plain.experts?.shared ?? 0).toBe(0);
    expect(shared.experts).toMatchObject({ shared: 1, sharedWidth: 1024 });
    expect(shared.experts?.sharedGate ?? false).toBe(false);
    const diff = metricsAt(shared, 4096).params! - metricsAt(plain, 4096).params!;
    expect(diff).toBe(32 * 3 * 1536 * 1024);
  });
});

describe('ERNIE 4.5 mixtures (model_type ernie4_5_moe)', () => {
  it('ERNIE-4.5-21B-A3B reads 21B total and 3B active (Baidu 2025, ERNIE 4.5 model card: 21B total, 3B activated) from moe_num_experts, moe_k and moe_num_shared_experts', () => {
    const { spec, all } = read('ernie4-5-21b-moe.json');
    expect(blocking(all)).toEqual([]);
    expect(spec.experts).toMatchObject({
      total: 64,
      active: 6,
      width: 1536,
      shared: 2,
      denseLayers: 1,
    });
    const m = metricsAt(spec, 4096);
    // Hand count: 28 layers of attention (2560·20·128 q and o, 2560·4·128 k and v), layer 0 dense
    // (12288), 27 mixture layers of 64 routed and a 2 · 1536 shared expert with a 2560·64 router;
    // tied embeddings of 103424.
    expect(m.params).toBe(21_825_436_160);
    // The card prints 21B for this 21.8B: a truncation, so the check is the interval it names.
    expect(m.params).toBeGreaterThanOrEqual(21e9);
    expect(m.params).toBeLessThan(22e9);
    expect(rel(m.nonEmbeddingParams, 3e9)).toBeLessThan(0.03);
    expect(m.cachePerTokenBytes).toBe(28 * 2 * 4 * 128 * 2);
  });

  it('a layer is a mixture when start <= i <= end and (i + 1) % interval == 0 (transformers Ernie4_5_MoeDecoderLayer), end -1 meaning the last', () => {
    const base = json('ernie4-5-21b-moe.json');
    const layers = (extra: Record<string, unknown>) =>
      readText(configText({ ...base, ...extra })).spec.experts?.denseLayers;
    // Mixture layers 1, 3, …, 27: 14 of 28.
    expect(layers({ moe_layer_interval: 2 })).toBe(14);
    // Mixture layers 3..20: 18 of 28.
    expect(layers({ moe_layer_start_index: 3, moe_layer_end_index: 20 })).toBe(10);
    expect(layers({ moe_layer_end_index: -1 })).toBe(1);
    // Copies of the published config write the end as 27 or null (not set): the same 27 mixtures.
    expect(layers({ moe_layer_end_index: 27 })).toBe(1);
    expect(layers({ moe_layer_end_index: null, head_dim: null })).toBe(1);
  });
});

describe('Kimi K2 (model_type deepseek_v3, 384 routed experts)', () => {
  it('reads 1.04T total and 32B active (Kimi Team 2025, Kimi K2 technical report: 1.04T total, 32B activated, from memory), counted as DeepSeek-V3 is', () => {
    const { spec } = read('kimi-k2-latent.json');
    expect(spec.experts).toMatchObject({
      total: 384,
      active: 8,
      width: 2048,
      shared: 1,
      denseLayers: 1,
    });
    expect(spec.latent).toMatchObject({
      kvRank: 512,
      qRank: 1536,
      ropeDim: 64,
      nopeDim: 128,
      valueDim: 128,
    });
    const b = parameterBreakdown(spec)!;
    expect(b.params).toBe(1_026_408_209_408);
    expect(rel(b.params, 1.04e12)).toBeLessThan(0.02);
    // As for DeepSeek-V2-Lite (families.test.ts): the active figure without the input lookup table.
    expect(rel(b.activeParams - b.embedding, 32e9)).toBeLessThan(0.02);
    // The same reading of DeepSeek-V3 (256 experts, 128 heads, 3 dense layers, vocab 129280) gives
    // its 671B (DeepSeek-V3 technical report 2024, from memory).
    const v3 = readText(
      configText({
        ...json('kimi-k2-latent.json'),
        n_routed_experts: 256,
        num_attention_heads: 128,
        num_key_value_heads: 128,
        first_k_dense_replace: 3,
        vocab_size: 129280,
      }),
    ).spec;
    expect(rel(parameterBreakdown(v3)!.params, 671e9)).toBeLessThan(0.005);
  });

  it('reads its yarn scaling (factor 32 from 4,096, beta_fast = beta_slow = 1) as a step, not an invalid ramp: no blocking finding, θ/32 exactly for pairs turning at most once over 4,096 tokens', () => {
    const { spec, all } = read('kimi-k2-latent.json');
    expect(blocking(all)).toEqual([]);
    expect(spec.position).toMatchObject({
      kind: 'rotary',
      base: 50000,
      scaling: { kind: 'yarn', factor: 32, originalSpan: 4096, alpha: 1, beta: 1 },
    });
    // The reference is the ramp's limit written out per pair (docs/metrics.md, yarn): ρ = L0/λ
    // over the 32 pairs of the 64-wide decoupled rotary part (Liu et al. 2024, §2.1).
    const plan = frequencyPlan(spec, 131072, 4096)!;
    expect(plan.theta.length).toBe(32);
    let scaled = 0;
    for (const [i, t] of plan.theta.entries()) {
      const rho = 4096 / ((2 * Math.PI) / t);
      const expected = rho > 1 ? t : t / 32;
      if (rho <= 1) scaled++;
      expect(Object.is(plan.scaled[i], expected), `pair ${i}`).toBe(true);
    }
    expect(scaled).toBeGreaterThan(0);
    expect(scaled).toBeLessThan(32);
  });

  it('caches the latent, (512 + 64) · 2 bytes on each of 61 layers (DeepSeek-V2, Table 1)', () => {
    const { spec } = read('kimi-k2-latent.json');
    expect(metricsAt(spec, 4096).cachePerTokenBytes).toBe(61 * 576 * 2);
  });
});
