import { describe, expect, it } from 'vitest';
import { computeMetrics } from '../../src/core/metrics/compute.js';
import { dtypeQuantization, quantizedBytes } from '../../src/core/metrics/quantized-weights.js';
import { inspectModel } from '../../src/core/inspect.js';
import { readModel } from '../../src/core/parse/read-model.js';
import { parsePolicy, resolvePolicy } from '../../src/core/policy/index.js';

// Quantized weights (docs/metrics.md, "Quantized weights"): group quantization stores `bits` per weight
// plus one 16-bit scale per group (and a zero point of `bits` bits where the method keeps one):
// common practice. GPTQ (Frantar et al. 2022) quantizes to 4 bits in groups of 128. Every
// expected byte count below is worked out by hand beside the check.

/** The 70B-class shape of serving-devices.test.ts, with a quantization_config as published checkpoints write it. */
function seventyB(extra: Record<string, unknown> = {}): string {
  return JSON.stringify(
    {
      model_type: 'llama',
      hidden_size: 8192,
      intermediate_size: 28672,
      num_hidden_layers: 80,
      num_attention_heads: 64,
      num_key_value_heads: 8,
      vocab_size: 32000,
      max_position_embeddings: 4096,
      rope_theta: 10000,
      hidden_act: 'silu',
      tie_word_embeddings: false,
      torch_dtype: 'float16',
      ...extra,
    },
    null,
    2,
  );
}

// Hand count of the parts: matrices 80 · (150,994,944 + 704,643,072) = 68,451,041,280;
// unquantized: embedding and output 2 · 262,144,000 plus norms 80 · 16,384 + 8,192 = 525,606,912.
const MATRICES = 68_451_041_280;
const REST = 525_606_912;

describe('group quantization storage (common practice; worked by hand)', () => {
  it('4-bit weights in groups of 128 with a 16-bit scale: 1,048,576 weights take 524,288 + 8,192 · 2 = 540,672 bytes (4.125 bits each)', () => {
    const q = dtypeQuantization('int4', 128)!;
    expect(q).toEqual({
      method: 'int4',
      bits: 4,
      groupSize: 128,
      scaleBits: 16,
      zeroPoint: false,
      output: false,
    });
    expect(quantizedBytes(1_048_576, q)).toBe(540_672);
    expect((540_672 * 8) / 1_048_576).toBe(4.125);
  });

  it('adds a 4-bit zero point per group when the method stores one: + 8,192 · 0.5 = 544,768 bytes', () => {
    expect(quantizedBytes(1_048_576, { ...dtypeQuantization('int4', 128)!, zeroPoint: true })).toBe(
      544_768,
    );
  });

  it('block-scaled fp8 adds one 32-bit scale per 128 × 128 block: 262,144 weights take 262,144 + 16 · 4 bytes', () => {
    expect(
      quantizedBytes(262_144, {
        method: 'fp8',
        bits: 8,
        groupSize: 128 * 128,
        scaleBits: 32,
        zeroPoint: false,
        output: false,
      }),
    ).toBe(262_208);
  });
});

