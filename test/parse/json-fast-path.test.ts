import { readdirSync, readFileSync } from 'node:fs';
import fc from 'fast-check';
import { describe, expect, test } from 'vitest';
import { parseSource } from '../../src/core/parse/source.js';
import { inspectModel } from '../../src/core/inspect.js';
import { createScanMemo } from '../../src/core/metrics/scan-memo.js';
import { jsonViaFast as viaFast, jsonViaYaml as viaYaml } from './fast-readers.js';
import { outcome } from './helpers.js';

// The fast JSON reader (`json-read.ts`) must give what the YAML path gives for the same JSON
// text: the same values, the same line for every key and item, the same literal for every
// scalar, the same refusals. The YAML path is the `yaml` package (YAML 1.2, of which JSON is a
// subset: YAML 1.2.2, section 1.3) read through the project's one pipeline, so the reference
// for every check below is that package's reading of the text.

const FIXTURES = new URL('../../fixtures/checkpoints/', import.meta.url);
const jsonFixtures = readdirSync(FIXTURES).filter((name) => name.endsWith('.json'));

describe('the fast JSON reader gives what the YAML path gives', () => {
  test.each(jsonFixtures)(
    'fixtures/checkpoints/%s: values, every line and every literal',
    (name) => {
      const text = readFileSync(new URL(name, FIXTURES), 'utf8');
      const fast = viaFast(text);
      expect(fast).not.toBe('left to the YAML path');
      expect(fast).toEqual(viaYaml(text));
    },
  );

  test.each(jsonFixtures)(
    'fixtures/checkpoints/%s: inspect gives the same findings and lines through either reader',
    (name) => {
      const text = readFileSync(new URL(name, FIXTURES), 'utf8');
      // A `.yaml` name sends the same text down the YAML path (the fixtures hold no bare NaN).
      const yamlName = `models/${name.replace(/\.json$/, '.yaml')}`;
      // The positional metrics of equal specs are computed once (the specs are compared below).
      const memo = createScanMemo();
      const fast = inspectModel(text, `models/${name}`, { memo });
      const yaml = inspectModel(text, yamlName, { memo });
      expect(fast.findings.map((f) => [f.rule, f.line, f.key, f.message])).toEqual(
        yaml.findings.map((f) => [f.rule, f.line, f.key, f.message]),
      );
      expect(fast.locations).toEqual(yaml.locations);
      expect(fast.spec).toEqual(yaml.spec);
    },
  );

  /** Whitespace JSON allows between tokens (RFC 8259, section 2), CR LF line ends included. */
  const space = fc.constantFrom('', ' ', '  ', '\t', '\n', '\r\n', '\n    ', ' \n\t');
  /** Numbers written the ways JSON allows: signs, fractions, exponents, past 2^53, past binary64. */
  const number = fc.oneof(
    fc.integer({ min: -1e6, max: 1e6 }).map(String),
    fc.double({ noNaN: true, noDefaultInfinity: true }).map((x) => JSON.stringify(x)),
    fc.constantFrom(
      '-0',
      '-0.0',
      '1.0',
      '8.0e0',
      '1E+2',
      '1e-7',
      '1e400',
      '-1e400',
      '9007199254740993',
      '123456789012345678901234567890',
      '0.30000000000000004',
      '5e-324',
    ),
  );
  /** Strings with escapes JSON has and characters outside ASCII, astral ones included. */
  const string = fc
    .string({
      unit: fc.constantFrom(
        'a',
        'Z',
        ' ',
        'é',
        '模',
        '😀',
        '"',
        '\\',
        '/',
        '\u0001',
        '\u2028',
        '\u0085',
        ':',
        '#',
        '-',
        '&',
        '*',
      ),
    })
    .map((s) => {
      const quoted = JSON.stringify(s);
      // Some escapes JSON.stringify never writes: \/ and \u for a plain letter.
      return quoted.replace(/\//g, '\\/').replace(/Z/g, '\\u005A');
    });
  const key = fc.oneof(
    string,
    fc.constantFrom('"a"', '"b"', '"0"', '"1"', '""', '"a b"', '"x.y"', '"\\u0061"'),
  );
  const scalar = fc.oneof(number, string, fc.constantFrom('true', 'false', 'null'));
  const { json } = fc.letrec<{ json: string; list: string; map: string }>((tie) => ({
    json: fc.oneof({ depthSize: 'small', withCrossShrink: true }, scalar, tie('list'), tie('map')),
    list: fc
      .array(fc.tuple(space, tie('json'), space), { maxLength: 5 })
      .chain((items) =>
        space.map((inner) =>
          items.length === 0
            ? `[${inner}]`
            : `[${items.map(([a, v, b]) => `${a}${v}${b}`).join(',')}]`,
        ),
      ),
    map: fc
      .array(fc.tuple(space, key, space, space, tie('json'), space), { maxLength: 5 })
      .chain((entries) =>
        space.map((inner) =>
          entries.length === 0
            ? `{${inner}}`
            : `{${entries.map(([a, k, b, c, v, d]) => `${a}${k}${b}:${c}${v}${d}`).join(',')}}`,
        ),
      ),
  }));
  const document = fc
    .tuple(space, fc.array(fc.tuple(space, key, space, json, space), { maxLength: 6 }), space)
    .map(
      ([before, entries, after]) =>
        `${before}{${entries.map(([a, k, b, v, c]) => `${a}${k}:${b}${v}${c}`).join(',')}}${after}`,
    )
    .filter((text) => {
      try {
        JSON.parse(text);
        return true;
      } catch {
        return false;
      }
    });

  test('generated JSON (any nesting, spacing, escapes, numbers, duplicate and forbidden keys): the same outcome', () => {
    const outcomes = { read: 0, refused: 0 };
    fc.assert(
      fc.property(document, (text) => {
        const fast = viaFast(text);
        // The generator writes no lone carriage return, no deep nesting: the fast reader takes all.
        expect(fast).not.toBe('left to the YAML path');
        expect(fast).toEqual(viaYaml(text));
        outcomes[typeof fast === 'object' && 'refused' in fast ? 'refused' : 'read'] += 1;
      }),
      { numRuns: 400, seed: 13 },
    );
    // Both outcomes are exercised: documents read, and duplicate keys refused.
    expect(outcomes.read).toBeGreaterThan(100);
    expect(outcomes.refused).toBeGreaterThan(10);
  });

  test('generated JSON with a key named __proto__, constructor or prototype: the same refusal', () => {
    fc.assert(
      fc.property(
        document,
        fc.constantFrom('__proto__', 'constructor', 'prototype'),
        (text, bad) => {
          const poisoned = text.replace(/^(\s*)\{(\s*)(\}?)/, (_, a, b, empty) =>
            empty ? `${a}{"${bad}": 1${b}}` : `${a}{"${bad}": 1,${b}`,
          );
          expect(() => JSON.parse(poisoned)).not.toThrow();
          const fast = viaFast(poisoned);
          expect(fast).toHaveProperty('refused', expect.stringMatching(/is refused|duplicate key/));
          expect(fast).toEqual(viaYaml(poisoned));
        },
      ),
      { numRuns: 100, seed: 14 },
    );
  });

  test('bare NaN, Infinity and -Infinity (which the Python JSON reader writes) read as the same numbers', () => {
    const text = '{\n  "a": NaN,\n  "b": [Infinity, -Infinity],\n  "c": "NaN"\n}\n';
    expect(viaFast(text)).toEqual(viaYaml(text));
    const doc = parseSource(text, 'config.json');
    expect(Number.isNaN(doc.value.a)).toBe(true);
    expect(doc.value.b).toEqual([Infinity, -Infinity]);
    expect(doc.value.c).toBe('NaN');
    expect(doc.literalOf(['b', 1])).toBe('-Infinity');
  });

  test('a carriage return without a line feed is left to the YAML path, which reads or refuses it as before', () => {
    const accepted = '{"a": 1,\r"b": 2}';
    const refused = '{\r"a"\r:\r1\r,\r"b"\r:\r[\r1\r,\r2\r]\r}';
    for (const text of [accepted, refused]) {
      expect(viaFast(text)).toBe('left to the YAML path');
      expect(outcome(() => parseSource(text, 'config.json'))).toEqual(viaYaml(text));
    }
    expect(viaYaml(accepted)).toHaveProperty('value');
    expect(viaYaml(refused)).toHaveProperty('refused');
  });

  test('a top level that is not an object is left to the YAML path, which names it', () => {
    expect(viaFast('[1, 2]')).toBe('left to the YAML path');
    expect(() => parseSource('[1, 2]', 'config.json')).toThrow(/top level is a list/);
  });

  test('nesting past MAX_NESTING is refused without parsing, at the line the YAML path names', () => {
    const text = `{"a":\n${'['.repeat(300)}${']'.repeat(300)}}`;
    expect(viaFast(text)).toEqual(viaYaml(text));
    expect(() => parseSource(text, 'config.json')).toThrow(/line 2: nesting is deeper than 256/);
    // Two chains past the level: below 1,024 levels the YAML pipeline's tree walk meets the last,
    // past them its lexer pass stops at the first.
    const chain = (n: number) => `${'['.repeat(n)}${']'.repeat(n)}`;
    for (const [depth, line] of [
      [300, 3],
      [2000, 2],
    ] as const) {
      const two = `{"a":\n${chain(depth)},\n"b": ${chain(depth)}}`;
      expect(viaFast(two)).toEqual(viaYaml(two));
      expect(viaFast(two)).toHaveProperty('line', line);
    }
  });
});
