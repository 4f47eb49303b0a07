import { describe, expect, it } from 'vitest';
import { computeMetrics } from '../../src/core/metrics/compute.js';
import { fitSequences, weightBytes } from '../../src/core/metrics/memory-fit.js';
import { parameterBreakdown } from '../../src/core/metrics/parameter-count.js';
import { shardingDegrees, shards } from '../../src/core/metrics/per-device.js';
import { servedSequences } from '../../src/core/metrics/kv-cache.js';
import { readModel } from '../../src/core/parse/read-model.js';
import type { ModelSpec } from '../../src/core/model.js';
import {
  PER_DEVICE_METRICS,
  SCALAR_METRICS,
  type PerDeviceMetric,
} from '../../src/core/metrics/types.js';
import { specFindings } from '../../src/core/rules/spec-rules.js';
import { cpuClock } from '../support/cpu-time.js';

// Serving across devices (docs/metrics.md, "Serving across devices"). Expected values are worked out by
// hand beside each check from the contract's formulas; the shapes are published ones.

const GIB = 2 ** 30;

/**
 * A 70B-class shape: 80 layers, width 8192, 64 heads, 8 key/value heads of 128, feed-forward 28672
 * (Touvron et al. 2023, Llama 2, Table 1: the 70B model uses grouped-query attention; 8 key/value
 * heads and the widths from memory of its published config; Ainslie et al. 2023, GQA, for key/value
 * heads shared by groups of query heads), vocabulary 32000, untied output, fp16.
 */
function seventyB(serving: Record<string, unknown> = {}): string {
  return JSON.stringify({
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
    ...serving,
  });
}

function specWith(text: string, serving: Partial<ModelSpec['serving']>): ModelSpec {
  const spec = readModel(text, 'config.json').spec;
  return { ...spec, serving: { ...spec.serving, ...serving } };
}

// Parameters by hand: embedding and output 32000·8192 = 262,144,000 each; per layer attention
// 8192·64·128 + 2·8192·8·128 + 64·128·8192 = 150,994,944, feed-forward 3·8192·28672 = 704,643,072,
// two norms 16,384: 855,654,400; 80 layers 68,452,352,000; final norm 8,192.
const PARAMS = 2 * 262_144_000 + 80 * 855_654_400 + 8_192;
const WEIGHT_BYTES = PARAMS * 2;

describe('per-device figures of a 70B-class shape (docs/metrics.md, serving across devices)', () => {
  it('counts 68,976,648,192 parameters, 137,953,296,384 bytes in fp16, split into the parts a quantization needs', () => {
    const spec = specWith(seventyB(), {});
    expect(PARAMS).toBe(68_976_648_192);
    const parts = parameterBreakdown(spec)!;
    expect(parts.params).toBe(PARAMS);
    expect(parts.embedding).toBe(262_144_000);
    expect(parts.output).toBe(262_144_000);
    expect(parts.vectors).toBe(80 * 16_384 + 8_192);
    expect(parts.matrices).toBe(80 * (150_994_944 + 704_643_072));
    expect(computeMetrics(spec).weightBytes).toBe(WEIGHT_BYTES);
  });

  // t ∈ {1, 2, 8, 16}, p ∈ {1, 4}: kvHeadsPerDevice = ceil(8 / t) = 8, 4, 1, 1 (t = 16 > 8 keeps a
  // copy of one head per device); a stage holds ceil(80 / p) = 80 or 20 layers; a layer holds
  // 2 · kvHeadsPerDevice · 128 · 2 bytes per token.
  const cases: [t: number, p: number, kvPerDevice: number, cachePerToken: number][] = [
    [1, 1, 8, 80 * 2 * 8 * 128 * 2], // 327,680
    [2, 1, 4, 80 * 2 * 4 * 128 * 2], // 163,840
    [8, 1, 1, 80 * 2 * 1 * 128 * 2], // 40,960
    [16, 1, 1, 80 * 2 * 1 * 128 * 2], // 40,960: the copies do not shrink
    [1, 4, 8, 20 * 2 * 8 * 128 * 2], // 81,920
    [2, 4, 4, 20 * 2 * 4 * 128 * 2], // 40,960
    [8, 4, 1, 20 * 2 * 1 * 128 * 2], // 10,240
    [16, 4, 1, 20 * 2 * 1 * 128 * 2], // 10,240
  ];
  it.each(cases)(
    't = %i, p = %i: %i key/value heads and %i cache bytes per token on each device, weights split evenly',
    (t, p, kv, perToken) => {
      const m = computeMetrics(
        specWith(seventyB(), {
          tensorParallel: t,
          pipelineParallel: p,
          span: 4096,
          sequences: 64,
          deviceGiB: 80,
        }),
      );
      expect(m.devices).toBe(t * p);
      expect(m.kvHeadsPerDevice).toBe(kv);
      expect(m.cachePerTokenBytesPerDevice).toBe(perToken);
      expect(m.weightBytesPerDevice).toBe(WEIGHT_BYTES / (t * p));
      expect(Number.isInteger(m.weightBytesPerDevice)).toBe(true);
      expect(m.memoryBytesPerDevice).toBe(WEIGHT_BYTES / (t * p) + 64 * 4096 * perToken);
      expect(m.fitSequences).toBe(
        Math.floor((80 * GIB * 0.9 - WEIGHT_BYTES / (t * p)) / (4096 * perToken)),
      );
    },
  );

  it('gives exact integers: t = 8 splits 137,953,296,384 weight bytes into 17,244,162,048 per device, t = 16 p = 4 into 2,155,520,256', () => {
    expect(computeMetrics(specWith(seventyB(), { tensorParallel: 8 })).weightBytesPerDevice).toBe(
      17_244_162_048,
    );
    expect(
      computeMetrics(specWith(seventyB(), { tensorParallel: 16, pipelineParallel: 4 }))
        .weightBytesPerDevice,
    ).toBe(2_155_520_256);
  });

  it('fits over 8 devices of 80 GiB what one device cannot hold: 358 sequences of 4,096 tokens per replica', () => {
    const one = computeMetrics(specWith(seventyB(), { span: 4096, deviceGiB: 80 }));
    expect(one.fitSequences).toBeLessThan(0);
    const eight = computeMetrics(
      specWith(seventyB(), { span: 4096, deviceGiB: 80, tensorParallel: 8 }),
    );
    // (80 GiB · 0.9 − 17,244,162,048) / (4,096 · 40,960) = (77,309,411,328 − 17,244,162,048) / 167,772,160 = 358.01…
    expect(eight.fitSequences).toBe(358);
  });

  it('subtracts an activation reserve per device from the usable memory', () => {
    const m = computeMetrics(
      specWith(seventyB(), {
        span: 4096,
        deviceGiB: 80,
        tensorParallel: 8,
        activationReserveGiB: 4,
      }),
    );
    expect(m.fitSequences).toBe(
      Math.floor((80 * GIB * 0.9 - 4 * GIB - 17_244_162_048) / 167_772_160),
    );
  });
});

