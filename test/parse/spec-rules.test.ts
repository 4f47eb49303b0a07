import { describe, expect, test } from 'vitest';
import type { LocationMap, ModelSpec } from '../../src/core/model.js';
import { completeSpec } from '../../src/core/parse/spec-defaults.js';
import type { SpecDraft } from '../../src/core/parse/spec-defaults.js';
import { readModel } from '../../src/core/parse/read-model.js';
import { RULES } from '../../src/core/rules/catalog.js';
import { specFindings } from '../../src/core/rules/spec-rules.js';
import { configText, lineOf } from './helpers.js';
import { cpuClock } from '../support/cpu-time.js';

/** A valid spec (GPT-style sizes); tests change one field at a time. */
function spec(changes: Partial<SpecDraft> = {}): ModelSpec {
  return completeSpec({
    layers: 24,
    hidden: 2048,
    heads: 16,
    vocab: 50000,
    declaredSpan: 4096,
    position: { kind: 'rotary' },
    ...changes,
  });
}

const CHECKPOINT = {
  model_type: 'llama',
  hidden_size: 4096,
  num_hidden_layers: 32,
  num_attention_heads: 32,
  vocab_size: 32000,
  max_position_embeddings: 8192,
  rope_theta: 10000,
};

function fromCheckpoint(changes: Record<string, unknown>) {
  const text = configText({ ...CHECKPOINT, ...changes });
  const read = readModel(text, 'config.json');
  return { text, read, findings: specFindings(read.spec, read.locations) };
}

describe('specFindings(spec, locations)', () => {
  test('specFindings of a valid spec is empty', () => {
    expect(specFindings(spec(), {})).toEqual([]);
  });

  test('every rule it raises is in the catalogue at block severity', () => {
    for (const id of [
      'size-invalid',
      'kv-heads-indivisible',
      'rotary-width-odd',
      'scaling-factor-below-one',
      'original-span-above-declared',
      'value-invalid',
    ] as const) {
      expect(RULES[id].severity).toBe('block');
    }
  });
});

describe('kv-heads-indivisible: GQA splits the query heads into groups sharing one key/value head (Ainslie et al. 2023, section 2.2)', () => {
  test('num_key_value_heads 12 with 32 heads names both keys, the line and divisors near 12', () => {
    const { text, findings } = fromCheckpoint({ num_key_value_heads: 12 });
    expect(findings).toEqual([
      {
        rule: 'kv-heads-indivisible',
        severity: 'block',
        key: 'num_key_value_heads',
        line: lineOf(text, '"num_key_value_heads"'),
        message:
          'num_key_value_heads is 12, which does not divide num_attention_heads 32; use a divisor of 32 such as 8 or 16',
      },
    ]);
  });

  test('more key/value heads than heads suggests the largest divisor', () => {
    expect(specFindings(spec({ kvHeads: 24 }), {})[0]?.message).toBe(
      'kvHeads is 24, which does not divide heads 16; use a divisor of 16 such as 16',
    );
  });

  test.each([[1], [2], [4], [8], [16]])(
    'kvHeads %i divides 16 heads: no finding (1 is MQA, 16 is MHA)',
    (kv) => {
      expect(specFindings(spec({ kvHeads: kv }), {})).toEqual([]);
    },
  );

  test('a huge odd head count is judged at once, without a list of divisors', () => {
    const cpu = cpuClock();
    // Trial division to sqrt(2^53) would take about 10^8 steps; the rule must not try.
    const f = specFindings(spec({ heads: 2 ** 53 - 111, kvHeads: 2 }), {}).find(
      (x) => x.rule === 'kv-heads-indivisible',
    );
    expect(cpu(), 'ms of CPU time').toBeLessThan(1000);
    expect(f?.message).toBe(
      'kvHeads is 2, which does not divide heads 9007199254740881; use a divisor of 9007199254740881',
    );
  });

  test('36 heads and 5 key/value heads: the divisors of 36 next to 5 are 4 and 6', () => {
    expect(
      specFindings(spec({ heads: 36, hidden: 36 * 64, kvHeads: 5 }), {})[0]?.message,
    ).toContain('such as 4 or 6');
  });

  test('an encoder stack is checked too', () => {
    const s = spec({ encoder: { layers: 6, heads: 16, kvHeads: 5 } });
    expect(specFindings(s, {}).map((f) => [f.rule, f.message])).toEqual([
      [
        'kv-heads-indivisible',
        'encoder.kvHeads is 5, which does not divide encoder.heads 16; use a divisor of 16 such as 4 or 8',
      ],
    ]);
  });
});

