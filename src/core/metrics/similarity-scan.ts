/**
 * Similarity of a code with itself at offset k, `S(k) = (1/P) Σ_i cos(k θ'_i)`, scanned over
 * every k in [1, T): `separationFloor`, `separationFloorOffset` (METRICS.md) and
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
 * negative, none can be that either. The same results, with the bounds checked first on
 * intervals of 8B offsets and then on each block; for typical codes (fast pairs few next to the
 * slow ones that keep the sum high near k = 1) nearly every block is passed over.
 */
import { cosineSumBounds } from './cosine-sum-bounds.js';
import { scanAllowed } from './scan-limits.js';

const BLOCK = 512;
/** Offsets per interval whose bounds are checked before its blocks'. */
const SPAN_OF_BOUNDS = 8 * BLOCK;
const EPS = 2 ** -53;

/** sum: `Σ_i cos(k θ'_i)` in pair order, the reference expression. */
export function cosineSum(theta: Float64Array, k: number): number {
  let s = 0;
  for (let i = 0; i < theta.length; i++) s += Math.cos(k * theta[i]);
  return s;
}

/** 0..2: `sqrt(2 (1 - S(k)))` with `S(k) = cosineSum / P` (METRICS.md, separationFloor). */
export function separationAt(theta: Float64Array, k: number): number {
  return Math.sqrt(2 * (1 - cosineSum(theta, k) / theta.length));
}

/** The scan over one range of offsets: floor, its smallest offset, first negative sum. */
export interface SimilarityPartial {
  floor: number;
  offset: number;
  negative: number | null;
}

export interface SimilarityResult {
  separationFloor: number | null;
  separationFloorOffset: number | null;
  discriminationSpan: number | null;
}

/**
 * Scans offsets k in [kStart, kEnd) (so two workers can split a span and `mergeSimilarity` the
 * halves); null for an empty range or no pairs.
 */
export function scanSimilarityRange(theta: Float64Array, kStart: number, kEnd: number): SimilarityPartial | null {
  const P = theta.length;
  if (P === 0 || !(kEnd > kStart) || !(kStart >= 1)) return null;
  const a2 = new Float64Array(P);
  const cT = new Float64Array(P);
  const sT = new Float64Array(P);
  let sumTheta = 0;
  for (let i = 0; i < P; i++) {
    cT[i] = Math.cos(theta[i]);
    sT[i] = Math.sin(theta[i]);
    a2[i] = 2 * cT[i];
    sumTheta += theta[i];
  }
  const buf = new Float64Array(BLOCK);
  const seedNow = new Float64Array(P);
  const seedBefore = new Float64Array(P);
  let bestApprox = -Infinity;
  let bestFloor = Infinity;
  let bestK = -1;
  let bestSum = -Infinity;
  let negative: number | null = null;
  // Nothing in [from, to] can change the result: every reference sum is below the best one, and
  // none is negative or a negative one was found already.
  const passes = (from: number, to: number): boolean => {
    if (bestK < 0) return false;
    const bounds = cosineSumBounds(theta, from, to);
    return bounds.upper < bestSum && (negative !== null || bounds.lower >= 0);
  };
  for (let k0 = kStart; k0 < kEnd; k0 += BLOCK) {
    const n = Math.min(BLOCK, kEnd - k0);
    if ((k0 - kStart) % SPAN_OF_BOUNDS === 0) {
      const to = Math.min(k0 + SPAN_OF_BOUNDS, kEnd) - 1;
      if (to > k0 + n - 1 && passes(k0, to)) {
        k0 = to + 1 - BLOCK;
        continue;
      }
    }
    if (passes(k0, k0 + n - 1)) continue;
    fillBlock(theta, a2, cT, sT, k0, n, buf, seedNow, seedBefore);
    const margin = 2.5 * EPS * (P * (4 * n * n + 80 * n + 2) + 2 * (k0 + n) * sumTheta + 2 * P * P + 4 * P);
    let threshold = bestApprox - margin;
    for (let j = 0; j < n; j++) {
      const v = buf[j];
      if (v >= threshold) {
        const k = k0 + j;
        const exact = cosineSum(theta, k);
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
        if (v < -margin || cosineSum(theta, k) < 0) negative = k;
      }
    }
  }
  return { floor: bestFloor, offset: bestK, negative };
}

/** Combines two scanned ranges: the lower floor (the smaller offset on a tie), the first negative. */
export function mergeSimilarity(a: SimilarityPartial, b: SimilarityPartial): SimilarityPartial {
  const takeA = a.floor < b.floor || (a.floor === b.floor && a.offset < b.offset);
  const negative = a.negative === null ? b.negative : b.negative === null ? a.negative : Math.min(a.negative, b.negative);
  return { floor: takeA ? a.floor : b.floor, offset: takeA ? a.offset : b.offset, negative };
}

/**
 * 0..2, tokens, tokens: `separationFloor`, `separationFloorOffset`, `discriminationSpan` over
 * k in [1, T) (METRICS.md); all null when `T < 2`, there are no pairs, or the scan is past
 * `MAX_SCAN_SPAN` / `MAX_SCAN_ELEMENTS`.
 */
