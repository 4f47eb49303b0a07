import { describe, expect, it } from 'vitest';
import { computeMetrics } from '../../src/core/metrics/compute.js';
import { applyChange } from '../../src/core/remedy/apply-change.js';
import { proposeRemedy } from '../../src/core/remedy/propose.js';
import { contextOf, modelText, remedyFor } from './helpers.js';

// Each kind of remedy on a small invented model (16 layers, width 2048, 16 heads, 4 key/value
// heads of 128, rotary base 10000), with the cases where none can be found. Expected values are
// derived beside each check from the formula of the metric contract, not copied from output.

const GIB = 2 ** 30;

describe('proposeRemedy(ctx, finding) for span-past-reach', () => {
  it('adds linear scaling with the smallest whole factor covering the span: ceil(T / L0) (Chen et al. 2023, Eq. 4)', () => {
    // Served 16,384 on a code trained at its declared 4,096: s = L'/L = 16384/4096 = 4.
    const r = remedyFor(modelText({ serving: 'span: 16384' }), 'span-past-reach');
    expect(r.remedy?.change).toEqual({
      'position.scaling.kind': 'linear',
      'position.scaling.factor': 4,
    });
    expect(r.remedy?.metrics).toMatchObject({ reach: 16384, headroom: 0 });
    expect(r.remedyWhyNot).toBeNull();
  });

  it('rounds a fractional ratio up: 10,000 tokens from 4,096 need factor 3 (2.44 rounded up)', () => {
    const r = remedyFor(modelText({ serving: 'span: 10000' }), 'span-past-reach');
    expect(r.remedy?.change['position.scaling.factor']).toBe(3);
    expect(r.remedy?.metrics.headroom).toBe(3 * 4096 - 10000);
  });

  it('raises the factor of the scaling kind in use (yarn stays yarn)', () => {
    const yarn = modelText({
      position:
        'code: rotary\nbase: 1000000\nscaling: { kind: yarn, factor: 4, original-span: 32768 }',
      declared: 131072,
      serving: 'span: 262144',
    });
    const r = remedyFor(yarn, 'span-past-reach');
    expect(r.remedy?.change).toEqual({ 'position.scaling.factor': 8 });
    // Peng et al. 2023 (YaRN) Eq. 22: 0.1 ln(8) + 1 = 1.2079.
    expect(r.remedy?.metrics.attentionScale).toBeCloseTo(1.2079, 4); // 4 decimals: the paper's worked value is printed to 4
  });

  it('offers the longest span that fits as an alternative: the reach itself', () => {
    const r = remedyFor(modelText({ serving: 'span: 16384' }), 'span-past-reach');
    expect(r.remedyAlternatives.map((a) => a.change)).toEqual([{ 'serving.span': 4096 }]);
  });

  it('gives a learned table only the shorter span, saying nothing else applies', () => {
    const r = remedyFor(
      modelText({ position: 'code: learned', declared: 2048, serving: 'span: 4096' }),
      'span-past-reach',
    );
    expect(r.remedy?.change).toEqual({ 'serving.span': 2048 });
    expect(r.remedyAlternatives).toEqual([]);
  });
});

