import { readFileSync, readdirSync } from 'node:fs';
import { Ajv } from 'ajv';
import { parse as parseYaml } from 'yaml';
import { describe, expect, test } from 'vitest';
import {
  MODEL_FORMAT,
  MODEL_SCHEMA,
  validateModelValue,
} from '../../src/core/parse/own-dialect.js';
import { readModel } from '../../src/core/parse/read-model.js';
import { specFindings } from '../../src/core/rules/spec-rules.js';
import { fixture, lineOf, readError } from './helpers.js';

const SCHEMA_URL = new URL('../../schema/model.schema.json', import.meta.url);
const OWN_FIXTURES = readdirSync(new URL('../../fixtures/checkpoints/', import.meta.url)).filter(
  (f) => f.startsWith('own-'),
);

/** A valid own-dialect file; tests change one line at a time. */
const BASE = `format: context-reach-model/1
model:
  layers: 32
  hidden: 4096
  heads: 32
  vocab: 32000
  position:
    code: rotary
  declared-span: 4096
`;

function readText(text: string, file = 'model.reach.yaml') {
  const read = readModel(text, file);
  return { ...read, all: [...read.findings, ...specFindings(read.spec, read.locations)] };
}

describe('the shipped schema, schema/model.schema.json', () => {
  test('it compiles under ajv in strict mode as a draft-07 schema', () => {
    const schema = JSON.parse(readFileSync(SCHEMA_URL, 'utf8'));
    expect(schema.$schema).toBe('http://json-schema.org/draft-07/schema#');
    expect(() => new Ajv({ strict: true, allErrors: true }).compile(schema)).not.toThrow();
  });

  test('MODEL_SCHEMA is the shipped file, unchanged', () => {
    expect(MODEL_SCHEMA).toEqual(JSON.parse(readFileSync(SCHEMA_URL, 'utf8')));
  });

  test.each(OWN_FIXTURES.map((f) => [f]))(
    'the schema accepts fixture %s (parsed by the yaml package, checked by a fresh ajv)',
    (name) => {
      const validate = new Ajv({ strict: true, allErrors: true }).compile(
        JSON.parse(readFileSync(SCHEMA_URL, 'utf8')),
      );
      const ok = validate(parseYaml(fixture(name)));
      expect(validate.errors ?? []).toEqual([]);
      expect(ok).toBe(true);
    },
  );

  test('every property of the schema has a description or a title, for editor completion', () => {
    const missing: string[] = [];
    const walk = (node: unknown, path: string): void => {
      if (node === null || typeof node !== 'object') return;
      const properties = (node as { properties?: Record<string, unknown> }).properties ?? {};
      for (const [key, sub] of Object.entries(properties)) {
        const s = sub as { description?: string; title?: string; $ref?: string };
        if (!s.description && !s.title && !s.$ref) missing.push(`${path}/${key}`);
        walk(sub, `${path}/${key}`);
      }
      for (const [key, sub] of Object.entries(
        (node as { definitions?: Record<string, unknown> }).definitions ?? {},
      ))
        walk(sub, `#/definitions/${key}`);
    };
    walk(MODEL_SCHEMA, '#');
    expect(missing).toEqual([]);
  });

  test('the schema and the core agree on the enumerations of the model types', async () => {
    const { FLOAT_FORMATS, POSITION_KINDS, SCALING_KINDS, STORAGE_DTYPES } =
      await import('../../src/core/model.js');
    const defs = (
      MODEL_SCHEMA as {
        definitions: Record<
          string,
          {
            properties: Record<
              string,
              { enum?: string[]; properties?: Record<string, { enum?: string[] }> }
            >;
          }
        >;
      }
    ).definitions;
    expect(defs.position?.properties.code?.enum).toEqual([...POSITION_KINDS]);
    expect(defs.scaling?.properties.kind?.enum).toEqual([...SCALING_KINDS]);
    expect(defs.model?.properties.dtypes?.properties?.weights?.enum).toEqual([...STORAGE_DTYPES]);
    expect(defs.model?.properties.dtypes?.properties?.positions?.enum).toEqual([...FLOAT_FORMATS]);
  });
});

