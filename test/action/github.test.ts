import { beforeEach, describe, expect, test } from 'vitest';
import {
  ApiError,
  createGitHubClient,
  isNotFoundError,
  isPermissionError,
  isReadOnlyQuery,
} from '../../src/adapters/github-rest.js';
import { ContentTooLargeError, MAX_CONFIG_BYTES } from '../../src/adapters/content-limit.js';
import { publishComment } from '../../src/action/report-comment.js';
import {
  COMMENT_BODY_LIMIT,
  connectionReset,
  hang,
  primaryRateLimit,
  secondaryRateLimit,
  serverError,
  statusFault,
  tree,
} from '../support/fake-github.js';
import {
  addPull,
  BASE,
  client,
  fake,
  HEAD,
  logs,
  OWNER,
  REPO,
  useFakeGitHub,
} from './github-fixture.js';

// The REST adapter against the loopback GitHub (github-fixture.ts). Its file list at GitHub's
// 3,000-file cap is in github.slow.test.ts (`npm run test:full`).

const MARKER = '<!-- context-reach:report -->';

useFakeGitHub();

function addComment(issueNumber: number, body: string, user = fake.state.tokenUser): number {
  const id = fake.state.nextCommentId;
  fake.state.nextCommentId += 1;
  fake.state.comments.push({
    id,
    issueNumber,
    body,
    user,
    createdAt: '2024-01-01T00:00:00Z',
    updatedAt: '2024-01-01T00:00:00Z',
  });
  return id;
}

describe('listPullRequestFiles(owner, repo, number)', () => {
  test('pages through 250 files, 100 a page, following the Link header', async () => {
    addPull(
      7,
      Array.from({ length: 250 }, (_, i) => ({
        filename: `models/m${i}/config.json`,
        status: 'modified' as const,
      })),
    );
    const { files, truncated } = await client().listPullRequestFiles(OWNER, REPO, 7);
    expect(files).toHaveLength(250);
    expect(files[249]).toEqual({
      status: 'modified',
      path: 'models/m249/config.json',
      previousPath: null,
    });
    expect(truncated).toBe(false);
    expect(fake.calls('pulls/list-files').map((call) => call.query)).toEqual([
      '?per_page=100',
      '?per_page=100&page=2',
      '?per_page=100&page=3',
    ]);
  });

  test('maps every status of the REST description onto added, modified, renamed, deleted', async () => {
    addPull(8, [
      { filename: 'a.json', status: 'added' },
      { filename: 'b.json', status: 'removed' },
      { filename: 'c.json', status: 'modified' },
      { filename: 'd/new.json', status: 'renamed', previous_filename: 'd/old.json' },
      { filename: 'e.json', status: 'copied' },
      { filename: 'f.json', status: 'changed' },
      { filename: 'g.json', status: 'unchanged' },
    ]);
    const { files } = await client().listPullRequestFiles(OWNER, REPO, 8);
    expect(files).toEqual([
      { status: 'added', path: 'a.json', previousPath: null },
      { status: 'deleted', path: 'b.json', previousPath: null },
      { status: 'modified', path: 'c.json', previousPath: null },
      { status: 'renamed', path: 'd/new.json', previousPath: 'd/old.json' },
      { status: 'added', path: 'e.json', previousPath: null },
      { status: 'modified', path: 'f.json', previousPath: null },
      { status: 'modified', path: 'g.json', previousPath: null },
    ]);
  });
});

