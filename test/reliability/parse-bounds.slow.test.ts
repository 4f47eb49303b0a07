import { describe, expect, it } from 'vitest';
import { inspectModel } from '../../src/core/inspect.js';
import { MAX_ENTRIES, MAX_TOKENS } from '../../src/core/parse/source.js';
import { isModelConfig, parsePolicy } from '../../src/core/policy/index.js';

// Round two of parse and match costs (issue 13, points 4 and 12): small files that took minutes.
// Keys and documents are bounded before anything is built, duplicate keys are found in one pass,
// and no policy glob and no path can make matching slow. Times are CPU time of this process
// (`process.cpuUsage`), which the other work on a shared machine does not inflate as much as wall time.

const MIB = 1024 * 1024;

/** CPU milliseconds and result of `work`. */
function measured<T>(work: () => T): { ms: number; value: T | Error } {
  const before = process.cpuUsage();
  let value: T | Error;
  try {
    value = work();
  } catch (error) {
    value = error as Error;
  }
  const used = process.cpuUsage(before);
  return { ms: (used.user + used.system) / 1000, value };
}

function read(text: string, path: string) {
  return measured(() => inspectModel(text, path));
}

const unreadable = (value: unknown): string => {
  if (value instanceof Error) return value.message;
  const finding = (value as { findings: { rule: string; message: string }[] }).findings.find(
    (f) => f.rule === 'config-unreadable',
  );
  return finding?.message ?? '';
};

describe('files with many keys or documents (point 4)', () => {
  it('a 634 KB config.json of 60,000 keys is refused from its syntax tree in well under a second (before: 20–33 s)', () => {
    const text = `{${Array.from({ length: 60_000 }, (_, i) => `"key_${i}": ${i}`).join(',\n')}}`;
    const { ms, value } = read(text, 'models/many/config.json');
    console.log(
      `60,000 JSON keys (${(text.length / 1024).toFixed(0)} KiB): ${ms.toFixed(0)} ms CPU: ${unreadable(value)}`,
    );
    expect(unreadable(value)).toMatch(
      new RegExp(
        `more than ${MAX_ENTRIES} keys and list items|more than ${MAX_TOKENS} syntax tokens`,
      ),
    );
    expect(ms).toBeLessThan(2000);
  });

  it('a YAML file of 40,000 keys is read with linear duplicate checks (before: 16–19 s; 1.5–2.1 s CPU through the YAML package alone)', () => {
    const text = `format: context-reach-model/1\nnotes:\n${Array.from({ length: 40_000 }, (_, i) => `  k${i}: ${i}`).join('\n')}\n`;
    const { ms, value } = read(text, 'models/many/model.reach.yaml');
    console.log(
      `40,000 YAML keys (${(text.length / 1024).toFixed(0)} KiB): ${ms.toFixed(0)} ms CPU`,
    );
    expect(value).not.toBeInstanceOf(Error);
    // Plain block YAML is read by the fast block reader (`yaml-block.ts`): 0.15–0.6 s measured
    // on a busy 2-core machine, the first call in the process included.
    expect(ms).toBeLessThan(1500);
  });

  it('a duplicate key among 40,000 is still found, at its line', () => {
    const keys = Array.from({ length: 40_000 }, (_, i) => `"k${i}": ${i}`);
    keys.push('"k17": 1');
    const { value } = read(`{\n${keys.join(',\n')}\n}`, 'models/dup/config.json');
    expect(unreadable(value)).toMatch(/line 40002: duplicate key "k17"/);
  });

  it('a 4 MB .reach.yaml of a million empty documents stops at the second (before: 23 s, 1.4 GiB)', () => {
    const text = '---\n'.repeat(1_000_000);
    const { ms, value } = read(text, 'models/docs/model.reach.yaml');
    console.log(
      `1,000,000 YAML documents (${(text.length / MIB).toFixed(1)} MiB): ${ms.toFixed(0)} ms CPU: ${unreadable(value)}`,
    );
    expect(unreadable(value)).toMatch(
      /line 2: holds more than one YAML document|holds more than \d+ syntax tokens/,
    );
    expect(ms).toBeLessThan(500);
  });

  it.each([
    [
      'a JSON list of 2 million zeros',
      () => `{"a": [${'0,'.repeat(2 * MIB - 8)}0]}`,
      'models/z/config.json',
    ],
    [
      'JSON of 4 MiB of one-character keys',
      () => `{${Array.from({ length: 420_000 }, (_, i) => `"${i.toString(36)}":0`).join(',')}}`,
      'models/k/config.json',
    ],
    [
      'YAML of 4 MiB of list items',
      () => `format: context-reach-model/1\nx:\n${'- 1\n'.repeat(MIB)}`,
      'models/y/model.reach.yaml',
    ],
    [
      'YAML flow mapping of 4 MiB',
      () => `{${Array.from({ length: 350_000 }, (_, i) => `k${i}: 1`).join(', ')}}`,
      'models/f/model.reach.yaml',
    ],
  ])('%s (under 4 MiB) is refused in bounded time and memory', (_, make, path) => {
    const text = make();
    expect(text.length).toBeLessThanOrEqual(4 * MIB + 64);
    const rssBefore = process.memoryUsage().rss;
    const { ms, value } = read(text, path);
    const rss = process.memoryUsage().rss;
    console.log(
      `${(text.length / MIB).toFixed(2)} MiB ${path}: ${ms.toFixed(0)} ms CPU, RSS ${(rss / MIB).toFixed(0)} MiB (+${((rss - rssBefore) / MIB).toFixed(0)}): ${unreadable(value)}`,
    );
    expect(unreadable(value)).toMatch(/more than \d+ (syntax tokens|keys and list items)/);
    // Measured 0.15–0.3 s of CPU on a busy 2-core machine (0.45–0.58 s before the fast readers).
    expect(ms).toBeLessThan(1000);
    expect(rss).toBeLessThan(1024 * MIB);
  });

  it.each([
    ['JSON', 'models/deep/config.json', (n: number) => `{"a": ${'['.repeat(n)}${']'.repeat(n)}}`],
    ['YAML', 'models/deep/model.reach.yaml', (n: number) => `a: ${'['.repeat(n)}${']'.repeat(n)}`],
  ])(
    '%s of 190,000 nested brackets (380 KB) is refused for its nesting in well under a second (before: 2.7–3.0 s)',
    (_, path, make) => {
      const { ms, value } = read(make(190_000), path);
      console.log(
        `190,000 nested brackets, ${path}: ${ms.toFixed(0)} ms CPU: ${unreadable(value)}`,
      );
      expect(unreadable(value)).toMatch(/line 1: nesting is deeper than 256 levels/);
      expect(ms).toBeLessThan(1000);
    },
  );

  it('a valid config with two label maps of 21,843 classes each still reads without a finding about its size', () => {
    const labels = Array.from({ length: 21_843 }, (_, i) => [String(i), `class_${i}`]);
    const config = {
      model_type: 'vit',
      hidden_size: 768,
      num_hidden_layers: 12,
      num_attention_heads: 12,
      intermediate_size: 3072,
      image_size: 224,
      patch_size: 16,
      num_channels: 3,
      id2label: Object.fromEntries(labels),
      label2id: Object.fromEntries(labels.map(([id, name]) => [name, Number(id)])),
    };
    const { ms, value } = read(`${JSON.stringify(config, null, 2)}\n`, 'models/vit/config.json');
    console.log(`two label maps of 21,843 entries: ${ms.toFixed(0)} ms CPU`);
    expect(unreadable(value)).not.toMatch(/more than \d+ (syntax tokens|keys and list items)/);
  });
});

