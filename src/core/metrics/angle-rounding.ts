/**
 * Rotation angles rounded into a number format, `fl_D(fl_D(p) fl_D(θ'_i))`, the product formed
 * exactly in binary64 (both factors have at most 24 significant bits) and rounded once
 * (docs/metrics.md, number formats: `angleErrorMax`, `overflowPosition`, `blurredPairs`).
 *
 * Method, and why it is exact. The definitions visit every (p, i); these functions return what
 * that loop returns (counts identical, the maximum bit for bit) while skipping provably
 * irrelevant elements. With m significant bits in D, positions come in runs of equal `fl_D(p)`:
 * single positions below `2^m`, runs of up to `2^(e-m+1)` positions in the binade `[2^e, 2^(e+1))`. Over a run the rounded angle `c` is constant and
 * `c - fl(pθ)` is monotone in p, so its largest magnitude sits at an end of the run. Runs are
 * visited from the top of the span down, and the scan stops once
 *   bound(v) = spacing_D(v t)/2 + v |t - θ| + (run half-width) θ   (+ binary64 slack)
 * falls below the best error found: every term is non-decreasing in the position, so no lower
 * run can do better. Inside a binade `[2^e, 2^(e+1))` the runs have one shape (v = k s with
 * s = 2^(e-m+1); even k holds [v - s/2, v + s/2], odd k the open interval), so they are walked
 * with the spacing held fixed; the run cut by the span and the bottom run v = 2^e, whose lower
 * half is narrower, are visited on their own. When t is a power of two every product `v t` is
 * exact and the rounding term is 0; when moreover t = θ every error is exactly
 * `|fl(p) - p| θ`, and the walk stops as soon as the best error reaches the half-width.
 * Pairs are visited from the largest frequency down, whose errors are largest, so the first
 * pair's maximum prunes the others early. Below `2^m` (fp32: the whole of `T <= 2^24`) the run
 * ends coincide and a tight descending loop with Math.fround checks the bound once per chunk.
 * Blurred pairs: in a binade of the angle with spacing u, neighbouring angles `x`, `x + t`
 * cannot round together when `t >= u`, and must when `t < u/2` and the angles cover `2u`
 * (an open rounding interval of width u then holds two of them); only the remaining binades
 * are scanned, stopping at the first collision.
 */
import type { FloatFormat } from '../model.js';
import {
  binaryExponent,
  minNormalExponent,
  roundToFormat,
  significantBits,
  spacingAt,
} from './float-format.js';
import { positionOverflowStart } from './position-rounding.js';

const CHUNK = 1024;
const SLACK = 2 ** -50;

/** True when `fl_D(fl_D(p) t)` is not finite (overflow, or `0 · ∞`). */
function angleOverflows(p: number, t: number, format: FloatFormat): boolean {
  return !Number.isFinite(roundToFormat(roundToFormat(p, format) * t, format));
}

/**
 * token: `overflowPosition`, first p in [0, T) whose `fl_D(p)` or any angle is not finite;
 * null when none is (docs/metrics.md). Angles are monotone in p, so each pair is a binary search.
 */
export function overflowPosition(
  format: FloatFormat,
  theta: Float64Array,
  span: number,
): number | null {
  const start = positionOverflowStart(format);
  let first = start < span ? start : span;
  for (const th of theta) {
    const t = roundToFormat(th, format);
    if (!Number.isFinite(t)) return 0;
    if (first === 0 || !angleOverflows(first - 1, t, format)) continue;
    let lo = 0;
    let hi = first - 1; // angleOverflows(hi) holds
    while (lo < hi) {
      const mid = Math.floor((lo + hi) / 2);
      if (angleOverflows(mid, t, format)) hi = mid;
      else lo = mid + 1;
    }
    first = lo;
  }
  return first < span ? first : null;
}

/** bits: width of the odd significand of a positive finite `t` (1 for powers of two). */
function significandWidth(t: number): number {
  let m = t / 2 ** binaryExponent(t);
  let width = 1;
  while (m !== Math.floor(m)) {
    m *= 2;
    width++;
  }
  return width;
}

/**
 * True when every product `p t`, `p <= top`, fits in `bits` significant bits: a power of two
 * adds no bits to p, any other odd significand M adds at most its width.
 */
