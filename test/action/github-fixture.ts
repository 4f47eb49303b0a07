/**
 * The loopback GitHub of the REST adapter's tests (github.test.ts, github.slow.test.ts): a fresh
 * fake per test, checked after it, and a client of the adapter pointed at it.
 */
import { afterEach, beforeEach, expect } from 'vitest';
import { createGitHubClient } from '../../src/adapters/github-rest.js';
import type { GitHubClient, GitHubClientOptions } from '../../src/adapters/github-rest.js';
import { startFakeGitHub } from '../support/fake-github.js';
import type { FakeGitHub, FakePullFile } from '../support/fake-github.js';

export const OWNER = 'example-org';
export const REPO = 'model-zoo';
export const BASE = 'a'.repeat(40);
export const HEAD = 'b'.repeat(40);

/** The current test's fake (live binding, set before each test by `useFakeGitHub`). */
export let fake: FakeGitHub;
/** What the adapter logged in the current test. */
export let logs: string[];

/** For the calling test file: a fresh fake before each test; after it, checks and closes it. */
export function useFakeGitHub(): void {
  beforeEach(async () => {
    fake = await startFakeGitHub();
    logs = [];
  });

  afterEach(async () => {
    // Every request the adapter made is one GitHub's REST description allows, and the fake's answers match it too.
    expect(fake.mismatches).toEqual([]);
    expect(fake.responseMismatches).toEqual([]);
    expect(fake.unhandled).toEqual([]);
    for (const line of logs) expect(line).not.toContain(fake.state.token);
    expect(fake.requests.every((request) => request.authorized || request.fault)).toBe(true);
    await fake.close();
  });
}

export function client(options: Partial<GitHubClientOptions> = {}): GitHubClient {
  // 1 ms per requested second: waits keep their proportions and tests stay fast.
  return createGitHubClient(fake.state.token, {
    baseUrl: fake.url,
    log: { debug: (m) => logs.push(m), info: (m) => logs.push(m), warn: (m) => logs.push(m) },
    msPerSecond: 1,
    ...options,
  });
}

export function addPull(
  number: number,
  files: FakePullFile[],
  extra: { labels?: string[]; headRepo?: string } = {},
): void {
  fake.state.pulls.set(number, {
    number,
    baseSha: BASE,
    headSha: HEAD,
    baseRef: 'main',
    headRef: 'feature',
    labels: extra.labels ?? [],
    headRepo: extra.headRepo ?? `${OWNER}/${REPO}`,
    files,
  });
}
