/**
 * Hostile and broken model configs a pull request could add, each with what the gate must say
 * about it. Shared by the in-process, bundled-action and CLI tests of hostile-files.test.ts.
 */
import { checkpointConfig } from '../support/scenario-repo.js';

export interface HostileCase {
  /** What the file is, for test names and the reliability table. */
  name: string;
  path: string;
  /** File bytes, or a symbolic link to `outside` (a file outside the checkout). */
  content: Uint8Array | { symlinkOutside: 'absolute' | 'relative' };
  /** The file is read and measured (its head has metrics), e.g. a byte-order mark. */
  judged: boolean;
  /** The finding it must get: rule, message pattern and 1-based line (null: the whole file). */
  finding?: { rule: string; message: RegExp; line: number | null };
}

const encode = (text: string) => new TextEncoder().encode(text);

/** A text as a JSON config, one key per line. */
function json(entries: [string, string][]): string {
  return `{\n${entries.map(([key, value]) => `  ${JSON.stringify(key)}: ${value}`).join(',\n')}\n}\n`;
}

const MODEL_KEYS: [string, string][] = [
  ['model_type', '"llama"'],
  ['hidden_size', '2048'],
  ['intermediate_size', '5632'],
  ['num_hidden_layers', '16'],
  ['num_attention_heads', '16'],
  ['num_key_value_heads', '4'],
  ['vocab_size', '32000'],
  ['max_position_embeddings', '4096'],
  ['rope_theta', '10000'],
];

/** MODEL_KEYS with `key` set to the literal `value` (or added at the end). */
function withKey(key: string, value: string): string {
  const entries = MODEL_KEYS.map(([k, v]): [string, string] => [k, k === key ? value : v]);
  if (!MODEL_KEYS.some(([k]) => k === key)) entries.push([key, value]);
  return json(entries);
}

/** Nine levels of ten aliases each: 10^9 values if a reader expanded them all. */
function aliasBomb(): string {
  const lines = ['format: context-reach-model/1', 'a: &a [x, x, x, x, x, x, x, x, x, x]'];
  for (let i = 1; i < 9; i += 1) {
    const previous = String.fromCharCode(96 + i);
    const current = String.fromCharCode(97 + i);
    lines.push(`${current}: &${current} [${Array(10).fill(`*${previous}`).join(', ')}]`);
  }
  return `${lines.join('\n')}\n`;
}

/** Bytes of a PNG file: its signature, a header chunk, then zeros. */
function pngBytes(): Uint8Array {
  const bytes = new Uint8Array(256);
  bytes.set([0x89, 0x50, 0x4e, 0x47, 0x0d, 0x0a, 0x1a, 0x0a, 0, 0, 0, 13, 0x49, 0x48, 0x44, 0x52]);
  return bytes;
}

/** A config whose bytes are 100 MiB: a few keys, then spaces. */
export const HUNDRED_MIB = 100 * 1024 * 1024;
function hundredMiB(): Uint8Array {
  const bytes = new Uint8Array(HUNDRED_MIB).fill(0x20);
  bytes.set(encode('{"model_type": "llama", "hidden_size": 2048,\n'));
  bytes[bytes.length - 2] = 0x7d;
  bytes[bytes.length - 1] = 0x0a;
  return bytes;
}

function withBom(text: string): Uint8Array {
  return Uint8Array.from([0xef, 0xbb, 0xbf, ...encode(text)]);
}

/** A valid config with one byte that starts no UTF-8 character, inside the value on line 2. */
function notUtf8(): Uint8Array {
  const text = withKey('model_type', '"ll?ma"');
  const bytes = encode(text);
  bytes[text.indexOf('?')] = 0xff;
  return bytes;
}

const OWN_HEAD = `format: context-reach-model/1
model:
  layers: 29
  hidden: 325
  heads: 2.5e10
  head-dim: 200
  vocab: 69119
  declared-span: 4252
  position:
    code: alibi
`;

