/**
 * The one adapter for git: every git call of the action and the CLI goes through here. Git runs
 * as a child process with an argument array (never a shell), bounded output and a timeout.
 * Revisions and paths come from events and pull requests, so they are checked before use and
 * blobs are read with `cat-file` (no textconv or filters from the pull request's attributes).
 */
import { execFile } from 'node:child_process';
import type { ChangedFile } from '../core/changes.js';
import { elementAt } from '../core/element-at.js';
import type { ContentRequest, ContentSource } from '../core/gate.js';
import { ContentTooLargeError, MAX_CONFIG_BYTES } from './content-limit.js';

/** A git call that failed: exit status, signal, or output past its bound. */
export class GitError extends Error {
  constructor(
    message: string,
    readonly args: readonly string[],
    readonly exitCode: number | null,
    readonly stderr: string,
  ) {
    super(message);
    this.name = 'GitError';
  }
}

export type TreeEntryKind = 'file' | 'symlink' | 'submodule' | 'directory';

/** One entry of a commit's tree. */
export interface TreeEntry {
  kind: TreeEntryKind;
  /** Octal mode as git prints it: `100644`, `100755`, `120000`, `160000`, `040000`. */
  mode: string;
  /** Object id of the blob, tree or commit. */
  oid: string;
}

export interface GitReader {
  /** Whether `rev` names a commit present in the local repository (false in a shallow clone that lacks it). */
  hasCommit(rev: string): Promise<boolean>;
  /** Full object id of the commit `rev` names, or null when there is none. */
  resolveCommit(rev: string): Promise<string | null>;
  /** `resolveCommit` of each revision, in order, in one git process. */
  resolveCommits(revs: readonly string[]): Promise<(string | null)[]>;
  /** Files that differ between two commits, renames detected (`git diff --name-status -M -z`). */
  changedFiles(base: string, head: string): Promise<ChangedFile[]>;
  /** The tree entry at `path` in `commit`, or null when absent; symlinks are reported, never followed. */
  entry(commit: string, path: string): Promise<TreeEntry | null>;
  /**
   * Bytes of the regular file at `path` in `commit`; null when absent or not a regular file
   * (symlink, submodule, directory). Throws `ContentTooLargeError` past `MAX_CONFIG_BYTES`.
   */
  show(commit: string, path: string): Promise<Uint8Array | null>;
  /**
   * What `show` gives for each request, in order, with an `Error` in place of a throw; a few git
   * processes for all of them (one tree listing per commit and one `cat-file --batch`), not
   * three per file.
   */
  showMany(requests: readonly BlobRequest[]): Promise<(Uint8Array | null | Error)[]>;
  /** Best common ancestor of two commits, or null when they share none. */
  mergeBase(a: string, b: string): Promise<string | null>;
  /**
   * Fetches these commits (full ids) from the `origin` remote with `--depth=1`: one request for
   * every file of both sides, where the checkout is a repository whose remote answers (the
   * credentials `actions/checkout` leaves). Resolves false, never throws, when it cannot.
   */
  fetchCommits(commits: readonly string[], timeoutMs?: number): Promise<boolean>;
}

/** One file to read at one commit. */
export interface BlobRequest {
  commit: string;
  path: string;
}

export interface GitReaderOptions {
  /** Git executable (default: `git` from PATH). */
  git?: string;
  /** Time one git call may take, in milliseconds (default: `30000`). */
  timeoutMs?: number;
  /** Largest output of a listing call (diff, ls-tree), in bytes (default: `64 MiB`). */
  maxListBytes?: number;
  /** Largest file `show` reads, in bytes (default: `MAX_CONFIG_BYTES`). */
  maxFileBytes?: number;
}

interface RunResult {
  code: number;
  stdout: Buffer;
  stderr: string;
}