describe('rotary-width-odd: rotary codes turn channel pairs (Su et al. 2021, RoFormer, eq. 15: d/2 frequencies)', () => {
  test('head 80 × fraction 0.45 = 36 is even: no finding', () => {
    expect(
      specFindings(spec({ headDim: 80, position: { kind: 'rotary', fraction: 0.45 } }), {}),
    ).toEqual([]);
  });

  test.each([
    [100, 0.14, 14],
    [100, 0.58, 58],
    [50, 0.28, 14],
  ])(
    'head %i × fraction %f is %i in decimal; binary64 gives a neighbour of it (IEEE 754), which is still read as even',
    (head, fraction, width) => {
      expect(head * fraction).not.toBe(width);
      expect(Math.abs(head * fraction - width)).toBeLessThan(1e-12);
      expect(
        specFindings(spec({ headDim: head, position: { kind: 'rotary', fraction } }), {}),
      ).toEqual([]);
    },
  );

  test('an odd head width with the whole head rotating suggests the even widths beside it', () => {
    const { text, findings } = fromCheckpoint({ head_dim: 75 });
    expect(findings.map((f) => [f.rule, f.key, f.line])).toEqual([
      ['rotary-width-odd', 'head_dim', lineOf(text, '"head_dim"')],
    ]);
    expect(findings[0]?.message).toBe(
      'head_dim 75 is odd, so the rotary width 75 leaves one channel without a partner (the metrics use 74 channels); use an even head width such as 74 or 76',
    );
  });

  test('a fraction giving a fractional width names both keys and suggests fractions giving even widths', () => {
    const { findings } = fromCheckpoint({ head_dim: 64, partial_rotary_factor: 0.3 });
    expect(findings.map((f) => [f.rule, f.key])).toEqual([
      ['rotary-width-odd', 'partial_rotary_factor'],
    ]);
    expect(findings[0]?.message).toBe(
      'head_dim 64 × partial_rotary_factor 0.3 = 19.2, which is not an even whole number, so the rotary channels do not pair up (the metrics use 18 channels); use a fraction giving an even width, such as 0.28125 (18 channels) or 0.3125 (20 channels)',
    );
  });

  test('a fraction giving an odd whole width is reported too', () => {
    const f = specFindings(
      spec({ headDim: 64, position: { kind: 'rotary', fraction: 0.5 - 1 / 64 } }),
      {},
    );
    expect(f.map((x) => x.rule)).toEqual(['rotary-width-odd']);
    expect(f[0]?.message).toContain('= 31, which is not an even whole number');
  });

  test('non-rotary codes and unusable widths raise no rotary finding', () => {
    expect(specFindings(spec({ headDim: 75, position: { kind: 'learned' } }), {})).toEqual([]);
    expect(specFindings(spec({ headDim: NaN }), {})).toEqual([]);
  });
});

describe('size-invalid', () => {
  const fields: [string, Partial<SpecDraft>][] = [
    ['layers', { layers: 0 }],
    ['hidden', { hidden: -8 }],
    ['heads', { heads: 2.5 }],
    ['kvHeads', { kvHeads: 0 }],
    ['headDim', { headDim: -64 }],
    ['ffn', { ffn: 0 }],
    ['vocab', { vocab: Infinity }],
    ['declaredSpan', { declaredSpan: 0 }],
    ['trainedSpan', { trainedSpan: -1 }],
    ['experts.total', { experts: { total: 0, active: 1 } }],
    ['experts.active', { experts: { total: 8, active: 1.5 } }],
    ['encoder.layers', { encoder: { layers: 0, heads: 16 } }],
    ['slidingWindow', { slidingWindow: 0 }],
    ['windowLayers', { windowLayers: -1 }],
    [
      'position.scaling.originalSpan',
      { position: { kind: 'rotary', scaling: { kind: 'linear', factor: 2, originalSpan: 0 } } },
    ],
    ['serving.span', { serving: { span: 0 } }],
    ['serving.sequences', { serving: { sequences: -2 } }],
    ['serving.deviceGiB', { serving: { deviceGiB: 0 } }],
    ['serving.outputTokens', { serving: { outputTokens: -1 } }],
    ['serving.promptTokens', { serving: { promptTokens: 0.5 } }],
  ];

  test.each(fields)('%s out of range is size-invalid, named by its key', (field, change) => {
    const locations: LocationMap = { [field]: { key: `the.key.of.${field}`, line: 7 } };
    const findings = specFindings(spec(change), locations).filter((f) => f.rule === 'size-invalid');
    expect(findings).toHaveLength(1);
    expect(findings[0]).toMatchObject({ severity: 'block', key: `the.key.of.${field}`, line: 7 });
    expect(findings[0]?.message).toMatch(
      new RegExp(`^the\\.key\\.of\\.${field.replace('.', '\\.')} is `),
    );
    expect(findings[0]?.message).toMatch(/; set it to /);
  });

  test('sizes past 2^53 - 1 are too large to hold exactly (IEEE 754 binary64)', () => {
    const [f] = specFindings(spec({ vocab: 2 ** 60 }), { vocab: { key: 'vocab_size', line: 3 } });
    expect(f?.message).toBe(
      'vocab_size is 1152921504606846976, too large to hold exactly in a double (beyond 2^53 − 1); set it to the vocabulary size: a whole number of at least 1',
    );
  });

  test('zero reserved output and prompt tokens, and fractional device memory, are fine', () => {
    expect(
      specFindings(spec({ serving: { outputTokens: 0, promptTokens: 0, deviceGiB: 0.5 } }), {}),
    ).toEqual([]);
  });

  test("NaN is the reader's mark of a reported value and is skipped", () => {
    expect(
      specFindings(spec({ layers: NaN, hidden: NaN, vocab: NaN, declaredSpan: NaN }), {}),
    ).toEqual([]);
  });

  test('a head width derived from sizes that do not divide says how it was derived', () => {
    const { text, findings } = fromCheckpoint({ num_attention_heads: 48 });
    expect(findings).toEqual([
      {
        rule: 'size-invalid',
        severity: 'block',
        key: 'num_attention_heads',
        line: lineOf(text, '"num_attention_heads"'),
        message:
          'the head width is not stated, and hidden_size / num_attention_heads = 4096 / 48 = 85.3333, not a whole number; state the width of one head, or use a head count that divides 4096',
      },
    ]);
  });

  test('a size from the command line is named as the command line', () => {
    const [f] = specFindings(spec({ serving: { span: -5 } }), {
      'serving.span': { key: 'command line', line: null },
    });
    expect(f).toMatchObject({ rule: 'size-invalid', key: 'command line', line: null });
    expect(f?.message).toBe(
      'command line is -5; set it to the served span in tokens: a whole number of at least 1',
    );
  });
});