export function similarityScan(theta: Float64Array | null, span: number | null): SimilarityResult {
  const none: SimilarityResult = { separationFloor: null, separationFloorOffset: null, discriminationSpan: null };
  if (theta === null || span === null || span < 2 || !scanAllowed(theta.length, span)) return none;
  const r = scanSimilarityRange(theta, 1, span);
  if (r === null) return none;
  return { separationFloor: r.floor, separationFloorOffset: r.offset, discriminationSpan: r.negative };
}

// 2π = A + B + C + D: A and B have 24 significant bits, so n·A and n·B are exact for n < 2^29;
// A + B + C is exactly the binary64 value 2·Math.PI, and D = 2π - 2·Math.PI = 2(π - Math.PI)
// (π - Math.PI = 1.2246467991473531772e-16) carries the rest, so the turn itself is off by
// under 1e-31 per turn instead of 2.4e-16.
const TURN_A = Math.fround(2 * Math.PI);
const TURN_B = Math.fround(2 * Math.PI - TURN_A);
const TURN_C = 2 * Math.PI - TURN_A - TURN_B;
const TURN_D = 2.4492935982947064e-16;
const MAX_TURNS = 2 ** 29;

/**
 * radians: `x - n·2π` for the nearest whole n (Cody–Waite reduction), so the seeds avoid the slow
 * large-argument path of Math.cos. `x - n·A` is exact (Sterbenz), the three later steps add
 * under 20ε for a result within π. Arguments past `2^29` turns are left to Math.cos.
 */
function reduceTurns(x: number): number {
  if (!(x > 1e5)) return x;
  const n = Math.round(x / (2 * Math.PI));
  if (n >= MAX_TURNS) return x;
  return x - n * TURN_A - n * TURN_B - n * TURN_C - n * TURN_D;
}

/**
 * Fills buf[j] with an approximation of Σ_i cos((k0 + j) θ_i), j < n (error bound above).
 * Eight, then four, then single pairs per pass: independent recurrences overlap in the CPU.
 */
function fillBlock(
  theta: Float64Array,
  a2: Float64Array,
  cT: Float64Array,
  sT: Float64Array,
  k0: number,
  n: number,
  buf: Float64Array,
  seedNow: Float64Array,
  seedBefore: Float64Array,
): void {
  const P = theta.length;
  for (let i = 0; i < P; i++) {
    // cos(x0) and cos(x0 - θ) = cos(x0)cos(θ) + sin(x0)sin(θ), one argument x0 = fl(k0 θ)
    const x = reduceTurns(k0 * theta[i]);
    const c = Math.cos(x);
    seedNow[i] = c;
    seedBefore[i] = c * cT[i] + Math.sin(x) * sT[i];
  }
  buf.fill(0, 0, n);
  let i = 0;
  for (; i + 8 <= P; i += 8) {
    const a0 = a2[i], a1 = a2[i + 1], a2_ = a2[i + 2], a3 = a2[i + 3];
    const a4 = a2[i + 4], a5 = a2[i + 5], a6 = a2[i + 6], a7 = a2[i + 7];
    let q0 = seedNow[i], q1 = seedNow[i + 1], q2 = seedNow[i + 2], q3 = seedNow[i + 3];
    let q4 = seedNow[i + 4], q5 = seedNow[i + 5], q6 = seedNow[i + 6], q7 = seedNow[i + 7];
    let p0 = seedBefore[i], p1 = seedBefore[i + 1], p2 = seedBefore[i + 2], p3 = seedBefore[i + 3];
    let p4 = seedBefore[i + 4], p5 = seedBefore[i + 5], p6 = seedBefore[i + 6], p7 = seedBefore[i + 7];
    for (let j = 0; j < n; j++) {
      buf[j] += q0 + q1 + (q2 + q3) + (q4 + q5 + (q6 + q7));
      const r0 = a0 * q0 - p0, r1 = a1 * q1 - p1, r2 = a2_ * q2 - p2, r3 = a3 * q3 - p3;
      const r4 = a4 * q4 - p4, r5 = a5 * q5 - p5, r6 = a6 * q6 - p6, r7 = a7 * q7 - p7;
      p0 = q0; q0 = r0; p1 = q1; q1 = r1; p2 = q2; q2 = r2; p3 = q3; q3 = r3;
      p4 = q4; q4 = r4; p5 = q5; q5 = r5; p6 = q6; q6 = r6; p7 = q7; q7 = r7;
    }
  }
  for (; i + 4 <= P; i += 4) {
    const a0 = a2[i], a1 = a2[i + 1], a2_ = a2[i + 2], a3 = a2[i + 3];
    let q0 = seedNow[i], q1 = seedNow[i + 1], q2 = seedNow[i + 2], q3 = seedNow[i + 3];
    let p0 = seedBefore[i], p1 = seedBefore[i + 1], p2 = seedBefore[i + 2], p3 = seedBefore[i + 3];
    for (let j = 0; j < n; j++) {
      buf[j] += q0 + q1 + (q2 + q3);
      const r0 = a0 * q0 - p0, r1 = a1 * q1 - p1, r2 = a2_ * q2 - p2, r3 = a3 * q3 - p3;
      p0 = q0; q0 = r0; p1 = q1; q1 = r1; p2 = q2; q2 = r2; p3 = q3; q3 = r3;
    }
  }
  for (; i < P; i++) {
    const a = a2[i];
    let q = seedNow[i];
    let p = seedBefore[i];
    for (let j = 0; j < n; j++) {
      buf[j] += q;
      const r = a * q - p;
      p = q;
      q = r;
    }
  }
}
