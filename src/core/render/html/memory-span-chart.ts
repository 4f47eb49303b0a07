/**
 * Device memory against span, base and head: weights plus the key/value cache of the served
 * sequences on one device (`memoryBytesPerDevice` of docs/metrics.md at every span, `memoryBytes` on
 * one device), the weights alone, the usable memory per device, each version's evaluation span marked with how many sequences fit there, and, when a
 * remedy changes the memory, the head with that remedy applied.
 */
import { scaleLinear, scaleLog } from 'd3-scale';
import { line } from 'd3-shape';
import type { FileReport } from '../../inspect.js';
import { servedSequences } from '../../metrics/kv-cache.js';
import { memoryAtSpan, reserveWords, usableDeviceBytes } from '../../metrics/memory-curve.js';
import type { ModelSpec } from '../../model.js';
import { formatBytes, formatInteger } from '../../format/units.js';
import {
  axisBottom,
  axisLeft,
  figure,
  frame,
  hRule,
  powerOfTwoTicks,
  tokenLabel,
  vRule,
  type LegendEntry,
} from './chart-frame.js';
import { h, type Markup } from './markup.js';
import { sameCurveWords } from '../memory-chart.js';

const GIB = 2 ** 30;
/** Points per curve: memory is linear in the span, so a few dozen on a log axis draw it exactly enough. */
const POINTS = 48;

/** A version of the head to draw as well, e.g. with a remedy applied. */
export interface MemoryVariant {
  spec: ModelSpec;
  label: string;
}

type Point = [span: number, bytes: number];

function curve(spec: ModelSpec, spans: number[]): Point[] {
  return spans
    .map((s): [number, number | null] => [s, memoryAtSpan(spec, s)])
    .filter((p): p is Point => p[1] !== null);
}

function sequencesText(report: FileReport): string {
  const n = servedSequences(report.spec);
  return n === null ? '' : `${formatInteger(n)} sequence${n === 1 ? '' : 's'}`;
}

