import type { Annotation } from '../core/render/annotations.js';
import { appendSummary, issueCommand, setOutput, writeLine } from './workflow-commands.js';

/** The action's one adapter for what the runner shows: summary, annotations, outputs, log. */
export interface RunnerOutput {
  secret(value: string): void;
  output(name: string, value: string): void;
  summary(markdown: string): Promise<void>;
  annotate(annotation: Annotation): void;
  info(message: string): void;
  notice(message: string): void;
  warning(message: string): void;
  fail(message: string): void;
}

/** GitHub's limit for one step's job summary; a longer summary is cut with a note. */
export const SUMMARY_LIMIT = 1024 * 1024;

export function createRunnerOutput(env: Readonly<Record<string, string | undefined>> = process.env): RunnerOutput {
  return {
    secret: (value) => issueCommand('add-mask', {}, value),
    output: (name, value) => setOutput(env, name, value),
    async summary(markdown) {
      const text = markdown.length > SUMMARY_LIMIT - 200
        ? `${markdown.slice(0, SUMMARY_LIMIT - 400)}\n\n_The summary was cut at GitHub's 1 MiB limit; the JSON report has everything._\n`
        : markdown;
      appendSummary(env, text);
    },
    annotate(a) {
      issueCommand(a.level, { title: a.title, file: a.file, line: a.line ?? undefined }, a.message);
    },
    info: (message) => writeLine(message),
    notice: (message) => issueCommand('notice', {}, message),
    warning: (message) => issueCommand('warning', {}, message),
    fail: (message) => {
      process.exitCode = 1;
      issueCommand('error', {}, message);
    },
  };
}
