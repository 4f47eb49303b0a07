import { execFile, execFileSync } from 'node:child_process';
import {
  existsSync,
  lstatSync,
  mkdirSync,
  mkdtempSync,
  readFileSync,
  rmSync,
  symlinkSync,
  writeFileSync,
} from 'node:fs';
import { tmpdir } from 'node:os';
import { dirname, join, resolve } from 'node:path';
import { promisify } from 'node:util';
import { afterEach, describe, expect, it } from 'vitest';
import { forkWorkflows, simpleWorkflow } from '../../src/core/init/workflows.js';
import { checkpointConfig } from '../support/scenario-repo.js';
import { freshBundle } from '../support/fresh-bundle.js';

const CLI = resolve(import.meta.dirname, '../../dist/cli.js');
const run = promisify(execFile);
const folders: string[] = [];
afterEach(() => {
  for (const folder of folders.splice(0)) rmSync(folder, { recursive: true, force: true });
});

async function init(
  args: string[],
  cwd: string,
): Promise<{ code: number; stdout: string; stderr: string }> {
  try {
    const { stdout, stderr } = await run(process.execPath, [freshBundle(CLI), 'init', ...args], {
      cwd,
      env: { ...process.env, NO_COLOR: '1' },
    });
    return { code: 0, stdout, stderr };
  } catch (error) {
    const e = error as { code: number; stdout: string; stderr: string };
    return { code: e.code, stdout: e.stdout, stderr: e.stderr };
  }
}

function repoWith(tree: Record<string, string>): string {
  const dir = mkdtempSync(join(tmpdir(), 'context-reach-init-'));
  folders.push(dir);
  execFileSync('git', ['init', '--quiet'], { cwd: dir });
  for (const [path, text] of Object.entries(tree)) {
    mkdirSync(dirname(join(dir, path)), { recursive: true });
    writeFileSync(join(dir, path), text);
  }
  return dir;
}

const PATHS = ['models/**', '.github/context-reach.yml'];

describe('context-reach init', () => {
  it('writes the policy and the simple workflow, skipping a config.json that is no model and ignored files', async () => {
    const dir = repoWith({
      'models/a/config.json': checkpointConfig(),
      'tools/config.json': '{"indent": 2}\n',
      'scratch/model.json': checkpointConfig(),
      '.gitignore': 'scratch/\n',
    });
    const { code, stdout } = await init([], dir);
    expect(code).toBe(0);
    expect(stdout).toContain('1 model config found: models/a/config.json');
    expect(readFileSync(join(dir, '.github/workflows/context-reach.yml'), 'utf8')).toBe(
      simpleWorkflow(PATHS).text,
    );
    expect(readFileSync(join(dir, '.github/context-reach.yml'), 'utf8')).toContain(
      '- "models/**/config.json"',
    );
    expect(stdout).toMatch(/verdict now: ok/);
  });

  it('never overwrites a file without --force (exit 1), and replaces it with --force', async () => {
    const dir = repoWith({
      'models/a/config.json': checkpointConfig(),
      '.github/context-reach.yml': 'standing: block\n',
    });
    const kept = await init([], dir);
    expect(kept.code).toBe(1);
    expect(kept.stdout).toMatch(
      /kept\s+\.github\/context-reach\.yml \(it exists; --force replaces it\)/,
    );
    expect(readFileSync(join(dir, '.github/context-reach.yml'), 'utf8')).toBe('standing: block\n');
    expect(existsSync(join(dir, '.github/workflows/context-reach.yml'))).toBe(true);
    const forced = await init(['--force'], dir);
    expect(forced.code).toBe(0);
    expect(readFileSync(join(dir, '.github/context-reach.yml'), 'utf8')).toMatch(
      /^# yaml-language-server: \$schema=/,
    );
  });

  it('writes the two workflows of the fork recipe with --forks', async () => {
    const dir = repoWith({ 'models/a/config.json': checkpointConfig() });
    expect((await init(['--forks'], dir)).code).toBe(0);
    for (const file of forkWorkflows(PATHS))
      expect(readFileSync(join(dir, file.path), 'utf8')).toBe(file.text);
  });

  it("shows the first run's blocking finding without failing", async () => {
    const dir = repoWith({
      'models/a/config.json': checkpointConfig(),
      'models/b/config.json': '{\n  "model_type": "llama",\n  "hidden_size": 4096,\n  oops\n}\n',
    });
    const { code, stdout } = await init([], dir);
    expect(code).toBe(0);
    expect(stdout).toContain('2 model configs found');
    expect(stdout).toMatch(/verdict now: block \(1 blocking/);
    expect(readFileSync(join(dir, '.github/context-reach.yml'), 'utf8')).toContain(
      'models/b/config.json (could not be read',
    );
  });

  it('replaces a symlinked policy with --force instead of writing through it', async () => {
    const dir = repoWith({
      'models/a/config.json': checkpointConfig(),
      'elsewhere.yml': 'standing: block\n',
    });
    mkdirSync(join(dir, '.github'));
    symlinkSync('../elsewhere.yml', join(dir, '.github/context-reach.yml'));
    expect((await init([], dir)).code).toBe(1);
    expect((await init(['--force'], dir)).code).toBe(0);
    expect(lstatSync(join(dir, '.github/context-reach.yml')).isSymbolicLink()).toBe(false);
    expect(readFileSync(join(dir, 'elsewhere.yml'), 'utf8')).toBe('standing: block\n');
  });

  it('says it needs a git repository, exit 2', async () => {
    const dir = mkdtempSync(join(tmpdir(), 'context-reach-init-'));
    folders.push(dir);
    const { code, stderr } = await init([], dir);
    expect(code).toBe(2);
    expect(stderr).toMatch(/inside a git repository/);
  });
});
