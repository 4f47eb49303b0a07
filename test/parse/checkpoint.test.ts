import { describe, expect, test } from 'vitest';
import type { ModelSpec } from '../../src/core/model.js';
import { readModel } from '../../src/core/parse/read-model.js';
import { specFindings } from '../../src/core/rules/spec-rules.js';
import { configText, fixture, lineOf, readError } from './helpers.js';

function read(name: string, at?: string) {
  return readModel(fixture(name), name, at === undefined ? {} : { at });
}

function rotary(spec: ModelSpec) {
  if (spec.position.kind !== 'rotary')
    throw new Error(`expected a rotary code, got ${spec.position.kind}`);
  return spec.position;
}

/** The smallest checkpoint config that reads cleanly; tests change one key at a time. */
const BASE = {
  model_type: 'olmo',
  hidden_size: 1024,
  num_hidden_layers: 4,
  num_attention_heads: 16,
  vocab_size: 1000,
  max_position_embeddings: 2048,
  rope_theta: 10000,
};

function readConfig(config: Record<string, unknown>) {
  const text = configText(config);
  return { text, ...readModel(text, 'config.json') };
}

describe('readModel(checkpoint text) against published shapes', () => {
  test('readModel(gpt2-compact.json) reads the compact keys as GPT-2 small (Radford et al. 2019, Table 2 and section 2.3)', () => {
    const { dialect, spec, findings } = read('gpt2-compact.json');
    expect(dialect).toBe('checkpoint');
    // Table 2: 12 layers, d_model 768; section 2.3: context 1024, vocabulary 50,257. Heads 12: from memory (released config).
    expect([spec.layers, spec.hidden, spec.heads, spec.declaredSpan, spec.vocab]).toEqual([
      12, 768, 12, 1024, 50257,
    ]);
    // n_inner null: the feed-forward is 4 · d_model, as GPT-3 section 2.1 states for the family.
    expect(spec.ffn).toBe(4 * 768);
    expect(spec.position).toEqual({ kind: 'learned' });
    expect([spec.bias, spec.tied, spec.gated]).toEqual([true, true, false]);
    expect(spec.embeddingInitStd).toBe(0.02);
    expect(findings).toEqual([]);
  });

  test('readModel(bert-absolute.json) reads BERT-base: L=12, H=768, A=12, 4H feed-forward, 512 positions (Devlin et al. 2018, section 3, appendix A.2)', () => {
    const { spec, locations } = read('bert-absolute.json');
    expect([spec.layers, spec.hidden, spec.heads, spec.ffn, spec.declaredSpan]).toEqual([
      12,
      768,
      12,
      4 * 768,
      512,
    ]);
    expect(spec.position).toEqual({ kind: 'learned' });
    expect(locations.position?.key).toBe('position_embedding_type');
    expect(spec.bias).toBe(true);
  });

  test("readModel(llama2-7b-shape.json) reads LLaMA 6.7B (Touvron et al. 2023, Table 2) with the rotary base of LlamaConfig's published defaults, and says it took it", () => {
    const { spec, findings } = read('llama2-7b-shape.json');
    // LLaMA Table 2: dim 4096, 32 heads, 32 layers; llama/model.py: hidden 11008; Llama 2 Table 1: 4k context.
    expect([spec.hidden, spec.heads, spec.layers, spec.ffn, spec.declaredSpan]).toEqual([
      4096, 32, 32, 11008, 4096,
    ]);
    // head width d_model / heads = 128 (Vaswani et al. 2017, section 3.2.2: d_k = d_model / h).
    expect(spec.headDim).toBe(128);
    expect(spec.kvHeads).toBe(32);
    // SwiGLU (LLaMA section 2.2) is a gated block; llama/model.py's default theta is 10000.
    expect(spec.gated).toBe(true);
    expect(rotary(spec)).toEqual({ kind: 'rotary', base: 10000, fraction: 1, scaling: null });
    // LlamaConfig's published default rope_theta is 10000 (the published config class): taken, and said so.
    expect(findings.map((f) => [f.rule, f.severity, f.key])).toEqual([
      ['family-default-taken', 'info', 'model_type'],
    ]);
    expect(findings[0]?.message).toContain('rope_theta 10000');
    expect(findings[0]?.message).toContain('LlamaConfig');
  });

  test('readModel(llama-rotary-llama3.json) reads llama3 scaling as banded, with its factors and every line', () => {
    const text = fixture('llama-rotary-llama3.json');
    const { spec, locations, findings } = readModel(text, 'llama.json');
    expect(rotary(spec)).toEqual({
      kind: 'rotary',
      base: 500000,
      fraction: 1,
      scaling: {
        kind: 'banded',
        factor: 8,
        originalSpan: 8192,
        alpha: 1,
        beta: 32,
        low: 1,
        high: 4,
      },
    });
    expect([spec.kvHeads, spec.tied, spec.bias, spec.dtypes.weights]).toEqual([
      8,
      false,
      false,
      'bf16',
    ]);
    expect(locations['position.scaling.factor']).toEqual({
      key: 'rope_scaling.factor',
      line: lineOf(text, '"factor"'),
    });
    expect(locations['position.scaling.originalSpan']).toEqual({
      key: 'rope_scaling.original_max_position_embeddings',
      line: lineOf(text, '"original_max_position_embeddings"'),
    });
    expect(locations['position.base']).toEqual({
      key: 'rope_theta',
      line: lineOf(text, '"rope_theta"'),
    });
    expect(locations.kvHeads).toEqual({
      key: 'num_key_value_heads',
      line: lineOf(text, '"num_key_value_heads"'),
    });
    expect(locations.declaredSpan).toEqual({
      key: 'max_position_embeddings',
      line: lineOf(text, '"max_position_embeddings"'),
    });
    expect(findings).toEqual([]);
    expect(specFindings(spec, locations)).toEqual([]);
  });

  test('readModel(mistral-sliding-window.json) reads a window on every layer', () => {
    const { spec, locations } = read('mistral-sliding-window.json');
    expect([spec.slidingWindow, spec.windowLayers]).toEqual([4096, null]);
    expect(locations.slidingWindow?.key).toBe('sliding_window');
  });

  test('readModel(qwen-yarn.json) reads yarn with the Llama-family ramp α = 1, β = 32 (Peng et al. 2023, YaRN, section 3.2) and no window when use_sliding_window is false', () => {
    const { spec, findings } = read('qwen-yarn.json');
    expect(rotary(spec).scaling).toEqual({
      kind: 'yarn',
      factor: 4,
      originalSpan: 32768,
      alpha: 1,
      beta: 32,
      low: 1,
      high: 4,
    });
    expect(rotary(spec).base).toBe(1_000_000);
    expect([spec.slidingWindow, spec.windowLayers]).toEqual([null, null]);
    expect(findings).toEqual([]);
  });

  test('readModel(qwen-window-layers.json) counts layers from max_window_layers on as windowed (28 - 20 = 8)', () => {
    const { spec, locations } = read('qwen-window-layers.json');
    expect([spec.slidingWindow, spec.windowLayers]).toEqual([4096, 28 - 20]);
    expect(locations.windowLayers?.key).toBe('max_window_layers');
  });

  test('readModel(bart-encoder-decoder.json) reads the decoder at the top and the encoder stack apart', () => {
    const { spec, locations } = read('bart-encoder-decoder.json');
    expect([spec.layers, spec.hidden, spec.heads, spec.ffn]).toEqual([12, 1024, 16, 4096]);
    expect(locations.layers?.key).toBe('decoder_layers');
    expect(spec.encoder).toEqual({
      layers: 12,
      heads: 16,
      kvHeads: 16,
      headDim: 1024 / 16,
      ffn: 4096,
    });
    expect(spec.position).toEqual({ kind: 'learned' });
    expect(spec.embeddingMultiplier).toBe(1);
  });

  test('readModel(t5-encoder-decoder.json) reads T5 keys, gated-gelu as gated, and relative buckets as their own code (Raffel et al. 2020, section 2.1: 32 buckets, max distance 128)', () => {
    const { spec, findings } = read('t5-encoder-decoder.json');
    expect([spec.layers, spec.hidden, spec.heads, spec.headDim, spec.ffn]).toEqual([
      12, 768, 12, 64, 2048,
    ]);
    expect(spec.encoder).toEqual({ layers: 12, heads: 12, kvHeads: 12, headDim: 64, ffn: 2048 });
    expect(spec.gated).toBe(true);
    expect(spec.tied).toBe(false);
    expect(spec.position).toEqual({ kind: 'relative', buckets: 32, maxDistance: 128 });
    // The file states the buckets; the max distance is T5's default, taken and said so.
    expect(findings.map((f) => [f.rule, f.severity, f.key])).toEqual([
      ['family-default-taken', 'info', 'model_type'],
    ]);
    expect(findings[0]?.message).toContain('relative_attention_max_distance');
  });

  test('readModel(mixtral-moe.json) reads 8 experts with 2 active', () => {
    const { spec, locations } = read('mixtral-moe.json');
    expect(spec.experts).toEqual({ total: 8, active: 2 });
    expect(locations['experts.total']?.key).toBe('num_local_experts');
    expect(spec.slidingWindow).toBeNull();
  });

  test('readModel(falcon-alibi.json) reads alibi: true and multi_query as one key/value head (MQA: Ainslie et al. 2023, GQA-1)', () => {
    const { spec, locations } = read('falcon-alibi.json');
    expect(spec.position).toEqual({ kind: 'alibi' });
    expect(spec.kvHeads).toBe(1);
    expect(locations.kvHeads?.key).toBe('multi_query');
    expect(spec.bias).toBe(true);
  });

  test('readModel(phi-partial-rotary.json) reads partial_rotary_factor, and 80 × 0.4 = 32 rotated channels raise nothing', () => {
    const { spec, locations } = read('phi-partial-rotary.json');
    expect(spec.headDim).toBe(2560 / 32);
    expect(rotary(spec).fraction).toBe(0.4);
    expect(spec.gated).toBe(false);
    expect(specFindings(spec, locations)).toEqual([]);
  });

  test('readModel(gemma-gated.json) reads a Gemma block as gated and its embeddings scaled by sqrt(hidden) (from memory: Gemma normalises embeddings by sqrt(d_model))', () => {
    const { spec, locations } = read('gemma-gated.json');
    expect(spec.gated).toBe(true);
    expect(locations.gated?.key).toBe('model_type');
    // sqrt(2048) = 32·sqrt(2); the two roundings differ by at most an ulp, so compare to 12 digits.
    expect(spec.embeddingMultiplier).toBeCloseTo(32 * Math.SQRT2, 12);
    expect([spec.kvHeads, spec.headDim]).toEqual([1, 256]);
  });

  test('readModel(longrope-unknown.json) reads longrope as pairwise, and blocks on factor lists of 4 where the code has 48 pairs (head 3072/32 = 96, 96/2)', () => {
    const text = fixture('longrope-unknown.json');
    const { spec, findings } = readModel(text, 'phi3.json');
    expect(rotary(spec).scaling).toMatchObject({
      kind: 'pairwise',
      originalSpan: 4096,
      shortFactors: null,
      longFactors: null,
    });
    expect(findings.map((f) => [f.rule, f.severity, f.key, f.line])).toEqual([
      ['value-invalid', 'block', 'rope_scaling.short_factor', lineOf(text, '"short_factor"')],
      ['value-invalid', 'block', 'rope_scaling.long_factor', lineOf(text, '"long_factor"')],
    ]);
    expect(findings[0]?.message).toContain('has 4 factors, but the rotary code has 48 pairs');
  });

  test('readModel(rope-parameters.json) reads the rope_parameters block newer checkpoint libraries write', () => {
    const { spec, locations } = read('rope-parameters.json');
    expect(rotary(spec)).toEqual({
      kind: 'rotary',
      base: 1_000_000,
      fraction: 1,
      scaling: {
        kind: 'yarn',
        factor: 4,
        originalSpan: 32768,
        alpha: 1,
        beta: 32,
        low: 1,
        high: 4,
      },
    });
    expect(locations['position.base']?.key).toBe('rope_parameters.rope_theta');
    expect(spec.dtypes.weights).toBe('bf16');
    expect(locations['dtypes.weights']?.key).toBe('dtype');
  });

  test('readModel(multimodal-nested.json, {at: "/text_config"}) reads the nested model and names keys from the top of the file', () => {
    const text = fixture('multimodal-nested.json');
    const { spec, locations } = readModel(text, 'llava.json', { at: '/text_config' });
    expect([spec.layers, spec.hidden, spec.vocab]).toEqual([32, 4096, 32064]);
    expect(rotary(spec).scaling).toMatchObject({ kind: 'linear', factor: 2, originalSpan: null });
    expect(locations.hidden).toEqual({
      key: 'text_config.hidden_size',
      line: lineOf(text, '"hidden_size"'),
    });
  });
});