describe('quantization_config of checkpoint configs', () => {
  it('counts a GPTQ 4-bit, group-128 checkpoint (Frantar et al. 2022) within 2 % of the hand count, and exactly', () => {
    const text = seventyB({
      quantization_config: {
        quant_method: 'gptq',
        bits: 4,
        group_size: 128,
        desc_act: false,
        sym: true,
        lm_head: false,
        checkpoint_format: 'gptq',
      },
    });
    const read = readModel(text, 'config.json');
    expect(read.findings).toEqual([]);
    expect(read.spec.quantization).toEqual({
      method: 'gptq',
      bits: 4,
      groupSize: 128,
      scaleBits: 16,
      zeroPoint: true,
      output: false,
    });
    // Hand count: 68,451,041,280 · 4 / 8 = 34,225,520,640; 534,773,760 groups · (16 + 4) bits / 8 = 1,336,934,400;
    // the rest in fp16: 525,606,912 · 2 = 1,051,213,824. Total 36,613,668,864 bytes (34.1 GiB), against 137,953,296,384 in fp16.
    const hand = 34_225_520_640 + 1_336_934_400 + 1_051_213_824;
    expect(MATRICES / 128).toBe(534_773_760);
    expect(hand).toBe(MATRICES / 2 + (MATRICES / 128) * 2.5 + REST * 2);
    const bytes = computeMetrics(read.spec).weightBytes!;
    expect(Math.abs(bytes - hand) / hand).toBeLessThan(0.02);
    expect(bytes).toBe(36_613_668_864);
  });

  it('quantizes the output matrix too when GPTQ says lm_head: true', () => {
    const q = readModel(
      seventyB({
        quantization_config: { quant_method: 'gptq', bits: 4, group_size: 128, lm_head: true },
      }),
      'config.json',
    ).spec;
    const plain = readModel(
      seventyB({ quantization_config: { quant_method: 'gptq', bits: 4, group_size: 128 } }),
      'config.json',
    ).spec;
    // The output matrix 262,144,000 weights: 2 bytes each less 0.5 + 2.5/128 bytes each.
    expect(computeMetrics(plain).weightBytes! - computeMetrics(q).weightBytes!).toBe(
      262_144_000 * 2 - (262_144_000 / 2 + (262_144_000 / 128) * 2.5),
    );
  });

  it('reads AWQ keys w_bit, q_group_size and zero_point', () => {
    const spec = readModel(
      seventyB({
        quantization_config: {
          quant_method: 'awq',
          w_bit: 4,
          q_group_size: 64,
          zero_point: false,
          version: 'gemm',
        },
      }),
      'config.json',
    ).spec;
    expect(spec.quantization).toEqual({
      method: 'awq',
      bits: 4,
      groupSize: 64,
      scaleBits: 16,
      zeroPoint: false,
      output: false,
    });
    expect(computeMetrics(spec).weightBytes).toBe(MATRICES / 2 + (MATRICES / 64) * 2 + REST * 2);
  });

  it('reads block-scaled fp8 with weight_block_size [128, 128]: one byte per weight and a 32-bit scale per block', () => {
    const spec = readModel(
      seventyB({
        torch_dtype: 'bfloat16',
        quantization_config: {
          quant_method: 'fp8',
          fmt: 'e4m3',
          activation_scheme: 'dynamic',
          weight_block_size: [128, 128],
        },
      }),
      'config.json',
    ).spec;
    expect(spec.quantization).toMatchObject({ bits: 8, groupSize: 16_384, scaleBits: 32 });
    // 68,451,041,280 / 16,384 = 4,177,920 blocks.
    expect(computeMetrics(spec).weightBytes).toBe(MATRICES + 4_177_920 * 4 + REST * 2);
  });

  it('reads bitsandbytes 4-bit: 4 bits plus a 32-bit absolute maximum per block of 64 (from memory), 4.5 bits per weight', () => {
    const spec = readModel(
      seventyB({
        quantization_config: {
          quant_method: 'bitsandbytes',
          load_in_4bit: true,
          load_in_8bit: false,
          bnb_4bit_quant_type: 'nf4',
          bnb_4bit_use_double_quant: false,
        },
      }),
      'config.json',
    ).spec;
    expect(computeMetrics(spec).weightBytes).toBe(MATRICES * (4.5 / 8) + REST * 2);
  });

  it('names an unknown method in a warning and counts every weight unquantized, never a silent figure', () => {
    const text = seventyB({
      quantization_config: { quant_method: 'compressed-tensors', format: 'pack-quantized' },
    });
    const report = inspectModel(text, 'config.json');
    const finding = report.findings.find((f) => f.rule === 'quantization-unknown')!;
    expect(finding).toMatchObject({
      severity: 'warn',
      key: 'quantization_config.quant_method',
      line: 15,
    });
    expect(finding.message).toContain('"compressed-tensors"');
    expect(report.metrics.weightBytes).toBe((MATRICES + REST) * 2);
    expect(report.findings.some((f) => f.severity === 'block')).toBe(false);
  });

  it('says so when modules other than lm_head are kept unquantized', () => {
    const read = readModel(
      seventyB({
        quantization_config: {
          quant_method: 'awq',
          bits: 4,
          group_size: 128,
          modules_to_not_convert: ['lm_head', 'mlp.gate'],
        },
      }),
      'config.json',
    );
    expect(read.findings.map((f) => [f.rule, f.key])).toEqual([
      ['key-ignored', 'quantization_config.modules_to_not_convert'],
    ]);
  });

  it("drops the checkpoint's quantization when the command line names another weight format", () => {
    const text = seventyB({
      quantization_config: { quant_method: 'gptq', bits: 4, group_size: 128 },
    });
    const report = inspectModel(text, 'config.json', { overrides: { weights: 'bf16' } });
    expect(report.spec.quantization).toBeNull();
    expect(report.metrics.weightBytes).toBe((MATRICES + REST) * 2);
  });

  it('refuses a group size that is not a whole number of weights, naming the key', () => {
    const read = readModel(
      seventyB({ quantization_config: { quant_method: 'gptq', bits: 4, group_size: 0 } }),
      'config.json',
    );
    expect(read.findings.map((f) => [f.rule, f.key])).toEqual([
      ['value-invalid', 'quantization_config.group_size'],
    ]);
    expect(read.spec.quantization).toBeNull();
  });
});

