import { readFile } from 'node:fs/promises';
import { createFileSource } from '../adapters/file-source.js';
import { createGitReader } from '../adapters/git.js';
import { createGitHubClient } from '../adapters/github-rest.js';
import { runAction } from './run-action.js';
import { writeReportFile } from './write-report.js';
import { createRunnerOutput } from './runner-output.js';

// The entry only wires the real adapters to the action; errors become one failed-check message.
import('./toolkit.js').then(
  (core) => {
    const out = createRunnerOutput(core);
    return runAction({
      env: process.env,
      getInput: (name) => core.getInput(name),
      out,
      readJson: async (path) => JSON.parse(await readFile(path, 'utf8')) as unknown,
      readFile: (path, maxBytes) => createFileSource(maxBytes).read(path),
      // Never through a symbolic link the pull request put in the checkout.
      writeFile: (path, text) =>
        writeReportFile(path, text, process.env.GITHUB_WORKSPACE ?? process.cwd()),
      createGit: (cwd) => createGitReader(cwd),
      createGitHub: (token, options) => createGitHubClient(token, options),
    }).catch((error: unknown) => {
      out.fail(`context-reach failed: ${error instanceof Error ? error.message : String(error)}`);
    });
  },
  (error: unknown) => {
    // Without the toolkit there is no workflow command to fail with: the exit status says it.
    process.exitCode = 1;
    console.error(
      `context-reach failed to start: ${error instanceof Error ? error.message : String(error)}`,
    );
  },
);
