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

/**
 * Cost weights of the similarity scan's steps, in units of one pair-offset of the cosine
 * recurrence (about 0.75 ns here): each offset of a filled block costs 16 besides its pairs (the
 * buffer, the comparisons, the short chains of few pairs); each pair of an exact sum 200
 * (Math.cos of a large argument takes the slow reduction); each pair of an interval bound 40.
 * Measured with bench/scan-work.ts; the units count steps, so a result never depends on the machine.
 */
export const SCAN_WORK = { offset: 16, exactPair: 200, boundPair: 40 } as const;

/**
 * Work units one similarity scan may spend: `2^30`, about 0.6–1.2 s on one core of the machines
 * measured. The costliest real configs measured need 0.83 of it (128 pairs, rotary base 1e8,
 * scaling factor 16, 2^27 tokens); few pairs at spans near 2^31 can need a hundred times more,
 * so past it the scan stops and says so (`scan-incomplete`) instead of running for minutes.
 */
export const MAX_SCAN_WORK = 2 ** 30;
