/**
 * The similarity curve `S(k) = (1/P) Σ_i cos(k θ'_i)` over k in [1, T), downsampled for a chart:
 * per bucket of consecutive offsets its smallest and largest value and where they fall, so the
 * minima (where the code confuses far tokens with near ones, Men et al. 2024, "Base of RoPE
 * Bounds Context Length", Eq. 9) survive any amount of downsampling.
 *
 * Method, and why it is exact. Every offset is visited, streaming: blocks of offsets are filled
 * with the recurrence of `cosine-sum-blocks.ts` (approximate sums within a proven margin), and an
 * offset is re-evaluated with the reference expression (`cosineSum`, Math.cos per pair in pair
 * order, as `similarity-scan.ts` does) whenever its approximate sum is within the margin of the
 * bucket's running minimum or maximum; no other offset can be a bucket's extreme. So each
 * bucket's min and max equal, bit for bit, what the straightforward loop over k gives, and ties
 * go to the earlier offset. Memory is O(P + buckets + block), never O(T).
 */
import { elementAt } from '../element-at.js';
import {
  COSINE_BLOCK,
  cosineSumMargin,
  fillCosineSums,
  planCosineSums,
} from './cosine-sum-blocks.js';
import { MAX_CURVE_WORK, SCAN_WORK, scanAllowed } from './scan-limits.js';
import { cosineSum } from './similarity-scan.js';

/** Buckets of a curve when the caller asks for none in particular (default: `480`, about one per pixel). */
export const DEFAULT_CURVE_BUCKETS = 480;

/** Offsets k in [start, end] (inclusive) and the extremes of `S(k)` over them. */
export interface SimilarityBucket {
  start: number;
  end: number;
  /** ratio in [-1, 1]: smallest `S(k)` in the bucket. */
  min: number;
  /** offset of `min` (the first, on a tie). */
  minAt: number;
  /** ratio in [-1, 1]: largest `S(k)` in the bucket. */
  max: number;
  maxAt: number;
}

export type BucketSpacing = 'log' | 'linear';

/**
 * offsets: the first offset of each bucket and, last, `T` itself: strictly increasing whole
 * numbers from 1, at most `buckets + 1` of them. `log` spaces the edges geometrically (one offset
 * per bucket near 1, where S falls fastest), `linear` evenly. Null for `T < 2` or `buckets < 1`.
 */
export function bucketEdges(
  span: number,
  buckets: number,
  spacing: BucketSpacing,
): number[] | null {
  if (!Number.isSafeInteger(span) || span < 2 || !Number.isSafeInteger(buckets) || buckets < 1)
    return null;
  const edges = [1];
  let last = 1;
  const logEnd = Math.log(span);
  for (let j = 1; j < buckets; j++) {
    const x = spacing === 'log' ? Math.exp((logEnd * j) / buckets) : 1 + ((span - 1) * j) / buckets;
    const edge = Math.min(span - 1, Math.round(x));
    if (edge > last) {
      edges.push(edge);
      last = edge;
    }
  }
  edges.push(span);
  return edges;
}

/**
 * ratio per bucket: min and max of `S(k)` over each bucket of k in [1, T) (see the file doc);
 * null when `T < 2`, there are no pairs, or the scan is past the bounds of `scan-limits.ts`:
 * the span and pair bounds, or `MAX_CURVE_WORK` counted as the similarity scan counts it (every
 * offset filled, so known before starting, plus each exact re-evaluation).
 * (buckets default: `DEFAULT_CURVE_BUCKETS`; spacing default: `log`)
 */
export function similarityCurve(
  theta: Float64Array | null,
  span: number | null,
  buckets: number = DEFAULT_CURVE_BUCKETS,
  spacing: BucketSpacing = 'log',
  workLimit: number = MAX_CURVE_WORK,
): SimilarityBucket[] | null {
  if (theta === null || theta.length === 0 || span === null || !scanAllowed(theta.length, span))
    return null;
  const P = theta.length;
  // Every offset is filled: past the work limit before starting, the curve is not drawn at all.
  let work = span * (P + SCAN_WORK.offset);
  if (work > workLimit) return null;
  const edges = bucketEdges(span, buckets, spacing);
  if (edges === null) return null;
  const plan = planCosineSums(theta);
  const buf = new Float64Array(COSINE_BLOCK);
  const out: SimilarityBucket[] = [];

  let b = 0;
  let approxMin = Infinity;
  let approxMax = -Infinity;
  let minSum = Infinity;
  let maxSum = -Infinity;
  let minAt = 1;
  let maxAt = 1;
  const close = () => {
    out.push({
      start: elementAt(edges, b),
      end: elementAt(edges, b + 1) - 1,
      min: minSum / P,
      minAt,
      max: maxSum / P,
      maxAt,
    });
    b += 1;
    approxMin = Infinity;
    approxMax = -Infinity;
    minSum = Infinity;
    maxSum = -Infinity;
  };

  for (let k0 = 1; k0 < span; k0 += COSINE_BLOCK) {
    const n = Math.min(COSINE_BLOCK, span - k0);
    fillCosineSums(plan, k0, n, buf);
    const margin = cosineSumMargin(plan, k0, n);
    for (let j = 0; j < n; j++) {
      const k = k0 + j;
      if (k >= elementAt(edges, b + 1)) close();
      const v = elementAt(buf, j);
      const nearMin = v <= approxMin + margin;
      const nearMax = v >= approxMax - margin;
      if (!nearMin && !nearMax) continue;
      work += SCAN_WORK.exactPair * P;
      if (work > workLimit) return null;
      const exact = cosineSum(theta, k);
      if (nearMin) {
        if (exact < minSum) {
          minSum = exact;
          minAt = k;
        }
        if (v < approxMin) approxMin = v;
      }
      if (nearMax) {
        if (exact > maxSum) {
          maxSum = exact;
          maxAt = k;
        }
        if (v > approxMax) approxMax = v;
      }
    }
  }
  close();
  return out;
}
