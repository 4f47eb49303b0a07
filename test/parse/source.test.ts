import { describe, expect, test } from 'vitest';
import { ReadError } from '../../src/core/parse/errors.js';
import {
  FORBIDDEN_KEYS,
  MAX_ALIASES,
  MAX_ALIAS_VALUES,
  MAX_FULL_YAML_LENGTH,
  MAX_FULL_YAML_LINES,
  MAX_FULL_YAML_TOKENS,
  MAX_NESTING,
  MAX_TEXT_LENGTH,
  decodeText,
  parseSource,
} from '../../src/core/parse/source.js';
import { lineOf, readError } from './helpers.js';
import { cpuClock } from '../support/cpu-time.js';

const JSON_TEXT = `{
  "model_type": "llama",
  "hidden_size": 4096,
  "rope_scaling": {
    "rope_type": "llama3",

    "factor": 8.0
  },
  "layer_types": ["full_attention",
    "sliding_attention"]
}
`;

const YAML_TEXT = `# a comment line
format: context-reach-model/1
model:
  layers: 32
  position:
    code: rotary
    scaling: {kind: yarn,
      factor: 4}
  list:
    - 1
    - 2
`;

describe('parseSource(text, file) lines and literals', () => {
  test('parseSource(json) gives the 1-based line of every key, nested ones included', () => {
    const doc = parseSource(JSON_TEXT, 'config.json');
    expect(doc.lineOf(['model_type'])).toBe(lineOf(JSON_TEXT, '"model_type"'));
    expect(doc.lineOf(['hidden_size'])).toBe(lineOf(JSON_TEXT, '"hidden_size"'));
    expect(doc.lineOf(['rope_scaling'])).toBe(lineOf(JSON_TEXT, '"rope_scaling"'));
    expect(doc.lineOf(['rope_scaling', 'factor'])).toBe(lineOf(JSON_TEXT, '"factor"'));
    expect(doc.lineOf(['layer_types', 1])).toBe(lineOf(JSON_TEXT, '"sliding_attention"'));
  });

  test('parseSource(yaml) gives the line of block and flow keys and of list items', () => {
    const doc = parseSource(YAML_TEXT, 'model.yaml');
    expect(doc.lineOf(['format'])).toBe(lineOf(YAML_TEXT, 'format:'));
    expect(doc.lineOf(['model', 'layers'])).toBe(lineOf(YAML_TEXT, 'layers:'));
    expect(doc.lineOf(['model', 'position', 'scaling', 'kind'])).toBe(
      lineOf(YAML_TEXT, 'kind: yarn'),
    );
    expect(doc.lineOf(['model', 'position', 'scaling', 'factor'])).toBe(
      lineOf(YAML_TEXT, 'factor: 4'),
    );
    expect(doc.lineOf(['model', 'list', 1])).toBe(lineOf(YAML_TEXT, '- 2'));
  });

  test('parseSource(text).lineOf(path) is null for a path that is not in the file', () => {
    const doc = parseSource(JSON_TEXT, 'config.json');
    expect(doc.lineOf(['nope'])).toBeNull();
    expect(doc.lineOf(['rope_scaling', 'nope'])).toBeNull();
  });

  test('parseSource(text).literalOf(path) is the scalar exactly as written, quotes included', () => {
    const doc = parseSource('{"a": 8.0, "b": "x", "c": 1e400}', 'f.json');
    expect(doc.literalOf(['a'])).toBe('8.0');
    expect(doc.literalOf(['b'])).toBe('"x"');
    expect(doc.literalOf(['c'])).toBe('1e400');
    expect(doc.literalOf(['a', 'b'])).toBeNull();
  });

  test('parseSource(text).value holds the plain values of JSON and YAML alike', () => {
    const json = parseSource(JSON_TEXT, 'config.json').value;
    expect(json.hidden_size).toBe(4096);
    expect(json.layer_types).toEqual(['full_attention', 'sliding_attention']);
    const yaml = parseSource(YAML_TEXT, 'model.yaml').value;
    expect(JSON.parse(JSON.stringify(yaml))).toEqual({
      format: 'context-reach-model/1',
      model: {
        layers: 32,
        position: { code: 'rotary', scaling: { kind: 'yarn', factor: 4 } },
        list: [1, 2],
      },
    });
  });

  test('parseSource(text) builds mappings without a prototype', () => {
    const value = parseSource('{"a": {"b": 1}}', 'f.json').value;
    expect(Object.getPrototypeOf(value)).toBeNull();
    expect(Object.getPrototypeOf(value.a)).toBeNull();
    // No inherited names leak in as keys.
    expect('toString' in value).toBe(false);
  });
});

