import { readdirSync, readFileSync } from 'node:fs';
import fc from 'fast-check';
import { describe, expect, test } from 'vitest';
import { coreScalar } from '../../src/core/parse/yaml-block.js';
import { parseDocument } from 'yaml';
import { yamlViaFast as viaFast, yamlViaYaml as viaYaml } from './fast-readers.js';

// The fast block-YAML reader (`yaml-block.ts`) must give what the YAML path gives for the same
// text: values, the line of every key and item, the literal of every scalar, and the same
// refusals; or leave the text to the YAML path. The reference is the `yaml` package (YAML 1.2,
// core schema) read through the project's pipeline, and, for scalars, the core schema's table
// (YAML 1.2.2, section 10.3.2) as that package applies it.

const FIXTURES = new URL('../../fixtures/checkpoints/', import.meta.url);
const yamlFixtures = readdirSync(FIXTURES).filter((name) => name.endsWith('.yaml'));
const demoFixtures = ['base', 'head'].flatMap((side) => {
  const dir = new URL(`../../fixtures/demo/${side}/`, import.meta.url);
  const found: URL[] = [];
  const walk = (url: URL) => {
    for (const entry of readdirSync(url, { withFileTypes: true })) {
      if (entry.isDirectory()) walk(new URL(`${entry.name}/`, url));
      else if (/\.ya?ml$/.test(entry.name)) found.push(new URL(entry.name, url));
    }
  };
  walk(dir);
  return found;
});

describe('the fast block-YAML reader gives what the YAML path gives', () => {
  test.each([...yamlFixtures.map((name) => new URL(name, FIXTURES)), ...demoFixtures])(
    '%s: values, every line and every literal (or left to the YAML path)',
    (url) => {
      const text = readFileSync(url, 'utf8');
      const fast = viaFast(text);
      if (fast !== 'left to the YAML path') expect(fast).toEqual(viaYaml(text));
    },
  );

  test('the fixtures written as plain block YAML are read by the fast reader', () => {
    const read = [...yamlFixtures.map((name) => new URL(name, FIXTURES)), ...demoFixtures].filter(
      (url) => viaFast(readFileSync(url, 'utf8')) !== 'left to the YAML path',
    );
    expect(read.length).toBeGreaterThanOrEqual(4);
  });

  test('plain scalars resolve as the yaml package resolves them (YAML 1.2 core schema)', () => {
    const samples = [
      ...['', '~', 'null', 'Null', 'NULL', 'nULL', 'true', 'True', 'TRUE', 'tRUE', 'false'],
      ...['yes', 'no', 'on', 'off', 'y', 'n', '0', '-0', '+0', '007', '-12', '+12', '0o17'],
      ...['0o8', '0x1F', '0X1F', '0x', '1_000', '.5', '5.', '-.5', '+5.', '1e5', '1E+5', '1e-5'],
      ...['.inf', '-.Inf', '+.INF', '.nan', '.NaN', '.NAN', 'inf', 'nan', 'NaN', 'Infinity'],
      ...['1.0', '8.0e0', '9007199254740993', '123456789012345678901234567890', '1e400'],
      ...['0.30000000000000004', 'bf16', 'context-reach-model/1', 'a:b', 'x#y', "it's"],
    ];
    for (const s of samples) {
      const reference = parseDocument(`a: ${s}\n`).toJS() as { a: unknown };
      const mine = coreScalar(s);
      expect(
        Object.is(mine, reference.a) || (Number.isNaN(mine) && Number.isNaN(reference.a)),
        s,
      ).toBe(true);
    }
  });

  /** Generated block YAML, mostly inside the subset, with some of what leaves it. */
  const key = fc.oneof(
    fc.constantFrom('a', 'b', 'c', 'layers', 'kv-heads', 'head_dim', '_x', 'A1'),
    fc.constantFrom('null', 'true', 'TRUE', '1', 'a b', '"q"', 'k:', '__proto__', 'constructor'),
  );
  const scalar = fc.oneof(
    {
      weight: 6,
      arbitrary: fc.constantFrom(
        '1',
        '-0',
        '2.5',
        '1e400',
        '.inf',
        '.nan',
        '0x1F',
        '0o17',
        'bf16',
        'x y',
        '~',
        'null',
        'True',
        '"quoted"',
        "'single'",
        'a:b',
        'x#y',
        "it's",
        'é模😀',
      ),
    },
    {
      weight: 1,
      arbitrary: fc.constantFrom(
        '[1, 2]',
        '{a: 1}',
        '&anchor 1',
        '*alias',
        '!!str 1',
        '|',
        '"esc\\"aped"',
        "'it''s'",
        '- x',
        'a: b',
        '-',
        '@x',
        '`x`',
        '%x',
      ),
    },
  );
  const comment = fc.constantFrom('', '', '', ' # note', '  #x');
  interface Node {
    lines: string[];
  }
  const block = (indent: number, depth: number): fc.Arbitrary<Node> => {
    const pad = ' '.repeat(indent);
    const entry: fc.Arbitrary<string[]> = fc.oneof(
      {
        weight: 4,
        arbitrary: fc.tuple(key, scalar, comment).map(([k, v, c]) => [`${pad}${k}: ${v}${c}`]),
      },
      { weight: 1, arbitrary: fc.tuple(key, comment).map(([k, c]) => [`${pad}${k}:${c}`]) },
      {
        weight: depth < 3 ? 2 : 0,
        arbitrary: fc.tuple(key, fc.constantFrom(2, 4), fc.boolean()).chain(([k, step, list]) =>
          (list
            ? fc.array(fc.tuple(scalar, comment), { minLength: 1, maxLength: 4 }).map((items) => ({
                lines: items.map(([v, c]) => `${' '.repeat(indent + step)}- ${v}${c}`),
              }))
            : block(indent + step, depth + 1)
          ).map((child) => [`${pad}${k}:`, ...child.lines]),
        ),
      },
      {
        weight: 1,
        arbitrary: fc
          .constantFrom([''], ['# a comment'], ['   '], [`${pad}  # indented`])
          .map((lines) => [...lines]),
      },
    );
    return fc
      .array(entry, { minLength: 1, maxLength: 5 })
      .map((entries) => ({ lines: entries.flat() }));
  };
  const document = block(0, 0).map((node) => `${node.lines.join('\n')}\n`);

  test('generated block YAML (nesting, lists, comments, scalars of every kind, keys that collide): the same outcome or left to the YAML path', () => {
    const outcomes = { read: 0, refused: 0, left: 0 };
    fc.assert(
      fc.property(document, (text) => {
        const fast = viaFast(text);
        if (fast === 'left to the YAML path') {
          outcomes.left += 1;
          return;
        }
        expect(fast).toEqual(viaYaml(text));
        outcomes[typeof fast === 'object' && 'refused' in fast ? 'refused' : 'read'] += 1;
      }),
      { numRuns: 600, seed: 16 },
    );
    // The subset is exercised, read and refused alike, and what leaves it is left.
    expect(outcomes.read).toBeGreaterThan(60);
    expect(outcomes.refused).toBeGreaterThan(20);
    expect(outcomes.left).toBeGreaterThan(60);
  });
});