describe('retries and rate limits', () => {
  test('500, 502 and 503 answers are retried until the call succeeds', async () => {
    addPull(7, []);
    fake.fail('pulls/get', serverError(500), serverError(502), serverError(503));
    const pull = await client().getPullRequest(OWNER, REPO, 7);
    expect(pull.headSha).toBe(HEAD);
    expect(fake.calls('pulls/get').map((call) => call.status)).toEqual([500, 502, 503, 200]);
  });

  test('gives up with ApiError after the configured retries', async () => {
    addPull(7, []);
    fake.fail('pulls/get', serverError(502), serverError(502), serverError(502));
    const error = await client({ retries: 2 })
      .getPullRequest(OWNER, REPO, 7)
      .catch((e: unknown) => e);
    expect(error).toBeInstanceOf(ApiError);
    expect((error as ApiError).status).toBe(502);
    expect(fake.calls('pulls/get')).toHaveLength(3);
  });

  test('a connection reset mid-run is retried', async () => {
    addPull(7, [{ filename: 'x.json', status: 'added' }]);
    fake.fail('pulls/list-files', connectionReset());
    const { files } = await client().listPullRequestFiles(OWNER, REPO, 7);
    expect(files).toHaveLength(1);
    expect(fake.calls('pulls/list-files').map((call) => call.status)).toEqual(['reset', 200]);
  });

  test('a request that never gets an answer times out and is retried', async () => {
    addPull(7, []);
    fake.fail('pulls/get', hang());
    const pull = await client({ requestTimeoutMs: 200 }).getPullRequest(OWNER, REPO, 7);
    expect(pull.number).toBe(7);
    expect(fake.calls('pulls/get').map((call) => call.status)).toEqual(['hang', 200]);
  });

  test('a secondary rate limit is waited out for the retry-after it names', async () => {
    addPull(7, []);
    fake.fail('pulls/get', secondaryRateLimit(3));
    const started = performance.now();
    // 40 ms per second: the 3 s wait becomes 120 ms, long enough to measure.
    const pull = await client({ msPerSecond: 40 }).getPullRequest(OWNER, REPO, 7);
    const elapsed = performance.now() - started;
    expect(pull.number).toBe(7);
    // Timers fire no earlier than asked; 5 ms of slack for clock granularity.
    expect(elapsed).toBeGreaterThanOrEqual(115);
    expect(fake.calls('pulls/get').map((call) => call.status)).toEqual([403, 200]);
    expect(
      logs.some((line) => line.includes('secondary rate limit') && line.includes('waiting 3 s')),
    ).toBe(true);
  });

  test('a wait longer than the bound is not honoured: the call fails as a rate limit, not a permission error', async () => {
    addPull(7, []);
    fake.fail('pulls/get', secondaryRateLimit(600));
    const error = await client({ maxRateLimitWaitSeconds: 60 })
      .getPullRequest(OWNER, REPO, 7)
      .catch((e: unknown) => e);
    expect(error).toBeInstanceOf(ApiError);
    expect((error as ApiError).status).toBe(403);
    expect(isPermissionError(error)).toBe(false);
    expect(fake.calls('pulls/get')).toHaveLength(1);
  });

  test('rate-limit retries are bounded', async () => {
    addPull(7, []);
    fake.fail('pulls/get', secondaryRateLimit(1), secondaryRateLimit(1), secondaryRateLimit(1));
    const error = await client({ rateLimitRetries: 2 })
      .getPullRequest(OWNER, REPO, 7)
      .catch((e: unknown) => e);
    expect((error as ApiError).status).toBe(403);
    expect(fake.calls('pulls/get')).toHaveLength(3);
  });

  test('an exhausted primary rate limit is waited out until its reset time', async () => {
    addPull(7, []);
    fake.fail('pulls/get', primaryRateLimit(Math.floor(Date.now() / 1000) + 2));
    const pull = await client().getPullRequest(OWNER, REPO, 7);
    expect(pull.number).toBe(7);
    expect(fake.calls('pulls/get').map((call) => call.status)).toEqual([403, 200]);
    expect(logs.some((line) => /rate limit on GET .*waiting \d+ s/.test(line))).toBe(true);
  });
});

