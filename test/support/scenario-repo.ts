import { execFileSync } from 'node:child_process';
import { mkdtempSync, readFileSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';

/** File contents by repository path; `{ symlink: target }` makes a symbolic link. */
export type Tree = Record<string, string | Uint8Array | { symlink: string }>;

export interface ScenarioRepo {
  dir: string;
  base: string;
  head: string;
  remove(): void;
}

/** A path as git's C-style quoting writes it: quotes, backslashes and control bytes escaped. */
function quotedPath(path: string): string {
  let out = '"';
  for (const byte of Buffer.from(path, 'utf8')) {
    if (byte === 0x22 || byte === 0x5c) out += `\\${String.fromCharCode(byte)}`;
    else if (byte < 0x20 || byte === 0x7f) out += `\\${byte.toString(8).padStart(3, '0')}`;
    else out += String.fromCharCode(byte);
  }
  return `${out}"`;
}

/**
 * `git fast-import`'s input for two commits on main: `base`, then `head` on top of it (all of its
 * files listed after `deleteall`, so its tree is exactly `head`). One process writes every object.
 */
function importStream(
  base: Tree,
  head: Tree,
): { stream: Buffer; baseMark: number; headMark: number } {
  const parts: Buffer[] = [];
  const text = (value: string) => parts.push(Buffer.from(value, 'latin1'));
  const data = (bytes: Buffer) => {
    text(`data ${bytes.length}\n`);
    parts.push(bytes, Buffer.from('\n'));
  };
  let mark = 0;
  const commit = (tree: Tree, message: string, parent: number | null): number => {
    const entries = Object.entries(tree).map(([path, content]) => {
      mark += 1;
      const link = typeof content === 'object' && !(content instanceof Uint8Array);
      text(`blob\nmark :${mark}\n`);
      // A Uint8Array is viewed, not copied (the 100 MiB hostile file is copied once, into the stream).
      data(
        link
          ? Buffer.from(content.symlink)
          : typeof content === 'string'
            ? Buffer.from(content)
            : Buffer.from(content.buffer, content.byteOffset, content.byteLength),
      );
      return `M ${link ? '120000' : '100644'} :${mark} ${quotedPath(path)}\n`;
    });
    mark += 1;
    text(`commit refs/heads/main\nmark :${mark}\n`);
    text(`committer test <test@example.invalid> ${Math.floor(Date.now() / 1000)} +0000\n`);
    data(Buffer.from(message));
    if (parent !== null) text(`from :${parent}\n`);
    text('deleteall\n');
    parts.push(Buffer.from(entries.join(''), 'latin1'));
    text('\n');
    return mark;
  };
  const baseMark = commit(base, 'base', null);
  const headMark = commit(head, 'head', baseMark);
  return { stream: Buffer.concat(parts), baseMark, headMark };
}

/**
 * A temporary git repository with a base commit and a head commit on top of it, the head checked
 * out: init, fast-import (both commits) and reset (index and working tree), run by one shell so
 * that the test process, large enough for its forks to cost, starts one process, not three.
 */
export function scenarioRepo(base: Tree, head: Tree): ScenarioRepo {
  const dir = mkdtempSync(join(tmpdir(), 'context-reach-scenario-'));
  const marksFile = join(dir, '.git', 'scenario-marks');
  const { stream, baseMark, headMark } = importStream(base, head);
  // Big blobs (the 100 MiB hostile file) are stored without looking for deltas: seconds saved.
  // The objects stay in fast-import's pack (a small import is otherwise unpacked into loose
  // objects by one more process), and no template files (sample hooks) are copied.
  execFileSync(
    'sh',
    [
      '-c',
      'git init --quiet --template= --initial-branch=main && git -c core.bigFileThreshold=1m -c fastimport.unpackLimit=0 fast-import --quiet "--export-marks=$1" && git reset --hard --quiet',
      'sh',
      marksFile,
    ],
    { cwd: dir, input: stream, stdio: ['pipe', 'ignore', 'pipe'] },
  );
  // Lines `:<mark> <object id>`.
  const marks = new Map(
    readFileSync(marksFile, 'utf8')
      .trim()
      .split('\n')
      .map((line) => line.split(' ') as [string, string]),
  );
  const baseSha = marks.get(`:${baseMark}`)!;
  const headSha = marks.get(`:${headMark}`)!;
  rmSync(marksFile);
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
