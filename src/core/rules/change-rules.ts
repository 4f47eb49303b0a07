/**
 * Rules about a change between base and head: findings that only make sense with both versions
 * of a model config read (a span grown with the code unchanged, new position frequencies, a
 * different cache per token, a checkpoint whose network changed shape).
 */
import type { Dialect, Finding, LocationMap, ModelSpec } from '../model.js';
import type { Metrics } from '../metrics/types.js';
import { rotaryHeadDim, rotaryWidth } from '../metrics/frequencies.js';
import { MINUS } from '../format/metric-format.js';
import { formatCount, formatInteger, formatNumber, percentChange } from '../format/units.js';
import { RULES } from './catalog.js';
import { firstStated } from './first-stated.js';

/** One version of a model config as the change rules read it (an inspected file is one). */
export interface MeasuredVersion {
  dialect: Dialect;
  spec: ModelSpec;
  metrics: Metrics;
  locations: LocationMap;
}

/** The position codes are the same (kind, base, width share, scaling block). */
export function samePositionCode(a: ModelSpec, b: ModelSpec): boolean {
  return JSON.stringify(a.position) === JSON.stringify(b.position);
}

/** The same position code and the same stated trained span. */
export function sameCode(a: ModelSpec, b: ModelSpec): boolean {
  return samePositionCode(a, b) && a.trainedSpan === b.trainedSpan;
}

/** The channels a rotary code turns (0 when its width is unusable, as the metrics read it). */
function rotaryChannels(spec: ModelSpec): number {
  return spec.position.kind === 'rotary'
    ? (rotaryWidth(rotaryHeadDim(spec), spec.position.fraction) ?? 0)
    : 0;
}

/** Frequencies before scaling: they follow from the code kind, the rotary base and width, or d_model. */
function frequencyKey(spec: ModelSpec): string {
  const code = spec.position;
  if (code.kind === 'rotary')
    return `rotary:${code.base}:${rotaryChannels(spec)}:${spec.localBase ?? ''}`;
  if (code.kind === 'sinusoidal') return `sinusoidal:${spec.hidden}`;
  return code.kind;
}