describe('parseSource(text, file) numbers', () => {
  test('parseSource keeps -0 as negative zero (IEEE 754 signed zero)', () => {
    const v = parseSource('{"a": -0, "b": -0.0}', 'f.json').value;
    expect(Object.is(v.a, -0)).toBe(true);
    expect(Object.is(v.b, -0)).toBe(true);
  });

  test('parseSource reads 1e400 as Infinity: beyond the largest binary64 value, 1.7976931348623157e308 (IEEE 754)', () => {
    const v = parseSource('{"a": 1e400, "b": -1e400}', 'f.json').value;
    expect(v.a).toBe(Infinity);
    expect(v.b).toBe(-Infinity);
    expect(Number.MAX_VALUE).toBe(1.7976931348623157e308);
  });

  test('parseSource reads 2^60 as the nearest double, past Number.MAX_SAFE_INTEGER = 2^53 - 1', () => {
    const v = parseSource('{"a": 1152921504606846976, "b": 9007199254740993}', 'f.json').value;
    expect(v.a).toBe(2 ** 60);
    // 2^53 + 1 has no binary64 form: it rounds to 2^53 (ties to even).
    expect(v.b).toBe(2 ** 53);
    expect(Number.isSafeInteger(v.a)).toBe(false);
  });
});

describe('parseSource(text, file) errors', () => {
  test('parseSource(text, "x.json") throws ReadError naming file and line on a JSON syntax error', () => {
    const text = '{\n  "a": 1,\n  "b": 2\n  "c": 3\n}\n';
    const error = readError(() => parseSource(text, 'models/x/config.json'));
    expect(error.file).toBe('models/x/config.json');
    // JSON.parse (the reference reader) stops at the key that should have followed a comma.
    expect(error.line).toBe(lineOf(text, '"c"'));
    expect(error.reason).toBe("is not valid JSON: Expected ',' or '}' after property value");
    expect(error.message).toBe(`models/x/config.json, line ${error.line}: ${error.reason}`);
  });

  test.each([
    ['a bare word', '{\n  "hidden_size": 4096,\n  oops\n}\n', 3],
    ['a trailing comma', '{\n  "a": 1,\n}\n', 3],
    ['single quotes', "{\n  'a': 1\n}\n", 2],
    ['text after the document', '{"a": 1}\n{"b": 2}\n', 2],
    ['an unclosed mapping', '{\n  "a": 1\n', 3],
  ])(
    'parseSource(text, "x.json") refuses %s, which YAML would read but JSON loaders refuse',
    (_, text, line) => {
      const error = readError(() => parseSource(text, 'config.json'));
      expect(error.reason).toMatch(/^is not valid JSON: /);
      expect(error.line).toBe(line);
    },
  );

  test('parseSource(text, "x.yaml") reads JSON-like text as YAML flow style, trailing comma included', () => {
    expect(parseSource('{"a": 1,}', 'config.yaml').value.a).toBe(1);
  });

  test('parseSource(text, "x.json") reads bare NaN, Infinity and -Infinity as numbers, as Python\'s json module writes and reads them', () => {
    const v = parseSource(
      '{"a": NaN, "b": Infinity, "c": -Infinity, "d": "NaN"}',
      'config.json',
    ).value;
    expect(Number.isNaN(v.a)).toBe(true);
    expect([v.b, v.c, v.d]).toEqual([Infinity, -Infinity, 'NaN']);
  });

  test('parseSource(text, "x.yaml") leaves NaN as text: YAML 1.2 writes it .nan', () => {
    expect(parseSource('a: NaN\nb: .nan\n', 'f.yaml').value.a).toBe('NaN');
  });

  test('parseSource throws ReadError on a YAML syntax error in JSON-like text, with a hint about commas', () => {
    const text = '{\n  "a": 1,\n  "b": 2\n  "c": 3\n}\n';
    const error = readError(() => parseSource(text, 'config.yaml'));
    expect(error.line).toBe(lineOf(text, '"b"'));
    expect(error.reason).toContain('missing comma');
  });

  test('parseSource throws ReadError on a YAML indentation error, with its line', () => {
    const text = 'model:\n  layers: 1\n hidden: 2\n';
    const error = readError(() => parseSource(text, 'm.yaml'));
    expect(error.line).toBe(lineOf(text, 'hidden'));
  });

  test('parseSource refuses duplicate keys in JSON and names the line of the second one', () => {
    const text = '{\n  "hidden_size": 1,\n  "vocab_size": 2,\n  "hidden_size": 3\n}';
    const error = readError(() => parseSource(text, 'c.json'));
    expect(error.line).toBe(4);
    expect(error.reason).toContain('duplicate key');
    expect(error.reason).toContain('hidden_size');
  });

  test('parseSource refuses duplicate keys in YAML, nested ones too', () => {
    const text = 'model:\n  layers: 1\n  layers: 2\n';
    const error = readError(() => parseSource(text, 'm.yaml'));
    expect(error.line).toBe(3);
    expect(error.reason).toContain('duplicate key');
  });

  test('parseSource refuses keys that differ only in type (1 and "1"), which would collide as object keys', () => {
    const error = readError(() => parseSource('1: a\n"1": b\n', 'm.yaml'));
    expect(error.line).toBe(2);
    expect(error.reason).toContain('duplicate key "1"');
  });

  test.each([
    ['[1, 2]', 'a list'],
    ['"text"', '"text"'],
    ['42', '42'],
  ])('parseSource(%s) throws: the top level must be a mapping', (text, shown) => {
    const error = readError(() => parseSource(text, 'f.json'));
    expect(error.reason).toBe(`top level is ${shown}; expected a mapping of keys`);
  });

  test.each([[''], ['# only a comment\n'], ['~'], ['null']])(
    'parseSource(%j) throws: an empty file holds no mapping',
    (text) => {
      expect(readError(() => parseSource(text, 'f.yaml')).reason).toBe(
        'is empty; expected a mapping of keys',
      );
    },
  );

  test('parseSource refuses a stream of several YAML documents', () => {
    const error = readError(() => parseSource('a: 1\n---\nb: 2\n', 'f.yaml'));
    expect(error.line).toBe(2);
    expect(error.reason).toContain('more than one YAML document');
  });

  test('parseSource refuses tags outside the JSON-compatible core schema (!!binary)', () => {
    const error = readError(() => parseSource('a: !!binary aGVsbG8=\n', 'f.yaml'));
    expect(error.line).toBe(1);
  });

  test('parseSource refuses mappings and lists used as keys', () => {
    expect(readError(() => parseSource('? [a, b]\n: 1\n', 'f.yaml')).reason).toContain(
      'keys must be plain text',
    );
  });
});

