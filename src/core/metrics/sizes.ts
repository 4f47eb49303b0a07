/**
 * Guards for the sizes a spec states. Sizes may be zero, negative, fractional, NaN or beyond
 * exact integers; every metric that depends on one returns null then.
 */

/** Whether `n` is a size: a whole number in [1, 2^53 - 1], which a double holds exactly. */
export function isCount(n: number | null | undefined): n is number {
  return typeof n === 'number' && Number.isSafeInteger(n) && n >= 1;
}

/** count: `x` when it is a whole number in [1, 2^53 - 1], else null. */
export function positiveCount(x: number | null | undefined): number | null {
  return isCount(x) ? x : null;
}

/** count: `x` when it is a whole number in [0, 2^53 - 1], else null. */
export function nonNegativeCount(x: number | null | undefined): number | null {
  return typeof x === 'number' && Number.isSafeInteger(x) && x >= 0 ? x : null;
}

/** value: `x` when it is finite and above zero, else null. */
export function positiveFinite(x: number | null | undefined): number | null {
  return typeof x === 'number' && Number.isFinite(x) && x > 0 ? x : null;
}

/** value: `x` when it is finite, else null (`null` and `undefined` stay null). */
export function finiteOrNull(x: number | null | undefined): number | null {
  return typeof x === 'number' && Number.isFinite(x) ? x : null;
}
