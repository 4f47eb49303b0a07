/**
 * The action's one adapter for what the runner shows, over the toolkit's `@actions/core`: workflow
 * commands on standard output (annotations, `add-mask`, errors; `%`, CR and LF escaped, and in
 * properties also `:` and `,`), outputs appended to the file at `GITHUB_OUTPUT`, the job summary
 * appended to the file at `GITHUB_STEP_SUMMARY` (GitHub's "Workflow commands for GitHub Actions").
 * The entry loads the toolkit and passes it in; tests pass the same module.
 */
import type * as ActionsCore from '@actions/core';
import type { Annotation } from '../core/render/annotations.js';
import { showBidiControls } from '../core/render/escape.js';

/** The parts of `@actions/core` the action uses. */
export type Toolkit = Pick<
  typeof ActionsCore,
  'setSecret' | 'setOutput' | 'summary' | 'error' | 'warning' | 'notice' | 'info' | 'setFailed'
>;

/** What the runner shows: summary, annotations, outputs, log. */
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

/**
 * GitHub's limit for one step's job summary, in bytes: the runner measures the file it reads
 * (UTF-8), and a step whose summary is larger loses it whole. A longer summary is cut with a note.
 */
export const SUMMARY_LIMIT = 1024 * 1024;

/** What a summary may take, in UTF-8 bytes: the limit less a margin for the cut note and rounding (default: `SUMMARY_LIMIT − 16 KiB`). */
export const SUMMARY_BYTES = SUMMARY_LIMIT - 16 * 1024;

const CUT_NOTE =
  "\n\n_The summary was cut at GitHub's 1 MiB limit; the JSON report has everything._\n";

/** `text` cut to at most `maxBytes` bytes of UTF-8 at a character boundary (no half character, no lone surrogate). */
export function cutUtf8(text: string, maxBytes: number): string {
  const bytes = Buffer.from(text, 'utf8');
  if (bytes.byteLength <= maxBytes) return text;
  let end = maxBytes;
  // Step back over continuation bytes (10xxxxxx) to the start of a character.
  while (end > 0 && (bytes[end]! & 0xc0) === 0x80) end -= 1;
  return bytes.subarray(0, end).toString('utf8');
}

/**
 * A summary rendered to fit `maxBytes` of UTF-8: `render` takes a budget in characters (what the
 * renderers count), and the budget shrinks by the measured bytes-per-character until it fits.
 */
export function fitSummary(
  render: (limitChars: number) => string,
  maxBytes = SUMMARY_BYTES,
): string {
  let limit = maxBytes;
  for (let attempt = 0; attempt < 6; attempt += 1) {
    const text = render(limit);
    const bytes = Buffer.byteLength(text, 'utf8');
    if (bytes <= maxBytes) return text;
    limit = Math.max(1024, Math.floor(limit * (maxBytes / bytes) * 0.97));
  }
  return render(limit);
}

export function createRunnerOutput(core: Toolkit): RunnerOutput {
  return {
    secret: (value) => core.setSecret(value),
    output: (name, value) => core.setOutput(name, value),
    async summary(markdown) {
      // Bytes, as the runner counts them: 1 MiB of characters can be 3 MiB of UTF-8.
      const text =
        Buffer.byteLength(markdown, 'utf8') > SUMMARY_BYTES
          ? `${cutUtf8(markdown, SUMMARY_BYTES - Buffer.byteLength(CUT_NOTE, 'utf8'))}${CUT_NOTE}`
          : markdown;
      try {
        await core.summary.addRaw(text, true).write();
      } catch (error) {
        // The toolkit keeps its buffer when a write fails; the next summary must not carry this one.
        core.summary.emptyBuffer();
        throw error;
      }
    },
    annotate(a) {
      core[a.level](a.message, { title: a.title, file: a.file, startLine: a.line ?? undefined });
    },
    // Names from a pull request may hold bidirectional controls: the log shows them, never obeys them.
    info: (message) => core.info(showBidiControls(message)),
    notice: (message) => core.notice(showBidiControls(message)),
    warning: (message) => core.warning(showBidiControls(message)),
    fail: (message) => core.setFailed(showBidiControls(message)),
  };
}