describe('parseSource(text, file) against untrusted text', () => {
  test.each(FORBIDDEN_KEYS.map((k) => [k]))(
    'parseSource refuses the key %s in JSON, and no prototype changes',
    (key) => {
      const text = `{"a": 1, "nested": {"${key}": {"polluted": true}}}`;
      const error = readError(() => parseSource(text, 'evil.json'));
      expect(error.reason).toContain(`"${key}"`);
      expect(error.key).toBe(`nested.${key}`);
      expect(({} as Record<string, unknown>).polluted).toBeUndefined();
      expect(Object.prototype).not.toHaveProperty('polluted');
    },
  );

  test('parseSource refuses __proto__ as a YAML key, quoted or plain, and no prototype changes', () => {
    for (const text of [
      '__proto__:\n  polluted: yes\n',
      '"__proto__": {polluted: true}\n',
      'a:\n  - {__proto__: {polluted: 1}}\n',
    ]) {
      expect(readError(() => parseSource(text, 'evil.yaml')).reason).toContain('__proto__');
    }
    expect(({} as Record<string, unknown>).polluted).toBeUndefined();
  });

  test('parseSource expands a few aliases like YAML says', () => {
    const v = parseSource(
      'base: &b {heads: 8, layers: 6}\nencoder: *b\ndecoder: *b\n',
      'f.yaml',
    ).value;
    expect(JSON.parse(JSON.stringify(v))).toEqual({
      base: { heads: 8, layers: 6 },
      encoder: { heads: 8, layers: 6 },
      decoder: { heads: 8, layers: 6 },
    });
  });

  test(`parseSource stops an alias bomb after ${MAX_ALIASES} expansions, quickly`, () => {
    const levels = ['a: &a [x, x, x, x, x, x, x, x, x, x]'];
    for (let i = 1; i < 9; i++) {
      const prev = String.fromCharCode(96 + i);
      const cur = String.fromCharCode(97 + i);
      levels.push(`${cur}: &${cur} [${Array(10).fill(`*${prev}`).join(', ')}]`);
    }
    const text = `${levels.join('\n')}\n`;
    const cpu = cpuClock();
    const error = readError(() => parseSource(text, 'bomb.yaml'));
    // 10^9 values if expanded; the bound must stop it in well under a second on any CI machine.
    expect(cpu(), 'ms of CPU time').toBeLessThan(2000);
    expect(error.reason).toContain(`more than ${MAX_ALIASES} aliases`);
  });

  test('parseSource bounds the values aliases add, even with few aliases', () => {
    // 60 aliases (under the alias limit) of a 2,000-item list would add 120,000 values.
    const big = `[${Array(2_000).fill('1').join(', ')}]`;
    const text = `a: &a ${big}\nb: [${Array(60).fill('*a').join(', ')}]\n`;
    expect(readError(() => parseSource(text, 'wide.yaml')).reason).toContain(
      `aliases expand to more than ${MAX_ALIAS_VALUES} values`,
    );
    expect(MAX_ALIAS_VALUES).toBeLessThan(120_000);
  });

  test('parseSource refuses an alias inside the value it names', () => {
    expect(() => parseSource('a: &x [1, *x]\n', 'loop.yaml')).toThrow(ReadError);
  });

  const nestedArrays = (n: number): string => `{"a": ${'['.repeat(n - 1)}${']'.repeat(n - 1)}}`;

  test(`parseSource accepts exactly ${MAX_NESTING} levels of nesting (the top-level mapping is level 1)`, () => {
    expect(() => parseSource(nestedArrays(MAX_NESTING), 'deep.json')).not.toThrow();
    const error = readError(() => parseSource(nestedArrays(MAX_NESTING + 1), 'deep.json'));
    expect(error.reason).toContain(`deeper than ${MAX_NESTING}`);
    expect(error.line).toBe(1);
  });

  test.each([
    ['flow lists', `{"a": ${'['.repeat(10_000)}${']'.repeat(10_000)}}`],
    ['flow mappings', `${'{"a": '.repeat(10_000)}1${'}'.repeat(10_000)}`],
    ['block lists', `a:\n${'- '.repeat(10_000)}1\n`],
    ['unclosed flow lists', `a: ${'['.repeat(10_000)}`],
  ])('parseSource refuses 10,000 levels of %s with a clean error, quickly', (_, text) => {
    const cpu = cpuClock();
    const error = readError(() => parseSource(text, 'deep'));
    // The syntax pass is linear (about 0.2 s here for 10,000 levels); 5 s leaves room for slow CI runners.
    expect(cpu(), 'ms of CPU time').toBeLessThan(5000);
    expect(error.reason).toContain(`nesting is deeper than ${MAX_NESTING}`);
  });

  test('parseSource refuses 1,000 levels of indented block mappings with the line where it got too deep', () => {
    const text = Array.from({ length: 1000 }, (_, i) => `${' '.repeat(i)}k:`).join('\n') + ' 1\n';
    const error = readError(() => parseSource(text, 'deep.yaml'));
    expect(error.line).toBe(MAX_NESTING + 1);
  });

  test('parseSource refuses nesting that only aliases make too deep', () => {
    const inner = `${'['.repeat(200)}${']'.repeat(200)}`;
    const text = `a: &a ${inner}\nb: &b ${'['.repeat(100)}*a${']'.repeat(100)}\n`;
    expect(readError(() => parseSource(text, 'alias-deep.yaml')).reason).toContain(
      'once aliases are expanded',
    );
  });

  test('parseSource drops a leading byte-order mark (U+FEFF)', () => {
    const doc = parseSource('\uFEFF{"a": 1}', 'bom.json');
    expect(doc.value.a).toBe(1);
    expect(doc.lineOf(['a'])).toBe(1);
  });

  test('parseSource refuses NUL characters: binary data or UTF-16 text', () => {
    const error = readError(() => parseSource('a: 1\nb: \u0000\n', 'bin.yaml'));
    expect(error.line).toBe(2);
    expect(error.reason).toContain('NUL');
  });

  test('parseSource refuses U+FFFD, the mark a lenient decoder leaves for bytes that are not UTF-8', () => {
    const lenient = new TextDecoder('utf-8').decode(new Uint8Array([0x61, 0x3a, 0x20, 0xff, 0x0a]));
    expect(lenient).toBe('a: \uFFFD\n');
    expect(readError(() => parseSource(lenient, 'latin1.yaml')).reason).toContain('U+FFFD');
  });

  test('parseSource refuses a lone UTF-16 surrogate', () => {
    expect(readError(() => parseSource('a: "\uD800"\n', 'f.yaml')).reason).toContain('surrogate');
  });

  test(`parseSource refuses text longer than ${MAX_TEXT_LENGTH} characters`, () => {
    const text = `a: "${'x'.repeat(MAX_TEXT_LENGTH)}"\n`;
    expect(readError(() => parseSource(text, 'huge.yaml')).reason).toContain(
      `limited to ${MAX_TEXT_LENGTH}`,
    );
  });
});

