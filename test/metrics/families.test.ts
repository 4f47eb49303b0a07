/**
 * Model families with experts, latent attention, layers that differ and encoder-only stacks, read
 * from configs written in the published key style (fixtures/checkpoints, invented files) and
 * checked against the families' own papers and technical reports. Each check names its source;
 * "from memory" marks a figure recalled and not re-read.
 */
import { describe, expect, it } from 'vitest';
import { computeMetrics } from '../../src/core/metrics/compute.js';
import { parameterBreakdown } from '../../src/core/metrics/parameter-count.js';
import type { ModelSpec } from '../../src/core/model.js';
import { readModel } from '../../src/core/parse/read-model.js';
import { specFindings } from '../../src/core/rules/spec-rules.js';
import { configText, fixture } from '../parse/helpers.js';

function read(name: string) {
  const r = readModel(fixture(name), name);
  return { ...r, all: [...r.findings, ...specFindings(r.spec, r.locations)] };
}

function withSpan(spec: ModelSpec, span: number): ModelSpec {
  return { ...spec, serving: { ...spec.serving, span } };
}

const rel = (x: number | null, y: number) => Math.abs((x as number) - y) / y;

describe('mixtures of experts against the published totals', () => {
  it('DeepSeek-V2-Lite reads at 15.7B parameters (Liu et al. 2024, DeepSeek-V2, Appendix B: 15.7B total), no blocking finding', () => {
    const { spec, all } = read('deepseek-v2-lite-latent.json');
    expect(all.filter((f) => f.severity === 'block')).toEqual([]);
    expect(spec.experts).toMatchObject({
      total: 64,
      active: 6,
      width: 1408,
      shared: 2,
      denseLayers: 1,
    });
    const m = computeMetrics(withSpan(spec, 4096));
    expect(rel(m.params, 15.7e9)).toBeLessThan(0.02);
    // Architecture count, derived by hand from the published shapes: 15,706,484,224.
    expect(m.params).toBe(15_706_484_224);
  });

  it('DeepSeek-V2-Lite activates 2.4B per token (DeepSeek-V2, Appendix B) when the input embedding lookup is not counted', () => {
    const { spec } = read('deepseek-v2-lite-latent.json');
    const b = parameterBreakdown(spec)!;
    // activeParams counts both embedding tables (docs/metrics.md): 2.661B. The paper's convention is
    // not stated; the nearest is the count without the input lookup table, 2.451B, 2.14% above
    // the printed 2.4B (without either table 2.244B, 6.5% below). The tolerance, 2.5%, is wider
    // than the 2% the totals meet: no counting convention lands within 2% of this one figure.
    expect(b.activeParams).toBe(2_661_150_208);
    expect(rel(b.activeParams - b.embedding, 2.4e9)).toBeLessThan(0.025);
  });

  it('DeepSeek-V2 (236B total, 21B activated; DeepSeek-V2 §1, from memory) reads within 2% on both', () => {
    const text = fixture('deepseek-v2-lite-latent.json')
      .replace('"hidden_size": 2048', '"hidden_size": 5120')
      .replace('"intermediate_size": 10944', '"intermediate_size": 12288')
      .replace('"moe_intermediate_size": 1408', '"moe_intermediate_size": 1536')
      .replace('"num_hidden_layers": 27', '"num_hidden_layers": 60')
      .replace('"num_attention_heads": 16', '"num_attention_heads": 128')
      .replace('"num_key_value_heads": 16', '"num_key_value_heads": 128')
      .replace('"n_routed_experts": 64', '"n_routed_experts": 160')
      .replace('"q_lora_rank": null', '"q_lora_rank": 1536');
    const { spec } = readModel(text, 'config.json');
    const m = computeMetrics(withSpan(spec, 4096));
    expect(rel(m.params, 236e9)).toBeLessThan(0.02);
    expect(rel(m.activeParams, 21e9)).toBeLessThan(0.02);
  });

  it('Qwen3-30B-A3B reads at 30.5B total and 3.3B activated (Qwen3 technical report 2025, Table 2, from memory)', () => {
    const { spec, all } = read('qwen3-moe-experts.json');
    expect(all.filter((f) => f.severity === 'block')).toEqual([]);
    const m = computeMetrics(withSpan(spec, 4096));
    expect(rel(m.params, 30.5e9)).toBeLessThan(0.02);
    expect(rel(m.activeParams, 3.3e9)).toBeLessThan(0.02);
  });

  it('Qwen1.5-MoE-A2.7B style: one gated shared expert of shared_expert_intermediate_size; 14.3B total, 2.7B activated (Qwen team 2024 model release, from memory)', () => {
    const { spec } = read('qwen2-moe-shared-expert.json');
    expect(spec.experts).toMatchObject({
      total: 60,
      active: 4,
      width: 1408,
      shared: 1,
      sharedWidth: 5632,
      sharedGate: true,
    });
    const m = computeMetrics(withSpan(spec, 4096));
    expect(rel(m.params, 14.3e9)).toBeLessThan(0.02);
    expect(rel(m.activeParams, 2.7e9)).toBeLessThan(0.02);
  });

  it('Mixtral reads at 47B total and 13B active, 8 experts top 2 (Jiang et al. 2024, Mixtral of Experts, §2)', () => {
    const { spec } = read('mixtral-moe.json');
    const m = computeMetrics(withSpan(spec, 4096));
    expect(spec.experts).toMatchObject({ total: 8, active: 2 });
    expect(rel(m.params, 47e9)).toBeLessThan(0.02);
    expect(rel(m.activeParams, 13e9)).toBeLessThan(0.02);
  });

  it('Llama-4-Scout style: 16 experts top 1 plus a shared expert, 109B total and 17B active (Meta 2025 model release, from memory)', () => {
    const { spec, all } = read('llama4-chunked-experts.json');
    expect(all.filter((f) => f.severity === 'block')).toEqual([]);
    expect(spec.experts).toMatchObject({
      total: 16,
      active: 1,
      width: 8192,
      shared: 1,
      denseLayers: 0,
    });
    expect(spec.ffn).toBe(16384);
    const m = computeMetrics(withSpan(spec, 16384));
    expect(rel(m.params, 109e9)).toBeLessThan(0.02);
    expect(rel(m.activeParams, 17e9)).toBeLessThan(0.02);
  });

  it('dense layers of a mixture: first_k_dense_replace, mlp_only_layers and decoder_sparse_step count the layers that keep a dense feed-forward', () => {
    const base = JSON.parse(fixture('qwen3-moe-experts.json')) as Record<string, unknown>;
    const sparse2 = readModel(configText({ ...base, decoder_sparse_step: 2 }), 'c.json').spec;
    expect(sparse2.experts?.denseLayers).toBe(24);
    const listed = readModel(configText({ ...base, mlp_only_layers: [0, 1, 47] }), 'c.json').spec;
    expect(listed.experts?.denseLayers).toBe(3);
    const deep = JSON.parse(fixture('deepseek-v2-lite-latent.json')) as Record<string, unknown>;
    expect(
      readModel(configText({ ...deep, first_k_dense_replace: 3, moe_layer_freq: 2 }), 'c.json').spec
        .experts?.denseLayers,
    ).toBe(27 - 12);
    // One dense layer of width ffn replaces one mixture: the difference is exact.
    const one = computeMetrics(
      readModel(configText({ ...base, mlp_only_layers: [5] }), 'c.json').spec,
    ).params!;
    const none = computeMetrics(readModel(configText(base), 'c.json').spec).params!;
    const mixture = 128 * 3 * 2048 * 768 + 2048 * 128;
    expect(none - one).toBe(mixture - 3 * 2048 * 6144);
  });
});

