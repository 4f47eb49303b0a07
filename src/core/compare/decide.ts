/**
 * The gate's decision: each changed model config judged (its findings, the change rules between
 * base and head, the policy's limits, standing and waiver), and the pull request's verdict.
 */
import type { ChangedFile } from '../changes.js';
import type { FileFailure, FileReport } from '../inspect.js';
import { sortFindings } from '../inspect.js';
import type { Finding } from '../model.js';
import type { MetricPath } from '../metrics/types.js';
import type { Judging } from '../policy/judging.js';
import type {
  FileDecision,
  GateReport,
  JudgedFinding,
  MetricDelta,
  PolicyInfo,
} from '../report/types.js';
import { tally, verdictOf } from '../report/verdict.js';
import { RULES } from '../rules/catalog.js';
import { changeFindings } from '../rules/change-rules.js';
import { SEVERITY_ORDER } from '../severity.js';
import { inheritTrainedSpan } from './assumed.js';
import { metricRows } from './limits.js';
import { judgeFindings } from './standing.js';

/** One changed model config with both of its versions read (null where a side has none). */
export interface ChangedConfig {
  change: ChangedFile;
  base: FileReport | FileFailure | null;
  head: FileReport | FileFailure | null;
  judging: Judging;
}

/** What the decision reads: the changed configs, the policy's source, the waiver, notices, commits. */
export interface GateInput {
  configs: ChangedConfig[];
  /** Deleted configs: listed, not judged. */
  deleted: ChangedFile[];
  policy: PolicyInfo;
  /** The waiver label and whether the pull request carries it (default: none). */
  waiver: { label: string | null; applied: boolean };
  /** Notices for the report (not-judged files, truncated file lists, read-only tokens). */
  notices: string[];
  base: string;
  head: string;
}

function isReport(version: FileReport | FileFailure | null): version is FileReport {
  return version !== null && 'metrics' in version;
}

function isFailure(version: FileReport | FileFailure | null): version is FileFailure {
  return version !== null && !('metrics' in version);
}

/** The blocking finding for a base version that exists but could not be read or parsed. */
function baseUnreadable(failure: FileFailure): Finding {
  return {
    rule: 'base-unreadable',
    severity: RULES['base-unreadable'].severity,
    message: `The base version does not read: ${failure.message}. The change is not judged against the base (a grown span with the code unchanged, changed frequencies, shape or cache per token, a limit's max-increase-pct), so it blocks; a pull request that repairs the base can be merged deliberately with the policy's waiver label.`,
    key: null,
    line: null,
  };
}

/** Judge one changed config: its findings with policy, standing and waiver applied, and its deltas. */
export function decideFile(config: ChangedConfig, waiverApplied: boolean): FileDecision {
  const { change, judging } = config;
  const base = isReport(config.base) ? config.base : null;
  const readHead = isReport(config.head) ? config.head : null;
  // A head that keeps the base's code and states no trained span inherits the base's (assumed).
  const inherited = base && readHead ? inheritTrainedSpan(base, readHead) : null;
  const head = inherited?.head ?? readHead;
  const headError = isFailure(config.head) ? config.head : null;
  let raw: (Finding & { metric?: MetricPath })[] = [];
  let deltas: MetricDelta[] = [];
  if (head) {
    const limits = metricRows(base, head, judging);
    deltas = limits.deltas;
    raw = [...head.findings, ...(base ? changeFindings(base, head) : []), ...limits.findings];
  } else if (headError) {
    raw = [
      {
        rule: 'config-unreadable',
        severity: 'block',
        message: headError.message,
        key: null,
        line: headError.line,
      },
    ];
  }
  const baseError = isFailure(config.base) ? config.base : null;
  // Fail closed: a base that exists but does not read leaves every base-against-head rule
  // unjudged, so the change blocks rather than pass on its head alone. A base that reads but
  // describes no model has nothing to compare with: the head is a new model.
  if (head && baseError && baseError.notAModel !== true) raw.push(baseUnreadable(baseError));
  const findings = judgeFindings(raw, base?.findings ?? [], judging, waiverApplied, change.path);
  const sorted = sortFindings(findings) as JudgedFinding[];
  return {
    path: change.path,
    previousPath: change.previousPath,
    status: change.status,
    dialect: head?.dialect ?? null,
    verdict: verdictOf(sorted),
    deltas,
    findings: sorted,
    base,
    head,
    baseError,
    headError,
    assumed: inherited?.assumption ?? null,
  };
}

/** The gate's one decision for a pull request. */
export function decide(input: GateInput): GateReport {
  const files = input.configs.map((config) => decideFile(config, input.waiver.applied));
  const { verdict, blocking, warnings, waivedBlocks } = tally(files.flatMap((f) => f.findings));
  return {
    version: 1,
    verdict,
    blocking,
    warnings,
    files: [...files].sort(
      (a, b) =>
        SEVERITY_ORDER[a.verdict === 'ok' ? 'info' : a.verdict] -
          SEVERITY_ORDER[b.verdict === 'ok' ? 'info' : b.verdict] || a.path.localeCompare(b.path),
    ),
    deleted: input.deleted,
    policy: input.policy,
    waiver: { ...input.waiver, waivedBlocks },
    notices: input.notices,
    base: input.base,
    head: input.head,
  };
}
