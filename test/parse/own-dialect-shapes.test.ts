import { describe, expect, test } from 'vitest';
import { computeMetrics } from '../../src/core/metrics/compute.js';
import { parameterBreakdown } from '../../src/core/metrics/parameter-count.js';
import { readModel } from '../../src/core/parse/read-model.js';
import { specFindings } from '../../src/core/rules/spec-rules.js';
import { fixture } from './helpers.js';

function read(name: string) {
  const r = readModel(fixture(name), name);
  return { ...r, all: [...r.findings, ...specFindings(r.spec, r.locations)] };
}

describe('readModel(own dialect) experts, latent attention and layer patterns', () => {
  test('own-experts-latent.reach.yaml states what the DeepSeek-V2-Lite config states, and counts the same', () => {
    const own = read('own-experts-latent.reach.yaml');
    expect(own.all).toEqual([]);
    expect(own.spec.experts).toEqual({
      total: 64,
      active: 6,
      width: 1408,
      shared: 2,
      denseLayers: 1,
    });
    expect(own.spec.latent).toEqual({
      kvRank: 512,
      qRank: null,
      ropeDim: 64,
      nopeDim: 128,
      valueDim: 128,
    });
    expect(own.locations['latent.kvRank']?.key).toBe('model.latent-attention.kv-rank');
    // Same shapes as the checkpoint-style fixture (Liu et al. 2024, DeepSeek-V2: 15.7B total).
    const checkpoint = read('deepseek-v2-lite-latent.json');
    expect(parameterBreakdown(own.spec)!.params).toBe(parameterBreakdown(checkpoint.spec)!.params);
    expect(computeMetrics(own.spec).cachePerTokenBytes).toBe(27 * (512 + 64) * 2);
  });

  test('own-layer-pattern.reach.yaml repeats a 6-layer pattern over 26 layers and reads the local base', () => {
    const own = read('own-layer-pattern.reach.yaml');
    expect(own.all).toEqual([]);
    expect(own.spec.layerTypes!.length).toBe(26);
    expect(own.spec.layerTypes!.filter((t) => t === 'full').length).toBe(4);
    expect(own.spec.localBase).toBe(10000);
    // Same model as the checkpoint-style Gemma 3 1B fixture: same counts, same cache.
    const checkpoint = read('gemma3-local-global.json');
    expect(own.spec.layerTypes).toEqual(checkpoint.spec.layerTypes);
    expect(parameterBreakdown(own.spec)!.params).toBe(parameterBreakdown(checkpoint.spec)!.params);
    expect(computeMetrics(own.spec).cacheBytesAtSpan).toBe(
      computeMetrics(checkpoint.spec).cacheBytesAtSpan,
    );
  });

  test('a sliding kind without a sliding-window block is a finding on the window', () => {
    const text = fixture('own-layer-pattern.reach.yaml').replace(
      '  sliding-window:\n    size: 1024\n',
      '',
    );
    const r = readModel(text, 'm.reach.yaml');
    expect(r.findings.map((f) => [f.rule, f.key])).toContainEqual([
      'value-invalid',
      'model.sliding-window',
    ]);
  });

  test('a chunked kind reads chunked-attention; position-free layers are listed', () => {
    const text = fixture('own-layer-pattern.reach.yaml')
      .replace(
        'kinds: [sliding, sliding, sliding, sliding, sliding, full]',
        'kinds: [chunked, chunked, chunked, full]\n    position-free: [3, 7]',
      )
      .replace('  sliding-window:\n    size: 1024\n', '  chunked-attention:\n    size: 8192\n');
    const r = readModel(text, 'm.reach.yaml');
    expect(r.findings).toEqual([]);
    expect(r.spec.chunkSize).toBe(8192);
    expect(r.spec.positionFreeLayers).toEqual([3, 7]);
    const kinds = computeMetrics(r.spec).layerKinds!;
    expect(kinds.map((k) => [k.attention, k.positionCode, k.layers])).toEqual([
      ['chunked', 'rotary', 20],
      ['full', 'none', 2],
      ['full', 'rotary', 4],
    ]);
  });

  test('encoder-only: true gives no decoding cache', () => {
    const text = fixture('own-minimal.reach.json').replace(
      '"declared-span": 2048',
      '"declared-span": 2048, "encoder-only": true',
    );
    const m = computeMetrics(readModel(text, 'm.reach.json').spec);
    expect(m.cachePerTokenBytes).toBe(0);
  });

  test('local-base on a non-rotary code has no effect and says so', () => {
    const text = fixture('own-minimal.reach.json').replace(
      '{ "code": "rotary" }',
      '{ "code": "learned", "local-base": 10000 }',
    );
    const r = readModel(text, 'm.reach.json');
    expect(r.findings.map((f) => [f.rule, f.key])).toContainEqual([
      'key-ignored',
      'model.position.local-base',
    ]);
  });
});
