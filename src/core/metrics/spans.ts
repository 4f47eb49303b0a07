/**
 * The spans every positional metric is measured over (docs/metrics.md, symbols `T` and `L0`).
 */
import type { ModelSpec } from '../model.js';
import { positiveCount } from './sizes.js';

/** tokens: the config's maximum positions, null when not a positive whole number. */
export function declaredSpan(spec: ModelSpec): number | null {
  return positiveCount(spec.declaredSpan);
}

/** tokens: the served span (serving block, policy or CLI flag), null when none or invalid. */
export function servedSpan(spec: ModelSpec): number | null {
  return positiveCount(spec.serving?.span);
}

/**
 * tokens: `T`, the served span when one is given, otherwise the declared span (docs/metrics.md).
 * A served span that is given but invalid gives null rather than silently falling back.
 */
export function evaluationSpan(spec: ModelSpec): number | null {
  const served = spec.serving?.span;
  if (served !== null && served !== undefined) return positiveCount(served);
  return declaredSpan(spec);
}

/**
 * tokens: `L0`, the original span of a rotary scaling block (`original_max_position_embeddings`,
 * inside the block or at the top level), else an explicit trained span (model file, policy or
 * `--trained-span`), else the declared span (docs/metrics.md). A stated but invalid value gives null.
 */
export function trainedSpan(spec: ModelSpec): number | null {
  const code = spec.position;
  if (
    code?.kind === 'rotary' &&
    code.scaling &&
    code.scaling.originalSpan !== null &&
    code.scaling.originalSpan !== undefined
  ) {
    return positiveCount(code.scaling.originalSpan);
  }
  if (spec.trainedSpan !== null && spec.trainedSpan !== undefined)
    return positiveCount(spec.trainedSpan);
  return declaredSpan(spec);
}

/**
 * tokens: `tunedSpan`: for a rotary code with a scaling block, the explicitly stated trained span,
 * which is the span the scaled model was trained or tuned at (docs/metrics.md); null when none is
 * stated, when there is no scaling block, or when the stated value is invalid.
 */
export function tunedSpan(spec: ModelSpec): number | null {
  const code = spec.position;
  if (code?.kind !== 'rotary' || !code.scaling) return null;
  if (spec.trainedSpan === null || spec.trainedSpan === undefined) return null;
  return positiveCount(spec.trainedSpan);
}

/**
 * tokens: `bucketHorizon`: for relative-bucket codes, the distance past which every offset shares
 * the last bucket (`relative_attention_max_distance`; Raffel et al. 2020, section 2.1); null otherwise.
 */
export function bucketHorizon(spec: ModelSpec): number | null {
  return spec.position?.kind === 'relative' ? positiveCount(spec.position.maxDistance) : null;
}
