/**
 * The one place the action's inputs are read: every input of `action.yml`, defaulted and
 * checked, into one `Settings` object. Messages name the input, quote the value and say what
 * is allowed.
 */
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { DEFAULT_POLICY_PATH } from '../core/policy/defaults.js';

export type FailOn = 'block' | 'warn' | 'never';
export type CommentMode = 'update' | 'off';
export type SuggestionsMode = 'on' | 'off';

export interface Settings {
  /** Token for REST calls; empty when the workflow gives none (default: `${{ github.token }}`). */
  token: string;
  /** Repository-relative path of the policy file, read at the base commit (default: `.github/context-reach.yml`). */
  policyPath: string;
  /** Lowest verdict that fails the check; `never` only reports (default: `block`). */
  failOn: FailOn;
  /** Keep one living pull-request comment, or write none (default: `update`). */
  comment: CommentMode;
  /** Post each blocking finding's fix as a review suggestion on its line when that line is in the diff (default: `on`). */
  suggestions: SuggestionsMode;
  /** Where the JSON report is written (default: `${RUNNER_TEMP}/context-reach/report.json`). */
  reportJson: string;
  /** Where a SARIF 2.1.0 file is written, null for none (default: `null`). */
  sarif: string | null;
  /** Base ref or commit for events that carry none, e.g. workflow_dispatch (default: `null`). */
  base: string | null;
  /** Where a standalone HTML report is written, null for none (default: `null`). */
  htmlReport: string | null;
  /**
   * Link to the HTML report for the comment, e.g. where a later step publishes it; null links
   * this workflow run's page (its artifacts) when `htmlReport` is set (default: `null`).
   */
  htmlReportUrl: string | null;
  /**
   * Publish mode: the JSON report a first, unprivileged workflow wrote, to post as the comment of
   * the pull request whose head the triggering `workflow_run` names; null runs the gate (default: `null`).
   */
  publishReport: string | null;
}

/** Reads one input as the runner passes it: empty string when unset. */
export type GetInput = (name: string) => string;

export class InputError extends Error {
  constructor(
    readonly input: string,
    message: string,
  ) {
    super(message);
    this.name = 'InputError';
  }
}

function quote(value: string): string {
  const text = JSON.stringify(value);
  return text.length > 120 ? `${text.slice(0, 117)}..."` : text;
}

function oneOf<T extends string>(name: string, raw: string, allowed: readonly T[], fallback: T): T {
  if (raw === '') return fallback;
  if ((allowed as readonly string[]).includes(raw)) return raw as T;
  throw new InputError(
    name,
    `Input "${name}" is ${quote(raw)}; expected one of ${allowed.join(', ')} (action.yml, input ${name}).`,
  );
}

/** A path the action writes to or reads its own files from: no control characters. */
function outputPath(name: string, raw: string): string {
  if (/[\u0000-\u001f]/.test(raw)) {
    throw new InputError(
      name,
      `Input "${name}" is ${quote(raw)}; expected a file path without control characters (action.yml, input ${name}).`,
    );
  }
  return raw;
}

/** A link for the comment: an absolute http(s) URL without spaces or control characters. */
function webLink(name: string, raw: string): string {
  let url: URL | null;
  try {
    url = new URL(raw);
  } catch {
    url = null;
  }
  if (url === null || !/^https?:$/.test(url.protocol) || /[\s\u0000-\u001f]/.test(raw)) {
    throw new InputError(
      name,
      `Input "${name}" is ${quote(raw)}; expected an absolute http or https URL such as "https://example.org/report.html" (action.yml, input ${name}).`,
    );
  }
  return raw;
}

function repositoryPath(name: string, raw: string): string {
  const parts = raw.split('/');
  if (
    /[\u0000-\u001f\\]/.test(raw) ||
    raw.startsWith('/') ||
    /^[A-Za-z]:/.test(raw) ||
    parts.some((part) => part === '' || part === '.' || part === '..')
  ) {
    throw new InputError(
      name,
      `Input "${name}" is ${quote(raw)}; expected a path inside the repository such as ".github/context-reach.yml" (relative, "/" separators, no "." or ".." parts) (action.yml, input ${name}).`,
    );
  }
  return raw;
}

/**
 * Every input, defaulted and checked. `getInput` returns the raw input (the runner's `INPUT_*`
 * value); `env` supplies `RUNNER_TEMP`.
 */
export function readSettings(
  getInput: GetInput,
  env: Readonly<Record<string, string | undefined>>,
): Settings {
  const read = (name: string): string => (getInput(name) ?? '').trim();

  const token = read('github-token');
  if (/\s/.test(token)) {
    // The value is a secret: say what is wrong without quoting it.
    throw new InputError(
      'github-token',
      'Input "github-token" contains whitespace; expected a single token (action.yml, input github-token).',
    );
  }
  const policyRaw = read('policy');
  const baseRaw = read('base');
  if (
    baseRaw !== '' &&
    (baseRaw.startsWith('-') || /[\s\u0000-\u001f~^:?*[\\]/.test(baseRaw) || baseRaw.includes('..'))
  ) {
    throw new InputError(
      'base',
      `Input "base" is ${quote(baseRaw)}; expected a branch, tag or commit id such as "main" (action.yml, input base).`,
    );
  }
  const reportRaw = read('report-json');
  const sarifRaw = read('sarif');
  const htmlRaw = read('html-report');
  const htmlUrlRaw = read('html-report-url');
  const publishRaw = read('publish-report');
  const temp = env.RUNNER_TEMP && env.RUNNER_TEMP !== '' ? env.RUNNER_TEMP : tmpdir();
  return {
    token,
    policyPath: policyRaw === '' ? DEFAULT_POLICY_PATH : repositoryPath('policy', policyRaw),
    failOn: oneOf('fail-on', read('fail-on'), ['block', 'warn', 'never'] as const, 'block'),
    comment: oneOf('comment', read('comment'), ['update', 'off'] as const, 'update'),
    suggestions: oneOf('suggestions', read('suggestions'), ['on', 'off'] as const, 'on'),
    reportJson:
      reportRaw === ''
        ? join(temp, 'context-reach', 'report.json')
        : outputPath('report-json', reportRaw),
    sarif: sarifRaw === '' ? null : outputPath('sarif', sarifRaw),
    base: baseRaw === '' ? null : baseRaw,
    htmlReport: htmlRaw === '' ? null : outputPath('html-report', htmlRaw),
    htmlReportUrl: htmlUrlRaw === '' ? null : webLink('html-report-url', htmlUrlRaw),
    publishReport: publishRaw === '' ? null : outputPath('publish-report', publishRaw),
  };
}
