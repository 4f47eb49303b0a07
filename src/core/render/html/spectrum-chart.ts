/**
 * The frequency spectrum of the position code, base against head: each pair's wavelength
 * `2π/θ'_i` on a log scale against its index, the trained span `L0` and the evaluation span `T`
 * as horizontal rules, the band between them shaded, and each head pair coloured by what it does
 * over those spans (turning, unturned, exposed: docs/metrics.md).
 */
import { scaleLinear, scaleLog } from 'd3-scale';
import { line } from 'd3-shape';
import type { FileReport } from '../../inspect.js';
import { frequencyPlan } from '../../metrics/compute.js';
import { pairStatuses, type PairInfo } from '../../metrics/pair-status.js';
import { formatInteger } from '../../format/units.js';
import {
  axisBottom,
  axisLeft,
  figure,
  frame,
  hRule,
  powerOfTenLabel,
  powerOfTenTicks,
  tokenLabel,
} from './chart-frame.js';
import { h, type Markup } from './markup.js';

export interface Spectrum {
  pairs: PairInfo[];
  /** tokens: `L0`. */
  trained: number;
  /** tokens: `T`. */
  span: number;
}

/** The spectrum of one version; null for codes without frequencies or spans that are unknown. */
export function spectrumOf(report: FileReport | null): Spectrum | null {
  if (!report) return null;
  const { trainedSpan: trained, evaluationSpan: span } = report.metrics;
  if (trained === null || span === null) return null;
  const plan = frequencyPlan(report.spec, span, trained);
  if (!plan) return null;
  const pairs = pairStatuses(plan.theta, plan.scaled, trained, span);
  return pairs ? { pairs, trained, span } : null;
}

function count(s: Spectrum, status: PairInfo['status']): number {
  return s.pairs.filter((p) => p.status === status).length;
}

/** The chart, or null when neither version has frequencies; `variant` is the head with a remedy applied. */
export function spectrumChart(
  id: string,
  base: Spectrum | null,
  head: Spectrum | null,
  variant: { spectrum: Spectrum; label: string } | null = null,
): Markup | null {
  if (!head && !base) return null;
  const f = frame();
  const all = [base, head, variant?.spectrum ?? null].filter((s): s is Spectrum => s !== null);
  const values = all.flatMap((s) => [...s.pairs.map((p) => p.wavelength), s.trained, s.span]);
  const lo = Math.min(...values) / 2;
  const hi = Math.max(...values) * 2;
  const pairsMax = Math.max(...all.map((s) => s.pairs.length));
  const x = scaleLinear()
    .domain([-0.5, pairsMax - 0.5])
    .range([f.left, f.width - f.right]);
  const y = scaleLog()
    .domain([lo, hi])
    .range([f.height - f.bottom, f.top]);
  const path = line<PairInfo>()
    .x((_, i) => x(i))
    .y((p) => y(p.wavelength))
    .digits(2);

  const parts: (Markup | null)[] = [];
  const main = head ?? base!;
  if (main.span > main.trained) {
    // The stretch of wavelengths a pair must not exceed to have turned within training, up to T.
    parts.push(
      h('rect', {
        class: 'band',
        x: f.left,
        width: f.width - f.left - f.right,
        y: y(main.span),
        height: y(main.trained) - y(main.span),
      }),
    );
  }
  const xTicks = scaleLinear()
    .domain([0, pairsMax - 1])
    .ticks(6)
    .filter((t) => Number.isInteger(t));
  parts.push(axisBottom(f, x, xTicks, (t) => String(t), 'frequency pair i (fast → slow)'));
  parts.push(
    axisLeft(f, y, powerOfTenTicks(lo, hi, 7), powerOfTenLabel, 'wavelength (tokens, log)'),
  );

  // Rules: head solid, base dashed when its spans differ; labels kept apart when they would touch.
  const rules: { v: number; label: string; cls: string }[] = [];
  if (head)
    rules.push(
      { v: head.trained, label: `L0 ${tokenLabel(head.trained)}`, cls: 's-head' },
      { v: head.span, label: `T ${tokenLabel(head.span)}`, cls: 's-head' },
    );
  if (base && (!head || base.trained !== head.trained))
    rules.push({
      v: base.trained,
      label: `base L0 ${tokenLabel(base.trained)}`,
      cls: 's-base dash',
    });
  if (base && (!head || base.span !== head.span))
    rules.push({ v: base.span, label: `base T ${tokenLabel(base.span)}`, cls: 's-base dash' });
  rules.sort((a, b) => y(a.v) - y(b.v));
  let lastLabel = -Infinity;
  for (const rule of rules) {
    const labelY = Math.max(y(rule.v), lastLabel + 13);
    parts.push(hRule(f, y(rule.v), rule.label, rule.cls, labelY));
    lastLabel = labelY;
  }

  if (base) {
    parts.push(h('path', { class: 's-base', d: path(base.pairs) ?? '', 'stroke-width': 1 }));
    parts.push(
      h(
        'g',
        null,
        base.pairs.map((p, i) =>
          h('circle', {
            class: 'p-base',
            cx: x(i),
            cy: y(p.wavelength),
            r: 3.2,
            'stroke-width': 1.2,
          }),
        ),
      ),
    );
  }
  if (head) {
    parts.push(
      h('path', { class: 's-head', d: path(head.pairs) ?? '', 'stroke-width': 1, opacity: 0.5 }),
    );
    parts.push(
      h(
        'g',
        null,
        head.pairs.map((p, i) =>
          h('circle', { class: `p-${p.status}`, cx: x(i), cy: y(p.wavelength), r: 2.6 }),
        ),
      ),
    );
  }
  if (variant) {
    parts.push(
      h('path', {
        class: 's-fix dash',
        d: path(variant.spectrum.pairs) ?? '',
        'stroke-width': 1.6,
      }),
    );
  }

  const counts = (s: Spectrum | null, name: string) =>
    s
      ? `${name}: ${formatInteger(count(s, 'exposed'))} exposed, ${formatInteger(s.pairs.filter((p) => p.wavelength > s.trained).length)} unturned of ${formatInteger(s.pairs.length)} pairs`
      : null;
  const caption = [
    counts(base, 'base'),
    counts(head, 'head'),
    variant ? counts(variant.spectrum, 'with the remedy') : null,
  ]
    .filter(Boolean)
    .join(' · ');
  return figure(
    `${id}-spectrum`,
    'Position-code spectrum',
    [
      ['sw-base', 'base pairs'],
      ['sw-turning', 'head: turns within L0'],
      ['sw-unturned', 'head: unturned over L0'],
      ['sw-exposed', 'head: exposed past training'],
      ['sw-band', 'between L0 and T'],
      ...(variant ? [['dash sw-fix', variant.label] as [string, string]] : []),
    ],
    f,
    parts,
    [
      caption,
      '. A pair above the L0 rule never completes a turn in training; an exposed pair reaches angles at T that training never showed.',
    ],
    `Wavelength of each frequency pair on a log scale. ${caption}.`,
  );
}
