/**
 * The few numbers that say what a pull request did to one config, as cards a reader takes in at
 * a glance: the metrics behind blocking findings first, then crossed limits, then other changes,
 * each with base → head and a tone (bad, warning, better, neutral).
 */
import type { FileDecision } from '../../report/types.js';
import { metricValue } from '../../metrics/metric-path.js';
import { usableDeviceBytes } from '../../metrics/memory-curve.js';
import type { MetricPath } from '../../metrics/types.js';
import { formatInteger } from '../../format/units.js';
import { formatMetric } from '../../format/metric-format.js';
import { MEMORY_CAUTION_SHORT as MEMORY_CAUTION } from '../marks.js';
import { tokenLabel } from './chart-frame.js';
import { h, type Markup } from './markup.js';

interface CardSpec {
  metric: MetricPath;
  label: string;
  /** Which way is better (null: neither). */
  better: 'up' | 'down' | null;
}

const CARDS: CardSpec[] = [
  { metric: 'evaluationSpan', label: 'Evaluated span', better: null },
  { metric: 'declaredSpan', label: 'Declared span', better: null },
  { metric: 'headroom', label: 'Headroom to reach', better: 'up' },
  { metric: 'reach', label: 'Reach', better: 'up' },
  { metric: 'trainedSpan', label: 'Trained span', better: null },
  { metric: 'discriminationSpan', label: 'First offset with S(k) < 0', better: 'up' },
  { metric: 'exposedPairs', label: 'Exposed pairs', better: 'down' },
  { metric: 'memoryBytesPerDevice', label: 'Memory per device at the span', better: 'down' },
  { metric: 'memoryBytes', label: 'Memory at the span', better: 'down' },
  { metric: 'fitSequences', label: 'Sequences that fit', better: 'up' },
  { metric: 'cachePerTokenBytes', label: 'Cache per token', better: 'down' },
];

/** Metrics a blocking rule is about. */
const RULE_METRICS: Record<string, MetricPath[]> = {
  'span-past-reach': ['headroom', 'reach', 'evaluationSpan'],
  'span-beyond-scaling-cover': ['declaredSpan', 'reach'],
  'span-grew-code-unchanged': ['declaredSpan', 'trainedSpan'],
  'memory-over-budget': ['memoryBytesPerDevice', 'memoryBytes', 'fitSequences'],
  'layout-unshardable': ['devices', 'kvHeadsPerDevice'],
};

/** Most cards a file shows (default: `6`). */
export const MAX_CARDS = 6;

type Tone = 'bad' | 'warn' | 'good' | '';

const TOKEN_METRICS = new Set([
  'evaluationSpan',
  'declaredSpan',
  'headroom',
  'reach',
  'trainedSpan',
  'discriminationSpan',
]);

/** Short enough for a card: token counts as `256k` when round, everything else as in the tables. */
function valueText(metric: MetricPath, value: number | null): string {
  if (value === null && metric === 'discriminationSpan') return 'none in span';
  if (value !== null && TOKEN_METRICS.has(metric) && value !== 0)
    return `${value < 0 ? '−' : ''}${tokenLabel(Math.abs(value))}`;
  return formatMetric(metric, value);
}