describe('readModel(own dialect)', () => {
  test('readModel(own-full.reach.yaml) reads every key of the format into the spec, with no findings', () => {
    const { dialect, spec, findings, locations } = readModel(
      fixture('own-full.reach.yaml'),
      'own-full.reach.yaml',
    );
    expect(dialect).toBe('context-reach');
    expect(findings).toEqual([]);
    expect(specFindings(spec, locations)).toEqual([]);
    expect(spec).toEqual({
      name: 'ferncastle-moe-demo',
      layers: 32,
      hidden: 4096,
      heads: 32,
      kvHeads: 8,
      headDim: 128,
      ffn: 14336,
      gated: true,
      vocab: 32000,
      tied: false,
      bias: false,
      experts: { total: 8, active: 2 },
      encoder: null,
      position: {
        kind: 'rotary',
        base: 500000,
        fraction: 1,
        scaling: {
          kind: 'banded',
          factor: 8,
          originalSpan: 8192,
          alpha: 1,
          beta: 32,
          low: 1,
          high: 4,
        },
      },
      declaredSpan: 65536,
      trainedSpan: 8192,
      slidingWindow: 4096,
      windowLayers: 16,
      dtypes: { weights: 'bf16', cache: 'fp8', positions: 'fp32' },
      embeddingInitStd: 0.02,
      embeddingMultiplier: 1,
      serving: {
        span: 32768,
        sequences: 8,
        deviceGiB: 80,
        reserve: 0.1,
        outputTokens: 2048,
        promptTokens: 512,
        tensorParallel: 2,
        pipelineParallel: 1,
        activationReserveGiB: 2,
      },
      quantization: null,
    });
  });

  test('readModel(own-full.reach.yaml) records the dotted key and line of every field it read', () => {
    const text = fixture('own-full.reach.yaml');
    const { locations } = readModel(text, 'own-full.reach.yaml');
    const expected: Record<string, [string, string]> = {
      layers: ['model.layers', 'layers: 32'],
      kvHeads: ['model.kv-heads', 'kv-heads:'],
      ffn: ['model.feed-forward.size', 'size: 14336'],
      'position.base': ['model.position.base', 'base: 500000'],
      'position.scaling.factor': ['model.position.scaling.factor', 'factor: 8'],
      'position.scaling.originalSpan': ['model.position.scaling.original-span', 'original-span:'],
      declaredSpan: ['model.declared-span', 'declared-span:'],
      windowLayers: ['model.sliding-window.layers', 'layers: 16'],
      'dtypes.cache': ['model.dtypes.cache', 'cache: fp8'],
      'serving.span': ['serving.span', 'span: 32768'],
      'serving.deviceGiB': ['serving.device-memory-gib', 'device-memory-gib:'],
      'serving.tensorParallel': ['serving.tensor-parallel', 'tensor-parallel: 2'],
      'serving.activationReserveGiB': ['serving.activation-reserve-gib', 'activation-reserve-gib:'],
    };
    for (const [field, [key, needle]] of Object.entries(expected)) {
      expect(locations[field], field).toEqual({ key, line: lineOf(text, needle) });
    }
  });

  test('readModel(own-encoder-decoder.reach.yaml) reads the base Transformer (Vaswani et al. 2017, Table 3): N=6, d_model=512, h=8, d_ff=2048, d_k=64', () => {
    const { spec } = readModel(fixture('own-encoder-decoder.reach.yaml'), 'base.yaml');
    expect([spec.layers, spec.hidden, spec.heads, spec.ffn, spec.headDim]).toEqual([
      6, 512, 8, 2048, 64,
    ]);
    expect(spec.encoder).toEqual({ layers: 6, heads: 8, kvHeads: 8, headDim: 64, ffn: 2048 });
    expect(spec.position).toEqual({ kind: 'sinusoidal' });
  });

  test('readModel(own-minimal.reach.json) reads the JSON form and fills the defaults', () => {
    const text = fixture('own-minimal.reach.json');
    const { spec, locations, findings } = readModel(text, 'own-minimal.reach.json');
    expect(findings).toEqual([]);
    expect([spec.kvHeads, spec.headDim, spec.ffn, spec.gated, spec.tied, spec.bias]).toEqual([
      16,
      2048 / 16,
      4 * 2048,
      false,
      true,
      false,
    ]);
    expect(spec.position).toEqual({ kind: 'rotary', base: 10000, fraction: 1, scaling: null });
    expect(spec.serving).toEqual({
      span: null,
      sequences: null,
      deviceGiB: null,
      reserve: null,
      outputTokens: null,
      promptTokens: null,
      tensorParallel: null,
      pipelineParallel: null,
      activationReserveGiB: null,
    });
    expect(spec.dtypes).toEqual({ weights: null, cache: null, positions: null });
    expect(locations.declaredSpan).toEqual({
      key: 'model.declared-span',
      line: lineOf(text, '"declared-span"'),
    });
  });

  test('readModel(own-learned.reach.yaml) reads flow-style blocks and serving', () => {
    const { spec } = readModel(fixture('own-learned.reach.yaml'), 'gpt2.yaml');
    expect(spec.position).toEqual({ kind: 'learned' });
    expect([spec.serving.span, spec.serving.sequences]).toEqual([1024, 4]);
  });

  test('readModel refuses another version of the format, naming the line of format', () => {
    const error = readError(() =>
      readModel(BASE.replace(MODEL_FORMAT, 'context-reach-model/2'), 'm.yaml'),
    );
    expect(error.reason).toBe(
      `format "context-reach-model/2" is not supported; this version reads ${MODEL_FORMAT}`,
    );
    expect(error.line).toBe(1);
  });

  test('validateModelValue(value) is empty for a conforming document', () => {
    expect(validateModelValue(parseYaml(BASE))).toEqual([]);
  });
});

