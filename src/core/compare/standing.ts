/**
 * How the policy counts each finding of a head: the policy's severity for its rule (or the rule
 * turned off), standing (the base already had it), and the waiver label.
 */
import type { Finding, Severity } from '../model.js';
import type { MetricPath } from '../metrics/types.js';
import type { Judging } from '../policy/judging.js';
import type { JudgedFinding } from '../report/types.js';
import { RULES, isRuleId } from '../rules/catalog.js';

/** A finding's identity across base and head: its rule and key. */
const findingKey = (f: Finding) => `${f.rule}\u0000${f.key ?? ''}`;

/**
 * The head's `raw` findings as counted: a rule the policy turns off drops out; a blocking
 * finding of a file-scoped rule the base already had counts as `info` unless the policy makes
 * standing findings block; with the waiver applied what still blocks counts as a warning.
 */
export function judgeFindings(
  raw: readonly (Finding & { metric?: MetricPath })[],
  baseFindings: readonly Finding[],
  judging: Judging,
  waiverApplied: boolean,
  file: string,
): JudgedFinding[] {
  const baseKeys = new Set(baseFindings.map(findingKey));
  const findings: JudgedFinding[] = [];
  for (const finding of raw) {
    const configured =
      isRuleId(finding.rule) && RULES[finding.rule].scope !== 'limit'
        ? judging.rules[finding.rule]
        : undefined;
    if (configured === 'off') continue;
    const severity: Severity = configured ?? finding.severity;
    const standing =
      baseKeys.has(findingKey(finding)) &&
      RULES[finding.rule as keyof typeof RULES]?.scope === 'file';
    let counts: Severity | null = severity;
    if (standing && severity === 'block' && judging.standing === 'report') counts = 'info';
    let waived = false;
    if (counts === 'block' && waiverApplied) {
      counts = 'warn';
      waived = true;
    }
    findings.push({ ...finding, severity, standing, counts, waived, file });
  }
  return findings;
}
