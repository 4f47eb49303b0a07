import type { FileReport } from '../inspect.js';
import type { Finding } from '../model.js';
import type { MetricPath } from '../metrics/types.js';
import { METRIC_PATHS, METRIC_SOURCES, metricValue } from '../metrics/metric-path.js';
import { formatMetric } from '../format/metric-format.js';
import { formatInteger, percentChange } from '../format/units.js';
import type { Judging } from '../policy/judging.js';
import { checkLimit } from '../policy/limit-check.js';
import type { LimitState, MetricDelta } from '../report/types.js';
import { firstStated } from '../rules/first-stated.js';
import { uncomputedScanMetrics } from '../rules/metric-rules.js';

/**
 * The metric rows of one file (those that changed or that a limit judges, in contract order)
 * and the `limit-crossed` findings of the head.
 */
export function metricRows(
  base: FileReport | null,
  head: FileReport,
  judging: Judging,
): { deltas: MetricDelta[]; findings: (Finding & { metric?: MetricPath })[] } {
  const deltas: MetricDelta[] = [];
  const findings: (Finding & { metric?: MetricPath })[] = [];
  const uncomputed = new Set(uncomputedScanMetrics(head.metrics));
  for (const metric of METRIC_PATHS) {
    const b = base ? metricValue(base.metrics, metric) : null;
    const h = metricValue(head.metrics, metric);
    const limit = judging.limits[metric] ?? null;
    const change = b !== null && h !== null ? h - b : null;
    let state: LimitState = 'unjudged';
    let note: string | undefined;
    if (limit && h === null && uncomputed.has(metric)) {
      // Fail closed: the scan stopped at its bound, so nothing shows the limit holds.
      state = 'crossed';
      findings.push({
        rule: 'limit-crossed',
        severity: limit.severity,
        message: `${metric} is not computed (the positional scans stopped at their bound, see scan-incomplete), so its limit cannot be shown to hold.`,
        ...firstStated(head.locations, ['serving.span', 'declaredSpan']),
        metric,
      });
    } else if (limit && metric === 'discriminationSpan' && h === null) {
      // No negative sum within the span: the span itself is the least the metric can be.
      const T = head.metrics.evaluationSpan;
      const bound = limit.min ?? null;
      if (T !== null && head.metrics.fastestWavelength !== null && (bound === null || T >= bound))
        state = 'ok';
      else
        note =
          T !== null && bound !== null
            ? `not judged: the span ${formatInteger(T)} is shorter than the limit`
            : 'not judged: no value';
    } else if (limit) {
      const { crossed, judged } = checkLimit(limit, b, h, metric);
      state = crossed.length > 0 ? 'crossed' : judged ? 'ok' : 'unjudged';
      if (!judged) note = 'not judged: no value';
      if (crossed.length > 0) {
        findings.push({
          rule: 'limit-crossed',
          severity: limit.severity,
          message: `${metric} is ${formatMetric(metric, h)}${b !== null && b !== h ? ` (base ${formatMetric(metric, b)})` : ''}: ${crossed.join('; ')}.`,
          ...firstStated(
            head.locations,
            METRIC_SOURCES[metric.startsWith('precision.') ? 'collidingPositions' : metric] ?? [
              'serving.span',
              'declaredSpan',
            ],
          ),
          metric,
        });
      }
    }
    const changed = base !== null && b !== h;
    if (changed || limit) {
      deltas.push({
        metric,
        base: b,
        head: h,
        change,
        changePct: percentChange(b, h),
        limit,
        state,
        ...(note ? { note } : {}),
      });
    }
  }
  return { deltas, findings };
}
