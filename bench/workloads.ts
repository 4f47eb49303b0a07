/**
 * Benchmark workloads of issue 4 (invented configs): one rotary model with 64 frequency pairs
 * (head 128, base 10000), all positional metrics in all three formats, at T = 2^20 (W1) and
 * T = 2^24 (W2).
 */
import type { ModelSpec } from '../src/core/model.js';

export interface Workload {
  name: 'W1' | 'W2';
  span: number;
  spec: ModelSpec;
}

function rotary64(span: number): ModelSpec {
  return {
    name: 'bench-rotary-64',
    layers: 32,
    hidden: 4096,
    heads: 32,
    kvHeads: 8,
    headDim: 128,
    ffn: 11008,
    gated: true,
    vocab: 32000,
    tied: false,
    bias: false,
    experts: null,
    encoder: null,
    position: { kind: 'rotary', base: 10000, fraction: 1, scaling: null },
    declaredSpan: span,
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
    },
  };
}

export const W1: Workload = { name: 'W1', span: 2 ** 20, spec: rotary64(2 ** 20) };
export const W2: Workload = { name: 'W2', span: 2 ** 24, spec: rotary64(2 ** 24) };
