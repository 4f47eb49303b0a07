/**
 * Behaviour of computeMetrics(spec) metric by metric (docs/metrics.md), on invented specs. Expected
 * values here come from the definitions worked by hand, each shown next to its check.
 */
import { describe, expect, it } from 'vitest';
import { computeMetrics, evaluationSpan, trainedSpan } from '../../src/core/metrics/compute.js';
import { collidingPositions } from '../../src/core/metrics/position-rounding.js';
import { SCALAR_METRICS } from '../../src/core/metrics/types.js';
import type { Scaling } from '../../src/core/model.js';
import { makeSpec } from './spec-fixtures.js';

const scaling = (over: Partial<Scaling>): Scaling => ({
  kind: 'linear',
  factor: 4,
  originalSpan: null,
  alpha: 1,
  beta: 32,
  low: 1,
  high: 4,
  ...over,
});

describe('spans', () => {
  it('evaluationSpan(spec) is the served span when given, else the declared span', () => {
    expect(evaluationSpan(makeSpec({ declaredSpan: 4096 }))).toBe(4096);
    expect(evaluationSpan(makeSpec({ declaredSpan: 4096, serving: { span: 1000 } }))).toBe(1000);
  });

  it('evaluationSpan(spec) is null for a stated but invalid served span (no silent fallback)', () => {
    expect(evaluationSpan(makeSpec({ serving: { span: 0 } }))).toBeNull();
    expect(evaluationSpan(makeSpec({ serving: { span: 10.5 } }))).toBeNull();
  });

  it("trainedSpan(spec) prefers the scaling block's original span, then the explicit span, then the declared span (docs/metrics.md, L0)", () => {
    const rotary = (s: Scaling | null) => ({
      kind: 'rotary' as const,
      base: 10000,
      fraction: 1,
      scaling: s,
    });
    // With a scaling block, an explicit span is the tuned span, not L0.
    expect(
      trainedSpan(
        makeSpec({ trainedSpan: 1024, position: rotary(scaling({ originalSpan: 2048 })) }),
      ),
    ).toBe(2048);
    expect(
      trainedSpan(
        makeSpec({ trainedSpan: 1024, position: rotary(scaling({ originalSpan: null })) }),
      ),
    ).toBe(1024);
    expect(
      trainedSpan(
        makeSpec({ position: rotary(scaling({ originalSpan: 2048 })), declaredSpan: 8192 }),
      ),
    ).toBe(2048);
    expect(trainedSpan(makeSpec({ declaredSpan: 8192 }))).toBe(8192);
  });
});

