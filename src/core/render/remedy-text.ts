/**
 * Remedies in words, the same in every report: which field changes from what to what, and the
 * metric values the change would produce. Plain text; the markdown and HTML renderers escape it.
 */
import type { MetricPath } from '../metrics/types.js';
import type { Dialect, LocationMap, ModelSpec } from '../model.js';
import { filePatches as patchesOf } from '../remedy/file-patch.js';
import { needsText as needsOf, remedyNeeds as needsFor } from '../remedy/needs.js';
import { changeEntries, currentValue } from '../remedy/apply-change.js';
import type { ChangeValue, CombinedRemedy, Remedy, RemedyFields } from '../report/types.js';
import { formatInteger, formatNumber, formatTokens } from '../format/units.js';
import { formatMetric } from '../format/metric-format.js';

export { remedyNeeds, needsText } from '../remedy/needs.js';
export { filePatches, type FilePatch } from '../remedy/file-patch.js';

const TOKEN_KEYS = new Set(['serving.span', 'position.scaling.originalSpan']);

/** A change value in the unit people read it in. */
export function formatChangeValue(key: string, value: ChangeValue | null): string {
  if (value === null) return 'not set';
  if (typeof value === 'string') return value;
  if (TOKEN_KEYS.has(key)) return formatTokens(value);
  if (key === 'position.base') return formatNumber(value, 6);
  if (Number.isInteger(value)) return formatInteger(value);
  return formatNumber(value, 6);
}

/** One field of a change: `key: before → after` (before from `spec`, when known). */
export interface ChangePart {
  key: string;
  before: string | null;
  after: string;
  /** Where the value is set now: `line 20` in the file, or the policy or flag that set it (default: `null`, not stated). */
  at: string | null;
}

export function changeParts(
  change: Remedy['change'],
  spec: ModelSpec | null,
  locations: LocationMap | null = null,
): ChangePart[] {
  return changeEntries(change).map(([key, value]) => {
    const before = spec ? currentValue(spec, key) : null;
    const loc =
      locations?.[key === 'position.scaling.kind' ? 'position.scaling' : key] ?? locations?.[key];
    const at = !loc ? null : loc.line !== null ? `line ${loc.line}` : `set by ${loc.key}`;
    return {
      key,
      before: spec ? formatChangeValue(key, before) : null,
      after: formatChangeValue(key, value),
      at,
    };
  });
}

/** The file a remedy is written for, so its fields are named by the file's own keys. */
export interface RemedyNaming {
  dialect: Dialect;
  locations: LocationMap;
  path: string;
}

/** Field path → the file's own key (`rope_scaling.factor`, `model.position.scaling.factor`, `<policy> serving.span`). */
function fileKeys(
  change: Remedy['change'],
  spec: ModelSpec | null,
  naming: RemedyNaming | null,
): Map<string, string> {
  const keys = new Map<string, string>();
  if (!spec || !naming) return keys;
  for (const patch of patchesOf(change, naming.dialect, spec, naming.locations, naming.path)) {
    for (const edit of patch.edits)
      keys.set(
        edit.field,
        patch.target === 'policy'
          ? `${patch.where} serving.${edit.key.split('.').pop()}`
          : edit.key,
      );
  }
  return keys;
}

/** `rope_scaling.factor 4 → 8, serving.sequences 8 → 5`, in the file's own keys when `naming` is given. */
export function changeText(
  change: Remedy['change'],
  spec: ModelSpec | null,
  naming: RemedyNaming | null = null,
): string {
  const keys = fileKeys(change, spec, naming);
  return changeParts(change, spec)
    .map((p) => {
      const key = keys.get(p.key) ?? p.key;
      return p.before === null ? `${key} = ${p.after}` : `${key} ${p.before} → ${p.after}`;
    })
    .join(', ');
}

/** One metric after a change. */
export interface MetricPart {
  metric: string;
  value: string;
}

export function metricParts(metrics: Remedy['metrics']): MetricPart[] {
  return Object.entries(metrics).map(([metric, value]) => ({
    metric,
    value:
      value === null && metric === 'discriminationSpan'
        ? 'none within the span'
        : formatMetric(metric as MetricPath, value),
  }));
}

/** `reach 262,144 (256k), headroom 0`. */
export function metricsText(metrics: Remedy['metrics']): string {
  return metricParts(metrics)
    .map((p) => `${p.metric} ${p.value}`)
    .join(', ');
}

/** `rope_scaling.factor 4 → 8 ⇒ reach 262,144 (256k), headroom 0; still needs …`. */
export function remedyText(
  remedy: Remedy,
  spec: ModelSpec | null,
  naming: RemedyNaming | null = null,
): string {
  const raises = remedy.raises.length > 0 ? ` (also raises ${remedy.raises.join(', ')})` : '';
  const cost = remedy.cost ? `; costs ${remedy.cost}` : '';
  const needs = spec && naming ? `; still needs ${needsOf(needsFor(remedy.change, spec))}` : '';
  return `${changeText(remedy.change, spec, naming)} ⇒ ${metricsText(remedy.metrics)}${raises}${cost}${needs}`;
}

/** Lines for one finding: the fix, each alternative, or why there is none; empty for findings without remedy fields. */
export function remedyLines(
  fields: Partial<RemedyFields>,
  spec: ModelSpec | null,
  naming: RemedyNaming | null = null,
): { label: 'fix' | 'or' | 'no fix'; text: string }[] {
  if (fields.remedy === undefined) return [];
  if (fields.remedy === null)
    return [{ label: 'no fix', text: fields.remedyWhyNot ?? 'none found' }];
  return [
    { label: 'fix', text: remedyText(fields.remedy, spec, naming) },
    ...(fields.remedyAlternatives ?? []).map((r) => ({
      label: 'or' as const,
      text: remedyText(r, spec, naming),
    })),
  ];
}

/** `All first fixes together (a, b) pass these rules` or what still blocks. */
export function togetherText(
  together: CombinedRemedy,
  spec: ModelSpec | null,
  naming: RemedyNaming | null = null,
): string {
  const verdict = together.passes
    ? 'pass these rules: nothing blocks'
    : `still block on ${together.stillBlocking.join(', ')}`;
  return `All first fixes together (${changeText(together.change, spec, naming)}) ${verdict} ⇒ ${metricsText(together.metrics)}`;
}

/** Said once wherever remedies are shown: what "passes" means and what it does not. */
export const PASSES_NOTE =
  'A fix "passes these rules" when the changed file, measured and judged again by the same rules and limits, no longer blocks; it does not show the model keeps its quality.';

/** Every remedy of a finding: the first, then the alternatives. */
export function allRemedies(fields: Partial<RemedyFields>): Remedy[] {
  return fields.remedy ? [fields.remedy, ...(fields.remedyAlternatives ?? [])] : [];
}
