import { readFileSync } from 'node:fs';
import { Ajv } from 'ajv';
import type { ErrorObject } from 'ajv';
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { SCHEMA_COMPILE_OPTIONS } from '../../src/core/schema-options.js';

// The start-up-minded compile options must not change a single error: each schema is compiled
// with ajv's defaults and with SCHEMA_COMPILE_OPTIONS, and both judge the same documents.

const load = (name: string) =>
  JSON.parse(readFileSync(new URL(`../../schema/${name}`, import.meta.url), 'utf8')) as Record<
    string,
    unknown
  >;
const SCHEMAS = [
  { name: 'policy.schema.json', extra: { allowUnionTypes: true } },
  { name: 'model.schema.json', extra: {} },
];

/** What the readers use of an error: where, which keyword, its params, the value and the schema holding it. */
function shape(errors: ErrorObject[] | null | undefined) {
  return (errors ?? []).map((e) => ({
    instancePath: e.instancePath,
    keyword: e.keyword,
    params: e.params,
    data: e.data,
    parentSchema: e.parentSchema,
  }));
}

/** Documents near the schemas' shapes: known keys with values of every kind, and unknown keys. */
function documents(schema: Record<string, unknown>): fc.Arbitrary<unknown> {
  const keys = new Set<string>();
  const walk = (node: unknown): void => {
    if (node === null || typeof node !== 'object') return;
    for (const [key, value] of Object.entries(node as Record<string, unknown>)) {
      if (key === 'properties' && value && typeof value === 'object')
        for (const name of Object.keys(value)) keys.add(name);
      walk(value);
    }
  };
  walk(schema);
  const key = fc.oneof(fc.constantFrom(...keys), fc.string({ maxLength: 6 }));
  const leaf = fc.oneof(
    fc.integer({ min: -5, max: 200000 }),
    fc.double({ noNaN: true }),
    fc.boolean(),
    fc.constant(null),
    fc.string({ maxLength: 8 }),
    fc.constantFrom(
      'bf16',
      'fp32',
      'rotary',
      'yarn',
      'block',
      'warn',
      'context-reach-model/1',
      '**/*.json',
    ),
  );
  const { tree } = fc.letrec((tie) => ({
    tree: fc.oneof(
      { depthSize: 'small', withCrossShrink: true },
      leaf,
      fc.array(tie('tree'), { maxLength: 3 }),
      fc.dictionary(key, tie('tree'), { maxKeys: 5 }),
    ),
  }));
  return fc.dictionary(key, tree, { maxKeys: 8 });
}

describe('SCHEMA_COMPILE_OPTIONS', () => {
  for (const { name, extra } of SCHEMAS) {
    it(`gives the same errors as ajv's defaults for schema/${name}`, () => {
      const schema = load(name);
      const plain = new Ajv({ allErrors: true, verbose: true, strict: true, ...extra }).compile(
        schema,
      );
      const quick = new Ajv({
        allErrors: true,
        verbose: true,
        strict: true,
        ...extra,
        ...SCHEMA_COMPILE_OPTIONS,
      }).compile(schema);
      fc.assert(
        fc.property(documents(schema), (doc) => {
          expect(quick(doc)).toBe(plain(doc));
          expect(shape(quick.errors)).toEqual(shape(plain.errors));
        }),
        { numRuns: 400 },
      );
    });
  }
});