/** A revision from an event or an input: no option lookalikes, no control characters, sane length. */
function checkRevision(rev: string): string {
  if (
    typeof rev !== 'string' ||
    rev === '' ||
    rev.length > 256 ||
    rev.startsWith('-') ||
    /[\u0000-\u0020\u007f]/.test(rev)
  ) {
    throw new GitError(
      `revision ${JSON.stringify(rev)} is not usable; expected a commit id or ref name without spaces or a leading "-"`,
      [],
      null,
      '',
    );
  }
  return rev;
}

function checkPath(path: string): string {
  if (
    typeof path !== 'string' ||
    path === '' ||
    path.includes('\u0000') ||
    path.startsWith('/') ||
    path.split('/').some((part) => part === '' || part === '.' || part === '..')
  ) {
    throw new GitError(
      `path ${JSON.stringify(path)} is not usable; expected a repository-relative path without empty, "." or ".." parts`,
      [],
      null,
      '',
    );
  }
  return path;
}

const KINDS: Record<string, TreeEntryKind> = {
  blob: 'file',
  tree: 'directory',
  commit: 'submodule',
};

type Run = (args: string[], maxBuffer: number, input?: string) => Promise<RunResult>;

/** The git command of an argument list (`commit` in `-c user.name=x commit -m y`), for messages. */
function verb(args: readonly string[]): string {
  return args.find((arg, i) => !arg.startsWith('-') && args[i - 1] !== '-c') ?? 'command';
}

/** Runs git; resolves with any exit status, rejects on timeout, output overflow or spawn failure. */
function runner(cwd: string, git: string, timeout: number): Run {
  return function run(args, maxBuffer, input) {
    // The checkout's own settings stay, but nothing may prompt or run a file-system monitor.
    const full = ['-c', 'core.fsmonitor=false', '-c', 'core.quotePath=false', ...args];
    return new Promise((resolve, reject) => {
      const child = execFile(
        git,
        full,
        {
          cwd,
          encoding: 'buffer',
          maxBuffer,
          timeout,
          windowsHide: true,
          env: { ...process.env, GIT_TERMINAL_PROMPT: '0', GIT_OPTIONAL_LOCKS: '0', LC_ALL: 'C' },
        },
        (error, stdout, stderr) => {
          const errText = stderr.toString('utf8').slice(0, 2000).trim();
          if (!error) {
            resolve({ code: 0, stdout, stderr: errText });
            return;
          }
          const failure = error as NodeJS.ErrnoException & {
            code?: string | number;
            killed?: boolean;
            signal?: string | null;
          };
          if (failure.code === 'ERR_CHILD_PROCESS_STDIO_MAXBUFFER') {
            reject(
              new GitError(
                `git ${verb(args)} wrote more than ${maxBuffer} bytes; expected less (output refused)`,
                args,
                null,
                errText,
              ),
            );
          } else if (failure.killed || failure.signal) {
            reject(
              new GitError(
                `git ${verb(args)} did not finish within ${timeout} ms (stopped with ${failure.signal ?? 'a signal'})`,
                args,
                null,
                errText,
              ),
            );
          } else if (typeof failure.code === 'number') {
            resolve({ code: failure.code, stdout, stderr: errText });
          } else {
            reject(
              new GitError(
                `git could not be started (${failure.code ?? failure.message}); expected a git executable at ${JSON.stringify(git)}`,
                args,
                null,
                errText,
              ),
            );
          }
        },
      );
      if (input !== undefined) {
        // A git that exits before reading all of it closes the pipe; its exit status says why.
        child.stdin?.on('error', () => {});
        child.stdin?.end(input);
      }
    });
  };
}

function failed(args: string[], result: RunResult): GitError {
  const reason = result.stderr.split('\n')[0] || 'no message';
  return new GitError(
    `git ${args.join(' ')} failed with exit status ${result.code}: ${reason}`,
    args,
    result.code,
    result.stderr,
  );
}

