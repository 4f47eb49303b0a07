/**
 * Values taken on assumption between base and head. A head whose position code did not change
 * and that states no trained span was trained no longer than the base: it inherits the base's
 * trained span `L0` (docs/metrics.md), and every metric that moves because of that is marked
 * *assumed* wherever it is shown. Without the inheritance a declared span that grows with the
 * code unchanged would read as trained at the new length, and contradict its own finding.
 */
import type { FileReport } from '../inspect.js';
import type { Assumption } from '../report/types.js';
import { sortFindings } from '../inspect.js';
import { computeMetrics } from '../metrics/compute.js';
import type { Finding, ModelSpec } from '../model.js';
import { metricFindings } from '../rules/metric-rules.js';
import { specFindings } from '../rules/spec-rules.js';
import { samePositionCode } from '../rules/change-rules.js';
import { formatTokens } from '../format/units.js';
import { METRIC_PATHS, metricValue } from '../metrics/metric-path.js';

/** Rules about the span against the reach, which a grown span with an unchanged code raises anyway. */
const SPAN_RULES = new Set(['span-past-reach', 'span-beyond-scaling-cover']);

function sameFinding(a: Finding, b: Finding): boolean {
  return a.rule === b.rule && a.message === b.message && a.key === b.key && a.line === b.line;
}

/** The report's findings less the ones its spec and metrics give again: those came from reading the text. */
export function readerFindings(report: FileReport): Finding[] {
  const derived = [
    ...specFindings(report.spec, report.locations),
    ...metricFindings(report.spec, report.metrics, report.locations),
  ];
  const out: Finding[] = [];
  for (const finding of report.findings) {
    const at = derived.findIndex((d) => sameFinding(d, finding));
    if (at >= 0) derived.splice(at, 1);
    else out.push(finding);
  }
  return out;
}

/**
 * The head measured with the base's trained span when the code did not change and the head
 * states none; null when nothing needs assuming. The head's spec stays as the file states it
 * (so change rules still see an unchanged code); its metrics and the findings that follow from
 * them are those of the assumed trained span.
 */
export function inheritTrainedSpan(
  base: FileReport,
  head: FileReport,
): { head: FileReport; assumption: Assumption } | null {
  const inherited = base.metrics.trainedSpan;
  if (
    inherited === null ||
    head.spec.trainedSpan !== null ||
    !samePositionCode(base.spec, head.spec)
  )
    return null;
  if (head.metrics.trainedSpan === inherited) return null;
  const assumedSpec: ModelSpec = { ...head.spec, trainedSpan: inherited };
  const metrics = computeMetrics(assumedSpec);
  const moved = METRIC_PATHS.filter(
    (m) => metricValue(metrics, m) !== metricValue(head.metrics, m),
  );
  // A span past the assumed reach is the grown span itself, which `span-grew-code-unchanged`
  // already says: only findings the head had on its own face stay about spans.
  const had = new Set(head.findings.map((f) => f.rule));
  const derived = metricFindings(assumedSpec, metrics, head.locations).filter(
    (f) => !SPAN_RULES.has(f.rule) || had.has(f.rule),
  );
  const findings = sortFindings([
    ...readerFindings(head),
    ...specFindings(head.spec, head.locations),
    ...derived,
  ]);
  return {
    head: { ...head, metrics, findings },
    assumption: {
      metrics: moved.includes('trainedSpan') ? moved : ['trainedSpan', ...moved],
      reason: `The position code did not change and the head states no trained span, so it is taken as the base's ${formatTokens(inherited)} tokens (assumed), not the declared ${formatTokens(head.metrics.declaredSpan)}.`,
    },
  };
}
