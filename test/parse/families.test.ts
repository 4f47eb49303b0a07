import { describe, expect, test } from 'vitest';
import { inspectModel } from '../../src/core/inspect.js';
import type { ModelSpec } from '../../src/core/model.js';
import { CHECKPOINT_FAMILIES } from '../../src/core/parse/checkpoint-families.js';
import { readModel } from '../../src/core/parse/read-model.js';
import { frequencyPlan } from '../../src/core/metrics/compute.js';
import { visionParams } from '../../src/core/metrics/vision-params.js';
import { configText, fixture, lineOf } from './helpers.js';

function inspect(name: string, overrides = {}) {
  return inspectModel(fixture(name), name, { overrides });
}

function rotary(spec: ModelSpec) {
  if (spec.position.kind !== 'rotary')
    throw new Error(`expected a rotary code, got ${spec.position.kind}`);
  return spec.position;
}

const within = (value: number | null, published: number, share = 0.02) => {
  expect(value).not.toBeNull();
  expect(Math.abs((value as number) - published) / published).toBeLessThan(share);
};

describe('long-context scalings published configs ship', () => {
  test('phi3-longrope.json: longrope reads as pairwise over 48 pairs, factor 131072/4096 = 32, long factors past the original span (Phi-3 report: phi-3-mini 3.8B, 4k original, 128k variant)', () => {
    const r = inspect('phi3-longrope.json');
    const code = rotary(r.spec);
    expect(code.scaling?.kind).toBe('pairwise');
    expect(code.scaling?.longFactors).toHaveLength(48);
    expect(code.scaling?.factor).toBe(32);
    expect([r.metrics.trainedSpan, r.metrics.reach, r.metrics.tunedSpan]).toEqual([
      4096,
      131072,
      null,
    ]);
    expect(r.findings.filter((f) => f.severity === 'block')).toEqual([]);
    // Attention factor: sqrt(1 + ln 32 / ln 4096) (published implementation, after LongRoPE, Ding et al. 2024).
    expect(r.metrics.attentionScale).toBeCloseTo(Math.sqrt(1 + Math.log(32) / Math.log(4096)), 12);
    // Phi-3 report (Abdin et al. 2024): phi-3-mini, 3.8B parameters.
    within(r.metrics.params, 3.8e9);
    expect(r.findings.filter((f) => f.rule === 'key-unread')).toEqual([]);
  });

  test("pairwise scaling uses the short factors at or below the original span and the long ones past it: θ'_i = θ_i / factor_i", () => {
    const at4k = inspect('phi3-longrope.json', { span: 4096 });
    const at8k = inspect('phi3-longrope.json', { span: 8192 });
    const code = rotary(at4k.spec);
    // Fastest pair (i = 0): θ_0 = 1, so the wavelength is 2π · factor_0 of the chosen list.
    expect(at4k.metrics.fastestWavelength).toBeCloseTo(
      2 * Math.PI * code.scaling!.shortFactors![0]!,
      9,
    );
    // Slowest pair (i = 47): θ_47 = 10000^(-94/96) (Su et al. 2021, eq. 15), divided by the long factor.
    expect(at8k.metrics.slowestWavelength).toBeCloseTo(
      ((2 * Math.PI) / Math.pow(10000, -94 / 96)) * code.scaling!.longFactors![47]!,
      3,
    );
  });

  test('su, the older name of longrope, reads the same; the factor lists are checked against the pairs', () => {
    const text = fixture('phi3-longrope.json').replace('"type": "longrope"', '"type": "su"');
    expect(rotary(readModel(text, 'phi3.json').spec).scaling?.kind).toBe('pairwise');
  });

  test('qwen2-vl-mrope.json: mrope sections over 64 pairs read as the plain rotary spectrum, no blocking finding; sections that do not add up are reported', () => {
    const r = inspect('qwen2-vl-mrope.json');
    expect(rotary(r.spec).scaling).toBeNull();
    expect(r.findings.filter((f) => f.severity !== 'info')).toEqual([]);
    const bad = fixture('qwen2-vl-mrope.json').replace(
      '[\n      16,\n      24,\n      24\n    ]',
      '[16, 24, 16]',
    );
    const f = readModel(bad, 'qwen2-vl.json').findings.find(
      (x) => x.key === 'rope_scaling.mrope_section',
    );
    expect(f).toMatchObject({ rule: 'value-invalid', severity: 'block' });
    expect(f!.message).toContain('adds up to 56 pairs, but the rotary code has 64 pairs');
  });

  test('Llama-3.1-style banded ×8 from 8,192 (factor 8, low 1, high 4, original 8192: from memory) raises no warning, and --trained-span 131072 does not multiply the reach to 1,048,576', () => {
    const plain = inspect('llama-rotary-llama3.json');
    expect(plain.findings.filter((f) => f.severity !== 'info')).toEqual([]);
    const assumed = plain.findings.find((f) => f.rule === 'span-beyond-scaling-cover');
    expect(assumed?.message).toContain('taken on assumption');
    expect(plain.metrics.reach).toBe(131072);
    const tuned = inspect('llama-rotary-llama3.json', { trainedSpan: 131072 });
    expect([tuned.metrics.trainedSpan, tuned.metrics.tunedSpan, tuned.metrics.reach]).toEqual([
      8192, 131072, 131072,
    ]);
    expect(tuned.findings).toEqual([]);
  });
});