export function changeCards(file: FileDecision): Markup | null {
  const head = file.head;
  if (!head) return null;
  const base = file.base;
  const own = head.spec.dtypes.positions ?? 'fp32';
  const colliding = `precision.${own}.collidingPositions` as MetricPath;
  const ruleMetrics = (rule: string): MetricPath[] =>
    rule === 'positions-collide' ? [colliding] : (RULE_METRICS[rule] ?? []);
  const blocking = new Set<string>(
    file.findings
      .filter((f) => f.severity === 'block')
      .flatMap((f) => (f.metric ? [f.metric] : ruleMetrics(f.rule))),
  );
  const crossed = new Map(
    file.deltas
      .filter((d) => d.state === 'crossed')
      .map((d) => [d.metric as string, d.limit?.severity ?? 'block']),
  );
  // On one device the per-device memory is the memory itself: one card, not two.
  const several =
    (head.metrics.devices ?? 1) > 1 || (base !== null && (base.metrics.devices ?? 1) > 1);
  // A reshaped checkpoint's budget figures describe weights it does not have: never a gain.
  const reshaped = file.findings.some((f) => f.rule === 'checkpoint-shape-changed');
  const SHAPED = new Set([
    'memoryBytes',
    'memoryBytesPerDevice',
    'fitSequences',
    'cachePerTokenBytes',
  ]);
  const assumed = new Set<string>(file.assumed?.metrics ?? []);
  const specs = [
    ...CARDS.filter((c) => several || c.metric !== 'memoryBytesPerDevice'),
    { metric: colliding, label: `Colliding positions (${own})`, better: 'down' as const },
  ];

  const rows = specs
    .map((spec) => {
      const b = base ? metricValue(base.metrics, spec.metric) : null;
      const v = metricValue(head.metrics, spec.metric);
      const changed = base !== null && b !== v;
      const rank = blocking.has(spec.metric) ? 0 : crossed.has(spec.metric) ? 1 : changed ? 2 : 3;
      let tone: Tone = '';
      if (rank === 0 || crossed.get(spec.metric) === 'block') tone = 'bad';
      else if (crossed.get(spec.metric) === 'warn') tone = 'warn';
      else if (
        changed &&
        spec.better &&
        b !== null &&
        v !== null &&
        !(reshaped && SHAPED.has(spec.metric)) &&
        !assumed.has(spec.metric)
      ) {
        tone = (spec.better === 'up') === v > b ? 'good' : '';
      }
      return { spec, b, v, changed, rank, tone };
    })
    .filter((r) => r.rank < 3 && !(r.v === null && r.b === null));
  rows.sort((a, b) => a.rank - b.rank);
  if (rows.length === 0) return null;

  const usable = usableDeviceBytes(head.spec);
  return h(
    'ul',
    { class: 'cards' },
    rows.slice(0, MAX_CARDS).map((r) => {
      let note: string | null = null;
      if (r.spec.metric === 'headroom' && r.v !== null && r.v < 0)
        note = `the span is ${formatInteger(-r.v)} tokens past the reach`;
      else if (r.spec.metric === 'memoryBytesPerDevice' && usable !== null)
        note = `usable per device: ${formatMetric('memoryBytes', usable)}; ${MEMORY_CAUTION}`;
      else if (r.spec.metric === 'memoryBytes' && usable !== null && !several)
        note = `usable on the device: ${formatMetric('memoryBytes', usable)}; ${MEMORY_CAUTION}`;
      else if (r.spec.metric === 'memoryBytes' && several)
        note = `across ${formatInteger(head.metrics.devices)} devices`;
      else if (r.spec.metric === 'fitSequences' && head.spec.serving.sequences !== null)
        note = `the service holds ${formatInteger(head.spec.serving.sequences)}; ${MEMORY_CAUTION}`;
      if (reshaped && SHAPED.has(r.spec.metric))
        note = `${note ? `${note}; ` : ''}a reshaped network: needs new weights`;
      const limit = file.deltas.find((d) => d.metric === r.spec.metric)?.limit;
      if (limit && note === null) {
        note = `limit ${[
          limit.min !== undefined ? `≥ ${formatMetric(r.spec.metric, limit.min)}` : '',
          limit.max !== undefined ? `≤ ${formatMetric(r.spec.metric, limit.max)}` : '',
          limit.maxIncreasePct !== undefined ? `≤ +${limit.maxIncreasePct} %` : '',
        ]
          .filter(Boolean)
          .join(', ')}`;
      }
      return h(
        'li',
        { class: `card ${r.tone}`.trim() },
        h('div', { class: 'label' }, r.spec.label),
        h(
          'div',
          { class: 'value' },
          r.changed ? [h('span', { class: 'from' }, valueText(r.spec.metric, r.b)), ' → '] : null,
          assumed.has(r.spec.metric)
            ? h('span', { class: 'assumed' }, valueText(r.spec.metric, r.v))
            : valueText(r.spec.metric, r.v),
        ),
        note ? h('div', { class: 'note' }, note) : null,
      );
    }),
  );
}