describe('readModel(text, path, options) errors', () => {
  test('readModel(multimodal-nested.json) without --at reads the language model under text_config, never vision_config', () => {
    const text = fixture('multimodal-nested.json');
    const { spec, locations, findings } = readModel(text, 'llava.json');
    expect([spec.layers, spec.hidden, spec.vocab]).toEqual([32, 4096, 32064]);
    expect(locations.hidden).toEqual({
      key: 'text_config.hidden_size',
      line: lineOf(text, '"hidden_size"'),
    });
    // The vision tower states only image_size and patch_size: not counted, and said so.
    expect(spec.vision ?? null).toBeNull();
    const tower = findings.find((f) => f.rule === 'vision-not-counted');
    expect(tower).toMatchObject({
      severity: 'info',
      key: 'vision_config',
      line: lineOf(text, '"vision_config"'),
    });
    expect(tower!.message).toContain('hidden_size, num_hidden_layers, intermediate_size');
  });

  test('readModel of a mapping with no model keys throws "not a model config" with a line', () => {
    const text = '{\n  "bos_token": "<s>",\n  "eos_token": "</s>"\n}\n';
    const error = readError(() => readModel(text, 'tokenizer_config.json'));
    expect(error.reason).toMatch(
      /^not a model config: expected "format: context-reach-model\/1" or checkpoint keys such as hidden_size/,
    );
    expect(error.line).toBe(2);
    expect(error.message).toContain('tokenizer_config.json, line 2');
  });

  test('readModel(text, path, {at}) names the pointer and where it stopped', () => {
    const text = fixture('multimodal-nested.json');
    const error = readError(() =>
      readModel(text, 'llava.json', { at: '/text_config/rope_scaling/type/x' }),
    );
    expect(error.reason).toContain('"/text_config/rope_scaling/type/x"');
    expect(error.reason).toContain('stops at "/text_config/rope_scaling"');
    expect(error.line).toBe(lineOf(text, '"rope_scaling"'));
  });

  test('readModel(text, path, {at}) refuses a pointer to something that is not a mapping', () => {
    const error = readError(() =>
      readModel(fixture('multimodal-nested.json'), 'llava.json', { at: '/architectures' }),
    );
    expect(error.reason).toBe(
      '--at "/architectures" selects a list; expected a mapping holding a model',
    );
  });

  test('readModel refuses a model file with a __proto__ key and leaves Object.prototype alone', () => {
    const text =
      '{"hidden_size": 8, "__proto__": {"polluted": true}, "constructor": {"prototype": {"polluted": true}}}';
    expect(() => readModel(text, 'evil.json')).toThrow(/__proto__/);
    expect(({} as Record<string, unknown>).polluted).toBeUndefined();
  });
});

