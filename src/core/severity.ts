import type { Severity } from './model.js';

/** Sort key: block first. */
export const SEVERITY_ORDER: Record<Severity, number> = { block: 0, warn: 1, info: 2 };