describe('reach, headroom, extensionRatio, scalingCover', () => {
  it('reach(spec) is the table size for a learned code, whatever the trained span', () => {
    expect(
      computeMetrics(
        makeSpec({ position: { kind: 'learned' }, declaredSpan: 1024, trainedSpan: 512 }),
      ).reach,
    ).toBe(1024);
  });

  it('reach(spec) is L0·factor, at least the declared span when L0 was not stated explicitly', () => {
    const position = {
      kind: 'rotary' as const,
      base: 10000,
      fraction: 1,
      scaling: scaling({ factor: 4, originalSpan: 1024 }),
    };
    // L0 = 1024 from the scaling block, factor 4 → 4096; declared 8192 is larger and not overruled
    expect(computeMetrics(makeSpec({ position, declaredSpan: 8192 })).reach).toBe(8192);
    expect(computeMetrics(makeSpec({ position, declaredSpan: 2048 })).reach).toBe(4096);
    // explicit trained span with a scaling block: the tuned span; reach max(L0·factor, tuned), no declared floor
    expect(
      computeMetrics(makeSpec({ position, declaredSpan: 8192, trainedSpan: 1024 })).reach,
    ).toBe(4096);
  });

  it('reach(spec) never multiplies a tuned span by the factor again: Llama-3.1-style banded ×8 from 8,192 tuned at 131,072 reaches 131,072 (Llama 3.1 figures from memory)', () => {
    const position = {
      kind: 'rotary' as const,
      base: 500000,
      fraction: 1,
      scaling: scaling({ kind: 'banded', factor: 8, originalSpan: 8192 }),
    };
    const m = computeMetrics(
      makeSpec({ position, declaredSpan: 131072, trainedSpan: 131072, serving: { span: 4096 } }),
    );
    expect([m.trainedSpan, m.tunedSpan, m.scalingCover, m.reach]).toEqual([
      8192, 131072, 65536, 131072,
    ]);
    expect(m.reach).not.toBe(131072 * 8);
    // Without a scaling block an explicit span is L0 itself, and no tuned span.
    const plain = computeMetrics(makeSpec({ declaredSpan: 8192, trainedSpan: 4096 }));
    expect([plain.trainedSpan, plain.tunedSpan, plain.reach]).toEqual([4096, null, 4096]);
  });

  it('reach(spec) is null for relative buckets (no hard limit), and bucketHorizon is the max distance (Raffel et al. 2020, section 2.1: 32 buckets, 128)', () => {
    const m = computeMetrics(
      makeSpec({
        position: { kind: 'relative', buckets: 32, maxDistance: 128 },
        declaredSpan: 512,
        serving: { span: 4096 },
      }),
    );
    expect([m.reach, m.headroom, m.bucketHorizon]).toEqual([null, null, 128]);
    expect(computeMetrics(makeSpec({})).bucketHorizon).toBeNull();
  });

  it('headroom(spec) is reach - T, negative when the served span goes past the reach', () => {
    const m = computeMetrics(makeSpec({ declaredSpan: 2048, serving: { span: 3000 } }));
    expect(m.headroom).toBe(-952);
    expect(m.extensionRatio).toBe(3000 / 2048);
  });

  it('scalingCover(spec) is null without scaling and L0·factor with it', () => {
    expect(computeMetrics(makeSpec()).scalingCover).toBeNull();
    const position = {
      kind: 'rotary' as const,
      base: 10000,
      fraction: 1,
      scaling: scaling({ kind: 'yarn', factor: 8, originalSpan: 4096 }),
    };
    expect(computeMetrics(makeSpec({ position, declaredSpan: 32768 })).scalingCover).toBe(32768);
  });
});

describe('frequency metrics', () => {
  it('unturnedPairs(spec) counts wavelengths longer than L0; exposedPairs(spec) those pushed past their trained angle', () => {
    // head 64 → 32 pairs, base 10000: λ_i = 2π·10000^(i/32); λ_i > 2048 for i >= 21 (λ_20 ≈ 1987, λ_21 ≈ 2646)
    const m = computeMetrics(makeSpec({ declaredSpan: 2048 }));
    expect(m.unturnedPairs).toBe(11);
    expect(m.exposedPairs).toBe(0);
    // serving 4096 unscaled: every unturned pair now goes past its trained angle
    expect(
      computeMetrics(makeSpec({ declaredSpan: 2048, serving: { span: 4096 } })).exposedPairs,
    ).toBe(11);
  });

  it('exposedPairs(spec) is 0 under linear interpolation that exactly covers the served span', () => {
    const position = {
      kind: 'rotary' as const,
      base: 10000,
      fraction: 1,
      scaling: scaling({ factor: 2, originalSpan: 2048 }),
    };
    expect(computeMetrics(makeSpec({ position, declaredSpan: 4096 })).exposedPairs).toBe(0);
  });

  it('dynamic scaling uses s = max(1, T/L0): at T = L0 the frequencies are unscaled', () => {
    const position = {
      kind: 'rotary' as const,
      base: 10000,
      fraction: 1,
      scaling: scaling({ kind: 'dynamic', factor: 4, originalSpan: 2048 }),
    };
    const dyn = computeMetrics(makeSpec({ position, declaredSpan: 2048 }));
    const plain = computeMetrics(makeSpec({ declaredSpan: 2048 }));
    expect(dyn.slowestWavelength).toBe(plain.slowestWavelength);
    const stretched = computeMetrics(
      makeSpec({ position, declaredSpan: 2048, serving: { span: 8192 } }),
    );
    expect((stretched.slowestWavelength as number) > (plain.slowestWavelength as number)).toBe(
      true,
    );
  });

  it('separationFloor(spec) lies in [0, 2] and separationFloorOffset(spec) in [1, T)', () => {
    const m = computeMetrics(makeSpec({ declaredSpan: 5000 }));
    expect(m.separationFloor! >= 0 && m.separationFloor! <= 2).toBe(true);
    expect(m.separationFloorOffset! >= 1 && m.separationFloorOffset! < 5000).toBe(true);
  });

  it('frequency rows and the precision block are null for learned, alibi and position-free codes', () => {
    for (const kind of ['learned', 'alibi', 'none'] as const) {
      const m = computeMetrics(makeSpec({ position: { kind } }));
      for (const key of [
        'fastestWavelength',
        'slowestWavelength',
        'unturnedPairs',
        'exposedPairs',
        'separationFloor',
        'separationFloorOffset',
        'discriminationSpan',
      ] as const) {
        expect(m[key], `${kind} ${key}`).toBeNull();
      }
      for (const f of ['fp32', 'bf16', 'fp16'] as const)
        expect(Object.values(m.precision[f]).every((v) => v === null)).toBe(true);
    }
  });

  it('alibiSlopes/alibiHorizon(spec) are set for alibi only', () => {
    expect(computeMetrics(makeSpec()).alibiSlopes).toBeNull();
    expect(
      computeMetrics(makeSpec({ position: { kind: 'alibi' }, heads: 8 })).alibiSlopes,
    ).toHaveLength(8);
  });
});

