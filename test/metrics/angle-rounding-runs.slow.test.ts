/**
 * `angleErrorMax` bit for bit against the loop over every position (see
 * angle-rounding-runs.test.ts): in bf16 over 120 cases up to 2^18 (a sample runs in `npm test`),
 * and in fp32 just past the exact-integer limit 2^24, where each case walks 2^24 positions or
 * more; so this runs in `npm run test:full`.
 */
import { describe, it } from 'vitest';
import fc from 'fast-check';
import { check, thetaArb } from './angle-rounding-check.js';

describe('angleErrorMax over runs of shared rounded positions, in bf16', () => {
  it('equals the every-position loop bit for bit in bf16 over spans up to 2^18 (ten binades of runs)', () => {
    fc.assert(
      fc.property(thetaArb, fc.integer({ min: 257, max: 2 ** 18 }), (theta, span) =>
        check('bf16', theta, span),
      ),
      { numRuns: 120, seed: 20261202 },
    );
  });
});

describe('angleErrorMax over runs of shared rounded positions, in fp32', () => {
  it('equals the every-position loop bit for bit in fp32 just past 2^24, where positions start to share values', () => {
    fc.assert(
      fc.property(
        thetaArb,
        fc.integer({ min: 2 ** 24 + 1, max: 2 ** 24 + 2 ** 21 }),
        (theta, span) => check('fp32', theta, span),
      ),
      { numRuns: 12, seed: 77 },
    );
    // The run holding the last position rounds up into the next binade (2^25 - 1 rounds to 2^25).
    check('fp32', [1, 0.75 + 2 ** -40], 2 ** 25);
  });
});
