import { matchesGlob } from 'node:path';
import { describe, expect, test } from 'vitest';
import {
  DEFAULT_POLICY,
  isModelConfig,
  matchingOverrides,
  parsePolicy,
  resolvePolicy,
  ruleLevel,
  servingPatchOf,
} from '../../src/core/policy/index.js';

const FILE = '.github/context-reach.yml';

const POLICY = parsePolicy(
  `limits:
  headroom: {min: 0}
  memoryBytes: {max: 80000000000, severity: warn}
  params: {max-increase-pct: 5}
serving:
  span: 8192
  device-memory-gib: 40
rules:
  pairs-blurred: info
overrides:
  - files: ["models/experimental/**"]
    serving: {span: 65536}
    limits:
      headroom: {severity: info}
      memoryBytes: null
      params: {max-increase-pct: null, max: 9000000000}
    rules: {pairs-blurred: "off", span-past-reach: warn}
  - files: ["models/experimental/long/**"]
    serving: {span: 131072, sequences: 2}
    limits:
      headroom: {min: -1024}
standing: block
waiver-label: reach-waiver
`,
  FILE,
);

describe('resolvePolicy(policy, filePath)', () => {
  test('gives tensor- and pipeline-parallel degrees, an activation reserve and a quantized weight format, overridden per glob, with their lines', () => {
    const policy = parsePolicy(
      `serving:
  device-memory-gib: 80
  activation-reserve-gib: 2
  tensor-parallel: 2
  weights: int4
  weight-group-size: 128
limits:
  memoryBytesPerDevice: {max: 70000000000}
overrides:
  - files: ["models/big/**"]
    serving: {tensor-parallel: 8, pipeline-parallel: 2}
`,
      FILE,
    );
    const small = resolvePolicy(policy, 'models/small/config.json');
    expect(small.serving).toEqual({
      deviceGiB: 80,
      activationReserveGiB: 2,
      tensorParallel: 2,
      weights: 'int4',
      weightGroupSize: 128,
    });
    expect(small.limits.memoryBytesPerDevice).toEqual({ max: 7e10, severity: 'block' });
    const big = resolvePolicy(policy, 'models/big/config.json');
    expect(big.serving).toMatchObject({
      tensorParallel: 8,
      pipelineParallel: 2,
      activationReserveGiB: 2,
    });
    expect(big.origins['serving.tensorParallel']).toEqual({
      key: 'overrides[0].serving.tensor-parallel',
      line: 11,
    });
    expect(small.origins['serving.weightGroupSize']).toEqual({
      key: 'serving.weight-group-size',
      line: 6,
    });
  });

  test('refuses a tensor-parallel degree of 0, naming the key and line', () => {
    expect(() => parsePolicy('serving:\n  tensor-parallel: 0\n', FILE)).toThrow(
      '.github/context-reach.yml:2: serving.tensor-parallel: is 0; expected a number at least 1',
    );
  });

  test('a file no override matches gets the top level', () => {
    const resolved = resolvePolicy(POLICY, 'models/prod/config.json');
    expect({ ...resolved.limits }).toEqual({
      headroom: { min: 0, severity: 'block' },
      params: { maxIncreasePct: 5, severity: 'block' },
      memoryBytes: { max: 80e9, severity: 'warn' },
    });
    expect(resolved.serving).toEqual({ span: 8192, deviceGiB: 40 });
    expect({ ...resolved.rules }).toEqual({ 'pairs-blurred': 'info' });
    expect(resolved.standing).toBe('block');
    expect(resolved.waiverLabel).toBe('reach-waiver');
    expect(resolved.origins['serving.span']).toEqual({ key: 'serving.span', line: 6 });
  });

  test('an override changes a severity and keeps the bound above it; null removes a bound or a limit', () => {
    const resolved = resolvePolicy(POLICY, 'models/experimental/a/config.json');
    expect({ ...resolved.limits }).toEqual({
      headroom: { min: 0, severity: 'info' },
      params: { max: 9e9, severity: 'block' },
    });
    expect(resolved.serving).toEqual({ span: 65536, deviceGiB: 40 });
    expect({ ...resolved.rules }).toEqual({ 'pairs-blurred': 'off', 'span-past-reach': 'warn' });
    expect(resolved.origins['serving.span']).toEqual({
      key: 'overrides[0].serving.span',
      line: 12,
    });
    expect(resolved.origins['serving.deviceGiB']).toEqual({
      key: 'serving.device-memory-gib',
      line: 7,
    });
  });

  test('later overrides win key by key over earlier ones', () => {
    const resolved = resolvePolicy(POLICY, 'models/experimental/long/config.json');
    expect(resolved.limits.headroom).toEqual({ min: -1024, severity: 'info' });
    expect(resolved.serving).toEqual({ span: 131072, sequences: 2, deviceGiB: 40 });
    expect(resolved.origins['limits.headroom']).toEqual({
      key: 'overrides[1].limits.headroom',
      line: 21,
    });
    expect(matchingOverrides(POLICY, 'models/experimental/long/config.json')).toHaveLength(2);
  });

  test("limits come out in the metric contract's order, whatever the file's order", () => {
    expect(Object.keys(resolvePolicy(POLICY, 'x.json').limits)).toEqual([
      'headroom',
      'params',
      'memoryBytes',
    ]);
  });

  test('the built-in policy has no limits, no rule changes and reports standing findings', () => {
    const resolved = resolvePolicy(DEFAULT_POLICY, 'models/config.json');
    expect({ ...resolved.limits }).toEqual({});
    expect({ ...resolved.rules }).toEqual({});
    expect(resolved.serving).toEqual({});
    expect(resolved.standing).toBe('report');
    expect(resolved.waiverLabel).toBeNull();
    expect(DEFAULT_POLICY.path).toBeNull();
  });

  test('a "./" prefix does not change which overrides match', () => {
    expect(resolvePolicy(POLICY, './models/experimental/a.json').serving.span).toBe(65536);
  });
});

