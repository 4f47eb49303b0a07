/**
 * Bounds on the positional scans, so degenerate or absurd input gives null instead of hanging.
 */

/**
 * tokens: longest span `T` any O(T) scan runs over (`2^31`, eight times the longest context
 * published so far); past it the similarity metrics and `angleErrorMax` are null.
 */
export const MAX_SCAN_SPAN = 2 ** 31;

/**
 * elements: most (position, pair) elements one scan touches (`2^37`: 64 pairs over `2^31`
 * positions, about three minutes on one core); past it the scan gives null.
 */
export const MAX_SCAN_ELEMENTS = 2 ** 37;

/** True when a scan of `pairs` frequency pairs over `span` positions stays inside the bounds. */
export function scanAllowed(pairs: number, span: number): boolean {
  return span <= MAX_SCAN_SPAN && pairs * span <= MAX_SCAN_ELEMENTS;
}