describe('with t = p = 1 every figure is the single-device one', () => {
  const shapes: [string, string][] = [
    ['70B-class', seventyB()],
    [
      'windowed, 24 of 32 layers',
      JSON.stringify({
        model_type: 'mistral',
        hidden_size: 4096,
        intermediate_size: 14336,
        num_hidden_layers: 32,
        num_attention_heads: 32,
        num_key_value_heads: 8,
        vocab_size: 32000,
        max_position_embeddings: 32768,
        rope_theta: 1000000,
        sliding_window: 4096,
        layer_types: [...Array(8).fill('full_attention'), ...Array(24).fill('sliding_attention')],
      }),
    ],
    [
      'learned table with biases',
      JSON.stringify({
        model_type: 'gpt2',
        n_embd: 768,
        n_layer: 12,
        n_head: 12,
        vocab_size: 50257,
        n_positions: 1024,
      }),
    ],
    [
      'encoder-decoder',
      JSON.stringify({
        model_type: 't5',
        d_model: 512,
        num_layers: 6,
        num_heads: 8,
        d_kv: 64,
        d_ff: 2048,
        vocab_size: 32128,
        n_positions: 512,
      }),
    ],
  ];
  it.each(shapes)(
    '%s: devices 1, per-device figures equal weightBytes, cachePerTokenBytes, memoryBytes, and fitSequences as before',
    (_name, text) => {
      for (const serving of [{}, { span: 8192, sequences: 16, deviceGiB: 40, reserve: 0.2 }]) {
        const spec = specWith(text, serving);
        const m = computeMetrics(spec);
        expect(m.devices).toBe(1);
        expect(m.kvHeadsPerDevice).toBe(spec.kvHeads);
        expect(m.weightBytesPerDevice).toBe(m.weightBytes);
        expect(m.weightBytes).toBe(weightBytes(spec, m.params));
        expect(m.cachePerTokenBytesPerDevice).toBe(m.cachePerTokenBytes);
        expect(m.memoryBytesPerDevice).toBe(m.memoryBytes);
        // Every metric the catalogue lists as per-device (the comment hides them on one device
        // because of this equality) has its single-device figure here: a new one must be added.
        const single: Record<PerDeviceMetric, number | null> = {
          devices: 1,
          kvHeadsPerDevice: spec.kvHeads,
          weightBytesPerDevice: m.weightBytes,
          cachePerTokenBytesPerDevice: m.cachePerTokenBytes,
          memoryBytesPerDevice: m.memoryBytes,
        };
        expect(Object.keys(single).sort()).toEqual([...PER_DEVICE_METRICS].sort());
        for (const metric of PER_DEVICE_METRICS) expect(m[metric], metric).toBe(single[metric]);
        // The single-device formula of the context budget, kept in memory-fit.ts.
        expect(m.fitSequences).toBe(
          fitSequences(spec, m.weightBytes, m.cacheBytesAtSpan, servedSequences(spec)),
        );
      }
    },
  );
});

