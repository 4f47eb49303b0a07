import { afterEach, describe, expect, it } from 'vitest';
import { COMMENT_MARKER } from '../../src/core/render/notice.js';
import { runScenario, type ScenarioResult } from '../support/action-harness.js';
import { checkpointConfig } from '../support/scenario-repo.js';

// A broken policy on the base commit: the action, in-process with real git and the loopback API,
// fails the check, says which key on which line, never passes silently, and replaces an earlier
// comment that said the pull request passes.

const POLICY_PATH = '.github/context-reach.yml';
const MODEL = 'models/a/config.json';

let result: ScenarioResult | null = null;
afterEach(async () => {
  await result?.fake.close();
  result = null;
});

/** Text of a policy that expands 10^9 values if a reader followed every alias. */
function aliasBombPolicy(): string {
  const lines = ['a: &a [x, x, x, x, x, x, x, x, x, x]'];
  for (let i = 1; i < 9; i += 1)
    lines.push(
      `${String.fromCharCode(97 + i)}: &${String.fromCharCode(97 + i)} [${Array(10)
        .fill(`*${String.fromCharCode(96 + i)}`)
        .join(', ')}]`,
    );
  return `${lines.join('\n')}\n`;
}

const BROKEN: [name: string, policy: string | Uint8Array, expected: RegExp][] = [
  ['a YAML syntax error', 'limits:\n  headroom: { min: 0\nrules: {}\n', /context-reach\.yml:\d+: /],
  ['a misspelt top-level key', 'limts:\n  headroom: { min: 0 }\n', /context-reach\.yml:1: limts: /],
  [
    'a value of the wrong type',
    'limits:\n  headroom: { min: "zero" }\n',
    /context-reach\.yml:2: limits\.headroom\.min: /,
  ],
  [
    'an unknown metric name',
    'limits:\n  hedroom: { min: 0 }\n',
    /context-reach\.yml:2: limits\.hedroom: /,
  ],
  ['a duplicate key', 'standing: report\nstanding: block\n', /context-reach\.yml:2: /],
  ['a __proto__ key', '__proto__:\n  files: ["nothing/**"]\n', /context-reach\.yml:1: /],
  ['an alias expansion bomb', aliasBombPolicy(), /context-reach\.yml:\d+: .*alias/i],
  [
    'bytes that are not UTF-8',
    Uint8Array.from([...new TextEncoder().encode('standing: '), 0xff, 0x0a]),
    /context-reach\.yml, line 1: is not UTF-8 text/,
  ],
  [
    '2 MiB of text (over the 1 MiB policy limit)',
    `# ${'x'.repeat(2 * 1024 * 1024)}\nstanding: report\n`,
    /context-reach\.yml/,
  ],
];

describe('a broken policy on the base commit', () => {
  it.each(BROKEN)(
    '%s fails the check closed, naming the policy file, key and line',
    async (_, policy, expected) => {
      result = await runScenario({
        base: { [POLICY_PATH]: policy, [MODEL]: checkpointConfig() },
        // The head would pass: only the policy can make this run fail.
        head: { [POLICY_PATH]: policy, [MODEL]: checkpointConfig({ num_key_value_heads: 8 }) },
      });
      expect(result.error).toBeNull();
      expect(result.out.outputs.verdict).toBe('block');
      expect(result.out.failed).toMatch(/^context-reach could not judge this change: /);
      expect(result.out.failed).toMatch(expected);
      expect(result.out.summaries[0]).toContain('Could not judge this change');
      const comments = result.fake.state.comments.filter((c) => c.body.startsWith(COMMENT_MARKER));
      expect(comments).toHaveLength(1);
      expect(comments[0]!.body).toContain('Could not judge this change');
    },
  );

  it('replaces the comment of an earlier passing run instead of leaving it up', async () => {
    const good = 'standing: report\n';
    const first = await runScenario({
      base: { [POLICY_PATH]: good, [MODEL]: checkpointConfig() },
      head: { [POLICY_PATH]: good, [MODEL]: checkpointConfig({ num_key_value_heads: 8 }) },
    });
    expect(first.out.outputs.verdict).not.toBe('block');
    result = await runScenario({
      base: { [POLICY_PATH]: 'standing: sometimes\n', [MODEL]: checkpointConfig() },
      head: {
        [POLICY_PATH]: 'standing: sometimes\n',
        [MODEL]: checkpointConfig({ num_key_value_heads: 8 }),
      },
      fake: first.fake,
    });
    const comments = result.fake.state.comments.filter((c) => c.body.startsWith(COMMENT_MARKER));
    expect(comments).toHaveLength(1);
    expect(comments[0]!.body).toContain('Could not judge this change');
    expect(comments[0]!.body).toContain('standing');
    expect(result.out.failed).toMatch(/context-reach\.yml:1: standing: /);
  });
});
