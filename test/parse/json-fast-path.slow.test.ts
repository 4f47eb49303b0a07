import { describe, expect, test } from 'vitest';
import { MAX_ENTRIES } from '../../src/core/parse/source.js';
import { jsonViaFast as viaFast, jsonViaYaml as viaYaml } from './fast-readers.js';

// The fast JSON reader (`json-read.ts`) at the parser's bound on entries: texts of tens of
// thousands of items, read by it and by the YAML path (the `yaml` package through the
// project's pipeline, the reference), which must refuse them at the same collection. Seconds of
// work, so it runs in `npm run test:full`; json-fast-path.test.ts holds the rest.

describe('the fast JSON reader gives what the YAML path gives, at the bound on entries', () => {
  test('more than MAX_ENTRIES entries are refused at the collection the YAML pipeline names', () => {
    // The YAML pipeline visits a collection, then its child collections last to first.
    const many = (n: number) => `[${Array(n).fill('1').join(',')}]`;
    for (const text of [
      `{"a": ${many(MAX_ENTRIES + 5)}}`,
      `{"a": ${many(30_000)},\n"b": [\n${many(30_000)}],\n"c": {}}`,
      `{"a": [\n${many(20_000)}, ${many(20_000)}],\n"b": ${many(20_000)}}`,
    ]) {
      const yamlSays = viaYaml(text) as { refused: string; line: number };
      expect(yamlSays.refused).toMatch(`more than ${MAX_ENTRIES} keys and list items`);
      expect(viaFast(text)).toEqual(yamlSays);
    }
  });
});
