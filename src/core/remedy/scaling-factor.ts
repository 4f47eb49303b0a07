/**
 * The scaling factor that makes a rotary code reach a span.
 */
import { isCount } from '../metrics/sizes.js';

/**
 * factor: `ceil(span / L0)`, the smallest whole factor `s` with `L0 · s >= span`. Position
 * interpolation stretches a code trained at `L` to `L'` with `s = L'/L` (Chen et al. 2023, §2.3,
 * Eq. 4: `f'(x, m) = f(x, mL/L')`), and `reach = L0 · factor` for every scaling kind (docs/metrics.md);
 * whole factors, as Chen et al. 2023 Table 1 and common configs use. Null when either span is not
 * a positive whole number.
 */
export function coveringFactor(span: number, trained: number): number | null {
  if (!isCount(span) || !isCount(trained)) return null;
  return Math.max(1, Math.ceil(span / trained));
}
