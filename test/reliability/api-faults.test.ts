import { execFileSync } from 'node:child_process';
import { inspect } from 'node:util';
import { afterEach, describe, expect, it } from 'vitest';
import { COMMENT_FAILED_NOTICE } from '../../src/action/run-action.js';
import { COMMENT_MARKER } from '../../src/core/render/notice.js';
import {
  runScenario,
  type ScenarioOptions,
  type ScenarioResult,
} from '../support/action-harness.js';
import {
  connectionReset,
  connectionResetAfterEffect,
  secondaryRateLimit,
  serverError,
  startFakeGitHub,
  statusFault,
  type FakeGitHub,
} from '../support/fake-github.js';
import { pullRequestEvent, runBundle } from '../support/run-bundle.js';
import { checkpointConfig, scenarioRepo } from '../support/scenario-repo.js';

// API faults against the loopback stand-in for GitHub's REST API (every request checked against
// GitHub's OpenAPI description), the action in-process with the real adapters: each run ends
// with the right verdict and at most one report comment, however the API misbehaves.

const MODEL = 'models/a/config.json';
/** A change that blocks: the declared span quadruples and the position code stays. */
const BLOCKING = {
  base: { [MODEL]: checkpointConfig() },
  head: { [MODEL]: checkpointConfig({ max_position_embeddings: 16384 }) },
};

const fakes: FakeGitHub[] = [];
afterEach(async () => {
  for (const fake of fakes.splice(0)) {
    expect(fake.mismatches).toEqual([]);
    expect(fake.unhandled).toEqual([]);
    await fake.close();
  }
});

