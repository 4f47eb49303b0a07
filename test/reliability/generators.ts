/**
 * fast-check generators of model configs, valid and broken, as the bytes a pull request could
 * put in a file: both dialects, every value kind a key can hold (sizes at and past their edges,
 * `1e400`, `-0`, `0x10`, integers past 2^53, NaN, text, hostile markup), then byte-level damage
 * (cut short, stray bytes that are not UTF-8, NUL, byte-order marks, doubled lines).
 */
import fc from 'fast-check';

/** Largest span a generated config states, so 10,000 runs stay fast (spans past the scan bounds are cheap too). */
export const MAX_GENERATED_SPAN = 65_536;

/** Text that must come out escaped wherever the report quotes it. */
export const HOSTILE_TEXT = [
  '<script>alert(1)</script>',
  '<img src=x onerror=alert(1)>',
  '@someone',
  '#123',
  '[x](https://evil.example)',
  '<!-- context-reach:pull-request-report -->',
  'a | b',
  '`tick`',
  '**bold**',
];

/** A value written as a literal: JSON/YAML source text, chosen to cover edges. */
export type Literal = string;

const quoted = (text: string): Literal => JSON.stringify(text);

/** Literal numbers at the edges of what a reader must survive (as text, so `1e400` stays `1e400`). */
const EDGE_NUMBERS: Literal[] = [
  '0',
  '-0',
  '-1',
  '0.5',
  '1e400',
  '-1e400',
  '9007199254740993',
  '1099511627776',
  '1e-400',
  '2.5e10',
];

/** Literals only the JSON reader of Python's json module takes; YAML reads them as text. */
const JSON_SPECIALS: Literal[] = ['NaN', 'Infinity', '-Infinity'];

const otherKinds = fc.constantFrom<Literal>(
  'true',
  'false',
  'null',
  '[]',
  '{}',
  '[1, 2]',
  '{"a": 1}',
  quoted('12'),
  quoted('bf16'),
);

const hostileText = fc.constantFrom(...HOSTILE_TEXT).map(quoted);

/** A size: mostly usable and small, sometimes at an edge, sometimes not a number. */
export function sizeLiteral(max: number, json: boolean): fc.Arbitrary<Literal> {
  return fc.oneof(
    { weight: 8, arbitrary: fc.integer({ min: 1, max }).map(String) },
    { weight: 2, arbitrary: fc.constantFrom(...EDGE_NUMBERS) },
    {
      weight: 1,
      arbitrary: json
        ? fc.constantFrom(...JSON_SPECIALS, '0x10')
        : fc.constantFrom('0x10', '.nan', '.inf', '0o17', '1_000'),
    },
    { weight: 1, arbitrary: otherKinds },
    { weight: 1, arbitrary: hostileText },
  );
}

/** A real number such as a rotary base or a scaling factor. */
function realLiteral(min: number, max: number, json: boolean): fc.Arbitrary<Literal> {
  return fc.oneof(
    {
      weight: 6,
      arbitrary: fc
        .double({ min, max, noNaN: true, noDefaultInfinity: true })
        .map((x) => String(x)),
    },
    { weight: 2, arbitrary: fc.constantFrom(...EDGE_NUMBERS) },
    {
      weight: 1,
      arbitrary: json ? fc.constantFrom(...JSON_SPECIALS) : fc.constantFrom('.nan', '-.inf'),
    },
    { weight: 1, arbitrary: otherKinds },
  );
}

/** A span: small enough to scan fast, or far past the scan bounds (refused cheaply). */
function spanLiteral(json: boolean): fc.Arbitrary<Literal> {
  return fc.oneof(
    { weight: 6, arbitrary: fc.integer({ min: 1, max: 4096 }).map(String) },
    { weight: 2, arbitrary: fc.integer({ min: 1, max: MAX_GENERATED_SPAN }).map(String) },
    {
      weight: 2,
      arbitrary: fc.constantFrom(
        '0',
        '-0',
        '-4096',
        '0.5',
        '1e400',
        '9007199254740993',
        '1099511627776',
        '1e300',
      ),
    },
    {
      weight: 1,
      arbitrary: json ? fc.constantFrom(...JSON_SPECIALS) : fc.constantFrom('.nan', '0x10'),
    },
    { weight: 1, arbitrary: otherKinds },
    { weight: 1, arbitrary: hostileText },
  );
}

