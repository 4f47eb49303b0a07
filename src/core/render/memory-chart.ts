import { memoryAtSpan, usableDeviceBytes } from '../metrics/memory-curve.js';
import { formatInteger, formatNumber } from '../format/units.js';
import { servedSequences } from '../metrics/kv-cache.js';
import { cacheDType } from '../metrics/storage-bytes.js';
import type { ModelSpec } from '../model.js';
import type { FileDecision } from '../report/types.js';

const GIB = 1024 ** 3;

/** `4 sequences with a bf16 cache hold as much as 8 with an fp8 cache`: why two curves coincide. */
export function sameCurveWords(base: ModelSpec, head: ModelSpec): string {
  const nb = servedSequences(base);
  const nh = servedSequences(head);
  const cb = cacheDType(base);
  const ch = cacheDType(head);
  if (nb !== nh || cb !== ch)
    return `${formatInteger(nb)} sequence${nb === 1 ? '' : 's'} with a ${cb} cache take as much as ${formatInteger(nh)} with a ${ch} cache`;
  return 'the change does not move memory';
}

/** Spans to plot: powers of two from 1k up to the larger evaluation span, plus both spans themselves. */
export function chartSpans(...spans: (number | null)[]): number[] {
  const known = spans.filter((s): s is number => s !== null && Number.isFinite(s) && s > 0);
  if (known.length === 0) return [];
  const top = Math.max(...known);
  const points = new Set<number>(known);
  for (let s = 1024; s < top; s *= 2) points.add(s);
  let sorted = [...points].sort((a, b) => a - b);
  // Keep the chart readable: at most 12 points, always keeping the evaluated spans.
  while (sorted.length > 12) {
    const drop = sorted.findIndex((s, i) => i > 0 && !known.includes(s));
    if (drop < 0) break;
    sorted = sorted.filter((_, i) => i !== drop);
  }
  return sorted;
}

function spanLabel(span: number): string {
  if (span >= 1024 * 1024 && span % (1024 * 1024) === 0) return `${span / (1024 * 1024)}M`;
  if (span >= 1024 && span % 1024 === 0) return `${span / 1024}k`;
  return String(span);
}

/**
 * A Mermaid line chart (GitHub renders it in comments): weights plus key/value cache in GiB
 * against span (per device when a replica spans several), for base and head, with the usable
 * memory of one device as a flat line. Only numbers
 * and our own labels go into it, never text from the pull request.
 */
export function memoryChart(file: FileDecision): string | null {
  const base = file.base;
  const head = file.head;
  if (!head) return null;
  const spans = chartSpans(base?.metrics.evaluationSpan ?? null, head.metrics.evaluationSpan);
  if (spans.length < 2) return null;
  const series: { name: string; values: number[] }[] = [];
  for (const [name, report] of [
    ['base', base],
    ['head', head],
  ] as const) {
    if (!report) continue;
    const values = spans.map((s) => memoryAtSpan(report.spec, s));
    if (values.every((v): v is number => v !== null))
      series.push({ name, values: values.map((v) => v / GIB) });
  }
  if (series.length === 0) return null;
  const several =
    (head.metrics.devices ?? 1) > 1 || (base !== null && (base.metrics.devices ?? 1) > 1);
  const each = several ? ' per device' : '';
  const budget = usableDeviceBytes(head.spec);
  if (budget !== null)
    series.push({ name: `usable memory${each}`, values: spans.map(() => budget / GIB) });
  const top = Math.max(...series.flatMap((s) => s.values));
  const round = (v: number) => formatNumber(v, 4).replace(/,/g, '');
  const lines = [
    '```mermaid',
    'xychart-beta',
    `    title "Weights + key/value cache${each} (GiB) against span"`,
    `    x-axis "span (tokens)" [${spans.map((s) => `"${spanLabel(s)}"`).join(', ')}]`,
    `    y-axis "GiB" 0 --> ${round(top * 1.1)}`,
    ...series.map((s) => `    line [${s.values.map(round).join(', ')}]`),
    '```',
  ];
  const legend = series.map((s, i) => `${i + 1}. ${s.name}`).join(' · ');
  const same =
    base &&
    series.length >= 3 &&
    series[0]!.values.every((v, i) => Math.abs(v - series[1]!.values[i]!) <= 1e-9 * v);
  const words = same
    ? ` Base and head draw the same line: ${sameCurveWords(base.spec, head.spec)}.`
    : '';
  const served = `The head serves ${formatInteger(head.metrics.evaluationSpan)} tokens; usable memory ${budget !== null ? `${formatNumber(budget / GIB, 3)} GiB` : 'is not given'}.`;
  return `<details><summary>Memory against span</summary>\n\n${lines.join('\n')}\n\nLines, in order: ${legend}.${words} ${served}\n\n</details>`;
}
