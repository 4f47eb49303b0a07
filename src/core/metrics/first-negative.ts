/**
 * The first offset at which a code's cosine sum turns negative, stopping there:
 * `discriminationSpan` (docs/metrics.md; Men et al. 2024, "Base of RoPE Bounds Context Length",
 * Thm 1, Eqs. 9–10) without the floor scan that `similarity-scan.ts` also runs, so a search
 * over bases pays only up to each base's first negative offset.
 *
 * Exact, as `similarity-scan.ts` is: blocks are filled by the recurrence of
 * `cosine-sum-blocks.ts`; an approximate sum below minus the margin is negative for sure, one
 * above the margin positive for sure, and one within the margin is decided by the reference
 * expression (`cosineSum`). So the result is the first k with `cosineSum(θ, k) < 0`.
 */
import { elementAt } from '../element-at.js';
import {
  COSINE_BLOCK,
  cosineSumMargin,
  fillCosineSums,
  planCosineSums,
} from './cosine-sum-blocks.js';
import { cosineSum } from './similarity-scan.js';

/** The offset found (null when none in range) and the (pair, offset) elements the scan touched. */
export interface FirstNegative {
  offset: number | null;
  elements: number;
}

/**
 * tokens: the smallest k in [kStart, kEnd) with `Σ_i cos(k θ_i) < 0`, null when none; also the
 * work done. Null offset for an empty range or no pairs.
 */
export function firstNegativeOffset(
  theta: Float64Array,
  kStart: number,
  kEnd: number,
): FirstNegative {
  const P = theta.length;
  if (P === 0 || !(kEnd > kStart) || !(kStart >= 1)) return { offset: null, elements: 0 };
  const plan = planCosineSums(theta);
  const buf = new Float64Array(COSINE_BLOCK);
  let elements = 0;
  for (let k0 = kStart; k0 < kEnd; k0 += COSINE_BLOCK) {
    const n = Math.min(COSINE_BLOCK, kEnd - k0);
    fillCosineSums(plan, k0, n, buf);
    elements += n * P;
    const margin = cosineSumMargin(plan, k0, n);
    for (let j = 0; j < n; j++) {
      const v = elementAt(buf, j);
      if (v >= margin) continue;
      if (v < -margin || cosineSum(theta, k0 + j) < 0) return { offset: k0 + j, elements };
    }
  }
  return { offset: null, elements };
}