const dtype = fc.constantFrom(
  '"bfloat16"',
  '"float16"',
  '"float32"',
  '"float8_e4m3fn"',
  '"int4"',
  '"<b>"',
  '7',
  'null',
);

type Entry = [key: string, value: Literal | Entry[]];

function jsonText(entries: Entry[], indent = '  '): string {
  const lines = entries.map(
    ([key, value]) =>
      `${indent}${JSON.stringify(key)}: ${Array.isArray(value) ? jsonText(value, `${indent}  `) : value}`,
  );
  return `{\n${lines.join(',\n')}\n${indent.slice(2)}}`;
}

function yamlText(entries: Entry[], indent = ''): string {
  return entries
    .map(([key, value]) =>
      Array.isArray(value)
        ? `${indent}${key}:\n${yamlText(value, `${indent}  `)}`
        : `${indent}${key}: ${value}`,
    )
    .join('\n');
}

/** Keeps a random subset of entries, in order (missing keys are a case too). */
function someOf(entries: fc.Arbitrary<Entry>[]): fc.Arbitrary<Entry[]> {
  return fc
    .tuple(...entries.map((entry) => fc.tuple(entry, fc.nat({ max: 9 }))))
    .map((pairs) => pairs.filter(([, keep]) => keep < 8).map(([entry]) => entry));
}

const entry = (key: string, value: fc.Arbitrary<Literal | Entry[]>): fc.Arbitrary<Entry> =>
  value.map((v) => [key, v] as Entry);

/** A checkpoint-style `config.json` (JSON). */
export const checkpointConfig: fc.Arbitrary<string> = fc
  .tuple(
    someOf([
      entry(
        'model_type',
        fc.constantFrom(
          '"llama"',
          '"mistral"',
          '"gpt2"',
          '"t5"',
          '"bloom"',
          '"qwen2"',
          '7',
          quoted(HOSTILE_TEXT[0]!),
        ),
      ),
      entry('hidden_size', sizeLiteral(2048, true)),
      entry('intermediate_size', sizeLiteral(8192, true)),
      entry('num_hidden_layers', sizeLiteral(64, true)),
      entry('num_attention_heads', sizeLiteral(32, true)),
      entry('num_key_value_heads', sizeLiteral(32, true)),
      entry('head_dim', sizeLiteral(256, true)),
      entry('vocab_size', sizeLiteral(200_000, true)),
      entry('max_position_embeddings', spanLiteral(true)),
      entry('rope_theta', realLiteral(1, 1e7, true)),
      entry('partial_rotary_factor', realLiteral(0, 1.5, true)),
      entry('sliding_window', spanLiteral(true)),
      entry('tie_word_embeddings', fc.constantFrom('true', 'false', '"yes"', '1')),
      entry('torch_dtype', dtype),
      entry(
        'position_embedding_type',
        fc.constantFrom('"rotary"', '"absolute"', '"alibi"', '"relative_key"', '"?"'),
      ),
      entry(
        'rope_scaling',
        fc.oneof(
          fc.constant<Literal>('null'),
          someOf([
            entry(
              'rope_type',
              fc.constantFrom(
                '"yarn"',
                '"linear"',
                '"dynamic"',
                '"llama3"',
                '"longrope"',
                '"<x>"',
                '3',
              ),
            ),
            entry('factor', realLiteral(0.1, 64, true)),
            entry('original_max_position_embeddings', spanLiteral(true)),
            entry('beta_fast', realLiteral(1, 64, true)),
          ]),
        ),
      ),
    ]),
    fc.option(
      fc.tuple(fc.constantFrom(...HOSTILE_TEXT), fc.constantFrom(...HOSTILE_TEXT.map(quoted))),
      { nil: undefined },
    ),
  )
  .map(([entries, extra]) => `${jsonText(extra ? [...entries, [extra[0], extra[1]]] : entries)}\n`);

