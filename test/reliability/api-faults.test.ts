import { describe, expect, it } from 'vitest';
import { inspect } from 'node:util';
import { COMMENT_FAILED_NOTICE } from '../../src/action/run-action.js';
import { COMMENT_MARKER } from '../../src/core/render/notice.js';
import type { ScenarioResult } from '../support/action-harness.js';
import {
  connectionReset,
  connectionResetAfterEffect,
  secondaryRateLimit,
  serverError,
  startFakeGitHub,
  statusFault,
  type FakeGitHub,
} from '../support/fake-github.js';
import { checkedFakes, MODEL } from './checked-scenarios.js';

// API faults against the loopback stand-in for GitHub's REST API (every request checked against
// GitHub's OpenAPI description), the action in-process with the real adapters: each run ends
// with the right verdict and at most one report comment, however the API misbehaves. The bundled
// action's runs are in api-faults.bundle.test.ts, pull requests of 3,500 files in
// api-faults.slow.test.ts (both in `npm run test:full`).

const { scenario } = checkedFakes();

/** Our report comment from an earlier run (id 1) on the pull request the scenarios judge (7). */
function withOldComment(fake: FakeGitHub): void {
  fake.state.comments.push({
    id: 1,
    issueNumber: 7,
    body: `${COMMENT_MARKER}\nold`,
    user: fake.state.tokenUser,
    createdAt: '2024-01-01T00:00:00Z',
    updatedAt: '2024-01-01T00:00:00Z',
  });
}

const reports = (r: ScenarioResult) =>
  r.fake.state.comments.filter((c) => c.body.startsWith(COMMENT_MARKER));

/** Everything a run wrote: outputs, summary, annotations, log, files, comments, and its error. */
function everything(r: ScenarioResult): string {
  const error =
    r.error instanceof Error
      ? `${r.error.message}\n${r.error.stack}`
      : r.error === null || r.error === undefined
        ? ''
        : inspect(r.error);
  return [
    r.out.everything(),
    ...Object.values(r.written),
    ...r.fake.state.comments.map((c) => c.body),
    error,
  ].join('\n');
}

describe('server errors (500, 502, 503) are retried and the run ends as if nothing happened', () => {
  it.each([
    ['pulls/list-files', true],
    ['repos/get-content', true],
    ['pulls/get', false],
    ['issues/list-comments', false],
    ['issues/create-comment', false],
    ['issues/update-comment', false],
  ] as const)('on %s: verdict block, exactly one comment', async (operation, noHistory) => {
    const fake = await startFakeGitHub();
    if (operation === 'issues/update-comment') withOldComment(fake);
    const result = await scenario({
      noHistory,
      fake,
      prepare: (f) => f.fail(operation, serverError(500), serverError(502), serverError(503)),
    });
    expect(result.error).toBeNull();
    expect(result.out.outputs.verdict).toBe('block');
    expect(reports(result)).toHaveLength(1);
    expect(reports(result)[0]!.body).toContain('span-grew-code-unchanged');
    expect(
      fake
        .calls(operation)
        .slice(0, 3)
        .map((c) => c.status),
    ).toEqual([500, 502, 503]);
  });
});

describe('rate limits and resets', () => {
  it('waits out a 403 secondary rate limit for the retry-after it names, then comments once', async () => {
    const started = performance.now();
    // The harness runs 1 ms per second GitHub asks for: 100 s of retry-after become 100 ms.
    const result = await scenario({
      prepare: (f) => f.fail('issues/create-comment', secondaryRateLimit(100)),
    });
    const elapsed = performance.now() - started;
    expect(result.error).toBeNull();
    expect(result.out.outputs.verdict).toBe('block');
    expect(reports(result)).toHaveLength(1);
    expect(result.fake.calls('issues/create-comment').map((c) => c.status)).toEqual([403, 201]);
    expect(
      result.out.log.some(
        (l) => l.level === 'warning' && /secondary rate limit .*waiting 100 s/.test(l.message),
      ),
    ).toBe(true);
    expect(elapsed).toBeGreaterThanOrEqual(100);
    console.log(
      `api faults: secondary rate limit of 100 s (scaled to 100 ms) waited out, run took ${elapsed.toFixed(0)} ms`,
    );
  });

  it('a connection reset while reading files (no history: the API path) is retried', async () => {
    // Review suggestions list the diff on their own to place a suggestion on a changed line: off here, where the gate's reads are counted.
    const result = await scenario({
      noHistory: true,
      inputs: { suggestions: 'off' },
      prepare: (f) => {
        f.fail('repos/get-content', connectionReset());
        f.fail('pulls/list-files', connectionReset());
      },
    });
    expect(result.error).toBeNull();
    expect(result.out.outputs.verdict).toBe('block');
    expect(result.fake.calls('pulls/list-files').map((c) => c.status)).toEqual(['reset', 200]);
    expect(reports(result)).toHaveLength(1);
  });

  it('a reset before a comment is created: the action looks, finds none, creates exactly one', async () => {
    const result = await scenario({
      prepare: (f) => f.fail('issues/create-comment', connectionReset()),
    });
    expect(result.error).toBeNull();
    expect(result.fake.calls('issues/create-comment').map((c) => c.status)).toEqual(['reset', 201]);
    expect(reports(result)).toHaveLength(1);
  });

  it('a reset after the comment was created (the answer lost): the action finds it and does not post a second', async () => {
    const result = await scenario({
      prepare: (f) => f.fail('issues/create-comment', connectionResetAfterEffect()),
    });
    expect(result.error).toBeNull();
    expect(result.fake.calls('issues/create-comment').map((c) => c.status)).toEqual([
      'reset-after',
    ]);
    expect(reports(result)).toHaveLength(1);
    expect(result.out.outputs['comment-url']).toContain(`#issuecomment-${reports(result)[0]!.id}`);
  });
});