describe('readModel(checkpoint) defaults', () => {
  test('readModel fills every documented default for a config that states only the required keys', () => {
    const { spec, findings } = readConfig({
      hidden_size: 1024,
      num_hidden_layers: 4,
      num_attention_heads: 16,
      vocab_size: 1000,
      max_position_embeddings: 2048,
      rope_theta: 10000,
    });
    expect(findings).toEqual([]);
    expect(spec).toEqual({
      name: null,
      layers: 4,
      hidden: 1024,
      heads: 16,
      kvHeads: 16, // default: heads
      headDim: 1024 / 16, // default: hidden / heads
      ffn: 4 * 1024, // default: 4 · hidden
      gated: false,
      vocab: 1000,
      tied: true,
      bias: false,
      experts: null,
      encoder: null,
      position: { kind: 'rotary', base: 10000, fraction: 1, scaling: null },
      declaredSpan: 2048,
      trainedSpan: null,
      slidingWindow: null,
      windowLayers: null,
      dtypes: { weights: null, cache: null, positions: null },
      embeddingInitStd: null,
      embeddingMultiplier: null,
      serving: {
        span: null,
        sequences: null,
        deviceGiB: null,
        reserve: null,
        outputTokens: null,
        promptTokens: null,
        tensorParallel: null,
        pipelineParallel: null,
        activationReserveGiB: null,
      },
      quantization: null,
    });
  });

  test('readModel gives the rotary base 10000 and fraction 1 when only another rotary key says the code is rotary', () => {
    const { spec } = readConfig({
      ...BASE,
      rope_theta: undefined,
      rope_scaling: { rope_type: 'linear', factor: 2 },
    });
    expect(rotary(spec)).toMatchObject({ base: 10000, fraction: 1 });
  });

  test('readModel fills the yarn ramp (α 1, β 32) and banded factors (low 1, high 4) a scaling block leaves out', () => {
    const yarn = rotary(
      readConfig({ ...BASE, rope_scaling: { rope_type: 'yarn', factor: 2 } }).spec,
    ).scaling;
    expect(yarn).toEqual({
      kind: 'yarn',
      factor: 2,
      originalSpan: null,
      alpha: 1,
      beta: 32,
      low: 1,
      high: 4,
    });
    const banded = rotary(
      readConfig({
        ...BASE,
        rope_scaling: { rope_type: 'llama3', factor: 8, original_max_position_embeddings: 1024 },
      }).spec,
    ).scaling;
    expect(banded).toEqual({
      kind: 'banded',
      factor: 8,
      originalSpan: 1024,
      alpha: 1,
      beta: 32,
      low: 1,
      high: 4,
    });
  });

  test('readModel reads beta_fast as β and beta_slow as α', () => {
    const s = rotary(
      readConfig({
        ...BASE,
        rope_scaling: { type: 'yarn', factor: 4, beta_fast: 16, beta_slow: 2 },
      }).spec,
    ).scaling;
    expect([s?.alpha, s?.beta]).toEqual([2, 16]);
  });

  test('readModel reads rope_type "default" as no scaling, and null keys as not set', () => {
    expect(
      rotary(readConfig({ ...BASE, rope_scaling: { rope_type: 'default' } }).spec).scaling,
    ).toBeNull();
    const { spec, findings } = readConfig({
      ...BASE,
      num_key_value_heads: null,
      head_dim: null,
      sliding_window: null,
      rope_scaling: null,
    });
    expect([spec.kvHeads, spec.headDim, spec.slidingWindow]).toEqual([16, 64, null]);
    expect(findings).toEqual([]);
  });

  test.each([
    ['float32', 'fp32'],
    ['bfloat16', 'bf16'],
    ['float16', 'fp16'],
  ])('readModel reads torch_dtype %s as %s', (name, dtype) => {
    expect(readConfig({ ...BASE, torch_dtype: name }).spec.dtypes.weights).toBe(dtype);
  });

  test('readModel reads scale_embedding: true as a multiplier of sqrt(hidden)', () => {
    // sqrt(1024) = 32 exactly (IEEE 754 square root is correctly rounded).
    expect(readConfig({ ...BASE, scale_embedding: true }).spec.embeddingMultiplier).toBe(32);
  });

  test('readModel reads attention_bias or mlp_bias true as biases on', () => {
    expect(readConfig({ ...BASE, attention_bias: false, mlp_bias: true }).spec.bias).toBe(true);
    expect(readConfig({ ...BASE, attention_bias: false }).spec.bias).toBe(false);
  });

  test('readModel reads rotary_dim as a fraction of the head', () => {
    expect(
      rotary(readConfig({ ...BASE, rope_theta: undefined, rotary_dim: 16 }).spec).fraction,
    ).toBe(16 / 64);
  });

  test('readModel counts "sliding_attention" entries of layer_types as windowed layers', () => {
    const types = ['sliding_attention', 'sliding_attention', 'sliding_attention', 'full_attention'];
    const { spec, locations } = readConfig({ ...BASE, sliding_window: 512, layer_types: types });
    expect([spec.slidingWindow, spec.windowLayers]).toEqual([512, 3]);
    expect(locations.windowLayers?.key).toBe('layer_types');
  });
});

