/**
 * The fork-safe two-workflow recipe, shared by publish.test.ts, publish.bundle.test.ts and
 * report-round-two.test.ts: the first workflow's run on a fork's pull request, the workflow_run
 * payload of the second, and the second run in process.
 */
import { writeFileSync } from 'node:fs';
import { join } from 'node:path';
import { createFileSource } from '../../src/adapters/file-source.js';
import { createGitReader } from '../../src/adapters/git.js';
import { createGitHubClient } from '../../src/adapters/github-rest.js';
import { runAction } from '../../src/action/run-action.js';
import { OWNER, REPO, runScenario, type ScenarioResult } from '../support/action-harness.js';
import type { FakeGitHub } from '../support/fake-github.js';
import { createRecordingOutput, type RecordingOutput } from '../support/recording-output.js';
import { checkpointConfig } from '../support/scenario-repo.js';

export const MODEL = 'models/a/config.json';

export interface WorkflowRunOverrides {
  headSha?: string;
  event?: string;
  headOwner?: string;
  pullNumbers?: number[];
}

/**
 * The workflow_run payload GitHub sends the second workflow (the fields it reads, and a few more)
 * after the first ran on the pull request's head commit `head`.
 */
export function workflowRunFor(head: string, overrides: WorkflowRunOverrides = {}) {
  return {
    action: 'completed',
    workflow_run: {
      id: 4242,
      name: 'context-reach',
      event: overrides.event ?? 'pull_request',
      status: 'completed',
      conclusion: 'failure',
      head_sha: overrides.headSha ?? head,
      head_branch: 'feature',
      head_repository: {
        full_name: `${overrides.headOwner ?? 'someone-else'}/${REPO}`,
        owner: { login: overrides.headOwner ?? 'someone-else' },
      },
      // GitHub leaves this empty for pull requests from forks.
      pull_requests: (overrides.pullNumbers ?? []).map((number) => ({ number })),
    },
    repository: { name: REPO, full_name: `${OWNER}/${REPO}`, owner: { login: OWNER } },
  };
}

/**
 * Workflow 1 on a fork's pull request (read-only token, no comment), its JSON report, and the
 * fake API made ready for workflow 2: a token that may comment, another open pull request from
 * another fork and a closed one from the same branch label.
 */
export async function firstWorkflow(): Promise<{ first: ScenarioResult; reportText: string }> {
  // Workflow 1: a fork's pull request, read-only token, no comment; the report is the artifact.
  const first = await runScenario({
    base: { [MODEL]: checkpointConfig() },
    head: { [MODEL]: checkpointConfig({ max_position_embeddings: 16384 }) },
    fork: true,
    readOnly: true,
    inputs: { comment: 'off' },
  });
  const fake = first.fake;
  const reportText = Object.values(first.written)[0]!;
  // Workflow 2 runs in the base repository with a token that may comment.
  fake.state.readOnly = false;
  // Another open pull request from another fork, and a closed one from the same branch label.
  fake.state.pulls.set(8, {
    number: 8,
    baseSha: first.base,
    headSha: 'd'.repeat(40),
    baseRef: 'main',
    headRef: 'feature',
    labels: [],
    headRepo: `mallory/${REPO}`,
    files: [],
  });
  addClosedPullOfSameHead(first);
  return { first, reportText };
}

/** A closed pull request (9) from the fork's branch at the first workflow's head commit. */
export function addClosedPullOfSameHead(first: ScenarioResult): void {
  first.fake.state.pulls.set(9, {
    number: 9,
    baseSha: first.base,
    headSha: first.head,
    baseRef: 'main',
    headRef: 'feature',
    labels: [],
    headRepo: `someone-else/${REPO}`,
    files: [],
    state: 'closed',
  });
}

/**
 * Workflow 2 in process with the real adapters: the action in publish mode on `report` (text or
 * bytes, written to a file under `folder`) against `fake`, with the event `payload`.
 */
export async function publishInProcess(
  fake: FakeGitHub,
  folder: string,
  report: string | Uint8Array,
  payload: unknown,
  eventName = 'workflow_run',
): Promise<{ out: RecordingOutput; error: unknown }> {
  const path = join(folder, `report-${Math.random().toString(36).slice(2)}.json`);
  writeFileSync(path, report);
  const out = createRecordingOutput();
  let error: unknown = null;
  await runAction({
    env: {
      GITHUB_EVENT_NAME: eventName,
      GITHUB_EVENT_PATH: 'event.json',
      GITHUB_API_URL: fake.url,
      GITHUB_SERVER_URL: 'https://github.example',
      RUNNER_TEMP: folder,
    },
    getInput: (name) =>
      (({ 'github-token': fake.state.token, 'publish-report': path }) as Record<string, string>)[
        name
      ] ?? '',
    out,
    readJson: async () => payload,
    readFile: (p, max) => createFileSource(max).read(p),
    writeFile: async () => {
      throw new Error('publish mode writes no files');
    },
    createGit: (cwd) => createGitReader(cwd),
    createGitHub: (token, options) => createGitHubClient(token, { ...options, msPerSecond: 1 }),
  }).catch((caught: unknown) => {
    error = caught;
  });
  return { out, error };
}

/** The JSON report `reportText` with `change` made to it, as a forger would write it. */
export function tamperedReport(
  reportText: string,
  change: (report: Record<string, unknown> & { files: Record<string, unknown>[] }) => void,
): string {
  const report = JSON.parse(reportText);
  change(report);
  return JSON.stringify(report);
}