function productsExact(t: number, top: number, bits: number): boolean {
  if (t === 0) return true;
  const width = significandWidth(t);
  return bitLength(top) + (width === 1 ? 0 : width) <= bits;
}

/** bits: `ceil(log2(n + 1))`, the width of a whole number n. */
function bitLength(n: number): number {
  return n < 1 ? 0 : binaryExponent(n) + 1;
}

/**
 * radians: `angleErrorMax`, `max |fl_D(fl_D(p) fl_D(θ'_i)) - p θ'_i|` over p in [0, T) and all
 * pairs (docs/metrics.md). The caller checks `overflowPosition` first: with any overflow the metric is
 * null. Pairs are independent, so a caller may split `theta` and take the larger result.
 */
export function angleErrorMax(format: FloatFormat, theta: Float64Array, span: number): number {
  // Largest frequencies first: their errors are the largest, so their maximum prunes the others early.
  const order = Float64Array.from(theta).sort().reverse();
  let best = 0;
  for (const th of order) best = pairAngleError(format, th, span, best);
  return best;
}

function pairAngleError(format: FloatFormat, th: number, span: number, best: number): number {
  const m = significantBits(format);
  const exactLimit = 2 ** m;
  const t = roundToFormat(th, format);
  // Every angle rounds to 0: the error p θ grows with p, so the last position holds the maximum.
  if (t === 0) return Math.max(best, Math.abs(0 - (span - 1) * th));
  const d = Math.abs(t - th);
  let p = span - 1;
  if (p >= exactLimit) {
    // The run holding the last position may be cut by the span or round up into the next binade.
    const first = visitRun(format, t, th, d, p, best);
    if (first < 0) return best;
    best = first;
    p = runStart(format, p) - 1;
    for (let e = binaryExponent(Math.max(p, 1)); p >= exactLimit; e--) {
      const runs = binadeRuns(format, t, th, d, e, p, best);
      if (runs.done) return runs.best;
      best = runs.best;
      // The bottom run of the binade, v = 2^e (even), has the narrower spacing below it; its last
      // position is 2^e + 2^(e-m), half a spacing up.
      const bottom = visitRun(format, t, th, d, 2 ** e + 2 ** (e - m), best);
      if (bottom < 0) return best;
      best = bottom;
      p = runStart(format, 2 ** e) - 1;
    }
  }
  // Below 2^m every position is exact: fl_D(p) = p.
  const top = Math.min(p, span - 1);
  if (top < 1) return best;
  // All products p t exact in D: no rounding term in the bound (and no error at all when t = θ).
  const exactProducts = productsExact(t, top, m);
  if (exactProducts && t === th) return best;
  p = top;
  while (p >= 1) {
    const roundingTerm = exactProducts ? 0 : spacingAt(p * t, format) / 2;
    const bound = (roundingTerm + p * d) * (1 + SLACK) + SLACK * (p * th + 2 * roundingTerm);
    if (bound < best) break;
    const lo = Math.max(1, p - CHUNK + 1);
    let local = best;
    if (format === 'fp32') {
      for (let q = p; q >= lo; q--) {
        const e = Math.abs(Math.fround(q * t) - q * th);
        if (e > local) local = e;
      }
    } else {
      for (let q = p; q >= lo; q--) {
        const e = Math.abs(roundToFormat(q * t, format) - q * th);
        if (e > local) local = e;
      }
    }
    best = local;
    p = lo - 1;
  }
  return best;
}

/**
 * Whether `x` (positive, finite) is a power of two. For t = 2^j in D, `fl_D(v t) = v t` for every
 * value v of D at or above 2^m: the product keeps v's significand (at most m bits) and its last
 * bit weighs at least `2^(j+1)`, above the smallest subnormal `2^(emin - m + 1) <= t`, so it is
 * held exactly; no overflow, the caller has checked `overflowPosition` (IEEE 754-2008 §3.3).
 */
function isPowerOfTwo(x: number): boolean {
  return x === 2 ** binaryExponent(x);
}

/** position: first position of the run of positions `q` with `fl_D(q) = fl_D(p)` (p >= 2^m). */
function runStart(format: FloatFormat, p: number): number {
  const v = roundToFormat(p, format);
  const above = spacingAt(v, format);
  const below = v === 2 ** binaryExponent(v) ? above / 2 : above;
  const even = (v / above) % 2 === 0;
  return below / 2 < 1 ? v : v - below / 2 + (even ? 0 : 1);
}

