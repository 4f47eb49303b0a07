/**
 * Blocks of cosine sums `Σ_i cos(k θ_i)` for consecutive offsets k, by the Chebyshev recurrence
 * `c_{j+1} = 2cos(θ) c_j - c_{j-1}` re-seeded exactly at each block start: the method of
 * `similarity-scan.ts` (its doc derives the error bound), in its own file so that scans other
 * than the floor scan (the plotted curve of `similarity-curve.ts`) can share it. The values are
 * approximations within `cosineSumBound`; callers re-evaluate exactly wherever a decision could
 * turn on the difference.
 */

import { elementAt } from '../element-at.js';
import { cosineKernel, type CosineKernel } from './cosine-sum-kernel.js';

/** Offsets per block: the recurrence restarts from exact seeds this often. */
export const COSINE_BLOCK = 512;

const EPS = 2 ** -53;

/** Per-pair constants the recurrence needs, computed once per frequency set. */
export interface CosinePlan {
  theta: Float64Array;
  /** `2 cos θ_i`. */
  twoCos: Float64Array;
  cos: Float64Array;
  sin: Float64Array;
  /** `Σ_i θ_i`, for the bound. */
  sumTheta: number;
  seedNow: Float64Array;
  seedBefore: Float64Array;
}

export function planCosineSums(theta: Float64Array): CosinePlan {
  const P = theta.length;
  const plan: CosinePlan = {
    theta,
    twoCos: new Float64Array(P),
    cos: new Float64Array(P),
    sin: new Float64Array(P),
    sumTheta: 0,
    seedNow: new Float64Array(P),
    seedBefore: new Float64Array(P),
  };
  for (const [i, t] of theta.entries()) {
    const c = Math.cos(t);
    plan.cos[i] = c;
    plan.sin[i] = Math.sin(t);
    plan.twoCos[i] = 2 * c;
    plan.sumTheta += t;
  }
  return plan;
}

/**
 * sum: bound on `|approximate - reference|` for any offset of a block of `n` offsets starting at
 * `k0`, times the 2.5 decision margin of `similarity-scan.ts`:
 * `2.5 ε (P (4n² + 80n + 2) + 2 (k0 + n) Σθ + 2P² + 4P)` with `ε = 2^-53`.
 */