describe('readModel(checkpoint) position codes by family and key', () => {
  test.each([
    ['xglm', 'sinusoidal'],
    ['opt', 'learned'],
    ['bloom', 'alibi'],
  ])(
    'readModel reads model_type %s without position keys as %s, from the family tables',
    (modelType, kind) => {
      const { spec, locations, findings } = readConfig({
        ...BASE,
        model_type: modelType,
        rope_theta: undefined,
      });
      expect(spec.position).toEqual({ kind });
      expect(locations.position?.key).toBe('model_type');
      expect(findings.filter((f) => f.rule !== 'family-default-taken')).toEqual([]);
    },
  );

  test('readModel reads GPT-2 compact keys without a model_type as a learned table with biases', () => {
    const { spec, locations } = readConfig({
      n_embd: 256,
      n_layer: 2,
      n_head: 4,
      n_positions: 512,
      vocab_size: 100,
    });
    expect(spec.position).toEqual({ kind: 'learned' });
    expect(locations.position?.key).toBe('n_positions');
    expect(spec.bias).toBe(true);
  });

  test('readModel reads attn_config.alibi and sinusoidal_pos_embds', () => {
    expect(
      readConfig({ ...BASE, rope_theta: undefined, attn_config: { alibi: true } }).spec.position,
    ).toEqual({ kind: 'alibi' });
    expect(
      readConfig({ ...BASE, rope_theta: undefined, sinusoidal_pos_embds: true }).spec.position,
    ).toEqual({ kind: 'sinusoidal' });
  });

  test('readModel warns that rotary keys beside alibi: true have no effect', () => {
    const { spec, findings } = readConfig({ ...BASE, alibi: true });
    expect(spec.position).toEqual({ kind: 'alibi' });
    expect(findings.map((f) => [f.rule, f.key, f.message])).toEqual([
      [
        'key-ignored',
        'rope_theta',
        'rope_theta has no effect: it applies to rotary codes, and the code is read as alibi (alibi)',
      ],
    ]);
  });

  test('readModel warns that alibi: true has no effect when position_embedding_type states another code', () => {
    const { spec, findings } = readConfig({
      ...BASE,
      rope_theta: undefined,
      alibi: true,
      position_embedding_type: 'absolute',
    });
    expect(spec.position).toEqual({ kind: 'learned' });
    expect(findings.map((f) => [f.rule, f.key])).toEqual([['key-ignored', 'alibi']]);
  });

  test('readModel warns that a window with no "sliding_attention" layer has no effect', () => {
    const { spec, findings } = readConfig({
      ...BASE,
      sliding_window: 512,
      layer_types: ['full_attention', 'full_attention', 'full_attention', 'full_attention'],
    });
    expect(spec.slidingWindow).toBeNull();
    expect(findings.map((f) => [f.rule, f.key])).toEqual([['key-ignored', 'sliding_window']]);
  });

  test('readModel reports rope_parameters that is not a mapping', () => {
    const { findings } = readConfig({ ...BASE, rope_parameters: 'yarn' });
    expect(findings.map((f) => [f.rule, f.key])).toEqual([['value-invalid', 'rope_parameters']]);
  });
});

