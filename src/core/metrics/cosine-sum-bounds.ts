/**
 * Bounds of the cosine sum `Σ_i cos(k θ_i)` over a whole interval of offsets [k0, k1], from one
 * pair at a time: over the angles `[k0 θ_i, k1 θ_i]` a cosine is largest at an end of the
 * interval unless the interval holds a multiple of 2π (then 1), and smallest at an end unless it
 * holds an odd multiple of π (then -1); an interval 2π or longer holds both. Summing the pairs'
 * bounds bounds the sum at every offset of the interval, so a scan may pass over an interval
 * whose bounds show no offset in it can matter (branch and bound with interval bounds, as in
 * Hansen & Walster 2004, "Global Optimization Using Interval Analysis", from memory).
 *
 * Error bound. The returned bounds hold for the reference expression of `similarity-scan.ts`,
 * `cosineSum(θ, k)` (Math.cos of `fl(k θ_i)`, summed in pair order), not only for the exact sum.
 * With ε = 2^-53: the reference differs from the exact sum by at most
 * `ε (k1 Σθ + 2P + P²)` (argument rounding `ε k θ_i`, Math.cos within one ulp `2ε`, the pair-order
 * sum `P² ε`); each pair's reduced interval is known within `δ_i = 8ε (k1 θ_i + 8)` (the product,
 * the reduction by whole turns and the width each add at most `2ε (k1 θ_i + 4)`), so each pair's
 * bound moves by at most `δ_i + 2ε`, and summing the bounds adds `P² ε`. The slack added to both
 * bounds, `16 ε (k1 Σθ + P² + 8P)`, covers all of it with room (about 3e-7 for P = 64, k1 = 2^24).
 */

import { elementAt } from '../element-at.js';

const EPS = 2 ** -53;
const TWO_PI = 2 * Math.PI;

// 2π split for the Cody–Waite reduction; similarity-scan.ts says why each part is exact.
const TURN_A = Math.fround(TWO_PI);
const TURN_B = Math.fround(TWO_PI - TURN_A);
const TURN_C = TWO_PI - TURN_A - TURN_B;
const TURN_D = 2.4492935982947064e-16;
const MAX_TURNS = 2 ** 29;

/** Lower and upper bounds of a cosine sum over an interval of offsets. */
export interface CosineSumBounds {
  lower: number;
  upper: number;
}

/** radians: `x` less the nearest whole number of turns, near [-π, π] (error within `δ_i` above). */
function reduceTurns(x: number): number {
  const n = Math.round(x / TWO_PI);
  if (n === 0) return x;
  if (x > 1e5 && n < MAX_TURNS) return x - n * TURN_A - n * TURN_B - n * TURN_C - n * TURN_D;
  return x - n * TWO_PI;
}

/**
 * sum: bounds of `cosineSum(θ, k)` (the reference expression) holding for every whole k in
 * `[k0, k1]`, `1 <= k0 <= k1`; `[-P, P]` when the interval says nothing. Formula and error bound
 * in the file's doc.
 */
export function cosineSumBounds(theta: Float64Array, k0: number, k1: number): CosineSumBounds {
  const P = theta.length;
  let upper = 0;
  let lower = 0;
  let sumTheta = 0;
  for (let i = 0; i < P; i++) {
    const th = elementAt(theta, i);
    sumTheta += th;
    const width = (k1 - k0) * th;
    const delta = 8 * EPS * (k1 * th + 8);
    if (!(width + 2 * delta < TWO_PI)) {
      upper += 1;
      lower -= 1;
      continue;
    }
    const a = reduceTurns(k0 * th) - delta;
    const b = a + width + 2 * delta;
    const ca = Math.cos(a);
    const cb = Math.cos(b);
    // a lies within about π of zero, so the multiples of π that [a, b] can hold are -π, 0, π, 2π, 3π.
    const holdsTop = (a <= 0 && b >= 0) || b >= TWO_PI;
    const holdsBottom = a <= -Math.PI || (a <= Math.PI && b >= Math.PI) || b >= 3 * Math.PI;
    upper += holdsTop ? 1 : Math.max(ca, cb);
    lower += holdsBottom ? -1 : Math.min(ca, cb);
  }
  // The ends a and b were widened by δ_i already; the slack covers the rest of the error bound.
  const slack = 16 * EPS * (k1 * sumTheta + P * P + 8 * P);
  return { lower: lower - slack, upper: upper + slack };
}
