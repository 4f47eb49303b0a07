/**
 * `angleErrorMax` past the exact-integer limit 2^m, where positions share rounded values in runs
 * and the scan visits one run at a time, binade by binade. Checked against the straightforward
 * loop over every (p, i) (reference.ts), bit for bit, on frequencies chosen to stress each branch:
 * θ = 1 and other powers of two (every product exact, errors exactly the run half-widths), θ held
 * exactly but not a power of two (products round, no drift), θ within 2^-40 of a held value (drift
 * so small the bound prunes late), and ordinary θ. bf16 (m = 8) puts a dozen binades of runs
 * inside spans the reference loop covers in milliseconds (120 cases in angle-rounding-runs.slow.test.ts,
 * a sample of them here); fp32 is checked just past 2^24 there too (`npm run test:full`: the loop
 * visits 2^24 positions a case).
 */
import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { angleErrorMax } from '../../src/core/metrics/angle-rounding.js';
import { cpuClock } from '../support/cpu-time.js';
import { check, thetaArb } from './angle-rounding-check.js';

describe('angleErrorMax over runs of shared rounded positions', () => {
  it('equals the every-position loop bit for bit in bf16 over spans up to 2^18 (a sample: the first 24 of the 120 cases in angle-rounding-runs.slow.test.ts)', () => {
    fc.assert(
      fc.property(thetaArb, fc.integer({ min: 257, max: 2 ** 18 }), (theta, span) =>
        check('bf16', theta, span),
      ),
      { numRuns: 24, seed: 20261202 },
    );
  });

  it('equals the every-position loop in bf16 at every binade edge and around it', () => {
    for (let e = 8; e <= 16; e++) {
      for (const span of [
        2 ** e - 1,
        2 ** e,
        2 ** e + 1,
        2 ** e + 2 ** (e - 8),
        2 ** e + 2 ** (e - 8) + 1,
        2 ** (e + 1) - 2 ** (e - 7),
      ]) {
        check('bf16', [1, 0.75, 0.9, 0.3], span);
      }
    }
  });

  it('θ = 1 over 2^31 - 1 positions: exactly half the largest run, 2^(30-24) = 64, found without walking the runs', () => {
    // Every product is exact, so the error is |fl(p) - p|, largest at the ties p = v ± 64 of the
    // top binade, where the spacing is 2^(30-23) = 128 (IEEE 754-2008 §3.3).
    const cpu = cpuClock();
    expect(angleErrorMax('fp32', Float64Array.of(1), 2 ** 31 - 1)).toBe(64);
    expect(angleErrorMax('fp32', Float64Array.of(2 ** -20), 2 ** 31 - 1)).toBe(64 * 2 ** -20);
    expect(cpu(), 'ms of CPU time').toBeLessThan(200);
  });
});