async function scenario(options: Partial<ScenarioOptions> = {}): Promise<ScenarioResult> {
  const result = await runScenario({ ...BLOCKING, ...options });
  if (!fakes.includes(result.fake)) fakes.push(result.fake);
  return result;
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
    if (operation === 'issues/update-comment')
      fake.state.comments.push({
        id: 1,
        issueNumber: 7,
        body: `${COMMENT_MARKER}\nold`,
        user: fake.state.tokenUser,
        createdAt: '2024-01-01T00:00:00Z',
        updatedAt: '2024-01-01T00:00:00Z',
      });
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
    fake.state.comments.push({
      id: 1,
      issueNumber: 7,
      body: `${COMMENT_MARKER}\nold`,
      user: fake.state.tokenUser,
      createdAt: '2024-01-01T00:00:00Z',
      updatedAt: '2024-01-01T00:00:00Z',
    });
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
    fake.state.comments.push({
      id: 1,
      issueNumber: 7,
      body: `${COMMENT_MARKER}\nold`,
      user: fake.state.tokenUser,
      createdAt: '2024-01-01T00:00:00Z',
      updatedAt: '2024-01-01T00:00:00Z',
    });
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

describe('pull requests from forks (read-only token)', () => {
  it('the bundled action: no comment, the report in the summary and annotations, exit 1 on a block, no stack trace', async () => {
    const repo = scenarioRepo(BLOCKING.base, BLOCKING.head);
    const fake = await startFakeGitHub({ owner: 'example-org', repo: 'model-zoo' });
    fakes.push(fake);
    fake.state.readOnly = true;
    fake.state.pulls.set(7, {
      number: 7,
      baseSha: repo.base,
      headSha: repo.head,
      baseRef: 'main',
      headRef: 'feature',
      labels: [],
      headRepo: 'someone-else/model-zoo',
      files: [{ filename: MODEL, status: 'modified' }],
    });
    const run = await runBundle({
      eventName: 'pull_request',
      event: pullRequestEvent({
        owner: 'example-org',
        repo: 'model-zoo',
        number: 7,
        base: repo.base,
        head: repo.head,
        fork: true,
      }),
      workspace: repo.dir,
      apiUrl: fake.url,
      repository: 'example-org/model-zoo',
      inputs: { 'github-token': fake.state.token },
    });
    repo.remove();
    expect(run.code).toBe(1);
    expect(fake.state.comments).toHaveLength(0);
    expect(fake.calls('issues/create-comment').map((c) => c.status)).toEqual([403]);
    expect(run.summary).toContain('span-grew-code-unchanged');
    expect(run.summary).toContain('Pull requests from forks');
    expect(run.annotations.some((a) => a.level === 'error' && a.properties.file === MODEL)).toBe(
      true,
    );
    expect(run.outputs.verdict).toBe('block');
    expect(run.outputs['comment-url']).toBe('');
    expect(`${run.stdout}\n${run.stderr}`).not.toMatch(/\n\s+at .+:\d+:\d+/);
  });
});

describe('pull requests with more files than the API lists (over 3,000)', () => {
  const MANY = 3500;
  /** 3,500 changed files: notes, and model configs at positions 10 and 3,200 of the list. */
  function manyFiles(): { base: Record<string, string>; head: Record<string, string> } {
    const base: Record<string, string> = {};
    const head: Record<string, string> = {};
    for (let i = 0; i < MANY; i += 1) {
      const path =
        i === 10 || i === 3200
          ? `m${String(i).padStart(4, '0')}/config.json`
          : `notes/n${String(i).padStart(4, '0')}.txt`;
      base[path] = path.endsWith('.json') ? checkpointConfig() : 'a';
      head[path] = path.endsWith('.json')
        ? checkpointConfig({ max_position_embeddings: 16384 })
        : 'b';
    }
    return { base, head };
  }

  it('with the history checked out, reads the change from git: every file judged, no file list asked for', async () => {
    // Review suggestions list the diff on their own to place a suggestion on a changed line: off here, where the gate's reads are counted.
    const result = await scenario({ ...manyFiles(), inputs: { suggestions: 'off' } });
    expect(result.error).toBeNull();
    const report = JSON.parse(Object.values(result.written)[0]!);
    expect(report.files.map((f: { path: string }) => f.path).sort()).toEqual([
      'm0010/config.json',
      'm3200/config.json',
    ]);
    expect(result.fake.calls('pulls/list-files')).toHaveLength(0);
    expect(report.notices).toEqual([]);
  }, 60_000);

  it("without the history, completes the cut list from the two commits' trees: every file judged, no notice", async () => {
    const result = await scenario({ ...manyFiles(), noHistory: true });
    expect(result.error).toBeNull();
    const report = JSON.parse(Object.values(result.written)[0]!);
    expect(report.files.map((f: { path: string }) => f.path).sort()).toEqual([
      'm0010/config.json',
      'm3200/config.json',
    ]);
    expect(report.notices).toEqual([]);
    expect(result.fake.calls('git/get-tree')).toHaveLength(2);
    expect(result.out.outputs.verdict).toBe('block');
  }, 60_000);
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

  it('the bundled action failing on the API prints one failure line, without the token or a stack trace', async () => {
    const repo = scenarioRepo(BLOCKING.base, BLOCKING.head);
    const fake = await startFakeGitHub({ owner: 'example-org', repo: 'model-zoo' });
    fakes.push(fake);
    fake.state.pulls.set(7, {
      number: 7,
      baseSha: repo.base,
      headSha: repo.head,
      baseRef: 'main',
      headRef: 'feature',
      labels: [],
      headRepo: 'example-org/model-zoo',
      files: [{ filename: MODEL, status: 'modified' }],
    });
    // A 422 is not retried, so the failure comes at once; its message quotes the token back.
    fake.fail('pulls/list-files', statusFault(422, `refused for ${fake.state.token}`));
    const empty = execFileSync('mktemp', ['-d'], { encoding: 'utf8' }).trim();
    const run = await runBundle({
      eventName: 'pull_request',
      event: pullRequestEvent({
        owner: 'example-org',
        repo: 'model-zoo',
        number: 7,
        base: repo.base,
        head: repo.head,
      }),
      workspace: empty,
      apiUrl: fake.url,
      repository: 'example-org/model-zoo',
      inputs: { 'github-token': fake.state.token },
    });
    repo.remove();
    expect(run.code).toBe(1);
    expect(run.stdout).toMatch(
      /::error::context-reach failed: GitHub API list files of pull request #7 failed with status 422/,
    );
    const lines = `${run.stdout}\n${run.stderr}`
      .split('\n')
      .filter((line) => !line.startsWith('::add-mask::'));
    for (const text of [...lines, run.summary, ...Object.values(run.files)])
      expect(text).not.toContain(fake.state.token);
    expect(run.stderr).not.toMatch(/\n\s+at .+:\d+:\d+/);
  });
});