describe('latent attention (Liu et al. 2024, DeepSeek-V2)', () => {
  it('caches (d_c + d_h^R) elements per token and layer (Table 1; d_c = 512, d_h^R = 64, §2.1): 27 · 576 · 2 bytes', () => {
    const { spec } = read('deepseek-v2-lite-latent.json');
    const m = computeMetrics(withSpan(spec, 4096));
    expect(m.cachePerTokenBytes).toBe(27 * (512 + 64) * 2);
    expect(m.cacheBytesAtSpan).toBe(27 * (512 + 64) * 2 * 4096);
  });

  it('the rotary code has d_h^R / 2 = 32 pairs: the wavelengths span base^(62/64)·2π (Su et al. 2021, eq. 15 over the decoupled width)', () => {
    const { spec } = read('deepseek-v2-lite-latent.json');
    const unscaled: ModelSpec = {
      ...withSpan(spec, 4096),
      position: { kind: 'rotary', base: 10000, fraction: 1, scaling: null },
    };
    const m = computeMetrics(unscaled);
    expect(m.fastestWavelength).toBeCloseTo(2 * Math.PI, 12);
    expect(m.slowestWavelength! / (2 * Math.PI * 10000 ** (62 / 64))).toBeCloseTo(1, 12);
  });

  it("counts the paper's projections: W^DKV+W^KR, W^UK+W^UV, W^Q (or W^DQ, W^UQ), W^O, and the latents' norms", () => {
    const { spec } = read('deepseek-v2-lite-latent.json');
    const plain = parameterBreakdown(spec)!;
    const q = readModel(
      fixture('deepseek-v2-lite-latent.json').replace('"q_lora_rank": null', '"q_lora_rank": 1536'),
      'c.json',
    ).spec;
    const compressed = parameterBreakdown(q)!;
    // Per layer: W^Q 2048·16·192 becomes W^DQ 2048·1536 + W^UQ 1536·16·192, plus a 1536-wide norm.
    expect(compressed.matrices - plain.matrices).toBe(
      27 * (2048 * 1536 + 1536 * 16 * 192 - 2048 * 16 * 192),
    );
    expect(compressed.vectors - plain.vectors).toBe(27 * 1536);
  });

  it('kv-heads rules and remedies do not apply: a head count the latent does not group raises no kv-heads-indivisible', () => {
    const text = fixture('deepseek-v2-lite-latent.json').replace(
      '"num_key_value_heads": 16',
      '"num_key_value_heads": 3',
    );
    const r = readModel(text, 'c.json');
    expect(specFindings(r.spec, r.locations).map((f) => f.rule)).not.toContain(
      'kv-heads-indivisible',
    );
    expect(computeMetrics(withSpan(r.spec, 4096)).cachePerTokenBytes).toBe(27 * 576 * 2);
  });

  it('an odd decoupled rotary width is reported on qk_rope_head_dim', () => {
    const r = readModel(
      fixture('deepseek-v2-lite-latent.json').replace(
        '"qk_rope_head_dim": 64',
        '"qk_rope_head_dim": 63',
      ),
      'c.json',
    );
    expect(specFindings(r.spec, r.locations).map((f) => [f.rule, f.key])).toContainEqual([
      'rotary-width-odd',
      'qk_rope_head_dim',
    ]);
  });
});

