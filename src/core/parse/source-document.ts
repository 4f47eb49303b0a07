/**
 * What a reader of JSON or YAML text hands on: plain values (mappings without a prototype), and
 * where each entry was written, the 1-based line of its key (of the item, in a list) and its
 * scalar's source text, kept as offsets into the text and turned into lines only when asked.
 * Both readers (`json-read.ts`, `yaml-build.ts`) note entries here and refuse keys the same way.
 */
import { ReadError } from './errors.js';
import { dottedKey, quoteText } from './quote.js';
import type { PathSegment } from './quote.js';

/** A value read from the file: mappings are null-prototype objects. */
export type SourceValue = null | boolean | number | string | SourceValue[] | SourceMapping;

/** A mapping read from the file. Built on `Object.create(null)`, so no key reaches a prototype. */
export interface SourceMapping {
  [key: string]: SourceValue;
}

export interface SourceDocument {
  /** The file's top-level mapping. */
  value: SourceMapping;
  /** 1-based line of the key at `path` (of the item, for a list index); null when absent. */
  lineOf(path: readonly PathSegment[]): number | null;
  /** The scalar at `path` exactly as written, quotes included; null for collections and absent paths. */
  literalOf(path: readonly PathSegment[]): string | null;
}

/** Keys refused anywhere: tools that merge parsed objects would turn them into prototype changes. */
export const FORBIDDEN_KEYS: readonly string[] = ['__proto__', 'constructor', 'prototype'];

/**
 * Where one entry was written: `at`, the offset of its key (of the item, in a list); `start` and
 * `end`, the range of its scalar value (`start` -1 when the value is not a scalar).
 */
interface EntryPlace {
  at: number;
  start: number;
  end: number;
}

/** A path built one step at a time, turned into an array only for a message. */
export type PathLink = { parent: PathLink; segment: PathSegment } | null;

/** The segments of `link`, outermost first. */
export function pathOf(link: PathLink): PathSegment[] {
  const out: PathSegment[] = [];
  for (let at = link; at !== null; at = at.parent) out.push(at.segment);
  return out.reverse();
}

/** How a path is named in a message: `the top level` or its dotted form. */
export function whereOf(path: readonly PathSegment[]): string {
  return path.length === 0 ? 'the top level' : dottedKey(path);
}

/** The entries of every mapping and list a reader built, by the container object. */
export class EntryNotes {
  private readonly places = new WeakMap<object, Map<PathSegment, EntryPlace>>();

  /** The note book of a new container. */
  open(container: object): Map<PathSegment, EntryPlace> {
    const notes = new Map<PathSegment, EntryPlace>();
    this.places.set(container, notes);
    return notes;
  }

  /** The place of the entry `path` leads to inside `root`, or undefined when the path is not there. */
  placeOf(root: SourceMapping, path: readonly PathSegment[]): EntryPlace | undefined {
    if (path.length === 0) return undefined;
    let container: unknown = root;
    for (let i = 0; i < path.length - 1; i++) {
      if (container === null || typeof container !== 'object') return undefined;
      const step: unknown = (container as Record<string, unknown>)[String(path[i])];
      if (!has(container, path[i]!)) return undefined;
      container = step;
    }
    if (container === null || typeof container !== 'object') return undefined;
    const last = path[path.length - 1]!;
    return this.places.get(container)?.get(Array.isArray(container) ? Number(last) : String(last));
  }
}

function has(container: object, segment: PathSegment): boolean {
  return Array.isArray(container)
    ? Number.isInteger(Number(segment)) && Number(segment) < container.length
    : Object.prototype.hasOwnProperty.call(container, String(segment));
}

/** The document a reader hands on: `value`, with lines and literals from `notes` over `text`. */
export function sourceDocument(
  value: SourceMapping,
  text: string,
  notes: EntryNotes,
  lineAt: (offset: number) => number,
): SourceDocument {
  return {
    value,
    lineOf: (path) => {
      const place = notes.placeOf(value, path);
      return place === undefined ? null : lineAt(place.at);
    },
    literalOf: (path) => {
      const place = notes.placeOf(value, path);
      return place === undefined || place.start < 0 ? null : text.slice(place.start, place.end);
    },
  };
}

/**
 * Refuses `key` under `parent` when it is one of `FORBIDDEN_KEYS` or already in `seen` (keys that
 * differ only in type, 1 and "1", are distinct to YAML but collide as object keys): one set
 * lookup per key, so duplicate detection is linear in the number of keys.
 */
export function checkKey(
  file: string,
  key: string,
  parent: PathLink,
  seen: ReadonlyMap<PathSegment, unknown>,
  line: () => number,
): void {
  if (FORBIDDEN_KEYS.includes(key)) {
    const path = pathOf(parent);
    throw new ReadError(
      file,
      line(),
      `key ${quoteText(key)} under ${whereOf(path)} is refused: tools that merge parsed objects would treat it as a prototype change; rename or remove it`,
      dottedKey([...path, key]),
    );
  }
  if (seen.has(key)) {
    const path = pathOf(parent);
    throw new ReadError(
      file,
      line(),
      `duplicate key ${quoteText(key)} under ${whereOf(path)}; each key may appear once in a mapping`,
      dottedKey([...path, key]),
    );
  }
}

/** A line lookup by binary search over the offsets where lines start. */
export function lineIndex(text: string): (offset: number) => number {
  let starts: number[] | null = null;
  return (offset) => {
    if (starts === null) {
      starts = [0];
      for (let i = text.indexOf('\n'); i !== -1; i = text.indexOf('\n', i + 1)) starts.push(i + 1);
    }
    let lo = 0;
    let hi = starts.length - 1;
    while (lo < hi) {
      const mid = (lo + hi + 1) >> 1;
      if (starts[mid]! <= offset) lo = mid;
      else hi = mid - 1;
    }
    return lo + 1;
  };
}
