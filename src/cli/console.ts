/** The CLI's standard streams and environment, passed in so tests use their own. */
export interface Console {
  out(text: string): void;
  error(text: string): void;
  stdout: { isTTY?: boolean };
  env: Record<string, string | undefined>;
  cwd: string;
}

export function createConsole(): Console {
  return {
    out: (text) => process.stdout.write(text),
    error: (text) => process.stderr.write(text.endsWith('\n') ? text : `${text}\n`),
    stdout: process.stdout,
    env: process.env,
    cwd: process.cwd(),
  };
}
