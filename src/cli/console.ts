/** The CLI's standard streams and environment, passed in so tests use their own. */
export interface Console {
  out(text: string): void;
  /**
   * Resolves once standard output has taken what `out` gave it (a pipe holds 64 KiB; the rest
   * waits in memory), so long output is written as it is made (default: at once).
   */
  drained?(): Promise<void>;
  error(text: string): void;
  stdout: { isTTY?: boolean };
  env: Record<string, string | undefined>;
  cwd: string;
}

export function createConsole(): Console {
  return {
    out: (text) => process.stdout.write(text),
    drained: () =>
      process.stdout.writableNeedDrain
        ? new Promise((done) => process.stdout.once('drain', () => done()))
        : Promise.resolve(),
    error: (text) => process.stderr.write(text.endsWith('\n') ? text : `${text}\n`),
    stdout: process.stdout,
    env: process.env,
    cwd: process.cwd(),
  };
}
