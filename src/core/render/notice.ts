/** Said in every report: what the numbers are and are not. */
export const ESTIMATE_NOTICE =
  'These metrics are estimates computed from the config alone, to support a review; they are not a guarantee of model quality, and a model can fail or succeed for reasons no config shows.';

/** Hidden first line of the pull-request comment; the action finds its own comment by it. */
export const COMMENT_MARKER = '<!-- context-reach:pull-request-report -->';

/**
 * What a reader must know of a file whose base version did not read (`base-unreadable`): the
 * rules that compare base and head were not applied, why, and what the finding makes of the
 * change (blocks, warns, or blocks but is waived). Null when the base read, or was no model.
 */
export function baseUnreadableText(file: {
  base: unknown;
  baseError: { message: string } | null;
  findings: readonly { rule: string; counts: 'block' | 'warn' | 'info' | null; waived: boolean }[];
}): string | null {
  if (file.baseError === null || file.base !== null) return null;
  const finding = file.findings.find((f) => f.rule === 'base-unreadable');
  const outcome = !finding
    ? ''
    : finding.waived
      ? ' It would block; the waiver label makes it a warning.'
      : finding.counts === 'block'
        ? ' This blocks the change.'
        : finding.counts === 'warn'
          ? " This is a warning here (the policy's rules say so), not a block."
          : '';
  return `The base version could not be read (${file.baseError.message}), so the rules that compare base and head (a grown span, changed frequencies, shape or cache per token, a limit's max-increase-pct) were not applied: the head is judged on its own, and no change against the base is measured.${outcome}`;
}
