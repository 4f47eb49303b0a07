/**
 * Rotation angles rounded into a number format, `fl_D(fl_D(p) fl_D(θ'_i))`, the product formed
 * exactly in binary64 (both factors have at most 24 significant bits) and rounded once
 * (METRICS.md, number formats: `angleErrorMax`, `overflowPosition`, `blurredPairs`).
 *
 * Method, and why it is exact. The definitions visit every (p, i); these functions return what
 * that loop returns (counts identical, the maximum bit for bit) while skipping provably
 * irrelevant elements. With m significant bits in D, positions come in runs of equal `fl_D(p)`:
 * single positions below `2^m`, runs of up to `2^(e-m+1)` positions in the binade `[2^e, 2^(e+1))`. Over a run the rounded angle `c` is constant and
 * `c - fl(pθ)` is monotone in p, so its largest magnitude sits at an end of the run. Runs are
 * visited from the top of the span down, and the scan stops once
 *   bound(v) = spacing_D(v t)/2 + v |t - θ| + (run half-width) θ   (+ binary64 slack)
 * falls below the best error found: every term is non-decreasing in the position, so no lower
 * run can do better. Below `2^m` (fp32: the whole of `T <= 2^24`) the run ends coincide and a
 * tight descending loop with Math.fround checks the bound once per chunk of positions.
 * Blurred pairs: in a binade of the angle with spacing u, neighbouring angles `x`, `x + t`
 * cannot round together when `t >= u`, and must when `t < u/2` and the angles cover `2u`
 * (an open rounding interval of width u then holds two of them); only the remaining binades
 * are scanned, stopping at the first collision.
 */
import type { FloatFormat } from '../model.js';
import { binaryExponent, minNormalExponent, roundToFormat, significantBits, spacingAt } from './float-format.js';
import { positionOverflowStart } from './position-rounding.js';

const CHUNK = 1024;
const SLACK = 2 ** -50;

/** True when `fl_D(fl_D(p) t)` is not finite (overflow, or `0 · ∞`). */
function angleOverflows(p: number, t: number, format: FloatFormat): boolean {
  return !Number.isFinite(roundToFormat(roundToFormat(p, format) * t, format));
}

/**
 * token: `overflowPosition`, first p in [0, T) whose `fl_D(p)` or any angle is not finite;
 * null when none is (METRICS.md). Angles are monotone in p, so each pair is a binary search.
 */
export function overflowPosition(format: FloatFormat, theta: Float64Array, span: number): number | null {
  const start = positionOverflowStart(format);
  let first = start < span ? start : span;
  for (let i = 0; i < theta.length; i++) {
    const t = roundToFormat(theta[i], format);
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
 * pairs (METRICS.md). The caller checks `overflowPosition` first: with any overflow the metric is
 * null. Pairs are independent, so a caller may split `theta` and take the larger result.
 */
export function angleErrorMax(format: FloatFormat, theta: Float64Array, span: number): number {
  let best = 0;
  for (let i = 0; i < theta.length; i++) best = pairAngleError(format, theta[i], span, best);
  return best;
}

function pairAngleError(format: FloatFormat, th: number, span: number, best: number): number {
  const m = significantBits(format);
  const exactLimit = 2 ** m;
  const t = roundToFormat(th, format);
  const d = Math.abs(t - th);
  // Above 2^m: runs of positions sharing one rounded value v, visited downwards.
  let p = span - 1;
  while (p >= exactLimit) {
    const v = roundToFormat(p, format);
    const above = spacingAt(v, format);
    const below = v === 2 ** binaryExponent(v) ? above / 2 : above;
    const even = (v / above) % 2 === 0;
    const lo = below / 2 < 1 ? v : v - below / 2 + (even ? 0 : 1);
    const hi = Math.min(p, above / 2 < 1 ? v : v + above / 2 - (even ? 0 : 1));
    const bound = (spacingAt(v * t, format) / 2 + v * d + (above / 2) * th) * (1 + SLACK) + SLACK * (v + above) * th;
    if (bound < best) return best;
    const c = roundToFormat(v * t, format);
    const e1 = Math.abs(c - lo * th);
    const e2 = Math.abs(c - hi * th);
    if (e1 > best) best = e1;
    if (e2 > best) best = e2;
    p = lo - 1;
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
 * count: `blurredPairs`, pairs i for which some p in [1, T) has
 * `fl_D(fl_D(p) t_i) == fl_D(fl_D(p-1) t_i)` with `t_i = fl_D(θ'_i)` (METRICS.md). Once T passes
 * `2^m + 1` (m significant bits) two positions share a rounded value and every pair is blurred.
 */
export function blurredPairs(format: FloatFormat, theta: Float64Array, span: number): number {
  if (span < 2) return 0;
  if (span - 1 >= 2 ** significantBits(format) + 1) return theta.length;
  let n = 0;
  for (let i = 0; i < theta.length; i++) if (pairBlurred(format, theta[i], span)) n++;
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
      if (collidesWithinBinade(t / u, qLo + 1, qHi, (q) => roundToFormat(q * t, format))) return true;
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
function collidesWithinBinade(r: number, a: number, b: number, round: (q: number) => number): boolean {
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
