import { afterEach, describe, expect, it } from 'vitest';
import { publishComment } from '../../src/action/report-comment.js';
import { createGitHubClient } from '../../src/adapters/github-rest.js';
import { COMMENT_MARKER } from '../../src/core/render/notice.js';
import {
  runScenario,
  type ScenarioOptions,
  type ScenarioResult,
} from '../support/action-harness.js';
import { startFakeGitHub, type FakeGitHub } from '../support/fake-github.js';
import { checkpointConfig } from '../support/scenario-repo.js';

// Round two of the living comment (issue 13, points 5 to 7): it is recognised by the identity the
// token authenticates as (GET /user for a person's token; GraphQL `viewer` for an installation
// token, which GET /user refuses), never by "some bot wrote it", and runs at the same time
// converge on one comment.

const MODEL = 'models/a/config.json';
const BLOCKING = {
  base: { [MODEL]: checkpointConfig() },
  head: { [MODEL]: checkpointConfig({ max_position_embeddings: 16384 }) },
};
const PASSING = {
  base: { [MODEL]: checkpointConfig() },
  head: { [MODEL]: checkpointConfig({ rope_theta: 10000 }) },
};

const fakes: FakeGitHub[] = [];
afterEach(async () => {
  for (const fake of new Set(fakes.splice(0))) {
    expect(fake.mismatches).toEqual([]);
    expect(fake.unhandled).toEqual([]);
    await fake.close();
  }
});

async function scenario(options: Partial<ScenarioOptions> = {}): Promise<ScenarioResult> {
  const result = await runScenario({ ...BLOCKING, ...options });
  fakes.push(result.fake);
  return result;
}

const marked = (fake: FakeGitHub) =>
  fake.state.comments.filter((c) => c.body.startsWith(COMMENT_MARKER));

describe("the comment is recognised by the token's own identity", () => {
  it("a person's token (GET /user answers): three runs keep exactly one comment (point 5)", async () => {
    const fake = await startFakeGitHub({
      tokenUser: { login: 'dana-example', type: 'User', id: 501 },
    });
    for (let run = 0; run < 3; run += 1) {
      const result = await scenario({ fake });
      expect(result.error).toBeNull();
    }
    expect(marked(fake)).toHaveLength(1);
    expect(fake.calls('issues/create-comment')).toHaveLength(1);
    expect(fake.calls('users/get-authenticated').every((c) => c.status === 200)).toBe(true);
  });

  it('an installation token (GET /user refuses with 403): the GraphQL viewer names the bot, re-runs edit in place', async () => {
    const fake = await startFakeGitHub();
    await scenario({ fake });
    await scenario({ fake });
    expect(marked(fake)).toHaveLength(1);
    expect(fake.calls('users/get-authenticated').map((c) => c.status)).toContain(403);
    expect(fake.calls('graphql').length).toBeGreaterThan(0);
  });

  it("another bot's comment with the marker is never edited (point 6)", async () => {
    const fake = await startFakeGitHub();
    const other = {
      id: 1,
      issueNumber: 7,
      body: `${COMMENT_MARKER}\nanother integration's text`,
      user: { login: 'other-app[bot]', type: 'Bot' as const, id: 99 },
      createdAt: '2024-01-01T00:00:00Z',
      updatedAt: '2024-01-01T00:00:00Z',
    };
    fake.state.comments.push(other);
    const result = await scenario({ fake });
    expect(result.error).toBeNull();
    expect(fake.state.comments.find((c) => c.id === 1)!.body).toBe(other.body);
    expect(fake.calls('issues/update-comment')).toHaveLength(0);
    expect(marked(fake).filter((c) => c.user.login === 'github-actions[bot]')).toHaveLength(1);
    expect(result.out.log.some((l) => /Pull requests from forks/.test(l.message))).toBe(false);
  });
});

describe('reads the publishing needs are asked for early (issue 16)', () => {
  it('the identity, the comment look-up and our review comments before the first write, the patches before the comment is written; still one comment and the review, each read asked once', async () => {
    // Each is a read: asked for while git reads the changes and the gate computes, so no write
    // waits on it. The look-up's first page goes out with the identity, not after it. The outcome
    // is what asking late gave: one comment, the suggestions planned.
    const fake = await startFakeGitHub();
    for (let run = 0; run < 2; run += 1) {
      const result = await scenario({ fake });
      expect(result.error).toBeNull();
      expect(result.out.outputs.verdict).toBe('block');
    }
    expect(marked(fake)).toHaveLength(1);
    const first = (operation: string) => fake.calls(operation)[0]!.at;
    expect(first('graphql')).toBeLessThan(first('issues/create-comment'));
    expect(first('issues/list-comments')).toBeLessThan(first('issues/create-comment'));
    expect(first('pulls/list-review-comments')).toBeLessThan(first('issues/create-comment'));
    expect(first('pulls/list-files')).toBeLessThan(first('issues/create-comment'));
    // Two runs, each listing the patches once and asking the identity of its own client once,
    // looking for the comment once before its write and once after it, and listing the review
    // comments once: asking early adds no request.
    expect(fake.calls('pulls/list-files')).toHaveLength(2);
    expect(fake.calls('graphql')).toHaveLength(2);
    expect(fake.calls('issues/list-comments')).toHaveLength(4);
    expect(fake.calls('pulls/list-review-comments')).toHaveLength(2);
  });
});

