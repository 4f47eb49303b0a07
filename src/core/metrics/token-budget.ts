/**
 * Tokens left for input once the serving block's reservations are taken (docs/metrics.md: `tokenBudget`).
 */
import type { Serving } from '../model.js';
import { nonNegativeCount } from './sizes.js';

/**
 * tokens: `T - reservedOutputTokens - reservedPromptTokens`, a missing one of the two counting 0;
 * null when the serving block gives neither, or one is not a whole number (may be negative:
 * the reservations do not fit).
 */
export function tokenBudget(
  serving: Serving | null | undefined,
  span: number | null,
): number | null {
  const out = serving?.outputTokens ?? null;
  const prompt = serving?.promptTokens ?? null;
  if (span === null || (out === null && prompt === null)) return null;
  const o = out === null ? 0 : nonNegativeCount(out);
  const p = prompt === null ? 0 : nonNegativeCount(prompt);
  return o === null || p === null ? null : span - o - p;
}
