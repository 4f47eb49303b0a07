import type { Severity } from '../model.js';
import { RULES, type RuleId } from '../rules/catalog.js';
import { encodePath, showBidiControls } from './escape.js';
import type { GateReport } from '../report/types.js';

const SARIF_LEVEL: Record<Severity, 'error' | 'warning' | 'note'> = {
  block: 'error',
  warn: 'warning',
  info: 'note',
};

/**
 * SARIF 2.1.0 (OASIS standard) for code-scanning upload: one run, rule metadata from the rule
 * catalogue, one result per finding at its file and line.
 */
export function renderSarif(report: GateReport, toolVersion: string): string {
  const ruleIds = Object.keys(RULES) as RuleId[];
  const results = report.files.flatMap((file) =>
    file.findings
      .filter((f) => f.counts !== null)
      .map((f) => ({
        ruleId: f.rule,
        ruleIndex: ruleIds.indexOf(f.rule as RuleId),
        level: SARIF_LEVEL[f.counts!],
        message: { text: showBidiControls(f.message) },
        locations: [
          {
            physicalLocation: {
              // A URI reference (RFC 3986, as SARIF 2.1.0 §3.10.2 asks): each segment percent-encoded,
              // so `#`, `?` and `%2f` in a name stay part of the name.
              artifactLocation: { uri: encodePath(file.path), uriBaseId: '%SRCROOT%' },
              ...(f.line !== null ? { region: { startLine: f.line } } : {}),
            },
          },
        ],
        properties: {
          standing: f.standing,
          waived: f.waived,
          key: f.key === null ? null : showBidiControls(f.key),
        },
      })),
  );
  const sarif = {
    $schema: 'https://json.schemastore.org/sarif-2.1.0.json',
    version: '2.1.0',
    runs: [
      {
        tool: {
          driver: {
            name: 'context-reach',
            version: toolVersion,
            rules: ruleIds.map((id) => ({
              id,
              shortDescription: { text: RULES[id].title },
              help: { text: RULES[id].help },
              defaultConfiguration: { level: SARIF_LEVEL[RULES[id].severity] },
            })),
          },
        },
        results,
      },
    ],
  };
  return `${JSON.stringify(sarif, null, 2)}\n`;
}
