/**
 * The one error the readers throw: the file cannot be read as a model description at all
 * (bad text, bad syntax, an unsafe or unreadable structure, no model in it). Problems with
 * single values are findings instead, so one run reports all of them.
 */
export class ReadError extends Error {
  override readonly name = 'ReadError';
  /** The file as the caller named it. */
  readonly file: string;
  /** 1-based line the problem was found at (default: `null`, the whole file). */
  readonly line: number | null;
  /** Dotted key the problem is about (default: `null`). */
  readonly key: string | null;
  /** The problem without the file and line prefix. */
  readonly reason: string;

  constructor(file: string, line: number | null, reason: string, key: string | null = null) {
    super(`${file}${line === null ? '' : `, line ${line}`}: ${reason}`);
    this.file = file;
    this.line = line;
    this.key = key;
    this.reason = reason;
  }
}

/**
 * The text parsed but holds no model description (no format marker, no checkpoint keys). The
 * gate skips such files when only its default globs picked them, since `config.json` is a common
 * name for other things.
 */
export class NotAModelError extends ReadError {}
