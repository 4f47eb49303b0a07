import { execFileSync } from 'node:child_process';
import { writeFileSync } from 'node:fs';
import { join } from 'node:path';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { COMMENT_MARKER } from '../../src/core/render/notice.js';
import { putPullRequest, startFakeGitHub, type FakeGitHub } from '../support/fake-github.js';
import {
  PEAK_RSS_PRELOAD,
  pullRequestEvent,
  runBundle,
  type BundleRun,
} from '../support/run-bundle.js';
import { checkpointConfig, scenarioRepo, type ScenarioRepo } from '../support/scenario-repo.js';

// The bundled action (dist/index.js) as the runner starts it, against a temporary git repository
// and a loopback stand-in for the GitHub REST API that checks every request against GitHub's
// published OpenAPI description (@octokit/openapi).

const OWNER = 'example-org';
const REPO = 'model-zoo';
const POLICY = `limits:\n  fitSequences: { min: 1 }\nserving:\n  device-memory-gib: 80\n  sequences: 4\n`;

let repo: ScenarioRepo;
let fake: FakeGitHub;
let first: BundleRun;
let second: BundleRun;
let third: BundleRun;
/** Review comments after the first and the second run, and the suggestion applied as GitHub would apply it. */
let afterFirst: { id: number; body: string; line: number }[] = [];
let afterSecond: { id: number; body: string; line: number }[] = [];
let fixedText = '';

function git(...args: string[]): string {
  return execFileSync(
    'git',
    [
      '-c',
      'user.name=test',
      '-c',
      'user.email=test@example.invalid',
      '-c',
      'commit.gpgsign=false',
      ...args,
    ],
    { cwd: repo.dir, encoding: 'utf8' },
  ).trim();
}

/** The file's unified diff between two commits, from its first hunk on, as the pull request's file list carries it. */
function patchOf(from: string, to: string, path: string): string {
  const diff = git('diff', '-U3', from, to, '--', path);
  return diff.slice(diff.indexOf('@@'));
}

async function run(head = repo.head): Promise<BundleRun> {
  return runBundle({
    eventName: 'pull_request',
    event: pullRequestEvent({ owner: OWNER, repo: REPO, number: 7, base: repo.base, head }),
    workspace: repo.dir,
    apiUrl: fake.url,
    repository: `${OWNER}/${REPO}`,
    inputs: { 'github-token': fake.state.token, 'fail-on': 'block', comment: 'update' },
    // Reports the child's CPU time on exit (stripped from stderr), for the bound below.
    nodeArgs: ['--require', PEAK_RSS_PRELOAD],
  });
}

beforeAll(async () => {
  repo = scenarioRepo(
    { '.github/context-reach.yml': POLICY, 'models/tiny/config.json': checkpointConfig() },
    // The pull request quadruples the declared span and leaves the rotary code as it was.
    {
      '.github/context-reach.yml': POLICY,
      'models/tiny/config.json': checkpointConfig({ max_position_embeddings: 16384 }),
    },
  );
  fake = await startFakeGitHub({ owner: OWNER, repo: REPO });
  putPullRequest(fake, repo, [
    {
      filename: 'models/tiny/config.json',
      status: 'modified',
      patch: patchOf(repo.base, repo.head, 'models/tiny/config.json'),
    },
  ]);
  const snapshot = () =>
    fake.state.reviewComments.map((c) => ({ id: c.id, body: c.body, line: c.line }));
  first = await run();
  afterFirst = snapshot();
  second = await run();
  afterSecond = snapshot();
  // Apply the suggestion as GitHub's "Commit suggestion" button does: its lines replace the commented line.
  const suggestion = afterSecond[0];
  if (suggestion) {
    const replacement = /```suggestion\n([\s\S]*?)\n```/.exec(suggestion.body)?.[1] ?? '';
    const lines = git('show', `${repo.head}:models/tiny/config.json`).split('\n');
    lines.splice(suggestion.line - 1, 1, ...replacement.split('\n'));
    fixedText = `${lines.join('\n')}\n`;
    writeFileSync(join(repo.dir, 'models/tiny/config.json'), fixedText);
    git('commit', '--quiet', '-am', 'apply the suggestion');
    const fixed = git('rev-parse', 'HEAD');
    const pull = fake.state.pulls.get(7)!;
    pull.headSha = fixed;
    pull.files = [
      {
        filename: 'models/tiny/config.json',
        status: 'modified',
        patch: patchOf(repo.base, fixed, 'models/tiny/config.json'),
      },
    ];
    third = await run(fixed);
  }
}, 90_000);

afterAll(async () => {
  await fake?.close();
  repo?.remove();
});

