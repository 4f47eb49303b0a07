import { execFileSync } from 'node:child_process';
import { describe, expect, it } from 'vitest';
import { ContentTooLargeError, MAX_CONFIG_BYTES } from '../../src/adapters/content-limit.js';
import { gitBlobId } from '../../src/adapters/graphql-contents.js';
import { COMMENT_MARKER } from '../../src/core/render/notice.js';
import { runScenario } from '../support/action-harness.js';
import { FAKE_BLOB_TEXT_LIMIT, serverError, tree, type FakeEntry } from '../support/fake-github.js';
import { checkpointConfig } from '../support/scenario-repo.js';
import {
  BASE,
  client,
  encode,
  fake,
  HEAD,
  OWNER,
  REPO,
  restAlone,
  shown,
  source,
  unspacedClient,
  useApiFake,
  warnings,
} from './api-contents-fixture.js';

// Issue 13's read cost: without local history the action read one contents request per file
// version, so 5,000 changed configs (10,000 versions) cost about 10,000 requests, past the
// 1,000 an hour a workflow's token may make. Now each commit's tree names every path's object
// (one request) and GraphQL reads the texts by object id, 100 a query; paths and ids are
// variables. A text is used only when it hashes to its git object id; anything else is read
// through the REST contents API, and nothing that failed becomes "absent". The loopback fake
// checks every REST request against GitHub's REST description and every GraphQL query against
// GitHub's published GraphQL schema (npm @octokit/graphql-schema), executed by npm `graphql`.
// The two very large pull requests (5,000 configs; 500 read the old way) are in
// api-contents.slow.test.ts (`npm run test:full`).

useApiFake();

describe("git's object id of a blob", () => {
  it('equals `git hash-object` (SHA-1) for text, a byte-order mark, CR LF, bytes not UTF-8 and nothing', () => {
    for (const bytes of [
      encode('{"hidden_size": 4096}\n'),
      encode('\uFEFF{"a": 1}\r\n'),
      new Uint8Array([0x7b, 0xff, 0xfe, 0x00, 0x7d]),
      new Uint8Array(0),
      encode('übergroß 模型 🚀\n'),
    ]) {
      // Reference: git itself, reading the same bytes from standard input.
      const fromGit = execFileSync('git', ['hash-object', '--stdin'], { input: bytes })
        .toString()
        .trim();
      expect(gitBlobId(bytes)).toBe(fromGit);
    }
  });

  it('equals `git hash-object` in a SHA-256 repository for 64-digit ids', () => {
    const bytes = encode('format: context-reach-model/1\n');
    const dir = execFileSync('mktemp', ['-d']).toString().trim();
    execFileSync('git', ['init', '-q', '--object-format=sha256', dir]);
    const fromGit = execFileSync('git', ['-C', dir, 'hash-object', '--stdin'], { input: bytes })
      .toString()
      .trim();
    execFileSync('rm', ['-rf', dir]);
    expect(fromGit).toHaveLength(64);
    expect(gitBlobId(bytes, 64)).toBe(fromGit);
  });
});

describe("a file list past GitHub's cap, completed from the trees and then read", () => {
  it("asks for each commit's tree once: the list and the contents share them (before: 4 tree requests)", async () => {
    // More changed configs than the GraphQL lookups take (2 × 100 paths), so the content source
    // looks the paths up in the same two trees the changed files were listed from.
    const base = new Map<string, FakeEntry>();
    const head = new Map<string, FakeEntry>();
    for (let i = 0; i < 250; i += 1) {
      const path = `models/m${i}/config.json`;
      base.set(path, { type: 'file', bytes: encode(checkpointConfig({ vocab_size: 32000 + i })) });
      head.set(path, {
        type: 'file',
        bytes: encode(checkpointConfig({ vocab_size: 32000 + i, max_position_embeddings: 8192 })),
      });
    }
    fake.state.trees.set(BASE, base);
    fake.state.trees.set(HEAD, head);
    const api = unspacedClient();
    const changes = await api.listChangesBetween(OWNER, REPO, BASE, HEAD);
    expect(changes).toHaveLength(250);
    expect(fake.calls('git/get-tree')).toHaveLength(2);
    const requests = changes.flatMap(({ path }) => [
      { ref: HEAD, path },
      { ref: BASE, path },
    ]);
    const answers = await source(api).readMany(requests);
    answers.forEach((answer, i) => {
      const { ref, path } = requests[i]!;
      const want = (fake.state.trees.get(ref)!.get(path) as { bytes: Uint8Array }).bytes;
      expect(Buffer.from(answer as Uint8Array).equals(Buffer.from(want)), path).toBe(true);
    });
    const trees = fake.calls('git/get-tree').map((call) => call.path);
    expect(trees.sort()).toEqual(
      [BASE, HEAD].map((sha) => `/repos/${OWNER}/${REPO}/git/trees/${sha}`),
    );
    expect(fake.calls('repos/get-content')).toHaveLength(0);
  });

  it('a tree read that fails is asked for again, not kept as the answer', async () => {
    fake.state.trees.set(BASE, tree({ 'a/config.json': '{}' }));
    fake.state.trees.set(HEAD, tree({ 'a/config.json': '{"x": 1}' }));
    const api = client();
    fake.fail('git/get-tree', serverError(404));
    await expect(api.readTree!(OWNER, REPO, HEAD)).rejects.toThrow();
    const again = await api.readTree!(OWNER, REPO, HEAD);
    expect([...again.entries.keys()].sort()).toEqual(['a/config.json']);
    expect(fake.calls('git/get-tree')).toHaveLength(2);
  });
});

