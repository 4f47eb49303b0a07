import { execFileSync } from 'node:child_process';
import {
  chmodSync,
  mkdirSync,
  mkdtempSync,
  readFileSync,
  rmSync,
  statSync,
  symlinkSync,
  unlinkSync,
  writeFileSync,
} from 'node:fs';
import { tmpdir } from 'node:os';
import { dirname, join } from 'node:path';
import { afterAll, beforeAll, describe, expect, test } from 'vitest';
import { ContentTooLargeError, MAX_CONFIG_BYTES } from '../../src/adapters/content-limit.js';
import {
  GitError,
  createGitReader,
  gitContentSource,
  parseNameStatus,
} from '../../src/adapters/git.js';
import type { GitReader } from '../../src/adapters/git.js';
import { createScratchRepository } from '../../src/cli/scratch-repository.js';

let root: string;
let repo: string;
let base: string;
let head: string;
let reader: GitReader;

function git(...args: string[]): string {
  return execFileSync('git', args, {
    cwd: repo,
    encoding: 'utf8',
    env: {
      ...process.env,
      GIT_AUTHOR_NAME: 'Test Author',
      GIT_AUTHOR_EMAIL: 'author@example.invalid',
      GIT_COMMITTER_NAME: 'Test Author',
      GIT_COMMITTER_EMAIL: 'author@example.invalid',
    },
  }).trim();
}

function write(path: string, content: string | Buffer): void {
  mkdirSync(dirname(join(repo, path)), { recursive: true });
  writeFileSync(join(repo, path), content);
}

const CONFIG_A = '{"hidden_size": 4096, "num_attention_heads": 32}\n';
const RENAMED = `${'{"layers": 24, "hidden": 2048, "heads": 16, "span": 4096}\n'.repeat(20)}`;
const ODD_NAME = 'models/ü ber #1 [x]*.json';
const NEWLINE_NAME = 'models/line\nbreak.json';

beforeAll(() => {
  root = mkdtempSync(join(tmpdir(), 'context-reach-git-'));
  repo = join(root, 'repo');
  mkdirSync(repo);
  git('init', '-q', '-b', 'main');
  write('models/a/config.json', CONFIG_A);
  write('models/old.reach.yaml', RENAMED);
  write('notes/delete-me.txt', 'gone soon\n');
  write('models/stays.json', '{}\n');
  git('add', '-A');
  git('commit', '-q', '-m', 'base');
  base = git('rev-parse', 'HEAD');

  write('models/a/config.json', CONFIG_A.replace('4096', '5120'));
  git('mv', 'models/old.reach.yaml', 'models/new.reach.yaml');
  git('rm', '-q', 'notes/delete-me.txt');
  write(ODD_NAME, '{"odd": true}\n');
  write(NEWLINE_NAME, '{"newline": true}\n');
  // A link out of the checkout, a link to a file inside it, and a directory reached through a link.
  symlinkSync('../../../../etc/passwd', join(repo, 'models/outside.json'));
  symlinkSync('a/config.json', join(repo, 'models/inside.json'));
  symlinkSync('models/a', join(repo, 'linked'));
  // One byte past the limit: refused by size, never read.
  write('models/big/config.json', Buffer.alloc(MAX_CONFIG_BYTES + 1, 0x20));
  write('models/exact/config.json', Buffer.alloc(MAX_CONFIG_BYTES, 0x20));
  git('add', '-A');
  git('commit', '-q', '-m', 'head');
  head = git('rev-parse', 'HEAD');
  reader = createGitReader(repo);
});

afterAll(() => {
  rmSync(root, { recursive: true, force: true });
});

