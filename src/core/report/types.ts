/**
 * The gate's report as data: the verdict, per changed model config its metric rows and judged
 * findings, and the remedies attached to blocking findings. The decision (`compare/`) fills it,
 * the remedies (`remedy/`) complete it, the renderers print it and `read.ts` reads it back.
 */
import type { ChangedFile } from '../changes.js';
import type { FileFailure, FileReport } from '../inspect.js';
import type { MetricPath } from '../metrics/types.js';
import type { Finding, Severity } from '../model.js';
import type { Limit } from '../policy/judging.js';

export type Verdict = 'ok' | 'warn' | 'block';

/** A finding of the head version, as the gate judged it. */
export interface JudgedFinding extends Finding, Partial<RemedyFields> {
  /** The metric a `limit-crossed` finding is about (default: absent for other rules). */
  metric?: MetricPath;
  /** The base version already had it (same rule and key). */
  standing: boolean;
  /** The severity the verdict counts, after policy, standing and waiver (null: counts for nothing). */
  counts: Severity | null;
  /** A blocking finding the waiver label turned into a warning. */
  waived: boolean;
  /** Path of the file at head. */
  file: string;
}

export type LimitState = 'ok' | 'crossed' | 'unjudged';

/** One metric row: base, head, change, and the limit it was judged by. */
export interface MetricDelta {
  metric: MetricPath;
  base: number | null;
  head: number | null;
  /** head − base, null when either is missing. */
  change: number | null;
  /** Percent change, null when undefined (base missing or zero). */
  changePct: number | null;
  limit: Limit | null;
  state: LimitState;
  /** Why a limited row was not judged, e.g. the span is shorter than the limit (default: absent). */
  note?: string;
}

export interface FileDecision {
  path: string;
  previousPath: string | null;
  status: ChangedFile['status'];
  dialect: FileReport['dialect'] | null;
  verdict: Verdict;
  /** Rows that changed or are judged by a limit, in contract order. */
  deltas: MetricDelta[];
  findings: JudgedFinding[];
  base: FileReport | null;
  head: FileReport | null;
  /** Set when a version could not be read. */
  baseError: FileFailure | null;
  headError: FileFailure | null;
  /** Every blocking finding's first remedy applied at once, and whether that passes (default: absent). */
  remedyTogether?: CombinedRemedy | null;
  /** What the head's values take on assumption (the base's trained span), null when nothing (default: absent). */
  assumed?: Assumption | null;
}

export interface PolicyInfo {
  /** Where the judging came from: the base commit's policy file, or built-in rules only. */
  source: 'file' | 'built-in';
  path: string;
  /** The pull request changes the policy file: the change applies after merge. */
  changedInHead: boolean;
  /** What the head's policy would change, `key old → new` (default: absent, none or unchanged). */
  limitChanges?: string[];
}

export interface GateReport {
  version: 1;
  verdict: Verdict;
  blocking: number;
  warnings: number;
  files: FileDecision[];
  deleted: ChangedFile[];
  policy: PolicyInfo;
  waiver: { label: string | null; applied: boolean; waivedBlocks: number };
  notices: string[];
  base: string;
  head: string;
}

/** What the gate took on assumption for one file's head. */
export interface Assumption {
  /** Metrics of the head whose value rests on the assumption (they differ from the face-value reading). */
  metrics: MetricPath[];
  /** One sentence: what was assumed and why. */
  reason: string;
}

/*
 * Remedies: for a blocking finding, the nearest change to the model description (or its serving
 * block) that passes, proven by re-running the metrics and the policy decision on the changed
 * description before it is offered.
 */

/** A proposed value: a number, or a name such as a dtype or a scaling kind. */
export type ChangeValue = number | string;

/**
 * Proposed values keyed by the model description's field paths, as the location map spells them:
 * `position.base`, `position.scaling.kind`, `position.scaling.factor`,
 * `position.scaling.originalSpan`, `kvHeads`, `dtypes.cache`, `dtypes.positions`,
 * `serving.span`, `serving.sequences`, `serving.tensorParallel`, `serving.pipelineParallel`,
 * `dtypes.weights`, `quantization.groupSize`.
 */
export type Change = Record<string, ChangeValue>;

/** A change proven to pass, and what it would measure. */
export interface Remedy {
  change: Change;
  /** Metric values after the change (metric names as in the contract), the ones the finding and the change concern. */
  metrics: Record<string, number | null>;
  /** Non-blocking findings the change raises that the head did not have, as rule ids (e.g. `frequencies-changed`). */
  raises: string[];
  /** What the change costs beyond the numbers: devices, or the accuracy risk of quantized weights (default: none). */
  cost?: string;
}

/** What a blocking finding carries in every report. */
export interface RemedyFields {
  /** The nearest change that passes; null when none was found. */
  remedy: Remedy | null;
  /** Why there is no remedy; null when there is one. */
  remedyWhyNot: string | null;
  /** Other kinds of change that also pass, each proven the same way (default: `[]`). */
  remedyAlternatives: Remedy[];
}

/** Every blocking finding's remedy applied at once. */
export interface CombinedRemedy {
  change: Change;
  metrics: Record<string, number | null>;
  /** True when the file no longer has any blocking finding with all of them applied. */
  passes: boolean;
  /** Rule ids (with the metric for limits) still blocking with all of them applied. */
  stillBlocking: string[];
}
