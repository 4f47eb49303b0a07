/**
 * The size limit of a model config, the same for every way a file is read (git, the GitHub API,
 * the local file system): real configs are a few KiB, so anything larger is refused unread.
 */

/** Largest model config read, in bytes; larger files are refused unread (default: `4 MiB`). */
export const MAX_CONFIG_BYTES = 4 * 1024 * 1024;

/** A file refused because it is larger than `limit` bytes. */
export class ContentTooLargeError extends Error {
  constructor(
    readonly path: string,
    readonly size: number,
    readonly limit: number,
  ) {
    super(
      `${path} is ${size} bytes; expected at most ${limit} bytes for a model config (the file was not read)`,
    );
    this.name = 'ContentTooLargeError';
  }
}