describe('layers that differ', () => {
  it('Gemma 2 9B: non-embedding 8,324,201,984 exactly, embedding 917,962,752 within 0.05% (Gemma 2 report 2024, Table 2; the table counts 256,128 rows, the config 256,000)', () => {
    const { spec, all } = read('gemma2-alternating.json');
    expect(all.filter((f) => f.severity === 'block')).toEqual([]);
    const b = parameterBreakdown(spec)!;
    expect(b.nonEmbeddingParams).toBe(8_324_201_984);
    expect(rel(b.embedding, 917_962_752)).toBeLessThan(0.0005);
  });

  it('Gemma 2 alternates local and global layers starting with a local one: cache at 8192 holds 21 layers at 4096 and 21 at 8192 (Gemma 2 report, §2)', () => {
    const { spec, locations } = read('gemma2-alternating.json');
    expect(spec.layerTypes!.slice(0, 4)).toEqual(['sliding', 'full', 'sliding', 'full']);
    expect(locations.layerTypes?.key).toBe('model_type');
    const m = computeMetrics(spec);
    const perLayerToken = 2 * 8 * 256 * 4;
    expect(m.cacheBytesAtSpan).toBe(perLayerToken * (21 * 4096 + 21 * 8192));
    expect(m.receptiveField).toBeNull();
  });

  it('Gemma 3 1B: 302M embedding and 698M non-embedding (Gemma 3 report 2025, Table 1); 5 local layers per global one, window 1024', () => {
    const { spec, all } = read('gemma3-local-global.json');
    expect(all.filter((f) => f.severity === 'block')).toEqual([]);
    const b = parameterBreakdown(spec)!;
    expect(rel(b.embedding, 302e6)).toBeLessThan(0.02);
    expect(rel(b.nonEmbeddingParams, 698e6)).toBeLessThan(0.02);
    expect(spec.layerTypes!.filter((t) => t === 'sliding').length).toBe(22);
    expect(spec.layerTypes!.slice(0, 6)).toEqual([
      'sliding',
      'sliding',
      'sliding',
      'sliding',
      'sliding',
      'full',
    ]);
  });

  it('Gemma 3 4B language model: 3,209M non-embedding (Gemma 3 report, Table 1); 29 local and 5 global layers', () => {
    const { spec } = read('gemma3-4b-text-scaled.json');
    const b = parameterBreakdown(spec)!;
    expect(rel(b.nonEmbeddingParams, 3209e6)).toBeLessThan(0.001);
    expect(spec.layerTypes!.filter((t) => t === 'full').length).toBe(5);
  });

  it("Gemma 3 local layers keep their own base 10000, unscaled; the top level is the global layers' scaled code", () => {
    const { spec } = read('gemma3-4b-text-scaled.json');
    const m = computeMetrics(withSpan(spec, 32768));
    const kinds = m.layerKinds!;
    expect(
      kinds.map((k) => [k.attention, k.layers, k.window, k.rotaryBase, k.scaled, k.visibleSpan]),
    ).toEqual([
      ['sliding', 29, 1024, 10000, false, 1024],
      ['full', 5, null, 1_000_000, true, 32768],
    ]);
    // Global layers: linear scaling by 8 (Chen et al. 2023): slowest wavelength 8·2π·base^(254/256).
    expect(m.slowestWavelength! / (8 * 2 * Math.PI * 1e6 ** (254 / 256))).toBeCloseTo(1, 9);
    expect(kinds[0]!.slowestWavelength! / (2 * Math.PI * 1e4 ** (254 / 256))).toBeCloseTo(1, 9);
    expect(kinds[1]!.slowestWavelength).toBe(m.slowestWavelength);
    // The cache sums each layer's own min(T, window) (docs/metrics.md).
    expect(m.cacheBytesAtSpan).toBe(2 * 4 * 256 * 2 * (29 * 1024 + 5 * 32768));
  });

  it('Mistral 7B: window 4,096 on all 32 layers gives a receptive field of 131,072 (Jiang et al. 2023, Mistral 7B, §2: about 131K)', () => {
    const { spec } = read('mistral-sliding-window.json');
    const m = computeMetrics(spec);
    expect(m.receptiveField).toBe(32 * 4096);
    expect(m.layerKinds).toBeNull();
  });

  it('Llama-4 style chunked attention: rotary layers chunked at 8192, every 4th layer full and without a position code', () => {
    const { spec } = read('llama4-chunked-experts.json');
    expect(spec.positionFreeLayers!.slice(0, 3)).toEqual([3, 7, 11]);
    const m = computeMetrics(withSpan(spec, 16384));
    expect(m.layerKinds!.map((k) => [k.attention, k.positionCode, k.layers, k.window])).toEqual([
      ['chunked', 'rotary', 36, 8192],
      ['full', 'none', 12, null],
    ]);
    expect(m.cacheBytesAtSpan).toBe(2 * 8 * 128 * 2 * (36 * 8192 + 12 * 16384));
    expect(m.receptiveField).toBeNull();
  });

  it('Cohere2: the sliding layers rotate and the global ones have no position code (transformers, modular_cohere2.py: Cohere2Attention applies the rotary code only when the layer has a window)', () => {
    // Command-R7B-style shape, invented: 32 layers, window 4096, every 4th layer global.
    const cohere2 = {
      architectures: ['Cohere2ForCausalLM'],
      model_type: 'cohere2',
      hidden_size: 4096,
      intermediate_size: 14336,
      num_hidden_layers: 32,
      num_attention_heads: 32,
      num_key_value_heads: 8,
      sliding_window: 4096,
      rope_theta: 50000,
      max_position_embeddings: 131072,
      vocab_size: 256000,
    };
    const global = [3, 7, 11, 15, 19, 23, 27, 31];
    // From the family's every-4th pattern, and from layer_types spelled out.
    const fromPattern = readModel(configText(cohere2), 'c.json').spec;
    const layerTypes = Array.from({ length: 32 }, (_, i) =>
      global.includes(i) ? 'full_attention' : 'sliding_attention',
    );
    const fromTypes = readModel(configText({ ...cohere2, layer_types: layerTypes }), 'c.json').spec;
    for (const spec of [fromPattern, fromTypes]) {
      expect(spec.positionFreeLayers).toEqual(global);
      const m = computeMetrics(withSpan(spec, 131072));
      expect(m.layerKinds!.map((k) => [k.attention, k.positionCode, k.layers])).toEqual([
        ['sliding', 'rotary', 24],
        ['full', 'none', 8],
      ]);
    }
    // Cohere (the first generation) has no window and rotates in every layer.
    const cohere = readModel(
      configText({ ...cohere2, model_type: 'cohere', sliding_window: undefined }),
      'c.json',
    ).spec;
    expect(cohere.positionFreeLayers ?? null).toBeNull();
  });

  it('an empty no_rope_layers list takes the Llama-4-style default of every 4th layer position-free, as the config class does', () => {
    const cfg = {
      ...(JSON.parse(fixture('llama4-chunked-experts.json')) as Record<string, unknown>),
      no_rope_layers: [],
    };
    const r = readModel(configText(cfg), 'c.json');
    expect(r.findings).toEqual([]);
    expect(r.spec.positionFreeLayers).toEqual(
      read('llama4-chunked-experts.json').spec.positionFreeLayers,
    );
  });

  it('a position-free first layer leaves the rotary layers their own number formats', () => {
    const { spec } = read('llama4-chunked-experts.json');
    const m = computeMetrics({ ...withSpan(spec, 16384), positionFreeLayers: [0] });
    const rotaryFull = m.layerKinds!.find(
      (k) => k.attention === 'chunked' && k.positionCode === 'rotary',
    )!;
    expect(m.layerKinds![0]!.positionCode).toBe('none');
    expect(rotaryFull.precision.bf16.blurredPairs).toBe(m.precision.bf16.blurredPairs);
    expect(rotaryFull.precision.bf16.blurredPairs).not.toBeNull();
  });

  it('an unknown layer_types entry is a finding, never a silent default', () => {
    const types = Array.from({ length: 26 }, (_, i) =>
      i % 2 ? 'linear_attention' : 'full_attention',
    );
    const cfg = {
      ...(JSON.parse(fixture('gemma3-local-global.json')) as Record<string, unknown>),
      layer_types: types,
    };
    const r = readModel(configText(cfg), 'c.json');
    expect(r.findings.map((f) => [f.rule, f.key])).toContainEqual([
      'key-ignored',
      'layer_types[1]',
    ]);
  });

  it("flopsPerToken counts each layer's own span: windowed layers attend min(T, w) (Kaplan et al. 2020, Table 1, n_ctx per layer)", () => {
    const { spec } = read('gemma2-alternating.json');
    const m = computeMetrics(spec);
    expect(m.flopsPerToken).toBe(
      2 * m.nonEmbeddingParams! + 2 * (21 * 4096 + 21 * 8192) * 16 * 256,
    );
  });
});

