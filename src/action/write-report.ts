/**
 * Writes the report files (JSON, SARIF, HTML) without following a symbolic link the pull request
 * put in the checkout: a link named like the report, or a folder on its way, could otherwise
 * send the write to any file the job may change (a later step's script, the git hooks).
 */
import { constants } from 'node:fs';
import { lstat, mkdir, open } from 'node:fs/promises';
import { dirname, isAbsolute, relative, resolve, sep } from 'node:path';

/** A report file that would be written through a symbolic link or onto something not a file. */
export class UnsafeReportPathError extends Error {
  constructor(message: string) {
    super(message);
    this.name = 'UnsafeReportPathError';
  }
}

async function kindOf(
  path: string,
): Promise<'missing' | 'symlink' | 'directory' | 'file' | 'other'> {
  try {
    const stat = await lstat(path);
    return stat.isSymbolicLink()
      ? 'symlink'
      : stat.isDirectory()
        ? 'directory'
        : stat.isFile()
          ? 'file'
          : 'other';
  } catch (error) {
    if ((error as NodeJS.ErrnoException).code === 'ENOENT') return 'missing';
    throw error;
  }
}

/** Size of one write of a report given in parts. */
const WRITE_BYTES = 1 << 20;

/**
 * Writes `text` (whole, or in parts) to `path` (relative paths from `cwd`). Inside `workspace` (the checkout, which
 * the pull request shapes) every folder on the way is made or checked one by one and none may be
 * a symbolic link; the file itself is opened with `O_NOFOLLOW` and must be a regular file or
 * new. Outside the checkout (the runner's temp folder) folders are made as usual.
 */
export async function writeReportFile(
  path: string,
  text: string | Iterable<string>,
  workspace: string,
  cwd = process.cwd(),
): Promise<void> {
  const target = resolve(cwd, path);
  const root = resolve(cwd, workspace);
  const inside = relative(root, target);
  const inWorkspace = inside !== '' && !inside.startsWith('..') && !isAbsolute(inside);
  if (inWorkspace) {
    let folder = root;
    for (const part of dirname(inside)
      .split(sep)
      .filter((p) => p !== '' && p !== '.')) {
      folder = resolve(folder, part);
      const kind = await kindOf(folder);
      if (kind === 'missing') await mkdir(folder);
      else if (kind !== 'directory') {
        throw new UnsafeReportPathError(
          `${relative(root, folder)} in the checkout is ${kind === 'symlink' ? 'a symbolic link' : 'not a folder'}; the report ${path} is not written through it (choose a report path outside the checkout, e.g. under RUNNER_TEMP)`,
        );
      }
    }
  } else {
    await mkdir(dirname(target), { recursive: true });
  }
  const kind = await kindOf(target);
  if (kind !== 'missing' && kind !== 'file') {
    throw new UnsafeReportPathError(
      `${path} is ${kind === 'symlink' ? 'a symbolic link' : 'not a regular file'}; the report is not written through it (choose a report path outside the checkout, e.g. under RUNNER_TEMP)`,
    );
  }
  // O_NOFOLLOW refuses a link that appears between the check and the open (0 where the platform has none).
  const handle = await open(
    target,
    constants.O_WRONLY | constants.O_CREAT | constants.O_TRUNC | (constants.O_NOFOLLOW ?? 0),
    0o644,
  );
  try {
    if (typeof text === 'string') await handle.writeFile(text, 'utf8');
    else {
      // Parts encoded one by one into a buffer of about a megabyte, written whole when full.
      // Not joined into one string first: joining parts that hold characters past Latin-1 and
      // encoding the join took 1.1 s of CPU for the 42 MB report of 3,000 configs, encoding
      // each part in place 0.1 s (measured 2026-12-02, load 14).
      let buffer = Buffer.allocUnsafe(WRITE_BYTES);
      let used = 0;
      const flush = async () => {
        for (let at = 0; at < used;) at += (await handle.write(buffer, at, used - at)).bytesWritten;
        used = 0;
      };
      for (const part of text) {
        // A UTF-16 code unit is at most 3 bytes of UTF-8 (a surrogate pair, two units, is 4).
        const room = part.length * 3;
        if (used + room > buffer.length) {
          await flush();
          if (room > buffer.length) buffer = Buffer.allocUnsafe(room);
        }
        used += buffer.write(part, used, 'utf8');
        if (used >= WRITE_BYTES) await flush();
      }
      await flush();
    }
  } finally {
    await handle.close();
  }
}
