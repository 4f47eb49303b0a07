import { execFileSync } from 'node:child_process';
import { createHash } from 'node:crypto';
import { mkdtempSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { createGitReader } from '../../src/adapters/git.js';
import { createFileSource } from '../../src/adapters/file-source.js';
import { createGitHubClient } from '../../src/adapters/github-rest.js';
import { runAction } from '../../src/action/run-action.js';
import {
  putPullRequest,
  startFakeGitHub,
  tree,
  type FakeGitHub,
  type FakePullFile,
} from './fake-github.js';
import { createRecordingOutput, type RecordingOutput } from './recording-output.js';
import { pullRequestEvent } from './run-bundle.js';
import { scenarioRepo, type ScenarioRepo, type Tree } from './scenario-repo.js';

export const OWNER = 'example-org';
export const REPO = 'model-zoo';

export interface ScenarioOptions {
  base: Tree;
  head: Tree;
  labels?: string[];
  /** The token may read but not write (a fork's pull request). */
  readOnly?: boolean;
  fork?: boolean;
  inputs?: Record<string, string>;
  /** The checkout lacks the commits: the action must use the REST API (default: `false`). */
  noHistory?: boolean;
  /**
   * The checkout is a repository without the commits whose `origin` has them (what a depth-1
   * checkout of another commit leaves): the action may fetch them (default: `false`).
   */
  emptyClone?: boolean;
  /** Comments already on the pull request (re-runs). */
  fake?: FakeGitHub;
  /** Prepare the fake API before the run (faults, extra state). */
  prepare?: (fake: FakeGitHub) => void;
}

export interface ScenarioResult {
  out: RecordingOutput;
  fake: FakeGitHub;
  written: Record<string, string>;
  error: unknown;
  base: string;
  head: string;
}

/** A repository with no commits whose `origin` is `source`. */
function emptyClone(source: string): string {
  const dir = mkdtempSync(join(tmpdir(), 'context-reach-clone-'));
  // One shell for both git commands: one start of a process from this (large) one, not two.
  execFileSync('sh', ['-c', 'git init -q && git remote add origin "$1"', 'sh', source], {
    cwd: dir,
  });
  return dir;
}

/** The same text, bytes or link target on both sides (a link's target is compared, not "[object Object]"). */
function sameEntry(a: Tree[string], b: Tree[string]): boolean {
  if (typeof a === 'string' || typeof b === 'string') return a === b;
  if (a instanceof Uint8Array || b instanceof Uint8Array)
    return a instanceof Uint8Array && b instanceof Uint8Array && Buffer.compare(a, b) === 0;
  return a.symlink === b.symlink;
}

function pullFiles(base: Tree, head: Tree): FakePullFile[] {
  const files: FakePullFile[] = [];
  for (const path of new Set([...Object.keys(base), ...Object.keys(head)])) {
    const before = base[path];
    const after = head[path];
    if (after === undefined) files.push({ filename: path, status: 'removed' });
    else if (before === undefined) files.push({ filename: path, status: 'added' });
    else if (!sameEntry(before, after)) files.push({ filename: path, status: 'modified' });
  }
  return files;
}

/**
 * Repositories already built in this worker, by the content of their two trees. The action only
 * reads a scenario's repository (its report files go to `written`, its fetches to a clone of its
 * own), so scenarios with the same trees share one: of the 86 scenario runs of `npm test`, 43
 * repeated trees an earlier run of their worker had built (2026-12-02, four workers), and each
 * build starts a shell and three git processes. Small trees only: a repository holding
 * a hostile file of megabytes is removed after its run. The test run's temporary root (removed
 * when the run ends) holds the shared ones.
 */
const sharedRepos = new Map<string, ScenarioRepo>();
const SHARED_TREE_BYTES = 1 << 20;

/** The trees' content as a key (paths, kinds and bytes), or null when they are too large to keep. */
function treesKey(base: Tree, head: Tree): string | null {
  const hash = createHash('sha256');
  let bytes = 0;
  for (const tree of [base, head]) {
    for (const [path, content] of Object.entries(tree)) {
      const link = typeof content === 'object' && !(content instanceof Uint8Array);
      const body = link ? Buffer.from(content.symlink) : Buffer.from(content);
      bytes += body.length;
      if (bytes > SHARED_TREE_BYTES) return null;
      hash.update(`${link ? 'l' : 'f'}${Buffer.byteLength(path)}:${path}${body.length}:`);
      hash.update(body);
    }
    hash.update('|');
  }
  return hash.digest('hex');
}

/** A repository with these trees: one built before in this worker, or a new one. */
function repoFor(base: Tree, head: Tree): { repo: ScenarioRepo; shared: boolean } {
  const key = treesKey(base, head);
  if (key === null) return { repo: scenarioRepo(base, head), shared: false };
  let repo = sharedRepos.get(key);
  if (repo === undefined) {
    repo = scenarioRepo(base, head);
    sharedRepos.set(key, repo);
  }
  return { repo, shared: true };
}

/**
 * Runs the action in-process with the real git and GitHub adapters, against a temporary git
 * repository and the loopback API stand-in; waits GitHub asks for are shrunk to milliseconds.
 */
export async function runScenario(options: ScenarioOptions): Promise<ScenarioResult> {
  const { repo, shared } = repoFor(options.base, options.head);
  const fake = options.fake ?? (await startFakeGitHub({ owner: OWNER, repo: REPO }));
  fake.state.readOnly = options.readOnly ?? false;
  putPullRequest(fake, repo, pullFiles(options.base, options.head), {
    labels: options.labels,
    fork: options.fork,
  });
  const asFakeTree = (t: Tree) =>
    tree(
      Object.fromEntries(
        Object.entries(t).map(([p, v]) => [
          p,
          typeof v === 'object' && !(v instanceof Uint8Array)
            ? { type: 'symlink' as const, target: v.symlink }
            : v,
        ]),
      ),
    );
  fake.state.trees.set(repo.base, asFakeTree(options.base));
  fake.state.trees.set(repo.head, asFakeTree(options.head));
  options.prepare?.(fake);
  const out = createRecordingOutput();
  const written: Record<string, string> = {};
  const temp = mkdtempSync(join(tmpdir(), 'context-reach-harness-'));
  const workspace = options.emptyClone
    ? emptyClone(repo.dir)
    : options.noHistory
      ? mkdtempSync(join(tmpdir(), 'context-reach-empty-'))
      : repo.dir;
  const inputs: Record<string, string> = { 'github-token': fake.state.token, ...options.inputs };
  let error: unknown = null;
  try {
    await runAction({
      env: {
        GITHUB_EVENT_NAME: 'pull_request',
        GITHUB_EVENT_PATH: 'event.json',
        GITHUB_API_URL: fake.url,
        GITHUB_SERVER_URL: 'https://github.example',
        RUNNER_TEMP: temp,
        GITHUB_WORKSPACE: workspace,
      },
      getInput: (name) => inputs[name] ?? '',
      out,
      readJson: async () =>
        pullRequestEvent({
          owner: OWNER,
          repo: REPO,
          number: 7,
          base: repo.base,
          head: repo.head,
          labels: options.labels,
          fork: options.fork,
        }),
      readFile: (path, maxBytes) => createFileSource(maxBytes).read(path),
      writeFile: async (path, text) => {
        written[path] = typeof text === 'string' ? text : [...text].join('');
      },
      createGit: (cwd) => createGitReader(cwd),
      createGitHub: (token, clientOptions) =>
        createGitHubClient(token, { ...clientOptions, msPerSecond: 1 }),
    });
  } catch (caught) {
    error = caught;
  }
  // What the run wrote is in `written` and `out`: its folders go (a shared repository stays).
  if (!shared) repo.remove();
  for (const dir of [temp, workspace])
    if (dir !== repo.dir) rmSync(dir, { recursive: true, force: true });
  return { out, fake, written, error, base: repo.base, head: repo.head };
}