describe('MXFP4 mixtures of experts (gpt-oss)', () => {
  // OCP Microscaling Formats (MX) Specification v1.0 (2023): MXFP4 holds FP4 (E2M1) elements in
  // blocks of 32 that share one 8-bit E8M0 scale, 4.25 bits per element. gpt-oss checkpoints store
  // their routed experts' weights so and keep attention, router, embeddings and output in bf16
  // (their quantization_config lists those in modules_to_not_convert). Published figures: OpenAI's
  // gpt-oss model card (2025), Table 1: gpt-oss-120b 116.83B parameters, a 60.8 GiB checkpoint;
  // gpt-oss-20b 20.91B and 12.8 GiB (from memory). The shapes are the published key style with
  // the published sizes (hidden 2880, experts 2880 wide, 64 heads of 64, 8 key/value heads).
  function gptOss(layers: number, experts: number, extra: Record<string, unknown> = {}): string {
    return JSON.stringify(
      {
        architectures: ['GptOssForCausalLM'],
        model_type: 'gpt_oss',
        hidden_size: 2880,
        intermediate_size: 2880,
        num_hidden_layers: layers,
        num_attention_heads: 64,
        num_key_value_heads: 8,
        head_dim: 64,
        hidden_act: 'silu',
        attention_bias: true,
        num_local_experts: experts,
        num_experts_per_tok: 4,
        max_position_embeddings: 131072,
        rope_theta: 150000,
        vocab_size: 201088,
        tie_word_embeddings: false,
        torch_dtype: 'bfloat16',
        quantization_config: {
          quant_method: 'mxfp4',
          modules_to_not_convert: [
            'model.layers.*.self_attn',
            'model.layers.*.mlp.router',
            'model.embed_tokens',
            'lm_head',
          ],
        },
        ...extra,
      },
      null,
      2,
    );
  }
  const GIB = 2 ** 30;

  it('stores a block of 32 weights in 32 · 4 + 8 bits: 4.25 bits per weight', () => {
    const q = {
      method: 'mxfp4',
      bits: 4,
      groupSize: 32,
      scaleBits: 8,
      zeroPoint: false,
      output: false,
    };
    expect(quantizedBytes(32, q)).toBe((32 * 4 + 8) / 8);
    expect((quantizedBytes(2 ** 20, q)! * 8) / 2 ** 20).toBe(4.25);
  });

  it('counts gpt-oss-120b and gpt-oss-20b within 1 % of the published parameters and checkpoint sizes, experts at 4.25 bits and the rest in bf16', () => {
    for (const [layers, experts, params, gib] of [
      [36, 128, 116.83e9, 60.8],
      [24, 32, 20.91e9, 12.8],
    ] as const) {
      const report = inspectModel(gptOss(layers, experts), 'config.json');
      expect(report.findings.filter((f) => f.severity !== 'info')).toEqual([]);
      expect(Math.abs(report.metrics.params! - params) / params).toBeLessThan(0.01);
      expect(Math.abs(report.metrics.weightBytes! / GIB - gib) / gib).toBeLessThan(0.01);
      // Worked by hand: the routed experts' matrices (gated: 3 · 2880 · 2880 each) at 4.25 bits,
      // every other parameter at 2 bytes.
      const expertMatrices = layers * experts * 3 * 2880 * 2880;
      expect(report.metrics.weightBytes).toBe(
        (expertMatrices * 4.25) / 8 + (report.metrics.params! - expertMatrices) * 2,
      );
    }
  });

  it('says so when the model has no experts, or keeps expert modules unquantized', () => {
    const dense = inspectModel(
      gptOss(24, 32, { num_local_experts: undefined, num_experts_per_tok: undefined }),
      'config.json',
    );
    const unknown = dense.findings.find((f) => f.rule === 'quantization-unknown');
    expect(unknown?.key).toBe('quantization_config.quant_method');
    expect(unknown?.message).toContain('no experts');
    expect(dense.metrics.weightBytes).toBe(dense.metrics.params! * 2);
    const keptExperts = inspectModel(
      gptOss(24, 32, {
        quantization_config: {
          quant_method: 'mxfp4',
          modules_to_not_convert: ['model.layers.0.mlp.experts', 'lm_head'],
        },
      }),
      'config.json',
    );
    const ignored = keptExperts.findings.find((f) => f.rule === 'key-ignored');
    expect(ignored?.key).toBe('quantization_config.modules_to_not_convert');
  });
});