export function createGitReader(cwd: string, options: GitReaderOptions = {}): GitReader {
  const git = options.git ?? 'git';
  const timeout = options.timeoutMs ?? 30_000;
  const maxList = options.maxListBytes ?? 64 * 1024 * 1024;
  const maxFile = options.maxFileBytes ?? MAX_CONFIG_BYTES;
  const run = runner(cwd, git, timeout);
  /**
   * Tree entries the diff already named, by commit id and path: only under full commit ids,
   * which cannot move, so a later read of the same file needs no `ls-tree`.
   */
  const known = new Map<string, TreeEntry | null>();
  const knownKey = (commit: string, path: string) => `${commit}\u0000${path}`;
  const remember = (commit: string, path: string | null, entry: TreeEntry | null) => {
    if (path !== null && FULL_ID.test(commit)) known.set(knownKey(commit, path), entry);
  };
  /** Sizes of blobs `cat-file --batch-check` gave, by object id (a blob's size never changes). */
  const sizeOf = new Map<string, number>();

  async function resolveCommit(rev: string): Promise<string | null> {
    const args = ['rev-parse', '--verify', '--quiet', `${checkRevision(rev)}^{commit}`];
    const result = await run(args, 4096);
    if (result.code === 0) return result.stdout.toString('utf8').trim();
    // --quiet turns "no such commit" into exit status 1 and nothing else.
    if (result.code === 1) return null;
    throw failed(args, result);
  }

  /**
   * Several revisions in one `cat-file --batch-check` of `<rev>^{commit}` lines: git answers
   * `<id> commit <size>` for a commit, `<line> missing` where `rev-parse --verify` finds none
   * (no such name, or an object that does not peel to a commit). Revisions are checked as for
   * `resolveCommit`, so no line holds a space or a line break.
   */
  async function resolveCommits(revs: readonly string[]): Promise<(string | null)[]> {
    const names = revs.map((rev) => `${checkRevision(rev)}^{commit}`);
    if (names.length === 0) return [];
    const args = ['cat-file', '--batch-check'];
    const result = await run(args, names.length * 400 + 4096, `${names.join('\n')}\n`);
    if (result.code !== 0) throw failed(args, result);
    const lines = result.stdout.toString('utf8').split('\n');
    return names.map((name, i) => {
      const line = lines[i] ?? '';
      const found = /^([0-9a-f]{40}|[0-9a-f]{64}) commit \d+$/.exec(line);
      if (found) return found[1]!;
      if (line === `${name} missing` || line === `${name} ambiguous`) return null;
      throw new GitError(
        `git cat-file --batch-check answered ${JSON.stringify(line)} for ${name}; expected a commit id or "missing"`,
        args,
        null,
        result.stderr,
      );
    });
  }

  async function entry(commit: string, path: string): Promise<TreeEntry | null> {
    checkPath(path);
    const found = (await listEntries(checkRevision(commit), [path]))?.get(path);
    return found ? { kind: found.kind, mode: found.mode, oid: found.oid } : null;
  }

  /**
   * Tree entries with their sizes for many paths of one commit, one `ls-tree` per chunk of paths.
   * `--literal-pathspecs` keeps `*`, `[` and `:` in names literal and `--full-tree` makes paths
   * repository-relative; a pathspec never descends through a symlink or a file, and names are
   * compared exactly after listing.
   */
  async function listEntries(
    commit: string,
    paths: string[],
  ): Promise<Map<string, SizedEntry> | null> {
    const listed = new Map<string, SizedEntry>();
    for (const chunk of pathChunks(paths)) {
      const args = [
        '--literal-pathspecs',
        'ls-tree',
        '-z',
        '-l',
        '--full-tree',
        commit,
        '--',
        ...chunk,
      ];
      const result = await run(args, maxList);
      if (result.code !== 0) {
        if (
          /not a tree object|Not a valid object name|does not exist|bad revision/i.test(
            result.stderr,
          )
        )
          return null;
        throw failed(args, result);
      }
      for (const record of result.stdout.toString('utf8').split('\u0000')) {
        const tab = record.indexOf('\t');
        if (tab < 0) continue;
        const [mode = '', type = '', oid = '', size = ''] = record.slice(0, tab).split(/ +/);
        const kind: TreeEntryKind = mode === '120000' ? 'symlink' : (KINDS[type] ?? 'file');
        listed.set(record.slice(tab + 1), {
          kind,
          mode,
          oid,
          size: size === '-' ? null : Number(size),
        });
      }
    }
    return listed;
  }

  /** Blob bytes by object id, from `cat-file --batch` calls of at most `BATCH_BYTES` each. */
  async function readBlobs(blobs: Map<string, number>): Promise<Map<string, Uint8Array | Error>> {
    const read = new Map<string, Uint8Array | Error>();
    let batch: string[] = [];
    let bytes = 0;
    const flush = async () => {
      if (batch.length === 0) return;
      const oids = batch;
      // Each answer is `<oid> blob <size>\n<bytes>\n`; the sizes are known, so the bound is exact.
      const bound = oids.reduce((sum, oid) => sum + blobs.get(oid)! + oid.length + 32, 0);
      batch = [];
      bytes = 0;
      const args = ['cat-file', '--batch'];
      try {
        const result = await run(args, bound, `${oids.join('\n')}\n`);
        if (result.code !== 0) throw failed(args, result);
        parseBatch(result.stdout, oids, read, maxFile);
      } catch (error) {
        for (const oid of oids)
          if (!read.has(oid))
            read.set(oid, error instanceof Error ? error : new Error(String(error)));
      }
    };
    for (const [oid, size] of blobs) {
      if (bytes + size > BATCH_BYTES) await flush();
      batch.push(oid);
      bytes += size;
    }
    await flush();
    return read;
  }

  /**
   * Sizes of blobs by object id from one `cat-file --batch-check` (null for an object that is
   * missing or not a blob), so nothing over the size limit is ever read.
   */
  async function blobSizes(all: string[]): Promise<Map<string, number | Error | null>> {
    const sizes = new Map<string, number | Error | null>();
    // An object id names the same bytes for ever: a size asked once is not asked again.
    const oids = all.filter((oid) => {
      if (!sizeOf.has(oid)) return true;
      sizes.set(oid, sizeOf.get(oid)!);
      return false;
    });
    if (oids.length === 0) return sizes;
    const args = ['cat-file', '--batch-check'];
    const result = await run(args, oids.length * 128 + 4096, `${oids.join('\n')}\n`);
    if (result.code !== 0) throw failed(args, result);
    const lines = result.stdout.toString('utf8').split('\n');
    oids.forEach((oid, i) => {
      const [name, type, size] = (lines[i] ?? '').split(' ');
      if (name !== oid)
        sizes.set(
          oid,
          new GitError(
            `git cat-file --batch-check answered ${JSON.stringify(lines[i] ?? '')} for ${oid}; expected its type and size`,
            args,
            null,
            '',
          ),
        );
      else {
        const answer = type === 'blob' && size !== undefined ? Number(size) : null;
        sizes.set(oid, answer);
        if (answer !== null) sizeOf.set(oid, answer);
      }
    });
    return sizes;
  }

  async function showMany(
    requests: readonly BlobRequest[],
  ): Promise<(Uint8Array | null | Error)[]> {
    const answers: (Uint8Array | null | Error)[] = requests.map(() => null);
    const byCommit = new Map<string, number[]>();
    requests.forEach((request, i) => {
      try {
        checkRevision(request.commit);
        checkPath(request.path);
      } catch (error) {
        answers[i] = error as Error;
        return;
      }
      const group = byCommit.get(request.commit);
      if (group) group.push(i);
      else byCommit.set(request.commit, [i]);
    });
    const wanted = new Map<number, string>();
    const blobs = new Map<string, number>();
    // Entries the diff named need no listing, only their sizes: one `cat-file --batch-check`.
    const fromDiff = new Map<number, TreeEntry | null>();
    for (const [commit, indexes] of byCommit) {
      const rest = indexes.filter((i) => {
        const key = knownKey(commit, requests[i]!.path);
        if (!known.has(key)) return true;
        fromDiff.set(i, known.get(key)!);
        return false;
      });
      if (rest.length === 0) byCommit.delete(commit);
      else byCommit.set(commit, rest);
    }
    let sizes = new Map<string, number | Error | null>();
    if (fromDiff.size > 0) {
      const oids = [
        ...new Set(
          [...fromDiff.values()].filter((e) => e !== null && e.kind === 'file').map((e) => e!.oid),
        ),
      ];
      sizes = await blobSizes(oids).catch(
        (error: unknown) =>
          new Map(
            oids.map((oid) => [oid, error instanceof Error ? error : new Error(String(error))]),
          ),
      );
    }
    for (const [i, found] of fromDiff) {
      if (found === null || found.kind !== 'file') continue;
      const size = sizes.get(found.oid);
      if (size instanceof Error) {
        answers[i] = size;
        continue;
      }
      place(i, { ...found, size: size ?? null });
    }
    function place(i: number, found: SizedEntry): void {
      const path = requests[i]!.path;
      if (found.size === null || !Number.isSafeInteger(found.size) || found.size > maxFile) {
        answers[i] = new ContentTooLargeError(path, found.size ?? Number.NaN, maxFile);
        return;
      }
      wanted.set(i, found.oid);
      blobs.set(found.oid, found.size);
    }
    for (const [commit, indexes] of byCommit) {
      let listed: Map<string, SizedEntry> | null;
      try {
        listed = await listEntries(commit, [...new Set(indexes.map((i) => requests[i]!.path))]);
      } catch (error) {
        for (const i of indexes) answers[i] = error as Error;
        continue;
      }
      for (const i of indexes) {
        const path = requests[i]!.path;
        const found = listed?.get(path);
        // Absent, a symlink, a submodule or a directory: not a regular file, never followed.
        if (found === undefined || found.kind !== 'file') continue;
        place(i, found);
      }
    }
    const read = await readBlobs(blobs);
    for (const [i, oid] of wanted)
      answers[i] =
        read.get(oid) ??
        new GitError(
          `git cat-file --batch gave nothing for ${oid}; expected the blob of ${requests[i]!.path}`,
          ['cat-file', '--batch'],
          null,
          '',
        );
    return answers;
  }

  return {
    async hasCommit(rev) {
      return (await resolveCommit(rev)) !== null;
    },
    resolveCommit,
    resolveCommits,
    async changedFiles(base, head) {
      // `--raw` is `--name-status` with both sides' modes and blob ids: the blobs are then read
      // without listing any tree again.
      const args = [
        'diff',
        '--raw',
        '--no-abbrev',
        '-M',
        '-z',
        '--no-ext-diff',
        '--no-textconv',
        '--no-color',
        checkRevision(base),
        checkRevision(head),
        '--',
      ];
      const result = await run(args, maxList);
      if (result.code !== 0) throw failed(args, result);
      const records = parseRawDiff(result.stdout.toString('utf8'));
      for (const record of records) {
        remember(base, record.basePath, record.baseEntry);
        remember(head, record.file.path, record.headEntry);
      }
      return records.map((record) => record.file);
    },
    entry,
    async show(commit, path) {
      const [answer] = await showMany([{ commit, path }]);
      if (answer instanceof Error) throw answer;
      return answer ?? null;
    },
    showMany,
    async fetchCommits(commits, timeoutMs = 120_000) {
      if (
        commits.length === 0 ||
        commits.some((commit) => !/^([0-9a-f]{40}|[0-9a-f]{64})$/.test(commit))
      )
        return false;
      try {
        const remote = await run(['remote', 'get-url', 'origin'], 64 * 1024);
        if (remote.code !== 0) return false;
        const fetchRun = runner(cwd, git, timeoutMs);
        const result = await fetchRun(
          [
            '-c',
            'protocol.version=2',
            'fetch',
            '--quiet',
            '--no-tags',
            '--no-recurse-submodules',
            '--no-write-fetch-head',
            '--depth=1',
            'origin',
            ...new Set(commits),
          ],
          1024 * 1024,
        );
        return result.code === 0;
      } catch {
        return false;
      }
    },
    async mergeBase(a, b) {
      const args = ['merge-base', checkRevision(a), checkRevision(b)];
      const result = await run(args, 4096);
      if (result.code === 0) return result.stdout.toString('utf8').trim();
      if (result.code === 1) return null;
      throw failed(args, result);
    },
  };
}

