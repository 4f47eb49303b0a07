import { ESTIMATE_NOTICE } from './notice.js';
import { VERSION } from '../version.js';
import type { GateReport } from '../report/types.js';

/**
 * The versioned JSON report of the gate: the decision, and per file both versions' spec, metrics
 * and findings. Locations are left out (the findings carry key and line). Every blocking finding
 * carries `remedy` (`{change, metrics, raises}`, or null), `remedyWhyNot` and
 * `remedyAlternatives`; a file with two or more remedies carries `remedyTogether`. `toolVersion` is
 * the context-reach release that wrote it. Published as `schema/report.schema.json`.
 */
export function renderGateJson(report: GateReport): string {
  const files = report.files.map((file) => ({
    path: file.path,
    previousPath: file.previousPath,
    status: file.status,
    dialect: file.dialect,
    verdict: file.verdict,
    deltas: file.deltas,
    findings: file.findings,
    base: file.base ? { spec: file.base.spec, metrics: file.base.metrics } : null,
    // Where each field was stated: the fixes are shown in the file's own keys from it.
    head: file.head
      ? { spec: file.head.spec, metrics: file.head.metrics, locations: file.head.locations }
      : null,
    baseError: file.baseError,
    headError: file.headError,
    ...(file.remedyTogether ? { remedyTogether: file.remedyTogether } : {}),
    ...(file.assumed ? { assumed: file.assumed } : {}),
  }));
  return `${JSON.stringify(
    {
      version: report.version,
      toolVersion: VERSION,
      notice: ESTIMATE_NOTICE,
      verdict: report.verdict,
      blocking: report.blocking,
      warnings: report.warnings,
      base: report.base,
      head: report.head,
      policy: report.policy,
      waiver: report.waiver,
      notices: report.notices,
      deleted: report.deleted,
      files,
    },
    null,
    2,
  )}\n`;
}