describe('quantized weights from the own description and the policy', () => {
  const own = (dtypes: string) => `format: context-reach-model/1
model:
  layers: 80
  hidden: 8192
  heads: 64
  kv-heads: 8
  feed-forward: { size: 28672, gated: true }
  vocab: 32000
  tied-output: false
  position: { code: rotary, base: 10000 }
  declared-span: 4096
  dtypes: ${dtypes}
`;

  it('reads weights: int4 with weight-group-size 128 as group quantization of the matrices, the rest in bf16', () => {
    const read = readModel(own('{ weights: int4, weight-group-size: 128 }'), 'm.reach.yaml');
    expect(read.findings).toEqual([]);
    expect(computeMetrics(read.spec).weightBytes).toBe(
      MATRICES / 2 + (MATRICES / 128) * 2 + REST * 2,
    );
  });

  it('keeps the contract formula for int4 without a group size: every parameter at half a byte', () => {
    const read = readModel(own('{ weights: int4 }'), 'm.reach.yaml');
    expect(computeMetrics(read.spec).weightBytes).toBe((MATRICES + REST) / 2);
  });

  it('reports a group size on a float format as having no effect', () => {
    const read = readModel(own('{ weights: bf16, weight-group-size: 128 }'), 'm.reach.yaml');
    expect(read.findings.map((f) => [f.rule, f.key])).toEqual([
      ['key-ignored', 'model.dtypes.weight-group-size'],
    ]);
  });

  it("applies the policy's weights int4 and weight-group-size to a config without its own quantization, and yields to one with it", () => {
    const policy = parsePolicy(
      'serving:\n  weights: int4\n  weight-group-size: 128\n',
      '.github/context-reach.yml',
    );
    const serving = resolvePolicy(policy, 'm/config.json').serving;
    expect(serving).toEqual({ weights: 'int4', weightGroupSize: 128 });
    const noDtype = seventyB()
      .replace('"torch_dtype": "float16",', '')
      .replace(',\n  "torch_dtype": "float16"', '');
    const plain = inspectModel(noDtype, 'm/config.json', { defaults: serving });
    expect(plain.metrics.weightBytes).toBe(MATRICES / 2 + (MATRICES / 128) * 2 + REST * 2);
    expect(plain.locations.quantization).toEqual({ key: 'policy serving', line: null });
    const gptq = inspectModel(
      seventyB({ quantization_config: { quant_method: 'gptq', bits: 8, group_size: 128 } }),
      'm/config.json',
      { defaults: serving },
    );
    expect(gptq.spec.quantization?.method).toBe('gptq');
  });
});
