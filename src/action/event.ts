/**
 * Which commits to compare, from the workflow event's payload (the JSON at `GITHUB_EVENT_PATH`).
 * Pure: the caller reads the file and passes the parsed object.
 */

export interface EventInfo {
  /** Commit (or ref) to compare against; null when there is none (the first push of a branch without a `base` input). */
  base: string | null;
  /** Commit under review. */
  head: string;
  /** Pull request number, null for events without one. */
  pullNumber: number | null;
  /** Labels of the pull request as the event saw them. */
  labels: string[];
  owner: string;
  repo: string;
  /** The pull request's head lives in another repository: the workflow token is read-only there. */
  isFork: boolean;
}

export const SUPPORTED_EVENTS = [
  'pull_request',
  'pull_request_target',
  'merge_group',
  'push',
  'workflow_dispatch',
] as const;

export class EventError extends Error {
  constructor(message: string) {
    super(message);
    this.name = 'EventError';
  }
}

/** Git's null object id: `before` of a push that created the branch. */
const ZERO_SHA = /^0+$/;
const SHA = /^[0-9a-f]{40}([0-9a-f]{24})?$/;

type Json = Record<string, unknown>;

function field(payload: unknown, path: string, eventName: string): unknown {
  let cursor: unknown = payload;
  for (const part of path.split('.')) {
    if (
      cursor === null ||
      typeof cursor !== 'object' ||
      !Object.prototype.hasOwnProperty.call(cursor, part)
    ) {
      throw new EventError(
        `The ${eventName} event payload has no "${path}"; expected it in the file at GITHUB_EVENT_PATH.`,
      );
    }
    cursor = (cursor as Json)[part];
  }
  return cursor;
}

function sha(payload: unknown, path: string, eventName: string): string {
  const value = field(payload, path, eventName);
  if (typeof value !== 'string' || !SHA.test(value)) {
    throw new EventError(
      `The ${eventName} event payload has "${path}" = ${JSON.stringify(value)}; expected a 40-character hexadecimal commit id.`,
    );
  }
  return value;
}

function text(payload: unknown, path: string, eventName: string): string {
  const value = field(payload, path, eventName);
  if (typeof value !== 'string' || value === '') {
    throw new EventError(
      `The ${eventName} event payload has "${path}" = ${JSON.stringify(value)}; expected a non-empty string.`,
    );
  }
  return value;
}

function positiveWhole(payload: unknown, path: string, eventName: string): number {
  const value = field(payload, path, eventName);
  if (!Number.isSafeInteger(value) || (value as number) < 1) {
    throw new EventError(
      `The ${eventName} event payload has "${path}" = ${JSON.stringify(value)}; expected a positive whole number.`,
    );
  }
  return value as number;
}

function list(payload: unknown, path: string, eventName: string): unknown[] {
  const value = field(payload, path, eventName);
  if (!Array.isArray(value)) {
    throw new EventError(
      `The ${eventName} event payload has "${path}" = ${JSON.stringify(value)}; expected a list.`,
    );
  }
  return value;
}

function repository(payload: unknown, eventName: string): { owner: string; repo: string } {
  return {
    owner: text(payload, 'repository.owner.login', eventName),
    repo: text(payload, 'repository.name', eventName),
  };
}

/**
 * Base, head and pull request of a run. `baseInput` is the `base` input (used where the event
 * has no base, and required for workflow_dispatch); `fallbackSha` is `GITHUB_SHA`, the head of
 * a workflow_dispatch run.
 */
