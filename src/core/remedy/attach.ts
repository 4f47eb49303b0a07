/**
 * Remedies attached to reports: every blocking finding of the gate's report (and of a single
 * inspected file, judged with the built-in rules) carries its remedy, or why there is none.
 */
import type { ChangedConfig } from '../compare/decide.js';
import { BUILT_IN_JUDGING } from '../policy/judging.js';
import { isMetricPath, metricValue } from '../metrics/metric-path.js';
import type { FileReport } from '../inspect.js';
import type { Finding } from '../model.js';
import { createScanMemo, type ScanMemo } from '../metrics/scan-memo.js';
import { applyChange, changeEntries } from './apply-change.js';
import { proofCost, proposeRemedy } from './propose.js';
import { prove, remedyContext, type RemedyContext } from './prove.js';
import type {
  Change,
  CombinedRemedy,
  RemedyFields,
  FileDecision,
  GateReport,
  JudgedFinding,
} from '../report/types.js';

const UNREADABLE: RemedyFields = {
  remedy: null,
  remedyWhyNot: 'The head version could not be read, so there is no description to change.',
  remedyAlternatives: [],
};

/**
 * Every blocking finding's first remedy applied at once, proven the same way; null with fewer
 * than two remedies (one is already shown), when two remedies set one field differently, or when
 * the file's proof budget is spent.
 */
export function combineRemedies(
  ctx: RemedyContext,
  findings: readonly Partial<RemedyFields>[],
): CombinedRemedy | null {
  const remedies = findings.map((f) => f.remedy).filter((r) => r !== null && r !== undefined);
  if (remedies.length < 2) return null;
  const change: Change = {};
  for (const remedy of remedies) {
    for (const [key, value] of changeEntries(remedy.change)) {
      if (key in change && change[key] !== value) return null;
      change[key] = value;
    }
  }
  // Within the file's proof budget, like every other proof.
  const cost = proofCost(applyChange(ctx.head.spec, change));
  if (cost > ctx.work.left) return null;
  ctx.work.left -= cost;
  const proof = prove(ctx, null, change);
  const metrics: Record<string, number | null> = {};
  for (const remedy of remedies) {
    for (const name of Object.keys(remedy.metrics))
      if (isMetricPath(name)) metrics[name] = metricValue(proof.metrics, name);
  }
  return { change, metrics, passes: proof.passes, stillBlocking: proof.blockers };
}

function withRemedies(
  file: FileDecision,
  config: ChangedConfig | undefined,
  memo: ScanMemo | undefined,
): FileDecision {
  if (!file.findings.some((f) => f.severity === 'block')) return file;
  if (!file.head || !config) {
    return {
      ...file,
      findings: file.findings.map((f) => (f.severity === 'block' ? { ...f, ...UNREADABLE } : f)),
    };
  }
  const ctx = remedyContext(file.head, file.base, config.judging, config.change, memo);
  const findings: JudgedFinding[] = file.findings.map((f) =>
    f.severity === 'block' ? { ...f, ...proposeRemedy(ctx, f) } : f,
  );
  return { ...file, findings, remedyTogether: combineRemedies(ctx, findings) };
}

/**
 * The gate's report with a remedy (or the reason there is none) on every blocking finding; with
 * a `memo`, proofs reuse the positional computations of the run.
 */
export function attachRemedies(
  report: GateReport,
  configs: readonly ChangedConfig[],
  memo?: ScanMemo,
): GateReport {
  const byPath = new Map(configs.map((c) => [c.change.path, c]));
  return {
    ...report,
    files: report.files.map((file) => withRemedies(file, byPath.get(file.path), memo)),
  };
}

/** A finding of `inspect`, with its remedy when it blocks. */
export type RemediedFinding = Finding & Partial<RemedyFields>;

/**
 * One inspected file with a remedy on every blocking finding, judged with the built-in rules and
 * no base version; `remedyTogether` when two or more remedies apply at once.
 */
export function remedyFileReport(
  report: FileReport,
  memo?: ScanMemo,
): FileReport & { findings: RemediedFinding[]; remedyTogether: CombinedRemedy | null } {
  if (!report.findings.some((f) => f.severity === 'block'))
    return { ...report, remedyTogether: null };
  const ctx = remedyContext(
    report,
    null,
    BUILT_IN_JUDGING,
    { status: 'added', path: report.path, previousPath: null },
    // A memo of its own when none is given: proofs that keep the file's positional inputs reuse
    // one scan instead of repeating it.
    memo ?? createScanMemo(),
  );
  const findings: RemediedFinding[] = report.findings.map((f) =>
    f.severity === 'block' ? { ...f, ...proposeRemedy(ctx, f) } : f,
  );
  return { ...report, findings, remedyTogether: combineRemedies(ctx, findings) };
}
