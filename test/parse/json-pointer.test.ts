import { describe, expect, test } from 'vitest';
import {
  PointerError,
  formatPointer,
  parsePointer,
  resolvePointer,
} from '../../src/core/parse/json-pointer.js';

// RFC 6901 (2013), section 5: the example document and what each pointer evaluates to.
const RFC_DOCUMENT = JSON.parse(`{
  "foo": ["bar", "baz"],
  "": 0,
  "a/b": 1,
  "c%d": 2,
  "e^f": 3,
  "g|h": 4,
  "i\\\\j": 5,
  "k\\"l": 6,
  " ": 7,
  "m~n": 8
}`);

const RFC_SECTION_5: [string, unknown][] = [
  ['', RFC_DOCUMENT],
  ['/foo', ['bar', 'baz']],
  ['/foo/0', 'bar'],
  ['/', 0],
  ['/a~1b', 1],
  ['/c%d', 2],
  ['/e^f', 3],
  ['/g|h', 4],
  ['/i\\j', 5],
  ['/k"l', 6],
  ['/ ', 7],
  ['/m~0n', 8],
];

// RFC 6901 section 6: the same pointers as URI fragments (percent-encoded, "#" first).
const RFC_SECTION_6: [string, unknown][] = [
  ['#', RFC_DOCUMENT],
  ['#/foo', ['bar', 'baz']],
  ['#/foo/0', 'bar'],
  ['#/', 0],
  ['#/a~1b', 1],
  ['#/c%25d', 2],
  ['#/e%5Ef', 3],
  ['#/g%7Ch', 4],
  ['#/i%5Cj', 5],
  ['#/k%22l', 6],
  ['#/%20', 7],
  ['#/m~0n', 8],
];

function pointerError(run: () => unknown): PointerError {
  try {
    run();
  } catch (error) {
    if (error instanceof PointerError) return error;
    throw error;
  }
  throw new Error('expected a PointerError');
}

describe('resolvePointer(root, pointer)', () => {
  test.each(RFC_SECTION_5)(
    'resolvePointer(RFC 6901 example, %j) is the value RFC 6901 section 5 gives',
    (pointer, expected) => {
      expect(resolvePointer(RFC_DOCUMENT, pointer).value).toEqual(expected);
    },
  );

  test.each(RFC_SECTION_6)(
    'resolvePointer(RFC 6901 example, %j) reads the URI-fragment form of section 6',
    (pointer, expected) => {
      expect(resolvePointer(RFC_DOCUMENT, pointer).value).toEqual(expected);
    },
  );

  test('resolvePointer returns the document path, list indexes as numbers', () => {
    expect(resolvePointer(RFC_DOCUMENT, '/foo/1').path).toEqual(['foo', 1]);
    expect(resolvePointer(RFC_DOCUMENT, '/a~1b').path).toEqual(['a/b']);
  });

  test('resolvePointer names the pointer and where it stopped when a key is missing', () => {
    const root = { model: { text: { layers: 2 } } };
    const error = pointerError(() => resolvePointer(root, '/model/txet/layers'));
    expect(error.resolved).toBe('/model');
    expect(error.resolvedPath).toEqual(['model']);
    expect(error.message).toBe(
      'pointer "/model/txet/layers" stops at "/model": no key "txet" there (keys: "text")',
    );
  });

  test('resolvePointer refuses an index past the end, a non-index and "-" in a list', () => {
    expect(pointerError(() => resolvePointer(RFC_DOCUMENT, '/foo/2')).reason).toContain(
      'index 2 is past the end of a list of 2',
    );
    expect(pointerError(() => resolvePointer(RFC_DOCUMENT, '/foo/01')).reason).toContain(
      'is not an index',
    );
    expect(pointerError(() => resolvePointer(RFC_DOCUMENT, '/foo/-')).reason).toContain('"-"');
  });

  test('resolvePointer refuses to step into a scalar', () => {
    const error = pointerError(() => resolvePointer(RFC_DOCUMENT, '/foo/0/x'));
    expect(error.resolved).toBe('/foo/0');
    expect(error.reason).toContain('not a mapping or a list');
  });

  test('resolvePointer follows own keys only, never inherited ones', () => {
    const root = Object.create(null);
    root.a = 1;
    expect(pointerError(() => resolvePointer({ a: 1 }, '/toString')).reason).toContain(
      'no key "toString"',
    );
    expect(pointerError(() => resolvePointer(root, '/__proto__')).reason).toContain(
      'no key "__proto__"',
    );
  });
});

describe('parsePointer(pointer) and formatPointer(tokens)', () => {
  test('parsePointer unescapes ~1 before ~0, so "~01" is "~1" (RFC 6901 section 4)', () => {
    expect(parsePointer('/~01')).toEqual(['~1']);
    expect(parsePointer('/a~1b/m~0n')).toEqual(['a/b', 'm~n']);
  });

  test('parsePointer refuses a pointer without a leading "/"', () => {
    expect(pointerError(() => parsePointer('model')).reason).toBe(
      'must start with "/" (for example "/model")',
    );
  });

  test.each([['/a~'], ['/a~2b']])(
    'parsePointer(%j) refuses "~" not followed by 0 or 1',
    (pointer) => {
      expect(pointerError(() => parsePointer(pointer)).reason).toContain(
        '"~" not followed by 0 or 1',
      );
    },
  );

  test('parsePointer refuses a malformed percent escape in the fragment form', () => {
    expect(pointerError(() => parsePointer('#/%zz')).reason).toContain('% escape');
  });

  test('formatPointer(parsePointer(p)) is p for every pointer of RFC 6901 section 5', () => {
    for (const [pointer] of RFC_SECTION_5)
      expect(formatPointer(parsePointer(pointer))).toBe(pointer);
  });
});
