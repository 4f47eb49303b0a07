/**
 * The fast positional scans against the straightforward loops of reference.ts: counts identical,
 * floats within 1e-9 relative (the contract for the fast methods; in practice they agree bit for
 * bit because every decisive value is recomputed with the reference expression).
 *
 * Shared by scans.property.test.ts (every run, `npm run test:full`) and scans.test.ts (a fifth of
 * the generated cases, `npm test`). The seeds are fixed, so the sample's cases are the first ones
 * of the full runs.
 */
import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import type { FloatFormat, ModelSpec, Scaling, ScalingKind } from '../../src/core/model.js';
import { frequencyPlan } from '../../src/core/metrics/compute.js';
import { numberFormatMetrics } from '../../src/core/metrics/number-format.js';
import { scanSimilarityRange, similarityScan } from '../../src/core/metrics/similarity-scan.js';
import { MAX_SCAN_WORK } from '../../src/core/metrics/scan-limits.js';
import { referencePrecision, referenceSimilarity } from './reference.js';

const FORMATS: FloatFormat[] = ['fp32', 'bf16', 'fp16'];

/** Relative closeness 1e-9: the tolerance the fast scans promise against the reference loop. */
function expectClose(actual: number | null, expected: number | null, what: string): void {
  if (expected === null || actual === null) {
    expect(actual, what).toBe(expected);
    return;
  }
  const scale = Math.max(Math.abs(expected), Number.MIN_VALUE);
  if (!(Math.abs(actual - expected) <= 1e-9 * scale))
    throw new Error(`${what}: fast ${actual}, reference ${expected}`);
}

function checkAgainstReference(theta: Float64Array, span: number, label: string): void {
  const fast = similarityScan(theta, span);
  const ref = referenceSimilarity(theta, span);
  expect(fast.separationFloorOffset, `${label} separationFloorOffset`).toBe(
    ref.separationFloorOffset,
  );
  expect(fast.discriminationSpan, `${label} discriminationSpan`).toBe(ref.discriminationSpan);
  expectClose(fast.separationFloor, ref.separationFloor, `${label} separationFloor`);
  for (const f of FORMATS) {
    const got = numberFormatMetrics(f, theta, span);
    const want = referencePrecision(f, theta, span);
    expect(got.collidingPositions, `${label} ${f} collidingPositions`).toBe(
      want.collidingPositions,
    );
    expect(got.overflowPosition, `${label} ${f} overflowPosition`).toBe(want.overflowPosition);
    expect(got.blurredPairs, `${label} ${f} blurredPairs`).toBe(want.blurredPairs);
    expectClose(got.angleErrorMax, want.angleErrorMax, `${label} ${f} angleErrorMax`);
  }
}

function rotarySpec(
  base: number,
  headDim: number,
  fraction: number,
  scaling: Scaling | null,
  declared: number,
  served: number,
): ModelSpec {
  return {
    name: null,
    layers: 2,
    hidden: headDim * 2,
    heads: 2,
    kvHeads: 2,
    headDim,
    ffn: 8,
    gated: false,
    vocab: 10,
    tied: true,
    bias: false,
    experts: null,
    encoder: null,
    position: { kind: 'rotary', base, fraction, scaling },
    declaredSpan: declared,
    trainedSpan: null,
    slidingWindow: null,
    windowLayers: null,
    dtypes: { weights: null, cache: null, positions: null },
    embeddingInitStd: null,
    embeddingMultiplier: null,
    serving: {
      span: served,
      sequences: null,
      deviceGiB: null,
      reserve: null,
      outputTokens: null,
      promptTokens: null,
    },
  };
}

const scalingArb: fc.Arbitrary<Scaling | null> = fc.oneof(
  fc.constant(null),
  fc.record({
    kind: fc.constantFrom<ScalingKind>('linear', 'ntk', 'dynamic', 'yarn', 'banded'),
    factor: fc.oneof(
      fc.double({ min: 1, max: 16, noNaN: true }),
      fc.double({ min: 0.01, max: 1, noNaN: true }),
    ),
    originalSpan: fc.oneof(fc.constant(null), fc.integer({ min: 16, max: 4096 })),
    alpha: fc.constantFrom(1, 2),
    beta: fc.constantFrom(32, 16),
    low: fc.constant(1),
    high: fc.constantFrom(4, 8),
  }),
);

