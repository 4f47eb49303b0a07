import { createGitCommand, type GitReaderOptions } from '../adapters/git.js';

/** A throwaway repository the demo commits its base and head trees into. */
export interface ScratchRepository {
  /** `git init` with `main` as the branch. */
  init(): Promise<void>;
  /** Stages everything in the working tree and commits it; resolves with the new commit id. */
  commitAll(message: string): Promise<string>;
}

/** Identity of scratch commits: invented, so no one's global git settings are needed or used. */
const SCRATCH_IDENTITY = [
  '-c',
  'user.name=context-reach demo',
  '-c',
  'user.email=demo@example.invalid',
  '-c',
  'commit.gpgsign=false',
];

export function createScratchRepository(
  cwd: string,
  options: Pick<GitReaderOptions, 'git' | 'timeoutMs'> = {},
): ScratchRepository {
  const must = createGitCommand(cwd, options);
  return {
    async init() {
      await must(['init', '-q']);
      // `init -b` needs git 2.28; pointing HEAD works on any git.
      await must(['symbolic-ref', 'HEAD', 'refs/heads/main']);
    },
    async commitAll(message) {
      await must(['add', '-A']);
      await must([
        ...SCRATCH_IDENTITY,
        'commit',
        '-q',
        '--allow-empty',
        '--no-verify',
        '-m',
        message,
      ]);
      return must(['rev-parse', 'HEAD']);
    },
  };
}
