/**
 * Frequencies and the bit-for-bit check shared by angle-rounding-runs.test.ts and
 * angle-rounding-runs.slow.test.ts: `angleErrorMax` against the straightforward loop over every
 * (p, i) of reference.ts.
 */
import fc from 'fast-check';
import { expect } from 'vitest';
import type { FloatFormat } from '../../src/core/model.js';
import { angleErrorMax } from '../../src/core/metrics/angle-rounding.js';
import { referenceAngleErrorMax } from './reference.js';

export const SPECIAL = [
  1,
  0.5,
  2 ** -7,
  0.75,
  3 * 2 ** -12,
  0.75 + 2 ** -40,
  0.75 - 2 ** -45,
  1 - 2 ** -30,
  Math.fround(0.9),
  Math.fround(0.9) + 2 ** -50,
  0.999999,
  7.5,
];

export const thetaArb = fc.array(
  fc.oneof(
    fc.constantFrom(...SPECIAL),
    fc.double({ min: Math.log(1e-4), max: Math.log(2), noNaN: true }).map(Math.exp),
  ),
  { minLength: 1, maxLength: 3 },
);

export function check(format: FloatFormat, theta: number[], span: number): void {
  const th = Float64Array.from(theta);
  expect(angleErrorMax(format, th, span), `${format} θ=${JSON.stringify(theta)} T=${span}`).toBe(
    referenceAngleErrorMax(format, th, span),
  );
}