/**
 * The comparisons: `sample` runs a fifth of each property's cases and leaves out the fixed check
 * past 2^24 tokens (a reference loop over 16 million positions, most of this file's time).
 */
export function describeScansAgainstReference(sample: boolean): void {
  const runs = (full: number): number => (sample ? Math.ceil(full / 5) : full);
  describe(`similarityScan and numberFormatMetrics against the straightforward loops${sample ? ' (a sample)' : ''}`, () => {
    it('similarityScan(θ, T) and numberFormatMetrics(D, θ, T) equal the reference on random rotary configs (T <= 5000)', () => {
      fc.assert(
        fc.property(
          fc.double({ min: Math.log(2), max: Math.log(1e7), noNaN: true }),
          fc.integer({ min: 1, max: 24 }),
          fc.constantFrom(1, 0.5, 0.25, 0.4),
          scalingArb,
          fc.integer({ min: 1, max: 5000 }),
          fc.integer({ min: 1, max: 5000 }),
          (logBase, halfHead, fraction, scaling, declared, served) => {
            const spec = rotarySpec(
              Math.exp(logBase),
              2 * halfHead,
              fraction,
              scaling,
              declared,
              served,
            );
            const plan = frequencyPlan(spec, served, scaling?.originalSpan ?? declared);
            if (plan === null) return;
            checkAgainstReference(
              plan.scaled,
              served,
              JSON.stringify({ logBase, halfHead, fraction, scaling, served }),
            );
          },
        ),
        { numRuns: runs(150), seed: 424242 },
      );
    });

    it('equal the reference on random raw frequencies, including θ > 1, fp16 subnormal and zero-rounding θ', () => {
      fc.assert(
        fc.property(
          fc.array(fc.double({ min: Math.log(1e-9), max: Math.log(40), noNaN: true }), {
            minLength: 1,
            maxLength: 9,
          }),
          fc.integer({ min: 1, max: 4000 }),
          (logs, span) => {
            const theta = Float64Array.from(logs, Math.exp);
            checkAgainstReference(theta, span, JSON.stringify({ logs, span }));
          },
        ),
        { numRuns: runs(150), seed: 777 },
      );
    });

    it('equal the reference for large angles kθ up to 1e9, where the seeds are reduced by whole turns', () => {
      fc.assert(
        fc.property(
          fc.array(fc.double({ min: Math.log(50), max: Math.log(3e5), noNaN: true }), {
            minLength: 1,
            maxLength: 6,
          }),
          fc.integer({ min: 600, max: 3000 }),
          (logs, span) => {
            const theta = Float64Array.from(logs, Math.exp);
            const fast = similarityScan(theta, span);
            const ref = referenceSimilarity(theta, span);
            expect(fast.separationFloorOffset).toBe(ref.separationFloorOffset);
            expect(fast.discriminationSpan).toBe(ref.discriminationSpan);
            expectClose(fast.separationFloor, ref.separationFloor, 'separationFloor');
          },
        ),
        { numRuns: runs(80), seed: 31337 },
      );
    });

    it('picks the smallest offset among tied floors: θ = 2π/q repeats S(k) exactly every q', () => {
      for (const q of [3, 7, 50, 64, 100]) {
        const theta = Float64Array.from([(2 * Math.PI) / q, (4 * Math.PI) / q]);
        checkAgainstReference(theta, 4 * q + 3, `q=${q}`);
      }
      checkAgainstReference(Float64Array.from([1e-9]), 500, 'nearly constant S');
      // S(j) = S(q - j) mathematically: the two rounded sums differ in their last bits, and the
      // smallest offset attaining the floor must come out the same as the reference's
      for (let q = 5; q <= 400; q++) {
        const one = Float64Array.from([(2 * Math.PI) / q]);
        const two = Float64Array.from([(2 * Math.PI) / q, (6 * Math.PI) / q, (10 * Math.PI) / q]);
        for (const theta of [one, two]) {
          const fast = similarityScan(theta, q);
          const ref = referenceSimilarity(theta, q);
          expect(fast.separationFloorOffset, `q=${q} P=${theta.length}`).toBe(
            ref.separationFloorOffset,
          );
          expect(fast.separationFloor, `q=${q} P=${theta.length}`).toBe(ref.separationFloor);
        }
      }
      checkAgainstReference(Float64Array.from([Math.PI]), 50, 'alternating S');
    });

    it('discriminationSpan(θ, T) matches where Σcos passes within rounding of zero (θ = π/(2m))', () => {
      for (let m = 2; m <= 400; m++) {
        for (const theta of [
          Float64Array.from([Math.PI / (2 * m)]),
          Float64Array.from([Math.PI / (2 * m), Math.PI / (2 * m), (3 * Math.PI) / (2 * m)]),
        ]) {
          const span = 4 * m + 2;
          expect(similarityScan(theta, span).discriminationSpan, `m=${m} P=${theta.length}`).toBe(
            referenceSimilarity(theta, span).discriminationSpan,
          );
        }
      }
    });

    it('equal the reference across the format thresholds (T around 257, 2049, 65520)', () => {
      const theta = Float64Array.from([1, 0.31, 0.0123, 1.7e-5, 3e-8]);
      for (const span of [
        1, 2, 3, 256, 257, 258, 259, 2048, 2049, 2050, 2051, 65519, 65520, 65521, 65530,
      ]) {
        checkAgainstReference(theta, span, `T=${span}`);
      }
    });

    if (!sample)
      it('equal the reference for fp32 past 2^23 where angle spacing reaches the frequency', () => {
        // Few pairs so the reference loop stays short; T crosses the exact-integer limit 2^24.
        const span = 2 ** 24 + 5;
        const theta = Float64Array.from([1, 0.75, 1 - 2 ** -20, 0.5 + 2 ** -24, 0.3]);
        for (const f of ['fp32'] as const) {
          const got = numberFormatMetrics(f, theta, span);
          const want = referencePrecision(f, theta, span);
          expect(got.collidingPositions).toBe(want.collidingPositions);
          expect(got.blurredPairs).toBe(want.blurredPairs);
          expect(got.overflowPosition).toBe(want.overflowPosition);
          expectClose(got.angleErrorMax, want.angleErrorMax, 'fp32 angleErrorMax');
        }
        for (const span2 of [2 ** 23 + 7, 2 ** 24]) {
          for (let i = 0; i < theta.length; i++) {
            const one = theta.subarray(i, i + 1);
            const got = numberFormatMetrics('fp32', one, span2);
            const want = referencePrecision('fp32', one, span2);
            expect(got.blurredPairs, `θ=${one[0]} T=${span2}`).toBe(want.blurredPairs);
            expectClose(got.angleErrorMax, want.angleErrorMax, `θ=${one[0]} T=${span2}`);
          }
        }
      });

    it(
      'equal the reference where the bounds are checked three levels deep (T up to 300,000, intervals of 512·8^j)',
      () => {
        fc.assert(
          fc.property(
            fc.array(fc.double({ min: Math.log(1e-5), max: Math.log(3), noNaN: true }), {
              minLength: 1,
              maxLength: 12,
            }),
            fc.integer({ min: 33_000, max: 300_000 }),
            (logs, span) => {
              const theta = Float64Array.from(logs, Math.exp);
              const fast = similarityScan(theta, span);
              const ref = referenceSimilarity(theta, span);
              expect(fast.complete).toBe(true);
              expect(fast.separationFloorOffset).toBe(ref.separationFloorOffset);
              expect(fast.discriminationSpan).toBe(ref.discriminationSpan);
              expect(fast.separationFloor).toBe(ref.separationFloor);
            },
          ),
          { numRuns: runs(25), seed: 90210 },
        );
      },
      sample ? 120_000 : 600_000,
    );

    it('stops at the work limit, saying so, with the first negative sum still exact when it was reached', () => {
      // One fast pair: no interval of 512 offsets can be passed over, so every block is filled.
      const theta = Float64Array.of(1, 0.9);
      const span = 200_000;
      const ref = referenceSimilarity(theta, span);
      const whole = scanSimilarityRange(theta, 1, span)!;
      expect(whole.complete).toBe(true);
      expect(whole.work).toBeLessThan(MAX_SCAN_WORK);
      const cut = scanSimilarityRange(theta, 1, span, whole.work / 4)!;
      expect(cut.complete).toBe(false);
      expect(cut.work).toBeLessThan(whole.work / 2);
      expect(cut.negative).toBe(ref.discriminationSpan);
      // Nothing found before the stop: no value is claimed.
      const early = scanSimilarityRange(Float64Array.of(1e-6), 1, span, 10)!;
      expect(early.complete).toBe(false);
      expect(early.negative).toBeNull();
    });
  });
}
