import type { FileFailure, FileReport } from '../inspect.js';
import { ESTIMATE_NOTICE } from './notice.js';
import { VERSION } from '../version.js';

/** Version of the JSON documents context-reach writes; bumped on any incompatible change. */
export const REPORT_VERSION = 1;

/**
 * The one JSON document of `inspect --json`. Unreadable files carry `error` and no metrics;
 * blocking findings carry `remedy`, `remedyWhyNot` and `remedyAlternatives` when the caller
 * attached them (`remedyFileReport`), and a file `remedyTogether` when two or more apply.
 */
export function renderInspectJson(reports: FileReport[], failures: FileFailure[]): string {
  const files = [
    ...reports.map((r) => {
      const together = (r as { remedyTogether?: unknown }).remedyTogether;
      return {
        path: r.path,
        dialect: r.dialect,
        spec: r.spec,
        metrics: r.metrics,
        findings: r.findings,
        ...(together ? { remedyTogether: together } : {}),
      };
    }),
    ...failures.map((f) => ({
      path: f.path,
      dialect: null,
      spec: null,
      metrics: null,
      findings: [
        {
          rule: 'config-unreadable',
          severity: 'block',
          message: f.message,
          key: null,
          line: f.line,
        },
      ],
      error: { message: f.message, line: f.line },
    })),
  ];
  return `${JSON.stringify({ version: REPORT_VERSION, toolVersion: VERSION, notice: ESTIMATE_NOTICE, files }, null, 2)}\n`;
}
