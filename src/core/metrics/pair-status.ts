/**
 * What each frequency pair does over the trained and the evaluated span, pair by pair: the
 * per-pair form of `unturnedPairs` and `exposedPairs` (docs/metrics.md), for charts that colour them.
 */

import { elementAt } from '../element-at.js';

/**
 * `turning`: finishes a turn within `L0`. `unturned`: `2π/θ'_i > L0` (docs/metrics.md,
 * unturnedPairs). `exposed`: `θ_i L0 < 2π` and `θ'_i T > θ_i L0 (1 + 1e-9)`, reaching angles
 * never seen in training (docs/metrics.md, exposedPairs); a pair that is both is `exposed`.
 */
export type PairStatus = 'turning' | 'unturned' | 'exposed';

/** Wavelength and status of one pair. */
export interface PairInfo {
  /** tokens: `2π/θ'_i`. */
  wavelength: number;
  /** tokens: `2π/θ_i`, before scaling. */
  unscaledWavelength: number;
  status: PairStatus;
}

/**
 * Per pair: wavelength after and before scaling, and status over trained span `L0` and
 * evaluation span `T` (`exposedPairs` is the tally of `exposed`; `unturnedPairs` the tally of
 * wavelengths above `L0`, whatever the status); null when the arrays differ in length or a span
 * is not positive.
 */
export function pairStatuses(
  theta: Float64Array,
  scaled: Float64Array,
  trained: number,
  span: number,
): PairInfo[] | null {
  if (theta.length !== scaled.length || !(trained > 0) || !(span > 0)) return null;
  const out: PairInfo[] = [];
  for (const [i, th] of theta.entries()) {
    const sc = elementAt(scaled, i);
    const seen = th * trained;
    const exposed = seen < 2 * Math.PI && sc * span > seen * (1 + 1e-9);
    const wavelength = (2 * Math.PI) / sc;
    const status: PairStatus = exposed ? 'exposed' : wavelength > trained ? 'unturned' : 'turning';
    out.push({ wavelength, unscaledWavelength: (2 * Math.PI) / th, status });
  }
  return out;
}
