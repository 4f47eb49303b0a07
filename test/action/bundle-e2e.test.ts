import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { COMMENT_MARKER } from '../../src/core/render/notice.js';
import { startFakeGitHub, type FakeGitHub } from '../support/fake-github.js';
import { pullRequestEvent, runBundle, type BundleRun } from '../support/run-bundle.js';
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

async function run(): Promise<BundleRun> {
  return runBundle({
    eventName: 'pull_request',
    event: pullRequestEvent({ owner: OWNER, repo: REPO, number: 7, base: repo.base, head: repo.head }),
    workspace: repo.dir,
    apiUrl: fake.url,
    repository: `${OWNER}/${REPO}`,
    inputs: { 'github-token': fake.state.token, 'fail-on': 'block', comment: 'update' },
  });
}

beforeAll(async () => {
  repo = scenarioRepo(
    { '.github/context-reach.yml': POLICY, 'models/tiny/config.json': checkpointConfig() },
    // The pull request quadruples the declared span and leaves the rotary code as it was.
    { '.github/context-reach.yml': POLICY, 'models/tiny/config.json': checkpointConfig({ max_position_embeddings: 16384 }) },
  );
  fake = await startFakeGitHub({ owner: OWNER, repo: REPO });
  fake.state.pulls.set(7, {
    number: 7, baseSha: repo.base, headSha: repo.head, baseRef: 'main', headRef: 'feature', labels: [],
    headRepo: `${OWNER}/${REPO}`, files: [{ filename: 'models/tiny/config.json', status: 'modified' }],
  });
  first = await run();
  second = await run();
}, 60_000);

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
    expect(first.outputs['comment-url']).toMatch(/^http:\/\/127\.0\.0\.1:\d+\/example-org\/model-zoo\/pull\/7#issuecomment-\d+$/);
  });

  it('creates the comment on the first run and updates the same one on the second', () => {
    const mine = fake.state.comments.filter((c) => c.body.startsWith(COMMENT_MARKER));
    expect(mine).toHaveLength(1);
    expect(fake.calls('issues/create-comment')).toHaveLength(1);
    expect(fake.calls('issues/update-comment')).toHaveLength(1);
    expect(second.outputs['comment-url']).toBe(first.outputs['comment-url']);
    expect(mine[0]!.body).toContain('span-grew-code-unchanged');
    expect(mine[0]!.body).toContain('```mermaid');
  });

  it('writes the same report to the job summary', () => {
    expect(first.summary).toContain(COMMENT_MARKER);
    expect(first.summary).toContain('span-grew-code-unchanged');
  });

  it('annotates the offending line of the model config', () => {
    const error = first.annotations.find((a) => a.level === 'error' && a.message.includes('declared span grew'));
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

  it('makes only requests that GitHub\'s REST description allows, method, path and body', () => {
    expect(fake.requests.length).toBeGreaterThan(0);
    expect(fake.mismatches).toEqual([]);
  });

  it('registers the token as a secret and prints it nowhere else', () => {
    // `::add-mask::` is how an action tells the runner to hide a value from every later line.
    expect(first.stdout.split('\n')[0]).toBe(`::add-mask::${fake.state.token}`);
    const stdout = first.stdout.split('\n').filter((line) => !line.startsWith('::add-mask::')).join('\n');
    for (const text of [stdout, first.stderr, first.summary, ...Object.values(first.files), ...fake.state.comments.map((c) => c.body)]) {
      expect(text).not.toContain(fake.state.token);
    }
  });

  it('finishes well inside the runner\'s patience (each run under 5 s)', () => {
    console.log(`bundle e2e: first run ${first.elapsedMs.toFixed(0)} ms, second ${second.elapsedMs.toFixed(0)} ms`);
    expect(first.elapsedMs).toBeLessThan(5000);
  });
});