describe('the bundled action on a pull request', () => {
  it('fails the check with exit status 1 on a blocking finding', () => {
    expect(first.stderr).not.toMatch(/at .*\.js:\d+/); // no stack trace
    expect(first.code).toBe(1);
    expect(second.code).toBe(1);
  });

  it('sets the verdict, counts, report path and comment URL outputs', () => {
    expect(first.outputs.verdict).toBe('block');
    expect(Number(first.outputs.blocking)).toBeGreaterThanOrEqual(1);
    expect(first.outputs.warnings).toMatch(/^\d+$/);
    expect(first.outputs['report-json']).toMatch(/context-reach[/\\]report\.json$/);
    expect(first.outputs['comment-url']).toMatch(
      /^http:\/\/127\.0\.0\.1:\d+\/example-org\/model-zoo\/pull\/7#issuecomment-\d+$/,
    );
  });

  it('creates the comment on the first run and updates the same one on the later runs', () => {
    const mine = fake.state.comments.filter((c) => c.body.startsWith(COMMENT_MARKER));
    expect(mine).toHaveLength(1);
    expect(fake.calls('issues/create-comment')).toHaveLength(1);
    expect(fake.calls('issues/update-comment')).toHaveLength(2);
    expect(second.outputs['comment-url']).toBe(first.outputs['comment-url']);
    expect(second.outputs['comment-url']).toBe(first.outputs['comment-url']);
  });

  it('writes the same report to the job summary', () => {
    expect(first.summary).toContain(COMMENT_MARKER);
    expect(first.summary).toContain('span-grew-code-unchanged');
  });

  it('annotates the offending line of the model config', () => {
    const error = first.annotations.find(
      (a) => a.level === 'error' && a.message.includes('declared span grew'),
    );
    expect(error?.properties.file).toBe('models/tiny/config.json');
    // max_position_embeddings is on line 10 of the generated config.
    expect(error?.properties.line).toBe('10');
  });

  it('writes a versioned JSON report at the report-json path', () => {
    const report = JSON.parse(first.files[first.outputs['report-json']!]!);
    expect(report.version).toBe(1);
    expect(report.verdict).toBe('block');
    expect(report.files[0].path).toBe('models/tiny/config.json');
  });

  it("posts the fix as one review suggestion on the offending line, in the file's own JSON keys", () => {
    expect(afterFirst).toHaveLength(1);
    expect(fake.calls('pulls/create-review-comment')).toHaveLength(1);
    const [suggestion] = afterFirst;
    expect(suggestion!.line).toBe(10);
    expect(suggestion!.body).toMatch(/^<!-- context-reach:suggestion [0-9a-f]{16} -->/);
    expect(suggestion!.body).toContain(
      '```suggestion\n  "max_position_embeddings": 16384,\n  "rope_scaling": {"rope_type": "linear", "factor": 4.0, "original_max_position_embeddings": 4096},\n```',
    );
    expect(suggestion!.body).toContain('still needs fine\\-tuning');
  });

  it('keeps the one suggestion on a re-run: no duplicate, no rewrite', () => {
    expect(afterSecond).toEqual(afterFirst);
    expect(fake.calls('pulls/update-review-comment')).toHaveLength(0);
  });

  it('applying the suggestion gives valid JSON that clears the finding, and the re-run removes the suggestion', () => {
    expect(() => JSON.parse(fixedText)).not.toThrow();
    expect(JSON.parse(fixedText).rope_scaling).toEqual({
      rope_type: 'linear',
      factor: 4,
      original_max_position_embeddings: 4096,
    });
    expect(third.outputs.verdict).not.toBe('block');
    expect(fake.calls('pulls/delete-review-comment')).toHaveLength(1);
    expect(fake.state.reviewComments).toEqual([]);
    expect(fake.calls('pulls/create-review-comment')).toHaveLength(1);
  });

  it("makes only requests that GitHub's REST description allows, method, path and body", () => {
    expect(fake.requests.length).toBeGreaterThan(0);
    expect(fake.mismatches).toEqual([]);
    expect(fake.responseMismatches).toEqual([]);
    expect(fake.unhandled).toEqual([]);
  });

  it('registers the token as a secret and prints it nowhere else', () => {
    // `::add-mask::` is how an action tells the runner to hide a value from every later line.
    expect(first.stdout.split('\n')[0]).toBe(`::add-mask::${fake.state.token}`);
    const stdout = first.stdout
      .split('\n')
      .filter((line) => !line.startsWith('::add-mask::'))
      .join('\n');
    for (const text of [
      stdout,
      first.stderr,
      first.summary,
      ...Object.values(first.files),
      ...fake.state.comments.map((c) => c.body),
    ]) {
      expect(text).not.toContain(fake.state.token);
    }
  });

  it("finishes well inside the runner's patience (each run under 5 s of CPU time)", () => {
    console.log(
      `bundle e2e: first run ${first.elapsedMs.toFixed(0)} ms (${first.cpuMs} ms CPU), second ${second.elapsedMs.toFixed(0)} ms (${second.cpuMs} ms CPU)`,
    );
    // CPU time of the action's process: other work on the machine stretches its wall time, not this.
    expect(first.cpuMs, 'the preload reported the CPU time').not.toBeNull();
    expect(first.cpuMs!).toBeLessThan(5000);
  });
});
