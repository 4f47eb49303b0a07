/**
 * What a remedy still needs past these rules. A remedy passes the rules and limits it was judged
 * by; it does not keep the model's quality on its own: a new linear factor or a larger yarn
 * factor is used after fine-tuning at the longer span (the position-interpolation and YaRN
 * papers both tune after changing the factor), a narrow key/value cache needs a runtime that
 * stores it, a changed rotary base or a reshaped network needs new weights (common practice).
 */
import type { ModelSpec, ScalingKind } from '../model.js';
import { changeEntries, currentValue } from './apply-change.js';
import type { Change } from '../report/types.js';

/** Scaling kinds that are used after fine-tuning at the new factor (as published); the others are applied at inference. */
const TUNED_KINDS: readonly ScalingKind[] = ['linear', 'yarn', 'banded'];

/** One thing a remedy needs beyond passing these rules. */
export interface RemedyNeed {
  /** Short words: `fine-tuning`, `runtime support`, `new weights`. */
  kind: 'fine-tuning' | 'runtime support' | 'new weights' | 'evaluation';
  /** The sentence shown beside the remedy. */
  text: string;
}

/** What `change` applied to `spec` still needs; empty when it is a serving setting only. */
export function remedyNeeds(change: Change, spec: ModelSpec): RemedyNeed[] {
  const needs: RemedyNeed[] = [];
  const entries = new Map(changeEntries(change));
  const factor = entries.get('position.scaling.factor');
  if (typeof factor === 'number') {
    const kind = (entries.get('position.scaling.kind') ??
      currentValue(spec, 'position.scaling.kind') ??
      'linear') as ScalingKind;
    const before = currentValue(spec, 'position.scaling.factor');
    const fresh = before === null;
    if (TUNED_KINDS.includes(kind)) {
      needs.push({
        kind: 'fine-tuning',
        text: `fine-tuning at the longer span with the ${fresh ? 'new' : 'larger'} ${kind} factor ${factor}`,
      });
    } else {
      needs.push({
        kind: 'evaluation',
        text: `an evaluation at the longer span: ${kind} scaling is applied without tuning, and quality there is not shown by a config`,
      });
    }
  }
  if (entries.has('position.base'))
    needs.push({
      kind: 'new weights',
      text: 'retraining: the model was trained at the old rotary base',
    });
  const cache = entries.get('dtypes.cache');
  if (cache === 'int4' || cache === 'int8' || cache === 'fp8') {
    needs.push({
      kind: 'runtime support',
      text: `a serving runtime that stores the key/value cache in ${cache} (not every runtime does)`,
    });
  }
  if (entries.has('kvHeads'))
    needs.push({
      kind: 'new weights',
      text: 'new weights: a different key/value head count is a retraining-level change',
    });
  const weights = entries.get('dtypes.weights');
  if (weights === 'int4' || weights === 'int8' || weights === 'fp8') {
    needs.push({
      kind: 'evaluation',
      text: `a ${weights} quantized checkpoint and an accuracy evaluation of it (quantization can lose quality)`,
    });
  }
  return needs;
}

/** `fine-tuning …; runtime support …`, or that nothing else is needed. */
export function needsText(needs: readonly RemedyNeed[]): string {
  return needs.length === 0
    ? 'nothing else (a serving setting)'
    : needs.map((n) => n.text).join('; ');
}
