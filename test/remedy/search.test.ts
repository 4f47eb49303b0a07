import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { geometricFrequencies } from '../../src/core/metrics/frequencies.js';
import { firstNegativeOffset } from '../../src/core/metrics/first-negative.js';
import { cosineSum } from '../../src/core/metrics/similarity-scan.js';
import {
  nextGridBase,
  roundBase,
  searchRotaryBase,
  type BaseTrial,
} from '../../src/core/remedy/rotary-base.js';
import { coveringFactor } from '../../src/core/remedy/scaling-factor.js';
import { largestPassing } from '../../src/core/remedy/whole-search.js';

describe('coveringFactor(span, trained)', () => {
  it("is L'/L for position interpolation's published extension: 2048 → 32768 is 16 (Chen et al. 2023, §1 and Eq. 4)", () => {
    expect(coveringFactor(32768, 2048)).toBe(16);
  });

  it('rounds up to the next whole factor and never goes below 1', () => {
    expect(coveringFactor(32769, 2048)).toBe(17);
    expect(coveringFactor(1000, 2048)).toBe(1);
  });

  it.each([
    [0, 2048],
    [-1, 2048],
    [4096, 0],
    [Number.NaN, 2048],
    [4096.5, 2048],
    [2 ** 53, 2048],
    [4096, Infinity],
  ])('is null for span %p and trained span %p', (span, trained) => {
    expect(coveringFactor(span, trained)).toBeNull();
  });
});

describe('largestPassing(lo, hi, passes)', () => {
  it('finds the last whole number of a true-then-false predicate, as a linear scan does', () => {
    fc.assert(
      fc.property(
        fc.integer({ min: 0, max: 5000 }),
        fc.integer({ min: 0, max: 5000 }),
        fc.integer({ min: -5, max: 5005 }),
        (a, b, cut) => {
          const [lo, hi] = a <= b ? [a, b] : [b, a];
          let expected: number | null = null;
          for (let n = lo; n <= hi; n++) if (n <= cut) expected = n;
          const found = largestPassing(lo, hi, (n) => n <= cut);
          expect(found.value).toBe(expected);
          // Two ends, then one bisection step per halving.
          expect(found.evaluations).toBeLessThanOrEqual(2 + Math.ceil(Math.log2(hi - lo + 1)));
        },
      ),
    );
  });

  it('is null for an empty range and for a predicate false at lo', () => {
    expect(largestPassing(5, 4, () => true).value).toBeNull();
    expect(largestPassing(1, 10, () => false).value).toBeNull();
    expect(largestPassing(Number.NaN, 10, () => true).value).toBeNull();
  });

  it('spans the whole safe-integer range in at most 55 calls', () => {
    const found = largestPassing(1, Number.MAX_SAFE_INTEGER, (n) => n <= 123456789012);
    expect(found.value).toBe(123456789012);
    expect(found.evaluations).toBeLessThanOrEqual(55);
  });
});

describe('roundBase(x, direction) and nextGridBase(g, direction)', () => {
  it('rounds to two significant digits in the direction asked', () => {
    expect(roundBase(1294337, 'up')).toBe(1300000);
    expect(roundBase(1294337, 'down')).toBe(1200000);
    expect(roundBase(84000, 'up')).toBe(84000);
    expect(roundBase(0.0123, 'up')).toBe(0.013);
  });

  it('steps along the grid across decades', () => {
    expect(nextGridBase(99000, 'up')).toBe(100000);
    expect(nextGridBase(100000, 'up')).toBe(110000);
    expect(nextGridBase(100000, 'down')).toBe(99000);
    expect(nextGridBase(84000, 'down')).toBe(83000);
  });

  it.each([0, -5, Number.NaN, Infinity])('is null for %p', (x) => {
    expect(roundBase(x, 'up')).toBeNull();
  });
});

/** Men et al. 2024's criterion for P = 64 pairs (head 128): no negative Σ cos(k θ_i) for k < span. */
function criterion(span: number) {
  return (base: number): BaseTrial => {
    const found = firstNegativeOffset(geometricFrequencies(base, 128)!, 1, span);
    return { passes: found.offset === null, cost: found.elements };
  };
}