describe('readModel(checkpoint) keys that do nothing', () => {
  test('readModel warns that a Qwen window without use_sliding_window has no effect', () => {
    const { spec, findings } = readConfig({ ...BASE, model_type: 'qwen2', sliding_window: 4096 });
    expect(spec.slidingWindow).toBeNull();
    expect(findings.filter((f) => f.severity !== 'info').map((f) => [f.rule, f.key])).toEqual([
      ['key-ignored', 'sliding_window'],
    ]);
  });

  test('readModel warns that max_window_layers at or past the layer count leaves no windowed layer', () => {
    const { text, spec, findings } = readConfig({
      ...BASE,
      use_sliding_window: true,
      sliding_window: 4096,
      max_window_layers: 4,
    });
    expect([spec.slidingWindow, spec.windowLayers]).toEqual([null, null]);
    expect(findings).toHaveLength(1);
    expect([findings[0]?.rule, findings[0]?.line]).toEqual([
      'key-ignored',
      lineOf(text, '"sliding_window"'),
    ]);
    expect(findings[0]?.message).toContain('max_window_layers (4)');
  });

  test('readModel warns about rotary keys on a learned code', () => {
    const { spec, findings } = readConfig({ ...BASE, position_embedding_type: 'absolute' });
    expect(spec.position).toEqual({ kind: 'learned' });
    expect(findings.map((f) => [f.rule, f.key])).toEqual([['key-ignored', 'rope_theta']]);
  });

  test('readModel warns that yarn attention_factor is not modelled', () => {
    const { findings } = readConfig({
      ...BASE,
      rope_scaling: { rope_type: 'yarn', factor: 4, attention_factor: 1.2 },
    });
    expect(findings.map((f) => [f.rule, f.key])).toEqual([
      ['key-ignored', 'rope_scaling.attention_factor'],
    ]);
  });

  test('readModel reads the full_attention entry of per-layer-type rope_parameters and says the local base has no effect without local layers', () => {
    const { spec, findings } = readConfig({
      ...BASE,
      rope_theta: undefined,
      rope_parameters: {
        full_attention: { rope_type: 'default', rope_theta: 1_000_000 },
        sliding_attention: { rope_type: 'default', rope_theta: 10000 },
      },
    });
    expect(rotary(spec).base).toBe(1_000_000);
    expect(findings.map((f) => [f.rule, f.key])).toEqual([
      ['key-ignored', 'rope_parameters.sliding_attention.rope_theta'],
    ]);
  });

  test('readModel warns when no position code is stated and the family is unknown, and reads none', () => {
    const { spec, findings } = readConfig({
      ...BASE,
      model_type: 'made_up',
      rope_theta: undefined,
    });
    expect(spec.position).toEqual({ kind: 'none' });
    expect(findings.map((f) => [f.rule, f.severity])).toEqual([['position-code-assumed', 'warn']]);
  });

  test('readModel reads relative_key position embeddings as none, with a warning', () => {
    const { spec, findings } = readConfig({
      ...BASE,
      rope_theta: undefined,
      position_embedding_type: 'relative_key',
    });
    expect(spec.position).toEqual({ kind: 'none' });
    expect(findings.map((f) => [f.rule, f.key])).toEqual([
      ['position-code-assumed', 'position_embedding_type'],
    ]);
  });
});

