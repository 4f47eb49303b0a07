/**
 * What every chart of the HTML report shares: its frame (size and margins), axes with gridlines
 * drawn from d3 scales, tick choices for spans, wavelengths and bytes, and the figure around it.
 * Only numbers and labels written here reach the SVG; text from a pull request never does.
 */
import { h, type Child, type Markup } from './markup.js';

/** Chart size in SVG units; the page scales it to the column width. */
export interface Frame {
  width: number;
  height: number;
  top: number;
  right: number;
  bottom: number;
  left: number;
}

/** (defaults: 560 × 300, margins 26 / 104 / 44 / 62: the right margin holds the line labels) */
export function frame(width = 560, height = 300): Frame {
  return { width, height, top: 26, right: 104, bottom: 44, left: 62 };
}

export const innerWidth = (f: Frame) => f.width - f.left - f.right;
export const innerHeight = (f: Frame) => f.height - f.top - f.bottom;

type Scale = (value: number) => number;

/** `1024` → `1k`, `262144` → `256k`, `1048576` → `1M`; other values with k/M/G in decimal. */
export function tokenLabel(n: number): string {
  if (n >= 2 ** 30 && n % 2 ** 30 === 0) return `${n / 2 ** 30}G`;
  if (n >= 2 ** 20 && n % 2 ** 20 === 0) return `${n / 2 ** 20}M`;
  if (n >= 1024 && n % 1024 === 0) return `${n / 1024}k`;
  if (n >= 1e9) return `${Number((n / 1e9).toPrecision(3))}G`;
  if (n >= 1e6) return `${Number((n / 1e6).toPrecision(3))}M`;
  if (n >= 1e4) return `${Number((n / 1e3).toPrecision(3))}k`;
  return Number.isInteger(n) ? n.toLocaleString('en-US') : `${Number(n.toPrecision(4))}`;
}

/** Powers of two in [lo, hi], thinned to every other, every fourth … until at most `max` remain. */
export function powerOfTwoTicks(lo: number, hi: number, max = 8): number[] {
  const all: number[] = [];
  for (let e = Math.ceil(Math.log2(Math.max(lo, 1))); 2 ** e <= hi; e++) all.push(2 ** e);
  let stride = 1;
  while (Math.ceil(all.length / stride) > max) stride *= 2;
  // Keep the largest power: it is the one next to the spans marked on the chart.
  return all.filter((_, i) => (all.length - 1 - i) % stride === 0);
}

/** Powers of ten in [lo, hi], thinned the same way. */
export function powerOfTenTicks(lo: number, hi: number, max = 8): number[] {
  const all: number[] = [];
  for (let e = Math.ceil(Math.log10(lo)); 10 ** e <= hi; e++) all.push(10 ** e);
  let stride = 1;
  while (Math.ceil(all.length / stride) > max) stride += 1;
  return all.filter((_, i) => i % stride === 0);
}

/** `1e4` → `10⁴`, for wavelength axes. */
export function powerOfTenLabel(n: number): string {
  const e = Math.round(Math.log10(n));
  if (e >= 0 && e <= 3) return String(10 ** e);
  const superscript: Record<string, string> = {
    '-': '⁻',
    0: '⁰',
    1: '¹',
    2: '²',
    3: '³',
    4: '⁴',
    5: '⁵',
    6: '⁶',
    7: '⁷',
    8: '⁸',
    9: '⁹',
  };
  return `10${String(e)
    .split('')
    .map((c) => superscript[c] ?? c)
    .join('')}`;
}

/** The x axis along the bottom, with vertical gridlines and a title. */
export function axisBottom(
  f: Frame,
  x: Scale,
  ticks: number[],
  format: (n: number) => string,
  title: string,
): Markup {
  const y0 = f.height - f.bottom;
  return h(
    'g',
    { class: 'axis x' },
    h(
      'g',
      { class: 'grid' },
      ticks.map((t) => h('line', { x1: x(t), x2: x(t), y1: f.top, y2: y0 })),
    ),
    h('line', { x1: f.left, x2: f.width - f.right, y1: y0, y2: y0 }),
    ticks.map((t) => h('text', { x: x(t), y: y0 + 16, 'text-anchor': 'middle' }, format(t))),
    h('text', { x: f.left + innerWidth(f) / 2, y: f.height - 6, 'text-anchor': 'middle' }, title),
  );
}

/** The y axis along the left, with horizontal gridlines and a title. */
export function axisLeft(
  f: Frame,
  y: Scale,
  ticks: number[],
  format: (n: number) => string,
  title: string,
): Markup {
  return h(
    'g',
    { class: 'axis y' },
    h(
      'g',
      { class: 'grid' },
      ticks.map((t) => h('line', { x1: f.left, x2: f.width - f.right, y1: y(t), y2: y(t) })),
    ),
    h('line', { x1: f.left, x2: f.left, y1: f.top, y2: f.height - f.bottom }),
    ticks.map((t) => h('text', { x: f.left - 6, y: y(t) + 4, 'text-anchor': 'end' }, format(t))),
    h(
      'text',
      {
        x: 14,
        y: f.top + innerHeight(f) / 2,
        'text-anchor': 'middle',
        transform: `rotate(-90 14 ${f.top + innerHeight(f) / 2})`,
      },
      title,
    ),
  );
}

/** A horizontal reference line across the plot with its label in the right margin. */
export function hRule(f: Frame, y: number, label: string, className: string, labelY = y): Markup {
  return h(
    'g',
    null,
    h('line', {
      class: className,
      x1: f.left,
      x2: f.width - f.right,
      y1: y,
      y2: y,
      'stroke-width': 1.5,
    }),
    h('text', { class: 'mark', x: f.width - f.right + 6, y: labelY + 4 }, label),
  );
}

/** A vertical reference line across the plot, labelled at its top. */
export function vRule(
  f: Frame,
  x: number,
  label: string,
  className: string,
  anchor: 'start' | 'end' = 'start',
  labelRow = 0,
): Markup {
  return h(
    'g',
    null,
    h('line', {
      class: className,
      x1: x,
      x2: x,
      y1: f.top,
      y2: f.height - f.bottom,
      'stroke-width': 1.5,
    }),
    h(
      'text',
      {
        class: 'mark',
        x: anchor === 'start' ? x + 4 : x - 4,
        y: f.top - 8 + labelRow * 12,
        'text-anchor': anchor,
      },
      label,
    ),
  );
}

/** Legend entries: a swatch class and a label. */
export type LegendEntry = [swatch: string, label: string];

export function legend(entries: LegendEntry[]): Markup {
  return h(
    'ul',
    { class: 'legend' },
    entries.map(([swatch, label]) => h('li', null, h('i', { class: swatch }), label)),
  );
}

/**
 * One chart: heading, legend, the SVG (with its own title and description for screen readers),
 * and a caption saying what to read off it.
 */
export function figure(
  id: string,
  heading: string,
  entries: LegendEntry[],
  f: Frame,
  svgBody: Child,
  caption: Child,
  description: string,
): Markup {
  return h(
    'figure',
    { class: f.width > 800 ? 'chart-figure wide' : 'chart-figure', 'data-chart': id },
    h('h3', null, heading),
    legend(entries),
    h(
      'svg',
      {
        class: 'chart',
        viewBox: `0 0 ${f.width} ${f.height}`,
        role: 'img',
        'aria-labelledby': `${id}-t ${id}-d`,
        xmlns: 'http://www.w3.org/2000/svg',
      },
      h('title', { id: `${id}-t` }, heading),
      h('desc', { id: `${id}-d` }, description),
      svgBody,
    ),
    h('figcaption', null, caption),
  );
}