describe('searchRotaryBase(from, direction, criterion)', () => {
  it('stops at the first passing grid base beyond the current one', () => {
    const found = searchRotaryBase(10000, 'up', (b) => ({ passes: b >= 37000, cost: 1 }));
    expect(found).toMatchObject({ base: 37000, capped: false });
  });

  it('returns the nearest passing base, not the far side of a pocket of failing bases', () => {
    // Passing from 20,000 to 29,000, failing up to 60,000, passing again after: a bisection
    // between doublings (10k → 20k passes) could not land in the pocket, and the walk does not.
    const passes = (b: number) => (b >= 20000 && b < 30000) || b > 60000;
    expect(searchRotaryBase(31000, 'up', (b) => ({ passes: passes(b), cost: 1 })).base).toBe(61000);
    expect(searchRotaryBase(10000, 'up', (b) => ({ passes: passes(b), cost: 1 })).base).toBe(20000);
  });

  it("after the walk's budget, doubles and bisects, and still returns only a base that passed", () => {
    const seen: number[] = [];
    const found = searchRotaryBase(
      10,
      'up',
      (b) => {
        seen.push(b);
        return { passes: b >= 123456789, cost: 1 };
      },
      {
        walkCost: 5,
        totalCost: 1000,
        evaluations: 4000,
        doublings: 30,
        bisections: 40,
        gridSteps: 30,
      },
    );
    expect(found.capped).toBe(true);
    expect(found.base).toBeGreaterThanOrEqual(123456789);
    expect(found.base).toBe(130000000);
    expect(seen).toContain(found.base);
  });

  it('is null when nothing passes within the caps, and for a base that is not a positive number', () => {
    expect(
      searchRotaryBase(10000, 'up', () => ({ passes: false, cost: 1 }), {
        walkCost: 10,
        totalCost: 1000,
        evaluations: 4000,
        doublings: 5,
        bisections: 5,
        gridSteps: 5,
      }),
    ).toMatchObject({ base: null, capped: true });
    expect(searchRotaryBase(Number.NaN, 'up', () => ({ passes: true, cost: 1 })).base).toBeNull();
    expect(searchRotaryBase(0, 'up', () => ({ passes: true, cost: 1 })).base).toBeNull();
  });

  it("stops when the whole search's work is spent, returning the last base that passed", () => {
    const found = searchRotaryBase(10, 'up', (b) => ({ passes: b >= 5000, cost: 1 }), {
      walkCost: 3,
      totalCost: 12,
      evaluations: 4000,
      doublings: 30,
      bisections: 40,
      gridSteps: 30,
    });
    expect(found.capped).toBe(true);
    expect(found.base).toBeGreaterThanOrEqual(5000);
  });

  it('stops after its evaluation cap even when each evaluation costs nothing', () => {
    const found = searchRotaryBase(10, 'up', () => ({ passes: false, cost: 0 }), {
      walkCost: 1e9,
      totalCost: 1e9,
      evaluations: 50,
      doublings: 30,
      bisections: 40,
      gridSteps: 30,
    });
    expect(found).toMatchObject({ base: null, capped: true });
    expect(found.evaluations).toBeLessThanOrEqual(51);
  });

  it('never walks down to a base of 1 or less', () => {
    const found = searchRotaryBase(100, 'down', (b) => ({ passes: b < 1, cost: 1 }));
    expect(found.base).toBeNull();
  });

  // Men et al. 2024, Table 2 (arXiv v1; Table 1 in the NeurIPS version): lower-bound bases 2.7e4 (4k), 8.4e4 (8k),
  // 6.4e5 (32k). The table was solved numerically and the feasible set is not monotone, so the
  // check is the nearest passing two-digit base within 10 % of the published value.
  it.each([
    [4096, 27000],
    [8192, 84000],
    [32768, 640000],
  ])("for %i tokens finds a base within a tenth of Men et al. 2024's %i", (span, published) => {
    const found = searchRotaryBase(10000, 'up', criterion(span));
    expect(found.capped).toBe(false);
    expect(Math.abs((found.base as number) / published - 1)).toBeLessThanOrEqual(0.1);
    expect(criterion(span)(found.base as number).passes).toBe(true);
  });
});

describe('firstNegativeOffset(theta, kStart, kEnd)', () => {
  it('is the first k whose reference cosine sum is negative, as the straightforward loop finds it', () => {
    for (const base of [500, 10000, 40000]) {
      const theta = geometricFrequencies(base, 64)!;
      let expected: number | null = null;
      for (let k = 1; k < 20000 && expected === null; k++)
        if (cosineSum(theta, k) < 0) expected = k;
      expect(firstNegativeOffset(theta, 1, 20000).offset).toBe(expected);
    }
  });

  it('counts the work up to where it stopped', () => {
    const theta = geometricFrequencies(10000, 128)!;
    const found = firstNegativeOffset(theta, 1, 100000);
    expect(found.offset).not.toBeNull();
    expect(found.elements).toBeLessThan(64 * ((found.offset as number) + 512));
  });

  it('is null for an empty range or no pairs', () => {
    expect(firstNegativeOffset(new Float64Array(0), 1, 100).offset).toBeNull();
    expect(firstNegativeOffset(geometricFrequencies(10000, 8)!, 10, 10).offset).toBeNull();
    expect(firstNegativeOffset(geometricFrequencies(10000, 8)!, 0, 10).offset).toBeNull();
  });
});