describe('proposeRemedy(ctx, finding) for memory-over-budget', () => {
  // 32 KiB per token (16 layers × 2 × 4 kv heads × 128 × 2 bytes), 64 sequences of 32,768 tokens = 64 GiB of cache.
  const serving = (device: number) => `span: 32768\nsequences: 64\ndevice-memory-gib: ${device}`;
  const model = (device: number) => modelText({ declared: 32768, serving: serving(device) });

  it('holds the most sequences that fit: floor((device·0.9 − weights) / cache per sequence)', () => {
    const { head } = contextOf(model(24));
    const perSequence = 32768 * 16 * 2 * 4 * 128 * 2;
    const expected = Math.floor(
      (24 * GIB * 0.9 - (head.metrics.weightBytes as number)) / perSequence,
    );
    const r = remedyFor(model(24), 'memory-over-budget');
    expect(r.remedy?.change).toEqual({ 'serving.sequences': expected });
    expect(r.remedy?.metrics.memoryBytes).toBeLessThanOrEqual(24 * GIB * 0.9);
    expect(r.remedy?.metrics.fitSequences).toBe(expected);
  });

  it('offers the widest narrower cache dtype, the most key/value heads dividing the heads, and the longest span', () => {
    const r = remedyFor(model(24), 'memory-over-budget');
    const changes = r.remedyAlternatives.map((a) => a.change);
    // bf16 → fp8 halves 64 GiB to 32 (no fit), int4 quarters it to 16 GiB: fits. kv 4 → 2 halves (no), → 1 quarters: fits.
    expect(changes[0]).toEqual({ 'dtypes.cache': 'int4' });
    expect(changes[1]).toEqual({ kvHeads: 1 });
    expect(Object.keys(changes[2]!)).toEqual(['serving.span']);
    // Across devices (docs/metrics.md, serving across devices): tensor degree 2 keeps ceil(4/2) = 2 kv heads per device,
    // 32 GiB of cache (no fit); 4 keeps 1, 16 GiB: fits. 3 pipeline stages hold ceil(16/3) = 6 layers, 24 GiB of
    // cache (no fit); 4 stages hold 4 layers, 16 GiB: fits.
    expect(changes[3]).toEqual({ 'serving.tensorParallel': 4 });
    expect(changes[4]).toEqual({ 'serving.pipelineParallel': 4 });
    expect(r.remedyAlternatives[3]!.cost).toBe(
      '4 devices per replica (tensor-parallel 4 × pipeline-parallel 1), was 1',
    );
    expect(changes).toHaveLength(5);
    for (const alternative of r.remedyAlternatives) {
      expect(
        alternative.metrics.memoryBytesPerDevice ?? alternative.metrics.memoryBytes,
      ).toBeLessThanOrEqual(24 * GIB * 0.9);
    }
  });

  it('finds none when the weights alone exceed the device, and says why for each kind', () => {
    const r = remedyFor(model(1), 'memory-over-budget');
    expect(r.remedy).toBeNull();
    expect(r.remedyWhyNot).toMatch(
      /^No change found that passes: not even one sequence of 32,768 \(32k\) tokens clears it; even a int4 cache does not clear it; even one key\/value head does not clear it; no served span from 1 to 32,767 tokens clears it; even a tensor-parallel degree of 16 does not clear it; even 16 pipeline stages \(one per layer\) do not clear it; even int4 weights in groups of 128 do not clear it\.$/,
    );
  });

  it('answers a fitSequences floor with a dtype, heads or span (holding fewer sequences does not change what fits)', () => {
    const r = remedyFor(model(80), 'limit-crossed', {
      metric: 'fitSequences',
      policy: 'limits:\n  fitSequences: { min: 100 }\n',
    });
    expect(r.remedy?.change).toEqual({ 'dtypes.cache': 'fp8' });
    expect(r.remedy?.metrics.fitSequences).toBeGreaterThanOrEqual(100);
    expect(r.remedyAlternatives.some((a) => 'serving.sequences' in a.change)).toBe(false);
  });
});

describe('proposeRemedy(ctx, finding) for a discrimination or separation limit', () => {
  const limit = (min: number) => `limits:\n  discriminationSpan: { min: ${min} }\n`;

  it('finds the smallest two-digit base with no negative cosine sum before the limit, and proves it', () => {
    const r = remedyFor(modelText({ declared: 8192 }), 'limit-crossed', {
      metric: 'discriminationSpan',
      policy: limit(8192),
    });
    const base = r.remedy?.change['position.base'] as number;
    // Men et al. 2024, Table 2 (arXiv v1): 8k needs a base of 8.4e4.
    expect(base).toBe(84000);
    expect(r.remedy?.metrics.discriminationSpan).toBeNull();
    // The grid step below fails: the remedy is the nearest passing base on the grid.
    const { head } = contextOf(modelText({ declared: 8192 }));
    expect(
      computeMetrics(applyChange(head.spec, { 'position.base': 83000 })).discriminationSpan,
    ).not.toBeNull();
  });

  it('lowers the base for a separation floor, since faster pairs separate neighbours more', () => {
    const r = remedyFor(modelText({ declared: 8192 }), 'limit-crossed', {
      metric: 'separationFloor',
      policy: 'limits:\n  separationFloor: { min: 0.3 }\n',
    });
    expect(r.remedy?.change['position.base']).toBeLessThan(10000);
    expect(r.remedy?.metrics.separationFloor).toBeGreaterThanOrEqual(0.3);
  });

  it('searches nothing for a limit on a floor the scans left uncomputed (span past the scan bound), and says why', () => {
    const r = remedyFor(modelText({ declared: 2 ** 40 }), 'limit-crossed', {
      metric: 'separationFloor',
      policy: 'limits:\n  separationFloor: { min: 0.3 }\n',
    });
    expect(r.finding.metric).toBe('separationFloor');
    expect(r.remedy).toBeNull();
    expect(r.remedyWhyNot).toContain('scan-incomplete');
  });

  it('has no base to change on a sinusoidal code', () => {
    const r = remedyFor(
      modelText({ position: 'code: sinusoidal', declared: 8192 }),
      'limit-crossed',
      { metric: 'discriminationSpan', policy: limit(8192) },
    );
    expect(r.remedy).toBeNull();
    expect(r.remedyWhyNot).toBe(
      'No change found that passes: a sinusoidal position code has no base to change.',
    );
  });

  it('rejects a base that clears the limit but raises a finding the policy blocks, and says which', () => {
    const text = modelText({ declared: 8192 });
    const r = remedyFor(text, 'limit-crossed', {
      base: text,
      metric: 'discriminationSpan',
      policy: `${limit(8192)}rules:\n  frequencies-changed: block\n`,
    });
    expect(r.remedy).toBeNull();
    expect(r.remedyWhyNot).toBe(
      'No change found that passes: a rotary base of 84,000 (a retraining-level change) clears it but still blocks on frequencies-changed.',
    );
  });

  it('lists the warnings a proven base raises', () => {
    const text = modelText({ declared: 8192 });
    const r = remedyFor(text, 'limit-crossed', {
      base: text,
      metric: 'discriminationSpan',
      policy: limit(8192),
    });
    expect(r.remedy?.raises).toEqual(['frequencies-changed']);
  });
});