describe('decodeText(bytes, path)', () => {
  test('decodeText(bytes) round-trips what TextEncoder writes, multi-byte characters included', () => {
    const text = 'name: "é 😀 模型"\n';
    expect(decodeText(new TextEncoder().encode(text), 'f.yaml')).toBe(text);
  });

  test('decodeText(bytes) drops a UTF-8 byte-order mark (EF BB BF)', () => {
    expect(decodeText(new Uint8Array([0xef, 0xbb, 0xbf, 0x61]), 'f.yaml')).toBe('a');
  });

  test('decodeText(bytes) refuses a byte that starts no UTF-8 character, naming its line', () => {
    const bytes = new Uint8Array([...new TextEncoder().encode('a: 1\nb: 2\nc: '), 0xff, 0x0a]);
    const error = readError(() => decodeText(bytes, 'latin1.yaml'));
    expect(error.file).toBe('latin1.yaml');
    expect(error.line).toBe(3);
    expect(error.reason).toContain('ff');
  });

  test.each([
    ['a truncated two-byte sequence', [0x61, 0xc3]],
    ['an overlong encoding of "/" (C0 AF), which RFC 3629 section 3 forbids', [0xc0, 0xaf]],
    ['an encoded surrogate (ED A0 80), which RFC 3629 section 3 forbids', [0xed, 0xa0, 0x80]],
  ])('decodeText refuses %s', (_, bytes) => {
    expect(() => decodeText(new Uint8Array(bytes), 'f.yaml')).toThrow(ReadError);
  });

  test('decodeText refuses UTF-16 with a byte-order mark (FF FE)', () => {
    const error = readError(() =>
      decodeText(new Uint8Array([0xff, 0xfe, 0x61, 0x00]), 'utf16.json'),
    );
    expect(error.reason).toContain('UTF-16');
  });

  test('decodeText refuses UTF-16 without a mark by its NUL bytes, though they are valid UTF-8', () => {
    const utf16 = new Uint8Array([0x7b, 0x00, 0x0a, 0x00, 0x7d, 0x00]);
    const error = readError(() => decodeText(utf16, 'utf16.json'));
    expect(error.reason).toContain('NUL');
    expect(error.line).toBe(1);
  });

  test('decodeText refuses binary data (a PNG signature: 89 50 4E 47 0D 0A 1A 0A, then NULs)', () => {
    const png = new Uint8Array([
      0x89, 0x50, 0x4e, 0x47, 0x0d, 0x0a, 0x1a, 0x0a, 0x00, 0x00, 0x00, 0x0d,
    ]);
    expect(() => decodeText(png, 'image.json')).toThrow(ReadError);
  });
});

