/**
 * Blocks of cosine sums `Σ_i cos(k θ_i)` for consecutive offsets k, by the Chebyshev recurrence
 * `c_{j+1} = 2cos(θ) c_j - c_{j-1}` re-seeded exactly at each block start: the method of
 * `similarity-scan.ts` (its doc derives the error bound), in its own file so that scans other
 * than the floor scan (the plotted curve of `similarity-curve.ts`) can share it. The values are
 * approximations within `cosineSumBound`; callers re-evaluate exactly wherever a decision could
 * turn on the difference.
 */

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
    theta, twoCos: new Float64Array(P), cos: new Float64Array(P), sin: new Float64Array(P), sumTheta: 0,
    seedNow: new Float64Array(P), seedBefore: new Float64Array(P),
  };
  for (let i = 0; i < P; i++) {
    plan.cos[i] = Math.cos(theta[i]);
    plan.sin[i] = Math.sin(theta[i]);
    plan.twoCos[i] = 2 * plan.cos[i];
    plan.sumTheta += theta[i];
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
  return 2.5 * EPS * (P * (4 * n * n + 80 * n + 2) + 2 * (k0 + n) * plan.sumTheta + 2 * P * P + 4 * P);
}

// 2π split for the Cody–Waite reduction; see similarity-scan.ts for why each part is exact.
const TURN_A = Math.fround(2 * Math.PI);
const TURN_B = Math.fround(2 * Math.PI - TURN_A);
const TURN_C = 2 * Math.PI - TURN_A - TURN_B;
const TURN_D = 2.4492935982947064e-16;
const MAX_TURNS = 2 ** 29;

/** radians: `x - n·2π` for the nearest whole n, so seeds avoid Math.cos's slow large-argument path. */
function reduceTurns(x: number): number {
  if (!(x > 1e5)) return x;
  const n = Math.round(x / (2 * Math.PI));
  if (n >= MAX_TURNS) return x;
  return x - n * TURN_A - n * TURN_B - n * TURN_C - n * TURN_D;
}

/**
 * Fills `buf[j]` with an approximation of `Σ_i cos((k0 + j) θ_i)`, `j < n <= COSINE_BLOCK`.
 * Four pairs per pass: independent recurrences overlap in the CPU.
 */
export function fillCosineSums(plan: CosinePlan, k0: number, n: number, buf: Float64Array): void {
  const { theta, twoCos, cos, sin, seedNow, seedBefore } = plan;
  const P = theta.length;
  for (let i = 0; i < P; i++) {
    const x = reduceTurns(k0 * theta[i]);
    const c = Math.cos(x);
    seedNow[i] = c;
    seedBefore[i] = c * cos[i] + Math.sin(x) * sin[i];
  }
  buf.fill(0, 0, n);
  let i = 0;
  for (; i + 4 <= P; i += 4) {
    const a0 = twoCos[i], a1 = twoCos[i + 1], a2 = twoCos[i + 2], a3 = twoCos[i + 3];
    let q0 = seedNow[i], q1 = seedNow[i + 1], q2 = seedNow[i + 2], q3 = seedNow[i + 3];
    let p0 = seedBefore[i], p1 = seedBefore[i + 1], p2 = seedBefore[i + 2], p3 = seedBefore[i + 3];
    for (let j = 0; j < n; j++) {
      buf[j] += q0 + q1 + (q2 + q3);
      const r0 = a0 * q0 - p0, r1 = a1 * q1 - p1, r2 = a2 * q2 - p2, r3 = a3 * q3 - p3;
      p0 = q0; q0 = r0; p1 = q1; q1 = r1; p2 = q2; q2 = r2; p3 = q3; q3 = r3;
    }
  }
  for (; i < P; i++) {
    const a = twoCos[i];
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
