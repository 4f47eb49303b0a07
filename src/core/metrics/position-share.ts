/**
 * Share of the input energy that an additive position code carries at initialisation
 * (docs/metrics.md: `positionShare`).
 */
import type { ModelSpec } from '../model.js';
import { finiteOrNull, positiveCount, positiveFinite } from './sizes.js';

/**
 * 0..1: `code / (code + token)` per token at initialisation, with token energy
 * `hidden·std²·multiplier²` and code energy `hidden/2` for sinusoidal codes (each pair's
 * sin² + cos² = 1; Vaswani et al. 2017, §3.5), or `hidden·std²` for a learned table, assumed
 * initialised like the token embedding (common practice). Null for other codes, an unknown or
 * degenerate std, or a degenerate multiplier (multiplier default: `1`).
 */
export function positionShare(spec: ModelSpec): number | null {
  const kind = spec.position?.kind;
  if (kind !== 'sinusoidal' && kind !== 'learned') return null;
  const hidden = positiveCount(spec.hidden);
  const std = positiveFinite(spec.embeddingInitStd);
  const multiplier =
    spec.embeddingMultiplier === null || spec.embeddingMultiplier === undefined
      ? 1
      : finiteOrNull(spec.embeddingMultiplier);
  if (hidden === null || std === null || multiplier === null) return null;
  const token = hidden * std * std * multiplier * multiplier;
  const code = kind === 'sinusoidal' ? hidden / 2 : hidden * std * std;
  const share = code / (code + token);
  return Number.isFinite(share) ? share : null;
}
