import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { geometricFrequencies } from '../../src/core/metrics/frequencies.js';
import { pairStatuses } from '../../src/core/metrics/pair-status.js';
import { bucketEdges, similarityCurve } from '../../src/core/metrics/similarity-curve.js';
import { cosineSum, similarityScan } from '../../src/core/metrics/similarity-scan.js';
import { exposedPairs, unturnedPairs } from '../../src/core/metrics/wavelengths.js';
import { scaleFrequencies } from '../../src/core/metrics/context-scaling.js';
import { cpuClock } from '../support/cpu-time.js';

/** The straightforward loop: every k in the bucket, the reference expression, min and max. */
function reference(theta: Float64Array, span: number, buckets: number, spacing: 'log' | 'linear') {
  const edges = bucketEdges(span, buckets, spacing)!;
  const out = [];
  for (let b = 0; b + 1 < edges.length; b++) {
    let min = Infinity;
    let max = -Infinity;
    let minAt = 0;
    let maxAt = 0;
    for (let k = edges[b]!; k < edges[b + 1]!; k++) {
      const s = cosineSum(theta, k) / theta.length;
      if (s < min) {
        min = s;
        minAt = k;
      }
      if (s > max) {
        max = s;
        maxAt = k;
      }
    }
    out.push({ start: edges[b], end: edges[b + 1]! - 1, min, minAt, max, maxAt });
  }
  return out;
}

describe('similarityCurve(theta, span, buckets, spacing)', () => {
  it('is not drawn past the work limit: refused before starting when filling every offset would pass it, or once exact re-evaluations do', () => {
    const theta = geometricFrequencies(10000, 2)!;
    const cpu = cpuClock();
    // One pair over 2^31 - 1 offsets: (1 + 16) units per offset, far past MAX_SCAN_WORK (2^30).
    expect(similarityCurve(theta, 2 ** 31 - 1)).toBeNull();
    expect(cpu(), 'ms of CPU time').toBeLessThan(50);
    const span = 20000;
    const drawn = similarityCurve(theta, span, 64, 'log');
    expect(drawn).not.toBeNull();
    // Just above the fill cost: the exact re-evaluations of the bucket extremes push it over.
    expect(similarityCurve(theta, span, 64, 'log', span * 17 + 200 * 3)).toBeNull();
    expect(similarityCurve(theta, span, 64, 'log', span * 17 + 200 * span)).toEqual(drawn);
  });

  it("gives exactly the straightforward loop's min and max per bucket (bit for bit, ties to the earlier k)", () => {
    for (const [base, d, span, buckets, spacing] of [
      [10000, 128, 20000, 64, 'log'],
      [500, 64, 9000, 37, 'linear'],
      [1e6, 128, 3000, 400, 'log'],
    ] as const) {
      const theta = geometricFrequencies(base, d)!;
      expect(similarityCurve(theta, span, buckets, spacing)).toEqual(
        reference(theta, span, buckets, spacing),
      );
    }
  });

  it('agrees with the loop on random codes and spans (property)', () => {
    fc.assert(
      fc.property(
        fc.double({ min: 50, max: 1e7, noNaN: true }),
        fc.integer({ min: 1, max: 32 }),
        fc.integer({ min: 2, max: 3000 }),
        fc.integer({ min: 1, max: 50 }),
        (base, pairs, span, buckets) => {
          const theta = geometricFrequencies(base, 2 * pairs)!;
          expect(similarityCurve(theta, span, buckets, 'log')).toEqual(
            reference(theta, span, buckets, 'log'),
          );
        },
      ),
      { numRuns: 40 },
    );
  });

  it('agrees with the exact scan: the largest bucket maximum gives the separation floor, the first negative minimum the discrimination span', () => {
    const theta = geometricFrequencies(10000, 128)!;
    const curve = similarityCurve(theta, 65536, 200)!;
    const scan = similarityScan(theta, 65536);
    const highest = Math.max(...curve.map((b) => b.max));
    // separationFloor = min_k sqrt(2(1 - S(k))) (docs/metrics.md), so it is the largest S: the same number through the same expression.
    expect(Math.sqrt(2 * (1 - highest))).toBe(scan.separationFloor);
    const first = curve.find((b) => b.min < 0)!;
    expect(scan.discriminationSpan).toBeGreaterThanOrEqual(first.start);
    expect(scan.discriminationSpan).toBeLessThanOrEqual(first.minAt);
  });

  it('covers every offset from 1 to T - 1 once, in at most the buckets asked for', () => {
    const curve = similarityCurve(geometricFrequencies(10000, 16), 100000, 480)!;
    expect(curve.length).toBeLessThanOrEqual(480);
    expect(curve[0]!.start).toBe(1);
    expect(curve[curve.length - 1]!.end).toBe(99999);
    for (let i = 1; i < curve.length; i++) expect(curve[i]!.start).toBe(curve[i - 1]!.end + 1);
  });

  it.each([
    [null, 100],
    [new Float64Array(0), 100],
    [new Float64Array([0.1]), 1],
    [new Float64Array([0.1]), null],
    [new Float64Array([0.1]), 2 ** 40],
  ])('is null for theta %p and span %p', (theta, span) => {
    expect(similarityCurve(theta as Float64Array | null, span)).toBeNull();
  });

  it('is null for no buckets', () => {
    expect(similarityCurve(new Float64Array([0.1]), 100, 0)).toBeNull();
    expect(bucketEdges(100, Number.NaN, 'log')).toBeNull();
  });
});

describe('pairStatuses(theta, scaled, trained, span)', () => {
  it('tallies to exposedPairs and, by wavelength, to unturnedPairs (docs/metrics.md)', () => {
    const theta = geometricFrequencies(1e6, 128)!;
    const scaling = {
      kind: 'yarn' as const,
      factor: 4,
      originalSpan: 32768,
      alpha: 1,
      beta: 32,
      low: 1,
      high: 4,
    };
    const scaled = scaleFrequencies(theta, 1e6, 128, scaling, 262144, 32768)!;
    const pairs = pairStatuses(theta, scaled, 32768, 262144)!;
    expect(pairs.filter((p) => p.status === 'exposed').length).toBe(
      exposedPairs(theta, scaled, 32768, 262144),
    );
    expect(pairs.filter((p) => p.wavelength > 32768).length).toBe(unturnedPairs(scaled, 32768));
    // Vaswani et al. 2017 §3.5: the fastest pair's wavelength is 2π.
    expect(pairs[0]!.wavelength).toBeCloseTo(2 * Math.PI, 12); // 1e-12: θ_0 = base^0 = 1 exactly, one division
  });

  it('is null for mismatched arrays or spans that are not positive', () => {
    const t = new Float64Array([1, 0.1]);
    expect(pairStatuses(t, new Float64Array([1]), 10, 10)).toBeNull();
    expect(pairStatuses(t, t, 0, 10)).toBeNull();
    expect(pairStatuses(t, t, 10, Number.NaN)).toBeNull();
  });
});
