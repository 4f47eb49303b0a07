import type { GateReport } from '../../src/core/report/types.js';

/** Text a pull request could put in a path, a key, a value or a message. */
export const HOSTILE = [
  '<script>alert(1)</script>',
  '"><img src=x onerror=alert(2)>',
  "'><svg onload=alert(3)>",
  '</style><iframe src="https://evil.example/">',
  '<!-- comment --><a href="javascript:alert(4)">x</a>',
  '&lt;already&gt; &amp; escaped',
];

/** The report with every text a pull request controls replaced by hostile strings. */
export function hostileReport(report: GateReport): GateReport {
  const pick = (i: number) => HOSTILE[i % HOSTILE.length]!;
  return {
    ...report,
    notices: [...report.notices, pick(0), pick(3)],
    waiver: { label: pick(1), applied: true, waivedBlocks: 1 },
    policy: { ...report.policy, path: pick(2), source: 'built-in', changedInHead: true },
    deleted: [{ status: 'deleted', path: pick(4), previousPath: null }],
    files: report.files.map((file, f) => ({
      ...file,
      path: `models/${pick(f)}/config.json`,
      status: 'renamed',
      previousPath: pick(f + 1),
      findings: file.findings.map((finding, i) => ({
        ...finding,
        message: `${finding.message} ${pick(i)}`,
        key: pick(i + 1),
        remedyWhyNot: finding.remedy === null ? pick(i + 2) : finding.remedyWhyNot,
      })),
      headError: file.headError,
    })),
  };
}