describe('changedFiles(base, head)', () => {
  test('lists modified, renamed (with the old path), deleted and added files as git diff does', async () => {
    const files = await reader.changedFiles(base, head);
    const byPath = new Map(files.map((file) => [file.path, file]));
    expect(byPath.get('models/a/config.json')).toEqual({
      status: 'modified',
      path: 'models/a/config.json',
      previousPath: null,
    });
    expect(byPath.get('models/new.reach.yaml')).toEqual({
      status: 'renamed',
      path: 'models/new.reach.yaml',
      previousPath: 'models/old.reach.yaml',
    });
    expect(byPath.get('notes/delete-me.txt')).toEqual({
      status: 'deleted',
      path: 'notes/delete-me.txt',
      previousPath: null,
    });
    expect(byPath.get(ODD_NAME)?.status).toBe('added');
    expect(byPath.get(NEWLINE_NAME)?.status).toBe('added');
    expect(byPath.get('models/outside.json')?.status).toBe('added');
    expect(byPath.has('models/stays.json')).toBe(false);
    // Cross-check the count against git's own summary of the same diff.
    expect(files).toHaveLength(
      git('diff', '--name-only', '-M', base, head, '-z').split('\u0000').filter(Boolean).length,
    );
  });

  test('is empty between a commit and itself', async () => {
    expect(await reader.changedFiles(head, head)).toEqual([]);
  });
});

describe('show(commit, path)', () => {
  test('gives the bytes of a file at each commit', async () => {
    expect(
      Buffer.from((await reader.show(base, 'models/a/config.json')) as Uint8Array).toString('utf8'),
    ).toBe(CONFIG_A);
    expect(
      Buffer.from((await reader.show(head, 'models/a/config.json')) as Uint8Array).toString('utf8'),
    ).toBe(CONFIG_A.replace('4096', '5120'));
  });

  test('reads names with spaces, glob characters, non-ASCII letters and a newline exactly', async () => {
    expect(Buffer.from((await reader.show(head, ODD_NAME)) as Uint8Array).toString('utf8')).toBe(
      '{"odd": true}\n',
    );
    expect(
      Buffer.from((await reader.show(head, NEWLINE_NAME)) as Uint8Array).toString('utf8'),
    ).toBe('{"newline": true}\n');
    // "*" in the name is not a pattern: no other file answers for it.
    expect(await reader.show(head, 'models/ü ber #1 [x]x.json')).toBeNull();
  });

  test('is null for a path absent at that commit (the renamed file at base, the deleted one at head)', async () => {
    expect(await reader.show(base, 'models/new.reach.yaml')).toBeNull();
    expect(await reader.show(head, 'notes/delete-me.txt')).toBeNull();
    expect(await reader.show(head, 'models/none/config.json')).toBeNull();
  });

  test('never follows a symlink: out of the checkout, inside it, or as a parent directory', async () => {
    expect(await reader.show(head, 'models/outside.json')).toBeNull();
    expect(await reader.show(head, 'models/inside.json')).toBeNull();
    expect(await reader.show(head, 'linked/config.json')).toBeNull();
    expect(await reader.entry(head, 'models/outside.json')).toEqual(
      expect.objectContaining({ kind: 'symlink', mode: '120000' }),
    );
  });

  test('is null for a directory', async () => {
    expect(await reader.show(head, 'models/a')).toBeNull();
    expect((await reader.entry(head, 'models/a'))?.kind).toBe('directory');
  });

  test('reads a file of exactly MAX_CONFIG_BYTES and refuses one byte more', async () => {
    expect(MAX_CONFIG_BYTES).toBe(4 * 1024 * 1024);
    expect((await reader.show(head, 'models/exact/config.json'))?.byteLength).toBe(
      statSync(join(repo, 'models/exact/config.json')).size,
    );
    const error = await reader.show(head, 'models/big/config.json').catch((e: unknown) => e);
    expect(error).toBeInstanceOf(ContentTooLargeError);
    expect((error as ContentTooLargeError).size).toBe(
      statSync(join(repo, 'models/big/config.json')).size,
    );
    expect((error as Error).message).toContain('models/big/config.json');
  });

  test('refuses paths that climb out or are absolute, before running git', async () => {
    for (const path of ['../etc/passwd', '/etc/passwd', 'models/../../x', '', 'a//b']) {
      await expect(reader.show(head, path)).rejects.toBeInstanceOf(GitError);
    }
  });
});