/**
 * The run holding position p (>= 2^m), cut at p from above: the larger of `best` and its error,
 * or -1 when its bound shows that neither it nor any lower run can pass `best`.
 */
function visitRun(
  format: FloatFormat,
  t: number,
  th: number,
  d: number,
  p: number,
  best: number,
): number {
  const v = roundToFormat(p, format);
  const above = spacingAt(v, format);
  const even = (v / above) % 2 === 0;
  const lo = runStart(format, p);
  const hi = Math.min(p, above / 2 < 1 ? v : v + above / 2 - (even ? 0 : 1));
  const roundingTerm = isPowerOfTwo(t) ? 0 : spacingAt(v * t, format) / 2;
  const bound = (roundingTerm + v * d + (above / 2) * th) * (1 + SLACK) + SLACK * (v + above) * th;
  if (bound < best) return -1;
  const c = roundToFormat(v * t, format);
  return Math.max(best, Math.abs(c - lo * th), Math.abs(c - hi * th));
}

/**
 * Runs of binade e (positions [2^e, 2^(e+1)), spacing s = 2^(e-m+1), half-width h = s/2) with
 * values v = k s from `fl_D(p)` down to just above 2^e, each with the same closed shape: v even
 * in D (k even) holds [v - h, v + h], odd holds [v - h + 1, v + h - 1]. Returns the larger of
 * `best` and their errors, and `done` when a bound shows that no lower run can pass it.
 * The spacing of `v t` takes at most two values over a binade (v t spans a factor of two).
 * When t = θ is a power of two every product and difference is exact: the errors are exactly
 * `(h - [k odd]) θ`, at most `h θ`, so once `best` reaches that the rest cannot pass it.
 */
function binadeRuns(
  format: FloatFormat,
  t: number,
  th: number,
  d: number,
  e: number,
  p: number,
  best: number,
): { best: number; done: boolean } {
  const m = significantBits(format);
  const floorValue = 2 ** e;
  const s = 2 ** (e - m + 1);
  const h = s / 2;
  const kLow = floorValue / s;
  let k = roundToFormat(p, format) / s;
  if (k <= kLow) return { best, done: false };
  const exactProducts = isPowerOfTwo(t);
  const exact = exactProducts && t === th;
  const topProduct = k * s * t;
  const edge = 2 ** binaryExponent(topProduct);
  const halfHigh = exactProducts ? 0 : spacingAt(topProduct, format) / 2;
  const halfLow = exactProducts ? 0 : spacingAt(floorValue * t, format) / 2;
  const spread = h * th;
  for (; k > kLow; k--) {
    const v = k * s;
    const vt = v * t;
    if (exact) {
      if (spread <= best) return { best, done: true };
    } else {
      const bound =
        ((vt >= edge ? halfHigh : halfLow) + v * d + spread) * (1 + SLACK) + SLACK * (v + s) * th;
      if (bound < best) return { best, done: true };
    }
    const c = roundToFormat(vt, format);
    const odd = k % 2;
    const e1 = Math.abs(c - (v - h + odd) * th);
    const e2 = Math.abs(c - (v + h - odd) * th);
    if (e1 > best) best = e1;
    if (e2 > best) best = e2;
  }
  return { best, done: false };
}

/**
 * count: `blurredPairs`, pairs i for which some p in [1, T) has
 * `fl_D(fl_D(p) t_i) == fl_D(fl_D(p-1) t_i)` with `t_i = fl_D(θ'_i)` (docs/metrics.md). Once T passes
 * `2^m + 1` (m significant bits) two positions share a rounded value and every pair is blurred.
 */
export function blurredPairs(format: FloatFormat, theta: Float64Array, span: number): number {
  if (span < 2) return 0;
  if (span - 1 >= 2 ** significantBits(format) + 1) return theta.length;
  let n = 0;
  for (const th of theta) if (pairBlurred(format, th, span)) n++;
  return n;
}

