import { execFile, execFileSync } from 'node:child_process';
import { mkdirSync, mkdtempSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { dirname, join, resolve } from 'node:path';
import { promisify } from 'node:util';
import { afterEach, describe, expect, it } from 'vitest';
import { checkpointConfig } from '../support/scenario-repo.js';
import { freshBundle } from '../support/fresh-bundle.js';

// The bundle, run as a user would before a push: `context-reach diff` with no flags.
const CLI = resolve(import.meta.dirname, '../../dist/cli.js');
const run = promisify(execFile);

async function diff(
  args: string[],
  cwd: string,
): Promise<{ code: number; stdout: string; stderr: string }> {
  try {
    const { stdout, stderr } = await run(process.execPath, [freshBundle(CLI), 'diff', ...args], {
      cwd,
      env: { ...process.env, NO_COLOR: '1' },
    });
    return { code: 0, stdout, stderr };
  } catch (error) {
    const e = error as { code: number; stdout: string; stderr: string };
    return { code: e.code, stdout: e.stdout, stderr: e.stderr };
  }
}

function git(cwd: string, ...args: string[]): string {
  return execFileSync(
    'git',
    [
      '-c',
      'user.name=test',
      '-c',
      'user.email=test@example.invalid',
      '-c',
      'commit.gpgsign=false',
      ...args,
    ],
    {
      cwd,
      encoding: 'utf8',
      stdio: ['ignore', 'pipe', 'pipe'],
    },
  ).trim();
}

function write(dir: string, path: string, text: string): void {
  mkdirSync(dirname(join(dir, path)), { recursive: true });
  writeFileSync(join(dir, path), text);
}

const folders: string[] = [];
afterEach(() => {
  for (const folder of folders.splice(0)) rmSync(folder, { recursive: true, force: true });
});

/** A clone whose `main` tracks `origin/main`, both at one commit holding `tree`; returns the clone and that commit. */
function trackedClone(tree: Record<string, string>): { dir: string; upstream: string } {
  const root = mkdtempSync(join(tmpdir(), 'context-reach-worktree-'));
  folders.push(root);
  const remote = join(root, 'remote.git');
  const seed = join(root, 'seed');
  const dir = join(root, 'clone');
  git(root, 'init', '--quiet', '--bare', '--initial-branch=main', remote);
  git(root, 'init', '--quiet', '--initial-branch=main', seed);
  for (const [path, text] of Object.entries(tree)) write(seed, path, text);
  git(seed, 'add', '--all');
  git(seed, 'commit', '--quiet', '-m', 'models');
  git(seed, 'push', '--quiet', remote, 'main');
  git(root, 'clone', '--quiet', remote, dir);
  return { dir, upstream: git(dir, 'rev-parse', 'origin/main') };
}

describe('context-reach diff with no flags (before a push)', () => {
  it('judges unstaged edits against the upstream branch and names the working tree as head', async () => {
    const { dir, upstream } = trackedClone({ 'models/a/config.json': checkpointConfig() });
    write(dir, 'models/a/config.json', checkpointConfig({ max_position_embeddings: 32768 }));
    const { code, stdout } = await diff(['--format', 'json'], dir);
    expect(code).toBe(1);
    const report = JSON.parse(stdout);
    expect(report.base).toBe(upstream);
    expect(report.head).toBe('working tree');
    expect(report.verdict).toBe('block');
    expect(report.files.map((f: { path: string }) => f.path)).toEqual(['models/a/config.json']);
    expect(report.files[0].head.spec.declaredSpan).toBe(32768);
    expect(report.files[0].base.spec.declaredSpan).toBe(4096);
  });

  it('includes staged files, new ones too, and local commits not yet pushed', async () => {
    const { dir } = trackedClone({ 'models/a/config.json': checkpointConfig() });
    write(dir, 'models/b/config.json', checkpointConfig({ num_key_value_heads: 2 }));
    git(dir, 'add', 'models/b/config.json');
    write(dir, 'models/a/config.json', checkpointConfig({ rope_theta: 500000 }));
    git(dir, 'commit', '--quiet', '-am', 'local commit');
    const { stdout } = await diff(['--format', 'json'], dir);
    const report = JSON.parse(stdout);
    expect(
      report.files.map((f: { path: string; status: string }) => `${f.status} ${f.path}`).sort(),
    ).toEqual(['added models/b/config.json', 'modified models/a/config.json']);
  });

  it('passes a clean working tree with nothing to judge', async () => {
    const { dir } = trackedClone({ 'models/a/config.json': checkpointConfig() });
    const { code, stdout } = await diff(['--format', 'json'], dir);
    expect(code).toBe(0);
    expect(JSON.parse(stdout)).toMatchObject({ verdict: 'ok', files: [] });
  });

  it('reads the policy at the upstream, so an uncommitted policy edit cannot loosen the check', async () => {
    const strict = 'limits:\n  declaredSpan:\n    max: 8192\n';
    const { dir } = trackedClone({
      'models/a/config.json': checkpointConfig(),
      '.github/context-reach.yml': strict,
    });
    write(dir, '.github/context-reach.yml', 'limits:\n  declaredSpan:\n    max: 65536\n');
    write(
      dir,
      'models/a/config.json',
      checkpointConfig({
        max_position_embeddings: 16384,
        rope_scaling: { rope_type: 'linear', factor: 4 },
      }),
    );
    const { code, stdout } = await diff(['--format', 'json'], dir);
    const report = JSON.parse(stdout);
    expect(report.policy).toMatchObject({ source: 'file', changedInHead: true });
    expect(
      report.files[0].deltas.find((d: { metric: string }) => d.metric === 'declaredSpan'),
    ).toMatchObject({ head: 16384, state: 'crossed', limit: { max: 8192 } });
    expect(code).toBe(1);
  });

  it('never follows a symlink in the working tree', async () => {
    const { dir } = trackedClone({ 'models/a/config.json': checkpointConfig() });
    rmSync(join(dir, 'models/a/config.json'));
    write(dir, 'elsewhere.json', checkpointConfig({ max_position_embeddings: 32768 }));
    execFileSync('ln', ['-s', '../../elsewhere.json', join(dir, 'models/a/config.json')]);
    const { stdout } = await diff(['--format', 'json', '--fail-on', 'never'], dir);
    const file = JSON.parse(stdout).files[0];
    expect(file.head).toBeNull();
    expect(file.headError.message).toMatch(/not a regular file/);
  });

  it('falls back to the parent commit without an upstream, and says when there is no commit at all', async () => {
    const dir = mkdtempSync(join(tmpdir(), 'context-reach-worktree-'));
    folders.push(dir);
    git(dir, 'init', '--quiet', '--initial-branch=main');
    const empty = await diff([], dir);
    expect(empty.code).toBe(2);
    expect(empty.stderr).toMatch(/no commit yet/);
    write(dir, 'models/a/config.json', checkpointConfig());
    git(dir, 'add', '--all');
    git(dir, 'commit', '--quiet', '-m', 'one');
    const parent = git(dir, 'rev-parse', 'HEAD');
    write(dir, 'models/a/config.json', checkpointConfig({ num_key_value_heads: 2 }));
    git(dir, 'commit', '--quiet', '-am', 'two');
    const { stdout } = await diff(['--format', 'json'], dir);
    expect(JSON.parse(stdout).base).toBe(parent);
  });
});
