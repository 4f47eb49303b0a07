import { readFileSync } from 'node:fs';
import { ReadError } from '../../src/core/parse/errors.js';
import type { PathSegment, SourceDocument, SourceValue } from '../../src/core/parse/source.js';
import { YamlLimitError } from '../../src/core/parse/yaml.js';

/** A fixture's text from fixtures/checkpoints. */
export function fixture(name: string): string {
  return readFileSync(new URL(`../../fixtures/checkpoints/${name}`, import.meta.url), 'utf8');
}

/** 1-based line of the first line containing `needle`, found by scanning the text itself. */
export function lineOf(text: string, needle: string): number {
  const index = text.split('\n').findIndex((l) => l.includes(needle));
  if (index < 0) throw new Error(`test text lacks ${needle}`);
  return index + 1;
}

/** The ReadError `run` throws (any other outcome fails the test). */
export function readError(run: () => unknown): ReadError {
  try {
    run();
  } catch (error) {
    if (error instanceof ReadError) return error;
    throw error;
  }
  throw new Error('expected a ReadError');
}

/** A checkpoint config's JSON text from an object, one key per line as published configs are. */
export function configText(config: Record<string, unknown>): string {
  return `${JSON.stringify(config, null, 2)}\n`;
}

/** Every path into `value`, containers and scalars, in document order. */
export function pathsOf(value: SourceValue, prefix: PathSegment[] = []): PathSegment[][] {
  if (value === null || typeof value !== 'object') return [];
  const keys: PathSegment[] = Array.isArray(value) ? value.map((_, i) => i) : Object.keys(value);
  return keys.flatMap((key) => {
    const path = [...prefix, key];
    const child = (value as Record<string, SourceValue>)[String(key)]!;
    return [path, ...pathsOf(child, path)];
  });
}

/** What a reader hands on, in a form `toEqual` compares exactly (-0 and NaN kept apart). */
export function reading(doc: SourceDocument) {
  const exact = (v: SourceValue): unknown =>
    typeof v === 'number'
      ? Object.is(v, -0)
        ? '-0'
        : Number.isNaN(v)
          ? 'NaN'
          : v
      : v === null || typeof v !== 'object'
        ? v
        : Array.isArray(v)
          ? v.map(exact)
          : Object.fromEntries(Object.entries(v).map(([k, x]) => [k, exact(x)]));
  return {
    value: exact(doc.value),
    prototypeFree: Object.getPrototypeOf(doc.value) === null,
    places: pathsOf(doc.value).map((path) => [
      path.join('/'),
      doc.lineOf(path),
      doc.literalOf(path),
    ]),
    absent: [doc.lineOf(['no such key']), doc.literalOf(['no such key', 0])],
  };
}

/**
 * The outcome of a reader, for comparing two readers of one text: its reading, the message,
 * line and key of its refusal (or the bound a `YamlLimitError` names), or that it left the text
 * to the YAML path (null).
 */
export function outcome(read: () => SourceDocument | null) {
  try {
    const doc = read();
    return doc === null ? 'left to the YAML path' : reading(doc);
  } catch (error) {
    if (error instanceof ReadError)
      return { refused: error.message, line: error.line, key: error.key };
    if (error instanceof YamlLimitError) return { limit: error.limit, line: error.line };
    throw error;
  }
}
