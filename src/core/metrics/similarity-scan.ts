/**
 * Similarity of a code with itself at offset k, `S(k) = (1/P) Σ_i cos(k θ'_i)`, scanned over
 * every k in [1, T): `separationFloor`, `separationFloorOffset` (docs/metrics.md) and
 * `discriminationSpan`, the first k with `Σ_i cos(k θ'_i) < 0` (Men et al. 2024, "Base of RoPE
 * Bounds Context Length", Thm 1, Eqs. 9–10).
 *
 * Method, and why it is exact. The definition is the straightforward loop over k and i with
 * Math.cos(k * θ) summed in pair order, `sqrt(2 (1 - sum/P))`; the results here are identical to
 * that loop, not close to it. Blocks of B = 512 offsets are filled pair by pair with the Chebyshev
 * recurrence `c_{j+1} = 2cos(θ) c_j - c_{j-1}` (one multiply, one subtract per element; eight
 * pairs interleaved so the chains overlap), re-seeded exactly at every block start from
 * Math.cos/Math.sin of `k0 θ` (reduced by whole turns first, adding under 20ε, because large
 * arguments take a slow path). With unit roundoff ε = 2^-53 and `|U_n(cos θ)| <= n + 1`, seeds
 * within 22ε and 56ε and local errors of 8ε per step (4ε of them from `2cos θ`) leave a
 * recurrence value after n <= B steps within ε(4n² + 78n) of the cosine of the seeded argument;
 * the seed argument and the reference's own argument `fl(kθ)` are both within `ε kθ` of `kθ`;
 * the two pair-order sums add `P² ε` each. So the approximate sum at k differs from the
 * reference sum by at most
 *   bound(k) = ε (P (4B² + 80B + 2) + 2 k Σθ + 2P² + 4P)   (≈ 1e-8 for P = 64, B = 512, k = 2^20).
 * Decisions are then made with a margin of 2.5 bound (two approximate sums are compared, and a
 * quarter of the bound each is spare): an offset is re-evaluated exactly (the
 * reference expression, Math.cos per pair) when its approximate sum is within the margin of the
 * best approximate sum seen so far, or within the margin of zero while no negative sum has been
 * found; every other offset provably cannot change the floor, its offset (ties go to the
 * earlier k, which was already evaluated) or the first negative sum. Memory is O(P + B), never
 * O(T).
 *
 * Whole intervals are passed over unfilled once an offset has been evaluated: when the bounds of
 * `cosine-sum-bounds.ts` (which hold for the reference expression itself, rounding included) put
 * every sum of an interval below the best reference sum so far, no offset in it can lower the
 * floor or take its offset, and when the first negative sum is found or the lower bound is not
 * negative, none can be that either. The same results, with the bounds checked top down on
 * intervals of B 8^j offsets (each split into eight only when its bounds fail, visited in order of
 * k) down to single blocks; for typical codes (fast pairs few next to the slow ones that keep the
 * sum high near k = 1) nearly every block is passed over, most of them inside a larger interval.
 */
import { elementAt } from '../element-at.js';
import { cosineSumBounds } from './cosine-sum-bounds.js';
import {
  COSINE_BLOCK,
  cosineSumMargin,
  fillCosineSums,
  planCosineSums,
} from './cosine-sum-blocks.js';
import { MAX_SCAN_WORK, SCAN_WORK, scanAllowed } from './scan-limits.js';

const BLOCK = COSINE_BLOCK;
/** Parts per interval: an interval of BLOCK FANOUT^j offsets splits into FANOUT equal parts. */
const FANOUT = 8;

/** sum: `Σ_i cos(k θ'_i)` in pair order, the reference expression. */
export function cosineSum(theta: Float64Array, k: number): number {
  let s = 0;
  for (let i = 0; i < theta.length; i++) s += Math.cos(k * elementAt(theta, i));
  return s;
}

/** The scan over one range of offsets: floor, its smallest offset, first negative sum. */
export interface SimilarityPartial {
  floor: number;
  offset: number;
  negative: number | null;
  /** Work spent, in the units of `SCAN_WORK` (scan-limits.ts). */
  work: number;
  /** False when the scan stopped at the work limit: `floor` and `offset` are then not the minimum. */
  complete: boolean;
}

export interface SimilarityResult {
  separationFloor: number | null;
  separationFloorOffset: number | null;
  discriminationSpan: number | null;
  /** False when the scan stopped at its work limit (`MAX_SCAN_WORK`) before the end of the span. */
  complete: boolean;
  /** Work spent, in the units of `SCAN_WORK` (0 when nothing was scanned). */
  work: number;
}

