/**
 * Checks against figures published outside the project: the paper, year and place stand beside
 * every check. Counts are compared with the tolerance the paper's own
 * rounding or omissions allow, stated at each check.
 */
import { describe, expect, it } from 'vitest';
import { elementAt } from '../../src/core/element-at.js';
import { computeMetrics } from '../../src/core/metrics/compute.js';
import { alibiHorizon, alibiSlopes } from '../../src/core/metrics/alibi-slopes.js';
import {
  ntkBase,
  scaleFrequencies,
  yarnAttentionScale,
} from '../../src/core/metrics/context-scaling.js';
import {
  geometricFrequencies,
  rotaryWidth,
  rotatedChannels,
} from '../../src/core/metrics/frequencies.js';
import type { EncoderStack, ModelSpec } from '../../src/core/model.js';
import { makeSpec } from './spec-fixtures.js';

function relativeError(actual: number | null, expected: number): number {
  if (actual === null) throw new Error('metric is null');
  return Math.abs(actual / expected - 1);
}

describe('Vaswani et al. 2017, "Attention Is All You Need"', () => {
  const base = (): ModelSpec => {
    const encoder: EncoderStack = { layers: 6, heads: 8, kvHeads: 8, headDim: 64, ffn: 2048 };
    return makeSpec({
      layers: 6,
      hidden: 512,
      heads: 8,
      kvHeads: 8,
      headDim: 64,
      ffn: 2048,
      vocab: 37000,
      tied: true,
      bias: true,
      encoder,
      position: { kind: 'sinusoidal' },
      declaredSpan: 512,
    });
  };

  it('fastestWavelength/slowestWavelength(spec) run from 2π to 2π·10000^((d-2)/d) = 60611.5 for d = 512 (§3.5 says "to 10000·2π": that is the limit, not the last pair)', () => {
    const m = computeMetrics(base());
    // exact formula: relative 1e-12 covers Math.pow rounding
    expect(relativeError(m.fastestWavelength, 2 * Math.PI)).toBeLessThan(1e-12);
    // the source prints one decimal: absolute 0.05
    expect(Math.abs((m.slowestWavelength as number) - 60611.5)).toBeLessThan(0.05);
  });

  it('sinusoidal frequencies form the geometric progression of §3.5: θ_i = 10000^(-2i/d), ratio 10000^(-2/d)', () => {
    const theta = geometricFrequencies(10000, 512)!;
    expect(theta.length).toBe(256);
    expect(theta[0]).toBe(1);
    const ratio = Math.pow(10000, -2 / 512);
    // consecutive ratios agree to a few binary64 roundings
    for (let i = 1; i < theta.length; i++)
      expect(Math.abs(elementAt(theta, i) / elementAt(theta, i - 1) / ratio - 1)).toBeLessThan(
        1e-13,
      );
  });

  it('params(spec) of the base model (N=6, d=512, ff=2048, h=8, shared 37,000 vocab) is 65M within 5% (Table 3)', () => {
    // 5%: Table 3 prints two significant digits and the paper does not say which small terms
    // (norms, biases, embedding scaling) it counted
    expect(relativeError(computeMetrics(base()).params, 65e6)).toBeLessThan(0.05);
  });
});

describe('Devlin et al. 2018, BERT (§3 "Model Architecture")', () => {
  const bert = (layers: number, hidden: number, heads: number): ModelSpec =>
    makeSpec({
      layers,
      hidden,
      heads,
      kvHeads: heads,
      headDim: hidden / heads,
      ffn: 4 * hidden,
      vocab: 30522,
      tied: true,
      bias: true,
      position: { kind: 'learned' },
      declaredSpan: 512,
    });

  it('params(spec) is 110M for BERT-BASE and 340M for BERT-LARGE within 3% (learned table 512, vocab 30,522)', () => {
    // 3%: the paper rounds to two or three digits and also counts segment embeddings and the pooler
    expect(relativeError(computeMetrics(bert(12, 768, 12)).params, 110e6)).toBeLessThan(0.03);
    expect(relativeError(computeMetrics(bert(24, 1024, 16)).params, 340e6)).toBeLessThan(0.03);
  });

  it('reach(spec) is the learned table size, 512 (App. A.2: sequences of at most 512 tokens)', () => {
    expect(computeMetrics(bert(12, 768, 12)).reach).toBe(512);
  });
});

