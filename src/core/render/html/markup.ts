/**
 * Building HTML and SVG as strings with escaping by default: text children and attribute values
 * always go through `escapeHtml`; only markup built here (a `Markup` value) is inserted as is.
 * So nothing from a pull request can open an element or an attribute, whatever it contains.
 */
import { escapeHtml } from '../escape.js';

/** Markup built by these helpers: trusted to be well-formed and escaped. */
export class Markup {
  constructor(readonly html: string) {}
  toString(): string {
    return this.html;
  }
}

export type Child = Markup | string | number | null | undefined | false | readonly Child[];

/** Attribute values: strings and numbers are escaped; `true` writes the bare name; null, undefined and false leave it out. */
export type Attrs = Record<string, string | number | boolean | null | undefined>;

const NAME = /^[a-zA-Z][a-zA-Z0-9:-]*$/;

function render(child: Child): string {
  if (child === null || child === undefined || child === false) return '';
  if (child instanceof Markup) return child.html;
  if (Array.isArray(child)) return child.map(render).join('');
  if (typeof child === 'number') return Number.isFinite(child) ? String(child) : '';
  return escapeHtml(String(child));
}

function attributes(attrs: Attrs | null | undefined): string {
  if (!attrs) return '';
  let out = '';
  for (const [name, value] of Object.entries(attrs)) {
    // Names come from this code, never from a pull request; refuse anything else loudly.
    if (!NAME.test(name))
      throw new Error(`attribute name ${JSON.stringify(name)} is not a plain name`);
    if (value === null || value === undefined || value === false) continue;
    if (value === true) out += ` ${name}`;
    else
      out += ` ${name}="${escapeHtml(typeof value === 'number' ? (Number.isFinite(value) ? String(round(value)) : '') : value)}"`;
  }
  return out;
}

/** Coordinates to 0.01 px: enough for any screen, and keeps the page small. */
export function round(value: number): number {
  return Math.round(value * 100) / 100;
}

const VOID = new Set([
  'meta',
  'br',
  'hr',
  'img',
  'link',
  'circle',
  'line',
  'path',
  'rect',
  'polyline',
  'stop',
  'use',
]);

/** An element: `h('p', { class: 'x' }, 'text', h('b', null, 'bold'))`. */
export function h(tag: string, attrs: Attrs | null, ...children: Child[]): Markup {
  if (!NAME.test(tag)) throw new Error(`tag ${JSON.stringify(tag)} is not a plain name`);
  const inner = children.map(render).join('');
  if (inner === '' && VOID.has(tag))
    return new Markup(
      `<${tag}${attributes(attrs)}${tag === 'meta' || tag === 'br' || tag === 'hr' || tag === 'img' || tag === 'link' ? '>' : '/>'}`,
    );
  return new Markup(`<${tag}${attributes(attrs)}>${inner}</${tag}>`);
}

/** Several children as one. */
export function fragment(...children: Child[]): Markup {
  return new Markup(children.map(render).join(''));
}

/** Markup written by this code itself (style sheets, the doctype): never pass text from a pull request. */
export function trusted(html: string): Markup {
  return new Markup(html);
}
