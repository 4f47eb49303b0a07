/**
 * Review suggestions: each blocking finding's fix as GitHub's suggestion block in a review
 * comment on the offending line, so a reviewer applies it with one click. Only where the fix is a
 * whole-line edit of the model file that reads back with the fix's values, and only on lines
 * that are part of the pull request's diff (GitHub takes review comments only there). Each body
 * starts with a hidden marker naming its finding, so a re-run finds its own suggestions: it keeps
 * or updates them and removes those whose finding is gone, never posting one twice.
 */
import type { FileDecision, GateReport, JudgedFinding } from '../report/types.js';
import { lineEdit } from '../remedy/suggestion-edit.js';
import { needsText, remedyNeeds } from '../remedy/needs.js';
import { remedyPatches } from './comment.js';
import { codeBlock, codeId, escapeMarkdown } from './escape.js';
import { metricParts, allRemedies } from './remedy-text.js';

/** Start of every suggestion body; the finding's id and ` -->` follow. */
export const SUGGESTION_MARKER = '<!-- context-reach:suggestion ';

/** One review comment to keep on the pull request. */
export interface PlannedSuggestion {
  /** Stable id of the finding it fixes (file, rule, metric, key), hashed: the same on every run. */
  id: string;
  path: string;
  /** First and last line replaced (equal for a one-line suggestion). */
  startLine: number;
  line: number;
  body: string;
}

/** FNV-1a, 32 bits, twice with different offsets: a short stable id that no path can break out of. */
function hash(text: string): string {
  let a = 0x811c9dc5;
  let b = 0x01000193 ^ 0x5bd1e995;
  for (let i = 0; i < text.length; i++) {
    const c = text.charCodeAt(i);
    a = Math.imul(a ^ c, 0x01000193) >>> 0;
    b = Math.imul(b ^ c, 0x01000193 + 2) >>> 0;
  }
  return `${a.toString(16).padStart(8, '0')}${b.toString(16).padStart(8, '0')}`;
}

/** The id a finding's suggestion carries. */
export function suggestionId(file: FileDecision, finding: JudgedFinding): string {
  return hash([file.path, finding.rule, finding.metric ?? '', finding.key ?? ''].join('\u0000'));
}

/** The id a review comment body carries, or null when it is not one of ours. */
export function suggestionIdOf(body: string): string | null {
  if (!body.startsWith(SUGGESTION_MARKER)) return null;
  const match = /^<!-- context-reach:suggestion ([0-9a-f]{16}) -->/.exec(body);
  return match ? match[1]! : null;
}

/**
 * The suggestions to keep on the pull request: per blocking finding, the first of its fixes that
 * is a whole-line edit of lines in the diff. `texts` holds each model file at head; `diffLines`
 * the lines of each path that are part of the diff (right side).
 */
export function planSuggestions(
  report: GateReport,
  texts: ReadonlyMap<string, string>,
  diffLines: ReadonlyMap<string, ReadonlySet<number>>,
): PlannedSuggestion[] {
  const planned: PlannedSuggestion[] = [];
  for (const file of report.files) {
    const text = texts.get(file.path);
    const lines = diffLines.get(file.path);
    if (text === undefined || !lines || !file.head) continue;
    for (const finding of file.findings) {
      if (finding.counts !== 'block') continue;
      for (const remedy of allRemedies(finding)) {
        const patches = remedyPatches(file, remedy);
        if (patches.length !== 1) continue;
        const edit = lineEdit(text, file.path, patches[0]!, remedy.change, finding.line);
        if (edit === null) continue;
        let inDiff = true;
        for (let n = edit.startLine; n <= edit.endLine; n++) if (!lines.has(n)) inDiff = false;
        if (!inDiff) continue;
        const values = metricParts(remedy.metrics)
          .slice(0, 3)
          .map((m) => `${m.metric} ${m.value}`)
          .join(', ');
        const needs = needsText(remedyNeeds(remedy.change, file.head.spec));
        planned.push({
          id: suggestionId(file, finding),
          path: file.path,
          startLine: edit.startLine,
          line: edit.endLine,
          body: [
            `${SUGGESTION_MARKER}${suggestionId(file, finding)} -->`,
            `**context-reach** · ${codeId(finding.rule)}${finding.metric ? ` (${codeId(finding.metric)})` : ''}: this fix passes these rules (${escapeMarkdown(values)}); it still needs ${escapeMarkdown(needs)}.`,
            '',
            codeBlock(edit.replacement, 'suggestion'),
          ].join('\n'),
        });
        break;
      }
    }
  }
  return planned;
}