describe('showMany(requests)', () => {
  const REQUESTS = (): { commit: string; path: string }[] => [
    { commit: base, path: 'models/a/config.json' },
    { commit: head, path: 'models/a/config.json' },
    { commit: head, path: ODD_NAME },
    { commit: head, path: NEWLINE_NAME },
    { commit: head, path: 'models/ü ber #1 [x]x.json' },
    { commit: base, path: 'models/new.reach.yaml' },
    { commit: head, path: 'models/outside.json' },
    { commit: head, path: 'models/inside.json' },
    { commit: head, path: 'linked/config.json' },
    { commit: head, path: 'models/a' },
    { commit: head, path: 'models/exact/config.json' },
    { commit: head, path: 'models/big/config.json' },
    { commit: head, path: '../etc/passwd' },
    { commit: '0123456789abcdef0123456789abcdef01234567', path: 'models/a/config.json' },
    { commit: head, path: 'models/a/config.json' },
  ];

  test('answers every request as show(commit, path) does, in order, errors in place of throws', async () => {
    const requests = REQUESTS();
    const many = await reader.showMany(requests);
    expect(many).toHaveLength(requests.length);
    for (const [i, request] of requests.entries()) {
      const one = await reader.show(request.commit, request.path).catch((e: unknown) => e);
      const got = many[i];
      if (one instanceof Error) {
        expect(got, request.path).toBeInstanceOf(one.constructor);
        expect((got as Error).message).toBe(one.message);
      } else if (one === null) {
        expect(got, request.path).toBeNull();
      } else {
        expect(
          Buffer.from(got as Uint8Array).equals(Buffer.from(one as Uint8Array)),
          request.path,
        ).toBe(true);
      }
    }
    // Checked against git itself, not only against show.
    expect(Buffer.from(many[1] as Uint8Array).toString('utf8')).toBe(
      git('show', `${head}:models/a/config.json`) + '\n',
    );
    expect(many[11]).toBeInstanceOf(ContentTooLargeError);
    expect(many[12]).toBeInstanceOf(GitError);
  });

  test('runs one listing per commit and one cat-file for all the blobs, not three processes per file', async () => {
    const log = join(root, 'git-calls.log');
    const counting = join(root, 'counting-git');
    writeFileSync(counting, `#!/bin/sh\necho "$@" >> '${log}'\nexec git "$@"\n`);
    chmodSync(counting, 0o755);
    const requests = Array.from({ length: 40 }, (_, i) => ({
      commit: i % 2 === 0 ? base : head,
      path: i % 4 < 2 ? 'models/a/config.json' : 'models/stays.json',
    }));
    const answers = await createGitReader(repo, { git: counting }).showMany(requests);
    expect(answers.every((a) => a instanceof Uint8Array)).toBe(true);
    const calls = execFileSync('cat', [log], { encoding: 'utf8' }).trim().split('\n');
    expect(calls.filter((c) => c.includes('ls-tree'))).toHaveLength(2);
    expect(calls.filter((c) => c.includes('cat-file'))).toHaveLength(1);
    unlinkSync(counting);
    unlinkSync(log);
  });

  test('is empty for no requests, without running git', async () => {
    expect(await createGitReader(repo, { git: join(root, 'no-git-here') }).showMany([])).toEqual(
      [],
    );
  });
});

describe('gitContentSource(git, early)', () => {
  /** A reader whose `show` is counted and answers from git, or fails for one path. */
  function countingReader(): { reader: GitReader; shown: string[] } {
    const shown: string[] = [];
    return {
      shown,
      reader: {
        ...reader,
        show: (commit, path) => {
          shown.push(`${commit.slice(0, 7)}:${path}`);
          return path === 'models/unreadable.json'
            ? Promise.reject(new GitError('cannot read', ['cat-file'], 128, ''))
            : reader.show(commit, path);
        },
      },
    };
  }

  test('starts an early read at once and hands its result to the first read of that file only', async () => {
    const { reader: counted, shown } = countingReader();
    const source = gitContentSource(counted, [{ ref: base, path: 'models/a/config.json' }]);
    // Started before anyone asks.
    expect(shown).toEqual([`${base.slice(0, 7)}:models/a/config.json`]);
    const first = await source.read(base, 'models/a/config.json');
    expect(Buffer.from(first!).toString('utf8')).toBe(CONFIG_A);
    expect(shown).toHaveLength(1);
    // A second read, and a read of another version, go to git again.
    expect(Buffer.from((await source.read(base, 'models/a/config.json'))!).toString('utf8')).toBe(
      CONFIG_A,
    );
    await source.read(head, 'models/a/config.json');
    expect(shown).toHaveLength(3);
  });

  test("hands an early read's error to the read that asks, and leaves it unreported when none does", async () => {
    const { reader: counted } = countingReader();
    const asked = gitContentSource(counted, [{ ref: base, path: 'models/unreadable.json' }]);
    await expect(asked.read(base, 'models/unreadable.json')).rejects.toThrow('cannot read');
    // Never asked: the run failed before the gate read its policy. An unhandled rejection would
    // fail this test run (vitest reports them as errors).
    gitContentSource(counted, [{ ref: base, path: 'models/unreadable.json' }]);
    await new Promise((settle) => setTimeout(settle, 20));
  });
});

