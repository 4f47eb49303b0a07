/**
 * The team policy as the gate uses it: the YAML file's keys normalised to camelCase, every value
 * checked. `Policy` is the whole file; `FilePolicy` is what applies to one model config after
 * the overrides.
 */
import type { Judging, Limit } from './judging.js';
import type {
  FloatFormat,
  ServingPatch,
  Severity,
  SourceLocation,
  StorageDType,
} from '../model.js';

export type RuleLevel = Severity | 'off';
export type Standing = 'report' | 'block';

/** The `serving` block exactly as the file spells it (kebab-case keys). */
export interface PolicyServingBlock {
  span?: number;
  sequences?: number;
  'device-memory-gib'?: number;
  reserve?: number;
  weights?: StorageDType;
  cache?: StorageDType;
  positions?: FloatFormat;
  'output-tokens'?: number;
  'prompt-tokens'?: number;
  'trained-span'?: number;
  'tensor-parallel'?: number;
  'pipeline-parallel'?: number;
  'activation-reserve-gib'?: number;
  'weight-group-size'?: number;
}

/**
 * One `limits` entry as written. `null` for a bound removes a bound an earlier entry set; a
 * bound left out keeps it. `null` for the whole entry (in `LimitTable`) removes the limit.
 */
export interface LimitSetting {
  max?: number | null;
  min?: number | null;
  maxIncreasePct?: number | null;
  severity?: Severity;
}

/** Metric name (as in the metric contract) to its limit setting; null-prototype. */
export type LimitTable = Readonly<Record<string, LimitSetting | null>>;

/** Rule id to level; null-prototype. */
export type RuleTable = Readonly<Record<string, RuleLevel>>;

export interface PolicyOverride {
  /** Globs of the configs this entry applies to. */
  files: readonly string[];
  serving: ServingPatch;
  limits: LimitTable;
  rules: RuleTable;
}

export interface Policy {
  /** Path the policy was read from; `null` for the built-in policy (no file in the repository). */
  path: string | null;
  /** Globs picking the model configs (default: `DEFAULT_FILES`). */
  files: readonly string[];
  /** Globs never judged (default: `DEFAULT_EXCLUDE`). */
  exclude: readonly string[];
  /** Serving defaults for every config; a value the config states wins (default: `{}`). */
  serving: ServingPatch;
  /** Limits keyed by metric name exactly as in the metric contract (default: `{}`, no limits). */
  limits: LimitTable;
  /** Rule id to level (default: `{}`, every rule at its own severity). */
  rules: RuleTable;
  /** Applied in order to the configs their globs match; later entries win (default: `[]`). */
  overrides: readonly PolicyOverride[];
  /** Whether a finding the base already had still blocks (default: `report`). */
  standing: Standing;
  /** Pull-request label that turns blocks into warnings (default: `null`, no waiver). */
  waiverLabel: string | null;
  /**
   * Where each setting was written: `files`, `exclude`, `serving.<field>`, `limits.<metric>`,
   * `rules.<id>`, `standing`, `waiver-label`, and `overrides[i].<same>`, to the key as written
   * and its 1-based line. Empty for the built-in policy.
   */
  locations: Readonly<Record<string, SourceLocation>>;
}

/**
 * What applies to one model config: the top level with every matching override laid over it.
 * Structurally a `Judging` (the compare stage's input) plus serving defaults and the waiver label.
 */
export interface FilePolicy extends Judging {
  limits: Record<string, Limit>;
  rules: Record<string, RuleLevel>;
  standing: Standing;
  serving: ServingPatch;
  waiverLabel: string | null;
  /**
   * Where each effective value was set, keyed `serving.<field>` (camelCase, as in
   * `ServingPatch`), `limits.<metric>`, `rules.<id>`: the policy key as written and its line.
   */
  origins: Record<string, SourceLocation>;
}

/** One thing wrong with a policy file. */
export interface PolicyProblem {
  file: string;
  /** 1-based line, null when the problem has no place (e.g. the file is too large). */
  line: number | null;
  /** Dotted key path as written (e.g. `overrides[0].limits.headroom.max`), null for the file. */
  key: string | null;
  /** Quotes the bad value and says what was expected. */
  message: string;
}
