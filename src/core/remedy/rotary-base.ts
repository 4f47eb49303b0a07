/**
 * The rotary base nearest to the current one that a criterion accepts, typically the long-range
 * criterion of Men et al. 2024 ("Base of RoPE Bounds Context Length", Thm 1, Eqs. 9–11: the
 * smallest base with `Σ_i cos(k θ_i) >= 0` for every k up to the span, solved numerically there
 * too).
 *
 * Method. Which bases pass is NOT monotone in the base (so Men et al. 2024, Table 2, cannot be
 * reproduced exactly: a larger base can fail where a smaller one passes; for 8k offsets and 64
 * pairs, 84,000 passes, 113,000 fails, 160,000 passes), so a plain bisection can land on the far
 * side of a pocket of failing bases.
 * (1) Walk: the two-significant-digit grid (as published bases are written: 84,000, 500,000)
 * is walked from the current base in the search's direction, and the first grid base that
 * passes is the answer: the nearest passing base on that grid, exactly. The walk stops when its
 * work budget is spent (a criterion reports its cost; scans stop at the first negative sum, so
 * bases far from passing are cheap).
 * (2) Past the budget: doubling (halving, downwards) from where the walk stopped until a base
 * passes, geometric bisection between the last failing and that passing base (keeping the
 * passing end) to a ratio of 1.001, then the grid again from the rounded bisection result,
 * stepping past pockets to the first base that passes; failing that, the bisection's own base,
 * which passed. Every base returned passed the criterion; after (2) a nearer passing base may
 * exist in a pocket the doubling stepped over, and the result says the walk was capped.
 */

export type BaseDirection = 'up' | 'down';

/** A criterion's answer for one base and the work it took (e.g. pairs × offsets scanned). */
export interface BaseTrial {
  passes: boolean;
  cost: number;
}

/**
 * Caps of each stage (defaults: a walk of 2^29 cost units, 2^31 in all; 4000 evaluations in all;
 * 30 doublings; 40 bisections; 30 grid steps).
 */
export interface BaseSearchCaps {
  walkCost: number;
  /** Work of the whole search; past it the search returns the last base that passed, if any. */
  totalCost: number;
  /** Criterion evaluations of the whole search, whatever they cost. */
  evaluations: number;
  doublings: number;
  bisections: number;
  gridSteps: number;
}

export const DEFAULT_BASE_CAPS: BaseSearchCaps = {
  walkCost: 2 ** 29,
  totalCost: 2 ** 31,
  evaluations: 4000,
  doublings: 30,
  bisections: 40,
  gridSteps: 30,
};

export interface BaseSearch {
  /** The base found; null when none passed within the caps. */
  base: number | null;
  /** Criterion evaluations made. */
  evaluations: number;
  /** True when the walk's budget ran out, so the base is the nearest found rather than the nearest on the grid. */
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
  const e = Math.floor(Math.log10(g) + 1e-12) - 1;
  const m = Math.round(g / 10 ** e);
  if (direction === 'up') return Number(((m + 1) * 10 ** e).toPrecision(2));
  // 10 × 10^e steps down to 99 × 10^(e-1).
  return m <= 10
    ? Number((99 * 10 ** (e - 1)).toPrecision(2))
    : Number(((m - 1) * 10 ** e).toPrecision(2));
}

/** A base above 1 and finite: at 1 or below every pair turns at the same rate or faster ones slow down. */
function usable(base: number): boolean {
  return base > 1 && Number.isFinite(base);
}

/** The first grid base strictly beyond `from` in `direction`. */
function firstGridBeyond(from: number, direction: BaseDirection): number | null {
  const g = roundBase(from, direction);
  if (g === null) return null;
  return g === from || (direction === 'up' ? g < from : g > from) ? nextGridBase(g, direction) : g;
}

/**
 * base: the nearest base to `from` in `direction` that the criterion passes, found as the file
 * doc says; null when `from` is not a positive finite number or nothing passed within the caps.
 */
export function searchRotaryBase(
  from: number,
  direction: BaseDirection,
  criterion: (base: number) => BaseTrial,
  caps: BaseSearchCaps = DEFAULT_BASE_CAPS,
): BaseSearch {
  let evaluations = 0;
  let spent = 0;
  const test = (b: number) => {
    evaluations += 1;
    const trial = criterion(b);
    // Each evaluation counts at least 1, and reaching the evaluation cap counts as spending everything.
    spent += Math.max(1, trial.cost);
    if (evaluations >= caps.evaluations) spent = Math.max(spent, caps.totalCost);
    return trial.passes;
  };
  if (!(from > 0 && Number.isFinite(from))) return { base: null, evaluations, capped: false };

  // (1) the grid walk
  let g = firstGridBeyond(from, direction);
  let failing = from;
  while (g !== null && usable(g) && spent < caps.walkCost) {
    if (test(g)) return { base: g, evaluations, capped: false };
    failing = g;
    g = nextGridBase(g, direction);
  }
  if (g === null || !usable(g)) return { base: null, evaluations, capped: false };

  // (2) doubling from where the walk stopped
  const step = direction === 'up' ? 2 : 0.5;
  let passing: number | null = null;
  for (let i = 0; i < caps.doublings && spent < caps.totalCost; i++) {
    const b = failing * step;
    if (!usable(b)) break;
    if (test(b)) {
      passing = b;
      break;
    }
    failing = b;
  }
  if (passing === null) return { base: null, evaluations, capped: true };
  let bisected = 0;
  while (
    Math.max(passing, failing) / Math.min(passing, failing) > 1.001 &&
    bisected < caps.bisections &&
    spent < caps.totalCost
  ) {
    const mid = Math.sqrt(passing * failing);
    if (test(mid)) passing = mid;
    else failing = mid;
    bisected += 1;
  }
  let r = roundBase(passing, direction);
  for (let i = 0; r !== null && i < caps.gridSteps && spent < caps.totalCost; i++) {
    if (test(r)) return { base: r, evaluations, capped: true };
    r = nextGridBase(r, direction);
  }
  return { base: passing, evaluations, capped: true };
}
