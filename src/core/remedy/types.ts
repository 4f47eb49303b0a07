/**
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