describe('hasCommit(rev), resolveCommit(rev), mergeBase(a, b)', () => {
  test('knows the commits of the repository and no others', async () => {
    expect(await reader.hasCommit(base)).toBe(true);
    expect(await reader.hasCommit('main')).toBe(true);
    expect(await reader.hasCommit('0123456789abcdef0123456789abcdef01234567')).toBe(false);
    expect(await reader.resolveCommit('HEAD')).toBe(head);
    expect(await reader.resolveCommit('no-such-branch')).toBeNull();
  });

  test('resolveCommits(revs) answers what `git rev-parse --verify --quiet <rev>^{commit}` answers, in one process', async () => {
    git('tag', 'v-light', base);
    git('tag', '-a', '-m', 'annotated', 'v-annotated', head);
    const treeId = git('rev-parse', 'HEAD^{tree}');
    const blobId = git('rev-parse', 'HEAD:models/stays.json');
    const revs = [
      head,
      base,
      'main',
      'HEAD~1',
      'v-light',
      'v-annotated',
      base.slice(0, 12),
      'no-such-branch',
      '0123456789abcdef0123456789abcdef01234567',
      treeId,
      blobId,
      'HEAD:models/stays.json',
      'HEAD~9',
    ];
    // The outside answer: git's own rev-parse, one process per revision.
    const expected = revs.map((rev) => {
      try {
        return execFileSync('git', ['rev-parse', '--verify', '--quiet', `${rev}^{commit}`], {
          cwd: repo,
          encoding: 'utf8',
          stdio: ['ignore', 'pipe', 'ignore'],
        }).trim();
      } catch {
        return null;
      }
    });
    expect(expected.filter((sha) => sha !== null)).toHaveLength(7);
    expect(await reader.resolveCommits(revs)).toEqual(expected);
    expect(await reader.resolveCommits([])).toEqual([]);
    await expect(reader.resolveCommits([head, '--output=/tmp/x'])).rejects.toThrow(/not usable/);
    await expect(reader.resolveCommits(['HEAD\nmain'])).rejects.toThrow(/not usable/);
  });

  test('mergeBase of a commit and its descendant is the commit', async () => {
    expect(await reader.mergeBase(base, head)).toBe(git('merge-base', base, head));
    expect(await reader.mergeBase(base, head)).toBe(base);
  });

  test('a revision that looks like an option is refused, not passed to git', async () => {
    await expect(reader.hasCommit('--output=/tmp/x')).rejects.toBeInstanceOf(GitError);
    await expect(reader.changedFiles('-p', head)).rejects.toThrow(/not usable/);
    await expect(reader.changedFiles(base, 'HEAD with space')).rejects.toThrow(/not usable/);
  });

  test('outside a repository git\'s failure is an error, not "no such commit"', async () => {
    const empty = mkdtempSync(join(root, 'not-a-repo-'));
    const error = await createGitReader(empty)
      .hasCommit('HEAD')
      .catch((e: unknown) => e);
    expect(error).toBeInstanceOf(GitError);
    expect((error as GitError).exitCode).toBe(128);
  });
});

