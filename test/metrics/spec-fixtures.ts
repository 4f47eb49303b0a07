/** Invented model specs for the metric tests (no real product is described). */
import type { ModelSpec, PositionCode } from '../../src/core/model.js';

type SpecOverrides = Partial<Omit<ModelSpec, 'serving' | 'dtypes'>> & {
  serving?: Partial<ModelSpec['serving']>;
  dtypes?: Partial<ModelSpec['dtypes']>;
};

/** A small decoder-only rotary model, with any field replaced. */
export function makeSpec(over: SpecOverrides = {}): ModelSpec {
  const hidden = over.hidden ?? 256;
  const heads = over.heads ?? 4;
  const position: PositionCode = over.position ?? {
    kind: 'rotary',
    base: 10000,
    fraction: 1,
    scaling: null,
  };
  const { serving, dtypes, ...rest } = over;
  return {
    name: 'toy-model',
    layers: 2,
    hidden,
    heads,
    kvHeads: heads,
    headDim: hidden / heads,
    ffn: 4 * hidden,
    gated: false,
    vocab: 1000,
    tied: true,
    bias: false,
    experts: null,
    encoder: null,
    position,
    declaredSpan: 2048,
    trainedSpan: null,
    slidingWindow: null,
    windowLayers: null,
    embeddingInitStd: null,
    embeddingMultiplier: null,
    ...rest,
    dtypes: { weights: null, cache: null, positions: null, ...dtypes },
    serving: {
      span: null,
      sequences: null,
      deviceGiB: null,
      reserve: null,
      outputTokens: null,
      promptTokens: null,
      ...serving,
    },
  };
}
