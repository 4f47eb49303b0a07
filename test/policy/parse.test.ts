import { describe, expect, test } from 'vitest';
import { runGate } from '../../src/core/gate.js';
import { ReadError } from '../../src/core/parse/errors.js';
import { decodeText } from '../../src/core/parse/source.js';
import {
  DEFAULT_EXCLUDE,
  DEFAULT_FILES,
  MAX_POLICY_CHARS,
  PolicyError,
  parsePolicy,
} from '../../src/core/policy/index.js';
import { cpuClock } from '../support/cpu-time.js';

const FILE = '.github/context-reach.yml';

/** The PolicyError `parsePolicy` throws for `text` (fails the test when it does not throw). */
function failure(text: string): PolicyError {
  try {
    parsePolicy(text, FILE);
  } catch (error) {
    expect(error).toBeInstanceOf(PolicyError);
    return error as PolicyError;
  }
  throw new Error(`parsePolicy accepted ${JSON.stringify(text)}`);
}

const FULL = `# Team policy (invented example)
files: ["models/**/*.json", "serving/*.reach.yaml"]
exclude: ["models/archive/**"]
serving:
  span: 32768
  sequences: 8
  device-memory-gib: 80
  reserve: 0.15
  weights: bf16
  cache: fp8
  positions: fp32
  output-tokens: 1024
  prompt-tokens: 512
  trained-span: 8192
limits:
  headroom: {min: 0}
  memoryBytes: {max: 75000000000, severity: warn}
  cachePerTokenBytes: {max-increase-pct: 10}
  precision.bf16.collidingPositions: {max: 0, severity: info}
rules:
  frequencies-changed: block
  pairs-blurred: "off"
overrides:
  - files: ["models/experimental/**"]
    serving: {span: 131072}
    limits:
      headroom: {severity: info}
      memoryBytes: null
    rules: {span-past-reach: warn}
standing: block
waiver-label: context-reach-waiver
`;

