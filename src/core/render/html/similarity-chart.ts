/**
 * The similarity curve `S(k) = (1/P) Σ cos(k θ'_i)` of base and head over their spans, on a log
 * axis of offsets, downsampled to per-bucket minimum and maximum (`similarity-curve.ts`, exact, so
 * the dips survive), with the zero line of Men et al. 2024's criterion and the first offset below
 * it (`discriminationSpan`) marked.
 */
import { scaleLinear, scaleLog } from 'd3-scale';
import { area, line } from 'd3-shape';
import type { FileReport } from '../../inspect.js';
import { frequencyPlan } from '../../metrics/compute.js';
import { similarityCurve, type SimilarityBucket } from '../../metrics/similarity-curve.js';
import { formatInteger, formatNumber } from '../../format/units.js';
import {
  axisBottom,
  axisLeft,
  figure,
  frame,
  hRule,
  powerOfTwoTicks,
  tokenLabel,
  vRule,
} from './chart-frame.js';
import { h, type Markup } from './markup.js';

/** Buckets per curve: about one per pixel column of the wide chart. */
const BUCKETS = 800;

export interface SimilaritySeries {
  buckets: SimilarityBucket[];
  span: number;
  trained: number | null;
  /** tokens: first k with a negative sum, null when none within the span. */
  discrimination: number | null;
}

/**
 * The curve of one version; null without frequencies, a span of at least 2, or past the scan
 * bounds (the curve visits every offset: `MAX_CURVE_WORK` of `scan-limits.ts`, about a second, is
 * 13 million tokens at 64 pairs); the page then says it is not drawn.
 */
export function similarityOf(report: FileReport | null): SimilaritySeries | null {
  if (!report) return null;
  const span = report.metrics.evaluationSpan;
  const plan = frequencyPlan(report.spec, span, report.metrics.trainedSpan);
  const buckets = plan ? similarityCurve(plan.scaled, span, BUCKETS, 'log') : null;
  if (!buckets || span === null) return null;
  return {
    buckets,
    span,
    trained: report.metrics.trainedSpan,
    discrimination: report.metrics.discriminationSpan,
  };
}

/** A bucket's position on a log axis: the geometric middle of its offsets. */
const middle = (b: SimilarityBucket) => Math.sqrt(b.start * Math.max(b.start, b.end));

/** The chart, or null when neither version has a curve; `variant` is the head with a remedy applied. */
export function similarityChart(
  id: string,
  base: SimilaritySeries | null,
  head: SimilaritySeries | null,
  variant: { series: SimilaritySeries; label: string } | null = null,
): Markup | null {
  if (!base && !head) return null;
  // Wide: long spans need the room, and the chart takes a whole row of the page.
  const f = frame(1120, 320);
  const all = [base, head, variant?.series ?? null].filter(
    (s): s is SimilaritySeries => s !== null,
  );
  const maxSpan = Math.max(...all.map((s) => s.span));
  const lowest = Math.min(...all.flatMap((s) => s.buckets.map((b) => b.min)));
  const x = scaleLog()
    .domain([1, maxSpan])
    .range([f.left, f.width - f.right]);
  const y = scaleLinear()
    .domain([Math.min(-0.2, lowest - 0.05), 1])
    .nice()
    .range([f.height - f.bottom, f.top]);
  const band = area<SimilarityBucket>()
    .x((b) => x(middle(b)))
    .y0((b) => y(b.min))
    .y1((b) => y(b.max))
    .digits(2);
  const minima = line<SimilarityBucket>()
    .x((b) => x(middle(b)))
    .y((b) => y(b.min))
    .digits(2);

  const parts: (Markup | null)[] = [
    axisBottom(
      f,
      x,
      powerOfTwoTicks(1, maxSpan, 7),
      tokenLabel,
      'offset k between two positions (tokens, log)',
    ),
    axisLeft(f, y, y.ticks(6), (t) => formatNumber(t, 2), 'similarity S(k)'),
    hRule(f, y(0), 'S = 0', 's-budget dash'),
  ];
  for (const [series, name] of [
    [base, 'base'],
    [head, 'head'],
  ] as const) {
    if (!series) continue;
    parts.push(h('path', { class: `a-${name}`, d: band(series.buckets) ?? '' }));
    parts.push(
      h('path', {
        class: `s-${name}`,
        d: minima(series.buckets) ?? '',
        'stroke-width': name === 'head' ? 1.6 : 1.2,
      }),
    );
  }
  if (variant)
    parts.push(
      h('path', {
        class: 's-fix dash',
        d: minima(variant.series.buckets) ?? '',
        'stroke-width': 1.6,
      }),
    );
  let row = 0;
  if (head?.trained && head.trained < maxSpan)
    parts.push(
      vRule(f, x(head.trained), `L0 ${tokenLabel(head.trained)}`, 's-head dash', 'end', row++),
    );
  for (const [series, name] of [
    [base, 'base'],
    [head, 'head'],
    [variant?.series ?? null, 'fix'],
  ] as const) {
    if (!series?.discrimination) continue;
    const k = series.discrimination;
    const who = name === 'fix' ? 'with the remedy' : name;
    parts.push(
      vRule(
        f,
        x(k),
        `${who}: first S<0 at ${formatInteger(k)}`,
        `s-${name}${name === 'fix' ? ' dash' : ''}`,
        'end',
        row++,
      ),
    );
    parts.push(h('circle', { class: `f-${name}`, cx: x(k), cy: y(0), r: 4 }));
  }

  const say = (s: SimilaritySeries | null, name: string) =>
    s
      ? `${name}: ${s.discrimination === null ? `stays at or above 0 over all ${formatInteger(s.span)} offsets` : `first below 0 at ${formatInteger(s.discrimination)} of ${formatInteger(s.span)}`}, lowest ${formatNumber(Math.min(...s.buckets.map((b) => b.min)), 3)}`
      : null;
  const caption = [
    say(base, 'base'),
    say(head, 'head'),
    variant ? say(variant.series, 'with the remedy') : null,
  ]
    .filter(Boolean)
    .join(' · ');
  return figure(
    `${id}-similarity`,
    'Similarity over the span',
    [
      ['sw-a-base', 'base: min–max per bucket, minima as a line'],
      ['sw-a-head', 'head: min–max per bucket, minima as a line'],
      ['dash sw-budget', 'S = 0'],
      ...(variant ? [['dash sw-fix', `minima ${variant.label}`] as [string, string]] : []),
    ],
    f,
    parts,
    [
      caption,
      '. Below zero, by the criterion of Men et al. 2024, the code no longer lets attention favour a similar token over a random one at that distance.',
    ],
    `Similarity of the position code with itself at offset k, minimum and maximum per bucket of offsets. ${caption}.`,
  );
}