/** A tree entry with the blob size `ls-tree -l` prints (null for trees and submodules). */
interface SizedEntry extends TreeEntry {
  size: number | null;
}

/** Paths per `ls-tree` call, and characters of them: command lines stay far below Windows' 32,767. */
const PATHS_PER_LISTING = 200;
const CHARS_PER_LISTING = 8000;

/** Bytes of blobs one `cat-file --batch` call returns at most (default: `64 MiB`), so output stays bounded. */
const BATCH_BYTES = 64 * 1024 * 1024;

function pathChunks(paths: string[]): string[][] {
  const chunks: string[][] = [];
  let chunk: string[] = [];
  let chars = 0;
  for (const path of paths) {
    if (
      chunk.length > 0 &&
      (chunk.length >= PATHS_PER_LISTING || chars + path.length > CHARS_PER_LISTING)
    ) {
      chunks.push(chunk);
      chunk = [];
      chars = 0;
    }
    chunk.push(path);
    chars += path.length + 1;
  }
  if (chunk.length > 0) chunks.push(chunk);
  return chunks;
}

/**
 * Splits `cat-file --batch` output for `oids`, in order, into `read`: `<oid> <type> <size>\n`, the
 * bytes, `\n`; `<oid> missing\n` for an absent object. Anything else is an error for that object.
 */