describe('Brown et al. 2020, GPT-3, Table 2.1', () => {
  const gpt3 = (layers: number, hidden: number, heads: number): ModelSpec =>
    makeSpec({
      layers,
      hidden,
      heads,
      kvHeads: heads,
      headDim: hidden / heads,
      ffn: 4 * hidden,
      vocab: 50257,
      tied: true,
      bias: true,
      position: { kind: 'learned' },
      declaredSpan: 2048,
    });

  it.each([
    ['Small', 12, 768, 12, 125e6],
    ['Medium', 24, 1024, 16, 350e6],
    ['6.7B', 32, 4096, 32, 6.7e9],
    ['175B', 96, 12288, 96, 175.0e9],
  ])(
    'params(spec) of GPT-3 %s is the printed n_params within 3%%',
    (_name, layers, hidden, heads, printed) => {
      // 3%: Table 2.1 prints two or three significant digits (rows with the printed d_model/head
      // inconsistencies, 13B's d_model 5140 and XL's 24 heads × 128, are left out)
      expect(
        relativeError(computeMetrics(gpt3(layers, hidden, heads)).params, printed),
      ).toBeLessThan(0.03);
    },
  );

  it('nonEmbeddingParams(spec) of 175B is 12·n_layer·d_model² = 1.739e11 within 0.5% (Kaplan et al. 2020, Eq. 2.1)', () => {
    // 0.5%: Kaplan's approximation leaves out biases and norms
    expect(
      relativeError(computeMetrics(gpt3(96, 12288, 96)).nonEmbeddingParams, 1.739e11),
    ).toBeLessThan(0.005);
  });

  it('flopsPerToken(spec) of 175B adds the context term 2·n_layer·n_ctx·d_attn = 4.83e9 to 2N (Kaplan et al. 2020, Table 1)', () => {
    const m = computeMetrics(gpt3(96, 12288, 96));
    const contextTerm = (m.flopsPerToken as number) - 2 * (m.nonEmbeddingParams as number);
    // 0.5%: 4.83e9 and 3.48e11 are 2·96·2048·12288 and 2N to three digits
    expect(relativeError(contextTerm, 4.83e9)).toBeLessThan(0.005);
    expect(relativeError(2 * (m.nonEmbeddingParams as number), 3.48e11)).toBeLessThan(0.005);
  });
});

describe('Touvron et al. 2023, LLaMA, Table 2', () => {
  /** SwiGLU width from the reference code: int(2·4d/3) rounded up to a multiple of 256 (common practice). */
  const llamaFfn = (d: number): number => 256 * Math.ceil(Math.floor((2 * 4 * d) / 3) / 256);
  const llama = (hidden: number, heads: number, layers: number): ModelSpec =>
    makeSpec({
      layers,
      hidden,
      heads,
      kvHeads: heads,
      headDim: hidden / heads,
      ffn: llamaFfn(hidden),
      gated: true,
      vocab: 32000,
      tied: false,
      bias: false,
      declaredSpan: 2048,
    });

  it('the 2/3·4d rule with multiple_of = 256 gives 11008, 13824, 17920, 22016 (Touvron et al. 2023, LLaMA §2.2 and llama/model.py)', () => {
    expect([4096, 5120, 6656, 8192].map(llamaFfn)).toEqual([11008, 13824, 17920, 22016]);
  });

  it.each([
    [4096, 32, 32, 6.7e9],
    [5120, 40, 40, 13.0e9],
    [6656, 52, 60, 32.5e9],
    [8192, 64, 80, 65.2e9],
  ])(
    'params(spec) with dim %i, %i heads, %i layers is the printed size within 1%%',
    (hidden, heads, layers, printed) => {
      // 1%: Table 2 prints three significant digits
      expect(
        relativeError(computeMetrics(llama(hidden, heads, layers)).params, printed),
      ).toBeLessThan(0.01);
    },
  );
});

describe("Press et al. 2022, ALiBi, §3 and the authors' code", () => {
  it('alibiSlopes(8) is 1/2, 1/4, …, 1/256 (§3)', () => {
    expect(alibiSlopes(8)).toEqual([1, 2, 3, 4, 5, 6, 7, 8].map((j) => 2 ** -j));
  });

  it('alibiSlopes(16) is the full sequence 2^-0.5, 2^-1, …, 2^-8 (§3)', () => {
    const slopes = alibiSlopes(16)!;
    // 2^(-8j/16) computed as a power of two: relative 1e-15 covers one rounding
    slopes.forEach((m, j) => expect(Math.abs(m / 2 ** (-(j + 1) / 2) - 1)).toBeLessThan(1e-15));
  });

  it('alibiSlopes(12) follows get_slopes: -log2 m = 1..8, then 0.5, 1.5, 2.5, 3.5 (get_slopes in fairseq, models/transformer.py)', () => {
    const exponents = alibiSlopes(12)!.map((m) => -Math.log2(m));
    const expected = [1, 2, 3, 4, 5, 6, 7, 8, 0.5, 1.5, 2.5, 3.5];
    // log2 of a rounded power: absolute 1e-12
    exponents.forEach((e, j) => expect(Math.abs(e - elementAt(expected, j))).toBeLessThan(1e-12));
  });

  it('alibiHorizon(slopes) is where the slowest head (2^-8, §3) fades a key by 10^4: ceil(256 ln 10^4) = 2358', () => {
    expect(alibiHorizon(alibiSlopes(8))).toBe(2358);
    expect(alibiHorizon(alibiSlopes(12))).toBe(2358);
  });
});