describe('parsePolicy(text, path)', () => {
  test('reads every key of a full policy into camelCase settings with their lines', () => {
    const policy = parsePolicy(FULL, FILE);
    expect(policy.path).toBe(FILE);
    expect(policy.files).toEqual(['models/**/*.json', 'serving/*.reach.yaml']);
    expect(policy.exclude).toEqual(['models/archive/**']);
    expect(policy.serving).toEqual({
      span: 32768,
      sequences: 8,
      deviceGiB: 80,
      reserve: 0.15,
      weights: 'bf16',
      cache: 'fp8',
      positions: 'fp32',
      outputTokens: 1024,
      promptTokens: 512,
      trainedSpan: 8192,
    });
    expect({ ...policy.limits }).toEqual({
      headroom: { min: 0 },
      memoryBytes: { max: 75e9, severity: 'warn' },
      cachePerTokenBytes: { maxIncreasePct: 10 },
      'precision.bf16.collidingPositions': { max: 0, severity: 'info' },
    });
    expect({ ...policy.rules }).toEqual({ 'frequencies-changed': 'block', 'pairs-blurred': 'off' });
    expect(policy.overrides).toHaveLength(1);
    expect(policy.overrides[0]?.files).toEqual(['models/experimental/**']);
    expect(policy.overrides[0]?.serving).toEqual({ span: 131072 });
    expect({ ...policy.overrides[0]?.limits }).toEqual({
      headroom: { severity: 'info' },
      memoryBytes: null,
    });
    expect(policy.standing).toBe('block');
    expect(policy.waiverLabel).toBe('context-reach-waiver');
    expect(policy.locations['serving.deviceGiB']).toEqual({
      key: 'serving.device-memory-gib',
      line: 7,
    });
    expect(policy.locations['limits.memoryBytes']).toEqual({ key: 'limits.memoryBytes', line: 17 });
    expect(policy.locations['rules.pairs-blurred']).toEqual({
      key: 'rules.pairs-blurred',
      line: 22,
    });
    expect(policy.locations['overrides[0].serving.span']).toEqual({
      key: 'overrides[0].serving.span',
      line: 25,
    });
    expect(policy.locations['overrides[0].limits.memoryBytes']).toEqual({
      key: 'overrides[0].limits.memoryBytes',
      line: 28,
    });
    expect(policy.locations['waiver-label']).toEqual({ key: 'waiver-label', line: 31 });
  });

  test('an empty file, or one of comments only, is a policy that sets nothing', () => {
    for (const text of ['', '# nothing yet\n', '---\n']) {
      const policy = parsePolicy(text, FILE);
      expect(policy.files).toEqual(DEFAULT_FILES);
      expect(policy.exclude).toEqual(DEFAULT_EXCLUDE);
      expect(policy.serving).toEqual({});
      expect({ ...policy.limits }).toEqual({});
      expect(policy.standing).toBe('report');
      expect(policy.waiverLabel).toBeNull();
      expect(policy.path).toBe(FILE);
    }
  });

  test('JSON is accepted (it is YAML too)', () => {
    expect(
      parsePolicy('{"standing": "block", "limits": {"reach": {"min": 4096}}}', FILE).limits.reach,
    ).toEqual({ min: 4096 });
  });

  test('a byte-order mark at the start is ignored', () => {
    expect(parsePolicy('\uFEFFstanding: block\n', FILE).standing).toBe('block');
  });

  test.each([
    [
      'unknown metric, nearest name suggested',
      'limits:\n  headroomm: {max: 3}\n',
      `${FILE}:2: limits.headroomm: unknown metric "headroomm": limits are keyed by metric names exactly as in the metric contract (docs/metrics.md of context-reach); did you mean "headroom"?`,
    ],
    [
      'metric name in the wrong case',
      'limits:\n  MemoryBytes: {max: 3}\n',
      `${FILE}:2: limits.MemoryBytes: unknown metric "MemoryBytes": limits are keyed by metric names exactly as in the metric contract (docs/metrics.md of context-reach); did you mean "memoryBytes"?`,
    ],
    [
      'precision metric with a misspelt format',
      'limits:\n  precision.fp61.collidingPositions: {max: 0}\n',
      `${FILE}:2: limits.precision.fp61.collidingPositions: unknown metric "precision.fp61.collidingPositions": limits are keyed by metric names exactly as in the metric contract (docs/metrics.md of context-reach); did you mean "precision.fp16.collidingPositions"?`,
    ],
    [
      'unknown rule id',
      'rules:\n  span-past-reac: warn\n',
      `${FILE}:2: rules.span-past-reac: unknown rule id "span-past-reac": expected a rule id of context-reach; did you mean "span-past-reach"?`,
    ],
    [
      'unknown serving key',
      'serving:\n  device-memory-gb: 80\n',
      `${FILE}:2: serving.device-memory-gb: unknown key "device-memory-gb": expected one of span, sequences, device-memory-gib, reserve, activation-reserve-gib, tensor-parallel, pipeline-parallel, weights, weight-group-size, cache, positions, output-tokens, prompt-tokens, trained-span; did you mean "device-memory-gib"?`,
    ],
    [
      'unknown top-level key',
      'limit:\n  reach: {min: 1}\n',
      `${FILE}:1: limit: unknown key "limit": expected one of files, exclude, serving, limits, rules, overrides, standing, waiver-label; did you mean "limits"?`,
    ],
    [
      'string for a span',
      'serving:\n  span: lots\n',
      `${FILE}:2: serving.span: is "lots"; expected a whole number`,
    ],
    [
      'fractional span',
      'serving:\n  span: 4096.5\n',
      `${FILE}:2: serving.span: is 4096.5; expected a whole number`,
    ],
    [
      'zero span',
      'serving:\n  span: 0\n',
      `${FILE}:2: serving.span: is 0; expected a number at least 1`,
    ],
    [
      'negative sequences',
      'serving:\n  sequences: -4\n',
      `${FILE}:2: serving.sequences: is -4; expected a number at least 1`,
    ],
    [
      'negative zero span',
      'serving:\n  span: -0\n',
      `${FILE}:2: serving.span: is -0; expected a number at least 1`,
    ],
    [
      'span past 2^53',
      'serving:\n  span: 9007199254740993\n',
      `${FILE}:2: serving.span: is 9007199254740992; expected a number at most 9007199254740991`,
    ],
    [
      'reserve of 1',
      'serving:\n  reserve: 1\n',
      `${FILE}:2: serving.reserve: is 1; expected a number below 1`,
    ],
    [
      'NaN memory',
      'serving:\n  device-memory-gib: .nan\n',
      `${FILE}:2: serving.device-memory-gib: is NaN; expected a finite number`,
    ],
    [
      '1e400 memory (Infinity)',
      'serving:\n  device-memory-gib: 1e400\n',
      `${FILE}:2: serving.device-memory-gib: is Infinity; expected a finite number`,
    ],
    [
      'unknown dtype, nearest suggested',
      'serving:\n  cache: fp9\n',
      `${FILE}:2: serving.cache: is "fp9"; expected one of fp32, bf16, fp16, fp8, int8, int4; did you mean "fp8"?`,
    ],
    [
      'position dtype that is a storage dtype',
      'serving:\n  positions: int8\n',
      `${FILE}:2: serving.positions: is "int8"; expected one of fp32, bf16, fp16`,
    ],
    [
      'standing misspelt',
      'standing: blok\n',
      `${FILE}:1: standing: is "blok"; expected one of report, block; did you mean "block"?`,
    ],
    [
      'far-off metric name gets no guess',
      'limits:\n  latency: {max: 3}\n',
      `${FILE}:2: limits.latency: unknown metric "latency": limits are keyed by metric names exactly as in the metric contract (docs/metrics.md of context-reach)`,
    ],
    [
      'rule level misspelt',
      'rules:\n  pairs-blurred: warning\n',
      `${FILE}:2: rules.pairs-blurred: is "warning"; expected one of off, info, warn, block; did you mean "warn"?`,
    ],
    [
      'rule level as YAML boolean',
      'rules:\n  pairs-blurred: false\n',
      `${FILE}:2: rules.pairs-blurred: is false; expected one of off, info, warn, block`,
    ],
    [
      'limit severity misspelt',
      'limits:\n  reach: {min: 1, severity: blocker}\n',
      `${FILE}:2: limits.reach.severity: is "blocker"; expected one of block, warn, info; did you mean "block"?`,
    ],
    [
      'limit that is a number',
      'limits:\n  reach: 4096\n',
      `${FILE}:2: limits.reach: is 4096; expected a mapping or null`,
    ],
    [
      'limit with an unknown bound',
      'limits:\n  reach:\n    minimum: 4096\n',
      `${FILE}:3: limits.reach.minimum: unknown key "minimum": expected one of max, min, max-increase-pct, severity; did you mean "min"?`,
    ],
    [
      'limit without a bound',
      'limits:\n  reach: {severity: warn}\n',
      `${FILE}:2: limits.reach: sets no bound; expected at least one of max, min, max-increase-pct`,
    ],
    [
      'empty limit',
      'limits:\n  reach: {}\n',
      `${FILE}:2: limits.reach: is empty; expected at least one of max, min, max-increase-pct, severity`,
    ],
    [
      'min above max',
      'limits:\n  headroom:\n    max: 10\n    min: 20\n',
      `${FILE}:4: limits.headroom.min: is 20, above max 10; expected min at most max`,
    ],
    [
      'negative increase',
      'limits:\n  params: {max-increase-pct: -5}\n',
      `${FILE}:2: limits.params.max-increase-pct: is -5; expected a number at least 0`,
    ],
    [
      'files as a single string',
      'files: "**/*.json"\n',
      `${FILE}:1: files: is "**/*.json"; expected a list`,
    ],
    ['empty files list', 'files: []\n', `${FILE}:1: files: has 0 entries; expected at least 1`],
    [
      'negated glob',
      'files: ["models/**", "!models/old/**"]\n',
      `${FILE}:1: files[1]: is "!models/old/**"; expected a repository-relative glob without a leading "/" or "!" (list files to leave out under exclude)`,
    ],
    [
      'absolute glob',
      'exclude:\n  - /etc/**\n',
      `${FILE}:2: exclude[0]: is "/etc/**"; expected a repository-relative glob without a leading "/" or "!" (list files to leave out under exclude)`,
    ],
    [
      'glob with a reversed range',
      'files: ["models/[z-a].json"]\n',
      `${FILE}:1: files[0]: is "models/[z-a].json", not a usable glob (it can match no path); expected a glob such as "models/**/config.json"`,
    ],
    [
      'override glob with an open brace',
      'overrides:\n  - files:\n      - "models/{a,b"\n',
      `${FILE}:3: overrides[0].files[0]: is "models/{a,b", not a usable glob (it can match no path); expected a glob such as "models/**/config.json"`,
    ],
    [
      'override without files',
      'overrides:\n  - serving: {span: 2048}\n',
      `${FILE}:2: overrides[0]: has no "files"; expected a list of globs naming the configs this entry applies to`,
    ],
    [
      'override with an unknown key',
      'overrides:\n  - files: ["a/**"]\n    standing: block\n',
      `${FILE}:3: overrides[0].standing: unknown key "standing": expected one of files, serving, limits, rules`,
    ],
    [
      'waiver label too long for GitHub',
      `waiver-label: ${'w'.repeat(51)}\n`,
      `${FILE}:1: waiver-label: is "${'w'.repeat(51)}" (51 characters); expected at most 50 characters`,
    ],
    [
      'policy that is a list',
      '- files: []\n',
      `${FILE}:1: is a list; expected a mapping of policy keys (files, exclude, serving, limits, rules, overrides, standing, waiver-label)`,
    ],
    [
      'policy that is a scalar',
      'just text\n',
      `${FILE}:1: is "just text"; expected a mapping of policy keys (files, exclude, serving, limits, rules, overrides, standing, waiver-label)`,
    ],
  ])('%s: names file, line and key', (_name, text, message) => {
    expect(failure(text).message).toBe(message);
  });

  test("the error's fields give the first problem; every problem is listed in line order", () => {
    const error = failure('serving:\n  span: abc\n  spam: 3\nstanding: blok\n');
    expect({ file: error.file, line: error.line, key: error.key }).toEqual({
      file: FILE,
      line: 2,
      key: 'serving.span',
    });
    expect(error.problems.map((problem) => [problem.line, problem.key])).toEqual([
      [2, 'serving.span'],
      [3, 'serving.spam'],
      [4, 'standing'],
    ]);
    expect(error.message).toContain('(and 2 more: ');
  });

  test('a YAML syntax error gives its line', () => {
    const error = failure('serving:\n  span: 1\n\tsequences: 2\n');
    expect(error.message).toBe(`${FILE}:3: not valid YAML: Tabs are not allowed as indentation`);
  });

  test('a duplicate key is an error at the second occurrence', () => {
    const error = failure('standing: report\nlimits: {}\nstanding: block\n');
    expect(error.message).toBe(
      `${FILE}:3: duplicate key "standing"; expected each key once per mapping`,
    );
  });

  test('more than one YAML document is an error', () => {
    expect(failure('standing: report\n---\nstanding: block\n').message).toMatch(/not valid YAML/);
  });

  test('an alias expansion bomb is refused, not expanded', () => {
    const bomb = ['a: &a ["x","x","x","x","x","x","x","x","x"]']
      .concat(
        ['b', 'c', 'd', 'e', 'f', 'g', 'h', 'i'].map(
          (name, i) => `${name}: &${name} [${Array(9).fill(`*${'abcdefghi'[i]}`).join(',')}]`,
        ),
      )
      .join('\n');
    const cpu = cpuClock();
    const error = failure(bomb);
    expect(error.message).toMatch(/cannot be read as YAML: .*alias/i);
    // 9^9 strings would take minutes and gigabytes; the refusal takes milliseconds.
    expect(cpu(), 'ms of CPU time').toBeLessThan(2000);
  });

  test.each([
    ['lists', `${'['.repeat(10_000)}${']'.repeat(10_000)}`],
    ['mappings', `limits: ${'{a: '.repeat(10_000)}1${'}'.repeat(10_000)}`],
  ])('10,000 levels of nested %s end in one clear error within 2 s, not a crash', (_kind, deep) => {
    const cpu = cpuClock();
    expect(failure(deep).message).toBe(
      `${FILE}:1: nested too deeply; expected a policy a few levels deep`,
    );
    expect(cpu(), 'ms of CPU time').toBeLessThan(2000);
  });

  test('a file past MAX_POLICY_CHARS is refused before parsing', () => {
    const error = failure(`# ${'x'.repeat(MAX_POLICY_CHARS)}\n`);
    expect(error.line).toBeNull();
    expect(error.message).toBe(
      `${FILE}: is ${MAX_POLICY_CHARS + 3} characters long; expected at most ${MAX_POLICY_CHARS} (a policy is a short file)`,
    );
  });

  test('__proto__, constructor and prototype keys are refused and pollute nothing', () => {
    const error = failure(
      '__proto__: {polluted: true}\nrules:\n  constructor: block\n  __proto__: "off"\nlimits:\n  prototype: {max: 1}\n',
    );
    expect(error.problems.map((problem) => problem.key)).toEqual([
      '__proto__',
      'rules.constructor',
      'rules.__proto__',
      'limits.prototype',
    ]);
    expect(({} as Record<string, unknown>).polluted).toBeUndefined();
    expect(Object.prototype).not.toHaveProperty('polluted');
  });

  test('an unquoted off is the rule level "off" (YAML 1.2 core schema, where off is not a boolean)', () => {
    expect(parsePolicy('rules:\n  pairs-blurred: off\n', FILE).rules['pairs-blurred']).toBe('off');
  });

  test('hexadecimal and exponent numbers are numbers (YAML 1.2 core schema)', () => {
    expect(
      parsePolicy('serving:\n  span: 0x1000\n  device-memory-gib: 8e1\n', FILE).serving,
    ).toEqual({ span: 4096, deviceGiB: 80 });
  });
});