describe('readModel(checkpoint) invalid values', () => {
  const cases: [string, unknown, string][] = [
    ['text', '32', '"32" (text); expected a whole number'],
    ['NaN-like text', 'NaN', '"NaN" (text); expected a whole number'],
    ['a boolean', true, 'true (a boolean)'],
    ['a list', [32], 'a list of 1 item (a list)'],
    ['a mapping', { n: 32 }, 'a mapping (a mapping)'],
  ];
  test.each(cases)(
    'readModel reports num_hidden_layers given as %s as value-invalid with its line, and the spec gets NaN',
    (_, value, quoted) => {
      const { text, spec, findings, locations } = readConfig({ ...BASE, num_hidden_layers: value });
      expect(Number.isNaN(spec.layers)).toBe(true);
      expect(findings).toHaveLength(1);
      expect(findings[0]).toMatchObject({
        rule: 'value-invalid',
        severity: 'block',
        key: 'num_hidden_layers',
        line: lineOf(text, '"num_hidden_layers"'),
      });
      expect(findings[0]?.message).toContain(`num_hidden_layers is ${quoted}`);
      // NaN is the reader's mark: the spec rules do not report the same key again.
      expect(specFindings(spec, locations)).toEqual([]);
    },
  );

  test('readModel reports 1e400 as overflowing to Infinity (beyond binary64, IEEE 754) and gives NaN', () => {
    const text =
      '{"hidden_size": 1024, "num_hidden_layers": 1e400, "num_attention_heads": 16, "vocab_size": 1000, "max_position_embeddings": 2048}';
    const { spec, findings } = readModel(text, 'c.json');
    expect(Number.isNaN(spec.layers)).toBe(true);
    expect(findings.find((f) => f.key === 'num_hidden_layers')?.message).toBe(
      'num_hidden_layers is 1e400, which overflows to Infinity in a double; expected a whole number (the number of layers)',
    );
  });

  test('readModel reports a bare NaN or Infinity in config.json (Python json writes them) as value-invalid', () => {
    const text = configText(BASE)
      .replace('"num_hidden_layers": 4', '"num_hidden_layers": NaN')
      .replace('"vocab_size": 1000', '"vocab_size": Infinity');
    const { spec, findings } = readModel(text, 'config.json');
    expect(findings.map((f) => [f.key, f.line, f.message])).toEqual([
      [
        'num_hidden_layers',
        lineOf(text, 'NaN'),
        'num_hidden_layers is NaN, which is not a number; expected a whole number (the number of layers)',
      ],
      [
        'vocab_size',
        lineOf(text, 'Infinity'),
        'vocab_size is Infinity, which is not finite; expected a whole number (the vocabulary size)',
      ],
    ]);
    expect([spec.layers, spec.vocab].every(Number.isNaN)).toBe(true);
  });

  test('readModel reports 2^60 as not exact: past 2^53 - 1, neighbouring integers share a double (IEEE 754 binary64)', () => {
    const text =
      '{"hidden_size": 1024, "num_hidden_layers": 4, "num_attention_heads": 16, "vocab_size": 1152921504606846976, "max_position_embeddings": 2048, "rope_theta": 10000}';
    const { spec, findings } = readModel(text, 'c.json');
    expect(Number.isNaN(spec.vocab)).toBe(true);
    expect(findings).toHaveLength(1);
    expect(findings[0]?.message).toContain(
      'vocab_size is 1152921504606846976, beyond 2^53 − 1 = 9007199254740991',
    );
    expect(2 ** 53 - 1).toBe(Number.MAX_SAFE_INTEGER);
  });

  test('readModel keeps zero, negative and fractional sizes for the spec rules, which report them once', () => {
    for (const [value, phrase] of [
      ['0', 'is 0;'],
      ['-4', 'is -4;'],
      ['2.5', 'is 2.5, not a whole number'],
      ['-0', 'is -0;'],
    ] as const) {
      const text = configText(BASE).replace(
        '"num_hidden_layers": 4',
        `"num_hidden_layers": ${value}`,
      );
      const { spec, findings, locations } = readModel(text, 'config.json');
      expect(Object.is(spec.layers, Number(value))).toBe(true);
      expect(findings).toEqual([]);
      const rules = specFindings(spec, locations);
      expect(rules.map((f) => [f.rule, f.key])).toEqual([['size-invalid', 'num_hidden_layers']]);
      expect(rules[0]?.message).toContain(`num_hidden_layers ${phrase}`);
    }
  });

  test.each([
    ['hidden_size', 'the model width'],
    ['num_hidden_layers', 'the number of layers'],
    ['num_attention_heads', 'the number of attention heads'],
    ['vocab_size', 'the vocabulary size'],
    ['max_position_embeddings', 'the maximum positions'],
  ])('readModel reports a missing %s once, gives NaN, and derives nothing from it', (key, what) => {
    const config: Record<string, unknown> = { ...BASE };
    delete config[key];
    const { spec, findings, locations } = readConfig(config);
    expect(findings).toHaveLength(1);
    expect(findings[0]).toMatchObject({ rule: 'value-invalid', key, line: null });
    expect(findings[0]?.message).toMatch(new RegExp(`^${key} is missing; expected ${what}`));
    expect(specFindings(spec, locations)).toEqual([]);
    if (key === 'num_attention_heads')
      expect([spec.kvHeads, spec.headDim].every(Number.isNaN)).toBe(true);
    if (key === 'hidden_size') expect([spec.headDim, spec.ffn].every(Number.isNaN)).toBe(true);
  });

  test.each([
    ['rope_theta', '10000', 'rope_theta is "10000" (text)'],
    ['rope_theta', 1, 'rope_theta is 1; expected a rotary base above 1'],
    [
      'partial_rotary_factor',
      1.5,
      'partial_rotary_factor is 1.5; expected a share of the head above 0 and at most 1',
    ],
    ['partial_rotary_factor', 0, 'partial_rotary_factor is 0; expected a share'],
    [
      'torch_dtype',
      'float64',
      'torch_dtype is "float64"; expected one of float32, bfloat16, float16',
    ],
    [
      'tie_word_embeddings',
      'false',
      'tie_word_embeddings is "false" (text); expected true or false',
    ],
    [
      'initializer_range',
      -0.02,
      'initializer_range is -0.02; expected a standard deviation above 0',
    ],
    ['rope_scaling', 'yarn', 'rope_scaling is "yarn" (text); expected a mapping'],
    [
      'position_embedding_type',
      'spiral',
      'position_embedding_type is "spiral"; expected one of absolute',
    ],
  ])('readModel reports %s = %j as value-invalid, naming key and line', (key, value, message) => {
    const { text, findings } = readConfig({ ...BASE, [key]: value });
    const finding = findings.find((f) => f.rule === 'value-invalid');
    expect(finding).toMatchObject({ key, line: lineOf(text, `"${key}"`) });
    expect(finding?.message).toContain(message);
  });

  test('readModel reports a scaling block without a factor as missing, and one without a type as an unknown kind', () => {
    const noFactor = readConfig({ ...BASE, rope_scaling: { rope_type: 'linear' } });
    expect(noFactor.findings.map((f) => [f.rule, f.key])).toEqual([
      ['value-invalid', 'rope_scaling.factor'],
    ]);
    expect(Number.isNaN(rotary(noFactor.spec).scaling?.factor)).toBe(true);
    const noType = readConfig({ ...BASE, rope_scaling: { factor: 2 } });
    expect(noType.findings.map((f) => [f.rule, f.key])).toEqual([
      ['scaling-kind-unknown', 'rope_scaling'],
    ]);
    expect(rotary(noType.spec).scaling).toBeNull();
  });

  test('readModel reports beta_fast below beta_slow: the yarn ramp (β - α) would run backwards; equal ends are a step', () => {
    const { findings } = readConfig({
      ...BASE,
      rope_scaling: { rope_type: 'yarn', factor: 4, beta_fast: 1, beta_slow: 2 },
    });
    expect(findings.map((f) => [f.rule, f.key])).toEqual([
      ['value-invalid', 'rope_scaling.beta_fast'],
    ]);
    const step = readConfig({
      ...BASE,
      rope_scaling: { rope_type: 'yarn', factor: 4, beta_fast: 1, beta_slow: 1 },
    });
    expect(step.findings).toEqual([]);
  });

  test('readModel reads 0 or 1 experts as a dense model', () => {
    expect(readConfig({ ...BASE, num_local_experts: 0 }).spec.experts).toBeNull();
    expect(readConfig({ ...BASE, num_experts: 1, num_experts_per_tok: 1 }).spec.experts).toBeNull();
  });

  test('readModel reports experts without num_experts_per_tok as missing', () => {
    const { spec, findings } = readConfig({ ...BASE, num_local_experts: 8 });
    expect(findings.map((f) => [f.rule, f.key])).toEqual([
      ['value-invalid', 'num_experts_per_tok'],
    ]);
    expect(spec.experts?.total).toBe(8);
    expect(Number.isNaN(spec.experts?.active)).toBe(true);
  });

  test('readModel reads a YAML checkpoint config and its .nan value as not a number', () => {
    const text =
      'hidden_size: 1024\nnum_hidden_layers: .nan\nnum_attention_heads: 16\nvocab_size: 1000\nmax_position_embeddings: 2048\nrope_theta: 10000\n';
    const { dialect, findings } = readModel(text, 'config.yaml');
    expect(dialect).toBe('checkpoint');
    expect(findings.map((f) => [f.key, f.line])).toEqual([['num_hidden_layers', 2]]);
    expect(findings[0]?.message).toContain('.nan, which is not a number');
  });
});