describe('encoder-only models', () => {
  it('BERT-base: no decoding cache, 110M parameters (Devlin et al. 2018, §3); memory is the weights alone', () => {
    const { spec } = read('bert-absolute.json');
    expect(spec.encoderOnly).toBe(true);
    const m = computeMetrics(spec);
    expect(m.cachePerTokenBytes).toBe(0);
    expect(m.cacheBytesAtSpan).toBe(0);
    expect(m.memoryBytes).toBe(m.weightBytes);
    expect(rel(m.params, 110e6)).toBeLessThan(0.02);
  });

  it('BERT-large (340M, Devlin et al. 2018, §3) reads within 2% with no cache; fitSequences is null as no cache bounds it', () => {
    const cfg = {
      ...(JSON.parse(fixture('bert-absolute.json')) as Record<string, unknown>),
      hidden_size: 1024,
      num_hidden_layers: 24,
      num_attention_heads: 16,
      intermediate_size: 4096,
    };
    const { spec } = readModel(configText(cfg), 'c.json');
    const m = computeMetrics({ ...spec, serving: { ...spec.serving, deviceGiB: 16 } });
    expect(rel(m.params, 340e6)).toBeLessThan(0.02);
    expect(m.cacheBytesAtSpan).toBe(0);
    expect(m.fitSequences).toBeNull();
  });

  it('a BERT-family config that says is_decoder: true keeps its cache', () => {
    const cfg = {
      ...(JSON.parse(fixture('bert-absolute.json')) as Record<string, unknown>),
      is_decoder: true,
    };
    const m = computeMetrics(readModel(configText(cfg), 'c.json').spec);
    expect(m.cachePerTokenBytes).toBe(12 * 2 * 768 * 2);
  });
});

