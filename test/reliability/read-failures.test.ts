import { describe, expect, it } from 'vitest';
import { COMMENT_MARKER } from '../../src/core/render/notice.js';
import type { ScenarioResult } from '../support/action-harness.js';
import { BLOCKING, checkedFakes, MODEL } from './checked-scenarios.js';

// Round two of fail-closed reading (issue 13, points 2, 3, 10 and the read cost): whatever could
// not be read, listed or parsed makes the check fail and says what and why; it never leaves the
// verdict to what could be read. The action in-process with the real git and GitHub adapters,
// against temporary repositories and the loopback API stand-in. A pull request of 3,200 files is
// in read-failures.slow.test.ts (`npm run test:full`).

/** The action on the blocking change (or what the options say), its fake checked and closed after each test. */
const { scenario } = checkedFakes();

const comments = (r: ScenarioResult) =>
  r.fake.state.comments.filter((c) => c.body.startsWith(COMMENT_MARKER));

describe('a base version that cannot be read fails closed (point 2)', () => {
  it('no history, the base keeps answering 502 past the retries: verdict block, naming the file and the reason', async () => {
    const result = await scenario({
      noHistory: true,
      prepare: (f) => {
        f.state.failingReads = new Set([`${[...f.state.trees.keys()][0]!}:${MODEL}`]);
      },
    });
    expect(result.error).toBeNull();
    expect(result.out.outputs.verdict).toBe('block');
    expect(result.out.failed).toMatch(
      /could not judge this change: models\/a\/config\.json could not be read at base [0-9a-f]{40}: GitHub API read models\/a\/config\.json at [0-9a-f]{40} failed with status 502/,
    );
    expect(comments(result)).toHaveLength(1);
    expect(comments(result)[0]!.body).toContain('Could not judge this change');
  });

  it('a base that is absent (404) is still an added file, judged on its head', async () => {
    const result = await scenario({
      noHistory: true,
      prepare: (f) => {
        f.state.trees.get([...f.state.trees.keys()][0]!)!.delete(MODEL);
      },
    });
    expect(result.error).toBeNull();
    expect(JSON.parse(Object.values(result.written)[0]!).files[0]).toMatchObject({
      status: 'added',
      base: null,
    });
  });
});

describe('a policy path that exists but is not a regular file fails closed (point 10)', () => {
  const policy = 'limits:\n  declaredSpan: { max: 8192 }\n';
  const tree = (side: Record<string, string>) => ({
    ...side,
    'policies/real.yml': policy,
    '.github/context-reach.yml': { symlink: '../policies/real.yml' },
  });

  it.each([[false], [true]])(
    'a symbolic link at the policy path (no history: %s): verdict block, the path named',
    async (noHistory) => {
      const result = await scenario({
        base: tree(BLOCKING.base),
        head: tree(BLOCKING.head),
        noHistory,
      });
      expect(result.error).toBeNull();
      expect(result.out.outputs.verdict).toBe('block');
      expect(result.out.failed).toMatch(
        /\.github\/context-reach\.yml exists on the base commit but is not a regular file/,
      );
    },
  );

  it('a directory at the policy path: verdict block', async () => {
    const withDir = (side: Record<string, string>) => ({
      ...side,
      '.github/context-reach.yml/inner.yml': policy,
    });
    const result = await scenario({ base: withDir(BLOCKING.base), head: withDir(BLOCKING.head) });
    expect(result.out.outputs.verdict).toBe('block');
    expect(result.out.failed).toMatch(/not a regular file/);
  });
});

describe('reading contents in few requests (the read cost)', () => {
  it('a checkout without the commits but with their remote: one shallow fetch, then no content or file-list request at all', async () => {
    // Review suggestions list the diff on their own to place a suggestion on a changed line: off here, where the gate's reads are counted.
    const result = await scenario({ emptyClone: true, inputs: { suggestions: 'off' } });
    expect(result.error).toBeNull();
    expect(result.out.outputs.verdict).toBe('block');
    expect(result.fake.calls('repos/get-content')).toHaveLength(0);
    expect(result.fake.calls('pulls/list-files')).toHaveLength(0);
    expect(result.fake.calls('repos/compare-commits-with-basehead')).toHaveLength(1);
    console.log(
      `read cost with a shallow fetch: ${result.fake.requests.length} API requests in all (${[...new Set(result.fake.requests.map((r) => r.operationId))].join(', ')})`,
    );
  });
});
