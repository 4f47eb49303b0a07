/**
 * The number-format block for one format D (docs/metrics.md, `precision.<D>`), assembled from the
 * position and angle rounding scans.
 */
import type { FloatFormat } from '../model.js';
import type { PrecisionMetrics } from './types.js';
import { angleErrorMax, blurredPairs, overflowPosition } from './angle-rounding.js';
import { positionExactLimit } from './float-format.js';
import { collidingPositions } from './position-rounding.js';
import { scanAllowed } from './scan-limits.js';
import { isCount } from './sizes.js';

/** The block with every metric null (learned, ALiBi and position-free codes, docs/metrics.md). */
export const NULL_PRECISION: Readonly<PrecisionMetrics> = Object.freeze({
  positionExactLimit: null,
  collidingPositions: null,
  angleErrorMax: null,
  overflowPosition: null,
  blurredPairs: null,
});

/**
 * `precision.<D>` for scaled frequencies `θ'` over span `T`: all null without frequencies; only
 * `positionExactLimit` without a valid span; `angleErrorMax` null when anything overflows or the
 * span is past the scan bounds (`MAX_SCAN_SPAN`).
 */
export function numberFormatMetrics(
  format: FloatFormat,
  theta: Float64Array | null,
  span: number | null,
): PrecisionMetrics {
  if (theta === null) return { ...NULL_PRECISION };
  const limit = positionExactLimit(format);
  if (!isCount(span)) {
    return { ...NULL_PRECISION, positionExactLimit: limit };
  }
  const overflow = overflowPosition(format, theta, span);
  return {
    positionExactLimit: limit,
    collidingPositions: collidingPositions(format, span),
    angleErrorMax:
      overflow === null && scanAllowed(theta.length, span)
        ? angleErrorMax(format, theta, span)
        : null,
    overflowPosition: overflow,
    blurredPairs:
      span - 1 > limit || scanAllowed(theta.length, span)
        ? blurredPairs(format, theta, span)
        : null,
  };
}
