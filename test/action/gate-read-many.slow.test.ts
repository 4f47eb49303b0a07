import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { createGitReader } from '../../src/adapters/git.js';
import type { GateReport } from '../../src/core/report/types.js';
import { runGate, type ContentRequest, type ContentSource } from '../../src/core/gate.js';
import { renderGateJson } from '../../src/core/render/gate-json.js';
import {
  checkpointConfig,
  scenarioRepo,
  type ScenarioRepo,
  type Tree,
} from '../support/scenario-repo.js';

// The gate reads the versions of all files with one batched call per run when the source
// offers readMany (the git adapter does), and must judge exactly as it does reading file by file.

const POLICY =
  'limits:\n  fitSequences: { min: 1 }\nserving:\n  device-memory-gib: 80\n  sequences: 4\n';
/** More files than the read window (32) the gate once had, so nothing depends on such a window. */
const FILES = 45;

let repo: ScenarioRepo;

beforeAll(() => {
  const base: Tree = { '.github/context-reach.yml': POLICY };
  const head: Tree = { '.github/context-reach.yml': POLICY };
  for (let i = 0; i < FILES; i++) {
    const path = `models/m${String(i).padStart(2, '0')}/config.json`;
    const text = checkpointConfig({ max_position_embeddings: 2048 * (1 + (i % 5)) });
    if (i % 9 !== 0) base[path] = text; // every ninth file is added in head
    if (i % 11 === 3) continue; // some are deleted in head
    head[path] =
      i % 2 === 0
        ? checkpointConfig({ max_position_embeddings: 4096 * (1 + (i % 5)) })
        : text.replace('10000', '20000');
  }
  // Renamed, a symlink and a file that is not a model config, among the batched reads.
  base['models/old-name/config.json'] = checkpointConfig({ rope_theta: 500000 });
  head['models/new-name/config.json'] = checkpointConfig({ rope_theta: 500000 });
  head['models/link/config.json'] = { symlink: '../m01/config.json' };
  head['models/broken/config.json'] = '{ "hidden_size": ';
  repo = scenarioRepo(base, head);
});

afterAll(() => repo?.remove());

async function judge(source: ContentSource): Promise<GateReport> {
  const git = createGitReader(repo.dir);
  return runGate(source, {
    base: repo.base,
    head: repo.head,
    changes: await git.changedFiles(repo.base, repo.head),
    policyPath: '.github/context-reach.yml',
  });
}

describe('runGate(source, request) with a source that offers readMany', () => {
  it('gives the same report as reading file by file, with one readMany call for every version of every file', async () => {
    const git = createGitReader(repo.dir);
    let reads = 0;
    const batches: number[] = [];
    const batched = await judge({
      read: (ref, path) => {
        reads += 1;
        return git.show(ref, path);
      },
      readMany: (requests: readonly ContentRequest[]) => {
        batches.push(requests.length);
        return git.showMany(requests.map((r) => ({ commit: r.ref, path: r.path })));
      },
    });
    const single = await judge({ read: (ref, path) => git.show(ref, path) });
    expect(renderGateJson(batched)).toBe(renderGateJson(single));
    expect(batched.files.length).toBeGreaterThan(32);
    expect(batches).toHaveLength(1);
    expect(batches[0]).toBe(
      batched.files.length + batched.files.filter((f) => f.status !== 'added').length,
    );
    // Only the policy is read on its own (once at base; head's is the same file unchanged).
    expect(reads).toBe(1);
  });

  it('fails closed when a readMany throws: a base version that cannot be read stops the gate, naming the file and why', async () => {
    const git = createGitReader(repo.dir);
    await expect(
      judge({
        read: (ref, path) => git.show(ref, path),
        readMany: async () => {
          throw new Error('the batch broke');
        },
      }),
    ).rejects.toThrow(/could not be read at base [0-9a-f]{40}: the batch broke/);
  });
});

describe('runGate(source, request) on a move git does not see as one (issue 13, point 8)', () => {
  it('reads the deleted file in the same readMany call as every other version, and pairs the move', async () => {
    const FROM = 'models/chat/config.json';
    const TO = 'archive/chat-long/config.json';
    // The same keys on one line, in reverse order: git's similarity score does not pair them.
    const minified = JSON.stringify(
      Object.fromEntries(
        Object.entries(
          JSON.parse(checkpointConfig({ max_position_embeddings: 16384 })) as Record<
            string,
            unknown
          >,
        ).reverse(),
      ),
    );
    const moved = scenarioRepo(
      { [FROM]: checkpointConfig(), 'models/other/config.json': checkpointConfig() },
      { [TO]: minified, 'models/other/config.json': checkpointConfig({ rope_theta: 20000 }) },
    );
    try {
      const git = createGitReader(moved.dir);
      const changes = await git.changedFiles(moved.base, moved.head);
      expect(changes.map((c) => c.status).sort()).toEqual(['added', 'deleted', 'modified']);
      const batches: string[][] = [];
      const report = await runGate(
        {
          read: (ref, path) => git.show(ref, path),
          readMany: (requests: readonly ContentRequest[]) => {
            batches.push(
              requests.map((r) => `${r.ref === moved.base ? 'base' : 'head'}:${r.path}`),
            );
            return git.showMany(requests.map((r) => ({ commit: r.ref, path: r.path })));
          },
        },
        { base: moved.base, head: moved.head, changes, policyPath: '.github/context-reach.yml' },
      );
      // One batch: both heads, the modified file's base and the deleted file's base.
      expect(batches).toEqual([
        [
          `head:${TO}`,
          'head:models/other/config.json',
          'base:models/other/config.json',
          `base:${FROM}`,
        ],
      ]);
      expect(report.files.find((f) => f.path === TO)).toMatchObject({
        status: 'renamed',
        previousPath: FROM,
      });
      expect(report.deleted).toEqual([]);
    } finally {
      moved.remove();
    }
  });
});
