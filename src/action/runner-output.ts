import * as core from '@actions/core';
import type { Annotation } from '../core/render/annotations.js';

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

export function createRunnerOutput(): RunnerOutput {
  return {
    secret: (value) => core.setSecret(value),
    output: (name, value) => core.setOutput(name, value),
    async summary(markdown) {
      const text = markdown.length > SUMMARY_LIMIT - 200
        ? `${markdown.slice(0, SUMMARY_LIMIT - 400)}\n\n_The summary was cut at GitHub's 1 MiB limit; the JSON report has everything._\n`
        : markdown;
      await core.summary.addRaw(text, true).write();
    },
    annotate(a) {
      const properties = { title: a.title, file: a.file, ...(a.line !== null ? { startLine: a.line } : {}) };
      if (a.level === 'error') core.error(a.message, properties);
      else if (a.level === 'warning') core.warning(a.message, properties);
      else core.notice(a.message, properties);
    },
    info: (message) => core.info(message),
    notice: (message) => core.notice(message),
    warning: (message) => core.warning(message),
    fail: (message) => core.setFailed(message),
  };
}
