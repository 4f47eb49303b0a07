/**
 * Review suggestions on the pull request: keeps exactly the planned suggestions, creates the
 * missing ones, updates or moves changed ones, leaves equal ones alone, and deletes ours whose
 * finding is gone. Only review comments written by a bot account and starting with our marker
 * are ever touched. The calls are the REST adapter's (`createReviewApi` in
 * `src/adapters/github-rest.ts`).
 */
import {
  isWriteRefused,
  type ReviewApi,
  type ReviewComment,
  type ReviewTarget,
} from '../adapters/github-rest.js';
import type { PlannedSuggestion } from '../core/render/suggestions.js';
import { suggestionIdOf } from '../core/render/suggestions.js';
import { decodeUtf8Lenient } from '../core/parse/utf8.js';

/** Lines of the head version a unified diff shows (added or context lines): where review comments may go. */
export function diffRightLines(patch: string): Set<number> {
  const lines = new Set<number>();
  let right = 0;
  let inHunk = false;
  for (const row of patch.split('\n')) {
    const hunk = /^@@ -\d+(?:,\d+)? \+(\d+)(?:,\d+)? @@/.exec(row);
    if (hunk) {
      right = Number(hunk[1]);
      inHunk = true;
      continue;
    }
    if (!inHunk || row.startsWith('\\')) continue;
    if (row.startsWith('-')) continue;
    if (row.startsWith('+') || row.startsWith(' ') || row === '') {
      lines.add(right);
      right += 1;
    }
  }
  return lines;
}

/** What a run did with the suggestions. */
export interface SuggestionOutcome {
  created: number;
  updated: number;
  kept: number;
  removed: number;
}

/**
 * Makes the pull request carry exactly `planned` among our suggestions. A suggestion whose line
 * moved is deleted and written again (a review comment cannot move); one whose body changed is
 * updated in place; ours that no plan names (the finding is fixed or gone) are deleted.
 */
export async function syncSuggestions(
  api: ReviewApi,
  target: ReviewTarget,
  planned: readonly PlannedSuggestion[],
): Promise<SuggestionOutcome> {
  const outcome: SuggestionOutcome = { created: 0, updated: 0, kept: 0, removed: 0 };
  const ours = (await api.listReviewComments(target)).filter(
    (c) => c.byBot && suggestionIdOf(c.body) !== null,
  );
  const byId = new Map<string, ReviewComment[]>();
  for (const comment of ours) {
    const id = suggestionIdOf(comment.body)!;
    byId.set(id, [...(byId.get(id) ?? []), comment]);
  }
  const wanted = new Set(planned.map((p) => p.id));
  for (const suggestion of planned) {
    const [first, ...extra] = byId.get(suggestion.id) ?? [];
    // Duplicates left by an interrupted run go; one stays.
    for (const comment of extra) {
      await api.deleteReviewComment(target, comment.id);
      outcome.removed += 1;
    }
    const samePlace =
      first &&
      first.path === suggestion.path &&
      first.line === suggestion.line &&
      (first.startLine ?? first.line) === suggestion.startLine;
    if (first && samePlace) {
      if (first.body === suggestion.body) outcome.kept += 1;
      else {
        await api.updateReviewComment(target, first.id, suggestion.body);
        outcome.updated += 1;
      }
      continue;
    }
    if (first) {
      await api.deleteReviewComment(target, first.id);
      outcome.removed += 1;
    }
    await api.createReviewComment(target, suggestion);
    outcome.created += 1;
  }
  for (const [id, comments] of byId) {
    if (wanted.has(id)) continue;
    for (const comment of comments) {
      await api.deleteReviewComment(target, comment.id);
      outcome.removed += 1;
    }
  }
  return outcome;
}

/** Files with a blocking finding that has a fix: where suggestions may go. */
function filesWithFixes(
  report: import('../core/report/types.js').GateReport,
): import('../core/report/types.js').FileDecision[] {
  return report.files.filter((f) => f.findings.some((x) => x.counts === 'block' && x.remedy));
}

/** Whether `publishSuggestions` will list the pull request's patches for this report. */
export function patchesNeeded(
  target: { isFork: boolean },
  report: import('../core/report/types.js').GateReport,
): boolean {
  return !target.isFork && filesWithFixes(report).length > 0;
}

/** The files whose head texts `publishSuggestions` reads for this report, in the order it asks for them. */
export function suggestionPaths(report: import('../core/report/types.js').GateReport): string[] {
  return filesWithFixes(report).map((file) => file.path);
}

/** Said when suggestions are skipped because the token may not write them. */
export const SUGGESTIONS_SKIPPED =
  'Review suggestions were skipped: the token cannot write review comments on this pull request (a read-only token, as pull requests from forks get). The fixes are in the report comment and the job summary.';

/**
 * Plans and syncs the suggestions of one report: the head text of each file with a blocking
 * finding, the diff's lines, then `syncSuggestions`. Returns a notice when the run skipped them
 * (a fork, a read-only token); throws for other failures, which the caller reports as a warning.
 */
export async function publishSuggestions(
  api: ReviewApi,
  target: ReviewTarget & { isFork: boolean },
  report: import('../core/report/types.js').GateReport,
  /** The head versions of `paths`, in order, read at once (null or an Error where one cannot be read). */
  readHeads: (paths: string[]) => Promise<(Uint8Array | null | Error)[]>,
  /** `api.listPatches(target)` when the caller asked for it already (`patchesNeeded`). */
  patchesAsked: Promise<Map<string, string>> | null = null,
): Promise<{ outcome: SuggestionOutcome | null; notice: string | null }> {
  if (target.isFork) return { outcome: null, notice: SUGGESTIONS_SKIPPED };
  const { planSuggestions } = await import('../core/render/suggestions.js');
  const blocking = filesWithFixes(report);
  const texts = new Map<string, string>();
  const heads = await readHeads(suggestionPaths(report)).catch(() => []);
  for (const [i, file] of blocking.entries()) {
    const bytes = heads[i];
    if (bytes instanceof Uint8Array)
      texts.set(file.path, decodeUtf8Lenient(bytes).replace(/^\uFEFF/, ''));
  }
  try {
    const patches =
      blocking.length > 0
        ? await (patchesAsked ?? api.listPatches(target))
        : new Map<string, string>();
    const lines = new Map([...patches].map(([path, patch]) => [path, diffRightLines(patch)]));
    return {
      outcome: await syncSuggestions(api, target, planSuggestions(report, texts, lines)),
      notice: null,
    };
  } catch (error) {
    if (isWriteRefused(error)) return { outcome: null, notice: SUGGESTIONS_SKIPPED };
    throw error;
  }
}
