import type { Severity } from './model.js';

/** Sort key: block first. */
export const SEVERITY_ORDER: Record<Severity, number> = { block: 0, warn: 1, info: 2 };

/** The more severe of two severities. */
export function worse(a: Severity, b: Severity): Severity {
  return SEVERITY_ORDER[a] <= SEVERITY_ORDER[b] ? a : b;
}
