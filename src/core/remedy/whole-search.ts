/**
 * Bisection over whole numbers for a predicate that holds up to some point and fails after it
 * (memory against sequences or span, colliding positions against span): exact, and at most
 * `ceil(log2(hi - lo + 1)) + 1` evaluations (54 for any range of safe integers).
 */

/** Outcome of a search: the value found (null when none passes) and the predicate calls made. */
export interface WholeSearch {
  value: number | null;
  evaluations: number;
}

/**
 * count: the largest whole n in [lo, hi] with `passes(n)`, for a `passes` that is true on
 * [lo, n*] and false above; null when `passes(lo)` is false or the range is empty.
 */
export function largestPassing(
  lo: number,
  hi: number,
  passes: (n: number) => boolean,
): WholeSearch {
  let evaluations = 0;
  const test = (n: number) => {
    evaluations += 1;
    return passes(n);
  };
  if (!(Number.isSafeInteger(lo) && Number.isSafeInteger(hi)) || hi < lo || !test(lo))
    return { value: null, evaluations };
  if (test(hi)) return { value: hi, evaluations };
  let good = lo;
  let bad = hi;
  while (bad - good > 1) {
    const mid = good + Math.floor((bad - good) / 2);
    if (test(mid)) good = mid;
    else bad = mid;
  }
  return { value: good, evaluations };
}
