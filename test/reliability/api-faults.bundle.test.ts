import { execFileSync } from 'node:child_process';
import { describe, expect, it } from 'vitest';
import { startFakeGitHub, statusFault } from '../support/fake-github.js';
import { runBundleOnPullRequest } from '../support/run-bundle.js';
import { scenarioRepo } from '../support/scenario-repo.js';
import { BLOCKING, checkedFakes, MODEL } from './checked-scenarios.js';

// API faults as api-faults.test.ts injects them, met by the bundled action (dist/index.js) in a
// child process as the runner starts it (`npm run test:full`: it needs a build of these sources).

const { fakes } = checkedFakes();

describe('pull requests from forks (read-only token)', () => {
  it('the bundled action: no comment, the report in the summary and annotations, exit 1 on a block, no stack trace', async () => {
    const repo = scenarioRepo(BLOCKING.base, BLOCKING.head);
    const fake = await startFakeGitHub({ owner: 'example-org', repo: 'model-zoo' });
    fakes.push(fake);
    fake.state.readOnly = true;
    const run = await runBundleOnPullRequest(
      fake,
      repo,
      [{ filename: MODEL, status: 'modified' }],
      {
        fork: true,
      },
    );
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

describe('the token', () => {
  it('the bundled action failing on the API prints one failure line, without the token or a stack trace', async () => {
    const repo = scenarioRepo(BLOCKING.base, BLOCKING.head);
    const fake = await startFakeGitHub({ owner: 'example-org', repo: 'model-zoo' });
    fakes.push(fake);
    // A 422 is not retried, so the failure comes at once; its message quotes the token back.
    fake.fail('pulls/list-files', statusFault(422, `refused for ${fake.state.token}`));
    const empty = execFileSync('mktemp', ['-d'], { encoding: 'utf8' }).trim();
    const run = await runBundleOnPullRequest(
      fake,
      repo,
      [{ filename: MODEL, status: 'modified' }],
      {
        workspace: empty,
      },
    );
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