describe('missing and vanished things', () => {
  it('a 404 for the base version of a file (no history: the API path) judges it as an added file', async () => {
    const fake = await startFakeGitHub();
    const result = await scenario({
      noHistory: true,
      fake,
      // The pull request lists the file as modified, but the base commit does not have it.
      prepare: (f) => {
        f.state.trees.get([...f.state.trees.keys()][0]!)!.delete(MODEL);
      },
    });
    expect(result.error).toBeNull();
    expect(fake.calls('repos/get-content').some((c) => c.status === 404)).toBe(true);
    const report = JSON.parse(Object.values(result.written)[0]!);
    expect(report.files[0]).toMatchObject({ path: MODEL, status: 'added', base: null });
    expect(reports(result)[0]!.body).toContain('new file, judged on its own');
  });

  it('a 422 on update when the old comment is gone: one new comment', async () => {
    const fake = await startFakeGitHub();
    withOldComment(fake);
    const result = await scenario({
      fake,
      prepare: (f) =>
        f.fail('issues/update-comment', {
          ...statusFault(422, 'Validation Failed'),
          effect: (state) => {
            state.comments = [];
          },
        }),
    });
    expect(result.error).toBeNull();
    expect(reports(result)).toHaveLength(1);
    expect(reports(result)[0]!.id).not.toBe(1);
    expect(result.out.outputs.verdict).toBe('block');
  });

  it('a 422 on update when the old comment is still there: no second comment, a warning, the verdict still decides', async () => {
    const fake = await startFakeGitHub();
    withOldComment(fake);
    const result = await scenario({
      fake,
      prepare: (f) => f.fail('issues/update-comment', statusFault(422, 'Validation Failed')),
    });
    expect(result.error).toBeNull();
    expect(reports(result).map((c) => c.id)).toEqual([1]);
    expect(fake.calls('issues/create-comment')).toHaveLength(0);
    expect(
      result.out.log.some(
        (l) => l.level === 'warning' && l.message.startsWith(COMMENT_FAILED_NOTICE),
      ),
    ).toBe(true);
    expect(result.out.summaries[0]).toContain('The report comment could not be written');
    expect(result.out.outputs.verdict).toBe('block');
    expect(result.out.failed).toMatch(/blocking finding/);
  });
});

describe('re-runs', () => {
  it('five runs, with a fault in each, leave exactly one comment, edited in place', async () => {
    const fake = await startFakeGitHub();
    const faults: [string, Parameters<FakeGitHub['fail']>[1]][] = [
      ['issues/create-comment', connectionResetAfterEffect()],
      ['issues/list-comments', serverError(502)],
      ['issues/update-comment', serverError(503)],
      ['issues/update-comment', connectionReset()],
      ['pulls/get', secondaryRateLimit(1)],
    ];
    const ids: number[] = [];
    for (const [operation, fault] of faults) {
      const result = await scenario({ fake, prepare: (f) => f.fail(operation, fault) });
      expect(result.error).toBeNull();
      expect(result.out.outputs.verdict).toBe('block');
      expect(reports(result)).toHaveLength(1);
      ids.push(reports(result)[0]!.id);
    }
    expect(new Set(ids).size).toBe(1);
    expect(fake.calls('issues/create-comment')).toHaveLength(1);
  });
});

describe('the token', () => {
  it('is registered as a secret first and appears in nothing a normal run writes', async () => {
    const result = await scenario({});
    expect(result.out.secrets).toEqual([result.fake.state.token]);
    expect(everything(result)).not.toContain(result.fake.state.token);
  });

  it('appears in no error message when the API keeps failing, even when the server quotes it back', async () => {
    const fake = await startFakeGitHub();
    const echo = { ...statusFault(502, `upstream refused token ${fake.state.token}`) };
    const result = await scenario({
      fake,
      noHistory: true,
      prepare: (f) => f.fail('pulls/list-files', echo, echo, echo, echo, echo),
    });
    expect(result.error).toBeInstanceOf(Error);
    expect((result.error as Error).message).toMatch(
      /list files of pull request #7 failed with status 502/,
    );
    expect(everything(result)).not.toContain(fake.state.token);
  });
});
