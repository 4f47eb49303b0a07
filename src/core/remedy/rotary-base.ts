/**
 * The rotary base nearest to the current one that a criterion accepts, typically the long-range
 * criterion of Men et al. 2024 ("Base of RoPE Bounds Context Length", Thm 1, Eqs. 9–11: the
 * smallest base with `Σ_i cos(k θ_i) >= 0` for every k up to the span, solved numerically there
 * too).
 *
 * Method. Which bases pass is NOT monotone in the base (SOURCES.md §12: a larger base can fail
 * where a smaller one passes), so plain bisection could return a base that fails. The search
 * (1) moves away from the current base by doubling (halving, downwards) until a base passes;
 * (2) bisects geometrically between the last failing and the first passing base, keeping the
 * passing end, to a ratio of 1.001; (3) rounds that passing base to two significant digits in
 * the search's direction, as published bases are written, and verifies the rounded value; when it
 * fails (a pocket of failing bases), it steps along the two-digit grid to the first base that
 * passes; (4) when the grid finds none within its steps, it offers the bisection's own base,
 * which passed. Every base returned was accepted by the criterion; a smaller passing base may
 * exist in a pocket the doubling stepped over, so this is the nearest base found, not
 * necessarily the nearest there is. Each step is capped and the result says when a cap stopped it.
 */

export type BaseDirection = 'up' | 'down';

/** Caps of each stage (defaults: 30 doublings, i.e. a factor of 2^30; 40 bisections; 30 grid steps). */
export interface BaseSearchCaps {
  doublings: number;
  bisections: number;
  gridSteps: number;
}

export const DEFAULT_BASE_CAPS: BaseSearchCaps = { doublings: 30, bisections: 40, gridSteps: 30 };

export interface BaseSearch {
  /** The base found; null when none passed within the caps. */
  base: number | null;
  /** Criterion evaluations made. */
  evaluations: number;
  /** True when a cap ended a stage before it found what it looked for. */
  capped: boolean;
}

/**
 * base: `x` rounded to two significant digits, up or down (`1,294,337` → `1,300,000` up,
 * `1,200,000` down); null for a value that is not positive and finite.
 */
export function roundBase(x: number, direction: BaseDirection): number | null {
  if (!(x > 0 && Number.isFinite(x))) return null;
  const e = Math.floor(Math.log10(x)) - 1;
  const scaled = x / 10 ** e;
  // Within 1e-9 of a grid value counts as on it: the division is inexact.
  const m = direction === 'up' ? Math.ceil(scaled - 1e-9) : Math.floor(scaled + 1e-9);
  return Number((m * 10 ** e).toPrecision(2));
}

/** base: the next two-significant-digit value after `g` (itself on the grid), in `direction`. */
export function nextGridBase(g: number, direction: BaseDirection): number {
  const e = Math.floor(Math.log10(g)) - 1;
  const m = Math.round(g / 10 ** e);
  if (direction === 'up') return Number(((m + 1) * 10 ** e).toPrecision(2));
  // 10 × 10^e steps down to 99 × 10^(e-1).
  return m <= 10 ? Number((99 * 10 ** (e - 1)).toPrecision(2)) : Number(((m - 1) * 10 ** e).toPrecision(2));
}

/**
 * base: the nearest base to `from` in `direction` that `passes`, found as the file doc says;
 * null when `from` is not a positive finite number or nothing passed within the caps.
 */
export function searchRotaryBase(
  from: number,
  direction: BaseDirection,
  passes: (base: number) => boolean,
  caps: BaseSearchCaps = DEFAULT_BASE_CAPS,
): BaseSearch {
  let evaluations = 0;
  const test = (b: number) => { evaluations += 1; return passes(b); };
  if (!(from > 0 && Number.isFinite(from))) return { base: null, evaluations, capped: false };
  const step = direction === 'up' ? 2 : 0.5;

  // (1) doubling away from the current base
  let failing = from;
  let passing: number | null = null;
  for (let i = 0; i < caps.doublings; i++) {
    const b = failing * step;
    if (!Number.isFinite(b) || b <= 0) break;
    if (test(b)) { passing = b; break; }
    failing = b;
  }
  if (passing === null) return { base: null, evaluations, capped: true };

  // (2) geometric bisection, keeping the passing end
  let bisected = 0;
  while (Math.max(passing, failing) / Math.min(passing, failing) > 1.001 && bisected < caps.bisections) {
    const mid = Math.sqrt(passing * failing);
    if (test(mid)) passing = mid;
    else failing = mid;
    bisected += 1;
  }

  // (3) the two-digit grid, stepping past pockets of failing bases
  let g = roundBase(passing, direction);
  for (let i = 0; g !== null && i < caps.gridSteps; i++) {
    if (test(g)) return { base: g, evaluations, capped: false };
    g = nextGridBase(g, direction);
  }
  // (4) the bisection's own base passed
  return { base: passing, evaluations, capped: true };
}