describe('banded scaling with equal band factors (Llama 4)', () => {
  // Llama-4-Scout-17B-16E's published config.json ships rope_scaling {rope_type: llama3, factor
  // 16, low_freq_factor 1, high_freq_factor 1, original_max_position_embeddings 8192} (its values
  // as inference code citing that config copies them). Equal factors leave no ramp: the common
  // implementation (transformers' llama3 rope parameters) divides θ by the factor where the
  // wavelength 2π/θ is above original/low and keeps θ below original/high, and its ramp between
  // them is empty. The reference here is that rule written out per pair.
  const scout = () => ({
    ...(JSON.parse(fixture('llama4-chunked-experts.json')) as Record<string, unknown>),
    max_position_embeddings: 10485760,
    rope_scaling: {
      rope_type: 'llama3',
      factor: 16,
      low_freq_factor: 1,
      high_freq_factor: 1,
      original_max_position_embeddings: 8192,
    },
  });

  test('reads as a step, not an invalid ramp: no value-invalid, and θ/16 exactly for wavelengths past 8,192 tokens', () => {
    const text = configText(scout());
    const r = inspectModel(text, 'scout.json', {});
    expect(r.findings.filter((f) => f.rule === 'value-invalid')).toEqual([]);
    const code = rotary(r.spec);
    expect([code.scaling?.kind, code.scaling?.low, code.scaling?.high]).toEqual(['banded', 1, 1]);
    const plan = frequencyPlan(r.spec, 10485760, 8192)!;
    expect(plan).not.toBeNull();
    let scaledPairs = 0;
    for (const [i, t] of plan.theta.entries()) {
      const wavelength = (2 * Math.PI) / t;
      const expected = wavelength > 8192 ? t / 16 : t;
      if (wavelength > 8192) scaledPairs++;
      expect(Object.is(plan.scaled[i], expected), `pair ${i}`).toBe(true);
    }
    // 64 pairs at base 500,000: the slow ones past 8,192 tokens are scaled, the fast ones kept.
    expect(scaledPairs).toBeGreaterThan(0);
    expect(scaledPairs).toBeLessThan(64);
  });

  test('a high factor below the low one is still refused, with a message that allows them equal', () => {
    const config = scout();
    (config.rope_scaling as Record<string, unknown>).high_freq_factor = 0.5;
    const r = inspectModel(configText(config), 'scout.json', {});
    const invalid = r.findings.filter((f) => f.rule === 'value-invalid');
    expect(invalid.map((f) => f.key)).toEqual(['rope_scaling.high_freq_factor']);
    expect(invalid[0]?.message).toContain(
      'rope_scaling.high_freq_factor (0.5) must not be below rope_scaling.low_freq_factor (1)',
    );
  });
});