describe('a policy file from its bytes, as the gate reads it: parsePolicy(decodeText(bytes, path), path)', () => {
  const encode = (text: string): Uint8Array => new TextEncoder().encode(text);
  /** The gate's path from the policy file's bytes to a policy (`runGate` in gate.ts). */
  const fromBytes = (bytes: Uint8Array) => parsePolicy(decodeText(bytes, FILE), FILE);
  /** The whole gate over a change of nothing, with these bytes as the base commit's policy file. */
  const gateWith = (bytes: Uint8Array) =>
    runGate(
      { read: async (_ref, path) => (path === FILE ? bytes : null) },
      { base: 'base', head: 'head', changes: [], policyPath: FILE },
    );

  test('reads UTF-8 text, with or without a byte-order mark', async () => {
    expect(fromBytes(encode('standing: block\n')).standing).toBe('block');
    expect(
      fromBytes(new Uint8Array([0xef, 0xbb, 0xbf, ...encode('standing: block\n')])).standing,
    ).toBe('block');
    expect((await gateWith(encode('standing: block\n'))).policy.source).toBe('file');
  });

  test('refuses bytes that are not UTF-8, naming the line of the first bad byte', async () => {
    // 0xFF never occurs in UTF-8 (RFC 3629, section 1).
    const bytes = new Uint8Array([
      ...encode('standing: report\nwaiver-label: a'),
      0xff,
      ...encode('\n'),
    ]);
    const message = `${FILE}, line 2: is not UTF-8 text: bytes ff 0a at byte offset 32 do not form a UTF-8 character (save the file as UTF-8)`;
    expect(() => fromBytes(bytes)).toThrow(message);
    await expect(gateWith(bytes)).rejects.toThrow(message);
  });

  test('refuses more than MAX_POLICY_CHARS characters', () => {
    const error = (() => {
      try {
        fromBytes(encode('#'.repeat(MAX_POLICY_CHARS + 1)));
      } catch (e) {
        return e as PolicyError;
      }
      return null;
    })();
    expect(error).toBeInstanceOf(PolicyError);
    expect(error?.message).toBe(
      `${FILE}: is ${MAX_POLICY_CHARS + 1} characters long; expected at most ${MAX_POLICY_CHARS} (a policy is a short file)`,
    );
  });

  test('binary content (NUL bytes) is an error with a line, not a crash', () => {
    expect(() => fromBytes(new Uint8Array([0, 1, 2, 3, 10, 0]))).toThrow(ReadError);
    expect(() => fromBytes(new Uint8Array([0, 1, 2, 3, 10, 0]))).toThrow(
      `${FILE}, line 1: contains a NUL character`,
    );
  });
});
