import { describe, expect, it } from 'vitest';
import { inspectModel } from '../../src/core/inspect.js';
import { applyChange, ChangeError, currentValue } from '../../src/core/remedy/apply-change.js';
import { modelText } from './helpers.js';

const spec = () =>
  inspectModel(modelText({ serving: 'span: 8192\nsequences: 4' }), 'm.reach.yaml').spec;

describe('applyChange(spec, change)', () => {
  it('sets each field a remedy changes and leaves the input untouched', () => {
    const before = spec();
    const frozen = JSON.stringify(before);
    const next = applyChange(before, {
      'position.base': 500000,
      kvHeads: 2,
      'dtypes.cache': 'fp8',
      'dtypes.positions': 'bf16',
      'serving.span': 4096,
      'serving.sequences': 2,
    });
    expect(JSON.stringify(before)).toBe(frozen);
    expect(next.position).toMatchObject({ kind: 'rotary', base: 500000 });
    expect(next).toMatchObject({
      kvHeads: 2,
      dtypes: { cache: 'fp8', positions: 'bf16' },
      serving: { span: 4096, sequences: 2 },
    });
  });

  it('adds a linear scaling block with the documented defaults when the code has none', () => {
    const next = applyChange(spec(), {
      'position.scaling.factor': 4,
      'position.scaling.originalSpan': 2048,
    });
    // yarn α = 1, β = 32 (Peng et al. 2023, §3.2); banded low 1, high 4 (common practice).
    expect(next.position).toMatchObject({
      scaling: {
        kind: 'linear',
        factor: 4,
        originalSpan: 2048,
        alpha: 1,
        beta: 32,
        low: 1,
        high: 4,
      },
    });
  });

  it('takes the kind the change names for a new scaling block', () => {
    const next = applyChange(spec(), {
      'position.scaling.kind': 'ntk',
      'position.scaling.factor': 2,
    });
    expect(next.position).toMatchObject({ scaling: { kind: 'ntk', factor: 2 } });
  });

  it.each([
    [{ 'position.rope': 1 }, /change position\.rope: not a field a remedy changes/],
    [
      { 'dtypes.cache': 'fp7' },
      /change dtypes\.cache = "fp7": expected one of fp32, bf16, fp16, fp8, int8, int4/,
    ],
    [{ 'serving.span': Number.NaN }, /change serving\.span = null: expected a finite number/],
    [{ 'serving.span': '4096' }, /change serving\.span = "4096": expected a finite number/],
  ])('refuses %j, quoting it', (change, message) => {
    expect(() => applyChange(spec(), change as never)).toThrow(ChangeError);
    expect(() => applyChange(spec(), change as never)).toThrow(message);
  });

  it('refuses a rotary field on a code that is not rotary', () => {
    const learned = inspectModel(modelText({ position: 'code: learned' }), 'm.reach.yaml').spec;
    expect(() => applyChange(learned, { 'position.base': 10 })).toThrow(
      'change to the rotary code of a learned position code',
    );
  });
});

describe('currentValue(spec, key)', () => {
  it('reads what the description states, null where a default applies', () => {
    const s = spec();
    expect(currentValue(s, 'position.base')).toBe(10000);
    expect(currentValue(s, 'position.scaling.factor')).toBeNull();
    expect(currentValue(s, 'serving.sequences')).toBe(4);
    expect(currentValue(s, 'dtypes.cache')).toBe('bf16');
    expect(currentValue(s, 'nothing')).toBeNull();
  });
});