describe('bounds', () => {
  test('a git call that runs past the timeout is stopped', async () => {
    const slow = join(root, 'slow-git');
    const pidFile = join(root, 'slow-git.pid');
    // `exec`: the process git's runner starts is the sleep itself, so stopping it ends the sleep.
    writeFileSync(slow, `#!/bin/sh\necho $$ > '${pidFile}'\nexec sleep 5\n`);
    chmodSync(slow, 0o755);
    const error = await createGitReader(repo, { git: slow, timeoutMs: 200 })
      .hasCommit('HEAD')
      .catch((e: unknown) => e);
    // A sleep that ran its 5 s would have exited 0: the error says it was stopped at 200 ms.
    expect(error).toBeInstanceOf(GitError);
    expect((error as Error).message).toMatch(/did not finish within 200 ms/);
    // And it is gone, not left running (signal 0 only checks that the process exists).
    const pid = Number(readFileSync(pidFile, 'utf8'));
    expect(pid).toBeGreaterThan(0);
    expect(() => process.kill(pid, 0)).toThrow(expect.objectContaining({ code: 'ESRCH' }));
    unlinkSync(slow);
    unlinkSync(pidFile);
  });

  test('listing output past its bound is refused', async () => {
    const error = await createGitReader(repo, { maxListBytes: 16 })
      .changedFiles(base, head)
      .catch((e: unknown) => e);
    expect((error as Error).message).toMatch(/more than 16 bytes/);
  });

  test('a missing git executable is a clear error', async () => {
    const error = await createGitReader(repo, { git: join(root, 'no-git-here') })
      .hasCommit('HEAD')
      .catch((e: unknown) => e);
    expect((error as Error).message).toMatch(/could not be started \(ENOENT\)/);
  });
});

describe('parseNameStatus(output)', () => {
  test('reads type changes as modified and copies as added', () => {
    expect(parseNameStatus('T\u0000a.json\u0000C075\u0000b.json\u0000c.json\u0000')).toEqual([
      { status: 'modified', path: 'a.json', previousPath: null },
      { status: 'added', path: 'c.json', previousPath: null },
    ]);
  });

  test('refuses an unknown status and a record cut short', () => {
    expect(() => parseNameStatus('X\u0000a.json\u0000')).toThrow(/status "X"/);
    expect(() => parseNameStatus('R100\u0000a.json\u0000')).toThrow(/ends inside/);
    expect(() => parseNameStatus('M\u0000')).toThrow(/ends after status/);
  });

  test('is empty for empty output', () => {
    expect(parseNameStatus('')).toEqual([]);
  });
});

describe('createScratchRepository(cwd)', () => {
  test('init and commitAll build a repository the reader can compare, with no git identity configured anywhere', async () => {
    const scratch = mkdtempSync(join(root, 'scratch-'));
    const emptyConfig = join(root, 'empty-gitconfig');
    writeFileSync(emptyConfig, '');
    const saved = {
      global: process.env.GIT_CONFIG_GLOBAL,
      nosystem: process.env.GIT_CONFIG_NOSYSTEM,
    };
    // Hide the machine's own settings: the scratch identity must be enough on a bare runner.
    process.env.GIT_CONFIG_GLOBAL = emptyConfig;
    process.env.GIT_CONFIG_NOSYSTEM = '1';
    try {
      const repository = createScratchRepository(scratch);
      await repository.init();
      writeFileSync(join(scratch, 'config.json'), '{"n_positions": 1024}\n');
      const first = await repository.commitAll('before');
      writeFileSync(join(scratch, 'config.json'), '{"n_positions": 2048}\n');
      const second = await repository.commitAll('after');
      const reader = createGitReader(scratch);
      expect(await reader.resolveCommit('main')).toBe(second);
      expect(await reader.changedFiles(first, second)).toEqual([
        { status: 'modified', path: 'config.json', previousPath: null },
      ]);
      expect(
        execFileSync('git', ['log', '-1', '--format=%an <%ae>'], {
          cwd: scratch,
          encoding: 'utf8',
        }).trim(),
      ).toBe('context-reach demo <demo@example.invalid>');
      // A commit with nothing changed still gets its own id.
      expect(await repository.commitAll('again')).not.toBe(second);
    } finally {
      if (saved.global === undefined) delete process.env.GIT_CONFIG_GLOBAL;
      else process.env.GIT_CONFIG_GLOBAL = saved.global;
      if (saved.nosystem === undefined) delete process.env.GIT_CONFIG_NOSYSTEM;
      else process.env.GIT_CONFIG_NOSYSTEM = saved.nosystem;
    }
  });
});
