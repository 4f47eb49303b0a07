import { lstat } from 'node:fs/promises';
import { join } from 'node:path';
import { MAX_CONFIG_BYTES } from '../adapters/content-limit.js';
import { createFileSource } from '../adapters/file-source.js';

/** The working tree's bytes of repository-relative paths, for local runs before a push or commit. */
export interface WorktreeFiles {
  /** Bytes of the regular file at `path` under the top folder; null when absent or not a regular file (a symlink is never followed). */
  read(path: string): Promise<Uint8Array | null>;
}

/** Reads files of the working tree under `topLevel`, as git would see them: no symlinks, the size limit of a model config. */
export function createWorktreeFiles(topLevel: string, maxBytes = MAX_CONFIG_BYTES): WorktreeFiles {
  const files = createFileSource(maxBytes);
  return {
    async read(path) {
      if (
        path === '' ||
        path.startsWith('/') ||
        path.split('/').some((part) => part === '' || part === '.' || part === '..')
      ) {
        throw new Error(
          `path ${JSON.stringify(path)} is not usable; expected a repository-relative path without empty, "." or ".." parts`,
        );
      }
      const full = join(topLevel, path);
      const info = await lstat(full).catch((error: NodeJS.ErrnoException) => {
        if (error.code === 'ENOENT' || error.code === 'ENOTDIR') return null;
        throw new Error(`${path}: cannot be read (${error.code ?? error.message})`);
      });
      if (info === null || !info.isFile()) return null;
      return files.read(full);
    },
  };
}
