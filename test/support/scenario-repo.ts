import { execFileSync } from 'node:child_process';
import { mkdirSync, mkdtempSync, readdirSync, rmSync, symlinkSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { dirname, join } from 'node:path';

/** File contents by repository path; `{ symlink: target }` makes a symbolic link. */
export type Tree = Record<string, string | Uint8Array | { symlink: string }>;

export interface ScenarioRepo {
  dir: string;
  base: string;
  head: string;
  remove(): void;
}

function git(dir: string, ...args: string[]): string {
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
      cwd: dir,
      encoding: 'utf8',
      stdio: ['ignore', 'pipe', 'pipe'],
    },
  ).trim();
}

function writeTree(dir: string, tree: Tree): void {
  for (const entry of readdirSync(dir))
    if (entry !== '.git') rmSync(join(dir, entry), { recursive: true, force: true });
  for (const [path, content] of Object.entries(tree)) {
    const target = join(dir, path);
    mkdirSync(dirname(target), { recursive: true });
    if (typeof content === 'object' && !(content instanceof Uint8Array))
      symlinkSync(content.symlink, target);
    else writeFileSync(target, content);
  }
}

/** A temporary git repository with a base commit and a head commit on top of it. */
export function scenarioRepo(base: Tree, head: Tree): ScenarioRepo {
  const dir = mkdtempSync(join(tmpdir(), 'context-reach-scenario-'));
  git(dir, 'init', '--quiet', '--initial-branch=main');
  writeTree(dir, base);
  git(dir, 'add', '--all');
  git(dir, 'commit', '--quiet', '--allow-empty', '-m', 'base');
  const baseSha = git(dir, 'rev-parse', 'HEAD');
  writeTree(dir, head);
  git(dir, 'add', '--all');
  git(dir, 'commit', '--quiet', '--allow-empty', '-m', 'head');
  const headSha = git(dir, 'rev-parse', 'HEAD');
  return {
    dir,
    base: baseSha,
    head: headSha,
    remove: () => rmSync(dir, { recursive: true, force: true }),
  };
}

/** A checkout-style model config in JSON, with overrides for the keys a scenario changes. */
export function checkpointConfig(overrides: Record<string, unknown> = {}): string {
  return `${JSON.stringify(
    {
      model_type: 'llama',
      hidden_size: 2048,
      intermediate_size: 5632,
      num_hidden_layers: 16,
      num_attention_heads: 16,
      num_key_value_heads: 4,
      hidden_act: 'silu',
      vocab_size: 32000,
      max_position_embeddings: 4096,
      rope_theta: 10000,
      tie_word_embeddings: false,
      torch_dtype: 'bfloat16',
      ...overrides,
    },
    null,
    2,
  )}\n`;
}