export function cosineSumMargin(plan: CosinePlan, k0: number, n: number): number {
  const P = plan.theta.length;
  return (
    2.5 * EPS * (P * (4 * n * n + 80 * n + 2) + 2 * (k0 + n) * plan.sumTheta + 2 * P * P + 4 * P)
  );
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
 * Fills `buf[j]` with an approximation of `Σ_i cos((k0 + j) θ_i)`, `j < n <= COSINE_BLOCK`, within
 * `cosineSumMargin / 2.5`. Eight, then four, then single pairs per pass: independent recurrences
 * overlap in the CPU. The seeds are computed here; the recurrence runs in `kernel`, the
 * WebAssembly form of the loop below (cosine-sum-kernel.ts, identical values), unless it is null
 * or cannot take the arrays, and then in the loop below.
 */
export function fillCosineSums(
  plan: CosinePlan,
  k0: number,
  n: number,
  buf: Float64Array,
  kernel: CosineKernel | null = cosineKernel(),
): void {
  const { theta, twoCos: a2, cos: cT, sin: sT, seedNow, seedBefore } = plan;
  const P = theta.length;
  // Checked once here, so every `buf[j]` below (j < n) is inside: the innermost loops read it
  // with `!`, because a check per read there costs 10-25% of the whole fill (measured).
  if (n > buf.length) throw new RangeError(`${n} offsets do not fit a block of ${buf.length}`);
  for (let i = 0; i < P; i++) {
    const t = elementAt(theta, i);
    // cos(x0) and cos(x0 - θ) = cos(x0)cos(θ) + sin(x0)sin(θ), one argument x0 = fl(k0 θ)
    const x = reduceTurns(k0 * t);
    const c = Math.cos(x);
    seedNow[i] = c;
    seedBefore[i] = c * elementAt(cT, i) + Math.sin(x) * elementAt(sT, i);
  }
  if (kernel?.fill(plan.twoCos, seedNow, seedBefore, n, buf)) return;
  buf.fill(0, 0, n);
  let i = 0;
  for (; i + 8 <= P; i += 8) {
    const a0 = elementAt(a2, i),
      a1 = elementAt(a2, i + 1),
      a2_ = elementAt(a2, i + 2),
      a3 = elementAt(a2, i + 3);
    const a4 = elementAt(a2, i + 4),
      a5 = elementAt(a2, i + 5),
      a6 = elementAt(a2, i + 6),
      a7 = elementAt(a2, i + 7);
    let q0 = elementAt(seedNow, i),
      q1 = elementAt(seedNow, i + 1),
      q2 = elementAt(seedNow, i + 2),
      q3 = elementAt(seedNow, i + 3);
    let q4 = elementAt(seedNow, i + 4),
      q5 = elementAt(seedNow, i + 5),
      q6 = elementAt(seedNow, i + 6),
      q7 = elementAt(seedNow, i + 7);
    let p0 = elementAt(seedBefore, i),
      p1 = elementAt(seedBefore, i + 1),
      p2 = elementAt(seedBefore, i + 2),
      p3 = elementAt(seedBefore, i + 3);
    let p4 = elementAt(seedBefore, i + 4),
      p5 = elementAt(seedBefore, i + 5),
      p6 = elementAt(seedBefore, i + 6),
      p7 = elementAt(seedBefore, i + 7);
    for (let j = 0; j < n; j++) {
      buf[j] = buf[j]! + (q0 + q1 + (q2 + q3) + (q4 + q5 + (q6 + q7)));
      const r0 = a0 * q0 - p0,
        r1 = a1 * q1 - p1,
        r2 = a2_ * q2 - p2,
        r3 = a3 * q3 - p3;
      const r4 = a4 * q4 - p4,
        r5 = a5 * q5 - p5,
        r6 = a6 * q6 - p6,
        r7 = a7 * q7 - p7;
      p0 = q0;
      q0 = r0;
      p1 = q1;
      q1 = r1;
      p2 = q2;
      q2 = r2;
      p3 = q3;
      q3 = r3;
      p4 = q4;
      q4 = r4;
      p5 = q5;
      q5 = r5;
      p6 = q6;
      q6 = r6;
      p7 = q7;
      q7 = r7;
    }
  }
  for (; i + 4 <= P; i += 4) {
    const a0 = elementAt(a2, i),
      a1 = elementAt(a2, i + 1),
      a2_ = elementAt(a2, i + 2),
      a3 = elementAt(a2, i + 3);
    let q0 = elementAt(seedNow, i),
      q1 = elementAt(seedNow, i + 1),
      q2 = elementAt(seedNow, i + 2),
      q3 = elementAt(seedNow, i + 3);
    let p0 = elementAt(seedBefore, i),
      p1 = elementAt(seedBefore, i + 1),
      p2 = elementAt(seedBefore, i + 2),
      p3 = elementAt(seedBefore, i + 3);
    for (let j = 0; j < n; j++) {
      buf[j] = buf[j]! + (q0 + q1 + (q2 + q3));
      const r0 = a0 * q0 - p0,
        r1 = a1 * q1 - p1,
        r2 = a2_ * q2 - p2,
        r3 = a3 * q3 - p3;
      p0 = q0;
      q0 = r0;
      p1 = q1;
      q1 = r1;
      p2 = q2;
      q2 = r2;
      p3 = q3;
      q3 = r3;
    }
  }
  for (; i < P; i++) {
    const a = elementAt(a2, i);
    let q = elementAt(seedNow, i);
    let p = elementAt(seedBefore, i);
    for (let j = 0; j < n; j++) {
      buf[j] = buf[j]! + q;
      const r = a * q - p;
      p = q;
      q = r;
    }
  }
}