describe('scaling rules', () => {
  test('scaling-factor-below-one quotes the factor and suggests declared / original span', () => {
    const { text, findings } = fromCheckpoint({
      rope_scaling: { rope_type: 'linear', factor: 0.5, original_max_position_embeddings: 2048 },
    });
    expect(findings).toEqual([
      {
        rule: 'scaling-factor-below-one',
        severity: 'block',
        key: 'rope_scaling.factor',
        line: lineOf(text, '"factor"'),
        message:
          'rope_scaling.factor is 0.5; a scaling factor below 1 shrinks the trained span instead of extending it: set it to the extended span over the original span, at least 1 such as 4 (max_position_embeddings 8192 / rope_scaling.original_max_position_embeddings 2048), or remove the scaling block',
      },
    ]);
  });

  test.each([[1], [4], [NaN]])(
    'a scaling factor of %f raises no scaling-factor-below-one',
    (factor) => {
      expect(
        specFindings(
          spec({ position: { kind: 'rotary', scaling: { kind: 'linear', factor } } }),
          {},
        ),
      ).toEqual([]);
    },
  );

  test('original-span-above-declared names both keys and the extended span original × factor', () => {
    const { text, findings } = fromCheckpoint({
      rope_scaling: { rope_type: 'yarn', factor: 4, original_max_position_embeddings: 16384 },
    });
    expect(findings).toEqual([
      {
        rule: 'original-span-above-declared',
        severity: 'block',
        key: 'rope_scaling.original_max_position_embeddings',
        line: lineOf(text, '"original_max_position_embeddings"'),
        message:
          'rope_scaling.original_max_position_embeddings is 16384, above max_position_embeddings 8192; the original span is the span trained before scaling and cannot exceed the declared span: set max_position_embeddings to the extended span (16384 × 4 = 65536), or rope_scaling.original_max_position_embeddings to the span the model was trained at',
      },
    ]);
  });

  test('an original span equal to the declared span is fine', () => {
    expect(
      specFindings(
        spec({
          position: { kind: 'rotary', scaling: { kind: 'yarn', factor: 4, originalSpan: 4096 } },
        }),
        {},
      ),
    ).toEqual([]);
  });
});

describe('sizes that contradict each other', () => {
  test('more active experts than experts is value-invalid', () => {
    const { findings } = fromCheckpoint({ num_local_experts: 8, num_experts_per_tok: 9 });
    expect(findings.map((f) => [f.rule, f.key, f.message])).toEqual([
      [
        'value-invalid',
        'num_experts_per_tok',
        'num_experts_per_tok is 9, more than num_local_experts 8; a token cannot use more experts than there are: set it to at most 8',
      ],
    ]);
  });

  test('more windowed layers than layers is value-invalid', () => {
    const [f] = specFindings(spec({ slidingWindow: 512, windowLayers: 30 }), {
      windowLayers: { key: 'model.sliding-window.layers', line: 9 },
    });
    expect([f?.rule, f?.key, f?.line]).toEqual(['value-invalid', 'model.sliding-window.layers', 9]);
    expect(f?.message).toBe(
      'model.sliding-window.layers makes 30 windowed layers, more than the 24 layers (layers); set it to at most 24',
    );
  });
});