export function hostileCases(): HostileCase[] {
  return [
    {
      name: 'YAML alias expansion bomb (10^9 values if expanded)',
      path: 'models/bomb/model.reach.yaml',
      content: encode(aliasBomb()),
      judged: false,
      finding: { rule: 'config-unreadable', message: /expands more than 100 aliases/, line: 3 },
    },
    {
      name: 'JSON nested 10,000 levels deep',
      path: 'models/deep-json/config.json',
      content: encode(
        `{"model_type": "llama", "hidden_size":\n${'{"a": '.repeat(10_000)}1${'}'.repeat(10_000)}}\n`,
      ),
      judged: false,
      finding: { rule: 'config-unreadable', message: /nesting is deeper than 256 levels/, line: 2 },
    },
    {
      name: 'YAML nested 10,000 levels deep (flow lists)',
      path: 'models/deep-yaml/model.reach.yaml',
      content: encode(
        `format: context-reach-model/1\nmodel:\n  layers: ${'['.repeat(10_000)}${']'.repeat(10_000)}\n`,
      ),
      judged: false,
      finding: { rule: 'config-unreadable', message: /nesting is deeper than 256 levels/, line: 3 },
    },
    {
      name: '100 MiB config (over the 4 MiB limit)',
      path: 'models/huge/config.json',
      content: hundredMiB(),
      judged: false,
      finding: {
        rule: 'config-unreadable',
        message:
          /is 104857600 bytes; expected at most 4194304 bytes for a model config \(the file was not read\)/,
        line: null,
      },
    },
    {
      name: 'duplicate keys (JSON)',
      path: 'models/dup-json/config.json',
      content: encode(json([...MODEL_KEYS, ['hidden_size', '4096']])),
      judged: false,
      finding: { rule: 'config-unreadable', message: /duplicate key "hidden_size"/, line: 11 },
    },
    {
      name: 'duplicate keys (YAML)',
      path: 'models/dup-yaml/model.reach.yaml',
      content: encode('format: context-reach-model/1\nmodel:\n  layers: 4\n  layers: 8\n'),
      judged: false,
      finding: { rule: 'config-unreadable', message: /duplicate key/, line: 4 },
    },
    {
      name: '`__proto__` key (JSON)',
      path: 'models/proto/config.json',
      content: encode(withKey('__proto__', '{"polluted": "yes", "hidden_size": 1}')),
      judged: false,
      finding: { rule: 'config-unreadable', message: /key "__proto__" .* is refused/, line: 11 },
    },
    {
      name: '`constructor` and `prototype` keys (YAML)',
      path: 'models/ctor/model.reach.yaml',
      content: encode(
        'format: context-reach-model/1\nconstructor:\n  prototype:\n    polluted: yes\n',
      ),
      judged: false,
      finding: { rule: 'config-unreadable', message: /key "constructor" .* is refused/, line: 2 },
    },
    {
      name: 'bytes that are not UTF-8 (0xFF)',
      path: 'models/latin/config.json',
      content: notUtf8(),
      judged: false,
      finding: {
        rule: 'config-unreadable',
        message: /is not UTF-8 text: bytes ff 6d 61 22 at byte offset 21/,
        line: 2,
      },
    },
    {
      name: 'UTF-8 byte-order mark (read as usual)',
      path: 'models/bom/config.json',
      content: withBom(checkpointConfig()),
      judged: true,
    },
    {
      name: '`1e400` (overflows a double)',
      path: 'models/e400/config.json',
      content: encode(withKey('max_position_embeddings', '1e400')),
      judged: true,
      finding: {
        rule: 'value-invalid',
        message: /max_position_embeddings is 1e400, which overflows to Infinity/,
        line: 9,
      },
    },
    {
      name: '`-0` layers',
      path: 'models/minus-zero/config.json',
      content: encode(withKey('num_hidden_layers', '-0')),
      judged: true,
      finding: { rule: 'size-invalid', message: /num_hidden_layers/, line: 5 },
    },
    {
      name: '`0x10` in JSON (not JSON)',
      path: 'models/hex/config.json',
      content: encode(withKey('num_attention_heads', '0x10')),
      judged: false,
      finding: { rule: 'config-unreadable', message: /is not valid JSON/, line: 6 },
    },
    {
      name: '`0x10` in YAML (16, as YAML 1.2 reads it)',
      path: 'models/hex-yaml/model.reach.yaml',
      content: encode(
        'format: context-reach-model/1\nmodel:\n  layers: 2\n  hidden: 256\n  heads: 0x10\n  vocab: 1000\n  position: { code: rotary }\n  declared-span: 2048\n',
      ),
      judged: true,
    },
    {
      name: 'integer beyond 2^53 (9007199254740993)',
      path: 'models/big-int/config.json',
      content: encode(withKey('vocab_size', '9007199254740993')),
      judged: true,
      finding: { rule: 'value-invalid', message: /beyond 2\^53/, line: 8 },
    },
    {
      name: 'span of 2^40 (past the scan bound, scans skipped)',
      path: 'models/span40/config.json',
      content: encode(withKey('max_position_embeddings', '1099511627776')),
      judged: true,
      finding: { rule: 'positions-collide', message: /.*/, line: 9 },
    },
    {
      name: 'binary file (PNG bytes) named config.json',
      path: 'models/png/config.json',
      content: pngBytes(),
      judged: false,
      finding: {
        rule: 'config-unreadable',
        message: /is not UTF-8 text: bytes 89 50 4e 47 at byte offset 0/,
        line: 1,
      },
    },
    {
      name: 'symlink to an absolute path outside the checkout',
      path: 'models/link-abs/config.json',
      content: { symlinkOutside: 'absolute' },
      judged: false,
      finding: { rule: 'config-unreadable', message: /is not a regular file at head/, line: null },
    },
    {
      name: 'symlink climbing out of the checkout (../..)',
      path: 'models/link-rel/config.json',
      content: { symlinkOutside: 'relative' },
      judged: false,
      finding: { rule: 'config-unreadable', message: /is not a regular file at head/, line: null },
    },
    {
      name: '2.5e10 heads (a remedy search once looped over every number below it)',
      path: 'models/many-heads/model.reach.yaml',
      content: encode(OWN_HEAD),
      judged: true,
      finding: { rule: 'limit-crossed', message: /cachePerTokenBytes/, line: 6 },
    },
  ];
}
