import { INSPECT_USAGE, runInspect } from './inspect.js';
import type { Console } from './console.js';
import type { FileSource } from './files.js';
import { UsageError } from './options.js';

export interface CliDeps {
  files: FileSource;
  io: Console;
}

const USAGE = `context-reach: positional-range and context-budget review of transformer model configs

${INSPECT_USAGE}

Run 'context-reach COMMAND --help' for a command's options.`;

/** Dispatch a command; returns the exit status. Usage mistakes exit 2 with one line, no stack trace. */
export async function run(argv: string[], deps: CliDeps): Promise<number> {
  const [command, ...rest] = argv;
  try {
    switch (command) {
      case 'inspect':
        if (rest.includes('--help')) { deps.io.out(`${INSPECT_USAGE}\n`); return 0; }
        return await runInspect(rest, deps.files, deps.io);
      case undefined: case '--help': case '-h': case 'help':
        deps.io.out(`${USAGE}\n`);
        return command === undefined ? 2 : 0;
      case '--version':
        deps.io.out('context-reach 0.1.0\n');
        return 0;
      default:
        throw new UsageError(`unknown command '${command}'`);
    }
  } catch (error) {
    if (error instanceof UsageError || (error as { code?: string })?.code?.startsWith('ERR_PARSE_ARGS')) {
      deps.io.error(`context-reach: ${(error as Error).message}\n${USAGE}`);
      return 2;
    }
    throw error;
  }
}