describe('the rotary width, read one way by the reader, the rules and the metrics', () => {
  const config = (extra: Record<string, unknown> = {}) =>
    configText({
      hidden_size: 800,
      num_attention_heads: 8,
      head_dim: 100,
      num_hidden_layers: 2,
      vocab_size: 1000,
      max_position_embeddings: 4096,
      rope_theta: 10000,
      partial_rotary_factor: 0.58,
      ...extra,
    });

  test('head 100 × share 0.58 is 58 channels (29 pairs) everywhere, though 100 × 0.58 is 57.99999999999999 in binary64', async () => {
    const { inspectModel } = await import('../../src/core/inspect.js');
    const report = inspectModel(config(), 'c.json');
    expect(report.findings.map((f) => f.rule)).not.toContain('rotary-width-odd');
    // Slowest pair i = 28 of r = 58: wavelength 2π·10000^(56/58) (Su et al. 2021, RoFormer, eq. 15);
    // relative 1e-12 for the rounding of pow and the product.
    const expected = 2 * Math.PI * Math.pow(10000, 56 / 58);
    expect(Math.abs(report.metrics.slowestWavelength! - expected) / expected).toBeLessThan(1e-12);
    // LongRoPE wants one factor per pair: 29 are accepted, 28 are not.
    const longrope = (n: number) => ({
      rope_scaling: {
        type: 'longrope',
        short_factor: Array(n).fill(1),
        long_factor: Array(n).fill(2),
        original_max_position_embeddings: 2048,
      },
    });
    expect(readModel(config(longrope(29)), 'c.json').findings.map((f) => f.rule)).not.toContain(
      'value-invalid',
    );
    expect(
      readModel(config(longrope(28)), 'c.json').findings.find((f) => f.rule === 'value-invalid')
        ?.message,
    ).toMatch(/has 28 factors, but the rotary code has 29 pairs/);
  });
});
