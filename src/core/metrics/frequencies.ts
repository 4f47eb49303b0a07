/**
 * Frequency pairs of a position code before any context scaling (docs/metrics.md, symbols `P`, `θ_i`).
 */
import type { ModelSpec } from '../model.js';
import { positiveCount, positiveFinite } from './sizes.js';

/**
 * count: most frequency pairs any scan accepts; wider codes are degenerate input and give null
 * frequency metrics rather than exhausting memory (no published code comes near: heads are a
 * few hundred wide at most).
 */
export const MAX_PAIRS = 65536;

/** Sinusoidal base `10000` (Vaswani et al. 2017, §3.5). */
export const SINUSOIDAL_BASE = 10000;

/**
 * channels: `headDim * fraction` read as the whole number it stands for when it is one within
 * 1e-9 relative, else as it is. A decimal share is inexact in binary: `100 * 0.58` is
 * `57.99999999999999` in binary64 (IEEE 754 round to nearest), though the config means 58.
 */
export function rotatedChannels(headDim: number, fraction: number): number {
  const width = headDim * fraction;
  const nearest = Math.round(width);
  return Math.abs(width - nearest) <= 1e-9 * Math.max(1, width) ? nearest : width;
}

/**
 * dimensions: rotated width `r = 2 floor(headDim * fraction / 2)` (Su et al. 2021, RoFormer,
 * §3.2.2, with the partial-rotation fraction of common practice), the product as
 * `rotatedChannels` reads it; null for degenerate input.
 */
export function rotaryWidth(headDim: number, fraction: number): number | null {
  const width = positiveCount(headDim);
  if (width === null || !(fraction > 0 && fraction <= 1)) return null;
  const r = 2 * Math.floor(rotatedChannels(width, fraction) / 2);
  return r >= 2 && r / 2 <= MAX_PAIRS ? r : null;
}

/**
 * dimensions: the per-head width the rotary code turns: the decoupled rotary width `d_h^R` for
 * latent attention (Liu et al. 2024, DeepSeek-V2, §2.1.3: only that part carries positions),
 * the head width otherwise.
 */
export function rotaryHeadDim(spec: ModelSpec): number {
  return spec.latent ? spec.latent.ropeDim : spec.headDim;
}

/**
 * per token: `θ_i = base^(-2i/d)`, `i = 0..P-1`, `P = d/2` (Vaswani et al. 2017 §3.5 with
 * base 10000 and `d = d_model`; Su et al. 2021, RoFormer, eq. 15 with `d = r`).
 */
export function geometricFrequencies(base: number, d: number): Float64Array | null {
  if (
    positiveFinite(base) === null ||
    positiveCount(d) === null ||
    d % 2 !== 0 ||
    d / 2 > MAX_PAIRS
  )
    return null;
  const pairs = d / 2;
  const theta = new Float64Array(pairs);
  for (let i = 0; i < pairs; i++) theta[i] = Math.pow(base, (-2 * i) / d);
  return allPositiveFinite(theta) ? theta : null;
}

/**
 * per token: the unscaled frequencies `θ_i` of the spec's code: sinusoidal over `hidden`
 * (odd widths are degenerate), rotary over `r` (at `base` when given, e.g. the local layers'
 * own base); null for learned, ALiBi and position-free codes.
 */
export function baseFrequencies(spec: ModelSpec, base?: number): Float64Array | null {
  const code = spec.position;
  if (code?.kind === 'sinusoidal') return geometricFrequencies(SINUSOIDAL_BASE, spec.hidden);
  if (code?.kind === 'rotary') {
    const r = rotaryWidth(rotaryHeadDim(spec), code.fraction);
    return r === null ? null : geometricFrequencies(base ?? code.base, r);
  }
  return null;
}

/** True when every entry is finite and above zero (a frequency of zero never turns). */
export function allPositiveFinite(values: Float64Array): boolean {
  for (const v of values) if (!(v > 0 && v < Infinity)) return false;
  return values.length > 0;
}
