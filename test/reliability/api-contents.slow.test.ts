import { describe, expect, it } from 'vitest';
import type { FakeEntry } from '../support/fake-github.js';
import type { ContentRequest } from '../../src/core/gate.js';
import { checkpointConfig } from '../support/scenario-repo.js';
import {
  BASE,
  client,
  encode,
  fake,
  HEAD,
  source,
  unspacedClient,
  useApiFake,
} from './api-contents-fixture.js';

// Issue 13's read cost on very large pull requests (see api-contents.test.ts for the rest).

useApiFake();

describe('a very large pull request through the API', () => {
  it('5,000 changed configs (10,000 versions) in at most 110 requests, every byte as committed', async () => {
    const base = new Map<string, FakeEntry>();
    const head = new Map<string, FakeEntry>();
    const requests: ContentRequest[] = [];
    for (let i = 0; i < 5000; i += 1) {
      const path = `models/m${String(i).padStart(4, '0')}/config.json`;
      base.set(path, { type: 'file', bytes: encode(checkpointConfig({ vocab_size: 32000 + i })) });
      head.set(path, {
        type: 'file',
        bytes: encode(checkpointConfig({ vocab_size: 32000 + i, max_position_embeddings: 8192 })),
      });
      requests.push({ ref: HEAD, path }, { ref: BASE, path });
    }
    // Unrelated files in the trees, as a real repository has.
    for (let i = 0; i < 2000; i += 1)
      head.set(`docs/n${i}.md`, { type: 'file', bytes: encode('x') });
    fake.state.trees.set(BASE, base);
    fake.state.trees.set(HEAD, head);

    const queries: string[] = [];
    const started = performance.now();
    const answers = await source(unspacedClient(queries)).readMany(requests);
    const elapsed = performance.now() - started;

    answers.forEach((answer, i) => {
      const { ref, path } = requests[i]!;
      const want = (fake.state.trees.get(ref)!.get(path) as { bytes: Uint8Array }).bytes;
      expect(Buffer.from(answer as Uint8Array).equals(Buffer.from(want)), path).toBe(true);
    });
    const byOperation = (id: string) => fake.calls(id).length;
    expect(byOperation('git/get-tree')).toBe(2);
    expect(byOperation('repos/get-content')).toBe(0);
    expect(byOperation('graphql')).toBe(100);
    expect(fake.requests.length).toBeLessThanOrEqual(110);
    // Nothing from a path is in a query's text: only generated aliases and variables.
    for (const query of queries) {
      expect(query).not.toMatch(/models\/|config\.json/);
      for (const alias of query.matchAll(/(\w+): object\(/g)) expect(alias[1]).toMatch(/^b\d+$/);
    }
    console.log(
      `api contents: 5,000 changed configs, 10,000 versions: ${fake.requests.length} requests (${byOperation('git/get-tree')} trees, ${byOperation('graphql')} GraphQL queries, ${byOperation('repos/get-content')} contents reads) in ${elapsed.toFixed(0)} ms without GraphQL's 1 s spacing`,
    );
  }, 120_000);

  it('before: one contents request per version (counted on 500 versions: a client without GraphQL still reads so)', async () => {
    const files = new Map<string, FakeEntry>();
    const requests: ContentRequest[] = [];
    for (let i = 0; i < 500; i += 1) {
      const path = `models/m${i}/config.json`;
      files.set(path, { type: 'file', bytes: encode(checkpointConfig()) });
      requests.push({ ref: HEAD, path });
    }
    fake.state.trees.set(HEAD, files);
    // A client without GraphQL is read the old way: one contents request per version.
    const restOnly = { ...client(), graphql: undefined, readTree: undefined };
    await source(restOnly).readMany(requests);
    expect(fake.calls('repos/get-content')).toHaveLength(500);
    expect(fake.calls('graphql')).toHaveLength(0);
  });
});
