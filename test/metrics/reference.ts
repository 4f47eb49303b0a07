/**
 * Straightforward reference implementations of the positional scans: the obvious loops over every
 * position and pair, exactly as docs/metrics.md words the definitions. The fast scans in
 * src/core/metrics must agree with these (counts identical, floats within 1e-9 relative).
 */
import { elementAt } from '../../src/core/element-at.js';
import type { FloatFormat } from '../../src/core/model.js';
import { roundToFormat } from '../../src/core/metrics/float-format.js';

export interface ReferenceSimilarity {
  separationFloor: number | null;
  separationFloorOffset: number | null;
  discriminationSpan: number | null;
}

/** min over k in [1, T) of sqrt(2(1 - S(k))), its smallest k, and the first k with Σcos < 0. */
export function referenceSimilarity(theta: Float64Array, span: number): ReferenceSimilarity {
  const P = theta.length;
  let floor: number | null = null;
  let offset: number | null = null;
  let negative: number | null = null;
  for (let k = 1; k < span; k++) {
    let sum = 0;
    for (let i = 0; i < P; i++) sum += Math.cos(k * elementAt(theta, i));
    const f = Math.sqrt(2 * (1 - sum / P));
    if (floor === null || f < floor) {
      floor = f;
      offset = k;
    }
    if (negative === null && sum < 0) negative = k;
  }
  return { separationFloor: floor, separationFloorOffset: offset, discriminationSpan: negative };
}

export interface ReferencePrecision {
  collidingPositions: number;
  angleErrorMax: number | null;
  overflowPosition: number | null;
  blurredPairs: number;
}

/** The number-format block by visiting every (p, i). */
export function referencePrecision(
  format: FloatFormat,
  theta: Float64Array,
  span: number,
): ReferencePrecision {
  const fl = (x: number) => roundToFormat(x, format);
  const P = theta.length;
  const t = Array.from(theta, fl);
  let colliding = 0;
  let overflow: number | null = null;
  let errorMax = 0;
  const blurred = new Array<boolean>(P).fill(false);
  const previous = new Array<number>(P).fill(NaN);
  let previousPosition = NaN;
  for (let p = 0; p < span; p++) {
    const fp = fl(p);
    if (p >= 1 && (!Number.isFinite(fp) || fp === previousPosition)) colliding++;
    let overflows = !Number.isFinite(fp);
    for (let i = 0; i < P; i++) {
      const angle = fl(fp * elementAt(t, i));
      if (!Number.isFinite(angle)) overflows = true;
      const e = Math.abs(angle - p * elementAt(theta, i));
      if (e > errorMax) errorMax = e;
      if (p >= 1 && angle === previous[i]) blurred[i] = true;
      previous[i] = angle;
    }
    if (overflows && overflow === null) overflow = p;
    previousPosition = fp;
  }
  return {
    collidingPositions: colliding,
    angleErrorMax: overflow === null ? errorMax : null,
    overflowPosition: overflow,
    blurredPairs: blurred.filter(Boolean).length,
  };
}

/** `angleErrorMax` alone by visiting every (p, i), for the long spans where the full block is slow. */
export function referenceAngleErrorMax(
  format: FloatFormat,
  theta: Float64Array,
  span: number,
): number {
  const fl = format === 'fp32' ? Math.fround : (x: number) => roundToFormat(x, format);
  const t = Array.from(theta, fl);
  let errorMax = 0;
  for (let p = 0; p < span; p++) {
    const fp = fl(p);
    for (let i = 0; i < theta.length; i++) {
      const e = Math.abs(fl(fp * elementAt(t, i)) - p * elementAt(theta, i));
      if (e > errorMax) errorMax = e;
    }
  }
  return errorMax;
}