describe('ruleLevel(filePolicy, ruleId, ownSeverity)', () => {
  test("is the policy's level where it sets one, the rule's own severity otherwise", () => {
    const resolved = resolvePolicy(POLICY, 'models/experimental/a.json');
    expect(ruleLevel(resolved, 'pairs-blurred', 'warn')).toBe('off');
    expect(ruleLevel(resolved, 'frequencies-changed', 'warn')).toBe('warn');
  });

  test('names of Object.prototype members are rule ids like any other, not inherited values', () => {
    const resolved = resolvePolicy(DEFAULT_POLICY, 'a.json');
    expect(ruleLevel(resolved, 'constructor', 'info')).toBe('info');
    expect(ruleLevel(resolved, 'toString', 'block')).toBe('block');
    expect(resolved.limits.constructor).toBeUndefined();
  });
});

describe('servingPatchOf(block)', () => {
  test("turns the file's kebab-case keys into ServingPatch fields and leaves absent keys out", () => {
    expect(
      servingPatchOf({
        span: 1,
        sequences: 2,
        'device-memory-gib': 3,
        reserve: 0.2,
        weights: 'int4',
        cache: 'fp8',
        positions: 'bf16',
        'output-tokens': 4,
        'prompt-tokens': 5,
        'trained-span': 6,
      }),
    ).toEqual({
      span: 1,
      sequences: 2,
      deviceGiB: 3,
      reserve: 0.2,
      weights: 'int4',
      cache: 'fp8',
      positions: 'bf16',
      outputTokens: 4,
      promptTokens: 5,
      trainedSpan: 6,
    });
    expect(servingPatchOf({})).toEqual({});
    expect(Object.keys(servingPatchOf({ reserve: 0 }))).toEqual(['reserve']);
  });
});

describe('isModelConfig(policy, path)', () => {
  test.each([
    ['config.json', true],
    ['models/llama-like/config.json', true],
    ['checkpoints/small_model.yaml', true],
    ['serving/model-card.yml', true],
    ['specs/tiny.reach.yaml', true],
    ['specs/tiny.reach.json', true],
    ['models/model.safetensors.index.json', false],
    ['models/tokenizer_config.json', false],
    ['models/tokenizer.json', false],
    ['web/package.json', false],
    ['package-lock.json', false],
    ['node_modules/some-lib/config.json', false],
    ['tools/node_modules/x/model.json', false],
    ['.github/config.json', false],
    ['src/settings.json', false],
    ['models/generation_config.json', false],
    ['README.md', false],
  ])('built-in globs: %s → %s', (path, expected) => {
    expect(isModelConfig(DEFAULT_POLICY, path)).toBe(expected);
    // Node's own glob matcher (path.matchesGlob) agrees on these paths (none has a dot segment).
    const included = DEFAULT_POLICY.files.some((glob) => matchesGlob(path, glob));
    const excluded = DEFAULT_POLICY.exclude.some((glob) => matchesGlob(path, glob));
    expect(included && !excluded).toBe(expected);
  });

  test('built-in globs reach configs under dot-directories other than .github', () => {
    expect(isModelConfig(DEFAULT_POLICY, '.models/config.json')).toBe(true);
  });

  test("a policy's files and exclude replace the built-in lists", () => {
    const policy = parsePolicy('files: ["zoo/**/*.json"]\nexclude: ["zoo/old/**"]\n', FILE);
    expect(isModelConfig(policy, 'zoo/a/config.json')).toBe(true);
    expect(isModelConfig(policy, 'zoo/old/config.json')).toBe(false);
    expect(isModelConfig(policy, 'other/config.json')).toBe(false);
    // package.json is no longer excluded once exclude is given.
    expect(isModelConfig(policy, 'zoo/package.json')).toBe(true);
  });

  test('an empty path is not a config', () => {
    expect(isModelConfig(DEFAULT_POLICY, '')).toBe(false);
  });
});