/**
 * Scans offsets k in [kStart, kEnd); null for an empty range or no pairs.
 */
export function scanSimilarityRange(
  theta: Float64Array,
  kStart: number,
  kEnd: number,
  workLimit = MAX_SCAN_WORK,
): SimilarityPartial | null {
  const P = theta.length;
  if (P === 0 || !(kEnd > kStart) || !(kStart >= 1)) return null;
  const plan = planCosineSums(theta);
  const buf = new Float64Array(BLOCK);
  let bestApprox = -Infinity;
  let bestFloor = Infinity;
  let bestK = -1;
  let bestSum = -Infinity;
  let negative: number | null = null;
  let work = 0;
  let complete = true;
  const exactSum = (k: number): number => {
    work += SCAN_WORK.exactPair * P;
    return cosineSum(theta, k);
  };
  // Nothing in [from, to] can change the result: every reference sum is below the best one, and
  // none is negative or a negative one was found already.
  const passes = (from: number, to: number): boolean => {
    if (bestK < 0) return false;
    work += SCAN_WORK.boundPair * P;
    const bounds = cosineSumBounds(theta, from, to);
    return bounds.upper < bestSum && (negative !== null || bounds.lower >= 0);
  };
  const scanBlock = (k0: number, n: number): void => {
    work += n * (P + SCAN_WORK.offset);
    fillCosineSums(plan, k0, n, buf);
    const margin = cosineSumMargin(plan, k0, n);
    let threshold = bestApprox - margin;
    for (let j = 0; j < n; j++) {
      const v = elementAt(buf, j);
      if (v >= threshold) {
        const k = k0 + j;
        const exact = exactSum(k);
        const f = Math.sqrt(2 * (1 - exact / P));
        if (f < bestFloor) {
          bestFloor = f;
          bestK = k;
          bestSum = exact;
        }
        if (v > bestApprox) {
          bestApprox = v;
          threshold = v - margin;
        }
        if (negative === null && exact < 0) negative = k;
      } else if (negative === null && v < margin) {
        const k = k0 + j;
        if (v < -margin || exactSum(k) < 0) negative = k;
      }
    }
  };
  // Intervals of BLOCK FANOUT^j offsets, visited in order of k so every decision sees what a
  // plain scan would have seen; an interval's parts are looked at only when its bounds fail.
  // Past the work limit nothing more is visited and the result says it is incomplete.
  const visit = (from: number, size: number): void => {
    if (!complete) return;
    if (work > workLimit) {
      complete = false;
      return;
    }
    const to = Math.min(from + size, kEnd);
    if (passes(from, to - 1)) return;
    if (size === BLOCK) {
      scanBlock(from, to - from);
      return;
    }
    const part = size / FANOUT;
    for (let k = from; k < to; k += part) visit(k, part);
  };
  let size = BLOCK;
  while (size < kEnd - kStart) size *= FANOUT;
  visit(kStart, size);
  return { floor: bestFloor, offset: bestK, negative, work, complete };
}

/**
 * 0..2, tokens, tokens: `separationFloor`, `separationFloorOffset`, `discriminationSpan` over
 * k in [1, T) (docs/metrics.md); all null when `T < 2`, there are no pairs, or the scan is past
 * `MAX_SCAN_SPAN` / `MAX_SCAN_ELEMENTS`. When the scan stops at `workLimit` (default:
 * `MAX_SCAN_WORK`) the floor and
 * its offset are null and `complete` is false; a first negative sum found before the stop is
 * still exact (offsets are decided in order), otherwise it is null too.
 */
export function similarityScan(
  theta: Float64Array | null,
  span: number | null,
  workLimit: number = MAX_SCAN_WORK,
): SimilarityResult {
  const none: SimilarityResult = {
    separationFloor: null,
    separationFloorOffset: null,
    discriminationSpan: null,
    complete: true,
    work: 0,
  };
  if (theta === null || span === null || span < 2 || !scanAllowed(theta.length, span)) return none;
  const r = scanSimilarityRange(theta, 1, span, workLimit);
  if (r === null) return none;
  if (!r.complete)
    return { ...none, discriminationSpan: r.negative, complete: false, work: r.work };
  return {
    separationFloor: r.floor,
    separationFloorOffset: r.offset,
    discriminationSpan: r.negative,
    complete: true,
    work: r.work,
  };
}