describe('readModel(own dialect) schema findings name the key and its line', () => {
  test('an unknown key is reported with the nearest known key (kv_heads → kv-heads)', () => {
    const text = BASE.replace('  heads: 32\n', '  heads: 32\n  kv_heads: 8\n');
    const { all } = readText(text);
    expect(all).toHaveLength(1);
    expect(all[0]).toMatchObject({
      rule: 'value-invalid',
      severity: 'block',
      key: 'model.kv_heads',
      line: lineOf(text, 'kv_heads'),
    });
    expect(all[0]?.message).toMatch(
      /^model\.kv_heads is not a known key under model; did you mean "kv-heads"\?/,
    );
  });

  test('a checkpoint key in the own dialect is pointed at its own-dialect name (max_position_embeddings → declared-span)', () => {
    const text = BASE.replace('  heads: 32\n', '  heads: 32\n  max_position_embeddings: 8\n');
    expect(readText(text).all[0]?.message).toContain('did you mean "declared-span"?');
  });

  test('an unknown key nothing resembles gets no guess, but the list of known keys', () => {
    const text = `${BASE}servng: {span: 3}\nzzqq: 1\n`;
    const messages = readText(text).all.map((f) => f.message);
    expect(messages).toEqual([
      'servng is not a known key at the top level; did you mean "serving"? (known keys: format, model, serving)',
      'zzqq is not a known key at the top level (known keys: format, model, serving)',
    ]);
  });

  test.each([
    ['layers: "32"', 'model.layers', 'model.layers is "32" (text); expected a whole number'],
    ['layers:', 'model.layers', 'model.layers is empty; expected a whole number'],
    [
      'layers: 1e400',
      'model.layers',
      'model.layers is 1e400, which overflows to Infinity in a double',
    ],
    [
      'layers: 1152921504606846976',
      'model.layers',
      'model.layers is 1152921504606846976, beyond 2^53 − 1',
    ],
    [
      'code: relative-key',
      'model.position.code',
      'model.position.code is "relative-key"; expected one of sinusoidal, learned, rotary, alibi, relative, none',
    ],
    [
      'code: [rotary]',
      'model.position.code',
      'model.position.code is a list of 1 item; expected one of sinusoidal',
    ],
  ])('%s is reported as value-invalid on %s with its line', (replacement, key, message) => {
    const original = replacement.startsWith('code') ? 'code: rotary' : 'layers: 32';
    const text = BASE.replace(original, replacement);
    const { all, spec } = readText(text);
    expect(all).toHaveLength(1);
    expect(all[0]).toMatchObject({ rule: 'value-invalid', key, line: lineOf(text, replacement) });
    expect(all[0]?.message).toContain(message);
    if (key === 'model.layers') expect(Number.isNaN(spec.layers)).toBe(true);
  });

  test('an unknown dtype gets the list of formats and the nearest one', () => {
    const text = `${BASE}  dtypes: {cache: fp4}\n`;
    const [f] = readText(text).all;
    expect(f?.message).toBe(
      'model.dtypes.cache is "fp4"; expected one of fp32, bf16, fp16, fp8, int8, int4; did you mean "fp8"?',
    );
    expect(f?.line).toBe(lineOf(text, 'fp4'));
  });

  test('an unknown scaling kind is scaling-kind-unknown, and the code is read unscaled', () => {
    const text = BASE.replace(
      'code: rotary',
      'code: rotary\n    scaling: {kind: longrope, factor: 4}',
    );
    const { all, spec } = readText(text);
    expect(all.map((f) => [f.rule, f.key, f.line])).toEqual([
      ['scaling-kind-unknown', 'model.position.scaling.kind', lineOf(text, 'longrope')],
    ]);
    expect(spec.position.kind === 'rotary' && spec.position.scaling).toBeNull();
  });

  test.each([
    [
      '  layers: 32\n',
      'model.layers is missing; expected the number of decoder layers',
      'model.layers',
    ],
    [
      '  position:\n    code: rotary\n',
      'model.position is missing; expected the position block',
      'model.position',
    ],
    [
      '  declared-span: 4096\n',
      'model.declared-span is missing; expected the maximum positions the model declares',
      'model.declared-span',
    ],
  ])('a missing required key is named once (%j)', (removed, message, key) => {
    const { all } = readText(BASE.replace(removed, ''));
    expect(all).toHaveLength(1);
    expect(all[0]?.key).toBe(key);
    expect(all[0]?.message).toContain(message);
  });

  test('a missing model block is one finding, not one per key', () => {
    const { all } = readText('format: context-reach-model/1\nserving: {span: 10}\n');
    expect(all.map((f) => [f.rule, f.key])).toEqual([['value-invalid', 'model']]);
  });

  test('a block of the wrong type is one finding on the block', () => {
    const text = BASE.replace('  position:\n    code: rotary\n', '  position: 5\n');
    expect(readText(text).all.map((f) => [f.key, f.message])).toEqual([
      ['model.position', 'model.position is 5 (a number); expected a mapping'],
    ]);
  });

  test('serving.reserve of 1.5 is outside [0, 1)', () => {
    const text = `${BASE}serving:\n  reserve: 1.5\n`;
    const [f] = readText(text).all;
    expect([f?.rule, f?.key, f?.line]).toEqual([
      'value-invalid',
      'serving.reserve',
      lineOf(text, 'reserve'),
    ]);
  });

  test('zero and fractional sizes are left to size-invalid, once, in both dialects alike', () => {
    for (const value of ['0', '-3', '2.5']) {
      const text = BASE.replace('layers: 32', `layers: ${value}`);
      const { all } = readText(text);
      expect(all.map((f) => [f.rule, f.key, f.line])).toEqual([
        ['size-invalid', 'model.layers', 3],
      ]);
    }
  });

  test('a scaling factor below 1 is scaling-factor-below-one only, not also a schema range error', () => {
    const text = BASE.replace(
      'code: rotary',
      'code: rotary\n    scaling: {kind: linear, factor: 0.5}',
    );
    expect(readText(text).all.map((f) => f.rule)).toEqual(['scaling-factor-below-one']);
  });

  test('banded low equal to high is a step, not an error; high below low is reported on the key that was written', () => {
    const step = BASE.replace(
      'code: rotary',
      'code: rotary\n    scaling: {kind: banded, factor: 16, original-span: 8192, low: 1, high: 1}',
    );
    expect(readText(step).all.filter((f) => f.rule === 'value-invalid')).toEqual([]);
    const backwards = BASE.replace(
      'code: rotary',
      'code: rotary\n    scaling: {kind: banded, factor: 16, original-span: 8192, low: 2, high: 1}',
    );
    const [f] = readText(backwards).all.filter((x) => x.rule === 'value-invalid');
    expect([f?.key, f?.message]).toEqual([
      'model.position.scaling.high',
      expect.stringContaining(
        'model.position.scaling.high (1) must not be below model.position.scaling.low (2)',
      ),
    ]);
  });

  test('yarn alpha above beta is reported on the key that was written; alpha equal to beta is a step', () => {
    const text = BASE.replace(
      'code: rotary',
      'code: rotary\n    scaling: {kind: yarn, factor: 4, alpha: 40}',
    );
    const [f] = readText(text).all;
    expect([f?.rule, f?.key]).toEqual(['value-invalid', 'model.position.scaling.alpha']);
    expect(f?.message).toContain(
      'model.position.scaling.beta (32) must not be below model.position.scaling.alpha (40)',
    );
    const step = BASE.replace(
      'code: rotary',
      'code: rotary\n    scaling: {kind: yarn, factor: 4, alpha: 32}',
    );
    expect(readText(step).all.filter((x) => x.rule === 'value-invalid')).toEqual([]);
  });

  test('rotary keys on another code, and yarn keys on banded scaling, are key-ignored warnings', () => {
    const learned = readText(BASE.replace('code: rotary', 'code: learned\n    base: 10000'));
    expect(learned.all.map((f) => [f.rule, f.severity, f.key])).toEqual([
      ['key-ignored', 'warn', 'model.position.base'],
    ]);
    expect(learned.spec.position).toEqual({ kind: 'learned' });
    const banded = readText(
      BASE.replace(
        'code: rotary',
        'code: rotary\n    scaling: {kind: banded, factor: 4, alpha: 2}',
      ),
    );
    expect(banded.all.map((f) => [f.rule, f.key])).toEqual([
      ['key-ignored', 'model.position.scaling.alpha'],
    ]);
  });

  test('experts and sliding-window blocks need their sizes', () => {
    const { all } = readText(`${BASE}  experts: {total: 8}\n  sliding-window: {layers: 4}\n`);
    expect(all.map((f) => [f.rule, f.key])).toEqual([
      ['value-invalid', 'model.experts.active'],
      ['value-invalid', 'model.sliding-window.size'],
    ]);
  });

  test('a long unknown key and a long bad value give short messages', () => {
    const key = 'k'.repeat(900);
    const value = 'v'.repeat(100_000);
    const { all } = readText(`${BASE}${key}: 1\n`.replace('code: rotary', `code: "${value}"`));
    expect(all).toHaveLength(2);
    for (const f of all) expect(f.message.length).toBeLessThan(400);
  });

  test('readModel(own JSON) names JSON lines too', () => {
    const text = fixture('own-minimal.reach.json').replace('"layers": 24', '"layers": "24"');
    const [f] = readModel(text, 'm.json').findings;
    expect([f?.key, f?.line]).toEqual(['model.layers', lineOf(text, '"layers"')]);
  });

  test('readModel(own dialect) with a __proto__ key throws and leaves prototypes alone', () => {
    expect(() => readModel(`${BASE}  __proto__: {polluted: true}\n`, 'evil.yaml')).toThrow(
      /__proto__/,
    );
    expect(({} as Record<string, unknown>).polluted).toBeUndefined();
  });
});