describe('the per-device metrics of the catalogue (PER_DEVICE_METRICS)', () => {
  it('are the device count and every scalar metric named per device, the last of SCALAR_METRICS', () => {
    expect(PER_DEVICE_METRICS).toEqual([
      'devices',
      ...SCALAR_METRICS.filter((metric) => metric.endsWith('PerDevice')),
    ]);
    expect(SCALAR_METRICS.slice(-PER_DEVICE_METRICS.length)).toEqual([...PER_DEVICE_METRICS]);
  });
});

describe('the busiest pipeline stage', () => {
  it('holds the full-attention layers first when windowed layers are mixed in: 8 full + 2 windowed of 10 per stage', () => {
    const text = JSON.stringify({
      model_type: 'mistral',
      hidden_size: 4096,
      intermediate_size: 14336,
      num_hidden_layers: 32,
      num_attention_heads: 32,
      num_key_value_heads: 8,
      vocab_size: 32000,
      max_position_embeddings: 32768,
      rope_theta: 1000000,
      sliding_window: 4096,
      layer_types: [...Array(8).fill('full_attention'), ...Array(24).fill('sliding_attention')],
    });
    const m = computeMetrics(specWith(text, { span: 32768, sequences: 1, pipelineParallel: 4 }));
    const layer = 2 * 8 * 128 * 2; // bytes per token and layer (bf16 by default)
    // ceil(32/4) = 8 layers per stage; the busiest has all 8 full layers (32,768 tokens each).
    expect(m.memoryBytesPerDevice! - m.weightBytesPerDevice!).toBe(8 * layer * 32768);
    const m3 = computeMetrics(specWith(text, { span: 32768, sequences: 1, pipelineParallel: 3 }));
    // ceil(32/3) = 11 layers: 8 full, 3 windowed at 4,096 tokens.
    expect(m3.memoryBytesPerDevice! - m3.weightBytesPerDevice!).toBe(
      8 * layer * 32768 + 3 * layer * 4096,
    );
  });
});

describe('sharding degrees', () => {
  it('for 64 heads and 8 key/value heads are the divisors of 64: 1, 2, 4, 8, 16, 32, 64 (8 and t divide one another)', () => {
    expect(shardingDegrees(64, 8, 64)).toEqual([1, 2, 4, 8, 16, 32, 64]);
    expect(shards(64, 8, 3)).toBe(false);
  });

  it('leave out divisors of the heads that the key/value heads do not divide and that do not divide them: 40 heads, 8 kv → 1, 2, 4, 8, 40', () => {
    // 5, 10 and 20 divide 40, but neither 8 % t nor t % 8 is 0.
    expect(shardingDegrees(40, 8, 64)).toEqual([1, 2, 4, 8, 40]);
  });

  it('a hostile head count near 2^32 answers quickly', () => {
    const cpu = cpuClock();
    expect(shardingDegrees(2 ** 32 - 1, 1).length).toBeGreaterThan(0);
    expect(cpu(), 'ms of CPU time').toBeLessThan(1000);
  });
});

describe('layout-unshardable (docs/metrics.md: heads % t != 0, or kvHeads and t with neither dividing the other)', () => {
  const findings = (heads: number, kv: number, t: number) => {
    const text = JSON.stringify({
      model_type: 'llama',
      hidden_size: heads * 128,
      num_hidden_layers: 4,
      num_attention_heads: heads,
      num_key_value_heads: kv,
      vocab_size: 1000,
      max_position_embeddings: 4096,
      rope_theta: 10000,
    });
    return specFindings(specWith(text, { tensorParallel: t }), {
      'serving.tensorParallel': { key: 'serving.tensor-parallel', line: 3 },
    }).filter((f) => f.rule === 'layout-unshardable');
  };

  it('blocks 12 key/value heads over 8 ranks though 8 divides the 48 heads, naming the degrees that work', () => {
    const [f] = findings(48, 12, 8);
    expect(f).toMatchObject({ severity: 'block', key: 'serving.tensor-parallel', line: 3 });
    // Divisors of 48 that 12 divides or that divide 12... 1, 2, 3, 4, 6, 12, 24, 48; not 8 or 16.
    expect(f!.message).toBe(
      'The tensor-parallel degree 8 (serving.tensor-parallel) cannot shard the attention: 8 and the 12 key/value heads do not divide one another; use a tensor-parallel degree of 1, 2, 3, 4, 6, 12, 24 or 48.',
    );
  });

  it('lets 16 ranks share 8 key/value heads (each keeps a copy) and 2 ranks split them', () => {
    expect(findings(64, 8, 16)).toEqual([]);
    expect(findings(64, 8, 2)).toEqual([]);
  });
});