describe('Peng et al. 2023, YaRN', () => {
  it('yarnAttentionScale(8) is 0.1 ln 8 + 1 (Eq. 22); worked values for s = 2..32 (derived from Eq. 22)', () => {
    expect(yarnAttentionScale(8)).toBe(0.1 * Math.log(8) + 1);
    const worked: [number, number][] = [
      [2, 1.0693],
      [4, 1.1386],
      [8, 1.2079],
      [16, 1.2773],
      [32, 1.3466],
    ];
    // four printed decimals: absolute 5e-5
    for (const [s, v] of worked)
      expect(Math.abs((yarnAttentionScale(s) as number) - v)).toBeLessThan(5e-5);
  });

  it('ntkBase(10000, s, 128) is b·s^(|D|/(|D|-2)) (Eq. 16): 20221.3, 40889.9, 82684.6, 167198.7, 338096.9', () => {
    const worked: [number, number][] = [
      [2, 20221.3],
      [4, 40889.9],
      [8, 82684.6],
      [16, 167198.7],
      [32, 338096.9],
    ];
    // one printed decimal: absolute 0.05
    for (const [s, v] of worked)
      expect(Math.abs((ntkBase(10000, s, 128) as number) - v)).toBeLessThan(0.05);
  });

  it('yarn ramp edges for |D| = 128, b = 10000: L = 2048 ramps over 16.13 < d < 40.21, L = 4096 over 20.94 < d < 45.03 (Eq. 18, α=1, β=32)', () => {
    const theta = geometricFrequencies(10000, 128)!;
    for (const [L, inner, outer] of [
      [2048, 16.13, 40.21],
      [4096, 20.94, 45.03],
    ] as const) {
      const s = 4;
      const scaled = scaleFrequencies(
        theta,
        10000,
        128,
        { kind: 'yarn', factor: s, originalSpan: L, alpha: 1, beta: 32, low: 1, high: 4 },
        L * s,
        L,
      )!;
      for (let d = 0; d < 64; d++) {
        const ratio = elementAt(scaled, d) / elementAt(theta, d);
        // γ = 1 keeps θ; γ = 0 divides by s; in between strictly between (relative 1e-12)
        if (d < inner) expect(Math.abs(ratio - 1)).toBeLessThan(1e-12);
        else if (d > outer) expect(Math.abs(ratio - 1 / s)).toBeLessThan(1e-12);
        else expect(ratio > 1 / s && ratio < 1).toBe(true);
      }
    }
  });

  it('attentionScale(spec) is 1 for every code but yarn (docs/metrics.md)', () => {
    expect(computeMetrics(makeSpec()).attentionScale).toBe(1);
    expect(computeMetrics(makeSpec({ position: { kind: 'alibi' } })).attentionScale).toBe(1);
  });
});

describe('Chen et al. 2023, Position Interpolation', () => {
  it("linear scaling by s = L'/L makes the angle at m equal the unscaled angle at m·L/L' (Eq. 4); reach is L' = 32768 from 2048 (Table 1)", () => {
    const spec = makeSpec({
      hidden: 4096,
      heads: 32,
      declaredSpan: 32768,
      position: {
        kind: 'rotary',
        base: 10000,
        fraction: 1,
        scaling: {
          kind: 'linear',
          factor: 16,
          originalSpan: 2048,
          alpha: 1,
          beta: 32,
          low: 1,
          high: 4,
        },
      },
    });
    const theta = geometricFrequencies(10000, 128)!;
    const scaled = scaleFrequencies(
      theta,
      10000,
      128,
      spec.position.kind === 'rotary' ? spec.position.scaling : null,
      32768,
      2048,
    )!;
    const m = 30000;
    // one division each side: relative 1e-15
    for (let i = 0; i < 64; i++)
      expect(
        Math.abs((m * elementAt(scaled, i)) / (((m * 2048) / 32768) * elementAt(theta, i)) - 1),
      ).toBeLessThan(1e-15);
    const metrics = computeMetrics({ ...spec, serving: { ...spec.serving, span: 4096 } });
    expect(metrics.reach).toBe(32768);
    expect(metrics.scalingCover).toBe(32768);
    expect(metrics.trainedSpan).toBe(2048);
  });
});

