/**
 * The loopback GitHub and the clients the API content-source tests share (api-contents.test.ts,
 * and api-contents.slow.test.ts for the very large pull requests).
 */
import { afterEach, beforeEach, expect } from 'vitest';
import {
  createGitHubClient,
  type GitHubClient,
  type GraphqlAnswer,
} from '../../src/adapters/github-rest.js';
import { createApiContentSource } from '../../src/adapters/graphql-contents.js';
import type { ContentRequest } from '../../src/core/gate.js';
import { startFakeGitHub, type FakeGitHub } from '../support/fake-github.js';

export const OWNER = 'example-org';
export const REPO = 'model-zoo';
export const BASE = 'a'.repeat(40);
export const HEAD = 'b'.repeat(40);
export const encode = (text: string) => new TextEncoder().encode(text);

export let fake: FakeGitHub;
export let warnings: string[];

/** Each test gets a fresh loopback GitHub, checked against GitHub's descriptions when it ends. */
export function useApiFake(): void {
  beforeEach(async () => {
    fake = await startFakeGitHub({ owner: OWNER, repo: REPO });
    warnings = [];
  });
  afterEach(async () => {
    expect(fake.mismatches).toEqual([]);
    expect(fake.responseMismatches).toEqual([]);
    expect(fake.unhandled).toEqual([]);
    await fake.close();
  });
}

export function client(): GitHubClient {
  return createGitHubClient(fake.state.token, {
    baseUrl: fake.url,
    log: { debug: () => {}, info: () => {}, warn: (m) => warnings.push(m) },
    msPerSecond: 1,
  });
}

/**
 * The real client, but GraphQL posted straight to the fake: Octokit's throttling plugin spaces
 * GraphQL requests a second apart (as it does writes), which would make 100 queries take 100 s
 * here. What is counted is the same: every request reaches the fake and is logged there.
 */
export function unspacedClient(queries: string[] = []): GitHubClient {
  return {
    ...client(),
    async graphql(query, variables, maxBytes): Promise<GraphqlAnswer> {
      queries.push(query);
      const response = await fetch(`${fake.url}/graphql`, {
        method: 'POST',
        headers: {
          authorization: `token ${fake.state.token}`,
          'content-type': 'application/json',
        },
        body: JSON.stringify({ query, variables }),
      });
      const text = await response.text();
      if (!response.ok || text.length > maxBytes) throw new Error(`GraphQL ${response.status}`);
      return JSON.parse(text) as GraphqlAnswer;
    },
  };
}

export const source = (api: GitHubClient) =>
  createApiContentSource(api, { owner: OWNER, repo: REPO, warn: (m) => warnings.push(m) });

/** What the REST contents API alone gives for each request (the path the action took before). */
export async function restAlone(
  requests: ContentRequest[],
): Promise<(Uint8Array | null | string)[]> {
  const api = client();
  return Promise.all(
    requests.map((r) =>
      api.getFileContent(OWNER, REPO, r.path, r.ref).catch((e: unknown) => (e as Error).name),
    ),
  );
}

export const shown = (answers: (Uint8Array | null | Error | string)[]) =>
  answers.map((a) =>
    a instanceof Uint8Array ? Buffer.from(a).toString('hex') : a instanceof Error ? a.name : a,
  );
