/**
 * The fork-safe two-workflow recipe's first half, shared by publish.test.ts and
 * publish.bundle.test.ts: the first workflow's run on a fork's pull request and the workflow_run
 * payload of the second.
 */
import { OWNER, REPO, runScenario, type ScenarioResult } from '../support/action-harness.js';
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
  fake.state.pulls.set(9, {
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
  return { first, reportText };
}
