/**
 * The spans every positional metric is measured over (METRICS.md, symbols `T` and `L0`).
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
 * tokens: `T`, the served span when one is given, otherwise the declared span (METRICS.md).
 * A served span that is given but invalid gives null rather than silently falling back.
 */
export function evaluationSpan(spec: ModelSpec): number | null {
  const served = spec.serving?.span;
  if (served !== null && served !== undefined) return positiveCount(served);
  return declaredSpan(spec);
}

/**
 * tokens: `L0`, an explicit trained span, else the original span of a rotary scaling block,
 * else the declared span (METRICS.md). A stated but invalid value gives null.
 */
export function trainedSpan(spec: ModelSpec): number | null {
  if (spec.trainedSpan !== null && spec.trainedSpan !== undefined) return positiveCount(spec.trainedSpan);
  const code = spec.position;
  if (code?.kind === 'rotary' && code.scaling && code.scaling.originalSpan !== null && code.scaling.originalSpan !== undefined) {
    return positiveCount(code.scaling.originalSpan);
  }
  return declaredSpan(spec);
}