/** Findings that only make sense as a change between base and head. */
export function changeFindings(base: MeasuredVersion, head: MeasuredVersion): Finding[] {
  const findings: Finding[] = [];
  const b = base.metrics;
  const h = head.metrics;
  const at = (...paths: string[]) => firstStated(head.locations, paths);
  if (
    b.declaredSpan !== null &&
    h.declaredSpan !== null &&
    h.declaredSpan > b.declaredSpan &&
    sameCode(base.spec, head.spec)
  ) {
    findings.push({
      rule: 'span-grew-code-unchanged',
      severity: RULES['span-grew-code-unchanged'].severity,
      message: `The declared span grew from ${formatInteger(b.declaredSpan)} to ${formatInteger(h.declaredSpan)} tokens while the position code (${head.spec.position.kind}${head.spec.position.kind === 'rotary' ? `, base ${formatNumber(head.spec.position.base, 6)}, ${head.spec.position.scaling ? `${head.spec.position.scaling.kind} × ${head.spec.position.scaling.factor}` : 'no scaling'}` : ''}) stayed the same; add or raise context scaling so the code reaches ${formatInteger(h.declaredSpan)}, or state the trained span if the model was trained that long.`,
      ...at('declaredSpan'),
    });
  }
  const before = frequencyKey(base.spec);
  const after = frequencyKey(head.spec);
  if (before !== after) {
    const describe = (spec: ModelSpec) =>
      spec.position.kind === 'rotary'
        ? `rotary base ${formatNumber(spec.position.base, 6)}${spec.localBase ? ` (local layers ${formatNumber(spec.localBase, 6)})` : ''} over ${rotaryChannels(spec)} channels`
        : spec.position.kind === 'sinusoidal'
          ? `sinusoidal over ${spec.hidden} channels`
          : `${spec.position.kind} code`;
    findings.push({
      rule: 'frequencies-changed',
      severity: RULES['frequencies-changed'].severity,
      message: `The position frequencies changed from ${describe(base.spec)} to ${describe(head.spec)}: the checkpoint was trained with the old ones, so this needs retraining or tuning at the new frequencies.`,
      ...at(
        'position.base',
        'localBase',
        'position.fraction',
        'headDim',
        'latent.ropeDim',
        'position',
      ),
    });
  }
  if (
    b.cachePerTokenBytes !== null &&
    h.cachePerTokenBytes !== null &&
    b.cachePerTokenBytes !== h.cachePerTokenBytes
  ) {
    const pct = percentChange(b.cachePerTokenBytes, h.cachePerTokenBytes);
    const cacheOf = (spec: ModelSpec) => spec.dtypes.cache ?? spec.dtypes.weights ?? 'bf16';
    const causes = [
      base.spec.kvHeads !== head.spec.kvHeads &&
        `key/value heads ${base.spec.kvHeads} → ${head.spec.kvHeads}`,
      base.spec.headDim !== head.spec.headDim &&
        `head size ${base.spec.headDim} → ${head.spec.headDim}`,
      cacheOf(base.spec) !== cacheOf(head.spec) &&
        `cache dtype ${cacheOf(base.spec)} → ${cacheOf(head.spec)}`,
      base.spec.layers !== head.spec.layers && `layers ${base.spec.layers} → ${head.spec.layers}`,
      JSON.stringify([
        base.spec.slidingWindow,
        base.spec.windowLayers,
        base.spec.layerTypes ?? null,
        base.spec.chunkSize ?? null,
      ]) !==
        JSON.stringify([
          head.spec.slidingWindow,
          head.spec.windowLayers,
          head.spec.layerTypes ?? null,
          head.spec.chunkSize ?? null,
        ]) && 'layer pattern',
      JSON.stringify(base.spec.latent ?? null) !== JSON.stringify(head.spec.latent ?? null) &&
        'latent attention',
      Boolean(base.spec.encoderOnly) !== Boolean(head.spec.encoderOnly) && 'encoder-only',
    ]
      .filter(Boolean)
      .join(', ');
    findings.push({
      rule: 'cache-per-token-changed',
      severity: RULES['cache-per-token-changed'].severity,
      message: `Key/value cache per token changed from ${formatInteger(b.cachePerTokenBytes)} to ${formatInteger(h.cachePerTokenBytes)} bytes (${pct === null ? 'n/a' : `${pct > 0 ? '+' : '−'}${formatNumber(Math.abs(pct), 3)} %`})${causes ? `: ${causes}` : ''}.`,
      ...at('kvHeads', 'latent.kvRank', 'dtypes.cache', 'headDim'),
    });
  }
  const shape = shapeChangeFinding(base, head);
  if (shape) findings.push(shape);
  return findings;
}

/*
 * A checkpoint config whose network changed shape between base and head. The weights stored
 * with a checkpoint have the shapes its config describes (layers, width, heads, key/value heads,
 * head size, feed-forward size, vocabulary, experts); a config that changes any of them no longer
 * describes those weights, so the change needs new weights: a retraining-level change. The own
 * model format describes designs being planned and is not judged by this rule.
 */

/** Spec fields that fix the shapes of stored weights, with the words for them. */
const SHAPE_FIELDS: readonly {
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
  const sign = delta > 0 ? '+' : delta < 0 ? MINUS : '';
  const pct =
    before !== 0 ? ` (${sign}${Number(Math.abs((delta / before) * 100).toPrecision(3))} %)` : '';
  return `${sign}${formatCount(Math.abs(delta))}${pct}`;
}

/** The shape-change finding of a checkpoint config, or null when its shapes are the same (or it is not a checkpoint). */
function shapeChangeFinding(base: MeasuredVersion, head: MeasuredVersion): Finding | null {
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
