/**
 * The interval bounds that let the similarity scan pass over blocks, against the reference
 * expression (Math.cos of `fl(k θ)`, summed in pair order, test/metrics/reference.ts), and the
 * scan that uses them against the straightforward loop on spans long enough for whole intervals
 * to be passed over.
 */
import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { cosineSumBounds } from '../../src/core/metrics/cosine-sum-bounds.js';
import { cosineSum, similarityScan } from '../../src/core/metrics/similarity-scan.js';
import { referenceSimilarity } from './reference.js';

/** `θ_i = base^(-2i/d)`, i < d/2 (Su et al. 2021, "RoFormer", Eq. 15). */
function rotaryTheta(base: number, d: number): Float64Array {
  return Float64Array.from({ length: d / 2 }, (_, i) => base ** ((-2 * i) / d));
}

/** The reference sum in pair order, written out here so the check does not lean on the code it checks. */
function referenceSum(theta: Float64Array, k: number): number {
  let s = 0;
  for (let i = 0; i < theta.length; i++) s += Math.cos(k * theta[i]!);
  return s;
}

describe('cosineSumBounds(theta, k0, k1)', () => {
  it('holds the reference sum at every offset of the interval, for random frequencies and offsets up to 2^31', () => {
    fc.assert(
      fc.property(
        fc.array(fc.double({ min: 1e-9, max: 4, noNaN: true }), { minLength: 1, maxLength: 24 }),
        fc.integer({ min: 1, max: 2 ** 31 - 5000 }),
        fc.integer({ min: 0, max: 3000 }),
        (values, k0, length) => {
          const theta = Float64Array.from(values);
          const { lower, upper } = cosineSumBounds(theta, k0, k0 + length);
          // Sample the interval: both ends, and every offset of a short interval.
          const step = Math.max(1, Math.floor(length / 200));
          for (let k = k0; k <= k0 + length; k += step) {
            const s = referenceSum(theta, k);
            if (!(s >= lower && s <= upper))
              throw new Error(`k=${k}: ${s} outside [${lower}, ${upper}]`);
          }
          const last = referenceSum(theta, k0 + length);
          expect(last).toBeGreaterThanOrEqual(lower);
          expect(last).toBeLessThanOrEqual(upper);
        },
      ),
      { numRuns: 300 },
    );
  });

  it('is [-P, P] widened by the slack when every pair turns a whole circle in the interval', () => {
    const theta = Float64Array.from([1, 2, 3]);
    const { lower, upper } = cosineSumBounds(theta, 1, 100);
    // The slack is 16 ε (k1 Σθ + P² + 8P) = 16 · 2^-53 · (600 + 9 + 24): far below 1e-9.
    expect(upper).toBeCloseTo(3, 9);
    expect(lower).toBeCloseTo(-3, 9);
  });

  it('is tight for a single slow pair: cos at the two ends when the interval holds no multiple of π', () => {
    const theta = Float64Array.from([1e-4]);
    const { lower, upper } = cosineSumBounds(theta, 5000, 6000);
    // Angles 0.5 .. 0.6 rad: cos decreasing, so cos(0.5) on top and cos(0.6) below (within 1e-12,
    // the widening by δ and the slack being about 1e-15 here).
    expect(Math.abs(upper - Math.cos(0.5))).toBeLessThan(1e-12);
    expect(Math.abs(lower - Math.cos(0.6))).toBeLessThan(1e-12);
  });

  it('reaches 1 when the angles pass a whole turn, -1 when they pass an odd half turn', () => {
    const theta = Float64Array.from([1e-3]);
    // 6.0 .. 6.5 rad passes 2π = 6.283…; 3.0 .. 3.2 rad passes π.
    expect(cosineSumBounds(theta, 6000, 6500).upper).toBeGreaterThanOrEqual(1);
    expect(cosineSumBounds(theta, 3000, 3200).lower).toBeLessThanOrEqual(-1);
  });
});

describe('similarityScan(theta, T) passing over intervals by their bounds', () => {
  it('equals the straightforward loop for 64 pairs of base 10000 at T = 2^17, where nearly every block is passed over', () => {
    const theta = rotaryTheta(10000, 128);
    const span = 2 ** 17;
    const fast = similarityScan(theta, span);
    const ref = referenceSimilarity(theta, span);
    expect(fast.separationFloorOffset).toBe(ref.separationFloorOffset);
    expect(fast.discriminationSpan).toBe(ref.discriminationSpan);
    // Identical, not merely close: the floor is recomputed with the reference expression.
    expect(fast.separationFloor).toBe(ref.separationFloor);
  });

  it('finds a floor far from k = 1 when every pair returns to angle 0 together (θ_i = 2π j_i / 7000)', () => {
    // At k = 7000 every angle is a whole number of turns, so the sum is P up to rounding: the
    // floor sits there, after thousands of offsets whose blocks the bounds pass over.
    const theta = Float64Array.from(
      [3, 5, 11, 17, 29, 41, 59, 97],
      (j) => (2 * Math.PI * j) / 7000,
    );
    const span = 20_000;
    const fast = similarityScan(theta, span);
    const ref = referenceSimilarity(theta, span);
    expect(ref.separationFloorOffset).toBe(7000);
    expect(fast.separationFloorOffset).toBe(ref.separationFloorOffset);
    expect(fast.discriminationSpan).toBe(ref.discriminationSpan);
    expect(fast.separationFloor).toBe(ref.separationFloor);
    expect(cosineSum(theta, 7000)).toBeGreaterThan(8 - 1e-9);
  });

  it('equals the straightforward loop on random codes with slow and fast pairs at spans up to 2^15', () => {
    fc.assert(
      fc.property(
        fc.integer({ min: 4, max: 32 }).map((n) => 2 * n),
        fc.double({ min: 2, max: 1e6, noNaN: true }),
        fc.integer({ min: 2, max: 2 ** 15 }),
        (d, base, span) => {
          const theta = rotaryTheta(base, d);
          const fast = similarityScan(theta, span);
          const ref = referenceSimilarity(theta, span);
          expect(fast.separationFloorOffset).toBe(ref.separationFloorOffset);
          expect(fast.discriminationSpan).toBe(ref.discriminationSpan);
          expect(fast.separationFloor).toBe(ref.separationFloor);
        },
      ),
      { numRuns: 40 },
    );
  });
});