function parseBatch(
  output: Buffer,
  oids: string[],
  read: Map<string, Uint8Array | Error>,
  maxFile: number,
): void {
  let at = 0;
  for (const oid of oids) {
    const end = output.indexOf(0x0a, at);
    if (end < 0)
      throw new GitError(
        `git cat-file --batch output ends before ${oid}; expected one answer per object`,
        ['cat-file', '--batch'],
        null,
        '',
      );
    const [name, type, sizeText] = output.toString('utf8', at, end).split(' ');
    at = end + 1;
    if (name !== oid || type !== 'blob') {
      read.set(
        oid,
        new GitError(
          `git cat-file --batch answered ${JSON.stringify(`${name} ${type}`)} for ${oid}; expected a blob`,
          ['cat-file', '--batch'],
          null,
          '',
        ),
      );
      if (type !== 'missing' && sizeText !== undefined) at += Number(sizeText) + 1;
      continue;
    }
    const size = Number(sizeText);
    if (!Number.isSafeInteger(size) || size > maxFile || at + size > output.length) {
      throw new GitError(
        `git cat-file --batch gave ${sizeText} bytes for ${oid}; expected at most ${maxFile} within its output`,
        ['cat-file', '--batch'],
        null,
        '',
      );
    }
    read.set(oid, new Uint8Array(output.buffer, output.byteOffset + at, size));
    at += size + 1;
  }
}