describe('relative buckets, ALiBi and position-free families', () => {
  test('t5-encoder-decoder.json: no hard reach, bucketHorizon 128 (Raffel et al. 2020, section 2.1), and a span past n_positions does not block', () => {
    const r = inspect('t5-encoder-decoder.json', { span: 4096 });
    expect([r.metrics.reach, r.metrics.bucketHorizon, r.metrics.headroom]).toEqual([
      null,
      128,
      null,
    ]);
    expect(r.findings.filter((f) => f.severity === 'block')).toEqual([]);
  });

  test('DeBERTa-style relative_key keeps a clear finding that the code is not modelled', () => {
    const { findings } = readModel(
      configText({
        model_type: 'deberta-v2',
        hidden_size: 768,
        num_hidden_layers: 12,
        num_attention_heads: 12,
        vocab_size: 128100,
        max_position_embeddings: 512,
        position_embedding_type: 'relative_key',
      }),
      'c.json',
    );
    expect(findings.find((f) => f.rule === 'position-code-assumed')?.message).toContain(
      'relative position embeddings are not one of the modelled codes',
    );
  });

  test("bloom-176b.json: ALiBi with no maximum-positions key never blocks; params within 2% of the BLOOM paper's 176B", () => {
    const r = inspect('bloom-176b.json');
    expect(r.spec.position).toEqual({ kind: 'alibi' });
    expect(r.findings.filter((f) => f.severity !== 'info')).toEqual([]);
    expect(r.findings.map((f) => f.rule)).toContain('span-not-stated');
    // BLOOM paper (BigScience 2022): 176B parameters; the count here is 176,247,242,752 (the paper's 176,247M: from memory).
    within(r.metrics.params, 176e9);
    // Served longer than any stated span: ALiBi has no stated span to cross.
    expect(
      inspect('bloom-176b.json', { span: 8192 }).findings.filter((f) => f.severity === 'block'),
    ).toEqual([]);
  });

  test("falcon-7b-rotary.json: no maximum-positions key, so FalconConfig's published default 2048 is taken and said so; rotary since alibi is false", () => {
    const text = fixture('falcon-7b-rotary.json');
    const r = inspect('falcon-7b-rotary.json');
    expect(rotary(r.spec).base).toBe(10000);
    expect([r.spec.declaredSpan, r.spec.kvHeads, r.spec.ffn]).toEqual([2048, 1, 4 * 4544]);
    const taken = r.findings.find((f) => f.rule === 'family-default-taken');
    expect(taken).toMatchObject({
      severity: 'info',
      key: 'model_type',
      line: lineOf(text, '"model_type"'),
    });
    expect(taken!.message).toContain('max_position_embeddings 2048');
    expect(taken!.message).toContain('FalconConfig');
    expect(r.findings.filter((f) => f.severity !== 'info')).toEqual([]);
    expect(r.findings.filter((f) => f.rule === 'key-unread')).toEqual([]);
    // Falcon-7B: published as 7B parameters (Falcon model card, from memory).
    within(r.metrics.params, 7e9);
  });

  test('mpt-7b.json: MPT keys (n_layers, n_heads, d_model, expansion_ratio, no_bias, max_seq_len, attn_config.alibi) read as a 6.7B ALiBi model (MosaicML, from memory)', () => {
    const r = inspect('mpt-7b.json');
    expect([
      r.spec.layers,
      r.spec.heads,
      r.spec.hidden,
      r.spec.ffn,
      r.spec.bias,
      r.spec.declaredSpan,
    ]).toEqual([32, 32, 4096, 16384, false, 2048]);
    expect(r.spec.position).toEqual({ kind: 'alibi' });
    expect(r.findings.filter((f) => f.severity !== 'info')).toEqual([]);
    // Every key of the published MPT style is either read or known to change no metric.
    expect(r.findings.filter((f) => f.rule === 'key-unread')).toEqual([]);
    within(r.metrics.params, 6.7e9);
  });

  test('gpt-neox-20b.json: rotary on 25% of each head, 12 of 48 pairs (GPT-NeoX-20B paper: rotary 25%, 20.55B parameters)', () => {
    const r = inspect('gpt-neox-20b.json');
    expect(rotary(r.spec).fraction).toBe(0.25);
    expect(r.metrics.fastestWavelength).toBeCloseTo(2 * Math.PI, 9);
    within(r.metrics.params, 20.55e9);
    expect(r.findings.filter((f) => f.rule === 'key-unread')).toEqual([]);
  });
});

