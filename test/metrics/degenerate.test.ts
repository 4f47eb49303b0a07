/**
 * computeMetrics(spec) on degenerate input: missing fields, zero, negatives, fractions, NaN,
 * Infinity and huge integers give null or finite metrics, never NaN/Infinity, never an
 * exception, and return promptly.
 */
import { describe, expect, it } from 'vitest';
import { computeMetrics } from '../../src/core/metrics/compute.js';
import { MAX_SCAN_SPAN } from '../../src/core/metrics/scan-limits.js';
import type { Metrics } from '../../src/core/metrics/types.js';
import type { ModelSpec, PositionCode } from '../../src/core/model.js';
import { makeSpec } from './spec-fixtures.js';
import { cpuClock } from '../support/cpu-time.js';

const BAD_NUMBERS: unknown[] = [
  0,
  -1,
  -4096,
  1.5,
  NaN,
  Infinity,
  -Infinity,
  2 ** 60,
  2 ** 53 + 2,
  null,
  undefined,
];

/** Every metric is null or a finite number (alibiSlopes: null or an array of finite numbers). */
function expectSane(m: Metrics, label: string): void {
  for (const [key, value] of Object.entries(m)) {
    if (key === 'precision') {
      for (const [format, block] of Object.entries(value as Metrics['precision'])) {
        for (const [name, v] of Object.entries(block)) {
          if (!(v === null || (typeof v === 'number' && Number.isFinite(v))))
            throw new Error(`${label}: precision.${format}.${name} = ${v}`);
        }
      }
    } else if (key === 'layerKinds') {
      // Checked entry by entry in degenerate-shapes.test.ts.
      if (!(value === null || Array.isArray(value))) throw new Error(`${label}: layerKinds`);
    } else if (key === 'alibiSlopes') {
      if (!(value === null || (Array.isArray(value) && value.every((x) => Number.isFinite(x)))))
        throw new Error(`${label}: alibiSlopes`);
    } else if (!(value === null || (typeof value === 'number' && Number.isFinite(value)))) {
      throw new Error(`${label}: ${key} = ${value}`);
    }
  }
}

const CODES: PositionCode[] = [
  { kind: 'rotary', base: 10000, fraction: 1, scaling: null },
  {
    kind: 'rotary',
    base: 10000,
    fraction: 1,
    scaling: { kind: 'yarn', factor: 4, originalSpan: 512, alpha: 1, beta: 32, low: 1, high: 4 },
  },
  { kind: 'sinusoidal' },
  { kind: 'learned' },
  { kind: 'alibi' },
  { kind: 'none' },
];

/** Top-level numeric fields and nested numeric fields, as setters. */
const FIELDS: [string, (s: ModelSpec, v: unknown) => ModelSpec][] = [
  ...(
    [
      'layers',
      'hidden',
      'heads',
      'kvHeads',
      'headDim',
      'ffn',
      'vocab',
      'declaredSpan',
      'trainedSpan',
      'slidingWindow',
      'windowLayers',
      'embeddingInitStd',
      'embeddingMultiplier',
    ] as const
  ).map((k): [string, (s: ModelSpec, v: unknown) => ModelSpec] => [
    k,
    (s, v) => ({ ...s, [k]: v }),
  ]),
  ...(['span', 'sequences', 'deviceGiB', 'reserve', 'outputTokens', 'promptTokens'] as const).map(
    (k): [string, (s: ModelSpec, v: unknown) => ModelSpec] => [
      `serving.${k}`,
      (s, v) => ({ ...s, serving: { ...s.serving, [k]: v } }),
    ],
  ),
  [
    'position.base',
    (s, v) =>
      s.position.kind === 'rotary' ? { ...s, position: { ...s.position, base: v as number } } : s,
  ],
  [
    'position.fraction',
    (s, v) =>
      s.position.kind === 'rotary'
        ? { ...s, position: { ...s.position, fraction: v as number } }
        : s,
  ],
  ...(['factor', 'originalSpan', 'alpha', 'beta', 'low', 'high'] as const).map(
    (k): [string, (s: ModelSpec, v: unknown) => ModelSpec] => [
      `position.scaling.${k}`,
      (s, v) =>
        s.position.kind === 'rotary' && s.position.scaling
          ? { ...s, position: { ...s.position, scaling: { ...s.position.scaling, [k]: v } } }
          : s,
    ],
  ),
  ...(['total', 'active'] as const).map((k): [string, (s: ModelSpec, v: unknown) => ModelSpec] => [
    `experts.${k}`,
    (s, v) => ({ ...s, experts: { total: 8, active: 2, [k]: v } }),
  ]),
  ...(['layers', 'heads', 'kvHeads', 'headDim', 'ffn'] as const).map(
    (k): [string, (s: ModelSpec, v: unknown) => ModelSpec] => [
      `encoder.${k}`,
      (s, v) => ({
        ...s,
        encoder: { layers: 2, heads: 4, kvHeads: 4, headDim: 64, ffn: 1024, [k]: v },
      }),
    ],
  ),
];