describe('glob matching is bounded (point 12)', () => {
  const policyWith = (globs: string[]) => `files: ${JSON.stringify(globs)}\n`;

  it('a glob with many stars in one segment is refused when the policy is read, naming it', () => {
    expect(() =>
      parsePolicy(policyWith(['models/*a*a*a*a*a*a*b/config.json']), '.github/context-reach.yml'),
    ).toThrow(/files\[0\].*\*a\*a\*a\*a\*a\*a\*b.*at most 3 stars/);
  });

  it('the allowed worst case against long names costs milliseconds per path (before: 0.8 s each)', () => {
    const policy = parsePolicy(
      policyWith(['**/*a*a*b/**', 'models/**/config.json']),
      '.github/context-reach.yml',
    );
    const paths = Array.from(
      { length: 50 },
      (_, i) => `models/${'a'.repeat(250)}${i}/${'a'.repeat(250)}/config.json`,
    );
    const { ms, value } = measured(() => paths.map((path) => isModelConfig(policy, path)));
    console.log(
      `50 paths with 250-character segments against a 3-star glob: ${ms.toFixed(0)} ms CPU`,
    );
    expect(value).toEqual(paths.map(() => true));
    expect(ms).toBeLessThan(1000);
  });

  it('a path longer than 4,096 characters is refused rather than matched or skipped', () => {
    const policy = parsePolicy(policyWith(['**/config.json']), '.github/context-reach.yml');
    expect(() => isModelConfig(policy, `${'a/'.repeat(2100)}config.json`)).toThrow(
      /longer than 4096 characters/,
    );
  });
});