describe('the budget of files the fast readers leave to the YAML pipeline', () => {
  // The pipeline costs 5–15 µs a token and folds block scalars line by line, so what the fast
  // readers do not take is held to MAX_FULL_YAML_LENGTH, _LINES and _TOKENS, each named.
  test('past the length: refused from it, naming the form that took the file there', () => {
    const flow = `{a: "${'x'.repeat(MAX_FULL_YAML_LENGTH)}"}`;
    const error = readError(() => parseSource(flow, 'm/model.reach.yaml'));
    expect(error.line).toBeNull();
    expect(error.reason).toContain(
      `is ${flow.length} characters long and is YAML written outside plain block style`,
    );
    // The same text as plain block YAML is for the fast reader, which reads up to 4 MiB.
    expect(
      parseSource(`a: ${'x'.repeat(MAX_FULL_YAML_LENGTH)}\n`, 'm/model.reach.yaml').value.a,
    ).toHaveLength(MAX_FULL_YAML_LENGTH);
  });

  test('past the lines: refused at the first line past them', () => {
    const text = `a: |\n${'  x\n'.repeat(MAX_FULL_YAML_LINES)}`;
    const error = readError(() => parseSource(text, 'm/model.reach.yaml'));
    expect(error.line).toBe(MAX_FULL_YAML_LINES + 1);
    expect(error.reason).toContain(`has more than ${MAX_FULL_YAML_LINES} lines`);
    const fits = `a: |\n${'  x\n'.repeat(MAX_FULL_YAML_LINES - 1)}`;
    expect(parseSource(fits, 'm/model.reach.yaml').value.a).toBe(
      'x\n'.repeat(MAX_FULL_YAML_LINES - 1),
    );
  });

  test('past the tokens: refused by the lexer count; JSON left to the pipeline says why it was', () => {
    const entries = (n: number) => Array.from({ length: n }, (_, i) => `k${i}: 1`).join(', ');
    expect(
      readError(() => parseSource(`{${entries(4_000)}}`, 'm/model.reach.yaml')).reason,
    ).toContain(`holds more than ${MAX_FULL_YAML_TOKENS} syntax tokens`);
    expect(
      Object.keys(parseSource(`{${entries(2_000)}}`, 'm/model.reach.yaml').value),
    ).toHaveLength(2_000);
    const json = `{\r${Array.from({ length: 4_000 }, (_, i) => `"k${i}": 1`).join(',\r')}}`;
    expect(readError(() => parseSource(json, 'm/config.json')).reason).toContain(
      'and is JSON the JSON reader leaves to the YAML reader (a top level that is not an object, or a carriage return without a line feed)',
    );
  });

  test('JSON past the nesting bound with a syntax error: the error, at its line, without parsing', () => {
    const text = `{"a":\n${'['.repeat(300)}\n${']'.repeat(299)}}`;
    const error = readError(() => parseSource(text, 'm/config.json'));
    expect(error.line).toBe(3);
    expect(error.reason).toBe('is not valid JSON: unexpected character "}"');
  });
});
