/**
 * The proof behind every remedy: the changed description is measured again (every metric of the
 * contract) and judged again by the same policy against the same base, exactly as the gate judges
 * a pull request. A change passes when the finding it targets no longer blocks and nothing blocks
 * that did not block before.
 */
import type { ChangedFile } from '../changes.js';
import { decideFile } from '../compare/decide.js';
import type { Judging } from '../policy/judging.js';
import { readerFindings } from '../compare/assumed.js';
import { sortFindings, type FileReport } from '../inspect.js';
import { computeMetrics, positionalMetricsOf, type ScanBudget } from '../metrics/compute.js';
import { MAX_REMEDY_SCAN_WORK } from '../metrics/scan-limits.js';
import type { Metrics } from '../metrics/types.js';
import type { ScanMemo } from '../metrics/scan-memo.js';
import type { Finding, ModelSpec } from '../model.js';
import { metricFindings } from '../rules/metric-rules.js';
import { specFindings } from '../rules/spec-rules.js';
import { applyChange } from './apply-change.js';
import type { Change } from '../report/types.js';
import { type FileDecision } from '../report/types.js';

/** What a finding is, for telling findings before and after a change apart: the rule, and the metric of a limit. */
export interface FindingIdentity {
  rule: string;
  metric?: string;
}

/** `rule` or `rule:metric`. */
export function identityOf(finding: FindingIdentity): string {
  return finding.metric ? `${finding.rule}:${finding.metric}` : finding.rule;
}

/** One file as the gate judged it, and what a proof compares against. */
export interface RemedyContext {
  head: FileReport;
  base: FileReport | null;
  judging: Judging;
  change: ChangedFile;
  /** Findings of the reader (about the text itself), which a change to the description leaves as they are. */
  readFindings: Finding[];
  /** Blocking findings of the head as it is, counted by identity. */
  blockingBefore: Map<string, number>;
  /** Every finding identity of the head as it is. */
  findingsBefore: Set<string>;
  /** pair·offsets the proofs of this file may still scan (see `MAX_FILE_PROOF_WORK`). */
  work: { left: number };
  /**
   * Similarity-scan work the whole search of this file may still spend, charged as scans run
   * (`MAX_REMEDY_SCAN_WORK`): it bounds what the estimate above cannot see, few fast pairs whose
   * scans cost far more than their pairs times their span.
   */
  scans: ScanBudget;
  /** The run's memory of positional computations, shared with the gate (default: none). */
  memo?: ScanMemo;
}

/**
 * pair·offsets: work all proofs of one file may do, a proof costing its frequency pairs times
 * its span (the positional scans dominate `computeMetrics`, measured at about 0.75 ns per
 * pair·offset), so remedies add at most a few seconds to any file (default: `2^32`).
 */
export const MAX_FILE_PROOF_WORK = 2 ** 32;

function blockingCounts(decision: FileDecision): Map<string, number> {
  const counts = new Map<string, number>();
  for (const finding of decision.findings) {
    if (finding.severity !== 'block') continue;
    const id = identityOf(finding);
    counts.set(id, (counts.get(id) ?? 0) + 1);
  }
  return counts;
}

/** The context of one file: judged once as it is, so proofs compare like with like. */
export function remedyContext(
  head: FileReport,
  base: FileReport | null,
  judging: Judging,
  change: ChangedFile,
  memo?: ScanMemo,
): RemedyContext {
  const decision = decideFile({ change, base, head, judging }, false);
  return {
    head,
    base,
    judging,
    change,
    readFindings: readerFindings(head),
    blockingBefore: blockingCounts(decision),
    findingsBefore: new Set(decision.findings.map(identityOf)),
    work: { left: MAX_FILE_PROOF_WORK },
    // The head's own positional metrics are paid for (the run's memo holds them): proofs that
    // leave them as they are do not spend the budget.
    scans: {
      left: MAX_REMEDY_SCAN_WORK,
      cut: false,
      ...(memo ? { free: positionalMetricsOf(head.spec, memo) } : {}),
    },
    ...(memo ? { memo } : {}),
  };
}

/** The changed description, measured and judged. */
export interface Proof {
  spec: ModelSpec;
  metrics: Metrics;
  decision: FileDecision;
  /** True when the target no longer blocks and no other finding blocks more than before (all-clear for no target). */
  passes: boolean;
  /** Identities that make it fail: the target if it still blocks, and any new blocking finding. */
  blockers: string[];
  /** Non-blocking findings the head did not have before. */
  raises: string[];
}

/** A spec measured and judged as the gate would judge the head (waivers do not apply: the proof is of the severity). */
export function judgeSpec(
  ctx: RemedyContext,
  spec: ModelSpec,
): { metrics: Metrics; decision: FileDecision } {
  const metrics = computeMetrics(spec, ctx.memo, ctx.scans);
  const findings = sortFindings([
    ...ctx.readFindings,
    ...specFindings(spec, ctx.head.locations),
    ...metricFindings(spec, metrics, ctx.head.locations),
  ]);
  const head: FileReport = { ...ctx.head, spec, metrics, findings };
  return {
    metrics,
    decision: decideFile({ change: ctx.change, base: ctx.base, head, judging: ctx.judging }, false),
  };
}

/**
 * Applies `change` to the head and judges it. With a `target`, passing means the target's
 * identity no longer blocks and no identity blocks more often than before; with `null`, that
 * nothing blocks at all (all remedies of a file applied together).
 */
export function prove(ctx: RemedyContext, target: FindingIdentity | null, change: Change): Proof {
  const spec = applyChange(ctx.head.spec, change);
  const { metrics, decision } = judgeSpec(ctx, spec);
  const after = blockingCounts(decision);
  const blockers: string[] = [];
  const targetId = target ? identityOf(target) : null;
  for (const [id, count] of after) {
    if (target === null || id === targetId || count > (ctx.blockingBefore.get(id) ?? 0))
      blockers.push(id);
  }
  const raises = [
    ...new Set(
      decision.findings
        .filter((f) => f.severity !== 'block' && !ctx.findingsBefore.has(identityOf(f)))
        .map(identityOf),
    ),
  ];
  return { spec, metrics, decision, passes: blockers.length === 0, blockers, raises };
}