describe('sparse and nested configs', () => {
  test('gemma3-multimodal-sparse.json: the sparse text_config reads with Gemma3TextConfig defaults (each named), and the SigLIP tower counts 417M apart (Gemma 3 report, Table 1: 4B, vision 417M, non-embedding 3,209M)', () => {
    const text = fixture('gemma3-multimodal-sparse.json');
    const r = inspectModel(text, 'gemma3.json');
    expect([
      r.spec.hidden,
      r.spec.layers,
      r.spec.heads,
      r.spec.kvHeads,
      r.spec.headDim,
      r.spec.vocab,
    ]).toEqual([2560, 34, 8, 4, 256, 262208]);
    const taken = r.findings.find(
      (f) => f.rule === 'family-default-taken' && f.key === 'text_config.model_type',
    );
    for (const key of [
      'num_attention_heads 8',
      'num_key_value_heads 4',
      'head_dim 256',
      'vocab_size 262208',
      'Gemma3TextConfig',
    ])
      expect(taken!.message).toContain(key);
    within(r.metrics.visionParams, 417e6);
    within(r.metrics.nonEmbeddingParams, 3209e6);
    expect(r.findings.filter((f) => f.severity === 'block')).toEqual([]);
  });

  test("visionParams of a ViT-L/16 at 224 is within 2% of the ViT paper's 307M (Dosovitskiy et al. 2021, Table 1; the paper's count includes a 1000-class head)", () => {
    within(
      visionParams({ hidden: 1024, layers: 24, ffn: 4096, patch: 16, image: 224, channels: 3 }),
      307e6,
    );
    within(
      visionParams({ hidden: 768, layers: 12, ffn: 3072, patch: 16, image: 224, channels: 3 }),
      86e6,
    );
  });

  test('a file with only vision_config is never read as a language model', () => {
    const text = configText({
      model_type: 'llava',
      vision_config: {
        hidden_size: 1024,
        num_hidden_layers: 24,
        num_attention_heads: 16,
        intermediate_size: 4096,
        image_size: 336,
        patch_size: 14,
      },
    });
    expect(() => readModel(text, 'c.json')).toThrow(/not a model config/);
  });

  test('every family default table names its published config class', () => {
    const published = Object.entries(CHECKPOINT_FAMILIES).flatMap(([type, row]) =>
      row.published ? [[type, row.published] as const] : [],
    );
    expect(published.length).toBeGreaterThan(0);
    for (const [type, family] of published) {
      expect(family.source, type).toMatch(
        /^from the published config class [A-Z][A-Za-z0-9_]+Config$/,
      );
      expect(Object.keys(family.values).length, type).toBeGreaterThan(0);
    }
    // LlamaConfig: 4096 wide, 11008 feed-forward, 32 layers and heads, 2048 positions, untied (from the published config class).
    expect(CHECKPOINT_FAMILIES.llama?.published?.values).toMatchObject({
      hidden_size: 4096,
      intermediate_size: 11008,
      num_hidden_layers: 32,
      max_position_embeddings: 2048,
      tie_word_embeddings: false,
    });
  });

  test('a key written as null keeps its meaning "not set": no family default stands in for it', () => {
    const { spec } = readModel(
      configText({
        model_type: 'mistral',
        hidden_size: 1024,
        num_hidden_layers: 2,
        num_attention_heads: 8,
        vocab_size: 1000,
        max_position_embeddings: 4096,
        rope_theta: 10000,
        sliding_window: null,
      }),
      'c.json',
    );
    expect(spec.slidingWindow).toBeNull();
  });
});

describe('keys the reader does not honour', () => {
  test('an unknown key of the model block or of rope_scaling is reported as key-unread with its line; ordinary keys are not', () => {
    const text = configText({
      model_type: 'llama',
      hidden_size: 1024,
      num_hidden_layers: 2,
      num_attention_heads: 8,
      vocab_size: 1000,
      max_position_embeddings: 4096,
      rope_theta: 10000,
      intermediate_size: 2048,
      tie_word_embeddings: true,
      bos_token_id: 1,
      eos_token_id: 2,
      attention_dropout: 0.0,
      rms_norm_eps: 1e-5,
      use_cache: true,
      torch_dtype: 'bfloat16',
      num_memory_tokens: 16,
      rope_scaling: { rope_type: 'linear', factor: 2.0, extra_window: 4 },
    });
    const { findings } = readModel(text, 'c.json');
    expect(
      findings.filter((f) => f.rule === 'key-unread').map((f) => [f.key, f.severity, f.line]),
    ).toEqual([
      ['num_memory_tokens', 'info', lineOf(text, '"num_memory_tokens"')],
      ['rope_scaling.extra_window', 'info', lineOf(text, '"extra_window"')],
    ]);
  });
});

