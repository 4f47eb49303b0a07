/**
 * computeMetrics(spec) on degenerate experts, latent attention and layer kinds: null or finite
 * metrics, never NaN/Infinity, never an exception.
 */
import { describe, expect, it } from 'vitest';
import { computeMetrics } from '../../src/core/metrics/compute.js';
import { parameterBreakdown } from '../../src/core/metrics/parameter-count.js';
import type { Metrics } from '../../src/core/metrics/types.js';
import type { ModelSpec } from '../../src/core/model.js';
import { makeSpec } from './spec-fixtures.js';

const BAD: unknown[] = [0, -1, 1.5, NaN, Infinity, 2 ** 60, null, undefined];

function sane(v: unknown): boolean {
  return v === null || (typeof v === 'number' && Number.isFinite(v));
}

function expectSane(m: Metrics, label: string): void {
  for (const [key, value] of Object.entries(m)) {
    if (key === 'precision' || key === 'alibiSlopes') continue;
    if (key === 'layerKinds') {
      for (const kind of (value as Metrics['layerKinds']) ?? []) {
        for (const [name, v] of Object.entries(kind)) {
          if (name === 'precision') {
            for (const block of Object.values(v as Record<string, Record<string, unknown>>)) {
              for (const [p, x] of Object.entries(block))
                if (!sane(x)) throw new Error(`${label}: layerKinds ${p} = ${String(x)}`);
            }
          } else if (typeof v !== 'string' && typeof v !== 'boolean' && !sane(v))
            throw new Error(`${label}: layerKinds ${name} = ${String(v)}`);
        }
      }
    } else if (!sane(value)) throw new Error(`${label}: ${key} = ${value}`);
  }
}

const BASE = makeSpec({
  layers: 4,
  experts: { total: 4, active: 2, width: 64, shared: 1, denseLayers: 1 },
  latent: { kvRank: 32, qRank: null, ropeDim: 16, nopeDim: 32, valueDim: 32 },
});

const SETTERS: [string, (v: unknown) => ModelSpec][] = [
  ...(['width', 'shared', 'sharedWidth', 'denseLayers'] as const).map(
    (k): [string, (v: unknown) => ModelSpec] => [
      `experts.${k}`,
      (v) => ({ ...BASE, experts: { ...BASE.experts!, [k]: v } }),
    ],
  ),
  ...(['kvRank', 'qRank', 'ropeDim', 'nopeDim', 'valueDim'] as const).map(
    (k): [string, (v: unknown) => ModelSpec] => [
      `latent.${k}`,
      (v) => ({ ...BASE, latent: { ...BASE.latent!, [k]: v } }),
    ],
  ),
  [
    'chunkSize',
    (v) => ({
      ...BASE,
      layerTypes: ['chunked', 'full', 'chunked', 'full'],
      chunkSize: v as number,
    }),
  ],
  [
    'slidingWindow with layerTypes',
    (v) => ({
      ...BASE,
      layerTypes: ['sliding', 'full', 'sliding', 'full'],
      slidingWindow: v as number,
    }),
  ],
  [
    'localBase',
    (v) => ({
      ...BASE,
      layerTypes: ['sliding', 'full', 'sliding', 'full'],
      slidingWindow: 64,
      localBase: v as number,
    }),
  ],
  ['layerNorms', (v) => ({ ...BASE, layerNorms: v as number })],
  ['positionFreeLayers', (v) => ({ ...BASE, positionFreeLayers: [v as number] })],
];

describe('computeMetrics on degenerate shapes', () => {
  it.each(SETTERS)(
    '%s set to 0, -1, 1.5, NaN, Infinity, 2^60, null or missing gives null or finite metrics',
    (label, set) => {
      for (const v of BAD) {
        const m = computeMetrics(set(v));
        expectSane(m, `${label} = ${String(v)}`);
      }
    },
  );

  it('a layer list of the wrong length gives null cache and receptive field rather than a guess', () => {
    const m = computeMetrics({ ...BASE, layerTypes: ['sliding', 'full'], slidingWindow: 64 });
    expect(m.cacheBytesAtSpan).toBeNull();
    expect(m.receptiveField).toBeNull();
    expect(m.layerKinds).toBeNull();
  });

  it('more dense layers than layers, or more active experts than experts, gives null counts', () => {
    expect(
      parameterBreakdown({ ...BASE, experts: { ...BASE.experts!, denseLayers: 5 } }),
    ).toBeNull();
    expect(parameterBreakdown({ ...BASE, experts: { ...BASE.experts!, active: 5 } })).toBeNull();
  });
});
