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
 * Work units one similarity scan may spend: `2^28`, about 0.15–0.3 s on one core of the
 * development machine, so that one file with its remedy search stays within half a second of
 * CPU (issue 16; `MAX_REMEDY_SCAN_WORK` bounds the search). Of a measured grid of 1,260
 * plausible configs (head size 64–256, rotary fraction 1/4–1, base 1e4–1e9, linear factor 1–64,
 * spans 2^17–2^27), 12 need more (all 128 pairs at bases 1e8–1e9, up to 0.83 × 2^30: the slow
 * pairs keep every interval bound above the floor near k = 1); few pairs at spans near 2^31
 * can need a hundred times more. Past it the scan stops and says so (`scan-incomplete`, a limit
 * on the missing metric counting as crossed) instead of running for seconds.
 */
export const MAX_SCAN_WORK = 2 ** 28;

/**
 * Work units the similarity scans of one file's remedy search may spend in all (proofs, the
 * values a search compares, the rotary-base criterion), charged as they run: `2^28`. With
 * `MAX_SCAN_WORK` for the file's own scan, a judgement with its remedies scans at most `2^29`
 * units (about 0.3–0.5 s); a search that runs out says its remedy was not proven.
 */
export const MAX_REMEDY_SCAN_WORK = 2 ** 28;

/**
 * Work units the plotted similarity curve of the HTML report may spend (`similarity-curve.ts`):
 * `2^30`, about a second, 13 million tokens at 64 pairs; the page says when it is not drawn.
 */
export const MAX_CURVE_WORK = 2 ** 30;