describe('the own model description states the same', () => {
  const OWN = `format: context-reach-model/1
model:
  layers: 32
  hidden: 4096
  heads: 32
  vocab: 32000
  position:
    code: rotary
  declared-span: 131072
`;

  test('relative buckets with buckets and max-distance: no reach, bucketHorizon from max-distance (Raffel et al. 2020, section 2.1)', () => {
    const text = OWN.replace(
      'code: rotary',
      'code: relative\n    buckets: 32\n    max-distance: 128',
    );
    const r = inspectModel(text, 'm.reach.yaml');
    expect(r.spec.position).toEqual({ kind: 'relative', buckets: 32, maxDistance: 128 });
    expect([r.metrics.reach, r.metrics.bucketHorizon]).toEqual([null, 128]);
    expect(r.findings).toEqual([]);
  });

  test('pairwise scaling with short-factors and long-factors, and trained-span as the tuned span of a scaled code', () => {
    const ones = `[${Array(64).fill(1).join(', ')}]`;
    const twos = `[${Array(64).fill(2).join(', ')}]`;
    const text = OWN.replace(
      'code: rotary',
      `code: rotary\n    scaling: {kind: pairwise, factor: 32, original-span: 4096, short-factors: ${ones}, long-factors: ${twos}}`,
    ).replace('declared-span: 131072', 'declared-span: 131072\n  trained-span: 131072');
    const r = inspectModel(text, 'm.reach.yaml');
    expect(rotary(r.spec).scaling).toMatchObject({
      kind: 'pairwise',
      shortFactors: Array(64).fill(1),
      longFactors: Array(64).fill(2),
    });
    expect([r.metrics.trainedSpan, r.metrics.tunedSpan, r.metrics.reach]).toEqual([
      4096, 131072, 131072,
    ]);
    // Past the original span every pair is divided by its long factor, 2: the fastest wavelength is 2π · 2.
    expect(r.metrics.fastestWavelength).toBeCloseTo(4 * Math.PI, 9);
    expect(r.findings.filter((f) => f.severity === 'block')).toEqual([]);
  });

  test('pairwise factor lists of the wrong length are reported against the pairs (64 for head 128)', () => {
    const text = OWN.replace(
      'code: rotary',
      'code: rotary\n    scaling: {kind: pairwise, factor: 32, original-span: 4096, short-factors: [1, 1], long-factors: [2, 2]}',
    );
    const r = inspectModel(text, 'm.reach.yaml');
    expect(r.findings.filter((f) => f.rule === 'value-invalid').map((f) => f.message)).toEqual([
      expect.stringContaining('number 2, but the rotary code has 64 pairs'),
      expect.stringContaining('number 2, but the rotary code has 64 pairs'),
    ]);
  });
});

describe('the family table (checkpoint-families.ts)', () => {
  test.each(['__proto__', 'constructor', 'toString', 'hasOwnProperty'])(
    'model_type %j names no family: read as an unknown one, with the code assumed none',
    (type) => {
      const { spec, findings } = readModel(
        configText({
          model_type: type,
          hidden_size: 64,
          num_hidden_layers: 2,
          num_attention_heads: 4,
          vocab_size: 100,
          max_position_embeddings: 128,
          sliding_window: 16,
        }),
        'c.json',
      );
      expect(spec.position.kind).toBe('none');
      expect(spec.gated).toBe(false);
      expect(spec.layerTypes ?? null).toBeNull();
      expect(findings.find((f) => f.rule === 'position-code-assumed')?.message).toContain(
        `model_type ${JSON.stringify(type.toLowerCase())} is not a known family`,
      );
    },
  );

  test('a family row carries every trait: gemma3_text is rotary, gated, scaled, four norms, per-head norms, every 6th layer global', () => {
    expect(CHECKPOINT_FAMILIES.gemma3_text).toMatchObject({
      position: 'rotary',
      gated: true,
      scaledEmbedding: true,
      fourNorms: true,
      qkNorms: true,
      globalEvery: 6,
    });
  });
});
