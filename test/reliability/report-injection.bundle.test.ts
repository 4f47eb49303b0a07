import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { startFakeGitHub, type FakeGitHub } from '../support/fake-github.js';
import { runBundleOnPullRequest, type BundleRun } from '../support/run-bundle.js';
import { checkpointConfig, scenarioRepo, type ScenarioRepo } from '../support/scenario-repo.js';

// The report as an attack surface, as in report-injection.test.ts, in the bundled action
// (dist/index.js) as the runner starts it: `npm run test:full`, as it needs a build of these sources.

describe('the bundled action: a file name that tries to inject workflow commands into the log', () => {
  let repo: ScenarioRepo;
  let fake: FakeGitHub;
  let run: BundleRun;
  const NAME =
    'models/x\n::set-output name=verdict::ok\n::add-mask::nothing\n::error file=y::forged/config.json';

  beforeAll(async () => {
    repo = scenarioRepo(
      { [NAME]: checkpointConfig() },
      { [NAME]: checkpointConfig({ max_position_embeddings: 65536 }) },
    );
    fake = await startFakeGitHub({ owner: 'example-org', repo: 'model-zoo' });
    run = await runBundleOnPullRequest(fake, repo, [{ filename: NAME, status: 'modified' }]);
  }, 60_000);

  afterAll(async () => {
    await fake?.close();
    repo?.remove();
  });

  it('writes no workflow command the file name spells: its newlines are escaped in the annotation', () => {
    expect(run.outputs.verdict).toBe('block');
    const commands = run.stdout.split('\n').filter((line) => line.startsWith('::'));
    expect(commands.filter((line) => line.startsWith('::add-mask::'))).toEqual([
      `::add-mask::${fake.state.token}`,
    ]);
    expect(commands.some((line) => line.startsWith('::set-output'))).toBe(false);
    expect(commands.some((line) => line.startsWith('::error file=y::'))).toBe(false);
    const annotation = run.annotations.find((a) => a.level === 'error');
    expect(annotation?.properties.file).toBe(NAME);
  });
});