describe('number formats', () => {
  it('precision.fp16 for T = 70000: positions collide past 2048, overflow at 65520, angleErrorMax null', () => {
    const p = computeMetrics(makeSpec({ declaredSpan: 70000 })).precision.fp16;
    expect(p.positionExactLimit).toBe(2048);
    expect(p.overflowPosition).toBe(65520);
    expect(p.angleErrorMax).toBeNull();
    expect(p.blurredPairs).toBe(32);
    // 70000 - 65520 overflowing positions plus those below that repeat a value
    expect(p.collidingPositions).toBe(collidingPositions('fp16', 65520)! + (70000 - 65520));
  });

  it('collidingPositions(D, T) counts repeats per binade: bf16 over [1, 512) has 127 (every other position in [256, 512))', () => {
    // positions 257..511: odd ones tie or round onto an even neighbour already taken → 128 repeats less
    // the boundary: p = 511 rounds up to 512, a new value → 127
    expect(collidingPositions('bf16', 512)).toBe(127);
    expect(collidingPositions('fp32', 2 ** 24)).toBe(0);
    expect(collidingPositions('fp32', 2 ** 24 + 2)).toBe(1);
  });

  it('precision.fp32 has no collisions and no blurred pairs at T = 4096', () => {
    const p = computeMetrics(makeSpec({ declaredSpan: 4096 })).precision.fp32;
    expect(p).toMatchObject({
      positionExactLimit: 2 ** 24,
      collidingPositions: 0,
      overflowPosition: null,
      blurredPairs: 0,
    });
    // rounding θ to 24 bits and the angle once: at most about 2^-24 of the largest angle 4095
    expect(p.angleErrorMax! > 0 && p.angleErrorMax! < 4095 * 2 ** -23).toBe(true);
  });
});

