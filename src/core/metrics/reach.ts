/**
 * How far a position scheme reaches and how the served span compares (docs/metrics.md: `reach`,
 * `scalingCover`, `headroom`, `extensionRatio`).
 */
import type { ModelSpec } from '../model.js';
import { positiveFinite } from './sizes.js';
import { tunedSpan } from './spans.js';

/** factor: the configured rotary scaling factor `s` (1 without scaling); null when degenerate. */
export function scalingFactor(spec: ModelSpec): number | null {
  const code = spec.position;
  if (code?.kind !== 'rotary' || code.scaling === null || code.scaling === undefined) return 1;
  return positiveFinite(code.scaling.factor);
}

/**
 * tokens: `reach` (docs/metrics.md): a learned table's size; null for relative buckets (no hard
 * limit, see `bucketHorizon`); otherwise `max(L0·factor, tunedSpan)`, and at least
 * `declaredSpan` when neither a trained nor a tuned span was stated explicitly (the config's own
 * claim, taken on assumption: `reachAssumed`).
 */
export function reach(
  spec: ModelSpec,
  trained: number | null,
  declared: number | null,
): number | null {
  if (spec.position?.kind === 'learned') return declared;
  if (spec.position?.kind === 'relative') return null;
  const factor = scalingFactor(spec);
  if (trained === null || factor === null) return null;
  const r = trained * factor;
  if (!Number.isFinite(r)) return null;
  if (spec.trainedSpan !== null && spec.trainedSpan !== undefined) {
    const tuned = tunedSpan(spec);
    return tuned === null ? r : Math.max(r, tuned);
  }
  return declared === null ? null : Math.max(r, declared);
}

/**
 * Whether `reach` rests on the assumption that the declared span is supported: no trained or
 * tuned span is stated, and `L0·factor` falls short of the declared span.
 */
export function reachAssumed(
  spec: ModelSpec,
  trained: number | null,
  declared: number | null,
): boolean {
  const kind = spec.position?.kind;
  if (kind === 'learned' || kind === 'relative') return false;
  if (spec.trainedSpan !== null && spec.trainedSpan !== undefined) return false;
  const factor = scalingFactor(spec);
  if (trained === null || factor === null || declared === null) return false;
  return trained * factor < declared;
}

/** tokens: `scalingCover = L0·factor` for scaled rotary codes; null otherwise. */
export function scalingCover(spec: ModelSpec, trained: number | null): number | null {
  const code = spec.position;
  if (code?.kind !== 'rotary' || !code.scaling || trained === null) return null;
  const factor = scalingFactor(spec);
  if (factor === null) return null;
  const c = trained * factor;
  return Number.isFinite(c) ? c : null;
}

/** tokens: `headroom = reach - T` (negative: the span goes past what the scheme supports). */
export function headroom(reachTokens: number | null, span: number | null): number | null {
  return reachTokens === null || span === null ? null : reachTokens - span;
}

/** ratio: `extensionRatio = T / L0`. */
export function extensionRatio(span: number | null, trained: number | null): number | null {
  return span === null || trained === null ? null : span / trained;
}
