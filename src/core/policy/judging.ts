import type { Severity } from '../model.js';

/** One limit of the team's policy on one metric. */
export interface Limit {
  /** Head value must not exceed this (default: none). */
  max?: number;
  /** Head value must not fall below this (default: none). */
  min?: number;
  /** Head may grow at most this many percent over base (default: none). */
  maxIncreasePct?: number;
  /** Severity of a crossing (default: `block`). */
  severity: Severity;
}

/** What the policy says for one file, in the terms the decision needs. */
export interface Judging {
  /** Keyed by metric name exactly as in the metric contract (`precision.fp16.collidingPositions` for the formats). */
  limits: Record<string, Limit>;
  /** Rule id to a severity, or `off` (default: the rule's own severity). */
  rules: Record<string, Severity | 'off'>;
  /** Whether findings the base already had still block (default: `report`). */
  standing: 'report' | 'block';
}

export const BUILT_IN_JUDGING: Judging = { limits: {}, rules: {}, standing: 'report' };