describe('context budget', () => {
  it('params/activeParams(spec) count E experts against k active, plus a router hidden·E', () => {
    const dense = computeMetrics(makeSpec());
    const moe = computeMetrics(makeSpec({ experts: { total: 8, active: 2 } }));
    const ff = 2 * 256 * 1024; // plain feed-forward per layer
    expect(moe.params! - dense.params!).toBe(2 * (7 * ff + 256 * 8));
    expect(moe.activeParams! - dense.activeParams!).toBe(2 * (1 * ff + 256 * 8));
    expect(moe.nonEmbeddingParams).toBe(moe.activeParams! - 1000 * 256);
  });

  it('params(spec) adds the output matrix when untied and the table for a learned code', () => {
    const tied = computeMetrics(makeSpec()).params!;
    expect(computeMetrics(makeSpec({ tied: false })).params! - tied).toBe(1000 * 256);
    expect(computeMetrics(makeSpec({ position: { kind: 'learned' } })).params! - tied).toBe(
      2048 * 256,
    );
  });

  it('weightBytes(spec) is params × 2 by default (bf16) and × 0.5 for int4', () => {
    const m = computeMetrics(makeSpec());
    expect(m.weightBytes).toBe(m.params! * 2);
    expect(computeMetrics(makeSpec({ dtypes: { weights: 'int4' } })).weightBytes).toBe(
      m.params! * 0.5,
    );
  });

  it('cacheBytesAtSpan(spec) holds min(T, w) tokens on windowed layers and T on the others', () => {
    // 2 layers, 4 kv heads × 64 × 2 bytes × 2 (K and V) = 1024 bytes per layer-token
    const m = computeMetrics(
      makeSpec({
        declaredSpan: 4096,
        slidingWindow: 1000,
        windowLayers: 1,
        serving: { sequences: 3 },
      }),
    );
    expect(m.cachePerTokenBytes).toBe(2048);
    expect(m.cacheBytesAtSpan).toBe(3 * 1024 * (4096 + 1000));
    expect(m.receptiveField).toBeNull();
    expect(m.memoryBytes).toBe(m.weightBytes! + m.cacheBytesAtSpan!);
  });

  it('fitSequences(spec) is null without a device and floor((budget·(1-reserve) - weights) / per-sequence cache) with one', () => {
    expect(computeMetrics(makeSpec()).fitSequences).toBeNull();
    const m = computeMetrics(makeSpec({ serving: { deviceGiB: 1, reserve: 0.5 } }));
    expect(m.fitSequences).toBe(Math.floor((2 ** 29 - m.weightBytes!) / m.cacheBytesAtSpan!));
  });

  it('tokenBudget(spec) subtracts the reservations, a missing one counting 0; null with neither', () => {
    expect(computeMetrics(makeSpec()).tokenBudget).toBeNull();
    expect(computeMetrics(makeSpec({ serving: { outputTokens: 500 } })).tokenBudget).toBe(1548);
    expect(
      computeMetrics(makeSpec({ serving: { outputTokens: 500, promptTokens: 48 } })).tokenBudget,
    ).toBe(1500);
  });

  it('positionShare(spec) is 1/3 for a sinusoidal code with std 1 (code d/2 against tokens d) and 1/(1+mult²) for a learned table', () => {
    expect(
      computeMetrics(makeSpec({ position: { kind: 'sinusoidal' }, embeddingInitStd: 1 }))
        .positionShare,
    ).toBe(1 / 3);
    expect(
      computeMetrics(
        makeSpec({ position: { kind: 'learned' }, embeddingInitStd: 0.02, embeddingMultiplier: 2 }),
      ).positionShare,
    ).toBeCloseTo(0.2, 14);
    expect(computeMetrics(makeSpec({ position: { kind: 'learned' } })).positionShare).toBeNull();
    expect(computeMetrics(makeSpec({ embeddingInitStd: 0.02 })).positionShare).toBeNull();
  });

  it('computeMetrics(spec) fills every scalar metric of the contract for a complete rotary spec', () => {
    const m = computeMetrics(
      makeSpec({ serving: { deviceGiB: 80, outputTokens: 10 }, slidingWindow: 512 }),
    );
    const nullable = new Set([
      'servedSpan',
      'scalingCover',
      'alibiHorizon',
      'positionShare',
      'tunedSpan',
      'bucketHorizon',
      'visionParams',
    ]);
    for (const key of SCALAR_METRICS) if (!nullable.has(key)) expect(m[key], key).not.toBeNull();
  });
});