/** The chart, or null when neither version has a memory figure. */
export function memorySpanChart(
  id: string,
  base: FileReport | null,
  head: FileReport | null,
  variant: MemoryVariant | null,
): Markup | null {
  const versions = (
    [
      ['base', base],
      ['head', head],
    ] as const
  ).filter(
    ([, r]) =>
      r !== null && r.metrics.memoryBytesPerDevice !== null && r.metrics.evaluationSpan !== null,
  ) as [string, FileReport][];
  if (versions.length === 0) return null;
  const several = versions.some(([, r]) => (r.metrics.devices ?? 1) > 1);
  const each = several ? ' per device' : '';
  const f = frame();
  const spansT = versions.map(([, r]) => r.metrics.evaluationSpan as number);
  const lo = Math.max(256, 2 ** Math.floor(Math.log2(Math.min(...spansT) / 64)));
  const hi = 2 ** Math.ceil(Math.log2(Math.max(...spansT) * 1.5));
  const grid = new Set<number>(spansT);
  for (let i = 0; i <= POINTS; i++) grid.add(Math.round(lo * (hi / lo) ** (i / POINTS)));
  const spans = [...grid].sort((a, b) => a - b);

  const series = versions.map(([name, r]) => ({ name, report: r, points: curve(r.spec, spans) }));
  const variantPoints = variant ? curve(variant.spec, spans) : [];
  const budget = head ? usableDeviceBytes(head.spec) : base ? usableDeviceBytes(base.spec) : null;
  const top =
    Math.max(
      ...series.flatMap((s) => s.points.map((p) => p[1])),
      ...variantPoints.map((p) => p[1]),
      budget ?? 0,
    ) * 1.08;
  const x = scaleLog()
    .domain([lo, hi])
    .range([f.left, f.width - f.right]);
  const y = scaleLinear()
    .domain([0, top / GIB])
    .nice()
    .range([f.height - f.bottom, f.top]);
  const path = line<Point>()
    .x((p) => x(p[0]))
    .y((p) => y(p[1] / GIB))
    .digits(2);

  const parts: (Markup | null)[] = [
    axisBottom(f, x, powerOfTwoTicks(lo, hi, 7), tokenLabel, 'span (tokens, log)'),
    axisLeft(f, y, y.ticks(6), (t) => String(t), `weights + key/value cache${each} (GiB)`),
  ];
  if (budget !== null)
    parts.push(hRule(f, y(budget / GIB), `usable${each} ${formatBytes(budget)}`, 's-budget dash'));
  const weights = head?.metrics.weightBytesPerDevice ?? null;
  if (weights !== null)
    parts.push(
      hRule(
        f,
        y(weights / GIB),
        `weights ${formatBytes(weights)}`,
        's-head dash',
        y(weights / GIB) + 2,
      ),
    );
  for (const s of series)
    parts.push(
      h('path', {
        class: `s-${s.name}`,
        d: path(s.points) ?? '',
        'stroke-width': s.name === 'head' ? 2.4 : 1.8,
      }),
    );
  if (variant && variantPoints.length > 0)
    parts.push(
      h('path', { class: 's-fix dash', d: path(variantPoints) ?? '', 'stroke-width': 2.2 }),
    );

  // The served (evaluated) span of the head, labelled above the plot where no curve runs.
  const headT = head?.metrics.evaluationSpan ?? null;
  if (headT !== null)
    parts.push(
      vRule(
        f,
        x(headT),
        `served ${tokenLabel(headT)}`,
        's-span dot',
        x(headT) > f.width - f.right - 60 ? 'end' : 'start',
      ),
    );

  const notes: string[] = [];
  // Memory grows with the span, so each curve runs below-left and above-right of its point: the
  // higher point's label goes above-left, clear of the line.
  const highest = Math.max(...series.map((s) => s.report.metrics.memoryBytesPerDevice as number));
  for (const s of series) {
    const T = s.report.metrics.evaluationSpan as number;
    const m = s.report.metrics.memoryBytesPerDevice as number;
    const devices = s.report.metrics.devices ?? 1;
    const over = budget !== null && m > budget;
    parts.push(
      h('circle', { class: over ? 'f-block' : `f-${s.name}`, cx: x(T), cy: y(m / GIB), r: 5 }),
    );
    const fit = s.report.metrics.fitSequences;
    const label = `${s.name}: ${formatBytes(m)} at ${tokenLabel(T)}${fit !== null ? `, ${formatInteger(fit)} fit` : ''}`;
    const above = series.length === 1 || m === highest;
    // Every curve lies at or above the weights, so the band between the weights and the axis is
    // free of lines: the lower point's label goes there, left of its span.
    const floorY =
      weights !== null ? (y(weights / GIB) + (f.height - f.bottom)) / 2 + 4 : y(m / GIB) + 17;
    parts.push(
      h(
        'text',
        above
          ? { class: 'mark', x: x(T) - 8, y: y(m / GIB) - 9, 'text-anchor': 'end' }
          : { class: 'mark', x: x(T) - 6, y: floorY, 'text-anchor': 'end' },
        label,
      ),
    );
    const spread = devices > 1 ? ` over ${formatInteger(devices)} devices` : '';
    notes.push(
      `${s.name} holds ${sequencesText(s.report)} of ${formatInteger(T)} tokens${spread}: ${formatBytes(m)}${each}${budget !== null ? ` of ${formatBytes(budget)} usable` : ''}${fit !== null ? `, ${formatInteger(fit)} sequence${fit === 1 ? '' : 's'} fit` : ''}`,
    );
  }

  // Base and head on one curve: one line hides the other, so it is said in words.
  const same =
    series.length === 2 &&
    series[0]!.points.length === series[1]!.points.length &&
    series[0]!.points.every((p, i) => Math.abs(p[1] - series[1]!.points[i]![1]) <= 1e-9 * p[1]);
  if (same)
    notes.unshift(
      `base and head draw the same curve: ${sameCurveWords(series[0]!.report.spec, series[1]!.report.spec)}`,
    );
  const entries: LegendEntry[] = same
    ? [
        [
          'sw-head',
          `base and head, one curve (${sequencesText(series[0]!.report)} / ${sequencesText(series[1]!.report)})`,
        ] as LegendEntry,
      ]
    : series.map((s) => [`sw-${s.name}`, `${s.name} (${sequencesText(s.report)})`] as LegendEntry);
  if (variant && variantPoints.length > 0) entries.push(['dash sw-fix', variant.label]);
  if (budget !== null) {
    entries.push(['dash sw-budget', `usable memory${each}`]);
    const budgetSpec = head ? head.spec : base!.spec;
    notes.push(`usable memory is ${reserveWords(budgetSpec)}`);
  }
  return figure(
    `${id}-memory`,
    several ? 'Memory per device against span' : 'Memory against span',
    entries,
    f,
    parts,
    `${notes.join(' · ')}.`,
    `Weights plus key/value cache${each} against span. ${notes.join('. ')}.`,
  );
}
