/**
 * How values, keys and paths from an untrusted file are quoted in messages: short, exact and
 * unambiguous. Escaping for markdown or HTML is the renderer's job; this only keeps messages
 * readable (bounded length, visible quotes, `-0` kept).
 */

/** One step of a path into a parsed document: a mapping key or a list index. */
export type PathSegment = string | number;

const MAX_QUOTED = 60;

/** `s` cut to `max` characters with an ellipsis (default: `60`). */
export function truncate(s: string, max = MAX_QUOTED): string {
  return s.length <= max ? s : `${s.slice(0, max - 1)}…`;
}

/**
 * A number as a reader would write it: `-0` stays `-0`, whole numbers past 2^53 in full (the
 * exact value of the double, not JavaScript's shortest form `1152921504606847000`), others as
 * JavaScript prints them.
 */
export function literalNumber(n: number): string {
  if (Object.is(n, -0)) return '-0';
  if (Number.isInteger(n) && !Number.isSafeInteger(n) && Math.abs(n) < 1e21)
    return BigInt(n).toString();
  return String(n);
}

/** A string in double quotes with JSON escapes, so spaces, quotes and controls stay visible. */
export function quoteText(s: string): string {
  return truncate(JSON.stringify(s), MAX_QUOTED + 2);
}

/**
 * The dotted form of a path as written in the file: keys joined by `.`, list indexes in
 * brackets (`rope_scaling.factor`, `layer_types[3]`).
 */
export function dottedKey(path: readonly PathSegment[]): string {
  let out = '';
  for (const segment of path) {
    if (typeof segment === 'number') out += `[${segment}]`;
    else out += out === '' ? truncate(segment) : `.${truncate(segment)}`;
  }
  return out;
}

/** What kind of value `v` is, in words, for "expected …" messages. */
export function kindOf(v: unknown): string {
  if (v === null || v === undefined) return 'empty';
  if (Array.isArray(v)) return 'a list';
  switch (typeof v) {
    case 'string':
      return 'text';
    case 'number':
      return 'a number';
    case 'boolean':
      return 'a boolean';
    case 'object':
      return 'a mapping';
    default:
      return typeof v;
  }
}

/**
 * The value as it appears in the file: `literal` (the scalar's source text) when known,
 * otherwise a short rendering; collections are named, not dumped.
 */
export function quoteValue(v: unknown, literal: string | null = null): string {
  if (Array.isArray(v)) return `a list of ${v.length} item${v.length === 1 ? '' : 's'}`;
  if (v !== null && typeof v === 'object') return 'a mapping';
  if (typeof v === 'string') return quoteText(v);
  if (literal !== null && literal.trim() !== '') return truncate(literal.trim());
  if (v === null || v === undefined) return 'empty';
  if (typeof v === 'number') return literalNumber(v);
  return typeof v === 'boolean' || typeof v === 'bigint' ? String(v) : 'a value';
}
