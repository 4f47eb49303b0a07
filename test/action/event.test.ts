import { describe, expect, test } from 'vitest';
import { EventError, SUPPORTED_EVENTS, parseEvent } from '../../src/action/event.js';

const BASE = '1'.repeat(40);
const HEAD = '2'.repeat(40);
const repository = {
  name: 'model-zoo',
  full_name: 'example-org/model-zoo',
  owner: { login: 'example-org' },
};

/** The fields of a pull_request payload the action reads, shaped as GitHub's webhook documentation shows. */
function pullPayload(headRepo: unknown = repository): Record<string, unknown> {
  return {
    action: 'synchronize',
    number: 12,
    repository,
    pull_request: {
      number: 12,
      labels: [{ name: 'context-waiver' }, { name: 'models' }],
      base: { sha: BASE, ref: 'main', repo: repository },
      head: { sha: HEAD, ref: 'feature', repo: headRepo },
    },
  };
}

describe('parseEvent(eventName, payload, baseInput, fallbackSha)', () => {
  test.each(['pull_request', 'pull_request_target'])(
    '%s: base and head from the pull request, its number and labels',
    (event) => {
      expect(parseEvent(event, pullPayload(), null)).toEqual({
        base: BASE,
        head: HEAD,
        pullNumber: 12,
        labels: ['context-waiver', 'models'],
        owner: 'example-org',
        repo: 'model-zoo',
        isFork: false,
      });
    },
  );

  test('pull_request from a fork is marked as a fork, also when the fork was deleted', () => {
    expect(
      parseEvent(
        'pull_request',
        pullPayload({ ...repository, full_name: 'stranger/model-zoo' }),
        null,
      ).isFork,
    ).toBe(true);
    expect(parseEvent('pull_request', pullPayload(null), null).isFork).toBe(true);
  });

  test('merge_group: base_sha and head_sha of the queue entry, no pull request', () => {
    const payload = {
      repository,
      merge_group: {
        base_sha: BASE,
        head_sha: HEAD,
        head_ref: 'refs/heads/gh-readonly-queue/main/pr-12',
      },
    };
    expect(parseEvent('merge_group', payload, null)).toEqual({
      base: BASE,
      head: HEAD,
      pullNumber: null,
      labels: [],
      owner: 'example-org',
      repo: 'model-zoo',
      isFork: false,
    });
  });

  test('push: before and after', () => {
    expect(parseEvent('push', { repository, before: BASE, after: HEAD }, null)).toEqual({
      base: BASE,
      head: HEAD,
      pullNumber: null,
      labels: [],
      owner: 'example-org',
      repo: 'model-zoo',
      isFork: false,
    });
  });

  test('push that creates a branch (before all zeros) has no base, unless the base input gives one', () => {
    const payload = { repository, before: '0'.repeat(40), after: HEAD };
    expect(parseEvent('push', payload, null).base).toBeNull();
    expect(parseEvent('push', payload, 'main').base).toBe('main');
  });

  test('push that deletes a branch is refused', () => {
    expect(() =>
      parseEvent('push', { repository, before: BASE, after: '0'.repeat(40) }, null),
    ).toThrow(/deletes its branch/);
  });

  test('workflow_dispatch: base from the input, head from GITHUB_SHA', () => {
    expect(
      parseEvent(
        'workflow_dispatch',
        { repository, ref: 'refs/heads/main', inputs: {} },
        'release/1.0',
        HEAD,
      ),
    ).toEqual({
      base: 'release/1.0',
      head: HEAD,
      pullNumber: null,
      labels: [],
      owner: 'example-org',
      repo: 'model-zoo',
      isFork: false,
    });
  });

  test('workflow_dispatch without the base input or GITHUB_SHA is refused with what to set', () => {
    expect(() => parseEvent('workflow_dispatch', { repository }, null, HEAD)).toThrow(
      'A workflow_dispatch run has no base commit; expected the "base" input (a branch, tag or commit id to compare against).',
    );
    expect(() => parseEvent('workflow_dispatch', { repository }, 'main')).toThrow(
      'A workflow_dispatch run needs GITHUB_SHA as its head; got null, expected a 40-character hexadecimal commit id.',
    );
  });

  test('an unsupported event names the supported ones', () => {
    expect(() => parseEvent('issue_comment', { repository }, null)).toThrow(
      `The event "issue_comment" is not supported; expected one of ${SUPPORTED_EVENTS.join(', ')}.`,
    );
  });

  test.each([
    [
      'pull_request',
      {
        repository,
        pull_request: {
          number: 1,
          labels: [],
          base: { sha: BASE, repo: repository },
          head: { repo: repository },
        },
      },
      'The pull_request event payload has no "pull_request.head.sha"; expected it in the file at GITHUB_EVENT_PATH.',
    ],
    [
      'pull_request',
      {
        repository,
        pull_request: {
          number: 1,
          labels: [],
          base: { sha: 'main', repo: repository },
          head: { sha: HEAD, repo: repository },
        },
      },
      'The pull_request event payload has "pull_request.base.sha" = "main"; expected a 40-character hexadecimal commit id.',
    ],
    [
      'pull_request',
      {
        repository,
        pull_request: {
          number: 0,
          labels: [],
          base: { sha: BASE, repo: repository },
          head: { sha: HEAD, repo: repository },
        },
      },
      'The pull_request event payload has "pull_request.number" = 0; expected a positive whole number.',
    ],
    [
      'pull_request',
      {
        repository,
        pull_request: {
          number: 1,
          labels: 'x',
          base: { sha: BASE, repo: repository },
          head: { sha: HEAD, repo: repository },
        },
      },
      'The pull_request event payload has "pull_request.labels" = "x"; expected a list.',
    ],
    [
      'merge_group',
      { repository, merge_group: { base_sha: BASE } },
      'The merge_group event payload has no "merge_group.head_sha"; expected it in the file at GITHUB_EVENT_PATH.',
    ],
    [
      'push',
      { before: BASE, after: HEAD },
      'The push event payload has no "repository.owner.login"; expected it in the file at GITHUB_EVENT_PATH.',
    ],
    [
      'push',
      { repository: { name: '', owner: { login: 'x' } }, before: BASE, after: HEAD },
      'The push event payload has "repository.name" = ""; expected a non-empty string.',
    ],
    [
      'push',
      null,
      'The push event payload is null; expected the JSON object at GITHUB_EVENT_PATH.',
    ],
  ])('%s with a broken payload is refused naming the field: %#', (event, payload, message) => {
    expect(() => parseEvent(event, payload, null)).toThrow(EventError);
    expect(() => parseEvent(event, payload, null)).toThrow(message);
  });

  test('a payload key named __proto__ is data, not a way into the result', () => {
    const payload = JSON.parse(
      `{"repository": {"name": "r", "owner": {"login": "o"}}, "before": "${BASE}", "after": "${HEAD}", "__proto__": {"pullNumber": 5}}`,
    );
    const info = parseEvent('push', payload, null);
    expect(info.pullNumber).toBeNull();
    expect(({} as Record<string, unknown>).pullNumber).toBeUndefined();
  });
});
