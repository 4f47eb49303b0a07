import { describe, expect, test } from 'vitest';
import { editDistance, nearestName } from '../../src/core/parse/nearest.js';
import { cpuClock } from '../support/cpu-time.js';

describe('editDistance(a, b)', () => {
  test('kitten → sitting is 3, the textbook Levenshtein example (from memory)', () => {
    expect(editDistance('kitten', 'sitting')).toBe(3);
  });

  test('a swap of neighbours costs 1 (Damerau 1964)', () => {
    expect(editDistance('fp16', 'fp61')).toBe(1);
    expect(editDistance('ab', 'ba')).toBe(1);
  });

  test('ca → abc is 3 under optimal string alignment, where unrestricted Damerau–Levenshtein gives 2 (the standard contrast, from memory)', () => {
    expect(editDistance('ca', 'abc')).toBe(3);
  });

  test('is 0 for names that differ only in case, and the length for an empty side', () => {
    expect(editDistance('HeadRoom', 'headroom')).toBe(0);
    expect(editDistance('', 'reach')).toBe(5);
    expect(editDistance('reach', '')).toBe(5);
  });

  test('is symmetric', () => {
    for (const [a, b] of [
      ['memoryBytes', 'memorybites'],
      ['span-past-reach', 'span-past-rech'],
      ['x', 'yz'],
    ] as const) {
      expect(editDistance(a, b)).toBe(editDistance(b, a));
    }
  });
});

describe('nearestName(name, candidates)', () => {
  const names = ['reach', 'headroom', 'memoryBytes', 'min', 'max'];

  test('suggests the closest name within a few edits', () => {
    expect(nearestName('headrom', names)).toBe('headroom');
    expect(nearestName('memorybytes', names)).toBe('memoryBytes');
  });

  test('suggests a name the input starts with, or that starts with the input', () => {
    expect(nearestName('minimum', names)).toBe('min');
    expect(nearestName('memory', names)).toBe('memoryBytes');
  });

  test('suggests nothing for a far-off name or an empty list', () => {
    expect(nearestName('latency', names)).toBeNull();
    expect(nearestName('reach', [])).toBeNull();
  });

  test('a 100,000-character name costs bounded work', () => {
    const cpu = cpuClock();
    nearestName('x'.repeat(100_000), names);
    // Only the first 200 characters are compared: well under a second.
    expect(cpu(), 'ms of CPU time').toBeLessThan(1000);
  });
});
