import { open, stat } from 'node:fs/promises';
import { MAX_CONFIG_BYTES } from './content-limit.js';

/** The one adapter for reading local files: the CLI's named files, the action's report files. */
export interface FileSource {
  read(path: string): Promise<Uint8Array>;
}

/** Reads a local file the user named, refusing directories and anything over the size limit unread. */
export function createFileSource(maxBytes = MAX_CONFIG_BYTES): FileSource {
  return {
    async read(path) {
      const info = await stat(path).catch((error: NodeJS.ErrnoException) => {
        throw new Error(
          error.code === 'ENOENT'
            ? `${path}: no such file`
            : `${path}: cannot be read (${error.code ?? error.message})`,
        );
      });
      if (info.isDirectory())
        throw new Error(`${path}: is a directory, expected a model config file`);
      if (info.size > maxBytes) {
        throw new Error(
          `${path}: ${info.size} bytes is over the ${maxBytes}-byte limit for a model config; it was not read`,
        );
      }
      const handle = await open(path, 'r');
      try {
        const buffer = new Uint8Array(Math.min(info.size, maxBytes) + 1);
        const { bytesRead } = await handle.read(buffer, 0, buffer.length, 0);
        if (bytesRead > maxBytes)
          throw new Error(`${path}: over the ${maxBytes}-byte limit for a model config`);
        return buffer.subarray(0, bytesRead);
      } finally {
        await handle.close();
      }
    },
  };
}
