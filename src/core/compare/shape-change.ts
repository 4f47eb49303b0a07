/**
 * A checkpoint config whose network changed shape between base and head. The weights stored
 * with a checkpoint have the shapes its config describes (layers, width, heads, key/value heads,
 * head size, feed-forward size, vocabulary, experts); a config that changes any of them no longer
 * describes those weights, so the change needs new weights: a retraining-level change. The own
 * model format describes designs being planned and is not judged by this rule.
 */
import type { FileReport } from '../inspect.js';
import type { Finding, ModelSpec } from '../model.js';
import { RULES } from '../rules/catalog.js';
import { formatCount, formatInteger } from '../format/units.js';

/** Spec fields that fix the shapes of stored weights, with the words for them. */
export const SHAPE_FIELDS: readonly {
  field: string;
  words: string;
  of: (spec: ModelSpec) => number | null;
}[] = [
  { field: 'layers', words: 'layers', of: (s) => s.layers },
  { field: 'hidden', words: 'width', of: (s) => s.hidden },
  { field: 'heads', words: 'attention heads', of: (s) => s.heads },
  { field: 'kvHeads', words: 'key/value heads', of: (s) => s.kvHeads },
  { field: 'headDim', words: 'head size', of: (s) => s.headDim },
  { field: 'ffn', words: 'feed-forward size', of: (s) => s.ffn },
  { field: 'vocab', words: 'vocabulary', of: (s) => s.vocab },
  { field: 'experts.total', words: 'experts', of: (s) => s.experts?.total ?? 1 },
];

/** `−134M (−1.67 %)`: a signed parameter change with one minus sign. */
function signedCount(delta: number, before: number): string {
  const sign = delta > 0 ? '+' : delta < 0 ? '\u2212' : '';
  const pct =
    before !== 0 ? ` (${sign}${Number(Math.abs((delta / before) * 100).toPrecision(3))} %)` : '';
  return `${sign}${formatCount(Math.abs(delta))}${pct}`;
}

/** The shape-change finding of a checkpoint config, or null when its shapes are the same (or it is not a checkpoint). */
export function shapeChangeFinding(base: FileReport, head: FileReport): Finding | null {
  if (base.dialect !== 'checkpoint' || head.dialect !== 'checkpoint') return null;
  const changed = SHAPE_FIELDS.filter((f) => f.of(base.spec) !== f.of(head.spec));
  if (changed.length === 0) return null;
  const keyOf = (field: string) =>
    head.locations[field]?.key ?? base.locations[field]?.key ?? field;
  const parts = changed.map(
    (f) =>
      `${f.words} (${keyOf(f.field)}) ${formatInteger(f.of(base.spec))} → ${formatInteger(f.of(head.spec))}`,
  );
  const b = base.metrics.params;
  const h = head.metrics.params;
  const params =
    b !== null && h !== null
      ? `; parameters ${formatCount(b)} → ${formatCount(h)}, ${signedCount(h - b, b)}`
      : '';
  const first = head.locations[changed[0]!.field] ?? null;
  return {
    rule: 'checkpoint-shape-changed',
    severity: RULES['checkpoint-shape-changed'].severity,
    message: `The network of this checkpoint config changed shape: ${parts.join(', ')}${params}. The stored weights no longer match these shapes, so the memory and speed figures of the head describe a model that needs new weights (retraining, or converting the checkpoint and tuning it).`,
    key: first?.key ?? null,
    line: first?.line ?? null,
  };
}