describe('getFileContent(owner, repo, path, ref)', () => {
  const big = new Uint8Array(2 * 1024 * 1024).map((_, i) => 32 + (i % 90));

  beforeEach(() => {
    fake.state.trees.set(
      HEAD,
      tree({
        'models/a b/ü#1?.json': '{"hidden_size": 64}',
        'models/empty.json': '',
        'models/large.json': big,
        'models/huge.json': new Uint8Array(MAX_CONFIG_BYTES + 1),
        'models/inside-link.json': { type: 'symlink', target: 'a b/ü#1?.json' },
        'models/outside-link.json': { type: 'symlink', target: '../../../etc/passwd' },
        'vendor/sub': { type: 'submodule', url: 'https://example.invalid/sub.git' },
      }),
    );
  });

  test('reads a file whose path has spaces, "#", "?" and non-ASCII letters', async () => {
    const bytes = await client().getFileContent(OWNER, REPO, 'models/a b/ü#1?.json', HEAD);
    expect(new TextDecoder().decode(bytes as Uint8Array)).toBe('{"hidden_size": 64}');
  });

  test('returns null for a 404: absent path or unknown commit', async () => {
    expect(await client().getFileContent(OWNER, REPO, 'models/none.json', HEAD)).toBeNull();
    expect(await client().getFileContent(OWNER, REPO, 'models/a b/ü#1?.json', BASE)).toBeNull();
  });

  test('returns null for a directory, a submodule and either kind of symlink', async () => {
    expect(await client().getFileContent(OWNER, REPO, 'models', HEAD)).toBeNull();
    expect(await client().getFileContent(OWNER, REPO, 'vendor/sub', HEAD)).toBeNull();
    // GitHub resolves a link to a file inside the repository and answers with the target file.
    expect(await client().getFileContent(OWNER, REPO, 'models/inside-link.json', HEAD)).toBeNull();
    expect(await client().getFileContent(OWNER, REPO, 'models/outside-link.json', HEAD)).toBeNull();
  });

  test('reads an empty file as zero bytes', async () => {
    expect(
      (await client().getFileContent(OWNER, REPO, 'models/empty.json', HEAD))?.byteLength,
    ).toBe(0);
  });

  test('reads a file past the inline limit through the raw media type, byte for byte', async () => {
    const bytes = await client().getFileContent(OWNER, REPO, 'models/large.json', HEAD);
    expect(Buffer.from(bytes as Uint8Array).equals(Buffer.from(big))).toBe(true);
    expect(fake.calls('repos/get-content')).toHaveLength(2);
  });

  test('refuses a file one byte past MAX_CONFIG_BYTES without downloading it', async () => {
    const error = await client()
      .getFileContent(OWNER, REPO, 'models/huge.json', HEAD)
      .catch((e: unknown) => e);
    expect(error).toBeInstanceOf(ContentTooLargeError);
    expect((error as ContentTooLargeError).size).toBe(4 * 1024 * 1024 + 1);
    expect(fake.calls('repos/get-content')).toHaveLength(1);
  });
});