/**
 * The gate's content source over a git reader: single reads with `show`, and every version of a
 * run in one `showMany` (for the files `changedFiles` named, one `cat-file --batch-check` and
 * one `cat-file --batch`, however many files).
 *
 * `early` names files to start reading now, before the gate asks: the shells pass the policy, so
 * its two git processes run while git still finds the merge base and lists the changes instead
 * of after. The first `read` of such a file gets that read's result or error; later reads read
 * again. A run that fails before it asks leaves the early read unused, and its error unreported.
 */
export function gitContentSource(
  git: GitReader,
  early: readonly ContentRequest[] = [],
): ContentSource {
  const started = new Map<string, Promise<Uint8Array | null>>();
  const key = (ref: string, path: string) => `${ref}\u0000${path}`;
  for (const { ref, path } of early) {
    const reading = git.show(ref, path);
    reading.catch(() => undefined);
    started.set(key(ref, path), reading);
  }
  return {
    read: (ref, path) => {
      const reading = started.get(key(ref, path));
      if (reading === undefined) return git.show(ref, path);
      started.delete(key(ref, path));
      return reading;
    },
    readMany: (requests) => git.showMany(requests.map((r) => ({ commit: r.ref, path: r.path }))),
    exists: async (ref, path) => (await git.entry(ref, path)) !== null,
  };
}

