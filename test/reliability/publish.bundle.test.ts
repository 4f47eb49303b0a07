import { mkdtempSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { COMMENT_MARKER } from '../../src/core/render/notice.js';
import { OWNER, REPO, type ScenarioResult } from '../support/action-harness.js';
import type { FakeGitHub } from '../support/fake-github.js';
import { runBundle } from '../support/run-bundle.js';
import { firstWorkflow, workflowRunFor } from './publish-recipe.js';

// Publish mode of publish.test.ts in the bundled action (dist/index.js), as the runner starts it:
// `npm run test:full`, as it needs a build of these sources.

let first: ScenarioResult;
let fake: FakeGitHub;
let reportText: string;
let folder: string;

const ours = () => fake.state.comments.filter((c) => c.body.startsWith(COMMENT_MARKER));
const workflowRun = () => workflowRunFor(first.head);

beforeAll(async () => {
  folder = mkdtempSync(join(tmpdir(), 'context-reach-publish-'));
  ({ first, reportText } = await firstWorkflow());
  fake = first.fake;
}, 60_000);

afterAll(async () => {
  if (folder) rmSync(folder, { recursive: true, force: true });
  expect(fake.mismatches).toEqual([]);
  expect(fake.responseMismatches).toEqual([]);
  expect(fake.unhandled).toEqual([]);
  await fake?.close();
});

describe('publish mode in the bundled action (dist/index.js)', () => {
  it("posts the artifact's report from a workflow_run, exit 0, token nowhere", async () => {
    const path = join(folder, 'artifact-report.json');
    writeFileSync(path, reportText);
    const run = await runBundle({
      eventName: 'workflow_run',
      event: workflowRun(),
      workspace: folder,
      apiUrl: fake.url,
      repository: `${OWNER}/${REPO}`,
      inputs: { 'github-token': fake.state.token, 'publish-report': path },
    });
    expect(run.code).toBe(0);
    expect(run.outputs.verdict).toBe('block');
    expect(run.outputs['comment-url']).toContain('/pull/7#issuecomment-');
    expect(ours()).toHaveLength(1);
    const lines = `${run.stdout}\n${run.stderr}`
      .split('\n')
      .filter((line) => !line.startsWith('::add-mask::'));
    for (const text of [...lines, run.summary]) expect(text).not.toContain(fake.state.token);
  });
});