describe('comments', () => {
  test('writes are spaced as GitHub asks, scaled by msPerSecond: 1 s between writes, 3 s before one that notifies', async () => {
    // GitHub's REST guidance (best practices for integrators, common practice): a second between
    // mutative requests; the throttling plugin waits 3 s before a write that notifies people.
    const unit = 200;
    const api = client({ msPerSecond: unit });
    const first = await api.createComment(OWNER, REPO, 7, 'one');
    await api.createComment(OWNER, REPO, 7, 'two');
    await api.updateComment(OWNER, REPO, first.id, 'one, edited');
    const at = fake.requests
      .filter((r) => r.method === 'POST' || r.method === 'PATCH')
      .map((r) => r.at);
    expect(at).toHaveLength(3);
    // The spacing holds between the times the client lets the writes go (a write's slot comes
    // before its notification wait, so the update's slot is two units after the first write's);
    // the fake sees each request later by however long it took to arrive: the bounds leave half a
    // unit for that.
    expect(at[1]! - at[0]!).toBeGreaterThanOrEqual(2.5 * unit);
    expect(at[2]! - at[0]!).toBeGreaterThanOrEqual(1.5 * unit);
  });

  test('a GraphQL query that only reads is not spaced like a write; the writes around it still are', async () => {
    // GitHub counts a GraphQL query without mutations like a GET (REST documentation, "Rate limits
    // for the REST API", "Calculating points for the secondary rate limit": 1 point; a mutation or
    // a POST, PATCH, PUT or DELETE, 5); the throttling plugin spaces every /graphql request.
    const unit = 200;
    const api = client({ msPerSecond: unit });
    await api.createComment(OWNER, REPO, 7, 'one');
    // The installation token cannot read /user: the identity comes from the GraphQL viewer.
    expect(await api.identity()).toBe(fake.state.tokenUser.login);
    await api.createComment(OWNER, REPO, 7, 'two');
    const posts = fake.requests.filter((r) => r.method === 'POST' && r.path !== '/graphql');
    const query = fake.requests.filter((r) => r.path === '/graphql');
    expect(posts).toHaveLength(2);
    expect(query).toHaveLength(1);
    expect(query[0]!.at - posts[0]!.at).toBeLessThan(0.5 * unit);
    expect(posts[1]!.at - posts[0]!.at).toBeGreaterThanOrEqual(2.5 * unit);
  });

  test('isReadOnlyQuery(…) takes a query or a bare selection set, and nothing that names a mutation or subscription', () => {
    // GraphQL specification, "Operations": an operation is a query, a mutation or a subscription,
    // and a document of one bare selection set is a query.
    expect(isReadOnlyQuery('query { viewer { login } }')).toBe(true);
    expect(isReadOnlyQuery('  { viewer { login } }')).toBe(true);
    expect(isReadOnlyQuery('query($owner: String!) { repository(owner: $owner) { id } }')).toBe(
      true,
    );
    expect(isReadOnlyQuery('mutation { addComment(input: {}) { clientMutationId } }')).toBe(false);
    expect(isReadOnlyQuery('subscription { x }')).toBe(false);
    expect(isReadOnlyQuery('query { a } mutation { b }')).toBe(false);
    expect(isReadOnlyQuery('query Mutation { viewer { login } }')).toBe(false);
    expect(isReadOnlyQuery('queryx { a }')).toBe(false);
  });

  test('findComment(…) takes the oldest bot comment that starts with the marker', async () => {
    const person = { login: 'someone', type: 'User' as const, id: 5 };
    addComment(7, `${MARKER}\nfake report by a person`, person);
    addComment(7, `quoting ${MARKER} later in the body`);
    const ours = addComment(7, `${MARKER}\nreport`);
    addComment(7, `${MARKER}\nsecond copy`);
    addComment(8, `${MARKER}\nother pull request`);
    const found = await client().findComment(OWNER, REPO, 7, MARKER);
    expect(found?.id).toBe(ours);
    expect(found?.author).toBe('github-actions[bot]');
  });

  test('findComment(…) pages through long threads', async () => {
    for (let i = 0; i < 150; i += 1)
      addComment(7, `chatter ${i}`, { login: 'someone', type: 'User', id: 5 });
    const ours = addComment(7, `${MARKER}\nreport`);
    expect((await client().findComment(OWNER, REPO, 7, MARKER))?.id).toBe(ours);
    expect(fake.calls('issues/list-comments')).toHaveLength(2);
  });

  test('findComment(…) with commentAuthor takes only that login', async () => {
    addComment(7, `${MARKER}\nbot`);
    const mine = addComment(7, `${MARKER}\nmine`, { login: 'release-robot', type: 'User', id: 9 });
    expect(
      (await client({ commentAuthor: 'release-robot' }).findComment(OWNER, REPO, 7, MARKER))?.id,
    ).toBe(mine);
  });

  test('findComment(…) is null when no comment carries the marker', async () => {
    addComment(7, 'nothing here');
    expect(await client().findComment(OWNER, REPO, 7, MARKER)).toBeNull();
  });

  test('publishComment(…) five times leaves exactly one comment, edited in place', async () => {
    addPull(7, []);
    const actions: string[] = [];
    for (let run = 1; run <= 5; run += 1) {
      const { action, comment } = await publishComment(client(), {
        owner: OWNER,
        repo: REPO,
        issueNumber: 7,
        marker: MARKER,
        body: `${MARKER}\nrun ${run}`,
      });
      actions.push(action);
      expect(comment.url).toContain(`#issuecomment-${comment.id}`);
    }
    expect(actions).toEqual(['created', 'updated', 'updated', 'updated', 'updated']);
    expect(fake.state.comments).toHaveLength(1);
    expect(fake.state.comments[0]?.body).toBe(`${MARKER}\nrun 5`);
  });

  test('publishComment(…) creates a new comment when the old one is gone (404 on update)', async () => {
    const old = addComment(7, `${MARKER}\nold`);
    fake.fail('issues/update-comment', {
      ...statusFault(404, 'Not Found'),
      effect: (state) => {
        state.comments = state.comments.filter((c) => c.id !== old);
      },
    });
    const { action } = await publishComment(client(), {
      owner: OWNER,
      repo: REPO,
      issueNumber: 7,
      marker: MARKER,
      body: `${MARKER}\nnew`,
    });
    expect(action).toBe('created');
    expect(fake.state.comments.map((c) => c.body)).toEqual([`${MARKER}\nnew`]);
  });

  test('publishComment(…) on a 422 creates a new comment only when a fresh read finds the old one gone', async () => {
    const old = addComment(7, `${MARKER}\nold`);
    fake.fail('issues/update-comment', {
      ...statusFault(422, 'Validation Failed'),
      effect: (state) => {
        state.comments = state.comments.filter((c) => c.id !== old);
      },
    });
    expect(
      (
        await publishComment(client(), {
          owner: OWNER,
          repo: REPO,
          issueNumber: 7,
          marker: MARKER,
          body: `${MARKER}\nnew`,
        })
      ).action,
    ).toBe('created');
    expect(fake.state.comments).toHaveLength(1);

    fake.fail('issues/update-comment', statusFault(422, 'Validation Failed'));
    const error = await publishComment(client(), {
      owner: OWNER,
      repo: REPO,
      issueNumber: 7,
      marker: MARKER,
      body: `${MARKER}\nagain`,
    }).catch((e: unknown) => e);
    expect((error as ApiError).status).toBe(422);
    expect(fake.state.comments).toHaveLength(1);
  });

  test("a body past GitHub's 65,536-character limit is refused with 422", async () => {
    const error = await client()
      .createComment(OWNER, REPO, 7, 'x'.repeat(COMMENT_BODY_LIMIT + 1))
      .catch((e: unknown) => e);
    expect((error as ApiError).status).toBe(422);
    expect(fake.state.comments).toHaveLength(0);
  });

  test("a read-only token's 403 on create and update is a permission error, and the token is in no message", async () => {
    const id = addComment(7, `${MARKER}\nold`);
    fake.state.readOnly = true;
    const created = await client()
      .createComment(OWNER, REPO, 7, 'x')
      .catch((e: unknown) => e);
    const updated = await client()
      .updateComment(OWNER, REPO, id, 'x')
      .catch((e: unknown) => e);
    for (const error of [created, updated]) {
      expect(error).toBeInstanceOf(ApiError);
      expect(isPermissionError(error)).toBe(true);
      expect(String((error as Error).message)).not.toContain(fake.state.token);
      expect(String((error as Error).stack)).not.toContain(fake.state.token);
    }
    // 403 is not retried: one request each.
    expect(fake.calls('issues/create-comment')).toHaveLength(1);
  });

  test('getComment(…) is null and updateComment(…) a not-found ApiError for a deleted comment', async () => {
    expect(await client().getComment(OWNER, REPO, 424242)).toBeNull();
    const error = await client()
      .updateComment(OWNER, REPO, 424242, 'x')
      .catch((e: unknown) => e);
    expect(isNotFoundError(error)).toBe(true);
  });
});