/**
 * A git command that must succeed, for callers with their own recipe of calls (the CLI's demo
 * repository): the same child process, bounds and settings as every other call here. Resolves
 * with standard output trimmed; throws `GitError` on a non-zero exit status.
 */
export type GitCommand = (args: string[]) => Promise<string>;

export function createGitCommand(
  cwd: string,
  options: Pick<GitReaderOptions, 'git' | 'timeoutMs'> = {},
): GitCommand {
  const run = runner(cwd, options.git ?? 'git', options.timeoutMs ?? 30_000);
  return async (args) => {
    const result = await run(args, 1024 * 1024);
    if (result.code !== 0) throw failed(args, result);
    return result.stdout.toString('utf8').trim();
  };
}

/** A full commit id (SHA-1 or SHA-256). */
const FULL_ID = /^(?:[0-9a-f]{40}|[0-9a-f]{64})$/;

/** One record of `git diff --raw -z`: the changed file, and its tree entry on each side (null where absent). */
export interface RawDiffRecord {
  file: ChangedFile;
  /** Path at base (the old path of a rename); null for an added or copied file. */
  basePath: string | null;
  baseEntry: TreeEntry | null;
  headEntry: TreeEntry | null;
}

function rawEntry(mode: string, oid: string): TreeEntry | null {
  if (/^0+$/.test(mode)) return null;
  const kind: TreeEntryKind =
    mode === '120000'
      ? 'symlink'
      : mode === '160000'
        ? 'submodule'
        : mode.startsWith('04')
          ? 'directory'
          : 'file';
  return { kind, mode, oid };
}

/**
 * Parses `git diff --raw --no-abbrev -z` output: `:<old mode> <new mode> <old id> <new id>
 * <status>` NUL path NUL, or for renames and copies NUL old NUL new NUL. The files are what
 * `parseNameStatus` gives for the same diff; the entries are each side's mode and blob id.
 */
export function parseRawDiff(output: string): RawDiffRecord[] {
  const fields = output.split('\u0000');
  if (fields[fields.length - 1] === '') fields.pop();
  const records: RawDiffRecord[] = [];
  for (let i = 0; i < fields.length;) {
    const header = fields[i]!;
    const [oldMode = '', newMode = '', oldId = '', newId = '', status = ''] = header
      .replace(/^:/, '')
      .split(' ');
    if (!header.startsWith(':') || status === '')
      throw new GitError(
        `git diff --raw record ${JSON.stringify(header)} is not "<modes> <ids> <status>"; expected a raw diff header`,
        [],
        null,
        '',
      );
    const letter = status.charAt(0);
    const paths = letter === 'R' || letter === 'C' ? 2 : 1;
    const names = fields.slice(i + 1, i + 1 + paths);
    // The name-status parser decides statuses and reports a record cut short.
    const [file] = parseNameStatus([status, ...names].join('\u0000') + '\u0000');
    if (file === undefined)
      throw new GitError(
        `git diff output ends after status ${JSON.stringify(status)}; expected a path`,
        [],
        null,
        '',
      );
    const basePath = letter === 'A' || letter === 'C' ? null : names[0]!;
    records.push({
      file,
      basePath,
      baseEntry: basePath === null ? null : rawEntry(oldMode, oldId),
      headEntry: letter === 'D' ? null : rawEntry(newMode, newId),
    });
    i += 1 + paths;
  }
  return records;
}

/**
 * Parses `git diff --name-status -z` output: `STATUS NUL path NUL`, or for renames and copies
 * `R<score> NUL old NUL new NUL`. Copies count as added files; type changes as modified.
 */