export function parseEvent(
  eventName: string,
  payload: unknown,
  baseInput: string | null,
  fallbackSha?: string,
): EventInfo {
  if (payload === null || typeof payload !== 'object') {
    throw new EventError(
      `The ${eventName} event payload is ${payload === null ? 'null' : typeof payload}; expected the JSON object at GITHUB_EVENT_PATH.`,
    );
  }
  switch (eventName) {
    case 'pull_request':
    case 'pull_request_target': {
      const number = positiveWhole(payload, 'pull_request.number', eventName);
      const labels = list(payload, 'pull_request.labels', eventName);
      const headRepo = field(payload, 'pull_request.head.repo', eventName) as Json | null;
      const baseRepo = text(payload, 'pull_request.base.repo.full_name', eventName);
      return {
        ...repository(payload, eventName),
        base: sha(payload, 'pull_request.base.sha', eventName),
        head: sha(payload, 'pull_request.head.sha', eventName),
        pullNumber: number,
        labels: labels
          .map((label) => (label as Json | null)?.name)
          .filter((name): name is string => typeof name === 'string'),
        // A deleted fork leaves head.repo null: still a fork.
        isFork: headRepo === null || headRepo?.full_name !== baseRepo,
      };
    }
    case 'merge_group':
      return {
        ...repository(payload, eventName),
        base: sha(payload, 'merge_group.base_sha', eventName),
        head: sha(payload, 'merge_group.head_sha', eventName),
        pullNumber: null,
        labels: [],
        isFork: false,
      };
    case 'push': {
      const before = text(payload, 'before', eventName);
      const head = sha(payload, 'after', eventName);
      if (ZERO_SHA.test(head)) {
        throw new EventError(
          'The push event deletes its branch ("after" is all zeros); expected a push with a head commit.',
        );
      }
      const created = ZERO_SHA.test(before);
      return {
        ...repository(payload, eventName),
        base: created ? baseInput : sha(payload, 'before', eventName),
        head,
        pullNumber: null,
        labels: [],
        isFork: false,
      };
    }
    case 'workflow_dispatch': {
      if (baseInput === null || baseInput === '') {
        throw new EventError(
          'A workflow_dispatch run has no base commit; expected the "base" input (a branch, tag or commit id to compare against).',
        );
      }
      if (fallbackSha === undefined || !SHA.test(fallbackSha)) {
        throw new EventError(
          `A workflow_dispatch run needs GITHUB_SHA as its head; got ${JSON.stringify(fallbackSha ?? null)}, expected a 40-character hexadecimal commit id.`,
        );
      }
      return {
        ...repository(payload, eventName),
        base: baseInput,
        head: fallbackSha,
        pullNumber: null,
        labels: [],
        isFork: false,
      };
    }
    default:
      throw new EventError(
        `The event ${JSON.stringify(eventName)} is not supported; expected one of ${SUPPORTED_EVENTS.join(', ')}.`,
      );
  }
}

/** A finished workflow run, as the `workflow_run` event describes it: what publish mode needs. */
export interface WorkflowRunInfo {
  owner: string;
  repo: string;
  /** Id of the run that wrote the report. */
  runId: number;
  /** Event that started that run, e.g. `pull_request`. */
  event: string;
  /** Head commit of that run: the only commit a report may be published for. */
  headSha: string;
  /** `owner:branch` of the head, for finding its pull request; null when the head repository is gone. */
  headLabel: string | null;
  /** Pull requests GitHub links to the run (empty for pull requests from forks). */
  pullNumbers: number[];
}

/**
 * The triggering run of a `workflow_run` event. Everything here comes from GitHub's payload,
 * never from the run's artifacts.
 */
export function parseWorkflowRun(payload: unknown): WorkflowRunInfo {
  const name = 'workflow_run';
  if (payload === null || typeof payload !== 'object') {
    throw new EventError(
      `The ${name} event payload is ${payload === null ? 'null' : typeof payload}; expected the JSON object at GITHUB_EVENT_PATH.`,
    );
  }
  const runId = positiveWhole(payload, 'workflow_run.id', name);
  const pulls = list(payload, 'workflow_run.pull_requests', name);
  const headRepo = field(payload, 'workflow_run.head_repository', name) as Json | null;
  const headOwner = (headRepo?.owner as Json | undefined)?.login;
  const headBranch = field(payload, 'workflow_run.head_branch', name);
  return {
    ...repository(payload, name),
    runId,
    event: text(payload, 'workflow_run.event', name),
    headSha: sha(payload, 'workflow_run.head_sha', name),
    headLabel:
      typeof headOwner === 'string' &&
      typeof headBranch === 'string' &&
      headOwner !== '' &&
      headBranch !== ''
        ? `${headOwner}:${headBranch}`
        : null,
    pullNumbers: pulls
      .map((pull) => (pull as Json | null)?.number)
      .filter((number): number is number => Number.isSafeInteger(number) && (number as number) > 0),
  };
}