describe('parameterBreakdown(spec)', () => {
  it('params = embedding + output + matrices + vectors for every family fixture', () => {
    for (const name of [
      'deepseek-v2-lite-latent.json',
      'qwen3-moe-experts.json',
      'gemma2-alternating.json',
      'bert-absolute.json',
      'mixtral-moe.json',
      'gpt2-compact.json',
    ]) {
      const b = parameterBreakdown(read(name).spec)!;
      expect(b.embedding + b.output + b.matrices + b.vectors, name).toBe(b.params);
    }
  });

  it('output is 0 when tied and vocab·hidden when not', () => {
    expect(parameterBreakdown(read('gemma2-alternating.json').spec)!.output).toBe(0);
    expect(parameterBreakdown(read('mixtral-moe.json').spec)!.output).toBe(32000 * 4096);
  });
});

describe('multimodal wrappers and long-context families, as their configs are published', () => {
  // Configs written in the published key style (values from the published config.json files, from
  // memory; invented where a key changes no figure). Each check names its source.
  const inspect = (config: Record<string, unknown>) => {
    const r = readModel(configText(config), 'config.json');
    return { ...r, metrics: computeMetrics(r.spec) };
  };

  const paligemma = {
    architectures: ['PaliGemmaForConditionalGeneration'],
    hidden_size: 2048,
    image_token_index: 257152,
    model_type: 'paligemma',
    projection_dim: 2048,
    text_config: {
      hidden_size: 2048,
      intermediate_size: 16384,
      model_type: 'gemma',
      num_attention_heads: 8,
      num_hidden_layers: 18,
      num_image_tokens: 256,
      num_key_value_heads: 1,
      torch_dtype: 'float32',
      vocab_size: 257216,
    },
    vision_config: {
      hidden_size: 1152,
      intermediate_size: 4304,
      model_type: 'siglip_vision_model',
      num_attention_heads: 16,
      num_hidden_layers: 27,
      patch_size: 14,
      projection_dim: 2048,
    },
    vocab_size: 257216,
  };

  it("PaliGemma: a wrapper that repeats hidden_size at the top level is read from text_config; Gemma 2B's 1,981,884,416 non-embedding parameters (Gemma report 2024, Table 2, from memory) with GemmaConfig's head_dim 256 and 8,192 positions", () => {
    const { spec, metrics, findings, locations } = inspect(paligemma);
    expect(findings.filter((f) => f.severity === 'block')).toEqual([]);
    expect(locations.layers?.key).toBe('text_config.num_hidden_layers');
    expect([spec.layers, spec.heads, spec.kvHeads, spec.headDim, spec.declaredSpan]).toEqual([
      18, 8, 1, 256, 8192,
    ]);
    expect(metrics.nonEmbeddingParams).toBe(1_981_884_416);
    // One key/value head of 256 in 18 layers, fp32 as the file states (multi-query: Gemma report, §2).
    expect(metrics.cachePerTokenBytes).toBe(18 * 2 * 1 * 256 * 4);
    const taken = findings.find((f) => f.rule === 'family-default-taken');
    expect(taken?.message).toContain('GemmaConfig');
  });

  it("PaliGemma 2: the gemma2 text block takes Gemma2Config's head_dim 256, not 2304/8 = 288; Gemma 2 2B's 2,024,517,888 non-embedding parameters (Gemma 2 report 2024, Table 2, from memory)", () => {
    const { spec, metrics } = inspect({
      ...paligemma,
      num_hidden_layers: 26,
      text_config: {
        hidden_activation: 'gelu_pytorch_tanh',
        hidden_size: 2304,
        intermediate_size: 9216,
        model_type: 'gemma2',
        num_attention_heads: 8,
        num_hidden_layers: 26,
        num_key_value_heads: 4,
        query_pre_attn_scalar: 256,
        sliding_window: 4096,
        torch_dtype: 'bfloat16',
        vocab_size: 257216,
      },
    });
    expect(spec.headDim).toBe(256);
    expect(metrics.nonEmbeddingParams).toBe(2_024_517_888);
    // Local and global layers alternate (Gemma 2 report, §2): 13 of each at window 4,096, span 8,192.
    expect(metrics.cacheBytesAtSpan).toBe(2 * 4 * 256 * 2 * (13 * 4096 + 13 * 8192));
  });

  const exaone4 = {
    architectures: ['Exaone4ForCausalLM'],
    head_dim: 128,
    hidden_act: 'silu',
    hidden_size: 5120,
    intermediate_size: 27392,
    max_position_embeddings: 131072,
    model_type: 'exaone4',
    num_attention_heads: 40,
    num_hidden_layers: 64,
    num_key_value_heads: 8,
    rope_scaling: {
      factor: 16.0,
      high_freq_factor: 4.0,
      low_freq_factor: 1.0,
      original_max_position_embeddings: 8192,
      rope_type: 'llama3',
    },
    rope_theta: 1000000,
    sliding_window: 4096,
    sliding_window_pattern: 'LLLG',
    tie_word_embeddings: false,
    torch_dtype: 'bfloat16',
    vocab_size: 102400,
  };

  it('EXAONE 4.0 32B: sliding_window_pattern "LLLG" gives 48 local and 16 global layers (3:1, EXAONE 4.0 report 2025, from memory), the global ones without a rotary code; 30.95B without embeddings (model card, from memory)', () => {
    const { spec, metrics, findings } = inspect(exaone4);
    expect(findings.filter((f) => f.severity === 'block')).toEqual([]);
    expect(spec.layerTypes!.slice(0, 8)).toEqual([
      'sliding',
      'sliding',
      'sliding',
      'full',
      'sliding',
      'sliding',
      'sliding',
      'full',
    ]);
    // Exaone4Attention: "We use global NoPE for hybrid attention model" (transformers, modular_exaone4.py).
    expect(metrics.layerKinds!.map((k) => [k.attention, k.positionCode, k.layers])).toEqual([
      ['sliding', 'rotary', 48],
      ['full', 'none', 16],
    ]);
    expect(rel(metrics.nonEmbeddingParams, 30.95e9)).toBeLessThan(0.001);
    expect(metrics.cacheBytesAtSpan).toBe(2 * 8 * 128 * 2 * (48 * 4096 + 16 * 131072));
  });

  it('a letter pattern puts a global layer last whatever the letters (Exaone4Config documentation) and rejects other letters', () => {
    const { spec } = inspect({ ...exaone4, num_hidden_layers: 6, sliding_window_pattern: 'LLLL' });
    expect(spec.layerTypes).toEqual([
      'sliding',
      'sliding',
      'sliding',
      'sliding',
      'sliding',
      'full',
    ]);
    const bad = inspect({ ...exaone4, sliding_window_pattern: 'LLXG' });
    expect(bad.findings.map((f) => [f.rule, f.key])).toContainEqual([
      'value-invalid',
      'sliding_window_pattern',
    ]);
  });

  const mllama = {
    architectures: ['MllamaForConditionalGeneration'],
    image_token_index: 128256,
    model_type: 'mllama',
    text_config: {
      cross_attention_layers: [3, 8, 13, 18, 23, 28, 33, 38],
      hidden_act: 'silu',
      hidden_size: 4096,
      intermediate_size: 14336,
      max_position_embeddings: 131072,
      model_type: 'mllama_text_model',
      num_attention_heads: 32,
      num_hidden_layers: 40,
      num_key_value_heads: 8,
      rope_scaling: {
        factor: 8.0,
        high_freq_factor: 4.0,
        low_freq_factor: 1.0,
        original_max_position_embeddings: 8192,
        rope_type: 'llama3',
      },
      rope_theta: 500000.0,
      tie_word_embeddings: false,
      torch_dtype: 'bfloat16',
      vocab_size: 128256,
    },
    vision_config: {
      hidden_act: 'gelu',
      hidden_size: 1280,
      image_size: 560,
      intermediate_size: 5120,
      max_num_tiles: 4,
      model_type: 'mllama_vision_model',
      num_channels: 3,
      num_global_layers: 8,
      num_hidden_layers: 32,
      patch_size: 14,
      vision_output_dim: 7680,
    },
  };

  it('Llama 3.2 11B Vision: the 8 cross-attention layers hold no cache per text token and have no position code; the 32 self-attention layers cache 131,072 bytes per token (Llama 3.1 8B shape, common practice)', () => {
    const { spec, metrics, findings } = inspect(mllama);
    expect(spec.positionFreeLayers).toEqual([3, 8, 13, 18, 23, 28, 33, 38]);
    expect(
      metrics.layerKinds!.map((k) => [k.attention, k.positionCode, k.layers, k.window]),
    ).toEqual([
      ['full', 'rotary', 32, null],
      ['cross', 'none', 8, 0],
    ]);
    expect(metrics.cachePerTokenBytes).toBe(32 * 2 * 8 * 128 * 2);
    expect(metrics.cacheBytesAtSpan).toBe(32 * 2 * 8 * 128 * 2 * 131072);
    // Kaplan et al. 2020, Table 1: the context term counts only the layers that attend to text.
    expect(metrics.flopsPerToken).toBe(
      2 * metrics.nonEmbeddingParams! + 2 * 32 * 131072 * 32 * 128,
    );
    // Tensor-parallel over 8 ranks: one key/value head per rank, still only the 32 self-attention
    // layers (docs/metrics.md, "Serving across devices").
    const split = computeMetrics({ ...spec, serving: { ...spec.serving, tensorParallel: 8 } });
    expect(split.cachePerTokenBytesPerDevice).toBe(32 * 2 * 1 * 128 * 2);
    const note = findings.find((f) => f.key === 'text_config.cross_attention_layers');
    expect(note).toMatchObject({ rule: 'vision-not-counted', severity: 'info' });
    expect(note!.message).toContain('understated');
  });

  it('Llama 3.2 11B Vision counts 10.6B with its tower (Meta model card 2024: 10.6B), the 8 global vision layers included; each cross layer adds query and key norms (128 each) and two gates (MllamaCrossAttentionDecoderLayer)', () => {
    const { spec, metrics } = inspect(mllama);
    expect(spec.vision?.layers).toBe(40);
    expect(rel(metrics.params! + metrics.visionParams!, 10.6e9)).toBeLessThan(0.01);
    const plain = inspect({
      ...mllama,
      text_config: { ...mllama.text_config, cross_attention_layers: [] },
    }).metrics;
    expect(metrics.params! - plain.params!).toBe(8 * (2 * 128 + 2));
  });

  it('Qwen2.5-7B-Instruct-1M: dual_chunk_attention_config is a key-ignored warning naming the chunk and the trained span, not an unread key (Qwen2.5-1M report 2025: trained to 256K, dual chunk attention to 1M, from memory); 7.6B parameters (Qwen2.5 report, from memory)', () => {
    const { metrics, findings } = inspect({
      architectures: ['Qwen2ForCausalLM'],
      hidden_act: 'silu',
      hidden_size: 3584,
      intermediate_size: 18944,
      max_position_embeddings: 1010000,
      max_window_layers: 28,
      model_type: 'qwen2',
      num_attention_heads: 28,
      num_hidden_layers: 28,
      num_key_value_heads: 4,
      rope_theta: 10000000.0,
      sliding_window: 32768,
      tie_word_embeddings: false,
      use_sliding_window: false,
      vocab_size: 152064,
      dual_chunk_attention_config: {
        chunk_size: 262144,
        local_size: 8192,
        original_max_position_embeddings: 262144,
      },
    });
    const dca = findings.filter((f) => f.key?.startsWith('dual_chunk_attention_config'));
    expect(dca.map((f) => [f.rule, f.severity])).toEqual([['key-ignored', 'warn']]);
    expect(dca[0]!.message).toContain('chunk_size (262,144)');
    expect(dca[0]!.message).toContain('trainedSpan and reach');
    expect(rel(metrics.params, 7.6e9)).toBeLessThan(0.02);
  });

  const smollm3 = {
    architectures: ['SmolLM3ForCausalLM'],
    hidden_act: 'silu',
    hidden_size: 2048,
    intermediate_size: 11008,
    max_position_embeddings: 65536,
    model_type: 'smollm3',
    no_rope_layer_interval: 4,
    no_rope_layers: Array.from({ length: 36 }, (_, i) => ((i + 1) % 4 === 0 ? 0 : 1)),
    num_attention_heads: 16,
    num_hidden_layers: 36,
    num_key_value_heads: 4,
    rope_theta: 5000000.0,
    use_sliding_window: false,
    vocab_size: 128256,
  };

  it('SmolLM3-3B: every 4th layer without a position code (SmolLM3 blog 2025: NoPE in every fourth layer, from memory), from the list or, without it, from the family interval; 3.08B parameters (model card, from memory)', () => {
    const stated = inspect(smollm3);
    expect(stated.findings.filter((f) => f.rule === 'key-unread')).toEqual([]);
    const { no_rope_layers: _list, ...withoutList } = smollm3;
    void _list;
    const fromFamily = inspect({ ...withoutList, no_rope_layer_interval: undefined });
    for (const r of [stated, fromFamily]) {
      expect(r.spec.positionFreeLayers).toEqual([3, 7, 11, 15, 19, 23, 27, 31, 35]);
      expect(r.metrics.layerKinds!.map((k) => [k.positionCode, k.layers])).toEqual([
        ['rotary', 27],
        ['none', 9],
      ]);
    }
    expect(rel(stated.metrics.params, 3.08e9)).toBeLessThan(0.01);
  });

  it('Phi-3.5-MoE: long_mscale 1.243163121016122 (its published config.json, from memory) is the attention factor past the original span, not the default sqrt(1 + ln 32 / ln 4096) = 1.190; 41.9B total and 6.6B active (model card, from memory)', () => {
    const { metrics, findings } = inspect({
      architectures: ['PhiMoEForCausalLM'],
      attention_bias: true,
      hidden_act: 'silu',
      hidden_size: 4096,
      intermediate_size: 6400,
      max_position_embeddings: 131072,
      model_type: 'phimoe',
      num_attention_heads: 32,
      num_experts_per_tok: 2,
      num_hidden_layers: 32,
      num_key_value_heads: 8,
      num_local_experts: 16,
      original_max_position_embeddings: 4096,
      rope_scaling: {
        long_factor: Array(64).fill(1.5),
        long_mscale: 1.243163121016122,
        original_max_position_embeddings: 4096,
        short_factor: Array(64).fill(1.0),
        short_mscale: 1.243163121016122,
        type: 'longrope',
      },
      rope_theta: 10000.0,
      sliding_window: 131072,
      tie_word_embeddings: false,
      vocab_size: 32064,
    });
    expect(metrics.attentionScale).toBe(1.243163121016122);
    expect(findings.filter((f) => f.key?.includes('mscale'))).toEqual([]);
    expect(rel(metrics.params, 41.9e9)).toBeLessThan(0.01);
    expect(rel(metrics.activeParams, 6.6e9)).toBeLessThan(0.02);
  });

  it('LLaVA-1.5-7B: the sparse llama text_config reads with LlamaConfig defaults, the CLIP ViT-L/14-336 tower counts 303.5M, and the projector left out is a finding with its smallest size (LLaVA-1.5: 7.06B, Liu et al. 2023 model release, from memory)', () => {
    const { metrics, findings } = inspect({
      architectures: ['LlavaForConditionalGeneration'],
      image_token_index: 32000,
      model_type: 'llava',
      projector_hidden_act: 'gelu',
      text_config: {
        architectures: ['LlamaForCausalLM'],
        max_position_embeddings: 4096,
        model_type: 'llama',
        rms_norm_eps: 1e-5,
        torch_dtype: 'float16',
        vocab_size: 32064,
      },
      tie_word_embeddings: false,
      vision_config: {
        hidden_size: 1024,
        image_size: 336,
        intermediate_size: 4096,
        model_type: 'clip_vision_model',
        num_attention_heads: 16,
        num_hidden_layers: 24,
        patch_size: 14,
        projection_dim: 768,
      },
      vision_feature_layer: -2,
      vocab_size: 32064,
    });
    // Llama 2 7B's shape (Touvron et al. 2023, Table 1) with 64 more vocabulary rows in two tables.
    expect(metrics.params).toBe(6_738_939_904);
    expect(rel(metrics.visionParams, 303.5e6)).toBeLessThan(0.001);
    const projector = findings.find(
      (f) => f.key === 'vision_config' && f.message.includes('projector'),
    );
    expect(projector).toMatchObject({ rule: 'vision-not-counted', severity: 'info' });
    expect(projector!.message).toContain('at least 4,194,304 parameters');
    // Its two matrices, 1024·4096 + 4096·4096 plus biases, close the gap to the published figure.
    const mlp = 1024 * 4096 + 4096 + 4096 * 4096 + 4096;
    expect(rel(metrics.params! + metrics.visionParams! + mlp, 7.06e9)).toBeLessThan(0.001);
  });

  it('Mistral Small 3.1 (24B, Mistral AI model card 2025, from memory): the Pixtral tower is read with findings for its gated feed-forward and its rotary code, both sized', () => {
    const { metrics, findings } = inspect({
      architectures: ['Mistral3ForConditionalGeneration'],
      model_type: 'mistral3',
      projector_hidden_act: 'gelu',
      spatial_merge_size: 2,
      text_config: {
        head_dim: 128,
        hidden_act: 'silu',
        hidden_size: 5120,
        intermediate_size: 32768,
        max_position_embeddings: 131072,
        model_type: 'mistral',
        num_attention_heads: 32,
        num_hidden_layers: 40,
        num_key_value_heads: 8,
        rope_theta: 1000000000.0,
        sliding_window: null,
        vocab_size: 131072,
      },
      vision_config: {
        head_dim: 64,
        hidden_act: 'silu',
        hidden_size: 1024,
        image_size: 1540,
        intermediate_size: 4096,
        model_type: 'pixtral',
        num_attention_heads: 16,
        num_channels: 3,
        num_hidden_layers: 24,
        patch_size: 14,
        rope_theta: 10000.0,
      },
    });
    const tower = findings.filter((f) => f.key?.startsWith('vision_config.'));
    expect(tower.map((f) => [f.rule, f.key])).toEqual([
      ['vision-not-counted', 'vision_config.hidden_act'],
      ['vision-not-counted', 'vision_config.rope_theta'],
    ]);
    expect(tower[0]!.message).toContain(
      `understated by ${(24 * 1024 * 4096).toLocaleString('en-US')}`,
    );
    expect(tower[1]!.message).toContain(
      `overstated by ${((110 * 110 + 1) * 1024).toLocaleString('en-US')}`,
    );
    expect(rel(metrics.params! + metrics.visionParams!, 24e9)).toBeLessThan(0.02);
    // 40 layers, 8 key/value heads of 128, bf16 by default: 163,840 bytes per token (common practice).
    expect(metrics.cachePerTokenBytes).toBe(40 * 2 * 8 * 128 * 2);
  });
});
