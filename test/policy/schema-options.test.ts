import { readFileSync } from 'node:fs';
import { resolve } from 'node:path';
import { Ajv } from 'ajv';
import type { ErrorObject, ValidateFunction } from 'ajv';
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { parse as parseYaml } from 'yaml';
// @ts-expect-error: a plain ES module script without types
import * as generator from '../../scripts/generate-validators.mjs';

// The validators of the policy and the model description are generated at build time with ajv's
// standalone code (scripts/generate-validators.mjs). Their compile options must not change a
// single error: each schema is compiled with ajv's defaults and with SCHEMA_COMPILE_OPTIONS, and
// both judge the same documents. The generated modules must be what the script generates from
// the schemas now, and judge documents as ajv compiling the schema at test time does.

interface Generated {
  schema: string;
  out: string;
  options: Record<string, unknown>;
}
const { SCHEMA_COMPILE_OPTIONS, VALIDATORS, generateValidator } = generator as {
  SCHEMA_COMPILE_OPTIONS: Record<string, unknown>;
  VALIDATORS: Generated[];
  generateValidator: (root: string, validator: Generated) => string;
};
const ROOT = resolve(import.meta.dirname, '../..');

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

/** ajv's defaults with the options every reader needs (all errors, with data and parent schema). */
function compiledNow(name: string): ValidateFunction {
  const extra = SCHEMAS.find((s) => s.name === name)!.extra;
  return new Ajv({ allErrors: true, verbose: true, strict: true, ...extra }).compile(load(name));
}

async function generatedValidator(name: string): Promise<ValidateFunction> {
  const validator = VALIDATORS.find((v) => v.schema === `schema/${name}`)!;
  const module = (await import(resolve(ROOT, validator.out))) as { validate: ValidateFunction };
  return module.validate;
}

const yamlFile = (path: string) => parseYaml(readFileSync(resolve(ROOT, path), 'utf8')) as unknown;
/** 50 code points in 100 UTF-16 units: within `maxLength: 50` only when lengths count code points (ajv's ucs2length). */
const ASTRAL_50 = '\u{1F600}'.repeat(50);

/** Documents of each schema that conform and that do not. */
const CASES: Record<string, { valid: unknown[]; invalid: unknown[] }> = {
  'policy.schema.json': {
    valid: [
      yamlFile('fixtures/demo/base/.github/context-reach.yml'),
      yamlFile('fixtures/demo/head/.github/context-reach.yml'),
      { 'waiver-label': ASTRAL_50 },
      { limits: { memoryBytes: { max: null } } },
    ],
    invalid: [
      { 'waiver-label': `${ASTRAL_50}x` },
      { 'waiver-label': '' },
      { files: [''], serving: { span: 'long' } },
      { unknown: true, rules: { 'span-grew-code-unchanged': 'loud' } },
      [],
    ],
  },
  'model.schema.json': {
    valid: [
      yamlFile('fixtures/checkpoints/own-full.reach.yaml'),
      yamlFile('fixtures/checkpoints/own-encoder-decoder.reach.yaml'),
      yamlFile('fixtures/demo/head/models/quill-mini/model.reach.yaml'),
    ],
    invalid: [
      { format: 'context-reach-model/1' },
      { format: 'context-reach-model/1', model: { name: 'x'.repeat(201), layers: -1 } },
      'a string',
    ],
  },
};

describe('the generated validators (scripts/generate-validators.mjs)', () => {
  for (const validator of VALIDATORS) {
    it(`${validator.out} is what the script generates from ${validator.schema} now`, () => {
      // Stale after a schema edit: \`node scripts/generate-validators.mjs\` (or \`npm run build\`) writes it again.
      // Compared as one flag: the modules are single lines of 100 KiB and more.
      const fresh =
        readFileSync(resolve(ROOT, validator.out), 'utf8') === generateValidator(ROOT, validator);
      expect(fresh, `${validator.out} is stale`).toBe(true);
    });
  }

  for (const { name } of SCHEMAS) {
    it(`judges documents as ajv compiling schema/${name} at test time does`, async () => {
      const generated = await generatedValidator(name);
      const now = compiledNow(name);
      const { valid, invalid } = CASES[name]!;
      for (const doc of valid) {
        expect(now(doc), JSON.stringify(now.errors)).toBe(true);
        expect(generated(doc), JSON.stringify(generated.errors)).toBe(true);
      }
      for (const doc of invalid) {
        expect(now(doc)).toBe(false);
        expect(generated(doc)).toBe(false);
        expect(shape(generated.errors)).toEqual(shape(now.errors));
        expect(shape(generated.errors).length).toBeGreaterThan(0);
      }
      fc.assert(
        fc.property(documents(load(name)), (doc) => {
          expect(generated(doc)).toBe(now(doc));
          expect(shape(generated.errors)).toEqual(shape(now.errors));
        }),
        { numRuns: 300 },
      );
    });
  }
});
