/**
 * Context scaling of rotary frequencies, `θ_i → θ'_i` (docs/metrics.md, symbol `θ'_i`).
 */
import { elementAt } from '../element-at.js';
import type { Scaling } from '../model.js';
import { allPositiveFinite } from './frequencies.js';
import { positiveFinite } from './sizes.js';

/**
 * base: NTK-aware base `b' = b s^(r/(r-2))` (Peng et al. 2023, YaRN, §3.1, Eq. 16); null when
 * `r <= 2` or the result is not finite.
 */
export function ntkBase(base: number, factor: number, r: number): number | null {
  if (positiveFinite(base) === null || positiveFinite(factor) === null || !(r > 2)) return null;
  return positiveFinite(base * Math.pow(factor, r / (r - 2)));
}

/**
 * ratio: yarn ramp `γ = clamp((ρ - α)/(β - α), 0, 1)` of `ρ = L0/λ` (Peng et al. 2023, YaRN,
 * Eq. 18; docs/metrics.md takes `λ` from the unscaled frequencies). `α = β` (Kimi K2's published
 * config) is the ramp's limit as `β` falls to `α`: a step, `γ = 1` for `ρ > α`, else 0.
 */
export function yarnRamp(rho: number, alpha: number, beta: number): number | null {
  if (!Number.isFinite(alpha) || !Number.isFinite(beta) || Number.isNaN(rho)) return null;
  if (alpha === beta) return rho > alpha ? 1 : 0;
  const g = (rho - alpha) / (beta - alpha);
  return g < 0 ? 0 : g > 1 ? 1 : g;
}

/**
 * ratio: softmax temperature factor `0.1 ln(s) + 1` (Peng et al. 2023, YaRN, Eq. 22); null for a
 * factor that is not a positive finite number.
 */
export function yarnAttentionScale(factor: number): number | null {
  return positiveFinite(factor) === null ? null : 0.1 * Math.log(factor) + 1;
}

/**
 * factor: effective scaling factor `s`: the configured factor; `max(1, T/L0)` for dynamic
 * scaling (Peng et al. 2023, YaRN, §3.3).
 */
export function effectiveFactor(
  scaling: Scaling,
  span: number | null,
  trained: number | null,
): number | null {
  if (scaling.kind === 'pairwise') return 1;
  if (scaling.kind === 'dynamic') {
    if (span === null || trained === null) return null;
    return Math.max(1, span / trained);
  }
  return positiveFinite(scaling.factor);
}

/**
 * factors: the per-pair factors pairwise (LongRoPE) scaling applies over span `T` with original
 * span `L0`: the long factors once `T > L0`, the short ones otherwise, as the published
 * implementation chooses them (LongRoPE, Ding et al. 2024; Phi-3's `longrope` rotary code). Null
 * when the chosen list is missing or `T`/`L0` is unknown.
 */
export function pairwiseFactors(
  scaling: Scaling,
  span: number | null,
  trained: number | null,
): number[] | null {
  if (span === null || trained === null) return null;
  const factors = span > trained ? scaling.longFactors : scaling.shortFactors;
  if (!factors || !factors.every((f) => Number.isFinite(f) && f > 0)) return null;
  return factors;
}

/**
 * ratio: the attention factor of pairwise (LongRoPE) scaling: the stated one, else
 * `sqrt(1 + ln(s)/ln(L0))` for `s > 1` and 1 otherwise, with `s` the scaling factor (declared
 * over original span) — the published implementation's default, after the LongRoPE paper
 * (Ding et al. 2024). Null when `s` or `L0` is unusable.
 */
export function pairwiseAttentionFactor(scaling: Scaling, trained: number | null): number | null {
  if (scaling.attentionFactor !== null && scaling.attentionFactor !== undefined)
    return positiveFinite(scaling.attentionFactor);
  const s = positiveFinite(scaling.factor);
  if (s === null || trained === null || !(trained > 1)) return null;
  return s <= 1 ? 1 : Math.sqrt(1 + Math.log(s) / Math.log(trained));
}

/**
 * per token: scaled frequencies `θ'_i` (docs/metrics.md): linear `θ/s` (Chen et al. 2023, eq. 4);
 * ntk and dynamic `b'^(-2i/r)` (Peng et al. 2023, Eq. 16 and §3.3); yarn `(1-γ)θ/s + γθ`
 * (Peng et al. 2023, Eqs. 17–20); banded: common practice; pairwise `θ_i / factor_i` with the
 * factors `pairwiseFactors` chooses (LongRoPE, Ding et al. 2024). No scaling: `θ` itself.
 * `span` is `T`, `trained` is `L0`; null for degenerate input.
 */
export function scaleFrequencies(
  theta: Float64Array,
  base: number,
  r: number,
  scaling: Scaling | null,
  span: number | null,
  trained: number | null,
): Float64Array | null {
  if (scaling === null) return theta;
  const s = effectiveFactor(scaling, span, trained);
  if (s === null) return null;
  const out = new Float64Array(theta.length);
  switch (scaling.kind) {
    case 'linear':
      for (const [i, t] of theta.entries()) out[i] = t / s;
      break;
    case 'ntk':
    case 'dynamic': {
      const b = ntkBase(base, s, r);
      if (b === null) return null;
      for (let i = 0; i < theta.length; i++) out[i] = Math.pow(b, (-2 * i) / r);
      break;
    }
    case 'yarn': {
      if (trained === null) return null;
      for (const [i, t] of theta.entries()) {
        const rho = trained / ((2 * Math.PI) / t);
        const g = yarnRamp(rho, scaling.alpha, scaling.beta);
        if (g === null) return null;
        out[i] = ((1 - g) * t) / s + g * t;
      }
      break;
    }
    case 'banded': {
      const { low, high } = scaling;
      if (
        trained === null ||
        !(Number.isFinite(low) && Number.isFinite(high) && low >= 0 && high >= low)
      )
        return null;
      for (const [i, t] of theta.entries()) {
        const lambda = (2 * Math.PI) / t;
        if (lambda < trained / high) out[i] = t;
        else if (lambda > trained / low) out[i] = t / s;
        // Equal ends (Llama 4's published configs): a step, no ramp. A wavelength exactly at the
        // boundary keeps θ (where the common implementation's ramp is 0/0).
        else if (high === low) out[i] = t;
        else {
          const g = (trained / lambda - low) / (high - low);
          out[i] = ((1 - g) * t) / s + g * t;
        }
      }
      break;
    }
    case 'pairwise': {
      const factors = pairwiseFactors(scaling, span, trained);
      if (factors === null || factors.length !== theta.length) return null;
      for (const [i, t] of theta.entries()) out[i] = t / elementAt(factors, i);
      break;
    }
    default:
      return null;
  }
  return allPositiveFinite(out) ? out : null;
}