/** Positions [0, span) all exact here (span <= 2^m + 1). */
function pairBlurred(format: FloatFormat, th: number, span: number): boolean {
  const t = roundToFormat(th, format);
  if (t === 0) return span >= 2;
  if (!Number.isFinite(t)) return span >= 3; // 0·∞ is NaN at p = 0; Infinity repeats from p = 1
  let top = span - 1;
  if (!Number.isFinite(roundToFormat(top * t, format))) {
    let lo = 1;
    let hi = top;
    while (lo < hi) {
      const mid = Math.floor((lo + hi) / 2);
      if (Number.isFinite(roundToFormat(mid * t, format))) lo = mid + 1;
      else hi = mid;
    }
    if (lo + 1 <= top) return true; // two neighbouring angles are both Infinity
    top = lo - 1;
  }
  if (top < 2) return false; // fl(t) = t differs from fl(0) = 0
  const m = significantBits(format);
  if (productsExact(t, top, m)) return false; // every product exact, all distinct
  const emin = minNormalExponent(format);
  const eTop = binaryExponent(top * t);
  for (let e = binaryExponent(t); e <= eTop; e++) {
    const u = 2 ** (Math.max(e, emin) - m + 1);
    // t = u too: the angles in this binade are then distinct multiples of u, each held exactly
    // (a power-of-two frequency, e.g. base 2^40 over 200 channels, would otherwise walk the binade).
    if (t >= u) continue;
    const floorEdge = 2 ** e;
    const ceilEdge = 2 ** (e + 1);
    let qLo = Math.max(2, Math.ceil(floorEdge / t));
    while (qLo > 2 && (qLo - 1) * t >= floorEdge) qLo--;
    while (qLo * t < floorEdge) qLo++;
    let qHi = Math.min(top, Math.ceil(ceilEdge / t) - 1);
    while (qHi * t >= ceilEdge) qHi--;
    while (qHi + 1 <= top && (qHi + 1) * t < ceilEdge) qHi++;
    if (qLo > qHi) continue;
    if (t < u / 2 && (qHi - qLo) * t >= 2 * u) return true;
    // Below: t < u/2 over a short stretch (a few steps each), or u/2 <= t < u (solved, not walked).
    if (roundToFormat(qLo * t, format) === roundToFormat((qLo - 1) * t, format)) return true;
    if (t >= u / 2) {
      if (collidesWithinBinade(t / u, qLo + 1, qHi, (q) => roundToFormat(q * t, format)))
        return true;
      continue;
    }
    let prev = roundToFormat(qLo * t, format);
    for (let q = qLo + 1; q <= qHi; q++) {
      const cur = roundToFormat(q * t, format);
      if (cur === prev) return true;
      prev = cur;
    }
  }
  return false;
}

/**
 * Whether some q in [a, b] has `fl(q t) = fl((q-1) t)`, for angles `q t` (and `(a-1) t`) in one
 * binade of spacing u with `1/2 <= r = t/u < 1`, without visiting every q (up to 2^(p+1) of them).
 * In units of u the angles are `q r` with `r = T/N`, T odd, `N = 2^c` (c <= p + 1, so every
 * integer below stays exact in binary64). Round to nearest is `F(q) = floor(q r + 1/2)` except at
 * ties (`q r + 1/2` whole, which for odd T is exactly `q ≡ N/2 mod N`), where ties to even may give
 * one less. `F(q) = F(q-1)` exactly when `y(q-1) < D`, with `y(q) = (qT + N/2) mod N` and
 * `D = N - T`; y falls by D a step without wrapping until it is below D, so the first such q from
 * a is `a + floor(y(a-1)/D)`. Away from ties rounding is F, so an F-collision before the next tie
 * is a collision; the two pairs at each tie are checked with `round(q)` itself.
 */
function collidesWithinBinade(
  r: number,
  a: number,
  b: number,
  round: (q: number) => number,
): boolean {
  let N = 1;
  let T = r;
  while (!Number.isInteger(T)) {
    T *= 2;
    N *= 2;
  }
  const D = N - T;
  const half = N / 2;
  while (a <= b) {
    const y = ((a - 1) * T + half) % N;
    const collision = a + Math.floor(y / D);
    // The first tie at or after a - 1.
    const tie = a - 1 + ((((half - (a - 1)) % N) + N) % N);
    if (collision < tie) return collision <= b;
    if (tie > b) return false;
    if (tie >= a && round(tie) === round(tie - 1)) return true;
    if (tie + 1 <= b && round(tie + 1) === round(tie)) return true;
    a = tie + 2;
  }
  return false;
}