export function parseNameStatus(output: string): ChangedFile[] {
  const fields = output.split('\u0000');
  if (fields[fields.length - 1] === '') fields.pop();
  const files: ChangedFile[] = [];
  for (let i = 0; i < fields.length;) {
    const status = elementAt(fields, i);
    const letter = status.charAt(0);
    if (letter === 'R' || letter === 'C') {
      const previous = fields[i + 1];
      const path = fields[i + 2];
      if (previous === undefined || path === undefined)
        throw new GitError(
          `git diff output ends inside a ${JSON.stringify(status)} record; expected two paths`,
          [],
          null,
          '',
        );
      files.push(
        letter === 'R'
          ? { status: 'renamed', path, previousPath: previous }
          : { status: 'added', path, previousPath: null },
      );
      i += 3;
      continue;
    }
    const path = fields[i + 1];
    if (path === undefined)
      throw new GitError(
        `git diff output ends after status ${JSON.stringify(status)}; expected a path`,
        [],
        null,
        '',
      );
    if (letter === 'A') files.push({ status: 'added', path, previousPath: null });
    else if (letter === 'M' || letter === 'T')
      files.push({ status: 'modified', path, previousPath: null });
    else if (letter === 'D') files.push({ status: 'deleted', path, previousPath: null });
    else
      throw new GitError(
        `git diff reported status ${JSON.stringify(status)} for ${JSON.stringify(path)}; expected A, M, T, D, R or C`,
        [],
        null,
        '',
      );
    i += 2;
  }
  return files;
}

/** Git calls about the working tree, for the CLI's local runs (`diff` before a push). */
export interface WorktreeGit {
  /** Absolute path of the repository's top folder (`git rev-parse --show-toplevel`). */
  topLevel(): Promise<string>;
  /** Commit of the current branch's upstream (`@{upstream}`); null without one or on a detached HEAD. */
  upstream(): Promise<string | null>;
  /**
   * Tracked files that differ between `base` and the working tree, staged and unstaged alike
   * (`git diff --name-status -M -z BASE`); untracked files are not part of it until added.
   */
  changedSince(base: string): Promise<ChangedFile[]>;
  /** Files git knows in the working tree: tracked, plus untracked ones not ignored (`ls-files -co --exclude-standard`). */
  listFiles(): Promise<string[]>;
}

export function createWorktreeGit(
  cwd: string,
  options: Pick<GitReaderOptions, 'git' | 'timeoutMs' | 'maxListBytes'> = {},
): WorktreeGit {
  const run = runner(cwd, options.git ?? 'git', options.timeoutMs ?? 30_000);
  const maxList = options.maxListBytes ?? 64 * 1024 * 1024;
  return {
    async topLevel() {
      const args = ['rev-parse', '--show-toplevel'];
      const result = await run(args, 64 * 1024);
      if (result.code !== 0) throw failed(args, result);
      return result.stdout.toString('utf8').trim();
    },
    async upstream() {
      const args = ['rev-parse', '--verify', '--quiet', '@{upstream}^{commit}'];
      const result = await run(args, 4096);
      if (result.code === 0) return result.stdout.toString('utf8').trim();
      // No upstream configured, a detached HEAD, or an upstream whose ref is gone.
      if (
        result.code === 1 ||
        /upstream|does not point to a branch|no such branch/i.test(result.stderr)
      )
        return null;
      throw failed(args, result);
    },
    async changedSince(base) {
      const args = [
        'diff',
        '--name-status',
        '-M',
        '-z',
        '--no-ext-diff',
        '--no-textconv',
        '--no-color',
        checkRevision(base),
        '--',
      ];
      const result = await run(args, maxList);
      if (result.code !== 0) throw failed(args, result);
      return parseNameStatus(result.stdout.toString('utf8'));
    },
    async listFiles() {
      const args = ['ls-files', '-z', '--cached', '--others', '--exclude-standard', '--full-name'];
      const result = await run(args, maxList);
      if (result.code !== 0) throw failed(args, result);
      return [
        ...new Set(
          result.stdout
            .toString('utf8')
            .split('\u0000')
            .filter((path) => path !== ''),
        ),
      ];
    },
  };
}
