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
  return [...gateJsonParts(report)].join('');
}

/**
 * The text of `renderGateJson` in parts, a file at a time (joined, byte for byte the same), so
 * a report of thousands of files is written without its whole text in memory: each file's part
 * is `JSON.stringify` of the file at the indentation it has inside the whole (JSON strings hold
 * no line break, so indenting every line of the part is exact).
 */
export function* gateJsonParts(report: GateReport): Generator<string> {
  const fileJson = (file: GateReport['files'][number]) => ({
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
  });
  const whole = JSON.stringify(
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
      files: [],
    },
    null,
    2,
  );
  if (report.files.length === 0) {
    yield `${whole}\n`;
    return;
  }
  // `"files": []` closes the whole; the files go between its brackets.
  const EMPTY_END = '[]\n}';
  yield `${whole.slice(0, whole.length - EMPTY_END.length)}[\n`;
  for (const [i, file] of report.files.entries()) {
    const text = JSON.stringify(fileJson(file), null, 2).replace(/\n/g, '\n    ');
    yield `${i === 0 ? '' : ',\n'}    ${text}`;
  }
  yield '\n  ]\n}\n';
}
