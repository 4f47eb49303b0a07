/**
 * Bounds on the positional scans, so degenerate or absurd input gives null instead of hanging.
 */

/**
 * tokens: longest span `T` any O(T) scan runs over (`2^31`, eight times the longest context
 * published so far); past it the similarity metrics and `angleErrorMax` are null.
 */
export const MAX_SCAN_SPAN = 2 ** 31;

/**
 * elements: most (position, pair) elements one scan may cover (`2^37`: 64 pairs over `2^31`
 * positions); past it the scan gives null. The scans pass over most of what they cover (interval
 * bounds, runs of shared positions); the similarity scan's actual spending is held by
 * `MAX_SCAN_WORK` below; the angle walk stops where its bound falls below the best error
 * (158 ms at most for 64 pairs at 2^31 - 1 over the frequency sets tried, near-power-of-two and
 * exactly held ones among them).
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
 * Costs measured on the development machine (2 vCPU Xeon, Node 20): the recurrence 0.73 ns per
 * pair-offset at 64 pairs and 3.3 ns per offset at one pair; an exact pair 60–170 ns at offsets
 * near 10^6; an interval bound 18–30 ns per pair. `npm run bench:spans` times whole files through
 * the CLI. The units count steps, not time, so a result never depends on the machine or its load.
 */
export const SCAN_WORK = { offset: 16, exactPair: 200, boundPair: 40 } as const;

/**
 * Work units one similarity scan may spend: `2^30`, about 0.6–1.2 s on one core of the
 * development machine. The costliest plausible config of a measured grid (head size 64–256,
 * rotary fraction 1/4–1, base 1e4–1e9, scaling factor 1–64, spans 2^17–2^27) needs 0.83 of it
 * (128 pairs, base 1e8, factor 16, 2^27 tokens); few pairs at spans near 2^31 can need a hundred times more,
 * so past it the scan stops and says so (`scan-incomplete`) instead of running for minutes.
 */
export const MAX_SCAN_WORK = 2 ** 30;
