import type { JudgedFinding, Verdict } from './types.js';

/** The verdict counted findings give: `block` when one counts as blocking, else `warn` when one counts as a warning, else `ok`. */
export function verdictOf(findings: readonly Pick<JudgedFinding, 'counts'>[]): Verdict {
  if (findings.some((f) => f.counts === 'block')) return 'block';
  if (findings.some((f) => f.counts === 'warn')) return 'warn';
  return 'ok';
}

/** A report's totals from all its findings: the verdict, what blocks, what warns, what the waiver turned. */
export function tally(findings: readonly JudgedFinding[]): {
  verdict: Verdict;
  blocking: number;
  warnings: number;
  waivedBlocks: number;
} {
  return {
    verdict: verdictOf(findings),
    blocking: findings.filter((f) => f.counts === 'block').length,
    warnings: findings.filter((f) => f.counts === 'warn').length,
    waivedBlocks: findings.filter((f) => f.waived).length,
  };
}