describe('the texts are the committed bytes, whatever GraphQL does with them', () => {
  const big = encode(`{"pad": "${'x'.repeat(FAKE_BLOB_TEXT_LIMIT)}"}\n`);
  const entries: Record<string, string | Uint8Array | FakeEntry> = {
    'm/plain/config.json': checkpointConfig(),
    'm/copy/config.json': checkpointConfig(),
    'm/exec/config.json': checkpointConfig({ vocab_size: 7 }),
    'm/bom/config.json': `\uFEFF${checkpointConfig()}`,
    'm/crlf/config.json': checkpointConfig().replace(/\n/g, '\r\n'),
    'm/latin1/config.json': new Uint8Array([0x7b, 0x22, 0xe9, 0x22, 0x3a, 0x31, 0x7d]),
    'm/nul/config.json': new Uint8Array([0x7b, 0x00, 0x7d]),
    'm/empty/config.json': '',
    'm/cut/config.json': big,
    'm/huge/config.json': new Uint8Array(MAX_CONFIG_BYTES + 1).fill(0x20),
    'm/link/config.json': { type: 'symlink', target: '../plain/config.json' },
    'm/sub': { type: 'submodule', url: 'https://example.invalid/sub.git' },
    'm/dir/config.json/inner.json': '{}',
    'odd/"quoted" $var {x} #c/config.json': checkpointConfig(),
    'odd/") { viewer { login } } #/config.json': checkpointConfig(),
    'odd/line\nbreak/config.json': checkpointConfig(),
    'odd/ünï 模型/config.json': checkpointConfig(),
  };
  const paths = [...Object.keys(entries), 'm/dir/config.json', 'm/absent/config.json'];

  for (const [name, count] of [
    ['few paths (GraphQL looks them up)', 1],
    ['many paths (the trees name them)', 12],
  ] as const) {
    it(`${name}: the same answer as the REST contents API, file by file`, async () => {
      const base: typeof entries = {};
      for (let copy = 0; copy < count; copy += 1)
        for (const [path, entry] of Object.entries(entries))
          base[copy ? `c${copy}/${path}` : path] = entry;
      fake.state.trees.set(HEAD, tree(base));
      const requests = Object.keys(base)
        .concat(paths.slice(-2))
        .map((path) => ({ ref: HEAD, path }));
      const queries: string[] = [];
      const answers = await source(unspacedClient(queries)).readMany(requests);
      const viaRest = new Set(fake.calls('repos/get-content').map((c) => c.path));
      const readByRest = fake.calls('repos/get-content').length;
      expect(shown(answers)).toEqual(shown(await restAlone(requests)));
      const at = (path: string) => answers[requests.findIndex((r) => r.path === path)];
      expect(at('m/huge/config.json')).toBeInstanceOf(ContentTooLargeError);
      expect(at('m/link/config.json')).toBeNull();
      expect(at('m/dir/config.json')).toBeNull();
      expect(at('m/absent/config.json')).toBeNull();
      // GraphQL gave texts that are not the blob (a dropped byte-order mark, U+FFFD for a byte,
      // a cut text, none for binary bytes): those, and the large one, came through REST.
      for (const path of ['bom', 'latin1', 'nul', 'cut', 'huge'])
        expect(viaRest.has(`/repos/${OWNER}/${REPO}/contents/m/${path}/config.json`), path).toBe(
          true,
        );
      expect(viaRest.has(`/repos/${OWNER}/${REPO}/contents/m/plain/config.json`)).toBe(false);
      // Those five, each once (the huge one's metadata only), and nothing else.
      expect(readByRest).toBe(5 * count);
      for (const query of queries) {
        expect(query).not.toMatch(/quoted|viewer|break|模型/);
        for (const alias of query.matchAll(/(\w+): (?:object|file)\(/g))
          expect(alias[1]).toMatch(/^[bcf]\d+$/);
      }
      expect(fake.calls('git/get-tree')).toHaveLength(count > 1 ? 1 : 0);
    });
  }

  it('a symlink, a submodule and a directory exist (the gate fails closed on them); an absent path does not, asking nothing more', async () => {
    fake.state.trees.set(HEAD, tree(entries));
    const src = source(client());
    await src.readMany(paths.map((path) => ({ ref: HEAD, path })));
    const before = fake.requests.length;
    expect(await src.exists(HEAD, 'm/link/config.json')).toBe(true);
    expect(await src.exists(HEAD, 'm/dir/config.json')).toBe(true);
    expect(await src.exists(HEAD, 'm/absent/config.json')).toBe(false);
    expect(fake.requests.length).toBe(before);
    expect(await src.exists(HEAD, 'm/sub')).toBe(true);
  });
});

describe('fail closed: what failed is an error, never an absent file', () => {
  const files = {
    'm/a/config.json': checkpointConfig(),
    'm/b/config.json': checkpointConfig({ vocab_size: 9 }),
  };

  it('GraphQL failing on every try: the files come through REST, with one warning', async () => {
    fake.state.trees.set(HEAD, tree(files));
    fake.fail('graphql', serverError(502), serverError(502), serverError(502), serverError(502));
    const requests = Object.keys(files).map((path) => ({ ref: HEAD, path }));
    const answers = await source(client()).readMany(requests);
    expect(shown(answers)).toEqual(shown(await restAlone(requests)));
    expect(fake.calls('graphql').map((c) => c.status)).toEqual([502, 502, 502, 502]);
    expect(warnings.filter((w) => /GraphQL API failed .*status 502/.test(w))).toHaveLength(1);
  }, 30_000);

  it('a blob whose field fails, and whose REST read fails too: an error naming the file', async () => {
    fake.state.trees.set(HEAD, tree(files));
    fake.state.failingReads = new Set([`${HEAD}:m/a/config.json`]);
    const answers = await source(client()).readMany(
      Object.keys(files).map((path) => ({ ref: HEAD, path })),
    );
    expect(answers[0]).toBeInstanceOf(Error);
    expect((answers[0] as Error).message).toMatch(
      /read m\/a\/config\.json at b{40} failed with status 502/,
    );
    expect(answers[1]).toBeInstanceOf(Uint8Array);
  }, 30_000);

  it('a commit the API does not know: an error for each of its files (GraphQL lookup and tree alike)', async () => {
    fake.state.trees.set(HEAD, tree(files));
    const unknown = 'c'.repeat(40);
    const few = await source(client()).readMany([
      { ref: unknown, path: 'm/a/config.json' },
      { ref: HEAD, path: 'm/a/config.json' },
    ]);
    expect(few[0]).toBeInstanceOf(Error);
    expect((few[0] as Error).message).toMatch(/commit c{40} was not found/);
    expect(few[1]).toBeInstanceOf(Uint8Array);
    const many = await source(client()).readMany(
      Array.from({ length: 201 }, (_, i) => ({ ref: unknown, path: `m/${i}/config.json` })),
    );
    expect(
      many.every(
        (a) => a instanceof Error && /tree of c{40} failed with status 404/.test(a.message),
      ),
    ).toBe(true);
  }, 30_000);

  it('a tree GitHub cuts short: the paths are looked up through GraphQL instead', async () => {
    const many: Record<string, string> = {};
    for (let i = 0; i < 250; i += 1)
      many[`m/${i}/config.json`] = checkpointConfig({ vocab_size: i + 1 });
    fake.state.trees.set(HEAD, tree(many));
    fake.state.truncatedTrees = new Set([HEAD]);
    const requests = [...Object.keys(many), 'm/none/config.json'].map((path) => ({
      ref: HEAD,
      path,
    }));
    const answers = await source(unspacedClient()).readMany(requests);
    expect(fake.calls('git/get-tree')).toHaveLength(1);
    expect(answers.slice(0, 250).every((a) => a instanceof Uint8Array)).toBe(true);
    expect(answers[250]).toBeNull();
    expect(fake.calls('repos/get-content')).toHaveLength(0);
    // 251 lookups in 3 queries, 250 texts in 3.
    expect(fake.calls('graphql')).toHaveLength(6);
  });
});

describe('the action without history reads through trees and GraphQL', () => {
  it('a blocking change: verdict block as through git, no contents request for the configs', async () => {
    const model = 'models/a/config.json';
    const result = await runScenario({
      base: { [model]: checkpointConfig() },
      head: { [model]: checkpointConfig({ max_position_embeddings: 16384 }) },
      noHistory: true,
      inputs: { suggestions: 'off' },
    });
    try {
      expect(result.error).toBeNull();
      expect(result.out.outputs.verdict).toBe('block');
      const comments = result.fake.state.comments.filter((c) => c.body.startsWith(COMMENT_MARKER));
      expect(comments[0]!.body).toContain('span-grew-code-unchanged');
      // The policy is read with one contents request (absent here); the configs are not.
      expect(
        result.fake.calls('repos/get-content').filter((c) => c.path.endsWith(model)),
      ).toHaveLength(0);
      expect(result.fake.calls('graphql').length).toBeGreaterThanOrEqual(2);
      expect(result.fake.mismatches).toEqual([]);
      console.log(
        `api contents: a two-version pull request without history: ${result.fake.requests.length} requests (${[...new Set(result.fake.requests.map((r) => r.operationId))].join(', ')})`,
      );
    } finally {
      await result.fake.close();
    }
  }, 60_000);
});
