/**
 * Indexed reads where the code has already established that the index is inside the array (a loop
 * bound, an earlier length check, a list that is never empty). `noUncheckedIndexedAccess` types
 * every `xs[i]` as possibly `undefined`; this states the reasoning once and checks it, throwing a
 * RangeError naming the index instead of letting `undefined` flow on as NaN or a missing field.
 *
 * Shaped for the numeric kernels: only a read that gives `undefined` leaves the fast path, so V8
 * inlines it and keeps typed-array values unboxed (a bounds test before the read, or a return that
 * may be `undefined`, made the cosine-sum fill 2-3x slower). It is still a branch per read: the
 * fill's innermost loop checks its bound once instead (cosine-sum-blocks.ts).
 */

/** `xs[i]` for a whole number `0 <= i < xs.length`; throws a RangeError otherwise. */
export function elementAt<T>(xs: ArrayLike<T>, i: number): T {
  const value = xs[i];
  if (value !== undefined) return value;
  return storedUndefined(xs, i);
}

/** An `undefined` stored in the list at `i` (a list whose element type allows it), else throws. */
function storedUndefined<T>(xs: ArrayLike<T>, i: number): T {
  // `i >>> 0 === i`: a whole number in [0, 2^32), the range of array indexes.
  if (i >>> 0 === i && i < xs.length) return xs[i] as T;
  throw new RangeError(`index ${i} is outside a list of ${xs.length}`);
}