describe('runs at the same time converge on one comment (point 7)', () => {
  it('two runs that each created a comment ("Passes" and "Blocked"): the next write keeps the oldest and deletes the other', async () => {
    const fake = await startFakeGitHub();
    const bot = fake.state.tokenUser;
    // What two simultaneous first runs leave: both found nothing and both created.
    fake.state.comments.push(
      {
        id: 10,
        issueNumber: 7,
        body: `${COMMENT_MARKER}\n🟢 **Passes**`,
        user: bot,
        createdAt: '2024-01-01T00:00:00Z',
        updatedAt: '2024-01-01T00:00:00Z',
      },
      {
        id: 11,
        issueNumber: 7,
        body: `${COMMENT_MARKER}\n🔴 **Blocked**`,
        user: bot,
        createdAt: '2024-01-01T00:00:01Z',
        updatedAt: '2024-01-01T00:00:01Z',
      },
    );
    const result = await scenario({ fake });
    expect(result.error).toBeNull();
    expect(marked(fake).map((c) => c.id)).toEqual([10]);
    expect(marked(fake)[0]!.body).toContain('**Blocked**');
    expect(marked(fake)[0]!.body).not.toContain('**Passes**');
    expect(fake.calls('issues/delete-comment')).toHaveLength(1);
  });

  it('two writers racing through publishComment with different verdicts leave one comment', async () => {
    const fake = await startFakeGitHub({ owner: 'example-org', repo: 'model-zoo' });
    fakes.push(fake);
    const client = () =>
      createGitHubClient(fake.state.token, {
        baseUrl: fake.url,
        log: { debug: () => {}, info: () => {}, warn: () => {} },
        msPerSecond: 1,
      });
    const target = (body: string) => ({
      owner: 'example-org',
      repo: 'model-zoo',
      issueNumber: 7,
      marker: COMMENT_MARKER,
      body: `${COMMENT_MARKER}\n${body}`,
    });
    const [a, b] = await Promise.all([
      publishComment(client(), target('🟢 **Passes**')),
      publishComment(client(), target('🔴 **Blocked**')),
    ]);
    expect(marked(fake)).toHaveLength(1);
    expect([a.comment.id, b.comment.id]).toEqual([marked(fake)[0]!.id, marked(fake)[0]!.id]);
  });

  it('a duplicate that cannot be deleted loses the marker and points to the one kept', async () => {
    const fake = await startFakeGitHub();
    const bot = fake.state.tokenUser;
    fake.state.comments.push(
      {
        id: 10,
        issueNumber: 7,
        body: `${COMMENT_MARKER}\nold`,
        user: bot,
        createdAt: '2024-01-01T00:00:00Z',
        updatedAt: '2024-01-01T00:00:00Z',
      },
      {
        id: 11,
        issueNumber: 7,
        body: `${COMMENT_MARKER}\nolder twin`,
        user: bot,
        createdAt: '2024-01-01T00:00:01Z',
        updatedAt: '2024-01-01T00:00:01Z',
      },
    );
    const result = await scenario({
      fake,
      ...PASSING,
      prepare: (f) =>
        f.fail('issues/delete-comment', {
          kind: 'status',
          status: 403,
          body: { message: 'Must have admin rights to Repository.' },
        }),
    });
    expect(result.error).toBeNull();
    expect(marked(fake).map((c) => c.id)).toEqual([10]);
    expect(fake.state.comments.find((c) => c.id === 11)!.body).toMatch(
      /replaced by \[the current context-reach report\]\(.*#issuecomment-10\)/,
    );
  });
});

describe('the README workflows set a concurrency group per pull request (point 7)', () => {
  it('every workflow in the README and .github/workflows has one', async () => {
    const { readFileSync } = await import('node:fs');
    const { parse } = await import('yaml');
    const root = new URL('../../', import.meta.url);
    const readme = readFileSync(new URL('README.md', root), 'utf8');
    const blocks = [...readme.matchAll(/```yaml\n([\s\S]*?)```/g)]
      .map((m) => m[1]!)
      .filter((text) => /^on:/m.test(text));
    const files = [
      '.github/workflows/context-reach.yml',
      '.github/workflows/context-reach-publish.yml',
    ].map((p) => readFileSync(new URL(p, root), 'utf8'));
    expect(blocks.length).toBeGreaterThanOrEqual(3);
    for (const text of [...blocks, ...files]) {
      const workflow = parse(text) as {
        on: Record<string, unknown>;
        concurrency?: { group?: string };
      };
      const group = workflow.concurrency?.group ?? '';
      if ('pull_request' in workflow.on)
        expect(group).toContain('${{ github.event.pull_request.number }}');
      else expect(group).toContain('github.event.workflow_run.pull_requests[0].number');
    }
  });
});