describe('getPullRequest(owner, repo, number)', () => {
  test('gives labels, base and head commits, and whether the head is a fork', async () => {
    addPull(7, [{ filename: 'a.json', status: 'added' }], { labels: ['context-waiver', 'infra'] });
    addPull(8, [], { headRepo: 'stranger/model-zoo' });
    expect(await client().getPullRequest(OWNER, REPO, 7)).toEqual({
      number: 7,
      baseSha: BASE,
      headSha: HEAD,
      labels: ['context-waiver', 'infra'],
      isFork: false,
      changedFiles: 1,
      state: 'open',
    });
    expect((await client().getPullRequest(OWNER, REPO, 8)).isFork).toBe(true);
  });

  test('a wrong token is a 401 ApiError that does not quote the token', async () => {
    addPull(7, []);
    const wrong = createGitHubClient('ghs_wrongTokenValue000', {
      baseUrl: fake.url,
      log: { debug: () => {}, info: () => {}, warn: () => {} },
      msPerSecond: 1,
    });
    const error = await wrong.getPullRequest(OWNER, REPO, 7).catch((e: unknown) => e);
    expect((error as ApiError).status).toBe(401);
    expect((error as Error).message).not.toContain('ghs_wrongTokenValue000');
    fake.requests.length = 0;
  });
});

describe("the fake server checks requests against GitHub's REST description", () => {
  test('a body the description forbids and a route it does not have are both recorded', async () => {
    const headers = {
      authorization: `token ${fake.state.token}`,
      'content-type': 'application/json',
    };
    await fetch(`${fake.url}/repos/${OWNER}/${REPO}/issues/7/comments`, {
      method: 'POST',
      headers,
      body: JSON.stringify({ text: 'x' }),
    });
    await fetch(`${fake.url}/repos/${OWNER}/${REPO}/no-such-thing`, { headers });
    await fetch(`${fake.url}/repos/${OWNER}/${REPO}/pulls/7/files?per_page=many&colour=red`, {
      headers,
    });
    const problems = fake.mismatches.map((mismatch) => mismatch.problem);
    expect(
      problems.some(
        (problem) =>
          problem.includes('request body of issues/create-comment') &&
          problem.includes("must have required property 'body'"),
      ),
    ).toBe(true);
    expect(problems.some((problem) => problem.includes('matches no operation'))).toBe(true);
    expect(
      problems.some(
        (problem) => problem.includes('per_page="many"') && problem.includes('must be integer'),
      ),
    ).toBe(true);
    expect(problems.some((problem) => problem.includes('query parameter colour'))).toBe(true);
    // Checked: clear them so the shared after-each check covers only the adapter's requests.
    fake.mismatches.length = 0;
    fake.responseMismatches.length = 0;
  });
});