/** context-reach's own model description (YAML). */
export const ownConfig: fc.Arbitrary<string> = fc
  .tuple(
    someOf([
      entry('name', fc.constantFrom('"generated"', quoted(HOSTILE_TEXT[1]!), '12')),
      entry('layers', sizeLiteral(64, false)),
      entry('hidden', sizeLiteral(2048, false)),
      entry('heads', sizeLiteral(32, false)),
      entry('kv-heads', sizeLiteral(32, false)),
      entry('head-dim', sizeLiteral(256, false)),
      entry('vocab', sizeLiteral(200_000, false)),
      entry('declared-span', spanLiteral(false)),
      entry(
        'feed-forward',
        someOf([
          entry('size', sizeLiteral(8192, false)),
          entry('gated', fc.constantFrom('true', 'false', '"no"')),
        ]),
      ),
      entry(
        'position',
        someOf([
          entry(
            'code',
            fc.constantFrom(
              'rotary',
              'learned',
              'alibi',
              'sinusoidal',
              'none',
              'spiral',
              '"<i>x</i>"',
            ),
          ),
          entry('base', realLiteral(1, 1e7, false)),
          entry(
            'scaling',
            someOf([
              entry('kind', fc.constantFrom('yarn', 'linear', 'ntk', 'dynamic', 'banded', 'warp')),
              entry('factor', realLiteral(0.1, 64, false)),
              entry('original-span', spanLiteral(false)),
            ]),
          ),
        ]),
      ),
      entry(
        'dtypes',
        someOf([
          entry('weights', fc.constantFrom('bf16', 'fp8', 'int4', 'fp64', '1')),
          entry('cache', fc.constantFrom('bf16', 'fp8', 'int8', 'x')),
        ]),
      ),
    ]),
    someOf([
      entry('span', spanLiteral(false)),
      entry('sequences', sizeLiteral(64, false)),
      entry('device-memory-gib', realLiteral(0, 200, false)),
      entry('reserve', realLiteral(-0.5, 1.5, false)),
      entry('output-tokens', sizeLiteral(8192, false)),
    ]),
    fc.constantFrom('context-reach-model/1', 'context-reach-model/9', '"context-reach-model/1"'),
  )
  .map(
    ([model, serving, format]) =>
      `format: ${format}\n${yamlText([
        ['model', model],
        ['serving', serving],
      ])}\n`,
  );

/** Damage done to a file's bytes: what a broken editor, a bad merge or an attacker leaves. */
type Damage =
  | { kind: 'none' }
  | { kind: 'cut'; at: number }
  | { kind: 'insert'; at: number; bytes: number[] }
  | { kind: 'double-line'; line: number }
  | { kind: 'bom' };

const damage: fc.Arbitrary<Damage> = fc.oneof(
  { weight: 6, arbitrary: fc.constant<Damage>({ kind: 'none' }) },
  { weight: 1, arbitrary: fc.nat().map((at): Damage => ({ kind: 'cut', at })) },
  {
    weight: 2,
    arbitrary: fc
      .tuple(
        fc.nat(),
        fc.array(
          fc.oneof(
            fc.constantFrom(
              0x00,
              0xff,
              0xfe,
              0xc3,
              0x80,
              0xef,
              0x0d,
              0x22,
              0x7b,
              0x3a,
              0x2c,
              0x26,
              0x2a,
              0x0a,
            ),
            fc.integer({ min: 0, max: 255 }),
          ),
          { minLength: 1, maxLength: 4 },
        ),
      )
      .map(([at, bytes]): Damage => ({ kind: 'insert', at, bytes })),
  },
  { weight: 1, arbitrary: fc.nat().map((line): Damage => ({ kind: 'double-line', line })) },
  { weight: 1, arbitrary: fc.constant<Damage>({ kind: 'bom' }) },
);

