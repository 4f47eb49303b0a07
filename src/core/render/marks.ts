/**
 * The words and marks every report uses for severities, verdicts and limit states, so the
 * comment, the terminal and the HTML page say the same thing the same way. Marks are shapes, not
 * colours (a square for what blocks, a triangle for a warning, a circle for a note), so they read
 * in grey print and for people who do not tell the colours apart; a warning never wears the
 * failure mark.
 */
import type { LimitState, MetricDelta, Verdict } from '../report/types.js';
import type { Severity } from '../model.js';

export const SEVERITY_MARK: Record<Severity, string> = { block: '■', warn: '▲', info: '●' };
export const SEVERITY_WORD: Record<Severity, string> = {
  block: 'blocks',
  warn: 'warning',
  info: 'note',
};

export const VERDICT_MARK: Record<Verdict, string> = { block: '■', warn: '▲', ok: '✓' };
export const VERDICT_WORD: Record<Verdict, string> = {
  block: 'Blocked',
  warn: 'Passes with warnings',
  ok: 'Passes',
};

/** The state cell of a limited metric, in words: `within`, `crossed (warning)`, `not judged: …`. */
export function limitStateWord(delta: Pick<MetricDelta, 'state' | 'limit' | 'note'>): string {
  const state: LimitState = delta.state;
  if (state === 'crossed') return `crossed (${SEVERITY_WORD[delta.limit?.severity ?? 'block']})`;
  if (state === 'ok') return 'within';
  if (!delta.limit) return '';
  return delta.note ?? 'not judged';
}

/** The mark of a limit state: the severity's shape when crossed, a tick within, nothing otherwise. */
export function limitStateMark(delta: Pick<MetricDelta, 'state' | 'limit'>): string {
  if (delta.state === 'crossed') return SEVERITY_MARK[delta.limit?.severity ?? 'block'];
  if (delta.state === 'ok') return '✓';
  return '';
}

/** Said beside every memory figure: what it counts. */
export const MEMORY_CAUTION =
  'weights and key/value cache only; the usable memory leaves out the reserve (10 % unless the policy says otherwise) kept for activations, workspace and fragmentation';

/** Memory figures the caution goes beside. */
export const MEMORY_METRICS: ReadonlySet<string> = new Set([
  'memoryBytes',
  'memoryBytesPerDevice',
  'fitSequences',
  'cacheBytesAtSpan',
]);

/** The same caution, short enough for a card or a chart label. */
export const MEMORY_CAUTION_SHORT = 'weights and cache only, plus the reserve';
