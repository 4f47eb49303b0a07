import { INSPECT_USAGE, runInspect } from './inspect.js';
import type { Console } from './console.js';
import type { FileSource } from '../adapters/file-source.js';
import { optionLines, UsageError } from './options.js';
import { VERSION } from '../core/version.js';

export interface CliDeps {
  files: FileSource;
  io: Console;
}

export const DEMO_USAGE = `usage: context-reach demo [--format markdown|text|json] [--keep] [--html FILE]
${optionLines([
  ['--format F', 'one of markdown, text, json (default: markdown, the pull-request comment)'],
  ['--keep', 'keep the scratch git repository the demo builds, and print where (default: removed)'],
  ['--html FILE', 'also write the standalone HTML report to FILE (default: none)'],
])}`;

interface Command {
  usage: string;
  run(args: string[], deps: CliDeps): Promise<number>;
}

// `diff` and `demo` (git, the gate, the HTML report) are loaded when asked for, so `inspect` and
// `--version` start without compiling them.
const COMMANDS: Record<string, () => Promise<Command>> = {
  inspect: async () => ({
    usage: INSPECT_USAGE,
    run: (args, deps) => runInspect(args, deps.files, deps.io),
  }),
  diff: async () => {
    const { DIFF_USAGE, runDiff } = await import('./diff.js');
    return { usage: DIFF_USAGE, run: (args, deps) => runDiff(args, deps.io) };
  },
  init: async () => {
    const { INIT_USAGE, runInit } = await import('./init.js');
    return { usage: INIT_USAGE, run: (args, deps) => runInit(args, deps.io) };
  },
  demo: async () => {
    const { runDemo } = await import('./demo.js');
    return { usage: DEMO_USAGE, run: (args, deps) => runDemo(args, deps.io) };
  },
};

async function usage(): Promise<string> {
  const { DIFF_USAGE } = await import('./diff.js');
  const { INIT_USAGE } = await import('./init.js');
  return `context-reach: positional-range and context-budget review of transformer model configs

${INSPECT_USAGE}

${DIFF_USAGE}

${INIT_USAGE}

${DEMO_USAGE}

'context-reach COMMAND --help' shows one command's usage.`;
}

/** Dispatch a command; returns the exit status. Usage mistakes exit 2 with one line, no stack trace. */
export async function run(argv: string[], deps: CliDeps): Promise<number> {
  const [command, ...rest] = argv;
  if (command === undefined || command === '--help' || command === '-h' || command === 'help') {
    deps.io.out(`${await usage()}\n`);
    return command === undefined ? 2 : 0;
  }
  if (command === '--version') {
    deps.io.out(`context-reach ${VERSION}\n`);
    return 0;
  }
  const load = Object.hasOwn(COMMANDS, command) ? COMMANDS[command] : undefined;
  const entry = load ? await load() : undefined;
  try {
    if (!entry) throw new UsageError(`unknown command '${command}'`);
    if (rest.includes('--help') || rest.includes('-h')) {
      deps.io.out(`${entry.usage}\n`);
      return 0;
    }
    return await entry.run(rest, deps);
  } catch (error) {
    const code = (error as { code?: unknown } | null)?.code;
    if (
      error instanceof UsageError ||
      (typeof code === 'string' && code.startsWith('ERR_PARSE_ARGS'))
    ) {
      deps.io.error(
        `context-reach: ${(error as Error).message}\n${entry?.usage ?? (await usage())}`,
      );
      return 2;
    }
    throw error;
  }
}
