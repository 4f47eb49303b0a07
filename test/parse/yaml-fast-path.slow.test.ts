import { describe, expect, test } from 'vitest';
import { MAX_ENTRIES, MAX_TOKENS } from '../../src/core/parse/source.js';
import { yamlViaFast as viaFast, yamlViaYaml as viaYaml } from './fast-readers.js';

// The fast block-YAML reader (`yaml-block.ts`) at the parser's bounds: texts of tens of thousands
// of entries, read by it and by the YAML path (the `yaml` package through the project's
// pipeline, the reference), which must refuse them alike. Seconds of work each, so they run in
// `npm run test:full`; yaml-fast-path.test.ts holds the rest of the comparison.

describe('the fast block-YAML reader gives what the YAML path gives, at the bounds', () => {
  test('more than MAX_ENTRIES entries: the same refusal at the same line', () => {
    // Few enough tokens for the YAML path to count entries: top-level keys and list items.
    const keys = (n: number) => Array.from({ length: n }, (_, i) => `k${i}: 1`).join('\n');
    const items = (n: number, pad = '  ') =>
      Array.from({ length: n }, () => `${pad}- 1`).join('\n');
    for (const text of [
      `${keys(MAX_ENTRIES + 1)}\n`,
      `a:\n${items(30_000)}\nb:\n${items(21_000)}\nc: 1\n`,
      `a:\n  b:\n${items(10_000, '    ')}\n  c: 2\nd:\n${items(41_000)}\n`,
    ]) {
      const yamlSays = viaYaml(text) as { refused: string; line: number };
      expect(yamlSays.refused).toMatch(`more than ${MAX_ENTRIES} keys and list items`);
      expect(viaFast(text)).toEqual(yamlSays);
    }
  });

  test('more than MAX_TOKENS tokens: the same refusal, counted by the lexer near the bound', () => {
    const text = `x:\n${'  - 1\n'.repeat(100_000)}`;
    const yamlSays = viaYaml(text) as { refused: string };
    expect(yamlSays.refused).toMatch(`more than ${MAX_TOKENS} syntax tokens`);
    expect(viaFast(text)).toEqual(yamlSays);
  });

  test('a duplicate key among 40,000 is found at its line, after the bounds, as on the YAML path', () => {
    const keys = Array.from({ length: 40_000 }, (_, i) => `  k${i}: ${i}`);
    keys.push('  k17: 1');
    const text = `notes:\n${keys.join('\n')}\n`;
    const fast = viaFast(text) as { refused: string; line: number };
    expect(fast.refused).toMatch(/line 40002: duplicate key "k17"/);
    expect(fast).toEqual(viaYaml(text));
  });
});