describe('computeMetrics(spec) on degenerate input', () => {
  it('returns null or finite values for every field set to zero, negative, fractional, NaN, ±Infinity, 2^60 or missing', () => {
    for (const position of CODES) {
      for (const [name, set] of FIELDS) {
        for (const bad of BAD_NUMBERS) {
          const spec = set(makeSpec({ position, declaredSpan: 1024 }), bad);
          const label = `${position.kind} ${name}=${String(bad)}`;
          const cpu = cpuClock();
          let m: Metrics;
          try {
            m = computeMetrics(spec);
          } catch (e) {
            throw new Error(`${label} threw: ${String(e)}`, { cause: e });
          }
          expectSane(m, label);
          // a generous per-call budget: nothing here may scan a degenerate span
          expect(cpu(), `${label}: ms of CPU time`).toBeLessThan(2000);
        }
      }
    }
  }, 300000);

  it('gives null size metrics, not NaN, when hidden is NaN or 2^60', () => {
    for (const hidden of [NaN, 2 ** 60]) {
      const m = computeMetrics(makeSpec({ hidden, headDim: 64 }));
      expect(m.params).toBeNull();
      expect(m.positionShare).toBeNull();
    }
    const sinusoidal = computeMetrics(
      makeSpec({ hidden: 2 ** 60, position: { kind: 'sinusoidal' } }),
    );
    expect(sinusoidal.slowestWavelength).toBeNull();
  });

  it('gives null scan metrics past MAX_SCAN_SPAN = 2^31 instead of scanning', () => {
    const cpu = cpuClock();
    const m = computeMetrics(makeSpec({ declaredSpan: MAX_SCAN_SPAN + 1 }));
    expect(m.separationFloor).toBeNull();
    expect(m.discriminationSpan).toBeNull();
    expect(m.precision.fp32.angleErrorMax).toBeNull();
    // closed-form metrics still come out
    expect(m.precision.fp32.collidingPositions).toBeGreaterThan(0);
    expect(m.precision.bf16.blurredPairs).toBe(32);
    expect(cpu(), 'ms of CPU time').toBeLessThan(2000);
  });

  it('gives null for a spec whose position or serving blocks are missing entirely', () => {
    const broken = {
      ...makeSpec(),
      position: undefined,
      serving: undefined,
      dtypes: undefined,
    } as unknown as ModelSpec;
    const m = computeMetrics(broken);
    expectSane(m, 'missing blocks');
    expect(m.fastestWavelength).toBeNull();
  });

  it('returns null frequency metrics for base <= 0, fraction > 1 and a rotary width under one pair', () => {
    for (const position of [
      { kind: 'rotary' as const, base: 0, fraction: 1, scaling: null },
      { kind: 'rotary' as const, base: 10000, fraction: 1.5, scaling: null },
      { kind: 'rotary' as const, base: 10000, fraction: 0.01, scaling: null },
    ]) {
      const m = computeMetrics(makeSpec({ position }));
      expect(m.slowestWavelength).toBeNull();
      expect(m.precision.fp32.positionExactLimit).toBeNull();
    }
  });
});