describe('Su et al. 2021, RoFormer', () => {
  it('geometricFrequencies(10000, d) is θ_i = 10000^(-2(i-1)/d), i = 1..d/2 (eq. 15), 0-indexed as in §3.3', () => {
    const d = 64;
    const theta = geometricFrequencies(10000, d)!;
    expect(theta.length).toBe(d / 2);
    for (let i = 1; i <= d / 2; i++) expect(theta[i - 1]).toBe(Math.pow(10000, (-2 * (i - 1)) / d));
  });

  it('rotaryWidth: a partial rotation of 0.25 on head 128 rotates 32 dimensions, 16 pairs', () => {
    const m = computeMetrics(
      makeSpec({
        hidden: 1024,
        heads: 8,
        position: { kind: 'rotary', base: 10000, fraction: 0.25, scaling: null },
      }),
    );
    // slowest pair i = 15 of r = 32: 2π·10000^(30/32); relative 1e-12
    expect(relativeError(m.slowestWavelength, 2 * Math.PI * Math.pow(10000, 30 / 32))).toBeLessThan(
      1e-12,
    );
  });

  it('rotaryWidth(100, 0.58) is 58: the share means 58 channels, though 100 × 0.58 rounds to 57.99999999999999 in binary64', () => {
    // IEEE 754 binary64, round to nearest: 0.58 is stored as 0.57999999999999996003197111349436454474925994873046875,
    // and the product with 100 rounds to the double just below 58.
    expect(100 * 0.58).toBe(57.99999999999999);
    expect(rotatedChannels(100, 0.58)).toBe(58);
    expect(rotaryWidth(100, 0.58)).toBe(58);
    // Not whole within 1e-9: the product stays, and r = 2 floor(r / 2) drops the odd channel.
    expect(rotatedChannels(100, 0.575)).toBe(57.49999999999999);
    expect(rotaryWidth(100, 0.575)).toBe(56);
    expect(rotaryWidth(128, 0.25)).toBe(32);
  });
});

describe('Men et al. 2024, "Base of RoPE Bounds Context Length" (criterion only: their table is solved numerically over a set of bases that is not monotone)', () => {
  it('discriminationSpan(spec) is L_θ + 1 with L_θ = sup{L : B_m = Σ cos(m θ_i) >= 0 for all m <= L} (Thm 1, Eqs. 9–10)', () => {
    for (const base of [500, 2000, 10000]) {
      const spec = makeSpec({
        hidden: 1024,
        heads: 8,
        declaredSpan: 60000,
        position: { kind: 'rotary', base, fraction: 1, scaling: null },
      });
      const theta = geometricFrequencies(base, 128)!;
      let L = 0;
      for (let m = 1; m < 60000; m++) {
        let B = 0;
        for (const t of theta) B += Math.cos(m * t);
        if (B < 0) break;
        L = m;
      }
      const got = computeMetrics(spec).discriminationSpan;
      expect(got).toBe(L + 1 < 60000 ? L + 1 : null);
    }
  });
});

describe('KV cache (common practice, no paper states it) and GQA (Ainslie et al. 2023)', () => {
  const spec = (kvHeads: number): ModelSpec =>
    makeSpec({
      layers: 32,
      hidden: 4096,
      heads: 32,
      kvHeads,
      headDim: 128,
      dtypes: { weights: 'fp16' },
      declaredSpan: 2048,
    });

  it('cachePerTokenBytes(spec) is 524,288 for 32 layers, 32 kv heads, head 128, fp16; 2048 tokens take 1 GiB', () => {
    const m = computeMetrics(spec(32));
    expect(m.cachePerTokenBytes).toBe(524288);
    expect(m.cacheBytesAtSpan).toBe(2 ** 30);
  });

  it('cachePerTokenBytes(spec) shrinks by the head count H going from MHA to MQA (§2.2)', () => {
    expect((computeMetrics(spec(1)).cachePerTokenBytes as number) * 32).toBe(
      computeMetrics(spec(32)).cachePerTokenBytes,
    );
  });
});

describe('Beltagy et al. 2020, Longformer, §3.1', () => {
  it('receptiveField(spec) is ℓ × w at the top layer: 12 layers of w = 512 reach 6144', () => {
    expect(computeMetrics(makeSpec({ layers: 12, slidingWindow: 512 })).receptiveField).toBe(6144);
  });
});