function damaged(text: string, hurt: Damage): Uint8Array {
  const bytes = new TextEncoder().encode(text);
  switch (hurt.kind) {
    case 'none':
      return bytes;
    case 'cut':
      return bytes.subarray(0, hurt.at % (bytes.length + 1));
    case 'insert': {
      const at = hurt.at % (bytes.length + 1);
      return Uint8Array.from([...bytes.subarray(0, at), ...hurt.bytes, ...bytes.subarray(at)]);
    }
    case 'double-line': {
      const lines = text.split('\n');
      const i = hurt.line % lines.length;
      return new TextEncoder().encode(
        [...lines.slice(0, i + 1), lines[i]!, ...lines.slice(i + 1)].join('\n'),
      );
    }
    case 'bom':
      return Uint8Array.from([0xef, 0xbb, 0xbf, ...bytes]);
  }
}

export interface GeneratedPair {
  path: string;
  /** Null: the file is new in the pull request. */
  base: Uint8Array | null;
  head: Uint8Array;
  damage: Damage['kind'];
}

const CHECKPOINT_PATH = 'models/generated/config.json';
const OWN_PATH = 'models/generated/model.reach.yaml';

/** A consistent checkpoint config (heads divide evenly, sizes in range): what most pull requests hold. */
export const validCheckpointConfig: fc.Arbitrary<string> = fc
  .record({
    heads: fc.constantFrom(1, 2, 4, 8, 16, 32),
    headDim: fc.constantFrom(16, 32, 64, 128),
    kvShare: fc.constantFrom(1, 2, 4, 8),
    layers: fc.integer({ min: 1, max: 48 }),
    span: fc.oneof(
      { weight: 4, arbitrary: fc.integer({ min: 128, max: 8192 }) },
      { weight: 1, arbitrary: fc.integer({ min: 8192, max: MAX_GENERATED_SPAN }) },
    ),
    theta: fc.double({ min: 1e3, max: 1e6, noNaN: true }),
    vocab: fc.integer({ min: 256, max: 160_000 }),
    dtype: fc.constantFrom('bfloat16', 'float16', 'float32'),
    scaling: fc.option(
      fc.record({
        rope_type: fc.constantFrom('linear', 'dynamic', 'yarn'),
        factor: fc.constantFrom(2, 4, 8),
      }),
      { nil: null },
    ),
  })
  .map(
    (c) =>
      `${JSON.stringify(
        {
          model_type: 'llama',
          hidden_size: c.heads * c.headDim,
          intermediate_size: 4 * c.heads * c.headDim,
          num_hidden_layers: c.layers,
          num_attention_heads: c.heads,
          num_key_value_heads: Math.max(1, c.heads / Math.min(c.kvShare, c.heads)),
          vocab_size: c.vocab,
          max_position_embeddings: c.span,
          rope_theta: c.theta,
          torch_dtype: c.dtype,
          rope_scaling:
            c.scaling === null
              ? null
              : {
                  ...c.scaling,
                  original_max_position_embeddings: Math.max(
                    1,
                    Math.floor(c.span / c.scaling.factor),
                  ),
                },
        },
        null,
        2,
      )}\n`,
  );

/** One changed config: a base (or none) and a head, both generated in the same dialect. */
export const generatedPair: fc.Arbitrary<GeneratedPair> = fc.oneof(
  fc
    .tuple(fc.option(validCheckpointConfig, { nil: null }), validCheckpointConfig)
    .map(([base, head]) => ({
      path: CHECKPOINT_PATH,
      base: base === null ? null : new TextEncoder().encode(base),
      head: new TextEncoder().encode(head),
      damage: 'none' as const,
    })),
  fc
    .tuple(fc.option(checkpointConfig, { nil: null }), checkpointConfig, damage)
    .map(([base, head, hurt]) => ({
      path: CHECKPOINT_PATH,
      base: base === null ? null : new TextEncoder().encode(base),
      head: damaged(head, hurt),
      damage: hurt.kind,
    })),
  fc.tuple(fc.option(ownConfig, { nil: null }), ownConfig, damage).map(([base, head, hurt]) => ({
    path: OWN_PATH,
    base: base === null ? null : new TextEncoder().encode(base),
    head: damaged(head, hurt),
    damage: hurt.kind,
  })),
);
