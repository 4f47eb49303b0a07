/**
 * blurredPairs solves each binade where neighbouring angles are between half a spacing and one
 * spacing apart instead of walking it; these cases pick frequencies that land there, checked
 * against the definition walked position by position (docs/metrics.md, `blurredPairs`:
 * some p in [1, T) with fl(fl(p) t) = fl(fl(p-1) t), t = fl(θ)).
 */
import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import type { FloatFormat } from '../../src/core/model.js';
import { blurredPairs } from '../../src/core/metrics/angle-rounding.js';
import { roundToFormat } from '../../src/core/metrics/float-format.js';

/** The definition for one pair, every position visited. */
function blurredByWalking(format: FloatFormat, theta: number, span: number): boolean {
  const fl = (x: number) => roundToFormat(x, format);
  const t = fl(theta);
  let previous = fl(fl(0) * t);
  for (let p = 1; p < span; p++) {
    const angle = fl(fl(p) * t);
    if (angle === previous) return true;
    previous = angle;
  }
  return false;
}

/** `M · 2^e` with an m-bit significand M: exactly representable in a format of m bits. */
function exactIn(bits: number, significand: number, exponent: number): number {
  return (significand / 2 ** (bits - 1)) * 2 ** exponent;
}

describe('blurredPairs(format, [θ], T) where angles step by half a spacing to one spacing', () => {
  it('agrees with the walk for fp32 frequencies whose significand is all ones, 1.5, or a power of two, at T = 2^24 + 1', () => {
    // T = 2^24 + 1 is the longest span fp32 positions stay exact for, so every binade is
    // reached; each walk visits 2^24 positions (tens of milliseconds).
    const span = 2 ** 24 + 1;
    const thetas = [
      exactIn(24, 2 ** 24 - 1, -3), // all ones: angles one step below the spacing, the slowest case to walk
      exactIn(24, 2 ** 24 - 1, -9),
      exactIn(24, 3 * 2 ** 22, -5), // 1.5: steps of 3/4 spacing
      2 ** -4, // a power of two: steps of exactly one spacing in one binade, never together
      exactIn(24, 2 ** 23 + 1, -7), // just above a power of two
    ];
    for (const theta of thetas) {
      expect(blurredPairs('fp32', Float64Array.of(theta), span), `θ = ${theta}`).toBe(
        blurredByWalking('fp32', theta, span) ? 1 : 0,
      );
    }
  });

  it('agrees with the walk for random significands near a power of two, in all three formats and spans up to their limits', () => {
    const limits: Record<FloatFormat, number> = {
      fp32: 2 ** 20,
      bf16: 2 ** 8 + 1,
      fp16: 2 ** 11 + 1,
    };
    const bits: Record<FloatFormat, number> = { fp32: 24, bf16: 8, fp16: 11 };
    fc.assert(
      fc.property(
        fc.constantFrom<FloatFormat>('fp32', 'bf16', 'fp16'),
        fc.integer({ min: 0, max: 64 }),
        fc.integer({ min: -14, max: 2 }),
        fc.double({ min: 0, max: 1, noNaN: true }),
        (format, below, exponent, spanShare) => {
          const m = bits[format];
          // Significands at or just under 2^m - 1 (steps just under a spacing) and a few random ones.
          const significand = Math.max(2 ** (m - 1), 2 ** m - 1 - below);
          const theta = exactIn(m, significand, exponent);
          const span = Math.max(2, Math.floor(limits[format] * spanShare));
          expect(blurredPairs(format, Float64Array.of(theta), span)).toBe(
            blurredByWalking(format, theta, span) ? 1 : 0,
          );
        },
      ),
      { numRuns: 150 },
    );
  });
});