describe('proposeRemedy(ctx, finding) for positions-collide', () => {
  it('moves positions to the narrowest format that keeps them all distinct: fp32, since bf16 is exact only to 256', () => {
    // IEEE 754-2008: binary16 holds every integer to 2^11 = 2048, bfloat16 to 2^8, binary32 to 2^24.
    const r = remedyFor(modelText({ dtypes: '{ positions: fp16 }' }), 'positions-collide');
    expect(r.remedy?.change).toEqual({ 'dtypes.positions': 'fp32' });
    expect(r.remedy?.metrics['precision.fp32.collidingPositions']).toBe(0);
  });

  it('offers the longest span with distinct positions: 2^11 + 1, every position 0..2048 exact in binary16', () => {
    const r = remedyFor(modelText({ dtypes: '{ positions: fp16 }' }), 'positions-collide');
    expect(r.remedyAlternatives.map((a) => a.change)).toEqual([{ 'serving.span': 2 ** 11 + 1 }]);
  });
});

describe('proposeRemedy(ctx, finding) for span-grew-code-unchanged', () => {
  it("adds linear scaling from the base version's trained span: factor ceil(16384 / 4096) = 4, original span 4096", () => {
    const r = remedyFor(modelText({ declared: 16384 }), 'span-grew-code-unchanged', {
      base: modelText({ declared: 4096 }),
    });
    expect(r.remedy?.change).toEqual({
      'position.scaling.kind': 'linear',
      'position.scaling.factor': 4,
      'position.scaling.originalSpan': 4096,
    });
    expect(r.remedy?.metrics).toMatchObject({ trainedSpan: 4096, scalingCover: 16384 });
  });

  it('finds none for a learned table, which has no scaling factor', () => {
    const r = remedyFor(
      modelText({ position: 'code: learned', declared: 2048 }),
      'span-grew-code-unchanged',
      { base: modelText({ position: 'code: learned', declared: 1024 }) },
    );
    expect(r.remedy).toBeNull();
    expect(r.remedyWhyNot).toBe(
      'No change found that passes: a learned position code has no scaling factor.',
    );
  });
});

describe('proposeRemedy(ctx, finding) within its work budget', () => {
  it("runs no proof past what is left of the file's budget, and says so", () => {
    const { ctx } = contextOf(modelText({ serving: 'span: 16384' }));
    ctx.work.left = 1000;
    const finding = ctx.head.findings.find((f) => f.rule === 'span-past-reach')!;
    const r = proposeRemedy(ctx, finding);
    expect(r.remedy).toBeNull();
    // 64 pairs × 16,384 offsets for the factor; 64 × 4,096 for the shorter span.
    expect(r.remedyWhyNot).toBe(
      "No change found that passes: a linear factor of 4 or more was not proven: its proof would scan 1,048,576 pair·offsets, past what is left of the search's budget (2,147,483,648 per finding, 4,294,967,296 per file); serving at most 4,096 (4k) tokens was not proven: its proof would scan 262,144 pair·offsets, past what is left of the search's budget (2,147,483,648 per finding, 4,294,967,296 per file).",
    );
  });
});

describe('proposeRemedy(ctx, finding) for other findings', () => {
  it('meets a headroom floor with the factor covering T plus the floor', () => {
    const r = remedyFor(modelText({ serving: 'span: 4096' }), 'limit-crossed', {
      metric: 'headroom',
      policy: 'limits:\n  headroom: { min: 1024 }\n',
    });
    // ceil((4096 + 1024) / 4096) = 2.
    expect(r.remedy?.change).toEqual({
      'position.scaling.kind': 'linear',
      'position.scaling.factor': 2,
    });
    expect(r.remedyAlternatives.map((a) => a.change)).toEqual([{ 'serving.span': 3072 }]);
  });

  it("searches nothing for a rule about the file itself, and says so with the rule's help", () => {
    const r = remedyFor(modelText({ kvHeads: 3 }), 'kv-heads-indivisible');
    expect(r.remedy).toBeNull();
    expect(r.remedyWhyNot).toMatch(
      /^no remedy is searched for kv-heads-indivisible: the value itself must be corrected, as the message says\. Grouped-query attention/,
    );
  });

  it('searches nothing for a limit on a metric no change here moves on purpose', () => {
    const r = remedyFor(modelText(), 'limit-crossed', {
      metric: 'flopsPerToken',
      policy: 'limits:\n  flopsPerToken: { max: 1 }\n',
    });
    expect(r.remedy).toBeNull();
    expect(r.remedyWhyNot).toMatch(/^no remedy is searched for a limit on flopsPerToken/);
  });
});
