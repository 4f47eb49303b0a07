/**
 * The straightforward TypeScript baseline: the obvious loops over every (position, pair) with
 * Math.cos and the rounding function per element. It is the same code the tests use as their
 * reference (test/metrics/reference.ts), so the benchmark and the tests judge by one definition.
 */
import type { FloatFormat } from '../src/core/model.js';
import { referencePrecision, referenceSimilarity } from '../test/metrics/reference.js';
import type { ReferencePrecision, ReferenceSimilarity } from '../test/metrics/reference.js';

export interface ScanResult extends ReferenceSimilarity {
  precision: Record<FloatFormat, ReferencePrecision>;
}

/** Every scanned positional metric by the obvious loops. */
export function straightforwardScan(theta: Float64Array, span: number): ScanResult {
  const similarity = referenceSimilarity(theta, span);
  return {
    ...similarity,
    precision: {
      fp32: referencePrecision('fp32', theta, span),
      bf16: referencePrecision('bf16', theta, span),
      fp16: referencePrecision('fp16', theta, span),
    },
  };
}
