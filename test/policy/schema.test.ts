import { readFileSync } from 'node:fs';
import { Ajv } from 'ajv';
import { describe, expect, test } from 'vitest';
import { METRIC_PATHS } from '../../src/core/metrics/metric-path.js';
import { FLOAT_FORMATS, STORAGE_DTYPES } from '../../src/core/model.js';
import { PRECISION_METRICS, SCALAR_METRICS } from '../../src/core/metrics/types.js';
import { RULES } from '../../src/core/rules/catalog.js';
import {
  DEFAULT_EXCLUDE,
  DEFAULT_FILES,
  POLICY_SCHEMA,
  parsePolicy,
  servingPatchOf,
} from '../../src/core/policy/index.js';

// The schema file read as untyped JSON: the assertions below are what check its shape.
// eslint-disable-next-line @typescript-eslint/no-explicit-any
type Schema = Record<string, any>;
const shipped = JSON.parse(
  readFileSync(new URL('../../schema/policy.schema.json', import.meta.url), 'utf8'),
) as Schema;
const definitions = shipped.definitions as Record<
  'limits' | 'limit' | 'rules' | 'serving',
  Schema
> &
  Partial<Record<string, Schema>>;

describe('schema/policy.schema.json', () => {
  test('is the schema the parser validates with', () => {
    expect(POLICY_SCHEMA).toEqual(shipped);
  });

  test("is a valid draft-07 JSON Schema (ajv's draft-07 meta-schema)", () => {
    const ajv = new Ajv({ strict: true, allowUnionTypes: true });
    expect(ajv.validateSchema(shipped)).toBe(true);
    expect(shipped.$schema).toBe('http://json-schema.org/draft-07/schema#');
  });

  test('enumerates exactly the limitable metric names: SCALAR_METRICS and precision.<format>.<metric>', () => {
    const expected = [
      ...SCALAR_METRICS,
      ...FLOAT_FORMATS.flatMap((format) =>
        PRECISION_METRICS.map((metric) => `precision.${format}.${metric}`),
      ),
    ];
    expect(Object.keys(definitions.limits.properties)).toEqual(expected);
    expect(Object.keys(definitions.limits.properties)).toEqual([...METRIC_PATHS]);
    expect(definitions.limits.additionalProperties).toBe(false);
  });

  test('every metric entry has a description naming its unit', () => {
    for (const [name, entry] of Object.entries(
      definitions.limits.properties as Record<string, Schema>,
    )) {
      expect(entry.description, name).toMatch(
        /^(tokens|token|count|ratio|bytes|radians|FLOP|0\.\.1|0\.\.2):/,
      );
    }
  });

  // After adding a rule: node scripts/sync-policy-schema-rules.mjs
  test('enumerates exactly the rule ids of the catalogue, each with a description', () => {
    expect(Object.keys(definitions.rules.properties).sort()).toEqual(Object.keys(RULES).sort());
    for (const [id, entry] of Object.entries(
      definitions.rules.properties as Record<string, Schema>,
    )) {
      expect(entry.description, id).toBe(`${RULES[id as keyof typeof RULES].title}.`);
    }
  });

  test('serving keys are the fourteen of the policy file, each mapped to a ServingPatch field', () => {
    const keys = Object.keys(definitions.serving.properties);
    expect(keys).toEqual([
      'span',
      'sequences',
      'device-memory-gib',
      'reserve',
      'activation-reserve-gib',
      'tensor-parallel',
      'pipeline-parallel',
      'weights',
      'weight-group-size',
      'cache',
      'positions',
      'output-tokens',
      'prompt-tokens',
      'trained-span',
    ]);
    const patch = servingPatchOf(Object.fromEntries(keys.map((key) => [key, 1])));
    expect(Object.keys(patch)).toHaveLength(14);
    expect(definitions.serving.properties.weights.enum).toEqual([...STORAGE_DTYPES]);
    expect(definitions.serving.properties.cache.enum).toEqual([...STORAGE_DTYPES]);
    expect(definitions.serving.properties.positions.enum).toEqual([...FLOAT_FORMATS]);
  });

  test('the defaults it shows editors are the ones the parser applies', () => {
    expect(shipped.properties.files.default).toEqual([...DEFAULT_FILES]);
    expect(shipped.properties.exclude.default).toEqual([...DEFAULT_EXCLUDE]);
    expect(shipped.properties.standing.default).toBe(parsePolicy('', 'p.yml').standing);
    expect(definitions.limit.properties.severity.default).toBe('block');
  });

  test('every top-level key and serving key has a title and a description for editors', () => {
    for (const [key, entry] of Object.entries(shipped.properties as Record<string, Schema>)) {
      if (key === '$schema') continue;
      const target = entry.$ref ? { ...definitions[entry.$ref.split('/').pop()], ...entry } : entry;
      expect(typeof target.title, key).toBe('string');
      expect(typeof target.description, key).toBe('string');
    }
    for (const [key, entry] of Object.entries(
      definitions.serving.properties as Record<string, Schema>,
    )) {
      expect(typeof entry.title, key).toBe('string');
      expect(entry.description, key).toMatch(/\(default: .+\)\.$/);
    }
  });
});
